package pore

import "math/cmplx"

// plates is a stack of parallel plates.
type plates struct {
	y0, half float64 // half gap, half plate thickness (m)
}

// Plates returns a stack of parallel plates with gap 2·halfGap between
// neighbouring plates and plate thickness thickness (both m). The
// porosity is y0/(y0+l) with y0 = halfGap and l = thickness/2 (half the
// plate thickness); thickness 0 means a single gap, porosity 1. The
// hydraulic radius is y0.
//
//	f = tanh[(1+i)y0/δ] / [(1+i)y0/δ]
//
// (Swift 2002, ch. 4, parallel plates, in his exp(+iωt) convention; from
// memory, equation number not checked here).
// Errors: halfGap <= 0, thickness < 0, or either not finite.
func Plates(halfGap, thickness float64) (Shape, error) {
	if err := positive("plate half gap", halfGap); err != nil {
		return nil, err
	}
	if err := nonNegative("plate thickness", thickness, "m"); err != nil {
		return nil, err
	}
	return checked(&plates{y0: halfGap, half: thickness / 2})
}

// PlatesFromPitch returns parallel plates given the plate pitch (centre to
// centre distance between neighbouring plates, m) and the plate thickness
// (m). The gap is pitch - thickness; a plate as thick as the pitch or
// thicker leaves no gap and is an error naming both inputs.
func PlatesFromPitch(pitch, thickness float64) (Shape, error) {
	if err := positive("plate pitch", pitch); err != nil {
		return nil, err
	}
	if err := nonNegative("plate thickness", thickness, "m"); err != nil {
		return nil, err
	}
	if thickness >= pitch {
		return nil, impossible("plate thickness %s is not smaller than the plate pitch %s: no gap is left", mm(thickness), mm(pitch))
	}
	return Plates((pitch-thickness)/2, thickness)
}

func (p *plates) HydraulicRadius() float64 { return p.y0 }
func (p *plates) Porosity() float64        { return p.y0 / (p.y0 + p.half) }
func (p *plates) Describe() string {
	return "parallel plates, gap 2y0 = " + mm(2*p.y0) + " (half gap y0 = " + mm(p.y0) + "), plate thickness " + mm(2*p.half)
}

func (p *plates) F(delta float64) complex128 {
	if badDelta(delta) {
		return cmplx.NaN()
	}
	x := p.y0 / delta
	return tanhOverZ(complex(x, x))
}

// tanhOverZ returns tanh(z)/z for Re z >= 0, stable for large z (no
// overflow) and accurate for small z (series).
func tanhOverZ(z complex128) complex128 {
	if cmplx.Abs(z) < 1e-3 {
		z2 := z * z
		return 1 - z2/3 + 2*z2*z2/15
	}
	if real(z) > 40 { // tanh z = 1 to double precision
		return 1 / z
	}
	e := cmplx.Exp(-2 * z)
	return (1 - e) / ((1 + e) * z)
}
