package listen

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/stat"
)

func analyzeSamples(t *testing.T, x []float64, fs float64) *Result {
	t.Helper()
	rec, err := NewRecording(x, fs)
	if err != nil {
		t.Fatal(err)
	}
	r, err := Analyze(rec, nil)
	if err != nil {
		t.Fatal(err)
	}
	return r
}

// Scaling the whole recording (signal and noise) changes no frequency, decay
// time or uncertainty: the analysis has no absolute level in it except the
// silence threshold and the cautions.
func TestPropertyAmplitudeScaling(t *testing.T) {
	t.Parallel()
	for _, k := range []tone{
		{Rate: 8000, Length: 0.5, Freq: 431.7, Amp: 0.5, Noise: 0.01, Seed: 21},
		{Rate: 22050, Length: 1, Freq: 742, Amp: 0.5, Tau: 0.06, Onset: 0.2, Noise: 0.002, Seed: 22},
	} {
		x := k.samples()
		ref := analyzeSamples(t, x, k.Rate)
		for _, s := range []float64{0.01, 0.3, 1.7} {
			y := make([]float64, len(x))
			for i := range x {
				y[i] = s * x[i]
			}
			r := analyzeSamples(t, y, k.Rate)
			const tol = 1e-9
			if !scalar.EqualWithinRel(r.Frequency, ref.Frequency, tol) ||
				!scalar.EqualWithinRel(r.FrequencyUncertainty, ref.FrequencyUncertainty, 1e-6) ||
				!scalar.EqualWithinRel(r.DecayTime, ref.DecayTime, 1e-6) ||
				!scalar.EqualWithinRel(r.Amplitude, s*ref.Amplitude, 1e-9) {
				t.Errorf("%g Hz scaled by %g: f %.9g ± %.4g, τ %.6g, A %.6g; unscaled f %.9g ± %.4g, τ %.6g, A %.6g",
					k.Freq, s, r.Frequency, r.FrequencyUncertainty, r.DecayTime, r.Amplitude, ref.Frequency, ref.FrequencyUncertainty, ref.DecayTime, ref.Amplitude)
			}
		}
	}
}

// The same samples declared at twice the rate are the same sound an octave
// up and twice as fast: frequency doubles, decay time halves, Q stays.
func TestPropertyRateScaling(t *testing.T) {
	t.Parallel()
	k := tone{Rate: 11025, Length: 1, Freq: 333.3, Amp: 0.5, Tau: 0.1, Onset: 0.2, Noise: 0.001, Seed: 23}
	x := k.samples()
	a := analyzeSamples(t, x, k.Rate)
	b := analyzeSamples(t, x, 2*k.Rate)
	if !scalar.EqualWithinRel(b.Frequency, 2*a.Frequency, 2e-6) ||
		!scalar.EqualWithinRel(b.DecayTime, a.DecayTime/2, 0.01) ||
		!scalar.EqualWithinRel(b.QualityFactor, a.QualityFactor, 0.01) {
		t.Errorf("at %g Hz: f %.6f τ %.6f Q %.3f; at twice the rate: f %.6f τ %.6f Q %.3f",
			k.Rate, a.Frequency, a.DecayTime, a.QualityFactor, b.Frequency, b.DecayTime, b.QualityFactor)
	}
}

// A stereo file with the same signal in both channels gives exactly the
// result of the mono file.
func TestPropertyStereoEqualsMono(t *testing.T) {
	t.Parallel()
	x := tone{Rate: 16000, Length: 0.6, Freq: 880.8, Amp: 0.4, Tau: 0.05, Onset: 0.1, Noise: 0.002, Seed: 24}.samples()
	for _, spec := range []wavSpec{{Bits: 16, Rate: 16000}, {Bits: 24, Rate: 16000, Extensible: true}, {Float: true, Bits: 32, Rate: 16000}} {
		mono, err := readBytes(encodeWAV(spec, x))
		if err != nil {
			t.Fatal(err)
		}
		st, err := readBytes(encodeWAV(spec, x, x))
		if err != nil {
			t.Fatal(err)
		}
		rm, err1 := Analyze(mono, nil)
		rs, err2 := Analyze(st, nil)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if rm.Frequency != rs.Frequency || rm.DecayTime != rs.DecayTime || rm.FrequencyUncertainty != rs.FrequencyUncertainty {
			t.Errorf("%+v: mono f %.9g τ %.9g, stereo f %.9g τ %.9g", spec, rm.Frequency, rm.DecayTime, rs.Frequency, rs.DecayTime)
		}
	}
}

// The ± from noise is honest: over repeated recordings that differ only in
// their noise, the standard deviation of the found frequency matches the
// mean stated FrequencyNoise within 35 % (with 40 recordings the sample
// standard deviation itself scatters by about 11 %, so 35 % is three times
// that). The decay time's ± is checked the same way within a factor 2 (its
// correction for correlated envelope points is rough).
func TestPropertyUncertaintyMatchesScatter(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		tone  tone
		decay bool
	}{
		{"steady", tone{Rate: 8000, Length: 0.25, Freq: 512.3, Amp: 0.3, Noise: 0.05}, false},
		{"ring-down", tone{Rate: 8000, Length: 0.5, Freq: 377.7, Amp: 0.5, Tau: 0.04, Onset: 0.1, Noise: 0.005}, true},
	}
	for _, c := range cases {
		const runs = 40
		var f, uf, tau, ut []float64
		for s := range runs {
			k := c.tone
			k.Seed = uint64(100 + s)
			r := analyzeSamples(t, k.samples(), k.Rate)
			f = append(f, r.Frequency)
			uf = append(uf, r.FrequencyNoise)
			tau = append(tau, r.DecayTime)
			ut = append(ut, r.DecayTimeUncertainty)
		}
		sd, u := stat.StdDev(f, nil), stat.Mean(uf, nil)
		t.Logf("%s: frequency scatter %.4g Hz, stated ± %.4g Hz; decay-time scatter %.4g s, stated ± %.4g s",
			c.name, sd, u, stat.StdDev(tau, nil), stat.Mean(ut, nil))
		if !scalar.EqualWithinRel(sd, u, 0.35) {
			t.Errorf("%s: frequency scatter %.4g Hz, stated ± %.4g Hz", c.name, sd, u)
		}
		if c.decay {
			sd, u := stat.StdDev(tau, nil), stat.Mean(ut, nil)
			if sd > 2*u || u > 2*sd {
				t.Errorf("%s: decay-time scatter %.4g s, stated ± %.4g s", c.name, sd, u)
			}
		}
	}
}
