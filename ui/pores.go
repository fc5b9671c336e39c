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

	// Kept between frames (see retain.go): the geometry keys, the keys
	// shown (made again only when the choices change), the widgets bound
	// once and the slices of children.
	geoKeys    []string
	shownKeys  []string
	shownFor   poreShownKey
	shownOK    bool
	geoHead    layout.Widget
	packingW   layout.Widget
	halvesWs   map[string]layout.Widget
	gasWs      []layout.Widget
	bothWs     map[string]*poreBoth
	ws, joined []layout.Widget
}

// poreShownKey is what the geometry inputs shown depend on.
type poreShownKey struct {
	shape, packing, material string
	half                     bool
}

// poreBoth is the line under one size (see both), bound once and written
// again only when the text changes.
type poreBoth struct {
	s         *poresScreen
	key, desc string
	w         layout.Widget
	ok        bool
	text      string
	shape     string
	line      string
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
	s.geoKeys = poreGeometryKeys(d)
	s.geoHead = Heading(env, "Geometry")
	s.gasWs = []layout.Widget{Heading(env, "Gas and operating point")}
	for _, key := range []string{"gas", "temperature", "pressure", "frequency", "non-ideal"} {
		s.gasWs = append(s.gasWs, s.form.InputWidget(key))
	}
	s.bothWs = map[string]*poreBoth{}
	s.packingW = s.packing.Layout
	s.halvesWs = map[string]layout.Widget{}
	for shape, c := range s.halves {
		s.halvesWs[shape] = c.Layout
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
	for _, key := range s.geoKeys {
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

// shown lists the geometry inputs shown for the current choices. The list
// is made again only when the choices change, and never changed in place.
func (s *poresScreen) shown() []string {
	shape := s.form.Text("shape")
	key := poreShownKey{shape: shape, packing: s.packing.Selected(), material: s.form.Text("material"), half: s.half(shape)}
	if !s.shownOK || key != s.shownFor {
		s.shownOK, s.shownFor = true, key
		s.shownKeys = poreFieldsShown(key.shape, key.packing, key.material, key.half)
	}
	return s.shownKeys
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
// The widget is made once per key and kept.
func (s *poresScreen) both(key string) layout.Widget {
	b := s.bothWs[key]
	if b == nil {
		b = &poreBoth{s: s, key: key, desc: "Both sizes of " + key}
		b.w = b.layout
		s.bothWs[key] = b
	}
	return b.w
}

// layout draws the line, written again only when the text or the shape
// changed.
func (b *poreBoth) layout(gtx layout.Context) layout.Dimensions {
	shape, text := b.s.form.Text("shape"), b.s.form.Text(b.key)
	if !b.ok || shape != b.shape || text != b.text {
		b.ok, b.shape, b.text, b.line = true, shape, text, poreBothLine(shape, b.key, text)
	}
	if b.line == "" {
		return layout.Dimensions{}
	}
	return describe(gtx, b.desc, func(gtx layout.Context) layout.Dimensions { return layoutNote(gtx, b.s.env, b.line) })
}

// poreBothLine writes the line under size key of shape typed as text; ""
// when the text does not read as one positive length.
func poreBothLine(shape, key, text string) string {
	for _, p := range poreHalves[shape] {
		if key != p.whole && key != p.half {
			continue
		}
		q, err := units.Parse(text, units.DimLength)
		if err != nil || !(q.Value > 0) || q.Uncertainty != 0 {
			return ""
		}
		w := q.Value
		if key == p.half {
			w *= 2
		}
		if shape == "plates" {
			return linear.GapWords(w / 2)
		}
		return p.wholeWords + " " + lengthWords(w) + " (" + p.halfWords + " " + lengthWords(w/2) + ")"
	}
	return ""
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
	s.ws = append(s.ws[:0], s.geoHead, f.InputWidget("role"), f.InputWidget("shape"))
	shape := f.Text("shape")
	if shape == "fibres" {
		s.ws = append(s.ws, s.packingW)
	}
	if w := s.halvesWs[shape]; w != nil {
		s.ws = append(s.ws, w)
	}
	for _, key := range s.shown() {
		s.ws = append(s.ws, f.InputWidget(key), s.both(key))
	}
	if !splitWide(gtx) {
		// On a phone the verdict follows the geometry it is about.
		s.joined = append(append(append(s.joined[:0], s.ws...), f.Outputs()...), s.gasWs...)
		return s.page.Layout(gtx, s.joined...)
	}
	s.joined = append(append(s.joined[:0], s.ws...), s.gasWs...)
	return splitLayout(gtx, s.page, s.side, nil, s.joined, f.Outputs())
}
