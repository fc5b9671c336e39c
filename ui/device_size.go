package ui

import (
	"strings"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// sizeAs lets a part's size be typed whole, the way the device file keeps
// it (a diameter, the gap between plates, a channel's width), or as its
// half (a radius, the half gap y0). Switching converts the text, so the
// size itself never changes by a factor of two; the line under the field
// always shows the whole and the half together.
type sizeAs struct {
	choice  *Choice   // "whole" or "half"
	labels  [2]string // the field's label for each
	halfKey string    // the file's key for the half in older files ("" if none)
	words   [2]string // the whole and the half in the echo: "gap 2y0", "half gap y0"

	// Kept between frames (see layout): the widget for the field it was
	// made for, the descriptions and the echo with what it was written
	// from.
	w                   layout.Widget
	wFor                *Field
	chipsDesc, bothDesc string
	echoText, echoFrom  string
	echoHalf, echoOK    bool
}

// Keys of a sizeAs choice.
const (
	sizeWhole = "whole"
	sizeHalf  = "half"
)

// newSizeAs returns the choice for a size; chips are the two chip labels
// (whole first), labels the field's label for each.
func newSizeAs(env *Env, chips, labels, words [2]string, halfKey string) *sizeAs {
	return &sizeAs{
		choice:  NewChoice(env, "", []string{sizeWhole, sizeHalf}, chips[:]),
		labels:  labels,
		halfKey: halfKey,
		words:   words,
	}
}

// roundSize is the choice for a round thing: diameter or radius.
func roundSize(env *Env, diameter, radius, halfKey string) *sizeAs {
	return newSizeAs(env, [2]string{"Diameter", "Radius"}, [2]string{diameter, radius}, [2]string{"Ø", "radius"}, halfKey)
}

// gapSize is the choice for the space between plates: gap or half gap.
func gapSize(env *Env) *sizeAs {
	return newSizeAs(env, [2]string{"Gap 2y0", "Half gap y0"},
		[2]string{"Gap between plates 2y0", "Half gap y0 (half the gap between plates)"},
		[2]string{"gap 2y0", "half gap y0"}, "pores.half_gap")
}

// half reports whether the size is typed as its half.
func (s *sizeAs) half() bool { return s.choice.Selected() == sizeHalf }

// update handles the chips of field f: a switch converts the text to the
// other form of the same size and relabels the field. It reports a
// switch.
func (s *sizeAs) update(gtx layout.Context, f *Field) bool {
	if !s.choice.Update(gtx) {
		return false
	}
	k := 0.5
	if !s.half() {
		k = 2
	}
	if t, ok := linear.ScaleLength(f.Text(), k); ok {
		f.SetText(t)
	}
	s.relabel(f)
	return true
}

// relabel names field f for the chosen form.
func (s *sizeAs) relabel(f *Field) {
	if s.half() {
		f.Label = s.labels[1]
	} else {
		f.Label = s.labels[0]
	}
}

// whole returns the whole size typed in f as the file keeps it, with the
// key to write it under: the text as typed, or the half doubled. A half
// that does not read goes under the half key (so the problem is named
// there), or as typed when the file has no half key.
func (s *sizeAs) whole(key string, f *Field) (string, string) {
	t := strings.TrimSpace(f.Text())
	if !s.half() || t == "" {
		return key, t
	}
	if w, ok := linear.ScaleLength(t, 2); ok {
		return key, w
	}
	if s.halfKey != "" {
		return s.halfKey, t
	}
	return key, t
}

// echo is the line under the field: the whole and the half together,
// "gap 2y0 = 0.6 mm (half gap y0 = 0.3 mm)", or "" when the text does not
// read.
func (s *sizeAs) echo(f *Field) string {
	q, err := units.Parse(f.Text(), units.DimLength)
	if err != nil || !(q.Value > 0) || q.Uncertainty != 0 {
		return ""
	}
	w := q.Value
	if s.half() {
		w *= 2
	}
	if s.words[0] == "gap 2y0" {
		return linear.GapWords(w / 2)
	}
	return s.words[0] + " " + lengthWords(w) + " (" + s.words[1] + " " + lengthWords(w/2) + ")"
}

// layout draws the chips, the field and the echo. The widget is made once
// for field f and kept; the echo is written again only when the text or
// the form changes.
func (s *sizeAs) layout(env *Env, f *Field) layout.Widget {
	if s.w != nil && s.wFor == f {
		return s.w
	}
	s.wFor = f
	s.chipsDesc, s.bothDesc = "Size of "+s.labels[0]+" given as", "Both sizes of "+s.labels[0]
	s.w = func(gtx layout.Context) layout.Dimensions {
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				return describe(gtx, s.chipsDesc, s.choice.Layout)
			}),
			layout.Rigid(layout.Spacer{Height: 4}.Layout),
			layout.Rigid(f.Layout),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				if text, half := f.Text(), s.half(); !s.echoOK || text != s.echoFrom || half != s.echoHalf {
					s.echoOK, s.echoFrom, s.echoHalf, s.echoText = true, text, half, s.echo(f)
				}
				if s.echoText == "" {
					return layout.Dimensions{}
				}
				return describe(gtx, s.bothDesc, func(gtx layout.Context) layout.Dimensions {
					return layoutNote(gtx, env, s.echoText)
				})
			}),
		)
	}
	return s.w
}

// lengthWords writes a small length in mm, or in µm below 10 µm, so that
// no exponent shows.
func lengthWords(v float64) string {
	unit := "mm"
	if v < 1e-5 {
		unit = "um"
	}
	if s, err := units.FormatInDim(v, units.DimLength, unit); err == nil {
		return s
	}
	return units.Format(v, units.DimLength)
}
