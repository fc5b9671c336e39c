package pore

import "math/cmplx"

// boundary is the wide-channel (boundary-layer) limit.
type boundary struct{ rh float64 }

// BoundaryLayer returns the wide-channel limit of any pore with hydraulic
// radius hydraulicRadius (m) and porosity 1:
//
//	f = (1-i) δ / (2 r_h)
//
// (Swift 2002, ch. 4, the boundary-layer approximation, from memory; it
// also follows from the plate formula f = tanh[(1+i)y0/δ]/[(1+i)y0/δ]
// with r_h = y0, since tanh → 1 for y0 ≫ δ: f → δ/((1+i) r_h) =
// (1-i) δ/(2 r_h). Valid when r_h ≫ δ; it is the large-r_h limit of every
// exact shape here, which the tests check). Do not use it for r_h below a few δ: there |f| is
// overestimated and f never tends to 1.
func BoundaryLayer(hydraulicRadius float64) (Shape, error) {
	if err := positive("hydraulic radius", hydraulicRadius); err != nil {
		return nil, err
	}
	return checked(&boundary{rh: hydraulicRadius})
}

func (b *boundary) HydraulicRadius() float64 { return b.rh }
func (b *boundary) Porosity() float64        { return 1 }
func (b *boundary) Describe() string {
	return "wide channel (boundary-layer limit), hydraulic radius " + mm(b.rh)
}

func (b *boundary) F(delta float64) complex128 {
	if badDelta(delta) {
		return cmplx.NaN()
	}
	d := delta / (2 * b.rh)
	return complex(d, -d)
}
