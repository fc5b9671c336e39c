package ui

import (
	"image"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
)

// This file draws the Details section of a results card: the diagnostics
// of a solve (Newton iterations), kept apart from the answers and closed
// until someone opens it.

// detailsLabel names the section's toggle on screen and for tests.
const detailsLabel = "Details"

// resultDetails is the collapsed section under the result rows.
type resultDetails struct {
	rows   []resultRow
	open   bool
	toggle widget.Clickable

	// Kept between frames (see retain.go).
	col           column
	rule, toggleW layout.Widget
	rowWs         indexed
}

// show fills the section from a result's Details.
func (d *resultDetails) show(rows []sheet.Row) {
	for _, row := range rows {
		d.rows = append(d.rows, resultRow{label: row.Label, value: row.Text})
	}
}

// Detail returns the shown text of the detail labelled label, whether the
// section is open or not.
func (r *Results) Detail(label string) (string, bool) {
	for _, row := range r.details.rows {
		if row.label == label {
			return row.value, true
		}
	}
	return "", false
}

// DetailsOpen reports whether the Details section is open.
func (r *Results) DetailsOpen() bool { return r.details.open }

// layoutDetails draws the toggle ("Show details of the solve", a
// full-width row at least 48 dp high for gloved fingers) and, when open,
// the detail rows.
func (r *Results) layoutDetails(gtx layout.Context) layout.Dimensions {
	d := &r.details
	if d.toggle.Clicked(gtx) {
		d.open = !d.open
	}
	if d.rule == nil {
		d.rule = r.layoutDetailsRule
		d.toggleW = r.layoutDetailsToggle
		d.rowWs.draw = r.layoutDetailRow
	}
	d.col.reset()
	d.col.add(d.rule)
	d.col.add(d.toggleW)
	if d.open {
		d.col.add(d.rule)
		for i := range d.rows {
			d.col.add(d.rowWs.at(i))
		}
	}
	return d.col.layout(gtx)
}

// layoutDetailsRule draws the hairline above and under the toggle.
func (r *Results) layoutDetailsRule(gtx layout.Context) layout.Dimensions {
	return layout.Inset{Left: 14, Right: 14}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		size := image.Pt(gtx.Constraints.Max.X, gtx.Dp(1))
		fill(gtx, r.env.Colors.Divider, size)
		return layout.Dimensions{Size: size}
	})
}

// layoutDetailsToggle draws the row that opens and closes the section.
func (r *Results) layoutDetailsToggle(gtx layout.Context) layout.Dimensions {
	d := &r.details
	return describe(gtx, detailsLabel, func(gtx layout.Context) layout.Dimensions {
		return d.toggle.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min.X = gtx.Constraints.Max.X
			gtx.Constraints.Min.Y = gtx.Dp(48)
			return layout.Inset{Left: 14, Right: 14}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				words := "Show details of the solve"
				if d.open {
					words = "Hide details of the solve"
				}
				return layout.W.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					gtx.Constraints.Min = image.Point{} // W keeps the row's height as a minimum
					l := material.Label(r.env.Theme, unit.Sp(15), words)
					l.Color = r.env.Colors.Accent
					return l.Layout(gtx)
				})
			})
		})
	})
}

// layoutDetailRow draws detail row i, with a hairline under it unless it
// is the last.
func (r *Results) layoutDetailRow(gtx layout.Context, i int) layout.Dimensions {
	d := &r.details
	return r.layoutRow(gtx, &d.rows[i], i < len(d.rows)-1)
}
