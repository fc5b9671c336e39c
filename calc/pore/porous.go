package pore

import (
	"math"
	"math/cmplx"

	"tubewright/calc/units"
)

// matrix is a random porous matrix (screens, fibres) described by its
// porosity and hydraulic radius; f is that of the circular pore of the same
// hydraulic radius.
type matrix struct {
	phi, rh float64
	desc    string
}

func (m *matrix) HydraulicRadius() float64 { return m.rh }
func (m *matrix) Porosity() float64        { return m.phi }
func (m *matrix) Describe() string         { return m.desc }

// F uses the circular pore of radius 2 r_h (same hydraulic radius): an
// approximation, since a random matrix has no exact f. It has the right
// limits (f → 1 for r_h ≪ δ, (1-i)δ/(2 r_h) for r_h ≫ δ); in between the
// true f of a screen bed differs by some per cent, which matters little for
// a regenerator, whose r_h ≪ δκ.
func (m *matrix) F(delta float64) complex128 {
	if badDelta(delta) {
		return cmplx.NaN()
	}
	return circularF(2 * m.rh / delta)
}

// Screens returns a bed of stacked square-weave woven screens with mesh
// count meshPerMetre (wires per metre, 1/m; 200 per inch is 7874 /m) and
// wire diameter wireDiameter (m).
//
// Geometric porosity, for layers of thickness 2d with straight wires of
// length 2m per unit area (crimp neglected):
//
//	φ = 1 - π m d / 4
//
// and hydraulic radius (gas volume over wire surface, cylinder surface
// 4/d per unit solid volume):
//
//	r_h = φ d / (4 (1 - φ))
//
// (both in Swift 2002, ch. 7 on regenerators, from memory; derived above
// and checked in the tests by hand). When measuredPorosity is in (0, 1)
// it replaces the geometric value (screens pressed or sintered to another
// density); 0 means use the geometric value.
//
// Errors: wire at least as thick as the mesh pitch 1/m (the wires overlap),
// measuredPorosity outside [0, 1), non-positive inputs.
func Screens(meshPerMetre, wireDiameter, measuredPorosity float64) (Shape, error) {
	if err := positive("mesh count", meshPerMetre); err != nil {
		return nil, err
	}
	if err := positive("wire diameter", wireDiameter); err != nil {
		return nil, err
	}
	if meshPerMetre*wireDiameter >= 1 {
		return nil, impossible("wire diameter %s is not smaller than the mesh pitch %s (1 / mesh count): the wires would overlap", mm(wireDiameter), mm(1/meshPerMetre))
	}
	phi := 1 - math.Pi*meshPerMetre*wireDiameter/4
	if measuredPorosity != 0 {
		if !(measuredPorosity > 0 && measuredPorosity < 1) {
			return nil, unitsRange("measured porosity", measuredPorosity, 0, 1)
		}
		phi = measuredPorosity
	}
	// r_h = φ d / (4(1-φ)); for the geometric φ, 1-φ = π m d/4, so
	// r_h = φ/(π m) without the cancellation of 1-φ at tiny m·d.
	rh := phi / (math.Pi * meshPerMetre)
	if measuredPorosity != 0 {
		rh = phi * wireDiameter / (4 * (1 - phi))
	}
	desc := "woven screens, " + perInch(meshPerMetre) + " mesh, wire " + mm(wireDiameter)
	return checked(&matrix{phi: phi, rh: rh, desc: desc})
}

// Fibres returns a random packing of fibres (metal wool, felt) of diameter
// fibreDiameter (m) filling the fraction solidFraction of the volume
// (0 < solidFraction < 1). Porosity φ = 1 - solidFraction and
//
//	r_h = φ d / (4 (1 - φ))
//
// (same source and derivation as Screens). f as for Screens.
func Fibres(fibreDiameter, solidFraction float64) (Shape, error) {
	if err := positive("fibre diameter", fibreDiameter); err != nil {
		return nil, err
	}
	if !(solidFraction > 0 && solidFraction < 1) {
		return nil, unitsRange("solid fraction", solidFraction, 0, 1)
	}
	phi := 1 - solidFraction
	rh := phi * fibreDiameter / (4 * solidFraction)
	desc := "random fibres, diameter " + mm(fibreDiameter) + ", solid fraction " + pct(solidFraction)
	return checked(&matrix{phi: phi, rh: rh, desc: desc})
}

// SolidFraction returns the volume fraction of solid in a packing of mass
// packedMass (kg) of a material of density materialDensity (kg/m³) filling
// the volume packedVolume (m³). A mass at least that of solid material
// filling the whole volume is an error naming the inputs.
func SolidFraction(packedMass, materialDensity, packedVolume float64) (float64, error) {
	if err := nonNegative("packed mass", packedMass, "kg"); err != nil {
		return 0, err
	}
	if packedMass == 0 {
		return 0, unitsRangeUnit("packed mass", 0, 0, math.Inf(1), "kg")
	}
	if !finitePositive(materialDensity) {
		return 0, unitsRangeUnit("material density", materialDensity, 0, math.Inf(1), "kg/m³")
	}
	if !finitePositive(packedVolume) {
		return 0, unitsRangeUnit("packed volume", packedVolume, 0, math.Inf(1), "m³")
	}
	s := packedMass / (materialDensity * packedVolume)
	if s >= 1 {
		return 0, impossible("packed mass %s is not less than the mass of solid material filling the packed volume (%s = %s × %s)",
			units.Format(packedMass, units.DimMass), units.Format(materialDensity*packedVolume, units.DimMass),
			units.Format(materialDensity, units.DimDensity), units.Format(packedVolume, units.DimVolume))
	}
	return s, nil
}

// FibresFromMass returns Fibres with the solid fraction from the packed
// mass (kg), the material density (kg/m³, see Materials) and the packed
// volume (m³).
func FibresFromMass(fibreDiameter, packedMass, materialDensity, packedVolume float64) (Shape, error) {
	if err := positive("fibre diameter", fibreDiameter); err != nil {
		return nil, err
	}
	s, err := SolidFraction(packedMass, materialDensity, packedVolume)
	if err != nil {
		return nil, err
	}
	return Fibres(fibreDiameter, s)
}

// perInch formats a mesh count (1/m) per inch.
func perInch(m float64) string {
	return trimFloat(m*0.0254) + " /in"
}

// pct formats a fraction as per cent.
func pct(f float64) string { return trimFloat(100*f) + " %" }
