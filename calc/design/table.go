package design

import (
	"math"

	"tubewright/calc/linear"
)

// tableGas speeds up the searches: it tabulates a gas at the design's one
// mean pressure on a grid of tableStep in temperature and interpolates
// linearly between grid points. Linear interpolation of a property that
// goes as T^n errs by about n(n-1) (ΔT/T)²/8, below 2e-6 for the density
// (n = -1) above 150 K on a 0.5 K grid: far below the 1e-5 tolerance of
// the search's solves. Outside the grid, at another pressure or where the
// gas model refused a grid point, it asks the gas itself. Final solves,
// and every figure reported, use the gas itself.
type tableGas struct {
	base linear.Gas
	p    float64 // Pa
	t0   float64 // K, first grid point
	rows []linear.GasState
}

const tableStep = 0.5 // K

// newTableGas tabulates base at pressure p (Pa) from tlo to thi (K),
// stopping at the first temperature the model refuses.
func newTableGas(base linear.Gas, p, tlo, thi float64) *tableGas {
	g := &tableGas{base: base, p: p, t0: tlo}
	for T := tlo; T <= thi; T += tableStep {
		s, err := base.State(T, p)
		if err != nil {
			if len(g.rows) == 0 {
				g.t0 = T + tableStep
				continue
			}
			break
		}
		g.rows = append(g.rows, s)
	}
	return g
}

// State implements linear.Gas.
func (g *tableGas) State(T, p float64) (linear.GasState, error) {
	x := (T - g.t0) / tableStep
	if p != g.p || !(x >= 0) || x >= float64(len(g.rows)-1) {
		return g.base.State(T, p)
	}
	i := int(x)
	f := x - float64(i)
	a, b := &g.rows[i], &g.rows[i+1]
	lerp := func(u, v float64) float64 { return u + f*(v-u) }
	return linear.GasState{
		Density:      lerp(a.Density, b.Density),
		SoundSpeed:   lerp(a.SoundSpeed, b.SoundSpeed),
		Gamma:        lerp(a.Gamma, b.Gamma),
		Cp:           lerp(a.Cp, b.Cp),
		Viscosity:    lerp(a.Viscosity, b.Viscosity),
		Conductivity: lerp(a.Conductivity, b.Conductivity),
	}, nil
}

// Name implements linear.Gas.
func (g *tableGas) Name() string { return g.base.Name() }

// searchGas returns the gas of the search's solves: a table of the gas
// model (Settings.Gas, or the target's mixture) at the mean pressure from
// tlo to thi (K).
func searchGas(set Settings, mix linear.MixtureGas, p, tlo, thi float64) linear.Gas {
	base := set.Gas
	if base == nil {
		base = mix
	}
	return newTableGas(base, p, math.Max(tlo, 1), thi)
}
