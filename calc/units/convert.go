package units

import "errors"

// This file converts numbers between SI and the units of the table.

// ErrUnknownUnit is returned (wrapped) by the conversion functions for a
// unit they do not know.
var ErrUnknownUnit = errors.New("unknown unit")

// resolve finds unit among every dimension (first match in Dimension
// order) or within d when d is valid and byDim is set.
func resolve(unit string, d Dimension, byDim bool) (*unitDef, error) {
	if byDim && !d.valid() {
		panic("calc: units: unknown Dimension")
	}
	def := lookupUnit(unit, d, !byDim)
	if def == nil {
		if byDim {
			return nil, &ParseError{Input: unit, Dim: d, Msg: "is not " + article(d.String()) + " " + d.String() + " unit", Accepted: Units(d), Err: ErrUnknownUnit}
		}
		return nil, &ParseError{Input: unit, Dim: DimNone, Msg: "is not a unit this program knows", Err: ErrUnknownUnit}
	}
	return def, nil
}

// toUnit converts an SI value to def's unit (gauge units subtract atm).
func toUnit(v float64, def *unitDef, atm float64) float64 {
	if def.gauge {
		v -= atm
	}
	return (v - def.offset) / def.factor
}

// fromUnit converts x in def's unit to SI (gauge units add atm).
func fromUnit(x float64, def *unitDef, atm float64) float64 {
	v := x*def.factor + def.offset
	if def.gauge {
		v += atm
	}
	return v
}

// ToUnit converts an SI value v to the unit named unit (any accepted
// spelling). A unit used by several dimensions is taken in the first:
// "degC" is an absolute temperature (use ToUnitDim for a difference); gauge
// units subtract StandardAtmosphere.
func ToUnit(v float64, unit string) (float64, error) {
	def, err := resolve(unit, DimNone, false)
	if err != nil {
		return 0, err
	}
	return toUnit(v, def, StandardAtmosphere), nil
}

// FromUnit converts x, written in unit, to SI; see ToUnit for how a unit
// shared by dimensions is read.
func FromUnit(x float64, unit string) (float64, error) {
	def, err := resolve(unit, DimNone, false)
	if err != nil {
		return 0, err
	}
	return fromUnit(x, def, StandardAtmosphere), nil
}

// ToUnitDim is ToUnit with the unit looked up within dimension d, so
// ToUnitDim(2, DimTemperatureDifference, "degF") is 3.6.
func ToUnitDim(v float64, d Dimension, unit string) (float64, error) {
	def, err := resolve(unit, d, true)
	if err != nil {
		return 0, err
	}
	return toUnit(v, def, StandardAtmosphere), nil
}

// FromUnitDim is FromUnit with the unit looked up within dimension d.
func FromUnitDim(x float64, d Dimension, unit string) (float64, error) {
	def, err := resolve(unit, d, true)
	if err != nil {
		return 0, err
	}
	return fromUnit(x, def, StandardAtmosphere), nil
}

// Gauge returns the gauge pressure of the absolute pressure abs against the
// ambient absolute pressure atm, both in Pa; atm ≤ 0 means
// StandardAtmosphere.
func Gauge(abs, atm float64) float64 {
	if atm <= 0 {
		atm = StandardAtmosphere
	}
	return abs - atm
}
