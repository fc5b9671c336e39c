package design

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/pore"
)

// TestPoresForMatchesPore: the pore sizes the design writes give back the
// hydraulic radius it chose when calc/pore builds them (Plates, Circular,
// Screens with the written porosity, Fibres with solid fraction 1 - φ),
// and the porosity of plates matches their thickness.
func TestPoresForMatchesPore(t *testing.T) {
	t.Parallel()
	const rh, wire = 0.2e-3, 0.1e-3
	for _, k := range StackKinds {
		p, phi, gap := poresFor(k, rh, wire)
		var s pore.Shape
		var err error
		switch k {
		case Plates:
			s, err = pore.Plates(p.HalfGap, p.Thickness)
			if err == nil && !scalar.EqualWithinRel(s.Porosity(), phi, 1e-12) {
				t.Errorf("plates: porosity %g from the thickness, %g written", s.Porosity(), phi)
			}
		case RoundPores:
			s, err = pore.CircularPores(p.Radius, phi)
		case Screens:
			s, err = pore.Screens(p.Mesh, p.WireDiameter, phi)
		case MetalWool:
			s, err = pore.Fibres(p.FibreDiameter, 1-phi)
		}
		if err != nil {
			t.Fatalf("%v: %v", k, err)
		}
		if !scalar.EqualWithinRel(s.HydraulicRadius(), rh, 1e-12) {
			t.Errorf("%v: calc/pore gives r_h %.6g m, the design chose %.6g m", k, s.HydraulicRadius(), rh)
		}
		if !(gap > 0) {
			t.Errorf("%v: gap %g", k, gap)
		}
	}
}

// TestShortStackEstimateNearSolver: the short-stack onset estimate that
// places the start (Swift 1988's boundary-layer work and wall loss, from
// memory of their form) agrees with the full linear onset of the finished
// design within 30 % of the temperature difference: the estimate neglects
// the hot space, the exchangers, the temperature dependence of the gas
// along the stack and the hot part of the standing wave.
func TestShortStackEstimateNearSolver(t *testing.T) {
	t.Parallel()
	for _, tg := range []Target{
		doneWhen,
		{Frequency: 150, Gas: "argon", MeanPressure: 4e5, HotTemperature: 900, Ambient: 295, Diameter: 0.04},
	} {
		r, err := Design(tg, &Settings{NoSensitivity: true})
		if err != nil {
			t.Fatal(err)
		}
		gas, _ := tg.validate()
		w, _ := newWave(&tg, gas)
		g := r.Geometry
		est := w.shortStackOnset(&tg, w.k*g.Centre(), g.Stack, g.HydraulicRadius, g.Porosity, g.Length())
		got := r.Onset.HotTemperature - tg.Ambient
		t.Logf("%s: short-stack %.1f K, solver %.1f K", tg.Gas, est, got)
		if math.Abs(est-got) > 0.3*got {
			t.Errorf("%s: short-stack estimate %.1f K, solver %.1f K", tg.Gas, est, got)
		}
	}
}
