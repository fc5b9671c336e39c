package resonator

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// checkPositive returns a *positiveError (which is a *units.RangeError
// for errors.As) unless v is finite and > 0.
func checkPositive(field string, v float64, unit string) error {
	if !(v > 0) || math.IsInf(v, 0) {
		return &positiveError{units.NewRangeError(field, v, 0, math.Inf(1), unit)}
	}
	return nil
}

// positiveError is a *units.RangeError for a value that must be positive
// and finite. Its message says so plainly ("length 0 m must be greater
// than zero") instead of the RangeError's "must be at least 0 m", which
// reads as if 0 m were allowed.
type positiveError struct{ *units.RangeError }

func (e *positiveError) Error() string {
	r := e.RangeError
	if math.IsNaN(r.Value) || math.IsInf(r.Value, 0) {
		return r.Field + " " + fmt.Sprintf("%+v", r.Value) + " is not a finite number"
	}
	return r.Field + " " + units.FormatSI(r.Value, r.Unit) + " must be greater than zero"
}

func (e *positiveError) Unwrap() error { return e.RangeError }

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
