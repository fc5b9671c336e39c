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

// TestSafetyStepsTwoColumns: on a tablet beside the catalog, a safety
// step's verdict (and the numbers under it) sit right of the step's text
// fields; on a phone the verdict is above them.
func TestSafetyStepsTwoColumns(t *testing.T) {
	for _, c := range []struct {
		size   image.Point
		beside bool
	}{{image.Pt(1024, 768), true}, {tallPhone, false}} {
		a, h := safetyApp(t, filepath.Join(t.TempDir(), "benchlog.json"), "safety", c.size)
		s := a.Screen("safety").(*safetyScreen)
		// A vessel whose steps give numbers (as TestScreenshotThemes).
		s.forms.vessel.SetText("allowable-stress", "138 MPa")
		s.forms.vessel.SetText("relief-set", "30 barg")
		s.forms.vessel.SetText("mawp", "25 barg")
		checked := 0
		for i := 0; i < s.items(); i++ {
			if s.calcs[i] == nil {
				continue
			}
			s.goTo(i)
			h.frames(3)
			v, ok := h.byDesc("Step verdict")
			field, okF := firstOfClass(h.nodes(), semantic.Editor)
			if !ok || !okF {
				continue // no numbers yet from the starting inputs
			}
			vb, fb := v.Desc.Bounds, field.Desc.Bounds
			if c.beside && fb.Max.X > vb.Min.X {
				t.Errorf("step %d (%s) at %v: text field %v not left of the verdict %v", i+1, s.pass.Items[i].ID, c.size, fb, vb)
			}
			if !c.beside && vb.Max.Y > fb.Min.Y {
				t.Errorf("step %d (%s) at %v: verdict %v not above the text field %v", i+1, s.pass.Items[i].ID, c.size, vb, fb)
			}
			checked++
		}
		if checked == 0 {
			t.Errorf("at %v no step showed a verdict beside a text field", c.size)
		}
		t.Logf("at %v: %d steps with a verdict and a text field", c.size, checked)
	}
}
