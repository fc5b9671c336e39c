package listen

import (
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// Recordings made by an outside program: Debian's sox, version in
// testdata/listen_sox_version.txt (SoX v14.4.2 when they were made), by the
// commands in testdata/gen_listen_sox.sh. sox writes the 24-bit file as
// WAVE_FORMAT_EXTENSIBLE and the float file as format 3, so these also
// check the reader against a writer that is not ours.
func TestSoxTones(t *testing.T) {
	t.Parallel()
	version, err := os.ReadFile(filepath.Join("..", "..", "testdata", "listen_sox_version.txt"))
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("files made by sox %s", strings.TrimSpace(string(version)))
	cases := []struct {
		file     string
		freq     float64 // Hz, the frequency given to "sox ... synth ... sine"
		rate     float64
		channels int
		enc      Encoding
		n        int     // samples per channel (0.5 s, 0.3 s, 0.25 s)
		rms      float64 // "vol 0.5": a sine of half full scale, rms 0.5/√2
	}{
		// sox -R -n -r 8000 -b 16 -e signed-integer -c 1 listen_sox_sine16.wav synth 0.5 sine 431.7 vol 0.5
		{"listen_sox_sine16.wav", 431.7, 8000, 1, Encoding{Bits: 16}, 4000, 0.5 / math.Sqrt2},
		// sox -R -n -r 11025 -b 24 -e signed-integer -c 2 listen_sox_sine24.wav synth 0.3 sine 1234.5 vol 0.5
		{"listen_sox_sine24.wav", 1234.5, 11025, 2, Encoding{Bits: 24}, 3307, 0.5 / math.Sqrt2},
		// sox -R -n -r 16000 -b 32 -e floating-point -c 1 listen_sox_float32.wav synth 0.25 sine 300.3 vol 0.5
		{"listen_sox_float32.wav", 300.3, 16000, 1, Encoding{Float: true, Bits: 32}, 4000, 0.5 / math.Sqrt2},
	}
	for _, c := range cases {
		rec, err := ReadWAVFile(filepath.Join("..", "..", "testdata", c.file))
		if err != nil {
			t.Errorf("%s: %v", c.file, err)
			continue
		}
		if rec.SampleRate != c.rate || rec.Channels != c.channels || rec.Encoding != c.enc || len(rec.Samples) != c.n {
			t.Errorf("%s: read %g Hz, %d channels, %v, %d samples", c.file, rec.SampleRate, rec.Channels, rec.Encoding, len(rec.Samples))
		}
		var ss float64
		for _, v := range rec.Samples {
			ss += v * v
		}
		if rms := math.Sqrt(ss / float64(len(rec.Samples))); !scalar.EqualWithinAbs(rms, c.rms, 0.001) {
			t.Errorf("%s: rms %g, want %g (vol 0.5) within 0.001", c.file, rms, c.rms)
		}
		r, err := Analyze(rec, nil)
		if err != nil {
			t.Errorf("%s: %v", c.file, err)
			continue
		}
		t.Logf("%s: %.5f ± %.2g Hz", c.file, r.Frequency, r.FrequencyUncertainty)
		// issue 14: within 0.05 %; and within 4 of its own ±
		if !scalar.EqualWithinRel(r.Frequency, c.freq, 5e-4) ||
			math.Abs(r.Frequency-c.freq) > 4*r.FrequencyUncertainty {
			t.Errorf("%s: %.5f ± %.2g Hz, want %g Hz", c.file, r.Frequency, r.FrequencyUncertainty, c.freq)
		}
		if r.DecayFound || r.Clipped || r.NearFullScale {
			t.Errorf("%s: decay %v clipped %v near full scale %v", c.file, r.DecayFound, r.Clipped, r.NearFullScale)
		}
	}
}

// A ring-down made by sox: one full-scale sample at 0.1 s through sox's
// "bandpass 523.3 50q" filter (two poles; sox(1) cites Bristow-Johnson's
// Audio EQ Cookbook), normalised to -3 dBFS. sox prints the filter's
// denominator 1 + a1 z⁻¹ + a2 z⁻² (testdata/listen_sox_ring16_filter.txt);
// its impulse response decays as rⁿ with r = √a2 and turns by θ per sample
// with cos θ = -a1/(2r) (a pair of complex poles r e^{±iθ}; Oppenheim &
// Schafer, Discrete-Time Signal Processing, 3rd ed. 2010, §5.3), so
//
//	τ = -1/(fs ln r),  f = θ fs/(2π).
func TestSoxRingDown(t *testing.T) {
	t.Parallel()
	a1, a2 := soxDenominator(t, filepath.Join("..", "..", "testdata", "listen_sox_ring16_filter.txt"))
	const fs = 8000
	r := math.Sqrt(a2)
	tau := -1 / (fs * math.Log(r))
	f := math.Acos(-a1/(2*r)) * fs / (2 * math.Pi)
	t.Logf("from sox's poles: τ = %.6f s, f = %.4f Hz, Q = %.2f", tau, f, math.Pi*f*tau)

	rec, err := ReadWAVFile(filepath.Join("..", "..", "testdata", "listen_sox_ring16.wav"))
	if err != nil {
		t.Fatal(err)
	}
	res, err := Analyze(rec, nil)
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("found: f = %.4f ± %.2g Hz, τ = %.6f ± %.2g s, Q = %.2f ± %.2g", res.Frequency, res.FrequencyUncertainty, res.DecayTime, res.DecayTimeUncertainty, res.QualityFactor, res.QualityFactorUncertainty)
	if !scalar.EqualWithinRel(res.Frequency, f, 5e-4) || math.Abs(res.Frequency-f) > 4*res.FrequencyUncertainty {
		t.Errorf("frequency %.4f ± %.2g Hz, want %.4f Hz", res.Frequency, res.FrequencyUncertainty, f)
	}
	if !res.DecayFound || !scalar.EqualWithinRel(res.DecayTime, tau, 0.05) {
		t.Errorf("decay time %.6f s (found %v), want %.6f s within 5 %%; %q", res.DecayTime, res.DecayFound, tau, res.Warnings)
	}
	if !scalar.EqualWithinRel(res.QualityFactor, math.Pi*f*tau, 0.05) {
		t.Errorf("Q %.2f, want %.2f", res.QualityFactor, math.Pi*f*tau)
	}
	// the ring starts at 0.1 s: the fit starts after it
	if res.DecayStart < 0.1 || res.DecayEnd <= res.DecayStart {
		t.Errorf("fitted %.4f–%.4f s", res.DecayStart, res.DecayEnd)
	}
}

// soxDenominator reads a1 and a2 from sox's "--plot octave" freqz line.
func soxDenominator(t *testing.T, path string) (a1, a2 float64) {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	m := regexp.MustCompile(`\],\[1 (\S+) (\S+)\]`).FindSubmatch(b)
	if m == nil {
		t.Fatalf("%s: no denominator in %q", path, b)
	}
	a1, err1 := strconv.ParseFloat(string(m[1]), 64)
	a2, err2 := strconv.ParseFloat(string(m[2]), 64)
	if err1 != nil || err2 != nil {
		t.Fatal(err1, err2)
	}
	return a1, a2
}
