package numeric

import (
	"errors"
	"fmt"
	"math"
	"math/cmplx"
)

// This file holds the adaptive Runge-Kutta integrator on complex state used
// by the wave-equation solvers (calc/linear).

// Dormand-Prince 5(4) coefficients: Dormand & Prince, "A family of embedded
// Runge-Kutta formulae", J. Comput. Appl. Math. 6, 19-26 (1980); the same
// tableau as Hairer, Nørsett & Wanner, "Solving Ordinary Differential
// Equations I", 2nd ed. 1993, Table 5.2 (section II.5).
const (
	dpC2 = 1.0 / 5
	dpC3 = 3.0 / 10
	dpC4 = 4.0 / 5
	dpC5 = 8.0 / 9

	dpA21 = 1.0 / 5
	dpA31 = 3.0 / 40
	dpA32 = 9.0 / 40
	dpA41 = 44.0 / 45
	dpA42 = -56.0 / 15
	dpA43 = 32.0 / 9
	dpA51 = 19372.0 / 6561
	dpA52 = -25360.0 / 2187
	dpA53 = 64448.0 / 6561
	dpA54 = -212.0 / 729
	dpA61 = 9017.0 / 3168
	dpA62 = -355.0 / 33
	dpA63 = 46732.0 / 5247
	dpA64 = 49.0 / 176
	dpA65 = -5103.0 / 18656
	// The fifth-order weights equal the seventh stage's row (FSAL).
	dpA71 = 35.0 / 384
	dpA73 = 500.0 / 1113
	dpA74 = 125.0 / 192
	dpA75 = -2187.0 / 6784
	dpA76 = 11.0 / 84

	// Error weights e = b(5th order) - b*(4th order), with
	// b* = 5179/57600, 0, 7571/16695, 393/640, -92097/339200, 187/2100, 1/40.
	dpE1 = 35.0/384 - 5179.0/57600
	dpE3 = 500.0/1113 - 7571.0/16695
	dpE4 = 125.0/192 - 393.0/640
	dpE5 = -2187.0/6784 + 92097.0/339200
	dpE6 = 11.0/84 - 187.0/2100
	dpE7 = -1.0 / 40
)

// Default ODE settings used when a field of ODESettings is zero.
const (
	DefaultRelTol   = 1e-8
	DefaultAbsTol   = 1e-12
	DefaultMaxSteps = 100000
)

// ErrMaxSteps is returned (wrapped) when Integrate needs more steps than
// ODESettings.MaxSteps.
var ErrMaxSteps = errors.New("numeric: too many integration steps")

// ErrStepTooSmall is returned (wrapped) when the step size falls below the
// floating-point resolution of x: the problem is stiff or singular there.
var ErrStepTooSmall = errors.New("numeric: integration step size underflow")

// ErrNonFinite is returned (wrapped) when the derivative or the state
// becomes NaN or infinite.
var ErrNonFinite = errors.New("numeric: state or derivative is not finite")

// ODESettings adjusts Integrate. A nil *ODESettings, or a zero field, means
// the documented default.
type ODESettings struct {
	// RelTol is the relative error tolerance per step (default 1e-8).
	RelTol float64
	// AbsTol is the absolute error tolerance per step, in the units of
	// the state (default 1e-12).
	AbsTol float64
	// InitialStep is the first trial step |h|; zero picks one from the
	// derivative at x0 (Hairer, Nørsett & Wanner 1993, section II.4,
	// "starting step size").
	InitialStep float64
	// MaxStep bounds |h|; zero means |x1 - x0|.
	MaxStep float64
	// MaxSteps bounds the number of attempted steps (default 100000).
	MaxSteps int
}

// ODEResult holds the statistics of one Integrate call.
type ODEResult struct {
	X           float64 // where the integration stopped (x1 on success)
	Steps       int     // accepted steps
	Rejected    int     // rejected trial steps
	Evaluations int     // calls of the derivative function
	LastStep    float64 // the last accepted step size |h|
}

// Integrator integrates y' = f(x, y) for complex y with the adaptive
// Dormand-Prince 5(4) pair. It owns its work buffers: after NewIntegrator
// (or the first call with a given dimension) Integrate allocates nothing
// per step. An Integrator is not safe for concurrent use.
type Integrator struct {
	n    int
	k    [7][]complex128
	ytmp []complex128
	ynew []complex128

	// Observer, when non-nil, is called at x0 and after every accepted
	// step with the current x and state. It must not keep y: the slice is
	// reused.
	Observer func(x float64, y []complex128)
}

// NewIntegrator returns an Integrator with buffers for n complex unknowns.
func NewIntegrator(n int) *Integrator {
	it := &Integrator{}
	it.resize(n)
	return it
}

func (it *Integrator) resize(n int) {
	if it.n == n && it.ytmp != nil {
		return
	}
	it.n = n
	for i := range it.k {
		it.k[i] = make([]complex128, n)
	}
	it.ytmp = make([]complex128, n)
	it.ynew = make([]complex128, n)
}

// Integrate advances y from x0 to x1 (x1 < x0 integrates backwards) in place
// with a new Integrator. See (*Integrator).Integrate.
func Integrate(f func(x float64, y, dydx []complex128), x0, x1 float64, y []complex128, s *ODESettings) (ODEResult, error) {
	return NewIntegrator(len(y)).Integrate(f, x0, x1, y, s)
}

// Integrate advances y from x0 to x1 in place, solving y' = f(x, y), where f
// writes the derivative into dydx (len(y) elements) and must not keep the
// slices. Each step's local error, measured per component as
// |err_i| / (AbsTol + RelTol·max(|y_i|, |y_new,i|)) in the root-mean-square
// norm, is kept below 1 (the usual error norm of Hairer, Nørsett & Wanner 1993, section II.4; from memory); the
// step is adapted with the usual safety factor 0.9 and exponent 1/5.
//
// On failure y holds the state at ODEResult.X and the error wraps
// ErrMaxSteps, ErrStepTooSmall or ErrNonFinite.
func (it *Integrator) Integrate(f func(x float64, y, dydx []complex128), x0, x1 float64, y []complex128, s *ODESettings) (ODEResult, error) {
	if math.IsNaN(x0) || math.IsNaN(x1) || math.IsInf(x0, 0) || math.IsInf(x1, 0) {
		panic("numeric: Integrate with non-finite limits")
	}
	it.resize(len(y))
	rtol, atol, h, hmax, maxSteps := DefaultRelTol, DefaultAbsTol, 0.0, math.Abs(x1-x0), DefaultMaxSteps
	if s != nil {
		if s.RelTol > 0 {
			rtol = s.RelTol
		}
		if s.AbsTol > 0 {
			atol = s.AbsTol
		}
		if s.InitialStep > 0 {
			h = s.InitialStep
		}
		if s.MaxStep > 0 {
			hmax = math.Min(hmax, s.MaxStep)
		}
		if s.MaxSteps > 0 {
			maxSteps = s.MaxSteps
		}
	}
	res := ODEResult{X: x0}
	if it.Observer != nil {
		it.Observer(x0, y)
	}
	if x1 == x0 {
		return res, nil
	}
	dir := 1.0
	if x1 < x0 {
		dir = -1
	}
	n := it.n
	k1, k2, k3, k4, k5, k6, k7 := it.k[0], it.k[1], it.k[2], it.k[3], it.k[4], it.k[5], it.k[6]
	yt, yn := it.ytmp, it.ynew
	x := x0
	f(x, y, k1)
	res.Evaluations++
	if !finiteC(k1) {
		return res, fmt.Errorf("derivative at x = %s: %w", num(x), ErrNonFinite)
	}
	if h == 0 {
		h = it.startStep(f, x, y, dir, rtol, atol, hmax, &res)
	}
	h = math.Min(h, hmax)
	const safety, facMin, facMax = 0.9, 0.2, 10.0
	lastRejected := false
	for attempts := 0; ; attempts++ {
		if attempts >= maxSteps {
			res.X = x
			return res, fmt.Errorf("%d steps from x = %s reached x = %s, not %s: %w", maxSteps, num(x0), num(x), num(x1), ErrMaxSteps)
		}
		last := false
		if dir*(x+dir*h-x1) >= 0 {
			h = math.Abs(x1 - x)
			last = true
		}
		if h <= 4*math.Abs(x)*rkEps || h == 0 {
			res.X = x
			return res, fmt.Errorf("at x = %s: %w", num(x), ErrStepTooSmall)
		}
		hs := dir * h
		for i := 0; i < n; i++ {
			yt[i] = y[i] + complex(hs*dpA21, 0)*k1[i]
		}
		f(x+dpC2*hs, yt, k2)
		for i := 0; i < n; i++ {
			yt[i] = y[i] + complex(hs, 0)*(complex(dpA31, 0)*k1[i]+complex(dpA32, 0)*k2[i])
		}
		f(x+dpC3*hs, yt, k3)
		for i := 0; i < n; i++ {
			yt[i] = y[i] + complex(hs, 0)*(complex(dpA41, 0)*k1[i]+complex(dpA42, 0)*k2[i]+complex(dpA43, 0)*k3[i])
		}
		f(x+dpC4*hs, yt, k4)
		for i := 0; i < n; i++ {
			yt[i] = y[i] + complex(hs, 0)*(complex(dpA51, 0)*k1[i]+complex(dpA52, 0)*k2[i]+complex(dpA53, 0)*k3[i]+complex(dpA54, 0)*k4[i])
		}
		f(x+dpC5*hs, yt, k5)
		for i := 0; i < n; i++ {
			yt[i] = y[i] + complex(hs, 0)*(complex(dpA61, 0)*k1[i]+complex(dpA62, 0)*k2[i]+complex(dpA63, 0)*k3[i]+complex(dpA64, 0)*k4[i]+complex(dpA65, 0)*k5[i])
		}
		xn := x + hs
		if last {
			xn = x1
		}
		f(xn, yt, k6)
		for i := 0; i < n; i++ {
			yn[i] = y[i] + complex(hs, 0)*(complex(dpA71, 0)*k1[i]+complex(dpA73, 0)*k3[i]+complex(dpA74, 0)*k4[i]+complex(dpA75, 0)*k5[i]+complex(dpA76, 0)*k6[i])
		}
		f(xn, yn, k7)
		res.Evaluations += 6
		var sum float64
		for i := 0; i < n; i++ {
			e := complex(hs, 0) * (complex(dpE1, 0)*k1[i] + complex(dpE3, 0)*k3[i] + complex(dpE4, 0)*k4[i] + complex(dpE5, 0)*k5[i] + complex(dpE6, 0)*k6[i] + complex(dpE7, 0)*k7[i])
			sc := atol + rtol*math.Max(cmplx.Abs(y[i]), cmplx.Abs(yn[i]))
			r := cmplx.Abs(e) / sc
			sum += r * r
		}
		errNorm := math.Sqrt(sum / float64(n))
		if math.IsNaN(errNorm) || math.IsInf(errNorm, 0) {
			// The trial state blew up: retry with a much smaller step,
			// and give up once the step is at the resolution of x.
			h *= facMin
			res.Rejected++
			lastRejected = true
			if h <= 4*math.Abs(x)*rkEps || h < 1e-300 {
				res.X = x
				return res, fmt.Errorf("at x = %s: %w", num(x), ErrNonFinite)
			}
			continue
		}
		if errNorm <= 1 {
			res.Steps++
			copy(y, yn)
			copy(k1, k7) // first same as last
			x = xn
			res.X = x
			res.LastStep = h
			if it.Observer != nil {
				it.Observer(x, y)
			}
			if last {
				return res, nil
			}
			fac := facMax
			if errNorm > 0 {
				fac = math.Min(facMax, math.Max(facMin, safety*math.Pow(errNorm, -0.2)))
			}
			if lastRejected {
				fac = math.Min(fac, 1)
			}
			h = math.Min(h*fac, hmax)
			lastRejected = false
		} else {
			res.Rejected++
			h *= math.Max(facMin, safety*math.Pow(errNorm, -0.2))
			lastRejected = true
		}
	}
}

// rkEps is the float64 machine epsilon.
const rkEps = 2.220446049250313e-16

// startStep picks a first step after Hairer, Nørsett & Wanner (1993),
// section II.4, algorithm "starting step size" (simplified: one Euler trial).
func (it *Integrator) startStep(f func(float64, []complex128, []complex128), x float64, y []complex128, dir, rtol, atol, hmax float64, res *ODEResult) float64 {
	n := it.n
	k1, k2, yt := it.k[0], it.k[1], it.ytmp
	var d0, d1 float64
	for i := 0; i < n; i++ {
		sc := atol + rtol*cmplx.Abs(y[i])
		d0 += sqr(cmplx.Abs(y[i]) / sc)
		d1 += sqr(cmplx.Abs(k1[i]) / sc)
	}
	d0, d1 = math.Sqrt(d0/float64(n)), math.Sqrt(d1/float64(n))
	h0 := 1e-6
	if d0 >= 1e-5 && d1 >= 1e-5 {
		h0 = 0.01 * d0 / d1
	}
	h0 = math.Min(h0, hmax)
	for i := 0; i < n; i++ {
		yt[i] = y[i] + complex(dir*h0, 0)*k1[i]
	}
	f(x+dir*h0, yt, k2)
	res.Evaluations++
	var d2 float64
	for i := 0; i < n; i++ {
		sc := atol + rtol*cmplx.Abs(y[i])
		d2 += sqr(cmplx.Abs(k2[i]-k1[i]) / sc)
	}
	d2 = math.Sqrt(d2/float64(n)) / h0
	var h1 float64
	if m := math.Max(d1, d2); m <= 1e-15 {
		h1 = math.Max(1e-6, h0*1e-3)
	} else {
		h1 = math.Pow(0.01/m, 0.2)
	}
	h := math.Min(100*h0, h1)
	if math.IsNaN(h) || h <= 0 {
		h = h0
	}
	return math.Min(h, hmax)
}

func sqr(v float64) float64 { return v * v }

func finiteC(v []complex128) bool {
	for _, c := range v {
		if math.IsNaN(real(c)) || math.IsNaN(imag(c)) || math.IsInf(real(c), 0) || math.IsInf(imag(c), 0) {
			return false
		}
	}
	return true
}
