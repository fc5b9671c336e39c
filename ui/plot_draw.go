package ui

import (
	"image"
	"image/color"
	"math"

	"gioui.org/f32"
	"gioui.org/font"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/op/clip"
	"gioui.org/op/paint"
	"gioui.org/unit"
	"gioui.org/widget/material"
)

// This file draws a Chart: axes with ticks and titles, grid lines, the
// lines, the marks with their ± bars and the point being read.

// markColor is the colour of marked points and their bars: a burnt orange
// that stands apart from the accent-coloured lines.
var markColor = rgb(0xb54a1c)

// axisMap maps data values on one axis to pixels.
type axisMap struct {
	lo, hi float64 // data range (log10 of it on a log axis)
	log    bool
	p0, p1 float64 // pixels of lo and hi
}

// px maps v to a pixel coordinate; false for values a log axis cannot show.
func (m axisMap) px(v float64) (float64, bool) {
	if m.log {
		if !(v > 0) {
			return 0, false
		}
		v = math.Log10(v)
	}
	if !finite(v) {
		return 0, false
	}
	return m.p0 + (v-m.lo)/(m.hi-m.lo)*(m.p1-m.p0), true
}

// plotGeom is the mapping of the last frame, kept for pointer events.
type plotGeom struct {
	ok   bool
	area image.Rectangle
	x, y axisMap
}

// toPx maps a data point to pixels.
func (g *plotGeom) toPx(x, y float64) (float64, float64, bool) {
	sx, okx := g.x.px(x)
	sy, oky := g.y.px(y)
	return sx, sy, okx && oky
}

// axisTicks is one axis's ticks, their texts, scale and range, worked out
// once per chart and size.
type axisTicks struct {
	log    bool
	lo, hi float64 // axis range in data units (not log10)
	vals   []float64
	texts  []string
	scale  axisScale
	title  string
}

// plotCache holds the axes for the size they were made for.
type plotCache struct {
	x, y axisTicks
}

// extent returns the finite data range on one axis (ys: the y axis),
// marks and their ± bars included; positive restricts to values > 0.
func (c *Chart) extent(ys, positive bool) (lo, hi float64, ok bool) {
	lo, hi = math.Inf(1), math.Inf(-1)
	add := func(v float64) {
		if !finite(v) || (positive && v <= 0) {
			return
		}
		lo, hi = math.Min(lo, v), math.Max(hi, v)
	}
	for _, l := range c.Lines {
		for _, p := range l {
			if finite(p.X) && finite(p.Y) {
				add(pickXY(p.X, p.Y, ys))
			}
		}
	}
	for _, m := range c.Marks {
		if finite(m.X) && finite(m.Y) {
			v, d := pickXY(m.X, m.Y, ys), pickXY(m.DX, m.DY, ys)
			add(v)
			if d > 0 && finite(d) {
				add(v - d)
				add(v + d)
			}
		}
	}
	return lo, hi, lo <= hi
}

func pickXY(x, y float64, ys bool) float64 {
	if ys {
		return y
	}
	return x
}

// useLog reports whether an axis is drawn on a log scale: asked for (or,
// on the x axis, positive values spanning two decades) and every value
// positive.
func (c *Chart) useLog(ys bool) bool {
	a := c.X
	if ys {
		a = c.Y
	}
	lo, hi, ok := c.extent(ys, false)
	if !ok || lo <= 0 {
		return false
	}
	return a.Log || (!ys && hi/lo >= 100)
}

// makeTicks works out one axis for about m labels.
func (c *Chart) makeTicks(ys bool, m int) axisTicks {
	a := c.X
	if ys {
		a = c.Y
	}
	var t axisTicks
	lo, hi, _ := c.extent(ys, false)
	if c.useLog(ys) {
		t.log = true
		t.lo, t.hi = lo, hi
		if hi/lo < 1.5 { // too narrow for decades: widen around the middle
			mid := math.Sqrt(lo * hi)
			t.lo, t.hi = mid/1.25, mid*1.25
		}
		t.vals = LogTicks(t.lo, t.hi)
		t.scale = chooseScale(a.Unit, t.hi)
		for _, v := range t.vals {
			t.texts = append(t.texts, logTickText(v*t.scale.mul))
		}
	} else {
		tk := LinearTicks(lo, hi, m)
		t.vals = tk.Values()
		t.lo, t.hi = math.Min(lo, tk.Min), math.Max(hi, tk.Max)
		if t.lo == t.hi {
			t.lo, t.hi = t.lo-1, t.hi+1
		}
		if ys {
			// A little room above and below, so a curve does not run
			// along the frame.
			d := 0.03 * (t.hi - t.lo)
			if lo <= t.lo+d {
				t.lo -= d
			}
			if hi >= t.hi-d {
				t.hi += d
			}
		}
		t.scale = chooseScale(a.Unit, math.Max(math.Abs(tk.Min), math.Abs(tk.Max)))
		disp := make([]float64, len(t.vals))
		for i, v := range t.vals {
			disp[i] = v * t.scale.mul
		}
		t.texts = tickTexts(disp)
	}
	t.title = t.scale.title(a.Label)
	return t
}

// mapOf returns the pixel mapping of an axis from p0 to p1.
func (t *axisTicks) mapOf(p0, p1 float64) axisMap {
	if t.log {
		return axisMap{lo: math.Log10(t.lo), hi: math.Log10(t.hi), log: true, p0: p0, p1: p1}
	}
	return axisMap{lo: t.lo, hi: t.hi, p0: p0, p1: p1}
}

// text lays out a single line of text in the app's font and returns it as
// a macro with its size.
func (w *Plot) text(gtx layout.Context, s string, sp unit.Sp, col color.NRGBA, weight font.Weight) (op.CallOp, image.Point) {
	m := op.Record(gtx.Ops)
	l := material.Label(w.env.Theme, sp, s)
	l.Color = col
	l.Font.Weight = weight
	l.MaxLines = 1
	gtx.Constraints = layout.Constraints{Max: image.Pt(1<<16, 1<<16)}
	d := l.Layout(gtx)
	return m.Stop(), d.Size
}

// grow returns b with length n, reusing its storage when large enough.
func grow[T any](b []T, n int) []T {
	if cap(b) < n {
		return make([]T, n)
	}
	return b[:n]
}

// place adds a macro at pixel (x, y).
func place(gtx layout.Context, c op.CallOp, x, y int) {
	t := op.Offset(image.Pt(x, y)).Push(gtx.Ops)
	c.Add(gtx.Ops)
	t.Pop()
}

// line strokes a straight segment.
func strokeLine(gtx layout.Context, col color.NRGBA, width float32, a, b f32.Point) {
	var p clip.Path
	p.Begin(gtx.Ops)
	p.MoveTo(a)
	p.LineTo(b)
	paint.FillShape(gtx.Ops, col, clip.Stroke{Path: p.End(), Width: width}.Op())
}

// dot fills a circle of radius r at c.
func dot(gtx layout.Context, col color.NRGBA, c f32.Point, r float32) {
	rect := image.Rect(int(c.X-r+0.5), int(c.Y-r+0.5), int(c.X+r+0.5), int(c.Y+r+0.5))
	paint.FillShape(gtx.Ops, col, clip.Ellipse(rect).Op(gtx.Ops))
}

// draw paints the whole plot into size.
func (w *Plot) draw(gtx layout.Context, size image.Point) {
	c := w.chart
	col := w.env.Colors
	fill(gtx, col.Surface, size)
	const tickSp = unit.Sp(13)
	if w.cacheSize != size {
		// Y ticks first: their widths set the room left for the x axis.
		w.cache.y = c.makeTicks(true, max(3, min(8, size.Y/gtx.Dp(45))))
		w.cache.x = c.makeTicks(false, max(2, min(10, size.X/gtx.Dp(95))))
		w.cacheSize = size
	}
	xt, yt := &w.cache.x, &w.cache.y

	// Measure the texts and work out the plot area.
	yTitle, yTitleSz := w.text(gtx, yt.title, tickSp, col.Muted, font.Normal)
	xTitle, xTitleSz := w.text(gtx, xt.title, tickSp, col.Muted, font.Normal)
	left := 0
	// Buffers kept from frame to frame: no allocation once drawn.
	w.yCalls, w.ySz = grow(w.yCalls, len(yt.texts)), grow(w.ySz, len(yt.texts))
	w.xCalls, w.xSz = grow(w.xCalls, len(xt.texts)), grow(w.xSz, len(xt.texts))
	yCalls, ySz, xCalls, xSz := w.yCalls, w.ySz, w.xCalls, w.xSz
	for i, s := range yt.texts {
		yCalls[i], ySz[i] = w.text(gtx, s, tickSp, col.Text, font.Normal)
		left = max(left, ySz[i].X)
	}
	lineH := yTitleSz.Y
	for i, s := range xt.texts {
		xCalls[i], xSz[i] = w.text(gtx, s, tickSp, col.Text, font.Normal)
		lineH = max(lineH, xSz[i].Y)
	}
	gap := gtx.Dp(6)
	right := gtx.Dp(14)
	if n := len(xSz); n > 0 {
		right = max(right, xSz[n-1].X/2+gtx.Dp(4))
	}
	area := image.Rect(left+gap+gtx.Dp(4), yTitleSz.Y+gtx.Dp(10),
		size.X-right, size.Y-lineH-gap-xTitleSz.Y-gtx.Dp(6))
	if area.Dx() < gtx.Dp(40) || area.Dy() < gtx.Dp(40) {
		w.geom = plotGeom{}
		return
	}
	g := plotGeom{ok: true, area: area,
		x: xt.mapOf(float64(area.Min.X), float64(area.Max.X)),
		y: yt.mapOf(float64(area.Max.Y), float64(area.Min.Y))}
	w.geom = g

	// Grid, ticks and their labels.
	hair := float32(gtx.Dp(1))
	for i, v := range yt.vals {
		py, ok := g.y.px(v)
		if !ok || py < float64(area.Min.Y)-1 || py > float64(area.Max.Y)+1 {
			continue
		}
		strokeLine(gtx, col.Divider, hair, f32.Pt(float32(area.Min.X), float32(py)), f32.Pt(float32(area.Max.X), float32(py)))
		place(gtx, yCalls[i], area.Min.X-gap-ySz[i].X, int(py)-ySz[i].Y/2)
	}
	for i, v := range xt.vals {
		px, ok := g.x.px(v)
		if !ok || px < float64(area.Min.X)-1 || px > float64(area.Max.X)+1 {
			continue
		}
		strokeLine(gtx, col.Divider, hair, f32.Pt(float32(px), float32(area.Min.Y)), f32.Pt(float32(px), float32(area.Max.Y)))
		place(gtx, xCalls[i], int(px)-xSz[i].X/2, area.Max.Y+gap/2)
	}
	// The axes.
	strokeLine(gtx, col.Muted, hair, f32.Pt(float32(area.Min.X), float32(area.Max.Y)), f32.Pt(float32(area.Max.X), float32(area.Max.Y)))
	strokeLine(gtx, col.Muted, hair, f32.Pt(float32(area.Min.X), float32(area.Min.Y)), f32.Pt(float32(area.Min.X), float32(area.Max.Y)))
	// Titles: y above its axis, x centred under the ticks.
	place(gtx, yTitle, 0, 0)
	place(gtx, xTitle, max(0, (area.Min.X+area.Max.X)/2-xTitleSz.X/2), area.Max.Y+gap/2+lineH+gap/2)

	// Data, clipped to the area (with room for half a line width).
	pad := gtx.Dp(3)
	cl := clip.Rect(area.Inset(-pad)).Push(gtx.Ops)
	for _, l := range c.Lines {
		w.drawLine(gtx, &g, l, float32(gtx.Dp(2)))
	}
	for _, m := range c.Marks {
		w.drawMark(gtx, &g, m)
	}
	if w.sel.ok {
		x, y := w.point(w.sel)
		if sx, sy, ok := g.toPx(x, y); ok {
			p := f32.Pt(float32(sx), float32(sy))
			strokeLine(gtx, col.Muted, hair, f32.Pt(p.X, float32(area.Min.Y)), f32.Pt(p.X, float32(area.Max.Y)))
			dot(gtx, col.Text, p, float32(gtx.Dp(6)))
			dot(gtx, col.Surface, p, float32(gtx.Dp(4)))
		}
	}
	cl.Pop()
}

// drawLine strokes one sweep, broken where a point cannot be shown.
func (w *Plot) drawLine(gtx layout.Context, g *plotGeom, l XYs, width float32) {
	var p clip.Path
	p.Begin(gtx.Ops)
	pen := false
	any := false
	for _, q := range l {
		sx, sy, ok := g.toPx(q.X, q.Y)
		if !ok {
			pen = false
			continue
		}
		pt := f32.Pt(float32(sx), float32(sy))
		if pen {
			p.LineTo(pt)
			any = true
		} else {
			p.MoveTo(pt)
			pen = true
		}
	}
	spec := p.End()
	if any {
		paint.FillShape(gtx.Ops, w.env.Colors.Accent, clip.Stroke{Path: spec, Width: width}.Op())
	}
}

// drawMark draws a marked point with its ± bars and their end caps.
func (w *Plot) drawMark(gtx layout.Context, g *plotGeom, m Mark) {
	sx, sy, ok := g.toPx(m.X, m.Y)
	if !ok {
		return
	}
	c := f32.Pt(float32(sx), float32(sy))
	bw := float32(gtx.Dp(2))
	cap := float32(gtx.Dp(5))
	if m.DY > 0 {
		_, a, ok1 := g.toPx(m.X, m.Y-m.DY)
		_, b, ok2 := g.toPx(m.X, m.Y+m.DY)
		if ok1 && ok2 {
			strokeLine(gtx, markColor, bw, f32.Pt(c.X, float32(a)), f32.Pt(c.X, float32(b)))
			strokeLine(gtx, markColor, bw, f32.Pt(c.X-cap, float32(a)), f32.Pt(c.X+cap, float32(a)))
			strokeLine(gtx, markColor, bw, f32.Pt(c.X-cap, float32(b)), f32.Pt(c.X+cap, float32(b)))
		}
	}
	if m.DX > 0 {
		a, _, ok1 := g.toPx(m.X-m.DX, m.Y)
		b, _, ok2 := g.toPx(m.X+m.DX, m.Y)
		if ok1 && ok2 {
			strokeLine(gtx, markColor, bw, f32.Pt(float32(a), c.Y), f32.Pt(float32(b), c.Y))
			strokeLine(gtx, markColor, bw, f32.Pt(float32(a), c.Y-cap), f32.Pt(float32(a), c.Y+cap))
			strokeLine(gtx, markColor, bw, f32.Pt(float32(b), c.Y-cap), f32.Pt(float32(b), c.Y+cap))
		}
	}
	dot(gtx, w.env.Colors.Surface, c, float32(gtx.Dp(7)))
	dot(gtx, markColor, c, float32(gtx.Dp(5)))
}
