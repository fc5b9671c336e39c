package ui

import (
	"fmt"

	"gioui.org/layout"
	"gioui.org/text"
	"gioui.org/unit"
	"gioui.org/widget/material"
)

// inputs returns the input widgets the chosen kind of design reads, the
// optional limits last under their own heading. The device-file name is
// the terminal's: on screen the design opens in the onset editor instead.
func (s *designScreen) inputs() []layout.Widget {
	kind := s.form.Text(designKeyFor)
	var main, adv []layout.Widget
	for _, in := range s.form.Sheet.Inputs {
		if in.Key == designKeyDeviceOut {
			continue
		}
		if only, ok := designForOnly[in.Key]; ok && only != kind {
			continue
		}
		w := s.form.InputWidget(in.Key)
		if in.Advanced {
			adv = append(adv, w)
		} else {
			main = append(main, w)
		}
	}
	if len(adv) > 0 {
		main = append(main, Heading(s.env, "Limits and details (optional)"))
		main = append(main, adv...)
	}
	return main
}

// outcome returns what the screen shows above the inputs (the progress,
// the cancelled note, the Form's failure, or the design's summary, its
// cautions, the device and the button that opens it) and below them (the
// parts, the sensitivity table and the method).
func (s *designScreen) outcome() (top, details []layout.Widget) {
	switch s.state() {
	case designBusy:
		return []layout.Widget{s.progressCard}, nil
	case designCancelled:
		return []layout.Widget{
			Described("design status", Note(s.env, capitalize(errCancelled.Error())+".")),
			func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints.Min.X = 0
				return smallButton(s.env, gtx, &s.again, "Design again")
			},
		}, nil
	case designIdle:
		return []layout.Widget{s.form.Results.Layout}, nil
	}
	if s.fail {
		top = append(top, Para(s.env, "The target is out of reach. Below is the nearest design found, with what it misses by."))
	}
	top = append(top, s.form.PointWidget, s.head.Layout, s.strip.Layout)
	if s.pump {
		top = append(top, Note(s.env, "Build it in the Heat pump editor part by part from the sizes below, driver first."))
	} else {
		top = append(top, func(gtx layout.Context) layout.Dimensions {
			return material.Button(s.env.Theme, &s.open, "Open in Engine onset").Layout(atTarget(gtx))
		})
	}
	top = append(top, s.form.CautionWidget)
	from := "closed end"
	if s.pump {
		from = "driver"
	}
	details = append(details, Heading(s.env, "Parts, from the "+from), s.parts.Layout)
	if len(s.sens) > 0 {
		details = append(details, Heading(s.env, "What moves the onset"),
			Note(s.env, "How the built engine's onset temperature and frequency change for one step of each quantity, the others held as stated."),
			s.sensitivityTable)
	}
	details = append(details, Heading(s.env, "How it was designed"))
	if r := s.form.Result(); r != nil {
		for _, n := range r.Notes {
			details = append(details, Described("Method", Note(s.env, n)))
		}
	}
	return top, append(details, Note(s.env, s.form.Sheet.About))
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
	lines := make([]layout.FlexChild, 0, 1+len(s.sens))
	lines = append(lines, layout.Rigid(func(gtx layout.Context) layout.Dimensions {
		return s.tableRow(gtx, "One step more of", "Onset", "Frequency", true, "", "")
	}))
	for _, l := range s.sens {
		on, fr := signed(l.Onset.Value, 2, "K"), signed(l.Frequency.Value, 3, "Hz")
		lines = append(lines, layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return s.tableRow(gtx, l.Change, on, fr, false, l.Onset.Label, l.Frequency.Label)
		}))
	}
	return background(gtx, c.Surface, c.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
		return layout.Inset{Top: 4, Bottom: 4}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			return layout.Flex{Axis: layout.Vertical}.Layout(gtx, lines...)
		})
	})
}

// tableRow draws one line of the sensitivity table; the values carry the
// row labels as their descriptions (for screen readers and tests).
func (s *designScreen) tableRow(gtx layout.Context, change, onset, freq string, header bool, onsetDesc, freqDesc string) layout.Dimensions {
	th, c := s.env.Theme, s.env.Colors
	cell := func(txt, desc string, width unit.Dp) layout.Widget {
		return func(gtx layout.Context) layout.Dimensions {
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
			return Described(desc, l.Layout)(gtx)
		}
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
			layout.Rigid(cell(onset, onsetDesc, 82)),
			layout.Rigid(cell(freq, freqDesc, 96)),
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
