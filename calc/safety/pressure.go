package safety

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// GaugePressure is a pressure above the surrounding atmosphere, in Pa. Wall
// stresses and the code formulas use it: the load on a wall is the
// difference between the pressures on its two faces.
type GaugePressure float64

// GaugeOf returns the gauge pressure of a parsed pressure input. units.Parse
// returns pressures absolute (a "30 barg" entry comes back as 31.01325 bar
// absolute with Gauge set), so the gauge value is the absolute value minus
// the atmosphere atm (Pa; 0 means the standard atmosphere 101325 Pa). Use
// the same atm that was given to units.ParseWith. A quantity that is not a
// pressure is a programmer error and panics.
func GaugeOf(q units.Quantity, atm float64) GaugePressure {
	if q.Dim != units.DimPressure {
		panic(fmt.Sprintf("calc: GaugeOf of a %v quantity", q.Dim))
	}
	if atm == 0 {
		atm = units.StandardAtmosphere
	}
	return GaugePressure(q.Value - atm)
}

// Absolute returns the absolute pressure, Pa, for a surrounding atmosphere
// atm (Pa; 0 means 101325 Pa).
func (g GaugePressure) Absolute(atm float64) units.Pressure {
	if atm == 0 {
		atm = units.StandardAtmosphere
	}
	return units.Pressure(float64(g) + atm)
}

// finite reports whether v is neither NaN nor ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// positive returns a RangeError unless v is finite and > 0.
func positive(field string, v float64, unit string) error {
	if !finite(v) || v <= 0 {
		return units.NewRangeError(field, v, 0, math.Inf(1), unit)
	}
	return nil
}

// nonNegative returns a RangeError unless v is finite and ≥ 0.
func nonNegative(field string, v float64, unit string) error {
	if !finite(v) || v < 0 {
		return units.NewRangeError(field, v, 0, math.Inf(1), unit)
	}
	return nil
}

// gaugeInput checks an internal (gauge) pressure: finite and ≥ 0. A vacuum
// inside loads the wall from outside, a buckling case these formulas do
// not cover.
func gaugeInput(p GaugePressure) error {
	if !finite(float64(p)) || p < 0 {
		e := units.NewRangeError("pressure (gauge)", float64(p), 0, math.Inf(1), "Pa")
		e.Why = "internal pressure above the atmosphere; a vacuum inside needs an external-pressure (buckling) check"
		return e
	}
	return nil
}
