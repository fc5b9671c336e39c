package sheet

import (
	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// HotGasTemperature is the gas temperature (K) above which the tube
// calculators (resonance, diagnose) add the hot-parts caution: 50 °C.
// From memory: ISO 13732-1:2006 puts the burn threshold of bare metal
// touched for about a minute near 51 °C; common practice, no published
// source, calls anything above 50 °C hot to touch.
const HotGasTemperature = 323.15

// PressurisedGauge is the gauge pressure (Pa) above which the tube
// calculators add the pressure cautions: 0.5 bar, the pressure above
// which the EU Pressure Equipment Directive 2014/68/EU applies (Article
// 1(1), maximum allowable pressure PS greater than 0.5 bar).
const PressurisedGauge = 0.5e5

// tubeCautions adds the cautions of a tube filled with gas at the highest
// temperature hot (K) and mean pressure p (Pa, absolute): hot parts above
// HotGasTemperature, pressure above PressurisedGauge. The same words on
// every calculator that uses them.
func tubeCautions(r *Result, hot, p float64) {
	if hot > HotGasTemperature {
		r.Caution("Hot parts: the gas is at about " + tubeInUnit(hot, units.DimTemperature, "degC") +
			", above " + tubeInUnit(HotGasTemperature, units.DimTemperature, "degC") + "; the tube and its fittings may be as hot. " +
			safety.CautionHotSurfaces)
	}
	if p-units.StandardAtmosphere > PressurisedGauge {
		r.Caution("Pressure: the mean pressure " + tubeInUnit(p, units.DimPressure, "bar") + " absolute is above " +
			tubeInUnit(PressurisedGauge, units.DimPressure, "bar") + " gauge, where pressure-equipment rules begin. " + safety.CautionGeneral)
		r.Caution(safety.CautionStoredEnergy)
	}
}

// tubeInUnit formats v (SI, of dimension dim) in unit, or in the SI unit when
// that fails.
func tubeInUnit(v float64, dim units.Dimension, unit string) string {
	if s, err := units.FormatInDim(v, dim, unit); err == nil {
		return s
	}
	return units.Format(v, dim)
}
