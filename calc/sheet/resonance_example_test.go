package sheet_test

import (
	"fmt"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// A quarter-wave tube of air at 20 °C, with a ± on its length: the
// frequency and its ±, as both front ends show it (the boundary layers at
// the wall included, as by default).
func Example_resonance() {
	s, _ := sheet.Lookup(sheet.IDResonance)
	r, err := s.Evaluate(map[string]string{"length": "500 mm ± 1 mm", "radius": "12 mm"})
	if err != nil {
		fmt.Println(err)
		return
	}
	f, _ := r.Row("frequency")
	fmt.Println(f.Label+":", units.FormatPM(f.Value, f.PM, f.Dim))
	// Output: Resonance frequency: 167.4 ± 0.3 Hz
}

// The gas temperature a measured pitch says, for a closed-closed helium
// tube without end corrections.
func Example_diagnose() {
	s, _ := sheet.Lookup(sheet.IDDiagnose)
	r, err := s.Evaluate(map[string]string{"gas": "helium", "ends": "closed-closed", "end-correction": "none",
		"length": "1 m", "radius": "20 mm", "measured-frequency": "510 Hz ± 2 Hz"})
	if err != nil {
		fmt.Println(err)
		return
	}
	T, _ := r.Row("temperature")
	fmt.Println(T.Label+":", units.FormatPM(T.Value, T.PM, T.Dim))
	// Output: Mean gas temperature: 308.4 ± 2.5 K
}
