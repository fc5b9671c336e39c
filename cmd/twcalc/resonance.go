package main

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// tubeFlags are the flags that describe a uniform tube, shared by
// `twcalc resonance` and `twcalc diagnose`.
type tubeFlags struct {
	ends, corr *string
	mode       *int
	length     *units.Quantity
	radius     *units.Quantity
}

func addTubeFlags(fl *flags, lengthDef string) *tubeFlags {
	return &tubeFlags{
		ends:   fl.choice("ends", []string{"closed-open", "closed-closed", "open-open"}, "closed-open", "end conditions: closed-open (quarter-wave), closed-closed or open-open (half-wave)"),
		corr:   fl.choice("end-correction", []string{"none", "unflanged", "flanged"}, "unflanged", "model of each open end: none, unflanged (thin-walled pipe in free space) or flanged (pipe ending in a large flat wall)"),
		mode:   fl.integer("mode", 1, 1, resonator.MaxMode, "harmonic number n (1 = fundamental)"),
		length: fl.quantity("length", units.DimLength, lengthDef, "physical tube length: 1m, 500mm, 20in; may carry a ±: 0.25m+-1mm"),
		radius: fl.quantity("radius", units.DimLength, "0m", "inner radius of the tube: 25mm, 0.5in (required for a tube)"),
	}
}

// tube returns the tube described by the flags (radius checked by the
// calculator).
func (tf *tubeFlags) tube(fl *flags) (resonator.Tube, error) {
	ends, err := resonator.ParseEnds(*tf.ends)
	if err != nil {
		return resonator.Tube{}, err
	}
	corr, err := resonator.ParseEndCorrection(*tf.corr)
	if err != nil {
		return resonator.Tube{}, err
	}
	if !fl.given("radius") {
		return resonator.Tube{}, &usageError{msg: "--radius is required: the inner radius of the tube, e.g. 25mm"}
	}
	return resonator.Tube{Ends: ends, Correction: corr, Mode: *tf.mode, Length: tf.length.Value, Radius: tf.radius.Value}, nil
}

// inputs records the flags that were used, as typed.
func recordInputs(fl *flags, r *report, names ...string) {
	for _, name := range names {
		for _, d := range fl.defs {
			if d.name != name {
				continue
			}
			switch d.kind {
			case kindQuantity:
				r.inputQuantity(name, *d.q, d.typed)
			case kindInt:
				r.input(name, *d.i)
			default:
				r.input(name, d.typed)
			}
		}
	}
}

// runResonance is `twcalc resonance`: the resonance frequency of a tube
// from its length, or the length for a target frequency; with --zones a
// tube of hot and cold zones; with --volume a Helmholtz resonator; with
// --sweep the frequency against temperature or mixture fraction as CSV.
func runResonance(args []string) (*report, error) {
	fl := newFlags("resonance")
	gas := fl.gas("gas", "air", "working gas, or a mixture by mole fraction: helium, helium:0.7,argon:0.3")
	temp := fl.quantity("temperature", units.DimTemperature, "20degC", "mean gas temperature: 300K, 27degC; may carry a ±: 20degC+-2K")
	pres := fl.quantity("pressure", units.DimPressure, "1atm", "mean pressure, absolute (10bar) or gauge (30barg)")
	tf := addTubeFlags(fl, "0m")
	freq := fl.quantity("frequency", units.DimFrequency, "0Hz", "target frequency instead of --length: gives the length; 400Hz, 1.2kHz")
	sweep := fl.str("sweep", "", "print CSV of frequency against temperature:FROM:TO:N (e.g. temperature:250K:450K:21) or fraction:FROM:TO:N of --second-gas (e.g. fraction:0:0.3:16)")
	second := fl.str("second-gas", "", "second gas of the fraction sweep, mixed into --gas (a pure gas): argon")
	zones := fl.str("zones", "", `tube of zones from the first end: "LENGTH,RADIUS,TEMPERATURE;..." e.g. "0.1m,10mm,700K;0.4m,10mm,295K" (up to 5)`)
	nModes := fl.integer("modes", 3, 1, 20, "how many modes of a zoned tube to list")
	vol := fl.quantity("volume", units.DimVolume, "0m3", "cavity volume of a Helmholtz resonator: 1L, 500mL (with --neck-length, --neck-radius)")
	neckL := fl.quantity("neck-length", units.DimLength, "0m", "neck length of a Helmholtz resonator")
	neckA := fl.quantity("neck-radius", units.DimLength, "0m", "neck inner radius of a Helmholtz resonator")
	nonIdeal := fl.boolean("non-ideal", "correct the gas density and sound speed with the second virial coefficient")
	fl.describe(`examples:
  twcalc resonance --gas air --temperature 300K --ends closed-open --length 1m --radius 25mm
  twcalc resonance --gas helium --pressure 10bar --ends closed-closed --frequency 400Hz --radius 25mm --json
  twcalc resonance --length 0.25m+-1mm --radius 8mm --temperature 20degC+-2K
  twcalc resonance --length 1m --radius 25mm --sweep temperature:250K:450K:21
  twcalc resonance --gas helium --length 1m --radius 25mm --sweep fraction:0:0.3:16 --second-gas argon
  twcalc resonance --ends closed-open --zones "0.1m,10mm,700K;0.4m,10mm,295K"
  twcalc resonance --volume 1L --neck-length 50mm --neck-radius 10mm --end-correction unflanged

Uncertainties (±) on length, radius, temperature, pressure and frequency are
carried to the results to first order.`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	var opts *gasprops.Options
	if *nonIdeal {
		opts = &gasprops.Options{NonIdeal: true}
	}
	r := newReport()
	switch {
	case fl.given("volume"):
		return helmholtzReport(fl, r, gas, temp, pres, [3]float64{vol.Value, neckL.Value, neckA.Value}, opts)
	case *zones != "":
		return zonesReport(fl, r, *zones, *nModes, gas, pres, opts)
	}
	tube, err := tf.tube(fl)
	if err != nil {
		return nil, err
	}
	s := resonator.Setup{Tube: tube, Gas: *gas, Temperature: temp.Value, Pressure: pres.Value, GasOptions: opts,
		U: resonator.Uncertainty{Length: tf.length.Uncertainty, Radius: tf.radius.Uncertainty, Temperature: temp.Uncertainty,
			Pressure: pres.Uncertainty, Frequency: freq.Uncertainty}}
	byFreq := fl.given("frequency")
	if byFreq == fl.given("length") {
		return nil, &usageError{msg: "give either --length (to get the frequency) or --frequency (to get the length), not both or neither"}
	}
	if *sweep != "" {
		if byFreq {
			return nil, &usageError{msg: "--sweep needs --length (it sweeps the frequency of a given tube)"}
		}
		return sweepReport(fl, r, s, *sweep, *second)
	}
	var res resonator.Result
	if byFreq {
		res, err = s.SolveLength(freq.Value)
	} else {
		res, err = s.SolveFrequency()
	}
	if err != nil {
		return nil, fl.blame(err, "length", "radius", "temperature", "pressure", "frequency", "mode")
	}
	recordInputs(fl, r, "gas", "temperature", "pressure", "ends", "end-correction", "mode")
	if byFreq {
		recordInputs(fl, r, "frequency", "radius")
		r.addPM("length", res.Length, res.LengthSigma, units.DimLength)
	} else {
		recordInputs(fl, r, "length", "radius")
		r.addPM("frequency", res.Frequency, res.FrequencySigma, units.DimFrequency)
	}
	if tube.Ends.OpenEnds() > 0 {
		// the correction's ± matters only through the radius; through ka it
		// is negligible and would only clutter the line
		u := 0.0
		if tf.radius.Uncertainty > 0 {
			u = res.EndCorrectionSigma
		}
		r.addPM("end_correction", res.EndCorrection, u, units.DimLength)
	} else {
		r.add("end_correction", 0, units.DimLength)
	}
	r.add("effective_length", res.EffectiveLength, units.DimLength)
	r.add("sound_speed", res.SoundSpeed, units.DimSpeed)
	r.add("wavelength", res.Wavelength, units.DimLength)
	r.add("ka", res.KA, units.DimNone)
	r.add("attenuation", res.Attenuation, units.DimPerLength)
	r.addPM("quality_factor", res.Q.Total, res.QSigma, units.DimNone)
	addFiniteQ(r, "q_wall", res.Q.Wall)
	addFiniteQ(r, "q_end_caps", res.Q.Caps)
	addFiniteQ(r, "q_radiation", res.Q.Radiation)
	r.addPM("bandwidth", res.Bandwidth, res.BandwidthSigma, units.DimFrequency)
	r.addPM("decay_time", res.DecayTime, res.DecayTimeSigma, units.DimTime)
	for _, w := range res.Warnings {
		r.warn(w)
	}
	return r, nil
}

// addFiniteQ adds a partial quality factor; an absent loss (+Inf) is left
// out.
func addFiniteQ(r *report, name string, q float64) {
	if finite(q) {
		r.add(name, q, units.DimNone)
	}
}

// sweepReport handles --sweep temperature:FROM:TO:N or fraction:FROM:TO:N.
func sweepReport(fl *flags, r *report, s resonator.Setup, spec, second string) (*report, error) {
	kind, rest, ok := strings.Cut(spec, ":")
	kind = strings.ToLower(strings.TrimSpace(kind))
	if !ok || (kind != "temperature" && kind != "fraction") {
		return nil, badInput("sweep", spec, errors.New("write temperature:FROM:TO:N (e.g. temperature:250K:450K:21) or fraction:FROM:TO:N"))
	}
	dim := units.DimTemperature
	if kind == "fraction" {
		dim = units.DimNone
	}
	var sp span
	if err := sp.read(rest, dim, units.Options{}); err != nil {
		return nil, badInput("sweep", spec, err)
	}
	recordInputs(fl, r, "gas", "temperature", "pressure", "ends", "end-correction", "mode", "length", "radius")
	r.input("sweep", spec)
	var pts []resonator.Point
	var err error
	var header []string
	if kind == "temperature" {
		pts, err = s.SweepTemperature(sp.From, sp.To, sp.N)
		header = []string{"temperature_K", "frequency_Hz"}
	} else {
		first, second, e := binaryPair(s.Gas, second)
		if e != nil {
			return nil, e
		}
		r.input("second-gas", second.Name)
		pts, err = s.SweepFraction(first, second, sp.From, sp.To, sp.N)
		header = []string{"mole_fraction_" + second.Name, "frequency_Hz"}
	}
	if err != nil {
		return nil, fl.blame(err, "sweep", "length", "radius", "temperature", "pressure")
	}
	rows := make([][]float64, len(pts))
	for i, p := range pts {
		rows[i] = []float64{p.X, p.Frequency}
	}
	r.table(header, rows)
	return r, nil
}

// binaryPair returns the pure first gas of mix and the second gas named by
// the --second-gas flag.
func binaryPair(mix gasprops.Mixture, secondName string) (*gasprops.Species, *gasprops.Species, error) {
	comps := mix.Components()
	if len(comps) != 1 {
		return nil, nil, &usageError{msg: fmt.Sprintf("--gas %q: give a pure gas for a mixture fraction (the second gas comes from --second-gas)", mix.String())}
	}
	if secondName == "" {
		return nil, nil, &usageError{msg: "--second-gas is required for a mixture fraction: e.g. --second-gas argon"}
	}
	sec, err := gasprops.Lookup(secondName)
	if err != nil {
		return nil, nil, badInput("second-gas", secondName, err)
	}
	if sec == comps[0].Species {
		return nil, nil, badInput("second-gas", secondName, errors.New("is the same gas as --gas"))
	}
	return comps[0].Species, sec, nil
}

// zonesReport handles --zones.
func zonesReport(fl *flags, r *report, spec string, n int, gas *gasprops.Mixture, pres *units.Quantity, opts *gasprops.Options) (*report, error) {
	zones, err := parseZones(spec)
	if err != nil {
		return nil, badInput("zones", spec, err)
	}
	ends, err := resonator.ParseEnds(fl.typed("ends"))
	if err != nil {
		return nil, err
	}
	corr, err := resonator.ParseEndCorrection(fl.typed("end-correction"))
	if err != nil {
		return nil, err
	}
	zt := resonator.ZonedTube{Ends: ends, Correction: corr, Zones: zones, Gas: *gas, Pressure: pres.Value, GasOptions: opts}
	res, err := zt.Modes(n)
	if err != nil {
		if _, ok := rangeField(err); ok {
			return nil, badInput("zones", spec, err)
		}
		return nil, err
	}
	recordInputs(fl, r, "gas", "pressure", "ends", "end-correction", "zones", "modes")
	m := res.Modes[0]
	r.add("frequency", m.Frequency, units.DimFrequency)
	r.add("travel_time_frequency", m.TravelTime, units.DimFrequency)
	r.add("difference", m.Difference, units.DimFrequency)
	list := make(zoneModeList, len(res.Modes))
	for i, m := range res.Modes {
		list[i] = zoneModeJSON{m.Number, m.Frequency, m.TravelTime, m.Difference}
	}
	r.addValue("modes", list)
	for _, w := range res.Warnings {
		r.warn(w)
	}
	return r, nil
}

// parseZones reads "LENGTH,RADIUS,TEMPERATURE;..." with any units.
func parseZones(spec string) ([]resonator.Zone, error) {
	parts := strings.Split(spec, ";")
	if len(parts) > resonator.MaxZones {
		return nil, fmt.Errorf("%d zones: at most %d", len(parts), resonator.MaxZones)
	}
	var zs []resonator.Zone
	for i, p := range parts {
		f := strings.Split(p, ",")
		if len(f) != 3 {
			return nil, fmt.Errorf("zone %d %q: write LENGTH,RADIUS,TEMPERATURE, e.g. 0.1m,10mm,700K", i+1, strings.TrimSpace(p))
		}
		dims := []units.Dimension{units.DimLength, units.DimLength, units.DimTemperature}
		var v [3]float64
		for j, s := range f {
			q, err := units.Parse(strings.TrimSpace(s), dims[j])
			if err != nil {
				return nil, fmt.Errorf("zone %d: %w", i+1, err)
			}
			v[j] = q.Value
		}
		zs = append(zs, resonator.Zone{Length: v[0], Radius: v[1], Temperature: v[2]})
	}
	return zs, nil
}

// helmholtzReport handles --volume, --neck-length, --neck-radius.
// size holds the cavity volume, neck length and neck radius (SI).
func helmholtzReport(fl *flags, r *report, gas *gasprops.Mixture, temp, pres *units.Quantity, size [3]float64, opts *gasprops.Options) (*report, error) {
	outer, err := resonator.ParseEndCorrection(fl.typed("end-correction"))
	if err != nil {
		return nil, err
	}
	for _, name := range []string{"neck-length", "neck-radius"} {
		if !fl.given(name) {
			return nil, &usageError{msg: "--" + name + " is required with --volume (a Helmholtz resonator)"}
		}
	}
	g, err := gas.Properties(units.Temperature(temp.Value), units.Pressure(pres.Value), opts)
	if err != nil {
		return nil, fl.blame(err, "temperature", "pressure")
	}
	h := resonator.Helmholtz{Volume: size[0], NeckLength: size[1], NeckRadius: size[2], Outer: outer}
	res, err := resonator.HelmholtzFrequency(h, g)
	if err != nil {
		return nil, fl.blame(err, "volume", "neck-length", "neck-radius")
	}
	recordInputs(fl, r, "gas", "temperature", "pressure", "volume", "neck-length", "neck-radius", "end-correction")
	r.add("frequency", res.Frequency, units.DimFrequency)
	r.add("inner_end_correction", res.InnerCorrection, units.DimLength)
	r.add("outer_end_correction", res.OuterCorrection, units.DimLength)
	r.add("effective_neck_length", res.EffectiveLength, units.DimLength)
	r.add("sound_speed", res.SoundSpeed, units.DimSpeed)
	r.add("wavelength", res.Wavelength, units.DimLength)
	for _, w := range res.Warnings {
		r.warn(w)
	}
	return r, nil
}

// zoneModeJSON is one mode of a zoned tube in the JSON output.
type zoneModeJSON struct {
	Mode       int     `json:"mode"`
	Frequency  float64 `json:"frequency_Hz"`
	TravelTime float64 `json:"travel_time_frequency_Hz"`
	Difference float64 `json:"difference_Hz"`
}

// zoneModeList is the modes of a zoned tube; String is its table form.
type zoneModeList []zoneModeJSON

// String lists the modes for the table: "1: 347.6 Hz (travel time 369.7 Hz); 2: ...".
func (l zoneModeList) String() string {
	parts := make([]string, len(l))
	for i, m := range l {
		parts[i] = fmt.Sprintf("%d: %s (travel time %s)", m.Mode,
			units.Format(m.Frequency, units.DimFrequency), units.Format(m.TravelTime, units.DimFrequency))
	}
	return strings.Join(parts, "; ")
}
