package sheet

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// The kinds of resonator of the resonance calculator (the values of its
// "resonator" choice).
const (
	ResonatorTube      = "tube"
	ResonatorZones     = "zones"
	ResonatorHelmholtz = "helmholtz"
)

// resonanceSheet is the tube-resonance calculator: a uniform tube
// (frequency from length or length from a target frequency, with end
// corrections, Q and bandwidth, and sweeps against temperature or mixture
// fraction), a tube of zones at different temperatures, or a Helmholtz
// resonator, all from calc/resonator.
var resonanceSheet = &Sheet{
	ID:      IDResonance,
	Title:   "Tube resonance",
	Summary: "Frequency from length or length from frequency of a quarter- or half-wave tube, with end corrections, Q and bandwidth; tubes of hot and cold zones; Helmholtz resonators",
	Inputs: append(append(append([]Input{
		{Key: "resonator", Label: "Resonator", Kind: Pick, Optional: true, Example: ResonatorTube,
			Hint: "tube, zones or helmholtz; the terminal picks zones when --zones is given and helmholtz when --volume is given",
			Choices: []Choice{
				{Key: ResonatorTube, Words: "Uniform tube", Value: ResonatorTube},
				{Key: ResonatorZones, Words: "Hot and cold zones", Value: ResonatorZones},
				{Key: ResonatorHelmholtz, Words: "Helmholtz resonator", Value: ResonatorHelmholtz},
			}},
		{Key: "solve", Label: "Solve for", Kind: Pick, Optional: true, Example: "frequency",
			Hint: "frequency (from the length) or length (from the target frequency); the terminal picks it from which of --length and --frequency is given",
			Choices: []Choice{
				{Key: "frequency", Words: "Frequency from length", Value: "frequency"},
				{Key: "length", Words: "Length from frequency", Value: "length"},
			}},
		endsInput(),
		tubeLengthInput("500 mm", "physical tube length, to get its frequency: 500 mm, 1.2 m, 20 in; ± or +- for an uncertainty: 500 mm ± 1 mm", true),
		{Key: "frequency", Label: "Target frequency", Kind: Quantity, Dim: units.DimFrequency, Optional: true, Example: "400 Hz", PM: true,
			Hint: "instead of the length, to get the length: 400 Hz, 1.2 kHz; ± or +- for an uncertainty"},
		tubeDiameterInput(),
		tubeRadiusInput(),
		endCorrectionInput(),
		modeInput(),
	}, zonesInputs()...), helmholtzInputs()...),
		GasInput("gas", "air"),
		tubeTemperatureInput("Mean gas temperature"),
		MeanPressureInput("pressure", "Mean pressure", "1 atm"),
		humidityInput(),
		NonIdealInput(),
		lossesInput(),
		sweepInput(),
		secondGasInput("Second gas of the fraction sweep", "mixed into the working gas (a pure noble gas) for a fraction sweep: argon"),
	),
	About: "Plane waves in a rigid tube. End corrections: Levine & Schwinger (1948) for an unflanged end, " +
		"Norris & Sheng (1989) for a flanged one, with their dependence on ka. Q from the viscous and thermal boundary " +
		"layers on the wall (Kirchhoff), the thermal layer on closed end caps and radiation from open ends; the real " +
		"tube is usually a little lossier. Zoned tube: exact plane-wave modes with pressure and volume velocity continuous " +
		"at each joint, each zone's gas at its own temperature; joints are sharp and there are no losses. Helmholtz: " +
		"lumped resonator, the neck's inner end flanged (Norris & Sheng 1989), valid while every size is small against " +
		"the wavelength. A ± typed on any input is carried to the results to first order.",
	Examples: []string{
		"twcalc resonance --gas air --temperature 300K --ends closed-open --length 1m --diameter 50mm",
		"twcalc resonance --gas helium --pressure 10bar --ends closed-closed --frequency 400Hz --diameter 50mm --json",
		"twcalc resonance --length 0.25m+-1mm --diameter 16mm --temperature 20degC+-2K",
		"twcalc resonance --length 1m --diameter 50mm --sweep temperature:250K:450K:21",
		"twcalc resonance --gas helium --length 1m --diameter 50mm --sweep fraction:0:0.3:16 --second-gas argon",
		`twcalc resonance --ends closed-open --zones "0.1m,d 20mm,700K;0.4m,d 20mm,295K" --modes 5`,
		"twcalc resonance --volume 1L --neck-length 50mm --neck-diameter 20mm --end-correction unflanged",
	},
	Run: runResonance,
}

// sweepInput is the optional sweep of the uniform tube's frequency.
func sweepInput() Input {
	return Input{Key: "sweep", Label: "Sweep (temperature:FROM:TO:N or fraction:FROM:TO:N)", Kind: Text, Optional: true, Advanced: true,
		Example: "", Hint: "frequency against temperature, e.g. temperature:250 K:450 K:21, or against the mole fraction of the second gas, e.g. fraction:0:0.3:16"}
}

// secondGasInput is a second noble gas mixed into the working gas; its
// choices are the noble gases of gasprops.
func secondGasInput(label, hint string) Input {
	in := Input{Key: "second-gas", Label: label, Kind: Pick, Optional: true, Example: "argon", Hint: hint, Advanced: true}
	for _, name := range gasprops.Names() {
		sp, err := gasprops.Lookup(name)
		if err != nil || !sp.Noble() {
			continue
		}
		in.Choices = append(in.Choices, Choice{Key: sp.Name, Words: strings.ToUpper(sp.Name[:1]) + sp.Name[1:] + " (" + sp.Symbol + ")", Value: sp})
	}
	return in
}

// resonatorKind is the resonator chosen: as picked, or on the terminal,
// where the choice is usually not typed, from the inputs given (a volume
// makes a Helmholtz resonator, zones a zoned tube, anything else a
// uniform tube).
func resonatorKind(v *Values) string {
	if v.Has("resonator") {
		return v.PickKey("resonator")
	}
	switch {
	case v.Given("volume"):
		return ResonatorHelmholtz
	case v.Given("zones"):
		return ResonatorZones
	}
	return ResonatorTube
}

func runResonance(v *Values) (*Result, error) {
	kind := resonatorKind(v)
	var r *Result
	var err error
	switch kind {
	case ResonatorZones:
		r, err = runZones(v)
	case ResonatorHelmholtz:
		r, err = runHelmholtz(v)
	default:
		r, err = runTube(v)
	}
	if err == nil && !v.Has("resonator") {
		// echo the choice worked out, in front of any other
		r.Derived = append([]Row{{Key: "resonator", Label: "Resonator", Kind: Words, Text: kind}}, r.Derived...)
	}
	return r, err
}

// solveForLength reports whether the uniform tube is solved for its
// length (from the target frequency): as picked, or on the terminal from
// which of length and frequency is given.
func solveForLength(v *Values) (bool, error) {
	if v.Has("solve") {
		return v.PickKey("solve") == "length", nil
	}
	byLength, byFreq := v.Given("length"), v.Given("frequency")
	switch {
	case byLength && byFreq:
		return false, v.Blame(errors.New("give either the tube length (to get the frequency) or the target frequency (to get the length), not both"), "frequency")
	case !byLength && !byFreq:
		return false, tubeMissing(v, "length")
	}
	return byFreq, nil
}

// runTube solves the uniform tube, and its sweep when one is asked for.
func runTube(v *Values) (*Result, error) {
	byFreq, err := solveForLength(v)
	if err != nil {
		return nil, err
	}
	tube, u, err := readTube(v, !byFreq)
	if err != nil {
		return nil, err
	}
	if err := tubeRequirePositive(v, "temperature", "pressure"); err != nil {
		return nil, err
	}
	T, p := v.Q("temperature"), v.Q("pressure")
	u.Temperature, u.Pressure = T.Uncertainty, p.Uncertainty
	// the gas at the typed state first, so that its range errors name
	// their input
	if _, err := tubeGas(v, T.Value, p.Value); err != nil {
		return nil, err
	}
	s := resonator.Setup{Tube: tube, Gas: v.Gas("gas"), Temperature: T.Value, Pressure: p.Value, GasOptions: GasOptions(v), U: u,
		RelativeHumidity: v.SI("humidity")}
	var res resonator.Result
	if byFreq {
		if err := tubeRequirePositive(v, "frequency"); err != nil {
			return nil, err
		}
		s.U.Frequency = v.Q("frequency").Uncertainty
		res, err = s.SolveLength(v.SI("frequency"))
	} else {
		res, err = s.SolveFrequency()
	}
	if err != nil {
		err = noResonanceBlame(v, v.BlameSubject(err, tubeGasSubjects), tubeSizeKey(v))
		if _, ok := AsFieldError(err); !ok && byFreq && tubeIsRangeError(err) {
			// with every size checked above, the one range the length
			// solve can leave is the frequency's: too high for the radius
			err = v.Blame(err, "frequency")
		}
		return nil, err
	}
	r := &Result{}
	if !v.Has("solve") {
		solve := "frequency"
		if byFreq {
			solve = "length"
		}
		r.DeriveWords("solve", "Solve for", solve)
	}
	if byFreq {
		r.AddPM("length", "Tube length to cut", res.Length, res.LengthSigma, units.DimLength)
	} else {
		r.AddPM("frequency", "Resonance frequency", res.Frequency, res.FrequencySigma, units.DimFrequency)
	}
	if tube.Losses == resonator.WallLosses {
		r.Rows[0].Note = "with the wall losses (Rott's complex wave number)"
		if !byFreq {
			r.Add("loss_free_frequency", "Loss-free frequency", res.LossFreeFrequency, units.DimFrequency).Note =
				"the same tube at the adiabatic sound speed"
		}
	}
	addTubeRows(r, tube, res, u.Radius > 0)
	r.Warn(res.Warnings...)
	if v.Has("sweep") && strings.TrimSpace(v.Text("sweep")) != "" {
		if byFreq {
			return nil, v.Blame(errors.New("a sweep needs the tube length: it sweeps the frequency of a given tube"), "sweep")
		}
		t, err := tubeSweep(v, s)
		if err != nil {
			return nil, err
		}
		r.Table = t
	}
	// the cautions are for the gas as it is, not for the what-if of a sweep
	tubeCautions(r, T.Value, p.Value)
	return r, nil
}

// addTubeRows adds the rows every uniform-tube result has after its main
// answer. radiusPM says whether the radius carried a ±: the end
// correction's ± is shown only then (through ka alone it is negligible).
func addTubeRows(r *Result, tube resonator.Tube, res resonator.Result, radiusPM bool) {
	ec := r.Add("end_correction", "End correction", res.EndCorrection, units.DimLength)
	ec.Show = "mm"
	if n := tube.Ends.OpenEnds(); n > 0 {
		if radiusPM {
			ec.PM = res.EndCorrectionSigma
		}
		ends := "end"
		if n > 1 {
			ends = "ends"
		}
		ec.Note = fmt.Sprintf("%s, added at each of %d open %s; %.3g × radius", tube.Correction, n, ends, res.EndCorrection/tube.Radius)
	} else {
		ec.Note = "no open end"
	}
	r.Add("effective_length", "Acoustic (effective) length", res.EffectiveLength, units.DimLength)
	r.Add("sound_speed", "Sound speed", res.SoundSpeed, units.DimSpeed)
	r.Add("wavelength", "Wavelength", res.Wavelength, units.DimLength)
	r.Add("ka", "ka", res.KA, units.DimNone).Note = fmt.Sprintf("plane waves need ka below %.3g", resonator.CutoffKA)
	r.Add("attenuation", "Wall attenuation", res.Attenuation, units.DimPerLength).Note = "Kirchhoff boundary-layer loss of a travelling wave, in Np/m"
	r.AddPM("quality_factor", "Quality factor Q", res.Q.Total, res.QSigma, units.DimNone)
	for _, q := range []struct {
		key, label string
		v          float64
	}{
		{"q_wall", "Q from the walls alone", res.Q.Wall},
		{"q_end_caps", "Q from the end caps alone", res.Q.Caps},
		{"q_radiation", "Q from radiation alone", res.Q.Radiation},
	} {
		// an absent loss (+Inf) is left out
		if finite(q.v) {
			r.Add(q.key, q.label, q.v, units.DimNone)
		}
	}
	r.AddPM("bandwidth", "Bandwidth (−3 dB)", res.Bandwidth, res.BandwidthSigma, units.DimFrequency)
	d := r.AddPM("decay_time", "Ring-down time (amplitude 1/e)", res.DecayTime, res.DecayTimeSigma, units.DimTime)
	if res.DecayTime < 1 {
		d.Show = "ms"
	}
}
