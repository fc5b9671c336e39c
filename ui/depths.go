package ui

import (
	"errors"
	"strings"

	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/pore"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// operatingPoint is the gas, temperature, mean pressure and frequency that
// the penetration-depth, pore and placement screens share, with a one-tap
// button that takes the frequency carried over on the Bench.
type operatingPoint struct {
	env    *Env
	picker *GasPicker
	temp   *Field
	press  *Field
	freq   *Field
	useHz  widget.Clickable
}

func newOperatingPoint(env *Env, freq string) *operatingPoint {
	op := &operatingPoint{
		env:    env,
		picker: NewGasPicker(env, "helium"),
		temp:   NewField(env, "Mean temperature", units.DimTemperature, "300 K"),
		press:  NewField(env, "Mean pressure", units.DimPressure, "10 bar"),
		freq:   NewField(env, "Frequency", units.DimFrequency, freq),
	}
	op.temp.Options.DefaultUnit = "K"
	op.temp.Hint = "gas temperature at the stack: 300 K, 27 degC, 80 degF"
	op.press.Hint = "absolute (bar, psi, MPa) or gauge (barg, psig)"
	op.freq.Options.DefaultUnit = "Hz"
	op.freq.Hint = "operating frequency: Hz or kHz"
	return op
}

// enter takes the gas, temperature and pressure last used elsewhere.
func (op *operatingPoint) enter() bool {
	return takeBench(op.env.Bench, op.picker, op.temp, op.press)
}

// benchFrequency returns the carried-over frequency when it differs from
// the one in the field.
func (op *operatingPoint) benchFrequency() (float64, bool) {
	b := op.env.Bench
	if !(b.Frequency > 0) {
		return 0, false
	}
	if v, ok := op.freq.Value(); ok && near(v, b.Frequency) {
		return 0, false
	}
	return b.Frequency, true
}

// update handles the controls and reports whether an input changed.
func (op *operatingPoint) update(gtx layout.Context) bool {
	ch := op.picker.Update(gtx)
	ch = op.temp.Update(gtx) || ch
	ch = op.press.Update(gtx) || ch
	ch = op.freq.Update(gtx) || ch
	if op.useHz.Clicked(gtx) {
		if hz, ok := op.benchFrequency(); ok {
			op.freq.SetText(units.Format(hz, units.DimFrequency))
			ch = true
		}
	}
	return ch
}

// opState is the evaluated operating point.
type opState struct {
	props  gasprops.Properties
	T, p   float64
	f      float64
	dk, dn float64
}

// evaluate reads the fields and computes the gas properties and depths. On
// failure the error is meant for Results.Fail; range errors are also put
// under the field they concern.
func (op *operatingPoint) evaluate() (opState, error) {
	op.temp.SetError(nil)
	op.press.SetError(nil)
	op.freq.SetError(nil)
	mix, err := op.picker.Mixture()
	if err != nil {
		return opState{}, err
	}
	tq, terr := op.temp.Quantity()
	pq, perr := op.press.Quantity()
	fq, ferr := op.freq.Quantity()
	if err := errors.Join(terr, perr, ferr); err != nil {
		return opState{}, errors.New("check the fields marked in red")
	}
	props, err := mix.Properties(units.Temperature(tq.Value), units.Pressure(pq.Value), nil)
	if err != nil {
		var re *units.RangeError
		if errors.As(err, &re) {
			switch f := strings.ToLower(re.Field); {
			case strings.Contains(f, "temperature"):
				op.temp.SetError(err)
			case strings.Contains(f, "pressure"):
				op.press.SetError(err)
			}
		}
		return opState{}, err
	}
	dk, dn, err := pore.PenetrationDepths(props, fq.Value)
	if err != nil {
		op.freq.SetError(err)
		return opState{}, err
	}
	op.env.Bench.SetGas(op.picker.Text())
	op.env.Bench.SetTemperature(tq.Value)
	op.env.Bench.SetPressure(pq.Value)
	return opState{props: props, T: tq.Value, p: pq.Value, f: fq.Value, dk: dk, dn: dn}, nil
}

// widgets returns the operating point's controls for a Page.
func (op *operatingPoint) widgets() []layout.Widget {
	return []layout.Widget{
		op.picker.Layout,
		op.temp.Layout,
		op.press.Layout,
		op.freq.Layout,
		op.layoutUseHz,
	}
}

// layoutUseHz draws the one-tap button for the carried-over frequency, or
// nothing.
func (op *operatingPoint) layoutUseHz(gtx layout.Context) layout.Dimensions {
	hz, ok := op.benchFrequency()
	if !ok {
		return layout.Dimensions{}
	}
	label := "Use " + units.Format(hz, units.DimFrequency)
	if from := op.env.Bench.FrequencyFrom; from != "" {
		label += " from " + from
	}
	b := material.Button(op.env.Theme, &op.useHz, label)
	b.Background = op.env.Colors.Accent
	return b.Layout(gtx)
}

// depthsScreen shows the thermal and viscous penetration depths at an
// operating point, with the pore sizes the usual rules of thumb give.
type depthsScreen struct {
	env     *Env
	page    *Page
	op      *operatingPoint
	results *Results
	dirty   bool
}

// newDepthsScreen builds the penetration-depth screen.
func newDepthsScreen(env *Env) Screen {
	return &depthsScreen{env: env, page: NewPage(env), op: newOperatingPoint(env, "100 Hz"), results: NewResults(env), dirty: true}
}

// Title implements Screen.
func (s *depthsScreen) Title() string { return "Penetration depths" }

// Enter takes the gas, temperature and pressure last used elsewhere.
func (s *depthsScreen) Enter() {
	if s.op.enter() {
		s.dirty = true
	}
}

func (s *depthsScreen) compute() {
	r := s.results
	r.Reset()
	st, err := s.op.evaluate()
	if err != nil {
		r.Fail(err)
		return
	}
	r.AddIn("Thermal penetration depth δκ", st.dk, "mm")
	r.AddIn("Viscous penetration depth δν", st.dn, "mm")
	r.Add("δν / δκ (= √Prandtl)", st.dn/st.dk, units.DimNone)
	r.Add("Wavelength", st.props.SoundSpeed/st.f, units.DimLength)
	stack, regen := pore.RuleFor(pore.RoleStack), pore.RuleFor(pore.RoleRegenerator)
	r.AddText("Stack plate gap (2–4 δκ)", rangeMM(2*stack.Low*st.dk, 2*stack.High*st.dk))
	r.AddNote("common practice, no published source; Tijani, Zeegers & de Waele (JASA 112, 128, 2002) found about 3 δκ optimal")
	r.AddText("Regenerator hydraulic radius (0.1–0.3 δκ)", rangeMM(regen.Low*st.dk, regen.High*st.dk))
	r.AddNote("common practice, no published source")
	r.Warn(st.props.Warnings...)
}

// rangeMM formats a range of lengths in mm: "0.49–0.98 mm".
func rangeMM(lo, hi float64) string {
	a, err1 := units.FormatIn(lo, "mm")
	b, err2 := units.FormatIn(hi, "mm")
	if err1 != nil || err2 != nil || !finite(lo) || !finite(hi) {
		return "—"
	}
	return strings.TrimSuffix(a, " mm") + "–" + b
}

// Layout implements Screen.
func (s *depthsScreen) Layout(gtx layout.Context) layout.Dimensions {
	if s.op.update(gtx) {
		s.dirty = true
	}
	if s.dirty {
		s.dirty = false
		s.compute()
	}
	ws := s.op.widgets()
	ws = append(ws, s.results.Layout,
		Note(s.env, "δκ = √(2k/(ωρcp)), δν = √(2μ/(ωρ)), ω = 2πf; Rott's theory as in Swift, "+
			"Thermoacoustics: A Unifying Perspective (2002), ch. 4. Both fall as 1/√f and, at a fixed temperature, as 1/√p."))
	return s.page.Layout(gtx, ws...)
}
