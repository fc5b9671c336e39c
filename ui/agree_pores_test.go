package ui

import "tubewright/calc/sheet"

// poresCase returns the texts of a pores case at helium, 300 K, 10 bar,
// 100 Hz with the geometry added; every input the screen shows for the
// shape is named, since it starts with examples in them.
func poresCase(more ...string) map[string]string {
	m := map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bar", "frequency": "100 Hz"}
	for i := 0; i+1 < len(more); i += 2 {
		m[more[i]] = more[i+1]
	}
	return m
}

// Pores and packing through both front ends.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDPores, name: "plates stack", texts: poresCase("shape", "plates", "gap", "0.5 mm", "plate-thickness", "0.1 mm")},
	agreeCase{id: sheet.IDPores, name: "screens regenerator with ±", texts: poresCase("shape", "screens", "role", "regenerator",
		"mesh-per-inch", "200", "wire-diameter", "41 um", "frequency", "100 Hz ± 3 Hz", "temperature", "300 K +- 2 K")},
	agreeCase{id: sheet.IDPores, name: "metal wool", texts: poresCase("shape", "fibres", "fibre-diameter", "25 um", "solid-fraction", "20 %")},
	agreeCase{id: sheet.IDPores, name: "honeycomb", texts: poresCase("shape", "honeycomb", "cells-per-square-inch", "400", "wall-thickness", "0.15 mm")},
	agreeCase{id: sheet.IDPores, name: "pins", texts: poresCase("shape", "pins", "pin-diameter", "0.2 mm", "pitch", "0.8 mm")},
	agreeCase{id: sheet.IDPores, name: "overlapping wires", texts: poresCase("shape", "screens", "mesh-per-inch", "200", "wire-diameter", "0.2 mm"), errKey: "wire-diameter"},
	agreeCase{id: sheet.IDPores, name: "plates by half gap", taps: []string{"Half gap y0"},
		texts: poresCase("shape", "plates", "half-gap", "0.25 mm", "plate-thickness", "0.1 mm")},
	agreeCase{id: sheet.IDPores, name: "round pores by radius with ±", taps: []string{"Round pores", "Radius"},
		texts: poresCase("shape", "circular", "radius", "0.15 mm", "temperature", "300 K ± 3 K")},
	agreeCase{id: sheet.IDPores, name: "zero pin radius", taps: []string{"Pin array", "Pin radius"},
		texts: poresCase("shape", "pins", "pin-radius", "0 mm", "pitch", "0.8 mm"), errKey: "pin-radius"},
	agreeCase{id: sheet.IDPores, name: "zero gap", texts: poresCase("shape", "plates", "gap", "0 mm", "plate-thickness", "0.1 mm"), errKey: "gap"},
)
