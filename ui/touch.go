package ui

import (
	"image"

	"gioui.org/f32"
	"gioui.org/gesture"
	"gioui.org/io/key"
	"gioui.org/io/pointer"
	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/op/clip"
	"gioui.org/op/paint"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"
)

// minTarget is the smallest side of anything a finger taps: 48 dp, the
// touch-target size of Material Design's accessibility guidance, above
// WCAG 2.2's 44 CSS px (2.5.5, Target Size). People at the bench wear
// gloves; TestTouchTargets holds every control of every screen to it.
const minTarget = unit.Dp(48)

// atTarget returns gtx with its minimum raised to minTarget both ways
// (never above the maximum), for a control's layout.
func atTarget(gtx layout.Context) layout.Context {
	m := gtx.Dp(minTarget)
	gtx.Constraints.Min.X = min(max(gtx.Constraints.Min.X, m), gtx.Constraints.Max.X)
	gtx.Constraints.Min.Y = min(max(gtx.Constraints.Min.Y, m), gtx.Constraints.Max.Y)
	return gtx
}

// button draws a material button at least minTarget square: filled with
// the accent when primary, else on the selected shade with body text.
func button(env *Env, gtx layout.Context, c *widget.Clickable, label string, primary bool) layout.Dimensions {
	b := material.Button(env.Theme, c, label)
	if !primary {
		b.Background = env.Colors.Selected
		b.Color = env.Colors.Text
	}
	return b.Layout(atTarget(gtx))
}

// editorBox lays out w (a box drawn around the editor ed, with padding)
// and makes the whole box a target: a press anywhere in it, the padding
// included, focuses ed as the editor itself does: at the press of a
// mouse, at the end of a tap of a finger (a finger that scrolls the page
// does not focus it). desc, when not "", describes the box for tests and
// screen readers (a field's label). While ed has the focus, Escape leaves
// it (and hides a phone's keyboard) instead of leaving the screen.
func editorBox(env *Env, gtx layout.Context, ed *widget.Editor, desc string, w layout.Widget) layout.Dimensions {
	if env.boxTaps == nil {
		env.boxTaps = map[*widget.Editor]*gesture.Click{}
	}
	tap := env.boxTaps[ed]
	if tap == nil {
		tap = new(gesture.Click)
		env.boxTaps[ed] = tap
	}
	for {
		e, ok := tap.Update(gtx.Source)
		if !ok {
			break
		}
		mouse := e.Source == pointer.Mouse
		if (e.Kind == gesture.KindPress && mouse) || (e.Kind == gesture.KindClick && !mouse) {
			gtx.Execute(key.FocusCmd{Tag: ed})
		}
	}
	if gtx.Focused(ed) {
		// Escape in the next frame leaves the box, not the screen
		// (App.update).
		env.typing = true
	}
	m := op.Record(gtx.Ops)
	dims := w(gtx)
	call := m.Stop()
	defer clip.Rect{Max: dims.Size}.Push(gtx.Ops).Pop()
	if desc != "" {
		semantic.DescriptionOp(desc).Add(gtx.Ops)
	}
	pointer.CursorText.Add(gtx.Ops)
	tap.Add(gtx.Ops)
	call.Add(gtx.Ops)
	return dims
}

// targetRow makes a row (a list entry, a line of the review) at least
// minTarget tall with w centred vertically in it; w gets no minimum
// height.
func targetRow(gtx layout.Context, w layout.Widget) layout.Dimensions {
	cgtx := gtx
	cgtx.Constraints.Min.Y = 0
	m := op.Record(gtx.Ops)
	d := w(cgtx)
	call := m.Stop()
	h := max(d.Size.Y, min(gtx.Dp(minTarget), gtx.Constraints.Max.Y))
	st := op.Offset(image.Pt(0, (h-d.Size.Y)/2)).Push(gtx.Ops)
	call.Add(gtx.Ops)
	st.Pop()
	return layout.Dimensions{Size: image.Pt(d.Size.X, h), Baseline: d.Baseline}
}

// tickSize is the side of a tick's box.
const tickSize = unit.Dp(24)

// tick draws a check box with its words as one row the full width and at
// least minTarget tall, so that a tap anywhere along it toggles b. The box
// is drawn here (not material's icon) so that it lines up with the first
// line of the words: an outlined square, filled with the accent and ticked
// when b is set.
func tick(env *Env, gtx layout.Context, b *widget.Bool, label string) layout.Dimensions {
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return b.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		semantic.CheckBox.Add(gtx.Ops)
		return targetRow(gtx, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min.X = gtx.Constraints.Max.X
			return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					return layout.Inset{Left: 4, Right: 12}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						return tickBox(gtx, env.Colors, b.Value)
					})
				}),
				layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					return layout.Inset{Top: 4, Bottom: 4}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						l := material.Body1(env.Theme, label)
						l.Color = env.Colors.Text
						return l.Layout(gtx)
					})
				}),
			)
		})
	})
}

// tickBox draws the square of a tick: outlined when clear, filled with
// the accent and carrying a check mark when set.
func tickBox(gtx layout.Context, c Colors, on bool) layout.Dimensions {
	s := gtx.Dp(tickSize)
	size := image.Pt(s, s)
	if !on {
		box(gtx, size, c.Surface, c.Outline, gtx.Dp(4), gtx.Dp(2))
		return layout.Dimensions{Size: size}
	}
	box(gtx, size, c.Accent, c.Accent, gtx.Dp(4), 0)
	var p clip.Path
	p.Begin(gtx.Ops)
	f := float32(s)
	p.MoveTo(f32.Pt(f*0.22, f*0.52))
	p.LineTo(f32.Pt(f*0.42, f*0.72))
	p.LineTo(f32.Pt(f*0.78, f*0.30))
	paint.FillShape(gtx.Ops, c.OnAccent, clip.Stroke{Path: p.End(), Width: float32(gtx.Dp(3))}.Op())
	return layout.Dimensions{Size: size}
}
