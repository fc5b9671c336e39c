package ui

import (
	"math"
	"strconv"
	"strings"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget/material"

	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// poresScreen judges a stack or regenerator geometry against the thermal
// penetration depth: porosity, hydraulic radius, Rott's fκ and fν, a verdict
// in plain words and the geometry that would hit the rule of thumb.
type poresScreen struct {
	env     *Env
	page    *Page
	op      *operatingPoint
	role    *Choice
	shape   *Choice
	packing *Choice
	metal   *Choice

	gap, plate       *Field // plates: full gap, plate thickness
	diameter         *Field // circular: pore diameter
	width, height    *Field // rectangular: full sides
	pinD, pinPitch   *Field // pins
	mesh, wire, meas *Field // screens
	fibreD, solid    *Field // fibres
	mass, volume     *Field // fibres by mass
	cells, wall      *Field // honeycomb
	results          *Results
	verdict          *pore.Verdict // nil when there is no result
	dirty            bool
}

var (
	shapeKeys   = []string{"plates", "circular", "rectangular", "pins", "screens", "fibres", "honeycomb"}
	shapeLabels = []string{"Parallel plates", "Round pores", "Rectangular channels", "Pin array", "Woven screens", "Metal wool / fibres", "Ceramic honeycomb"}
)

// newPoresScreen builds the pores-and-packing screen.
func newPoresScreen(env *Env) Screen {
	mats := pore.Materials()
	mk := make([]string, len(mats))
	ml := make([]string, len(mats))
	for i, m := range mats {
		mk[i], ml[i] = m.Name, capitalize(m.Label)
	}
	s := &poresScreen{
		env:      env,
		page:     NewPage(env),
		op:       newOperatingPoint(env, "100 Hz"),
		role:     NewChoice(env, "Role", []string{"stack", "regenerator"}, []string{"Standing-wave stack", "Regenerator"}),
		shape:    NewChoice(env, "Pore shape", shapeKeys, shapeLabels),
		packing:  NewChoice(env, "Packing given by", []string{"fraction", "mass"}, []string{"Solid fraction", "Packed mass"}),
		metal:    NewChoice(env, "Fibre material", mk, ml),
		gap:      NewField(env, "Gap between plates", units.DimLength, "0.5 mm"),
		plate:    NewField(env, "Plate thickness", units.DimLength, "0.1 mm"),
		diameter: NewField(env, "Pore diameter", units.DimLength, "0.6 mm"),
		width:    NewField(env, "Channel width", units.DimLength, "0.4 mm"),
		height:   NewField(env, "Channel height", units.DimLength, "1 mm"),
		pinD:     NewField(env, "Pin diameter", units.DimLength, "0.2 mm"),
		pinPitch: NewField(env, "Pin pitch (centre to centre, hexagonal array)", units.DimLength, "0.8 mm"),
		mesh:     NewField(env, "Mesh count", units.DimPerLength, "200 /in"),
		wire:     NewField(env, "Wire diameter", units.DimLength, "41 um"),
		meas:     NewField(env, "Measured porosity (0 = from the weave)", units.DimNone, "0"),
		fibreD:   NewField(env, "Fibre diameter", units.DimLength, "25 um"),
		solid:    NewField(env, "Solid fraction", units.DimNone, "20 %"),
		mass:     NewField(env, "Packed mass", units.DimMass, "30 g"),
		volume:   NewField(env, "Packed volume", units.DimVolume, "50 cm3"),
		cells:    NewField(env, "Cell density", units.DimPerArea, "400 cpsi"),
		wall:     NewField(env, "Wall thickness", units.DimLength, "0.15 mm"),
		results:  NewResults(env),
		dirty:    true,
	}
	s.metal.Select("steel")
	for _, f := range []*Field{s.gap, s.plate, s.diameter, s.width, s.height, s.pinD, s.pinPitch, s.wire, s.fibreD, s.wall} {
		f.Hint = "mm, um, in or m"
	}
	s.mass.Hint = "g, kg, oz or lb"
	s.volume.Hint = "cm3, mL, L or in3"
	s.mesh.Hint = "wires per inch or per mm: 200 /in, 8 /mm"
	s.mesh.Options.DefaultUnit = "/in"
	s.cells.Hint = "cells per square inch (cpsi) or per cm²"
	s.cells.Options.DefaultUnit = "cpsi"
	s.meas.Hint = "0 to 1 or a percentage; leave 0 to use φ = 1 − π m d/4"
	s.solid.Hint = "0 to 1 or a percentage"
	return s
}

// Title implements Screen.
func (s *poresScreen) Title() string { return "Pores and packing" }

// Enter takes the gas, temperature and pressure last used elsewhere.
func (s *poresScreen) Enter() {
	if s.op.enter() {
		s.dirty = true
	}
}

// geometryFields lists the fields shown for the selected shape.
func (s *poresScreen) geometryFields() []*Field {
	switch s.shape.Selected() {
	case "circular":
		return []*Field{s.diameter}
	case "rectangular":
		return []*Field{s.width, s.height}
	case "pins":
		return []*Field{s.pinD, s.pinPitch}
	case "screens":
		return []*Field{s.mesh, s.wire, s.meas}
	case "fibres":
		if s.packing.Selected() == "mass" {
			return []*Field{s.fibreD, s.mass, s.volume}
		}
		return []*Field{s.fibreD, s.solid}
	case "honeycomb":
		return []*Field{s.cells, s.wall}
	}
	return []*Field{s.gap, s.plate}
}

// build makes the shape from the fields.
func (s *poresScreen) build() (pore.Shape, error) {
	fs := s.geometryFields()
	v := make([]float64, len(fs))
	for i, f := range fs {
		q, err := f.Quantity()
		if err != nil {
			return nil, err
		}
		v[i] = q.Value
	}
	switch s.shape.Selected() {
	case "circular":
		return pore.Circular(v[0] / 2)
	case "rectangular":
		return pore.Rectangular(v[0]/2, v[1]/2)
	case "pins":
		return pore.Pins(v[0]/2, v[1])
	case "screens":
		return pore.Screens(v[0], v[1], v[2])
	case "fibres":
		if s.packing.Selected() == "mass" {
			m, err := pore.LookupMaterial(s.metal.Selected())
			if err != nil {
				return nil, err
			}
			return pore.FibresFromMass(v[0], v[1], m.Density, v[2])
		}
		return pore.Fibres(v[0], v[1])
	case "honeycomb":
		return pore.Honeycomb(v[0], v[1])
	}
	return pore.Plates(v[0]/2, v[1])
}

func (s *poresScreen) compute() {
	r := s.results
	r.Reset()
	s.verdict = nil
	st, err := s.op.evaluate()
	if err != nil {
		r.Fail(err)
		return
	}
	shape, err := s.build()
	if err != nil {
		r.Fail(err)
		return
	}
	role, _ := pore.ParseRole(s.role.Selected())
	v, err := pore.Judge(shape, role, st.dk)
	if err != nil {
		r.Fail(err)
		return
	}
	s.verdict = &v
	if s.shape.Selected() == "fibres" && s.packing.Selected() == "mass" {
		if q, err := s.mass.Quantity(); err == nil {
			d, _ := s.fibreD.Value()
			r.AddIn("Packed mass for the aim, same volume", q.Value*pore.SolidFractionFor(d, v.TargetRh)/(1-shape.Porosity()), "g")
		}
	}
	r.Add("Hydraulic radius / δκ", v.RhOverDelta, units.DimNone)
	r.Add("Equivalent plate spacing / δκ (2 r_h/δκ)", v.SpacingOverDelta, units.DimNone)
	r.Add("Porosity", shape.Porosity(), units.DimNone)
	r.AddIn("Hydraulic radius r_h", shape.HydraulicRadius(), "mm")
	r.AddIn("Thermal penetration depth δκ", st.dk, "mm")
	r.AddIn("Viscous penetration depth δν", st.dn, "mm")
	r.AddText("Rott's fκ", complexText(shape.F(st.dk)))
	r.AddText("Rott's fν", complexText(shape.F(st.dn)))
	r.AddNote("time dependence e^(+iωt), as in Swift 2002: Im f < 0")
	if k := s.shape.Selected(); k == "circular" || k == "rectangular" {
		r.Warn("porosity is that of the open channel alone (1): the solid between channels is not part of these inputs")
	}
	if k := s.shape.Selected(); k == "screens" || k == "fibres" {
		r.Warn("fκ and fν of screens and fibres are those of a round pore with the same hydraulic radius, an approximation")
	}
	r.Warn(st.props.Warnings...)
}

// complexText writes a complex number with 4 significant digits, or "—".
func complexText(c complex128) string {
	re, im := real(c), imag(c)
	if !finite(re) || !finite(im) {
		return "—"
	}
	sign := " + "
	if im < 0 {
		sign = " − "
	}
	return strconv.FormatFloat(re, 'g', 4, 64) + sign + strconv.FormatFloat(math.Abs(im), 'g', 4, 64) + "i"
}

// Layout implements Screen.
func (s *poresScreen) Layout(gtx layout.Context) layout.Dimensions {
	if s.op.update(gtx) {
		s.dirty = true
	}
	for _, c := range []*Choice{s.role, s.shape, s.packing, s.metal} {
		if c.Update(gtx) {
			s.dirty = true
		}
	}
	for _, f := range []*Field{s.gap, s.plate, s.diameter, s.width, s.height, s.pinD, s.pinPitch, s.mesh, s.wire,
		s.meas, s.fibreD, s.solid, s.mass, s.volume, s.cells, s.wall} {
		if f.Update(gtx) {
			s.dirty = true
		}
	}
	if s.dirty {
		s.dirty = false
		s.compute()
	}
	ws := []layout.Widget{Heading(s.env, "Geometry"), s.role.Layout, s.shape.Layout}
	if s.shape.Selected() == "fibres" {
		ws = append(ws, s.packing.Layout)
		if s.packing.Selected() == "mass" {
			ws = append(ws, s.metal.Layout)
		}
	}
	for _, f := range s.geometryFields() {
		ws = append(ws, f.Layout)
	}
	ws = append(ws, s.layoutVerdict, s.results.Layout, Heading(s.env, "Gas and operating point"))
	ws = append(ws, s.op.widgets()...)
	ws = append(ws, Note(s.env, "Plates, round pores, rectangular channels (Arnott, Bass & Raspet 1991) and pins "+
		"(cell of equal area, Swift & Keolian 1993) are exact solutions; screens use φ = 1 − π m d/4 and "+
		"r_h = φd/(4(1−φ)); fibres r_h = φd/(4(1−φ)); honeycomb uses square cells. Fibre densities: "+materialNote()+"."))
	return s.page.Layout(gtx, ws...)
}

// materialNote lists the packing materials with their densities.
func materialNote() string {
	out := ""
	for i, m := range pore.Materials() {
		if i > 0 {
			out += ", "
		}
		out += m.Label + " " + units.Format(m.Density, units.DimDensity)
	}
	return out + " (nominal handbook values, from memory)"
}

// layoutVerdict draws the verdict card: the call in large type, the reason,
// what would hit the aim, and the rule with its source. Nothing when there
// is no result.
func (s *poresScreen) layoutVerdict(gtx layout.Context) layout.Dimensions {
	v := s.verdict
	if v == nil {
		return layout.Dimensions{}
	}
	th, col := s.env.Theme, s.env.Colors
	edge := col.Accent
	if v.Call != pore.AboutRight {
		edge = col.Warning
	}
	head := capitalize(v.Call.String()) + " for a " + v.Role.String()
	body := v.Words
	if i := strings.Index(body, ": "); i >= 0 {
		body = capitalize(body[i+2:])
	}
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return Described("Verdict", func(gtx layout.Context) layout.Dimensions {
		return background(gtx, col.Surface, edge, gtx.Dp(8), gtx.Dp(2), func(gtx layout.Context) layout.Dimensions {
			return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				gap := layout.Rigid(layout.Spacer{Height: 6}.Layout)
				return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
					layout.Rigid(func(gtx layout.Context) layout.Dimensions {
						l := material.Label(th, unit.Sp(20), head)
						l.Font.Weight = 700
						l.Color = edge
						return l.Layout(gtx)
					}),
					gap,
					layout.Rigid(Para(s.env, body)),
					gap,
					layout.Rigid(Para(s.env, v.Suggestion)),
					gap,
					layout.Rigid(Note(s.env, "Rule of thumb: "+v.Rule.Text)),
				)
			})
		})
	})(gtx)
}
