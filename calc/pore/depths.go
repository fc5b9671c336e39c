package pore

import (
	"math"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Depths returns the thermal and viscous penetration depths (m) of a gas
// with properties p at frequency frequency (Hz):
//
//	δκ = √(2k / (ω ρ cp)),   δν = √(2μ / (ω ρ)),   ω = 2πf
//
// (Swift 2002, ch. 4; from memory, equation numbers not checked here). k is the
// thermal conductivity, ρ the density, cp the isobaric specific heat and μ
// the dynamic viscosity, all from p. Inputs must be positive and finite;
// otherwise the results are NaN (bad frequency) or NaN/Inf/0 (bad
// properties): call PenetrationDepths for checked input.
func Depths(p gasprops.Properties, frequency float64) (deltaKappa, deltaNu float64) {
	omega := 2 * math.Pi * frequency
	deltaKappa = math.Sqrt(2 * p.ThermalConductivity / (omega * p.Density * p.IsobaricSpecificHeat))
	deltaNu = math.Sqrt(2 * p.Viscosity / (omega * p.Density))
	if !(frequency > 0) || math.IsInf(frequency, 0) {
		return math.NaN(), math.NaN()
	}
	return deltaKappa, deltaNu
}

// PenetrationDepths is Depths with checked input: a frequency that is not
// positive and finite, or gas properties that are not, give a
// *units.RangeError naming the field.
func PenetrationDepths(p gasprops.Properties, frequency float64) (deltaKappa, deltaNu float64, err error) {
	if !finitePositive(frequency) {
		return 0, 0, units.NewRangeError("frequency", frequency, 0, math.Inf(1), "Hz")
	}
	for _, c := range []struct {
		name, unit string
		v          float64
	}{
		{"gas density", "kg/m³", p.Density},
		{"gas thermal conductivity", "W/(m·K)", p.ThermalConductivity},
		{"gas isobaric specific heat", "J/(kg·K)", p.IsobaricSpecificHeat},
		{"gas viscosity", "Pa·s", p.Viscosity},
	} {
		if !finitePositive(c.v) {
			return 0, 0, units.NewRangeError(c.name, c.v, 0, math.Inf(1), c.unit)
		}
	}
	dk, dn := Depths(p, frequency)
	return dk, dn, nil
}

// unitsRange is a RangeError for a dimensionless field.
func unitsRange(field string, v, lo, hi float64) error {
	return units.NewRangeError(field, v, lo, hi, "")
}
