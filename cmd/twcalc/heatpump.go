package main

import (
	"errors"
	"fmt"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// heatPumpCautions are printed with every heat-pump result.
func heatPumpCautions(r *report, d *linear.Device, driverPressure float64) {
	r.caution(fmt.Sprintf("Sound: the drive amplitude of %s inside the tube is a very high sound level; a leak or an open end is dangerous to hearing. Wear hearing protection and check the level with twcalc spl.", units.Format(driverPressure, units.DimPressure)))
	r.caution(fmt.Sprintf("Pressure: the device is charged to %s absolute; the vessel and the driver housing must be rated for it. Defer to local pressure-vessel codes and licensed practice.", inUnit(d.MeanPressure, units.DimPressure, "bar")))
	r.caution("Cold parts below about 0 degC frost over and can stick to skin; the driver's coil gets hot when driven hard.")
	r.caution("This is a linear estimate without heat leaks through the walls or the solid of the stack; measured spans are smaller.")
}

// runHeatPump is `twcalc heatpump`: the cold-end temperature, span, acoustic
// power and COP of a driven device, and the span against drive frequency.
func runHeatPump(args []string) (*report, error) {
	fl := newFlags("heatpump")
	example := deviceArgs(fl)
	freqText := fl.str("frequency", "", "drive frequency, e.g. 400Hz (default: the driver's \"frequency\" in the file)")
	load := fl.quantity("load", units.DimPower, "0 W", "cooling load taken from the cold side, e.g. 0.5W")
	sweep := fl.span("sweep-frequency", units.DimFrequency, "span against drive frequency as CSV, e.g. 300Hz:480Hz:19")
	profile := fl.boolean("profile", "print the profile along the device as CSV (x, |p1|, |U1|, phase, Tm, acoustic power)")
	fl.describe(`The device file is the same JSON as for twcalc onset; its first part is a
"driver" with "pressure_amplitude" or "volume_velocity_amplitude" and
"frequency"; the stack has one neighbour at "ambient" and the parts on the
other side at "cold".
examples:
  twcalc heatpump --example heatpump --json
  twcalc heatpump mypump.json --load 0.2W
  twcalc heatpump --example heatpump --sweep-frequency 300Hz:480Hz:19`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	freq, err := optionalQuantity("frequency", *freqText, units.DimFrequency)
	if err != nil {
		return nil, err
	}
	if load.Value < 0 {
		return nil, badInput("load", fl.typed("load"), errors.New("must be zero or positive"))
	}
	d, name, err := loadDevice(fl, *example)
	if err != nil {
		return nil, err
	}
	drv := d.Driver()
	if drv == nil {
		return nil, &usageError{msg: name + ": the first part must be a driver for a heat pump"}
	}
	r := newReport()
	deviceInputs(r, d, name)
	r.inputQuantity("load", *load, fl.typed("load"))
	hs := &linear.HeatPumpSettings{Frequency: freq.Value, CoolingLoad: load.Value}
	if sweep.Set {
		if *profile {
			return nil, &usageError{msg: "--sweep-frequency cannot be combined with --profile"}
		}
		var rows [][]float64
		maxP := drv.PressureAmplitude
		for _, p := range linear.SpanVsFrequency(d, sweep.values(), hs) {
			if p.Err != nil {
				r.warn(fmt.Sprintf("%s: %v", units.Format(p.Frequency, units.DimFrequency), p.Err))
				continue
			}
			x := p.Result
			rows = append(rows, []float64{p.Frequency, x.ColdTemperature, x.TemperatureSpan, x.AcousticPower, x.DriverPressure})
			maxP = max(maxP, x.DriverPressure)
		}
		if len(rows) == 0 {
			return nil, errors.New("heatpump: no point of the sweep converged")
		}
		r.table([]string{"frequency_Hz", "cold_temperature_K", "temperature_span_K", "acoustic_power_W", "driver_pressure_amplitude_Pa"}, rows)
		heatPumpCautions(r, d, maxP)
		return r, nil
	}
	res, err := linear.HeatPump(d, hs)
	if err != nil {
		return nil, solveError(err)
	}
	r.add("frequency", res.Frequency, units.DimFrequency)
	r.add("cold_temperature", res.ColdTemperature, units.DimTemperature)
	r.add("temperature_span", res.TemperatureSpan, units.DimTemperatureDifference)
	r.add("acoustic_power", res.AcousticPower, units.DimPower)
	r.add("cop", res.COP, units.DimNone)
	r.add("cop_relative_to_carnot", res.COPRelative, units.DimNone)
	r.add("driver_pressure_amplitude", res.DriverPressure, units.DimPressure)
	r.add("driver_volume_velocity_amplitude", res.DriverFlow, units.DimVolumeFlow)
	r.addValue("iterations", res.Iterations)
	if ss := res.ShortStack; ss != nil {
		r.add("short_stack_zero_load_span", ss.ZeroLoadSpan, units.DimTemperatureDifference)
		addShortStack(r, ss)
	}
	if load.Value == 0 {
		r.warn("at zero load the COP is zero by definition; give --load to see the COP against Carnot")
	}
	for _, w := range res.Warnings {
		r.warn(w)
	}
	if *profile {
		r.table(profileHeader, profileRows(&res.Profile))
	}
	heatPumpCautions(r, d, res.DriverPressure)
	return r, nil
}
