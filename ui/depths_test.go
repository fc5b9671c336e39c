package ui

import (
	"image"
	"strings"
	"testing"

	"tubewright/calc/pore"
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

// TestDepthsScreen types a new frequency and takes a carried-over one in
// one tap, checking the shown depths against the library each time. The
// physics is checked in calc/pore against NIST-table values.
func TestDepthsScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newDepthsScreen(env).(*depthsScreen)
	h := newHarness(t, image.Pt(412, 1800), s.Layout)

	// starting values: helium, 300 K, 10 bar, 100 Hz
	got, ok := h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "helium", 300, 1e6, 100, true); !ok || got != want {
		t.Fatalf("δκ shown %q (found %v), want %q", got, ok, want)
	}
	h.retype("Frequency", "100 Hz", "400 Hz")
	got, _ = h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "helium", 300, 1e6, 400, true); got != want {
		t.Fatalf("δκ at 400 Hz shown %q, want %q", got, want)
	}
	got, _ = h.shown("Viscous penetration depth δν")
	if want := wantDepth(t, "helium", 300, 1e6, 400, false); got != want {
		t.Fatalf("δν at 400 Hz shown %q, want %q", got, want)
	}

	// A frequency carried over from another screen is one tap away.
	env.Bench.SetFrequency(431.7, "Tube resonance")
	s.Enter()
	h.frames(2)
	h.tap("Use 431.7 Hz from Tube resonance")
	if txt := s.op.freq.Text(); txt != "431.7 Hz" {
		t.Fatalf("frequency field reads %q after the tap", txt)
	}
	got, _ = h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "helium", 300, 1e6, 431.7, true); got != want {
		t.Fatalf("δκ at 431.7 Hz shown %q, want %q", got, want)
	}
	if _, ok := h.control("Use 431.7 Hz from Tube resonance"); ok {
		t.Error("the button stays after the frequency was taken")
	}

	// A bad frequency: error under the field, no stale result.
	h.retype("Frequency", "431.7 Hz", "-5 Hz")
	msg, ok := h.shown("Frequency error")
	if !ok || !strings.Contains(msg, "Frequency") {
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
	s := newDepthsScreen(env).(*depthsScreen)
	s.Enter()
	h := newHarness(t, image.Pt(412, 1800), s.Layout)
	got, _ := h.shown("Thermal penetration depth δκ")
	if want := wantDepth(t, "argon", 350, 2e5, 100, true); got != want {
		t.Fatalf("δκ shown %q, want %q", got, want)
	}
}
