package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"strings"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// deviceEditor edits a device as an ordered list of parts on a phone: add
// a part of a kind, move it up or down, edit its fields, remove it (the
// screen's example chips load an example into it). It holds the text of
// every field (as the device file has it) and hands the device document
// to the screen; it computes nothing.
type deviceEditor struct {
	env      *Env
	gas      *GasPicker
	pressure *Field
	ambient  *Field
	hotText  string // the file's "hot_temperature", kept as loaded
	notes    string // the file's "notes", kept as loaded
	parts    []*partEditor
	selected int // index of the expanded part, -1 for none
	addKind  *Choice
	add      widget.Clickable
	example  string // the built-in example this editor starts from
	name     string
	changed  bool
	strip    *deviceStrip
	saved    deviceFile
	undo     *editorUndo // the Remove or Open that Undo takes back, or nil

	// Kept between frames (see retain.go): the widgets bound once
	// (bindWidgets), the conditions' widgets for the gas picker shown,
	// and the slice Layout returns.
	w       deviceEditorWidgets
	condFor *GasPicker
	condWs  []layout.Widget
	ws      []layout.Widget
}

// deviceEditorWidgets are the device editor's widgets, bound once.
type deviceEditorWidgets struct {
	strip, legend, partsHead, removed, addKind, add layout.Widget
	parts                                           indexed
}

// kindLabels are the part kinds as people read them, in linear.Kinds order.
var kindLabels = map[string]string{
	linear.KindClosedEnd: "Closed end", linear.KindDriver: "Driver", linear.KindTube: "Tube",
	linear.KindExchanger: "Exchanger", linear.KindStack: "Stack", linear.KindCavity: "Cavity",
	linear.KindOpenEnd: "Open end",
}

// newDeviceEditor returns an editor holding the built-in example name. The
// examples are invented demo devices.
func newDeviceEditor(env *Env, example string) *deviceEditor {
	e := &deviceEditor{
		env:      env,
		pressure: NewField(env, "Mean pressure", units.DimPressure, ""),
		ambient:  NewField(env, "Ambient temperature", units.DimTemperature, ""),
		selected: -1,
		example:  example,
		strip:    &deviceStrip{env: env},
		saved:    deviceFile{path: defaultDevicePath(example)},
	}
	var addable []string
	var labels []string
	for _, k := range linear.Kinds {
		addable = append(addable, k)
		labels = append(labels, kindLabels[k])
	}
	e.addKind = NewChoice(env, "Kind of part to add", addable, labels)
	e.addKind.Select(linear.KindTube)
	if err := e.load(example); err != nil {
		panic("ui: built-in example " + example + ": " + err.Error())
	}
	return e
}

// load replaces the device with a built-in example.
func (e *deviceEditor) load(name string) error {
	f, err := exampleDevice(name)
	if err != nil {
		return err
	}
	e.set(f)
	return nil
}

// exampleDevice returns the built-in example name as a device file.
func exampleDevice(name string) (*linear.DeviceFile, error) {
	b, err := linear.ExampleFile(name)
	if err != nil {
		return nil, err
	}
	var f linear.DeviceFile
	if err := jsonDecode(b, &f); err != nil {
		return nil, err
	}
	return &f, nil
}

// set fills the editor from a device file (code, not a user change, but
// the screen must recompute: changed is set).
func (e *deviceEditor) set(f *linear.DeviceFile) {
	e.name = f.Name
	if e.gas == nil {
		e.gas = NewGasPicker(e.env, f.Gas)
	} else if err := e.gas.SetText(f.Gas); err != nil {
		e.gas = NewGasPicker(e.env, f.Gas)
	}
	e.pressure.SetText(f.MeanPressure)
	e.ambient.SetText(f.AmbientTemperature)
	e.hotText = f.HotTemperature
	e.notes = f.Notes
	e.parts = e.parts[:0]
	for _, p := range f.PartsList {
		e.parts = append(e.parts, newPartEditor(e.env, p))
	}
	e.selected = -1
	e.changed = true
}

// File returns the device file the editor shows.
func (e *deviceEditor) File() *linear.DeviceFile {
	f := &linear.DeviceFile{
		Name:               e.name,
		Gas:                e.gas.Text(),
		MeanPressure:       e.pressure.Text(),
		AmbientTemperature: e.ambient.Text(),
		HotTemperature:     e.hotText,
		Notes:              e.notes,
	}
	for _, p := range e.parts {
		f.PartsList = append(f.PartsList, p.file())
	}
	return f
}

// document returns the device file the editor shows as one line of JSON:
// the text of the calculators' "device" input.
func (e *deviceEditor) document() string {
	b, err := json.Marshal(e.File())
	if err != nil {
		panic("ui: device file cannot be written: " + err.Error())
	}
	return string(b)
}

// Update handles the editor's events and reports whether the device changed.
func (e *deviceEditor) Update(gtx layout.Context) bool {
	e.saved.update(gtx, e)
	e.updateUndo(gtx)
	if e.gas.Update(gtx) {
		e.changed = true
	}
	for _, f := range []*Field{e.pressure, e.ambient} {
		if f.Update(gtx) {
			e.changed = true
		}
	}
	e.addKind.Update(gtx)
	if e.add.Clicked(gtx) {
		e.insert(e.addKind.Selected())
	}
	for i := 0; i < len(e.parts); i++ {
		p := e.parts[i]
		switch {
		case p.up.Clicked(gtx) && i > 0:
			e.parts[i-1], e.parts[i] = e.parts[i], e.parts[i-1]
			e.follow(i, i-1)
			e.changed = true
		case p.down.Clicked(gtx) && i < len(e.parts)-1:
			e.parts[i+1], e.parts[i] = e.parts[i], e.parts[i+1]
			e.follow(i, i+1)
			e.changed = true
		case p.edit.Clicked(gtx):
			if e.selected == i {
				e.selected = -1
			} else {
				e.selected = i
			}
		case p.remove.Clicked(gtx):
			e.removePart(i)
			i--
			continue
		}
		if p.update(gtx) {
			e.changed = true
		}
	}
	ch := e.changed
	e.changed = false
	e.settleUndo(ch)
	return ch
}

// follow keeps the expanded part expanded when it moves from i to j.
func (e *deviceEditor) follow(i, j int) {
	switch e.selected {
	case i:
		e.selected = j
	case j:
		e.selected = i
	}
}

// insert adds a part of kind after the expanded part, or before the last
// part (the far end), and expands it. New parts copy the diameter of their
// neighbour.
func (e *deviceEditor) insert(kind string) {
	at := len(e.parts)
	if e.selected >= 0 {
		at = e.selected + 1
	} else if at > 0 {
		at--
	}
	switch kind {
	case linear.KindDriver:
		at = 0
	case linear.KindOpenEnd:
		at = len(e.parts)
	}
	diameter := "50 mm"
	for _, j := range []int{at - 1, at} {
		if j >= 0 && j < len(e.parts) {
			if d := e.parts[j].text("diameter"); d != "" {
				diameter = d
				break
			}
		}
	}
	p := newPartEditor(e.env, defaultPart(kind, diameter))
	e.parts = append(e.parts, nil)
	copy(e.parts[at+1:], e.parts[at:])
	e.parts[at] = p
	e.selected = at
	e.changed = true
}

// defaultPart returns a new part of kind with plausible starting values
// (common bench sizes; edit them).
func defaultPart(kind, diameter string) linear.PartFile {
	p := linear.PartFile{Kind: kind}
	switch kind {
	case linear.KindTube:
		p.Length, p.Diameter, p.Temperature = "0.5 m", diameter, "ambient"
	case linear.KindStack:
		p.Length, p.Diameter, p.Porosity = "50 mm", diameter, "0.7"
		p.Pores = &linear.PoresFile{Shape: "plates", Gap: "0.6 mm", Thickness: "0.2 mm"}
	case linear.KindExchanger:
		p.Length, p.Diameter, p.Porosity, p.Temperature = "8 mm", diameter, "0.6", "ambient"
		p.Pores = &linear.PoresFile{Shape: "plates", Gap: "1 mm", Thickness: "0.5 mm"}
	case linear.KindCavity:
		p.Volume, p.Temperature = "0.5 L", "ambient"
	case linear.KindDriver:
		p.Diameter, p.PressureAmplitude, p.Frequency = diameter, "2 kPa", "400 Hz"
	case linear.KindOpenEnd:
		p.Flange = "none"
	}
	return p
}

// Layout draws the editor: the save buttons, the strip, the parts and the
// add row (the gas and fill fields are Conditions). The slice is the
// editor's own, valid until the next call.
func (e *deviceEditor) Layout(gtx layout.Context, dev *linear.Device) []layout.Widget {
	e.strip.dev = dev
	if e.w.strip == nil {
		e.bindWidgets()
	}
	e.ws = append(append(e.ws[:0], e.saved.widgets(e.env)...), e.w.strip, e.w.legend, e.w.partsHead)
	removedAt := -1
	if e.undo != nil && e.undo.part != nil {
		removedAt = min(e.undo.at, len(e.parts))
	}
	for i := range e.parts {
		if i == removedAt {
			e.ws = append(e.ws, e.w.removed)
		}
		e.ws = append(e.ws, e.w.parts.at(i))
	}
	if removedAt == len(e.parts) {
		e.ws = append(e.ws, e.w.removed)
	}
	e.ws = append(e.ws, e.w.addKind, e.w.add)
	return e.ws
}

// bindWidgets makes the editor's widgets once; they read the editor when
// drawn.
func (e *deviceEditor) bindWidgets() {
	e.w = deviceEditorWidgets{
		strip: e.strip.Layout,
		legend: func(gtx layout.Context) layout.Dimensions {
			if dev := e.strip.dev; dev == nil || len(dev.Parts) == 0 {
				return layout.Dimensions{}
			}
			return layoutNote(gtx, e.env, stripLegend)
		},
		partsHead: Heading(e.env, "Parts, from the start end"),
		removed:   e.removedBar,
		addKind:   e.addKind.Layout,
		add: func(gtx layout.Context) layout.Dimensions {
			b := material.Button(e.env.Theme, &e.add, "Add part")
			return b.Layout(atTarget(gtx))
		},
	}
	e.w.parts.draw = func(gtx layout.Context, i int) layout.Dimensions {
		return e.parts[i].layout(gtx, i, e.selected == i)
	}
}

// Conditions returns the fields of the gas and the fill (mean pressure,
// ambient temperature), which the screens show above the parts, with the
// other operating conditions. The slice is made again only when the gas
// picker is replaced.
func (e *deviceEditor) Conditions() []layout.Widget {
	if e.condFor != e.gas || e.condWs == nil {
		e.condFor = e.gas
		e.condWs = []layout.Widget{e.gas.Layout, e.pressure.Layout, e.ambient.Layout}
	}
	return e.condWs
}

// stripLegend says what the strip's shapes and colours mean (see
// deviceStrip).
const stripLegend = "To scale, start end on the left. Hatched: stack. Exchangers red when hot, blue at ambient, " +
	"pale blue when cold, violet at a set temperature; tubes tinted the same way. Dark bars: closed ends; a wedge: the driver."

// smallButton draws a button with small text, still at least minTarget
// square for gloved fingers.
func smallButton(env *Env, gtx layout.Context, c *widget.Clickable, label string) layout.Dimensions {
	b := material.Button(env.Theme, c, label)
	b.TextSize = unit.Sp(14)
	b.Inset = layout.Inset{Top: 6, Bottom: 6, Left: 10, Right: 10}
	return b.Layout(atTarget(gtx))
}

// jsonDecode reads a device file's JSON, refusing unknown fields.
func jsonDecode(b []byte, v any) error {
	dec := json.NewDecoder(bytes.NewReader(b))
	dec.DisallowUnknownFields()
	return dec.Decode(v)
}

// summary describes a part in one line: "60 mm long, Ø 60 mm, plates".
func summary(p linear.PartFile) string {
	var s []string
	if p.Length != "" {
		s = append(s, p.Length+" long")
	}
	if p.Diameter != "" {
		s = append(s, "Ø "+p.Diameter)
	}
	if p.Volume != "" {
		s = append(s, p.Volume)
	}
	if p.Pores != nil {
		s = append(s, poresWords(p.Pores))
	}
	if p.Temperature != "" {
		s = append(s, "at "+p.Temperature)
	}
	if p.PressureAmplitude != "" {
		s = append(s, "|p1| "+p.PressureAmplitude)
	}
	if p.VolumeVelocityAmplitude != "" {
		s = append(s, "|U1| "+p.VolumeVelocityAmplitude)
	}
	if p.Frequency != "" {
		s = append(s, p.Frequency)
	}
	if p.Flange == "infinite" {
		s = append(s, "in a wall")
	}
	return strings.Join(s, ", ")
}

// partTitle is "3. Stack" or "3. Stack “label”".
func partTitle(i int, p linear.PartFile) string {
	t := fmt.Sprintf("%d. %s", i+1, kindLabels[p.Kind])
	if p.Label != "" {
		t += " · " + p.Label
	}
	return t
}

// mark shows a device problem under the field it names (err holds a
// *linear.FieldError: the part, from 0, and the JSON key) and opens that
// part; any other error, or nil, clears the marks.
func (e *deviceEditor) mark(err error) {
	for _, f := range []*Field{e.pressure, e.ambient} {
		f.SetError(nil)
	}
	for _, p := range e.parts {
		for _, pf := range p.fields {
			pf.f.SetError(nil)
		}
		if p.tvalue != nil {
			p.tvalue.SetError(nil)
		}
	}
	var fe *linear.FieldError
	if !errors.As(err, &fe) {
		return
	}
	var f *Field
	switch {
	case fe.Part < 0 && fe.Field == "mean_pressure":
		f = e.pressure
	case fe.Part < 0 && fe.Field == "ambient_temperature":
		f = e.ambient
	case fe.Part >= 0 && fe.Part < len(e.parts):
		p := e.parts[fe.Part]
		for _, pf := range p.fields {
			if pf.key == fe.Field || (pf.size != nil && pf.size.halfKey == fe.Field) {
				f = pf.f
			}
		}
		if fe.Field == "temperature" && p.tvalue != nil {
			f = p.tvalue
		}
		if f != nil {
			e.selected = fe.Part
		}
	}
	if f != nil {
		f.SetError(errors.New(strings.TrimPrefix(fe.Msg, "= ")))
	}
}
