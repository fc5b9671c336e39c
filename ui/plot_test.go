package ui

import (
	"image"
	"image/color"
	"testing"

	"gonum.org/v1/plot/plotter"
)

// TestPlotRenders draws a line plot and checks the picture has the asked
// size, a white background in a corner and dark pixels of axes and line,
// and that the axis labels carry their units.
func TestPlotRenders(t *testing.T) {
	p := NewXYPlot("Length", "m", "Frequency", "Hz")
	if p.X.Label.Text != "Length (m)" || p.Y.Label.Text != "Frequency (Hz)" {
		t.Fatalf("axis labels %q, %q", p.X.Label.Text, p.Y.Label.Text)
	}
	// f = c/(4L) with c = 340 m/s: the quarter-wave rule (common practice,
	// no published source); the numbers only need a visible line here.
	pts := make(plotter.XYs, 20)
	for i := range pts {
		L := 0.1 + 0.01*float64(i)
		pts[i].X, pts[i].Y = L, 340/(4*L)
	}
	line, err := plotter.NewLine(pts)
	if err != nil {
		t.Fatal(err)
	}
	p.Add(line)
	w := NewPlot(NewEnv(nil))
	w.Set(p)
	h := newHarness(t, image.Pt(400, 600), w.Layout)
	_ = h
	if w.img == nil || w.img.Bounds().Size() != image.Pt(400, 260) {
		t.Fatalf("plot image %v, want 400×260", w.img)
	}
	if c := w.img.RGBAAt(1, 1); c != (color.RGBA{255, 255, 255, 255}) {
		t.Errorf("corner pixel %v, want white", c)
	}
	dark := 0
	b := w.img.Bounds()
	for y := b.Min.Y; y < b.Max.Y; y++ {
		for x := b.Min.X; x < b.Max.X; x++ {
			if c := w.img.RGBAAt(x, y); c.R < 100 && c.G < 100 && c.B < 100 {
				dark++
			}
		}
	}
	if dark < 300 {
		t.Errorf("only %d dark pixels: axes and line not drawn?", dark)
	}
	// The right margin (plotMargin, 10 pt = 13 px at 96 dpi) stays blank:
	// the line ends at the right end of its range and must not touch the
	// edge; check the last 10 columns.
	for y := b.Min.Y; y < b.Max.Y; y++ {
		for x := b.Max.X - 10; x < b.Max.X; x++ {
			if c := w.img.RGBAAt(x, y); c != (color.RGBA{255, 255, 255, 255}) {
				t.Fatalf("pixel (%d,%d) in the right margin is %v, want white", x, y, c)
			}
		}
	}
}
