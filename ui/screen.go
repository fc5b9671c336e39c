package ui

import (
	"image"

	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/op/clip"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"
)

// Screen is one calculator page. A screen is built once by its catalog
// constructor, kept by the App, and laid out every frame while it is on top
// of the back stack. Layout first handles the events of the screen's
// controls, then recomputes if an input changed, then draws; it must not
// block (long solves go through a Job).
type Screen interface {
	// Title is the screen's name in the top bar, in plain words.
	Title() string
	// Layout draws the screen into gtx.Constraints.Max (the content area
	// below the top bar; the screen scrolls itself, e.g. with a Page).
	Layout(gtx layout.Context) layout.Dimensions
}

// Enterer is implemented by screens that want to know when they come to the
// top of the back stack (opened, or uncovered by Back): for example to take
// a value another screen left on the Bench.
type Enterer interface {
	Enter()
}

// Leaver is implemented by screens that want to know when they stop being on
// top (covered by another screen or popped), e.g. to cancel a Job.
type Leaver interface {
	Leave()
}

// Page is a vertically scrolling column of widgets with the app's margins
// and spacing: the usual body of a screen. Make one per screen and keep it.
type Page struct {
	env  *Env
	list widget.List
	// joined is a list of children the page's owner may build into and
	// reuse from frame to frame (see splitLayout); Page itself does not
	// read it.
	joined []layout.Widget
}

// NewPage returns an empty scrolling page.
func NewPage(env *Env) *Page {
	p := &Page{env: env}
	p.list.Axis = layout.Vertical
	return p
}

// Layout draws the children top to bottom, 12 dp apart, with 16 dp margins,
// scrolling when they do not fit, in a column at most readable wide,
// centred.
func (p *Page) Layout(gtx layout.Context, children ...layout.Widget) layout.Dimensions {
	if w := gtx.Dp(readable); gtx.Constraints.Max.X > w {
		size := gtx.Constraints.Max
		gtx.Constraints = layout.Exact(image.Pt(w, size.Y))
		defer op.Offset(image.Pt((size.X-w)/2, 0)).Push(gtx.Ops).Pop()
		p.layout(gtx, children)
		return layout.Dimensions{Size: size}
	}
	return p.layout(gtx, children)
}

// layout draws the children into the whole width.
func (p *Page) layout(gtx layout.Context, children []layout.Widget) layout.Dimensions {
	return material.List(p.env.Theme, &p.list).Layout(gtx, len(children), func(gtx layout.Context, i int) layout.Dimensions {
		in := layout.Inset{Left: 16, Right: 16, Top: 6, Bottom: 6}
		if i == 0 {
			in.Top = 16
		}
		if i == len(children)-1 {
			in.Bottom = 32
		}
		return in.Layout(gtx, children[i])
	})
}

// Heading returns a section heading widget.
func Heading(env *Env, text string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions { return layoutHeading(gtx, env, text) }
}

// layoutHeading draws Heading's heading without making a widget.
func layoutHeading(gtx layout.Context, env *Env, text string) layout.Dimensions {
	l := material.Label(env.Theme, unit.Sp(19), text)
	l.Font.Weight = 600
	l.Color = env.Colors.Text
	return l.Layout(gtx)
}

// Para returns a paragraph of body text.
func Para(env *Env, text string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions { return layoutPara(gtx, env, text) }
}

// layoutPara draws Para's paragraph without making a widget.
func layoutPara(gtx layout.Context, env *Env, text string) layout.Dimensions {
	l := material.Body1(env.Theme, text)
	l.Color = env.Colors.Text
	return l.Layout(gtx)
}

// Note returns a paragraph of small, muted text (assumptions, sources).
func Note(env *Env, text string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions { return layoutNote(gtx, env, text) }
}

// layoutNote draws Note's paragraph without making a widget.
func layoutNote(gtx layout.Context, env *Env, text string) layout.Dimensions {
	l := material.Body2(env.Theme, text)
	l.Color = env.Colors.Muted
	return l.Layout(gtx)
}

// Described wraps w in its own semantic node described by desc, so tests
// and screen readers can find it: the node's Label is w's text and its
// Description is desc (e.g. a result row's name).
func Described(desc string, w layout.Widget) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions { return describe(gtx, desc, w) }
}

// describe draws w in its own semantic node described by desc, as the
// widget of Described does, without making a widget (and so without
// allocating) in the frame.
func describe(gtx layout.Context, desc string, w layout.Widget) layout.Dimensions {
	m := op.Record(gtx.Ops)
	dims := w(gtx)
	call := m.Stop()
	defer clip.Rect{Max: dims.Size}.Push(gtx.Ops).Pop()
	semantic.DescriptionOp(desc).Add(gtx.Ops)
	call.Add(gtx.Ops)
	return dims
}
