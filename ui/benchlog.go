package ui

import (
	"fmt"
	"time"

	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/safety"
	"tubewright/ui/store"
)

// benchLogScreen lists the saved safety passes, newest first. Tapping one
// shows its text; Export writes that text to a .txt file next to the log
// (desktop) or, where there is no file system (the browser), leaves it on
// screen to be selected and copied. A damaged log file is reported, never
// replaced: the user may set it aside (it is renamed, not deleted).
type benchLogScreen struct {
	env     *Env
	page    *Page
	caution *Caution

	passes  []store.Pass
	loadErr error
	rows    []widget.Clickable
	open    int // index into passes of the pass shown, -1 for none
	text    widget.Selectable

	export, setAside widget.Clickable
	status           string
	statusBad        bool
	now              func() time.Time
}

// newBenchLogScreen builds the bench-log screen.
func newBenchLogScreen(env *Env) Screen {
	return &benchLogScreen{
		env:  env,
		page: NewPage(env),
		caution: NewCaution(env, "A record, not an approval",
			safety.CautionGeneral,
			"A ticked pass records what you checked and when. It does not approve the rig: the applicable code, the inspector and your organisation's safety rules decide."),
		open: -1,
		now:  time.Now,
	}
}

// Title implements Screen.
func (s *benchLogScreen) Title() string { return "Bench log" }

// Enter reloads the log (the safety screen may have saved a pass).
func (s *benchLogScreen) Enter() { s.reload() }

func (s *benchLogScreen) reload() {
	s.passes, s.loadErr = bookFor(s.env).Load()
	if len(s.rows) < len(s.passes) {
		s.rows = make([]widget.Clickable, len(s.passes))
	}
	if s.open >= len(s.passes) {
		s.open = -1
	}
	if s.open < 0 && len(s.passes) > 0 {
		s.open = len(s.passes) - 1
	}
}

func (s *benchLogScreen) update(gtx layout.Context) {
	for i := range s.passes {
		if s.rows[i].Clicked(gtx) {
			s.open = i
			s.status = ""
		}
	}
	if s.export.Clicked(gtx) && s.open >= 0 {
		p := s.passes[s.open]
		path, err := bookFor(s.env).Export(p)
		switch {
		case err != nil:
			s.status, s.statusBad = "Export failed: "+err.Error(), true
		case path == "":
			s.status, s.statusBad = "No file system here: select the text above and copy it.", false
		default:
			s.status, s.statusBad = "Written to "+path, false
		}
	}
	if s.setAside.Clicked(gtx) {
		msg, err := bookFor(s.env).SetAside(s.now())
		if err != nil {
			s.status, s.statusBad = err.Error(), true
		} else {
			s.status, s.statusBad = msg, false
		}
		s.reload()
	}
}

// Layout implements Screen.
func (s *benchLogScreen) Layout(gtx layout.Context) layout.Dimensions {
	if s.passes == nil && s.loadErr == nil {
		s.reload()
	}
	s.update(gtx)
	ws := []layout.Widget{s.caution.Layout}
	switch {
	case s.loadErr != nil:
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			l := material.Body1(s.env.Theme, s.loadErr.Error())
			l.Color = s.env.Colors.Error
			return Described("Bench log error", l.Layout)(gtx)
		})
		if isDamaged(s.loadErr) {
			ws = append(ws,
				Para(s.env, "New passes cannot be saved into this file. Setting it aside renames it (its bytes are kept for you to inspect) and starts a new log."),
				func(gtx layout.Context) layout.Dimensions {
					return safetyButton(s.env, gtx, &s.setAside, "Set the damaged log aside", true)
				})
		}
	case len(s.passes) == 0:
		ws = append(ws, Para(s.env, "No safety pass saved yet. Walk the safety pass and save it at the end; it appears here with its date and time."))
	default:
		n := fmt.Sprintf("%d saved passes", len(s.passes))
		if len(s.passes) == 1 {
			n = "1 saved pass"
		}
		ws = append(ws, Heading(s.env, n))
		for i := len(s.passes) - 1; i >= 0; i-- {
			ws = append(ws, s.row(i))
		}
	}
	if s.open >= 0 && s.open < len(s.passes) {
		p := s.passes[s.open]
		ws = append(ws,
			Heading(s.env, "Pass of "+p.Time.Format("2006-01-02 15:04")),
			func(gtx layout.Context) layout.Dimensions {
				return background(gtx, s.env.Colors.Surface, s.env.Colors.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
					gtx.Constraints.Min.X = gtx.Constraints.Max.X
					return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						l := material.Body2(s.env.Theme, p.Text())
						l.Color = s.env.Colors.Text
						l.State = &s.text
						return Described("Pass text", l.Layout)(gtx)
					})
				})
			},
			func(gtx layout.Context) layout.Dimensions {
				return safetyButton(s.env, gtx, &s.export, "Export as text", true)
			})
	}
	if s.status != "" {
		ws = append(ws, statusLine(s.env, "Export status", s.status, s.statusBad))
	}
	ws = append(ws, Note(s.env, bookFor(s.env).Where()))
	return s.page.Layout(gtx, ws...)
}

// row draws the list entry of pass i.
func (s *benchLogScreen) row(i int) layout.Widget {
	p := s.passes[i]
	done := 0
	for _, it := range p.Items {
		if it.Done {
			done++
		}
	}
	label := fmt.Sprintf("%s · %d of %d ticked", p.Time.Format("2006-01-02 15:04"), done, len(p.Items))
	if p.Rig != "" {
		label += " · " + p.Rig
	}
	return func(gtx layout.Context) layout.Dimensions {
		return s.rows[i].Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			bg := s.env.Colors.Surface
			if i == s.open {
				bg = s.env.Colors.Selected
			}
			gtx.Constraints.Min.X = gtx.Constraints.Max.X
			return background(gtx, bg, s.env.Colors.Divider, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
				return layout.Inset{Left: 14, Right: 14, Top: 10, Bottom: 10}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					l := material.Body1(s.env.Theme, label)
					l.Color = s.env.Colors.Text
					return l.Layout(gtx)
				})
			})
		})
	}
}
