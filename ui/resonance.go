package ui

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// tubeInputs are the controls that describe a uniform tube, shared by the
// tube-resonance and diagnosis screens.
type tubeInputs struct {
	ends   *Choice
	corr   *Choice
	mode   *Field
	length *Field
	radius *Field
}

func newTubeInputs(env *Env, length, radius string) *tubeInputs {
	t := &tubeInputs{
		ends: NewChoice(env, "Ends", []string{"closed-open", "closed-closed", "open-open"},
			[]string{"Closed – open (quarter-wave)", "Closed – closed (half-wave)", "Open – open (half-wave)"}),
		corr: NewChoice(env, "End correction at each open end", []string{"none", "unflanged", "flanged"},
			[]string{"None", "Unflanged (bare tube end)", "Flanged (end in a wall)"}),
		mode:   NewField(env, "Mode number n", units.DimNone, "1"),
		length: NewField(env, "Tube length", units.DimLength, length),
		radius: NewField(env, "Inner radius", units.DimLength, radius),
	}
	t.corr.Select("unflanged")
	t.mode.Hint = "1 for the fundamental, 2, 3 … for the overtones"
	t.length.Hint = "e.g. 500 mm, 1.2 m, 20 in; ± allowed: 500 mm ± 1 mm"
	t.radius.Hint = "half the inner diameter: 12 mm, 0.5 in"
	return t
}

// update handles the controls' events; it reports whether the user changed
// anything.
func (t *tubeInputs) update(gtx layout.Context) bool {
	ch := t.ends.Update(gtx)
	ch = t.corr.Update(gtx) || ch
	ch = t.mode.Update(gtx) || ch
	ch = t.length.Update(gtx) || ch
	return t.radius.Update(gtx) || ch
}

// tube reads the tube; needLength says whether the length field is used.
// Field errors are shown under the fields.
func (t *tubeInputs) tube(needLength bool) (resonator.Tube, units.Quantity, units.Quantity, error) {
	t.mode.SetError(nil)
	t.length.SetError(nil)
	t.radius.SetError(nil)
	ends, _ := resonator.ParseEnds(t.ends.Selected())
	corr, _ := resonator.ParseEndCorrection(t.corr.Selected())
	var errs []error
	mq, err := t.mode.Quantity()
	errs = append(errs, err)
	mode := int(math.Round(mq.Value))
	if err == nil && (mq.Value != float64(mode) || mode < 1 || mode > resonator.MaxMode) {
		e := units.NewRangeError("mode number", mq.Value, 1, resonator.MaxMode, "")
		e.Why = "a whole number"
		t.mode.SetError(e)
		errs = append(errs, e)
	}
	var lq units.Quantity
	if needLength {
		lq, err = t.length.Quantity()
		errs = append(errs, err)
	}
	rq, err := t.radius.Quantity()
	errs = append(errs, err)
	if err := errors.Join(errs...); err != nil {
		return resonator.Tube{}, lq, rq, errors.New("check the fields marked in red")
	}
	return resonator.Tube{Ends: ends, Correction: corr, Mode: mode, Length: lq.Value, Radius: rq.Value}, lq, rq, nil
}

// blame puts a calculator's RangeError under the field it names and
// reports whether one took it.
func blameField(err error, fields map[string]*Field) bool {
	var re *units.RangeError
	if !errors.As(err, &re) {
		return false
	}
	f := strings.ToLower(re.Field)
	best := ""
	for key := range fields {
		if strings.Contains(f, key) && len(key) > len(best) {
			best = key
		}
	}
	if best == "" {
		return false
	}
	fields[best].SetError(err)
	return true
}

// resonanceScreen is "Tube resonance": frequency from length or length from
// a target frequency for a quarter- or half-wave tube, with the end
// correction, losses, Q, and the frequency against temperature.
type resonanceScreen struct {
	env     *Env
	page    *Page
	side    *Page
	head    string // the main answer in one line, shown above the inputs
	kind    *Choice
	solve   *Choice
	tube    *tubeInputs
	zones   *zoneInputs
	helm    *helmholtzInputs
	freq    *Field
	picker  *GasPicker
	temp    *Field
	press   *Field
	results *Results
	plot    *Plot
	carry   widget.Clickable
	carried string
	last    float64 // last computed frequency, Hz; 0 when none
	dirty   bool
}

func newResonanceScreen(env *Env) Screen {
	s := &resonanceScreen{
		env:  env,
		page: NewPage(env),
		side: NewPage(env),
		kind: NewChoice(env, "Resonator", []string{"tube", "zones", "helmholtz"},
			[]string{"Uniform tube", "Hot and cold zones", "Helmholtz resonator"}),
		solve:   NewChoice(env, "Solve for", []string{"frequency", "length"}, []string{"Frequency from length", "Length from frequency"}),
		tube:    newTubeInputs(env, "500 mm", "12 mm"),
		zones:   newZoneInputs(env),
		helm:    newHelmholtzInputs(env),
		freq:    NewField(env, "Target frequency", units.DimFrequency, "400 Hz"),
		picker:  NewGasPicker(env, "air"),
		temp:    NewField(env, "Mean gas temperature", units.DimTemperature, "20 degC"),
		press:   NewField(env, "Mean pressure", units.DimPressure, "1 atm"),
		results: NewResults(env),
		plot:    NewPlot(env),
		dirty:   true,
	}
	s.temp.Options.DefaultUnit = "K"
	s.temp.Hint = "e.g. 293 K, 20 degC, 68 degF; ± allowed: 20 degC ± 2 K"
	s.freq.Hint = "e.g. 400 Hz, 1.2 kHz"
	s.plot.Height = 240
	return s
}

// Title implements Screen.
func (s *resonanceScreen) Title() string { return "Tube resonance" }

// Enter takes the gas, temperature and pressure last used elsewhere.
func (s *resonanceScreen) Enter() {
	if takeBench(s.env.Bench, s.picker, s.temp, s.press) {
		s.dirty = true
	}
}

func (s *resonanceScreen) update(gtx layout.Context) {
	ch := s.kind.Update(gtx)
	ch = s.solve.Update(gtx) || ch
	ch = s.tube.update(gtx) || ch
	ch = s.zones.update(gtx) || ch
	ch = s.helm.update(gtx) || ch
	ch = s.freq.Update(gtx) || ch
	ch = s.picker.Update(gtx) || ch
	ch = s.temp.Update(gtx) || ch
	ch = s.press.Update(gtx) || ch
	if ch {
		s.carried = ""
	}
	if s.carry.Clicked(gtx) && s.last > 0 {
		s.env.Bench.SetFrequency(s.last, s.Title())
		s.carried = "Carried over: " + units.Format(s.last, units.DimFrequency) + ". The penetration-depth and stack screens will offer it."
	}
	if ch || s.dirty {
		s.dirty = false
		s.compute()
	}
}

// compute solves the chosen resonator and fills the results and the plot.
func (s *resonanceScreen) compute() {
	s.results.Reset()
	s.last = 0
	s.head = ""
	s.plot.Set(nil)
	s.temp.SetError(nil)
	s.press.SetError(nil)
	s.freq.SetError(nil)
	switch s.kind.Selected() {
	case "zones":
		s.computeZones()
	case "helmholtz":
		s.computeHelmholtz()
	default:
		s.computeTube()
	}
}

// computeTube solves the uniform tube.
func (s *resonanceScreen) computeTube() {
	r := s.results
	byLength := s.solve.Selected() == "frequency"
	tube, lq, rq, terr := s.tube.tube(byLength)
	mix, gerr := s.picker.Mixture()
	tq, err1 := s.temp.Quantity()
	pq, err2 := s.press.Quantity()
	var fq units.Quantity
	var err3 error
	if !byLength {
		fq, err3 = s.freq.Quantity()
	}
	if gerr != nil {
		r.Fail(gerr)
		return
	}
	if err := errors.Join(terr, err1, err2, err3); err != nil {
		r.Fail(errors.New("check the fields marked in red"))
		return
	}
	setup := resonator.Setup{Tube: tube, Gas: mix, Temperature: tq.Value, Pressure: pq.Value,
		U: resonator.Uncertainty{Length: lq.Uncertainty, Radius: rq.Uncertainty, Temperature: tq.Uncertainty,
			Pressure: pq.Uncertainty, Frequency: fq.Uncertainty}}
	var res resonator.Result
	var err error
	if byLength {
		res, err = setup.SolveFrequency()
	} else {
		res, err = setup.SolveLength(fq.Value)
	}
	if err != nil {
		blameField(err, map[string]*Field{"length": s.tube.length, "radius": s.tube.radius, "mode": s.tube.mode,
			"temperature": s.temp, "pressure": s.press, "frequency": s.freq})
		r.Fail(err)
		return
	}
	s.env.Bench.SetGas(s.picker.Text())
	s.env.Bench.SetTemperature(tq.Value)
	s.env.Bench.SetPressure(pq.Value)
	s.last = res.Frequency
	if byLength {
		r.AddPM("Resonance frequency", res.Frequency, res.FrequencySigma, units.DimFrequency)
		s.head, _ = r.Value("Resonance frequency")
	} else {
		r.AddPM("Tube length", res.Length, res.LengthSigma, units.DimLength)
		r.AddIn("Tube length in mm", res.Length, "mm")
		s.head, _ = r.Value("Tube length")
		if res.Length < 1 && res.LengthSigma == 0 {
			s.head, _ = r.Value("Tube length in mm")
		}
	}
	if n := tube.Ends.OpenEnds(); n > 0 {
		r.AddIn("End correction", res.EndCorrection, "mm")
		r.AddNote(fmt.Sprintf("%s, added at each of %d open end%s; %.3g × radius", s.tube.corr.Selected(), n, plural(n), res.EndCorrection/tube.Radius))
	}
	r.Add("Acoustic (effective) length", res.EffectiveLength, units.DimLength)
	r.Add("Sound speed", res.SoundSpeed, units.DimSpeed)
	r.Add("Wavelength", res.Wavelength, units.DimLength)
	r.AddText("ka", fmt.Sprintf("%.3g", res.KA))
	r.AddNote("plane waves need ka below 1.84")
	r.AddPM("Quality factor Q", res.Q.Total, res.QSigma, units.DimNone)
	r.AddNote(qNote(res.Q))
	r.AddPM("Bandwidth (−3 dB)", res.Bandwidth, res.BandwidthSigma, units.DimFrequency)
	if res.DecayTime < 1 {
		r.AddPMIn("Ring-down time (amplitude 1/e)", res.DecayTime, res.DecayTimeSigma, units.DimTime, "ms")
	} else {
		r.AddPM("Ring-down time (amplitude 1/e)", res.DecayTime, res.DecayTimeSigma, units.DimTime)
	}
	r.AddText("Wall attenuation", fmt.Sprintf("%.3g Np/m", res.Attenuation))
	r.AddNote("Kirchhoff boundary-layer loss of a travelling wave")
	r.Warn(res.Warnings...)
	s.plot.Set(s.sweepPlot(setup, tq.Value, res.Frequency).WithError(tq.Uncertainty, res.FrequencySigma))
}

func plural(n int) string {
	if n == 1 {
		return ""
	}
	return "s"
}

// qNote splits Q by loss mechanism in words.
func qNote(q resonator.Quality) string {
	parts := []string{"walls " + qText(q.Wall)}
	if finite(q.Caps) {
		parts = append(parts, "end caps "+qText(q.Caps))
	}
	if finite(q.Radiation) {
		parts = append(parts, "radiation "+qText(q.Radiation))
	}
	return "by loss alone: " + strings.Join(parts, ", ")
}

// qText writes a quality factor with 3 significant digits, without an
// exponent below a million.
func qText(q float64) string {
	if q >= 1000 && q < 1e6 {
		return fmt.Sprintf("%.0f", q)
	}
	return fmt.Sprintf("%.3g", q)
}

// sweepPlot draws the frequency against the gas temperature around T with
// the current point marked; nil when the sweep fails.
func (s *resonanceScreen) sweepPlot(setup resonator.Setup, T, f float64) *Chart {
	return frequencyPlot(setup, T, f, "Frequency against gas temperature")
}

// Layout implements Screen.
func (s *resonanceScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	inputs := []layout.Widget{s.kind.Layout}
	switch s.kind.Selected() {
	case "zones":
		inputs = append(inputs, s.tube.ends.Layout)
		inputs = append(inputs, s.zones.widgets()...)
		inputs = append(inputs, s.tube.corr.Layout, s.picker.Layout, s.press.Layout)
	case "helmholtz":
		inputs = append(inputs, s.helm.volume.Layout, s.helm.neckLength.Layout, s.helm.neckRadius.Layout,
			s.helm.outer.Layout, s.picker.Layout, s.temp.Layout, s.press.Layout)
	default:
		inputs = append(inputs, s.solve.Layout, s.tube.ends.Layout)
		if s.solve.Selected() == "frequency" {
			inputs = append(inputs, s.tube.length.Layout)
		} else {
			inputs = append(inputs, s.freq.Layout)
		}
		inputs = append(inputs,
			s.tube.radius.Layout,
			s.tube.corr.Layout,
			s.tube.mode.Layout,
			s.picker.Layout,
			s.temp.Layout,
			s.press.Layout,
		)
	}
	outputs := []layout.Widget{
		s.results.Layout,
		func(gtx layout.Context) layout.Dimensions {
			if s.last == 0 {
				return layout.Dimensions{}
			}
			return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					b := material.Button(s.env.Theme, &s.carry, "Use this frequency on other screens")
					return b.Layout(gtx)
				}),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					if s.carried == "" {
						return layout.Dimensions{}
					}
					return layout.Inset{Top: 6}.Layout(gtx, Note(s.env, s.carried))
				}),
			)
		},
		s.plot.Layout,
		Note(s.env, s.note()),
	}
	label := "Resonance frequency"
	switch {
	case s.kind.Selected() == "zones":
		label = "Lowest mode"
	case s.kind.Selected() == "tube" && s.solve.Selected() == "length":
		label = "Tube length"
	}
	return splitLayout(gtx, s.env, s.page, s.side, headline(s.env, label, s.head), inputs, outputs)
}

// note is the assumptions and sources under the results.
func (s *resonanceScreen) note() string {
	switch s.kind.Selected() {
	case "zones":
		return "Exact plane-wave modes of the zoned tube: pressure and volume velocity are continuous at each joint; " +
			"each zone has its own sound speed and density from the gas model at its temperature. The travel-time " +
			"estimate adds up the time sound takes through each zone and ignores the reflections at the joints. " +
			"Joints between zones are taken as sharp; a real temperature profile is smoother. No losses."
	case "helmholtz":
		return "Lumped Helmholtz resonator: the gas in the neck is the mass, the cavity the spring. The neck's inner " +
			"end opens into the cavity wall and gets the flanged end correction (Norris & Sheng 1989); the outer end " +
			"gets the one you choose (Levine & Schwinger 1948 for an unflanged end). Valid while the cavity and the " +
			"neck are small compared with the wavelength."
	}
	return "Plane waves in a rigid tube. End corrections: Levine & Schwinger (1948) for an unflanged end, " +
		"Norris & Sheng (1989) for a flanged one, with their dependence on ka. Q from the viscous and thermal boundary " +
		"layers on the wall (Kirchhoff), the thermal layer on closed end caps and radiation from open ends; the real " +
		"tube is usually a little lossier. A ± typed on any input is carried to the results to first order."
}

// wideMin is the width from which calculator screens put inputs and
// results side by side (the app gives a screen at most 760 dp, and about
// 700 dp on a tablet beside the catalog).
const wideMin = 680

// splitLayout lays a calculator screen out: on a narrow window one
// scrolling column with the headline answer on top, then the inputs, then
// the outputs; from wideMin dp on, inputs on the left and the headline and
// outputs on the right, each column scrolling on its own.
func splitLayout(gtx layout.Context, env *Env, left, right *Page, head layout.Widget, inputs, outputs []layout.Widget) layout.Dimensions {
	if gtx.Constraints.Max.X < gtx.Dp(wideMin) {
		all := append(append([]layout.Widget{head}, inputs...), outputs...)
		return left.Layout(gtx, all...)
	}
	return layout.Flex{}.Layout(gtx,
		layout.Flexed(0.45, func(gtx layout.Context) layout.Dimensions {
			return left.Layout(gtx, inputs...)
		}),
		layout.Flexed(0.55, func(gtx layout.Context) layout.Dimensions {
			return right.Layout(gtx, append([]layout.Widget{head}, outputs...)...)
		}),
	)
}

// headline shows the main answer large, or nothing when there is none.
func headline(env *Env, label, value string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		if value == "" {
			return layout.Dimensions{}
		}
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				l := material.Body2(env.Theme, label)
				l.Color = env.Colors.Muted
				return l.Layout(gtx)
			}),
			layout.Rigid(Described("Answer", func(gtx layout.Context) layout.Dimensions {
				l := material.Label(env.Theme, unit.Sp(30), value)
				l.Color = env.Colors.Accent
				l.Font.Weight = 700
				return l.Layout(gtx)
			})),
		)
	}
}

// frequencyPlot sweeps the resonance frequency over temperatures around T
// (within the gas model's range) and marks the point (T, f).
func frequencyPlot(setup resonator.Setup, T, f float64, title string) *Chart {
	tmin, tmax := setup.Gas.Range()
	lo := math.Max(tmin, math.Min(T-100, 0.7*T))
	hi := math.Min(tmax, math.Max(T+200, 1.5*T))
	if !(hi > lo) {
		return nil
	}
	pts, err := setup.SweepTemperature(lo, hi, 41)
	if err != nil {
		return nil
	}
	xy := make(XYs, len(pts))
	for i, p := range pts {
		xy[i].X, xy[i].Y = p.X, p.Frequency
	}
	return linePlot(xy, T, f, "Gas temperature", "K", title)
}

// linePlot draws xy as a line and marks (x0, y0) when finite.
func linePlot(xy XYs, x0, y0 float64, xLabel, xUnit, title string) *Chart {
	p := NewXYPlot(xLabel, xUnit, "Resonance frequency", "Hz")
	p.Title = title
	p.AddLine(xy)
	if finite(x0) && finite(y0) {
		p.AddMark(x0, y0, 0, 0)
	}
	return p
}
