package ui

import (
	"image"
	"strings"
	"testing"
	"time"

	"gioui.org/io/input"
	"gioui.org/io/semantic"
	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
)

// onsetOf solves the editor's device with calc/linear (hot temperature K,
// frequency Hz).
func onsetOf(t *testing.T, e *deviceEditor) (float64, float64) {
	t.Helper()
	d, err := e.File().Validate()
	if err != nil {
		t.Fatal(err)
	}
	r, err := linear.Onset(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	return r.HotTemperature, r.Frequency
}

// TestDeviceSizesWholeOrHalf: in the device editor the plates show the gap
// and the half gap together, on the part's line and under the field;
// switching a size between whole and half converts the text and leaves
// the device as it was; typing a radius gives the onset of twice that
// diameter (1e-12 relative: a size and its half are the same device).
func TestDeviceSizesWholeOrHalf(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	_, h, e := deviceApp(t, k, sheet.IDOnset)
	th0, f0 := onsetOf(t, e)
	doc := e.document()
	// The engine example's stack is part 4, plates 0.8 mm apart
	// (calc/linear/examples/engine.json).
	const both = "gap 2y0 = 0.8 mm (half gap y0 = 0.4 mm)"
	if line := nodeText(h.mustDesc("part 4")); !strings.Contains(line, "Stack") {
		t.Fatalf("part 4 is %q", line)
	}
	h.click(h.mustDesc("Edit part 4").Desc.Bounds)
	h.frames(2)
	if !strings.Contains(nodeText(h.mustDesc("Both sizes of Gap between plates 2y0")), both) {
		t.Errorf("under the gap: %q, want %q", nodeText(h.mustDesc("Both sizes of Gap between plates 2y0")), both)
	}
	summaryShown := false
	for _, n := range h.nodes() {
		if strings.Contains(n.Desc.Label, "plates, "+both) {
			summaryShown = true
		}
	}
	if !summaryShown {
		t.Errorf("no part line shows %q", "plates, "+both)
	}

	// Half gap: the field now holds y0, the device is unchanged.
	tapWithin(h, "Size of Gap between plates 2y0 given as", "Half gap y0")
	if got := e.parts[3].fields[3].f.Text(); got != "0.4 mm" {
		t.Errorf("half gap field %q, want 0.4 mm", got)
	}
	if e.document() != doc {
		t.Errorf("switching to the half gap changed the device:\n%s\nwas\n%s", e.document(), doc)
	}
	h.retype("Half gap y0 (half the gap between plates)", "0.4 mm", "0.5 mm")
	if !strings.Contains(e.document(), `"gap":"1 mm"`) {
		t.Errorf("half gap 0.5 mm: device %s, want gap 1 mm", e.document())
	}
	h.retype("Half gap y0 (half the gap between plates)", "0.5 mm", "0.4 mm")
	tapWithin(h, "Size of Gap between plates 2y0 given as", "Gap 2y0")
	if e.document() != doc {
		t.Errorf("back to the gap: the device changed:\n%s\nwas\n%s", e.document(), doc)
	}

	// The holder's diameter as a radius: 60 mm across is 30 mm.
	tapWithin(h, "Size of Inside diameter of the holder given as", "Radius")
	if got := e.parts[3].fields[1].f.Text(); got != "30 mm" || e.document() != doc {
		t.Errorf("radius of the holder %q, device changed %v", got, e.document() != doc)
	}
	th, f := onsetOf(t, e)
	if !scalar.EqualWithinRel(th, th0, 1e-12) || !scalar.EqualWithinRel(f, f0, 1e-12) {
		t.Errorf("onset with the radius %g K %g Hz, with the diameter %g K %g Hz", th, f, th0, f0)
	}

	// Round pores: a radius r typed gives the onset of the diameter 2r.
	h.tap("Round pores")
	h.frames(2)
	h.retype("Pore diameter", "", "0.6 mm")
	thD, fD := onsetOf(t, e)
	if !strings.Contains(e.document(), `"diameter":"0.6 mm"}`) {
		t.Fatalf("round pores 0.6 mm: %s", e.document())
	}
	h.retype("Pore diameter", "0.6 mm", "0.9 mm")
	if sizes := nodeText(h.mustDesc("Both sizes of Pore diameter")); sizes != "Ø 0.9 mm (radius 0.45 mm)" {
		t.Errorf("round pores show %q", sizes)
	}
	tapWithin(h, "Size of Pore diameter given as", "Radius")
	h.retype("Pore radius", "0.45 mm", "0.3 mm")
	if !strings.Contains(e.document(), `"diameter":"0.6 mm"}`) {
		t.Errorf("radius 0.3 mm: %s, want diameter 0.6 mm", e.document())
	}
	thR, fR := onsetOf(t, e)
	if !scalar.EqualWithinRel(thR, thD, 1e-12) || !scalar.EqualWithinRel(fR, fD, 1e-12) {
		t.Errorf("round pores: onset %g K %g Hz by radius, %g K %g Hz by diameter", thR, fR, thD, fD)
	}
}

// tapWithin taps the control labelled label inside the node described
// desc.
func tapWithin(h *harness, desc, label string) {
	h.t.Helper()
	var find func(n input.SemanticNode) (image.Rectangle, bool)
	find = func(n input.SemanticNode) (image.Rectangle, bool) {
		for _, c := range n.Children {
			if c.Desc.Class != semantic.Unknown && strings.Contains(nodeText(c), label) {
				return c.Desc.Bounds, true
			}
			if r, ok := find(c); ok {
				return r, true
			}
		}
		return image.Rectangle{}, false
	}
	r, ok := find(h.mustDesc(desc))
	if !ok {
		h.t.Fatalf("no %q in %q", label, desc)
	}
	h.click(r)
	h.frames(2)
}
