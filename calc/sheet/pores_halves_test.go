package sheet

import (
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestPoresSheetWholeOrHalf: a size typed whole (gap, diameter, width and
// height, pin diameter) and the same size typed as its half (half gap,
// radius, ...) give the same rows, verdict and words, every number to
// 1e-12 relative (gap = 2 y0 and diameter = 2 r are definitions: no
// outside source is needed), with and without a ± on the operating point.
func TestPoresSheetWholeOrHalf(t *testing.T) {
	t.Parallel()
	pm := []string{"frequency", "100 Hz ± 2 Hz"}
	cases := []struct {
		name        string
		whole, half []string
	}{
		{"plates", []string{"shape", "plates", "gap", "0.6 mm", "plate-thickness", "0.1 mm"},
			[]string{"shape", "plates", "half-gap", "0.3 mm", "plate-thickness", "0.1 mm"}},
		{"round pores", []string{"shape", "circular", "diameter", "0.5 mm"}, []string{"shape", "circular", "radius", "0.25 mm"}},
		{"rectangular", []string{"shape", "rectangular", "width", "0.4 mm", "height", "1 mm"},
			[]string{"shape", "rectangular", "half-width", "0.2 mm", "half-height", "0.5 mm"}},
		{"pins", []string{"shape", "pins", "pin-diameter", "3/64 in", "pitch", "2 mm"},
			[]string{"shape", "pins", "pin-radius", "3/128 in", "pitch", "2 mm"}},
		{"regenerator round pores with ±", append([]string{"shape", "circular", "diameter", "0.1 mm", "role", "regenerator"}, pm...),
			append([]string{"shape", "circular", "radius", "0.05 mm", "role", "regenerator"}, pm...)},
	}
	for _, c := range cases {
		w, errW := poresSheet.Evaluate(poresAt(c.whole...))
		h, errH := poresSheet.Evaluate(poresAt(c.half...))
		if errW != nil || errH != nil {
			t.Errorf("%s: %v, %v", c.name, errW, errH)
			continue
		}
		if len(w.Rows) != len(h.Rows) || len(w.Rows) < 10 {
			t.Errorf("%s: %d rows whole, %d by halves", c.name, len(w.Rows), len(h.Rows))
			continue
		}
		for i, a := range w.Rows {
			b := h.Rows[i]
			same := a.Key == b.Key && a.Text == b.Text && a.Outcome == b.Outcome &&
				scalar.EqualWithinRel(a.Value, b.Value, 1e-12) && scalar.EqualWithinRel(a.PM, b.PM, 1e-12) &&
				cmplx.Abs(a.Z-b.Z) <= 1e-12*cmplx.Abs(a.Z)
			if !same {
				t.Errorf("%s: row %s whole %+v, by halves %+v", c.name, a.Key, a, b)
			}
		}
	}
}
