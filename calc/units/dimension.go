package units

import "strconv"

// dimInfo holds what the package knows about one dimension: its name in
// messages, its SI symbol, whether negative values make sense, the largest
// magnitude Parse accepts and an example for hints.
type dimInfo struct {
	name     string
	si       string  // SI unit symbol used by Format
	negative bool    // negative values are ordinary (a difference, a level)
	maxAbs   float64 // largest |SI value| accepted by Parse
	example  string  // typed example shown in hints
}

// dims is indexed by Dimension. The magnitude limits are our own choice:
// far beyond anything at a laboratory bench, close enough to catch a slipped
// exponent ("2e30 m").
var dims = [...]dimInfo{
	DimNone:                  {"number", "", true, 1e15, "0.3 or 30 %"},
	DimLength:                {"length", "m", false, 1e6, "0.25 m or 12 mm"},
	DimArea:                  {"area", "m²", false, 1e9, "1.5 cm²"},
	DimVolume:                {"volume", "m³", false, 1e9, "50 L"},
	DimTemperature:           {"temperature", "K", false, 1e6, "300 K or 27 °C"},
	DimTemperatureDifference: {"temperature difference", "K", true, 1e6, "40 K"},
	DimPressure:              {"pressure", "Pa", false, 1e10, "10 bar or 30 barg"},
	DimStress:                {"stress", "Pa", false, 1e12, "138 MPa"},
	DimFrequency:             {"frequency", "Hz", false, 1e12, "440 Hz"},
	DimRate:                  {"rate", "1/s", false, 1e12, "2 /h"},
	DimTime:                  {"time", "s", false, 1e12, "10 min"},
	DimDensity:               {"density", "kg/m³", false, 1e6, "7900 kg/m³"},
	DimSpeed:                 {"speed", "m/s", false, 1e8, "340 m/s"},
	DimDynamicViscosity:      {"dynamic viscosity", "Pa·s", false, 1e10, "19.9 µPa·s"},
	DimKinematicViscosity:    {"kinematic viscosity", "m²/s", false, 1e6, "15 mm²/s"},
	DimDiffusivity:           {"diffusivity", "m²/s", false, 1e6, "22 mm²/s"},
	DimThermalConductivity:   {"thermal conductivity", "W/(m·K)", false, 1e6, "0.156 W/(m·K)"},
	DimSpecificHeat:          {"specific heat", "J/(kg·K)", false, 1e9, "5193 J/(kg·K)"},
	DimMolarMass:             {"molar mass", "kg/mol", false, 1e3, "4.0026 g/mol"},
	DimEnergy:                {"energy", "J", false, 1e15, "12 kJ"},
	DimPower:                 {"power", "W", false, 1e12, "50 W"},
	DimMass:                  {"mass", "kg", false, 1e9, "15 g"},
	DimVolumeFlow:            {"volume flow", "m³/s", false, 1e6, "2 L/min"},
	DimPerLength:             {"count per length", "1/m", false, 1e9, "200 /in"},
	DimPerArea:               {"count per area", "1/m²", false, 1e15, "400 cpsi"},
	DimSoundLevel:            {"sound level", "dB", true, 300, "94 dB"},
	DimTemperatureGradient:   {"temperature gradient", "K/m", true, 1e9, "500 K/m"},
}

func (d Dimension) valid() bool { return d >= 0 && int(d) < len(dims) }

func (d Dimension) info() dimInfo {
	if !d.valid() {
		panic("calc: units: unknown Dimension")
	}
	return dims[d]
}

// String returns the dimension's name as used in messages, e.g. "length",
// "pressure", "temperature difference". Unknown values give "Dimension(n)".
func (d Dimension) String() string {
	if !d.valid() {
		return "Dimension(" + strconv.Itoa(int(d)) + ")"
	}
	return dims[d].name
}

// SIUnit returns the symbol of d's SI unit as Format prints it: "m", "Pa",
// "K", "kg/m³", "W/(m·K)"; "" for DimNone. It panics on an unknown Dimension
// (a programmer error).
func SIUnit(d Dimension) string { return d.info().si }

// MaxMagnitude returns the largest |SI value| Parse accepts for d; larger
// values are reported as absurd (a slipped exponent or a unit mix-up).
func MaxMagnitude(d Dimension) float64 { return d.info().maxAbs }

// AllowsNegative reports whether negative values of d are ordinary (a
// temperature difference, a sound level, a plain number). For the other
// dimensions Parse rejects negative values unless Options.AllowNegative.
func AllowsNegative(d Dimension) bool { return d.info().negative }

// article returns "a" or "an" for a dimension name in messages.
func article(word string) string {
	if word != "" && (word[0] == 'a' || word[0] == 'e' || word[0] == 'i' || word[0] == 'o' || word[0] == 'u') {
		return "an"
	}
	return "a"
}
