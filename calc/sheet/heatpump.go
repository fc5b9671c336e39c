package sheet

import (
	"errors"
	"fmt"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// heatPumpSheet is the heat-pump calculator: the cold temperature, span,
// acoustic power and COP of a loudspeaker-driven device (calc/linear's
// HeatPump), or the span against drive frequency.
var heatPumpSheet = &Sheet{
	ID:      IDHeatPump,
	Title:   "Heat pump span",
	Summary: "Build a loudspeaker-driven heat pump from parts: cold temperature, span, acoustic power and COP, and the best drive frequency",
	Inputs: []Input{
		deviceInput(),
		exampleInput(),
		{Key: "load", Label: "Cooling load at the cold side", Kind: Quantity, Dim: units.DimPower, Default: "0 W",
			PM: true, Min: 0, Max: 1e6, Hint: "W or mW, e.g. 0.5 W; 0 for the zero-load span; ± or +- for an uncertainty"},
		{Key: "frequency", Label: "Drive at another frequency", Kind: Quantity, Dim: units.DimFrequency, Optional: true,
			Min: 0.1, Max: 1e6, Advanced: true, Hint: "e.g. 400 Hz (empty: the driver's own \"frequency\")"},
		{Key: "sweep-frequency", Label: "Span against drive frequency", Kind: Sweep, Dim: units.DimFrequency,
			Optional: true, Min: 0.1, Max: 1e6, Hint: "span against drive frequency as a table, FROM:TO[:N], e.g. 300Hz:480Hz:19"},
		profileInput(),
	},
	About: "Rott's linear wave equations (Swift 2002, ch. 4) with the total power through the stack held at minus the load (Swift 2002, ch. 7); " +
		"zero load is the largest span. The cold side is taken as insulated. " +
		fmt.Sprintf("The best drive frequency is the largest span, at the same driver amplitude and load, of %d frequencies within ±%g %% of the driver's own, refined by Brent's method on the slope of the span. ", bestPoints, 100*bestReach) + deviceFileHelp +
		` For a heat pump the first part is a "driver" with "pressure_amplitude" or "volume_velocity_amplitude" and "frequency"; the stack has one neighbour at "ambient" and the parts on the other side at "cold".`,
	Examples: []string{
		"twcalc heatpump --example heatpump --json",
		"twcalc heatpump mypump.json --load 0.2W",
		"twcalc heatpump --example heatpump --sweep-frequency 300Hz:480Hz:19",
	},
	Run: runHeatPump,
}

// pumpRows names the numeric rows of a heat-pump result in order;
// pumpValues lists the values in the same order.
var pumpRows = []struct {
	key, label string
	dim        units.Dimension
	show       string
}{
	{"cold_temperature", "Cold temperature", units.DimTemperature, "K"},
	{"temperature_span", "Temperature span", units.DimTemperatureDifference, ""},
	{"acoustic_power", "Acoustic power from the driver", units.DimPower, ""},
	{"cop", "COP", units.DimNone, ""},
	{"cop_relative_to_carnot", "COP / Carnot COP", units.DimNone, ""},
	{"frequency", "Drive frequency", units.DimFrequency, ""},
	{"driver_pressure_amplitude", "Pressure amplitude at the driver", units.DimPressure, ""},
	{"driver_volume_velocity_amplitude", "Volume-velocity amplitude at the driver", units.DimVolumeFlow, "L/s"},
}

func pumpValues(x *linear.HeatPumpResult) []float64 {
	return []float64{x.ColdTemperature, x.TemperatureSpan, x.AcousticPower, x.COP, x.COPRelative, x.Frequency,
		x.DriverPressure, x.DriverFlow}
}

func runHeatPump(v *Values) (*Result, error) {
	d, err := loadDevice(v)
	if err != nil {
		return nil, err
	}
	if d.Driver() == nil {
		return nil, v.Blame(errors.New("the first part must be a driver for a heat pump"), deviceSource(v))
	}
	load := v.Q("load")
	hs := &linear.HeatPumpSettings{Frequency: v.SI("frequency"), CoolingLoad: load.Value}
	hs.NoProfile = !v.On(keyProfile)
	r := &Result{}
	deriveDevice(r, d)
	if v.Has("sweep-frequency") {
		if v.On(keyProfile) {
			return nil, v.Blame(errors.New("cannot be combined with the profile"), "sweep-frequency")
		}
		return pumpSweep(r, d, v.Span("sweep-frequency").Points(), hs)
	}
	res, err := linear.HeatPump(d, hs)
	if err != nil {
		return nil, blameDevice(v, err)
	}
	quiet := *hs
	quiet.NoProfile = true
	vals := pumpValues(res)
	sig, ok := Spread(func(x, out []float64) error {
		q := quiet
		q.CoolingLoad = x[0]
		y, err := linear.HeatPump(d, &q)
		if err == nil {
			copy(out, pumpValues(y))
		}
		return err
	}, []float64{load.Value}, []float64{load.Uncertainty}, len(vals))
	for k, row := range pumpRows {
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		added := r.AddPM(row.key, row.label, vals[k], sig[k], row.dim)
		added.Show = row.show
		if c, err := units.FormatIn(res.ColdTemperature, "degC"); err == nil && row.key == "cold_temperature" {
			added.Note = "= " + c
		}
	}
	centre := res.Frequency
	if f := d.Driver().Frequency; f > 0 {
		centre = f
	}
	best, err := bestDrive(d, centre, quiet)
	if err != nil {
		return nil, blameDevice(v, err)
	}
	addBest(r, best, centre)
	iterationsRow(r, res.Iterations)
	shortStackRows(r, res.ShortStack, true)
	if load.Value == 0 {
		r.Warn("at zero load the COP is zero by definition; give a cooling load to see the COP against Carnot")
	}
	r.Warn(res.Warnings...)
	if v.On(keyProfile) {
		r.Table = profileTable(&res.Profile)
	}
	r.Caution(HeatPumpCautions(d.MeanPressure, res.DriverPressure)...)
	return r, nil
}

// pumpSweep is the heat pump at each drive frequency, as a table; a
// frequency whose solve fails is a warning.
func pumpSweep(r *Result, d *linear.Device, freqs []float64, hs *linear.HeatPumpSettings) (*Result, error) {
	t := &Table{Header: []string{"frequency_Hz", "cold_temperature_K", "temperature_span_K", "acoustic_power_W", "driver_pressure_amplitude_Pa"}}
	maxP := d.Driver().PressureAmplitude
	for _, p := range linear.SpanVsFrequency(d, freqs, hs) {
		if p.Err != nil {
			r.Warn(fmt.Sprintf("%s: %v", units.Format(p.Frequency, units.DimFrequency), p.Err))
			continue
		}
		x := p.Result
		t.Rows = append(t.Rows, []float64{p.Frequency, x.ColdTemperature, x.TemperatureSpan, x.AcousticPower, x.DriverPressure})
		maxP = max(maxP, x.DriverPressure)
	}
	if len(t.Rows) == 0 {
		return nil, errors.New("heat pump: no point of the sweep converged")
	}
	r.Table = t
	r.Caution(HeatPumpCautions(d.MeanPressure, maxP)...)
	return r, nil
}

// HeatPumpCautions are the cautions of every heat-pump result: the sound
// level inside (driverPressure, the pressure amplitude at the driver, Pa),
// the charge (meanPressure, Pa absolute), cold and hot parts, and the
// limits of the linear estimate.
func HeatPumpCautions(meanPressure, driverPressure float64) []string {
	return []string{
		fmt.Sprintf("Sound: the drive amplitude of %s inside the tube is a very high sound level; a leak or an open end can harm hearing. Wear hearing protection and check the level with the sound-level calculation.",
			units.Format(driverPressure, units.DimPressure)),
		fmt.Sprintf("Pressure: the device is charged to %s absolute; the vessel and the driver housing must be rated for it. Defer to local pressure-vessel codes and licensed practice.",
			withAlt(meanPressure, units.DimPressure, "bar")),
		"Cold parts below about 0 °C frost over and can stick to skin; the driver's coil gets hot when driven hard.",
		"This is a linear estimate without heat leaks through the walls or the solid of the stack; measured spans are smaller.",
	}
}
