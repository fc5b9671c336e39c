package sheet

import (
	"errors"
	"testing"

	"tubewright/calc/safety"
)

var roomRelease = map[string]string{"room": "30 m3", "release": "9 m3"}

// TestOxygenSheetValues checks the room-oxygen description against hand
// calculations.
func TestOxygenSheetValues(t *testing.T) {
	t.Parallel()
	// see calc/safety/oxygen_test.go: 9 m³ into 30 m³, 20.9 % oxygen in
	// air: displacement 0.209 × 0.7 = 14.63 %, well mixed 0.209 e^−0.3 =
	// 15.48 %, sealed 0.209/1.3 = 16.08 % (hand calculations).
	for _, c := range []struct {
		model string
		want  float64
	}{{"displacement", 0.1463}, {"mixed", 0.1548310081}, {"sealed", 0.1607692308}} {
		r := evalOK(t, oxygenSheet, plus(roomRelease, "model", c.model, "ventilation", "2/h"))
		wantNum(t, c.model, r, "oxygen_fraction", c.want, 1e-9)
		wantOutcome(t, c.model, r, "oxygen_deficient", Fail)
		if rowOf(t, r, "recovery_time").Value <= 0 {
			t.Errorf("%s: no recovery time", c.model)
		}
	}
	// 1 m³ into 30 m³ by displacement: 0.209 × 29/30 = 20.20 %, above
	// 19.5 % (OSHA 29 CFR 1910.134): pass.
	ok := evalOK(t, oxygenSheet, plus(roomRelease, "release", "1 m3"))
	wantNum(t, "1 m3", ok, "oxygen_fraction", 0.209*29/30, 1e-9)
	wantOutcome(t, "1 m3", ok, "oxygen_deficient", Pass)
	wantNum(t, "threshold", ok, "threshold", safety.OxygenDeficient, 0)
	// A 50 L helium cylinder at 200 bar (read as gauge) releases about
	// 9 m³ (see cmd/twcalc's oxygen test: 9.87 m³ ideal at 15 °C less the
	// non-ideal 9 %, plus the 15 → 20 °C expansion); with carbon dioxide's
	// model a 200 bar fill is refused (a full CO2 cylinder holds liquid).
	cyl := evalOK(t, oxygenSheet, map[string]string{"room": "30 m3", "release-from-cylinder": "50 L", "fill-pressure": "200 bar"})
	if v := rowOf(t, cyl, "release_volume").Value; v < 8.8 || v > 9.4 {
		t.Errorf("cylinder release %g m³, want about 9 m³", v)
	}
	wantFieldError(t, oxygenSheet, map[string]string{"room": "30 m3", "release-from-cylinder": "50 L", "fill-pressure": "200 bar", "gas": "carbon dioxide"}, "fill-pressure")
	// The rig's vessel: 50 L of helium at 30 barg and 20 °C releases
	// 1.4586 m³ (see cmd/twcalc/safety_cmds_test.go: Z of helium-4 from a
	// published table, hand calculation; 1e-3 covers the gas model's Z).
	ves := evalOK(t, oxygenSheet, map[string]string{"room": "30 m3", "release-from-vessel": "50 L", "vessel-pressure": "30 barg"})
	wantNum(t, "vessel", ves, "vessel_release", 1.45860, 1e-3)
}

// TestOxygenSheetSpread: by displacement the oxygen is 0.209 (1 − V/R),
// so a ± on the release gives σ = 0.209 σV/R (GUM eq. 10).
func TestOxygenSheetSpread(t *testing.T) {
	t.Parallel()
	for _, u := range []float64{0.5, 1} {
		r := evalOK(t, oxygenSheet, plus(roomRelease, "release", "9 m3 ± "+ftoa(u)+" m3"))
		o := rowOf(t, r, "oxygen_fraction")
		if want := 0.209 * u / 30; !near(o.PM, want, 1e-5) {
			t.Errorf("± %g m³: oxygen ± %g, want %g", u, o.PM, want)
		}
	}
}

// TestOxygenSheetBadInput: each error names its input.
func TestOxygenSheetBadInput(t *testing.T) {
	t.Parallel()
	wantFieldError(t, oxygenSheet, plus(roomRelease, "release", "40 m3"), "release")
	err := wantFieldError(t, oxygenSheet, map[string]string{"room": "30 m3"}, "release")
	if !errors.Is(err, ErrRequired) {
		t.Errorf("no release: %v is not ErrRequired", err)
	}
	wantFieldError(t, oxygenSheet, map[string]string{"room": "30 m3", "release-from-cylinder": "50 L"}, "fill-pressure")
	wantFieldError(t, oxygenSheet, map[string]string{"room": "30 m3", "release-from-vessel": "50 L", "vessel-pressure": "0.5 bara"}, "vessel-pressure")
	wantFieldError(t, oxygenSheet, map[string]string{"room": "30 m3", "release-from-vessel": "50 L", "vessel-pressure": "30 barg", "vessel-temperature": "5 K"}, "vessel-temperature")
	wantFieldError(t, oxygenSheet, plus(roomRelease, "room", "0 m3"), "room")
}
