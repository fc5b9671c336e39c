package ui

import (
	"image"
	"math"

	"gioui.org/io/event"
	"gioui.org/io/pointer"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/op/clip"
	"gioui.org/unit"
	"gioui.org/widget"
)

// XY is one point of a series, in SI units.
type XY struct{ X, Y float64 }

// XYs is a series of points, in the order they are joined.
type XYs []XY

// Axis is one axis of a Chart.
type Axis struct {
	// Label names the quantity: "Mean pressure".
	Label string
	// Unit is the SI unit symbol of the values ("Pa", "m³/s", "K"; "" or
	// "1" for a pure number). The plot writes the numbers with a prefix
	// (kPa) or one power of ten in the title, never an exponent on a tick.
	Unit string
	// Log draws the axis on a log scale (only when every value is
	// positive). The x axis also turns logarithmic by itself when its
	// positive values span two decades or more.
	Log bool
}

// Mark is a point drawn over the lines, such as the current operating
// point or a measurement, with ± half-widths DX and DY (0: no bar).
type Mark struct {
	X, Y, DX, DY float64
}

// Chart is what a Plot draws: lines through swept points and marked
// points, in SI units. Build it with NewXYPlot, AddLine and AddMark when
// the data change, and hand it to Plot.Set.
type Chart struct {
	// Title is shown above the plot.
	Title string
	// X and Y are the axes.
	X, Y Axis
	// Lines are the sweeps, each drawn as a line and listed in the table.
	Lines []XYs
	// Marks are single points drawn over the lines.
	Marks []Mark
}

// NewXYPlot returns an empty chart whose axes carry their units:
// NewXYPlot("Length", "m", "Frequency", "Hz").
func NewXYPlot(xLabel, xUnit, yLabel, yUnit string) *Chart {
	return &Chart{X: Axis{Label: xLabel, Unit: xUnit}, Y: Axis{Label: yLabel, Unit: yUnit}}
}

// AddLine adds a sweep drawn as a line; points with NaN or infinite
// coordinates break the line.
func (c *Chart) AddLine(xy XYs) { c.Lines = append(c.Lines, xy) }

// AddMark marks the point (x, y) with ± half-widths dx and dy (0: none).
func (c *Chart) AddMark(x, y, dx, dy float64) {
	c.Marks = append(c.Marks, Mark{X: x, Y: y, DX: dx, DY: dy})
}

// WithError sets the ± half-widths of the last mark and returns c; on a
// nil chart or one without marks it does nothing. Non-finite or negative
// widths are dropped.
func (c *Chart) WithError(dx, dy float64) *Chart {
	if c == nil || len(c.Marks) == 0 {
		return c
	}
	m := &c.Marks[len(c.Marks)-1]
	if finite(dx) && dx > 0 {
		m.DX = dx
	}
	if finite(dy) && dy > 0 {
		m.DY = dy
	}
	return c
}

// Plot draws a Chart with Gio vector paths in the app's font, ticks placed
// by LinearTicks or LogTicks. A touch or hover reads the nearest point
// with its units under the plot; a Table button switches to a table of
// every sweep that can be copied.
type Plot struct {
	// Height is the height of the drawing (without title and readout);
	// zero means 260 dp.
	Height unit.Dp

	env   *Env
	chart *Chart

	table        bool
	tableBtn     widget.Clickable
	copyBtn      widget.Clickable
	copied       bool
	sel          pick        // the point read by touch or hover
	headerHeight int         // of the last frame: the drawing starts this far down
	size         image.Point // of the drawing, this frame
	hovering     bool
	geom         plotGeom // mapping of the last frame, for pointer events
	cacheSize    image.Point
	cache        plotCache

	// Per-frame buffers of tick-label macros and sizes, and widgets made
	// once: a steady frame allocates nothing of its own.
	yCalls, xCalls []op.CallOp
	ySz, xSz       []image.Point
	drawing        layout.Widget
	readout        layout.Widget
	headerW        layout.Widget
	titleW         layout.Widget
	toggleW        layout.Widget
	copyW          layout.Widget
	readoutW       layout.Widget
	readoutStr     string // readoutText for readoutFor
	readoutFor     pick
	summary        string      // Summary of summaryFor at summarySize
	summaryFor     *Chart      // the chart summary describes
	summarySize    image.Point // the cache size it was written at
}

// pick names a point of the chart: line l, index i (l = -1: mark i).
type pick struct {
	ok   bool
	l, i int
}

// NewPlot returns an empty plot widget; Set gives it a chart.
func NewPlot(env *Env) *Plot {
	w := &Plot{env: env}
	w.drawing = w.layoutLabelled
	w.readout = w.layoutReadout
	w.headerWidgets()
	return w
}

// Set replaces the chart; nil shows nothing. Call it when the data change,
// not every frame.
func (w *Plot) Set(c *Chart) {
	w.chart = c
	w.sel = pick{}
	w.readoutStr = ""
	w.copied = false
	w.cacheSize = image.Point{}
}

// Chart returns the chart shown, or nil.
func (w *Plot) Chart() *Chart { return w.chart }

// Layout draws the title, the plot or table, and the readout across the
// available width.
func (w *Plot) Layout(gtx layout.Context) layout.Dimensions {
	if w.chart == nil || !w.chart.hasData() {
		return layout.Dimensions{}
	}
	if w.tableBtn.Clicked(gtx) {
		w.table = !w.table
		w.copied = false
	}
	if w.copyBtn.Clicked(gtx) {
		w.copyTable(gtx)
		w.copied = true
	}
	gtx.Constraints.Min = image.Point{}
	hdr := w.layoutHeader(gtx)
	w.headerHeight = hdr.Size.Y
	var body layout.Dimensions
	below(gtx, hdr.Size.Y, func() {
		if w.table {
			body = w.layoutTable(gtx)
		} else {
			body = w.layoutPlot(gtx)
		}
	})
	return layout.Dimensions{Size: image.Pt(max(hdr.Size.X, body.Size.X), hdr.Size.Y+body.Size.Y)}
}

// below runs f with the drawing moved down by y pixels.
func below(gtx layout.Context, y int, f func()) {
	t := op.Offset(image.Pt(0, y)).Push(gtx.Ops)
	f()
	t.Pop()
}

// hasData reports whether the chart has at least one finite point.
func (c *Chart) hasData() bool {
	for _, l := range c.Lines {
		for _, p := range l {
			if finite(p.X) && finite(p.Y) {
				return true
			}
		}
	}
	for _, m := range c.Marks {
		if finite(m.X) && finite(m.Y) {
			return true
		}
	}
	return false
}

// layoutPlot draws the axes and data, handles pointer input and writes the
// readout under the plot.
func (w *Plot) layoutPlot(gtx layout.Context) layout.Dimensions {
	h := w.Height
	if h == 0 {
		h = 260
	}
	size := image.Pt(gtx.Constraints.Max.X, gtx.Dp(h))
	if size.X <= 0 || size.Y <= 0 {
		return layout.Dimensions{}
	}
	w.pointer(gtx)
	w.size = size
	d := w.drawing(gtx)
	var r layout.Dimensions
	below(gtx, d.Size.Y, func() { r = w.readout(gtx) })
	return layout.Dimensions{Size: image.Pt(d.Size.X, d.Size.Y+r.Size.Y)}
}

// layoutDrawing draws the plot at w.size and takes pointer input over it.
func (w *Plot) layoutDrawing(gtx layout.Context) layout.Dimensions {
	w.draw(gtx, w.size)
	area := clip.Rect{Max: w.size}.Push(gtx.Ops)
	pointer.CursorCrosshair.Add(gtx.Ops)
	event.Op(gtx.Ops, w)
	area.Pop()
	return layout.Dimensions{Size: w.size}
}

// pointer handles touches and hovering: the nearest point to the pointer
// becomes the one read out. A tap keeps its point; hovering clears it when
// the pointer leaves.
func (w *Plot) pointer(gtx layout.Context) {
	for {
		ev, ok := gtx.Event(pointer.Filter{Target: w,
			Kinds: pointer.Press | pointer.Drag | pointer.Move | pointer.Enter | pointer.Leave})
		if !ok {
			break
		}
		e, ok := ev.(pointer.Event)
		if !ok {
			continue
		}
		switch e.Kind {
		case pointer.Leave:
			if w.hovering {
				w.sel = pick{}
			}
			w.hovering = false
		case pointer.Move, pointer.Enter:
			w.hovering = e.Source == pointer.Mouse
			w.sel = w.nearest(e.Position.X, e.Position.Y)
		case pointer.Press, pointer.Drag:
			w.hovering = false
			w.sel = w.nearest(e.Position.X, e.Position.Y)
		}
	}
}

// nearest returns the data point drawn closest to the pixel (px, py) of
// the last frame, the marks first on a tie.
func (w *Plot) nearest(px, py float32) pick {
	g := &w.geom
	if !g.ok {
		return pick{}
	}
	best := pick{}
	bestD := math.Inf(1)
	try := func(l, i int, x, y float64) {
		sx, sy, ok := g.toPx(x, y)
		if !ok {
			return
		}
		dx, dy := float64(px)-sx, float64(py)-sy
		if d := dx*dx + dy*dy; d < bestD {
			best, bestD = pick{ok: true, l: l, i: i}, d
		}
	}
	for i, m := range w.chart.Marks {
		try(-1, i, m.X, m.Y)
	}
	for l, line := range w.chart.Lines {
		for i, p := range line {
			try(l, i, p.X, p.Y)
		}
	}
	return best
}

// point returns the coordinates of a pick.
func (w *Plot) point(p pick) (x, y float64) {
	if p.l < 0 {
		m := w.chart.Marks[p.i]
		return m.X, m.Y
	}
	q := w.chart.Lines[p.l][p.i]
	return q.X, q.Y
}
