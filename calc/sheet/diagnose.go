package sheet

import (
	"errors"
	"fmt"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// What the diagnosis finds (the values of its "find" choice).
const (
	FindTemperature = "temperature"
	FindFraction    = "fraction"
)

// diagnoseSheet infers the mean gas temperature, or the mole fraction of a
// second gas, from a measured resonance frequency and the tube: the tube
// model of the resonance calculator solved backwards (calc/resonator
// DiagnoseTemperature, DiagnoseFraction), with the ± of every input
// carried to the answer.
var diagnoseSheet = &Sheet{
	ID:      IDDiagnose,
	Title:   "What the pitch says",
	Summary: "Gas temperature or mixture fraction from a measured resonance frequency, with its ±",
	Inputs: []Input{
		{Key: "find", Label: "Find", Kind: Pick, Default: FindTemperature,
			Hint: "temperature (the mean gas temperature of a known gas) or fraction (the mole fraction of the second gas at a known temperature)",
			Choices: []Choice{
				{Key: FindTemperature, Words: "Gas temperature", Value: FindTemperature},
				{Key: FindFraction, Words: "Fraction of a second gas", Value: FindFraction},
			}},
		{Key: "measured-frequency", Label: "Measured resonance frequency", Kind: Quantity, Dim: units.DimFrequency,
			Example: "140 Hz ± 2 Hz", PM: true, Hint: "as read from the analyser, with its ±: 140 Hz ± 2 Hz, 140Hz+-2Hz", Share: ShareFrequency},
		endsInput(),
		tubeLengthInput("600 mm", "physical tube length: 600 mm, 1.2 m, 20 in; ± or +- for an uncertainty: 600 mm ± 1 mm", false),
		tubeDiameterInput(),
		tubeRadiusInput(),
		endCorrectionInput(),
		modeInput(),
		diagnoseGasInput(),
		secondGasInput("Second gas (contaminant or admixture)", "the noble gas mixed into the working gas (a pure noble gas) when finding a fraction: argon"),
		knownTemperatureInput(),
		MeanPressureInput("pressure", "Mean pressure", "1 atm"),
		humidityInput(),
		NonIdealInput(),
		lossesInput(),
	},
	About: "The tube model of the Tube resonance calculator solved backwards with Brent's method over the gas " +
		"model's temperature range, or over mole fractions 0 to 1. The ± of every input is carried to the answer to " +
		"first order; a wide ± on the frequency usually dominates. A gas whose temperature varies along the tube " +
		"gives a mean weighted by the mode shape, not the arithmetic mean. The known gas temperature is used only " +
		"when finding a fraction.",
	Examples: []string{
		"twcalc diagnose --gas helium --pressure 1bar --ends closed-closed --length 1m --diameter 40mm --end-correction none --measured-frequency 510Hz",
		"twcalc diagnose --gas helium --second-gas argon --find fraction --temperature 300K --ends closed-open --length 0.5m --radius 10mm --measured-frequency 480Hz+-2Hz --json",
	},
	Run: runDiagnose,
}

// diagnoseGasInput is the working gas, required; a screen starts with
// air, the gas of most tubes on the bench.
func diagnoseGasInput() Input {
	in := GasInput("gas", "")
	in.Example = "air"
	return in
}

// knownTemperatureInput is the gas temperature of a fraction diagnosis.
// It is not carried between screens: when finding the temperature it is
// not used, and its default must not replace the one last used.
func knownTemperatureInput() Input {
	in := tubeTemperatureInput("Known gas temperature")
	in.Share = ShareNone
	return in
}

func runDiagnose(v *Values) (*Result, error) {
	tube, u, err := readTube(v, true)
	if err != nil {
		return nil, err
	}
	if err := tubeRequirePositive(v, "measured-frequency", "pressure"); err != nil {
		return nil, err
	}
	f, p := v.Q("measured-frequency"), v.Q("pressure")
	u.Frequency, u.Pressure = f.Uncertainty, p.Uncertainty
	if err := checkHumidity(v); err != nil {
		return nil, err
	}
	s := resonator.Setup{Tube: tube, Gas: v.Gas("gas"), Pressure: p.Value, GasOptions: GasOptions(v), U: u,
		RelativeHumidity: v.SI("humidity")}
	r := &Result{}
	if v.PickKey("find") == FindFraction {
		first, second, err := binaryPair(v)
		if err != nil {
			return nil, err
		}
		if err := tubeRequirePositive(v, "temperature"); err != nil {
			return nil, err
		}
		T := v.Q("temperature")
		s.Temperature, s.U.Temperature = T.Value, T.Uncertainty
		e, err := s.DiagnoseFraction(first, second, f.Value)
		if err != nil {
			return nil, diagnoseBlame(v, err, map[units.Subject]string{units.SubjectTemperature: "temperature",
				units.SubjectPressure: "pressure", units.SubjectComposition: "second-gas"})
		}
		pct := units.FormatPM(100*e.Value, 100*e.Sigma, units.DimNone) + " %"
		r.AddPM("mole_fraction", "Mole fraction of "+second.Name, e.Value, e.Sigma, units.DimNone).Note =
			fmt.Sprintf("%s in %s by mole (about the same by volume): %s", second.Name, first.Name, pct)
		r.Warn(e.Warnings...)
		tubeCautions(r, T.Value, p.Value)
		return r, nil
	}
	e, err := s.DiagnoseTemperature(f.Value)
	if err != nil {
		return nil, diagnoseBlame(v, err, map[units.Subject]string{units.SubjectPressure: "pressure"})
	}
	if v.Q("temperature").Uncertainty > 0 {
		r.Warn(unusedPMWarning(v, "temperature", "it is used only when finding a fraction"))
	}
	row := r.AddPM("temperature", "Mean gas temperature", e.Value, e.Sigma, units.DimTemperature)
	if c, err := units.FormatPMIn(e.Value, e.Sigma, units.DimTemperature, "degC"); err == nil {
		row.Note = "in degrees Celsius: " + c
	}
	r.Warn(e.Warnings...)
	tubeCautions(r, e.Value, p.Value)
	return r, nil
}

// diagnoseBlame names the input an inverse solve's error is about: no
// solution in range is the measured frequency's; a gas-model range error
// goes by its subject.
func diagnoseBlame(v *Values, err error, bySubject map[units.Subject]string) error {
	if errors.Is(err, resonator.ErrNoSolution) {
		return v.Blame(err, "measured-frequency")
	}
	return noResonanceBlame(v, v.BlameSubject(err, bySubject), tubeSizeKey(v))
}
