package main

import (
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// runGas is `twcalc gas`: the thermophysical properties of a working gas or
// a mixture at one temperature and mean pressure, from gasprops (the same
// call the app's gas screen makes).
func runGas(args []string) (*report, error) {
	fl := newFlags("gas")
	gas := fl.gas("gas", "", "working gas, or a mixture by mole fraction: helium, He, helium:0.7,argon:0.3")
	temp := fl.quantity("temperature", units.DimTemperature, "", "gas temperature: 300K, 27degC, 80degF")
	pres := fl.quantity("pressure", units.DimPressure, "1atm", "mean absolute pressure: 10bar, 30barg, 145psi, 1.2MPa")
	nonIdeal := fl.boolean("non-ideal", "correct density and sound speed with the second virial coefficient")
	fl.describe(`examples:
  twcalc gas --gas helium --temperature 300K --pressure 10bar
  twcalc gas --gas helium:0.7,argon:0.3 --temperature 27degC --pressure 30barg --json`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	var opts *gasprops.Options
	if *nonIdeal {
		opts = &gasprops.Options{NonIdeal: true}
	}
	p, err := gas.Properties(units.Temperature(temp.Value), units.Pressure(pres.Value), opts)
	if err != nil {
		return nil, fl.blame(err, "temperature", "pressure")
	}
	r := newReport()
	fl.echo(r)
	r.input("mixture", gas.String())
	r.add("molar_mass", p.MolarMass, units.DimMolarMass)
	r.add("density", p.Density, units.DimDensity)
	r.add("sound_speed", p.SoundSpeed, units.DimSpeed)
	r.add("isobaric_specific_heat", p.IsobaricSpecificHeat, units.DimSpecificHeat)
	r.add("gamma", p.Gamma, units.DimNone)
	r.add("viscosity", p.Viscosity, units.DimDynamicViscosity)
	r.add("thermal_conductivity", p.ThermalConductivity, units.DimThermalConductivity)
	r.add("thermal_diffusivity", p.ThermalDiffusivity, units.DimDiffusivity)
	r.add("kinematic_viscosity", p.KinematicViscosity, units.DimKinematicViscosity)
	r.add("prandtl", p.Prandtl, units.DimNone)
	for _, w := range p.Warnings {
		r.warn(w)
	}
	return r, nil
}
