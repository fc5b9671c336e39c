package safety

// The caution texts, in our own words. Every result struct carries the
// general caution first, then the specific ones that apply to it.
const (
	// CautionGeneral goes with every number of this package.
	CautionGeneral = "Estimates for planning only. Pressure equipment must be designed, tested and approved under the locally applicable code by qualified and, where required, licensed people. This tool is no substitute for that."

	// CautionStress goes with wall stresses and code thicknesses.
	CautionStress = "Stresses are for a plain cylinder away from ends, openings, welds and flanges, where real vessels fail first. Use the allowable stress of your material at the highest wall temperature, and check heads, bolting, windows and feedthroughs separately."

	// CautionTestPressure goes with reference test pressures.
	CautionTestPressure = "Test pressures are reference values. The applicable code and the inspector decide the test pressure, the medium and the procedure. Test with liquid where you can: a gas-filled test stores far more energy."

	// CautionStoredEnergy goes with the stored energy of a gas charge.
	CautionStoredEnergy = "A vessel of compressed gas stores energy that a failure releases as a blast and flying parts. Keep people out of line with end caps, windows and fittings while pressurising, shield the rig, and raise the pressure from a distance in steps."

	// CautionAsphyxiation goes with oxygen results.
	CautionAsphyxiation = "Helium, argon, nitrogen and other inert gases cannot be seen or smelled; air with too little oxygen can make you collapse without warning, within a breath or two at very low levels. Use a fixed oxygen monitor with an alarm, ventilate, and never enter or let anyone enter after a release until the air is checked."

	// CautionHotSurfaces goes with hot-end temperatures and hot parts.
	CautionHotSurfaces = "Hot ends and heaters stay hot long after the power is off and can burn on contact or ignite nearby materials. Guard them, mark them, and let them cool before handling."

	// CautionHearing goes with sound levels.
	CautionHearing = "Sound levels inside a resonator are not the exposure of a person, but leaks, open ends, loudspeaker housings and a failing window can let intense sound out. Measure the level where people stand with a sound level meter and wear hearing protection until you have."

	// CautionReliefSizing goes with the relief check: a set pressure at
	// or below the MAWP is necessary, not sufficient.
	CautionReliefSizing = "A relief device must be sized for the worst flow it may have to pass (a failed-open regulator, a fire) and vent somewhere safe; its set pressure alone does not make it adequate."

	// CautionCylinder goes with gas cylinder contents.
	CautionCylinder = "Secure gas cylinders upright with a chain or strap, keep the valve cap on when not in use, and use a regulator and hoses rated for the cylinder pressure."
)

// cautions returns the general caution followed by the specific ones.
func cautions(specific ...string) []string {
	out := make([]string, 0, 1+len(specific))
	out = append(out, CautionGeneral)
	return append(out, specific...)
}
