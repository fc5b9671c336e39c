package ui

import (
	"gioui.org/layout"

	"tubewright/calc/sheet"
)

// resonanceScreen is "Tube resonance", built from its description in
// calc/sheet: a uniform tube (frequency from length or length from a
// target frequency), a tube of hot and cold zones, or a Helmholtz
// resonator. It shows only the inputs of the resonator chosen, edits the
// zones one field each, draws the frequency against the gas temperature
// (or the sweep asked for) and carries the frequency and the tube to
// other screens (carry_screens.go).
type resonanceScreen struct {
	env   *Env
	page  *Page
	side  *Page
	form  *Form
	zones *zoneEditor
	plot  *Plot
	// stash holds the texts of hidden inputs by key (see hideInputs).
	stash map[string]string
	// bore is the tube's inside diameter, or its radius; neck the same
	// of a Helmholtz resonator's neck.
	bore, neck *sizePair

	// Kept between frames (see retain.go): the headline, the lists of
	// input keys (made again only when what they depend on changes) and
	// the slices of widgets.
	head           *formHead
	keys, shown    []string
	keysFor        [4]string
	plotW          layout.Widget
	ins, outs, top []layout.Widget
}

func newResonanceScreen(env *Env) Screen {
	d, _ := sheet.Lookup(sheet.IDResonance)
	s := &resonanceScreen{env: env, page: NewPage(env), side: NewPage(env), form: NewForm(env, d), plot: NewPlot(env),
		stash: map[string]string{}}
	s.bore = newSizePair(env, s.form, "diameter", "radius", [2]string{"Diameter", "Radius"}, [2]string{"Ø", "radius"})
	s.neck = newSizePair(env, s.form, "neck-diameter", "neck-radius", [2]string{"Diameter", "Radius"}, [2]string{"Ø", "radius"})
	s.zones = newZoneEditor(env, s.form)
	// The tube's size takes a carried value in either form, the hidden
	// one too: the pair then shows the form that arrived.
	s.form.cs.shown = s.shownKeys
	s.plot.Height = 240
	s.head = newFormHead(env, s.form)
	s.plotW = s.plot.Layout
	return s
}

// shownKeys lists the inputs shown and both forms of the tube's size.
func (s *resonanceScreen) shownKeys() []string {
	s.inputKeys()
	return s.shown
}

// Form returns the screen's form.
func (s *resonanceScreen) Form() *Form { return s.form }

// Title implements Screen.
func (s *resonanceScreen) Title() string { return s.form.Sheet.Title }

// Enter takes the gas, temperature and pressure last used elsewhere.
func (s *resonanceScreen) Enter() { s.form.Enter() }

// kind is the resonator chosen (sheet.ResonatorTube, ResonatorZones or
// ResonatorHelmholtz).
func (s *resonanceScreen) kind() string { return s.form.Text("resonator") }

func (s *resonanceScreen) update(gtx layout.Context) {
	s.zones.update(gtx)
	changed := s.form.Update(gtx)
	for _, p := range [...]*sizePair{s.bore, s.neck} {
		if p.update(gtx, s.form, s.stash) {
			changed = s.form.Update(gtx) || changed
		}
	}
	if hideInputs(s.form, s.inputKeys(), s.stash) {
		changed = s.form.Update(gtx) || changed
	}
	s.bore.settle(s.form)
	s.neck.settle(s.form)
	if changed {
		s.publish()
		if res := s.form.Result(); res != nil && s.kind() == sheet.ResonatorZones {
			showModes(s.form.Results, res)
		}
		s.plot.Set(curveChart(sheet.ResonanceCurve(s.form.Result())))
	}
	s.zones.sync()
}

// inputKeys lists the inputs of the resonator chosen, in order; the zone
// editor goes where "zones" is. The list is made again only when the
// choices it depends on change, and never changed in place.
func (s *resonanceScreen) inputKeys() []string {
	key := [4]string{s.kind(), s.form.Text("solve"), s.bore.key(), s.neck.key()}
	if s.keys != nil && key == s.keysFor {
		return s.keys
	}
	s.keysFor = key
	switch s.kind() {
	case sheet.ResonatorZones:
		s.keys = []string{"resonator", "ends", "zones", "modes", "end-correction", "gas", "pressure", "humidity", "non-ideal", "losses"}
	case sheet.ResonatorHelmholtz:
		s.keys = []string{"resonator", "volume", "neck-length", s.neck.key(), "end-correction", "gas", "temperature", "pressure", "humidity",
			"non-ideal"}
	default:
		given := "length"
		if s.form.Text("solve") == "length" {
			given = "frequency"
		}
		s.keys = []string{"resonator", "solve", "ends", given, s.bore.key(), "end-correction", "mode", "gas", "temperature", "pressure", "humidity",
			"non-ideal", "losses", "sweep", "second-gas"}
	}
	s.shown = append(s.keys[:len(s.keys):len(s.keys)], s.bore.whole, s.bore.half)
	return s.keys
}

// Layout implements Screen.
func (s *resonanceScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	s.ins = s.ins[:0]
	for _, key := range s.inputKeys() {
		if key == "zones" {
			s.ins = append(s.ins, s.zones.widgets()...)
		}
		if p := s.pairOf(key); p != nil {
			s.ins = append(s.ins, p.widgets(s.form)...)
			continue
		}
		s.ins = append(s.ins, s.form.InputWidget(key))
	}
	out := s.form.Outputs()
	s.outs = append(append(append(s.outs[:0], out[:2]...), s.plotW), out[2:]...)
	s.top = append(s.top[:0], s.head.widget())
	return splitLayout(gtx, s.page, s.side, s.top, s.ins, s.outs)
}

// pairOf returns the size pair whose shown input is key, or nil.
func (s *resonanceScreen) pairOf(key string) *sizePair {
	for _, p := range [...]*sizePair{s.bore, s.neck} {
		if p.key() == key {
			return p
		}
	}
	return nil
}
