package listen

import (
	"fmt"
	"math"
	"math/bits"

	"tubewright/calc/units"
)

// Settings tune Analyze. A nil *Settings means the defaults.
type Settings struct {
	// MinFrequency and MaxFrequency bound the search for the resonance, Hz.
	// Defaults: 20 Hz and the smaller of 20 kHz and 0.45 × the sample rate.
	MinFrequency, MaxFrequency float64
	// ClockTolerance is how far the recorder's sample rate may lie from its
	// nominal value, as a fraction (100e-6 for ±100 ppm); 0, the default,
	// treats the sample clock as exact. The frequency scales with the true
	// sample rate, so the tolerance adds FrequencyClock to its ±.
	ClockTolerance float64
}

// MaxClockTolerance is the largest ClockTolerance Analyze accepts (1 %).
const MaxClockTolerance = 0.01

// DefaultMinFrequency is the default lowest frequency searched, Hz.
const DefaultMinFrequency = 20.0

// MaxAnalysedSamples caps the stretch used for Frequency (2^20 samples:
// 21.8 s at 48 kHz); a longer loud part is cut to this length centred on
// its loudest frame, and the track covers the rest.
const MaxAnalysedSamples = 1 << 20

// activeRange is how far (dB) below the loudest frame a frame may be and
// still belong to the analysed stretch.
const activeRange = 30.0

// searchTol is the width (in bins of the fitted stretch, 1/its duration)
// to which the final frequency search narrows.
const searchTol = 1e-5

// silentPeak is the largest |sample| (after removing the mean) below which
// a recording counts as silent: 2^-16, half a step of 16-bit audio
// (-96 dBFS).
const silentPeak = 1.0 / 65536

// Analyze finds the resonance in a recording: its frequency with a standard
// uncertainty, its harmonics, the ring-down (1/e amplitude decay time and
// Q = π f τ) when the sound dies away, frequency and level against time,
// and the cautions.
//
// Method, in order:
//  1. the mean is removed; frames of about 0.1 s (half overlapping, Hann
//     window) give the track: level in dBFS and the strongest peak (see
//     frames);
//  2. the loud part (frames within 30 dB of the loudest) is analysed as one
//     stretch: its strongest peak between MinFrequency and MaxFrequency by
//     Grandke's interpolation on the Hann-windowed FFT (gonum dsp/fourier;
//     see spectrum.grandke);
//  3. the envelope of the component at that frequency by complex
//     demodulation (see demodEnvelope), and the noise near it from the
//     lower of an envelope and a spectral estimate (see
//     envelope.noiseAmplitude), at least the rounding noise of the samples;
//  4. the frequency refined by a least-squares sine fit with the envelope as
//     its amplitude over the loud stretch, or from just after the peak for a
//     ring-down (see sineFit, fitStretch): the periodogram maximum of Rife
//     & Boorstyn (1974) made exact for a short ring;
//  5. its ± from the noise and the width of the peak (see frequencySigma),
//     combined with the wander of the frame frequencies (see drift) and
//     the sample clock's tolerance (see clockSigma);
//  6. the decay time by a weighted straight-line fit to the log envelope
//     (see fitDecay) and Q = π f τ: the amplitude of a resonator of quality
//     factor Q decays as exp(-ω t/(2Q)) (Kinsler, Frey, Coppens & Sanders,
//     Fundamentals of Acoustics, 4th ed. 2000, ch. 1, damped free
//     oscillations, Q = ω₀/(2β));
//  7. harmonics near 2f … 10f, a warning when a peak near f/2 or f/3 could
//     be the fundamental, and the clipping and hearing cautions.
//
// Errors: ErrEmpty (too short for the band), ErrSilent (no variation above
// half a 16-bit step), ErrTooLong, ErrUnsupported (sample rate), and a
// *units.RangeError for a search band outside 1 Hz – fs/2 or a clock
// tolerance outside 0 – MaxClockTolerance. Results are
// never NaN or Inf.
func Analyze(rec *Recording, s *Settings) (*Result, error) {
	if rec == nil {
		panic("listen: nil recording")
	}
	fs := rec.SampleRate
	if err := checkRate(fs); err != nil {
		return nil, err
	}
	if err := checkLength(len(rec.Samples), fs); err != nil {
		return nil, err
	}
	lowHz, highHz, err := band(s, fs)
	if err != nil {
		return nil, err
	}
	if tol := clockTolerance(s); !(tol >= 0 && tol <= MaxClockTolerance) {
		return nil, units.NewRangeError("sample clock tolerance", tol, 0, MaxClockTolerance, "")
	}
	x, err := removeMean(rec.Samples)
	if err != nil {
		return nil, err
	}
	res := &Result{Duration: rec.Duration(), SampleRate: fs, PeakLevel: math.Max(MinLevel, 20*math.Log10(rec.Peak))}
	if rec.Peak <= 0 {
		res.PeakLevel = MinLevel
	}
	res.Warnings = append(res.Warnings, rec.Notes...)

	// 1. track
	res.Track = frames(x, fs, lowHz, highHz)

	// 2. the loud stretch and its peak
	a, b, cut := loudStretch(res.Track, len(x), fs)
	seg := x[a:b]
	res.AnalysedFrom, res.AnalysedTo = float64(a)/fs, float64(b)/fs
	if cut {
		res.Warnings = append(res.Warnings, fmt.Sprintf("The loud part is longer than %.1f s: the frequency is from %.1f–%.1f s around the loudest moment; the track covers the whole recording.", MaxAnalysedSamples/fs, res.AnalysedFrom, res.AnalysedTo))
	}
	// the coarse spectrum: the first 2^k samples of the stretch, the
	// largest power of two that fits (the FFT is fastest there)
	sp := newSpectrum(seg[:1<<(bits.Len(uint(len(seg)))-1)], fs)
	lo, hi := sp.band(lowHz, highHz)
	if lo > hi {
		return nil, fmt.Errorf("%w: the loud part (%s) is too short to resolve %s", ErrEmpty, units.Format(float64(len(seg))/fs, units.DimTime), units.Format(lowHz, units.DimFrequency))
	}
	k0 := sp.peak(lo, hi)
	bin := 2 * math.Pi * sp.binHz / fs // coarse bin, rad/sample
	wlo, whi := 2*math.Pi*lowHz/fs, 2*math.Pi*highHz/fs
	omega := math.Max(wlo, math.Min(whi, sp.grandke(k0)*2*math.Pi/fs))

	// 3. envelope, noise, decay
	env := demodEnvelope(x, fs, omega*fs/(2*math.Pi))
	gain := env.noiseGain
	sigma2 := math.Inf(1)
	if n := env.noiseAmplitude(); len(env.a) > 0 {
		sigma2 = n * n / (4 * gain)
	}
	fc := omega * fs / (2 * math.Pi)
	if v := sp.noisePower(int(0.7*fc/sp.binHz), int(1.3*fc/sp.binHz), k0, 4); v >= 0 {
		sigma2 = math.Min(sigma2, v)
	}
	if math.IsInf(sigma2, 1) {
		sigma2 = 0
	}
	// at least the rounding noise of the samples: a step q gives q²/12
	// (Bennett, "Spectra of quantized signals", Bell Syst. Tech. J. 27,
	// 446–472, 1948)
	q := math.Exp2(-float64(rec.Encoding.Bits - 1))
	if rec.Encoding.Float {
		q = math.Exp2(-24)
		if rec.Encoding.Bits == 64 {
			q = math.Exp2(-53)
		}
	}
	sigma2 = math.Max(sigma2, q*q/12)
	noiseEnv := math.Sqrt(4 * sigma2 * gain)
	var amp float64
	for _, v := range env.a {
		amp = math.Max(amp, v)
	}
	if len(env.a) == 0 {
		amp = 2 * math.Sqrt(sp.power[k0]) / sp.sumW // |X| = (A/2) Σw at the peak
	}

	// 4. the fit with the envelope as amplitude shape, and its ±
	fa, fb := fitStretch(env, fs, a, a+len(seg))
	fseg := x[fa:fb]
	g := envelopeShape(env, noiseEnv, fs, fa, len(fseg), amp)
	fw := hann(len(fseg))
	fit := newSineFit(fseg, fw, g)
	if fit.uu > 0 {
		omega = maximize(fit.power, math.Max(wlo, omega-0.75*bin), math.Min(whi, omega+0.75*bin), searchTol*2*math.Pi/float64(len(fseg)))
	}
	f := omega * fs / (2 * math.Pi)
	res.Frequency = f
	if k0 == lo || k0 == hi {
		res.Warnings = append(res.Warnings, fmt.Sprintf("The strongest peak (%.1f Hz) is at the edge of the searched band %s–%s; the resonance may lie outside it.", f, units.Format(lowHz, units.DimFrequency), units.Format(highHz, units.DimFrequency)))
	}
	for i := range g {
		fw[i] *= g[i]
	}
	res.FrequencyNoise = frequencySigma(fw, g, sigma2, fs)
	res.FrequencyDrift = drift(res.Track, f, res.AnalysedFrom, res.AnalysedTo)
	// the search stops within ±searchTol/2 bin: a uniform error of
	// standard deviation searchTol/√12 bin
	res.FrequencyClock = clockSigma(f, clockTolerance(s))
	res.FrequencyUncertainty = math.Sqrt(res.FrequencyNoise*res.FrequencyNoise + res.FrequencyDrift*res.FrequencyDrift +
		res.FrequencyClock*res.FrequencyClock + math.Pow(searchTol*fs/float64(len(fseg))/math.Sqrt(12), 2))

	res.Amplitude = amp
	res.SNR = 200
	if noiseEnv > 0 && amp > 0 {
		res.SNR = math.Min(200, 20*math.Log10(amp/noiseEnv))
	}
	if res.SNR < 10 {
		res.Warnings = append(res.Warnings, fmt.Sprintf("No clear tone: the strongest peak stands only %.0f dB above the noise near it; the frequency may be a noise peak.", res.SNR))
	}
	df := fitDecay(env, noiseEnv)
	if df.found {
		res.DecayFound = true
		res.DecayTime, res.DecayTimeUncertainty = df.tau, df.uTau
		res.DecayStart, res.DecayEnd = df.start, df.end
		res.QualityFactor = math.Pi * f * res.DecayTime
		res.QualityFactorUncertainty = math.Pi * math.Hypot(res.DecayTime*res.FrequencyUncertainty, f*res.DecayTimeUncertainty)
	} else {
		res.Warnings = append(res.Warnings, "No ring-down: "+df.why+". Decay time and Q need a recording of the tube dying away (after a tap, or after the drive is switched off).")
	}
	res.Envelope = env.thin(2000)

	// harmonics and a possible lower fundamental
	res.Harmonics = harmonics(sp, f, lowHz, highHz)
	if wmsg := lowerFundamental(sp, f, lowHz); wmsg != "" {
		res.Warnings = append(res.Warnings, wmsg)
	}

	// cautions
	res.Clipped = rec.ClippedRuns > 0
	res.NearFullScale = res.PeakLevel >= NearFullScaleDB
	if res.Clipped {
		res.Warnings = append(res.Warnings, clipWarning(rec.ClippedRuns, rec.ClippedSamples))
	}
	if res.Clipped || res.NearFullScale {
		res.Cautions = append(res.Cautions, CautionLoud)
	}
	res.Cautions = append(res.Cautions, CautionNoSPL)
	return res, nil
}

// band returns the searched band from s, checked against fs.
func band(s *Settings, fs float64) (lo, hi float64, err error) {
	lo, hi = DefaultMinFrequency, math.Min(20000, 0.45*fs)
	if s != nil {
		if s.MinFrequency != 0 {
			lo = s.MinFrequency
		}
		if s.MaxFrequency != 0 {
			hi = s.MaxFrequency
		}
	}
	if !(lo >= 1 && lo < fs/2) {
		return 0, 0, units.NewRangeError("lowest frequency", lo, 1, fs/2, "Hz")
	}
	if !(hi > lo && hi <= fs/2) {
		return 0, 0, units.NewRangeError("highest frequency", hi, lo, fs/2, "Hz")
	}
	return lo, hi, nil
}

// removeMean returns x less its mean, or ErrSilent when nothing is left.
func removeMean(in []float64) ([]float64, error) {
	var m float64
	for _, v := range in {
		m += v
	}
	m /= float64(len(in))
	x := make([]float64, len(in))
	var peak float64
	for i, v := range in {
		x[i] = v - m
		peak = math.Max(peak, math.Abs(x[i]))
	}
	if !(peak >= silentPeak) {
		if peak == 0 {
			return nil, fmt.Errorf("%w: every sample has the same value", ErrSilent)
		}
		return nil, fmt.Errorf("%w: the loudest sample is %.0f dBFS, below half a step of 16-bit audio (-96 dBFS)", ErrSilent, 20*math.Log10(peak))
	}
	return x, nil
}

// loudStretch returns the sample range [a, b) of the frames within
// activeRange dB of the loudest, cut to MaxAnalysedSamples around the
// loudest frame (cut reports that).
func loudStretch(track []TrackPoint, n int, fs float64) (a, b int, cut bool) {
	if len(track) == 0 {
		return 0, min(n, MaxAnalysedSamples), n > MaxAnalysedSamples
	}
	fl := frameLen(fs, n)
	loud := 0
	for i, p := range track {
		if p.Level > track[loud].Level {
			loud = i
		}
	}
	first, last := loud, loud
	for i, p := range track {
		if p.Level >= track[loud].Level-activeRange {
			first = min(first, i)
			last = max(last, i)
		}
	}
	hop := fl / 2
	a, b = first*hop, min(n, last*hop+fl)
	if b-a > MaxAnalysedSamples {
		c := loud*hop + fl/2
		a = max(0, c-MaxAnalysedSamples/2)
		b = min(n, a+MaxAnalysedSamples)
		a = b - MaxAnalysedSamples
		cut = true
	}
	return a, b, cut
}

// fitStretch returns the samples [fa, fb) for the final frequency fit
// within the loud stretch [a, b): for a ring-down (the envelope at b below
// 1/e of its largest value in the stretch) it starts 1.5 boxcar lengths after
// the envelope's peak, so the abrupt start of the sound, whose spectrum
// spreads the overtones over the resonance, is left out and the Hann
// window starts where the ring is already free; otherwise it is [a, b).
func fitStretch(e envelope, fs float64, a, b int) (fa, fb int) {
	ip, last := -1, -1
	for i, t := range e.t {
		n := int(math.Round(t * fs))
		if n < a || n >= b {
			continue
		}
		if ip < 0 || e.a[i] > e.a[ip] {
			ip = i
		}
		last = i
	}
	if ip < 0 || e.a[last] >= e.a[ip]/math.E {
		return a, b
	}
	fa = int(math.Round(e.t[ip]*fs)) + 3*e.m/2
	if b-fa < MinSamples {
		return a, b
	}
	return max(a, fa), b
}

// drift returns the spread of the clear frame frequencies within 5 % of f
// in [from, to] and within 20 dB of the loudest such frame, or 0 with fewer
// than four: the median absolute deviation times 1.4826, which is the
// standard deviation for normally distributed values and is not thrown by
// a frame that holds the start of the sound (Hampel, "The influence curve
// and its role in robust estimation", J. Am. Stat. Assoc. 69(346),
// 383–393, 1974).
func drift(track []TrackPoint, f, from, to float64) float64 {
	top := MinLevel
	for _, p := range track {
		if p.Time >= from && p.Time <= to {
			top = math.Max(top, p.Level)
		}
	}
	var v []float64
	for _, p := range track {
		if p.Clear && p.Time >= from && p.Time <= to && p.Level >= top-20 && math.Abs(p.Frequency-f) <= 0.05*f {
			v = append(v, p.Frequency)
		}
	}
	if len(v) < 4 {
		return 0
	}
	med := median(v)
	d := make([]float64, len(v))
	for i, x := range v {
		d[i] = math.Abs(x - med)
	}
	return 1.4826 * median(d)
}

// median returns the median of v (v is reordered).
func median(v []float64) float64 {
	n := len(v)
	if n%2 == 1 {
		return quickSelect(v, n/2)
	}
	return (quickSelect(v, n/2-1) + quickSelect(v, n/2)) / 2
}
