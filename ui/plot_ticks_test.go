package ui

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestTickScoreByHand checks the four scores of Talbot, Lin and Hanrahan
// (2010) on candidates whose scores were worked out by hand from the
// paper's formulas (§4.1-4.3, weights of §4.5: 0.25, 0.2, 0.5, 0.05 and
// legibility 1). The working is in each case's comment.
func TestTickScoreByHand(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name             string
		dmin, dmax       float64
		m                int
		i, j             int // position of q in Q (1-based), skip
		lmin, lmax, step float64
		k                int
		want             float64
	}{
		// data 8.1..14.1, 4 wanted; labels 8,10,12,14 (q = 2, i = 3):
		// s = 1 - 2/5 - 1 + 0 = -0.4
		// c = 1 - 0.5(0.1² + 0.1²)/0.6² = 0.972222
		// r = 3/6 = 0.5, rt = 3/6.1, d = 2 - 0.5·6.1/3 = 0.983333
		// 0.25(-0.4) + 0.2(0.972222) + 0.5(0.983333) + 0.05 = 0.636111
		{"8..14 by 2", 8.1, 14.1, 4, 3, 1, 8, 14, 2, 4, 0.636111},
		// the same data, labels 8..14 by 1 (q = 1, k = 7): s = 0,
		// c as above, d = 2 - 1/(3/6.1) = -0.033333;
		// 0 + 0.194444 - 0.016667 + 0.05 = 0.227778
		{"8..14 by 1", 8.1, 14.1, 4, 1, 1, 8, 14, 1, 7, 0.227778},
		// data -3.7..7.3, 5 wanted; labels -2.5..7.5 by 2.5 (q = 2.5,
		// i = 4, zero among them): s = 1 - 3/5 - 1 + 1 = 0.4
		// c = 1 - 0.5(0.2² + 1.2²)/1.1² = 0.388430
		// r = 4/10, rt = 4/11.2, d = 2 - 1.12 = 0.88
		// 0.1 + 0.077686 + 0.44 + 0.05 = 0.667686
		{"-2.5..7.5 by 2.5", -3.7, 7.3, 5, 4, 1, -2.5, 7.5, 2.5, 5, 0.667686},
		// the same data, labels -4..8 by 2 (q = 2, i = 3, zero in):
		// s = 0.6, c = 1 - 0.5(0.7² + 0.3²)/1.21 = 0.760331,
		// r = 6/12, rt = 4/12, d = 0.5;
		// 0.15 + 0.152066 + 0.25 + 0.05 = 0.602066
		{"-4..8 by 2", -3.7, 7.3, 5, 3, 1, -4, 8, 2, 7, 0.602066},
	}
	for _, c := range cases {
		s := tickSimplicity(c.i, c.j, c.lmin, c.lmax, c.step)
		cv := tickCoverage(c.dmin, c.dmax, c.lmin, c.lmax)
		d := tickDensity(c.k, c.m, c.dmin, c.dmax, c.lmin, c.lmax)
		if got := tickScore(s, cv, d); !scalar.EqualWithinAbs(got, c.want, 1e-6) {
			t.Errorf("%s: score %.6f (s %.4f c %.4f d %.4f), want %.6f", c.name, got, s, cv, d, c.want)
		}
	}
}

// TestLinearTicksChoice checks the search picks the best-scoring labels
// found by hand above (the winners among the candidates scored there and
// their neighbours, also scored by hand: 5,10,15 and 8,12,16 have negative
// coverage for 8.1..14.1; -5..10 by 5 and -3..6 by 3 for -3.7..7.3 too).
func TestLinearTicksChoice(t *testing.T) {
	t.Parallel()
	cases := []struct {
		dmin, dmax float64
		m          int
		min, max   float64
		step       float64
	}{
		{8.1, 14.1, 4, 8, 14, 2},
		{-3.7, 7.3, 5, -2.5, 7.5, 2.5},
	}
	for _, c := range cases {
		got := LinearTicks(c.dmin, c.dmax, c.m)
		if !scalar.EqualWithinAbs(got.Min, c.min, 1e-9) || !scalar.EqualWithinAbs(got.Max, c.max, 1e-9) ||
			!scalar.EqualWithinAbs(got.Step, c.step, 1e-9) {
			t.Errorf("LinearTicks(%g, %g, %d) = %g..%g by %g (score %.4f), want %g..%g by %g",
				c.dmin, c.dmax, c.m, got.Min, got.Max, got.Step, got.Score, c.min, c.max, c.step)
		}
	}
}

// TestLinearTicksProperties checks, over random ranges of many scales:
// at least two labels that overlap the data and cover most of it; a step
// of q·j·10^z with q from Q; no more than about twice the wanted count;
// and scaling the data by a power of ten keeps the best score.
func TestLinearTicksProperties(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(1, 2))
	for n := 0; n < 2000; n++ {
		scale := math.Pow(10, float64(rng.IntN(24)-12))
		a := (rng.Float64()*2 - 1) * scale
		b := a + rng.Float64()*scale*(0.01+rng.Float64())
		m := 3 + rng.IntN(6)
		tk := LinearTicks(a, b, m)
		if tk.Count < 2 || tk.Count > 2*m+1 {
			t.Fatalf("LinearTicks(%g, %g, %d): %d labels", a, b, m, tk.Count)
		}
		if tk.Min > b || tk.Max < a {
			t.Fatalf("LinearTicks(%g, %g, %d): labels %g..%g miss the data", a, b, m, tk.Min, tk.Max)
		}
		// The labels span at least half the data: coverage would
		// otherwise be below -11.5, far worse than any q = 1 grid.
		if tk.Max-tk.Min < 0.5*(b-a) {
			t.Fatalf("LinearTicks(%g, %g, %d): labels %g..%g cover too little", a, b, m, tk.Min, tk.Max)
		}
		z := math.Floor(math.Log10(tk.Step))
		mant := tk.Step / math.Pow(10, z)
		ok := false
		for j := 1.0; j <= 10; j++ {
			for _, q := range tickQ {
				for _, zz := range []float64{1, 10} { // j·q may pass 10
					if scalar.EqualWithinRel(mant*zz, j*q, 1e-9) || scalar.EqualWithinRel(mant, j*q*zz, 1e-9) {
						ok = true
					}
				}
			}
		}
		if !ok {
			t.Fatalf("LinearTicks(%g, %g, %d): step %g is not q·j·10^z", a, b, m, tk.Step)
		}
		v := tk.Values()
		if len(v) != tk.Count || !scalar.EqualWithinAbsOrRel(v[len(v)-1], tk.Max, 1e-9, 1e-9) {
			t.Fatalf("Values %v do not end at %g", v, tk.Max)
		}
		// The scores do not depend on the scale (ties between equal
		// scores may fall either way in floating point).
		s := LinearTicks(a*1000, b*1000, m)
		if !scalar.EqualWithinAbs(s.Score, tk.Score, 1e-9) {
			t.Fatalf("scaling %g..%g by 1000 changed the best score: %+v vs %+v", a, b, s, tk)
		}
	}
}

// TestLinearTicksDegenerate checks that a zero-width range still gets
// labels and that NaN gets none.
func TestLinearTicksDegenerate(t *testing.T) {
	t.Parallel()
	if tk := LinearTicks(5, 5, 5); tk.Count < 2 || tk.Min > 5 || tk.Max < 5 {
		t.Errorf("LinearTicks(5, 5) = %+v", tk)
	}
	if tk := LinearTicks(0, 0, 5); tk.Count < 2 {
		t.Errorf("LinearTicks(0, 0) = %+v", tk)
	}
	if tk := LinearTicks(math.NaN(), 1, 5); tk.Count != 0 {
		t.Errorf("LinearTicks(NaN, 1) = %+v, want no labels", tk)
	}
	// Labels across zero include zero exactly, not 1e-17.
	for _, v := range LinearTicks(-0.3, 0.7, 5).Values() {
		if v != 0 && math.Abs(v) < 1e-6 {
			t.Errorf("tick %g should be 0", v)
		}
	}
}

// TestLogTicks checks decade ticks and the denser sets on short spans.
func TestLogTicks(t *testing.T) {
	t.Parallel()
	cases := []struct {
		lo, hi float64
		want   []float64
	}{
		{1, 1000, []float64{1, 10, 100, 1000}},
		{1, 30, []float64{1, 2, 5, 10, 20}}, // 1.5 decades: 1, 2, 5
		{1.1, 4.4, []float64{2, 3, 4}},      // under a decade: every digit
		{2e-7, 3e-3, []float64{1e-6, 1e-5, 1e-4, 1e-3}},
		{1, 1e12, []float64{1, 1e3, 1e6, 1e9, 1e12}}, // wide: the tick search on exponents steps by 3
	}
	for _, c := range cases {
		got := LogTicks(c.lo, c.hi)
		if len(got) != len(c.want) {
			t.Errorf("LogTicks(%g, %g) = %v, want %v", c.lo, c.hi, got, c.want)
			continue
		}
		for i := range got {
			if !scalar.EqualWithinRel(got[i], c.want[i], 1e-9) {
				t.Errorf("LogTicks(%g, %g) = %v, want %v", c.lo, c.hi, got, c.want)
				break
			}
		}
	}
	if LogTicks(0, 10) != nil || LogTicks(-1, 10) != nil {
		t.Error("LogTicks of a range with zero or negatives should be nil")
	}
}
