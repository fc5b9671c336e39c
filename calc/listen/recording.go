package listen

import (
	"fmt"
	"math"
)

// Limits on what is read and analysed. A recording longer than either is
// refused with ErrTooLong before its samples are decoded: ten minutes covers
// an engine warming up to onset, and the cap on samples keeps the memory
// used (8 bytes a sample) near 270 MB at most, which a phone can give.
const (
	MaxDuration   = 600.0   // s (10 minutes)
	MaxSamples    = 1 << 25 // samples per channel (33 554 432: 11.6 min at 48 kHz, 2.9 min at 192 kHz)
	MinSampleRate = 1000.0  // Hz
	MaxSampleRate = 384000.0
	// MinSamples is the shortest recording analysed: 64 samples (8 ms at
	// 8 kHz) hold too little to find a peak below that.
	MinSamples = 64
)

// Encoding is how the samples are stored in the file.
type Encoding struct {
	Float bool // IEEE 754 floating point (WAVE_FORMAT_IEEE_FLOAT); else integer PCM
	Bits  int  // bits per sample: 8, 16, 24 or 32 for PCM; 32 or 64 for float
}

// String reads like "16-bit PCM" or "32-bit float".
func (e Encoding) String() string {
	if e.Float {
		return fmt.Sprintf("%d-bit float", e.Bits)
	}
	return fmt.Sprintf("%d-bit PCM", e.Bits)
}

// Recording is a decoded recording, mixed to one channel. Sample values are
// relative to digital full scale: integer PCM maps its most negative code
// to -1 (so the largest positive code is 1 - 1 LSB), float samples are taken
// as they are (full scale ±1).
type Recording struct {
	SampleRate float64   // samples per second, Hz
	Samples    []float64 // mono: the mean of the channels, full scale ±1
	Channels   int       // channels in the file (1 or 2)
	Encoding   Encoding  // how the file stored the samples

	// Peak is the largest |sample| in any channel before mixing, full scale
	// 1 (a float file may exceed 1).
	Peak float64
	// ClippedRuns counts runs of ClipRun or more consecutive samples at full
	// scale in one channel (the flat tops of a clipped wave); ClippedSamples
	// counts the samples in those runs.
	ClippedRuns, ClippedSamples int

	// Notes are things noticed while reading that do not stop the analysis
	// (a data chunk cut short).
	Notes []string
}

// ClipRun is the number of consecutive samples at full scale taken as a
// sign of clipping. A sine that just touches full scale has at most two
// samples there per peak; a clipped one holds the rail for longer. Common
// practice in audio clip detectors, no published source.
const ClipRun = 3

// Duration returns the recording's length, s.
func (r *Recording) Duration() float64 {
	if r.SampleRate <= 0 {
		return 0
	}
	return float64(len(r.Samples)) / r.SampleRate
}

// NewRecording wraps mono samples at sampleRate (Hz), full scale ±1, for
// Analyze, finding Peak and clipping as ReadWAV does for float samples.
// It checks the rate and the length limits.
func NewRecording(samples []float64, sampleRate float64) (*Recording, error) {
	if err := checkRate(sampleRate); err != nil {
		return nil, err
	}
	if err := checkLength(len(samples), sampleRate); err != nil {
		return nil, err
	}
	r := &Recording{SampleRate: sampleRate, Samples: samples, Channels: 1, Encoding: Encoding{Float: true, Bits: 64}}
	var c clipCounter
	c.rail = 1
	for _, v := range samples {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return nil, fmt.Errorf("%w: a sample is not a finite number", ErrUnsupported)
		}
		c.add(v)
		r.Peak = math.Max(r.Peak, math.Abs(v))
	}
	c.end()
	r.ClippedRuns, r.ClippedSamples = c.runs, c.samples
	return r, nil
}

func checkRate(fs float64) error {
	if !(fs >= MinSampleRate && fs <= MaxSampleRate) {
		return fmt.Errorf("%w: sample rate %g Hz is outside %g–%g Hz", ErrUnsupported, fs, MinSampleRate, MaxSampleRate)
	}
	return nil
}

func checkLength(n int, fs float64) error {
	d := float64(n) / fs
	if d > MaxDuration || n > MaxSamples {
		return fmt.Errorf("%w: %.1f s (%d samples per channel) is beyond the limit of %.0f s and %d samples (cut the part you need)",
			ErrTooLong, d, n, MaxDuration, MaxSamples)
	}
	if n == 0 {
		return fmt.Errorf("%w: the file holds no samples", ErrEmpty)
	}
	if n < MinSamples {
		return fmt.Errorf("%w: %d samples is too short to analyse (at least %d)", ErrEmpty, n, MinSamples)
	}
	return nil
}

// clipCounter counts runs of samples at or beyond rail in one channel.
type clipCounter struct {
	rail          float64
	run           int
	runs, samples int
}

func (c *clipCounter) add(v float64) {
	if math.Abs(v) >= c.rail {
		c.run++
		return
	}
	c.end()
}

func (c *clipCounter) end() {
	if c.run >= ClipRun {
		c.runs++
		c.samples += c.run
	}
	c.run = 0
}
