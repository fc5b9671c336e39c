// Package listen hears a tube: from a recording (a WAV file, or samples
// from a microphone) it finds the resonance frequency with its standard
// uncertainty, the harmonics, and, when the sound dies away after a tap or
// after the drive is switched off, the amplitude 1/e decay time τ and the
// quality factor Q = π f τ. For a long recording (an engine warming up to
// onset) it gives frequency and level against time, for a plot and as CSV.
//
// ReadWAV reads RIFF/WAVE files (PCM 8, 16, 24 and 32 bit, IEEE float 32
// and 64 bit, plain or WAVE_FORMAT_EXTENSIBLE, mono or stereo mixed to
// mono, sample rates 1–384 kHz) of at most MaxDuration (10 minutes) and
// MaxSamples per channel. It is our own small reader: the Go decoder
// github.com/go-audio/wav (v1.1.0) reads 32-bit IEEE float samples as
// integers, and phones record float. Every error wraps one of ErrNotWAV,
// ErrUnsupported, ErrEmpty, ErrSilent or ErrTooLong and names the detail.
//
// Analyze does the work; its doc comment lists the method step by step,
// and each step's function names its published source: the Hann window
// (Harris 1978), Grandke's interpolation for the Hann window (1983), the
// periodogram maximum (Rife & Boorstyn 1974), a least-squares sine fit with
// the measured envelope as amplitude shape (variable projection, Golub &
// Pereyra 1973), complex demodulation for the envelope (Bingham, Godfrey &
// Tukey 1967), a weighted straight-line fit of the log envelope (Bevington
// & Robinson 2003).
//
// Units: SI. Frequencies in Hz, times in s. Sample values and amplitudes
// are relative to digital full scale (±1); levels are in dBFS with a sine
// that reaches full scale at 0 dBFS (the AES17 convention). A recording
// cannot give a sound pressure level: how many pascals full scale stands
// for depends on the microphone, the phone and its gain, so this package
// never reports dB SPL, and its cautions say so.
//
// Assumptions: one dominant resonance in the searched band (20 Hz to
// 20 kHz by default); noise roughly white near the resonance; a ring-down
// that is a single exponential (a linear resonator). The frequency of a
// ring-down is the frequency of the damped oscillation, which lies below
// the undamped resonance by the factor √(1 - 1/(4Q²)) (a 0.01 % effect at
// Q = 35; Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th
// ed. 2000, ch. 1, damped free oscillations). The ± is a standard uncertainty (one standard
// deviation) from the noise and the width of the peak, combined with the
// wander of the pitch during the recording; it does not include the
// accuracy of the recorder's sample clock (typically tens of parts per
// million, from memory).
package listen
