package ui

import (
	"image"
	"math"
	"strings"
	"testing"

	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// TestPoresScreen picks shapes and roles with taps, types geometry, and
// checks the verdict card and the rows against calc/pore directly (the
// geometry formulas are checked there against published formulas).
func TestPoresScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newPoresScreen(env).(*poresScreen)
	h := newHarness(t, image.Pt(412, 3000), s.Layout)

	// start: plates, 0.5 mm gap, 0.1 mm thick, helium 300 K 10 bar 100 Hz
	card, ok := h.shown("Verdict")
	if !ok || !strings.Contains(card, "About right for a stack") {
		t.Fatalf("verdict card %q (found %v)", card, ok)
	}
	plates, _ := pore.Plates(0.25e-3, 0.1e-3)
	if got, _ := h.shown("Porosity"); got != units.Format(plates.Porosity(), units.DimNone) {
		t.Errorf("porosity shown %q, want %q", got, units.Format(plates.Porosity(), units.DimNone))
	}

	// a tighter gap: too tight, and the card says what gap would do
	h.retype("Gap between plates", "0.5 mm", "0.2 mm")
	card, _ = h.shown("Verdict")
	if !strings.Contains(card, "Too tight for a stack") || !strings.Contains(card, "plate spacing (gap)") {
		t.Fatalf("verdict card after 0.2 mm gap: %q", card)
	}

	// screens as a regenerator: 200 /in, 41 µm wire is about right
	h.tap("Woven screens")
	h.tap("Regenerator")
	card, _ = h.shown("Verdict")
	if !strings.Contains(card, "About right for a regenerator") || !strings.Contains(card, "mesh per inch") {
		t.Fatalf("verdict card for screens: %q", card)
	}
	screens, _ := pore.Screens(200/0.0254, 41e-6, 0)
	if got, _ := h.shown("Hydraulic radius r_h"); got != mustMM(t, screens.HydraulicRadius()) {
		t.Errorf("r_h shown %q, want %q", got, mustMM(t, screens.HydraulicRadius()))
	}
	if w := strings.Join(s.results.Warnings(), " "); !strings.Contains(w, "approximation") {
		t.Errorf("no approximation warning for screens: %q", w)
	}

	// impossible screens: the failure names the wire and the pitch
	h.retype("Wire diameter", "41 um", "0.2 mm")
	if f := s.results.Failure(); !strings.Contains(f, "wire diameter") || !strings.Contains(f, "mesh pitch") {
		t.Fatalf("failure for overlapping wires: %q", f)
	}
	if _, ok := h.shown("Verdict"); ok {
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
	role, _ := pore.ParseRole(s.role.Selected()) // regenerator, tapped above
	v, err := pore.Judge(fib, role, s.results2dk(t))
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
}

// results2dk returns δκ at the screen's starting operating point (helium,
// 300 K, 10 bar, 100 Hz), from the library.
func (s *poresScreen) results2dk(t *testing.T) float64 {
	t.Helper()
	st, err := s.op.evaluate()
	if err != nil {
		t.Fatal(err)
	}
	return st.dk
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
	s.shape.Select("screens")
	s.role.Select("regenerator")
	s.dirty = true
	shoot(t, "pores-screens", env, s)
}
