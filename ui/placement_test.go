package ui

import (
	"image"
	"strings"
	"testing"

	"tubewright/calc/pore"
	"tubewright/calc/safety"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// newPlacementScreen builds the stack-placement screen from its
// description (it has no extras).
func newPlacementScreen(env *Env) Screen {
	d, _ := sheet.Lookup(sheet.IDPlacement)
	return newSheetScreen(d)(env)
}

// TestPlacementScreen types a stack position and checks kx and the
// displacement against calc/pore (whose formulas are checked there), and
// that the hot-parts caution is on screen with the critical temperature
// difference.
func TestPlacementScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newPlacementScreen(env)
	h := newHarness(t, image.Pt(412, 3000), s.Layout)
	h.retype("Stack centre, from the closed end (pressure antinode)", "0.3 m", "1.2 m")

	// starting values: helium, 300 K, 100 Hz, 80 mm, 3 % (examples), 1 atm
	m, _ := gasprops.ParseMixture("helium")
	p, err := m.Properties(300, 101325, nil)
	if err != nil {
		t.Fatal(err)
	}
	want, err := pore.PlaceStack(pore.PlacementInput{SoundSpeed: p.SoundSpeed, Density: p.Density, Gamma: p.Gamma,
		MeanTemperature: 300, MeanPressure: 101325, Frequency: 100, Centre: 1.2, Length: 0.08, DriveRatio: 0.03})
	if err != nil {
		t.Fatal(err)
	}
	if got, _ := h.shown("kx of the stack centre"); got != units.Format(want.KX, units.DimNone) {
		t.Errorf("kx shown %q, want %q", got, units.Format(want.KX, units.DimNone))
	}
	if got, _ := h.shown("Gas displacement amplitude ξ"); got != mustMM(t, want.Displacement) {
		t.Errorf("ξ shown %q, want %q", got, mustMM(t, want.Displacement))
	}
	if _, ok := h.shown("Critical temperature difference across the stack"); !ok {
		t.Fatal("no critical temperature difference")
	}
	all := nodeText(h.nodes()[0])
	for _, n := range h.nodes() {
		all += "\n" + n.Desc.Label
	}
	if !strings.Contains(all, safety.CautionHotSurfaces[:30]) {
		t.Error("the hot-parts caution is not on screen with the critical temperature difference")
	}

	// the advice follows the device chosen with a tap
	if a, _ := h.shown("Position advice"); a != pore.PositionAdvice(pore.Engine, want) {
		t.Errorf("engine advice shown %q", a)
	}
	h.tap("Heat pump or refrigerator")
	if a, _ := h.shown("Position advice"); a != pore.PositionAdvice(pore.HeatPump, want) {
		t.Errorf("heat-pump advice shown %q", a)
	}

	// a drive ratio of 150 % is refused under its field and nothing stale
	// stays
	h.retype("Drive ratio |p1|/pm at the pressure antinode", "3 %", "150 %")
	if msg, ok := h.shown("Drive ratio |p1|/pm at the pressure antinode error"); !ok || !strings.Contains(msg, "drive ratio") {
		t.Fatalf("error under the drive ratio = %q (found %v)", msg, ok)
	}
	if _, ok := h.shown("kx of the stack centre"); ok {
		t.Fatal("kx still shown after a bad drive ratio")
	}
}
