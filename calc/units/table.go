package units

// This file lists every unit the package knows. SI = typed×factor + offset;
// gauge units then add the atmosphere. The exact definitions behind the
// factors are in doc.go (NIST SP 811, 2008 edition, Appendix B; BIPM SI
// Brochure, 9th edition, 2019).

// Exact definitions (NIST SP 811 (2008) B.8 footnotes; BIPM SI Brochure 2019).
const (
	inch          = 0.0254               // m, exact
	foot          = 12 * inch            // m, exact
	pound         = 0.45359237           // kg, exact (avoirdupois)
	standardGrav  = 9.80665              // m/s², exact (3rd CGPM 1901)
	poundForce    = pound * standardGrav // N, exact
	psiPa         = poundForce / (inch * inch)
	torrPa        = StandardAtmosphere / 760
	mmHgPa        = 13595.1 * standardGrav * 1e-3 // conventional millimetre of mercury, exact
	calorieJ      = 4.184                         // thermochemical calorie, exact
	zeroCelsiusK  = 273.15                        // K, exact
	fahrenheitOff = 459.67                        // °R = °F + 459.67, exact
)

// unitDef is one unit: a canonical ASCII name (Quantity.Unit), the symbol
// shown to users, and the other spellings Parse accepts.
type unitDef struct {
	name      string    // canonical ASCII spelling, e.g. "degC", "um", "m3"
	symbol    string    // display symbol, e.g. "°C", "µm", "m³"
	dim       Dimension // what it measures
	factor    float64   // SI = x*factor + offset
	offset    float64   //
	gauge     bool      // pressure relative to the atmosphere
	offered   bool      // listed by Units (the others are accepted quietly)
	spellings []string  // further accepted spellings (case-sensitive)
}

// u builds an offered linear unit.
func u(d Dimension, name, symbol string, factor float64, spellings ...string) unitDef {
	return unitDef{name: name, symbol: symbol, dim: d, factor: factor, offered: true, spellings: spellings}
}

// q builds a unit that Parse accepts but Units does not offer.
func q(d Dimension, name, symbol string, factor float64, spellings ...string) unitDef {
	x := u(d, name, symbol, factor, spellings...)
	x.offered = false
	return x
}

// unitTable lists the units, SI unit first within each dimension. Spellings
// with ² and ³ are also accepted as 2, 3, ^2 and ^3; "·" also as "*", "." and
// a space (see lookup.go).
var unitTable = []unitDef{
	u(DimNone, "%", "%", 0.01, "percent"),
	q(DimNone, "ppm", "ppm", 1e-6),
	// Words for large plain numbers, as Format writes them (short scale).
	q(DimNone, "million", "million", 1e6, "millions"),
	q(DimNone, "billion", "billion", 1e9, "billions"),
	q(DimNone, "trillion", "trillion", 1e12, "trillions"),

	u(DimLength, "m", "m", 1, "metre", "metres", "meter", "meters"),
	u(DimLength, "mm", "mm", 1e-3, "millimetre", "millimetres", "millimeter", "millimeters"),
	u(DimLength, "cm", "cm", 1e-2, "centimetre", "centimetres", "centimeter", "centimeters"),
	u(DimLength, "um", "µm", 1e-6, "µm", "micron", "microns", "micrometre", "micrometres", "micrometer", "micrometers"),
	u(DimLength, "in", "in", inch, "\"", "″", "''", "inch", "inches"),
	u(DimLength, "ft", "ft", foot, "'", "′", "foot", "feet"),
	q(DimLength, "nm", "nm", 1e-9),
	q(DimLength, "km", "km", 1e3),
	q(DimLength, "mil", "mil", 1e-3*inch, "thou"),

	u(DimArea, "m2", "m²", 1, "m²"),
	u(DimArea, "mm2", "mm²", 1e-6, "mm²"),
	u(DimArea, "cm2", "cm²", 1e-4, "cm²"),
	u(DimArea, "in2", "in²", inch*inch, "in²", "sq in", "square inch", "square inches"),
	q(DimArea, "ft2", "ft²", foot*foot, "ft²", "sq ft", "square foot", "square feet"),
	q(DimArea, "um2", "µm²", 1e-12, "µm²"),

	u(DimVolume, "m3", "m³", 1, "m³"),
	u(DimVolume, "L", "L", 1e-3, "l", "litre", "litres", "liter", "liters"),
	u(DimVolume, "mL", "mL", 1e-6, "ml", "millilitre", "millilitres", "milliliter", "milliliters"),
	u(DimVolume, "cm3", "cm³", 1e-6, "cm³", "cc"),
	q(DimVolume, "mm3", "mm³", 1e-9, "mm³"),
	q(DimVolume, "in3", "in³", inch*inch*inch, "in³", "cu in"),
	q(DimVolume, "ft3", "ft³", foot*foot*foot, "ft³", "cu ft"),

	u(DimTemperature, "K", "K", 1, "kelvin", "kelvins"),
	{name: "degC", symbol: "°C", dim: DimTemperature, factor: 1, offset: zeroCelsiusK, offered: true,
		spellings: []string{"°C", "ºC", "℃", "deg C", "celsius", "Celsius"}},
	{name: "degF", symbol: "°F", dim: DimTemperature, factor: 5.0 / 9, offset: fahrenheitOff * 5 / 9, offered: true,
		spellings: []string{"°F", "ºF", "℉", "deg F", "fahrenheit", "Fahrenheit"}},
	{name: "degR", symbol: "°R", dim: DimTemperature, factor: 5.0 / 9,
		spellings: []string{"°R", "deg R", "rankine", "Rankine"}},

	u(DimTemperatureDifference, "K", "K", 1, "kelvin", "kelvins"),
	u(DimTemperatureDifference, "degC", "°C", 1, "°C", "ºC", "℃", "deg C", "celsius", "Celsius"),
	u(DimTemperatureDifference, "degF", "°F", 5.0/9, "°F", "ºF", "℉", "deg F", "fahrenheit", "Fahrenheit"),
	q(DimTemperatureDifference, "mK", "mK", 1e-3),
	q(DimTemperatureDifference, "degR", "°R", 5.0/9, "°R", "deg R", "rankine", "Rankine"),

	u(DimPressure, "Pa", "Pa", 1, "pascal", "pascals"),
	u(DimPressure, "kPa", "kPa", 1e3),
	u(DimPressure, "MPa", "MPa", 1e6),
	u(DimPressure, "bar", "bar", 1e5, "bara", "bar(a)", "bar a"),
	{name: "barg", symbol: "barg", dim: DimPressure, factor: 1e5, gauge: true, offered: true,
		spellings: []string{"bar(g)", "bar g"}},
	u(DimPressure, "mbar", "mbar", 100),
	u(DimPressure, "psi", "psi", psiPa, "psia", "psi(a)", "lbf/in2"),
	{name: "psig", symbol: "psig", dim: DimPressure, factor: psiPa, gauge: true, offered: true,
		spellings: []string{"psi(g)"}},
	u(DimPressure, "atm", "atm", StandardAtmosphere),
	u(DimPressure, "torr", "torr", torrPa, "Torr"),
	q(DimPressure, "hPa", "hPa", 100),
	q(DimPressure, "mmHg", "mmHg", mmHgPa, "mm Hg"),
	q(DimPressure, "GPa", "GPa", 1e9),
	{name: "kPag", symbol: "kPag", dim: DimPressure, factor: 1e3, gauge: true, spellings: []string{"kPa(g)"}},
	{name: "MPag", symbol: "MPag", dim: DimPressure, factor: 1e6, gauge: true, spellings: []string{"MPa(g)"}},
	{name: "mbarg", symbol: "mbarg", dim: DimPressure, factor: 100, gauge: true, spellings: []string{"mbar(g)"}},

	u(DimStress, "Pa", "Pa", 1),
	u(DimStress, "MPa", "MPa", 1e6),
	u(DimStress, "N/mm2", "N/mm²", 1e6, "N/mm²"),
	u(DimStress, "GPa", "GPa", 1e9),
	u(DimStress, "psi", "psi", psiPa),
	u(DimStress, "ksi", "ksi", 1e3*psiPa),
	q(DimStress, "kPa", "kPa", 1e3),

	u(DimFrequency, "Hz", "Hz", 1, "hertz"),
	u(DimFrequency, "kHz", "kHz", 1e3),
	q(DimFrequency, "MHz", "MHz", 1e6),
	q(DimFrequency, "mHz", "mHz", 1e-3),

	u(DimRate, "/s", "/s", 1, "1/s", "per second"),
	u(DimRate, "/min", "/min", 1.0/60, "1/min", "per minute"),
	u(DimRate, "/h", "/h", 1.0/3600, "1/h", "/hr", "1/hr", "per hour", "ACH", "ach"),

	u(DimTime, "s", "s", 1, "sec", "second", "seconds"),
	u(DimTime, "ms", "ms", 1e-3),
	u(DimTime, "min", "min", 60, "minute", "minutes"),
	u(DimTime, "h", "h", 3600, "hr", "hour", "hours"),
	q(DimTime, "us", "µs", 1e-6, "µs"),
	q(DimTime, "d", "d", 86400, "day", "days"),

	u(DimDensity, "kg/m3", "kg/m³", 1, "kg/m³"),
	u(DimDensity, "g/cm3", "g/cm³", 1e3, "g/cm³", "g/cc", "g/mL", "g/ml"),
	u(DimDensity, "g/L", "g/L", 1, "g/l"),
	q(DimDensity, "kg/L", "kg/L", 1e3, "kg/l"),
	q(DimDensity, "lb/ft3", "lb/ft³", pound/(foot*foot*foot), "lb/ft³"),
	q(DimDensity, "g/m3", "g/m³", 1e-3, "g/m³"),
	q(DimDensity, "mg/m3", "mg/m³", 1e-6, "mg/m³"),

	u(DimSpeed, "m/s", "m/s", 1),
	u(DimSpeed, "km/h", "km/h", 1/3.6),
	u(DimSpeed, "ft/s", "ft/s", foot),
	q(DimSpeed, "mm/s", "mm/s", 1e-3),

	u(DimDynamicViscosity, "Pa.s", "Pa·s", 1, "Pa·s", "Pa s"),
	u(DimDynamicViscosity, "uPa.s", "µPa·s", 1e-6, "µPa·s", "µPa s"),
	u(DimDynamicViscosity, "mPa.s", "mPa·s", 1e-3, "mPa·s", "mPa s"),
	u(DimDynamicViscosity, "cP", "cP", 1e-3, "centipoise"),

	u(DimKinematicViscosity, "m2/s", "m²/s", 1, "m²/s"),
	u(DimKinematicViscosity, "mm2/s", "mm²/s", 1e-6, "mm²/s"),
	u(DimKinematicViscosity, "cSt", "cSt", 1e-6, "centistokes"),
	u(DimKinematicViscosity, "cm2/s", "cm²/s", 1e-4, "cm²/s"),

	u(DimDiffusivity, "m2/s", "m²/s", 1, "m²/s"),
	u(DimDiffusivity, "mm2/s", "mm²/s", 1e-6, "mm²/s"),
	u(DimDiffusivity, "cm2/s", "cm²/s", 1e-4, "cm²/s"),

	u(DimThermalConductivity, "W/(m.K)", "W/(m·K)", 1, "W/(m·K)", "W/m/K", "W/mK", "W/m·K"),
	u(DimThermalConductivity, "mW/(m.K)", "mW/(m·K)", 1e-3, "mW/(m·K)", "mW/m/K", "mW/mK", "mW/m·K"),

	u(DimSpecificHeat, "J/(kg.K)", "J/(kg·K)", 1, "J/(kg·K)", "J/kg/K", "J/kgK", "J/kg·K"),
	u(DimSpecificHeat, "kJ/(kg.K)", "kJ/(kg·K)", 1e3, "kJ/(kg·K)", "kJ/kg/K", "kJ/kgK", "kJ/kg·K"),
	u(DimSpecificHeat, "J/(g.K)", "J/(g·K)", 1e3, "J/(g·K)", "J/g/K", "J/gK", "J/g·K"),

	u(DimMolarMass, "kg/mol", "kg/mol", 1),
	u(DimMolarMass, "g/mol", "g/mol", 1e-3),

	u(DimEnergy, "J", "J", 1, "joule", "joules"),
	u(DimEnergy, "kJ", "kJ", 1e3),
	u(DimEnergy, "MJ", "MJ", 1e6),
	u(DimEnergy, "Wh", "Wh", 3600),
	u(DimEnergy, "kWh", "kWh", 3.6e6),
	q(DimEnergy, "cal", "cal", calorieJ),
	q(DimEnergy, "kcal", "kcal", 1e3*calorieJ),
	q(DimEnergy, "mJ", "mJ", 1e-3),
	q(DimEnergy, "GJ", "GJ", 1e9),

	u(DimPower, "W", "W", 1, "watt", "watts"),
	u(DimPower, "mW", "mW", 1e-3),
	u(DimPower, "kW", "kW", 1e3),
	q(DimPower, "MW", "MW", 1e6),

	u(DimMass, "kg", "kg", 1),
	u(DimMass, "g", "g", 1e-3, "gram", "grams"),
	u(DimMass, "mg", "mg", 1e-6),
	u(DimMass, "lb", "lb", pound, "lbs", "lbm", "pound", "pounds"),
	q(DimMass, "oz", "oz", pound/16),
	q(DimMass, "t", "t", 1e3, "tonne", "tonnes"),

	u(DimVolumeFlow, "m3/s", "m³/s", 1, "m³/s"),
	u(DimVolumeFlow, "m3/h", "m³/h", 1.0/3600, "m³/h"),
	u(DimVolumeFlow, "L/min", "L/min", 1e-3/60, "l/min", "lpm"),
	u(DimVolumeFlow, "L/s", "L/s", 1e-3, "l/s"),
	q(DimVolumeFlow, "mL/min", "mL/min", 1e-6/60, "ml/min"),
	q(DimVolumeFlow, "cfm", "cfm", foot*foot*foot/60, "ft³/min"),

	u(DimPerLength, "/m", "/m", 1, "1/m", "per metre", "per meter"),
	u(DimPerLength, "/mm", "/mm", 1e3, "1/mm", "per mm", "per millimetre", "per millimeter"),
	u(DimPerLength, "/cm", "/cm", 1e2, "1/cm", "per cm", "per centimetre", "per centimeter"),
	u(DimPerLength, "/in", "/in", 1/inch, "1/in", "per in", "per inch"),
	u(DimPerLength, "mesh", "mesh", 1/inch),

	u(DimPerArea, "/m2", "/m²", 1, "/m²", "1/m²", "per m²"),
	u(DimPerArea, "/cm2", "/cm²", 1e4, "/cm²", "1/cm²", "per cm²"),
	u(DimPerArea, "/in2", "/in²", 1/(inch*inch), "/in²", "1/in²", "per in²", "per square inch"),
	u(DimPerArea, "cpsi", "cpsi", 1/(inch*inch), "cells/in2", "cells per square inch"),
	q(DimPerArea, "/mm2", "/mm²", 1e6, "/mm²", "1/mm²", "per mm²"),

	u(DimSoundLevel, "dB", "dB", 1, "dB SPL", "dBSPL"),
	u(DimSoundLevel, "dBA", "dB(A)", 1, "dB(A)", "dB A"),

	u(DimTemperatureGradient, "K/m", "K/m", 1, "K per m", "K per metre", "K per meter"),
	u(DimTemperatureGradient, "K/cm", "K/cm", 1e2, "K per cm"),
	u(DimTemperatureGradient, "K/mm", "K/mm", 1e3, "K per mm"),
}
