package ui

import (
	"slices"
	"strings"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// partField is one quantity field of a part, with the JSON key it fills
// ("pores.gap" for a pore field). shape is set for pore fields (shown only
// for that pore shape); amp for the driver's two amplitudes (shown only
// for the chosen one); size for a size that may be typed whole or as its
// half (a diameter or a radius, a gap or a half gap).
type partField struct {
	key   string
	f     *Field
	shape string
	amp   string
	size  *sizeAs
}

// partEditor holds the widgets of one part.
type partEditor struct {
	env    *Env
	kind   string
	label  string
	fields []partField
	temp   *Choice // tube, exchanger, cavity: ambient, hot, cold or a value
	tvalue *Field
	shape  *Choice // stack, exchanger
	flange *Choice // open end
	amp    *Choice // driver: pressure or volume velocity

	up, down, edit, remove widget.Clickable

	// Kept between frames (see layout): the row's texts with the inputs
	// they were written from (sig, for index at), the widgets bound once
	// and the slices of children.
	sig, sigNew         []string
	at                  int
	isOpen, textsOK     bool
	title, sum          string
	titleDesc           string
	btnDescs            [5]string // Edit, Close, Up, Down, Remove with " part N"
	titleW, sumW, btnsW layout.Widget
	btnW                func(gtx layout.Context, j int) layout.Dimensions
	fieldWs             []layout.Widget
	choiceWs            [5]layout.Widget // amp, temp, tvalue, shape, flange
	noneW               layout.Widget
	col                 column
	openWs              []layout.Widget
}

// The keys, labels and dimensions of the fields by kind.
var (
	tempKeys        = []string{"ambient", "hot", "cold", "value"}
	tempLabels      = []string{"Ambient", "Hot", "Cold", "A value"}
	flangeKeys      = []string{"none", "infinite"}
	flangeLabels    = []string{"Unflanged (bare tube end)", "Flanged (end in a wall)"} // as on the Tube resonance screen
	ampKeys         = []string{"pressure", "flow"}
	ampLabels       = []string{"Pressure amplitude", "Volume-velocity amplitude"}
	poreShapeLabels = []string{"Plates", "Round pores", "Rectangular", "Pins", "Screens", "Fibres"}
)

func newPartEditor(env *Env, p linear.PartFile) *partEditor {
	e := &partEditor{env: env, kind: p.Kind, label: p.Label}
	add := func(key, label string, dim units.Dimension, text string) *Field {
		f := NewField(env, label, dim, text)
		e.fields = append(e.fields, partField{key: key, f: f})
		return f
	}
	// duct adds the diameter of a duct or driver, typed as a diameter or
	// a radius.
	duct := func(diameter, radius string) {
		f := add("diameter", diameter, units.DimLength, p.Diameter)
		e.fields[len(e.fields)-1].size = roundSize(env, diameter, radius, "")
		e.fields[len(e.fields)-1].size.relabel(f)
	}
	switch p.Kind {
	case linear.KindTube:
		add("length", "Length", units.DimLength, p.Length)
		duct("Inside diameter", "Inside radius")
	case linear.KindStack, linear.KindExchanger:
		add("length", "Length", units.DimLength, p.Length)
		duct("Inside diameter of the holder", "Inside radius of the holder")
		add("porosity", "Porosity (open fraction)", units.DimNone, p.Porosity)
		e.addPores(p.Pores)
	case linear.KindCavity:
		add("volume", "Volume", units.DimVolume, p.Volume)
	case linear.KindDriver:
		duct("Piston diameter (drawing only)", "Piston radius (drawing only)")
		e.amp = NewChoice(env, "Drive given as", ampKeys, ampLabels)
		pa := NewField(env, "Pressure amplitude at the driver", units.DimPressure, p.PressureAmplitude)
		ua := NewField(env, "Volume-velocity amplitude", units.DimVolumeFlow, p.VolumeVelocityAmplitude)
		e.fields = append(e.fields, partField{key: "pressure_amplitude", f: pa, amp: "pressure"}, partField{key: "volume_velocity_amplitude", f: ua, amp: "flow"})
		if p.VolumeVelocityAmplitude != "" && p.PressureAmplitude == "" {
			e.amp.Select("flow")
		}
		add("frequency", "Drive frequency", units.DimFrequency, p.Frequency)
	case linear.KindOpenEnd:
		e.flange = NewChoice(env, "End correction at the open end", flangeKeys, flangeLabels)
		if p.Flange == "infinite" {
			e.flange.Select("infinite")
		}
	}
	switch p.Kind {
	case linear.KindTube, linear.KindExchanger, linear.KindCavity:
		e.temp = NewChoice(env, "Temperature", tempKeys, tempLabels)
		e.tvalue = NewField(env, "Temperature value", units.DimTemperature, "")
		t := strings.ToLower(strings.TrimSpace(p.Temperature))
		switch t {
		case "", "ambient":
		case "hot", "cold":
			e.temp.Select(t)
		default:
			e.temp.Select("value")
			e.tvalue.SetText(p.Temperature)
		}
	}
	return e
}

// text returns the whole size or the text of the field with JSON key
// key, or "".
func (e *partEditor) text(key string) string {
	for _, pf := range e.fields {
		if pf.key == key {
			if pf.size != nil {
				_, t := pf.size.whole(key, pf.f)
				return t
			}
			return strings.TrimSpace(pf.f.Text())
		}
	}
	return ""
}

// visible reports whether a field is shown for the current choices.
func (e *partEditor) visible(pf partField) bool {
	if pf.shape != "" && (e.shape == nil || e.shape.Selected() != pf.shape) {
		return false
	}
	if pf.amp != "" && (e.amp == nil || e.amp.Selected() != pf.amp) {
		return false
	}
	return true
}

// file returns the part as written in a device file.
func (e *partEditor) file() linear.PartFile {
	p := linear.PartFile{Kind: e.kind, Label: e.label}
	if e.shape != nil {
		p.Pores = &linear.PoresFile{Shape: e.shape.Selected()}
	}
	for _, pf := range e.fields {
		if !e.visible(pf) {
			continue
		}
		key, t := pf.key, strings.TrimSpace(pf.f.Text())
		if pf.size != nil {
			key, t = pf.size.whole(key, pf.f)
		}
		setPartText(&p, key, t)
	}
	if e.temp != nil {
		p.Temperature = e.temp.Selected()
		if p.Temperature == "value" {
			p.Temperature = strings.TrimSpace(e.tvalue.Text())
		}
	}
	if e.flange != nil {
		p.Flange = e.flange.Selected()
	}
	return p
}

// update handles the part's fields and choices (the row buttons are read
// by the editor) and reports a change.
func (e *partEditor) update(gtx layout.Context) bool {
	changed := false
	for _, pf := range e.fields {
		if pf.size != nil && pf.size.update(gtx, pf.f) {
			changed = true
		}
		if pf.f.Update(gtx) {
			changed = true
		}
	}
	for _, c := range []*Choice{e.temp, e.shape, e.flange, e.amp} {
		if c != nil && c.Update(gtx) {
			changed = true
		}
	}
	if e.tvalue != nil && e.tvalue.Update(gtx) {
		changed = true
	}
	return changed
}

// layout draws the part's row (title, summary, buttons) and, when open, its
// fields. The row's texts are written again only when the part's inputs or
// its place change.
func (e *partEditor) layout(gtx layout.Context, i int, open bool) layout.Dimensions {
	e.refresh(i, open)
	c := e.env.Colors
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	bg := c.Surface
	if open {
		bg = c.Selected
	}
	return background(gtx, bg, c.Divider, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
		return layout.UniformInset(10).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			e.col.reset()
			e.col.add(e.titleW)
			e.col.add(e.sumW)
			e.col.add(gapH6)
			e.col.add(e.btnsW)
			if open {
				for _, w := range e.widgets() {
					e.col.add(gapH10)
					e.col.add(w)
				}
			}
			return e.col.layout(gtx)
		})
	})
}

// appendSig appends what the part's row is written from: its kind and
// label, its fields' texts and forms, and its choices.
func (e *partEditor) appendSig(s []string) []string {
	s = append(s, e.kind, e.label)
	for _, pf := range e.fields {
		s = append(s, pf.f.Text())
		if pf.size != nil {
			s = append(s, pf.size.choice.Selected())
		}
	}
	for _, c := range [...]*Choice{e.temp, e.shape, e.flange, e.amp} {
		if c != nil {
			s = append(s, c.Selected())
		}
	}
	if e.tvalue != nil {
		s = append(s, e.tvalue.Text())
	}
	return s
}

// refresh binds the row's widgets once and writes its texts again when
// the part at index i changed.
func (e *partEditor) refresh(i int, open bool) {
	e.isOpen = open
	if e.titleW == nil {
		e.bindRow()
	}
	e.sigNew = e.appendSig(e.sigNew[:0])
	if e.textsOK && i == e.at && slices.Equal(e.sigNew, e.sig) {
		return
	}
	e.sig, e.sigNew = e.sigNew, e.sig
	e.textsOK, e.at = true, i
	pf := e.file()
	e.title, e.sum = partTitle(i, pf), summary(pf)
	n := " part " + itoa(i+1)
	e.titleDesc = "part " + itoa(i+1)
	for j, w := range [...]string{"Edit", "Close", "Up", "Down", "Remove"} {
		e.btnDescs[j] = w + n
	}
}

// bindRow makes the row's widgets once; they read the part when drawn.
func (e *partEditor) bindRow() {
	e.titleW = func(gtx layout.Context) layout.Dimensions {
		l := material.Label(e.env.Theme, unit.Sp(16), e.title)
		l.Font.Weight = 600
		l.Color = e.env.Colors.Text
		return describe(gtx, e.titleDesc, l.Layout)
	}
	e.sumW = func(gtx layout.Context) layout.Dimensions {
		if e.sum == "" {
			return layout.Dimensions{}
		}
		l := material.Body2(e.env.Theme, e.sum)
		l.Color = e.env.Colors.Muted
		return l.Layout(gtx)
	}
	e.btnW = e.layoutButton
	e.btnsW = func(gtx layout.Context) layout.Dimensions {
		n := 4
		if e.kind == linear.KindClosedEnd {
			n = 3 // nothing to edit
		}
		return flow(gtx, gtx.Dp(6), gtx.Dp(6), n, e.btnW)
	}
}

// layoutButton draws button j of the row: Edit (Close when open), Up,
// Down, Remove; a closed end has no Edit.
func (e *partEditor) layoutButton(gtx layout.Context, j int) layout.Dimensions {
	if e.kind == linear.KindClosedEnd {
		j++
	}
	c, label, desc := &e.edit, "Edit", e.btnDescs[0]
	switch j {
	case 0:
		if e.isOpen {
			label, desc = "Close", e.btnDescs[1]
		}
	case 1:
		c, label, desc = &e.up, "Up", e.btnDescs[2]
	case 2:
		c, label, desc = &e.down, "Down", e.btnDescs[3]
	default:
		c, label, desc = &e.remove, "Remove", e.btnDescs[4]
	}
	return describe(gtx, desc, func(gtx layout.Context) layout.Dimensions {
		return smallButton(e.env, gtx, c, label)
	})
}

// widgets lists the open part's controls in order. The slice is the
// part's own, valid until the next call; the widgets are made once.
func (e *partEditor) widgets() []layout.Widget {
	if e.noneW == nil {
		for _, pf := range e.fields {
			e.fieldWs = append(e.fieldWs, pf.widget(e.env))
		}
		for j, c := range [...]*Choice{e.amp, e.temp, nil, e.shape, e.flange} {
			if c != nil {
				e.choiceWs[j] = c.Layout
			}
		}
		if e.tvalue != nil {
			e.choiceWs[2] = e.tvalue.Layout
		}
		e.noneW = Note(e.env, "A rigid end: nothing to set.")
	}
	ws := e.openWs[:0]
	if e.amp != nil {
		ws = append(ws, e.choiceWs[0])
	}
	for j, pf := range e.fields {
		if pf.shape != "" || !e.visible(pf) {
			continue
		}
		ws = append(ws, e.fieldWs[j])
	}
	if e.temp != nil {
		ws = append(ws, e.choiceWs[1])
		if e.temp.Selected() == "value" {
			ws = append(ws, e.choiceWs[2])
		}
	}
	if e.shape != nil {
		ws = append(ws, e.choiceWs[3])
		for j, pf := range e.fields {
			if pf.shape != "" && e.visible(pf) {
				ws = append(ws, e.fieldWs[j])
			}
		}
	}
	if e.flange != nil {
		ws = append(ws, e.choiceWs[4])
	}
	if len(ws) == 0 {
		ws = append(ws, e.noneW)
	}
	e.openWs = ws
	return ws
}

func itoa(i int) string {
	const digits = "0123456789"
	if i < 10 {
		return digits[i : i+1]
	}
	return itoa(i/10) + digits[i%10:i%10+1]
}
