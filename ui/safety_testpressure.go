package ui

import "tubewright/calc/safety"

// newTestStep is the pressure-test step: the vessel's reference test
// pressures from its MAWP, and the energy the gas charge stores at the
// MAWP and would store in a gas test. The charge and gas-test pressures
// follow the vessel's MAWP and pneumatic test pressure until typed.
func newTestStep(env *Env, f *safetyForms, item safety.Item) *sheetStep {
	s := newSheetStep(env, "Pressure tests and stored energy", item.Cautions,
		part(f.vessel, []string{"mawp", "stress-ratio"},
			[]string{"test_pressure_check", "mawp_used", "hydrostatic_test_pressure", "pneumatic_test_pressure", "eu_test_pressure", "test_pressure_basis"}),
		part(f.energy, []string{"volume", "gas", "pressure", "test-pressure"},
			[]string{"stored_energy", "brode_energy", "tnt_equivalent", "hazard_tier", "gas_test_energy"}),
	)
	s.parts[1].warnings = true
	charge := &carry{form: f.energy, key: "pressure", last: f.energy.Text("pressure")}
	test := &carry{form: f.energy, key: "test-pressure"}
	s.before = func() {
		r := f.vessel.Result()
		if p := gaugeRowText(r, "mawp_used"); p != "" {
			charge.set(p)
		}
		if p := gaugeRowText(r, "pneumatic_test_pressure"); p != "" {
			test.set(p)
		}
	}
	return s
}
