package ui

import (
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

// TestChooseScale checks axis titles: SI prefixes on units that take
// them, one power of ten in the title for the others, and plain numbers
// where they read well (SI Brochure, 9th ed., 2019, §3 for the prefixes).
func TestChooseScale(t *testing.T) {
	t.Parallel()
	cases := []struct {
		label, unit string
		maxAbs      float64
		title       string
		mul         float64
	}{
		{"|p1|", "Pa", 4500, "|p1| (kPa)", 1e-3},
		{"|p1|", "Pa", 450, "|p1| (Pa)", 1},
		{"Position", "m", 0.8, "Position (mm)", 1e3},
		{"Position", "m", 1.2, "Position (m)", 1},
		{"|U1|", "m³/s", 4e-3, "|U1| (L/s)", 1e3},
		{"|U1|", "m³/s", 4e-6, "|U1| (mL/s)", 1e6},
		{"Fraction", "", 5e-6, "Fraction (×10⁻⁶)", 1e6},
		{"Fraction", "1", 0.9, "Fraction", 1},
		{"Temperature", "K", 600, "Temperature (K)", 1},
		{"Pressure", "bar", 3e5, "Pressure (10⁵ bar)", 1e-5},
		{"Power", "W", 3e-9, "Power (nW)", 1e9},
	}
	for _, c := range cases {
		s := chooseScale(c.unit, c.maxAbs)
		if got := s.title(c.label); got != c.title || math.Abs(s.mul/c.mul-1) > 1e-12 {
			t.Errorf("chooseScale(%q, %g): %q ×%g, want %q ×%g", c.unit, c.maxAbs, got, s.mul, c.title, c.mul)
		}
	}
}

// TestTickTextsNeverExponents checks, over random ranges of many scales
// and units, that tick labels are plain decimals: no "e", distinct, in
// order, and that with the title's scale they read back to the ticks.
func TestTickTextsNeverExponents(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(3, 4))
	unitsList := []string{"Pa", "K", "", "m³/s", "Hz", "bar"}
	for n := 0; n < 3000; n++ {
		scale := math.Pow(10, float64(rng.IntN(30)-15))
		a := (rng.Float64()*2 - 1) * scale
		b := a + rng.Float64()*scale*(0.05+rng.Float64())
		c := NewXYPlot("x", unitsList[rng.IntN(len(unitsList))], "y", "")
		c.AddLine(XYs{{X: a, Y: 0}, {X: b, Y: 1}})
		at := c.makeTicks(false, 2+rng.IntN(8))
		if strings.ContainsAny(strings.Join(at.texts, " "), "eE") && !at.log {
			t.Fatalf("%g..%g %q: tick texts %v", a, b, c.X.Unit, at.texts)
		}
		seen := map[string]bool{}
		for i, s := range at.texts {
			if seen[s] {
				t.Fatalf("%g..%g %q: repeated tick text in %v", a, b, c.X.Unit, at.texts)
			}
			seen[s] = true
			if at.log {
				continue
			}
			var v float64
			if _, err := fmt.Sscan(strings.Replace(s, "−", "-", 1), &v); err != nil {
				t.Fatalf("tick %q: %v", s, err)
			}
			if want := at.vals[i] * at.scale.mul; math.Abs(v-want) > 1e-6*math.Max(1, math.Abs(want)) {
				t.Fatalf("%g..%g: tick %q reads %g, want %g", a, b, s, v, want)
			}
		}
	}
}

// TestLogTickText checks log-axis labels: plain where short, a power of
// ten with superscripts elsewhere.
func TestLogTickText(t *testing.T) {
	t.Parallel()
	cases := map[float64]string{1: "1", 20: "20", 0.05: "0.05", 1e-6: "10⁻⁶", 2e5: "2×10⁵", 1e4: "10⁴"}
	for v, want := range cases {
		if got := logTickText(v); got != want {
			t.Errorf("logTickText(%g) = %q, want %q", v, got, want)
		}
	}
}

// TestReadout checks point readouts with units and ± values.
func TestReadout(t *testing.T) {
	t.Parallel()
	cases := []struct {
		unit   string
		maxAbs float64
		v, dv  float64
		want   string
	}{
		{"Pa", 4500, 2315.2, 0, "2.315 kPa"},
		{"Hz", 600, 578.26, 8, "578.3 ± 8 Hz"},
		{"K", 600, -12.5, 0, "−12.5 K"},
		{"", 5e-6, 3.2e-6, 0, "3.2 ×10⁻⁶"},
		{"m", 0.3, 0, 0, "0 mm"},
		{"Hz", 600, math.NaN(), 0, "—"},
	}
	for _, c := range cases {
		if got := chooseScale(c.unit, c.maxAbs).readout(c.v, c.dv); got != c.want {
			t.Errorf("readout(%g ± %g %s) = %q, want %q", c.v, c.dv, c.unit, got, c.want)
		}
	}
}
