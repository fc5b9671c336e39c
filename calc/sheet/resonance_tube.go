package sheet

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// The inputs that describe a uniform tube, shared by the resonance and
// diagnosis calculators so that their keys, labels and words are the same.

// endsInput is the end conditions of a tube.
func endsInput() Input {
	return Input{Key: "ends", Label: "Ends", Kind: Pick, Default: "closed-open",
		Hint: "closed-open (quarter-wave), closed-closed or open-open (half-wave)",
		Choices: []Choice{
			{Key: "closed-open", Words: "Closed – open (quarter-wave)", Value: resonator.ClosedOpen},
			{Key: "closed-closed", Words: "Closed – closed (half-wave)", Value: resonator.ClosedClosed},
			{Key: "open-open", Words: "Open – open (half-wave)", Value: resonator.OpenOpen},
		}}
}

// endCorrectionInput is the model of each open end.
func endCorrectionInput() Input {
	return Input{Key: "end-correction", Label: "End correction at each open end", Kind: Pick, Default: "unflanged",
		Hint: "none, unflanged (thin-walled pipe in free space) or flanged (pipe ending in a large flat wall)",
		Choices: []Choice{
			{Key: "none", Words: "None", Value: resonator.NoCorrection},
			{Key: "unflanged", Words: "Unflanged (bare tube end)", Value: resonator.Unflanged},
			{Key: "flanged", Words: "Flanged (end in a wall)", Value: resonator.Flanged},
		}}
}

// modeInput is the harmonic number of a uniform tube.
func modeInput() Input {
	return Input{Key: "mode", Label: "Mode number n", Kind: Count, Default: "1", Min: 1, Max: resonator.MaxMode,
		Hint: "1 for the fundamental, 2, 3 … for the overtones"}
}

// tubeLengthInput is the physical length of a uniform tube; optional
// gives it no default (the resonance calculator solves for it instead when
// a target frequency is given).
func tubeLengthInput(example, hint string, optional bool) Input {
	return Input{Key: "length", Label: "Tube length", Kind: Quantity, Dim: units.DimLength, Example: example,
		Optional: optional, PM: true, Hint: hint}
}

// tubeDiameterInput is the inside diameter of a uniform tube, the size
// people measure; tubeRadiusInput is the alternative. One of the two is
// read (see tubeRadius); Optional here, since either will do.
func tubeDiameterInput() Input {
	return Input{Key: "diameter", Label: "Inside diameter", Kind: Quantity, Dim: units.DimLength, Example: "24 mm",
		Optional: true, PM: true, Hint: "bore of the tube: 24 mm, 1 in (or give radius); ± or +- for an uncertainty"}
}

// tubeRadiusInput is the inner radius of a uniform tube, instead of its
// inside diameter.
func tubeRadiusInput() Input {
	return Input{Key: "radius", Label: "Inner radius", Kind: Quantity, Dim: units.DimLength,
		Optional: true, PM: true, Hint: "half the inside diameter: 12 mm, 0.5 in (or give diameter); ± or +- for an uncertainty"}
}

// tubeSizeKey returns the key the tube's size was given under: "radius"
// when a radius was typed, else "diameter".
func tubeSizeKey(v *Values) string {
	if v.Has("radius") && !v.Has("diameter") {
		return "radius"
	}
	return "diameter"
}

// tubeRadius returns the tube's inner radius (m, with its standard
// uncertainty) from the inside diameter or the radius, exactly one of
// which must be given and positive.
func tubeRadius(v *Values) (units.Quantity, error) {
	d, r := v.Has("diameter"), v.Has("radius")
	switch {
	case d && r:
		return units.Quantity{}, v.Blame(errors.New("give either the inside diameter or the inner radius, not both"), "radius")
	case !d && !r:
		return units.Quantity{}, tubeMissing(v, "diameter")
	}
	key := tubeSizeKey(v)
	if !(v.SI(key) > 0) {
		return units.Quantity{}, tubePositiveError(v, key)
	}
	q := v.Q(key)
	if key == "diameter" {
		q.Value, q.Uncertainty = q.Value/2, q.Uncertainty/2
	}
	return q, nil
}

// tubeTemperatureInput is the mean gas temperature in a tube.
func tubeTemperatureInput(label string) Input {
	return TemperatureInput("temperature", label, "20 degC", "")
}

// tubePositiveError is the error of quantity input key, which must be
// greater than zero and is not.
func tubePositiveError(v *Values, key string) error {
	val := v.Get(key)
	e := units.NewRangeError(strings.ToLower(val.In.Label), val.Q.Value, 0, math.Inf(1), units.SIUnit(val.In.Dim))
	return v.Blame(e, key)
}

// tubeRequirePositive checks that each quantity input in keys is set and
// greater than zero; the first that is not is the error.
func tubeRequirePositive(v *Values, keys ...string) error {
	for _, k := range keys {
		if !v.Has(k) {
			return tubeMissing(v, k)
		}
		if !(v.SI(k) > 0) {
			return tubePositiveError(v, k)
		}
	}
	return nil
}

// tubeMissing is the error of an input needed here but left empty.
func tubeMissing(v *Values, key string) error {
	in := v.Get(key).In
	return &FieldError{Key: key, Label: in.Label, Err: fmt.Errorf("%w: type a value%s", ErrRequired, hintSuffix(in))}
}

// readTube returns the tube of the tube inputs (length ignored unless
// withLength) with its uncertainties, after checking that every size is
// given and positive.
func readTube(v *Values, withLength bool) (resonator.Tube, resonator.Uncertainty, error) {
	if withLength {
		if err := tubeRequirePositive(v, "length"); err != nil {
			return resonator.Tube{}, resonator.Uncertainty{}, err
		}
	}
	radius, err := tubeRadius(v)
	if err != nil {
		return resonator.Tube{}, resonator.Uncertainty{}, err
	}
	t := resonator.Tube{
		Ends:       v.Pick("ends").(resonator.Ends),
		Correction: v.Pick("end-correction").(resonator.EndCorrection),
		Mode:       v.Count("mode"),
		Radius:     radius.Value,
		Losses:     v.Pick("losses").(resonator.Losses),
	}
	u := resonator.Uncertainty{Radius: radius.Uncertainty}
	if withLength {
		t.Length = v.SI("length")
		u.Length = v.Q("length").Uncertainty
	}
	return t, u, nil
}

// tubeGasSubjects maps the gas model's range errors to the temperature and
// pressure inputs.
var tubeGasSubjects = map[units.Subject]string{
	units.SubjectTemperature: "temperature",
	units.SubjectPressure:    "pressure",
}

// tubeIsRangeError reports whether err holds a *units.RangeError.
func tubeIsRangeError(err error) bool {
	var re *units.RangeError
	return errors.As(err, &re)
}
