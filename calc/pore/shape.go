package pore

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// Shape is one pore geometry: its hydraulic radius, its porosity and Rott's
// function f for a given penetration depth.
type Shape interface {
	// HydraulicRadius returns r_h = gas volume / wetted area (m).
	HydraulicRadius() float64
	// Porosity returns the gas volume fraction of the packing, in (0, 1].
	Porosity() float64
	// F returns Rott's f for penetration depth delta (m): pass δκ for fκ,
	// δν for fν. Swift's exp(+iωt) convention (see the package doc).
	// delta must be positive and finite; otherwise the result is NaN.
	F(delta float64) complex128
}

// Named is implemented by every shape of this package: a short description
// for people, e.g. "parallel plates, gap 0.5 mm".
type Named interface {
	Describe() string
}

// positive returns a RangeError unless v is a positive finite length.
func positive(field string, v float64) error {
	if !(v > 0) || math.IsInf(v, 0) {
		return units.NewRangeError(field, v, 0, math.Inf(1), "m")
	}
	return nil
}

// nonNegative returns a RangeError unless v is finite and >= 0.
func nonNegative(field string, v float64, unit string) error {
	if !(v >= 0) || math.IsInf(v, 0) {
		return units.NewRangeError(field, v, 0, math.Inf(1), unit)
	}
	return nil
}

// geometryError reports geometry that cannot exist, naming the inputs.
type geometryError struct{ msg string }

func (e *geometryError) Error() string { return e.msg }

// impossible returns a geometryError with a formatted message.
func impossible(format string, a ...any) error {
	return &geometryError{fmt.Sprintf(format, a...)}
}

// badDelta reports whether delta cannot be used.
func badDelta(delta float64) bool { return !(delta > 0) || math.IsInf(delta, 0) }

// mm formats a length in millimetres for descriptions.
func mm(v float64) string {
	s, err := units.FormatIn(v, "mm")
	if err != nil {
		return units.Format(v, units.DimLength)
	}
	return s
}

// trimFloat formats v with 4 significant digits and no trailing zeros.
func trimFloat(v float64) string {
	return units.Number(v, 4)
}

// unitsRangeUnit is a RangeError with a unit.
func unitsRangeUnit(field string, v, lo, hi float64, unit string) error {
	return units.NewRangeError(field, v, lo, hi, unit)
}

// checked returns s unless its porosity or hydraulic radius cannot be
// represented (extreme inputs), in which case it returns an error.
func checked(s Shape) (Shape, error) {
	phi, rh := s.Porosity(), s.HydraulicRadius()
	if !(phi > 0 && phi <= 1) {
		return nil, units.NewRangeError("porosity", phi, 0, 1, "")
	}
	if !finitePositive(rh) {
		return nil, units.NewRangeError("hydraulic radius", rh, 0, math.MaxFloat64, "m")
	}
	return s, nil
}
