package ui

import (
	"image"
	"image/color"
	"math"

	"gioui.org/layout"
	"gioui.org/op/clip"
	"gioui.org/op/paint"

	"tubewright/calc/linear"
)

// deviceStrip draws the device to scale as a row of plain shapes: tubes as
// grey bands (tinted red when hot, pale blue when cold), stacks hatched, exchangers coloured by temperature (warm red,
// ambient blue, cold pale blue), cavities as boxes, closed ends as dark
// bars, a driver as a dark wedge. Length and diameter share one scale.
type deviceStrip struct {
	env *Env
	dev *linear.Device // last valid device; nil draws nothing
}

// Strip colours (our own).
var (
	stripTube     = rgb(0xd9dee4)
	stripTubeHot  = rgb(0xf2d4d2)
	stripTubeCold = rgb(0xd6eef8)
	stripWall     = rgb(0x6b7785)
	stripStack    = rgb(0xe8d9b5)
	stripHatch    = rgb(0x8c7a4e)
	stripHot      = rgb(0xd9534f)
	stripAmbient  = rgb(0x3d7cc9)
	stripCold     = rgb(0x8fd0ea)
	stripFixed    = rgb(0xb07cc6)
	stripEnd      = rgb(0x2b2f36)
	stripCavityBg = rgb(0xeef1f4)
)

// Layout draws the strip across the width, at most 120 dp tall.
func (s *deviceStrip) Layout(gtx layout.Context) layout.Dimensions {
	d := s.dev
	if d == nil || len(d.Parts) == 0 {
		return layout.Dimensions{}
	}
	w := gtx.Constraints.Max.X
	maxH := float64(gtx.Dp(120))
	pad := float64(gtx.Dp(10))
	// Widths: parts' lengths; cavities as cubes of their volume; ends as
	// thin bars.
	endW := float64(gtx.Dp(5))
	var total, maxD float64
	for _, p := range d.Parts {
		total += p.Length
		if p.Kind == linear.KindCavity {
			total += math.Cbrt(p.Volume)
			maxD = math.Max(maxD, math.Cbrt(p.Volume))
		}
		maxD = math.Max(maxD, p.Diameter)
	}
	if total <= 0 || maxD <= 0 {
		return layout.Dimensions{}
	}
	avail := float64(w) - 2*pad - 2*endW
	scale := avail / total
	if maxD*scale > maxH {
		scale = maxH / maxD
	}
	h := int(math.Max(maxD*scale, float64(gtx.Dp(12))) + 2*pad)
	mid := float64(h) / 2
	x := pad
	rect := func(x0, x1, half float64, c color.NRGBA) {
		r := image.Rect(int(x0), int(mid-half), int(math.Max(x1, x0+1)), int(mid+half+1))
		paint.FillShape(gtx.Ops, c, clip.Rect(r).Op())
	}
	for i, p := range d.Parts {
		half := math.Max(p.Diameter*scale/2, 2)
		if p.Diameter == 0 {
			half = s.neighbourHalf(i, scale)
		}
		switch p.Kind {
		case linear.KindClosedEnd:
			rect(x, x+endW, half+3, stripEnd)
			x += endW
		case linear.KindDriver:
			// a wedge drawn as stacked bars narrowing to the left
			for k := 0; k < int(endW*2); k++ {
				f := float64(k) / (endW * 2)
				rect(x+float64(k), x+float64(k)+1, half*(0.5+0.5*f)+3, stripEnd)
			}
			x += endW * 2
		case linear.KindOpenEnd:
			// nothing closes the tube: short wall stubs only
			rect(x, x+2, 1, stripWall)
		case linear.KindTube:
			l := p.Length * scale
			fillc := stripTube
			switch p.Temp {
			case linear.TempHot:
				fillc = stripTubeHot
			case linear.TempCold:
				fillc = stripTubeCold
			}
			rect(x, x+l, half, fillc)
			paint.FillShape(gtx.Ops, stripWall, clip.Rect(image.Rect(int(x), int(mid-half)-1, int(x+l)+1, int(mid-half)+1)).Op())
			paint.FillShape(gtx.Ops, stripWall, clip.Rect(image.Rect(int(x), int(mid+half), int(x+l)+1, int(mid+half)+2)).Op())
			x += l
		case linear.KindStack:
			l := p.Length * scale
			rect(x, x+l, half, stripStack)
			step := math.Max(3, float64(gtx.Dp(4)))
			for hx := x + step/2; hx < x+l; hx += step {
				rect(hx, hx+1, half, stripHatch)
			}
			x += l
		case linear.KindExchanger:
			l := p.Length * scale
			rect(x, x+math.Max(l, 2), half, tempColour(p.Temp))
			x += math.Max(l, 2)
		case linear.KindCavity:
			side := math.Cbrt(p.Volume) * scale
			rect(x, x+side, side/2, stripWall)
			rect(x+1, x+side-1, side/2-1, stripCavityBg)
			x += side
		}
	}
	return layout.Dimensions{Size: image.Pt(w, h)}
}

// neighbourHalf is the half-height of the nearest part with a diameter.
func (s *deviceStrip) neighbourHalf(i int, scale float64) float64 {
	for k := 1; k < len(s.dev.Parts); k++ {
		for _, j := range []int{i - k, i + k} {
			if j >= 0 && j < len(s.dev.Parts) && s.dev.Parts[j].Diameter > 0 {
				return math.Max(s.dev.Parts[j].Diameter*scale/2, 2)
			}
		}
	}
	return 6
}

func tempColour(t linear.TempRef) color.NRGBA {
	switch t {
	case linear.TempHot:
		return stripHot
	case linear.TempCold:
		return stripCold
	case linear.TempFixed:
		return stripFixed
	}
	return stripAmbient
}
