package sheet

import (
	"errors"
	"fmt"
	"maps"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// vesselSheet is the vessel check: wall stresses of a cylindrical shell
// (Lamé and thin-wall), the ASME UG-27 minimum wall and the wall's own
// MAWP, the vessel's MAWP by one rule, the relief set pressure against it
// and reference test pressures, each check a row with its outcome.
//
// The MAWP rule (the same in the app and the terminal): the vessel's MAWP
// is the lowest of its parts. The nameplate MAWP, where the user gives it,
// is the rating of the whole vessel; the shell wall entered has its own
// UG-27 MAWP; the lower of the two is used. Without a nameplate the wall's
// own MAWP is used, with a warning that the other parts may be weaker.
// The design pressure is never taken as the MAWP: it is checked against
// it.
var vesselSheet = &Sheet{
	ID:      IDVessel,
	Title:   "Vessel wall",
	Summary: "Wall stresses, minimum wall and MAWP of a cylindrical vessel, the relief set pressure against the MAWP, and reference test pressures (safety)",
	Inputs: append(append([]Input{
		withPM(SafetyPressureInput("pressure", "Design pressure", "", "30 barg", "internal design pressure"))},
		shellInputs()...), []Input{
		{Key: "allowable-stress", Label: "Allowable stress at the hot-end temperature", Kind: Quantity, Dim: units.DimStress,
			Hint: "your material's allowable stress at the hottest wall temperature, e.g. 138 MPa, 20 ksi", Min: 0, Max: 1e10, MinOpen: true, PM: true},
		{Key: "joint-efficiency", Label: "Joint efficiency", Kind: Number, Default: "1",
			Hint: "1 for seamless tube; 0.85 or 0.7 for welded seams (ASME UW-12)", Min: 0, Max: 1, MinOpen: true},
		{Key: "corrosion-allowance", Label: "Corrosion allowance", Kind: Quantity, Dim: units.DimLength, Default: "0 mm",
			Hint: "extra wall kept for corrosion or wear, e.g. 1 mm"},
		{Key: "code-family", Label: "Code family to compare with", Kind: Pick, Default: "asme",
			Hint: "formulas only for ASME; the others show their reference", Choices: familyChoices()},
		optional(SafetyPressureInput("mawp", "Vessel MAWP from the nameplate", "", "", "the whole vessel's rating, e.g. 40 barg; empty when unknown")),
		optional(SafetyPressureInput("relief-set", "Relief set pressure", "", "", "set pressure of the relief valve or bursting disc, from its tag, e.g. 33 barg")),
		{Key: "stress-ratio", Label: "Stress ratio, test to design temperature", Kind: Number, Default: "1",
			Hint: "allowable stress at the test temperature / at the design temperature; 1 if unsure", Min: 0.01, Max: 100, Advanced: true},
	}...),
	About: "Lamé's thick-wall stresses at the inner surface and thin-wall membrane stresses on the mean radius (Roark, Table 13.1); " +
		"ASME BPVC VIII-1 UG-27(c) and Appendix 1-2 for the minimum wall and the wall's MAWP; relief set at or below the MAWP (UG-134(a)); " +
		"test pressures UG-99(b), UG-100(b) and PED 2014/68/EU Annex I 7.4. " +
		"The vessel's MAWP is the lowest of its parts: the lower of the nameplate MAWP and the shell wall's own; the design pressure is checked against it, never used for it.",
	Examples: []string{
		"twcalc vessel --pressure 30barg --inner-radius 50mm --wall-thickness 6mm --allowable-stress 138MPa",
		"twcalc vessel --pressure 435psig --inside-diameter 4in --outside-diameter 4.5in --allowable-stress 20ksi --json",
		"twcalc vessel --pressure 30barg --inner-radius 50mm --wall-thickness 6mm --allowable-stress 138MPa --mawp 40barg --relief-set 38barg",
	},
	Run: runVessel,
}

func familyChoices() []Choice {
	keys := map[safety.CodeFamily]string{safety.FamilyASME: "asme", safety.FamilyEU: "eu", safety.FamilyOther: "other"}
	out := make([]Choice, len(safety.Families))
	for i, f := range safety.Families {
		out[i] = Choice{Key: keys[f], Words: f.Label(), Value: f}
	}
	return out
}

// vesselFields maps calc/safety's range-error fields to the inputs.
var vesselFields = map[string]string{
	"pressure (gauge)":    "pressure",
	"inner radius":        "inner-radius",
	"wall thickness":      "wall-thickness",
	"allowable stress":    "allowable-stress",
	"joint efficiency":    "joint-efficiency",
	"corrosion allowance": "corrosion-allowance",
	"stress ratio":        "stress-ratio",
}

// blameField returns err as a *FieldError about the input that fields
// names for the err's units.RangeError Field; other errors come back
// unchanged.
func blameField(v *Values, err error, fields map[string]string) error {
	var re *units.RangeError
	if errors.As(err, &re) {
		if key, ok := fields[re.Field]; ok {
			return v.Blame(err, key)
		}
	}
	return err
}

// vesselRows are the stress rows that carry a ±, in the order of
// vesselNumbers.
var vesselRows = []struct {
	key, label string
	dim        units.Dimension
	show       string
}{
	{"hoop_stress", "Hoop stress (Lamé, inner surface)", units.DimStress, "MPa"},
	{"longitudinal_stress", "Longitudinal stress", units.DimStress, "MPa"},
	{"radial_stress", "Radial stress", units.DimStress, "MPa"},
	{"stress_intensity", "Stress intensity (Tresca)", units.DimStress, "MPa"},
	{"hoop_stress_ratio", "Hoop stress / allowable", units.DimNone, ""},
	{"thin_wall_hoop_stress", "Hoop stress (thin-wall, mean radius)", units.DimStress, "MPa"},
	{"thin_wall_longitudinal_stress", "Longitudinal stress (thin-wall)", units.DimStress, "MPa"},
	{"thin_wall_hoop_stress_ratio", "Thin-wall hoop stress / allowable", units.DimNone, ""},
	{"minimum_wall_thickness", "Minimum wall for this pressure", units.DimLength, "mm"},
	{shellRows[0].key, shellRows[0].label, units.DimLength, "mm"},
	{shellRows[1].key, shellRows[1].label, units.DimLength, "mm"},
	{shellRows[2].key, shellRows[2].label, units.DimLength, "mm"},
}

// vesselShellRow is the index in vesselRows of the first shell size.
const vesselShellRow = 9

// vesselNumbers computes the rows of vesselRows from x = (P gauge, the
// two shell sizes given as g reads them, S); E and c are fixed. The
// thin-wall rows are zero when thinErr is set, the minimum wall when asme
// is false or no wall can hold P (shell.NoWall).
func vesselNumbers(x []float64, g shellGeometry, E, c float64, asme bool) (out []float64, lame, thin safety.WallStress, shell safety.Shell, thinErr, err error) {
	P := safety.GaugePressure(x[0])
	out = make([]float64, len(vesselRows))
	ri, t := g.radiusAndWall(x[1], x[2])
	copy(out[vesselShellRow:], shellSizes(ri, t))
	x = []float64{x[0], ri, t, x[3]}
	lame, err = safety.ThickWallStress(P, x[1], x[2], x[3])
	if err != nil {
		return
	}
	copy(out, []float64{lame.Hoop, lame.Longitudinal, lame.Radial, lame.Intensity, lame.HoopRatio})
	thin, thinErr = safety.ThinWallStress(P, x[1], x[2], x[3])
	if thinErr == nil {
		out[5], out[6], out[7] = thin.Hoop, thin.Longitudinal, thin.HoopRatio
	}
	if asme {
		shell, err = safety.ASMEShell(safety.ShellInput{Pressure: P, InnerRadius: x[1], Wall: x[2], Allowable: x[3], JointEfficiency: E, Corrosion: c})
		if errors.Is(err, safety.ErrNoWall) {
			// said by shell.NoWall and its warning; the wall's MAWP
			// is still there
			err = nil
		}
		out[8] = shell.MinThickness
	}
	return
}

func runVessel(v *Values) (*Result, error) {
	P := gaugeValue(v, "pressure")
	if P < 0 {
		return nil, v.Blame(fmt.Errorf("is %s below the atmosphere (a vacuum inside); these formulas are for internal pressure only", units.Format(-float64(P), units.DimPressure)), "pressure")
	}
	fam := v.Pick("code-family").(safety.CodeFamily)
	asme := fam == safety.FamilyASME
	g, err := readShell(v)
	if err != nil {
		return nil, err
	}
	S := v.Q("allowable-stress")
	E, c := v.Number("joint-efficiency"), v.SI("corrosion-allowance")
	x := []float64{float64(P), g.a, g.b, S.Value}
	nums, lame, thin, shell, thinErr, err := vesselNumbers(x, g, E, c, asme)
	if err != nil {
		fields := maps.Clone(vesselFields)
		maps.Copy(fields, g.radiusKeys)
		return nil, blameField(v, err, fields)
	}
	_, wall := g.radiusAndWall(g.a, g.b)
	r := &Result{}
	deriveReading(r, v, "pressure")
	r.Derive("pressure_gauge", "Pressure on the wall (gauge)", float64(P), units.DimPressure)
	r.DeriveWords("pressure_basis", "Pressure basis", "gauge: pressures below are above the atmosphere (101325 Pa)")

	sig, ok := Spread(func(x, out []float64) error {
		o, _, _, _, _, err := vesselNumbers(x, g, E, c, asme)
		copy(out, o)
		return err
	}, x, []float64{v.Q("pressure").Uncertainty, g.ua, g.ub, S.Uncertainty}, len(vesselRows))
	add := func(k int) {
		row := vesselRows[k]
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		r.AddPM(row.key, row.label, nums[k], sig[k], row.dim).Show = row.show
	}
	for k := vesselShellRow; k < len(vesselRows); k++ {
		add(k)
	}
	for k := range 5 {
		add(k)
	}
	r.AddWords("stress_method", "Stress method", lame.Method)
	r.Warn(lame.Warnings...)
	if thinErr == nil {
		for k := 5; k < 8; k++ {
			add(k)
		}
		ws := thin.Warnings
		if thin.HoopRatio > 1 && len(ws) > 0 {
			// the over-allowable warning, said already with Lamé's
			// result, is the last one
			ws = ws[:len(ws)-1]
		}
		r.Warn(ws...)
	} else {
		r.Warn("thin-wall stresses not shown: " + thinErr.Error())
	}
	vesselStressCheck(r, lame)
	cautionOnce(r, lame.Cautions...)

	r.AddWords("code_family", "Code", fam.Label())
	var wallMAWP safety.GaugePressure // the shell wall's own, ASME only
	if asme {
		if !shell.NoWall {
			add(8)
		}
		wallMAWP = shell.MAWP
		r.AddGauge("max_allowable_pressure", "MAWP of this wall (gauge)", float64(shell.MAWP))
		wallCheck(r, shell, wall, P, S.Value*E)
		r.AddWords("thickness_clause", "Thickness formula", shell.ClauseThickCircum+" / "+shell.ClauseThickLong)
		r.AddWords("pressure_clause", "MAWP formula", shell.ClauseMAWPCircum+" / "+shell.ClauseMAWPLong)
		r.Warn(shell.Warnings...)
		cautionOnce(r, shell.Cautions...)
	} else {
		r.AddWords("code_reference", "Where the rule is", fam.ShellReference())
		r.Warn("no wall-thickness formula for " + fam.Label() + ": the minimum wall and the wall's MAWP are given for the ASME family only")
	}

	mawp, err := vesselMAWP(r, v, wallMAWP, asme)
	if err != nil {
		return nil, err
	}
	if mawp > 0 {
		r.Check("mawp_check", "Design pressure against the MAWP", designWords(P, mawp), designOutcome(P, mawp), designWhy(P, mawp))
	}
	if err := reliefRows(r, v, P, mawp); err != nil {
		return nil, err
	}
	if err := testPressureRows(r, v, fam, mawp); err != nil {
		return nil, err
	}
	cautionOnce(r, safety.CautionReliefSizing)
	return r, nil
}

// vesselStressCheck is the check of Lamé's hoop stress against the
// allowable stress entered.
func vesselStressCheck(r *Result, lame safety.WallStress) {
	if lame.HoopRatio <= 1 {
		r.Check("stress_check", "Hoop stress against the allowable", "within the allowable", Pass,
			fmt.Sprintf("the hoop stress is %s of the allowable stress entered", percent(lame.HoopRatio)))
		return
	}
	r.Check("stress_check", "Hoop stress against the allowable", "over the allowable", Fail,
		fmt.Sprintf("the hoop stress is %s of the allowable stress entered: the wall is overstressed at this pressure", percent(lame.HoopRatio)))
}

// wallCheck is the check of the wall entered against UG-27's minimum.
func wallCheck(r *Result, s safety.Shell, wall float64, P safety.GaugePressure, SE float64) {
	if s.NoWall {
		row := r.AddObject("wall_adequate", "Wall against the code formula", false, "no wall can hold it")
		row.Outcome, row.Note = Fail, (&safety.NoWallError{Pressure: P, Stress: SE}).Error()
		return
	}
	words, o := "thick enough", Pass
	why := fmt.Sprintf("the wall %s is at least the %s that UG-27 requires at the design pressure", mm(wall), mm(s.MinThickness))
	if !s.WallEnough {
		words, o = "too thin", Fail
		why = fmt.Sprintf("the wall %s is thinner than the %s that UG-27 requires at the design pressure", mm(wall), mm(s.MinThickness))
	}
	row := r.AddObject("wall_adequate", "Wall against the code formula", s.WallEnough, words)
	row.Outcome, row.Note = o, why
}

// vesselMAWP applies the one MAWP rule and adds its rows; it returns 0
// when no MAWP is known (no nameplate and no code formula).
func vesselMAWP(r *Result, v *Values, wall safety.GaugePressure, asme bool) (safety.GaugePressure, error) {
	if !v.Has("mawp") {
		if !asme || wall <= 0 {
			r.Warn("no MAWP known: give the vessel's nameplate MAWP for the relief check and the test pressures")
			return 0, nil
		}
		r.AddGauge("mawp_used", "Vessel MAWP used (gauge)", float64(wall))
		r.AddWords("mawp_basis", "MAWP from", "the shell wall alone (UG-27)")
		r.Warn("the MAWP used is that of this shell wall alone; the vessel's MAWP is the lowest of all its parts (heads, flanges, windows, feedthroughs, driver housing): give the nameplate MAWP")
		return wall, nil
	}
	plate := gaugeValue(v, "mawp")
	if plate <= 0 {
		return 0, v.Blame(fmt.Errorf("is %s gauge; a maximum allowable working pressure is above the atmosphere", units.Format(float64(plate), units.DimPressure)), "mawp")
	}
	deriveReading(r, v, "mawp")
	used, basis := plate, "the nameplate"
	if asme && wall > 0 {
		if wall < plate {
			used, basis = wall, "the shell wall (UG-27), lower than the nameplate"
			r.Check("nameplate_check", "Nameplate MAWP against this wall", "wall below the nameplate", Warn,
				fmt.Sprintf("this wall allows only %s by UG-27, below the nameplate's %s: the lower is used (the vessel's MAWP is the lowest of its parts); check the wall and stress entered", barg(wall), barg(plate)))
		} else {
			r.Check("nameplate_check", "Nameplate MAWP against this wall", "wall allows it", Pass,
				fmt.Sprintf("this wall allows %s by UG-27, at or above the nameplate's %s", barg(wall), barg(plate)))
		}
	}
	r.AddGauge("mawp_used", "Vessel MAWP used (gauge)", float64(used))
	r.AddWords("mawp_basis", "MAWP from", basis)
	return used, nil
}

func designOutcome(P, mawp safety.GaugePressure) Outcome {
	if P <= mawp {
		return Pass
	}
	return Fail
}

func designWords(P, mawp safety.GaugePressure) string {
	if P <= mawp {
		return "at or below the MAWP"
	}
	return "above the MAWP"
}

func designWhy(P, mawp safety.GaugePressure) string {
	if P <= mawp {
		return fmt.Sprintf("the design pressure %s is %s of the MAWP %s", barg(P), percent(float64(P/mawp)), barg(mawp))
	}
	return fmt.Sprintf("the design pressure %s is above the MAWP %s (%s): do not run the vessel at it", barg(P), barg(mawp), percent(float64(P/mawp)))
}

// reliefRows checks the relief set pressure, when given, against the MAWP.
func reliefRows(r *Result, v *Values, P, mawp safety.GaugePressure) error {
	if !v.Has("relief-set") {
		return nil
	}
	set := gaugeValue(v, "relief-set")
	if set <= 0 {
		return v.Blame(fmt.Errorf("is %s gauge; a relief device opens above the atmosphere", units.Format(float64(set), units.DimPressure)), "relief-set")
	}
	deriveReading(r, v, "relief-set")
	r.AddGauge("relief_set_pressure", "Relief set pressure (gauge)", float64(set))
	if mawp <= 0 {
		r.Check("relief_check", "Relief set against the MAWP", "no MAWP to compare with", Warn,
			"no MAWP is known: give the nameplate MAWP (the design pressure is not a MAWP)")
		return nil
	}
	rc, err := safety.CheckRelief(set, mawp)
	if err != nil {
		return v.Blame(err, "relief-set")
	}
	r.AddObject("relief_at_or_below_mawp", "Relief at or below the MAWP", rc.OK, yesNo(rc.OK))
	switch {
	case !rc.OK:
		r.Check("relief_check", "Relief set against the MAWP", "above the MAWP", Fail, rc.Message)
	case set < P:
		r.Check("relief_check", "Relief set against the MAWP", "below the design pressure", Warn,
			rc.Message+"; but below the design pressure "+barg(P)+": the device may open in normal running")
	default:
		r.Check("relief_check", "Relief set against the MAWP", "at or below the MAWP", Pass, rc.Message)
	}
	cautionOnce(r, rc.Cautions...)
	return nil
}

func yesNo(b bool) string {
	if b {
		return "yes"
	}
	return "no"
}

// testPressureRows gives the reference test pressures from the MAWP.
func testPressureRows(r *Result, v *Values, fam safety.CodeFamily, mawp safety.GaugePressure) error {
	if mawp <= 0 {
		r.Check("test_pressure_check", "Test pressures", "no MAWP", Warn,
			"no test pressure without a MAWP: give the nameplate MAWP (the design pressure is not a MAWP)")
		return nil
	}
	tp, err := safety.ReferenceTestPressures(mawp, v.Number("stress-ratio"))
	if err != nil {
		return blameField(v, err, vesselFields)
	}
	if fam == safety.FamilyASME {
		r.AddGauge("hydrostatic_test_pressure", "Hydrostatic test, ASME UG-99(b)", float64(tp.ASMEHydrostatic))
		r.AddGauge("pneumatic_test_pressure", "Pneumatic test, ASME UG-100(b)", float64(tp.ASMEPneumatic))
		r.AddWords("test_pressure_basis", "Test pressures from", "ASME VIII-1 UG-99(b) 1.3 × MAWP × stress ratio; UG-100(b) 1.1 × MAWP × stress ratio; gauge")
	} else {
		r.AddGauge("eu_test_pressure", "Test pressure, PED 2014/68/EU Annex I 7.4", float64(tp.EUHydrostatic))
		r.AddWords("test_pressure_basis", "Test pressure from", "PED 2014/68/EU Annex I 7.4: max(1.25 × PS × stress ratio, 1.43 × PS), PS = the MAWP used; gauge")
	}
	if v.Has("mawp") {
		r.Check("test_pressure_check", "Test pressures", "from the vessel's MAWP", Pass,
			"the test pressures rest on the vessel's MAWP ("+barg(mawp)+"); the code and the inspector decide the test")
	} else {
		r.Check("test_pressure_check", "Test pressures", "from the shell wall alone", Warn,
			"the test pressures rest on the shell wall's own MAWP ("+barg(mawp)+"); a weaker part (head, window, feedthrough) would fail first: give the nameplate MAWP")
	}
	cautionOnce(r, tp.Cautions...)
	return nil
}
