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
		e := units.NewRangeError("temperature", t, lo*(1-warnMargin), hi*(1+warnMargin), "K").Of(units.SubjectTemperature)
		e.Why = who.m.source
		return nil, e
	}
	side := "below"
	if t > hi {
		side = "above"
	}
	return []string{"temperature " + fmtK(t) + " is " + side + " the validated range " +
		fmtNum(lo) + "–" + fmtK(hi) + " of the " + who.m.source + "; results are extrapolated"}, nil
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

func fmtK(t float64) string { return fmtNum(t) + " K" }

func fmtNum(v float64) string { return units.Number(v, 4) }

// nonIdealLimit is the largest |B p/(R T)| for which the second-virial
// correction is applied; beyond it the truncated series is no estimate at
// all and Properties refuses the pressure.
const nonIdealLimit = 0.25

// nonIdealWarnAt is the |B p/(R T)| above which Properties warns: in ideal
// mode that the ideal-gas density is off by that much, in non-ideal mode
// that higher virial terms start to matter.
const nonIdealWarnAt = 0.02

// checkPressure looks at the gas's departure from ideality at (t, pa) and
// returns warnings to append, or a *units.RangeError when the non-ideal
// option is on and the pressure is beyond nonIdealLimit. Below 0.5 MPa it
// returns at once (|Bp/RT| < 0.02 there for every gas here above 200 K
// except carbon dioxide and xenon near 200 K, for which the warning is
// then merely skipped).
func (m *Mixture) checkPressure(t, pa float64, nonIdeal bool, warn []string) ([]string, error) {
	if pa < 5e5 {
		return warn, nil
	}
	b, ok := m.SecondVirial(t)
	if !ok {
		if nonIdeal {
			warn = append(warn, "no second virial coefficient is available for "+m.String()+
				"; density and sound speed are ideal-gas values")
		}
		return warn, nil
	}
	d := b * pa / (R * t)
	switch {
	case nonIdeal && math.Abs(d) > nonIdealLimit:
		e := units.NewRangeError("pressure", pa, 0, nonIdealLimit*R*t/math.Abs(b), "Pa").Of(units.SubjectPressure)
		e.Why = "the second-virial correction for " + m.String() + " holds only while |Bp/RT| ≤ " +
			units.Number(nonIdealLimit, 2) + "; denser gas is close to condensing or supercritical"
		return nil, e
	case math.Abs(d) > nonIdealWarnAt && !nonIdeal:
		warn = append(warn, "at this pressure the real gas departs from the ideal gas by about "+
			strconv.FormatFloat(math.Abs(100*d), 'f', 1, 64)+" % in density; turn on the non-ideal correction")
	case math.Abs(d) > nonIdealWarnAt:
		warn = append(warn, "at this pressure the gas departs from the ideal gas by about "+
			strconv.FormatFloat(math.Abs(100*d), 'f', 1, 64)+" %; the second-virial correction is a first-order estimate")
	}
	return warn, nil
}
