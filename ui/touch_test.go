package ui

import (
	"fmt"
	"image"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"gioui.org/io/input"
	"gioui.org/io/semantic"

	"tubewright/calc/safety"
	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// The smallest target a gloved finger hits reliably, in dp, both ways.
// WCAG 2.2's AAA target size (2.5.5) asks 44 CSS px; Material Design's
// touch-target guidance asks 48 dp. We ask 48 × 48 of every control,
// inline links included (the app has none: every control is a button, a
// chip, a tick row, a list row or a field box).
const touchMin = 48

// touchSizes are the windows the targets are checked at: a phone held
// upright and a laptop, tall so that every control of a page is laid out
// at once (a list lays out only what is visible), and the phone's own
// screen, where the pages scroll.
var touchSizes = []shotSize{
	{"phone", image.Pt(412, 12000)},
	{"wide", image.Pt(1440, 12000)},
	{"phonescreen", image.Pt(412, 915)},
}

// tappable reports whether n is something a finger aims at: a node with a
// click handler, or one of the control classes.
func tappable(n input.SemanticNode) bool {
	if n.Desc.Gestures&input.ClickGesture != 0 {
		return true
	}
	switch n.Desc.Class {
	case semantic.Button, semantic.CheckBox, semantic.RadioButton, semantic.Editor, semantic.Switch:
		return true
	}
	return false
}

// scrollBar reports whether n is the scroll bar of a long page (its track
// or its handle): a thin upright bar with no class, description or text.
// It is left out: on a touch screen the page scrolls by dragging anywhere
// on it, and the bar is a mouse's aid. Nothing else in the app has that
// shape.
func scrollBar(n input.SemanticNode) bool {
	b := n.Desc.Bounds
	return n.Desc.Class == semantic.Unknown && n.Desc.Description == "" && nodeText(n) == "" &&
		b.Dx() <= 12 && b.Dy() >= 3*b.Dx()
}

// targetOf returns the area a tap on control n reaches: its own bounds,
// or those of the nearest tappable ancestor that holds no other control
// (the box of a field, whose every point focuses the field's editor; see
// TestFieldBoxFocuses).
func targetOf(n input.SemanticNode, byID map[input.SemanticID]input.SemanticNode) image.Rectangle {
	r := n.Desc.Bounds
	for p, ok := byID[n.ParentID]; ok; p, ok = byID[p.ParentID] {
		if !tappable(p) {
			continue
		}
		if countTappable(p)-1 == countTappable(n) {
			r = r.Union(p.Desc.Bounds)
		}
		break
	}
	return r
}

// countTappable counts the tappable nodes of n's subtree, n included.
func countTappable(n input.SemanticNode) int {
	c := 0
	if tappable(n) {
		c++
	}
	for _, k := range n.Children {
		c += countTappable(k)
	}
	return c
}

// nameOf names a control for a failure message: its class, description
// and the first words it shows.
func nameOf(n input.SemanticNode) string {
	text := nodeText(n)
	if i := strings.IndexByte(text, '\n'); i >= 0 {
		text = text[:i]
	}
	if len(text) > 50 {
		text = text[:50] + "…"
	}
	return fmt.Sprintf("%v %q %q", n.Desc.Class, n.Desc.Description, text)
}

// checkTargets fails for every tappable control of the last frame whose
// target is smaller than touchMin × touchMin dp (the harness draws one
// pixel per dp). It returns the number of controls it checked.
func checkTargets(t *testing.T, h *harness, where string) int {
	t.Helper()
	ns := h.nodes()
	byID := make(map[input.SemanticID]input.SemanticNode, len(ns))
	for _, n := range ns {
		byID[n.ID] = n
	}
	checked := 0
	seen := map[string]bool{}
	for _, n := range ns {
		if !tappable(n) || scrollBar(n) {
			continue
		}
		checked++
		r := targetOf(n, byID)
		if r.Dx() >= touchMin && r.Dy() >= touchMin {
			continue
		}
		msg := fmt.Sprintf("%s: %s is %d×%d dp, below %d×%d", where, nameOf(n), r.Dx(), r.Dy(), touchMin, touchMin)
		if !seen[msg] {
			seen[msg] = true
			t.Error(msg)
		}
	}
	return checked
}

// TestTouchTargets opens every screen of the catalog, and the states that
// show more controls (every step of the safety pass and its saved review,
// each part of the device editors opened, the setups panel with a setup
// selected, the note row after Log result, a plot's table, the saved-work
// page and the bench log with entries), at phone and wide sizes, and
// checks that every control is at least 48 × 48 dp.
func TestTouchTargets(t *testing.T) {
	for _, sz := range touchSizes {
		t.Run(sz.name, func(t *testing.T) {
			total := 0
			a := NewApp(nil)
			h := newHarness(t, sz.size, a.Layout)
			total += checkTargets(t, h, "catalog")
			for _, e := range Catalog() {
				a := NewApp(nil)
				useBookAt(a.Env(), filepath.Join(t.TempDir(), "benchlog.json"))
				a.Open(e.ID)
				h := newHarness(t, sz.size, a.Layout)
				h.settleJobs(a)
				total += checkTargets(t, h, string(e.ID))
				total += touchStates(t, a, h, e.ID)
			}
			total += touchSaved(t, sz.size)
			if total < 300 {
				t.Errorf("only %d controls checked: is the semantic tree there?", total)
			}
		})
	}
}

// settleJobs lays out a's screen until background solves have drawn
// their results (plots, tables and their buttons): as the screenshot
// harness does, it lays out again while the app asks for frames through
// its Env, until none is asked for in 300 ms (at most 20 s).
func (h *harness) settleJobs(a *App) {
	if !layOutUntilQuiet(a.env, 300*time.Millisecond, h.frame) {
		h.t.Logf("still asking for frames after 20 s")
	}
}

// touchStates drives screen id into the states that show more controls
// and checks each; it returns the number of controls checked.
func touchStates(t *testing.T, a *App, h *harness, id sheet.ID) int {
	t.Helper()
	n := 0
	switch s := a.Screen(id).(type) {
	case *safetyScreen:
		for i := 1; i <= s.items(); i++ {
			s.goTo(i)
			h.frames(2)
			n += checkTargets(t, h, fmt.Sprintf("safety step %d", i+1))
		}
		s.saveTo(false)
		h.frames(2)
		n += checkTargets(t, h, "safety review, saved")
		s.restartWithUndo()
		h.frames(2)
		n += checkTargets(t, h, "safety, a new pass with Undo")
	case *onsetScreen:
		n += touchParts(t, h, s.editor, "onset")
	case *heatPumpScreen:
		n += touchParts(t, h, s.editor, "heat pump")
	}
	for _, node := range h.nodes() {
		if node.Desc.Class == semantic.Button && strings.HasPrefix(nodeText(node), "Table") {
			h.click(node.Desc.Bounds)
			h.frames(2)
			n += checkTargets(t, h, string(id)+" with its table")
			break
		}
	}
	return n
}

// touchParts opens each part of a device editor in turn.
func touchParts(t *testing.T, h *harness, e *deviceEditor, where string) int {
	t.Helper()
	n := 0
	for i := range e.parts {
		e.selected = i
		h.frames(2)
		n += checkTargets(t, h, fmt.Sprintf("%s, part %d open", where, i+1))
	}
	e.selected = -1
	return n
}

// touchSaved checks the keep bar's states and the pages of saved work,
// with a setup, a logged result and a safety pass in them.
func touchSaved(t *testing.T, size image.Point) int {
	t.Helper()
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	path := filepath.Join(t.TempDir(), "benchlog.json")
	p := store.Pass{Time: time.Date(2026, 12, 1, 21, 0, 0, 0, time.UTC), Items: []store.Item{{ID: "rating", Title: "Vessel rating", Done: true}}, Cautions: []string{safety.CautionGeneral}}
	if err := store.Append(path, p); err != nil {
		t.Fatal(err)
	}
	useBookAt(a.Env(), path)
	a.Open(sheet.IDGas)
	h := newHarness(t, size, a.Layout)
	n := 0
	h.tap("Log result")
	settle(h, k)
	n += checkTargets(t, h, "gas, note row after Log result")
	h.tap("Setups")
	h.retype("Setup name", "", "bench 2")
	h.tap("Save as")
	settle(h, k)
	h.click(h.mustDesc("Setup bench 2").Desc.Bounds)
	h.frames(2)
	n += checkTargets(t, h, "setups panel, a setup selected")
	a.Open(sheet.IDSaved)
	h.frames(3)
	n += checkTargets(t, h, "saved work with entries")
	a.Open(sheet.IDBenchLog)
	h.frames(3)
	n += checkTargets(t, h, "bench log with a pass")
	return n
}
