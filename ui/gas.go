package ui

import (
	"errors"
	"strings"

	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// gasScreen shows the thermophysical properties of the working gas at one
// temperature and pressure, updating as the user types.
type gasScreen struct {
	env      *Env
	page     *Page
	picker   *GasPicker
	temp     *Field
	press    *Field
	nonIdeal widget.Bool
	results  *Results
	dirty    bool
	// rangeNote says over which temperatures the chosen gas's model was
	// validated; "" when the gas text does not parse.
	rangeNote string
}

// gasModelNote says in plain words what the gasprops models are (see
// gasprops/doc.go), so a user can judge the numbers.
const gasModelNote = "Ideal gas unless the real-gas correction is on (second virial: density and sound speed only; not hydrogen). " +
	"Viscosity and conductivity are low-pressure values, the same at any pressure, from published fits and reference tables " +
	"(NASA CEA; Lemmon & Jacobsen for air; Huber et al. for carbon dioxide; xenon scaled from krypton); " +
	"noble-gas mixtures by Chapman–Enskog kinetic theory. Viscosity and conductivity checked against CRC Handbook tables at 200–600 K within 2 %."

// newGasScreen builds the working-gas screen.
func newGasScreen(env *Env) Screen {
	s := &gasScreen{
		env:     env,
		page:    NewPage(env),
		picker:  NewGasPicker(env, "helium"),
		temp:    NewField(env, "Temperature", units.DimTemperature, "300 K"),
		press:   NewField(env, "Mean pressure", units.DimPressure, "1 bar"),
		results: NewResults(env),
		dirty:   true,
	}
	s.temp.Options.DefaultUnit = "K"
	s.temp.Hint = "e.g. 300 K, 27 degC, 80 degF (a bare number is K)"
	return s
}

// Title implements Screen.
func (s *gasScreen) Title() string { return "Working gas" }

// Enter takes the gas, temperature and pressure last used on another
// screen.
func (s *gasScreen) Enter() {
	if takeBench(s.env.Bench, s.picker, s.temp, s.press) {
		s.dirty = true
	}
}

// update handles the controls' events and recomputes when an input changed.
func (s *gasScreen) update(gtx layout.Context) {
	if s.picker.Update(gtx) {
		s.dirty = true
	}
	if s.temp.Update(gtx) {
		s.dirty = true
	}
	if s.press.Update(gtx) {
		s.dirty = true
	}
	if s.nonIdeal.Update(gtx) {
		s.dirty = true
	}
	if s.dirty {
		s.dirty = false
		s.compute()
	}
}

// compute evaluates the gas with gasprops and fills the results card.
func (s *gasScreen) compute() {
	r := s.results
	r.Reset()
	s.temp.SetError(nil)
	s.press.SetError(nil)
	s.rangeNote = ""
	mix, err := s.picker.Mixture()
	if err != nil {
		r.Fail(err)
		return
	}
	if lo, hi := mix.Range(); usable(lo) && usable(hi) {
		s.rangeNote = "Model validated for this gas from " + units.Format(lo, units.DimTemperature) + " to " +
			units.Format(hi, units.DimTemperature) + "; just outside it the results carry a warning, further out there is no result."
	}
	tq, terr := s.temp.Quantity()
	pq, perr := s.press.Quantity()
	if err := errors.Join(terr, perr); err != nil {
		r.Fail(errors.New("check the fields marked in red"))
		return
	}
	opt := &gasprops.Options{NonIdeal: s.nonIdeal.Value}
	p, err := mix.Properties(units.Temperature(tq.Value), units.Pressure(pq.Value), opt)
	if err != nil {
		var re *units.RangeError
		if errors.As(err, &re) {
			switch f := strings.ToLower(re.Field); {
			case strings.Contains(f, "temperature"):
				s.temp.SetError(err)
			case strings.Contains(f, "pressure"):
				s.press.SetError(err)
			}
		}
		r.Fail(err)
		return
	}
	s.env.Bench.SetGas(s.picker.Text())
	s.env.Bench.SetTemperature(tq.Value)
	s.env.Bench.SetPressure(pq.Value)
	r.AddIn("Molar mass", p.MolarMass, "g/mol")
	r.Add("Density", p.Density, units.DimDensity)
	r.Add("Sound speed", p.SoundSpeed, units.DimSpeed)
	r.Add("Ratio of specific heats γ", p.Gamma, units.DimNone)
	r.Add("Isobaric specific heat cp", p.IsobaricSpecificHeat, units.DimSpecificHeat)
	r.AddIn("Dynamic viscosity", p.Viscosity, "uPa.s")
	r.AddIn("Thermal conductivity", p.ThermalConductivity, "mW/(m.K)")
	r.AddIn("Thermal diffusivity", p.ThermalDiffusivity, "mm2/s")
	r.AddIn("Kinematic viscosity", p.KinematicViscosity, "mm2/s")
	r.Add("Prandtl number", p.Prandtl, units.DimNone)
	r.Warn(p.Warnings...)
}

// Layout implements Screen.
func (s *gasScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	return s.page.Layout(gtx,
		s.picker.Layout,
		s.temp.Layout,
		s.press.Layout,
		func(gtx layout.Context) layout.Dimensions {
			cb := material.CheckBox(s.env.Theme, &s.nonIdeal, "Real-gas correction to density and sound speed (second virial)")
			cb.Color = s.env.Colors.Text
			cb.IconColor = s.env.Colors.Accent
			return cb.Layout(gtx)
		},
		s.results.Layout,
		func(gtx layout.Context) layout.Dimensions {
			if s.rangeNote == "" {
				return layout.Dimensions{}
			}
			return Described("Model range", Note(s.env, s.rangeNote))(gtx)
		},
		Note(s.env, gasModelNote),
	)
}
