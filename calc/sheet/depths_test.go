package sheet

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestDepthsSheetValues checks the penetration-depth description against
// outside values.
func TestDepthsSheetValues(t *testing.T) {
	t.Parallel()
	he := map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bar", "frequency": "100 Hz"}
	cases := []struct {
		name  string
		texts map[string]string
		key   string
		want  float64
		tol   float64 // relative
	}{
		// see calc/pore/depths_test.go: helium at 300 K, 10 bar, 100 Hz from
		// NIST SRD 134 properties, hand-computed δκ = 0.24460392 mm,
		// δν = 0.19915113 mm; the gas model matches the table to 1 %.
		{"helium δκ", he, "thermal_penetration_depth", 0.24460392e-3, 0.01},
		{"helium δν", he, "viscous_penetration_depth", 0.19915113e-3, 0.01},
		// the stack rule: plate gap 2–4 δκ (common practice, no published
		// source; see calc/pore/verdict.go RuleFor), on the same δκ
		{"stack gap, narrow end", he, "stack_plate_gap_low", 2 * 0.24460392e-3, 0.01},
		{"stack gap, wide end", he, "stack_plate_gap_high", 4 * 0.24460392e-3, 0.01},
		// regenerator r_h 0.1–0.3 δκ (common practice, no published source)
		{"regenerator, narrow end", he, "regenerator_hydraulic_radius_low", 0.1 * 0.24460392e-3, 0.01},
		// δν/δκ = √Pr; Pr of a monatomic gas is close to 2/3 (kinetic
		// theory, Chapman & Cowling), so the ratio is about 0.816; 1 %.
		{"ratio", he, "viscous_over_thermal_depth", 0.8165, 0.01},
		// ideal monatomic sound speed √(γRT/M) = 1019.1 m/s (CODATA 2018 R,
		// IUPAC M = 4.002602 g/mol) over 100 Hz; the real-gas correction at
		// 10 bar is off here, so 1e-6.
		{"wavelength", he, "wavelength", 10.19135, 1e-5},
		// see calc/pore/depths_test.go: air at 300 K, 1 atm, 500 Hz,
		// Incropera & DeWitt Table A.4 (from memory): δκ = 0.11965 mm; the
		// gas model's air within 2 %.
		{"air δκ", map[string]string{"gas": "air", "temperature": "300 K", "frequency": "500 Hz"}, "thermal_penetration_depth", 0.11964989e-3, 0.02},
	}
	for _, c := range cases {
		r, err := depthsSheet.Evaluate(c.texts)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		row, ok := r.Row(c.key)
		if !ok || !scalar.EqualWithinRel(row.Value, c.want, c.tol) {
			t.Errorf("%s: %s = %v, want %v within %g", c.name, c.key, row.Value, c.want, c.tol)
		}
	}
}

// TestDepthsSheetSpread: a typed ± on the frequency reaches every length;
// δ ∝ f^-½ so σδ/δ = σf/(2f) (GUM eq. 10), and twice the ± gives twice
// the spread.
func TestDepthsSheetSpread(t *testing.T) {
	t.Parallel()
	texts := func(f string) map[string]string {
		return map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bar", "frequency": f}
	}
	one, err := depthsSheet.Evaluate(texts("100 Hz ± 4 Hz"))
	if err != nil {
		t.Fatal(err)
	}
	two, err := depthsSheet.Evaluate(texts("100 Hz +- 8 Hz"))
	if err != nil {
		t.Fatal(err)
	}
	for _, key := range []string{"thermal_penetration_depth", "viscous_penetration_depth", "stack_plate_gap_high", "regenerator_hydraulic_radius_low"} {
		a, _ := one.Row(key)
		b, _ := two.Row(key)
		if !scalar.EqualWithinRel(a.PM/a.Value, 0.02, 1e-3) {
			t.Errorf("%s: relative ± %v, want 0.02", key, a.PM/a.Value)
		}
		if !scalar.EqualWithinRel(b.PM, 2*a.PM, 1e-3) {
			t.Errorf("%s: ± %v with twice the typed ±, want %v", key, b.PM, 2*a.PM)
		}
	}
	// the wavelength c/f: σλ/λ = σf/f
	w, _ := one.Row("wavelength")
	if !scalar.EqualWithinRel(w.PM/w.Value, 0.04, 1e-3) {
		t.Errorf("wavelength relative ± %v, want 0.04", w.PM/w.Value)
	}
	// no ± typed, none shown
	plain, err := depthsSheet.Evaluate(texts("100 Hz"))
	if err != nil {
		t.Fatal(err)
	}
	if row, _ := plain.Row("thermal_penetration_depth"); row.PM != 0 {
		t.Errorf("± %v with none typed", row.PM)
	}
}

// TestDepthsSheetErrors: each bad input is blamed on its own key.
func TestDepthsSheetErrors(t *testing.T) {
	t.Parallel()
	base := func(k, v string) map[string]string {
		m := map[string]string{"gas": "helium", "temperature": "300 K", "frequency": "100 Hz"}
		m[k] = v
		return m
	}
	cases := []struct {
		texts map[string]string
		key   string
	}{
		{base("frequency", "0 Hz"), "frequency"},
		{base("frequency", "-5 Hz"), "frequency"},
		{base("temperature", "5 K"), "temperature"},
		{base("pressure", "10 bra"), "pressure"},
		{base("gas", "unobtainium"), "gas"},
		{map[string]string{"gas": "helium", "temperature": "300 K"}, "frequency"},
	}
	for _, c := range cases {
		_, err := depthsSheet.Evaluate(c.texts)
		fes := FieldErrors(err)
		if len(fes) == 0 || fes[0].Key != c.key {
			t.Errorf("%v: error %v names %v, want %s", c.texts, err, fes, c.key)
		}
	}
}
