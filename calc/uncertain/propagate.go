package uncertain

import (
	"math"

	"gonum.org/v1/gonum/diff/fd"
	"gonum.org/v1/gonum/mat"
)

// Relative steps of the finite differences, times max(|x_i|, u_i).
const (
	centralStep = 6.0554544523933395e-06 // ε^(1/3)
	oneSideStep = 1.4901161193847656e-08 // ε^(1/2)
)

// Propagate returns f(x) and its first-order standard uncertainty
//
//	sigma = sqrt(Σ_i (∂f/∂x_i · u_i)²)
//
// for uncorrelated input uncertainties u (same length as x, each ≥ 0; GUM,
// JCGM 100:2008, eq. 10). See the package documentation for the step sizes
// and the fallback to one-sided differences. It calls f once at x and twice
// for each input with u_i > 0 (more only when a central difference fails).
// f may not keep or change its argument.
//
// When f(x) is not finite both results are NaN; when a derivative cannot be
// estimated, sigma is NaN. Propagate panics when len(u) != len(x) or an
// u_i is negative or NaN (programmer error).
func Propagate(f func(x []float64) float64, x, u []float64) (value, sigma float64) {
	vals, sigmas := PropagateN(func(x, out []float64) { out[0] = f(x) }, x, u, 1)
	return vals[0], sigmas[0]
}

// PropagateN is Propagate for a function with nOut results written into
// out (len nOut) from one evaluation. vals[k] is the k-th result at x and
// sigmas[k] its propagated standard uncertainty. Results that are not
// finite at x give NaN for both; a sensitivity that cannot be estimated
// gives NaN for that result's sigma only.
//
// PropagateN panics when len(u) != len(x), nOut < 1, or an u_i is negative
// or NaN (programmer error).
func PropagateN(f func(x, out []float64), x, u []float64, nOut int) (vals, sigmas []float64) {
	if len(u) != len(x) {
		panic("uncertain: len(u) != len(x)")
	}
	if nOut < 1 {
		panic("uncertain: nOut < 1")
	}
	for _, ui := range u {
		if !(ui >= 0) || math.IsInf(ui, 0) {
			panic("uncertain: uncertainty must be finite and >= 0")
		}
	}
	vals = make([]float64, nOut)
	sigmas = make([]float64, nOut)
	work := make([]float64, len(x))
	copy(work, x)
	f(work, vals)
	for k, v := range vals {
		if !finite(v) {
			vals[k], sigmas[k] = math.NaN(), math.NaN()
		}
	}

	col := mat.NewDense(nOut, 1, nil)
	for i, ui := range u {
		if ui == 0 {
			continue
		}
		scale := math.Max(math.Abs(x[i]), ui)
		// g varies input i alone, in units of scale around x[i]
		g := func(y, z []float64) {
			copy(work, x)
			work[i] = x[i] + z[0]*scale
			f(work, y)
		}
		ok := derivative(col, g, fd.Central, centralStep, nil)
		if !ok {
			ok = derivative(col, g, fd.Forward, oneSideStep, vals)
		}
		if !ok {
			ok = derivative(col, g, fd.Backward, oneSideStep, vals)
		}
		for k := range sigmas {
			d := col.At(k, 0)
			if !ok && !finite(d) {
				sigmas[k] = math.NaN()
				continue
			}
			c := d / scale * ui
			sigmas[k] += c * c
		}
	}
	for k := range sigmas {
		sigmas[k] = math.Sqrt(sigmas[k])
	}
	return vals, sigmas
}

// derivative fills the one-column Jacobian col of g at z = 0 with the given
// formula and step and reports whether every entry is finite.
func derivative(col *mat.Dense, g func(y, z []float64), formula fd.Formula, step float64, origin []float64) bool {
	s := &fd.JacobianSettings{Formula: formula, Step: step}
	if origin != nil {
		for _, v := range origin {
			if !finite(v) {
				return false
			}
		}
		s.OriginValue = origin
	}
	fd.Jacobian(col, g, []float64{0}, s)
	for k := range col.RawMatrix().Rows {
		if !finite(col.At(k, 0)) {
			return false
		}
	}
	return true
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
