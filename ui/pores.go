package ui

import (
	"slices"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// poresScreen is the pores-and-packing calculator built from its
// description, showing only the geometry inputs of the chosen shape (and,
// for fibres, of the chosen way of giving the packing). Inputs of other
// shapes are emptied while hidden, so that they are never sent with the
// wrong shape, and come back when their shape is chosen again.
type poresScreen struct {
	env  *Env
	page *Page // the one column, or the inputs' column when wide
	side *Page // the results' column when wide
	form *Form
	// packing says how fibres are given: by solid fraction or by packed
	// mass and volume (a choice of the screen only; the description
	// tells them apart by which inputs are given).
	packing *Choice
	// stash holds the texts of hidden geometry inputs by key.
	stash map[string]string
	// halves says, by shape, whether its sizes are typed whole (a gap, a
	// diameter) or as their half (a half gap, a radius).
	halves map[string]*Choice
}

// newPoresScreen builds the pores-and-packing screen.
func newPoresScreen(env *Env) Screen {
	d, _ := sheet.Lookup(sheet.IDPores)
	s := &poresScreen{env: env, page: NewPage(env), side: NewPage(env), form: NewForm(env, d), stash: map[string]string{},
		packing: NewChoice(env, "Fibre packing given by", []string{"fraction", "mass"}, []string{"Solid fraction", "Packed mass"}),
		halves:  map[string]*Choice{}}
	for shape, chips := range poreHalfChips {
		s.halves[shape] = NewChoice(env, "Sizes given as", []string{sizeWhole, sizeHalf}, chips[:])
	}
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
	// A half typed with no whole beside it (kept inputs, a setup) shows
	// as the half rather than hiding behind an empty whole.
	shape := s.form.Text("shape")
	for _, p := range poreHalves[shape] {
		if c := s.halves[shape]; !s.half(shape) && s.form.Text(p.whole) == "" && s.form.Text(p.half) != "" {
			c.Select(sizeHalf)
		}
	}
	shown := s.shown()
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

// half reports whether the shape's sizes are typed as their half.
func (s *poresScreen) half(shape string) bool {
	c := s.halves[shape]
	return c != nil && c.Selected() == sizeHalf
}

// shown lists the geometry inputs shown for the current choices.
func (s *poresScreen) shown() []string {
	shape := s.form.Text("shape")
	return poreFieldsShown(shape, s.packing.Selected(), s.form.Text("material"), s.half(shape))
}

// switchHalves converts the sizes of shape to the form just chosen (a gap
// to its half gap, a radius to its diameter), so the size never changes
// by a factor of two; it reports whether it did.
func (s *poresScreen) switchHalves(gtx layout.Context, shape string) bool {
	c := s.halves[shape]
	if c == nil || !c.Update(gtx) {
		return false
	}
	for _, p := range poreHalves[shape] {
		from, to, k := p.whole, p.half, 0.5
		if !s.half(shape) {
			from, to, k = p.half, p.whole, 2
		}
		t := s.form.Text(from)
		if w, ok := linear.ScaleLength(t, k); ok {
			t = w
		}
		s.form.SetText(to, t)
		s.form.SetText(from, "")
		delete(s.stash, from)
		delete(s.stash, to)
	}
	return true
}

// both is the line under a size: the whole and the half together, "gap
// 2y0 = 0.5 mm (half gap y0 = 0.25 mm)"; empty when the text does not read.
func (s *poresScreen) both(shape, key string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		for _, p := range poreHalves[shape] {
			if key != p.whole && key != p.half {
				continue
			}
			q, err := units.Parse(s.form.Text(key), units.DimLength)
			if err != nil || !(q.Value > 0) || q.Uncertainty != 0 {
				return layout.Dimensions{}
			}
			w := q.Value
			if key == p.half {
				w *= 2
			}
			text := p.wholeWords + " " + lengthWords(w) + " (" + p.halfWords + " " + lengthWords(w/2) + ")"
			if shape == "plates" {
				text = linear.GapWords(w / 2)
			}
			return Described("Both sizes of "+key, Note(s.env, text))(gtx)
		}
		return layout.Dimensions{}
	}
}

// Layout implements Screen.
func (s *poresScreen) Layout(gtx layout.Context) layout.Dimensions {
	picked := s.packing.Update(gtx)
	if s.switchHalves(gtx, s.form.Text("shape")) {
		picked = true
	}
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
	if c := s.halves[shape]; c != nil {
		ws = append(ws, c.Layout)
	}
	for _, key := range s.shown() {
		ws = append(ws, f.InputWidget(key), s.both(shape, key))
	}
	gas := []layout.Widget{Heading(s.env, "Gas and operating point")}
	for _, key := range []string{"gas", "temperature", "pressure", "frequency", "non-ideal"} {
		gas = append(gas, f.InputWidget(key))
	}
	if !splitWide(gtx) {
		// On a phone the verdict follows the geometry it is about.
		ws = append(append(ws, f.Outputs()...), gas...)
		return s.page.Layout(gtx, ws...)
	}
	return splitLayout(gtx, s.page, s.side, nil, append(ws, gas...), f.Outputs())
}
