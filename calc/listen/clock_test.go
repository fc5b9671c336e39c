package listen

import (
	"math"
	"testing"
)

// TestClockTolerance checks the sample-clock term of the frequency's ±
// against its closed form, u = f·tol/√3 (GUM, JCGM 100:2008, 4.3.7, a
// rectangular distribution over ±tol): the noise, drift and search terms
// of the same recording are unchanged, the clock term is added in
// quadrature, and a tolerance outside 0 – 1 % is refused.
func TestClockTolerance(t *testing.T) {
	tn := tone{Rate: 48000, Length: 1, Freq: 612.7, Amp: 0.3, Noise: 0.001, Seed: 3}
	rec, err := NewRecording(tn.samples(), tn.Rate)
	if err != nil {
		t.Fatal(err)
	}
	base, err := Analyze(rec, nil)
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		tol  float64
		want float64 // u_clock / f
	}{
		{0, 0},
		{100e-6, 100e-6 / math.Sqrt(3)}, // 57.735 ppm
		{1e-3, 1e-3 / math.Sqrt(3)},
	}
	for _, c := range cases {
		r, err := Analyze(rec, &Settings{ClockTolerance: c.tol})
		if err != nil {
			t.Fatal(err)
		}
		if r.Frequency != base.Frequency || r.FrequencyNoise != base.FrequencyNoise || r.FrequencyDrift != base.FrequencyDrift {
			t.Errorf("tol %g: the frequency, noise or drift changed", c.tol)
		}
		if got := r.FrequencyClock / r.Frequency; math.Abs(got-c.want) > 1e-12 {
			t.Errorf("tol %g: clock term %.9g of f, want %.9g", c.tol, got, c.want)
		}
		want := math.Sqrt(base.FrequencyUncertainty*base.FrequencyUncertainty + r.FrequencyClock*r.FrequencyClock)
		if math.Abs(r.FrequencyUncertainty-want) > 1e-9*want {
			t.Errorf("tol %g: ± %.9g Hz, want %.9g Hz", c.tol, r.FrequencyUncertainty, want)
		}
	}
	for _, bad := range []float64{-1e-6, 0.02, math.NaN(), math.Inf(1)} {
		if _, err := Analyze(rec, &Settings{ClockTolerance: bad}); err == nil {
			t.Errorf("tolerance %g accepted", bad)
		}
	}
}
