package resonator

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/numeric"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// MaxMode is the highest harmonic number accepted.
const MaxMode = 50

// Tube is a straight rigid tube of uniform circular cross-section.
type Tube struct {
	Ends       Ends          // which ends are closed
	Correction EndCorrection // model of each open end
	Mode       int           // harmonic number n ≥ 1 (1 = fundamental)
	Length     float64       // physical length, m (ignored by TubeLength)
	Radius     float64       // inner radius, m
	// Losses selects the model of the frequency: LossFree (the zero value,
	// the adiabatic sound speed) or WallLosses (Rott's complex wave
	// number, see WaveNumber). The Q is the same in both.
	Losses Losses
}

// Result is a solved uniform-tube resonance. Sigma fields are the
// propagated standard uncertainties (0 when the inputs had none).
type Result struct {
	Frequency       float64 // resonance frequency, Hz
	Length          float64 // physical tube length, m
	EndCorrection   float64 // δ at each open end, m (0 for closed-closed)
	EffectiveLength float64 // acoustic length L + δ·(open ends), m
	SoundSpeed      float64 // m/s
	Wavelength      float64 // c/f, m
	KA              float64 // Helmholtz number 2πf·a/c
	Attenuation     float64 // Kirchhoff amplitude attenuation, Np/m
	Q               Quality // quality factor by loss mechanism
	Bandwidth       float64 // -3 dB (half-power) bandwidth f/Q, Hz
	DecayTime       float64 // amplitude 1/e decay time Q/(πf), s
	// Losses is the model that gave Frequency (or Length).
	Losses Losses
	// LossFreeFrequency is the resonance of the same tube without wall
	// losses, Hz (equal to Frequency with LossFree).
	LossFreeFrequency float64
	// MeanFreePath is the mean free path of the gas molecules, m, and
	// Knudsen its ratio to the radius (see MeanFreePath; a warning is
	// added above KnudsenLimit).
	MeanFreePath float64
	Knudsen      float64

	FrequencySigma, LengthSigma, EndCorrectionSigma float64
	QSigma, BandwidthSigma, DecayTimeSigma          float64

	Warnings []string // model-range warnings, never errors
}

// modeFactor returns m such that f = m·c/L_eff: (2n-1)/4 for a
// quarter-wave tube, n/2 for a half-wave tube.
func (t Tube) modeFactor() float64 {
	if t.Ends == ClosedOpen {
		return float64(2*t.Mode-1) / 4
	}
	return float64(t.Mode) / 2
}

func (t Tube) check(needLength bool) error {
	if t.Ends < ClosedOpen || t.Ends > OpenOpen {
		panic("resonator: unknown Ends")
	}
	if t.Correction < NoCorrection || t.Correction > Flanged {
		panic("resonator: unknown EndCorrection")
	}
	if t.Losses != LossFree && t.Losses != WallLosses {
		panic("resonator: unknown Losses")
	}
	if t.Mode < 1 || t.Mode > MaxMode {
		return units.NewRangeError("mode", float64(t.Mode), 1, MaxMode, "")
	}
	if needLength {
		if err := checkPositive("length", t.Length, "m"); err != nil {
			return err
		}
	}
	return checkPositive("radius", t.Radius, "m")
}

// TubeFrequency returns the resonance frequency of mode t.Mode of the tube
// filled with gas of properties g (use gasprops to get them at the mean
// temperature and pressure), with its end corrections, losses and Q:
//
//	f_n = (2n-1) c / (4 L_eff)   closed-open   (quarter-wave)
//	f_n = n c / (2 L_eff)        closed-closed, open-open (half-wave)
//	L_eff = L + δ(ka)·(number of open ends)
//
// (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed.
// 2000, ch. 10, standing waves in pipes; chapter cited from memory).
// Because δ depends on ka and so on f, the equation is solved with Brent's
// method. Losses: see KirchhoffAttenuation and Quality. Errors: length,
// radius not positive, mode outside 1-50, incomplete gas properties.
//
// With t.Losses = WallLosses the frequency is that of the lossy duct: the
// loss-free mode is followed to the complex frequency at which the
// far-end condition holds with Rott's complex wave number (see
// ZonedModesLosses and WaveNumber), and Frequency is Re ω/2π; the Q is
// computed as without losses. LossFreeFrequency keeps the loss-free value.
// With WallLosses a total Q below MinQ is a *NoResonanceError (matching
// ErrNoResonance), returned with the filled Result: the losses damp the
// wave within a cycle and the "frequency" means nothing.
func TubeFrequency(t Tube, g gasprops.Properties) (Result, error) {
	r, err := tubeFrequency(t, g)
	if err != nil {
		return Result{}, err
	}
	return r, r.resonance(t)
}

// tubeFrequency is TubeFrequency without the check of the Q.
func tubeFrequency(t Tube, g gasprops.Properties) (Result, error) {
	if err := t.check(true); err != nil {
		return Result{}, err
	}
	if err := checkProps(g); err != nil {
		return Result{}, err
	}
	f, err := lossFreeFrequency(t, g)
	if err != nil {
		return Result{}, err
	}
	f0 := f
	if t.Losses == WallLosses {
		if f, err = wallFrequency(t, g, f0); err != nil {
			return Result{}, err
		}
	}
	r := finish(t, g, f)
	r.LossFreeFrequency = f0
	return r, nil
}

// lossFreeFrequency is the loss-free resonance of a checked tube.
func lossFreeFrequency(t Tube, g gasprops.Properties) (float64, error) {
	c, m, nOpen := g.SoundSpeed, t.modeFactor(), float64(t.Ends.OpenEnds())
	f0 := m * c / t.Length
	f := f0
	if t.Correction != NoCorrection && nOpen > 0 {
		// g(f) = f·(L + n δ(ka(f))) - m c, increasing in f; δ ≤ 0.8216 a
		h := func(f float64) float64 {
			d, _ := CorrectionLength(t.Correction, t.Radius, 2*math.Pi*f*t.Radius/c)
			return f*(t.Length+nOpen*d) - m*c
		}
		lo := m * c / (t.Length + nOpen*FlangedLimit*t.Radius*1.001)
		r, err := numeric.Brent(h, lo, f0, &numeric.RootSettings{RelTol: 1e-13})
		if err != nil {
			return 0, fmt.Errorf("resonator: end-corrected frequency: %w", err)
		}
		f = r.X
	}
	return f, nil
}

// wallFrequency follows the loss-free resonance f0 of tube t to the
// resonance with wall losses (see ZonedModesLosses): Re ω/2π.
func wallFrequency(t Tube, g gasprops.Properties, f0 float64) (float64, error) {
	w, err := newWaveTube(t.Ends, t.Correction, []Section{sectionOf(t, g)})
	if err != nil {
		return 0, err
	}
	omega, err := w.solve(f0)
	if err != nil {
		return 0, err
	}
	return real(omega) / (2 * math.Pi), nil
}

// sectionOf is the uniform tube t as one section.
func sectionOf(t Tube, g gasprops.Properties) Section {
	return Section{Length: t.Length, Radius: t.Radius, SoundSpeed: g.SoundSpeed, Density: g.Density,
		Gamma: g.Gamma, KinematicViscosity: g.KinematicViscosity, ThermalDiffusivity: g.ThermalDiffusivity}
}

// TubeLength returns the physical length of a tube (t.Length is ignored)
// whose mode t.Mode resonates at frequency f (Hz) with gas properties g:
//
//	L = m c / f - δ(ka)·(number of open ends)
//
// with m as in TubeFrequency. With t.Losses = WallLosses the length is
// the one whose wall-loss resonance (see TubeFrequency) is f, found by
// Brent's method from the loss-free length, which is too long; the
// result's LossFreeFrequency is that length's loss-free resonance.
// With WallLosses a Q below MinQ is a *NoResonanceError, returned with the
// filled Result. It is also an error when the end corrections alone
// are longer than the acoustic length (the frequency is too high for this
// radius and mode): the RangeError gives the highest frequency possible.
func TubeLength(t Tube, f float64, g gasprops.Properties) (Result, error) {
	if err := t.check(false); err != nil {
		return Result{}, err
	}
	if err := checkPositive("frequency", f, "Hz"); err != nil {
		return Result{}, err
	}
	if err := checkProps(g); err != nil {
		return Result{}, err
	}
	c, m, nOpen := g.SoundSpeed, t.modeFactor(), float64(t.Ends.OpenEnds())
	length := func(f float64) float64 {
		d, _ := CorrectionLength(t.Correction, t.Radius, 2*math.Pi*f*t.Radius/c)
		return m*c/f - nOpen*d
	}
	L := length(f)
	if !(L > 0) {
		fmax := f
		if r, err := numeric.Brent(length, f*1e-6, f, nil); err == nil {
			fmax = r.X
		}
		e := units.NewRangeError("frequency", f, 0, fmax, "Hz")
		e.Why = fmt.Sprintf("the end corrections of a %s radius are longer than the acoustic length of mode %d above that", units.Format(t.Radius, units.DimLength), t.Mode)
		return Result{}, e
	}
	t.Length = L
	if t.Losses == WallLosses {
		var err error
		if t.Length, err = wallLength(t, g, f); err != nil {
			return Result{}, err
		}
	}
	r := finish(t, g, f)
	r.LossFreeFrequency = f
	if t.Losses == WallLosses {
		if f0, err := lossFreeFrequency(t, g); err == nil {
			r.LossFreeFrequency = f0
		}
	}
	return r, r.resonance(t)
}

// MinQ is the quality factor below which a tube has no resonance to speak
// of (with WallLosses): the wave's energy is gone within about a cycle.
const MinQ = 1.0

// ErrNoResonance is matched (errors.Is) by *NoResonanceError.
var ErrNoResonance = errors.New("no resonance")

// NoResonanceError says that the tube's Q is below MinQ.
type NoResonanceError struct {
	Q float64 // the total quality factor, 1
}

// Error says why there is no frequency to give and what would help.
func (e *NoResonanceError) Error() string {
	return fmt.Sprintf("no resonance: the quality factor is %s, below 1; the wall and end losses damp the sound within a cycle, so this tube has no frequency to speak of (a wider tube or a higher pressure helps)", units.Number(e.Q, 2))
}

// Is lets errors.Is(err, ErrNoResonance) match.
func (e *NoResonanceError) Is(target error) bool { return target == ErrNoResonance }

// resonance returns a *NoResonanceError when wall losses are on and the
// Q is below MinQ.
func (r Result) resonance(t Tube) error {
	if t.Losses == WallLosses && r.Q.Total < MinQ {
		return &NoResonanceError{Q: r.Q.Total}
	}
	return nil
}

// wallLength returns the length of tube t (t.Length holds the loss-free
// answer, which is too long) that resonates at f with wall losses, by
// Brent's method on L: the frequency falls as L grows.
func wallLength(t Tube, g gasprops.Properties, f float64) (float64, error) {
	h := func(L float64) float64 {
		tt := t
		tt.Length = L
		f0, err := lossFreeFrequency(tt, g)
		if err != nil {
			return math.NaN()
		}
		fw, err := wallFrequency(tt, g, f0)
		if err != nil {
			return math.NaN()
		}
		return fw - f
	}
	hi := t.Length
	lo := hi / 2
	for i := 0; i < 40 && h(lo) < 0; i++ {
		hi, lo = lo, lo/2
	}
	r, err := numeric.Brent(h, lo, hi, &numeric.RootSettings{RelTol: 1e-12})
	if err != nil {
		return 0, fmt.Errorf("resonator: tube length with wall losses: %w", err)
	}
	return r.X, nil
}

// finish fills the result for a tube t resonating at f.
func finish(t Tube, g gasprops.Properties, f float64) Result {
	c := g.SoundSpeed
	k := 2 * math.Pi * f / c
	ka := k * t.Radius
	nOpen := float64(t.Ends.OpenEnds())
	d, warn := CorrectionLength(t.Correction, t.Radius, ka)
	if nOpen == 0 {
		d, warn = 0, ""
	}
	r := Result{
		Losses:          t.Losses,
		Frequency:       f,
		Length:          t.Length,
		EndCorrection:   d,
		EffectiveLength: t.Length + nOpen*d,
		SoundSpeed:      c,
		Wavelength:      c / f,
		KA:              ka,
	}
	if warn == "" && ka >= CutoffKA {
		warn = kaWarning(ka, math.Inf(1))
	}
	if warn != "" {
		r.Warnings = append(r.Warnings, warn)
	}
	alpha, w, _ := KirchhoffAttenuation(g, t.Radius, f)
	if w != "" {
		r.Warnings = append(r.Warnings, w)
	}
	r.Attenuation = alpha
	r.MeanFreePath = MeanFreePath(g)
	r.Knudsen = r.MeanFreePath / t.Radius
	if w := knudsenWarning(g, t.Radius); w != "" {
		r.Warnings = append(r.Warnings, w)
	}
	r.Q = tubeQuality(t, g, f, k, d)
	r.Bandwidth = f / r.Q.Total
	r.DecayTime = r.Q.Total / (math.Pi * f)
	r.Warnings = append(r.Warnings, g.Warnings...)
	return r
}
