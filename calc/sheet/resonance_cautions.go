package sheet

import (
	"fmt"

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
// HotGasTemperature, pressure above PressurisedGauge. They are worded as
// the engine-onset cautions (OnsetCautions), so that the same hazard reads
// the same on every calculator.
func tubeCautions(r *Result, hot, p float64) {
	if hot > HotGasTemperature {
		r.Caution(fmt.Sprintf("Hot parts: the gas in the tube is at about %s; heaters, exchangers and tube walls at this temperature burn skin and can ignite nearby material. Let parts cool before touching; follow your lab's hot-work rules.",
			withAlt(hot, units.DimTemperature, "degC")))
	}
	if p-units.StandardAtmosphere > PressurisedGauge {
		r.Caution(fmt.Sprintf("Pressure: the tube is charged to %s absolute, above %s gauge, where pressure-equipment rules begin; the vessel must be rated for it at its working temperature (check its wall with the vessel calculation). Defer to local pressure-vessel codes and licensed practice.",
			tubeInUnit(p, units.DimPressure, "bar"), tubeInUnit(PressurisedGauge, units.DimPressure, "bar")))
	}
}

// tubeInUnit formats v (SI, of dimension dim) in unit, or in the SI unit
// when that fails.
func tubeInUnit(v float64, dim units.Dimension, unit string) string {
	if s, err := units.FormatInDim(v, dim, unit); err == nil {
		return s
	}
	return units.Format(v, dim)
}
