package ui

import (
	"image"
	"strings"
	"testing"

	"tubewright/calc/pore"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// wantDepth formats what the screen should show for δκ (kappa) or δν,
// computed directly with gasprops and calc/pore: the screen adds nothing.
func wantDepth(t *testing.T, gas string, T, p, f float64, kappa bool) string {
	t.Helper()
	m, err := gasprops.ParseMixture(gas)
	if err != nil {
		t.Fatal(err)
	}
	props, err := m.Properties(units.Temperature(T), units.Pressure(p), nil)
	if err != nil {
		t.Fatal(err)
	}
	dk, dn := pore.Depths(props, f)
	v := dn
	if kappa {
		v = dk
	}
	s, err := units.FormatIn(v, "mm")
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// newDepthsScreen builds the penetration-depth screen from its description
// (it has no extras).
func newDepthsScreen(env *Env) *sheetScreen {
	d, _ := sheet.Lookup(sheet.IDDepths)
	return newSheetScreen(d)(env).(*sheetScreen)
}

// TestDepthsScreen types a new frequency, takes a carried-over one on
// Enter, types a ± and a bad frequency, checking the shown depths against
// the library each time. The physics is checked in calc/pore against
// NIST-table values.
func TestDepthsScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newDepthsScreen(env)
	h := newHarness(t, image.Pt(412, 1800), s.Layout)

	// starting values: helium, 300 K and 100 Hz (the description's
	// examples), 1 atm (its default)
	got, ok := h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "helium", 300, 101325, 100, true); !ok || got != want {
		t.Fatalf("δκ shown %q (found %v), want %q", got, ok, want)
	}
	h.retype("Frequency", "100 Hz", "400 Hz")
	got, _ = h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "helium", 300, 101325, 400, true); got != want {
		t.Fatalf("δκ at 400 Hz shown %q, want %q", got, want)
	}
	got, _ = h.shown("Viscous penetration depth δν")
	if want := wantDepth(t, "helium", 300, 101325, 400, false); got != want {
		t.Fatalf("δν at 400 Hz shown %q, want %q", got, want)
	}
	// the frequency typed here is carried to the Bench for the next screen
	if env.Bench.Frequency != 400 || env.Bench.FrequencyFrom != "Penetration depths" {
		t.Errorf("Bench frequency %v from %q", env.Bench.Frequency, env.Bench.FrequencyFrom)
	}

	// A frequency carried over from another screen arrives on Enter.
	env.Bench.SetFrequency(431.7, "Tube resonance")
	s.Enter()
	h.frames(2)
	if txt := s.Form().Field("frequency").Text(); txt != "431.7 Hz" {
		t.Fatalf("frequency field reads %q after Enter", txt)
	}
	got, _ = h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "helium", 300, 101325, 431.7, true); got != want {
		t.Fatalf("δκ at 431.7 Hz shown %q, want %q", got, want)
	}

	// A typed ± is carried to the depths: δ ∝ f^-½, so 2 % on the
	// frequency is 1 % on δκ.
	h.retype("Frequency", "431.7 Hz", "400 Hz ± 8 Hz")
	got, _ = h.shown("Thermal penetration depth δκ")
	if !strings.Contains(got, "±") {
		t.Fatalf("δκ with a ± on the frequency shown %q", got)
	}

	// A bad frequency: error under the field, no stale result.
	h.retype("Frequency", "400 Hz ± 8 Hz", "-5 Hz")
	msg, ok := h.shown("Frequency error")
	if !ok || !strings.Contains(msg, "frequency") {
		t.Fatalf("error under the field = %q (found %v)", msg, ok)
	}
	if _, ok := h.shown("Thermal penetration depth δκ"); ok {
		t.Fatal("a depth is still shown with a bad frequency")
	}
}

// TestDepthsScreenTakesBench: gas, temperature and pressure used on another
// screen arrive on Enter.
func TestDepthsScreenTakesBench(t *testing.T) {
	env := NewEnv(nil)
	env.Bench.SetGas("argon")
	env.Bench.SetTemperature(350)
	env.Bench.SetPressure(2e5)
	s := newDepthsScreen(env)
	s.Enter()
	h := newHarness(t, image.Pt(412, 1800), s.Layout)
	got, _ := h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "argon", 350, 2e5, 100, true); got != want {
		t.Fatalf("δκ shown %q, want %q", got, want)
	}
}

// TestPoresTakesDepthsFrequency: the frequency typed on Penetration depths
// is the one Pores and packing starts from.
func TestPoresTakesDepthsFrequency(t *testing.T) {
	env := NewEnv(nil)
	depths := newDepthsScreen(env)
	h := newHarness(t, image.Pt(412, 1800), depths.Layout)
	h.retype("Frequency", "100 Hz", "250 Hz")
	pores := newPoresScreen(env).(*poresScreen)
	pores.Enter()
	if txt := pores.Form().Field("frequency").Text(); txt != "250 Hz" {
		t.Fatalf("pores frequency %q, want the 250 Hz typed on Penetration depths", txt)
	}
}
