package ui

import "tubewright/calc/sheet"

// poreFieldsShown lists the geometry inputs the pores screen shows for a
// shape: the full sizes people measure (a gap, a diameter), the mesh count
// in any unit, and for fibres either the solid fraction or the packed
// mass, volume and material (with its density for material "other"). The
// half sizes and the mesh per mm are the terminal's alternatives.
func poreFieldsShown(shape, packing, material string) []string {
	switch shape {
	case "plates":
		return []string{"gap", "plate-thickness"}
	case "circular":
		return []string{"diameter"}
	case "rectangular":
		return []string{"width", "height"}
	case "pins":
		return []string{"pin-diameter", "pitch"}
	case "screens":
		return []string{"mesh-per-inch", "wire-diameter", "porosity"}
	case "fibres":
		if packing != "mass" {
			return []string{"fibre-diameter", "solid-fraction"}
		}
		keys := []string{"fibre-diameter", "packed-mass", "packed-volume", "material"}
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
