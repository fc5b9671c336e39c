package main

import (
	"fmt"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// runEnergy is `twcalc energy`: the energy stored in a gas charge
// (isentropic expansion and Brode values), its TNT equivalent and a hazard
// tier, from calc/safety with γ from gasprops.
func runEnergy(args []string) (*report, error) {
	fl := newFlags("energy")
	gas := fl.gas("gas", "", "working gas or mixture: helium, argon, helium:0.7,argon:0.3")
	pres := fl.quantity("pressure", units.DimPressure, "", "charge pressure: 30barg (gauge) or 31bar (absolute)")
	vol := fl.quantity("volume", units.DimVolume, "", "gas volume of the vessel: 50L, 0.05m3")
	temp := fl.quantity("temperature", units.DimTemperature, "20degC", "gas temperature")
	amb := fl.quantity("ambient", units.DimPressure, "1atm", "absolute pressure the gas would expand to")
	fl.describe(`The isentropic value is the work of reversible adiabatic expansion to the
ambient pressure; the Brode value (p − pa) V/(γ − 1) is larger. The TNT
equivalent uses 4.184 MJ per kg of TNT.

examples:
  twcalc energy --gas helium --pressure 30barg --volume 50L
  twcalc energy --gas argon --pressure 10bar --volume 2L --temperature 400degC --json`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	if pres.Value <= amb.Value {
		return nil, badInput("pressure", fl.typed("pressure"), fmt.Errorf("is not above the ambient %s absolute: no energy is stored", units.Format(amb.Value, units.DimPressure)))
	}
	e, warns, err := safety.GasExpansionEnergy(*gas, units.Temperature(temp.Value), units.Pressure(pres.Value), units.Pressure(amb.Value), vol.Value)
	if err != nil {
		return nil, fl.blame(err, "pressure", "volume", "temperature", "ambient")
	}
	r := newReport()
	fl.echo(r)
	r.inputSI("pressure_absolute", pres.Value, units.DimPressure)
	r.add("stored_energy", e.Isentropic, units.DimEnergy)
	r.add("brode_energy", e.Brode, units.DimEnergy)
	r.add("tnt_equivalent", e.TNTMass, units.DimMass)
	r.add("tnt_equivalent_brode", e.TNTBrode, units.DimMass)
	r.addValue("tnt_convention", "4.184 MJ per kg of TNT")
	r.add("gamma", e.Gamma, units.DimNone)
	r.addValue("hazard_tier", e.Tier.Label())
	r.addValue("hazard_advice", e.Tier.Advice())
	for _, w := range warns {
		r.warn(w)
	}
	for _, c := range e.Cautions {
		r.caution(c)
	}
	return r, nil
}
