package resonator

import (
	"math"

	"tubewright/calc/uncertain"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Uncertainty holds the standard uncertainties of a Setup's inputs, in SI
// units. Zero means exact; an exact input costs no extra evaluation.
type Uncertainty struct {
	Length      float64 // m
	Radius      float64 // m
	Temperature float64 // K
	Pressure    float64 // Pa
	Frequency   float64 // Hz (target or measured frequency)
	Fraction    float64 // mole fraction of the second gas (diagnosis of temperature with a known mixture ignores it)
}

// Setup is a uniform tube filled with a gas at a mean temperature and
// pressure: what the bench calculators need for the forward problem
// (frequency from length, length from frequency) and the inverse ones
// (Diagnose).
type Setup struct {
	Tube
	Gas         gasprops.Mixture
	Temperature float64           // mean gas temperature, K
	Pressure    float64           // mean absolute pressure, Pa
	GasOptions  *gasprops.Options // nil: ideal gas
	U           Uncertainty       // standard uncertainties of the inputs
	// RelativeHumidity is the relative humidity of air, 0 to 1 (0: dry);
	// the gas is then gasprops.HumidAir. Other gases refuse a non-zero
	// value.
	RelativeHumidity float64
}

// properties evaluates the gas at temperature T and pressure p.
func (s Setup) properties(T, p float64) (gasprops.Properties, error) {
	if err := checkPositive("pressure", p, "Pa"); err != nil {
		return gasprops.Properties{}, err
	}
	if err := checkPositive("temperature", T, "K"); err != nil {
		return gasprops.Properties{}, err
	}
	return gasAt(s.Gas, T, p, s.RelativeHumidity, s.GasOptions)
}

// gasAt evaluates mix at T (K) and p (Pa), as humid air when rh > 0.
func gasAt(mix gasprops.Mixture, T, p, rh float64, o *gasprops.Options) (gasprops.Properties, error) {
	if rh == 0 {
		return mix.Properties(units.Temperature(T), units.Pressure(p), o)
	}
	if c := mix.Components(); len(c) != 1 || c[0].Species.Name != "air" {
		e := units.NewRangeError("relative humidity", rh, 0, 0, "")
		e.Why = "humidity applies to air only"
		return gasprops.Properties{}, e
	}
	return gasprops.HumidAir(units.Temperature(T), units.Pressure(p), rh, o)
}

// resultOutputs lists the uncertain outputs of a tube result in the order
// used with uncertain.PropagateN.
func resultOutputs(r Result, out []float64) {
	out[0], out[1], out[2] = r.Frequency, r.Length, r.EndCorrection
	out[3], out[4], out[5] = r.Q.Total, r.Bandwidth, r.DecayTime
}

const nOutputs = 6

func setSigmas(r *Result, s []float64) {
	r.FrequencySigma, r.LengthSigma, r.EndCorrectionSigma = s[0], s[1], s[2]
	r.QSigma, r.BandwidthSigma, r.DecayTimeSigma = s[3], s[4], s[5]
}

// SolveFrequency solves the tube for its resonance frequency (see
// TubeFrequency) with the gas evaluated at s.Temperature and s.Pressure,
// and propagates the uncertainties of length, radius, temperature and
// pressure. The gas model's errors (temperature far outside its range)
// are returned as they are.
func (s Setup) SolveFrequency() (Result, error) {
	g, err := s.properties(s.Temperature, s.Pressure)
	if err != nil {
		return Result{}, err
	}
	r, err := TubeFrequency(s.Tube, g)
	if err != nil {
		return Result{}, err
	}
	x := []float64{s.Length, s.Radius, s.Temperature, s.Pressure}
	u := []float64{s.U.Length, s.U.Radius, s.U.Temperature, s.U.Pressure}
	f := func(x, out []float64) {
		t := s.Tube
		t.Length, t.Radius = x[0], x[1]
		g, err := s.properties(x[2], x[3])
		if err != nil {
			fillNaN(out)
			return
		}
		r, err := TubeFrequency(t, g)
		if err != nil {
			fillNaN(out)
			return
		}
		resultOutputs(r, out)
	}
	s.propagate(&r, f, x, u)
	return r, nil
}

// SolveLength solves for the physical tube length that resonates at frequency
// f (Hz; s.Length is ignored; see TubeLength), propagating the
// uncertainties of frequency (s.U.Frequency), radius, temperature and
// pressure.
func (s Setup) SolveLength(f float64) (Result, error) {
	g, err := s.properties(s.Temperature, s.Pressure)
	if err != nil {
		return Result{}, err
	}
	r, err := TubeLength(s.Tube, f, g)
	if err != nil {
		return Result{}, err
	}
	x := []float64{f, s.Radius, s.Temperature, s.Pressure}
	u := []float64{s.U.Frequency, s.U.Radius, s.U.Temperature, s.U.Pressure}
	fn := func(x, out []float64) {
		t := s.Tube
		t.Radius = x[1]
		g, err := s.properties(x[2], x[3])
		if err != nil {
			fillNaN(out)
			return
		}
		r, err := TubeLength(t, x[0], g)
		if err != nil {
			fillNaN(out)
			return
		}
		resultOutputs(r, out)
	}
	s.propagate(&r, fn, x, u)
	return r, nil
}

// propagate fills r's sigma fields; a sigma that cannot be estimated adds a
// warning and is left at 0.
func (s Setup) propagate(r *Result, f func(x, out []float64), x, u []float64) {
	_, sig := uncertain.PropagateN(f, x, u, nOutputs)
	bad := false
	for i, v := range sig {
		if !finite(v) {
			sig[i] = 0
			bad = true
		}
	}
	if bad {
		r.Warnings = append(r.Warnings, "the uncertainty could not be propagated for every result (an input's ± reaches outside the model's range)")
	}
	setSigmas(r, sig)
	large := false
	for i, xi := range x {
		if xi != 0 && u[i]/math.Abs(xi) > 0.1 {
			large = true
		}
	}
	if large {
		r.Warnings = append(r.Warnings, "an input's ± is above 10 % of its value: first-order propagation of the uncertainty is only a rough guide")
	}
}

func fillNaN(out []float64) {
	for i := range out {
		out[i] = math.NaN()
	}
}
