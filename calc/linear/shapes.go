package linear

import (
	"fmt"

	"tubewright/calc/pore"
)

// shapeFor builds the pore geometry of a stack or exchanger with the
// calculators of calc/pore.
// The part's porosity is passed on where the geometry needs it: screens
// take it as measured, fibres as solid fraction 1 - porosity.
func shapeFor(p Pores, porosity float64) (poreShape, error) {
	var s pore.Shape
	var err error
	switch p.Shape {
	case "plates":
		s, err = pore.Plates(p.HalfGap, p.Thickness)
	case "circular":
		s, err = pore.Circular(p.Radius)
	case "rectangular":
		s, err = pore.Rectangular(p.HalfWidth, p.HalfHeight)
	case "pins":
		s, err = pore.Pins(p.PinRadius, p.Pitch)
	case "screens":
		s, err = pore.Screens(p.Mesh, p.WireDiameter, porosity)
	case "fibres":
		s, err = pore.Fibres(p.FibreDiameter, 1-porosity)
	default:
		return nil, fmt.Errorf("pore shape %q is not known", p.Shape)
	}
	if err != nil {
		return nil, err
	}
	return s, nil
}
