package ui

import (
	"gioui.org/layout"

	"tubewright/calc/pore"
	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// placementScreen places a short stack in a standing wave: kx, heat-flux
// and loss factors, the critical temperature difference, the gas
// displacement for a drive ratio and the heat exchanger length.
type placementScreen struct {
	env     *Env
	page    *Page
	op      *operatingPoint
	centre  *Field
	length  *Field
	drive   *Field
	device  *Choice
	advice  string
	results *Results
	rules   []string
	caution *Caution
	dirty   bool
}

// newPlacementScreen builds the stack-placement screen.
func newPlacementScreen(env *Env) Screen {
	s := &placementScreen{
		env:     env,
		page:    NewPage(env),
		op:      newOperatingPoint(env, "100 Hz"),
		centre:  NewField(env, "Stack centre, from the closed end (pressure antinode)", units.DimLength, "0.3 m"),
		length:  NewField(env, "Stack length", units.DimLength, "80 mm"),
		drive:   NewField(env, "Drive ratio |p1|/pm at the pressure antinode", units.DimNone, "3 %"),
		device:  NewChoice(env, "Device", []string{"engine", "heat-pump"}, []string{"Engine", "Heat pump or refrigerator"}),
		results: NewResults(env),
		caution: NewCaution(env, "Hot parts", safety.CautionHotSurfaces),
		dirty:   true,
	}
	s.drive.Hint = "0 to 1 or a percentage; 0 if unknown"
	s.centre.Hint = "m, cm, mm or in, from the closed end or other pressure antinode"
	s.length.Hint = "mm, cm, in or m; 0 for a point estimate"
	return s
}

// Title implements Screen.
func (s *placementScreen) Title() string { return "Stack placement" }

// Enter takes the gas, temperature and pressure last used elsewhere.
func (s *placementScreen) Enter() {
	if s.op.enter() {
		s.dirty = true
	}
}

func (s *placementScreen) compute() {
	r := s.results
	r.Reset()
	s.rules = nil
	s.advice = ""
	for _, f := range []*Field{s.centre, s.length, s.drive} {
		f.SetError(nil)
	}
	st, err := s.op.evaluate()
	if err != nil {
		r.Fail(err)
		return
	}
	var v [3]float64
	for i, f := range []*Field{s.centre, s.length, s.drive} {
		q, err := f.Quantity()
		if err != nil {
			r.Fail(err)
			return
		}
		v[i] = q.Value
	}
	pl, err := pore.PlaceStack(pore.PlacementInput{
		SoundSpeed: st.props.SoundSpeed, Density: st.props.Density, Gamma: st.props.Gamma,
		MeanTemperature: st.T, MeanPressure: st.p, Frequency: st.f,
		Centre: v[0], Length: v[1], DriveRatio: v[2],
	})
	if err != nil {
		r.Fail(err)
		return
	}
	r.Add("Wavelength λ", pl.Wavelength, units.DimLength)
	r.Add("kx of the stack centre", pl.KX, units.DimNone)
	r.AddNote("π/4 = 0.785 is λ/8 from the closed end")
	r.Add("λ/8 from the closed end", pl.LambdaEighth, units.DimLength)
	r.Add("Heat-flux factor |sin 2kx|", pl.HeatFluxFactor, units.DimNone)
	r.AddNote("1 at λ/8: the most heat pumped per unit drive in short-stack theory")
	r.Add("Viscous-loss factor sin² kx", pl.ViscousFactor, units.DimNone)
	r.Add("Stack length kΔx", pl.KLength, units.DimNone)
	r.AddText("Critical temperature gradient", units.Format(pl.CriticalGradient, units.DimNone)+" K/m")
	if v[1] > 0 {
		r.Add("Critical temperature difference across the stack", pl.CriticalDifference, units.DimTemperatureDifference)
		r.AddNote("an engine needs more than this across its stack to start; a heat pump held below it pumps heat")
	}
	if v[2] > 0 {
		r.AddIn("Gas displacement amplitude ξ", pl.Displacement, "mm")
		r.AddIn("Heat exchanger length ≈ 2ξ", pl.ExchangerLength, "mm")
		r.AddNote("peak-to-peak displacement: common practice, no published source")
	}
	r.Warn(pl.Warnings...)
	r.Warn(st.props.Warnings...)
	s.rules = pl.Rules
	dev, _ := pore.ParseDevice(s.device.Selected())
	s.advice = pore.PositionAdvice(dev, pl)
}

// Layout implements Screen.
func (s *placementScreen) Layout(gtx layout.Context) layout.Dimensions {
	if s.op.update(gtx) {
		s.dirty = true
	}
	for _, f := range []*Field{s.centre, s.length, s.drive} {
		if f.Update(gtx) {
			s.dirty = true
		}
	}
	if s.device.Update(gtx) {
		s.dirty = true
	}
	if s.dirty {
		s.dirty = false
		s.compute()
	}
	ws := []layout.Widget{Heading(s.env, "Stack"), s.device.Layout, s.centre.Layout, s.length.Layout, s.drive.Layout, s.caution.Layout}
	if s.advice != "" {
		ws = append(ws, Described("Position advice", Para(s.env, s.advice)))
	}
	ws = append(ws, s.results.Layout)
	ws = append(ws, Heading(s.env, "Gas and operating point"))
	ws = append(ws, s.op.widgets()...)
	if len(s.rules) > 0 {
		ws = append(ws, Heading(s.env, "Rules used"))
		for _, rule := range s.rules {
			ws = append(ws, Note(s.env, "• "+rule))
		}
	}
	return s.page.Layout(gtx, ws...)
}
