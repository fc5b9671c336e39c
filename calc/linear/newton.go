package linear

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/mat"

	"tubewright/calc/units"
)

// newtonProblem is a small square nonlinear system solved by damped Newton
// iterations with a forward-difference Jacobian.
type newtonProblem struct {
	n       int
	x       []float64 // start, then the answer
	scale   []float64 // typical size of each unknown (step tests, FD steps)
	lo, hi  []float64 // bounds of each unknown
	maxStep []float64 // largest change of each unknown per iteration
	tol     float64   // converged when every |Δx_j| < tol·scale_j
	maxIter int
	f       func(x, r []float64) error

	iterations, evaluations int
	norm                    float64 // last residual norm
}

// solve runs the iterations. On failure x holds the last iterate and the
// error says why.
func (p *newtonProblem) solve() error {
	n := p.n
	r := make([]float64, n)
	rt := make([]float64, n)
	xt := make([]float64, n)
	jac := mat.NewDense(n, n, nil)
	dx := mat.NewVecDense(n, nil)
	eval := func(x, r []float64) error {
		p.evaluations++
		if err := p.f(x, r); err != nil {
			return err
		}
		for _, v := range r {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return fmt.Errorf("residual is not finite")
			}
		}
		return nil
	}
	norm := func(r []float64) float64 {
		var s float64
		for _, v := range r {
			s += v * v
		}
		return math.Sqrt(s)
	}
	if err := eval(p.x, r); err != nil {
		return err
	}
	p.norm = norm(r)
	for p.iterations = 1; p.iterations <= p.maxIter; p.iterations++ {
		// Forward-difference Jacobian, step 1e-7 of the unknown's scale.
		for j := 0; j < n; j++ {
			copy(xt, p.x)
			h := 1e-7 * math.Max(math.Abs(p.x[j]), p.scale[j])
			if xt[j]+h > p.hi[j] {
				h = -h
			}
			xt[j] += h
			if err := eval(xt, rt); err != nil {
				return err
			}
			for i := 0; i < n; i++ {
				jac.Set(i, j, (rt[i]-r[i])/h)
			}
		}
		if err := dx.SolveVec(jac, mat.NewVecDense(n, r)); err != nil {
			return fmt.Errorf("singular Jacobian: %v", err)
		}
		// Limit the step, keeping its direction.
		f := 1.0
		for j := 0; j < n; j++ {
			if s := math.Abs(dx.AtVec(j)); s > p.maxStep[j] {
				f = math.Min(f, p.maxStep[j]/s)
			}
		}
		conv := true
		for j := 0; j < n; j++ {
			if math.Abs(f*dx.AtVec(j)) >= p.tol*p.scale[j] {
				conv = false
			}
		}
		accepted := false
		for try := 0; try < 12; try++ {
			for j := 0; j < n; j++ {
				xt[j] = p.x[j] - f*dx.AtVec(j)
				xt[j] = math.Min(math.Max(xt[j], p.lo[j]), p.hi[j])
			}
			err := eval(xt, rt)
			if err == nil && (conv || norm(rt) < p.norm) {
				accepted = true
				break
			}
			f /= 2
		}
		if !accepted {
			return fmt.Errorf("no step reduces the residual (norm %s)", units.Number(p.norm, 3))
		}
		copy(p.x, xt)
		copy(r, rt)
		p.norm = norm(r)
		if conv {
			return nil
		}
	}
	p.iterations = p.maxIter
	return fmt.Errorf("the iteration limit was reached with residual norm %s", units.Number(p.norm, 3))
}
