package ui

import "tubewright/calc/safety"

// newHearingStep is the hearing step: the sound level in the resonator
// against the occupational limits, and a level measured where people
// stand against OSHA 1910.95 and EU 2003/10/EC.
func newHearingStep(env *Env, f *safetyForms, item safety.Item) *sheetStep {
	return newSheetStep(env, "Hearing", item.Cautions, &stepPart{form: f.spl, warnings: true,
		keys: []string{"amplitude", "at-ear"},
		rows: []string{"exposure_check", "limits_reached_in_vessel", "spl", "peak_level", "osha_permitted_time", "eu_limit_time"},
	})
}
