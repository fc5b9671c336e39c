package design

import (
	"errors"
	"fmt"
	"math"

	"gonum.org/v1/gonum/optimize"

	"tubewright/calc/numeric"
	"tubewright/calc/units"
)

// box maps the optimiser's free coordinates onto bounded lengths: a
// coordinate x stands for v0·e^x, held within [lo, hi]; a value outside
// adds its distance in log units to the penalty, so that Nelder-Mead is
// pulled back inside.
type box struct{ penalty float64 }

func (b *box) at(v0, x, lo, hi float64) float64 {
	v := v0 * math.Exp(x)
	switch {
	case v < lo:
		b.penalty += math.Log(lo / v)
		return lo
	case v > hi:
		b.penalty += math.Log(v / hi)
		return hi
	}
	return v
}

// minimize runs gonum's Nelder-Mead on f from the origin in n coordinates
// with a simplex of 0.2 (20 % in each length), stopping when the best value
// has moved less than abs over iters iterations or after evals
// evaluations, or when stop returns an error (a cancelled search). It
// returns the optimiser's status in words and its iterations.
func minimize(f func(x []float64) float64, n, evals, iters int, abs float64, stop func() error) (string, int) {
	settings := &optimize.Settings{
		Converger:       &optimize.FunctionConverge{Absolute: abs, Iterations: iters},
		FuncEvaluations: evals,
	}
	status := func() (optimize.Status, error) {
		if err := stop(); err != nil {
			return optimize.Failure, err
		}
		return optimize.NotTerminated, nil
	}
	r, err := optimize.Minimize(optimize.Problem{Func: f, Status: status}, make([]float64, n), settings, &optimize.NelderMead{SimplexSize: 0.2})
	switch {
	case r == nil && err != nil:
		return err.Error(), 0
	case err != nil:
		return r.Status.String() + ": " + err.Error(), r.MajorIterations
	}
	return r.Status.String(), r.MajorIterations
}

// errShortest says that even the shortest resonator gives a frequency
// below the target.
var errShortest = errors.New("design: even the shortest resonator is too long for the target")

// solveLength finds the resonator length L (m) with F(L) = 0, where F is
// the frequency less the target (Hz) and falls as L grows, by Brent's
// method (numeric.Brent) on a bracket around the secant estimate
//
//	L' = L0 + total (F(L0) / ft)
//
// (a tube's frequency goes as one over its length; total is the whole tube
// with L0), widened three times per step until F changes sign. lo is the
// shortest resonator; tol times total is Brent's tolerance on L. When F is
// negative even at lo it returns errShortest and F(lo) + ft.
func solveLength(F func(float64) float64, l0, lo, total, ft, tol float64) (float64, float64, error) {
	l0 = math.Max(l0, lo)
	f0 := F(l0)
	if math.IsNaN(f0) {
		return 0, 0, fmt.Errorf("%w: the tube could not be solved", errSolve)
	}
	l1 := math.Max(l0+total*f0/ft, lo)
	delta := 0.002*total + 1e-4
	a, b := math.Max(l1-delta, lo), l1+delta
	fa, fb := F(a), F(b)
	for i := 0; !(fa*fb <= 0); i++ {
		if math.IsNaN(fa) || math.IsNaN(fb) || i >= 10 {
			return 0, 0, fmt.Errorf("%w: the resonator length that gives %s could not be bracketed", errSolve, units.Format(ft, units.DimFrequency))
		}
		delta *= 3
		if fa > 0 { // both too high: longer
			a, fa = b, fb
			b += delta
			fb = F(b)
			continue
		}
		if a == lo { // both too low even at the shortest resonator
			return 0, fa + ft, errShortest
		}
		b, fb = a, fa
		a = math.Max(a-delta, lo)
		fa = F(a)
	}
	r, err := numeric.Brent(F, a, b, &numeric.RootSettings{AbsTol: math.Max(tol*total, 1e-9), MaxIterations: 60})
	if err != nil {
		return 0, 0, fmt.Errorf("%w: resonator length: %v", errSolve, err)
	}
	return r.X, 0, nil
}
