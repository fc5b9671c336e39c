package ui

import (
	"image"

	"gioui.org/font"
	"gioui.org/layout"
	"gioui.org/op/clip"
	"gioui.org/op/paint"
	"gioui.org/unit"
	"gioui.org/widget/material"
)

// Caution is a visually distinct box of safety cautions. Every result that
// bears on pressure, stored energy, oxygen depletion, hot parts or sound
// level is shown next to one; the screen supplies the words, which should
// defer to local codes and licensed practice.
type Caution struct {
	// Heading is the first line, e.g. "Before you pressurise". Empty
	// means "Caution".
	Heading string
	// Lines are the cautions, one paragraph each.
	Lines []string

	env   *Env
	head  layout.Widget // layoutHeading, bound once
	lines indexed       // the widget of each line
	col   column
}

// NewCaution returns a caution box.
func NewCaution(env *Env, heading string, lines ...string) *Caution {
	return &Caution{Heading: heading, Lines: lines, env: env}
}

// Layout draws the box across the available width.
func (c *Caution) Layout(gtx layout.Context) layout.Dimensions {
	if c.head == nil {
		c.head = c.layoutHeading
		c.lines.draw = c.layoutLine
	}
	col := c.env.Colors
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return background(gtx, col.CautionBg, col.CautionEdge, gtx.Dp(6), gtx.Dp(2), func(gtx layout.Context) layout.Dimensions {
		return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			return c.col.headAndLines(gtx, c.head, &c.lines, len(c.Lines))
		})
	})
}

// layoutHeading draws the sign and the heading ("Caution" when empty).
func (c *Caution) layoutHeading(gtx layout.Context) layout.Dimensions {
	heading := c.Heading
	if heading == "" {
		heading = "Caution"
	}
	return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
		layout.Rigid(c.mark),
		layout.Rigid(layout.Spacer{Width: 8}.Layout),
		layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
			l := material.Label(c.env.Theme, unit.Sp(17), heading)
			l.Color = c.env.Colors.CautionEdge
			l.Font.Weight = font.Bold
			return l.Layout(gtx)
		}))
}

// layoutLine draws caution line i.
func (c *Caution) layoutLine(gtx layout.Context, i int) layout.Dimensions {
	l := material.Body2(c.env.Theme, c.Lines[i])
	l.Color = c.env.Colors.CautionText
	l.TextSize = unit.Sp(15)
	return l.Layout(gtx)
}

// mark draws the caution sign: an exclamation mark in a filled circle (the
// embedded fonts have no warning-sign glyph).
func (c *Caution) mark(gtx layout.Context) layout.Dimensions {
	d := gtx.Dp(22)
	size := image.Pt(d, d)
	paint.FillShape(gtx.Ops, c.env.Colors.CautionEdge, clip.Ellipse{Max: size}.Op(gtx.Ops))
	gtx.Constraints = layout.Exact(size)
	layout.Center.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		l := material.Label(c.env.Theme, unit.Sp(15), "!")
		l.Color = c.env.Colors.CautionBg
		l.Font.Weight = font.Bold
		return l.Layout(gtx)
	})
	return layout.Dimensions{Size: size}
}
