package ui

import (
	_ "embed" // the font files
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
	"golang.org/x/image/font/gofont/goregular"
)

// goBoldTTF is Go Bold (golang.org/x/image/font/gofont/gobold) with its
// TrueType hinting instructions left out, which Gio's text shaper never
// runs: every glyph, outline, advance and name (copyright included) is the
// original's, at 71 kB instead of 152 kB. `make fonts` writes it;
// ui/fonts/LICENSE is its licence, and TestAppFacesDrawAsGoFonts checks it
// against the original glyph by glyph. Go Regular stays the original: Gio's
// app package links that one for its own use, so a lighter copy would only
// add to the download.
//
//go:embed fonts/Go-Bold.ttf
var goBoldTTF []byte

// appFaces are the only font faces the app embeds: Go Regular and Go Bold.
// The screens ask for weights 400, 600 and 700 and never for italics or a
// monospace face; the shaper reads Go Bold as weight 600 and draws both 600
// and 700 with it. Each face is 30 to 60 kB of the compressed WebAssembly
// download, so no others are linked.
var appFaces = sync.OnceValue(func() []font.FontFace {
	var out []font.FontFace
	for _, ttf := range [][]byte{goregular.TTF, goBoldTTF} {
		faces, err := opentype.ParseCollection(ttf)
		if err != nil {
			panic(fmt.Errorf("ui: embedded Go font: %v", err))
		}
		out = append(out, faces...)
	}
	return out
})

// Colors is the app's palette beyond material.Palette: surfaces, muted
// text, errors, outlines, check badges and the caution box. The app has two
// (brightColors, darkColors, in themes.go); Env.SetDark swaps them at run
// time, so screens read Env.Colors every frame and never keep a copy.
type Colors struct {
	Background  color.NRGBA // window background
	Surface     color.NRGBA // cards and the side list
	Text        color.NRGBA // body text
	Muted       color.NRGBA // hints, units, secondary text
	Accent      color.NRGBA // buttons, selection, links, the top bar
	OnAccent    color.NRGBA // text on Accent
	Divider     color.NRGBA // hairlines between rows
	Outline     color.NRGBA // the border of a field or an unselected chip
	Error       color.NRGBA // error text under a field
	Warning     color.NRGBA // model warnings
	CautionBg   color.NRGBA // caution box fill
	CautionEdge color.NRGBA // caution box border and heading
	CautionText color.NRGBA // caution box text
	Selected    color.NRGBA // a selected list entry, selected text
	Pass        color.NRGBA // a passed check's badge and band
	Check       color.NRGBA // a check to look at again: badge and band
	Fail        color.NRGBA // a failed check's badge and band
	OnBadge     color.NRGBA // text and icons on Pass, Check and Fail
}

// rgb builds an opaque colour from 0xRRGGBB.
func rgb(c uint32) color.NRGBA {
	return color.NRGBA{R: uint8(c >> 16), G: uint8(c >> 8), B: uint8(c), A: 0xff}
}

// NewTheme returns the app's material theme and the bright bench palette.
// Its text shaper uses only the embedded faces (appFaces), never system
// fonts: the browser build has none, and screenshots then do not depend on
// the host's fonts.
func NewTheme() (*material.Theme, Colors) {
	th := material.NewTheme()
	th.Shaper = text.NewShaper(text.NoSystemFonts(), text.WithCollection(appFaces()))
	c := brightColors()
	applyPalette(th, c)
	th.TextSize = unit.Sp(16)
	return th, c
}

// applyPalette sets the material palette of th from c.
func applyPalette(th *material.Theme, c Colors) {
	th.Palette = material.Palette{
		Bg:         c.Background,
		Fg:         c.Text,
		ContrastBg: c.Accent,
		ContrastFg: c.OnAccent,
	}
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
