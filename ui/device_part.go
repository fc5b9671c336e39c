package ui

import (
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
// fields.
func (e *partEditor) layout(gtx layout.Context, i int, open bool) layout.Dimensions {
	th := e.env.Theme
	c := e.env.Colors
	pf := e.file()
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	bg := c.Surface
	if open {
		bg = c.Selected
	}
	return background(gtx, bg, c.Divider, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
		return layout.UniformInset(10).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			rows := []layout.FlexChild{
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					l := material.Label(th, unit.Sp(16), partTitle(i, pf))
					l.Font.Weight = 600
					l.Color = c.Text
					return Described("part "+itoa(i+1), l.Layout)(gtx)
				}),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					if summary(pf) == "" {
						return layout.Dimensions{}
					}
					l := material.Body2(th, summary(pf))
					l.Color = c.Muted
					return l.Layout(gtx)
				}),
				layout.Rigid(layout.Spacer{Height: 6}.Layout),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					edit := "Edit"
					if open {
						edit = "Close"
					}
					btns := []struct {
						c *widget.Clickable
						l string
					}{{&e.edit, edit}, {&e.up, "Up"}, {&e.down, "Down"}, {&e.remove, "Remove"}}
					if e.kind == linear.KindClosedEnd {
						btns = btns[1:] // nothing to edit
					}
					return flow(gtx, gtx.Dp(6), gtx.Dp(6), len(btns), func(gtx layout.Context, j int) layout.Dimensions {
						return Described(btns[j].l+" part "+itoa(i+1), func(gtx layout.Context) layout.Dimensions {
							return smallButton(e.env, gtx, btns[j].c, btns[j].l)
						})(gtx)
					})
				}),
			}
			if open {
				for _, w := range e.widgets() {
					rows = append(rows, layout.Rigid(layout.Spacer{Height: 10}.Layout), layout.Rigid(w))
				}
			}
			return layout.Flex{Axis: layout.Vertical}.Layout(gtx, rows...)
		})
	})
}

// widgets lists the open part's controls in order.
func (e *partEditor) widgets() []layout.Widget {
	var ws []layout.Widget
	if e.amp != nil {
		ws = append(ws, e.amp.Layout)
	}
	for _, pf := range e.fields {
		if pf.shape != "" || !e.visible(pf) {
			continue
		}
		ws = append(ws, pf.widget(e.env))
	}
	if e.temp != nil {
		ws = append(ws, e.temp.Layout)
		if e.temp.Selected() == "value" {
			ws = append(ws, e.tvalue.Layout)
		}
	}
	if e.shape != nil {
		ws = append(ws, e.shape.Layout)
		for _, pf := range e.fields {
			if pf.shape != "" && e.visible(pf) {
				ws = append(ws, pf.widget(e.env))
			}
		}
	}
	if e.flange != nil {
		ws = append(ws, e.flange.Layout)
	}
	if len(ws) == 0 {
		ws = append(ws, Note(e.env, "A rigid end: nothing to set."))
	}
	return ws
}

func itoa(i int) string {
	const digits = "0123456789"
	if i < 10 {
		return digits[i : i+1]
	}
	return itoa(i/10) + digits[i%10:i%10+1]
}
