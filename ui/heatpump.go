package ui

import (
	"context"
	"fmt"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// heatPumpScreen builds a driven heat pump from parts and shows the cold
// temperature, the span, the acoustic power, the COP against Carnot, the
// profiles and the span against drive frequency. Solves run off the UI
// goroutine; a newer edit cancels a stale one.
type heatPumpScreen struct {
	deviceView
	load *Field
	job  *Job[*pumpOutcome]
}

// pumpOutcome is what one heat-pump solve produces.
type pumpOutcome struct {
	dev   *linear.Device
	res   *linear.HeatPumpResult
	sweep []linear.FrequencyPoint
}

// newHeatPumpScreen builds the heat-pump screen with the example pump.
func newHeatPumpScreen(env *Env) Screen {
	s := &heatPumpScreen{
		deviceView: newDeviceView(env, "heatpump", "Sound, pressure and cold parts", 4),
		load:       NewField(env, "Cooling load at the cold side", units.DimPower, "0 W"),
		job:        NewJob[*pumpOutcome](env.Invalidate),
	}
	s.load.Hint = "W or mW; 0 for the zero-load span"
	return s
}

// Title implements Screen.
func (s *heatPumpScreen) Title() string { return "Heat pump span" }

// Leave cancels a running solve.
func (s *heatPumpScreen) Leave() { s.job.Cancel() }

// solvePump is the job: the heat pump at the driver's frequency, then the
// span from 0.8 to 1.2 times that frequency, point by point.
func solvePump(ctx context.Context, d *linear.Device, load float64) (*pumpOutcome, error) {
	r, err := linear.HeatPump(d, &linear.HeatPumpSettings{CoolingLoad: load})
	if err != nil {
		return nil, err
	}
	out := &pumpOutcome{dev: d, res: r}
	for _, f := range linear.Grid(0.8*r.Frequency, 1.2*r.Frequency, 17, false) {
		if err := ctx.Err(); err != nil {
			return nil, err
		}
		out.sweep = append(out.sweep, linear.SpanVsFrequency(d, []float64{f}, &linear.HeatPumpSettings{CoolingLoad: load})...)
	}
	return out, nil
}

func (s *heatPumpScreen) start() {
	d, err := s.editor.File().Validate()
	if err == nil && s.load.ErrorText() != "" {
		err = fmt.Errorf("%s", s.load.ErrorText())
	}
	load, _ := s.load.Value()
	if err == nil && load < 0 {
		err = fmt.Errorf("cooling load %s must be zero or positive", s.load.Text())
	}
	if err != nil {
		s.job.Cancel()
		s.fail(err)
		return
	}
	s.solving(d)
	s.job.Start(func(ctx context.Context) (*pumpOutcome, error) { return solvePump(ctx, d, load) })
}

func (s *heatPumpScreen) show(o *pumpOutcome, err error) {
	if err != nil {
		s.fail(err)
		return
	}
	s.done()
	r := s.results
	x := o.res
	r.AddIn("Cold temperature", x.ColdTemperature, "K")
	if c, err := units.FormatIn(x.ColdTemperature, "degC"); err == nil {
		r.AddNote("= " + c)
	}
	r.Add("Temperature span", x.TemperatureSpan, units.DimTemperatureDifference)
	r.Add("Acoustic power from the driver", x.AcousticPower, units.DimPower)
	if x.CoolingLoad > 0 {
		r.Add("COP", x.COP, units.DimNone)
		r.Add("COP / Carnot COP", x.COPRelative, units.DimNone)
	} else {
		r.AddText("COP / Carnot COP", "0 at zero load")
		r.AddNote("give a cooling load to see the COP")
	}
	r.Add("Drive frequency", x.Frequency, units.DimFrequency)
	r.Add("Pressure amplitude at the driver", x.DriverPressure, units.DimPressure)
	r.AddIn("Volume-velocity amplitude at the driver", x.DriverFlow, "L/s")
	shortStackRows(r, x.ShortStack, true)
	r.Warn(x.Warnings...)
	s.caution.Lines = []string{
		"Sound: " + units.Format(x.DriverPressure, units.DimPressure) + " of pressure amplitude in the tube is a very high sound level; a leak or an open end can harm hearing. Wear hearing protection; check the level on the Safety pass.",
		"Pressure: the device is charged to " + pressureText(o.dev.MeanPressure) + " absolute; the vessel and the driver housing must be rated for it. Defer to local codes and licensed practice.",
		"Cold parts below 0 °C frost over and can stick to skin; the driver's coil gets hot when driven hard.",
		"A linear estimate without heat leaks through walls or the stack's solid: measured spans are smaller.",
	}
	pr := &x.Profile
	tm := make(XYs, len(pr.X))
	pa := make(XYs, len(pr.X))
	e2 := make(XYs, len(pr.X))
	for k := range pr.X {
		tm[k] = XY{X: pr.X[k], Y: pr.Temperature[k]}
		pa[k] = XY{X: pr.X[k], Y: pr.PressureAmp[k]}
		e2[k] = XY{X: pr.X[k], Y: pr.AcousticPower[k]}
	}
	s.plots[0].Set(lineXY(tm, "Position from the driver", "m", "Mean temperature Tm", "K", "Mean temperature along the device"))
	s.plots[1].Set(lineXY(pa, "Position from the driver", "m", "|p1|", "Pa", "Pressure amplitude along the device"))
	s.plots[2].Set(lineXY(e2, "Position from the driver", "m", "Acoustic power", "W", "Acoustic power along the device"))
	var sp XYs
	for _, p := range o.sweep {
		if p.Err == nil {
			sp = append(sp, XY{X: p.Frequency, Y: p.Result.TemperatureSpan})
		}
	}
	s.plots[3].Set(lineXY(sp, "Drive frequency", "Hz", "Span", "K", "Span against drive frequency"))
}

// Layout implements Screen.
func (s *heatPumpScreen) Layout(gtx layout.Context) layout.Dimensions {
	if s.job.Poll() {
		s.show(s.job.Result())
	}
	changed := s.editor.Update(gtx)
	if s.load.Update(gtx) {
		changed = true
	}
	if changed {
		s.start()
	}
	ws := s.top(gtx, "Build the heat pump from parts, driver first; mark the stack's cold side \"cold\". The span is solved with Rott's linear theory and the total-power equation through the stack after every change.",
		"Heat pump", s.load)
	ws = append(ws, Heading(s.env, "Along the device"), s.plots[0].Layout, s.plots[1].Layout, s.plots[2].Layout)
	ws = append(ws, Heading(s.env, "Best drive frequency"), s.plots[3].Layout)
	ws = append(ws, Note(s.env, "Method: Rott's linear wave equations (Swift 2002, ch. 4) with the total power through the stack held at minus the load (Swift 2002, ch. 7); zero load is the largest span. The cold side is taken as insulated."))
	return s.page.Layout(gtx, ws...)
}
