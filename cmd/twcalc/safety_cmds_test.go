package main

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/safety"
)

// safetyOut is the decoded --json output of a safety command.
type safetyOut struct {
	Results map[string]struct {
		Value json.RawMessage `json:"value"`
		Unit  string          `json:"unit"`
	} `json:"results"`
	Warnings []string                   `json:"warnings"`
	Cautions []string                   `json:"cautions"`
	Inputs   map[string]json.RawMessage `json:"inputs"`
	Verdicts []struct {
		Check, Outcome, Why string
	} `json:"verdicts"`
}

// outcome returns the outcome of check in o's verdicts, or "".
func (o safetyOut) outcome(check string) string {
	for _, v := range o.Verdicts {
		if v.Check == check && v.Why != "" {
			return v.Outcome
		}
	}
	return ""
}

func (o safetyOut) num(t *testing.T, name string) float64 {
	t.Helper()
	r, ok := o.Results[name]
	if !ok {
		t.Fatalf("result %q missing; have %v", name, keys(o.Results))
	}
	var v float64
	if err := json.Unmarshal(r.Value, &v); err != nil {
		t.Fatalf("result %q: %v", name, err)
	}
	return v
}

func keys[V any](m map[string]V) []string {
	var out []string
	for k := range m {
		out = append(out, k)
	}
	return out
}

// runSafetyJSON runs a command with --json, wants exit 0 and a non-empty
// cautions array starting with the general caution.
func runSafetyJSON(t *testing.T, args ...string) safetyOut {
	t.Helper()
	out := decodeRun[safetyOut](t, args...)
	if len(out.Cautions) == 0 || out.Cautions[0] != safety.CautionGeneral {
		t.Errorf("twcalc %q: cautions %q, want the general caution first", args, out.Cautions)
	}
	return out
}

func approx(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, 1e-300, rel) {
		t.Errorf("%s = %.10g, want %.10g", what, got, want)
	}
}

func TestVesselCommand(t *testing.T) {
	t.Parallel()
	o := runSafetyJSON(t, "vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--joint-efficiency", "1")
	// Values: hand calculations in calc/safety's tests (Lamé 26.5849 MPa;
	// UG-27(c)(1) 1.10132 mm and 15.4478 MPa; UG-99(b) 1.3 × MAWP).
	approx(t, "hoop_stress", o.num(t, "hoop_stress"), 26.584905660e6, 1e-9)
	approx(t, "minimum_wall_thickness", o.num(t, "minimum_wall_thickness"), 1.101321586e-3, 1e-9)
	approx(t, "max_allowable_pressure", o.num(t, "max_allowable_pressure"), 15.44776119e6, 1e-9)
	approx(t, "hydrostatic_test_pressure", o.num(t, "hydrostatic_test_pressure"), 1.3*15.44776119e6, 1e-9)
	// Thin-wall hoop stress on the mean radius 53 mm: 3e6 × 0.053/0.006 =
	// 26.5 MPa, over 138 MPa = 0.1920290 (hand calculation).
	approx(t, "thin_wall_hoop_stress_ratio", o.num(t, "thin_wall_hoop_stress_ratio"), 26.5e6/138e6, 1e-12)
	if u := o.Results["hoop_stress"].Unit; u != "Pa" {
		t.Errorf("hoop_stress unit %q", u)
	}
	// 30 bar absolute is 1.01325 bar less load than 30 barg; a bare
	// "30 bar" is read as gauge, as a gauge shows it (issue 12).
	a := runSafetyJSON(t, "vessel", "--pressure", "30bara", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa")
	approx(t, "hoop difference", o.num(t, "hoop_stress")-a.num(t, "hoop_stress"), 101325*0.005636/0.000636, 1e-9)
	// The MAWP depends on the wall only, not on how the pressure was typed.
	approx(t, "same MAWP", a.num(t, "max_allowable_pressure"), o.num(t, "max_allowable_pressure"), 1e-15)
	bare := runSafetyJSON(t, "vessel", "--pressure", "30bar", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa")
	approx(t, "bare bar read as gauge", bare.num(t, "hoop_stress"), o.num(t, "hoop_stress"), 1e-15)
	// Without --mawp the test pressures rest on the shell's MAWP, with a
	// warning that the vessel's MAWP is the lowest of its parts.
	if !strings.Contains(strings.Join(o.Warnings, "\n"), "give the nameplate MAWP") {
		t.Errorf("no warning about the shell-only MAWP: %q", o.Warnings)
	}
	// With the vessel's marked MAWP, 40 bar gauge: UG-99(b) 1.3 × 40 =
	// 52 bar, UG-100(b) 1.1 × 40 = 44 bar (hand calculation); a relief set
	// at 42 bar gauge is above it (UG-134(a): a single device "shall not
	// exceed the maximum allowable working pressure").
	m := runSafetyJSON(t, "vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--mawp", "40barg", "--relief-set", "42barg")
	approx(t, "mawp_used", m.num(t, "mawp_used"), 40e5, 1e-12)
	approx(t, "hydrostatic with --mawp", m.num(t, "hydrostatic_test_pressure"), 52e5, 1e-12)
	approx(t, "pneumatic with --mawp", m.num(t, "pneumatic_test_pressure"), 44e5, 1e-12)
	if string(m.Results["relief_at_or_below_mawp"].Value) != "false" {
		t.Errorf("relief 42 barg over MAWP 40 barg: %s", m.Results["relief_at_or_below_mawp"].Value)
	}
	ok := runSafetyJSON(t, "vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--mawp", "40barg", "--relief-set", "40barg")
	if string(ok.Results["relief_at_or_below_mawp"].Value) != "true" {
		t.Errorf("relief at the MAWP: %s", ok.Results["relief_at_or_below_mawp"].Value)
	}
	// Other code families: no invented formula, the reference instead.
	// The design pressure is never the MAWP (issue 9): with no formula
	// and no nameplate there is no test pressure; with the nameplate PS it
	// is PED 7.4's.
	none := runSafetyJSON(t, "vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--code-family", "eu")
	if _, ok := none.Results["eu_test_pressure"]; ok {
		t.Error("eu family without a nameplate MAWP took the design pressure as PS")
	}
	eu := runSafetyJSON(t, "vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--code-family", "eu", "--mawp", "30barg")
	if _, ok := eu.Results["minimum_wall_thickness"]; ok {
		t.Error("eu family must not compute a UG-27 thickness")
	}
	if _, ok := eu.Results["code_reference"]; !ok {
		t.Error("eu family: code_reference missing")
	}
	// PED 7.4 with PS = 30 bar: max(1.25 × 30, 1.43 × 30) = 42.9 bar.
	approx(t, "eu_test_pressure", eu.num(t, "eu_test_pressure"), 42.9e5, 1e-12)
}

// TestVesselIssueVessel: the vessel of issues 9 and 12 (30 bar, 100 mm
// inside, 3 mm wall, 138 MPa, relief at 30 barg) gets the verdicts of the
// one MAWP rule in the JSON, and the echo says the bare 30 bar was read as
// gauge. UG-27(c)(1): MAWP = 138 MPa × 3 mm/(50 mm + 1.8 mm) = 79.92 bar;
// UG-99(b) 1.3 × that = 103.9 bar (hand calculation).
func TestVesselIssueVessel(t *testing.T) {
	t.Parallel()
	o := runSafetyJSON(t, "vessel", "--pressure", "30 bar", "--inner-radius", "50mm", "--wall-thickness", "3mm", "--allowable-stress", "138MPa", "--relief-set", "30barg")
	const mawp = 138e6 * 0.003 / (0.05 + 0.6*0.003)
	approx(t, "mawp_used", o.num(t, "mawp_used"), mawp, 1e-9)
	approx(t, "hydrostatic_test_pressure", o.num(t, "hydrostatic_test_pressure"), 1.3*mawp, 1e-9)
	for check, want := range map[string]string{"relief_check": "pass", "mawp_check": "pass", "wall_adequate": "pass", "stress_check": "pass", "test_pressure_check": "warn"} {
		if got := o.outcome(check); got != want {
			t.Errorf("verdict %s = %q, want %q (verdicts %+v)", check, got, want, o.Verdicts)
		}
	}
	if got := string(o.Inputs["pressure_read"]); got != `"30 bar read as 30 barg = 31.01 bar absolute"` {
		t.Errorf("pressure echo %s", got)
	}
	if countOf(o.Cautions, safety.CautionReliefSizing) != 1 {
		t.Errorf("relief-sizing caution missing: %q", o.Cautions)
	}
	// A nameplate of 25 barg: the same relief fails.
	f := runSafetyJSON(t, "vessel", "--pressure", "20 bar", "--inner-radius", "50mm", "--wall-thickness", "3mm", "--allowable-stress", "138MPa", "--relief-set", "30barg", "--mawp", "25barg")
	if got := f.outcome("relief_check"); got != "fail" {
		t.Errorf("relief over the nameplate MAWP: %q", got)
	}
}

func TestEnergyCommand(t *testing.T) {
	t.Parallel()
	o := runSafetyJSON(t, "energy", "--gas", "helium", "--pressure", "30barg", "--volume", "50L")
	// Hand calculation in calc/safety's energy tests: 173 405.6 J, Brode
	// 225 kJ, TNT at 4.184 MJ/kg.
	approx(t, "stored_energy", o.num(t, "stored_energy"), 173405.5674, 1e-6)
	approx(t, "brode_energy", o.num(t, "brode_energy"), 225000, 1e-6)
	approx(t, "tnt_equivalent", o.num(t, "tnt_equivalent"), 173405.5674/4.184e6, 1e-6)
	if o.Results["tnt_equivalent"].Unit != "kg" || o.Results["stored_energy"].Unit != "J" {
		t.Errorf("units %q %q", o.Results["tnt_equivalent"].Unit, o.Results["stored_energy"].Unit)
	}
	// 30 bar absolute stores less than 30 barg.
	a := runSafetyJSON(t, "energy", "--gas", "helium", "--pressure", "30bara", "--volume", "50L")
	if a.num(t, "stored_energy") >= o.num(t, "stored_energy") {
		t.Error("30 bar absolute stores as much as 30 barg")
	}
}

func TestOxygenCommand(t *testing.T) {
	t.Parallel()
	// Hand calculations in calc/safety's oxygen tests.
	cases := []struct {
		model string
		want  float64
	}{{"displacement", 0.1463}, {"mixed", 0.1548310081}, {"sealed", 0.1607692308}}
	for _, c := range cases {
		o := runSafetyJSON(t, "oxygen", "--release", "9m3", "--room", "30m3", "--model", c.model, "--ventilation", "2/h")
		approx(t, c.model, o.num(t, "oxygen_fraction"), c.want, 1e-9)
		if o.num(t, "recovery_time") <= 0 {
			t.Errorf("%s: no recovery time", c.model)
		}
	}
	// From a cylinder: 50 L at 200 bar helium releases about 9 m³
	// (9.87 m³ ideal at 15 °C less the non-ideal 9 %, plus the 15 → 20 °C
	// expansion, less the 0.05 m³ left in it).
	o := runSafetyJSON(t, "oxygen", "--release-from-cylinder", "50L", "--fill-pressure", "200bar", "--gas", "helium", "--room", "30m3")
	if v := o.num(t, "release_volume"); v < 8.8 || v > 9.3 {
		t.Errorf("cylinder release %g m³, want about 9 m³", v)
	}
	if o.num(t, "oxygen_fraction") >= 0.195 {
		t.Error("a full 50 L cylinder in 30 m³ should be oxygen-deficient")
	}
	// The rig's vessel: 50 L of helium at 30 bar gauge and 20 °C into a room
	// at 101 325 Pa and 20 °C. Z of helium-4 at 30 bar: 1.0147 at 15 °C and
	// 1.0129 at 50 °C in the table "Z de l'hélium 4"
	// (solar.energy.free.fr/sld015.htm, source not named), so 1.01444 at
	// 20 °C by linear interpolation; the gas that leaves is
	// 0.05 × (3 101 325/1.01444 − 101 325)/101 325 = 1.45860 m³ (hand
	// calculation). The tolerance covers the gas model's Z (1.0151).
	v := runSafetyJSON(t, "oxygen", "--release-from-vessel", "50L", "--vessel-pressure", "30barg", "--room", "30m3")
	approx(t, "vessel_release", v.num(t, "vessel_release"), 1.45860, 1e-3)
	// Vessel and cylinder releases add up.
	both := runSafetyJSON(t, "oxygen", "--release-from-vessel", "50L", "--vessel-pressure", "30barg", "--release-from-cylinder", "50L", "--fill-pressure", "200bar", "--room", "30m3")
	approx(t, "vessel + cylinder", both.num(t, "release_volume"), v.num(t, "vessel_release")+o.num(t, "cylinder_release"), 1e-12)
	// A hydrogen cylinder carries the fire caution, once; helium does not.
	h := runSafetyJSON(t, "oxygen", "--release-from-cylinder", "10L", "--fill-pressure", "150bar", "--gas", "hydrogen", "--room", "30m3")
	if n := countOf(h.Cautions, safety.CautionFlammable); n != 1 {
		t.Errorf("hydrogen: fire caution %d times in %q", n, h.Cautions)
	}
	if n := countOf(h.Cautions, safety.CautionGeneral); n != 1 {
		t.Errorf("hydrogen: general caution %d times", n)
	}
	if countOf(o.Cautions, safety.CautionFlammable) != 0 {
		t.Error("helium given the hydrogen caution")
	}
	// Air holds oxygen: said in a warning.
	a := runSafetyJSON(t, "oxygen", "--release-from-cylinder", "10L", "--fill-pressure", "150bar", "--gas", "air", "--room", "30m3")
	if !strings.Contains(strings.Join(a.Warnings, "\n"), "air holds oxygen") {
		t.Errorf("air: warnings %q", a.Warnings)
	}
}

func countOf(list []string, s string) int {
	n := 0
	for _, x := range list {
		if x == s {
			n++
		}
	}
	return n
}

func TestSPLCommand(t *testing.T) {
	t.Parallel()
	o := runSafetyJSON(t, "spl", "--amplitude", "10kPa")
	// Hand calculation: 170.969 dB rms, 173.979 dB peak.
	approx(t, "spl", o.num(t, "spl"), 170.9691001, 1e-9)
	approx(t, "peak_level", o.num(t, "peak_level"), 173.9794001, 1e-9)
	if o.Results["spl"].Unit != "dB" {
		t.Errorf("spl unit %q", o.Results["spl"].Unit)
	}
	e := runSafetyJSON(t, "spl", "--amplitude", "1Pa", "--at-ear", "95dBA")
	// OSHA Table G-16: 95 dBA allows 4 h.
	approx(t, "osha_permitted_time", e.num(t, "osha_permitted_time"), 4*3600, 1e-12)
}

func TestSafetyCommandsRejectImpossibleInput(t *testing.T) {
	t.Parallel()
	cases := []struct {
		args []string
		want string // part of the one-line message
	}{
		{[]string{"vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--joint-efficiency", "1.2"}, "--joint-efficiency \"1.2\": joint efficiency 1.2"},
		{[]string{"vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--joint-efficiency", "0"}, "joint efficiency 0"},
		{[]string{"vessel", "--pressure", "0.5bara", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa"}, "below the atmosphere"},
		{[]string{"vessel", "--pressure", "30barg", "--inner-radius", "0mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa"}, "inner radius 0 m"},
		{[]string{"vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--mawp", "0.5bara"}, "--mawp \"0.5bara\""},
		{[]string{"vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa", "--relief-set", "0.5bara"}, "--relief-set \"0.5bara\""},
		{[]string{"oxygen", "--release", "40m3", "--room", "30m3"}, "release volume 40 m³ is outside the valid range 0–30 m³"},
		{[]string{"oxygen", "--room", "30m3"}, "--release is required"},
		{[]string{"oxygen", "--release-from-cylinder", "50L", "--room", "30m3"}, "--fill-pressure is required"},
		{[]string{"oxygen", "--release-from-vessel", "50L", "--room", "30m3"}, "--vessel-pressure is required"},
		{[]string{"oxygen", "--release-from-vessel", "50L", "--vessel-pressure", "0.5bara", "--room", "30m3"}, "--vessel-pressure \"0.5bara\": is 50 kPa absolute, below the atmosphere"},
		{[]string{"oxygen", "--release-from-vessel", "50L", "--vessel-pressure", "30barg", "--vessel-temperature", "5K", "--room", "30m3"}, "--vessel-temperature \"5K\""},
		{[]string{"energy", "--gas", "helium", "--pressure", "1atm", "--volume", "50L"}, "no energy is stored"},
		{[]string{"spl", "--amplitude", "0Pa"}, "pressure amplitude 0 Pa"},
		{[]string{"spl", "--amplitude", "1barg"}, "neither gauge nor absolute"},
		{[]string{"spl", "--amplitude", "-3Pa"}, "--amplitude \"-3Pa\""},
		{[]string{"spl", "--amplitude=-3Pa"}, "is negative"},
	}
	for _, c := range cases {
		var o, e bytes.Buffer
		code := run(c.args, &o, &e)
		if code != exitUsage {
			t.Errorf("%q: exit %d, want %d (stderr %q)", c.args, code, exitUsage, e.String())
		}
		if !strings.Contains(e.String(), c.want) || strings.Count(e.String(), "\n") != 1 {
			t.Errorf("%q: stderr %q, want one line containing %q", c.args, e.String(), c.want)
		}
		if o.Len() != 0 {
			t.Errorf("%q: wrote %q to stdout on error", c.args, o.String())
		}
	}
}

func TestSafetyTextOutputShowsCautions(t *testing.T) {
	t.Parallel()
	for _, args := range [][]string{
		{"vessel", "--pressure", "30barg", "--inner-radius", "50mm", "--wall-thickness", "6mm", "--allowable-stress", "138MPa"},
		{"energy", "--gas", "helium", "--pressure", "30barg", "--volume", "50L"},
		{"oxygen", "--release", "9m3", "--room", "30m3"},
		{"spl", "--amplitude", "10kPa"},
	} {
		var o, e bytes.Buffer
		if code := run(args, &o, &e); code != exitOK {
			t.Fatalf("%q: exit %d %s", args, code, e.String())
		}
		if !strings.Contains(o.String(), "CAUTION") || !strings.Contains(o.String(), "Estimates for planning only") {
			t.Errorf("%q: table output lacks the caution:\n%s", args, o.String())
		}
	}
}
