package sheet

import (
	"strings"
	"testing"
)

// TestSPLSheetValues checks the sound-level description against hand
// calculations and OSHA 1910.95 Table G-16.
func TestSPLSheetValues(t *testing.T) {
	t.Parallel()
	r := evalOK(t, splSheet, map[string]string{"amplitude": "10 kPa"})
	// 20 log10(10 kPa/√2/20 µPa) = 170.969 dB, peak 173.979 dB (ISO
	// 80000-8 definition, hand calculation).
	wantNum(t, "10 kPa", r, "spl", 170.9691001, 1e-9)
	wantNum(t, "10 kPa", r, "peak_level", 173.9794001, 1e-9)
	wantOutcome(t, "10 kPa", r, "limits_reached_in_vessel", Warn)
	quiet := evalOK(t, splSheet, map[string]string{"amplitude": "0.02 Pa"})
	wantOutcome(t, "0.02 Pa", quiet, "limits_reached_in_vessel", Pass)
	// OSHA Table G-16: 95 dBA allows 4 h; the EU upper action value
	// 85 dB(A) requires protection (Directive 2003/10/EC Art. 3).
	e := evalOK(t, splSheet, map[string]string{"amplitude": "1 Pa", "at-ear": "95 dBA"})
	wantNum(t, "95 dBA", e, "osha_permitted_time", 4*3600, 1e-12)
	wantOutcome(t, "95 dBA", e, "exposure_check", Warn)
	// Above 115 dBA the table permits no time: a failing check, never an
	// extrapolation (issue 12).
	loud := evalOK(t, splSheet, map[string]string{"amplitude": "1 Pa", "at-ear": "120 dBA"})
	row := rowOf(t, loud, "osha_permitted_time")
	if row.Kind != Words || row.Text != "not permitted" || row.Outcome != Fail {
		t.Errorf("120 dBA: osha_permitted_time %+v", row)
	}
	wantOutcome(t, "120 dBA", loud, "exposure_check", Fail)
	calm := evalOK(t, splSheet, map[string]string{"amplitude": "1 Pa", "at-ear": "75 dBA"})
	wantOutcome(t, "75 dBA", calm, "exposure_check", Pass)
	if !strings.Contains(rowOf(t, calm, "exposure_check").Note, "80 dB(A)") {
		t.Error("the threshold is not named in the why")
	}
}

// TestSPLSheetSpread: the level is 20 log10 of the amplitude, so a ± on it
// gives σL = 20/ln10 × σA/A dB (GUM eq. 10).
func TestSPLSheetSpread(t *testing.T) {
	t.Parallel()
	for _, u := range []float64{0.1, 0.2} {
		r := evalOK(t, splSheet, map[string]string{"amplitude": "1 kPa ± " + ftoa(u) + " kPa"})
		s := rowOf(t, r, "spl")
		if want := 20 / 2.302585092994046 * u; !near(s.PM, want, 1e-4) {
			t.Errorf("± %g kPa: SPL ± %g dB, want %g", u, s.PM, want)
		}
	}
}

// TestSPLSheetBadInput: each error names its input.
func TestSPLSheetBadInput(t *testing.T) {
	t.Parallel()
	wantFieldError(t, splSheet, map[string]string{"amplitude": "1 barg"}, "amplitude")
	wantFieldError(t, splSheet, map[string]string{"amplitude": "0 Pa"}, "amplitude")
	wantFieldError(t, splSheet, map[string]string{"amplitude": "1 kPa", "at-ear": "250 dBA"}, "at-ear")
}
