package ui

import (
	"gioui.org/layout"

	"tubewright/calc/sheet"
)

// diagnoseScreen is "What the pitch says", built from its description in
// calc/sheet: from a measured resonance frequency and the tube, the mean
// gas temperature of a known gas, or the mole fraction of a second gas in
// the first at a known temperature, with a plot of the frequency against
// the quantity found and the measurement marked.
type diagnoseScreen struct {
	env  *Env
	page *Page
	side *Page
	form *Form
	plot *Plot
	// stash holds the texts of hidden inputs by key (see hideInputs).
	stash map[string]string
	// bore is the tube's inside diameter, or its radius.
	bore *sizePair

	// Kept between frames (see retain.go): the headline, the lists of
	// input keys (made again only when what they depend on changes) and
	// the slices of widgets.
	head           *formHead
	keys, shown    []string
	keysFor        [2]string
	plotW          layout.Widget
	ins, outs, top []layout.Widget
}

func newDiagnoseScreen(env *Env) Screen {
	d, _ := sheet.Lookup(sheet.IDDiagnose)
	s := &diagnoseScreen{env: env, page: NewPage(env), side: NewPage(env), form: NewForm(env, d), plot: NewPlot(env),
		stash: map[string]string{}}
	s.bore = newSizePair(env, s.form, "diameter", "radius", [2]string{"Diameter", "Radius"}, [2]string{"Ø", "radius"})
	s.plot.Height = 240
	// The tube's size takes a carried value in either form, the hidden
	// one too: the pair then shows the form that arrived.
	s.form.cs.shown = s.shownKeys
	s.head = newFormHead(env, s.form)
	s.plotW = s.plot.Layout
	return s
}

// shownKeys lists the inputs shown and both forms of the tube's size.
func (s *diagnoseScreen) shownKeys() []string {
	s.inputKeys()
	return s.shown
}

// Form returns the screen's form.
func (s *diagnoseScreen) Form() *Form { return s.form }

// Title implements Screen.
func (s *diagnoseScreen) Title() string { return s.form.Sheet.Title }

// Enter takes the gas, pressure and frequency last used elsewhere (a
// frequency found by listening to the tube arrives as the measurement).
func (s *diagnoseScreen) Enter() { s.form.Enter() }

func (s *diagnoseScreen) update(gtx layout.Context) {
	changed := s.form.Update(gtx)
	if s.bore.update(gtx, s.form, s.stash) {
		changed = s.form.Update(gtx) || changed
	}
	if hideInputs(s.form, s.inputKeys(), s.stash) {
		changed = s.form.Update(gtx) || changed
	}
	s.bore.settle(s.form)
	if !changed {
		return
	}
	s.plot.Set(curveChart(sheet.ResonanceCurve(s.form.Result())))
}

// inputKeys lists the inputs of what is found, in order. The list is made
// again only when the choices it depends on change, and never changed in
// place.
func (s *diagnoseScreen) inputKeys() []string {
	key := [2]string{s.form.Text("find"), s.bore.key()}
	if s.keys != nil && key == s.keysFor {
		return s.keys
	}
	s.keysFor = key
	keys := []string{"find", "measured-frequency", "ends", "length", s.bore.key(), "end-correction", "mode", "gas"}
	if s.form.Text("find") == sheet.FindFraction {
		keys = append(keys, "second-gas", "temperature")
	}
	s.keys = append(keys, "pressure", "humidity", "non-ideal", "losses")
	s.shown = append(s.keys[:len(s.keys):len(s.keys)], s.bore.whole, s.bore.half)
	return s.keys
}

// Layout implements Screen.
func (s *diagnoseScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	s.ins = s.ins[:0]
	for _, key := range s.inputKeys() {
		if key == s.bore.key() {
			s.ins = append(s.ins, s.bore.widgets(s.form)...)
			continue
		}
		s.ins = append(s.ins, s.form.InputWidget(key))
	}
	out := s.form.Outputs()
	s.outs = append(append(append(s.outs[:0], out[:2]...), s.plotW), out[2:]...)
	s.top = append(s.top[:0], s.head.widget())
	return splitLayout(gtx, s.page, s.side, s.top, s.ins, s.outs)
}
