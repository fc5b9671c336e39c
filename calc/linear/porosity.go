package linear

import (
	"fmt"
	"math"

	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// PorosityTolerance is how far the porosity written for a stack or
// exchanger may lie from the porosity its pore geometry fixes: 0.005, so
// the geometry's value rounded to two decimals is always accepted (0.62
// for plates that give 0.625).
const PorosityTolerance = 0.005

// GeometricPorosity returns the porosity (1) that the pore geometry p
// fixes by itself, and true, or 0 and false when the geometry leaves it
// free (circular and rectangular pores in a solid, screens and fibres,
// whose porosity is measured, and plates without a thickness):
//
//	plates with thickness:  φ = y0 / (y0 + l),  y0 the half gap, l half the plate thickness
//	pins:                   φ of calc/pore's Pins (the gas share of each pin's cell)
//
// (the parallel-plate porosity as in calc/pore's Plates; Swift 2002,
// ch. 4, from memory of the convention y0 half gap, l half thickness).
func GeometricPorosity(p Pores) (float64, bool) {
	var s pore.Shape
	var err error
	switch {
	case p.Shape == "plates" && p.Thickness > 0:
		s, err = pore.Plates(p.HalfGap, p.Thickness)
	case p.Shape == "pins":
		s, err = pore.Pins(p.PinRadius, p.Pitch)
	default:
		return 0, false
	}
	if err != nil {
		return 0, false
	}
	return s.Porosity(), true
}

// checkPorosity refuses a porosity that contradicts the pore geometry of
// part i by more than PorosityTolerance, showing both values.
func checkPorosity(i int, kind string, porosity float64, p Pores) error {
	geo, ok := GeometricPorosity(p)
	if !ok || math.Abs(porosity-geo) <= PorosityTolerance+1e-9 {
		return nil
	}
	var from string
	switch p.Shape {
	case "plates":
		from = fmt.Sprintf("the plates (%s, thickness %s) give %.3f: y0/(y0 + l) with y0 the half gap and l half the plate thickness", GapWords(p.HalfGap), mmText(p.Thickness), geo)
	default:
		from = fmt.Sprintf("the pins (diameter %s, pitch %s) give %.3f", mmText(2*p.PinRadius), mmText(p.Pitch), geo)
	}
	return &FieldError{Part: i, Kind: kind, Field: "porosity", Msg: fmt.Sprintf(
		"= %s contradicts the pore geometry: %s; write \"%.3f\" or correct the pores", units.Number(porosity, 3), from, geo)}
}

// GapWords shows the gap between plates and its half together, the way
// every screen and message names them: "gap 2y0 = 0.6 mm (half gap y0 =
// 0.3 mm)"; y0 is the half gap in m.
func GapWords(y0 float64) string {
	return "gap 2y0 = " + mmText(2*y0) + " (half gap y0 = " + mmText(y0) + ")"
}

// mmText formats a length in millimetres.
func mmText(v float64) string {
	if s, err := units.FormatIn(v, "mm"); err == nil {
		return s
	}
	return units.Format(v, units.DimLength)
}
