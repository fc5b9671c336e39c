package sheet

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestDiagnoseSheetValues inverts the half-wave rule by hand: a
// closed-closed tube without end correction has c = 2 L f (Kinsler et al.
// 2000, ch. 10), so T = c² M / (γ R) for ideal helium, and for a
// helium–argon mixture the mole fraction of argon is
// x = (γ R T / c² - M_He) / (M_Ar - M_He).
func TestDiagnoseSheetValues(t *testing.T) {
	t.Parallel()
	tube := map[string]string{"ends": "closed-closed", "end-correction": "none", "length": "1 m", "radius": "20 mm", "pressure": "1 bar", "losses": "none"}
	with := func(extra map[string]string) map[string]string {
		m := map[string]string{}
		for k, v := range tube {
			m[k] = v
		}
		for k, v := range extra {
			m[k] = v
		}
		return m
	}
	c := 2 * 1.0 * 510
	T := mustRow(t, diagnoseSheet, with(map[string]string{"gas": "helium", "measured-frequency": "510 Hz"}), "temperature")
	if want := c * c * heliumM / (5.0 / 3 * gasR); !scalar.EqualWithinRel(T.Value, want, 1e-8) {
		t.Errorf("temperature %.8g K, hand %.8g K", T.Value, want)
	}
	c = 2 * 1.0 * 400
	x := mustRow(t, diagnoseSheet, with(map[string]string{"gas": "helium", "measured-frequency": "400 Hz", "find": "fraction",
		"second-gas": "argon", "temperature": "300 K"}), "mole_fraction")
	if want := (5.0/3*gasR*300/(c*c) - heliumM) / (argonM - heliumM); !scalar.EqualWithinAbsOrRel(x.Value, want, 1e-9, 1e-7) {
		t.Errorf("mole fraction %.8g, hand %.8g", x.Value, want)
	}
}
