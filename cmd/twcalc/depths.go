package main

import (
	"math"

	"tubewright/calc/pore"
	"tubewright/calc/uncertain"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// poreOperating holds the gas and operating-point flags shared by twcalc
// depths, pores and placement.
type poreOperating struct {
	gas      *gasprops.Mixture
	temp     *units.Quantity
	pres     *units.Quantity
	freq     *units.Quantity
	nonIdeal *bool
}

// declarePoreOperating declares --gas, --temperature, --pressure,
// --frequency and --non-ideal on fl.
func declarePoreOperating(fl *flags) poreOperating {
	return poreOperating{
		gas:      fl.gas("gas", "", "working gas, or a mixture by mole fraction: helium, He, helium:0.7,argon:0.3"),
		temp:     fl.quantity("temperature", units.DimTemperature, "", "mean gas temperature at the stack: 300K, 27degC, 80degF"),
		pres:     fl.quantity("pressure", units.DimPressure, "1atm", "mean pressure, absolute (10bar, 145psi) or gauge (30barg)"),
		freq:     fl.quantity("frequency", units.DimFrequency, "", "operating frequency: 100Hz, 1.2kHz; a ± is carried to the results (440Hz+-5Hz)"),
		nonIdeal: fl.boolean("non-ideal", "correct density and sound speed with the second virial coefficient"),
	}
}

// properties evaluates the gas at the operating point.
func (op poreOperating) properties(fl *flags, T, p float64) (gasprops.Properties, error) {
	var opts *gasprops.Options
	if *op.nonIdeal {
		opts = &gasprops.Options{NonIdeal: true}
	}
	props, err := op.gas.Properties(units.Temperature(T), units.Pressure(p), opts)
	if err != nil {
		return props, fl.blame(err, "temperature", "pressure")
	}
	return props, nil
}

// depths evaluates the gas at the typed operating point and returns its
// properties and penetration depths; errors name the flag at fault.
func (op poreOperating) depths(fl *flags) (props gasprops.Properties, dk, dn float64, err error) {
	props, err = op.properties(fl, op.temp.Value, op.pres.Value)
	if err != nil {
		return props, 0, 0, err
	}
	dk, dn, err = pore.PenetrationDepths(props, op.freq.Value)
	if err != nil {
		return props, 0, 0, fl.blame(err, "frequency")
	}
	return props, dk, dn, nil
}

// runDepths is `twcalc depths`: the thermal and viscous penetration depths
// of a gas at a temperature, mean pressure and frequency, and the
// wavelength. A ± on temperature, pressure or frequency is carried to the
// results to first order.
func runDepths(args []string) (*report, error) {
	fl := newFlags("depths")
	op := declarePoreOperating(fl)
	fl.describe(`δκ = √(2k/(ωρcp)), δν = √(2μ/(ωρ)); Rott's theory as in Swift,
Thermoacoustics: A Unifying Perspective (2002), ch. 4.

examples:
  twcalc depths --gas helium --temperature 300K --pressure 10bar --frequency 100Hz
  twcalc depths --gas air --temperature 20degC --frequency 440Hz+-5Hz --json`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	props, dk, dn, err := op.depths(fl)
	if err != nil {
		return nil, err
	}
	vals := []float64{dk, dn, props.SoundSpeed / op.freq.Value}
	sig := make([]float64, len(vals))
	x := []float64{op.temp.Value, op.pres.Value, op.freq.Value}
	u := []float64{op.temp.Uncertainty, op.pres.Uncertainty, op.freq.Uncertainty}
	if u[0] > 0 || u[1] > 0 || u[2] > 0 {
		// first order (GUM, JCGM 100:2008, eq. 10); NaN where the ± leaves the model
		_, sig = uncertain.PropagateN(func(x, out []float64) {
			q, err := op.properties(fl, x[0], x[1])
			if err != nil || !(x[2] > 0) {
				for k := range out {
					out[k] = math.NaN()
				}
				return
			}
			a, b := pore.Depths(q, x[2])
			out[0], out[1], out[2] = a, b, q.SoundSpeed/x[2]
		}, x, u, len(vals))
	}
	r := newReport()
	fl.echo(r)
	names := []string{"thermal_penetration_depth", "viscous_penetration_depth", "wavelength"}
	for k, name := range names {
		s := sig[k]
		if !finite(s) {
			r.warn("the uncertainty of " + name + " could not be estimated (the ± reaches outside the gas model); shown without it")
			s = 0
		}
		r.addPM(name, vals[k], s, units.DimLength)
	}
	r.add("prandtl", props.Prandtl, units.DimNone)
	for _, w := range props.Warnings {
		r.warn(w)
	}
	return r, nil
}

// echoGiven is fl.echo without the optional flags the user did not type
// (the shape flags of twcalc pores all have a "0" default that only means
// "not given").
func echoGiven(fl *flags, r *report, optional ...string) {
	var keep []*flagDef
	for _, d := range fl.defs {
		if d.count == 0 && contains(optional, d.name) {
			continue
		}
		keep = append(keep, d)
	}
	all := fl.defs
	fl.defs = keep
	fl.echo(r)
	fl.defs = all
}
