package sheet

import (
	"errors"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// lossesInput chooses how the walls enter a tube's frequency (calc/resonator
// Losses): through Rott's complex wave number, as the onset solver does, so
// that the two agree on one tube (the default), or not at all.
func lossesInput() Input {
	return Input{Key: "losses", Label: "Wall losses in the frequency", Kind: Pick, Default: resonator.WallLosses.String(),
		Hint: "none: the plane wave at the adiabatic sound speed, the walls enter only Q; wall: the viscous and thermal boundary layers slow the wave (Rott's complex wave number), noticeably in narrow tubes",
		Choices: []Choice{
			{Key: resonator.LossFree.String(), Words: "Loss-free (adiabatic sound speed)", Value: resonator.LossFree},
			{Key: resonator.WallLosses.String(), Words: "With wall losses (Rott's wave number)", Value: resonator.WallLosses},
		}}
}

// humidityInput is the relative humidity of air (calc/resonator evaluates
// humid air with gasprops.HumidAir).
func humidityInput() Input {
	return Input{Key: "humidity", Label: "Relative humidity (air only)", Kind: Quantity, Dim: units.DimNone, Default: "0",
		Min: 0, Max: 1, Hint: "relative humidity of air: 50 %, 0.5; 0 for dry air; other gases take 0"}
}

// errHumidityNotAir is the reason of a humidity given with a gas other
// than air.
var errHumidityNotAir = errors.New("applies to air only; set it to 0 for this gas")

// checkHumidity returns an error about the humidity input when it is set
// for a gas other than air.
func checkHumidity(v *Values) error {
	if v.SI("humidity") == 0 {
		return nil
	}
	if c := v.Gas("gas").Components(); len(c) != 1 || c[0].Species.Name != "air" {
		return v.Blame(errHumidityNotAir, "humidity")
	}
	return nil
}

// tubeGas evaluates the working gas at T (K) and p (Pa), as humid air when
// a humidity is given, with the real-gas correction when it is on.
// Range errors are blamed on the temperature and pressure inputs.
func tubeGas(v *Values, T, p float64) (gasprops.Properties, error) {
	if err := checkHumidity(v); err != nil {
		return gasprops.Properties{}, err
	}
	rh := v.SI("humidity")
	if rh == 0 {
		g, err := v.Gas("gas").Properties(units.Temperature(T), units.Pressure(p), GasOptions(v))
		return g, v.BlameSubject(err, tubeGasSubjects)
	}
	g, err := gasprops.HumidAir(units.Temperature(T), units.Pressure(p), rh, GasOptions(v))
	if err == nil {
		return g, nil
	}
	if err = v.BlameSubject(err, tubeGasSubjects); !tubeIsRangeError(err) {
		return g, err
	}
	// The humid-air model's range errors say no subject: tell them apart
	// by its documented bounds (gasprops.WaterMoleFraction). Inside them,
	// the water vapour alone reaches the total pressure: the humidity is
	// too high for this pressure and temperature.
	key := "humidity"
	switch {
	case !(T >= gasprops.HumidMinTemperature && T <= gasprops.HumidMaxTemperature):
		key = "temperature"
	case !(p >= gasprops.MinPressure):
		key = "pressure"
	}
	return g, v.Blame(err, key)
}

// noResonanceBlame puts an error saying that the wall losses leave a tube
// without a resonance (Q below resonator.MinQ) on input key: the radius,
// or the zones that hold the radii, since a wider tube is the cure the
// calculator names. Other errors come back unchanged.
func noResonanceBlame(v *Values, err error, key string) error {
	if errors.Is(err, resonator.ErrNoResonance) {
		return v.Blame(err, key)
	}
	return err
}

// unusedPMWarning says that the ± typed on input key is not carried
// because the input is not used here (why).
func unusedPMWarning(v *Values, key, why string) string {
	return "the ± typed on the " + strings.ToLower(v.Get(key).In.Label) + " is not carried: " + why
}
