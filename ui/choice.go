package ui

import (
	"image"

	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"
)

// Choice is a single-choice row of chips that wraps onto more lines on
// narrow screens: gas species, pore shapes, tube ends. Keys are stable
// identifiers; labels are what people read.
type Choice struct {
	// Label names the choice, shown above the chips; may be empty.
	Label string

	env      *Env
	keys     []string
	labels   []string
	clicks   []widget.Clickable
	selected int
	changed  bool
}

// NewChoice returns a choice among keys (shown as labels; labels may be nil
// to show the keys) with the first key selected.
func NewChoice(env *Env, label string, keys, labels []string) *Choice {
	if labels == nil {
		labels = keys
	}
	if len(labels) != len(keys) || len(keys) == 0 {
		panic("ui: NewChoice needs one label per key and at least one key")
	}
	return &Choice{
		Label:  label,
		env:    env,
		keys:   append([]string(nil), keys...),
		labels: append([]string(nil), labels...),
		clicks: make([]widget.Clickable, len(keys)),
	}
}

// Selected returns the key of the selected chip.
func (c *Choice) Selected() string { return c.keys[c.selected] }

// Select selects key from code (not a user change) and reports whether the
// key exists.
func (c *Choice) Select(key string) bool {
	for i, k := range c.keys {
		if k == key {
			c.selected = i
			return true
		}
	}
	return false
}

// Changed reports, once, whether the user picked another chip since the
// last Update or Changed call.
func (c *Choice) Changed() bool {
	ch := c.changed
	c.changed = false
	return ch
}

// Update handles taps and reports whether the user picked another chip
// since the last Update or Changed call.
func (c *Choice) Update(gtx layout.Context) bool {
	c.update(gtx)
	return c.Changed()
}

// update handles taps and remembers a change for Changed.
func (c *Choice) update(gtx layout.Context) bool {
	changed := false
	for i := range c.clicks {
		if c.clicks[i].Clicked(gtx) && i != c.selected {
			c.selected = i
			changed = true
		}
	}
	if changed {
		c.changed = true
	}
	return changed
}

// Layout draws the label and the chips.
func (c *Choice) Layout(gtx layout.Context) layout.Dimensions {
	if c.update(gtx) {
		gtx.Execute(op.InvalidateCmd{})
	}
	th := c.env.Theme
	col := c.env.Colors
	chips := func(gtx layout.Context) layout.Dimensions {
		return flow(gtx, gtx.Dp(8), gtx.Dp(8), len(c.keys), func(gtx layout.Context, i int) layout.Dimensions {
			sel := i == c.selected
			return c.clicks[i].Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				semantic.RadioButton.Add(gtx.Ops)
				semantic.SelectedOp(sel).Add(gtx.Ops)
				// Selected: filled with the accent, so that it stands
				// apart from the outlined others in glare.
				bg, edge, fg := col.Surface, col.Outline, col.Text
				if sel {
					bg, edge, fg = col.Accent, col.Accent, col.OnAccent
				}
				bw := gtx.Dp(1)
				if sel {
					bw = gtx.Dp(2)
				}
				return background(gtx, bg, edge, gtx.Dp(16), bw, func(gtx layout.Context) layout.Dimensions {
					// At least minTarget both ways for gloved fingers,
					// the text centred.
					gtx = atTarget(gtx)
					return layout.Center.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						return layout.Inset{Left: 14, Right: 14, Top: 6, Bottom: 6}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
							l := material.Body2(th, c.labels[i])
							l.Color = fg
							l.TextSize = unit.Sp(15)
							if sel {
								l.Font.Weight = 600
							}
							return l.Layout(gtx)
						})
					})
				})
			})
		})
	}
	if c.Label == "" {
		return chips(gtx)
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			l := material.Body2(th, c.Label)
			l.Font.Weight = 600
			l.Color = col.Text
			return l.Layout(gtx)
		}),
		layout.Rigid(layout.Spacer{Height: 6}.Layout),
		layout.Rigid(chips),
	)
}

// flow lays out n children left to right, wrapping to a new line when the
// next child would pass the right edge; gapX and gapY are pixel gaps.
func flow(gtx layout.Context, gapX, gapY, n int, child func(gtx layout.Context, i int) layout.Dimensions) layout.Dimensions {
	maxW := gtx.Constraints.Max.X
	cgtx := gtx
	cgtx.Constraints.Min = image.Point{}
	x, y, rowH, width := 0, 0, 0, 0
	for i := range n {
		m := op.Record(gtx.Ops)
		d := child(cgtx, i)
		call := m.Stop()
		if x > 0 && x+d.Size.X > maxW {
			x = 0
			y += rowH + gapY
			rowH = 0
		}
		st := op.Offset(image.Pt(x, y)).Push(gtx.Ops)
		call.Add(gtx.Ops)
		st.Pop()
		x += d.Size.X
		width = max(width, x)
		x += gapX
		rowH = max(rowH, d.Size.Y)
	}
	return layout.Dimensions{Size: image.Pt(width, y+rowH)}
}
