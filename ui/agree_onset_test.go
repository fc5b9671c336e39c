package ui

import "tubewright/calc/sheet"

// Engine onset through both front ends. The device is the built-in
// example: the terminal takes --example, the app's chip loads it into the
// device editor, which hands the same device to the description as its
// document.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDOnset, name: "example engine", texts: map[string]string{"example": "engine"}},
	agreeCase{id: sheet.IDOnset, name: "hot temperature with ±", texts: map[string]string{"example": "engine", "hot": "600 K ± 10 K"}},
	agreeCase{id: sheet.IDOnset, name: "above onset", texts: map[string]string{"example": "engine", "hot": "800 K", "frequency-guess": "250 Hz"}},
	agreeCase{id: sheet.IDOnset, name: "hot below range", texts: map[string]string{"example": "engine", "hot": "1 K"}, errKey: "hot"},
	agreeCase{id: sheet.IDOnset, name: "guess with ±", texts: map[string]string{"example": "engine", "frequency-guess": "250 Hz +- 5 Hz"}, errKey: "frequency-guess"},
)
