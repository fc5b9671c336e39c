package sheet

import (
	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// Bounds of the pore geometry inputs, SI: far beyond any stack or
// regenerator, close enough to catch a slipped unit.
const (
	poreMaxLength  = 1                       // m, a pore size or a plate
	poreMaxMesh    = 1e5 / 0.0254            // 1/m: 100 000 wires per inch
	poreMaxCells   = 1e6 / (0.0254 * 0.0254) // 1/m²: a million cells per square inch
	poreMaxMass    = 1000                    // kg of packing
	poreMaxVolume  = 10                      // m³ of packing
	poreMaxDensity = 1e5                     // kg/m³ of a solid
)

// poreLength is an optional pore-geometry length; example is what a
// screen starts with ("" for the terminal-only alternatives).
func poreLength(key, label, example, hint string) Input {
	return Input{Key: key, Label: label, Kind: Quantity, Dim: units.DimLength, Optional: true, Example: example,
		Min: 0, MinOpen: true, Max: poreMaxLength, Hint: hint}
}

// poresInputs are the inputs of the pores calculator: the shape and role,
// every shape's geometry (each shape reads its own, see poreShapes), then
// the operating point.
func poresInputs() []Input {
	geometry := []Input{
		{Key: "shape", Label: "Pore shape", Kind: Pick, Example: "plates", Choices: poreShapeChoices(),
			Hint: "pore geometry"},
		{Key: "role", Label: "Role", Kind: Pick, Default: "stack", Hint: "what the part is for",
			Choices: []Choice{
				{Key: "stack", Words: "Standing-wave stack", Value: pore.RoleStack},
				{Key: "regenerator", Words: "Regenerator", Value: pore.RoleRegenerator},
			}},
		poreLength("gap", "Gap between plates 2y0", "0.5 mm", "plates: full gap between neighbouring plates, mm, um, in or m (or give half-gap)"),
		poreLength("half-gap", "Half gap y0 (half the gap between plates)", "", "plates: half the gap between neighbouring plates (or give gap)"),
		{Key: "plate-thickness", Label: "Plate thickness", Kind: Quantity, Dim: units.DimLength, Optional: true, Example: "0.1 mm",
			Max: poreMaxLength, Hint: "plates: plate thickness, mm, um, in or m"},
		poreLength("diameter", "Pore diameter", "0.6 mm", "round pores: pore diameter, mm, um, in or m (or give radius)"),
		poreLength("radius", "Pore radius", "", "round pores: pore radius (or give diameter)"),
		poreLength("width", "Channel width", "0.4 mm", "rectangular: full channel width, mm, um, in or m (or give half-width)"),
		poreLength("height", "Channel height", "1 mm", "rectangular: full channel height (or give half-height)"),
		poreLength("half-width", "Half the channel width", "", "rectangular: half the channel width (or give width)"),
		poreLength("half-height", "Half the channel height", "", "rectangular: half the channel height (or give height)"),
		poreLength("pin-diameter", "Pin diameter", "0.2 mm", "pins: pin diameter, mm, um, in or m (or give pin-radius)"),
		poreLength("pin-radius", "Pin radius", "", "pins: pin radius (or give pin-diameter)"),
		poreLength("pitch", "Pin pitch (centre to centre, hexagonal array)", "0.8 mm", "pins: centre-to-centre distance of a hexagonal array"),
		{Key: "mesh-per-inch", Label: "Mesh count", Kind: Quantity, Dim: units.DimPerLength, Units: units.Options{DefaultUnit: "/in"},
			Optional: true, Example: "200 /in", Min: 0, MinOpen: true, Max: poreMaxMesh,
			Hint: "screens: wires per inch (a bare number), or with a unit: 200 /in, 8 /mm"},
		{Key: "mesh-per-mm", Label: "Mesh count per mm", Kind: Quantity, Dim: units.DimPerLength, Units: units.Options{DefaultUnit: "/mm"},
			Optional: true, Min: 0, MinOpen: true, Max: poreMaxMesh, Hint: "screens: wires per mm (instead of mesh-per-inch)"},
		poreLength("wire-diameter", "Wire diameter", "41 um", "screens: wire diameter, um, mm or in (or give wire-radius)"),
		poreLength("wire-radius", "Wire radius", "", "screens: wire radius (or give wire-diameter)"),
		{Key: "porosity", Label: "Measured porosity (empty = from the weave)", Kind: Quantity, Dim: units.DimNone, Optional: true,
			Min: 0, Max: 1, MaxOpen: true, Hint: "screens: 0 to 1 or a percentage, replacing φ = 1 − π m d/4; empty or 0 for the geometric one"},
		poreLength("fibre-diameter", "Fibre diameter", "25 um", "fibres: fibre diameter, um or mm (or give fibre-radius)"),
		poreLength("fibre-radius", "Fibre radius", "", "fibres: fibre radius (or give fibre-diameter)"),
		{Key: "solid-fraction", Label: "Solid fraction", Kind: Quantity, Dim: units.DimNone, Optional: true, Example: "20 %",
			Min: 0, MinOpen: true, Max: 1, MaxOpen: true, Hint: "fibres: volume fraction of solid, 0 to 1 or a percentage"},
		{Key: "packed-mass", Label: "Packed mass", Kind: Quantity, Dim: units.DimMass, Optional: true, Example: "30 g",
			Min: 0, MinOpen: true, Max: poreMaxMass, Hint: "fibres: mass of fibre packed, g, kg, oz or lb"},
		{Key: "packed-volume", Label: "Packed volume", Kind: Quantity, Dim: units.DimVolume, Optional: true, Example: "50 cm3",
			Min: 0, MinOpen: true, Max: poreMaxVolume, Hint: "fibres: volume the packing fills, cm3, mL, L or in3"},
		{Key: "material", Label: "Fibre material", Kind: Pick, Default: "steel", Choices: materialChoices(),
			Hint: "fibres packed by mass: the material, for its density; other to type the density"},
		{Key: "material-density", Label: "Density of the fibre material", Kind: Quantity, Dim: units.DimDensity, Optional: true,
			Min: 0, MinOpen: true, Max: poreMaxDensity, Hint: "fibres packed by mass, material other: 7900 kg/m3, 8.9 g/cm3"},
		{Key: "cells-per-square-inch", Label: "Cell density", Kind: Quantity, Dim: units.DimPerArea, Units: units.Options{DefaultUnit: "cpsi"},
			Optional: true, Example: "400 cpsi", Min: 0, MinOpen: true, Max: poreMaxCells,
			Hint: "honeycomb: cells per square inch (a bare number), or per cm²"},
		{Key: "wall-thickness", Label: "Wall thickness", Kind: Quantity, Dim: units.DimLength, Optional: true, Example: "0.15 mm",
			Max: poreMaxLength, Hint: "honeycomb: wall thickness, mm, um or in"},
		poreLength("hydraulic-radius", "Hydraulic radius of the wide channel", "5 mm", "wide: hydraulic radius (area over wetted perimeter)"),
	}
	return append(geometry, poreOperatingInputs()...)
}
