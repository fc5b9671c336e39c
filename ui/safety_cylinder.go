package ui

import "tubewright/calc/safety"

// newCylinderStep is the gas-cylinder step: a cylinder emptied into the
// room, its contents as free gas and its release, from the room-oxygen
// calculator (the same Form as the oxygen step, so the release counts
// there).
func newCylinderStep(env *Env, f *safetyForms, item safety.Item) *sheetStep {
	return newSheetStep(env, "Gas cylinders", item.Cautions, part(f.oxygen,
		[]string{"release-from-cylinder", "fill-pressure", "fill-temperature", "gas"},
		[]string{"cylinder_contents_ideal", "cylinder_contents", "cylinder_contents_basis", "compressibility", "cylinder_release"}))
}
