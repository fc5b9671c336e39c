package pore

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

const inch = 0.0254

// TestGeometry checks porosity and hydraulic radius against the published
// geometric formulas, hand-computed (python3 used as a calculator):
//   - screens: φ = 1 - π m d/4, r_h = φ d/(4(1-φ)) (Swift 2002, ch. 7 on
//     regenerators, from memory);
//   - fibres: φ = 1 - s, r_h = φ d/(4(1-φ)) (same source);
//   - plates: φ = y0/(y0 + l), r_h = y0 (Swift 2002, ch. 4, from memory);
//   - square honeycomb: φ = (s/P)², r_h = s/4, P = 1/√N, s = P - t;
//   - hexagonal pins: φ = 1 - π r_i²/((√3/2)P²), r_h = (r_o² - r_i²)/(2 r_i)
//     with π r_o² = (√3/2)P² (Swift & Keolian 1993, from memory).
func TestGeometry(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name     string
		shape    Shape
		phi, rh  float64
		tol      float64
		citation string
	}{
		{"screens 200/in 41 µm", must(Screens(200/inch, 41e-6, 0)), 0.7464462622, 30.175355545e-6, 1e-9, "hand-computed"},
		{"screens 100/in 0.1 mm", must(Screens(100/inch, 0.1e-3, 0)), 0.6907881246, 55.85071109e-6, 1e-9, "hand-computed"},
		{"screens 30/in 0.25 mm", must(Screens(30/inch, 0.25e-3, 0)), 0.7680910935, 207.0023703e-6, 1e-9, "hand-computed"},
		// measured porosity replaces the geometric one: r_h = 0.7·41e-6/(4·0.3)
		{"screens measured 0.70", must(Screens(200/inch, 41e-6, 0.70)), 0.70, 23.916666667e-6, 1e-9, "hand-computed"},
		{"fibres 25 µm 20 %", must(Fibres(25e-6, 0.2)), 0.8, 25e-6, 1e-12, "hand-computed"},
		{"fibres 50 µm 10 %", must(Fibres(50e-6, 0.1)), 0.9, 112.5e-6, 1e-12, "hand-computed"},
		// 30 g of stainless steel (7900 kg/m³) in 50 cm³: s = 0.03/(7900·5e-5) = 0.0759494
		{"fibres from mass", must(FibresFromMass(25e-6, 0.03, 7900, 50e-6)), 1 - 0.0759493671, 0.9240506329 * 25e-6 / (4 * 0.0759493671), 1e-9, "hand-computed"},
		{"plates 0.5 mm gap 0.1 mm", must(Plates(0.25e-3, 0.1e-3)), 0.25 / 0.30, 0.25e-3, 1e-12, "hand-computed"},
		{"plates from pitch", must(PlatesFromPitch(0.6e-3, 0.1e-3)), 0.25 / 0.30, 0.25e-3, 1e-12, "hand-computed"},
		{"honeycomb 400 cpsi 0.15 mm", must(Honeycomb(400/(inch*inch), 0.15e-3)), 0.7777295555, 0.28e-3, 1e-9, "hand-computed"},
		{"honeycomb 600 cpsi 0.1 mm", must(Honeycomb(600/(inch*inch), 0.1e-3)), 0.8164268105, 0.2342376644e-3, 1e-9, "hand-computed"},
		// from memory: 400 cpsi ceramic with 6.5 mil (0.1651 mm) walls is sold
		// with an open frontal area of about 76 %.
		{"honeycomb 400/6.5", must(Honeycomb(400/(inch*inch), 0.1651e-3)), 0.757, 0.2762e-3, 2e-3, "from memory"},
		{"pins 0.2 mm on 0.8 mm", must(Pins(0.1e-3, 0.8e-3)), 0.9433187699, 0.8321262327e-3, 1e-9, "hand-computed"},
		{"circular", must(Circular(0.3e-3)), 1, 0.15e-3, 1e-12, "definition"},
		{"rectangular 0.4 × 1 mm", must(Rectangular(0.2e-3, 0.5e-3)), 1, 0.2e-3 * 0.5e-3 / 0.7e-3, 1e-12, "area over perimeter"},
	}
	for _, c := range cases {
		if !scalar.EqualWithinAbsOrRel(c.shape.Porosity(), c.phi, 0, c.tol) {
			t.Errorf("%s: porosity %.10g, want %.10g (%s)", c.name, c.shape.Porosity(), c.phi, c.citation)
		}
		if !scalar.EqualWithinAbsOrRel(c.shape.HydraulicRadius(), c.rh, 0, c.tol) {
			t.Errorf("%s: r_h %.10g, want %.10g (%s)", c.name, c.shape.HydraulicRadius(), c.rh, c.citation)
		}
		if d, ok := c.shape.(Named); !ok || d.Describe() == "" {
			t.Errorf("%s: no description", c.name)
		}
	}
}

// TestImpossibleGeometry: geometry that cannot exist is an error that names
// the inputs, never a negative porosity.
func TestImpossibleGeometry(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		err   error
		words []string
	}{
		{"wire thicker than the pitch", second(Screens(200/inch, 0.2e-3, 0)), []string{"wire diameter", "mesh pitch"}},
		{"plate thicker than the pitch", second(PlatesFromPitch(0.3e-3, 0.3e-3)), []string{"plate thickness", "pitch"}},
		{"pins overlap", second(Pins(0.5e-3, 0.9e-3)), []string{"pin diameter", "pitch"}},
		{"honeycomb walls", second(Honeycomb(400/(inch*inch), 2e-3)), []string{"wall thickness", "cell pitch"}},
		{"packed mass too heavy", second(FibresFromMass(25e-6, 0.5, 7900, 50e-6)), []string{"packed mass", "solid material"}},
		{"solid fraction 1", second(Fibres(25e-6, 1)), []string{"solid fraction"}},
		{"negative gap", second(Plates(-1e-3, 0)), []string{"plate half gap"}},
		{"measured porosity 1.2", second(Screens(200/inch, 41e-6, 1.2)), []string{"measured porosity"}},
		{"zero radius", second(Circular(0)), []string{"pore radius"}},
		{"NaN height", second(Rectangular(1e-3, math.NaN())), []string{"half height"}},
	}
	for _, c := range cases {
		if c.err == nil {
			t.Errorf("%s: no error", c.name)
			continue
		}
		for _, w := range c.words {
			if !strings.Contains(c.err.Error(), w) {
				t.Errorf("%s: error %q does not name %q", c.name, c.err, w)
			}
		}
	}
	var re *units.RangeError
	if !errors.As(second(Plates(-1e-3, 0)), &re) || re.Field != "plate half gap" {
		t.Errorf("negative gap should be a *units.RangeError for the half gap")
	}
}

func second(_ Shape, err error) error { return err }

func TestMaterials(t *testing.T) {
	t.Parallel()
	for _, name := range []string{"steel", "Stainless", "copper", "nickel", "brass", "bronze", "aluminum"} {
		m, err := LookupMaterial(name)
		if err != nil || !(m.Density > 2000 && m.Density < 9500) || m.Source == "" {
			t.Errorf("%s: %+v %v", name, m, err)
		}
	}
	if _, err := LookupMaterial("unobtainium"); err == nil || !strings.Contains(err.Error(), "steel") {
		t.Errorf("unknown material: error %v should list the known ones", err)
	}
}
