package sheet

// poresSheet is the pores-and-packing calculator: porosity, hydraulic
// radius and Rott's fκ, fν of a stack or regenerator geometry at an
// operating point, with a verdict on the pore size for the role and what
// geometry would hit the rule of thumb. A typed ± on the operating point is
// carried to the depths and every ratio to them.
var poresSheet = &Sheet{
	ID:      IDPores,
	Title:   "Pores and packing",
	Summary: "Plates, pores, pins, screens, metal wool or honeycomb: porosity, hydraulic radius, Rott's functions and a verdict for a stack or regenerator",
	Inputs:  poresInputs(),
	About: "Plates, round pores, rectangular channels (Arnott, Bass & Raspet 1991) and pins " +
		"(cell of equal area, Swift & Keolian 1993) are exact solutions; screens use φ = 1 − π m d/4 and " +
		"r_h = φd/(4(1−φ)); fibres r_h = φd/(4(1−φ)); honeycomb uses square cells; a wide channel is the boundary-layer limit. " +
		"Rott's f in Swift's exp(+iωt) convention (Im f < 0). Fibre densities: " + materialNote() + ".",
	Examples: []string{
		"twcalc pores --gas helium --temperature 300K --pressure 10bar --frequency 100Hz --shape plates --half-gap 0.25mm --plate-thickness 0.1mm",
		"twcalc pores --gas helium --temperature 300K --pressure 10bar --frequency 100Hz --shape screens --mesh-per-inch 200 --wire-diameter 41um --role regenerator",
		"twcalc pores --gas air --temperature 300K --frequency 500Hz --shape fibres --fibre-diameter 30um --packed-mass 30g --material steel --packed-volume 50cm3 --json",
	},
	Run: runPores,
}

// runPores reads the geometry and the operating point, judges the pore
// size for the role and adds the rows, warnings and their ±.
func runPores(v *Values) (*Result, error) {
	g, err := readGeometry(v)
	if err != nil {
		return nil, err
	}
	op, err := readOperatingPoint(v)
	if err != nil {
		return nil, err
	}
	j, err := judgePores(v, g, op)
	if err != nil {
		return nil, err
	}
	r := &Result{}
	poresRows(r, v, g, op, j)
	poresWarnings(r, v.Pick("shape").(PoreShape), j)
	r.Warn(op.Props.Warnings...)
	return r, nil
}
