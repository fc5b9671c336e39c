package special

import (
	"math"
	"math/cmplx"
)

// eulerGamma is the Euler–Mascheroni constant γ (DLMF 5.2.3).
const eulerGamma = 0.57721566490153286060651209008240243

// K0 returns the modified Bessel function of the second kind of order zero,
// K0(z), for Re z > 0 (NaN otherwise). It underflows to 0 for Re z above
// about 700.
func K0(z complex128) complex128 {
	k0, _ := KScaled(z)
	return k0 * cmplx.Exp(-z)
}

// K1 returns the modified Bessel function of the second kind of order one,
// K1(z), for Re z > 0 (NaN otherwise).
func K1(z complex128) complex128 {
	_, k1 := KScaled(z)
	return k1 * cmplx.Exp(-z)
}

// K0e returns exp(z) K0(z) for Re z > 0.
func K0e(z complex128) complex128 {
	k0, _ := KScaled(z)
	return k0
}

// K1e returns exp(z) K1(z) for Re z > 0.
func K1e(z complex128) complex128 {
	_, k1 := KScaled(z)
	return k1
}

// KScaled returns exp(z) K0(z) and exp(z) K1(z) together for Re z > 0; both
// are NaN for Re z <= 0 or a non-finite z. Methods and accuracy are in the
// package documentation.
func KScaled(z complex128) (k0e, k1e complex128) {
	if !(real(z) > 0) || cmplx.IsInf(z) || cmplx.IsNaN(z) {
		return cmplx.NaN(), cmplx.NaN()
	}
	a := cmplx.Abs(z)
	switch {
	case a > seriesLimit:
		p0, _ := hankelSums(0, z)
		p1, _ := hankelSums(1, z)
		root := cmplx.Sqrt(complex(math.Pi/2, 0) / z)
		return root * p0, root * p1
	case a > 2:
		return kTrapezoid(z)
	default:
		k0, k1 := kSeries(z)
		e := cmplx.Exp(z)
		return k0 * e, k1 * e
	}
}

// kSeries sums the ascending series with the logarithm, unscaled
// (DLMF 10.31.2 for K0; DLMF 10.31.1 with n = 1 for K1):
//
//	K0(z) = -(ln(z/2)+γ) I0(z) + Σ H_k t^k/(k!)²
//	K1(z) = 1/z + ln(z/2) I1(z) - (z/4) Σ (ψ(k+1)+ψ(k+2)) t^k/(k!(k+1)!)
//
// with t = z²/4, H_k the harmonic numbers and ψ(k+1) = H_k - γ.
func kSeries(z complex128) (k0, k1 complex128) {
	i0, i1 := iSeries(z)
	t := z * z / 4
	lg := cmplx.Log(z / 2)
	a := complex(1, 0) // t^k/(k!)^2
	b := complex(1, 0) // t^k/(k!(k+1)!)
	h := 0.0           // H_k
	s0 := complex(0, 0)
	s1 := complex(-2*eulerGamma+1, 0) // ψ(1)+ψ(2) = -2γ + 1
	for k := 1; k < 200; k++ {
		fk := float64(k)
		a *= t / complex(fk*fk, 0)
		b *= t / complex(fk*(fk+1), 0)
		h += 1 / fk
		d0 := a * complex(h, 0)
		d1 := b * complex(2*h+1/(fk+1)-2*eulerGamma, 0) // ψ(k+1)+ψ(k+2)
		s0 += d0
		s1 += d1
		if cmplx.Abs(d0) <= 1e-17*cmplx.Abs(s0) && cmplx.Abs(d1) <= 1e-17*cmplx.Abs(s1) {
			break
		}
	}
	k0 = -(lg+eulerGamma)*i0 + s0
	k1 = 1/z + lg*i1 - z/4*s1
	return k0, k1
}

// kTrapezoid evaluates exp(z) K_n(z) = ∫₀^∞ exp(-2z sinh²(t/2)) cosh(nt) dt
// (DLMF 10.32.9) for n = 0, 1 and Re z > 0 by the trapezoid rule. The
// integrand is entire and decays doubly exponentially in the strip
// |Im t| < π/2 - |ph z|, so the error falls like exp(-2πd/h) with d a
// safe fraction of that strip; h is chosen for about 1e-16.
func kTrapezoid(z complex128) (k0e, k1e complex128) {
	d := 0.75 * (math.Pi/2 - math.Abs(cmplx.Phase(z)))
	h := math.Min(0.1, 2*math.Pi*d/38)
	rz := real(z)
	s0 := complex(0.5, 0)
	s1 := complex(0.5, 0)
	for j := 1; j < 100000; j++ {
		t := float64(j) * h
		sh := math.Sinh(t / 2)
		e := 2 * sh * sh
		if rz*e > 45 {
			break
		}
		g := cmplx.Exp(-z * complex(e, 0))
		s0 += g
		s1 += g * complex(math.Cosh(t), 0)
	}
	return s0 * complex(h, 0), s1 * complex(h, 0)
}
