// Package uncertain propagates input uncertainties to a calculator's
// results, the same way for every calculator of Tubewright.
//
// # Method
//
// First-order propagation of uncorrelated standard uncertainties, the "law
// of propagation of uncertainty" of the GUM (JCGM 100:2008, Evaluation of
// measurement data — Guide to the expression of uncertainty in measurement,
// section 5.1.2, eq. 10):
//
//	u_c²(y) = Σ_i (∂f/∂x_i)² u²(x_i)
//
// The sensitivity coefficients ∂f/∂x_i are estimated by central finite
// differences (gonum.org/v1/gonum/diff/fd) with a step relative to the size
// of the input: h_i = 6.06e-6 · max(|x_i|, u_i) (≈ ε^(1/3), the usual
// choice that balances truncation and rounding error for a central
// difference). Where f is not finite on one side of x_i (an input at the
// edge of a model's range) a one-sided difference with h_i = 1.5e-8 ·
// max(|x_i|, u_i) is used instead. Inputs whose uncertainty is zero cost no
// evaluation at all.
//
// The method is linear: it is good while f is close to linear over ±u_i. A
// ± that is a large fraction of the value (say above 10 %) deserves a
// warning from the caller. Correlations between inputs are ignored; an
// uncertainty that is not a standard uncertainty (e.g. a tolerance band)
// is propagated as if it were one, so the output ± has the same meaning as
// the inputs' ±.
//
// # Use from a calculator
//
// Write the calculation as a function of a flat vector of SI inputs that
// returns NaN where it would fail, evaluate it once on its own (so its error
// reaches the user with the field name), then propagate:
//
//	x := []float64{length, radius, temperature}
//	u := []float64{uLength, 0, uTemperature}
//	f := func(x []float64) float64 {
//		v, err := model(x[0], x[1], x[2])
//		if err != nil {
//			return math.NaN()
//		}
//		return v
//	}
//	value, sigma := uncertain.Propagate(f, x, u)
//
// PropagateN does the same for several results from one evaluation (the
// frequency, the quality factor and the bandwidth together). f must not keep
// x or out.
//
// # Use from twcalc and the app
//
// units.Parse returns the typed ± in Quantity.Uncertainty (SI). Pass each
// Quantity's Value and Uncertainty as x_i and u_i. When sigma is NaN the
// derivative could not be estimated on either side; show the value alone
// with a warning, never the NaN. When every u_i is zero sigma is exactly 0
// and the result should be shown without ±.
package uncertain
