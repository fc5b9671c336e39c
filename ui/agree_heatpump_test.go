package ui

import "tubewright/calc/sheet"

// Heat pump span through both front ends, on the built-in example pump
// (see agree_onset_test.go for how the device reaches each side).
var _ = addAgreeCases(
	agreeCase{id: sheet.IDHeatPump, name: "example pump", texts: map[string]string{"example": "heatpump"}},
	agreeCase{id: sheet.IDHeatPump, name: "load with ±", texts: map[string]string{"example": "heatpump", "load": "100 mW ± 10 mW"}},
	agreeCase{id: sheet.IDHeatPump, name: "other frequency", texts: map[string]string{"example": "heatpump", "load": "50 mW", "frequency": "380 Hz"}},
	agreeCase{id: sheet.IDHeatPump, name: "negative load", texts: map[string]string{"example": "heatpump", "load": "-1 W"}, errKey: "load"},
)
