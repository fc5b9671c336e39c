// Package special provides the Bessel functions of complex argument that the
// thermoacoustic pore functions need and that neither Go's math/cmplx nor
// gonum provide: J0, J1, I0, I1, K0 and K1, each also in an exponentially
// scaled form so that ratios such as I1/I0 or J1/J0 can be formed far beyond
// the range where the unscaled values overflow.
//
// Scaling follows the convention of scipy.special (used for the reference
// tables in testdata/), so that tests can compare like with like:
//
//	I0e(z) = exp(-|Re z|) I0(z)     I1e(z) = exp(-|Re z|) I1(z)
//	J0e(z) = exp(-|Im z|) J0(z)     J1e(z) = exp(-|Im z|) J1(z)
//	K0e(z) = exp(z) K0(z)           K1e(z) = exp(z) K1(z)
//
// Methods (Olver et al., NIST Digital Library of Mathematical Functions,
// DLMF, release 1.1; Abramowitz & Stegun, Handbook of Mathematical Functions,
// 1964):
//
//   - I0, I1 for |z| <= 17: the ascending power series (DLMF 10.25.2;
//     A&S 9.6.10) where it loses little to cancellation (|z| - |Re z| <= 4),
//     otherwise the integral (1/π)∫₀^π exp(z cos θ) cos(nθ) dθ
//     (DLMF 10.32.3) by the trapezoid rule, which converges geometrically for
//     a periodic analytic integrand.
//   - I0, I1 for |z| > 17: the compound Hankel expansion with both the
//     exp(z) and exp(-z) parts (DLMF 10.40.5), valid uniformly for
//     |ph z| <= π/2; the smallest term there is below 1e-16.
//   - K0, K1 for |z| <= 2: the ascending series with the logarithm
//     (DLMF 10.31.1, 10.31.2; A&S 9.6.11, 9.6.13).
//   - K0, K1 for 2 < |z| <= 17: the integral exp(z)K_n(z) =
//     ∫₀^∞ exp(-2z sinh²(t/2)) cosh(nt) dt (DLMF 10.32.9) by the trapezoid
//     rule with a step set by the strip of analyticity, π/2 - |ph z|.
//   - K0, K1 for |z| > 17: the Hankel expansion (DLMF 10.40.2).
//   - J0, J1 through I: J0(z) = I0(-iz), J1(z) = i I1(-iz) (DLMF 10.27.6).
//
// Domain and accuracy: I and J are defined for every finite z; K for
// Re z > 0 (the half plane the pore functions need; K of Re z <= 0 returns
// NaN). Against scipy.special 1.10.1 the largest relative difference
// measured is 8e-15, on 3990 points along 14 rays (ph z from -3π/4 to π in
// steps of π/8) with |z| from 1e-3 to 300 (testdata/gen_rott.py,
// special_test.go, which asserts 1e-12). Unscaled values overflow to Inf
// once |Re z| (I, K) or |Im z| (J) passes about 700; use the scaled forms.
package special
