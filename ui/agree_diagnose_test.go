package ui

import "tubewright/calc/sheet"

// What the pitch says through both front ends: a temperature with the ±
// of the measurement, of the length and of the pressure, a fraction with
// ±, a hot tube with its caution, and bad inputs naming their key.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDDiagnose, name: "air tube", texts: map[string]string{"gas": "air", "measured-frequency": "140 Hz ± 2 Hz",
		"length": "600 mm", "diameter": "24 mm"}},
	agreeCase{id: sheet.IDDiagnose, name: "helium, ± on length and pressure", texts: map[string]string{"gas": "helium", "measured-frequency": "510 Hz",
		"ends": "closed-closed", "end-correction": "none", "length": "1 m ± 1 mm", "diameter": "40 mm", "pressure": "1 bar +- 0.01 bar"}},
	agreeCase{id: sheet.IDDiagnose, name: "argon in helium", texts: map[string]string{"find": "fraction", "gas": "helium", "second-gas": "argon",
		"temperature": "300 K ± 1 K", "measured-frequency": "480 Hz ± 2 Hz", "length": "0.5 m", "diameter": "20 mm"}},
	agreeCase{id: sheet.IDDiagnose, name: "hot tube", texts: map[string]string{"gas": "air", "ends": "closed-closed", "end-correction": "none",
		"length": "1 m", "radius": "20 mm", "measured-frequency": "250 Hz"}, taps: []string{"Radius"}},
	agreeCase{id: sheet.IDDiagnose, name: "humid air, wall losses", texts: map[string]string{"gas": "air", "humidity": "50 %", "losses": "wall",
		"measured-frequency": "280 Hz +- 1 Hz", "length": "300 mm", "diameter": "6 mm"}},
	agreeCase{id: sheet.IDDiagnose, name: "out of band", texts: map[string]string{"gas": "air", "length": "0.3 m", "diameter": "20 mm",
		"measured-frequency": "5000 Hz"}, errKey: "measured-frequency"},
	agreeCase{id: sheet.IDDiagnose, name: "fraction of a mixture", texts: map[string]string{"find": "fraction", "gas": "helium:0.5,argon:0.5",
		"second-gas": "argon", "measured-frequency": "480 Hz", "length": "0.5 m", "diameter": "20 mm"}, errKey: "gas"},
)
