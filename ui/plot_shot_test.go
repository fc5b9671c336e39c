package ui

import (
	"image"
	"math"
	"os"
	"path/filepath"
	"testing"
	"time"

	"gioui.org/f32"
	"gioui.org/gpu/headless"
	"gioui.org/io/input"
	"gioui.org/io/pointer"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
)

// shotCharts are the kinds of chart the screens draw, with demo data
// (invented, for pictures only): a sweep with a marked measurement and its
// ± bars, a log pressure axis, small volume flows, a tiny pure number.
func shotCharts() map[string]*Chart {
	out := map[string]*Chart{}
	c := NewXYPlot("Gas temperature", "K", "Resonance frequency", "Hz")
	c.Title = "Frequency against gas temperature"
	var xy XYs
	for i := range 41 {
		T := 200 + 10*float64(i)
		xy = append(xy, XY{X: T, Y: 20.05 * math.Sqrt(T) / (4 * 0.15)})
	}
	c.AddLine(xy)
	c.AddMark(300, 20.05*math.Sqrt(300)/(4*0.15)-6, 3, 8)
	out["sweep"] = c

	c = NewXYPlot("Mean pressure", "bar", "Onset hot temperature", "K")
	c.Title = "Onset against mean pressure"
	c.X.Log = true
	xy = nil
	for i := range 15 {
		p := math.Pow(10, float64(i)/10) // 1 to 25 bar
		xy = append(xy, XY{X: p, Y: 420 + 180*math.Pow(math.Log10(p)-0.7, 2)})
	}
	c.AddLine(xy)
	out["log"] = c

	c = NewXYPlot("Position from the start end", "m", "|U1|", "m³/s")
	c.Title = "|U1| along the device"
	xy = nil
	for i := range 60 {
		x := 0.6 * float64(i) / 59
		xy = append(xy, XY{X: x, Y: 3.5e-5 * math.Abs(math.Sin(math.Pi*x/0.6/2))})
	}
	c.AddLine(xy)
	out["flow"] = c

	c = NewXYPlot("Mole fraction of neon", "", "Strain", "")
	c.Title = "A pure number in millionths"
	xy = nil
	for i := range 21 {
		x := float64(i) / 20
		xy = append(xy, XY{X: x, Y: 2e-6 + 3e-6*x*x})
	}
	c.AddLine(xy)
	out["tiny"] = c
	return out
}

// TestScreenshotPlots pictures each kind of chart at phone and desktop
// widths, once as a plot read at one point and once as a table, and checks
// that the line (accent colour) and the marks were drawn. With SHOT_DIR
// the pictures are written there as plot-<kind>-<size>[-table].png.
func TestScreenshotPlots(t *testing.T) {
	env := NewEnv(nil)
	for name, c := range shotCharts() {
		for _, sz := range []shotSize{{"phone", image.Pt(412, 480)}, {"desktop", image.Pt(1000, 560)}} {
			for _, table := range []bool{false, true} {
				file := "plot-" + name + "-" + sz.name
				size := sz.size
				if table {
					file += "-table"
					size.Y = 1400
				}
				w := NewPlot(env)
				w.Set(c)
				w.table = table
				img := shootWidget(t, size, func(gtx layout.Context) {
					fill(gtx, env.Colors.Background, gtx.Constraints.Max)
					layout.UniformInset(unit.Dp(16)).Layout(gtx, w.Layout)
				}, func(r *input.Router, i int) {
					if i == 0 && !table && w.geom.ok {
						// Touch the middle of the first line.
						p := c.Lines[0][len(c.Lines[0])/2]
						sx, sy, _ := w.geom.toPx(p.X, p.Y)
						pos := f32.Pt(float32(sx)+16, float32(sy)+16+float32(w.headerHeight))
						r.Queue(pointer.Event{Kind: pointer.Press, Source: pointer.Touch, Position: pos},
							pointer.Event{Kind: pointer.Release, Source: pointer.Touch, Position: pos})
					}
				})
				if img == nil {
					return
				}
				if dir := os.Getenv("SHOT_DIR"); dir != "" {
					writePNG(t, filepath.Join(dir, file+".png"), img)
				}
				if table {
					continue
				}
				if !w.sel.ok {
					t.Errorf("%s: the touch read no point", file)
				}
				accent, mark := 0, 0
				b := img.Bounds()
				for y := b.Min.Y; y < b.Max.Y; y++ {
					for x := b.Min.X; x < b.Max.X; x++ {
						p := img.RGBAAt(x, y)
						if same(p, env.Colors.Accent) {
							accent++
						}
						if same(p, markColor) {
							mark++
						}
					}
				}
				if accent < 200 {
					t.Errorf("%s: %d accent pixels: line not drawn?", file, accent)
				}
				if len(c.Marks) > 0 && mark < 30 {
					t.Errorf("%s: %d mark-coloured pixels: mark not drawn?", file, mark)
				}
			}
		}
	}
}

// shootWidget renders three frames of draw at size
// and returns the picture, or nil after skipping when no
// renderer exists (failing under CI). after runs after each frame has
// been handed to the router, to queue input for the next.
func shootWidget(t *testing.T, size image.Point, draw func(gtx layout.Context), after func(r *input.Router, i int)) *image.RGBA {
	t.Helper()
	win, err := headless.NewWindow(size.X, size.Y)
	if err != nil {
		if os.Getenv("CI") != "" {
			t.Fatalf("no headless renderer under CI: %v", err)
		}
		t.Skipf("no headless renderer here (%v)", err)
		return nil
	}
	defer win.Release()
	var r input.Router
	var ops op.Ops
	now := time.Unix(1_800_000_000, 0)
	for i := range 3 {
		ops.Reset()
		gtx := layout.Context{Ops: &ops, Now: now.Add(time.Duration(i) * 20 * time.Millisecond),
			Metric: unit.Metric{PxPerDp: 1, PxPerSp: 1}, Constraints: layout.Exact(size), Source: r.Source()}
		draw(gtx)
		r.Frame(&ops)
		after(&r, i)
	}
	if err := win.Frame(&ops); err != nil {
		t.Fatalf("headless frame: %v", err)
	}
	img := image.NewRGBA(image.Rectangle{Max: size})
	if err := win.Screenshot(img); err != nil {
		t.Fatalf("headless screenshot: %v", err)
	}
	return img
}
