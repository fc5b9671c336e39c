package ui

import (
	"slices"

	"gioui.org/layout"

	"tubewright/calc/sheet"
)

// poresScreen is the pores-and-packing calculator built from its
// description, showing only the geometry inputs of the chosen shape (and,
// for fibres, of the chosen way of giving the packing). Inputs of other
// shapes are emptied while hidden, so that they are never sent with the
// wrong shape, and come back when their shape is chosen again.
type poresScreen struct {
	env  *Env
	page *Page
	form *Form
	// packing says how fibres are given: by solid fraction or by packed
	// mass and volume (a choice of the screen only; the description
	// tells them apart by which inputs are given).
	packing *Choice
	// stash holds the texts of hidden geometry inputs by key.
	stash map[string]string
}

// newPoresScreen builds the pores-and-packing screen.
func newPoresScreen(env *Env) Screen {
	d, _ := sheet.Lookup(sheet.IDPores)
	s := &poresScreen{env: env, page: NewPage(env), form: NewForm(env, d), stash: map[string]string{},
		packing: NewChoice(env, "Fibre packing given by", []string{"fraction", "mass"}, []string{"Solid fraction", "Packed mass"})}
	s.sync()
	return s
}

// Form returns the screen's form.
func (s *poresScreen) Form() *Form { return s.form }

// Title implements Screen.
func (s *poresScreen) Title() string { return s.form.Sheet.Title }

// Enter takes the shared values from the Bench.
func (s *poresScreen) Enter() { s.form.Enter() }

// sync empties the geometry inputs that are hidden (keeping their texts)
// and gives back the texts of those shown again; it reports whether
// anything changed.
func (s *poresScreen) sync() bool {
	shown := poreFieldsShown(s.form.Text("shape"), s.packing.Selected(), s.form.Text("material"))
	changed := false
	for _, key := range poreGeometryKeys(s.form.Sheet) {
		in := s.form.Sheet.Input(key)
		empty := in.Default // a choice is emptied back to its default
		text := s.form.Text(key)
		switch visible := slices.Contains(shown, key); {
		case !visible && text != empty:
			s.stash[key] = text
			s.form.SetText(key, empty)
			changed = true
		case visible && text == empty && s.stash[key] != "":
			s.form.SetText(key, s.stash[key])
			delete(s.stash, key)
			changed = true
		}
	}
	return changed
}

// Layout implements Screen.
func (s *poresScreen) Layout(gtx layout.Context) layout.Dimensions {
	picked := s.packing.Update(gtx)
	s.form.Update(gtx)
	if s.sync() || picked {
		s.form.Update(gtx)
	}
	f := s.form
	ws := []layout.Widget{Heading(s.env, "Geometry"), f.InputWidget("role"), f.InputWidget("shape")}
	shape := f.Text("shape")
	if shape == "fibres" {
		ws = append(ws, s.packing.Layout)
	}
	for _, key := range poreFieldsShown(shape, s.packing.Selected(), f.Text("material")) {
		ws = append(ws, f.InputWidget(key))
	}
	ws = append(ws, f.Outputs()...)
	ws = append(ws, Heading(s.env, "Gas and operating point"))
	for _, key := range []string{"gas", "temperature", "pressure", "frequency", "non-ideal"} {
		ws = append(ws, f.InputWidget(key))
	}
	return s.page.Layout(gtx, ws...)
}
