package ui

import (
	"testing"

	"tubewright/calc/sheet"
)

// TestTubeDiameterOrRadius: Tube resonance takes the tube's inside
// diameter, with Radius a tap away; the switch converts the text and the
// frequency stays the same, both sizes show under the field; a radius
// typed there arrives at What the pitch says as a radius, which that
// screen then shows instead of its diameter.
func TestTubeDiameterOrRadius(t *testing.T) {
	a, h := carryApp(t)
	f := openScreen(a, h, sheet.IDResonance)
	if got, _ := h.shown("Both sizes of Inside diameter"); got != "Ø 24 mm (radius 12 mm)" {
		t.Errorf("under the diameter: %q", got)
	}
	freq, ok := f.Results.Value("Resonance frequency")
	if !ok || freq == "" {
		t.Fatalf("no frequency shown: %q", freq)
	}
	tapWithin(h, "Size of Inside diameter given as", "Radius")
	if f.Text("radius") != "12 mm" || f.Text("diameter") != "" {
		t.Errorf("after Radius: radius %q, diameter %q", f.Text("radius"), f.Text("diameter"))
	}
	if got, _ := f.Results.Value("Resonance frequency"); got != freq {
		t.Errorf("frequency by radius %q, by diameter %q", got, freq)
	}
	h.retype("Inner radius", "12 mm", "10 mm")

	diag := openScreen(a, h, sheet.IDDiagnose)
	wantCarried(t, h, diag, "radius", "Inner radius", "10 mm", "Tube resonance")
	if diag.Text("diameter") != "" {
		t.Errorf("What the pitch says keeps its diameter %q beside the radius", diag.Text("diameter"))
	}
	if got, _ := h.shown("Both sizes of Inside diameter"); got != "Ø 20 mm (radius 10 mm)" {
		t.Errorf("under the carried radius: %q", got)
	}
	if diag.Err() != nil {
		t.Errorf("What the pitch says: %v", diag.Err())
	}
}
