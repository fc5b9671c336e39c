package main

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/resonator"
	"tubewright/gasprops"
)

type resultEntry struct {
	Value       json.RawMessage `json:"value"`
	Unit        string          `json:"unit"`
	Uncertainty *float64        `json:"uncertainty"`
}

type jsonReport struct {
	Results  map[string]resultEntry `json:"results"`
	Warnings []string               `json:"warnings"`
	Cautions []string               `json:"cautions"`
	Table    *struct {
		Columns []string    `json:"columns"`
		Rows    [][]float64 `json:"rows"`
	} `json:"table"`
}

// runJSON runs twcalc with --json and decodes the object.
func runJSON(t *testing.T, args ...string) jsonReport {
	t.Helper()
	return decodeRun[jsonReport](t, args...)
}

func num(t *testing.T, rep jsonReport, name string) (v float64, u *float64) {
	t.Helper()
	e, ok := rep.Results[name]
	if !ok {
		t.Fatalf("no result %q in %v", name, rep.Results)
	}
	if err := json.Unmarshal(e.Value, &v); err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	return v, e.Uncertainty
}

func mix(t *testing.T, s string) gasprops.Mixture {
	t.Helper()
	m, err := gasprops.ParseMixture(s)
	if err != nil {
		t.Fatal(err)
	}
	return m
}

// The JSON results are the calculator's own numbers for the same inputs
// (converted by hand to SI), with the documented names and units.
func TestResonanceJSON(t *testing.T) {
	t.Parallel()
	rep := runJSON(t, "resonance", "--losses", "none", "--gas", "air", "--temperature", "300K", "--pressure", "1atm",
		"--ends", "closed-open", "--length", "1m", "--radius", "25mm", "--end-correction", "unflanged", "--mode", "1")
	s := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: 1, Radius: 0.025},
		Gas: mix(t, "air"), Temperature: 300, Pressure: 101325}
	want, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name string
		want float64
		unit string
	}{
		{"frequency", want.Frequency, "Hz"},
		{"end_correction", want.EndCorrection, "m"},
		{"quality_factor", want.Q.Total, ""},
		{"bandwidth", want.Bandwidth, "Hz"},
		{"decay_time", want.DecayTime, "s"},
		{"sound_speed", want.SoundSpeed, "m/s"},
		{"wavelength", want.Wavelength, "m"},
	} {
		v, u := num(t, rep, c.name)
		if !scalar.EqualWithinRel(v, c.want, 1e-12) {
			t.Errorf("%s = %g, calc %g", c.name, v, c.want)
		}
		if u != nil {
			t.Errorf("%s has an uncertainty %g without any ± in the inputs", c.name, *u)
		}
		if rep.Results[c.name].Unit != c.unit {
			t.Errorf("%s unit %q, want %q", c.name, rep.Results[c.name].Unit, c.unit)
		}
	}

	// --frequency instead of --length gives length, and the round trip holds
	rep = runJSON(t, "resonance", "--losses", "none", "--gas", "air", "--temperature", "300K", "--ends", "closed-open",
		"--frequency", "85.50245Hz", "--radius", "25mm")
	L, _ := num(t, rep, "length")
	if !scalar.EqualWithinRel(L, 1, 1e-5) {
		t.Errorf("length for 85.50245 Hz = %g m, want 1 m", L)
	}
	if _, ok := rep.Results["frequency"]; ok {
		t.Error("length mode also reports frequency")
	}
}

// A ± typed on an input reaches the outputs as "uncertainty".
func TestResonanceUncertainty(t *testing.T) {
	t.Parallel()
	rep := runJSON(t, "resonance", "--losses", "none", "--length", "0.25m+-1mm", "--radius", "8mm", "--temperature", "20degC+-2K")
	_, u := num(t, rep, "frequency")
	if u == nil || !(*u > 0) {
		t.Fatalf("frequency without uncertainty")
	}
	s := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: 0.25, Radius: 0.008},
		Gas: mix(t, "air"), Temperature: 293.15, Pressure: 101325, U: resonator.Uncertainty{Length: 0.001, Temperature: 2}}
	want, _ := s.SolveFrequency()
	if !scalar.EqualWithinRel(*u, want.FrequencySigma, 1e-9) {
		t.Errorf("σ_f = %g, calc %g", *u, want.FrequencySigma)
	}
	for _, name := range []string{"quality_factor", "bandwidth", "decay_time"} {
		if _, u := num(t, rep, name); u == nil {
			t.Errorf("%s has no uncertainty", name)
		}
	}
	rep = runJSON(t, "resonance", "--losses", "none", "--frequency", "400Hz+-2Hz", "--radius", "25mm", "--gas", "helium", "--ends", "closed-closed")
	if _, u := num(t, rep, "length"); u == nil || !(*u > 0) {
		t.Error("length without uncertainty from a frequency ±")
	}
}

func TestResonanceSweep(t *testing.T) {
	t.Parallel()
	var o, e bytes.Buffer
	if code := run([]string{"resonance", "--losses", "none", "--length", "1m", "--radius", "25mm", "--sweep", "temperature:250K:450K:5"}, &o, &e); code != exitOK {
		t.Fatalf("exit %d: %s", code, e.String())
	}
	lines := strings.Split(strings.TrimSpace(o.String()), "\n")
	if lines[0] != "temperature_K,frequency_Hz" || len(lines) != 6 {
		t.Fatalf("CSV:\n%s", o.String())
	}
	rep := runJSON(t, "resonance", "--losses", "none", "--gas", "helium", "--length", "1m", "--radius", "25mm", "--sweep", "fraction:0:0.3:4", "--second-gas", "argon")
	if rep.Table == nil || len(rep.Table.Rows) != 4 || rep.Table.Columns[0] != "mole_fraction_argon" {
		t.Fatalf("fraction sweep table %+v", rep.Table)
	}
	s := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: 1, Radius: 0.025},
		Temperature: 293.15, Pressure: 101325}
	he, _ := gasprops.Lookup("helium")
	ar, _ := gasprops.Lookup("argon")
	pts, err := s.SweepFraction(he, ar, 0, 0.3, 4)
	if err != nil {
		t.Fatal(err)
	}
	for i, p := range pts {
		if !scalar.EqualWithinRel(rep.Table.Rows[i][1], p.Frequency, 1e-12) {
			t.Errorf("row %d: %v, calc %v", i, rep.Table.Rows[i], p)
		}
	}
}

func TestResonanceZonesAndHelmholtz(t *testing.T) {
	t.Parallel()
	rep := runJSON(t, "resonance", "--losses", "none", "--ends", "closed-open", "--zones", "0.1m,10mm,700K;0.4m,10mm,295K", "--modes", "2")
	f, _ := num(t, rep, "frequency")
	zt := resonator.ZonedTube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Gas: mix(t, "air"), Pressure: 101325,
		Zones: []resonator.Zone{{Length: 0.1, Radius: 0.01, Temperature: 700}, {Length: 0.4, Radius: 0.01, Temperature: 295}}}
	want, err := zt.Modes(2)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(f, want.Modes[0].Frequency, 1e-12) {
		t.Errorf("zoned frequency %g, calc %g", f, want.Modes[0].Frequency)
	}
	var modes []map[string]float64
	if err := json.Unmarshal(rep.Results["modes"].Value, &modes); err != nil || len(modes) != 2 {
		t.Fatalf("modes %s: %v", rep.Results["modes"].Value, err)
	}
	rep = runJSON(t, "resonance", "--losses", "none", "--volume", "1L", "--neck-length", "50mm", "--neck-radius", "10mm")
	f, _ = num(t, rep, "frequency")
	g, _ := mix(t, "air").Properties(293.15, 101325, nil)
	h, _ := resonator.HelmholtzFrequency(resonator.Helmholtz{Volume: 1e-3, NeckLength: 0.05, NeckRadius: 0.01, Outer: resonator.Unflanged}, g)
	if !scalar.EqualWithinRel(f, h.Frequency, 1e-12) {
		t.Errorf("Helmholtz %g Hz, calc %g Hz", f, h.Frequency)
	}
}

// Bad input: a one-line message naming the flag, exit status 2, no NaN.
func TestResonanceBadInput(t *testing.T) {
	t.Parallel()
	cases := []struct {
		args []string
		flag string
	}{
		{[]string{"resonance", "--length", "0m", "--radius", "8mm"}, "--length"},
		{[]string{"resonance", "--length", "-1m", "--radius", "8mm"}, "--length"},
		{[]string{"resonance", "--length", "1m", "--radius", "8mm", "--temperature", "5K"}, "--temperature"},
		{[]string{"resonance", "--length", "1m"}, "--diameter"},
		{[]string{"resonance", "--radius", "8mm"}, "--length"},
		{[]string{"resonance", "--length", "1m", "--frequency", "100Hz", "--radius", "8mm"}, "--frequency"},
		{[]string{"resonance", "--frequency", "30kHz", "--radius", "10mm"}, "--frequency"},
		{[]string{"resonance", "--volume", "1L", "--neck-length", "5mm", "--neck-radius", "10mm"}, "--neck-radius"},
		{[]string{"resonance", "--zones", "0.1m,10mm", "--ends", "closed-open"}, "--zones"},
		{[]string{"resonance", "--length", "1m", "--radius", "8mm", "--sweep", "pressure:1bar:2bar"}, "--sweep"},
		{[]string{"resonance", "--length", "1m", "--radius", "8mm", "--sweep", "fraction:0:1:3"}, "--second-gas"},
		{[]string{"diagnose", "--gas", "air", "--length", "0.3m", "--radius", "10mm", "--measured-frequency", "5000Hz"}, "--measured-frequency"},
		{[]string{"diagnose", "--gas", "helium", "--length", "0.5m", "--radius", "8mm", "--measured-frequency", "500Hz", "--find", "fraction"}, "--second-gas"},
	}
	for _, c := range cases {
		var o, e bytes.Buffer
		code := run(c.args, &o, &e)
		msg := e.String()
		if code != exitUsage {
			t.Errorf("%q: exit %d (%s), want %d", c.args, code, msg, exitUsage)
		}
		if !strings.Contains(msg, c.flag) || strings.Count(strings.TrimSpace(msg), "\n") > 0 || strings.Contains(msg, "NaN") {
			t.Errorf("%q: message %q should be one line naming %s", c.args, msg, c.flag)
		}
	}
}

// The zoned tube takes up to 5 zones and 20 modes, as the app does; more is
// refused naming the flag. The resonator worked out from the flags is
// echoed.
func TestResonanceZoneLimits(t *testing.T) {
	t.Parallel()
	five := "0.1m,10mm,700K;0.1m,10mm,500K;0.1m,10mm,400K;0.2m,10mm,300K;0.2m,10mm,295K"
	type out struct {
		Inputs  map[string]json.RawMessage `json:"inputs"`
		Results map[string]json.RawMessage `json:"results"`
	}
	rep := decodeRun[out](t, "resonance", "--zones", five, "--modes", "20")
	var modes struct {
		Value []map[string]float64 `json:"value"`
	}
	if err := json.Unmarshal(rep.Results["modes"], &modes); err != nil || len(modes.Value) != 20 {
		t.Fatalf("modes %s: %v", rep.Results["modes"], err)
	}
	if got := string(rep.Inputs["resonator"]); got != `"zones"` {
		t.Errorf("resonator echoed as %s, want \"zones\"", got)
	}
	for _, c := range []struct {
		args []string
		flag string
	}{
		{[]string{"resonance", "--zones", five, "--modes", "21"}, "--modes"},
		{[]string{"resonance", "--zones", five + ";0.1m,10mm,300K"}, "--zones"},
	} {
		var o, e bytes.Buffer
		if code := run(c.args, &o, &e); code != exitUsage || !strings.HasPrefix(e.String(), "twcalc: "+c.flag+" ") {
			t.Errorf("%q: exit %d, %q; want a usage error naming %s", c.args, code, e.String(), c.flag)
		}
	}
}
