package ui

import (
	"image"
	"path/filepath"
	"strings"
	"testing"

	"gioui.org/io/input"
	"gioui.org/io/semantic"

	"tubewright/calc/safety"
)

// TestWideScreensTwoColumns: on a tablet beside the catalog, a tablet
// held upright and a desktop, every calculator screen shows a text field
// of its inputs left of its first result row, both in view without
// scrolling; on a phone (tall enough to show the whole page) the same two
// are one above the other.
func TestWideScreensTwoColumns(t *testing.T) {
	sizes := []struct {
		name   string
		size   image.Point
		beside bool
	}{
		{"tall phone", image.Pt(412, 6000), false},
		{"tablet", image.Pt(1024, 768), true},
		{"tablet-upright", image.Pt(768, 1024), true},
		{"desktop", image.Pt(1440, 900), true},
	}
	checked := 0
	for _, e := range Catalog() {
		for _, sz := range sizes {
			a := NewApp(nil)
			a.Open(e.ID)
			fs, ok := a.Screen(e.ID).(formScreen)
			if !ok {
				continue
			}
			h := newHarness(t, sz.size, a.Layout)
			h.frames(3)
			r := fs.Form().Result()
			if r == nil || len(r.Rows) == 0 {
				continue // e.g. Listen to the tube before a recording
			}
			res, ok := h.byDesc(r.Rows[0].Label)
			if !ok {
				t.Errorf("%s %s: first result row %q not in view", e.ID, sz.name, r.Rows[0].Label)
				continue
			}
			field, ok := firstOfClass(h.nodes(), semantic.Editor)
			if !ok {
				t.Errorf("%s %s: no text field in view", e.ID, sz.name)
				continue
			}
			fb, rb := field.Desc.Bounds, res.Desc.Bounds
			if sz.beside {
				if fb.Max.X > rb.Min.X {
					t.Errorf("%s %s: text field %v is not left of the result %v", e.ID, sz.name, fb, rb)
				}
			} else if fb.Overlaps(rb) || fb.Min.Y < rb.Max.Y && fb.Max.Y > rb.Min.Y {
				t.Errorf("%s %s: text field %v overlaps the result %v", e.ID, sz.name, fb, rb)
			}
			checked++
		}
	}
	if checked < 4*8 {
		t.Errorf("checked %d screen sizes, want every calculator with a result at 4 sizes (at least 32)", checked)
	}
}

// firstOfClass returns the first node of class c whose bounds are not
// empty.
func firstOfClass(ns []input.SemanticNode, c semantic.ClassOp) (input.SemanticNode, bool) {
	for _, n := range ns {
		if n.Desc.Class == c && !n.Desc.Bounds.Empty() {
			return n, true
		}
	}
	return input.SemanticNode{}, false
}

// TestSafetyGeneralCautionOnce: every step of the safety pass shows the
// general caution exactly once (at the top), also where the step's own
// caution box sits beside its numbers.
func TestSafetyGeneralCautionOnce(t *testing.T) {
	for _, size := range []image.Point{tallPhone, image.Pt(1440, 4000)} {
		a, h := safetyApp(t, filepath.Join(t.TempDir(), "benchlog.json"), "safety", size)
		s := a.Screen("safety").(*safetyScreen)
		for i := 0; i < s.items(); i++ {
			s.goTo(i)
			h.frames(3)
			n := 0
			for _, node := range h.nodes() {
				if strings.Contains(node.Desc.Label, safety.CautionGeneral) {
					n++
				}
			}
			if n != 1 {
				t.Errorf("width %d, step %d (%s): general caution shown %d times, want once", size.X, i+1, s.pass.Items[i].ID, n)
			}
		}
	}
}
