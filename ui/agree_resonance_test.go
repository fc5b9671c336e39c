package ui

import "tubewright/calc/sheet"

// Tube resonance through both front ends: the uniform tube both ways, with
// ± and with the real-gas switch (once only in the terminal), five zones
// and twelve modes (once three of each on screen), the Helmholtz resonator
// with ±, a sweep, and bad inputs naming their key.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDResonance, name: "quarter-wave", texts: map[string]string{"length": "147 mm", "diameter": "16 mm"}},
	agreeCase{id: sheet.IDResonance, name: "length and radius with ±", taps: []string{"Radius"}, texts: map[string]string{"length": "1 m ± 2 mm", "radius": "12 mm +- 0.1 mm",
		"temperature": "20 degC ± 2 K"}},
	agreeCase{id: sheet.IDResonance, name: "length from frequency", texts: map[string]string{"solve": "length", "ends": "closed-closed",
		"frequency": "400 Hz ± 2 Hz", "diameter": "50 mm", "gas": "helium"}},
	agreeCase{id: sheet.IDResonance, name: "real gas at 30 bar", texts: map[string]string{"gas": "helium", "pressure": "30 bar", "length": "1 m",
		"diameter": "50 mm", "non-ideal": "true"}},
	agreeCase{id: sheet.IDResonance, name: "sweep", texts: map[string]string{"length": "1 m", "diameter": "50 mm", "sweep": "temperature:250 K:450 K:5"}},
	agreeCase{id: sheet.IDResonance, name: "five zones, twelve modes", texts: map[string]string{"resonator": "zones", "ends": "closed-open",
		"zones": "0.1 m, 10 mm, 700 K; 0.1 m, 10 mm, 500 K; 0.1 m, 10 mm, 400 K; 0.2 m, 12 mm, 300 K; 0.3 m, 15 mm, 295 K", "modes": "12"}},
	agreeCase{id: sheet.IDResonance, name: "Helmholtz with ±", texts: map[string]string{"resonator": "helmholtz", "volume": "1 L ± 10 mL",
		"neck-length": "50 mm", "neck-diameter": "20 mm ± 0.2 mm"}},
	agreeCase{id: sheet.IDResonance, name: "narrow tube with wall losses", texts: map[string]string{"length": "0.3 m", "diameter": "4 mm ± 0.05 mm",
		"losses": "wall"}},
	agreeCase{id: sheet.IDResonance, name: "humid air, zones with wall losses", texts: map[string]string{"resonator": "zones", "humidity": "60 %",
		"zones": "0.1 m, 5 mm, 350 K; 0.3 m, 5 mm, 295 K", "losses": "wall", "pressure": "1 atm ± 0.05 bar"}},
	agreeCase{id: sheet.IDResonance, name: "humid helium", texts: map[string]string{"gas": "helium", "humidity": "50 %", "length": "1 m",
		"diameter": "20 mm"}, errKey: "humidity"},
	agreeCase{id: sheet.IDResonance, name: "zero length", texts: map[string]string{"length": "0 m", "diameter": "16 mm"}, errKey: "length"},
	agreeCase{id: sheet.IDResonance, name: "zone too cold", texts: map[string]string{"resonator": "zones",
		"zones": "0.1 m, 10 mm, 700 K; 0.4 m, 10 mm, 5 K"}, errKey: "zones"},
	agreeCase{id: sheet.IDResonance, name: "neck shorter than its radius", texts: map[string]string{"resonator": "helmholtz", "volume": "1 L",
		"neck-length": "5 mm", "neck-diameter": "20 mm"}, errKey: "neck-diameter"},
)
