package ui

import (
	"gioui.org/layout"
	"gioui.org/widget/material"
)

// markedWidget draws input it's widget w and, when its value was carried
// from another screen, the line under it: "from Tube resonance" and an
// Undo button at least 48 dp tall that puts the earlier text back. The
// line is described "<label> carried" and the button "<label> undo" for
// tests and screen readers.
func (it *formItem) markedWidget(env *Env, w layout.Widget) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		m := it.mark
		if m != nil && m.info != "" {
			return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
				layout.Rigid(w),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					gtx.Constraints.Max.X = min(gtx.Constraints.Max.X, gtx.Dp(fieldWidth))
					l := material.Body2(env.Theme, m.info)
					l.Color = env.Colors.Text
					l.Font.Weight = 600
					return Described(it.in.Label+" carried", l.Layout)(gtx)
				}),
			)
		}
		if m == nil || it.text() != m.text {
			return w(gtx)
		}
		label := it.in.Label
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
			layout.Rigid(w),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints.Max.X = min(gtx.Constraints.Max.X, gtx.Dp(fieldWidth))
				return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
					layout.Flexed(1, Described(label+" carried", func(gtx layout.Context) layout.Dimensions {
						text := "from " + m.from
						if m.what != "" {
							text += ": " + m.what
						}
						l := material.Body2(env.Theme, text)
						l.Color = env.Colors.Text
						l.Font.Weight = 600
						return l.Layout(gtx)
					})),
					layout.Rigid(layout.Spacer{Width: 8}.Layout),
					layout.Rigid(Described(label+" undo", func(gtx layout.Context) layout.Dimensions {
						gtx.Constraints.Min.X = gtx.Dp(64)
						return keepButton(env, gtx, &m.undo, "Undo", false)
					})),
				)
			}),
		)
	}
}
