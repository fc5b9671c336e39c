package ui

import "tubewright/calc/sheet"

// placementCase returns the texts of a placement case; the stack inputs
// are always named, since the screen starts with examples in them.
func placementCase(centre, length, drive string, more ...string) map[string]string {
	m := map[string]string{"gas": "air", "temperature": "300 K", "frequency": "500 Hz",
		"centre": centre, "stack-length": length, "drive-ratio": drive}
	for i := 0; i+1 < len(more); i += 2 {
		m[more[i]] = more[i+1]
	}
	return m
}

// Stack placement through both front ends.
var _ = addAgreeCases(
	agreeCase{id: sheet.IDPlacement, name: "air engine", texts: placementCase("25 mm", "20 mm", "2 %")},
	agreeCase{id: sheet.IDPlacement, name: "helium heat pump with ±", texts: placementCase("0.3 m ± 5 mm", "80 mm +- 2 mm", "3 %",
		"device", "heat-pump", "gas", "helium", "pressure", "10 bar", "frequency", "100 Hz ± 1 Hz")},
	agreeCase{id: sheet.IDPlacement, name: "long stack, hard drive", texts: placementCase("0.1 m", "0.2 m", "15 %")},
	agreeCase{id: sheet.IDPlacement, name: "drive above 100 %", texts: placementCase("25 mm", "20 mm", "150 %"), errKey: "drive-ratio"},
	agreeCase{id: sheet.IDPlacement, name: "centre at the end", texts: placementCase("0 mm", "20 mm", "2 %"), errKey: "centre"},
)
