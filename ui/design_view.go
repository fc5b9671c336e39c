package ui

import (
	"fmt"

	"gioui.org/layout"
	"gioui.org/text"
	"gioui.org/unit"
	"gioui.org/widget/material"
)

// designWidgets are the design screen's widgets, bound once
// (bindWidgets); they read the screen when drawn.
type designWidgets struct {
	intro, headDesign, headNearest, wantHead, limitsHead layout.Widget
	cancelled, again, results, failPara, point, head     layout.Widget
	strip, pumpNote, open, caution, partsEngine          layout.Widget
	partsPump, parts, sensHead, sensNote, sens, howHead  layout.Widget
	about, progress                                      layout.Widget
	methods                                              indexed
}

// bindWidgets makes the screen's widgets once.
func (s *designScreen) bindWidgets() {
	env := s.env
	s.w = designWidgets{
		intro: Para(env, "Say what you want and what you have; the design runs in the background after every change. "+
			"It places and sizes the stack for the lowest onset and tunes the tube to your frequency."),
		headDesign: Heading(env, "The design"), headNearest: Heading(env, "Nearest design"),
		wantHead: Heading(env, "What you want"), limitsHead: Heading(env, "Limits and details (optional)"),
		cancelled: Described("design status", Note(env, capitalize(errCancelled.Error())+".")),
		again: func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min.X = 0
			return smallButton(env, gtx, &s.again, "Design again")
		},
		results:  s.form.Results.Layout,
		failPara: Para(env, "The target is out of reach. Below is the nearest design found, with what it misses by."),
		point:    s.form.PointWidget, head: s.head.Layout, strip: s.strip.Layout,
		pumpNote: Note(env, "Build it in the Heat pump editor part by part from the sizes below, driver first."),
		open: func(gtx layout.Context) layout.Dimensions {
			return material.Button(env.Theme, &s.open, "Open in Engine onset").Layout(atTarget(gtx))
		},
		caution:     s.form.CautionWidget,
		partsEngine: Heading(env, "Parts, from the closed end"), partsPump: Heading(env, "Parts, from the driver"),
		parts:    s.parts.Layout,
		sensHead: Heading(env, "What moves the onset"),
		sensNote: Note(env, "How the built engine's onset temperature and frequency change for one step of each quantity, the others held as stated."),
		sens:     s.sensitivityTable, howHead: Heading(env, "How it was designed"),
		about: Note(env, s.form.Sheet.About), progress: s.progressCard,
	}
	s.w.methods.draw = func(gtx layout.Context, i int) layout.Dimensions {
		return describe(gtx, "Method", func(gtx layout.Context) layout.Dimensions {
			return layoutNote(gtx, env, s.form.Result().Notes[i])
		})
	}
}

// inputs returns the input widgets the chosen kind of design reads, the
// optional limits last under their own heading. The device-file name is
// the terminal's: on screen the design opens in the onset editor instead.
// The slice is the screen's own, valid until the next call.
func (s *designScreen) inputs() []layout.Widget {
	kind := s.form.Text(designKeyFor)
	s.ins, s.adv = s.ins[:0], s.adv[:0]
	for i := range s.form.Sheet.Inputs {
		in := &s.form.Sheet.Inputs[i]
		if in.Key == designKeyDeviceOut {
			continue
		}
		if only, ok := designForOnly[in.Key]; ok && only != kind {
			continue
		}
		w := s.form.InputWidget(in.Key)
		if in.Advanced {
			s.adv = append(s.adv, w)
		} else {
			s.ins = append(s.ins, w)
		}
	}
	if len(s.adv) > 0 {
		s.ins = append(s.ins, s.w.limitsHead)
		s.ins = append(s.ins, s.adv...)
	}
	return s.ins
}

// outcome returns what the screen shows above the inputs (the progress,
// the cancelled note, the Form's failure, or the design's summary, its
// cautions, the device and the button that opens it) and below them (the
// parts, the sensitivity table and the method). The slices are the
// screen's own, valid until the next call.
func (s *designScreen) outcome() (top, details []layout.Widget) {
	w := &s.w
	s.outTop, s.details = s.outTop[:0], s.details[:0]
	switch s.state() {
	case designBusy:
		return append(s.outTop, w.progress), nil
	case designCancelled:
		return append(s.outTop, w.cancelled, w.again), nil
	case designIdle:
		return append(s.outTop, w.results), nil
	}
	if s.fail {
		s.outTop = append(s.outTop, w.failPara)
	}
	s.outTop = append(s.outTop, w.point, w.head, w.strip)
	if s.pump {
		s.outTop = append(s.outTop, w.pumpNote)
	} else {
		s.outTop = append(s.outTop, w.open)
	}
	s.outTop = append(s.outTop, w.caution)
	partsHead := w.partsEngine
	if s.pump {
		partsHead = w.partsPump
	}
	s.details = append(s.details, partsHead, w.parts)
	if len(s.sens) > 0 {
		s.details = append(s.details, w.sensHead, w.sensNote, w.sens)
	}
	s.details = append(s.details, w.howHead)
	if r := s.form.Result(); r != nil {
		for i := range r.Notes {
			s.details = append(s.details, w.methods.at(i))
		}
	}
	s.details = append(s.details, w.about)
	return s.outTop, s.details
}

// progressCard shows the running design's solves with a bar and Cancel.
func (s *designScreen) progressCard(gtx layout.Context) layout.Dimensions {
	th, c := s.env.Theme, s.env.Colors
	solves, limit := s.run.progressCounts()
	words, frac := "Designing…", float32(0)
	if limit > 0 {
		words = fmt.Sprintf("Designing: %d solves so far (the search stops by %d at most).", solves, limit)
		frac = float32(solves) / float32(limit)
	}
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return background(gtx, c.Surface, c.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
		return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
				layout.Rigid(Described("design status", Para(s.env, words))),
				layout.Rigid(layout.Spacer{Height: 10}.Layout),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					b := material.ProgressBar(th, frac)
					b.Color = c.Accent
					b.Height = unit.Dp(6)
					return b.Layout(gtx)
				}),
				layout.Rigid(layout.Spacer{Height: 12}.Layout),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					gtx.Constraints.Min.X = 0
					return smallButton(s.env, gtx, &s.cancel, "Cancel")
				}),
			)
		})
	})
}

// sensitivityTable draws the sensitivity lines as a table: the change,
// then the onset and frequency changes it brings, signed.
func (s *designScreen) sensitivityTable(gtx layout.Context) layout.Dimensions {
	c := s.env.Colors
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	if s.sensRows.draw == nil {
		s.sensRows.draw = s.sensitivityRow
	}
	s.sensCol.reset()
	for i := 0; i <= len(s.sens); i++ {
		s.sensCol.add(s.sensRows.at(i))
	}
	return background(gtx, c.Surface, c.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
		return layout.Inset{Top: 4, Bottom: 4}.Layout(gtx, s.sensCol.layout)
	})
}

// sensitivityRow draws row i of the sensitivity table: the header, then
// line i-1 of the sensitivity.
func (s *designScreen) sensitivityRow(gtx layout.Context, i int) layout.Dimensions {
	if i == 0 {
		return s.tableRow(gtx, "One step more of", "Onset", "Frequency", true, "", "")
	}
	l, t := s.sens[i-1], s.sensText[i-1]
	return s.tableRow(gtx, l.Change, t[0], t[1], false, l.Onset.Label, l.Frequency.Label)
}

// tableRow draws one line of the sensitivity table; the values carry the
// row labels as their descriptions (for screen readers and tests).
func (s *designScreen) tableRow(gtx layout.Context, change, onset, freq string, header bool, onsetDesc, freqDesc string) layout.Dimensions {
	th, c := s.env.Theme, s.env.Colors
	cell := func(gtx layout.Context, txt, desc string, width unit.Dp) layout.Dimensions {
		gtx.Constraints.Min.X, gtx.Constraints.Max.X = gtx.Dp(width), gtx.Dp(width)
		l := material.Label(th, unit.Sp(16), txt)
		l.Alignment = text.End
		l.Color = c.Text
		if header {
			l.Color, l.Font.Weight = c.Muted, 600
		} else {
			l.Font.Weight = 600
		}
		if desc == "" {
			return l.Layout(gtx)
		}
		return describe(gtx, desc, l.Layout)
	}
	return layout.Inset{Left: 14, Right: 14, Top: 7, Bottom: 7}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		return layout.Flex{Alignment: layout.Start}.Layout(gtx,
			layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
				l := material.Body2(th, change)
				l.Color = c.Muted
				if header {
					l.Font.Weight = 600
				}
				return l.Layout(gtx)
			}),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions { return cell(gtx, onset, onsetDesc, 82) }),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions { return cell(gtx, freq, freqDesc, 96) }),
		)
	})
}

// signed writes v with its sign and prec decimals, e.g. "+1.11 K",
// "-0.151 Hz" (a sensitivity: small numbers, never an exponent).
func signed(v float64, prec int, unit string) string {
	if !finite(v) {
		return "—"
	}
	return fmt.Sprintf("%+.*f %s", prec, v, unit)
}
