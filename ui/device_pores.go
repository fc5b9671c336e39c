package ui

import (
	"strings"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// addPores adds the pore shape choice and the pore fields of a stack or
// exchanger. Sizes come whole, as the device file keeps them (a file with
// half sizes is upgraded first); a half that does not read shows as typed
// with the half chosen, so that the problem is marked where it is.
func (e *partEditor) addPores(pores *linear.PoresFile) {
	env := e.env
	pf := linear.PoresFile{Shape: "plates"}
	if pores != nil {
		pf = *pores
	}
	pf.Upgrade()
	e.shape = NewChoice(env, "Pores", linear.PoreShapes, poreShapeLabels)
	e.shape.Select(pf.Shape)
	// Pore sizes are fractions of a millimetre: the generic length hint
	// ("250 mm") would mislead; the mesh count has its own.
	const small = "e.g. 0.25 mm, 250 um, 0.01 in"
	const mesh = "wires per inch or per mm: 200 /in, 8 /mm"
	halves := func(whole, half, wholeWord, halfWord, key string) *sizeAs {
		return newSizeAs(env, [2]string{wholeWord, halfWord}, [2]string{whole, half},
			[2]string{strings.ToLower(wholeWord), strings.ToLower(halfWord)}, key)
	}
	for _, d := range []struct {
		shape, key, label string
		dim               units.Dimension
		text, hint        string
		size              *sizeAs
		half              string // an older file's half that did not read
	}{
		{"plates", "gap", "", units.DimLength, pf.Gap, small, gapSize(env), pf.HalfGap},
		{"plates", "thickness", "Plate thickness (optional)", units.DimLength, pf.Thickness, small, nil, ""},
		{"circular", "diameter", "", units.DimLength, pf.Diameter, small, roundSize(env, "Pore diameter", "Pore radius", "pores.radius"), pf.Radius},
		{"rectangular", "width", "", units.DimLength, pf.Width, small,
			halves("Channel width", "Half the channel width", "Width", "Half width", "pores.half_width"), pf.HalfWidth},
		{"rectangular", "height", "", units.DimLength, pf.Height, small,
			halves("Channel height", "Half the channel height", "Height", "Half height", "pores.half_height"), pf.HalfHeight},
		{"pins", "pin_diameter", "", units.DimLength, pf.PinDiameter, small, roundSize(env, "Pin diameter", "Pin radius", "pores.pin_radius"), pf.PinRadius},
		{"pins", "pitch", "Pin pitch (centre to centre)", units.DimLength, pf.Pitch, small, nil, ""},
		{"screens", "mesh", "Mesh count", units.DimPerLength, pf.Mesh, mesh, nil, ""},
		{"screens", "wire_diameter", "", units.DimLength, pf.WireDiameter, small, roundSize(env, "Wire diameter", "Wire radius", ""), ""},
		{"fibres", "fibre_diameter", "", units.DimLength, pf.FibreDiameter, small, roundSize(env, "Fibre diameter", "Fibre radius", ""), ""},
	} {
		f := NewField(env, d.label, d.dim, d.text)
		f.Hint = d.hint
		if d.size != nil {
			if d.text == "" && d.half != "" {
				f.SetText(d.half)
				d.size.choice.Select(sizeHalf)
			}
			d.size.relabel(f)
		}
		e.fields = append(e.fields, partField{key: "pores." + d.key, f: f, shape: d.shape, size: d.size})
	}
}

// widget draws a part's field, with the whole-or-half chips and both
// sizes for a size.
func (pf partField) widget(env *Env) layout.Widget {
	if pf.size != nil {
		return pf.size.layout(env, pf.f)
	}
	return pf.f.Layout
}

// setPartText puts text under the JSON key key of p ("pores.gap" for a
// pore field; p.Pores is set for those).
func setPartText(p *linear.PartFile, key, text string) {
	top := map[string]*string{
		"length": &p.Length, "diameter": &p.Diameter, "porosity": &p.Porosity, "volume": &p.Volume,
		"pressure_amplitude": &p.PressureAmplitude, "volume_velocity_amplitude": &p.VolumeVelocityAmplitude,
		"frequency": &p.Frequency,
	}
	if dst, ok := top[key]; ok {
		*dst = text
		return
	}
	if p.Pores == nil {
		return
	}
	ps := p.Pores
	pores := map[string]*string{
		"gap": &ps.Gap, "half_gap": &ps.HalfGap, "thickness": &ps.Thickness,
		"diameter": &ps.Diameter, "radius": &ps.Radius,
		"width": &ps.Width, "half_width": &ps.HalfWidth, "height": &ps.Height, "half_height": &ps.HalfHeight,
		"pin_diameter": &ps.PinDiameter, "pin_radius": &ps.PinRadius, "pitch": &ps.Pitch,
		"mesh": &ps.Mesh, "wire_diameter": &ps.WireDiameter, "fibre_diameter": &ps.FibreDiameter,
	}
	if dst, ok := pores[strings.TrimPrefix(key, "pores.")]; ok {
		*dst = text
	}
}

// poresWords names the pores of a part and their size for its summary
// line; plates show the gap and the half gap together.
func poresWords(p *linear.PoresFile) string {
	size := func(text string) (float64, bool) {
		q, err := units.Parse(text, units.DimLength)
		return q.Value, err == nil && q.Value > 0
	}
	switch p.Shape {
	case "plates":
		if g, ok := size(p.Gap); ok {
			return "plates, " + linear.GapWords(g/2)
		}
	case "circular":
		if d, ok := size(p.Diameter); ok {
			return "round pores Ø " + lengthWords(d)
		}
	case "pins":
		if d, ok := size(p.PinDiameter); ok {
			return "pins Ø " + lengthWords(d)
		}
	case "screens":
		if d, ok := size(p.WireDiameter); ok {
			return "screens, wire Ø " + lengthWords(d)
		}
	case "fibres":
		if d, ok := size(p.FibreDiameter); ok {
			return "fibres Ø " + lengthWords(d)
		}
	}
	return p.Shape
}
