package sheet

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/safety"
)

// placementAir is the operating point of calc/pore's hand-computed
// placement case: air at 300 K and 1 atm, 578 Hz (common practice, no
// published source: a 0.147 m closed-open tube at 340 m/s by the
// quarter-wave rule), centre and length 20 mm, drive ratio 2 %.
func placementAir() map[string]string {
	return map[string]string{"gas": "air", "temperature": "300 K", "frequency": "578 Hz",
		"centre": "20 mm", "stack-length": "20 mm", "drive-ratio": "2 %"}
}

// TestPlacementSheetValues checks the description against the hand
// computation of calc/pore/placement_test.go (c = 347.25 m/s, γ = 1.4 for
// ideal air, python3 as a calculator): k = 10.458405 /m, kx = 0.2091681,
// ∇T_crit = 5912.241 K/m, ΔT_crit = 118.2448 K, ξ = 0.4215795 mm. The
// project's air model gives a sound speed within 0.1 % of 347.25 m/s, so
// the tolerances are 0.5 % (k, kx) and 1 % (the rest).
func TestPlacementSheetValues(t *testing.T) {
	t.Parallel()
	r, err := placementSheet.Evaluate(placementAir())
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		key  string
		want float64
		tol  float64 // relative
	}{
		{"wavenumber", 10.458405, 0.005},
		{"kx", 0.2091681, 0.005},
		{"critical_gradient", 5912.241, 0.01},
		{"critical_temperature_difference", 118.2448, 0.01},
		{"displacement_amplitude", 0.4215795e-3, 0.01},
		{"exchanger_length", 2 * 0.4215795e-3, 0.01},
		// λ/8 = c/(8f) = 347.25/(8·578) m
		{"lambda_eighth", 347.25 / 578 / 8, 0.005},
	}
	for _, c := range cases {
		row, ok := r.Row(c.key)
		if !ok || !scalar.EqualWithinRel(row.Value, c.want, c.tol) {
			t.Errorf("%s = %v (found %v), want %v within %g", c.key, row.Value, ok, c.want, c.tol)
		}
	}
	if len(r.Cautions) != 1 || r.Cautions[0] != safety.CautionHotSurfaces {
		t.Errorf("cautions %q, want the hot-surfaces caution", r.Cautions)
	}
	if row, ok := r.Row("position_advice"); !ok || row.Text == "" {
		t.Error("no position advice")
	}

	// without a length or a drive ratio the rows that need them are left out
	texts := placementAir()
	delete(texts, "stack-length")
	delete(texts, "drive-ratio")
	r, err = placementSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	for _, key := range []string{"critical_temperature_difference", "displacement_amplitude", "exchanger_length"} {
		if _, ok := r.Row(key); ok {
			t.Errorf("%s shown without the input it needs", key)
		}
	}
}

// TestPlacementSheetSpread: kx = k·x, so a ± on the centre alone gives
// σ(kx) = k·σx exactly to first order, and twice the ± twice the spread.
func TestPlacementSheetSpread(t *testing.T) {
	t.Parallel()
	texts := placementAir()
	texts["centre"] = "20 mm ± 1 mm"
	one, err := placementSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	texts["centre"] = "20 mm +- 2 mm"
	two, err := placementSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	k, _ := one.Row("wavenumber")
	kx1, _ := one.Row("kx")
	kx2, _ := two.Row("kx")
	if !scalar.EqualWithinRel(kx1.PM, k.Value*1e-3, 1e-4) {
		t.Errorf("σ(kx) = %v, want k·σx = %v", kx1.PM, k.Value*1e-3)
	}
	if !scalar.EqualWithinRel(kx2.PM, 2*kx1.PM, 1e-4) {
		t.Errorf("σ(kx) with twice the ± = %v, want %v", kx2.PM, 2*kx1.PM)
	}
	if k.PM != 0 {
		t.Errorf("the wavenumber does not depend on the centre, yet σk = %v", k.PM)
	}
}

// TestPlacementSheetErrors: each bad input is blamed on its own key.
func TestPlacementSheetErrors(t *testing.T) {
	t.Parallel()
	cases := []struct{ key, text string }{
		{"centre", "0 mm"},
		{"drive-ratio", "150 %"},
		{"stack-length", "-1 mm"},
		{"frequency", "0 Hz"},
		{"temperature", "5 K"},
		{"device", "kettle"},
	}
	for _, c := range cases {
		texts := placementAir()
		texts[c.key] = c.text
		_, err := placementSheet.Evaluate(texts)
		fes := FieldErrors(err)
		if len(fes) == 0 || fes[0].Key != c.key {
			t.Errorf("%s %q: error %v names %v, want %s", c.key, c.text, err, fes, c.key)
		}
	}
}
