package special

import (
	"math"
	"math/cmplx"
)

// seriesLimit is the |z| above which the Hankel expansions are used. There
// the smallest term of the asymptotic series, about exp(-2|z|), is below
// 2e-15 relative to the leading term.
const seriesLimit = 17.0

// I0 returns the modified Bessel function of the first kind of order zero,
// I0(z), for complex z. It overflows to Inf for |Re z| above about 700.
func I0(z complex128) complex128 {
	i0, _ := IScaled(z)
	return i0 * complex(math.Exp(math.Abs(real(z))), 0)
}

// I1 returns the modified Bessel function of the first kind of order one,
// I1(z), for complex z. It overflows to Inf for |Re z| above about 700.
func I1(z complex128) complex128 {
	_, i1 := IScaled(z)
	return i1 * complex(math.Exp(math.Abs(real(z))), 0)
}

// I0e returns exp(-|Re z|) I0(z).
func I0e(z complex128) complex128 {
	i0, _ := IScaled(z)
	return i0
}

// I1e returns exp(-|Re z|) I1(z).
func I1e(z complex128) complex128 {
	_, i1 := IScaled(z)
	return i1
}

// IScaled returns exp(-|Re z|) I0(z) and exp(-|Re z|) I1(z) together, for
// any finite complex z. The ratio i1/i0 equals I1(z)/I0(z) and never
// overflows. Methods and accuracy are in the package documentation.
func IScaled(z complex128) (i0e, i1e complex128) {
	if cmplx.IsNaN(z) || cmplx.IsInf(z) {
		return cmplx.NaN(), cmplx.NaN()
	}
	// I0 is even and I1 odd: work in Re z >= 0.
	sign := complex(1, 0)
	if real(z) < 0 {
		z = -z
		sign = -1
	}
	a := cmplx.Abs(z)
	switch {
	case a > seriesLimit:
		i0e, i1e = iHankel(z)
	case a-real(z) <= 4:
		i0e, i1e = iSeries(z)
		s := complex(math.Exp(-real(z)), 0)
		i0e, i1e = i0e*s, i1e*s
	default:
		i0e, i1e = iTrapezoid(z)
	}
	return i0e, sign * i1e
}

// iSeries sums the ascending series (DLMF 10.25.2) of I0 and I1, unscaled.
func iSeries(z complex128) (i0, i1 complex128) {
	t := z * z / 4
	a := complex(1, 0) // t^k/(k!)^2
	b := complex(1, 0) // t^k/(k!(k+1)!)
	i0, s1 := a, b
	for k := 1; k < 200; k++ {
		fk := float64(k)
		a *= t / complex(fk*fk, 0)
		b *= t / complex(fk*(fk+1), 0)
		i0 += a
		s1 += b
		if cmplx.Abs(a) <= 1e-17*cmplx.Abs(i0) && cmplx.Abs(b) <= 1e-17*cmplx.Abs(s1) {
			break
		}
	}
	return i0, s1 * z / 2
}

// iTrapezoid evaluates exp(-Re z) I_n(z) = (1/π)∫₀^π exp(z cos θ - Re z)
// cos(nθ) dθ (DLMF 10.32.3) for n = 0, 1 with the trapezoid rule, exact to
// rounding for a periodic analytic integrand once the number of panels
// exceeds |z| by a margin. Used for |z| <= seriesLimit away from the real
// axis, where the power series would cancel.
func iTrapezoid(z complex128) (i0e, i1e complex128) {
	const n = 64 // panels on [0, π]; error ~ exp(|z|cosh s - 2ns), s≈1.5
	h := math.Pi / n
	rz := real(z)
	var s0, s1 complex128
	for j := 0; j <= n; j++ {
		th := float64(j) * h
		c := math.Cos(th)
		g := cmplx.Exp(z*complex(c, 0) - complex(rz, 0))
		w := 1.0
		if j == 0 || j == n {
			w = 0.5
		}
		s0 += complex(w, 0) * g
		s1 += complex(w*c, 0) * g
	}
	return s0 / n, s1 / n
}

// iHankel evaluates the scaled compound Hankel expansion (DLMF 10.40.5) for
// Re z >= 0 and |z| > seriesLimit:
//
//	I_ν(z) ~ e^z/√(2πz) Σ (-1)^k a_k(ν)/z^k ± i e^{±iνπ} e^{-z}/√(2πz) Σ a_k(ν)/z^k
//
// with the upper sign for Im z >= 0, a_k from DLMF 10.17.1.
func iHankel(z complex128) (i0e, i1e complex128) {
	p0, m0 := hankelSums(0, z)
	p1, m1 := hankelSums(1, z)
	root := cmplx.Sqrt(2 * math.Pi * z)
	// e^z exp(-Re z) = e^{i Im z}; e^{-z} exp(-Re z) = e^{-2 Re z} e^{-i Im z}.
	front := cmplx.Exp(complex(0, imag(z))) / root
	back := cmplx.Exp(complex(-2*real(z), -imag(z))) / root
	up := complex(0, 1) // ± i e^{±iνπ} for ν = 0
	if imag(z) < 0 {
		up = -up
	}
	i0e = front*m0 + up*back*p0
	i1e = front*m1 - up*back*p1 // e^{±iπ} = -1 for ν = 1
	return i0e, i1e
}

// hankelSums returns Σ a_k(ν)/z^k and Σ (-1)^k a_k(ν)/z^k, stopped at the
// first term below 1e-17 relative or at the smallest term.
func hankelSums(nu int, z complex128) (plus, minus complex128) {
	mu := 4 * float64(nu*nu)
	term := complex(1, 0)
	plus, minus = 1, 1
	last := math.Inf(1)
	inv := 1 / z
	for k := 1; k < 60; k++ {
		fk := float64(k)
		term *= complex((mu-(2*fk-1)*(2*fk-1))/(8*fk), 0) * inv
		at := cmplx.Abs(term)
		if at > last {
			break
		}
		last = at
		plus += term
		if k%2 == 1 {
			minus -= term
		} else {
			minus += term
		}
		if at < 1e-17 {
			break
		}
	}
	return plus, minus
}
