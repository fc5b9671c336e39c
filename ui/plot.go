package ui

import (
	"image"
	"image/draw"

	"gioui.org/layout"
	"gioui.org/op/clip"
	"gioui.org/op/paint"
	"gioui.org/unit"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
	vgdraw "gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
)

// Plot shows a gonum plot at the available width and a fixed height. The
// plot is rasterised on the CPU with gonum's vgimg (plot v0.17.0 has no Gio
// back end) and the image is kept until the plot or the size changes.
//
// Give the axes their units: NewXYPlot("Length", "m", "Frequency", "Hz").
type Plot struct {
	// Height is the plot's height; zero means 260 dp.
	Height unit.Dp

	env  *Env
	p    *plot.Plot
	img  *image.RGBA
	op   paint.ImageOp
	size image.Point
	ppdp float32
}

// plotMargin is the blank space kept at the plot's right edge (half of it
// at the top).
const plotMargin = vg.Length(10) // points

// NewPlot returns an empty plot widget; Set gives it a plot.
func NewPlot(env *Env) *Plot { return &Plot{env: env} }

// NewXYPlot returns a gonum plot with axis labels that carry their units,
// e.g. "Frequency (Hz)", in a sans-serif face that sits well beside the
// app's text.
func NewXYPlot(xLabel, xUnit, yLabel, yUnit string) *plot.Plot {
	p := plot.New()
	p.X.Label.Text = axisLabel(xLabel, xUnit)
	p.Y.Label.Text = axisLabel(yLabel, yUnit)
	for _, f := range []*font.Font{
		&p.Title.TextStyle.Font, &p.Legend.TextStyle.Font,
		&p.X.Label.TextStyle.Font, &p.Y.Label.TextStyle.Font,
		&p.X.Tick.Label.Font, &p.Y.Tick.Label.Font,
	} {
		f.Variant = "Sans"
	}
	return p
}

func axisLabel(label, unit string) string {
	if unit == "" || unit == "1" {
		return label
	}
	return label + " (" + unit + ")"
}

// Set replaces the plot; nil shows nothing. Call it when the data change,
// not every frame.
func (w *Plot) Set(p *plot.Plot) {
	w.p = p
	w.img = nil
}

// Layout draws the plot across the available width.
func (w *Plot) Layout(gtx layout.Context) layout.Dimensions {
	if w.p == nil {
		return layout.Dimensions{}
	}
	h := w.Height
	if h == 0 {
		h = 260
	}
	size := image.Pt(gtx.Constraints.Max.X, gtx.Dp(h))
	if size.X <= 0 || size.Y <= 0 {
		return layout.Dimensions{}
	}
	if w.img == nil || w.size != size || w.ppdp != gtx.Metric.PxPerDp {
		w.render(size, gtx.Metric.PxPerDp)
	}
	defer clip.Rect{Max: size}.Push(gtx.Ops).Pop()
	w.op.Add(gtx.Ops)
	paint.PaintOp{}.Add(gtx.Ops)
	return layout.Dimensions{Size: size}
}

// render rasterises the plot at size pixels; plot text is sized for 96 dpi
// at one pixel per dp.
func (w *Plot) render(size image.Point, pxPerDp float32) {
	img := image.NewRGBA(image.Rectangle{Max: size})
	dpi := int(96*pxPerDp + 0.5)
	c := vgimg.NewWith(vgimg.UseImage(img), vgimg.UseDPI(dpi))
	// A margin on the right and at the top, so that the last tick label
	// and a curve running to the end of its range stay clear of the edge.
	w.p.Draw(vgdraw.Crop(vgdraw.New(c), 0, -plotMargin, 0, -plotMargin/2))
	// The canvas draws into its own copy of the image.
	out, ok := c.Image().(*image.RGBA)
	if !ok {
		out = image.NewRGBA(c.Image().Bounds())
		draw.Draw(out, out.Bounds(), c.Image(), image.Point{}, draw.Src)
	}
	w.img, w.size, w.ppdp = out, size, pxPerDp
	w.op = paint.NewImageOp(out)
}
