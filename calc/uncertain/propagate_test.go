package uncertain

import (
	"fmt"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestPropagate(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name      string
		f         func(x []float64) float64
		x, u      []float64
		val, sig  float64
		tolRelSig float64
	}{
		// Linear model: GUM (JCGM 100:2008) eq. 10 with constant
		// sensitivities 3 and 4 gives sqrt(0.3² + 0.8²) exactly.
		{"linear", func(x []float64) float64 { return 3*x[0] + 4*x[1] }, []float64{1, 2}, []float64{0.1, 0.2}, 11, math.Sqrt(0.09 + 0.64), 1e-9},
		// Product of powers Y = X1² X2^-0.5 X3³: GUM eq. 12 (section 5.1.6)
		// gives (u/Y)² = (2·u1/x1)² + (0.5·u2/x2)² + (3·u3/x3)².
		{"powers", func(x []float64) float64 { return x[0] * x[0] / math.Sqrt(x[1]) * x[2] * x[2] * x[2] },
			[]float64{2, 4, 3}, []float64{0.01, 0.04, 0.003},
			2 * 2 / 2 * 27, 54 * math.Sqrt(math.Pow(2*0.01/2, 2)+math.Pow(0.5*0.04/4, 2)+math.Pow(3*0.003/3, 2)), 1e-6},
		// A zero-valued input with an uncertainty: step scales with u.
		{"at zero", func(x []float64) float64 { return math.Sin(x[0]) }, []float64{0}, []float64{1e-3}, 0, 1e-3, 1e-6},
		// No uncertainty at all: sigma exactly 0.
		{"exact", func(x []float64) float64 { return x[0] * x[1] }, []float64{2, 3}, []float64{0, 0}, 6, 0, 0},
		// At the edge of the domain: sqrt defined only for x ≥ 1 here; the
		// central difference fails, the forward one gives d/dx = 1/(2√1).
		{"edge", func(x []float64) float64 {
			if x[0] < 1 {
				return math.NaN()
			}
			return math.Sqrt(x[0])
		}, []float64{1}, []float64{0.02}, 1, 0.01, 1e-6},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			v, s := Propagate(c.f, c.x, c.u)
			if !scalar.EqualWithinAbsOrRel(v, c.val, 1e-12, 1e-12) {
				t.Errorf("value %g, want %g", v, c.val)
			}
			if !scalar.EqualWithinAbsOrRel(s, c.sig, 1e-15, c.tolRelSig) {
				t.Errorf("sigma %.10g, want %.10g (rel tol %g)", s, c.sig, c.tolRelSig)
			}
		})
	}
}

func TestPropagateCostsNothingForExactInputs(t *testing.T) {
	t.Parallel()
	calls := 0
	f := func(x []float64) float64 { calls++; return x[0] + x[1] + x[2] }
	Propagate(f, []float64{1, 2, 3}, []float64{0, 0.5, 0})
	if calls != 3 {
		t.Errorf("%d evaluations, want 3 (one at x, two for the one uncertain input)", calls)
	}
	calls = 0
	Propagate(f, []float64{1, 2, 3}, []float64{0, 0, 0})
	if calls != 1 {
		t.Errorf("%d evaluations with no uncertainty, want 1", calls)
	}
}

func TestPropagateDoesNotChangeX(t *testing.T) {
	t.Parallel()
	x := []float64{1, 2}
	Propagate(func(x []float64) float64 { return x[0] * x[1] }, x, []float64{0.1, 0.1})
	if x[0] != 1 || x[1] != 2 {
		t.Errorf("x changed to %v", x)
	}
}

func TestPropagateNaN(t *testing.T) {
	t.Parallel()
	v, s := Propagate(func(x []float64) float64 { return math.NaN() }, []float64{1}, []float64{0.1})
	if !math.IsNaN(v) || !math.IsNaN(s) {
		t.Errorf("NaN function: %g ± %g, want NaN ± NaN", v, s)
	}
	// finite at x but undefined on both sides: sigma NaN, value kept
	v, s = Propagate(func(x []float64) float64 {
		if x[0] != 1 {
			return math.NaN()
		}
		return 5
	}, []float64{1}, []float64{0.1})
	if v != 5 || !math.IsNaN(s) {
		t.Errorf("isolated point: %g ± %g, want 5 ± NaN", v, s)
	}
}

func TestPropagateN(t *testing.T) {
	t.Parallel()
	// y0 = x0 + x1 (u = sqrt(u0²+u1²)); y1 = x0·x1 (GUM eq. 12).
	f := func(x, out []float64) { out[0] = x[0] + x[1]; out[1] = x[0] * x[1] }
	x, u := []float64{3, 5}, []float64{0.3, 0.4}
	vals, sig := PropagateN(f, x, u, 2)
	want := []float64{0.5, 15 * math.Sqrt(0.01+0.0064)}
	if vals[0] != 8 || vals[1] != 15 {
		t.Errorf("values %v, want [8 15]", vals)
	}
	for k := range want {
		if !scalar.EqualWithinAbsOrRel(sig[k], want[k], 1e-12, 1e-7) {
			t.Errorf("sigma[%d] = %.10g, want %.10g", k, sig[k], want[k])
		}
	}
}

func TestPropagatePanics(t *testing.T) {
	t.Parallel()
	f := func(x []float64) float64 { return x[0] }
	for _, c := range []struct {
		name string
		run  func()
	}{
		{"length", func() { Propagate(f, []float64{1}, []float64{1, 2}) }},
		{"negative", func() { Propagate(f, []float64{1}, []float64{-1}) }},
		{"NaN", func() { Propagate(f, []float64{1}, []float64{math.NaN()}) }},
		{"nOut", func() { PropagateN(func(x, out []float64) {}, []float64{1}, []float64{1}, 0) }},
	} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", c.name)
				}
			}()
			c.run()
		}()
	}
}

var sinkSigma float64

func BenchmarkPropagate(b *testing.B) {
	f := func(x []float64) float64 { return x[0] * x[1] / x[2] }
	x, u := []float64{1, 2, 3}, []float64{0.1, 0.1, 0.1}
	b.ReportAllocs()
	for b.Loop() {
		_, sinkSigma = Propagate(f, x, u)
	}
}

// The quarter-wave frequency f = c/(4L) of a 0.25 m ± 1 mm tube with
// c = 343 ± 1 m/s: relative uncertainties add in quadrature (GUM eq. 12).
func ExamplePropagate() {
	f := func(x []float64) float64 { return x[0] / (4 * x[1]) }
	v, s := Propagate(f, []float64{343, 0.25}, []float64{1, 0.001})
	fmt.Printf("%.1f ± %.1f Hz\n", v, s)
	// Output: 343.0 ± 1.7 Hz
}
