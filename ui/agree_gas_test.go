package ui

import "tubewright/calc/sheet"

// The working gas through both front ends.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDGas, name: "helium 10 bar", texts: map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bar"}},
	agreeCase{id: sheet.IDGas, name: "mixture with ±", texts: map[string]string{"gas": "helium:0.7,xenon:0.3", "temperature": "350 K ± 5 K", "pressure": "10 bar +- 0.5 bar"}},
	agreeCase{id: sheet.IDGas, name: "real gas", texts: map[string]string{"gas": "argon", "temperature": "27 degC", "pressure": "30 barg", "non-ideal": "true"}},
	agreeCase{id: sheet.IDGas, name: "too cold", texts: map[string]string{"gas": "helium", "temperature": "5 K"}, errKey: "temperature"},
	agreeCase{id: sheet.IDGas, name: "bad unit", texts: map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bra"}, errKey: "pressure"},
)
