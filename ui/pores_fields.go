package ui

import "tubewright/calc/sheet"

// poreFieldsShown lists the geometry inputs the pores screen shows for a
// shape: the whole sizes people measure (a gap, a diameter) or, with half
// set, their halves (a half gap, a radius), the mesh count in any unit,
// and for fibres either the solid fraction or the packed mass, volume and
// material (with its density for material "other"). The mesh per mm is
// the terminal's alternative.
func poreFieldsShown(shape, packing, material string, half bool) []string {
	pick := func(whole, halfKey string) string {
		if half {
			return halfKey
		}
		return whole
	}
	switch shape {
	case "plates":
		return []string{pick("gap", "half-gap"), "plate-thickness"}
	case "circular":
		return []string{pick("diameter", "radius")}
	case "rectangular":
		return []string{pick("width", "half-width"), pick("height", "half-height")}
	case "pins":
		return []string{pick("pin-diameter", "pin-radius"), "pitch"}
	case "screens":
		return []string{"mesh-per-inch", pick("wire-diameter", "wire-radius"), "porosity"}
	case "fibres":
		if packing != "mass" {
			return []string{pick("fibre-diameter", "fibre-radius"), "solid-fraction"}
		}
		keys := []string{pick("fibre-diameter", "fibre-radius"), "packed-mass", "packed-volume", "material"}
		if material == "other" {
			keys = append(keys, "material-density")
		}
		return keys
	case "honeycomb":
		return []string{"cells-per-square-inch", "wall-thickness"}
	case "wide":
		return []string{"hydraulic-radius"}
	}
	return nil
}

// poreGeometryKeys lists every geometry input of the pores description:
// the inputs each shape reads.
func poreGeometryKeys(d *sheet.Sheet) []string {
	var keys []string
	for _, c := range d.Input("shape").Choices {
		keys = append(keys, sheet.PoreShapeInputs(c.Key)...)
	}
	return keys
}

// poreHalves are the sizes the pores screen offers whole or as their half,
// by shape: the whole key, the half key, and the words of both for the
// line under the field ("gap 2y0", "half gap y0").
var poreHalves = map[string][]struct{ whole, half, wholeWords, halfWords string }{
	"plates":      {{"gap", "half-gap", "gap 2y0", "half gap y0"}},
	"circular":    {{"diameter", "radius", "Ø", "radius"}},
	"rectangular": {{"width", "half-width", "width", "half width"}, {"height", "half-height", "height", "half height"}},
	"pins":        {{"pin-diameter", "pin-radius", "pin Ø", "pin radius"}},
	"screens":     {{"wire-diameter", "wire-radius", "wire Ø", "wire radius"}},
	"fibres":      {{"fibre-diameter", "fibre-radius", "fibre Ø", "fibre radius"}},
}

// poreHalfChips are the chips of the whole-or-half choice by shape.
var poreHalfChips = map[string][2]string{
	"plates":      {"Gap 2y0", "Half gap y0"},
	"circular":    {"Diameter", "Radius"},
	"rectangular": {"Width and height", "Halves"},
	"pins":        {"Pin diameter", "Pin radius"},
	"screens":     {"Wire diameter", "Wire radius"},
	"fibres":      {"Fibre diameter", "Fibre radius"},
}
