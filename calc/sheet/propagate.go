package sheet

import (
	"math"

	"tubewright/calc/uncertain"
)

// Spread carries the typed ± of several inputs through f to first order
// (GUM, JCGM 100:2008, eq. 10, with calc/uncertain's derivatives). x are
// the SI values, u their standard uncertainties; f fills out with the
// results in order, or returns an error when a perturbed state leaves its
// model. It returns the uncertainty of each result; where one cannot be
// estimated it is 0 and ok[k] is false. With no ± typed it returns zeros
// without calling f.
func Spread(f func(x, out []float64) error, x, u []float64, nOut int) (sigmas []float64, ok []bool) {
	sigmas = make([]float64, nOut)
	ok = make([]bool, nOut)
	for i := range ok {
		ok[i] = true
	}
	any := false
	for _, ui := range u {
		if ui > 0 {
			any = true
		}
	}
	if !any {
		return sigmas, ok
	}
	_, s := uncertain.PropagateN(func(x, out []float64) {
		if err := f(x, out); err != nil {
			for k := range out {
				out[k] = math.NaN()
			}
		}
	}, x, u, nOut)
	for k, v := range s {
		if finite(v) && v >= 0 {
			sigmas[k] = v
		} else {
			ok[k] = false
		}
	}
	return sigmas, ok
}

// noSpreadWarning is the warning for a result whose ± could not be
// estimated.
func noSpreadWarning(name string) string {
	return "the uncertainty of " + name + " could not be estimated (the ± reaches outside the model); shown without it"
}
