package ui

import (
	"fmt"
	"math"
	"strings"

	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/op/clip"
)

// plotSummaryLines is the most sweeps the summary describes one by one.
const plotSummaryLines = 4

// Summary describes the chart in words, for screen readers (it is the
// semantic label of the drawing) and for tests: what is plotted against
// what, the range of each axis with its unit, each sweep's ends and its
// highest point, and the marked points. Numbers are written as the axes
// write them (an SI prefix or a power of ten, never an exponent).
func (w *Plot) Summary() string {
	c := w.chart
	if c == nil || !c.hasData() {
		return ""
	}
	xs, ys := w.scales()
	var b strings.Builder
	title := c.Title
	if title == "" {
		title = c.Y.Label + " against " + strings.ToLower(c.X.Label)
	}
	b.WriteString("Plot: " + strings.TrimSuffix(title, ".") + ".")
	// Values next to nothing beside the axis's span (round-off of a
	// zero, e.g. 3e-19 m³/s) are read as zero.
	xlo, xhi, _ := c.extent(false, false)
	ylo, yhi, _ := c.extent(true, false)
	tidy := func(v, lo, hi float64) float64 {
		if math.Abs(v) < 1e-9*math.Max(math.Abs(lo), math.Abs(hi)) {
			return 0
		}
		return v
	}
	axis := func(a Axis, s axisScale, isY bool) {
		lo, hi, ok := c.extent(isY, false)
		if !ok {
			return
		}
		fmt.Fprintf(&b, " %s from %s to %s", a.Label, s.readout(tidy(lo, lo, hi), 0), s.readout(tidy(hi, lo, hi), 0))
		if c.useLog(isY) {
			b.WriteString(" (log scale)")
		}
		b.WriteString(".")
	}
	axis(c.X, xs, false)
	axis(c.Y, ys, true)
	rx := func(v float64) string { return xs.readout(tidy(v, xlo, xhi), 0) }
	ry := func(v float64) string { return ys.readout(tidy(v, ylo, yhi), 0) }
	pt := func(p XY) string { return "(" + rx(p.X) + ", " + ry(p.Y) + ")" }
	n := 0
	for _, l := range c.Lines {
		if len(finitePoints(l)) > 0 {
			n++
		}
	}
	switch {
	case n == 1:
		b.WriteString(" One line.")
	case n > 1:
		fmt.Fprintf(&b, " %d lines.", n)
	}
	k := 0
	for _, l := range c.Lines {
		ps := finitePoints(l)
		if len(ps) == 0 {
			continue
		}
		k++
		if k > plotSummaryLines {
			fmt.Fprintf(&b, " %d more lines in the table.", n-plotSummaryLines)
			break
		}
		top := ps[0]
		for _, p := range ps {
			if p.Y > top.Y {
				top = p
			}
		}
		name := "The line"
		if n > 1 {
			name = fmt.Sprintf("Line %d", k)
		}
		fmt.Fprintf(&b, " %s, %d points, runs from %s to %s; highest %s at %s.",
			name, len(ps), pt(ps[0]), pt(ps[len(ps)-1]), ry(top.Y), rx(top.X))
	}
	for _, m := range c.Marks {
		if !finite(m.X) || !finite(m.Y) {
			continue
		}
		fmt.Fprintf(&b, " Marked point: %s %s, %s %s.", c.X.Label, xs.readout(m.X, m.DX), c.Y.Label, ys.readout(m.Y, m.DY))
	}
	return b.String()
}

// finitePoints returns the points of l with finite coordinates.
func finitePoints(l XYs) XYs {
	var out XYs
	for _, p := range l {
		if finite(p.X) && finite(p.Y) {
			out = append(out, p)
		}
	}
	return out
}

// layoutLabelled draws the drawing in a semantic node described "Plot
// drawing" whose label is the chart's Summary.
func (w *Plot) layoutLabelled(gtx layout.Context) layout.Dimensions {
	m := op.Record(gtx.Ops)
	dims := w.layoutDrawing(gtx)
	call := m.Stop()
	if w.summaryFor != w.chart || w.summarySize != w.cacheSize {
		w.summaryFor, w.summarySize = w.chart, w.cacheSize
		w.summary = w.Summary()
	}
	defer clip.Rect{Max: dims.Size}.Push(gtx.Ops).Pop()
	semantic.DescriptionOp("Plot drawing").Add(gtx.Ops)
	semantic.LabelOp(w.summary).Add(gtx.Ops)
	call.Add(gtx.Ops)
	return dims
}
