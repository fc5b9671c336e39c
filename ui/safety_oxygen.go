package ui

import "tubewright/calc/safety"

// newOxygenStep is the room-oxygen step: the room, any other release and
// the rig's vessel emptied into it, with the cylinder of the step before;
// the oxygen left against 19.5 %.
func newOxygenStep(env *Env, f *safetyForms, item safety.Item) *sheetStep {
	return newSheetStep(env, "Oxygen-deficient air", item.Cautions, &stepPart{form: f.oxygen, warnings: true,
		keys: []string{"room", "release", "release-from-vessel", "vessel-pressure", "gas", "model", "ventilation", "vessel-temperature", "room-temperature"},
		rows: []string{"oxygen_deficient", "oxygen_fraction", "release_volume", "vessel_release", "max_release", "recovery_time",
			"oxygen_fraction_displacement", "oxygen_fraction_mixed", "oxygen_fraction_sealed"},
	})
}
