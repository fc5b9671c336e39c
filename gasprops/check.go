package gasprops

import (
	"math"
	"strconv"

	"tubewright/calc/units"
)

// This file checks states against the models' validated ranges.

// warnMargin is how far outside a model's validated temperature range
// (as a fraction of the bound) a state is still evaluated, with a warning.
const warnMargin = 0.2

// checkTemperature returns a warning for a temperature mildly outside the
// mixture's validated range, or a *units.RangeError for one far outside it
// (more than warnMargin beyond a bound) or not finite. In range it returns
// (nil, nil) and does not allocate.
func (m *Mixture) checkTemperature(t float64) ([]string, error) {
	lo, hi, who := m.limits(t)
	if t >= lo && t <= hi {
		return nil, nil
	}
	if !(t > lo*(1-warnMargin)) || !(t < hi*(1+warnMargin)) {
		e := units.NewRangeError("temperature", t, lo*(1-warnMargin), hi*(1+warnMargin), "K")
		e.Why = who.m.source
		return nil, e
	}
	side := "below"
	if t > hi {
		side = "above"
	}
	return []string{"temperature " + fmtK(t) + " is " + side + " the validated range " +
		fmtK(lo) + "–" + fmtK(hi) + " of the " + who.m.source + "; results are extrapolated"}, nil
}

// limits returns the validated range and the species whose model sets the
// bound on the side of t (the first component when several tie).
func (m *Mixture) limits(t float64) (lo, hi float64, who *Species) {
	lo, hi = 0, math.Inf(1)
	whoLo, whoHi := m.comps[0].Species, m.comps[0].Species
	for _, c := range m.comps[:m.n] {
		if c.Species.m.tmin > lo {
			lo, whoLo = c.Species.m.tmin, c.Species
		}
		if c.Species.m.tmax < hi {
			hi, whoHi = c.Species.m.tmax, c.Species
		}
	}
	if t < lo {
		return lo, hi, whoLo
	}
	return lo, hi, whoHi
}

func fmtK(t float64) string {
	return strconv.FormatFloat(t, 'g', 4, 64) + " K"
}
