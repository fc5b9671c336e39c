package ui

import (
	"errors"
	"fmt"

	"gioui.org/layout"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// diagnoseScreen is "What the pitch says": from a measured resonance
// frequency and the tube, the mean gas temperature for a known gas, or the
// mole fraction of a second gas in the first at a known temperature.
type diagnoseScreen struct {
	env      *Env
	page     *Page
	side     *Page
	head     string
	find     *Choice
	tube     *tubeInputs
	measured *Field
	picker   *GasPicker
	first    *Choice
	second   *Choice
	temp     *Field
	press    *Field
	results  *Results
	plot     *Plot
	dirty    bool
}

func newDiagnoseScreen(env *Env) Screen {
	names := gasprops.Names()
	s := &diagnoseScreen{
		env:  env,
		page: NewPage(env),
		side: NewPage(env),
		find: NewChoice(env, "Find", []string{"temperature", "fraction"},
			[]string{"Mean gas temperature", "Fraction of a second gas"}),
		tube:     newTubeInputs(env, "600 mm", "12 mm"),
		measured: NewField(env, "Measured resonance frequency", units.DimFrequency, "140 Hz ± 2 Hz"),
		picker:   NewGasPicker(env, "air"),
		first:    NewChoice(env, "Main gas", names, capitalizeAll(names)),
		second:   NewChoice(env, "Second gas (contaminant or admixture)", names, capitalizeAll(names)),
		temp:     NewField(env, "Known gas temperature", units.DimTemperature, "20 degC"),
		press:    NewField(env, "Mean pressure", units.DimPressure, "1 atm"),
		results:  NewResults(env),
		plot:     NewPlot(env),
		dirty:    true,
	}
	s.first.Select("helium")
	s.second.Select("argon")
	s.measured.Hint = "as read from the analyser, with its ±: 140 Hz ± 2 Hz"
	s.temp.Options.DefaultUnit = "K"
	s.plot.Height = 240
	return s
}

// Title implements Screen.
func (s *diagnoseScreen) Title() string { return "What the pitch says" }

// Enter takes the gas and pressure last used elsewhere.
func (s *diagnoseScreen) Enter() {
	if takeBench(s.env.Bench, s.picker, nil, s.press) {
		s.dirty = true
	}
}

func (s *diagnoseScreen) update(gtx layout.Context) {
	ch := s.find.Update(gtx)
	ch = s.tube.update(gtx) || ch
	ch = s.measured.Update(gtx) || ch
	ch = s.picker.Update(gtx) || ch
	ch = s.first.Update(gtx) || ch
	ch = s.second.Update(gtx) || ch
	ch = s.temp.Update(gtx) || ch
	ch = s.press.Update(gtx) || ch
	if ch || s.dirty {
		s.dirty = false
		s.compute()
	}
}

func (s *diagnoseScreen) compute() {
	r := s.results
	r.Reset()
	s.head = ""
	s.plot.Set(nil)
	for _, f := range []*Field{s.measured, s.temp, s.press} {
		f.SetError(nil)
	}
	byTemp := s.find.Selected() == "temperature"
	tube, lq, rq, terr := s.tube.tube(true)
	fq, ferr := s.measured.Quantity()
	pq, perr := s.press.Quantity()
	var tq units.Quantity
	var tErr error
	if !byTemp {
		tq, tErr = s.temp.Quantity()
	}
	if err := errors.Join(terr, ferr, perr, tErr); err != nil {
		r.Fail(errors.New("check the fields marked in red"))
		return
	}
	setup := resonator.Setup{Tube: tube, Temperature: tq.Value, Pressure: pq.Value,
		U: resonator.Uncertainty{Length: lq.Uncertainty, Radius: rq.Uncertainty, Temperature: tq.Uncertainty,
			Pressure: pq.Uncertainty, Frequency: fq.Uncertainty}}
	fields := map[string]*Field{"measured frequency": s.measured, "length": s.tube.length, "radius": s.tube.radius,
		"mode": s.tube.mode, "temperature": s.temp, "pressure": s.press}
	if byTemp {
		mix, err := s.picker.Mixture()
		if err != nil {
			r.Fail(err)
			return
		}
		setup.Gas = mix
		e, err := setup.DiagnoseTemperature(fq.Value)
		if err != nil {
			blameField(err, fields)
			r.Fail(err)
			return
		}
		r.AddPM("Mean gas temperature", e.Value, e.Sigma, units.DimTemperature)
		s.head, _ = r.Value("Mean gas temperature")
		if c, err := units.FormatPMIn(e.Value, e.Sigma, units.DimTemperature, "degC"); err == nil {
			r.AddText("In degrees Celsius", c)
		}
		r.Warn(e.Warnings...)
		s.env.Bench.SetGas(s.picker.Text())
		s.env.Bench.SetFrequency(fq.Value, s.Title())
		s.plot.Set(frequencyPlot(setup, e.Value, fq.Value, "Frequency against temperature").WithError(e.Sigma, fq.Uncertainty))
		return
	}
	a, _ := gasprops.Lookup(s.first.Selected())
	b, _ := gasprops.Lookup(s.second.Selected())
	if a == b {
		r.Fail(errors.New("pick two different gases"))
		return
	}
	e, err := setup.DiagnoseFraction(a, b, fq.Value)
	if err != nil {
		blameField(err, fields)
		r.Fail(err)
		return
	}
	r.AddPM("Mole fraction of "+b.Name, e.Value, e.Sigma, units.DimNone)
	// The units formatter writes "—" for a non-finite value, never NaN.
	if pct, err := units.FormatPMIn(e.Value, e.Sigma, units.DimNone, "%"); err == nil {
		r.AddText("As a percentage", pct)
	}
	s.head, _ = r.Value("As a percentage")
	r.AddNote(fmt.Sprintf("%s in %s, by mole (≈ by volume for ideal gases)", b.Name, a.Name))
	r.Warn(e.Warnings...)
	s.env.Bench.SetFrequency(fq.Value, s.Title())
	s.plot.Set(fractionPlot(setup, a, b, e.Value, fq.Value).WithError(e.Sigma, fq.Uncertainty))
}

// fractionPlot sweeps the frequency over mole fractions 0..1 and marks the
// measurement.
func fractionPlot(setup resonator.Setup, a, b *gasprops.Species, x, f float64) *Chart {
	pts, err := setup.SweepFraction(a, b, 0, 1, 51)
	if err != nil {
		return nil
	}
	xy := make(XYs, len(pts))
	for i, p := range pts {
		xy[i].X, xy[i].Y = p.X, p.Frequency
	}
	return linePlot(xy, x, f, "Mole fraction of "+b.Name, "", "Frequency against mixture")
}

// Layout implements Screen.
func (s *diagnoseScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	inputs := []layout.Widget{
		s.find.Layout,
		s.measured.Layout,
		s.tube.ends.Layout,
		s.tube.length.Layout,
		s.tube.radius.Layout,
		s.tube.corr.Layout,
		s.tube.mode.Layout,
	}
	label := "Mean gas temperature"
	if s.find.Selected() == "temperature" {
		inputs = append(inputs, s.picker.Layout)
	} else {
		inputs = append(inputs, s.first.Layout, s.second.Layout, s.temp.Layout)
		label = "Mole fraction of " + s.second.Selected()
	}
	inputs = append(inputs, s.press.Layout)
	outputs := []layout.Widget{
		s.results.Layout,
		s.plot.Layout,
		Note(s.env, "The dot on the plot is your measurement. The tube model of the Tube resonance screen is solved backwards with Brent's method over the gas "+
			"model's temperature range, or over mole fractions 0 to 1. The ± of every input is carried to the answer to "+
			"first order; a wide ± on the frequency usually dominates. A gas whose temperature varies along the tube "+
			"gives a mean weighted by the mode shape, not the arithmetic mean."),
	}
	return splitLayout(gtx, s.env, s.page, s.side, headline(s.env, label, s.head), inputs, outputs)
}
