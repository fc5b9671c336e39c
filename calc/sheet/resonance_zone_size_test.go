package sheet

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestZoneSizeText: a zone's size is a diameter after d (diameter, dia,
// Ø) and a radius after r (radius) or with no word (the text of older
// versions).
func TestZoneSizeText(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in, length string
		radius     bool
	}{
		{"d 24 mm", "24 mm", false},
		{"D=24mm", "24mm", false},
		{"diameter: 1 in", "1 in", false},
		{"dia 0.5 in", "0.5 in", false},
		{"Ø24 mm", "24 mm", false},
		{"r 12 mm", "12 mm", true},
		{"radius 12 mm", "12 mm", true},
		{" 12 mm ", "12 mm", true},
		{"d", "d", true},                 // no number: left whole for the parser to name
		{"rad 12 mm", "rad 12 mm", true}, // not a size word
	}
	for _, c := range cases {
		l, r := ZoneSizeText(c.in)
		if l != c.length || r != c.radius {
			t.Errorf("ZoneSizeText(%q) = %q, %v; want %q, %v", c.in, l, r, c.length, c.radius)
		}
		if c.length != "d" && c.length != "rad 12 mm" {
			if got, _ := ZoneSizeText(ZoneSizeJoin(l, r)); got != l {
				t.Errorf("ZoneSizeJoin(%q, %v) reads back as %q", l, r, got)
			}
		}
	}
}

// TestZoneDiameterOrRadius: the same zoned tube given by its inside
// diameters, by its radii after r, and by the bare radii older versions
// wrote has the same modes to 1e-12 (the sizes are the same numbers; the
// zoned solver itself is checked against its references in
// calc/resonator).
func TestZoneDiameterOrRadius(t *testing.T) {
	t.Parallel()
	forms := []string{
		"0.1 m, 10 mm, 700 K; 0.2 m, 12 mm, 400 K; 0.4 m, 15 mm, 295 K",
		"0.1 m, r 10 mm, 700 K; 0.2 m, radius 12 mm, 400 K; 0.4 m, r=15 mm, 295 K",
		"0.1 m, d 20 mm, 700 K; 0.2 m, d 24 mm, 400 K; 0.4 m, d 30 mm, 295 K",
		"0.1 m, diameter 2 cm, 700 K; 0.2 m, Ø 24 mm, 400 K; 0.4 m, dia 0.03 m, 295 K",
	}
	for _, losses := range []string{"none", "wall"} {
		var want []ZoneMode
		for i, z := range forms {
			r, err := resonanceSheet.Evaluate(map[string]string{"zones": z, "modes": "4", "ends": "closed-open", "losses": losses})
			if err != nil {
				t.Fatalf("%s %q: %v", losses, z, err)
			}
			row, _ := r.Row("modes")
			ms, ok := row.Any.([]ZoneMode)
			if !ok || len(ms) != 4 {
				t.Fatalf("%s %q: modes %v", losses, z, row.Any)
			}
			if i == 0 {
				want = ms
				continue
			}
			for k := range ms {
				if !scalar.EqualWithinRel(ms[k].Frequency, want[k].Frequency, 1e-12) || !scalar.EqualWithinRel(ms[k].TravelTime, want[k].TravelTime, 1e-12) {
					t.Errorf("%s %q: mode %d %.15g Hz, the bare radii give %.15g Hz", losses, z, k+1, ms[k].Frequency, want[k].Frequency)
				}
			}
		}
	}
}
