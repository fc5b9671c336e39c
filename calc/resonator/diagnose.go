package resonator

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/numeric"
	"tubewright/calc/uncertain"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Estimate is a quantity inferred from a measurement, with its propagated
// standard uncertainty.
type Estimate struct {
	Value      float64  // SI (K for a temperature, 1 for a mole fraction)
	Sigma      float64  // standard uncertainty, same unit; 0 when inputs were exact
	Iterations int      // root-finder iterations of the central solve
	Warnings   []string // model-range and propagation warnings
}

// ErrNoSolution is wrapped by the errors of the Diagnose methods when no
// value in the model's range reproduces the measured frequency.
var ErrNoSolution = errors.New("no solution in range")

// DiagnoseTemperature infers the mean gas temperature (K) of the tube s
// (geometry, ends, mode, gas, pressure; s.Temperature is ignored) from a
// measured resonance frequency fMeas (Hz): it solves
//
//	TubeFrequency(T) = fMeas
//
// for T within the gas model's validated range (gasprops Mixture.Range;
// for humid air also within 273.15–373.15 K and below boiling at the
// pressure) by Brent's method. The frequency grows with T (c ∝ √T for an ideal
// gas), so the solution is unique when it exists. When it does not, the
// error wraps ErrNoSolution and is a *units.RangeError on the measured
// frequency that gives the band of frequencies this tube can show.
// Uncertainties of fMeas (s.U.Frequency), length, radius and pressure are
// propagated to the result. With WallLosses a tube without a resonance at
// the answer (Q below MinQ) gives a *NoResonanceError.
func (s Setup) DiagnoseTemperature(fMeas float64) (Estimate, error) {
	if err := checkPositive("measured frequency", fMeas, "Hz"); err != nil {
		return Estimate{}, err
	}
	if err := s.Tube.check(true); err != nil {
		return Estimate{}, err
	}
	if err := checkPositive("pressure", s.Pressure, "Pa"); err != nil {
		return Estimate{}, err
	}
	tmin, tmax := s.Gas.Range()
	if s.RelativeHumidity > 0 {
		// humid air: within the saturation-pressure range, and below the
		// temperature where the vapour would reach the total pressure
		tmin, tmax = math.Max(tmin, gasprops.HumidMinTemperature), math.Min(tmax, gasprops.HumidMaxTemperature)
		for i := 0; i < 40; i++ {
			if _, err := gasprops.WaterMoleFraction(tmax, s.Pressure, s.RelativeHumidity); err == nil {
				break
			}
			tmax -= (tmax - tmin) / 8
		}
	}
	solve := func(x []float64) (float64, int, []string, error) {
		t := s.Tube
		t.Length, t.Radius = x[1], x[2]
		var warn []string
		h := func(T float64) float64 { return s.frequencyOf(t, s.Gas, T, x[3]) - x[0] }
		res, err := numeric.Brent(h, tmin, tmax, &numeric.RootSettings{RelTol: 1e-12})
		if err != nil {
			return 0, 0, nil, s.noSolution(x[0], h, tmin, tmax, "gas temperatures "+units.Number(tmin, 6)+"–"+units.Format(tmax, units.DimTemperature), err)
		}
		if g, err := s.properties(res.X, x[3]); err == nil {
			warn = g.Warnings
		}
		return res.X, res.Iterations, warn, nil
	}
	x := []float64{fMeas, s.Length, s.Radius, s.Pressure}
	u := []float64{s.U.Frequency, s.U.Length, s.U.Radius, s.U.Pressure}
	e, err := estimate(solve, x, u)
	if err != nil {
		if nr := s.noResonanceIn(tmin, tmax); nr != nil {
			return Estimate{}, nr
		}
		return Estimate{}, err
	}
	if err := s.resonanceAt(s.Gas, e.Value, s.Pressure); err != nil {
		return Estimate{}, err
	}
	return e, nil
}

// noResonanceIn returns a *NoResonanceError when, with wall losses, the
// tube resonates at none of five temperatures spread over tmin–tmax (K):
// the reason a diagnosis found no answer is then that there is no
// resonance to read, not the measured value.
func (s Setup) noResonanceIn(tmin, tmax float64) error {
	if s.Losses != WallLosses || !(tmin > 0 && tmax > tmin) {
		return nil
	}
	best := 0.0
	for i := 0; i < 5; i++ {
		T := tmin * math.Pow(tmax/tmin, float64(i)/4)
		g, err := s.properties(T, s.Pressure)
		if err != nil {
			continue
		}
		r, err := tubeFrequency(s.Tube, g)
		if err != nil {
			continue
		}
		if r.Q.Total >= MinQ {
			return nil
		}
		best = math.Max(best, r.Q.Total)
	}
	if best == 0 {
		return nil // nothing could be evaluated: the solver's error says more
	}
	return &NoResonanceError{Q: best}
}

// resonanceAt returns a *NoResonanceError when s's tube filled with mix
// at T and p has no resonance (see TubeFrequency).
func (s Setup) resonanceAt(mix gasprops.Mixture, T, p float64) error {
	ss := s
	ss.Gas = mix
	g, err := ss.properties(T, p)
	if err != nil {
		return nil // the solve itself succeeded; nothing more to say
	}
	_, err = TubeFrequency(s.Tube, g)
	if errors.Is(err, ErrNoResonance) {
		return err
	}
	return nil
}

// DiagnoseFraction infers the mole fraction x of the second gas in a
// binary mixture of first and second (gasprops.Binary) from a measured
// resonance frequency fMeas (Hz) at the known temperature s.Temperature
// (s.Gas is ignored). It solves TubeFrequency(x) = fMeas for x in [0, 1]
// by Brent's method. When the two gases give nearly the same frequency the
// fraction is poorly determined and the uncertainty shows it. No solution
// in [0, 1] is an error wrapping ErrNoSolution. Uncertainties of fMeas,
// length, radius, temperature and pressure are propagated.
func (s Setup) DiagnoseFraction(first, second *gasprops.Species, fMeas float64) (Estimate, error) {
	if first == nil || second == nil {
		panic("resonator: nil species")
	}
	if err := checkPositive("measured frequency", fMeas, "Hz"); err != nil {
		return Estimate{}, err
	}
	if err := s.Tube.check(true); err != nil {
		return Estimate{}, err
	}
	// the temperature must be inside both gases' models: check once with
	// the pure gases so the error names the temperature.
	for _, sp := range []*gasprops.Species{first, second} {
		m := gasprops.Pure(sp)
		if _, err := m.Properties(units.Temperature(s.Temperature), units.Pressure(s.Pressure), s.GasOptions); err != nil {
			return Estimate{}, err
		}
	}
	solve := func(x []float64) (float64, int, []string, error) {
		t := s.Tube
		t.Length, t.Radius = x[1], x[2]
		h := func(xf float64) float64 {
			mix, err := gasprops.Binary(first, second, xf)
			if err != nil {
				return math.NaN()
			}
			return s.frequencyOf(t, mix, x[4], x[3]) - x[0]
		}
		res, err := numeric.Brent(h, 0, 1, &numeric.RootSettings{AbsTol: 1e-12})
		if err != nil {
			return 0, 0, nil, s.noSolution(x[0], h, 0, 1, fmt.Sprintf("mole fractions 0–1 of %s in %s", second.Name, first.Name), err)
		}
		return res.X, res.Iterations, nil, nil
	}
	x := []float64{fMeas, s.Length, s.Radius, s.Pressure, s.Temperature}
	u := []float64{s.U.Frequency, s.U.Length, s.U.Radius, s.U.Pressure, s.U.Temperature}
	e, err := estimate(solve, x, u)
	if err == nil {
		if mix, merr := gasprops.Binary(first, second, e.Value); merr == nil {
			if rerr := s.resonanceAt(mix, s.Temperature, s.Pressure); rerr != nil {
				return Estimate{}, rerr
			}
		}
	}
	if err == nil && e.Sigma > 0 && (e.Value-e.Sigma < 0 || e.Value+e.Sigma > 1) {
		e.Warnings = append(e.Warnings, "the ± of the mole fraction reaches beyond 0 or 1: the measurement does not pin the mixture down")
	}
	return e, err
}

// frequencyOf returns the resonance frequency of tube t filled with mix at
// T and p, or NaN where the gas model or the tube refuses the inputs.
func (s Setup) frequencyOf(t Tube, mix gasprops.Mixture, T, p float64) float64 {
	ss := s
	ss.Gas = mix
	g, err := ss.properties(T, p)
	if err != nil {
		return math.NaN()
	}
	r, err := tubeFrequency(t, g)
	if err != nil {
		return math.NaN()
	}
	return r.Frequency
}

// noSolution builds the error for an inverse problem without a root: a
// RangeError on the measured frequency giving the frequencies reachable
// between the ends lo and hi of the searched variable (described by what).
func (s Setup) noSolution(fMeas float64, h func(float64) float64, lo, hi float64, what string, cause error) error {
	const field = "measured frequency"
	if !errors.Is(cause, numeric.ErrNoBracket) {
		return fmt.Errorf("%s %s: the solver failed: %w", field, units.Format(fMeas, units.DimFrequency), cause)
	}
	fa, fb := h(lo)+fMeas, h(hi)+fMeas
	if !finite(fa) || !finite(fb) {
		return fmt.Errorf("%s %s: %w (the model cannot be evaluated at the ends of %s)", field, units.Format(fMeas, units.DimFrequency), ErrNoSolution, what)
	}
	e := units.NewRangeError(field, fMeas, math.Min(fa, fb), math.Max(fa, fb), "Hz")
	e.Why = fmt.Sprintf("%v: this tube resonates only in that band for %s", ErrNoSolution, what)
	return &noSolutionError{e}
}

// noSolutionError is a *units.RangeError that also matches ErrNoSolution.
type noSolutionError struct{ *units.RangeError }

func (e *noSolutionError) Unwrap() []error { return []error{e.RangeError, ErrNoSolution} }

// estimate solves at x and propagates u through the solver.
func estimate(solve func(x []float64) (float64, int, []string, error), x, u []float64) (Estimate, error) {
	v, it, warn, err := solve(x)
	if err != nil {
		return Estimate{}, err
	}
	e := Estimate{Value: v, Iterations: it, Warnings: warn}
	_, sig := uncertain.Propagate(func(x []float64) float64 {
		v, _, _, err := solve(x)
		if err != nil {
			return math.NaN()
		}
		return v
	}, x, u)
	if !finite(sig) {
		sig = 0
		e.Warnings = append(e.Warnings, "the uncertainty could not be propagated (an input's ± reaches outside the range where a solution exists)")
	}
	e.Sigma = sig
	return e, nil
}
