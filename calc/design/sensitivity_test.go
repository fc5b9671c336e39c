package design

import (
	"math"
	"testing"

	"tubewright/calc/linear"
)

// TestSensitivityAgainstResolves: each row of the sensitivity table (central
// differences through gonum diff/fd) matches re-solves of the changed
// device half a step either side, built here independently of the
// table's code, within 10 % or 0.02 K / 0.002 Hz where the change is tiny.
// Signs from physics: a longer stack lengthens the tube, so the frequency
// falls (tube frequency goes as one over length, common practice).
func TestSensitivityAgainstResolves(t *testing.T) {
	t.Parallel()
	r := designed(t)
	if len(r.Sensitivity) != 4 {
		t.Fatalf("%d sensitivity rows, want 4", len(r.Sensitivity))
	}
	gas, err := doneWhen.validate()
	if err != nil {
		t.Fatal(err)
	}
	solve := func(key string, step float64) *linear.OnsetResult {
		g := r.Geometry
		pm := doneWhen.MeanPressure
		switch key {
		case "position":
			g.HotSpace += step
			g.Resonator -= step
		case "stack_length":
			g.Stack += step
		case "hydraulic_radius":
			rh := g.HydraulicRadius + step
			g.Pores, g.Porosity, g.Gap = poresFor(doneWhen.Stack, rh, doneWhen.wire())
			g.HydraulicRadius = rh
		case "mean_pressure":
			pm += step
		default:
			t.Fatalf("unknown row %q", key)
		}
		d := doneWhen.device(g, gas)
		d.MeanPressure = pm
		on, err := linear.Onset(d, nil)
		if err != nil {
			t.Fatalf("%s: %v", key, err)
		}
		return on
	}
	for _, row := range r.Sensitivity {
		up, down := solve(row.Key, row.Step/2), solve(row.Key, -row.Step/2)
		dT := up.HotTemperature - down.HotTemperature
		df := up.Frequency - down.Frequency
		if math.Abs(dT-row.OnsetChange) > math.Max(0.1*math.Abs(dT), 0.02) {
			t.Errorf("%s: onset change %.4f K per step, re-solve %.4f K", row.Key, row.OnsetChange, dT)
		}
		if math.Abs(df-row.FrequencyChange) > math.Max(0.1*math.Abs(df), 0.002) {
			t.Errorf("%s: frequency change %.5f Hz per step, re-solve %.5f Hz", row.Key, row.FrequencyChange, df)
		}
		if !(math.Abs(row.DOnset*row.Step-row.OnsetChange) <= 1e-9*math.Abs(row.OnsetChange)+1e-12) {
			t.Errorf("%s: derivative and change disagree", row.Key)
		}
	}
	if row := r.Sensitivity[1]; row.DFrequency >= 0 {
		t.Errorf("a longer stack should lower the frequency: %g Hz/m", row.DFrequency)
	}
}
