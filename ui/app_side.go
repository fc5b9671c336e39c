package ui

import (
	"image"

	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"
)

// wideAt is the window width from which the catalog may stay beside the
// screen (a tablet held upright, 768 dp, gets the single column).
const wideAt = unit.Dp(840)

// shortBelow is the window height under which the catalog starts hidden
// even on a wide window: a phone held sideways (about 412 dp high) keeps
// its whole width for the screen until the list is asked for.
const shortBelow = unit.Dp(500)

// screenMax is the widest a screen grows on large windows: two columns
// of a readable width side by side.
const screenMax = unit.Dp(1240)

// sideWidth returns the width of the catalog beside the screen on a
// window w px wide: 320 dp on a desktop, down to 260 dp on a small tablet,
// so that the screen keeps room for its two columns.
func sideWidth(gtx layout.Context, w int) int {
	return min(gtx.Dp(320), max(gtx.Dp(260), w*27/100))
}

// sideToggle is the top bar's "Hide list" / "Show list" button of wide
// windows. Until it is tapped the list shows on wide windows that are not
// short; a tap hides or shows it for the rest of the session.
type sideToggle struct {
	click widget.Clickable
	set   bool // tapped at least once
	shown bool // the choice of the last tap
}

// beside reports whether the catalog sits beside the screen in a window
// of size px.
func (t *sideToggle) beside(gtx layout.Context, size image.Point) bool {
	if size.X < gtx.Dp(wideAt) {
		return false
	}
	if t.set {
		return t.shown
	}
	return size.Y >= gtx.Dp(shortBelow)
}

// update flips the list when the button was tapped in a window of size.
func (t *sideToggle) update(gtx layout.Context, size image.Point) {
	for t.click.Clicked(gtx) {
		t.shown = !t.beside(gtx, size)
		t.set = true
	}
}

// layout draws the button in the bar; nothing on windows too narrow for
// the list to sit beside the screen.
func (t *sideToggle) layout(gtx layout.Context, env *Env, size image.Point) layout.Dimensions {
	if size.X < gtx.Dp(wideAt) {
		return layout.Dimensions{}
	}
	word, desc := "Hide list", "Hide the list of calculators; the screen takes the whole width"
	if !t.beside(gtx, size) {
		word, desc = "Show list", "Show the list of calculators beside the screen"
	}
	return barButton(gtx, env, &t.click, word, desc)
}

// barButton draws an outlined button the full height of the top bar
// (56 dp, above the 48 dp minimum for gloved fingers) with word on it and
// desc for screen readers.
func barButton(gtx layout.Context, env *Env, click *widget.Clickable, word, desc string) layout.Dimensions {
	return click.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		semantic.Button.Add(gtx.Ops)
		semantic.DescriptionOp(desc).Add(gtx.Ops)
		gtx.Constraints.Min.Y = gtx.Constraints.Max.Y
		return layout.Center.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			return layout.Inset{Left: 12, Right: 14}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				c := env.Colors
				return background(gtx, c.Accent, c.OnAccent, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
					return layout.Inset{Left: 10, Right: 10, Top: 6, Bottom: 6}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						l := material.Label(env.Theme, unit.Sp(15), word)
						l.Color = c.OnAccent
						l.Font.Weight = 600
						return l.Layout(gtx)
					})
				})
			})
		})
	})
}
