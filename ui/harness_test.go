package ui

import (
	"image"
	"strings"
	"testing"
	"time"
	"unicode/utf8"

	"gioui.org/f32"
	"gioui.org/io/input"
	"gioui.org/io/key"
	"gioui.org/io/pointer"
	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
)

// harness drives widgets through Gio's input router without a GPU: each
// frame lays out into an op list at one pixel per dp, hands it to the
// router, and the semantic tree then tells where widgets are.
type harness struct {
	t    *testing.T
	r    input.Router
	ops  op.Ops
	size image.Point
	now  time.Time
	w    layout.Widget
}

func newHarness(t *testing.T, size image.Point, w layout.Widget) *harness {
	t.Helper()
	h := &harness{t: t, size: size, now: time.Unix(1_800_000_000, 0), w: w}
	h.frame()
	return h
}

// frame lays out once and hands the ops to the router.
func (h *harness) frame() {
	h.ops.Reset()
	h.now = h.now.Add(20 * time.Millisecond)
	gtx := layout.Context{
		Ops:         &h.ops,
		Now:         h.now,
		Metric:      unit.Metric{PxPerDp: 1, PxPerSp: 1},
		Constraints: layout.Exact(h.size),
		Source:      h.r.Source(),
	}
	h.w(gtx)
	h.r.Frame(&h.ops)
}

// frames lays out n times (changes found during layout act a frame later).
func (h *harness) frames(n int) {
	for range n {
		h.frame()
	}
}

// nodes returns every semantic node of the last frame, parents first.
func (h *harness) nodes() []input.SemanticNode {
	var out []input.SemanticNode
	seen := map[input.SemanticID]bool{}
	var walk func(ns []input.SemanticNode)
	walk = func(ns []input.SemanticNode) {
		for _, n := range ns {
			if seen[n.ID] {
				continue
			}
			seen[n.ID] = true
			out = append(out, n)
			walk(n.Children)
		}
	}
	walk(h.r.AppendSemantics(nil))
	return out
}

// byDesc finds the node whose Description is desc.
func (h *harness) byDesc(desc string) (input.SemanticNode, bool) {
	for _, n := range h.nodes() {
		if n.Desc.Description == desc {
			return n, true
		}
	}
	return input.SemanticNode{}, false
}

// mustDesc is byDesc that fails the test when the node is missing.
func (h *harness) mustDesc(desc string) input.SemanticNode {
	h.t.Helper()
	n, ok := h.byDesc(desc)
	if !ok {
		h.t.Fatalf("no semantic node described %q; have:\n%s", desc, h.dump())
	}
	return n
}

// nodeText returns the labels of n and its descendants, joined by newlines.
func nodeText(n input.SemanticNode) string {
	var parts []string
	if n.Desc.Label != "" {
		parts = append(parts, n.Desc.Label)
	}
	for _, c := range n.Children {
		if s := nodeText(c); s != "" {
			parts = append(parts, s)
		}
	}
	return strings.Join(parts, "\n")
}

// shown returns the text drawn inside the node described desc ("" and
// false when there is no such node).
func (h *harness) shown(desc string) (string, bool) {
	n, ok := h.byDesc(desc)
	if !ok {
		return "", false
	}
	return nodeText(n), true
}

// control finds the tappable node (a node with a class or a description)
// that holds the text label, and returns its bounds.
func (h *harness) control(label string) (image.Rectangle, bool) {
	ns := h.nodes()
	byID := make(map[input.SemanticID]input.SemanticNode, len(ns))
	for _, n := range ns {
		byID[n.ID] = n
	}
	for _, n := range ns {
		if n.Desc.Label != label {
			continue
		}
		for p := n; ; {
			if p.Desc.Class != semantic.Unknown || p.Desc.Description != "" {
				return p.Desc.Bounds, true
			}
			var ok bool
			if p, ok = byID[p.ParentID]; !ok {
				break
			}
		}
	}
	return image.Rectangle{}, false
}

// tap clicks the control holding the text label; the test fails if none.
func (h *harness) tap(label string) {
	h.t.Helper()
	r, ok := h.control(label)
	if !ok {
		h.t.Fatalf("no control labelled %q; have:\n%s", label, h.dump())
	}
	h.click(r)
}

func (h *harness) dump() string {
	var b strings.Builder
	for _, n := range h.nodes() {
		if n.Desc.Label != "" || n.Desc.Description != "" {
			b.WriteString("  " + n.Desc.Description + " | " + n.Desc.Label + "\n")
		}
	}
	return b.String()
}

// click presses and releases the primary button at the centre of r, then
// runs two frames.
func (h *harness) click(r image.Rectangle) {
	h.clickOnce(r)
	h.frame()
}

// clickOnce is click with a single frame after the release, as a window
// that draws only when something happens.
func (h *harness) clickOnce(r image.Rectangle) {
	c := r.Min.Add(r.Max).Div(2)
	p := f32.Pt(float32(c.X), float32(c.Y))
	h.r.Queue(
		pointer.Event{Kind: pointer.Press, Source: pointer.Mouse, Buttons: pointer.ButtonPrimary, Position: p},
		pointer.Event{Kind: pointer.Release, Source: pointer.Mouse, Position: p},
	)
	h.frame()
}

// retype clicks the editor of the field labelled label, replaces its text
// (old) with s as a keyboard would, and runs frames until the change has
// been acted on.
func (h *harness) retype(label, old, s string) {
	h.t.Helper()
	h.click(h.mustDesc(label).Desc.Bounds)
	h.r.Queue(key.EditEvent{Range: key.Range{Start: 0, End: utf8.RuneCountInString(old)}, Text: s})
	h.frames(3)
}
