package numeric

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/units"
)

// ErrNoBracket is returned by Brent when f(a) and f(b) have the same sign
// (or one of them is not finite), so the interval is not known to hold a
// root.
var ErrNoBracket = errors.New("numeric: f(a) and f(b) do not bracket a root")

// ErrNotConverged is wrapped by the error Brent returns when it runs out of
// iterations before meeting its tolerance.
var ErrNotConverged = errors.New("numeric: root finder did not converge")

// ErrNotFinite is wrapped by the error Brent returns when f returns NaN or
// ±Inf inside the bracket.
var ErrNotFinite = errors.New("numeric: function value is not finite")

// RootSettings tunes Brent. A nil *RootSettings means the defaults below;
// a zero field means that field's default.
type RootSettings struct {
	// AbsTol is the absolute tolerance on the root's position. Default
	// 1e-300 (so that RelTol governs for roots away from zero).
	AbsTol float64
	// RelTol is the tolerance relative to |x|. Default 4·eps ≈ 8.9e-16.
	// The final bracket is narrower than 2·(AbsTol + RelTol·|x|).
	RelTol float64
	// MaxIterations bounds the number of iterations. Default 200.
	MaxIterations int
}

// RootResult is the outcome of a root search.
type RootResult struct {
	X           float64 // the root, or the last iterate when not converged
	Iterations  int     // iterations performed
	Evaluations int     // calls of f, including the two at the ends
	Converged   bool    // the tolerance was met, or f(X) == 0 exactly
}

func (s *RootSettings) values() (absTol, relTol float64, maxIter int) {
	absTol, relTol, maxIter = 1e-300, 4*epsilon, 200
	if s == nil {
		return
	}
	if s.AbsTol > 0 {
		absTol = s.AbsTol
	}
	if s.RelTol > 0 {
		relTol = s.RelTol
	}
	if s.MaxIterations > 0 {
		maxIter = s.MaxIterations
	}
	return
}

const epsilon = 0x1p-52

// Brent finds a root of f in the closed interval [a, b] by Brent's method:
// inverse quadratic interpolation or the secant step when they make good
// progress, bisection otherwise, so the bracket always shrinks and at worst
// the method is as slow as bisection.
//
// Requirements: a and b finite, a != b (either order), f continuous on the
// interval, f(a) and f(b) of opposite sign or one of them zero. When they
// have the same sign Brent returns ErrNoBracket after two evaluations.
//
// Termination: when the bracket half-width is below
// tol = AbsTol + RelTol·|x| (see RootSettings), or f(x) == 0. When the
// iteration limit is hit first the error wraps ErrNotConverged and the
// result carries the best iterate so far (smallest |f|).
//
// Source: R. P. Brent, "Algorithms for Minimization without Derivatives",
// Prentice-Hall 1973, chapter 4 (the algorithm; this is an independent
// implementation from its description).
//
// Brent panics when a or b is not finite or a == b (programmer error).
func Brent(f func(float64) float64, a, b float64, s *RootSettings) (RootResult, error) {
	if math.IsNaN(a) || math.IsNaN(b) || math.IsInf(a, 0) || math.IsInf(b, 0) {
		panic("numeric: Brent interval ends must be finite")
	}
	if a == b {
		panic("numeric: Brent interval is empty")
	}
	absTol, relTol, maxIter := s.values()
	var res RootResult

	fa, fb := f(a), f(b)
	res.Evaluations = 2
	if !finite(fa) || !finite(fb) {
		res.X = a
		return res, fmt.Errorf("%w at the interval ends [%s, %s]", ErrNoBracket, num(a), num(b))
	}
	if fa == 0 {
		res.X, res.Converged = a, true
		return res, nil
	}
	if fb == 0 {
		res.X, res.Converged = b, true
		return res, nil
	}
	if (fa > 0) == (fb > 0) {
		res.X = a
		if math.Abs(fb) < math.Abs(fa) {
			res.X = b
		}
		return res, fmt.Errorf("%w: f(%s) = %s, f(%s) = %s", ErrNoBracket, num(a), num(fa), num(b), num(fb))
	}

	// b is the best estimate, a the previous one, c the point with f of
	// opposite sign to f(b) so that the root is between b and c.
	c, fc := a, fa
	d := b - a // latest step
	e := d     // step before the latest
	for res.Iterations = 0; res.Iterations < maxIter; res.Iterations++ {
		if (fb > 0) == (fc > 0) {
			c, fc = a, fa
			d = b - a
			e = d
		}
		if math.Abs(fc) < math.Abs(fb) {
			// keep b the best point
			a, b, c = b, c, b
			fa, fb, fc = fb, fc, fb
		}
		tol := 0.5*absTol + 0.5*relTol*math.Abs(b)
		half := 0.5 * (c - b)
		if math.Abs(half) <= tol || fb == 0 {
			res.X, res.Converged = b, true
			return res, nil
		}
		if math.Abs(e) >= tol && math.Abs(fa) > math.Abs(fb) {
			// try interpolation: p/q is the proposed step from b
			var p, q float64
			sr := fb / fa
			if a == c {
				// secant
				p = 2 * half * sr
				q = 1 - sr
			} else {
				// inverse quadratic through a, b, c
				qr := fa / fc
				rr := fb / fc
				p = sr * (2*half*qr*(qr-rr) - (b-a)*(rr-1))
				q = (qr - 1) * (rr - 1) * (sr - 1)
			}
			if p > 0 {
				q = -q
			} else {
				p = -p
			}
			// accept only when the step stays well inside the bracket and
			// shrinks faster than the step before last
			if 2*p < math.Min(3*half*q-math.Abs(tol*q), math.Abs(e*q)) {
				e = d
				d = p / q
			} else {
				d = half
				e = d
			}
		} else {
			d = half
			e = d
		}
		a, fa = b, fb
		if math.Abs(d) > tol {
			b += d
		} else if half > 0 {
			b += tol
		} else {
			b -= tol
		}
		fb = f(b)
		res.Evaluations++
		if !finite(fb) {
			res.X = a
			return res, fmt.Errorf("%w: f(%s) = %s", ErrNotFinite, num(b), num(fb))
		}
	}
	res.X = b
	if math.Abs(fc) < math.Abs(fb) {
		res.X = c
	}
	return res, fmt.Errorf("%w after %d iterations (bracket [%s, %s])", ErrNotConverged, maxIter, num(math.Min(b, c)), num(math.Max(b, c)))
}

// FindBrackets scans [a, b] in n equal sub-intervals and returns, in
// increasing order of x, every sub-interval [x0, x1] whose end values
// f(x0), f(x1) have opposite signs, or where f(x1) is exactly zero (or f(a)
// for the first one), ready for Brent: each root gives one bracket. It
// costs n+1 evaluations of f.
//
// Poles: a function like tan x changes sign across a pole as well as across
// a root. A sign change is discarded as a pole when |f| at both ends is
// larger than at the neighbouring grid points on each side, i.e. |f| grows
// toward the sign change instead of shrinking; a root has |f| falling toward
// it. The test needs the grid to resolve the function: choose n so that
// each sub-interval holds at most one root or pole and the function is
// roughly monotonic between grid points. Callers that can write their
// function without poles (multiply through by the denominator) should do so
// and not rely on this test. Points where f is NaN or ±Inf break the scan:
// no bracket is reported across them.
//
// FindBrackets panics when n < 1 or a >= b (programmer error).
func FindBrackets(f func(float64) float64, a, b float64, n int) [][2]float64 {
	if n < 1 {
		panic("numeric: FindBrackets needs n >= 1")
	}
	if !(a < b) {
		panic("numeric: FindBrackets needs a < b")
	}
	xs := make([]float64, n+1)
	fs := make([]float64, n+1)
	h := (b - a) / float64(n)
	for i := range xs {
		xs[i] = a + float64(i)*h
		if i == n {
			xs[i] = b
		}
		fs[i] = f(xs[i])
	}
	var out [][2]float64
	for i := 0; i < n; i++ {
		f0, f1 := fs[i], fs[i+1]
		if !finite(f0) || !finite(f1) {
			continue
		}
		if i == 0 && f0 == 0 {
			// a root exactly at a: Brent returns it from the first interval
			out = append(out, [2]float64{xs[0], xs[1]})
			continue
		}
		if f1 == 0 {
			out = append(out, [2]float64{xs[i], xs[i+1]})
			continue
		}
		if f0 == 0 || (f0 > 0) == (f1 > 0) {
			continue
		}
		if isPole(fs, i) {
			continue
		}
		out = append(out, [2]float64{xs[i], xs[i+1]})
	}
	return out
}

// isPole reports whether the sign change between fs[i] and fs[i+1] looks
// like a pole: |f| rises toward it from both sides.
func isPole(fs []float64, i int) bool {
	left, right := math.Abs(fs[i]), math.Abs(fs[i+1])
	risesLeft := i > 0 && finite(fs[i-1]) && math.Abs(fs[i-1]) < left
	risesRight := i+2 < len(fs) && finite(fs[i+2]) && math.Abs(fs[i+2]) < right
	return risesLeft && risesRight
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// num writes a number of a message plainly, without an exponent (these
// messages can reach a screen).
func num(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return fmt.Sprint(v)
	}
	return units.Number(v, 6)
}
