package ui

import (
	"gioui.org/layout"
	"gioui.org/widget/material"
)

// statusLine draws a status sentence (errors in the error colour) as a
// semantic node described desc.
func statusLine(env *Env, desc, text string, bad bool) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions { return layoutStatusLine(gtx, env, desc, text, bad) }
}

// layoutStatusLine draws statusLine's sentence without making a widget.
func layoutStatusLine(gtx layout.Context, env *Env, desc, text string, bad bool) layout.Dimensions {
	l := material.Body1(env.Theme, text)
	l.Color = env.Colors.Text
	if bad {
		l.Color = env.Colors.Error
	}
	return describe(gtx, desc, l.Layout)
}
