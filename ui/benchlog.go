package ui

import (
	"fmt"
	"sort"
	"strings"
	"time"

	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/safety"
	"tubewright/ui/store"
)

// benchLogScreen lists the saved safety passes, newest first: those kept
// in the log of the saved work and those of the older bench log file (see
// benchBook), each once. Tapping one shows its text; Export writes that
// text to a .txt file (desktop) or, where there is no file system (the
// browser), leaves it on screen to be selected and copied. A damaged file
// or library is reported, never replaced: the user may set the file aside
// (it is renamed, not deleted); the library is set aside on Saved work.
type benchLogScreen struct {
	env     *Env
	page    *Page
	caution *Caution

	legacy   []store.Pass // the older file's passes, read on Enter
	loadErr  error        // why the older file could not be read
	unread   []error      // safety entries of the log that are not passes
	passes   []store.Pass // both, oldest first
	seen     uint64       // the keeper's library version shown
	loaded   bool
	migrated bool // the older file's passes were queued to be copied
	rows     []widget.Clickable
	open     int // index into passes of the pass shown, -1 for none
	text     widget.Selectable

	export, setAside widget.Clickable
	status           string
	statusBad        bool
	now              func() time.Time

	// Kept between frames (see retain.go): widgets bound once
	// (bindWidgets), texts written when the passes or the pass shown
	// change (merge, passTexts), where the passes are kept, and the slice
	// of children.
	w         benchLogWidgets
	labels    []string // the row label of each pass
	countText string
	shownAt   int // index of the pass whose texts are kept, -1 for none
	shownHead string
	shownText string
	oldThere  bool // the older file exists, as of the last reload
	where     whereKey
	whereText string
	ws        []layout.Widget
}

// benchLogWidgets are the bench-log screen's widgets, bound once.
type benchLogWidgets struct {
	caution, reading, none, count, passHead, passText, export, status, where layout.Widget
	rows                                                                     indexed
}

// newBenchLogScreen builds the bench-log screen.
func newBenchLogScreen(env *Env) Screen {
	return &benchLogScreen{
		env:  env,
		page: NewPage(env),
		caution: NewCaution(env, "A record, not an approval",
			safety.CautionGeneral,
			"A ticked pass records what you checked and when. It does not approve the rig: the applicable code, the inspector and your organisation's safety rules decide."),
		open:    -1,
		shownAt: -1,
		now:     time.Now,
	}
}

// Title implements Screen.
func (s *benchLogScreen) Title() string { return "Bench log" }

// Enter reloads the log (the safety screen may have saved a pass).
func (s *benchLogScreen) Enter() { s.reload() }

// reload reads the older file again, then the log.
func (s *benchLogScreen) reload() {
	s.oldThere = bookFor(s.env).oldThere()
	s.legacy, s.loadErr = bookFor(s.env).Legacy()
	s.loaded, s.migrated = true, false
	s.merge()
}

// merge lists the log's passes and the older file's not yet in the log,
// and queues those to be copied into the log once the library is loaded.
func (s *benchLogScreen) merge() {
	k := bookFor(s.env).keeper()
	s.seen = k.Version()
	kept, unread := bookFor(s.env).Kept()
	s.unread = unread
	extra := missing(s.legacy, kept)
	if len(extra) > 0 && !s.migrated && k.Library() != nil && k.Damaged() == nil {
		k.Do(whatCopyPasses, opCopyPasses(extra))
		s.migrated = true
	}
	shownTime := time.Time{}
	if s.open >= 0 && s.open < len(s.passes) {
		shownTime = s.passes[s.open].Time
	}
	s.passes = append(kept, extra...)
	sort.SliceStable(s.passes, func(i, j int) bool { return s.passes[i].Time.Before(s.passes[j].Time) })
	if len(s.rows) < len(s.passes) {
		s.rows = append(s.rows, make([]widget.Clickable, len(s.passes)-len(s.rows))...)
	}
	s.open = -1
	for i, p := range s.passes {
		if !shownTime.IsZero() && p.Time.Equal(shownTime) {
			s.open = i
		}
	}
	if s.open < 0 && len(s.passes) > 0 {
		s.open = len(s.passes) - 1
	}
	s.labels = s.labels[:0]
	for i := range s.passes {
		s.labels = append(s.labels, s.rowLabel(i))
	}
	s.countText = fmt.Sprintf("%d saved passes", len(s.passes))
	if len(s.passes) == 1 {
		s.countText = "1 saved pass"
	}
	s.shownAt = -1
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
	if !s.loaded {
		s.reload()
	}
	k := bookFor(s.env).keeper()
	if k.Version() != s.seen {
		s.merge()
	}
	s.update(gtx)
	if s.w.caution == nil {
		s.bindWidgets()
	}
	w := &s.w
	s.ws = append(s.ws[:0], w.caution)
	if d := k.Damaged(); d != nil {
		s.ws = append(s.ws, s.errorLine(d.Error()+". Until then no pass can be saved there: open Saved work to export its raw text or set it aside."))
	}
	for _, err := range k.Problems() {
		s.ws = append(s.ws, s.errorLine(err.Error()))
	}
	for _, err := range s.unread {
		s.ws = append(s.ws, s.errorLine(err.Error()))
	}
	// The keeper's last word, when it is a failure to keep a pass (the
	// safety screen queued the save and went on).
	if st := k.Status(); st.Bad && (strings.HasPrefix(st.Text, whatSavePass) || strings.HasPrefix(st.Text, whatCopyPasses)) {
		s.ws = append(s.ws, s.errorLine(st.Text))
	}
	if s.loadErr != nil {
		s.ws = append(s.ws, s.errorLine(s.loadErr.Error()))
		if isDamaged(s.loadErr) {
			s.ws = append(s.ws,
				Para(s.env, "The passes in this older file cannot be shown. Setting it aside renames it (its bytes are kept for you to inspect); passes you save now are kept with your saved work either way."),
				func(gtx layout.Context) layout.Dimensions {
					return safetyButton(s.env, gtx, &s.setAside, "Set the damaged log aside", true)
				})
		}
	}
	switch {
	case len(s.passes) == 0 && !k.Loaded():
		s.ws = append(s.ws, w.reading)
	case len(s.passes) == 0:
		s.ws = append(s.ws, w.none)
	default:
		s.ws = append(s.ws, w.count)
		for i := len(s.passes) - 1; i >= 0; i-- {
			s.ws = append(s.ws, w.rows.at(i))
		}
	}
	if s.open >= 0 && s.open < len(s.passes) {
		s.passTexts()
		s.ws = append(s.ws, w.passHead, w.passText, w.export)
	}
	if s.status != "" {
		s.ws = append(s.ws, w.status)
	}
	if key := bookFor(s.env).whereKeyOf(s.oldThere); s.whereText == "" || key != s.where {
		s.where, s.whereText = key, bookFor(s.env).whereText(key)
	}
	s.ws = append(s.ws, w.where)
	return s.page.Layout(gtx, s.ws...)
}

// passTexts writes the heading and the text of the pass shown when it
// changed.
func (s *benchLogScreen) passTexts() {
	if s.shownAt == s.open {
		return
	}
	p := s.passes[s.open]
	s.shownAt, s.shownHead, s.shownText = s.open, "Pass of "+p.Time.Format("2006-01-02 15:04"), p.Text()
}

// bindWidgets makes the screen's widgets once; they read the screen when
// drawn.
func (s *benchLogScreen) bindWidgets() {
	env := s.env
	s.w = benchLogWidgets{
		caution: s.caution.Layout,
		reading: Para(env, "Reading your saved work…"),
		none:    Para(env, "No safety pass saved yet. Walk the safety pass and save it at the end; it appears here with its date and time."),
		count: func(gtx layout.Context) layout.Dimensions {
			return layoutHeading(gtx, env, s.countText)
		},
		passHead: func(gtx layout.Context) layout.Dimensions {
			return layoutHeading(gtx, env, s.shownHead)
		},
		passText: func(gtx layout.Context) layout.Dimensions {
			return background(gtx, env.Colors.Surface, env.Colors.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints.Min.X = gtx.Constraints.Max.X
				return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					l := material.Body2(env.Theme, s.shownText)
					l.Color = env.Colors.Text
					l.State = &s.text
					return describe(gtx, "Pass text", l.Layout)
				})
			})
		},
		export: func(gtx layout.Context) layout.Dimensions {
			return safetyButton(env, gtx, &s.export, "Export as text", true)
		},
		status: func(gtx layout.Context) layout.Dimensions {
			return layoutStatusLine(gtx, env, "Export status", s.status, s.statusBad)
		},
		where: func(gtx layout.Context) layout.Dimensions { return layoutNote(gtx, env, s.whereText) },
	}
	s.w.rows.draw = s.layoutRow
}

// errorLine draws a problem in the error colour.
func (s *benchLogScreen) errorLine(text string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		l := material.Body1(s.env.Theme, text)
		l.Color = s.env.Colors.Error
		return describe(gtx, "Bench log error", l.Layout)
	}
}

// rowLabel is the list entry's words for pass i.
func (s *benchLogScreen) rowLabel(i int) string {
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
	return label
}

// layoutRow draws the list entry of pass i.
func (s *benchLogScreen) layoutRow(gtx layout.Context, i int) layout.Dimensions {
	return s.rows[i].Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		bg := s.env.Colors.Surface
		if i == s.open {
			bg = s.env.Colors.Selected
		}
		gtx.Constraints.Min.X = gtx.Constraints.Max.X
		return background(gtx, bg, s.env.Colors.Divider, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
			return targetRow(gtx, func(gtx layout.Context) layout.Dimensions {
				return layout.Inset{Left: 14, Right: 14, Top: 10, Bottom: 10}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					l := material.Body1(s.env.Theme, s.labels[i])
					l.Color = s.env.Colors.Text
					return l.Layout(gtx)
				})
			})
		})
	})
}
