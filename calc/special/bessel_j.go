package special

import (
	"math"
	"math/cmplx"
)

// J0 returns the Bessel function of the first kind of order zero, J0(z),
// for complex z, computed as I0(-iz) (DLMF 10.27.6). It overflows to Inf
// for |Im z| above about 700.
func J0(z complex128) complex128 {
	return J0e(z) * complex(math.Exp(math.Abs(imag(z))), 0)
}

// J1 returns the Bessel function of the first kind of order one, J1(z),
// for complex z, computed as i I1(-iz) (DLMF 10.27.6).
func J1(z complex128) complex128 {
	return J1e(z) * complex(math.Exp(math.Abs(imag(z))), 0)
}

// J0e returns exp(-|Im z|) J0(z).
func J0e(z complex128) complex128 {
	j0, _ := JScaled(z)
	return j0
}

// J1e returns exp(-|Im z|) J1(z).
func J1e(z complex128) complex128 {
	_, j1 := JScaled(z)
	return j1
}

// JScaled returns exp(-|Im z|) J0(z) and exp(-|Im z|) J1(z) together. Since
// Re(-iz) = Im z, these are the scaled I0 and I1 of -iz.
func JScaled(z complex128) (j0e, j1e complex128) {
	if cmplx.IsNaN(z) || cmplx.IsInf(z) {
		return cmplx.NaN(), cmplx.NaN()
	}
	i0, i1 := IScaled(complex(imag(z), -real(z))) // -iz
	return i0, complex(0, 1) * i1
}
