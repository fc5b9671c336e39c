package numeric

import (
	"errors"
	"math"
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestIntegrateExponential checks y' = iωy against the exact solution
// y = exp(iωx) (elementary calculus), for several tolerances and directions.
func TestIntegrateExponential(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name   string
		omega  complex128
		x0, x1 float64
		rtol   float64
		tol    float64 // allowed |error| at x1
	}{
		{"oscillating", 5i, 0, 3, 1e-10, 1e-8},
		{"decaying", complex(-0.5, 7), 0, 4, 1e-10, 1e-8},
		{"backwards", 3i, 2, -1, 1e-10, 1e-8},
		{"loose", 5i, 0, 3, 1e-5, 1e-3},
	}
	for _, c := range cases {
		y := []complex128{cmplx.Exp(c.omega * complex(c.x0, 0))}
		f := func(x float64, y, d []complex128) { d[0] = c.omega * y[0] }
		res, err := Integrate(f, c.x0, c.x1, y, &ODESettings{RelTol: c.rtol, AbsTol: c.rtol * 1e-3})
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		want := cmplx.Exp(c.omega * complex(c.x1, 0))
		if d := cmplx.Abs(y[0] - want); d > c.tol {
			t.Errorf("%s: y(%g) = %v, want %v (|err| %g > %g)", c.name, c.x1, y[0], want, d, c.tol)
		}
		if res.X != c.x1 || res.Steps == 0 || res.Evaluations < 6*res.Steps {
			t.Errorf("%s: stats %+v", c.name, res)
		}
	}
}

// TestIntegrateOscillator checks the harmonic oscillator d²u/dx² = -u as a first
// order system against u = cos x, u' = -sin x (elementary calculus), and the
// conserved energy u² + u'².
func TestIntegrateOscillator(t *testing.T) {
	t.Parallel()
	y := []complex128{1, 0}
	f := func(x float64, y, d []complex128) { d[0] = y[1]; d[1] = -y[0] }
	it := NewIntegrator(2)
	_, err := it.Integrate(f, 0, 20, y, &ODESettings{RelTol: 1e-11, AbsTol: 1e-13})
	if err != nil {
		t.Fatal(err)
	}
	for i, want := range []float64{math.Cos(20), -math.Sin(20)} {
		if !scalar.EqualWithinAbs(real(y[i]), want, 1e-8) || imag(y[i]) != 0 {
			t.Errorf("y[%d] = %v, want %g", i, y[i], want)
		}
	}
	energy := real(y[0])*real(y[0]) + real(y[1])*real(y[1])
	if !scalar.EqualWithinAbs(energy, 1, 1e-8) {
		t.Errorf("energy %g, want 1", energy)
	}
}

// TestIntegrateOrder checks that the fifth-order solution converges at order
// 5 with fixed steps: halving h divides the error by about 2⁵ = 32
// (Hairer, Nørsett & Wanner 1993, Table 5.2 is a fifth-order pair). Fixed
// steps are forced with a huge tolerance and MaxStep.
func TestIntegrateOrder(t *testing.T) {
	t.Parallel()
	f := func(x float64, y, d []complex128) { d[0] = complex(0, 1+x) * y[0] } // y = exp(i(x + x²/2))
	errAt := func(h float64) float64 {
		y := []complex128{1}
		_, err := Integrate(f, 0, 2, y, &ODESettings{RelTol: 1e6, AbsTol: 1e6, MaxStep: h, InitialStep: h})
		if err != nil {
			t.Fatal(err)
		}
		return cmplx.Abs(y[0] - cmplx.Exp(complex(0, 2+2)))
	}
	e1, e2 := errAt(0.1), errAt(0.05)
	ratio := e1 / e2
	if ratio < 24 || ratio > 44 {
		t.Errorf("error ratio for halved step = %g, want about 32 (fifth order); errors %g, %g", ratio, e1, e2)
	}
}

// TestIntegrateToleranceConvergence: tighter tolerances give smaller errors
// and more steps (property test).
func TestIntegrateToleranceConvergence(t *testing.T) {
	t.Parallel()
	f := func(x float64, y, d []complex128) { d[0] = 20i * y[0] }
	prevErr, prevSteps := math.Inf(1), 0
	for _, tol := range []float64{1e-4, 1e-7, 1e-10} {
		y := []complex128{1}
		res, err := Integrate(f, 0, 1, y, &ODESettings{RelTol: tol, AbsTol: tol})
		if err != nil {
			t.Fatal(err)
		}
		e := cmplx.Abs(y[0] - cmplx.Exp(20i))
		if e >= prevErr || res.Steps <= prevSteps {
			t.Errorf("tol %g: error %g (previous %g), steps %d (previous %d)", tol, e, prevErr, res.Steps, prevSteps)
		}
		if e > 100*tol {
			t.Errorf("tol %g: error %g far above the tolerance", tol, e)
		}
		prevErr, prevSteps = e, res.Steps
	}
}

// TestIntegrateFailures checks the error values.
func TestIntegrateFailures(t *testing.T) {
	t.Parallel()
	// y' = y² from y(0) = 1 blows up at x = 1 (y = 1/(1-x)).
	y := []complex128{1}
	res, err := Integrate(func(x float64, y, d []complex128) { d[0] = y[0] * y[0] }, 0, 2, y, nil)
	if err == nil || res.X > 1.001 {
		t.Errorf("blow-up: err %v, stopped at %g", err, res.X)
	}
	y = []complex128{1}
	_, err = Integrate(func(x float64, y, d []complex128) { d[0] = 100i * y[0] }, 0, 10, y, &ODESettings{MaxSteps: 5})
	if !errors.Is(err, ErrMaxSteps) {
		t.Errorf("max steps: err %v, want ErrMaxSteps", err)
	}
	y = []complex128{1}
	_, err = Integrate(func(x float64, y, d []complex128) { d[0] = complex(math.NaN(), 0) }, 0, 1, y, nil)
	if !errors.Is(err, ErrNonFinite) {
		t.Errorf("NaN derivative: err %v, want ErrNonFinite", err)
	}
}

// TestIntegrateObserver checks the observer sees x0, every accepted step and x1.
func TestIntegrateObserver(t *testing.T) {
	t.Parallel()
	var xs []float64
	it := NewIntegrator(1)
	it.Observer = func(x float64, y []complex128) { xs = append(xs, x) }
	y := []complex128{1}
	res, err := it.Integrate(func(x float64, y, d []complex128) { d[0] = 3i * y[0] }, 0, 2, y, nil)
	if err != nil {
		t.Fatal(err)
	}
	if len(xs) != res.Steps+1 || xs[0] != 0 || xs[len(xs)-1] != 2 {
		t.Errorf("observer saw %d points (steps %d), first %g, last %g", len(xs), res.Steps, xs[0], xs[len(xs)-1])
	}
	for i := 1; i < len(xs); i++ {
		if xs[i] <= xs[i-1] {
			t.Fatalf("observer x not increasing at %d", i)
		}
	}
}

// TestIntegrateNoAllocs: a reused Integrator allocates nothing.
func TestIntegrateNoAllocs(t *testing.T) {
	it := NewIntegrator(2)
	y := make([]complex128, 2)
	f := func(x float64, y, d []complex128) { d[0] = y[1]; d[1] = -y[0] }
	allocs := testing.AllocsPerRun(20, func() {
		y[0], y[1] = 1, 0
		if _, err := it.Integrate(f, 0, 50, y, nil); err != nil {
			t.Fatal(err)
		}
	})
	if allocs != 0 {
		t.Errorf("%g allocations per Integrate call, want 0", allocs)
	}
}

var sinkODE ODEResult

// BenchmarkIntegrateStep measures one Dormand-Prince step on a 3-component
// state; ns/op is per call of 100 steps.
func BenchmarkIntegrateStep(b *testing.B) {
	it := NewIntegrator(3)
	y := make([]complex128, 3)
	f := func(x float64, y, d []complex128) { d[0] = y[1]; d[1] = -y[0]; d[2] = 1i * y[2] }
	s := &ODESettings{RelTol: 1e6, AbsTol: 1e6, MaxStep: 0.01, InitialStep: 0.01}
	b.ReportAllocs()
	for b.Loop() {
		y[0], y[1], y[2] = 1, 0, 1
		r, err := it.Integrate(f, 0, 1, y, s)
		if err != nil {
			b.Fatal(err)
		}
		sinkODE = r
	}
}
