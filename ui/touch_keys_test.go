package ui

import (
	"fmt"
	"image"
	"sort"
	"strings"
	"testing"
	"time"

	"gioui.org/f32"
	"gioui.org/io/input"
	"gioui.org/io/key"
	"gioui.org/io/pointer"
	"gioui.org/io/semantic"
	"gioui.org/widget"

	"tubewright/calc/sheet"
)

// editorIn returns the bounds of the Editor node inside the node described
// desc.
func (h *harness) editorIn(desc string) image.Rectangle {
	h.t.Helper()
	var find func(n input.SemanticNode) (image.Rectangle, bool)
	find = func(n input.SemanticNode) (image.Rectangle, bool) {
		if n.Desc.Class == semantic.Editor {
			return n.Desc.Bounds, true
		}
		for _, c := range n.Children {
			if r, ok := find(c); ok {
				return r, true
			}
		}
		return image.Rectangle{}, false
	}
	r, ok := find(h.mustDesc(desc))
	if !ok {
		h.t.Fatalf("no editor inside %q", desc)
	}
	return r
}

// tapPadding taps the box described desc 4 dp inside its top-left corner,
// in its padding and outside its editor, and reports whether ed then has
// the focus.
func (h *harness) tapPadding(desc string, ed *widget.Editor) bool {
	h.t.Helper()
	box := h.mustDesc(desc).Desc.Bounds
	p := box.Min.Add(image.Pt(4, 4))
	if p.In(h.editorIn(desc)) {
		h.t.Fatalf("%q: the point %v is on the editor %v, not in the padding", desc, p, h.editorIn(desc))
	}
	h.click(image.Rectangle{Min: p, Max: p.Add(image.Pt(1, 1))})
	return h.r.Source().Focused(ed)
}

// escape presses and releases Escape and lays out twice.
func (h *harness) escape() {
	h.r.Queue(key.Event{Name: key.NameEscape, State: key.Press}, key.Event{Name: key.NameEscape, State: key.Release})
	h.frames(2)
}

// TestFieldBoxFocuses taps the padding of each kind of text box (a
// calculator's field, a setup's name in the keep bar, a safety note) and
// expects its editor focused; Escape then leaves the box but not the
// screen, and a second Escape goes back.
func TestFieldBoxFocuses(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	a.Open(sheet.IDGas)
	h := newHarness(t, image.Pt(412, 915), a.Layout)
	f := keepFor(a.env).forms[sheet.IDGas].Field("temperature")
	if !h.tapPadding("Temperature", &f.editor) {
		t.Fatal("a tap in the Temperature box's padding did not focus its editor")
	}
	h.escape()
	if h.r.Source().Focused(&f.editor) {
		t.Error("Escape left the focus in the field")
	}
	if a.Current() != sheet.IDGas {
		t.Fatalf("Escape while typing left the screen for %q", a.Current())
	}
	h.escape()
	if a.Current() != "" {
		t.Errorf("a second Escape did not go back: %q on top", a.Current())
	}

	a.Open(sheet.IDGas)
	h.frames(2)
	h.tap("Setups")
	b := keepFor(a.env).bars[sheet.IDGas]
	if !h.tapPadding("Setup name", &b.name) {
		t.Error("a tap in the setup name box's padding did not focus it")
	}

	a.Open(sheet.IDSafety)
	h.frames(2)
	s := a.Screen(sheet.IDSafety).(*safetyScreen)
	h2 := newHarness(t, image.Pt(412, 4000), a.Layout)
	if !h2.tapPadding("Note (optional)", &s.notes[0]) {
		t.Error("a tap in the safety note box's padding did not focus it")
	}
	h2.escape()
	if a.Current() != sheet.IDSafety || h2.r.Source().Focused(&s.notes[0]) {
		t.Errorf("Escape in the note: %q on top, still focused %v", a.Current(), h2.r.Source().Focused(&s.notes[0]))
	}
}

// TestTabOrder moves the focus forward through every plain calculator
// screen as Tab does on a desktop (the window moves the focus when no
// widget takes Tab) and expects the text fields in reading order, top to
// bottom and left to right, each once, at phone and desktop widths.
func TestTabOrder(t *testing.T) {
	compared := 0
	for _, size := range []image.Point{{412, 12000}, {1440, 12000}} {
		for _, e := range Catalog() {
			a := NewApp(nil)
			a.Open(e.ID)
			form := keepFor(a.env).forms[e.ID]
			if form == nil {
				continue
			}
			h := newHarness(t, size, a.Layout)
			h.frames(2)
			// The form's fields on screen, by the label of their box
			// (labels met once only, so that a box is found by its name).
			count := map[string]int{}
			for _, n := range h.nodes() {
				if tappable(n) && n.Desc.Description != "" {
					count[n.Desc.Description]++
				}
			}
			type shown struct {
				f *Field
				r image.Rectangle
			}
			var fields []shown
			for _, it := range form.items {
				if it.field == nil || count[it.field.Label] != 1 {
					continue
				}
				fields = append(fields, shown{it.field, h.mustDesc(it.field.Label).Desc.Bounds})
			}
			if len(fields) == 0 {
				continue
			}
			sort.SliceStable(fields, func(i, j int) bool {
				ri, rj := fields[i].r, fields[j].r
				if ri.Min.Y != rj.Min.Y {
					return ri.Min.Y < rj.Min.Y
				}
				return ri.Min.X < rj.Min.X
			})
			var want, got []string
			for _, s := range fields {
				want = append(want, s.f.Label)
			}
			seen := map[*Field]bool{}
			for range 600 {
				h.r.MoveFocus(key.FocusForward)
				for _, s := range fields {
					if h.r.Source().Focused(&s.f.editor) && !seen[s.f] {
						seen[s.f] = true
						got = append(got, s.f.Label)
					}
				}
				if len(got) == len(want) {
					break
				}
			}
			compared += len(want)
			if strings.Join(got, " | ") != strings.Join(want, " | ") {
				t.Errorf("%v %s: Tab reaches\n  %s\nwant\n  %s", size, e.ID, strings.Join(got, " | "), strings.Join(want, " | "))
			}
		}
	}
	if compared < 40 {
		t.Errorf("only %d fields compared: were the forms found?", compared)
	}
	t.Logf("%d fields in Tab order", compared)
}

// TestFieldHints: a field that takes ± says that "+-" types it; a count or
// a plain number gets the number pad; a quantity keeps a keyboard with
// letters for its unit.
func TestFieldHints(t *testing.T) {
	env := NewEnv(nil)
	pm, counts, quantities := 0, 0, 0
	for _, e := range sheet.Catalog() {
		if e.Sheet == nil {
			continue
		}
		f := NewForm(env, e.Sheet)
		for _, it := range f.items {
			fd := it.field
			if fd == nil {
				continue
			}
			where := fmt.Sprintf("%s %q", e.ID, fd.Label)
			if it.in.PM {
				pm++
				if !strings.Contains(fd.hint(), "+-") {
					t.Errorf("%s takes ± but its hint %q does not say +-", where, fd.hint())
				}
			}
			switch h := fd.inputHint(); {
			case it.in.Kind == sheet.Count || it.in.Kind == sheet.Number:
				counts++
				if h != key.HintNumeric {
					t.Errorf("%s: keyboard %v, want the number pad", where, h)
				}
			case it.in.Kind == sheet.Quantity:
				quantities++
				if h == key.HintNumeric {
					t.Errorf("%s: the number pad cannot type a unit", where)
				}
			}
		}
	}
	if pm == 0 || counts == 0 || quantities == 0 {
		t.Errorf("checked %d ± fields, %d counts, %d quantities: the catalog changed?", pm, counts, quantities)
	}
}

// TestFieldBoxFingerTap: a finger's tap in a box's padding focuses the
// field when the finger lifts; a finger that goes on to scroll the page
// (its press cancelled) does not focus it, so the keyboard stays down.
func TestFieldBoxFingerTap(t *testing.T) {
	a := NewApp(nil)
	a.Open(sheet.IDGas)
	h := newHarness(t, image.Pt(412, 915), a.Layout)
	f := keepFor(a.env).forms[sheet.IDGas].Field("temperature")
	box := h.mustDesc("Temperature").Desc.Bounds
	p := f32.Pt(float32(box.Min.X+4), float32(box.Min.Y+4))
	h.r.Queue(pointer.Event{Kind: pointer.Press, Source: pointer.Touch, Position: p})
	h.frame()
	h.r.Queue(pointer.Event{Kind: pointer.Cancel, Source: pointer.Touch, Position: p})
	h.frames(2)
	if h.r.Source().Focused(&f.editor) {
		t.Fatal("a cancelled finger press (a scroll) focused the field")
	}
	h.r.Queue(pointer.Event{Kind: pointer.Press, Source: pointer.Touch, Position: p})
	h.frame()
	if h.r.Source().Focused(&f.editor) {
		t.Fatal("the field took the focus before the finger lifted")
	}
	h.r.Queue(pointer.Event{Kind: pointer.Release, Source: pointer.Touch, Position: p})
	h.frames(2)
	if !h.r.Source().Focused(&f.editor) {
		t.Fatal("a finger's tap in the padding did not focus the field")
	}
}
