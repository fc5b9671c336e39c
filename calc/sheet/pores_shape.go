package sheet

import (
	"fmt"
	"slices"
	"strings"
)

// PoreShape is the geometry of a stack or regenerator's pores, as the pores
// calculator offers it.
type PoreShape int

// The pore shapes. Plates, round pores, rectangular channels, pins and
// honeycomb are exact solutions of Rott's equation for their cross
// section; screens and fibres use the round pore of the same hydraulic
// radius; a wide channel is the boundary-layer limit (see calc/pore).
const (
	ShapePlates PoreShape = iota
	ShapeCircular
	ShapeRectangular
	ShapePins
	ShapeScreens
	ShapeFibres
	ShapeHoneycomb
	ShapeWide
)

// poreShapes are the shapes with their key (the terminal's --shape word),
// their words on screen and the inputs each reads, in the order shown.
var poreShapes = []struct {
	shape  PoreShape
	key    string
	words  string
	inputs []string
}{
	{ShapePlates, "plates", "Parallel plates", []string{"gap", "half-gap", "plate-thickness"}},
	{ShapeCircular, "circular", "Round pores", []string{"diameter", "radius"}},
	{ShapeRectangular, "rectangular", "Rectangular channels", []string{"width", "height", "half-width", "half-height"}},
	{ShapePins, "pins", "Pin array", []string{"pin-diameter", "pin-radius", "pitch"}},
	{ShapeScreens, "screens", "Woven screens", []string{"mesh-per-inch", "mesh-per-mm", "wire-diameter", "wire-radius", "porosity"}},
	{ShapeFibres, "fibres", "Metal wool / fibres", []string{"fibre-diameter", "fibre-radius", "solid-fraction", "packed-mass", "packed-volume", "material", "material-density"}},
	{ShapeHoneycomb, "honeycomb", "Ceramic honeycomb", []string{"cells-per-square-inch", "wall-thickness"}},
	{ShapeWide, "wide", "Wide channel (boundary layer)", []string{"hydraulic-radius"}},
}

// String returns the shape's key ("plates").
func (s PoreShape) String() string {
	for _, p := range poreShapes {
		if p.shape == s {
			return p.key
		}
	}
	return fmt.Sprintf("PoreShape(%d)", int(s))
}

// poreShapeChoices are the choices of the shape input.
func poreShapeChoices() []Choice {
	out := make([]Choice, len(poreShapes))
	for i, p := range poreShapes {
		out[i] = Choice{Key: p.key, Words: p.words, Value: p.shape}
	}
	return out
}

// PoreShapeInputs returns the keys of the inputs that pore shape key
// reads, in order (nil for an unknown key). A screen shows some of them;
// the others are alternatives for the terminal (a half gap for a gap).
func PoreShapeInputs(key string) []string {
	for _, p := range poreShapes {
		if p.key == key {
			return append([]string(nil), p.inputs...)
		}
	}
	return nil
}

// strayGeometry refuses a geometry input that the chosen shape does not
// read (a half gap given for round pores), so that a value typed for the
// wrong shape is never silently ignored. A choice left at its default
// counts as not given.
func strayGeometry(v *Values, shape string) error {
	own := PoreShapeInputs(shape)
	for _, p := range poreShapes {
		for _, key := range p.inputs {
			if !v.Given(key) || slices.Contains(own, key) {
				continue
			}
			if in := v.Get(key).In; in.Kind == Pick && strings.EqualFold(v.PickKey(key), in.Default) {
				continue
			}
			return v.Blame(fmt.Errorf("is for the %s shape (%s); the %s shape takes %s",
				p.key, p.words, shape, strings.Join(own, ", ")), key)
		}
	}
	return nil
}
