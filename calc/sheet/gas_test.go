package sheet

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestGasSheetValues checks the working-gas description against outside
// values.
func TestGasSheetValues(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		texts map[string]string
		key   string
		want  float64
		tol   float64 // relative
	}{
		// Ideal monatomic gas: c = sqrt(γRT/M) with γ = 5/3, R = 8.314462618
		// J/(mol·K) (CODATA 2018), M = 4.002602 g/mol (IUPAC 2013): 1019.1 m/s.
		{"helium sound speed", map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "1 bar"}, "sound_speed",
			math.Sqrt(5.0 / 3 * 8.314462618 * 300 / 4.002602e-3), 1e-6},
		// CRC Handbook, "Viscosity of Gases", helium at 300 K: 19.9 µPa·s
		// (the gasprops reference test cites the same table); 2 %.
		{"helium viscosity", map[string]string{"gas": "helium", "temperature": "300 K"}, "viscosity", 19.9e-6, 0.02},
		// Ideal gas density p M/(R T) at 10 bar and 27 °C: 1.604 kg/m³.
		{"helium density, 27 degC", map[string]string{"gas": "helium", "temperature": "27 degC", "pressure": "10 bar"}, "density",
			1e6 * 4.002602e-3 / (8.314462618 * 300.15), 1e-6},
	}
	for _, c := range cases {
		r, err := gasSheet.Evaluate(c.texts)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		row, ok := r.Row(c.key)
		if !ok || !scalar.EqualWithinRel(row.Value, c.want, c.tol) {
			t.Errorf("%s: %s = %v, want %v within %g", c.name, c.key, row.Value, c.want, c.tol)
		}
	}
}

// TestGasSheetSpread: a typed ± reaches the results; for an ideal gas
// c ∝ √T, so σc/c = σT/(2T) (first-order propagation, GUM eq. 10), and
// twice the ± gives twice the spread.
func TestGasSheetSpread(t *testing.T) {
	t.Parallel()
	one, err := gasSheet.Evaluate(map[string]string{"gas": "helium", "temperature": "300 K ± 3 K"})
	if err != nil {
		t.Fatal(err)
	}
	two, err := gasSheet.Evaluate(map[string]string{"gas": "helium", "temperature": "300 K ± 6 K"})
	if err != nil {
		t.Fatal(err)
	}
	c1, _ := one.Row("sound_speed")
	c2, _ := two.Row("sound_speed")
	if !scalar.EqualWithinRel(c1.PM, c1.Value*3/600, 1e-3) {
		t.Errorf("σc = %v, want %v", c1.PM, c1.Value*3/600)
	}
	if !scalar.EqualWithinRel(c2.PM, 2*c1.PM, 1e-3) {
		t.Errorf("doubling the ± gave %v, want %v", c2.PM, 2*c1.PM)
	}
	if m, _ := one.Row("molar_mass"); m.PM != 0 {
		t.Errorf("molar mass carries a ± (%v) though it depends on no input with one", m.PM)
	}
}

// TestGasSheetErrorsNameTheirInput: the gas model's range errors are
// reported against the input they concern, by key.
func TestGasSheetErrorsNameTheirInput(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		texts map[string]string
		key   string
	}{
		{map[string]string{"gas": "helium", "temperature": "5 K"}, "temperature"},
		{map[string]string{"gas": "xenon", "temperature": "200 K", "pressure": "50 bar"}, "pressure"},
		{map[string]string{"gas": "helium", "temperature": "300 K ± 1 K", "pressure": "1 bar ± 1 mbar", "non-ideal": "maybe"}, "non-ideal"},
	} {
		_, err := gasSheet.Evaluate(c.texts)
		fe, ok := AsFieldError(err)
		if !ok || fe.Key != c.key {
			t.Errorf("%v: error %v, want one about %s", c.texts, err, c.key)
		}
	}
}
