package ui

import (
	"image"
	"image/color"
	"slices"
	"strings"

	"gioui.org/f32"
	"gioui.org/layout"
	"gioui.org/op/clip"
	"gioui.org/op/paint"
	"gioui.org/unit"
	"gioui.org/widget/material"

	"tubewright/calc/safety"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/ui/store"
)

// inlineCalc is the calculator shown inside a checklist item where a
// number decides it. Update handles events and recomputes; Verdict, Inputs
// and Outputs draw it.
type inlineCalc interface {
	Update(gtx layout.Context)
	// Verdict is the step's worst outcome, drawn at the top of the step.
	Verdict() layout.Widget
	// Inputs are the fields and choices; Outputs the results card and the
	// caution box beside it.
	Inputs() []layout.Widget
	Outputs() []layout.Widget
	// Numbers returns the last result's numbers for the bench log, nil
	// when the inputs do not give one.
	Numbers() []store.Number
	// Typed returns the inputs as typed, and Checks the step's checks, for
	// the bench log.
	Typed() []store.ItemInput
	Checks() []store.ItemVerdict
	// Cautions returns the cautions shown beside the numbers.
	Cautions() []string
}

// stepPart is the share of one calculator's description that a step of
// the safety pass shows: some of its inputs and some of its result rows.
// Several steps may share one Form (the vessel's wall, relief and test
// steps), so that an input typed in one is the same input in the others.
type stepPart struct {
	form *Form
	keys []string // inputs shown, in this order
	rows []string // result rows shown, in this order
	// warnings says whether the part shows the result's warnings (one
	// part per Form does).
	warnings bool
	results  *Results

	// pair, when set, shows two of keys as one size typed whole or as
	// its half (the shell's inside diameter or its radius), with chips.
	pair *sizePair
	// cardW is results.Layout, made once (see resultsW).
	cardW layout.Widget

	shown *sheet.Result // the result on the card
	err   error         // the error on the card
	fresh bool          // the card has been filled once
	hints map[string]string
}

// sheetStep is a step of the safety pass built from calculator
// descriptions: its fields and result rows come from the parts' sheets.
type sheetStep struct {
	env   *Env
	parts []*stepPart
	// base are the cautions the step always shows: the checklist item's
	// own. The general caution is the screen's, once at the top of every
	// step (see safetyScreen.Layout), not again in the step's box.
	base    []string
	caution *Caution
	// before runs before the forms update: carry-over from other steps.
	before func()

	// Kept between frames (see retain.go): the slices Inputs and Outputs
	// return and the cards' widgets.
	ins, outs []layout.Widget
	cards     column
	// The banner's text, kept while the parts show the same results.
	vFor   []*sheet.Result
	vOut   sheet.Outcome
	vHead  string
	vLines []string
	vCol   column
	vHeadW layout.Widget
	vLineW indexed
}

// banner returns verdictText, written again only when a part's result
// changed.
func (s *sheetStep) banner() (sheet.Outcome, string, []string) {
	same := len(s.vFor) == len(s.parts)
	for i, p := range s.parts {
		if same && s.vFor[i] != p.shown {
			same = false
		}
	}
	if !same {
		s.vFor = s.vFor[:0]
		for _, p := range s.parts {
			s.vFor = append(s.vFor, p.shown)
		}
		s.vOut, s.vHead, s.vLines = s.verdictText()
	}
	return s.vOut, s.vHead, s.vLines
}

// newSheetStep returns a step with the item's cautions and the parts.
func newSheetStep(env *Env, heading string, item []string, parts ...*stepPart) *sheetStep {
	var base []string
	for _, c := range item {
		if c != safety.CautionGeneral && !slices.Contains(base, c) {
			base = append(base, c)
		}
	}
	for _, p := range parts {
		p.results = NewResults(env)
		p.hints = map[string]string{}
		for _, k := range p.keys {
			if fd := p.form.Field(k); fd != nil {
				p.hints[k] = fd.Hint
			}
		}
	}
	return &sheetStep{env: env, parts: parts, base: base, caution: NewCaution(env, heading, base...)}
}

// part makes a stepPart of form showing keys and rows.
func part(form *Form, keys, rows []string) *stepPart {
	return &stepPart{form: form, keys: keys, rows: rows}
}

// Update implements inlineCalc.
func (s *sheetStep) Update(gtx layout.Context) {
	if s.before != nil {
		s.before()
	}
	for _, p := range s.parts {
		p.form.Update(gtx)
		if p.pair != nil {
			if p.pair.update(gtx, p.form, nil) {
				p.form.Update(gtx)
			}
			p.pair.settle(p.form)
		}
	}
	s.refresh()
}

// settle brings a step that has been shown up to date with its forms,
// which other steps may have changed since (the vessel's inputs are shared
// by three steps); a step never shown stays empty.
func (s *sheetStep) settle() {
	if s.shownOnce() {
		s.refresh()
	}
}

// shownOnce reports whether the step has been shown.
func (s *sheetStep) shownOnce() bool {
	for _, p := range s.parts {
		if p.fresh {
			return true
		}
	}
	return false
}

// refresh fills the cards from the forms' results where they changed.
func (s *sheetStep) refresh() {
	changed := false
	for _, p := range s.parts {
		if p.fresh && p.shown == p.form.Result() && p.err == p.form.Err() {
			continue
		}
		p.fresh, p.shown, p.err = true, p.form.Result(), p.form.Err()
		p.fill()
		changed = true
	}
	if changed {
		s.caution.Lines = s.Cautions()
	}
}

// fill shows the part's rows of the form's result, or the form's error,
// and says under each pressure field how it was read.
func (p *stepPart) fill() {
	r := p.results
	r.Reset()
	for _, k := range p.keys {
		fd := p.form.Field(k)
		if fd == nil || fd.In == nil {
			continue
		}
		hint := p.hints[k]
		if v, err := sheet.ParseInput(fd.In, fd.Text()); err == nil {
			if read := sheet.ReadingOfValue(v); read != "" {
				hint = read
			}
		}
		fd.Hint = hint
	}
	if p.shown == nil {
		if p.err != nil {
			r.Fail(p.err)
		}
		return
	}
	sub := &sheet.Result{Rows: p.rowsShown()}
	if p.warnings {
		sub.Warnings = p.shown.Warnings
	}
	r.Show(sub)
}

// rowsShown returns the part's rows of the last result, in the part's
// order.
func (p *stepPart) rowsShown() []sheet.Row {
	if p.shown == nil {
		return nil
	}
	var out []sheet.Row
	for _, k := range p.rows {
		if row, ok := p.shown.Row(k); ok {
			out = append(out, row)
		}
	}
	return out
}

// worst returns the worst outcome among the step's rows and the rows that
// have it.
func (s *sheetStep) worst() (sheet.Outcome, []sheet.Row) {
	w := sheet.None
	var rows []sheet.Row
	for _, p := range s.parts {
		for _, row := range p.rowsShown() {
			switch {
			case row.Outcome > w:
				w, rows = row.Outcome, []sheet.Row{row}
			case row.Outcome == w && w != sheet.None:
				rows = append(rows, row)
			}
		}
	}
	return w, rows
}

// verdictText is the banner's text: the outcome in words, then each check
// that has it with its verdict and why.
func (s *sheetStep) verdictText() (sheet.Outcome, string, []string) {
	w, rows := s.worst()
	var head string
	switch w {
	case sheet.Fail:
		head = "FAIL: do not go on until this is put right"
	case sheet.Warn:
		head = "CHECK: read the notes below before going on"
	case sheet.Pass:
		head = "PASS: every check of this step passes"
	default:
		return w, "", nil
	}
	var lines []string
	if w != sheet.Pass {
		for _, row := range rows {
			lines = append(lines, row.Label+": "+row.Text+" — "+row.Note)
		}
	}
	return w, head, lines
}

// Verdict implements inlineCalc: a coloured band with an icon and words
// at the top of the step, readable in glare and by a screen reader.
func (s *sheetStep) Verdict() layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		_, head, _ := s.banner()
		if head == "" {
			return layout.Dimensions{}
		}
		if s.vHeadW == nil {
			s.vHeadW = s.layoutBannerHead
			s.vLineW.draw = s.layoutBannerLine
		}
		_, bg := outcomeLook(s.env.Colors, s.vOut)
		gtx.Constraints.Min.X = gtx.Constraints.Max.X
		return describe(gtx, "Step verdict", func(gtx layout.Context) layout.Dimensions {
			return background(gtx, bg, bg, gtx.Dp(8), 0, func(gtx layout.Context) layout.Dimensions {
				return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					return s.vCol.headAndLines(gtx, s.vHeadW, &s.vLineW, len(s.vLines))
				})
			})
		})
	}
}

// layoutBannerHead draws the banner's icon and outcome in words.
func (s *sheetStep) layoutBannerHead(gtx layout.Context) layout.Dimensions {
	o, head := s.vOut, s.vHead
	_, bg := outcomeLook(s.env.Colors, o)
	white := s.env.Colors.OnBadge
	return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions { return outcomeIcon(gtx, o, white, bg) }),
		layout.Rigid(layout.Spacer{Width: 10}.Layout),
		layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
			l := material.Label(s.env.Theme, unit.Sp(19), head)
			l.Color = white
			l.Font.Weight = 700
			return l.Layout(gtx)
		}))
}

// layoutBannerLine draws line i of the banner.
func (s *sheetStep) layoutBannerLine(gtx layout.Context, i int) layout.Dimensions {
	l := material.Label(s.env.Theme, unit.Sp(16), s.vLines[i])
	l.Color = s.env.Colors.OnBadge
	return l.Layout(gtx)
}

// outcomeIcon draws the outcome's sign in a disc of fg on bg: a tick for
// pass, an exclamation mark for check, a cross for fail (drawn as paths:
// the embedded fonts have no such glyphs).
func outcomeIcon(gtx layout.Context, o sheet.Outcome, fg, bg color.NRGBA) layout.Dimensions {
	d := gtx.Dp(28)
	size := image.Pt(d, d)
	paint.FillShape(gtx.Ops, fg, clip.Ellipse{Max: size}.Op(gtx.Ops))
	w := float32(gtx.Dp(3.5))
	pt := func(x, y float32) f32.Point { return f32.Pt(x*float32(d), y*float32(d)) }
	var p clip.Path
	p.Begin(gtx.Ops)
	switch o {
	case sheet.Pass:
		p.MoveTo(pt(0.27, 0.52))
		p.LineTo(pt(0.44, 0.69))
		p.LineTo(pt(0.74, 0.33))
	case sheet.Fail:
		p.MoveTo(pt(0.31, 0.31))
		p.LineTo(pt(0.69, 0.69))
		p.MoveTo(pt(0.69, 0.31))
		p.LineTo(pt(0.31, 0.69))
	default:
		p.MoveTo(pt(0.5, 0.22))
		p.LineTo(pt(0.5, 0.58))
		p.MoveTo(pt(0.5, 0.72))
		p.LineTo(pt(0.5, 0.78))
	}
	paint.FillShape(gtx.Ops, bg, clip.Stroke{Path: p.End(), Width: w}.Op())
	return layout.Dimensions{Size: size}
}

// Inputs implements inlineCalc. The slice is the step's own, valid until
// the next call.
func (s *sheetStep) Inputs() []layout.Widget {
	s.ins = s.ins[:0]
	for _, p := range s.parts {
		for _, k := range p.keys {
			switch {
			case p.pair != nil && k == p.pair.whole:
				s.ins = append(s.ins, p.pair.widgets(p.form)...)
			case p.pair != nil && k == p.pair.half:
			default:
				s.ins = append(s.ins, p.form.InputWidget(k))
			}
		}
	}
	return s.ins
}

// Outputs implements inlineCalc: the parts' cards one above the other,
// and the caution box (beside them where the width allows). The slice is
// made once and kept.
func (s *sheetStep) Outputs() []layout.Widget {
	if s.outs == nil {
		s.outs = []layout.Widget{s.layoutCards, s.caution.Layout}
	}
	return s.outs
}

// layoutCards draws the parts' results cards, 12 dp apart.
func (s *sheetStep) layoutCards(gtx layout.Context) layout.Dimensions {
	s.cards.reset()
	for i, p := range s.parts {
		if i > 0 {
			s.cards.add(gapH12)
		}
		s.cards.add(p.resultsW())
	}
	return s.cards.layout(gtx)
}

// resultsW returns the part's results card as a widget, made once.
func (p *stepPart) resultsW() layout.Widget {
	if p.cardW == nil {
		p.cardW = p.results.Layout
	}
	return p.cardW
}

// Numbers implements inlineCalc: the number rows shown, in SI with the
// text shown.
func (s *sheetStep) Numbers() []store.Number {
	var out []store.Number
	for _, p := range s.parts {
		for _, row := range p.rowsShown() {
			if row.Kind != sheet.Num {
				continue
			}
			shown, _ := p.results.Value(row.Label)
			unit := units.SIUnit(row.Dim)
			if unit == "" {
				unit = "1"
			}
			out = append(out, store.Number{Name: row.Label, Value: row.Value, Unit: unit, Shown: shown})
		}
	}
	return out
}

// Typed implements inlineCalc: nothing for a step never shown.
func (s *sheetStep) Typed() []store.ItemInput {
	if !s.shownOnce() {
		return nil
	}
	var out []store.ItemInput
	for _, p := range s.parts {
		for _, k := range p.keys {
			if t := strings.TrimSpace(p.form.Text(k)); t != "" {
				out = append(out, store.ItemInput{Key: k, Label: p.form.Sheet.Input(k).Label, Text: t})
			}
		}
	}
	return out
}

// Checks implements inlineCalc.
func (s *sheetStep) Checks() []store.ItemVerdict {
	var out []store.ItemVerdict
	for _, p := range s.parts {
		for _, row := range p.rowsShown() {
			if row.Outcome != sheet.None {
				out = append(out, store.ItemVerdict{Check: row.Key, Outcome: row.Outcome.String(), Why: row.Note})
			}
		}
	}
	return out
}

// Cautions implements inlineCalc: the item's cautions, those of the
// parts' results (the general caution, which the screen shows once at the
// top of the step, left out), and those of the gases picked (hydrogen
// burns, carbon dioxide is toxic), which stand whether or not the other
// inputs give a result.
func (s *sheetStep) Cautions() []string {
	out := append([]string(nil), s.base...)
	add := func(lines ...string) {
		for _, l := range lines {
			if !slices.Contains(out, l) {
				out = append(out, l)
			}
		}
	}
	for _, p := range s.parts {
		if p.shown != nil {
			for _, l := range p.shown.Cautions {
				if l != safety.CautionGeneral {
					add(l)
				}
			}
		}
		for _, k := range p.keys {
			if g := p.form.Gas(k); g != nil {
				if m, err := g.Mixture(); err == nil {
					add(safety.GasCautions(m)...)
				}
			}
		}
	}
	return out
}
