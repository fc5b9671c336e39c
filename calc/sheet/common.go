package sheet

import (
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Inputs that many calculators share, so that their keys, labels, hints
// and parsing are the same everywhere.

// GasInput is the working gas or mixture, with default def ("" for
// required).
func GasInput(key, def string) Input {
	return Input{Key: key, Label: "Working gas", Kind: Gas, Default: def, Example: "helium",
		Hint:  "helium, He, argon, air, or a mixture by mole fraction: helium:0.7,argon:0.3",
		Share: ShareGas}
}

// TemperatureInput is a gas temperature; a bare number is kelvin.
func TemperatureInput(key, label, def, example string) Input {
	return Input{Key: key, Label: label, Kind: Quantity, Dim: units.DimTemperature,
		Units: units.Options{DefaultUnit: "K"}, Default: def, Example: example, PM: true,
		Hint: "300 K, 27 degC, 80 degF (a bare number is K); ± or +- for an uncertainty", Share: ShareTemperature}
}

// MeanPressureInput is a mean (charge) pressure, absolute unless typed as
// gauge (barg, psig).
func MeanPressureInput(key, label, def string) Input {
	return Input{Key: key, Label: label, Kind: Quantity, Dim: units.DimPressure, Default: def, PM: true,
		Hint: "absolute: 10 bar, 145 psi, 1 MPa; gauge: 9 barg, 130 psig; ± or +- for an uncertainty", Share: SharePressure}
}

// NonIdealInput switches on the second-virial correction to density and
// sound speed.
func NonIdealInput() Input {
	return Input{Key: "non-ideal", Label: "Real-gas correction to density and sound speed (second virial)", Kind: Switch,
		Hint: "correct density and sound speed with the second virial coefficient"}
}

// GasOptions returns the gas model options of sheets that have the
// "non-ideal" switch.
func GasOptions(v *Values) *gasprops.Options {
	if v.sheet.Input("non-ideal") != nil && v.On("non-ideal") {
		return &gasprops.Options{NonIdeal: true}
	}
	return nil
}
