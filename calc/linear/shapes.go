package linear

import (
	"fmt"

	"tubewright/calc/pore"
)

// shapeFor builds the pore geometry of a stack or exchanger with the
// calculators of calc/pore.
func shapeFor(p Pores) (poreShape, error) {
	var s pore.Shape
	var err error
	switch p.Shape {
	case "plates":
		s, err = pore.Plates(p.HalfGap, p.Thickness)
	case "circular":
		s, err = pore.Circular(p.Radius)
	default:
		return nil, fmt.Errorf("pore shape %q is not available in this build yet", p.Shape)
	}
	if err != nil {
		return nil, err
	}
	return s, nil
}
