package ui

import (
	"errors"
	"strconv"

	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
)

// Form is a calculator's inputs as widgets, built from its description in
// calc/sheet, and the card of its results. A screen keeps one Form, calls
// Update at the start of each frame and lays out Inputs and Outputs; it may
// add its own extras (plots, a device editor) around them.
type Form struct {
	// Sheet is the calculator described.
	Sheet *sheet.Sheet
	// Results is the card the rows go to.
	Results *Results

	env     *Env
	items   []formItem
	caution *Caution
	result  *sheet.Result
	err     error
	dirty   bool
	kept    formKeep   // last inputs restored and remembered; see keep_form.go
	cs      carryState // carried values and the operating point; see carry_form.go

	// Kept between frames, so that a steady frame allocates nothing:
	// the slices Inputs and Outputs return (valid until their next call),
	// and the output widgets, bound once.
	ins, adv, outs []layout.Widget
	outWs          [4]layout.Widget // resultCard, CautionWidget, notes, about
	notes          column
	noteWs         indexed
	errIsMemo      []errIsAnswer // answers of errIs for the last evaluation
}

// errIsAnswer is whether the last evaluation's error is target.
type errIsAnswer struct {
	target error
	is     bool
}

// formItem is the widget of one input; exactly one of the pointers is set.
type formItem struct {
	in    *sheet.Input
	field *Field
	gas   *GasPicker
	pick  *Choice
	on    *widget.Bool
	mark  *carryMark    // set while the value is one carried from another screen
	w     layout.Widget // the widget, made on first use and kept
}

// NewForm builds the widgets of s's inputs with their defaults (or
// examples, for required inputs without a default).
func NewForm(env *Env, s *sheet.Sheet) *Form {
	f := &Form{Sheet: s, Results: NewResults(env), env: env, dirty: true,
		caution: NewCaution(env, "Before you go on")}
	for i := range s.Inputs {
		in := &s.Inputs[i]
		start := in.Default
		if start == "" {
			start = in.Example
		}
		it := formItem{in: in}
		switch in.Kind {
		case sheet.Gas:
			it.gas = NewGasPicker(env, start)
		case sheet.Pick:
			keys, words := in.ChoiceKeys(), make([]string, len(in.Choices))
			for j, c := range in.Choices {
				words[j] = c.Words
			}
			it.pick = NewChoice(env, in.Label, keys, words)
			it.pick.Select(start)
		case sheet.Switch:
			it.on = &widget.Bool{Value: switchOn(in, start)}
		default:
			fd := NewField(env, in.Label, in.Dim, "")
			fd.In = in
			fd.Options = in.Units
			fd.Hint = in.Hint
			fd.SetText(start)
			it.field = fd
		}
		f.items = append(f.items, it)
	}
	f.kept.start(f)
	return f
}

// item returns the widget of input key; an unknown key is a programming
// error.
func (f *Form) item(key string) *formItem {
	for i := range f.items {
		if f.items[i].in.Key == key {
			return &f.items[i]
		}
	}
	panic("ui: calculator " + string(f.Sheet.ID) + " has no input " + key)
}

// Field returns the text field of input key (nil for a gas, choice or
// switch input).
func (f *Form) Field(key string) *Field { return f.item(key).field }

// Gas returns the gas picker of input key.
func (f *Form) Gas(key string) *GasPicker { return f.item(key).gas }

// Pick returns the chips of input key.
func (f *Form) Pick(key string) *Choice { return f.item(key).pick }

// Switch returns the check box state of input key.
func (f *Form) Switch(key string) *widget.Bool { return f.item(key).on }

// Text returns the text of input key as the calculator reads it.
func (f *Form) Text(key string) string { return f.item(key).text() }

// SetText sets input key from code (not a user change) and marks the form
// for recomputing.
func (f *Form) SetText(key, text string) {
	it := f.item(key)
	switch {
	case it.gas != nil:
		_ = it.gas.SetText(text)
	case it.pick != nil:
		it.pick.Select(text)
	case it.on != nil:
		it.on.Value = switchOn(it.in, text)
	default:
		it.field.SetText(text)
	}
	f.dirty = true
}

// switchOn reads a switch's text with the calculator's own words (on/off,
// yes/no, true/false); anything else is off.
func switchOn(in *sheet.Input, text string) bool {
	v, err := sheet.ParseInput(in, text)
	return err == nil && v.On
}

func (it *formItem) text() string {
	switch {
	case it.gas != nil:
		return it.gas.Text()
	case it.pick != nil:
		return it.pick.Selected()
	case it.on != nil:
		return strconv.FormatBool(it.on.Value)
	default:
		return it.field.Text()
	}
}

// Texts returns every input's text by key.
func (f *Form) Texts() map[string]string {
	m := make(map[string]string, len(f.items))
	for i := range f.items {
		m[f.items[i].in.Key] = f.items[i].text()
	}
	return m
}

// Result returns the last result, or nil when the inputs gave none.
func (f *Form) Result() *sheet.Result { return f.result }

// Err returns why the last evaluation gave no result, or nil.
func (f *Form) Err() error { return f.err }

// errIs reports errors.Is(f.Err(), target) for a sentinel target (a
// comparable error value), worked out once per evaluation: screens ask
// every frame, and errors.Is's type assertions may allocate (the runtime
// grows its caches of them now and then).
func (f *Form) errIs(target error) bool {
	if f.err == nil {
		return false
	}
	for _, a := range f.errIsMemo {
		if a.target == target {
			return a.is
		}
	}
	is := errors.Is(f.err, target)
	f.errIsMemo = append(f.errIsMemo, errIsAnswer{target, is})
	return is
}

// Invalidate marks the form for recomputing at the next Update.
func (f *Form) Invalidate() { f.dirty = true }

// Update handles the widgets' events and recomputes when an input changed;
// it reports whether it recomputed.
func (f *Form) Update(gtx layout.Context) bool {
	if f.updateMarks(gtx) {
		f.dirty = true
		f.kept.touch()
	}
	for i := range f.items {
		it := &f.items[i]
		changed := false
		switch {
		case it.gas != nil:
			changed = it.gas.Update(gtx)
		case it.pick != nil:
			changed = it.pick.Update(gtx)
		case it.on != nil:
			changed = it.on.Update(gtx)
		default:
			changed = it.field.Update(gtx)
		}
		if changed {
			f.dirty = true
			f.kept.touch()
			if it.mark != nil && it.mark.info == "" {
				it.mark = nil // the user's own text now
			}
		}
	}
	if f.kept.restore(f) {
		f.dirty = true
		f.retake()
	}
	if !f.dirty {
		return false
	}
	f.dirty = false
	f.Compute()
	f.kept.remember(f)
	return true
}

// Compute evaluates the calculator on the current texts, fills the results
// card, marks the fields an error is about (by key) and carries the shared
// values to the Bench.
func (f *Form) Compute() {
	for i := range f.items {
		if fd := f.items[i].field; fd != nil {
			fd.SetError(nil)
		}
	}
	f.result, f.err = f.Sheet.Evaluate(f.Texts())
	f.errIsMemo = f.errIsMemo[:0]
	r := f.Results
	r.Reset()
	f.caution.Lines = nil
	if f.err != nil {
		fes := sheet.FieldErrors(f.err)
		for _, fe := range fes {
			if fd := f.item(fe.Key).field; fd != nil {
				fd.SetError(fe)
			}
		}
		if len(fes) > 1 || (len(fes) == 1 && f.item(fes[0].Key).field != nil && fes[0].Text != "" && f.item(fes[0].Key).field.ErrorText() != "") {
			r.Fail(errors.New("check the fields marked in red"))
		} else {
			r.Fail(f.err)
		}
		return
	}
	r.Show(f.result)
	f.caution.Lines = f.result.Cautions
	f.share()
}

// share carries the values of shared inputs to the Bench (carry_form.go).
func (f *Form) share() { f.shareCarried() }

// Enter takes the values the Bench holds into the inputs that take them,
// where they differ, marking each with where it came from
// (carry_form.go), and reports whether anything changed.
func (f *Form) Enter() bool {
	changed := f.takeCarried()
	if changed {
		f.dirty = true
	}
	return changed
}

// Inputs returns the input widgets in order, advanced ones last. The
// slice is the Form's own, valid until the next call.
func (f *Form) Inputs() []layout.Widget {
	f.ins, f.adv = f.ins[:0], f.adv[:0]
	for i := range f.items {
		w := f.items[i].widget(f.env)
		if f.items[i].in.Advanced {
			f.adv = append(f.adv, w)
		} else {
			f.ins = append(f.ins, w)
		}
	}
	f.ins = append(f.ins, f.adv...)
	return f.ins
}

// InputWidget returns the widget of input key alone, for screens that
// place inputs themselves.
func (f *Form) InputWidget(key string) layout.Widget { return f.item(key).widget(f.env) }

// widget returns the input's widget with its carry mark, made on first
// use and kept.
func (it *formItem) widget(env *Env) layout.Widget {
	if it.w == nil {
		it.w = it.markedWidget(env, it.plainWidget(env))
	}
	return it.w
}

// plainWidget is the input's widget without its carry mark.
func (it *formItem) plainWidget(env *Env) layout.Widget {
	switch {
	case it.gas != nil:
		return it.gas.Layout
	case it.pick != nil:
		return it.pick.Layout
	case it.on != nil:
		return func(gtx layout.Context) layout.Dimensions {
			return tick(env, gtx, it.on, it.in.Label)
		}
	default:
		return it.field.Layout
	}
}

// Outputs returns the results card, the cautions (when there are any),
// the result's notes and the calculator's model note. The slice is the
// Form's own, valid until the next call.
func (f *Form) Outputs() []layout.Widget {
	if f.outWs[0] == nil {
		f.outWs = [4]layout.Widget{f.resultCard, f.CautionWidget, f.layoutNotes, Note(f.env, f.Sheet.About)}
		f.noteWs.draw = f.layoutNote
	}
	f.outs = append(f.outs[:0], f.outWs[:3]...)
	if f.Sheet.About != "" {
		f.outs = append(f.outs, f.outWs[3])
	}
	return f.outs
}

// layoutNotes draws the result's notes, one under the other.
func (f *Form) layoutNotes(gtx layout.Context) layout.Dimensions {
	if f.result == nil || len(f.result.Notes) == 0 {
		return layout.Dimensions{}
	}
	f.notes.reset()
	for i := range f.result.Notes {
		f.notes.add(f.noteWs.at(i))
	}
	return f.notes.layout(gtx)
}

// layoutNote draws note i of the result, described "Model range".
func (f *Form) layoutNote(gtx layout.Context, i int) layout.Dimensions {
	l := material.Body2(f.env.Theme, f.result.Notes[i])
	l.Color = f.env.Colors.Muted
	return describe(gtx, "Model range", l.Layout)
}

// CautionWidget draws the result's safety cautions, or nothing.
func (f *Form) CautionWidget(gtx layout.Context) layout.Dimensions {
	if len(f.caution.Lines) == 0 {
		return layout.Dimensions{}
	}
	return f.caution.Layout(gtx)
}

// sheetScreen is the screen of a calculator that needs nothing beyond its
// description: its inputs, then its results (beside them on wide windows).
type sheetScreen struct {
	env  *Env
	page *Page // the one column, or the inputs' column when wide
	side *Page // the results' column when wide
	form *Form
}

// newSheetScreen returns the constructor of s's plain screen.
func newSheetScreen(s *sheet.Sheet) func(env *Env) Screen {
	return func(env *Env) Screen {
		return &sheetScreen{env: env, page: NewPage(env), side: NewPage(env), form: NewForm(env, s)}
	}
}

// Title implements Screen.
func (s *sheetScreen) Title() string { return s.form.Sheet.Title }

// Enter takes the shared values from the Bench.
func (s *sheetScreen) Enter() { s.form.Enter() }

// Layout implements Screen.
func (s *sheetScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.form.Update(gtx)
	return splitLayout(gtx, s.page, s.side, nil, s.form.Inputs(), s.form.Outputs())
}
