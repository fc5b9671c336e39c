package resonator

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

// Hand-calculated lumped Helmholtz formula f = c/(2π)·sqrt(S/(V L_eff))
// with the low-frequency end corrections (Kinsler et al. 2000, Helmholtz
// resonator, from memory; end corrections 0.8216 a inside, Norris & Sheng
// 1989, and 0.6133 a outside, Levine & Schwinger 1948): 1 L cavity, neck
// 50 mm long, 10 mm radius, air at 20 °C. At ka ≈ 0.02 the ka dependence
// changes the result by less than 1e-4.
func TestHelmholtzHand(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 293.15, 101325)
	h := Helmholtz{Volume: 1e-3, NeckLength: 0.05, NeckRadius: 0.01, Outer: Unflanged}
	r, err := HelmholtzFrequency(h, g)
	if err != nil {
		t.Fatal(err)
	}
	S := math.Pi * 1e-4
	leff := 0.05 + (0.8216+0.6133)*0.01
	want := g.SoundSpeed / (2 * math.Pi) * math.Sqrt(S/(1e-3*leff))
	if !scalar.EqualWithinRel(r.Frequency, want, 1e-4) {
		t.Errorf("f = %.6g Hz, hand %.6g Hz", r.Frequency, want)
	}
	if len(r.Warnings) != 0 {
		t.Errorf("unexpected warnings %v", r.Warnings)
	}
	// a long neck makes the end corrections negligible
	h = Helmholtz{Volume: 0.01, NeckLength: 10, NeckRadius: 0.001, Outer: Flanged}
	r, _ = HelmholtzFrequency(h, g)
	want = g.SoundSpeed / (2 * math.Pi) * math.Sqrt(math.Pi*1e-6/(0.01*10))
	if !scalar.EqualWithinRel(r.Frequency, want, 2e-4) {
		t.Errorf("long neck: f = %.6g Hz, %.6g Hz without corrections", r.Frequency, want)
	}
}

func TestHelmholtzBadInput(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 293.15, 101325)
	cases := []struct {
		name  string
		h     Helmholtz
		field string
	}{
		{"neck radius above length", Helmholtz{Volume: 1e-3, NeckLength: 0.005, NeckRadius: 0.01}, "neck radius"},
		{"zero volume", Helmholtz{Volume: 0, NeckLength: 0.05, NeckRadius: 0.01}, "cavity volume"},
		{"negative neck", Helmholtz{Volume: 1e-3, NeckLength: -0.05, NeckRadius: 0.01}, "neck length"},
		{"cavity smaller than neck", Helmholtz{Volume: 1e-6, NeckLength: 0.05, NeckRadius: 0.01}, "cavity volume"},
	}
	for _, c := range cases {
		_, err := HelmholtzFrequency(c.h, g)
		var re *units.RangeError
		if !errors.As(err, &re) || re.Field != c.field {
			t.Errorf("%s: %v, want RangeError on %q", c.name, err, c.field)
		}
	}
	// a wide neck on a 10 L cavity: the cavity (0.22 m) is not small compared
	// with λ/10 ≈ 0.2 m: warning
	r, err := HelmholtzFrequency(Helmholtz{Volume: 0.01, NeckLength: 0.08, NeckRadius: 0.08, Outer: Flanged}, g)
	if err != nil || len(r.Warnings) == 0 {
		t.Errorf("10 L cavity, wide neck: warnings %v, err %v; want a size warning", r.Warnings, err)
	}
}
