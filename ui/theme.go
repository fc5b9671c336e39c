package ui

import (
	"fmt"
	"image"
	"image/color"
	"sync"

	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/op/clip"
	"gioui.org/op/paint"

	"gioui.org/font"
	"gioui.org/font/opentype"
	"gioui.org/text"
	"gioui.org/unit"
	"gioui.org/widget/material"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goregular"
)

// appFaces are the only font faces the app embeds: Go Regular and Go Bold.
// The screens ask for weights 400, 600 and 700 and never for italics or a
// monospace face; the shaper reads Go Bold as weight 600 and draws both 600
// and 700 with it. Each face is about 130 kB of
// the WebAssembly download, so no others are linked.
var appFaces = sync.OnceValue(func() []font.FontFace {
	var out []font.FontFace
	for _, ttf := range [][]byte{goregular.TTF, gobold.TTF} {
		faces, err := opentype.ParseCollection(ttf)
		if err != nil {
			panic(fmt.Errorf("ui: embedded Go font: %v", err))
		}
		out = append(out, faces...)
	}
	return out
})

// Colors is the app's palette beyond material.Palette: surfaces, muted
// text, errors and the caution box.
type Colors struct {
	Background  color.NRGBA // window background
	Surface     color.NRGBA // cards and the side list
	Text        color.NRGBA // body text
	Muted       color.NRGBA // hints, units, secondary text
	Accent      color.NRGBA // buttons, selection, links
	OnAccent    color.NRGBA // text on Accent
	Divider     color.NRGBA // hairlines between rows
	Error       color.NRGBA // error text under a field
	Warning     color.NRGBA // model warnings
	CautionBg   color.NRGBA // caution box fill
	CautionEdge color.NRGBA // caution box border and heading
	CautionText color.NRGBA // caution box text
	Selected    color.NRGBA // a selected chip or list entry
}

// rgb builds an opaque colour from 0xRRGGBB.
func rgb(c uint32) color.NRGBA {
	return color.NRGBA{R: uint8(c >> 16), G: uint8(c >> 8), B: uint8(c), A: 0xff}
}

// NewTheme returns the app's material theme and the palette beyond it. Its
// text shaper uses only the embedded faces (appFaces), never system fonts:
// the browser build has none, and screenshots then do not depend on the
// host's fonts.
func NewTheme() (*material.Theme, Colors) {
	th := material.NewTheme()
	th.Shaper = text.NewShaper(text.NoSystemFonts(), text.WithCollection(appFaces()))
	c := Colors{
		Background:  rgb(0xf6f4ef),
		Surface:     rgb(0xffffff),
		Text:        rgb(0x1e2a32),
		Muted:       rgb(0x5a6670),
		Accent:      rgb(0x23636b),
		OnAccent:    rgb(0xffffff),
		Divider:     rgb(0xdcd8cf),
		Error:       rgb(0xa3261f),
		Warning:     rgb(0x8a5a00),
		CautionBg:   rgb(0xfff3d1),
		CautionEdge: rgb(0xb06d00),
		CautionText: rgb(0x3d2a00),
		Selected:    rgb(0xd6e8e9),
	}
	th.Palette = material.Palette{
		Bg:         c.Background,
		Fg:         c.Text,
		ContrastBg: c.Accent,
		ContrastFg: c.OnAccent,
	}
	th.TextSize = unit.Sp(16)
	return th, c
}

// fill paints the rectangle from the origin to size with c.
func fill(gtx layout.Context, c color.NRGBA, size image.Point) {
	defer clip.Rect{Max: size}.Push(gtx.Ops).Pop()
	paint.ColorOp{Color: c}.Add(gtx.Ops)
	paint.PaintOp{}.Add(gtx.Ops)
}

// box paints a rounded rectangle of the given size: a fill, then a border
// of width bw pixels (none when bw is 0).
func box(gtx layout.Context, size image.Point, bg, border color.NRGBA, radius, bw int) {
	r := image.Rectangle{Max: size}
	rr := clip.UniformRRect(r, radius)
	paint.FillShape(gtx.Ops, bg, rr.Op(gtx.Ops))
	if bw > 0 {
		paint.FillShape(gtx.Ops, border, clip.Stroke{Path: rr.Path(gtx.Ops), Width: float32(bw)}.Op())
	}
}

// background lays out w over a rounded box that fits w's size.
func background(gtx layout.Context, bg, border color.NRGBA, radius, bw int, w layout.Widget) layout.Dimensions {
	m := op.Record(gtx.Ops)
	dims := w(gtx)
	call := m.Stop()
	box(gtx, dims.Size, bg, border, radius, bw)
	call.Add(gtx.Ops)
	return dims
}
