package ui

import (
	"image"
	"math"
	"strconv"
	"strings"
	"testing"

	"gioui.org/f32"
	"gioui.org/io/pointer"
	"gonum.org/v1/gonum/floats/scalar"
)

// quarterWave is a sweep of f = c/(4L) with c = 340 m/s over L = 0.1 to
// 0.29 m: the quarter-wave rule (common practice, no published source); the
// numbers only need a visible, known line here.
func quarterWave() XYs {
	pts := make(XYs, 20)
	for i := range pts {
		L := 0.1 + 0.01*float64(i)
		pts[i] = XY{X: L, Y: 340 / (4 * L)}
	}
	return pts
}

// TestPlotDraws lays out a chart and checks the axes' titles carry their
// units, the ticks are labelled, and the drawing has the asked height.
func TestPlotDraws(t *testing.T) {
	t.Parallel()
	c := NewXYPlot("Length", "m", "Frequency", "Hz")
	c.Title = "Frequency against length"
	c.AddLine(quarterWave())
	w := NewPlot(NewEnv(nil))
	w.Set(c)
	h := newHarness(t, image.Pt(400, 700), w.Layout)
	n := h.mustDesc("Plot drawing")
	if got := n.Desc.Bounds.Dy(); got != 260 {
		t.Errorf("drawing height %d, want 260", got)
	}
	// 0.1..0.29 m is under a metre: millimetres; 293..850 Hz: hertz.
	if w.cache.x.title != "Length (mm)" || w.cache.y.title != "Frequency (Hz)" {
		t.Errorf("axis titles %q, %q", w.cache.x.title, w.cache.y.title)
	}
	if len(w.cache.x.texts) < 2 || len(w.cache.y.texts) < 3 {
		t.Errorf("too few tick labels: x %v, y %v", w.cache.x.texts, w.cache.y.texts)
	}
	txt := nodeText(n)
	for _, s := range append(w.cache.x.texts, w.cache.y.texts...) {
		if !strings.Contains(txt, s) {
			t.Errorf("tick label %q not drawn; drawing has %q", s, txt)
		}
	}
	if !w.geom.ok || !w.geom.area.In(image.Rectangle{Max: n.Desc.Bounds.Size()}) {
		t.Errorf("plot area %v outside the drawing %v", w.geom.area, n.Desc.Bounds)
	}
	if s, _ := h.shown("Plot readout"); !strings.Contains(s, "Touch the plot") {
		t.Errorf("readout before a touch: %q", s)
	}
}

// TestPlotReadsNearestPoint touches the plot near a data point and checks
// the readout names that point with its units; a touch on a mark reads
// the mark with its ± values.
func TestPlotReadsNearestPoint(t *testing.T) {
	t.Parallel()
	c := NewXYPlot("Length", "m", "Frequency", "Hz")
	c.AddLine(quarterWave())
	c.AddMark(0.147, 578.2, 0.002, 8)
	w := NewPlot(NewEnv(nil))
	w.Set(c)
	h := newHarness(t, image.Pt(400, 700), w.Layout)
	touch := func(x, y float64) {
		t.Helper()
		origin := h.mustDesc("Plot drawing").Desc.Bounds.Min
		sx, sy, ok := w.geom.toPx(x, y)
		if !ok {
			t.Fatalf("(%g, %g) not on the plot", x, y)
		}
		p := f32.Pt(float32(sx)+float32(origin.X)+2, float32(sy)+float32(origin.Y)-1)
		h.r.Queue(pointer.Event{Kind: pointer.Press, Source: pointer.Touch, Position: p},
			pointer.Event{Kind: pointer.Release, Source: pointer.Touch, Position: p})
		h.frames(2)
	}
	touch(0.25, 340)
	s, _ := h.shown("Plot readout")
	if s != "Length 250 mm · Frequency 340 Hz" {
		t.Errorf("readout %q, want %q", s, "Length 250 mm · Frequency 340 Hz")
	}
	touch(0.147, 578.2)
	s, _ = h.shown("Plot readout")
	if want := "Marked point: Length 147 ± 2 mm · Frequency 578.2 ± 8 Hz"; s != want {
		t.Errorf("readout %q, want %q", s, want)
	}
	// A mouse hovering reads the point under it and lets go when it
	// leaves the plot.
	origin := h.mustDesc("Plot drawing").Desc.Bounds.Min
	sx, sy, _ := w.geom.toPx(0.2, 425)
	p := f32.Pt(float32(sx)+float32(origin.X), float32(sy)+float32(origin.Y))
	h.r.Queue(pointer.Event{Kind: pointer.Move, Source: pointer.Mouse, Position: p})
	h.frames(2)
	if s, _ = h.shown("Plot readout"); s != "Length 200 mm · Frequency 425 Hz" {
		t.Errorf("hover readout %q", s)
	}
	h.r.Queue(pointer.Event{Kind: pointer.Move, Source: pointer.Mouse, Position: f32.Pt(5, 690)})
	h.frames(2)
	if s, _ = h.shown("Plot readout"); !strings.Contains(s, "Touch the plot") {
		t.Errorf("after the mouse left: %q", s)
	}
}

// TestPlotTable switches to the table and checks it lists every point
// in the axes' units, that the text reads back to the data, and that Copy
// puts it on the clipboard.
func TestPlotTable(t *testing.T) {
	t.Parallel()
	c := NewXYPlot("Mean pressure", "Pa", "|U1|", "m³/s")
	var xy XYs
	for i := range 11 {
		p := 1e5 * math.Pow(10, float64(i)/5) // 1 to 100 bar
		xy = append(xy, XY{X: p, Y: 2e-6 * (1 + float64(i))})
	}
	c.AddLine(xy)
	w := NewPlot(NewEnv(nil))
	w.Set(c)
	h := newHarness(t, image.Pt(412, 1400), w.Layout)
	if !w.cache.x.log {
		t.Error("two decades of pressure: the x axis should be logarithmic")
	}
	h.tap("Table")
	if !w.table {
		t.Fatal("Table did not switch to the table")
	}
	if _, ok := h.control("Copy"); !ok {
		t.Fatalf("no Copy button in the table view:\n%s", h.dump())
	}
	lines := strings.Split(strings.TrimSpace(w.TableText()), "\n")
	if len(lines) != len(xy)+1 {
		t.Fatalf("%d table lines, want %d:\n%s", len(lines), len(xy)+1, w.TableText())
	}
	// 10 MPa at most: MPa; 22 mL/s at most: volume flow in mL/s.
	if lines[0] != "Mean pressure (MPa)\t|U1| (mL/s)" {
		t.Errorf("header %q", lines[0])
	}
	for i, l := range lines[1:] {
		f := strings.Split(l, "\t")
		x, err1 := strconv.ParseFloat(f[0], 64)
		y, err2 := strconv.ParseFloat(f[1], 64)
		if err1 != nil || err2 != nil {
			t.Fatalf("line %q does not read as two numbers", l)
		}
		// 4 significant digits.
		if !scalar.EqualWithinRel(x*1e6, xy[i].X, 5e-4) || !scalar.EqualWithinRel(y*1e-6, xy[i].Y, 5e-4) {
			t.Errorf("row %d = %g MPa, %g mL/s; want %g Pa, %g m³/s", i, x, y, xy[i].X, xy[i].Y)
		}
	}
	h.tap("Copy")
	if mime, data, ok := h.r.WriteClipboard(); !ok || mime != "application/text" || string(data) != w.TableText() {
		t.Errorf("Copy put %q (%s, %v) on the clipboard, want the table", data, mime, ok)
	}
	if _, ok := h.control("Copied"); !ok {
		t.Errorf("the Copy button does not say Copied:\n%s", h.dump())
	}
	h.tap("Plot")
	if w.table {
		t.Error("Plot did not switch back")
	}
}

// TestChartWithError checks the ± setter on nil and mark-less charts and
// that it ignores non-finite widths.
func TestChartWithError(t *testing.T) {
	t.Parallel()
	var nilChart *Chart
	if nilChart.WithError(1, 1) != nil {
		t.Error("nil chart should stay nil")
	}
	c := NewXYPlot("x", "", "y", "")
	c.WithError(1, 1) // no marks: nothing to do
	c.AddMark(1, 2, 0, 0)
	c.WithError(math.NaN(), 0.5)
	if m := c.Marks[0]; m.DX != 0 || m.DY != 0.5 {
		t.Errorf("mark %+v, want DX 0, DY 0.5", m)
	}
}
