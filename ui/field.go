package ui

import (
	"errors"
	"fmt"
	"strings"

	"gioui.org/io/key"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// fieldWidth is the widest a number field grows.
const fieldWidth = unit.Dp(420)

// Field is a number field that understands units: the user types "10 bar",
// "145 psi" or "27 degC" and the field parses it with the units package on
// every change, shows what it accepts, and shows an error naming the field,
// the value and what is accepted when the text does not parse. Text set by
// code does not count as a user change.
type Field struct {
	// Label names the field for people, e.g. "Mean temperature".
	Label string
	// Dim is the dimension the field accepts.
	Dim units.Dimension
	// Options are passed to units.ParseWith (default unit, atmosphere,
	// negatives).
	Options units.Options
	// Hint is the line under the field when the input is good, e.g.
	// "K, degC or degF". Empty means a hint for Dim.
	Hint string
	// In, when set, is the calculator input the field edits: the text is
	// then read by sheet.ParseInput (the same parser as the terminal's),
	// with its ± rule and range.
	In *sheet.Input

	env      *Env
	editor   widget.Editor
	q        units.Quantity
	err      error
	extErr   error
	changed  bool
	codeText string
	code     bool
	// parsedAs is the dimension and options of the last parse, so that
	// changing Dim or Options after NewField re-parses.
	parsedAs struct {
		dim units.Dimension
		opt units.Options
	}
	// text is the editor's text at the last parse: every change of the
	// text is parsed (update, SetText), and reading the editor's text
	// allocates.
	text string
	// The lines under the box, kept until a parse, SetError or a change
	// of lineKey (see lines), so that a steady frame builds no text.
	lineOK            bool
	lineKey           fieldLineKey
	errLine, readLine string
	hintLine          string // hint(), kept with the lines
	errDesc, readDesc joined
}

// fieldLineKey is what the lines under a field depend on beside its text
// and parse.
type fieldLineKey struct {
	label, hint string
	dim         units.Dimension
}

// NewField returns a field for dimension dim with the given starting text
// (which counts as set by code, not a user change).
func NewField(env *Env, label string, dim units.Dimension, text string) *Field {
	f := &Field{Label: label, Dim: dim, env: env}
	f.editor.SingleLine = true
	f.editor.Submit = true
	f.editor.InputHint = f.inputHint()
	f.SetText(text)
	return f
}

// SetText replaces the text from code (e.g. a value carried over from
// another screen). It re-parses but does not count as a user change.
func (f *Field) SetText(s string) {
	f.editor.SetText(s)
	f.codeText = f.editor.Text()
	f.code = true
	f.parse()
}

// Text returns the current text.
func (f *Field) Text() string { return f.text }

// Changed reports, once, whether the user changed the text since the last
// Update or Changed call.
func (f *Field) Changed() bool {
	c := f.changed
	f.changed = false
	return c
}

// Quantity returns the parsed value, or the parse error (whose text names
// the field).
func (f *Field) Quantity() (units.Quantity, error) {
	f.fresh()
	if f.err != nil {
		return units.Quantity{}, f.err
	}
	return f.q, nil
}

// Value returns the parsed SI value and whether the text parsed.
func (f *Field) Value() (float64, bool) {
	f.fresh()
	if f.err != nil {
		return 0, false
	}
	return f.q.Value, true
}

// SetError shows err under the field in place of the hint, for a value that
// parsed but that a calculation rejected (e.g. a units.RangeError about this
// input). nil clears it. A parse error always takes precedence.
func (f *Field) SetError(err error) {
	if err == nil && f.extErr == nil {
		return // nothing changes: the lines under the box stay as written
	}
	f.extErr, f.lineOK = err, false
}

// ErrorText returns the error text shown under the field, or "".
func (f *Field) ErrorText() string {
	f.fresh()
	switch {
	case f.err != nil:
		return f.err.Error()
	case f.extErr != nil:
		return f.message(f.extErr)
	}
	return ""
}

// Focus asks for keyboard focus on the field's editor.
func (f *Field) Focus(gtx layout.Context) {
	gtx.Execute(key.FocusCmd{Tag: &f.editor})
}

// FieldError is a field's parse error: it names the field and the text.
type FieldError struct {
	Field string // the field's label
	Text  string // what was typed
	Err   error  // the parser's reason
}

// Error reads like `Mean pressure: "10 bra" has an unknown pressure unit
// "bra"; accepted: ...` (the units package quotes the input).
func (e *FieldError) Error() string {
	if strings.TrimSpace(e.Text) == "" {
		return fmt.Sprintf("%s: empty; type a value with its unit", e.Field)
	}
	return fmt.Sprintf("%s: %v", e.Field, e.Err)
}

// Unwrap returns the parser's error.
func (e *FieldError) Unwrap() error { return e.Err }

// fresh re-parses when Dim or Options changed since the last parse.
func (f *Field) fresh() {
	if f.parsedAs.dim != f.Dim || f.parsedAs.opt != f.Options {
		f.parse()
	}
}

func (f *Field) parse() {
	f.parsedAs.dim, f.parsedAs.opt = f.Dim, f.Options
	txt := f.editor.Text()
	f.text, f.lineOK = txt, false
	var q units.Quantity
	var err error
	if f.In != nil {
		var v sheet.Value
		v, err = sheet.ParseInput(f.In, txt)
		if fe, ok := sheet.AsFieldError(err); ok {
			err = fe.Err
		}
		q = v.Q
	} else {
		q, err = units.ParseWith(txt, f.Dim, f.Options)
	}
	if err != nil {
		f.err = &FieldError{Field: f.Label, Text: txt, Err: err}
		return
	}
	f.q, f.err = q, nil
	f.extErr = nil
}

// message prefixes an error with the field's label unless it already names
// the field.
func (f *Field) message(err error) string {
	msg := err.Error()
	var re *units.RangeError
	if errors.As(err, &re) && re.Field != "" {
		return msg
	}
	if strings.HasPrefix(strings.ToLower(msg), strings.ToLower(f.Label)) {
		return msg
	}
	return f.Label + ": " + msg
}

// Update handles the editor's events and reports whether the user changed
// the text since the last Update or Changed call. Screens call it (or
// Changed) at the start of their Layout, before computing.
func (f *Field) Update(gtx layout.Context) bool {
	f.update(gtx)
	return f.Changed()
}

// update handles the editor's events and remembers a user change for
// Changed.
func (f *Field) update(gtx layout.Context) bool {
	user := false
	for {
		ev, ok := f.editor.Update(gtx)
		if !ok {
			break
		}
		if _, ok := ev.(widget.SubmitEvent); ok {
			// Enter: done with this field; dropping focus also hides a
			// phone's on-screen keyboard.
			gtx.Execute(key.FocusCmd{})
			continue
		}
		if _, ok := ev.(widget.ChangeEvent); !ok {
			continue
		}
		if f.code && f.editor.Text() == f.codeText {
			// The change event of a SetText from code.
			f.code = false
			continue
		}
		f.code = false
		user = true
	}
	if user {
		f.parse()
		f.changed = true
	}
	return user
}

// Layout draws the label, the text box and the hint or error line.
func (f *Field) Layout(gtx layout.Context) layout.Dimensions {
	if f.update(gtx) {
		// A change found during layout is acted on in the next frame.
		gtx.Execute(op.InvalidateCmd{})
	}
	th := f.env.Theme
	c := f.env.Colors
	f.editor.InputHint = f.inputHint()
	gtx.Constraints.Max.X = min(gtx.Constraints.Max.X, gtx.Dp(fieldWidth))
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	errText, reading := f.lines()
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			l := material.Body2(th, f.Label)
			l.Color = c.Text
			l.Font.Weight = 600
			return l.Layout(gtx)
		}),
		layout.Rigid(layout.Spacer{Height: 4}.Layout),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			edge := c.Outline
			bw := gtx.Dp(1)
			if gtx.Focused(&f.editor) {
				edge, bw = c.Accent, gtx.Dp(2)
			}
			if errText != "" {
				edge = c.Error
			}
			// The box carries the label, so that tests and screen
			// readers find the field by its name, and a tap anywhere in
			// it focuses the editor; with its padding it is at least
			// minTarget tall.
			return editorBox(f.env, gtx, &f.editor, f.Label, func(gtx layout.Context) layout.Dimensions {
				return background(gtx, c.Surface, edge, gtx.Dp(6), bw, func(gtx layout.Context) layout.Dimensions {
					// An inset keeps the minimum it is given: the text's
					// minimum is what the padding leaves of minTarget.
					pad := unit.Dp(14)
					gtx.Constraints.Min.Y = max(0, gtx.Dp(minTarget)-2*gtx.Dp(pad))
					return layout.Inset{Left: 12, Right: 12, Top: pad, Bottom: pad}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						e := material.Editor(th, &f.editor, f.hintLine)
						e.Color = c.Text
						e.HintColor = c.Muted
						e.SelectionColor = c.Selected
						return e.Layout(gtx)
					})
				})
			})
		}),
		layout.Rigid(layout.Spacer{Height: 4}.Layout),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			if errText != "" {
				l := material.Body2(th, errText)
				l.Color = c.Error
				return describe(gtx, f.errDesc.of(f.Label, " error"), l.Layout)
			}
			l := material.Caption(th, reading)
			l.Color = c.Muted
			l.TextSize = unit.Sp(13)
			return describe(gtx, f.readDesc.of(f.Label, " reading"), l.Layout)
		}),
	)
}

// lines returns the error line under the box, or "" and the reading line;
// both are kept until the text is parsed again, SetError is called, or
// the label, hint or dimension change.
func (f *Field) lines() (errText, reading string) {
	f.fresh()
	key := fieldLineKey{label: f.Label, hint: f.Hint, dim: f.Dim}
	if !f.lineOK || f.lineKey != key {
		f.lineOK, f.lineKey = true, key
		f.errLine, f.readLine, f.hintLine = f.ErrorText(), "", f.hint()
		if f.errLine == "" {
			f.readLine = f.reading()
		}
	}
	return f.errLine, f.readLine
}

// reading is the line under a field that parsed: for a pressure it says
// how the text was read, gauge or absolute ("30 bar read as 30 barg = 31.01
// bar absolute"); otherwise the hint.
func (f *Field) reading() string {
	if q, err := f.Quantity(); err == nil && q.Dim == units.DimPressure && strings.TrimSpace(f.Text()) != "" {
		return units.DescribePressure(f.Text(), q, f.Options.Atmosphere)
	}
	return f.hint()
}

// inputHint is the keyboard a phone shows for the field. A count or a
// plain number without ± gets the number pad (key.HintNumeric: digits, a
// decimal point and a sign); everything else takes units and ±, so it
// needs letters, and gets key.HintURL: a full keyboard with autocorrect,
// capitals and spell checking off (Gio turns them on for HintText). The
// page shell (assets/web/index.html) turns the browser's URL keyboard and
// suggestions back to plain text.
func (f *Field) inputHint() key.InputHint {
	if f.In != nil && !f.In.PM && (f.In.Kind == sheet.Count || f.In.Kind == sheet.Number) {
		return key.HintNumeric
	}
	return key.HintURL
}

// pmHint is what a hint says about typing ± on a keyboard without it.
const pmHint = "± or +- for an uncertainty"

// hint returns the accepted-units hint; a field that takes ± says that
// "+-" types it.
func (f *Field) hint() string {
	h := f.Hint
	if h == "" {
		h = dimHints[f.Dim]
	}
	if h == "" {
		h = "value in " + units.SIUnit(f.Dim)
	}
	if f.In != nil && f.In.PM && !strings.Contains(h, "+-") {
		h += "; " + pmHint
	}
	return h
}

// dimHints are the default "what you can type" lines per dimension.
var dimHints = map[units.Dimension]string{
	units.DimLength:                "e.g. 250 mm, 25 cm, 10 in, 0.25 m",
	units.DimTemperature:           "e.g. 300 K, 27 degC, 80 degF",
	units.DimTemperatureDifference: "e.g. 40 K, 40 degC, 72 degF",
	units.DimPressure:              "absolute: 10 bar, 145 psi, 1 MPa; gauge: 9 barg, 130 psig",
	units.DimStress:                "e.g. 120 MPa, 17 ksi, 120 N/mm²",
	units.DimFrequency:             "e.g. 440 Hz, 1.2 kHz, 440 Hz ± 5 Hz (type +- for ±)",
	units.DimVolume:                "e.g. 2 L, 2000 cm³, 0.002 m³",
	units.DimNone:                  "a number, or a percentage such as 30 %",
}
