package ui

import "tubewright/calc/safety"

// newReliefStep is the relief step: the nameplate MAWP and the relief set
// pressure, checked against the vessel's MAWP by the vessel calculator's
// one rule (the same Form as the wall step).
func newReliefStep(env *Env, f *safetyForms, item safety.Item) *sheetStep {
	return newSheetStep(env, "Relief devices", item.Cautions, part(f.vessel,
		[]string{"mawp", "relief-set"},
		[]string{"relief_check", "mawp_check", "nameplate_check", "mawp_used", "mawp_basis", "max_allowable_pressure", "relief_set_pressure"}))
}
