package listen

import (
	"bytes"
	"errors"
	"math"
	"os"
	"path/filepath"
	"testing"
)

// FuzzReadWAV: the reader never panics, returns either a recording or one
// of the package's errors, and a recording it returns is within the limits
// with finite samples; analysing it never panics and gives finite numbers.
func FuzzReadWAV(f *testing.F) {
	x := tone{Rate: 8000, Length: 0.02, Freq: 500, Amp: 0.5, Noise: 0.01, Seed: 1}.samples()
	for _, spec := range []wavSpec{{Bits: 8, Rate: 8000}, {Bits: 16, Rate: 8000}, {Bits: 24, Rate: 8000, Extensible: true}, {Float: true, Bits: 32, Rate: 8000}} {
		f.Add(encodeWAV(spec, x))
		f.Add(encodeWAV(spec, x, x))
	}
	for _, name := range []string{"listen_sox_sine16.wav", "listen_sox_float32.wav"} {
		if b, err := os.ReadFile(filepath.Join("..", "..", "testdata", name)); err == nil {
			f.Add(b[:min(len(b), 2000)])
		}
	}
	f.Add([]byte("RIFF\x00\x00\x00\x00WAVE"))
	f.Add([]byte{})
	f.Fuzz(func(t *testing.T, b []byte) {
		rec, err := ReadWAV(bytes.NewReader(b))
		if err != nil {
			if !errors.Is(err, ErrNotWAV) && !errors.Is(err, ErrUnsupported) && !errors.Is(err, ErrEmpty) && !errors.Is(err, ErrTooLong) {
				t.Fatalf("error of no known kind: %v", err)
			}
			return
		}
		if len(rec.Samples) < MinSamples || len(rec.Samples) > MaxSamples || rec.SampleRate < MinSampleRate || rec.SampleRate > MaxSampleRate {
			t.Fatalf("%d samples at %g Hz accepted", len(rec.Samples), rec.SampleRate)
		}
		for _, v := range rec.Samples {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatal("non-finite sample")
			}
		}
		r, err := Analyze(rec, nil)
		if err != nil {
			return
		}
		for _, v := range []float64{r.Frequency, r.FrequencyUncertainty, r.DecayTime, r.DecayTimeUncertainty, r.QualityFactor, r.QualityFactorUncertainty, r.SNR, r.PeakLevel, r.Amplitude} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("non-finite result in %+v", r)
			}
		}
	})
}
