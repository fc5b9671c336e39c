package ui

import "tubewright/calc/safety"

// newWallStep is the wall-stress step: the vessel's pressure, shell and
// material, its stresses, UG-27 minimum wall and the wall's own MAWP. The
// shell's inside diameter comes first, its radius a chip away.
func newWallStep(env *Env, f *safetyForms, item safety.Item) *sheetStep {
	return newSheetStep(env, "Beside these stresses", item.Cautions, &stepPart{form: f.vessel, warnings: true,
		pair: newSizePair(env, f.vessel, "inside-diameter", "inner-radius", [2]string{"Diameter", "Radius"}, [2]string{"Ø", "radius"}),
		keys: []string{"pressure", "inside-diameter", "inner-radius", "outside-diameter", "wall-thickness", "allowable-stress", "joint-efficiency", "corrosion-allowance", "code-family"},
		rows: []string{"stress_check", "wall_adequate", "inside_diameter", "outside_diameter", "wall_thickness", "hoop_stress", "longitudinal_stress", "radial_stress", "stress_intensity", "hoop_stress_ratio",
			"thin_wall_hoop_stress", "code_family", "code_reference", "minimum_wall_thickness", "max_allowable_pressure", "thickness_clause"},
	})
}
