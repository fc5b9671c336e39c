package ui

import (
	"fmt"
	"image"
	"slices"
	"strings"
	"time"

	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/safety"
	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// safetyScreen walks the safety pass before pressurising: one checklist
// item at a time with its why, the inline calculator where a number
// decides it, a tick and a note; then a review page that saves the pass in
// the bench log. The general caution is at the top of every step, then the
// step's worst outcome; every calculator carries its own caution box
// beside its numbers. The calculators are the descriptions of calc/sheet
// (vessel, energy, oxygen, spl), one Form each, shared by the steps that
// show parts of them.
type safetyScreen struct {
	env     *Env
	page    *Page // the one column, or the step's inputs when wide
	side    *Page // a step's verdict and numbers when wide
	pass    *safety.Pass
	step    int // 0..len(items)-1, len(items) = review
	ticks   []widget.Bool
	notes   []widget.Editor
	calcs   []inlineCalc // per item, nil where no number decides it
	general *Caution

	prev, next, review widget.Clickable
	jumps              []widget.Clickable
	save, setAside     widget.Clickable
	openLog, restart   widget.Clickable
	undoBtn            widget.Clickable
	undo               *passUndo // what Start a new pass cleared; see restartWithUndo
	rig                widget.Editor

	forms *safetyForms // the calculators the steps show

	status    string // after a save attempt
	statusBad bool
	damaged   bool // the last save met a damaged log
	saved     bool // the current pass was saved
	now       func() time.Time

	// Kept between frames (see retain.go): widgets bound once, each
	// item's widgets, the progress line and the slices of children.
	generalW, progressW, navW layout.Widget
	itemWs                    []*safetyItem
	progressKey               [3]int
	progressText              string
	ws                        []layout.Widget
	// The review page's widgets, made again only when what they show
	// changes (see reviewPage).
	reviewWs  []layout.Widget
	reviewKey safetyReviewKey
	reviewOK  bool
	inReview  bool
	reviewOld bool // the older bench log file exists, as of the last rebuild
	undoWs    []layout.Widget
}

// safetyReviewKey is what the review page shows: each item's tick and
// outcome, the save's message and state, and where passes are kept.
type safetyReviewKey struct {
	done                [64]bool
	out                 [64]sheet.Outcome
	status              string
	bad, damaged, saved bool
	where               whereKey
}

// safetyItem is the widgets of one checklist item, bound once; they read
// the pass when drawn.
type safetyItem struct {
	head, verdict, why, inGrid, outGrid, caution, tick, note layout.Widget
	ws, numbers                                              []layout.Widget
}

// safetyTitle is the screen's title.
const safetyTitle = "Safety pass"

// newSafetyScreen builds the safety pass.
func newSafetyScreen(env *Env) Screen {
	p := safety.NewPass()
	n := len(p.Items)
	s := &safetyScreen{
		env:     env,
		page:    NewPage(env),
		side:    NewPage(env),
		pass:    p,
		ticks:   make([]widget.Bool, n),
		notes:   make([]widget.Editor, n),
		calcs:   make([]inlineCalc, n),
		jumps:   make([]widget.Clickable, n),
		general: NewCaution(env, "Before you pressurise", safety.CautionGeneral),
		now:     time.Now,
	}
	s.rig.SingleLine = true
	s.forms = newSafetyForms(env)
	for i, it := range p.Items {
		switch it.Calc {
		case safety.CalcWallStress:
			s.calcs[i] = newWallStep(env, s.forms, it)
		case safety.CalcRelief:
			s.calcs[i] = newReliefStep(env, s.forms, it)
		case safety.CalcTestEnergy:
			s.calcs[i] = newTestStep(env, s.forms, it)
		case safety.CalcCylinder:
			s.calcs[i] = newCylinderStep(env, s.forms, it)
		case safety.CalcOxygen:
			s.calcs[i] = newOxygenStep(env, s.forms, it)
		case safety.CalcSound:
			s.calcs[i] = newHearingStep(env, s.forms, it)
		}
	}
	return s
}

// Title implements Screen.
func (s *safetyScreen) Title() string { return safetyTitle }

// items returns the number of checklist items.
func (s *safetyScreen) items() int { return len(s.pass.Items) }

// goTo shows step i. The steps that share a calculator share its inputs
// (the vessel's MAWP typed on the relief step is the test step's), and the
// test step's charge pressure follows the vessel's MAWP until typed.
func (s *safetyScreen) goTo(i int) {
	s.step = max(0, min(i, s.items()))
	s.env.Invalidate()
}

// outcomeOf returns the worst outcome of item i's checks as they stand
// now, None for an item without a calculator or never shown.
func (s *safetyScreen) outcomeOf(i int) sheet.Outcome {
	st, ok := s.calcs[i].(*sheetStep)
	if !ok || !st.shownOnce() {
		return sheet.None
	}
	st.settle()
	w, _, _ := st.banner()
	return w
}

// failing lists the numbers of the items whose checks fail.
func (s *safetyScreen) failing() []string {
	var out []string
	for i := range s.calcs {
		if s.outcomeOf(i) == sheet.Fail {
			out = append(out, fmt.Sprintf("item %d", i+1))
		}
	}
	return out
}

// stepShowing returns the first step that shows input key of form f, or
// -1.
func (s *safetyScreen) stepShowing(f *Form, key string) int {
	for i, c := range s.calcs {
		st, ok := c.(*sheetStep)
		if !ok {
			continue
		}
		for _, p := range st.parts {
			if p.form == f && slices.Contains(p.keys, key) {
				return i
			}
		}
	}
	return -1
}

// update handles the controls of the step on show.
func (s *safetyScreen) update(gtx layout.Context) {
	for i := range s.ticks {
		if s.ticks[i].Update(gtx) {
			s.pass.Done[i] = s.ticks[i].Value
			s.saved = false
			s.undo = nil
		}
	}
	for i := range s.notes {
		for {
			ev, ok := s.notes[i].Update(gtx)
			if !ok {
				break
			}
			// Text set by code (a new pass, Undo) is not a change.
			if _, ok := ev.(widget.ChangeEvent); ok && s.notes[i].Text() != s.pass.Notes[i] {
				s.pass.Notes[i] = s.notes[i].Text()
				s.saved = false
				s.undo = nil
			}
		}
	}
	if s.step < s.items() {
		if c := s.calcs[s.step]; c != nil {
			c.Update(gtx)
		}
	}
	if s.prev.Clicked(gtx) {
		s.goTo(s.step - 1)
	}
	if s.next.Clicked(gtx) {
		s.goTo(s.step + 1)
	}
	if s.review.Clicked(gtx) {
		s.goTo(s.items())
	}
	for i := range s.jumps {
		if s.jumps[i].Clicked(gtx) {
			s.goTo(i)
		}
	}
	if s.save.Clicked(gtx) {
		s.saveTo(false)
	}
	if s.setAside.Clicked(gtx) {
		s.saveTo(true)
	}
	if s.openLog.Clicked(gtx) {
		s.env.Open(sheet.IDBenchLog)
	}
	if s.restart.Clicked(gtx) {
		s.restartWithUndo()
	}
	if s.undoBtn.Clicked(gtx) {
		s.undoRestart()
	}
}

// reset starts a new pass: ticks and notes cleared, calculators kept.
func (s *safetyScreen) reset() {
	s.pass.Reset()
	for i := range s.ticks {
		s.ticks[i].Value = false
		s.notes[i].SetText("")
	}
	s.status, s.statusBad, s.damaged, s.saved = "", false, false, false
	s.goTo(0)
}

// buildPass turns the current state into a bench-log pass.
func (s *safetyScreen) buildPass() store.Pass {
	p := store.Pass{
		Time:  s.now(),
		Title: "Safety pass before pressurising",
		Rig:   strings.TrimSpace(s.rig.Text()),
	}
	seen := map[string]bool{safety.CautionGeneral: true}
	p.Cautions = []string{safety.CautionGeneral}
	addCaution := func(c string) {
		if !seen[c] {
			seen[c] = true
			p.Cautions = append(p.Cautions, c)
		}
	}
	for i, it := range s.pass.Items {
		item := store.Item{ID: it.ID, Title: it.Title, Done: s.pass.Done[i], Note: strings.TrimSpace(s.pass.Notes[i])}
		if c := s.calcs[i]; c != nil {
			if st, ok := c.(*sheetStep); ok {
				st.settle()
			}
			item.Inputs = c.Typed()
			item.Verdicts = c.Checks()
			if nums := c.Numbers(); len(nums) > 0 {
				item.Numbers = nums
				item.Cautions = c.Cautions()
				// The gas's cautions (hydrogen, carbon dioxide) belong
				// to the whole pass, not only to the item's numbers.
				for _, l := range item.Cautions {
					addCaution(l)
				}
			}
		}
		for _, c := range it.Cautions {
			addCaution(c)
		}
		p.Items = append(p.Items, item)
	}
	return p
}

// saveTo saves the pass in the bench log (the log of the saved work, see
// benchBook.Save). With aside, an unreadable library is first set aside
// (kept under a dated name; the user chose that).
func (s *safetyScreen) saveTo(aside bool) {
	p := s.buildPass()
	where, err := bookFor(s.env).Save(p, aside)
	if err != nil {
		s.damaged = isDamaged(err)
		s.status, s.statusBad = "Not saved: "+err.Error(), true
		if s.damaged {
			s.status += ". You can keep the damaged log aside (kept under a dated name, not deleted) and save into a new one."
		}
		return
	}
	s.damaged, s.statusBad, s.saved = false, false, true
	s.status = fmt.Sprintf("Saved %s with %d of %d items ticked. %s", p.Time.Format("2006-01-02 15:04"), s.pass.Ticked(), s.items(), where)
}

// Layout implements Screen.
func (s *safetyScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	if s.generalW == nil {
		s.generalW, s.progressW, s.navW = s.general.Layout, s.progress, s.navigation
	}
	s.ws = append(s.ws[:0], s.generalW, s.progressW)
	s.ws = append(s.ws, s.undoWidgets()...)
	if s.step >= s.items() {
		s.ws = append(s.ws, s.reviewPage()...)
		s.ws = append(s.ws, s.navW)
		return s.page.Layout(gtx, s.ws...)
	}
	s.inReview = false
	// On wide windows a step's numbers, its verdict on top, sit beside
	// its inputs.
	wide := splitWide(gtx)
	item, numbers := s.itemWidgets(s.step, wide)
	s.ws = append(append(s.ws, item...), s.navW)
	if len(numbers) == 0 {
		return s.page.Layout(gtx, s.ws...)
	}
	return splitLayout(gtx, s.page, s.side, nil, s.ws, numbers)
}

// reviewPage returns the review page's widgets, made again by reviewWidgets
// only when the ticks, the outcomes, the save's message or where passes
// are kept changed.
func (s *safetyScreen) reviewPage() []layout.Widget {
	if !s.inReview {
		s.inReview, s.reviewOK = true, false
	}
	var key safetyReviewKey
	ok := s.items() <= len(key.done)
	if ok {
		for i := range s.items() {
			key.done[i], key.out[i] = s.pass.Done[i], s.outcomeOf(i)
		}
		key.status, key.bad, key.damaged, key.saved = s.status, s.statusBad, s.damaged, s.saved
	}
	if ok && s.reviewOK {
		key.where = bookFor(s.env).whereKeyOf(s.reviewOld)
		if key == s.reviewKey {
			return s.reviewWs
		}
	}
	s.reviewOld = bookFor(s.env).oldThere()
	key.where = bookFor(s.env).whereKeyOf(s.reviewOld)
	s.reviewOK, s.reviewKey = ok, key
	s.reviewWs = s.reviewWidgets()
	return s.reviewWs
}

// progress is the "Item 3 of 11 · 2 ticked" line, written again only when
// the step or the ticks change.
func (s *safetyScreen) progress(gtx layout.Context) layout.Dimensions {
	key := [3]int{s.step + 1, s.items(), s.pass.Ticked()}
	if s.progressText == "" || key != s.progressKey {
		s.progressKey = key
		s.progressText = fmt.Sprintf("Item %d of %d · %d ticked", s.step+1, s.items(), s.pass.Ticked())
		if s.step >= s.items() {
			s.progressText = fmt.Sprintf("Review · %d of %d ticked", s.pass.Ticked(), s.items())
		}
	}
	return layoutNote(gtx, s.env, s.progressText)
}

// itemWidgets draws checklist item i. With wide set, the verdict, the
// numbers and their caution box are returned apart (numbers), for a
// column of their own beside the inputs; otherwise numbers is empty. The
// slices are the item's own, valid until the next call.
func (s *safetyScreen) itemWidgets(i int, wide bool) (ws, numbers []layout.Widget) {
	for len(s.itemWs) < len(s.pass.Items) {
		s.itemWs = append(s.itemWs, nil)
	}
	w := s.itemWs[i]
	if w == nil {
		w = s.bindItem(i)
		s.itemWs[i] = w
	}
	w.ws, w.numbers = append(w.ws[:0], w.head), w.numbers[:0]
	c := s.calcs[i]
	if c != nil && !wide {
		// The step's worst outcome first, where it cannot be missed.
		w.ws = append(w.ws, w.verdict)
	}
	w.ws = append(w.ws, w.why)
	if c != nil {
		w.ws = append(w.ws, w.inGrid)
		// The numbers and their caution box side by side where the width
		// allows, so that the box is in view with the numbers.
		if wide {
			w.numbers = append(append(w.numbers, w.verdict), c.Outputs()...)
		} else {
			w.ws = append(w.ws, w.outGrid)
		}
	} else if w.caution != nil {
		w.ws = append(w.ws, w.caution)
	}
	w.ws = append(w.ws, w.tick, w.note)
	return w.ws, w.numbers
}

// bindItem makes the widgets of checklist item i.
func (s *safetyScreen) bindItem(i int) *safetyItem {
	it := s.pass.Items[i]
	w := &safetyItem{
		head: Heading(s.env, it.Title),
		why:  Para(s.env, it.Why),
		note: s.noteEditor(i),
	}
	done := "Done: " + it.Title
	w.tick = func(gtx layout.Context) layout.Dimensions { return tick(s.env, gtx, &s.ticks[i], done) }
	if c := s.calcs[i]; c != nil {
		w.verdict = c.Verdict()
		w.inGrid = func(gtx layout.Context) layout.Dimensions { return grid(gtx, c.Inputs()) }
		w.outGrid = func(gtx layout.Context) layout.Dimensions { return grid(gtx, c.Outputs()) }
	} else if len(it.Cautions) > 0 {
		w.caution = NewCaution(s.env, "", it.Cautions...).Layout
	}
	return w
}

// noteEditor draws the optional note of item i.
func (s *safetyScreen) noteEditor(i int) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		return s.textBox(gtx, &s.notes[i], "Note (optional)", "e.g. relief valve tag, test date, who checked")
	}
}

// textBox draws a labelled free-text editor.
func (s *safetyScreen) textBox(gtx layout.Context, ed *widget.Editor, label, hint string) layout.Dimensions {
	th, c := s.env.Theme, s.env.Colors
	gtx.Constraints.Max.X = min(gtx.Constraints.Max.X, gtx.Dp(fieldWidth))
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			l := material.Body2(th, label)
			l.Font.Weight = 600
			l.Color = c.Text
			return l.Layout(gtx)
		}),
		layout.Rigid(layout.Spacer{Height: 4}.Layout),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			edge := c.Outline
			if gtx.Focused(ed) {
				edge = c.Accent
			}
			return editorBox(s.env, gtx, ed, label, func(gtx layout.Context) layout.Dimensions {
				return background(gtx, c.Surface, edge, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
					// An inset keeps the minimum it is given: the text's
					// minimum is what the padding leaves of minTarget.
					gtx.Constraints.Min.Y = max(0, gtx.Dp(minTarget)-2*gtx.Dp(12))
					return layout.UniformInset(12).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
						e := material.Editor(th, ed, hint)
						e.Color, e.HintColor = c.Text, c.Muted
						return e.Layout(gtx)
					})
				})
			})
		}),
	)
}

// reviewWidgets draws the review page: every item with its tick, the rig
// name, the save button and the result of the last save.
func (s *safetyScreen) reviewWidgets() []layout.Widget {
	ws := []layout.Widget{Heading(s.env, "Review and save")}
	if open := s.items() - s.pass.Ticked(); open > 0 {
		what := fmt.Sprintf("%d items are", open)
		if open == 1 {
			what = "1 item is"
		}
		ws = append(ws, Para(s.env, what+" not ticked (tap one to go back to it). The pass is saved as it is, with the open items marked; do not pressurise until they are done."))
	} else {
		ws = append(ws, Para(s.env, "Every item is ticked. Save the pass to keep a dated record in the bench log."))
	}
	if failing := s.failing(); len(failing) > 0 {
		what, it := fmt.Sprintf("%d items have", len(failing)), "them"
		if len(failing) == 1 {
			what, it = "1 item has", "it"
		}
		ws = append(ws, statusLine(s.env, "Failing checks", what+" a failing check ("+strings.Join(failing, ", ")+"): put "+it+" right before pressurising, whatever the ticks say.", true))
	}
	ws = append(ws, func(gtx layout.Context) layout.Dimensions {
		return s.textBox(gtx, &s.rig, "Rig name (optional)", "e.g. helium engine, bench 2")
	})
	ws = append(ws, func(gtx layout.Context) layout.Dimensions {
		return s.button(gtx, &s.save, "Save to the bench log", true)
	})
	if s.status != "" {
		ws = append(ws, statusLine(s.env, "Save status", s.status, s.statusBad))
	}
	if s.damaged {
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			return s.button(gtx, &s.setAside, "Keep the damaged log aside and save", false)
		})
	}
	if s.saved {
		ws = append(ws,
			func(gtx layout.Context) layout.Dimensions {
				return s.button(gtx, &s.openLog, "Open the bench log", false)
			},
			func(gtx layout.Context) layout.Dimensions {
				return s.button(gtx, &s.restart, "Start a new pass", false)
			},
		)
	}
	for i, it := range s.pass.Items {
		state := "open"
		if s.pass.Done[i] {
			state = "done"
		}
		o := s.outcomeOf(i)
		if word, _ := outcomeLook(s.env.Colors, o); word != "" {
			state += ", checks " + word
		}
		label := fmt.Sprintf("%d. %s · %s", i+1, it.Title, state)
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			return s.jumps[i].Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints.Min.X = gtx.Constraints.Max.X
				return targetRow(gtx, func(gtx layout.Context) layout.Dimensions {
					l := material.Body1(s.env.Theme, label)
					l.Color = s.env.Colors.Text
					if !s.pass.Done[i] || o == sheet.Fail {
						l.Color = s.env.Colors.Error
					}
					return l.Layout(gtx)
				})
			})
		})
	}
	ws = append(ws, Note(s.env, bookFor(s.env).whereText(bookFor(s.env).whereKeyOf(s.reviewOld))))
	return ws
}

// navigation is the Previous / Next (or Review) row.
func (s *safetyScreen) navigation(gtx layout.Context) layout.Dimensions {
	// The children sit in an array on the stack, so that their widgets
	// are not made on the heap each frame.
	var children [5]layout.FlexChild
	n := 0
	if s.step > 0 {
		children[n] = layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return s.button(gtx, &s.prev, "‹ Previous", false)
		})
		children[n+1] = layout.Rigid(layout.Spacer{Width: 12}.Layout)
		n += 2
	}
	switch {
	case s.step < s.items()-1:
		children[n] = layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return s.button(gtx, &s.next, "Next ›", true)
		})
		children[n+1] = layout.Rigid(layout.Spacer{Width: 12}.Layout)
		children[n+2] = layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return s.button(gtx, &s.review, "Review", false)
		})
		n += 3
	case s.step == s.items()-1:
		children[n] = layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return s.button(gtx, &s.next, "Review and save ›", true)
		})
		n++
	}
	return layout.Flex{Alignment: layout.Middle}.Layout(gtx, children[:n]...)
}

// button draws a filled (primary) or outlined button.
func (s *safetyScreen) button(gtx layout.Context, c *widget.Clickable, label string, primary bool) layout.Dimensions {
	return safetyButton(s.env, gtx, c, label, primary)
}

// safetyButton draws a filled (primary) or outlined button of the safety
// screens.
func safetyButton(env *Env, gtx layout.Context, c *widget.Clickable, label string, primary bool) layout.Dimensions {
	return button(env, gtx, c, label, primary)
}

// gridMinCell is the narrowest column of the inputs grid.
const gridMinCell = unit.Dp(300)

// grid lays out ws in two columns when the width allows two cells of at
// least gridMinCell, else in one; rows are as tall as their tallest cell,
// and a last widget alone on its row has the whole width.
func grid(gtx layout.Context, ws []layout.Widget) layout.Dimensions {
	gap := gtx.Dp(16)
	cols := 1
	if gtx.Constraints.Max.X >= 2*gtx.Dp(gridMinCell)+gap {
		cols = 2
	}
	cellW := (gtx.Constraints.Max.X - (cols-1)*gap) / cols
	y := 0
	for row := 0; row*cols < len(ws); row++ {
		h := 0
		for col := 0; col < cols; col++ {
			i := row*cols + col
			if i >= len(ws) {
				break
			}
			w := cellW
			if col == 0 && i == len(ws)-1 {
				// Alone on the last row: the whole width, so that a row
				// of chips need not wrap in half of it.
				w = gtx.Constraints.Max.X
			}
			cgtx := gtx
			cgtx.Constraints = layout.Constraints{Max: image.Pt(w, gtx.Constraints.Max.Y)}
			m := op.Record(gtx.Ops)
			d := ws[i](cgtx)
			call := m.Stop()
			st := op.Offset(image.Pt(col*(cellW+gap), y)).Push(gtx.Ops)
			call.Add(gtx.Ops)
			st.Pop()
			h = max(h, d.Size.Y)
		}
		y += h
		if (row+1)*cols < len(ws) {
			y += gtx.Dp(12)
		}
	}
	return layout.Dimensions{Size: image.Pt(gtx.Constraints.Max.X, y)}
}
