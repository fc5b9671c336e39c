package ui

import "tubewright/calc/sheet"

// Penetration depths through both front ends.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDDepths, name: "helium 10 bar", texts: map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bar", "frequency": "100 Hz"}},
	agreeCase{id: sheet.IDDepths, name: "air with ±", texts: map[string]string{"gas": "air", "temperature": "20 degC +- 1 K", "frequency": "440 Hz ± 5 Hz"}},
	agreeCase{id: sheet.IDDepths, name: "real gas", texts: map[string]string{"gas": "argon", "temperature": "27 degC", "pressure": "30 barg", "frequency": "1.2 kHz", "non-ideal": "true"}},
	agreeCase{id: sheet.IDDepths, name: "zero frequency", texts: map[string]string{"gas": "helium", "temperature": "300 K", "frequency": "0 Hz"}, errKey: "frequency"},
	agreeCase{id: sheet.IDDepths, name: "too cold", texts: map[string]string{"gas": "helium", "temperature": "5 K", "frequency": "100 Hz"}, errKey: "temperature"},
)
