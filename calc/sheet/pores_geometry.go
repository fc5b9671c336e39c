package sheet

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/pore"
)

// poreGeometry is the pore geometry read from the inputs: the shape, and
// for fibres the solid fraction and whether it came from a packed mass.
type poreGeometry struct {
	shape  pore.Shape
	solid  float64 // fibres: volume fraction of solid
	fibre  float64 // fibres: fibre diameter, m
	byMass bool    // fibres: solid fraction from packed mass and volume
}

// readGeometry builds the pore shape from the inputs the chosen shape
// reads. Every error names one input: a missing one, a pair given twice,
// or the input of an impossible combination (with the other values in the
// message).
func readGeometry(v *Values) (poreGeometry, error) {
	shape := v.Pick("shape").(PoreShape)
	if err := strayGeometry(v, shape.String()); err != nil {
		return poreGeometry{}, err
	}
	var g poreGeometry
	var err error
	switch shape {
	case ShapePlates:
		g.shape, err = platesFrom(v)
	case ShapeCircular:
		g.shape, err = circularFrom(v)
	case ShapeRectangular:
		g.shape, err = rectangularFrom(v)
	case ShapePins:
		g.shape, err = pinsFrom(v)
	case ShapeScreens:
		g.shape, err = screensFrom(v)
	case ShapeFibres:
		g, err = fibresFrom(v)
	case ShapeHoneycomb:
		g.shape, err = honeycombFrom(v)
	case ShapeWide:
		if err = need(v, "hydraulic-radius"); err == nil {
			g.shape, err = pore.BoundaryLayer(v.SI("hydraulic-radius"))
			err = v.Blame(err, "hydraulic-radius")
		}
	default:
		panic(fmt.Sprintf("calc: pores: no geometry for shape %v", shape))
	}
	return g, err
}

// need returns a required-input error for the first key not given.
func need(v *Values, keys ...string) error {
	for _, key := range keys {
		if !v.Has(key) {
			in := v.Get(key).In
			return &FieldError{Key: key, Label: in.Label, Err: fmt.Errorf("%w for this shape: type a value%s", ErrRequired, hintSuffix(in))}
		}
	}
	return nil
}

// halfSize reads a size given in full (a gap, a diameter) or as its half
// (a half gap, a radius): exactly one of the two. It returns the half and
// the key it came from.
func halfSize(v *Values, full, half string) (float64, string, error) {
	switch f, h := v.Has(full), v.Has(half); {
	case f && h:
		return 0, half, v.Blame(fmt.Errorf("give either %s or %s, not both", strings.ToLower(v.Get(full).In.Label), strings.ToLower(v.Get(half).In.Label)), half)
	case f:
		return v.SI(full) / 2, full, nil
	case h:
		return v.SI(half), half, nil
	}
	return 0, full, need(v, full)
}

// with blames err on key, saying in the message which other value it was
// combined with (the mesh count beside an overlapping wire).
func with(v *Values, err error, key, other string) error {
	if err == nil {
		return nil
	}
	o := v.Get(other)
	return v.Blame(fmt.Errorf("with %s %s: %w", strings.ToLower(o.In.Label), strings.TrimSpace(o.Text), err), key)
}

func platesFrom(v *Values) (pore.Shape, error) {
	y0, key, err := halfSize(v, "gap", "half-gap")
	if err != nil {
		return nil, err
	}
	s, err := pore.Plates(y0, v.SI("plate-thickness"))
	return s, v.Blame(err, key)
}

func circularFrom(v *Values) (pore.Shape, error) {
	r, key, err := halfSize(v, "diameter", "radius")
	if err != nil {
		return nil, err
	}
	s, err := pore.Circular(r)
	return s, v.Blame(err, key)
}

func rectangularFrom(v *Values) (pore.Shape, error) {
	a, key, err := halfSize(v, "width", "half-width")
	if err != nil {
		return nil, err
	}
	b, _, err := halfSize(v, "height", "half-height")
	if err != nil {
		return nil, err
	}
	s, err := pore.Rectangular(a, b)
	return s, v.Blame(err, key)
}

func pinsFrom(v *Values) (pore.Shape, error) {
	ri, key, err := halfSize(v, "pin-diameter", "pin-radius")
	if err != nil {
		return nil, err
	}
	if err := need(v, "pitch"); err != nil {
		return nil, err
	}
	s, err := pore.Pins(ri, v.SI("pitch"))
	return s, with(v, err, "pitch", key)
}

// screensFrom reads the mesh count per inch or per mm (exactly one), the
// wire diameter and an optional measured porosity.
func screensFrom(v *Values) (pore.Shape, error) {
	meshKey := "mesh-per-inch"
	switch in, mm := v.Has("mesh-per-inch"), v.Has("mesh-per-mm"); {
	case in && mm:
		return nil, v.Blame(errors.New("give the mesh count once, as mesh-per-inch or mesh-per-mm, not both"), "mesh-per-mm")
	case mm:
		meshKey = "mesh-per-mm"
	}
	if err := need(v, meshKey); err != nil {
		return nil, err
	}
	rw, wireKey, err := halfSize(v, "wire-diameter", "wire-radius")
	if err != nil {
		return nil, err
	}
	s, err := pore.Screens(v.SI(meshKey), 2*rw, v.SI("porosity"))
	return s, with(v, err, wireKey, meshKey)
}

func honeycombFrom(v *Values) (pore.Shape, error) {
	if err := need(v, "cells-per-square-inch", "wall-thickness"); err != nil {
		return nil, err
	}
	s, err := pore.Honeycomb(v.SI("cells-per-square-inch"), v.SI("wall-thickness"))
	return s, with(v, err, "wall-thickness", "cells-per-square-inch")
}
