package sheet

import (
	"tubewright/calc/pore"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// The operating point that the penetration-depth, pore and placement
// calculators share: the gas, its mean temperature and pressure at the
// stack, the operating frequency and the real-gas switch. The same keys,
// labels and hints on all three.

// FrequencyInput is an operating frequency, shared with the Bench so that
// the next screen starts from it; a bare number is hertz.
func FrequencyInput(key, label, example string) Input {
	return Input{Key: key, Label: label, Kind: Quantity, Dim: units.DimFrequency,
		Units: units.Options{DefaultUnit: "Hz"}, Example: example, PM: true,
		Hint:  "operating frequency: 100 Hz, 1.2 kHz (a bare number is Hz); ± or +- for an uncertainty",
		Share: ShareFrequency}
}

// poreOperatingInputs are the inputs of the operating point, in order.
func poreOperatingInputs() []Input {
	return []Input{
		GasInput("gas", ""),
		TemperatureInput("temperature", "Mean temperature", "", "300 K"),
		MeanPressureInput("pressure", "Mean pressure", "1 atm"),
		FrequencyInput("frequency", "Frequency", "100 Hz"),
		NonIdealInput(),
	}
}

// poreSubjects maps the gas model's and the depth calculation's range
// errors to the inputs they concern.
var poreSubjects = map[units.Subject]string{
	units.SubjectTemperature: "temperature",
	units.SubjectPressure:    "pressure",
	units.SubjectFrequency:   "frequency",
}

// operatingPoint is the evaluated operating point: the typed quantities
// (with their ±), the gas properties there and the two penetration depths.
type operatingPoint struct {
	T, P, F units.Quantity
	Props   gasprops.Properties
	DK, DN  float64 // thermal and viscous penetration depths, m

	mix  gasprops.Mixture
	opts *gasprops.Options
}

// readOperatingPoint evaluates the gas and the penetration depths at the
// typed operating point; errors name the input at fault.
func readOperatingPoint(v *Values) (*operatingPoint, error) {
	op := &operatingPoint{T: v.Q("temperature"), P: v.Q("pressure"), F: v.Q("frequency"),
		mix: v.Gas("gas"), opts: GasOptions(v)}
	props, err := op.mix.Properties(units.Temperature(op.T.Value), units.Pressure(op.P.Value), op.opts)
	if err != nil {
		return nil, v.BlameSubject(err, poreSubjects)
	}
	dk, dn, err := pore.PenetrationDepths(props, op.F.Value)
	if err != nil {
		return nil, v.Blame(err, "frequency")
	}
	op.Props, op.DK, op.DN = props, dk, dn
	return op, nil
}

// at evaluates the gas and the depths at temperature x[0] (K), pressure
// x[1] (Pa) and frequency x[2] (Hz), for ± propagation.
func (op *operatingPoint) at(x []float64) (props gasprops.Properties, dk, dn float64, err error) {
	props, err = op.mix.Properties(units.Temperature(x[0]), units.Pressure(x[1]), op.opts)
	if err != nil {
		return props, 0, 0, err
	}
	dk, dn, err = pore.PenetrationDepths(props, x[2])
	return props, dk, dn, err
}

// x and u are the SI values and standard uncertainties of temperature,
// pressure and frequency, in the order at takes them.
func (op *operatingPoint) x() []float64 { return []float64{op.T.Value, op.P.Value, op.F.Value} }
func (op *operatingPoint) u() []float64 {
	return []float64{op.T.Uncertainty, op.P.Uncertainty, op.F.Uncertainty}
}
