package ui

import (
	"gioui.org/layout"
)

// wideMin is the width, in dp, from which calculator screens put inputs
// and results side by side: a tablet held upright (768 dp) and a tablet or
// desktop beside the catalog get two columns, a phone one.
const wideMin = 680

// splitGap is the space between the two columns, in dp, beside the
// pages' own 16 dp margins.
const splitGap = 8

// splitWide reports whether splitLayout puts the columns side by side at
// gtx's width.
func splitWide(gtx layout.Context) bool {
	return gtx.Constraints.Max.X >= gtx.Dp(wideMin)
}

// splitLayout lays a calculator screen out. On a narrow window it is one
// scrolling column (left): top, then the inputs, then the outputs, so that
// the headline answer and its cautions come first on a phone. From wideMin
// dp on, the inputs scroll on the left and top and outputs on the right,
// each column on its own, so that a change of an input and its result are
// both in view. Make left and right once per screen and keep them (they
// hold the scroll positions).
func splitLayout(gtx layout.Context, left, right *Page, top, inputs, outputs []layout.Widget) layout.Dimensions {
	if !splitWide(gtx) {
		// The joined list reuses the page's own slice from frame to frame.
		left.joined = append(append(append(left.joined[:0], top...), inputs...), outputs...)
		return left.Layout(gtx, left.joined...)
	}
	gtx.Constraints.Min = gtx.Constraints.Max
	return layout.Flex{}.Layout(gtx,
		layout.Flexed(0.46, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min = gtx.Constraints.Max
			return left.Layout(gtx, inputs...)
		}),
		layout.Rigid(layout.Spacer{Width: splitGap}.Layout),
		layout.Flexed(0.54, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min = gtx.Constraints.Max
			right.joined = append(append(right.joined[:0], top...), outputs...)
			return right.Layout(gtx, right.joined...)
		}),
	)
}
