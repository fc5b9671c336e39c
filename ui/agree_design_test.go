package ui

import "tubewright/calc/sheet"

// Design from a target through both front ends. The screen runs the
// design in a Job; the agreement test reads Form.Result right after
// typing, so these cases make the screen wait for its Job (designWaits)
// before the Form takes the result. The description takes no ± (a design
// is for one target): a typed ± is refused naming the field, which one
// case checks.
var _ = addAgreeCases(
	// The acceptance line.
	agreeCase{id: sheet.IDDesign, name: "helium half-wave", texts: map[string]string{"gas": "helium", "pressure": "10 bar",
		"frequency": "300 Hz", "hot": "650 K", "ambient": "295 K", "diameter": "50 mm", "ends": "closed-closed"}},
	agreeCase{id: sheet.IDDesign, name: "air quarter-wave wool", texts: map[string]string{"gas": "air", "pressure": "1 atm",
		"frequency": "120 Hz", "hot": "800 K", "diameter": "30 mm", "ends": "closed-open", "stack": "metal-wool", "wire": "50 um"}},
	// A heater too cool: the failing check with the nearest design.
	agreeCase{id: sheet.IDDesign, name: "unreachable heater", texts: map[string]string{"gas": "helium", "pressure": "10 bar",
		"frequency": "300 Hz", "hot": "300 K", "diameter": "50 mm"}},
	// The heat pump with the screen's starting values, so that only the
	// tap on "heat pump" starts a design (each takes a while under -race).
	agreeCase{id: sheet.IDDesign, name: "heat pump", texts: map[string]string{"for": "heat-pump", "gas": "helium", "pressure": "10 bar",
		"frequency": "300 Hz", "diameter": "50 mm", "drive": "3 kPa", "cold": "273 K"}},
	agreeCase{id: sheet.IDDesign, name: "frequency with ±", texts: map[string]string{"gas": "helium", "pressure": "10 bar",
		"frequency": "300 Hz ± 3 Hz", "hot": "650 K", "diameter": "50 mm"}, errKey: "frequency"},
	agreeCase{id: sheet.IDDesign, name: "heater below range", texts: map[string]string{"gas": "helium", "pressure": "10 bar",
		"frequency": "300 Hz", "hot": "100 K", "diameter": "50 mm"}, errKey: "hot"},
)

// The design screen waits for its Job while the agreement test types (see
// designWaits); its own tests (design_test.go) clear this to drive the
// background path.
var _ = func() bool { designWaits.Store(true); return true }()
