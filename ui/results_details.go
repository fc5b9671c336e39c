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
	th := r.env.Theme
	c := r.env.Colors
	rule := layout.Rigid(func(gtx layout.Context) layout.Dimensions {
		return layout.Inset{Left: 14, Right: 14}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			size := image.Pt(gtx.Constraints.Max.X, gtx.Dp(1))
			fill(gtx, c.Divider, size)
			return layout.Dimensions{Size: size}
		})
	})
	children := []layout.FlexChild{rule, layout.Rigid(Described(detailsLabel, func(gtx layout.Context) layout.Dimensions {
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
					l := material.Label(th, unit.Sp(15), words)
					l.Color = c.Accent
					return l.Layout(gtx)
				})
			})
		})
	}))}
	if d.open {
		children = append(children, rule)
		for i, row := range d.rows {
			last := i == len(d.rows)-1
			children = append(children, layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				return r.layoutRow(gtx, row, !last)
			}))
		}
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx, children...)
}
