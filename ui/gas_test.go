package ui

import (
	"image"
	"strings"
	"testing"

	"gioui.org/layout"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// wantGas formats what the gas screen should show for a property, computed
// directly with gasprops (the screen must add nothing of its own).
func wantGas(t *testing.T, gas string, T, p float64, pick func(gasprops.Properties) float64, unit string) string {
	t.Helper()
	m, err := gasprops.ParseMixture(gas)
	if err != nil {
		t.Fatal(err)
	}
	props, err := m.Properties(units.Temperature(T), units.Pressure(p), &gasprops.Options{})
	if err != nil {
		t.Fatal(err)
	}
	s, err := units.FormatIn(pick(props), unit)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func soundSpeed(p gasprops.Properties) float64 { return p.SoundSpeed }

// newGasScreen builds the working-gas screen from its description.
func newGasScreen(env *Env) Screen {
	s, _ := sheet.Lookup(sheet.IDGas)
	return newSheetScreen(s)(env)
}

// TestGasScreenTyping drives the working-gas screen through the input
// router: it types a temperature, checks the shown sound speed against
// gasprops directly, then types a bad value and checks the error under the
// field. The physics is gasprops' (checked there against CRC and NIST
// tables); this test checks that the screen passes the typed values through
// with their units and shows the result unchanged.
func TestGasScreenTyping(t *testing.T) {
	env := NewEnv(nil)
	s := newGasScreen(env)
	h := newHarness(t, image.Pt(412, 1600), s.Layout)

	// 300 K and 1 atm = 101325 Pa are the screen's starting values (the
	// description's example and default).
	got, ok := h.shown("Sound speed")
	if want := wantGas(t, "helium", 300, 101325, soundSpeed, "m/s"); !ok || got != want {
		t.Fatalf("initial sound speed shown %q (found %v), want %q", got, ok, want)
	}
	before := got

	// 327 degC = 600.15 K (ITS-90 offset 273.15, BIPM SI Brochure 2019, 2.3.1).
	h.retype("Temperature", "300 K", "327 degC")
	got, _ = h.shown("Sound speed")
	if want := wantGas(t, "helium", 600.15, 101325, soundSpeed, "m/s"); got != want {
		t.Fatalf("sound speed at 327 degC shown %q, want %q", got, want)
	}
	if got == before {
		t.Fatalf("sound speed did not change after typing a new temperature (%q)", got)
	}
	if env.Bench.Temperature != 600.15 {
		t.Errorf("Bench.Temperature = %v, want 600.15 K", env.Bench.Temperature)
	}

	// A temperature in an unknown unit: the error names the field and the
	// input, and no stale result stays on screen.
	h.retype("Temperature", "327 degC", "327 degQ")
	msg, ok := h.shown("Temperature error")
	if !ok || !strings.Contains(msg, "Temperature") || !strings.Contains(msg, "327 degQ") {
		t.Fatalf("error under the field = %q (found %v); want it to name Temperature and 327 degQ", msg, ok)
	}
	if _, ok := h.shown("Sound speed"); ok {
		t.Fatal("a sound speed is still shown with a bad temperature")
	}

	// Pressure in psi with a real-gas-free model leaves the ideal sound
	// speed unchanged; density follows p. 145.0377 psi = 1e6 Pa (NIST SP
	// 811, 2008, B.8: 1 psi = 6894.757 Pa).
	h.retype("Temperature", "327 degQ", "300 K")
	h.retype("Mean pressure", "1 atm", "145.0377 psi")
	got, _ = h.shown("Density")
	want := wantGas(t, "helium", 300, 145.0377*6894.757, func(p gasprops.Properties) float64 { return p.Density }, "kg/m3")
	if got != want {
		t.Fatalf("density at 145.0377 psi shown %q, want %q", got, want)
	}
}

// TestGasScreenMixture picks a helium-argon mixture with the chips and the
// fraction field and checks the shown molar mass against gasprops.
func TestGasScreenMixture(t *testing.T) {
	env := NewEnv(nil)
	s := newGasScreen(env)
	h := newHarness(t, image.Pt(412, 2000), s.Layout)
	h.tap("Noble mixture")
	h.frames(2)
	// The picker starts a mixture at helium + 0.3 argon.
	h.retype("Mole fraction of the second gas", "0.3", "40 %")
	got, _ := h.shown("Molar mass")
	want := wantGas(t, "helium:0.6,argon:0.4", 300, 101325, func(p gasprops.Properties) float64 { return p.MolarMass }, "g/mol")
	if got != want {
		t.Fatalf("molar mass of He 60 %% + Ar 40 %% shown %q, want %q", got, want)
	}
	if env.Bench.Gas != "helium:0.6,argon:0.4" {
		t.Errorf("Bench.Gas = %q", env.Bench.Gas)
	}
	h.retype("Mole fraction of the second gas", "40 %", "1.4")
	if msg, ok := h.shown("No result"); !ok || !strings.Contains(msg, "mole fraction") {
		t.Fatalf("fraction 1.4 gave %q (found %v), want a range message", msg, ok)
	}
}

// TestGasScreenTakesBench checks that the screen takes the gas and
// temperature another screen left on the Bench when it comes to the top.
func TestGasScreenTakesBench(t *testing.T) {
	a := NewApp(nil)
	a.env.Bench.SetGas("xenon")
	a.env.Bench.SetTemperature(350)
	a.Open("gas")
	h := newHarness(t, image.Pt(412, 1600), func(gtx layout.Context) layout.Dimensions { return a.Layout(gtx) })
	got, _ := h.shown("Sound speed")
	if want := wantGas(t, "xenon", 350, 101325, soundSpeed, "m/s"); got != want {
		t.Fatalf("sound speed shown %q, want xenon at 350 K: %q", got, want)
	}
}

// TestScreenshotGasStates pictures the gas screen with a helium-xenon
// mixture, and with a bad pressure, for looking at the error styling.
func TestScreenshotGasStates(t *testing.T) {
	env := NewEnv(nil)
	s := newGasScreen(env).(*sheetScreen)
	s.form.SetText("gas", "helium:0.7,xenon:0.3")
	s.form.SetText("pressure", "10 bar")
	shoot(t, "gas-mixture", env, s)

	env = NewEnv(nil)
	s = newGasScreen(env).(*sheetScreen)
	s.form.SetText("pressure", "10 bra")
	shoot(t, "gas-error", env, s)
}

// TestGasScreenModelRange checks that the screen states the validated
// temperature range of the chosen gas's model, as gasprops gives it
// (Species.Range; the ranges and their sources are in gasprops/doc.go), and
// that the line follows the chosen gas.
func TestGasScreenModelRange(t *testing.T) {
	env := NewEnv(nil)
	s := newGasScreen(env)
	h := newHarness(t, image.Pt(412, 2400), s.Layout)
	var seen []string
	for _, c := range []struct {
		tap, gas string // chip to tap first ("" for the starting gas) and the gas it picks
	}{
		{"", "helium"},
		{"Xenon", "xenon"},
		{"Carbon dioxide", "carbon dioxide"},
	} {
		if c.tap != "" {
			h.tap(c.tap)
		}
		sp, err := gasprops.Lookup(c.gas)
		if err != nil {
			t.Fatal(err)
		}
		lo, hi := sp.Range()
		got, ok := h.shown("Model range")
		if !ok {
			t.Fatalf("%s: no model-range note on screen", c.gas)
		}
		for _, w := range []string{units.Format(lo, units.DimTemperature), units.Format(hi, units.DimTemperature)} {
			if !strings.Contains(got, w) {
				t.Errorf("%s: model-range note %q does not name %s", c.gas, got, w)
			}
		}
		seen = append(seen, got)
	}
	// xenon (3000 K) and carbon dioxide (1100 K) have other upper bounds
	// than helium (5000 K) in gasprops/doc.go: the line must change.
	if seen[0] == seen[1] || seen[1] == seen[2] {
		t.Errorf("model-range note did not follow the gas: %q", seen)
	}
}
