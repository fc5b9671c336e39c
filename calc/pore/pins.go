package pore

import (
	"math"
	"math/cmplx"

	"tubewright/calc/special"
)

// pins is an array of pins of radius ri, each in a circular cell of outer
// radius ro of the same area as its hexagonal cell.
type pins struct {
	ri, ro, pitch float64
}

// hexCell is √(√3/(2π)): the radius of the circle with the area of the
// hexagonal cell, (√3/2)·pitch², of a hexagonal array, per unit pitch.
var hexCell = math.Sqrt(math.Sqrt(3) / (2 * math.Pi))

// Pins returns a hexagonal array of pins of radius pinRadius with
// centre-to-centre distance pitch (m), the flow along the pins. Each pin's
// hexagonal cell is replaced by the circle of equal area, outer radius
// r_o = pitch·√(√3/(2π)) ≈ 0.525·pitch, the approximation of
// G. W. Swift and R. M. Keolian, "Thermoacoustics in pin-array stacks",
// J. Acoust. Soc. Am. 94, 941 (1993) (from memory). Porosity is
// 1 - π r_i²/((√3/2) pitch²) and the hydraulic radius (r_o² - r_i²)/(2 r_i).
//
// With h = 1 on the pin, dh/dr = 0 at r_o and k = (1+i)/δ, the cell
// average of h is, derived from the field equation in the package doc:
//
//	f = -2 r_i / (k (r_o² - r_i²)) ·
//	    [I1(k r_i)K1(k r_o) - I1(k r_o)K1(k r_i)] /
//	    [I0(k r_i)K1(k r_o) + I1(k r_o)K0(k r_i)]
//
// evaluated with exponentially scaled Bessel functions (no overflow).
// Checked against the same expression in scipy (testdata/gen_rott.py) and
// against the boundary-layer limit.
//
// Errors: non-positive inputs, and pins that touch or overlap
// (pinRadius >= pitch/2), naming both inputs.
func Pins(pinRadius, pitch float64) (Shape, error) {
	if err := positive("pin radius", pinRadius); err != nil {
		return nil, err
	}
	if err := positive("pin pitch", pitch); err != nil {
		return nil, err
	}
	if 2*pinRadius >= pitch {
		return nil, impossible("pin diameter %s is not smaller than the pin pitch %s: the pins touch or overlap", mm(2*pinRadius), mm(pitch))
	}
	return checked(&pins{ri: pinRadius, ro: hexCell * pitch, pitch: pitch})
}

func (p *pins) HydraulicRadius() float64 { return (p.ro*p.ro - p.ri*p.ri) / (2 * p.ri) }
func (p *pins) Porosity() float64        { return 1 - (p.ri*p.ri)/(p.ro*p.ro) }
func (p *pins) Describe() string {
	return "pin array, pin diameter " + mm(2*p.ri) + ", pitch " + mm(p.pitch)
}

func (p *pins) F(delta float64) complex128 {
	if badDelta(delta) {
		return cmplx.NaN()
	}
	return pinsF(p.ri/delta, p.ro/delta)
}

// pinsF evaluates f for r_i/δ = xi and r_o/δ = xo. With scaled functions
// Ie = exp(-Re z) I, Ke = exp(z) K, numerator and denominator are divided
// by exp(Re b - a), leaving E = exp((Re a + a) - (Re b + b)), |E| <= 1.
func pinsF(xi, xo float64) complex128 {
	a := complex(xi, xi)
	b := complex(xo, xo)
	ia0, ia1 := special.IScaled(a)
	_, ib1 := special.IScaled(b)
	ka0, ka1 := special.KScaled(a)
	_, kb1 := special.KScaled(b)
	e := cmplx.Exp(complex(real(a), 0) + a - complex(real(b), 0) - b)
	num := ia1*kb1*e - ib1*ka1
	den := ia0*kb1*e + ib1*ka0
	k := complex(1, 1) // times 1/δ: lengths are in units of δ
	return -complex(2*xi/(xo*xo-xi*xi), 0) / k * num / den
}
