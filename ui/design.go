package ui

import (
	"gioui.org/layout"
	"gioui.org/widget"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
)

// designScreen is the design calculator's screen: the Form of its
// description (the inputs, the rows, the cautions), the design run off the
// UI goroutine with its progress and a Cancel button (designRun), and the
// result drawn as a summary card with the reachable check and the margin,
// the device to scale, its parts, the sensitivity table, and a button that
// opens the design in the Engine onset editor.
type designScreen struct {
	env  *Env
	page *Page // the one column, or the inputs' column when wide
	side *Page // the design's column when wide
	form *Form
	run  *designRun

	head  *Results     // the check, onset (or span), frequency, margin, tube
	parts *Results     // every part's size and the stack's pores
	strip *deviceStrip // the designed device to scale
	sens  []sheet.SensitivityLine
	doc   string // device document of the design shown ("" for none)
	name  string // its name, from the device file
	fail  bool   // the design shown misses the target (the nearest one)
	pump  bool   // the design shown is a heat pump

	cancel, again, open widget.Clickable

	// Kept between frames (see retain.go and design_view.go): the
	// widgets bound once, the sensitivity lines as text, and the slices
	// of children.
	w                                   designWidgets
	sensText                            [][2]string // onset and frequency change of each line of sens
	sensRows                            indexed
	sensCol                             column
	top, ins, adv, outTop, details, all []layout.Widget
}

// Keys of the design description's inputs and rows the screen places
// itself.
const (
	designKeyFor       = "for"
	designKeyDeviceOut = "device-out"
	designRowDevice    = "device"
	designRowReachable = "reachable"
)

// designHeadRows are the rows of the summary card, in the description's
// order; every other row but the device and the sensitivity goes to the
// parts card.
var designHeadRows = map[string]bool{
	"onset_temperature": true, "frequency": true, "margin": true, "tube_length": true,
	"cold_temperature": true, "span": true, "drive_frequency": true, "acoustic_power": true,
}

// designForOnly are inputs that apply to one kind of design only: the
// screen hides them for the other.
var designForOnly = map[string]string{"hot": "engine", "drive": "heat-pump", "cold": "heat-pump", "span": "heat-pump"}

// newDesignScreen builds the design screen. Its Form holds a copy of the
// design description whose Run answers from the background design.
func newDesignScreen(env *Env) Screen {
	base, ok := sheet.Lookup(sheet.IDDesign)
	if !ok {
		panic("ui: no design calculator in the catalog")
	}
	s := &designScreen{env: env, page: NewPage(env), side: NewPage(env), run: newDesignRun(env),
		head: NewResults(env), parts: NewResults(env), strip: &deviceStrip{env: env}}
	desc := *base
	desc.Run = func(v *sheet.Values) (*sheet.Result, error) { return s.run.run(typed(v)) }
	s.form = NewForm(env, &desc)
	return s
}

// typed returns the texts typed for the inputs of v (the others take
// their defaults when parsed again).
func typed(v *sheet.Values) map[string]string {
	texts := map[string]string{}
	for _, val := range v.All() {
		if val.Given {
			texts[val.In.Key] = val.Text
		}
	}
	return texts
}

// Title implements Screen.
func (s *designScreen) Title() string { return s.form.Sheet.Title }

// Form implements formScreen: the screen is built on its description.
func (s *designScreen) Form() *Form { return s.form }

// Enter takes the shared gas, pressure, ambient and frequency from the
// Bench.
func (s *designScreen) Enter() { s.form.Enter() }

// Leave cancels a running design (it is started again on return).
func (s *designScreen) Leave() {
	if s.run.running() {
		s.run.drop()
		s.form.Invalidate()
	}
}

// update handles the buttons, a finished design and the Form, and sorts
// the result for drawing when the Form computed anew.
func (s *designScreen) update(gtx layout.Context) {
	if s.run.poll() {
		s.form.Invalidate()
	}
	if s.cancel.Clicked(gtx) {
		s.run.cancel()
		s.form.Invalidate()
	}
	if s.again.Clicked(gtx) {
		s.run.again()
		s.form.Invalidate()
	}
	if s.open.Clicked(gtx) && s.doc != "" {
		s.env.handDevice(s.doc)
		s.env.Open(sheet.IDOnset)
	}
	s.run.asked = false
	if !s.form.Update(gtx) {
		return
	}
	if !s.run.asked {
		// The inputs no longer parse: the Form did not ask for a design.
		s.run.drop()
	}
	s.show(s.form.Result())
}

// show sorts result r (nil for none) into the summary card, the parts
// card, the sensitivity table and the device.
func (s *designScreen) show(r *sheet.Result) {
	s.head.Reset()
	s.parts.Reset()
	s.sens, s.doc, s.name, s.fail, s.pump = nil, "", "", false, false
	s.strip.dev = nil
	if r == nil {
		return
	}
	s.pump = r.Values != nil && r.Values.PickKey(designKeyFor) == "heat-pump"
	s.sens = sheet.DesignSensitivity(r)
	s.sensText = s.sensText[:0]
	for _, l := range s.sens {
		s.sensText = append(s.sensText, [2]string{signed(l.Onset.Value, 2, "K"), signed(l.Frequency.Value, 3, "Hz")})
	}
	inTable := map[string]bool{}
	for _, l := range s.sens {
		inTable[l.Onset.Key], inTable[l.Frequency.Key] = true, true
	}
	head := &sheet.Result{Warnings: r.Warnings}
	parts := &sheet.Result{}
	for _, row := range r.Rows {
		switch {
		case row.Key == designRowDevice:
			s.takeDevice(row)
		case inTable[row.Key]:
		case row.Key == designRowReachable:
			// The verdict first: a miss must be the first thing read.
			head.Rows = append([]sheet.Row{row}, head.Rows...)
			s.fail = row.Outcome == sheet.Fail
		case designHeadRows[row.Key]:
			head.Rows = append(head.Rows, row)
		default:
			parts.Rows = append(parts.Rows, row)
		}
	}
	s.head.Show(head)
	s.parts.Show(parts)
}

// takeDevice keeps the device row's document and draws its device.
func (s *designScreen) takeDevice(row sheet.Row) {
	s.doc = row.Text
	f, ok := row.Any.(linear.DeviceFile)
	if !ok {
		return
	}
	s.name = f.Name
	if d, err := f.Validate(); err == nil {
		s.strip.dev = d
	}
}

// designedDevice returns the name and device document of the design shown
// (ok false when there is none): the hook for saving it as a named device
// once the app keeps devices.
func (s *designScreen) designedDevice() (name, doc string, ok bool) {
	return s.name, s.doc, s.doc != ""
}

// state is what the screen shows under the inputs.
type designState int

const (
	designIdle      designState = iota // no result and no design: the Form's failure
	designBusy                         // a design runs
	designCancelled                    // the user cancelled it
	designDone                         // a result
)

func (s *designScreen) state() designState {
	switch {
	case s.form.Result() != nil:
		return designDone
	case s.form.errIs(errDesigning):
		return designBusy
	case s.form.errIs(errCancelled):
		return designCancelled
	}
	return designIdle
}

// Layout implements Screen: the outcome first (progress, the check and
// the margin, the device and the button to open it), then the inputs, then
// the parts, the sensitivity table and the method.
func (s *designScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	if s.w.intro == nil {
		s.bindWidgets()
	}
	outcome, details := s.outcome()
	heading := s.w.headDesign
	if s.fail {
		heading = s.w.headNearest
	}
	s.top, s.all = s.top[:0], s.all[:0]
	if splitWide(gtx) {
		// Beside the design, the intro leads the inputs it is about.
		s.all = append(s.all, s.w.intro)
	} else {
		s.top = append(s.top, s.w.intro)
	}
	s.top = append(append(s.top, heading), outcome...)
	s.all = append(append(s.all, s.w.wantHead), s.inputs()...)
	return splitLayout(gtx, s.page, s.side, s.top, s.all, details)
}
