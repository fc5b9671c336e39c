package sheet

import (
	"strings"
	"testing"

	"tubewright/calc/safety"
)

// The vessel of issues 9 and 12: 30 bar, 100 mm inside diameter, 3 mm
// wall, 138 MPa, relief set at 30 barg.
var issueVessel = map[string]string{"pressure": "30 bar", "inner-radius": "50 mm", "wall-thickness": "3 mm",
	"allowable-stress": "138 MPa", "relief-set": "30 barg"}

// TestVesselSheetValues checks the vessel description against hand
// calculations of the published formulas.
func TestVesselSheetValues(t *testing.T) {
	t.Parallel()
	// UG-27(c)(1) MAWP of the issue's wall: S E t/(R + 0.6 t) =
	// 138e6 × 0.003/(0.05 + 0.0018) = 7.992278 MPa; (c)(2) 2 S E t/(R − 0.4 t)
	// = 16.97 MPa is higher (ASME VIII-1 UG-27(c), hand calculation).
	const wallMAWP = 138e6 * 0.003 / (0.05 + 0.6*0.003)
	r := evalOK(t, vesselSheet, issueVessel)
	// The one MAWP rule: without a nameplate, the wall's own; 30 barg
	// relief is 38 % of it: pass on both sides (issue 9).
	wantNum(t, "issue vessel", r, "mawp_used", wallMAWP, 1e-9)
	wantOutcome(t, "issue vessel", r, "relief_check", Pass)
	wantOutcome(t, "issue vessel", r, "mawp_check", Pass)
	wantOutcome(t, "issue vessel", r, "test_pressure_check", Warn)
	// UG-99(b) 1.3 × MAWP = 103.9 barg, the terminal's figure in issue 9.
	wantNum(t, "issue vessel", r, "hydrostatic_test_pressure", 1.3*wallMAWP, 1e-9)
	wantNum(t, "issue vessel", r, "pneumatic_test_pressure", 1.1*wallMAWP, 1e-9)
	if !containsCaution(r, safety.CautionReliefSizing) {
		t.Error("the relief-sizing caution is missing")
	}
	// A bare "30 bar" is gauge: the echo says so (issue 12).
	var read string
	for _, d := range r.Derived {
		if d.Key == "pressure_read" {
			read = d.Text
		}
	}
	if read != "30 bar read as 30 barg = 31.01 bar absolute" {
		t.Errorf("pressure read as %q", read)
	}
	// Lamé at 30 barg, 50 mm, 6 mm: 26.584906 MPa; UG-27(c)(1) minimum wall
	// 1.101322 mm (hand calculations in calc/safety/wall_test.go and
	// shell_test.go).
	thick := evalOK(t, vesselSheet, plus(issueVessel, "wall-thickness", "6 mm"))
	wantNum(t, "6 mm wall", thick, "hoop_stress", 26.584905660e6, 1e-9)
	wantNum(t, "6 mm wall", thick, "minimum_wall_thickness", 1.101321586e-3, 1e-9)
	wantOutcome(t, "6 mm wall", thick, "wall_adequate", Pass)
	wantOutcome(t, "6 mm wall", thick, "stress_check", Pass)

	// A nameplate MAWP of 20 barg rules; a relief at 22 barg is above it
	// (UG-134(a)); UG-99(b) 1.3 × 20 = 26 barg.
	plate := evalOK(t, vesselSheet, plus(issueVessel, "pressure", "15 barg", "mawp", "20 barg", "relief-set", "22 barg"))
	wantNum(t, "nameplate", plate, "mawp_used", 20e5, 1e-12)
	wantNum(t, "nameplate", plate, "hydrostatic_test_pressure", 26e5, 1e-12)
	wantOutcome(t, "nameplate", plate, "relief_check", Fail)
	wantOutcome(t, "nameplate", plate, "nameplate_check", Pass)
	wantOutcome(t, "nameplate", plate, "test_pressure_check", Pass)
	if row := rowOf(t, plate, "relief_at_or_below_mawp"); row.Any != false {
		t.Errorf("relief_at_or_below_mawp = %v", row.Any)
	}
	// The vessel's MAWP is the lowest of its parts: a nameplate above what
	// the wall allows gives way to the wall's.
	high := evalOK(t, vesselSheet, plus(issueVessel, "mawp", "100 barg"))
	wantNum(t, "nameplate above the wall", high, "mawp_used", wallMAWP, 1e-9)
	wantOutcome(t, "nameplate above the wall", high, "nameplate_check", Warn)
	// The design pressure is never the MAWP: 90 barg over the wall's
	// 79.9 barg fails, and the 3 mm wall is under UG-27's minimum.
	over := evalOK(t, vesselSheet, plus(issueVessel, "pressure", "90 barg", "relief-set", "95 barg"))
	wantOutcome(t, "design over MAWP", over, "mawp_check", Fail)
	wantOutcome(t, "design over MAWP", over, "wall_adequate", Fail)
	wantOutcome(t, "design over MAWP", over, "relief_check", Fail)
	if over.Worst() != Fail {
		t.Errorf("worst outcome %v", over.Worst())
	}
	// No family formula and no nameplate: no MAWP, so no test pressure and
	// a relief that cannot be checked; never the design pressure.
	eu := evalOK(t, vesselSheet, plus(issueVessel, "code-family", "eu"))
	if _, ok := eu.Row("eu_test_pressure"); ok {
		t.Error("eu without a nameplate took the design pressure as PS")
	}
	wantOutcome(t, "eu", eu, "relief_check", Warn)
	// PED 7.4 with PS = 30 bar: max(1.25 × 30, 1.43 × 30) = 42.9 bar.
	eu = evalOK(t, vesselSheet, plus(issueVessel, "code-family", "eu", "mawp", "30 barg"))
	wantNum(t, "eu with PS", eu, "eu_test_pressure", 42.9e5, 1e-12)
	// At or above S·E no wall holds the pressure: a failing check with a
	// message, never a thickness like 1.3e42 m (see calc/safety/shell.go).
	none := evalOK(t, vesselSheet, plus(issueVessel, "pressure", "1500 barg", "relief-set", ""))
	if _, ok := none.Row("minimum_wall_thickness"); ok {
		t.Error("a minimum wall was given where no wall can hold the pressure")
	}
	wantOutcome(t, "no wall", none, "wall_adequate", Fail)
	if w := rowOf(t, none, "wall_adequate"); !strings.Contains(w.Note, "no wall can hold") {
		t.Errorf("no-wall why %q", w.Note)
	}
}

func containsCaution(r *Result, c string) bool {
	for _, x := range r.Cautions {
		if x == c {
			return true
		}
	}
	return false
}

// TestVesselSheetSpread: Lamé's hoop stress is proportional to the
// pressure, so a ± on the pressure gives σ = hoop × σP/P (GUM eq. 10), and
// twice the ± twice the spread.
func TestVesselSheetSpread(t *testing.T) {
	t.Parallel()
	for _, u := range []float64{0.5, 1} {
		r := evalOK(t, vesselSheet, plus(issueVessel, "pressure", "30 barg ± "+ftoa(u)+" bar"))
		h := rowOf(t, r, "hoop_stress")
		want := h.Value * u / 30
		if !near(h.PM, want, 1e-5) {
			t.Errorf("± %g bar: hoop ± %g, want %g", u, h.PM, want)
		}
	}
}

// TestVesselSheetBadInput: each error names its input.
func TestVesselSheetBadInput(t *testing.T) {
	t.Parallel()
	wantFieldError(t, vesselSheet, plus(issueVessel, "joint-efficiency", "1.2"), "joint-efficiency")
	wantFieldError(t, vesselSheet, plus(issueVessel, "pressure", "0.5 bara"), "pressure")
	wantFieldError(t, vesselSheet, plus(issueVessel, "mawp", "0.5 bara"), "mawp")
	wantFieldError(t, vesselSheet, plus(issueVessel, "relief-set", "0.5 bara"), "relief-set")
	wantFieldError(t, vesselSheet, plus(issueVessel, "inner-radius", "0 mm"), "inner-radius")
	wantFieldError(t, vesselSheet, plus(issueVessel, "corrosion-allowance", "3 mm"), "wall-thickness")
	wantFieldError(t, vesselSheet, plus(issueVessel, "allowable-stress", ""), "allowable-stress")
}
