package gasprops

import (
	"math"

	"tubewright/calc/units"
)

// This file guards against states where a component would condense.

// vaporPressure returns the saturation pressure (Pa) of the species at T
// by the Lee–Kesler corresponding-states equation (Lee & Kesler, AIChE J.
// 21, 510, 1975; Poling, Prausnitz & O'Connell 2001, eq. 7-4.1):
//
//	ln(p/pc) = f0(Tr) + ω f1(Tr)
//	f0 = 5.92714 − 6.09648/Tr − 1.28862 ln Tr + 0.169347 Tr⁶
//	f1 = 15.2518 − 15.6875/Tr − 13.4721 ln Tr + 0.43577 Tr⁶
//
// usually within 1–2 % for non-polar fluids. Below the triple point
// (carbon dioxide 216.6 K, xenon 161.4 K, krypton 115.8 K) the equation is
// extrapolated and stands in for the sublimation pressure only roughly
// (carbon dioxide at 200 K: 2.4 bar from the equation, about 1.6 bar
// measured, from memory). ok is false above the
// critical temperature or when the species has no critical constants
// here (helium and hydrogen, critical below 35 K).
func (sp *Species) vaporPressure(T float64) (p float64, ok bool) {
	v := &sp.m.virial
	if v.kind != virialTsonopoulos || T >= v.tc {
		return 0, false
	}
	tr := T / v.tc
	lt := math.Log(tr)
	tr6 := tr * tr * tr
	tr6 *= tr6
	f0 := 5.92714 - 6.09648/tr - 1.28862*lt + 0.169347*tr6
	f1 := 15.2518 - 15.6875/tr - 13.4721*lt + 0.43577*tr6
	return v.pc * math.Exp(f0+v.omeg*f1), true
}

// checkCondensation refuses a state where the partial pressure x_i p of a
// component reaches its vapour pressure (the gas models do not apply to a
// liquid or a two-phase state), and warns above 80 % of it. It runs only
// below the highest critical temperature of the components (carbon
// dioxide 304 K, xenon 290 K, krypton 209 K ...).
func (m *Mixture) checkCondensation(t, pa float64, warn []string) ([]string, error) {
	for _, c := range m.comps[:m.n] {
		ps, ok := c.Species.vaporPressure(t)
		if !ok {
			continue
		}
		pp := c.X * pa
		switch {
		case pp >= ps:
			e := units.NewRangeError("pressure", pa, 0, ps/c.X, "Pa").Of(units.SubjectPressure)
			e.Why = c.Species.Name + " condenses at " + fmtK(t) + " above this pressure (Lee–Kesler vapour pressure); the gas models do not apply"
			return nil, e
		case pp >= 0.8*ps:
			warn = append(warn, c.Species.Name+" is within 20 % of its vapour pressure ("+
				fmtNum(ps/1e5)+" bar at "+fmtK(t)+"); near condensation the gas models lose accuracy")
		}
	}
	return warn, nil
}
