package main

import (
	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// runPlacement is `twcalc placement`: where a short stack sits in a plane
// standing wave and what that means: kx, the heat-flux and viscous-loss
// factors, the critical temperature gradient and difference, the gas
// displacement for a drive ratio and the heat exchanger length rule.
func runPlacement(args []string) (*report, error) {
	fl := newFlags("placement")
	op := declarePoreOperating(fl)
	centre := fl.quantity("centre", units.DimLength, "", "stack centre, measured from the nearest pressure antinode (a closed end): 20mm")
	length := fl.quantity("stack-length", units.DimLength, "0m", "stack length along the tube: 20mm")
	drive := fl.quantity("drive-ratio", units.DimNone, "0", "pressure amplitude at the pressure antinode over the mean pressure: 0.02 or 2%")
	device := fl.choice("device", []string{"engine", "heat-pump"}, "engine", "what the stack is for, for the position advice (heat-pump includes refrigerators)")
	fl.describe(`Short-stack standing-wave estimates (Swift, JASA 84, 1145, 1988); see the rules
in the output. For a full onset calculation use the onset solver.

examples:
  twcalc placement --gas air --temperature 300K --frequency 500Hz --centre 25mm --stack-length 20mm --drive-ratio 2%
  twcalc placement --gas helium --temperature 300K --pressure 10bar --frequency 100Hz --centre 0.3m --stack-length 80mm --json`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	props, err := op.properties(fl, op.temp.Value, op.pres.Value)
	if err != nil {
		return nil, err
	}
	pl, err := pore.PlaceStack(pore.PlacementInput{
		SoundSpeed: props.SoundSpeed, Density: props.Density, Gamma: props.Gamma,
		MeanTemperature: op.temp.Value, MeanPressure: op.pres.Value, Frequency: op.freq.Value,
		Centre: centre.Value, Length: length.Value, DriveRatio: drive.Value,
	})
	if err != nil {
		return nil, placementBlame(fl, err)
	}
	r := newReport()
	echoGiven(fl, r, "stack-length", "drive-ratio")
	r.add("wavelength", pl.Wavelength, units.DimLength)
	r.add("wavenumber", pl.K, units.DimPerLength)
	r.add("kx", pl.KX, units.DimNone)
	r.add("k_stack_length", pl.KLength, units.DimNone)
	r.add("lambda_eighth", pl.LambdaEighth, units.DimLength)
	r.add("heat_flux_factor", pl.HeatFluxFactor, units.DimNone)
	r.add("viscous_loss_factor", pl.ViscousFactor, units.DimNone)
	addWithUnit(r, "critical_gradient", pl.CriticalGradient, "K/m", units.Format(pl.CriticalGradient, units.DimNone)+" K/m")
	if length.Value > 0 {
		r.add("critical_temperature_difference", pl.CriticalDifference, units.DimTemperatureDifference)
	}
	if drive.Value > 0 {
		r.add("displacement_amplitude", pl.Displacement, units.DimLength)
		r.add("exchanger_length", pl.ExchangerLength, units.DimLength)
	}
	dev, _ := pore.ParseDevice(*device)
	r.addValue("position_advice", pore.PositionAdvice(dev, pl))
	r.addValue("rules", pl.Rules)
	for _, w := range pl.Warnings {
		r.warn(w)
	}
	for _, w := range props.Warnings {
		r.warn(w)
	}
	for _, c := range pl.Cautions {
		r.caution(c)
	}
	return r, nil
}

// placementBlame maps the calculator's field names to our flags.
func placementBlame(fl *flags, err error) error {
	if f, ok := rangeField(err); ok {
		switch f {
		case "stack centre", "stack centre kx":
			return badInput("centre", fl.typed("centre"), err)
		case "stack length":
			return badInput("stack-length", fl.typed("stack-length"), err)
		case "drive ratio":
			return badInput("drive-ratio", fl.typed("drive-ratio"), err)
		}
	}
	return fl.blame(err)
}

// addWithUnit records a numeric result whose unit has no units.Dimension
// (K/m), in the same JSON form as report.add.
func addWithUnit(r *report, name string, v float64, unit, shown string) {
	if !finite(v) {
		r.fail("internal: result %s is not finite", name)
		return
	}
	r.put(&r.results, "result", name, resultJSON{Value: v, Unit: unit}, shown)
}
