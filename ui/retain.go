package ui

import (
	"gioui.org/layout"
)

// This file holds the small tools that let a steady frame (nothing
// changed) allocate nothing: widgets bound once and kept, slices of
// children reused from frame to frame, and text joined only when its parts
// change. A closure or method value that is stored in a slice escapes to
// the heap each time it is made; one made once and kept does not.

// Spacers bound once: a method value of layout.Spacer made in a frame and
// kept in a slice of children would be a new allocation each frame.
var (
	gapH6  = layout.Spacer{Height: 6}.Layout
	gapH10 = layout.Spacer{Height: 10}.Layout
	gapH12 = layout.Spacer{Height: 12}.Layout
)

// indexed hands out widgets bound once to an index: widget i draws
// draw(gtx, i). The widgets are made on first use and kept, so lists of
// rows built each frame do not allocate. Set draw once (a method value)
// and keep the indexed in a struct that does not move.
type indexed struct {
	draw func(gtx layout.Context, i int) layout.Dimensions
	ws   []layout.Widget
}

// at returns the widget of index i.
func (x *indexed) at(i int) layout.Widget {
	for len(x.ws) <= i {
		j := len(x.ws)
		x.ws = append(x.ws, func(gtx layout.Context) layout.Dimensions { return x.draw(gtx, j) })
	}
	return x.ws[i]
}

// column lays widgets out top to bottom, as a vertical layout.Flex of
// Rigid children, reusing its slice of children from frame to frame.
type column struct {
	children []layout.FlexChild
}

// reset empties the column for a new frame.
func (c *column) reset() { c.children = c.children[:0] }

// add appends w; w should be bound once (see indexed), not made in the
// frame.
func (c *column) add(w layout.Widget) { c.children = append(c.children, layout.Rigid(w)) }

// empty reports whether nothing was added since reset.
func (c *column) empty() bool { return len(c.children) == 0 }

// layout draws the children added since reset.
func (c *column) layout(gtx layout.Context) layout.Dimensions {
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx, c.children...)
}

// headAndLines fills the column anew with head and then n lines drawn by
// lines, 6 dp apart, and draws it: the layout of the caution box and of a
// safety step's verdict banner.
func (c *column) headAndLines(gtx layout.Context, head layout.Widget, lines *indexed, n int) layout.Dimensions {
	c.reset()
	c.add(head)
	for i := range n {
		c.add(gapH6)
		c.add(lines.at(i))
	}
	return c.layout(gtx)
}

// joined is a string a+b kept until a or b changes, for text (semantic
// descriptions, lines of words) that would otherwise be built each frame.
type joined struct {
	a, b, s string
	ok      bool
}

// of returns a+b, joining only when a or b changed since the last call.
func (j *joined) of(a, b string) string {
	if !j.ok || j.a != a || j.b != b {
		j.a, j.b, j.s, j.ok = a, b, a+b, true
	}
	return j.s
}
