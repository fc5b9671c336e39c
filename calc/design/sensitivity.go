package design

import (
	"math"

	"gonum.org/v1/gonum/diff/fd"
	"gonum.org/v1/gonum/mat"

	"tubewright/calc/linear"
)

// Sensitivity is one row of the sensitivity table: how the onset
// temperature and frequency of the built design move with one quantity.
type Sensitivity struct {
	Key      string  // "position", "stack_length", "hydraulic_radius", "mean_pressure"
	Quantity string  // in words, with what is held fixed
	Unit     string  // SI unit of the quantity: "m" or "Pa"
	Value    float64 // the design's value, in Unit
	Step     float64 // the step people read the table for, in Unit
	// DOnset and DFrequency are the derivatives, K and Hz per Unit, by
	// central differences (gonum diff/fd, Jacobian with the central
	// formula) over ± half the step.
	DOnset, DFrequency float64
	// OnsetChange and FrequencyChange are the derivatives times Step:
	// the change over one step, K and Hz.
	OnsetChange, FrequencyChange float64
}

// sensitivity differentiates the onset of the written device with respect
// to the stack position (the stack with its exchangers moved along a tube
// of fixed length), the stack length (other parts unchanged, so the tube
// grows), the hydraulic radius (the pores scaled, porosity by the kind's
// rule) and the mean pressure. Steps: 1 mm, 1 mm, 2 % of r_h, 2 % of the
// pressure.
func (sv *solver) sensitivity(res *Result) ([]Sensitivity, error) {
	t := sv.t
	g0 := res.Geometry
	rows := []Sensitivity{
		{Key: "position", Quantity: "stack position (stack and exchangers moved, tube length kept)", Unit: "m", Value: g0.Position(), Step: 1e-3},
		{Key: "stack_length", Quantity: "stack length (other parts kept, so the tube grows)", Unit: "m", Value: g0.Stack, Step: 1e-3},
		{Key: "hydraulic_radius", Quantity: "stack hydraulic radius (pore size)", Unit: "m", Value: g0.HydraulicRadius, Step: 0.02 * g0.HydraulicRadius},
		{Key: "mean_pressure", Quantity: "mean pressure", Unit: "Pa", Value: t.MeanPressure, Step: 0.02 * t.MeanPressure},
	}
	var failed error
	base := res.Onset
	f := func(y, x []float64) {
		g := g0
		g.HotSpace += x[0] * rows[0].Step
		g.Resonator -= x[0] * rows[0].Step
		g.Stack += x[1] * rows[1].Step
		rh := g0.HydraulicRadius + x[2]*rows[2].Step
		g.Pores, g.Porosity, g.Gap = poresFor(t.Stack, rh, t.wire())
		g.HydraulicRadius = rh
		d := t.device(g, sv.gas)
		d.MeanPressure = t.MeanPressure + x[3]*rows[3].Step
		sv.solves++
		r, err := linear.Onset(d, &linear.Settings{Gas: sv.set.Gas, NoProfile: true, HotGuess: base.HotTemperature, FrequencyGuess: base.Frequency})
		if err != nil {
			failed = err
			y[0], y[1] = math.NaN(), math.NaN()
			return
		}
		y[0], y[1] = r.HotTemperature, r.Frequency
	}
	jac := mat.NewDense(2, 4, nil)
	fd.Jacobian(jac, f, make([]float64, 4), &fd.JacobianSettings{Formula: fd.Central, Step: 0.5})
	if failed != nil {
		return nil, failed
	}
	for j := range rows {
		r := &rows[j]
		r.OnsetChange, r.FrequencyChange = jac.At(0, j), jac.At(1, j)
		r.DOnset, r.DFrequency = r.OnsetChange/r.Step, r.FrequencyChange/r.Step
	}
	return rows, nil
}
