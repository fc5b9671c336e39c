package ui

import (
	"image"
	"math"
	"strings"
	"testing"

	"tubewright/calc/pore"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// TestPoresScreen picks shapes and roles with taps, types geometry, and
// checks the verdict and the rows against calc/pore directly (the
// geometry formulas are checked there against published formulas).
func TestPoresScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newPoresScreen(env).(*poresScreen)
	h := newHarness(t, image.Pt(412, 3600), s.Layout)

	// start: plates, 0.5 mm gap, 0.1 mm thick, helium 300 K 1 atm 100 Hz
	if got, ok := h.shown("Verdict for a stack"); !ok || got == "" {
		t.Fatalf("verdict %q (found %v)", got, ok)
	}
	plates, _ := pore.Plates(0.25e-3, 0.1e-3)
	if got, _ := h.shown("Porosity"); got != units.Format(plates.Porosity(), units.DimNone) {
		t.Errorf("porosity shown %q, want %q", got, units.Format(plates.Porosity(), units.DimNone))
	}
	// only the plates' inputs are shown
	if _, ok := h.byDesc("Pore diameter"); ok {
		t.Error("a round-pore input is shown for plates")
	}

	// a tighter gap: too tight, and the suggestion says what gap would do
	h.retype("Gap between plates 2y0", "0.5 mm", "0.1 mm")
	if got, _ := h.shown("Verdict for a stack"); !strings.Contains(got, "too tight") {
		t.Fatalf("verdict after 0.1 mm gap: %q", got)
	}
	if got, _ := h.shown("What would hit the aim"); !strings.Contains(got, "plates with gap 2y0 = ") || !strings.Contains(got, "(half gap y0 = ") {
		t.Fatalf("suggestion after 0.1 mm gap: %q", got)
	}

	// screens as a regenerator at 10 bar: 200 /in, 41 µm wire is about right
	h.retype("Mean pressure", "1 atm", "10 bar")
	h.tap("Woven screens")
	h.tap("Regenerator")
	if got, _ := h.shown("Verdict for a regenerator"); !strings.Contains(got, "about right") {
		t.Fatalf("verdict for screens: %q", got)
	}
	if got, _ := h.shown("What would hit the aim"); !strings.Contains(got, "mesh per inch") {
		t.Fatalf("suggestion for screens: %q", got)
	}
	if _, ok := h.byDesc("Gap between plates 2y0"); ok {
		t.Error("the plates' gap is still shown for screens")
	}
	screens, _ := pore.Screens(200/0.0254, 41e-6, 0)
	if got, _ := h.shown("Hydraulic radius r_h"); got != mustMM(t, screens.HydraulicRadius()) {
		t.Errorf("r_h shown %q, want %q", got, mustMM(t, screens.HydraulicRadius()))
	}
	if w := strings.Join(s.form.Results.Warnings(), " "); !strings.Contains(w, "approximation") {
		t.Errorf("no approximation warning for screens: %q", w)
	}

	// impossible screens: the error under the wire names the mesh pitch
	h.retype("Wire diameter", "41 um", "0.2 mm")
	if msg, ok := h.shown("Wire diameter error"); !ok || !strings.Contains(msg, "wire diameter") || !strings.Contains(msg, "mesh pitch") {
		t.Fatalf("error for overlapping wires: %q (found %v)", msg, ok)
	}
	if _, ok := h.shown("Verdict for a regenerator"); ok {
		t.Fatal("a verdict is still shown for impossible screens")
	}

	// metal wool by mass: steel, 30 g in 50 cm³
	h.tap("Metal wool / fibres")
	h.tap("Packed mass")
	fib, _ := pore.FibresFromMass(25e-6, 0.03, 7900, 50e-6)
	if got, _ := h.shown("Porosity"); got != units.Format(fib.Porosity(), units.DimNone) {
		t.Errorf("metal wool porosity shown %q, want %q", got, units.Format(fib.Porosity(), units.DimNone))
	}
	// the mass that hits the aim, fed back, gives the aimed-for r_h
	v, err := pore.Judge(fib, pore.RoleRegenerator, heliumDK(t, 300, 1e6, 100))
	if err != nil {
		t.Fatal(err)
	}
	target := 0.03 * pore.SolidFractionFor(25e-6, v.TargetRh) / (1 - fib.Porosity())
	if got, _ := h.shown("Packed mass for the aim, same volume"); got != mustIn(t, target, "g") {
		t.Errorf("target mass shown %q, want %q", got, mustIn(t, target, "g"))
	}
	back, err := pore.FibresFromMass(25e-6, target, 7900, 50e-6)
	if err != nil || math.Abs(back.HydraulicRadius()/v.TargetRh-1) > 1e-9 {
		t.Errorf("target mass %g kg gives r_h %v, aim %g (%v)", target, back.HydraulicRadius(), v.TargetRh, err)
	}

	// back to screens: the wire typed before comes back with its shape
	h.tap("Woven screens")
	if txt := s.form.Field("wire-diameter").Text(); txt != "0.2 mm" {
		t.Errorf("wire diameter after coming back to screens: %q", txt)
	}
}

// heliumDK returns δκ of helium at T (K), p (Pa) and f (Hz), from the
// library.
func heliumDK(t *testing.T, T, p, f float64) float64 {
	t.Helper()
	m, _ := gasprops.ParseMixture("helium")
	props, err := m.Properties(units.Temperature(T), units.Pressure(p), nil)
	if err != nil {
		t.Fatal(err)
	}
	dk, _ := pore.Depths(props, f)
	return dk
}

func mustIn(t *testing.T, v float64, unit string) string {
	t.Helper()
	s, err := units.FormatIn(v, unit)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func mustMM(t *testing.T, v float64) string {
	t.Helper()
	s, err := units.FormatIn(v, "mm")
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// TestScreenshotPoresScreens pictures the pores screen judging woven
// screens as a regenerator (SHOT_DIR=... to keep the pictures).
func TestScreenshotPoresScreens(t *testing.T) {
	env := NewEnv(nil)
	s := newPoresScreen(env).(*poresScreen)
	s.form.SetText("shape", "screens")
	s.form.SetText("role", "regenerator")
	s.form.SetText("pressure", "10 bar")
	s.sync()
	shoot(t, "pores-screens", env, s)
}
