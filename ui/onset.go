package ui

import (
	"context"
	"fmt"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// onsetScreen builds an engine from parts and shows the hot temperature
// and frequency at which it starts, the profiles along it and the onset
// temperature against mean pressure. Every valid edit starts a new solve off
// the UI goroutine; a newer edit cancels the stale one.
type onsetScreen struct {
	deviceView
	probe *Field // a hot temperature at which to show growth or decay
	job   *Job[*onsetOutcome]
}

// onsetOutcome is what one solve produces.
type onsetOutcome struct {
	dev   *linear.Device
	onset *linear.OnsetResult
	sweep []linear.PressurePoint
	probe float64            // K, 0 when none
	mode  *linear.ModeResult // nearest mode at probe
	merr  error
}

// newOnsetScreen builds the onset screen with the example engine.
func newOnsetScreen(env *Env) Screen {
	return &onsetScreen{
		deviceView: newDeviceView(env, "engine", "Hot parts, pressure and sound", 5),
		probe:      NewField(env, "Check a hot temperature below or above onset", units.DimTemperature, "500 K"),
		job:        NewJob[*onsetOutcome](env.Invalidate),
	}
}

// Title implements Screen.
func (s *onsetScreen) Title() string { return "Engine onset" }

// Leave cancels a running solve.
func (s *onsetScreen) Leave() { s.job.Cancel() }

// sweepPressures are the mean pressures of the onset sweep: an eighth to
// four times the device's, geometric.
func sweepPressures(pm float64) []float64 { return linear.Grid(pm/8, pm*4, 15, true) }

// solveOnset is the job: onset with profiles, then the pressure sweep, one
// point at a time so that a cancelled job stops early.
func solveOnset(ctx context.Context, d *linear.Device, probe float64) (*onsetOutcome, error) {
	r, err := linear.Onset(d, nil)
	if err != nil {
		return nil, err
	}
	out := &onsetOutcome{dev: d, onset: r, probe: probe}
	if probe > 0 {
		out.mode, out.merr = linear.Mode(d, probe, &linear.Settings{FrequencyGuess: r.Frequency, NoProfile: true})
	}
	set := &linear.Settings{HotGuess: r.HotTemperature, FrequencyGuess: r.Frequency}
	for _, p := range sweepPressures(d.MeanPressure) {
		if err := ctx.Err(); err != nil {
			return nil, err
		}
		pt := linear.OnsetVsPressure(d, []float64{p}, set)[0]
		out.sweep = append(out.sweep, pt)
	}
	return out, nil
}

// start validates the editor's device and starts a solve, or shows why not.
func (s *onsetScreen) start() {
	d, err := s.editor.File().Validate()
	if err != nil {
		s.job.Cancel()
		s.fail(err)
		return
	}
	s.solving(d)
	probe, _ := s.probe.Value()
	s.job.Start(func(ctx context.Context) (*onsetOutcome, error) { return solveOnset(ctx, d, probe) })
}

// show fills results, cautions and plots from a finished solve.
func (s *onsetScreen) show(o *onsetOutcome, err error) {
	if err != nil {
		s.fail(err)
		return
	}
	s.done()
	r := s.results
	res := o.onset
	r.AddIn("Hot temperature at onset", res.HotTemperature, "K")
	if c, err := units.FormatIn(res.HotTemperature, "degC"); err == nil {
		r.AddNote("= " + c + "; the parts marked hot must reach this before the engine starts")
	}
	r.Add("Frequency", res.Frequency, units.DimFrequency)
	r.Add("Hot / ambient temperature", res.TemperatureRatio, units.DimNone)
	r.AddText("Newton iterations", fmt.Sprint(res.Iterations))
	shortStackRows(r, res.ShortStack, false)
	switch {
	case o.probe <= 0:
	case o.merr != nil:
		r.AddText("At "+units.Format(o.probe, units.DimTemperature), "no mode found")
		r.AddNote(o.merr.Error())
	default:
		verdict := "the sound decays"
		if o.mode.Growing {
			verdict = "the sound grows"
		}
		r.AddText("At "+units.Format(o.probe, units.DimTemperature), verdict)
		r.AddNote(fmt.Sprintf("nearest mode %s, growth rate %s, Q %s", units.Format(o.mode.Frequency, units.DimFrequency),
			units.Format(o.mode.GrowthRate, units.DimRate), modeQText(o.mode.Q)))
	}
	r.Warn(res.Warnings...)
	s.caution.Lines = []string{
		"Hot parts: the hot end must reach about " + units.Format(res.HotTemperature, units.DimTemperature) + " before the engine starts. Heaters, exchangers and walls at this temperature burn skin and can ignite nearby material; let them cool before touching.",
		"Pressure: the device is charged to " + pressureText(o.dev.MeanPressure) + " absolute. The vessel must be rated for it at the hot temperature; use the Safety pass and defer to local pressure-vessel codes and licensed practice.",
		"Sound: a running engine can be very loud; wear hearing protection near it.",
		"A linear estimate: heat leaks, streaming and construction change real onset; approach it slowly.",
	}
	setProfilePlots(s.plots[:4], &res.Profile)
	var xy XYs
	for _, p := range o.sweep {
		if p.Err == nil {
			xy = append(xy, XY{X: p.Pressure / 1e5, Y: p.HotTemperature})
		}
	}
	pp := lineXY(xy, "Mean pressure", "bar", "Onset hot temperature", "K", "Onset against mean pressure")
	if pp != nil {
		// Pressures are spaced geometrically: a log axis shows the U.
		pp.X.Log = true
	}
	s.plots[4].Set(pp)
}

// modeQText formats a quality factor; at onset it is unbounded.
func modeQText(q float64) string {
	if q > 1e12 {
		return "unbounded (at onset)"
	}
	return units.Format(q, units.DimNone)
}

// pressureText is "8 bar (800 kPa)"-style text.
func pressureText(p float64) string {
	b, err := units.FormatIn(p, "bar")
	if err != nil {
		return units.Format(p, units.DimPressure)
	}
	return b
}

// setProfilePlots draws |p1|, |U1|, Tm and acoustic power along x.
func setProfilePlots(plots []*Plot, pr *linear.Profile) {
	cols := []struct {
		y           []float64
		label, unit string
	}{
		{pr.PressureAmp, "|p1|", "Pa"},
		{pr.FlowAmp, "|U1|", "m³/s"},
		{pr.Temperature, "Mean temperature Tm", "K"},
		{pr.AcousticPower, "Acoustic power", "W"},
	}
	for i, c := range cols {
		if i >= len(plots) {
			break
		}
		xy := make(XYs, len(pr.X))
		for k := range pr.X {
			xy[k] = XY{X: pr.X[k], Y: c.y[k]}
		}
		plots[i].Set(lineXY(xy, "Position from the start end", "m", c.label, c.unit, c.label+" along the device"))
	}
}

// lineXY is a titled line plot; nil when there are fewer than two points.
func lineXY(xy XYs, xl, xu, yl, yu, title string) *Chart {
	if len(xy) < 2 {
		return nil
	}
	p := NewXYPlot(xl, xu, yl, yu)
	p.Title = title
	p.AddLine(xy)
	return p
}

// Layout implements Screen.
func (s *onsetScreen) Layout(gtx layout.Context) layout.Dimensions {
	if s.job.Poll() {
		s.show(s.job.Result())
	}
	changed := s.editor.Update(gtx)
	if s.probe.Update(gtx) {
		changed = true
	}
	if changed {
		s.start()
	}
	ws := s.top(gtx, "Build the engine from parts, closed end first. The hot temperature and frequency at which it starts are solved with Rott's linear theory after every change.",
		"Onset", s.probe)
	ws = append(ws, Heading(s.env, "Along the device at onset"))
	for _, p := range s.plots[:4] {
		ws = append(ws, p.Layout)
	}
	ws = append(ws, Note(s.env, "Profiles for |p1| = 1 Pa at the start end: the linear theory fixes shapes, not amplitudes."))
	ws = append(ws, Heading(s.env, "Onset and fill pressure"), s.plots[4].Layout)
	ws = append(ws, Note(s.env, "Method: Rott's linear wave equations for p1 and U1 with the thermoviscous functions of each part (Swift 2002, ch. 4), integrated part by part; onset is the hot temperature and real frequency that meet the far-end condition."))
	return s.page.Layout(gtx, ws...)
}
