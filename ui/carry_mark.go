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
					return describe(gtx, m.carriedDesc.of(it.in.Label, " carried"), l.Layout)
				}),
			)
		}
		if m == nil || it.text() != m.text {
			return w(gtx)
		}
		if m.line == "" {
			m.line = "from " + m.from
			if m.what != "" {
				m.line += ": " + m.what
			}
		}
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
			layout.Rigid(w),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints.Max.X = min(gtx.Constraints.Max.X, gtx.Dp(fieldWidth))
				return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
					layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
						l := material.Body2(env.Theme, m.line)
						l.Color = env.Colors.Text
						l.Font.Weight = 600
						return describe(gtx, m.carriedDesc.of(it.in.Label, " carried"), l.Layout)
					}),
					layout.Rigid(layout.Spacer{Width: 8}.Layout),
					layout.Rigid(func(gtx layout.Context) layout.Dimensions {
						gtx.Constraints.Min.X = gtx.Dp(64)
						return describe(gtx, m.undoDesc.of(it.in.Label, " undo"), func(gtx layout.Context) layout.Dimensions {
							return keepButton(env, gtx, &m.undo, "Undo", false)
						})
					}),
				)
			}),
		)
	}
}
