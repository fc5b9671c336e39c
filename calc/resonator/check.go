package resonator

import (
	"errors"
	"math"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// checkPositive returns a RangeError unless v is finite and > 0.
func checkPositive(field string, v float64, unit string) error {
	if !(v > 0) || math.IsInf(v, 0) {
		e := units.NewRangeError(field, v, 0, math.Inf(1), unit)
		e.Why = "must be positive"
		return e
	}
	return nil
}

// checkRange returns a RangeError unless lo <= v <= hi.
func checkRange(field string, v, lo, hi float64, unit string) error {
	if !(v >= lo && v <= hi) {
		return units.NewRangeError(field, v, lo, hi, unit)
	}
	return nil
}

// errIncomplete is returned when gas properties lack what a model needs.
var errIncomplete = errors.New("resonator: gas properties incomplete (sound speed, density, γ, viscosity and diffusivity are needed)")

func checkProps(g gasprops.Properties) error {
	for _, v := range []float64{g.SoundSpeed, g.Density, g.KinematicViscosity, g.ThermalDiffusivity} {
		if !(v > 0) || math.IsInf(v, 0) {
			return errIncomplete
		}
	}
	if !(g.Gamma > 1 && g.Gamma < 2) {
		return errIncomplete
	}
	return nil
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
