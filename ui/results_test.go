package ui

import (
	"errors"
	"image"
	"math"
	"strings"
	"testing"

	"tubewright/calc/units"
)

// TestResultsNeverShowNaN checks that non-finite values become "—" with a
// reason, that values carry their units, and that the rows are drawn.
func TestResultsNeverShowNaN(t *testing.T) {
	r := NewResults(NewEnv(nil))
	r.Add("Frequency", 431.2, units.DimFrequency)
	r.Add("Broken", math.NaN(), units.DimLength)
	r.AddIn("Endless length", math.Inf(1), "mm")
	r.AddPM("Measured", 440, 5, units.DimFrequency)
	r.AddPM("No sigma", 440, math.NaN(), units.DimFrequency)
	r.AddIn("Length", 0.25, "mm")
	r.AddPMIn("Ring-down", 0.08992, 0.002, units.DimTime, "ms")
	r.AddPMIn("Ring-down, no sigma", 0.08992, math.Inf(1), units.DimTime, "ms")
	r.AddPMIn("Ring-down, broken", math.NaN(), 0.002, units.DimTime, "ms")
	r.Warn("outside the model's range")
	// The expected texts follow the units package's formatting contract
	// (SI unit or the chosen one, 4 significant digits); the values are
	// arbitrary. 0.25 m = 250 mm by definition of the millimetre.
	cases := []struct{ label, want string }{
		{"Frequency", "431.2 Hz"},
		{"Broken", "—"},
		{"Endless length", "—"},
		{"Measured", units.FormatPM(440, 5, units.DimFrequency)},
		{"No sigma", "440 Hz"},
		{"Length", "250 mm"},
		// 0.08992 s = 89.92 ms by definition of the millisecond.
		{"Ring-down", "89.9 ± 2.0 ms"}, // the value rounded to the ± (units.FormatPM style)
		{"Ring-down, no sigma", "89.92 ms"},
		{"Ring-down, broken", "—"},
	}
	for _, c := range cases {
		if got, ok := r.Value(c.label); !ok || got != c.want {
			t.Errorf("%s shown %q (found %v), want %q", c.label, got, ok, c.want)
		}
	}
	h := newHarness(t, image.Pt(412, 800), r.Layout)
	all := ""
	for _, n := range h.nodes() {
		all += n.Desc.Label + "\n"
	}
	for _, bad := range []string{"NaN", "Inf"} {
		if strings.Contains(all, bad) {
			t.Errorf("%q drawn on screen:\n%s", bad, all)
		}
	}
	if !strings.Contains(all, "no finite value") || !strings.Contains(all, "Note: outside the model's range") {
		t.Errorf("reason or warning not drawn:\n%s", all)
	}
	r.Fail(errors.New("temperature 15 K is too low"))
	if r.Len() != 0 || !strings.Contains(r.Failure(), "15 K") {
		t.Fatalf("Fail kept %d rows, failure %q", r.Len(), r.Failure())
	}
}
