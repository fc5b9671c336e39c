package ui

import (
	"gioui.org/layout"
	"gioui.org/widget/material"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// sizePair is a size on a screen built on a Form that the description
// takes whole or as its half under two keys (a tube's "diameter" or
// "radius"). The screen shows one of the two, chosen with chips; a switch
// converts the text, so the size never changes by a factor of two, and
// a line under the field shows both. A value that arrives in the hidden
// one (carried from another screen, restored from the last session)
// brings its own form forward and empties the other, so the two are never
// both given.
type sizePair struct {
	env         *Env
	whole, half string    // the input keys
	words       [2]string // the whole and the half in the line under the field
	choice      *Choice
	seen        [2]string // the texts at the end of the last frame

	// Kept for drawing (see widgets): the widgets, their descriptions and
	// the line with both sizes, written again only when the text or the
	// form shown changes.
	ws                  [3]layout.Widget
	form                *Form
	chipsDesc, bothDesc string
	line                string
	lineOK, lineHalf    bool
	lineText            string
}

// newSizePair returns the pair of inputs whole and half of f, typed whole
// first; chips are the chips' words, words those of the line under the
// field ("Ø", "radius"). The texts f starts with are the ones seen, so
// that a value carried in or restored before the first frame counts as
// arriving.
func newSizePair(env *Env, f *Form, whole, half string, chips, words [2]string) *sizePair {
	p := &sizePair{env: env, whole: whole, half: half, words: words,
		choice: NewChoice(env, "", []string{sizeWhole, sizeHalf}, chips[:])}
	// The description starts with the whole; a half there already was
	// restored (a session that used it, or one from before the whole was
	// offered) and is what the user typed.
	if f.Text(half) != "" {
		p.choice.Select(sizeHalf)
		f.SetText(whole, "")
	}
	p.settle(f)
	return p
}

// halfShown reports whether the half is the input shown.
func (p *sizePair) halfShown() bool { return p.choice.Selected() == sizeHalf }

// key returns the key of the input shown.
func (p *sizePair) key() string {
	if p.halfShown() {
		return p.half
	}
	return p.whole
}

// update handles the chips and a value arriving in the hidden input;
// stash is the screen's store of hidden texts (see hideInputs). It
// reports whether a text changed.
func (p *sizePair) update(gtx layout.Context, f *Form, stash map[string]string) bool {
	show := func(half bool) {
		from, to := p.half, p.whole
		if half {
			from, to = p.whole, p.half
			p.choice.Select(sizeHalf)
		} else {
			p.choice.Select(sizeWhole)
		}
		f.SetText(from, "")
		delete(stash, from)
		delete(stash, to)
	}
	if p.choice.Update(gtx) {
		half := p.halfShown()
		from, to, k := p.half, p.whole, 2.0
		if half {
			from, to, k = p.whole, p.half, 0.5
		}
		t := f.Text(from)
		if s, ok := linear.ScaleLength(t, k); ok {
			t = s
		}
		f.SetText(to, t)
		show(half)
		return true
	}
	w, h := f.Text(p.whole), f.Text(p.half)
	switch {
	case w != p.seen[0] && w != "" && p.halfShown():
		show(false)
		return true
	case h != p.seen[1] && h != "" && !p.halfShown():
		show(true)
		return true
	}
	return false
}

// settle records the texts at the end of the screen's update.
func (p *sizePair) settle(f *Form) {
	p.seen = [2]string{f.Text(p.whole), f.Text(p.half)}
}

// widgets are the chips, the field shown and the line with both sizes;
// f is the form the pair was made with. The slice is the pair's own.
func (p *sizePair) widgets(f *Form) []layout.Widget {
	if p.ws[0] == nil {
		label := f.Sheet.Input(p.whole).Label
		p.form, p.chipsDesc, p.bothDesc = f, "Size of "+label+" given as", "Both sizes of "+label
		p.ws[0], p.ws[2] = p.layoutChips, p.layoutBoth
	}
	p.ws[1] = f.InputWidget(p.key())
	return p.ws[:]
}

// layoutChips draws the chips that choose the whole or the half.
func (p *sizePair) layoutChips(gtx layout.Context) layout.Dimensions {
	return describe(gtx, p.chipsDesc, p.choice.Layout)
}

// layoutBoth draws the line with both sizes, or nothing while the text is
// not a positive length.
func (p *sizePair) layoutBoth(gtx layout.Context) layout.Dimensions {
	text, half := p.form.Text(p.key()), p.halfShown()
	if !p.lineOK || text != p.lineText || half != p.lineHalf {
		p.lineOK, p.lineText, p.lineHalf, p.line = true, text, half, ""
		if q, err := units.Parse(text, units.DimLength); err == nil && q.Value > 0 {
			w := q.Value
			if half {
				w *= 2
			}
			p.line = p.words[0] + " " + lengthWords(w) + " (" + p.words[1] + " " + lengthWords(w/2) + ")"
		}
	}
	if p.line == "" {
		return layout.Dimensions{}
	}
	l := material.Body2(p.env.Theme, p.line)
	l.Color = p.env.Colors.Muted
	return describe(gtx, p.bothDesc, l.Layout)
}
