package listen

// Harmonic is a peak near a whole multiple of the resonance frequency.
type Harmonic struct {
	Number    int     // n: the peak lies near n times Result.Frequency
	Frequency float64 // Hz (Hann window, Grandke interpolation)
	Level     float64 // dB relative to the resonance peak (±1.5 dB from the window's scalloping)
}

// Result is what a recording says about the tube.
type Result struct {
	// Frequency is the strongest peak in the analysed stretch, Hz.
	Frequency float64
	// FrequencyUncertainty is its standard uncertainty, Hz: FrequencyNoise,
	// FrequencyDrift, FrequencyClock and the resolution of the search
	// (1e-5 of a bin) combined in quadrature.
	FrequencyUncertainty float64
	// FrequencyNoise is the standard deviation of Frequency caused by the
	// noise, given the shape (width) of the peak: see frequencySigma.
	FrequencyNoise float64
	// FrequencyDrift is the standard deviation of the frame frequencies
	// over the loud part of the recording, Hz (how much the pitch wandered);
	// 0 with fewer than four clear frames.
	FrequencyDrift float64
	// FrequencyClock is the standard uncertainty of Frequency from the
	// sample clock's tolerance (Settings.ClockTolerance), Hz: see
	// clockSigma; 0 when the clock is taken as exact.
	FrequencyClock float64

	// Amplitude of the resonance component at its loudest, full scale 1,
	// and SNR, its level above the noise near it, dB.
	Amplitude, SNR float64

	// DecayFound says whether a ring-down was fitted. DecayTime is the
	// amplitude 1/e decay time τ (s) of the resonance after its loudest
	// point, DecayTimeUncertainty its standard uncertainty (s);
	// QualityFactor is Q = π f τ and QualityFactorUncertainty its
	// propagated standard uncertainty. All 0 when DecayFound is false.
	DecayFound                              bool
	DecayTime, DecayTimeUncertainty         float64
	QualityFactor, QualityFactorUncertainty float64
	// DecayStart and DecayEnd bound the fitted stretch, s.
	DecayStart, DecayEnd float64

	// Harmonics are the peaks near 2f, 3f, … (up to the tenth, within the
	// searched band) that stand out of the noise.
	Harmonics []Harmonic
	// Track is frequency and level against time, one point per half frame.
	Track []TrackPoint
	// Envelope is the amplitude of the resonance component against time
	// (at most 2000 points), for a plot of the ring-down.
	Envelope []EnvelopePoint

	// AnalysedFrom and AnalysedTo bound the stretch used for Frequency, s:
	// the loud part (within 30 dB of the loudest frame), at most
	// MaxAnalysedSamples long.
	AnalysedFrom, AnalysedTo float64

	// Duration (s) and SampleRate (Hz) of the recording.
	Duration, SampleRate float64
	// PeakLevel is the largest sample in dBFS (0 dBFS is full scale).
	PeakLevel float64
	// Clipped is true when the recording has flat tops at full scale
	// (Recording.ClippedRuns > 0); NearFullScale when its peak reaches
	// NearFullScaleDB or more.
	Clipped, NearFullScale bool

	// Warnings are about the measurement (clipping, no clear tone, a
	// possible lower fundamental, no ring-down, notes from the file).
	Warnings []string
	// Cautions are about people: hearing.
	Cautions []string
}
