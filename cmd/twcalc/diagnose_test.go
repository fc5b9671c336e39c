package main

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/resonator"
	"tubewright/gasprops"
)

// TestDiagnoseWallLossesByDefault: a 0.5 m closed-closed helium tube of
// 10 mm radius at 1 bar measured at 1000 Hz. Without the boundary layers
// the plane-wave rule gives about 289 K; with Rott's complex wave number,
// the default, the scipy solution of testdata/gen_wall_resonance.py puts
// it at 299.4 K (see calc/resonator/wave_test.go).
func TestDiagnoseWallLossesByDefault(t *testing.T) {
	t.Parallel()
	args := []string{"diagnose", "--gas", "helium", "--pressure", "1bar", "--ends", "closed-closed", "--length", "0.5m",
		"--radius", "10mm", "--end-correction", "none", "--measured-frequency", "1000 Hz", "--find", "temperature"}
	T, _ := num(t, runJSON(t, args...), "temperature")
	if math.Abs(T-299.4) > 0.5 {
		t.Errorf("temperature %.2f K, scipy with wall losses 299.4 K", T)
	}
	T0, _ := num(t, runJSON(t, append(args, "--losses", "none")...), "temperature")
	if math.Abs(T0-288.8) > 0.5 {
		t.Errorf("loss-free temperature %.2f K, want about 288.8 K", T0)
	}
}

// twcalc diagnose returns what the calculator returns, with the ±.
func TestDiagnoseJSON(t *testing.T) {
	t.Parallel()
	rep := runJSON(t, "diagnose", "--ends", "closed-closed", "--length", "1m", "--radius", "20mm", "--end-correction", "none",
		"--gas", "helium", "--pressure", "1bar", "--measured-frequency", "510Hz", "--find", "temperature")
	T, u := num(t, rep, "temperature")
	s := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedClosed, Mode: 1, Length: 1, Radius: 0.02, Losses: resonator.WallLosses}, Gas: mix(t, "helium"), Pressure: 1e5}
	want, err := s.DiagnoseTemperature(510)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(T, want.Value, 1e-12) || u != nil {
		t.Errorf("temperature %g (± %v), calc %g without ±", T, u, want.Value)
	}
	if rep.Results["temperature"].Unit != "K" {
		t.Errorf("unit %q", rep.Results["temperature"].Unit)
	}

	rep = runJSON(t, "diagnose", "--ends", "closed-open", "--length", "0.5m", "--radius", "10mm", "--gas", "helium", "--pressure", "1bar",
		"--measured-frequency", "480Hz+-2Hz", "--find", "fraction", "--second-gas", "argon", "--temperature", "300K")
	x, u := num(t, rep, "mole_fraction")
	he, _ := gasprops.Lookup("helium")
	ar, _ := gasprops.Lookup("argon")
	s = resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: 0.5, Radius: 0.01, Losses: resonator.WallLosses},
		Temperature: 300, Pressure: 1e5, U: resonator.Uncertainty{Frequency: 2}}
	wx, err := s.DiagnoseFraction(he, ar, 480)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(x, wx.Value, 1e-12) || u == nil || !scalar.EqualWithinRel(*u, wx.Sigma, 1e-9) {
		t.Errorf("mole fraction %g ± %v, calc %g ± %g", x, u, wx.Value, wx.Sigma)
	}
	if math.IsNaN(x) {
		t.Error("NaN")
	}
}
