package ui

import (
	"image"
	"testing"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// TestDiagnoseScreen: the temperature shown is the calculator's inverse for
// the starting inputs, and switching to a fraction shows a mole fraction.
func TestDiagnoseScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newDiagnoseScreen(env)
	h := newHarness(t, image.Pt(412, 3600), s.Layout)
	air, _ := gasprops.ParseMixture("air")
	setup := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: 0.6, Radius: 0.012, Losses: resonator.WallLosses},
		Gas: air, Pressure: units.StandardAtmosphere, U: resonator.Uncertainty{Frequency: 2}}
	e, err := setup.DiagnoseTemperature(140)
	if err != nil {
		t.Fatal(err)
	}
	got, ok := h.shown("Mean gas temperature")
	if want := units.FormatPM(e.Value, e.Sigma, units.DimTemperature); !ok || got != want {
		t.Fatalf("temperature shown %q (found %v), want %q", got, ok, want)
	}
	h.retype("Measured resonance frequency", "140 Hz ± 2 Hz", "150 Hz")
	e, _ = setup.DiagnoseTemperature(150)
	if got, _ := h.shown("Mean gas temperature"); got != units.Format(e.Value, units.DimTemperature) {
		t.Fatalf("after typing 150 Hz: %q, want %q", got, units.Format(e.Value, units.DimTemperature))
	}
	if env.Bench.Frequency != 150 || env.Bench.FrequencyFrom != "What the pitch says" {
		t.Errorf("Bench has %v Hz from %q, want the measurement", env.Bench.Frequency, env.Bench.FrequencyFrom)
	}
	s.(*diagnoseScreen).form.Gas("gas").SetText("helium")
	s.(*diagnoseScreen).form.Invalidate()
	h.tap("Fraction of a second gas")
	h.frames(2)
	// helium with argon at the starting 20 degC = 293.15 K
	he, _ := gasprops.Lookup("helium")
	ar, _ := gasprops.Lookup("argon")
	setup.Temperature = 293.15
	setup.U = resonator.Uncertainty{}
	x, err := setup.DiagnoseFraction(he, ar, 150)
	if err != nil {
		t.Fatal(err)
	}
	if got, _ := h.shown("Mole fraction of argon"); got != units.Format(x.Value, units.DimNone) {
		t.Fatalf("mole fraction shown %q, want %q:\n%s", got, units.Format(x.Value, units.DimNone), h.dump())
	}
	if a, _ := h.shown("Answer"); a != units.Format(x.Value, units.DimNone) {
		t.Errorf("headline %q, want the mole fraction", a)
	}
}
