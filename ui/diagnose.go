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
}

func newDiagnoseScreen(env *Env) Screen {
	d, _ := sheet.Lookup(sheet.IDDiagnose)
	s := &diagnoseScreen{env: env, page: NewPage(env), side: NewPage(env), form: NewForm(env, d), plot: NewPlot(env),
		stash: map[string]string{}}
	s.bore = newSizePair(env, s.form, "diameter", "radius", [2]string{"Diameter", "Radius"}, [2]string{"Ø", "radius"})
	s.plot.Height = 240
	// The tube's size takes a carried value in either form, the hidden
	// one too: the pair then shows the form that arrived.
	s.form.cs.shown = func() []string { return append(s.inputKeys(), s.bore.whole, s.bore.half) }
	return s
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

// inputKeys lists the inputs of what is found, in order.
func (s *diagnoseScreen) inputKeys() []string {
	keys := []string{"find", "measured-frequency", "ends", "length", s.bore.key(), "end-correction", "mode", "gas"}
	if s.form.Text("find") == sheet.FindFraction {
		keys = append(keys, "second-gas", "temperature")
	}
	return append(keys, "pressure", "humidity", "non-ideal", "losses")
}

// Layout implements Screen.
func (s *diagnoseScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	var inputs []layout.Widget
	for _, key := range s.inputKeys() {
		if key == s.bore.key() {
			inputs = append(inputs, s.bore.widgets(s.form)...)
			continue
		}
		inputs = append(inputs, s.form.InputWidget(key))
	}
	out := s.form.Outputs()
	outputs := append([]layout.Widget{}, out[:2]...)
	outputs = append(outputs, s.plot.Layout)
	outputs = append(outputs, out[2:]...)
	return splitLayout(gtx, s.page, s.side, []layout.Widget{formHeadline(s.env, s.form)}, inputs, outputs)
}
