package pore

import (
	"math"
	"math/cmplx"

	"tubewright/calc/special"
)

// circular is a circular pore (a capillary) of radius R.
type circular struct {
	r, phi float64
}

// Circular returns a circular pore of radius radius (m) with porosity 1
// (the open tube itself; use CircularPores for a bundle of capillaries in a
// solid). Hydraulic radius R/2.
//
//	f = 2 J1[(i-1)R/δ] / ( (i-1)R/δ · J0[(i-1)R/δ] )
//
// (Swift 2002, ch. 4, circular pores; from memory, equation number not
// checked here). It is evaluated in the
// equivalent form f = 2 I1(w)/(w I0(w)) with w = (1+i)R/δ, using
// J_n(iw) = i^n I_n(w) (DLMF 10.27.6) and exponentially scaled I0, I1 so
// that R/δ up to 1e5 and beyond cannot overflow.
func Circular(radius float64) (Shape, error) {
	return CircularPores(radius, 1)
}

// CircularPores returns circular pores of radius radius (m) in a solid of
// porosity porosity (gas volume fraction, 0 < porosity <= 1), e.g. a
// bundle of capillaries or a drilled plate.
func CircularPores(radius, porosity float64) (Shape, error) {
	if err := positive("pore radius", radius); err != nil {
		return nil, err
	}
	if err := fraction("porosity", porosity); err != nil {
		return nil, err
	}
	return checked(&circular{r: radius, phi: porosity})
}

func (c *circular) HydraulicRadius() float64 { return c.r / 2 }
func (c *circular) Porosity() float64        { return c.phi }
func (c *circular) Describe() string {
	return "round pores, diameter " + mm(2*c.r) + " (radius " + mm(c.r) + ")"
}

func (c *circular) F(delta float64) complex128 {
	if badDelta(delta) {
		return cmplx.NaN()
	}
	return circularF(c.r / delta)
}

// circularF returns 2 I1(w)/(w I0(w)), w = (1+i)x, for x = R/δ > 0.
func circularF(x float64) complex128 {
	w := complex(x, x)
	if x < 1e-3 { // series: 1 - w²/8 + w⁴/96, error ~ w⁶/1500
		w2 := w * w
		return 1 - w2/8 + w2*w2/96
	}
	i0, i1 := special.IScaled(w)
	return 2 * i1 / (w * i0)
}

// fraction returns a RangeError unless 0 < v <= 1.
func fraction(field string, v float64) error {
	if !(v > 0 && v <= 1) {
		return unitsRange(field, v, 0, 1)
	}
	return nil
}

// finitePositive reports whether v is a positive finite number.
func finitePositive(v float64) bool { return v > 0 && !math.IsInf(v, 0) }
