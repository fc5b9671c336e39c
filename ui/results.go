package ui

import (
	"fmt"
	"image"
	"math"
	"unicode/utf8"

	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// Results is a card of result rows (label, value with its unit, optional
// note), followed by the model's warnings and, when the solve reports any,
// a closed Details section with its diagnostics. Values go through the units
// formatters; a non-finite value is never shown: the row reads "—" with a
// reason. A screen fills it after each computation (Reset, then Add...).
type Results struct {
	env      *Env
	rows     []resultRow
	warnings []string
	failure  string
	details  resultDetails

	// Kept between frames, so that an unchanged card allocates nothing.
	col        column
	rowWs      indexed // the widget of row i
	warnWs     indexed // the widget of warning i
	warnTexts  []joined
	failWidget layout.Widget
	failText   joined
	detailsW   layout.Widget
}

type resultRow struct {
	label, value, note string
	outcome            sheet.Outcome // set when the row is a check
	outcomeDesc        string        // label + " outcome", made when first drawn
}

// NewResults returns an empty results card.
func NewResults(env *Env) *Results { return &Results{env: env} }

// Reset removes all rows, warnings and the failure text.
func (r *Results) Reset() {
	r.rows = r.rows[:0]
	r.warnings = r.warnings[:0]
	r.failure = ""
	r.details.rows = r.details.rows[:0]
}

// finite reports whether v is neither NaN nor ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// notDefined is the note of a row whose value is not a finite number.
const notDefined = "no finite value for these inputs"

// Add appends a row with v (SI) formatted in the SI unit of dim.
func (r *Results) Add(label string, v float64, dim units.Dimension) {
	if !finite(v) {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: notDefined})
		return
	}
	r.rows = append(r.rows, resultRow{label: label, value: units.Format(v, dim)})
}

// AddIn appends a row with v (SI) shown in the chosen unit, e.g. "bar" or
// "mm".
func (r *Results) AddIn(label string, v float64, unit string) {
	if !finite(v) {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: notDefined})
		return
	}
	s, err := units.FormatIn(v, unit)
	if err != nil {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: err.Error()})
		return
	}
	r.rows = append(r.rows, resultRow{label: label, value: s})
}

// AddPM appends a row with a value and its standard uncertainty, both SI,
// e.g. "440 ± 5 Hz". A non-finite uncertainty drops the ± part with a note.
func (r *Results) AddPM(label string, v, u float64, dim units.Dimension) {
	switch {
	case !finite(v):
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: notDefined})
	case !finite(u):
		r.rows = append(r.rows, resultRow{label: label, value: units.Format(v, dim), note: "uncertainty not available"})
	default:
		r.rows = append(r.rows, resultRow{label: label, value: units.FormatPM(v, u, dim)})
	}
}

// AddPMIn is AddPM shown in the chosen unit of dimension dim, e.g. "ms".
func (r *Results) AddPMIn(label string, v, u float64, dim units.Dimension, unit string) {
	r.addPMWith(units.FormatPMIn, label, v, u, dim, unit)
}

// addPMWith appends a row written by format (units.FormatPMIn or
// units.FormatPMPrefer) in unit: "—" with a reason for a value that is not
// finite, the value alone with a note for an uncertainty that is not.
func (r *Results) addPMWith(format func(v, u float64, d units.Dimension, unit string) (string, error),
	label string, v, u float64, dim units.Dimension, unit string) {
	if !finite(v) {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: notDefined})
		return
	}
	note := ""
	if !finite(u) {
		u, note = 0, "uncertainty not available"
	}
	s, err := format(v, u, dim, unit)
	if err != nil {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: err.Error()})
		return
	}
	r.rows = append(r.rows, resultRow{label: label, value: s, note: note})
}

// AddText appends a row whose value is already text, e.g. a verdict.
func (r *Results) AddText(label, value string) {
	r.rows = append(r.rows, resultRow{label: label, value: value})
}

// AddNote attaches a note (small text under the value) to the last row.
func (r *Results) AddNote(note string) {
	if len(r.rows) > 0 {
		r.rows[len(r.rows)-1].note = note
	}
}

// Warn appends warnings shown under the rows.
func (r *Results) Warn(msgs ...string) { r.warnings = append(r.warnings, msgs...) }

// Fail replaces the rows with one line saying why there is no result.
func (r *Results) Fail(err error) {
	r.rows = r.rows[:0]
	r.failure = err.Error()
}

// Failure returns the failure text, or "".
func (r *Results) Failure() string { return r.failure }

// Value returns the shown text of the row labelled label.
func (r *Results) Value(label string) (string, bool) {
	for _, row := range r.rows {
		if row.label == label {
			return row.value, true
		}
	}
	return "", false
}

// Warnings returns the warnings shown.
func (r *Results) Warnings() []string { return append([]string(nil), r.warnings...) }

// Len returns the number of rows.
func (r *Results) Len() int { return len(r.rows) }

// Layout draws the card.
func (r *Results) Layout(gtx layout.Context) layout.Dimensions {
	if r.failWidget == nil {
		r.failWidget = r.layoutFailure
		r.rowWs.draw = r.layoutRowAt
		r.warnWs.draw = r.layoutWarning
		r.detailsW = r.layoutDetails
	}
	c := r.env.Colors
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	r.col.reset()
	if r.failure != "" {
		r.col.add(r.failWidget)
	}
	for i := range r.rows {
		r.col.add(r.rowWs.at(i))
	}
	for i := range r.warnings {
		r.col.add(r.warnWs.at(i))
	}
	if len(r.details.rows) > 0 {
		r.col.add(r.detailsW)
	}
	if r.col.empty() {
		return layout.Dimensions{}
	}
	return background(gtx, c.Surface, c.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
		return layout.Inset{Top: 4, Bottom: 4}.Layout(gtx, r.col.layout)
	})
}

// layoutFailure draws why there is no result.
func (r *Results) layoutFailure(gtx layout.Context) layout.Dimensions {
	return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		l := material.Body1(r.env.Theme, r.failText.of("No result: ", r.failure))
		l.Color = r.env.Colors.Error
		return describe(gtx, "No result", l.Layout)
	})
}

// layoutRowAt draws row i, with a hairline under it unless it is the last.
func (r *Results) layoutRowAt(gtx layout.Context, i int) layout.Dimensions {
	return r.layoutRow(gtx, &r.rows[i], i < len(r.rows)-1)
}

// layoutWarning draws warning i.
func (r *Results) layoutWarning(gtx layout.Context, i int) layout.Dimensions {
	for len(r.warnTexts) <= i {
		r.warnTexts = append(r.warnTexts, joined{})
	}
	text := r.warnTexts[i].of("Note: ", r.warnings[i])
	return layout.Inset{Left: 14, Right: 14, Top: 4, Bottom: 8}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		l := material.Body2(r.env.Theme, text)
		l.Color = r.env.Colors.Warning
		return l.Layout(gtx)
	})
}

// longValue is the length (in characters) above which a row's value is
// words rather than a number, and goes under its label as a paragraph.
const longValue = 40

// layoutRow draws one row: label on the left, value on the right (or, for
// a value in many words, under the label), note below; a hairline under it
// when divider is set.
func (r *Results) layoutRow(gtx layout.Context, row *resultRow, divider bool) layout.Dimensions {
	th := r.env.Theme
	c := r.env.Colors
	m := op.Record(gtx.Ops)
	long := utf8.RuneCountInString(row.value) > longValue
	dims := layout.Inset{Left: 14, Right: 14, Top: 9, Bottom: 9}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		gtx.Constraints.Min.X = gtx.Constraints.Max.X
		if long {
			return r.layoutLongRow(gtx, row)
		}
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				return layout.Flex{Alignment: layout.Baseline, Spacing: layout.SpaceBetween}.Layout(gtx,
					layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
						l := material.Body1(th, row.label)
						l.Color = c.Muted
						return l.Layout(gtx)
					}),
					layout.Rigid(layout.Spacer{Width: 12}.Layout),
					layout.Rigid(func(gtx layout.Context) layout.Dimensions {
						return r.badge(gtx, row)
					}),
					layout.Rigid(func(gtx layout.Context) layout.Dimensions {
						l := material.Label(th, unit.Sp(17), row.value)
						l.Color = c.Text
						l.Font.Weight = 600
						return describe(gtx, row.label, l.Layout)
					}),
				)
			}),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				if row.note == "" {
					return layout.Dimensions{}
				}
				l := material.Caption(th, row.note)
				l.Color = c.Muted
				l.TextSize = unit.Sp(13)
				return layout.Inset{Top: 2}.Layout(gtx, l.Layout)
			}),
		)
	})
	call := m.Stop()
	call.Add(gtx.Ops)
	if divider {
		line := image.Pt(dims.Size.X-gtx.Dp(28), gtx.Dp(1))
		st := op.Offset(image.Pt(gtx.Dp(14), dims.Size.Y-line.Y)).Push(gtx.Ops)
		fill(gtx, c.Divider, line)
		st.Pop()
	}
	return dims
}

// layoutLongRow draws a row whose value is many words: the label (with
// the badge of a check), the value as a paragraph under it, then the note.
func (r *Results) layoutLongRow(gtx layout.Context, row *resultRow) layout.Dimensions {
	th := r.env.Theme
	c := r.env.Colors
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
				layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					l := material.Body1(th, row.label)
					l.Color = c.Muted
					return l.Layout(gtx)
				}),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions { return r.badge(gtx, row) }),
			)
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return layout.Inset{Top: 4}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				l := material.Body1(th, row.value)
				l.Color = c.Text
				return describe(gtx, row.label, l.Layout)
			})
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			if row.note == "" {
				return layout.Dimensions{}
			}
			l := material.Caption(th, row.note)
			l.Color = c.Muted
			l.TextSize = unit.Sp(13)
			return layout.Inset{Top: 2}.Layout(gtx, l.Layout)
		}),
	)
}

// badge draws a check's outcome as a coloured box with its word ("FAIL"
// in white on red), readable in glare and by a screen reader; nothing for
// a row that is not a check.
func (r *Results) badge(gtx layout.Context, row *resultRow) layout.Dimensions {
	word, bg := outcomeLook(r.env.Colors, row.outcome)
	if word == "" {
		return layout.Dimensions{}
	}
	if row.outcomeDesc == "" {
		row.outcomeDesc = row.label + " outcome"
	}
	return layout.Inset{Right: 8}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		return describe(gtx, row.outcomeDesc, func(gtx layout.Context) layout.Dimensions {
			return background(gtx, bg, bg, gtx.Dp(4), 0, func(gtx layout.Context) layout.Dimensions {
				return layout.Inset{Left: 6, Right: 6, Top: 2, Bottom: 2}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					l := material.Label(r.env.Theme, unit.Sp(14), word)
					l.Color = r.env.Colors.OnBadge
					l.Font.Weight = 700
					return l.Layout(gtx)
				})
			})
		})
	})
}

// String lists the rows as "label: value" lines, each row's note on an
// indented line below it (for tests and logs).
func (r *Results) String() string {
	s := ""
	for _, row := range r.rows {
		if word, _ := outcomeLook(r.env.Colors, row.outcome); word != "" {
			s += fmt.Sprintf("%s: [%s] %s\n", row.label, word, row.value)
		} else {
			s += fmt.Sprintf("%s: %s\n", row.label, row.value)
		}
		if row.note != "" {
			s += "  " + row.note + "\n"
		}
	}
	return s
}
