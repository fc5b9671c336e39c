package main

import (
	"math"

	"tubewright/calc/uncertain"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// runGas is `twcalc gas`: the thermophysical properties of a working gas or
// a mixture at one temperature and mean pressure, from gasprops (the same
// call the app's gas screen makes). A ± typed on the temperature or the
// pressure is carried to the results to first order.
func runGas(args []string) (*report, error) {
	fl := newFlags("gas")
	gas := fl.gas("gas", "", "working gas, or a mixture by mole fraction: helium, He, helium:0.7,argon:0.3")
	temp := fl.quantity("temperature", units.DimTemperature, "", "gas temperature: 300K, 27degC, 80degF")
	pres := fl.quantity("pressure", units.DimPressure, "1atm", "mean pressure, absolute (10bar, 145psi, 1.2MPa) or gauge (30barg, 435psig)")
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
	if name := gas.String(); name != fl.typed("gas") {
		r.input("mixture", name)
	}
	vals := gasValues(p)
	sigmas := make([]float64, len(vals))
	if temp.Uncertainty > 0 || pres.Uncertainty > 0 {
		// Carry the typed ± through, first order (GUM, JCGM 100:2008, eq. 10).
		// A perturbed state outside the model gives NaN for that sigma.
		_, sigmas = uncertain.PropagateN(func(x, out []float64) {
			q, err := gas.Properties(units.Temperature(x[0]), units.Pressure(x[1]), opts)
			if err != nil {
				for k := range out {
					out[k] = math.NaN()
				}
				return
			}
			copy(out, gasValues(q))
		}, []float64{temp.Value, pres.Value}, []float64{temp.Uncertainty, pres.Uncertainty}, len(vals))
	}
	for k, res := range gasResults {
		u := sigmas[k]
		if !finite(u) {
			r.warn("the uncertainty of " + res.name + " could not be estimated (the ± reaches outside the model); shown without it")
			u = 0
		}
		r.addPM(res.name, vals[k], u, res.dim)
	}
	for _, w := range p.Warnings {
		r.warn(w)
	}
	return r, nil
}

// gasResults names the results of twcalc gas in the order printed; the
// values come from gasValues in the same order.
var gasResults = []struct {
	name string
	dim  units.Dimension
}{
	{"molar_mass", units.DimMolarMass},
	{"density", units.DimDensity},
	{"sound_speed", units.DimSpeed},
	{"isobaric_specific_heat", units.DimSpecificHeat},
	{"gamma", units.DimNone},
	{"viscosity", units.DimDynamicViscosity},
	{"thermal_conductivity", units.DimThermalConductivity},
	{"thermal_diffusivity", units.DimDiffusivity},
	{"kinematic_viscosity", units.DimKinematicViscosity},
	{"prandtl", units.DimNone},
}

// gasValues lists p's properties in the order of gasResults.
func gasValues(p gasprops.Properties) []float64 {
	return []float64{p.MolarMass, p.Density, p.SoundSpeed, p.IsobaricSpecificHeat, p.Gamma,
		p.Viscosity, p.ThermalConductivity, p.ThermalDiffusivity, p.KinematicViscosity, p.Prandtl}
}
