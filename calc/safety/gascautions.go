package safety

import "tubewright/gasprops"

// Cautions for gases that harm in other ways than by taking the place of
// oxygen, in our own words. The oxygen and stored-energy numbers of this
// package say nothing about these hazards.
const (
	// CautionFlammable goes with hydrogen, alone or in a mixture.
	CautionFlammable = "Hydrogen burns and explodes in air over a wide range of concentrations, and a leak can ignite without a visible flame. A release into a room is a fire and explosion hazard long before the oxygen falls: ventilate to the outside, keep ignition sources away and use a hydrogen detector. A stored-energy figure counts the pressure energy only, not the energy of combustion."

	// CautionCarbonDioxide goes with carbon dioxide.
	CautionCarbonDioxide = "Carbon dioxide is toxic: it harms at concentrations far below those that lower the oxygen to 19.5 %, so the oxygen figure understates the hazard. It is heavier than air and collects low down. Use a carbon dioxide detector as well as an oxygen monitor."
)

// GasCautions returns the cautions that the gas m brings beyond
// asphyxiation and stored pressure energy: CautionFlammable when it holds
// hydrogen, CautionCarbonDioxide when it holds carbon dioxide, nothing for
// the noble gases, nitrogen and air.
func GasCautions(m gasprops.Mixture) []string {
	var out []string
	for _, c := range m.Components() {
		if c.Species == nil || c.X <= 0 {
			continue
		}
		switch c.Species.Name {
		case "hydrogen":
			out = append(out, CautionFlammable)
		case "carbon dioxide":
			out = append(out, CautionCarbonDioxide)
		}
	}
	return out
}
