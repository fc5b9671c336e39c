package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
)

// TestOnsetCommandJSON: the JSON keys of twcalc onset and the values of the
// calc/linear solve they report (the solver's own checks are in
// calc/linear; here the command must pass them through unchanged).
func TestOnsetCommandJSON(t *testing.T) {
	d, err := linear.Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	want, err := linear.Onset(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	rep := runJSON(t, "onset", "--example", "engine")
	for _, c := range []struct {
		name string
		want float64
	}{{"hot_temperature", want.HotTemperature}, {"frequency", want.Frequency}, {"temperature_ratio", want.TemperatureRatio},
		{"short_stack_gradient_ratio", want.ShortStack.GradientRatio}} {
		v, _ := num(t, rep, c.name)
		if !scalar.EqualWithinRel(v, c.want, 1e-12) {
			t.Errorf("%s = %g, want %g", c.name, v, c.want)
		}
	}
	if rep.Results["hot_temperature"].Unit != "K" || rep.Results["frequency"].Unit != "Hz" {
		t.Errorf("units: %+v", rep.Results)
	}
}

// TestOnsetCommandFileAndErrors runs a device from a file, and checks that a
// broken file and bad flags exit with one message naming the problem.
func TestOnsetCommandFileAndErrors(t *testing.T) {
	dir := t.TempDir()
	b, _ := linear.ExampleFile("engine")
	good := filepath.Join(dir, "engine.json")
	if err := os.WriteFile(good, b, 0o600); err != nil {
		t.Fatal(err)
	}
	rep := runJSON(t, "onset", good)
	if v, _ := num(t, rep, "hot_temperature"); v < 300 {
		t.Errorf("hot temperature %g K from the file", v)
	}
	bad := filepath.Join(dir, "bad.json")
	_ = os.WriteFile(bad, []byte(strings.Replace(string(b), `"porosity": "0.76"`, `"porosity": "1.4"`, 1)), 0o600)
	// A ± inside the device is refused with the device check's words, the
	// same the app shows under its mean-pressure field.
	pm := filepath.Join(dir, "pm.json")
	_ = os.WriteFile(pm, []byte(strings.Replace(string(b), `"mean_pressure": "8 bar"`, `"mean_pressure": "8 bar ± 0.5 bar"`, 1)), 0o600)
	cases := []struct {
		args []string
		code int
		want string
	}{
		{[]string{"onset", bad}, exitUsage, `part 4 (stack): field "porosity" = 1.4 must be in (0, 1]`},
		{[]string{"onset", pm}, exitUsage, `device: field "mean_pressure" = "8 bar ± 0.5 bar": an uncertainty is not used here; give the value alone`},
		{[]string{"onset", good, "--example", "engine"}, exitUsage, "not both"},
		{[]string{"onset", "--example", "engine", "--hot", "500 K", "--sweep-pressure", "1bar:2bar"}, exitUsage, "--sweep-pressure"},
		{[]string{"onset"}, exitUsage, "--example"},
		{[]string{"onset", "--example", "teapot"}, exitUsage, "teapot"},
		{[]string{"onset", "--example", "engine", "--hot", "-5 K"}, exitUsage, "--hot"},
		{[]string{"onset", filepath.Join(dir, "missing.json")}, exitUsage, "missing.json"},
	}
	for _, c := range cases {
		var o, e bytes.Buffer
		code := run(c.args, &o, &e)
		msg := e.String()
		if code != c.code || !strings.Contains(msg, c.want) || strings.Count(strings.TrimSpace(msg), "\n") > 0 {
			t.Errorf("twcalc %q: exit %d, stderr %q; want exit %d and %q on one line", c.args, code, msg, c.code, c.want)
		}
	}
}

// TestOnsetCommandModeAndSweep: --hot reports a decaying mode at ambient,
// --sweep-pressure a table with one row per pressure.
func TestOnsetCommandModeAndSweep(t *testing.T) {
	rep := runJSON(t, "onset", "--example", "engine", "--hot", "295K")
	if g, _ := num(t, rep, "growth_rate"); g >= 0 {
		t.Errorf("growth rate at ambient %g, want decay", g)
	}
	rep = runJSON(t, "onset", "--example", "engine", "--sweep-pressure", "2bar:20bar:4")
	if rep.Table == nil || len(rep.Table.Rows) != 4 || rep.Table.Columns[1] != "hot_temperature_K" {
		t.Fatalf("sweep table %+v", rep.Table)
	}
	if rep.Table.Rows[3][0] != 20e5 {
		t.Errorf("last pressure %g Pa, want 2e6", rep.Table.Rows[3][0])
	}
	// the pressure caution names the top of the sweep, not the file's 8 bar
	found := false
	for _, c := range rep.Cautions {
		if strings.HasPrefix(c, "Pressure:") {
			found = strings.Contains(c, "(20 bar)") && !strings.Contains(c, "(8 bar)")
		}
	}
	if !found {
		t.Errorf("no pressure caution naming the sweep's 20 bar in %q", rep.Cautions)
	}
}

// TestHeatPumpCommandJSON: the JSON keys of twcalc heatpump.
func TestHeatPumpCommandJSON(t *testing.T) {
	d, _ := linear.Example("heatpump")
	want, err := linear.HeatPump(d, &linear.HeatPumpSettings{CoolingLoad: 0.1})
	if err != nil {
		t.Fatal(err)
	}
	rep := runJSON(t, "heatpump", "--example", "heatpump", "--load", "100mW")
	for _, c := range []struct {
		name string
		want float64
	}{{"cold_temperature", want.ColdTemperature}, {"temperature_span", want.TemperatureSpan},
		{"acoustic_power", want.AcousticPower}, {"cop_relative_to_carnot", want.COPRelative},
		{"short_stack_zero_load_span", want.ShortStack.ZeroLoadSpan}, {"short_stack_gradient_ratio", want.ShortStack.GradientRatio},
		{"short_stack_k_dx", want.ShortStack.KDeltaX}, {"short_stack_depth_ratio", want.ShortStack.DepthRatio}} {
		v, _ := num(t, rep, c.name)
		if !scalar.EqualWithinRel(v, c.want, 1e-12) {
			t.Errorf("%s = %g, want %g", c.name, v, c.want)
		}
	}
	rep = runJSON(t, "heatpump", "--example", "heatpump", "--sweep-frequency", "380Hz:420Hz:3")
	if rep.Table == nil || len(rep.Table.Rows) != 3 {
		t.Fatalf("sweep table %+v", rep.Table)
	}
	var o, e bytes.Buffer
	if code := run([]string{"heatpump", "--example", "engine"}, &o, &e); code != exitUsage || !strings.Contains(e.String(), "driver") {
		t.Errorf("heat pump of the engine: exit %d, %q", code, e.String())
	}
}
