package ui

import (
	"image"
	"io"
	"sort"
	"strings"
	"time"

	"gioui.org/io/clipboard"
	"gioui.org/io/semantic"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// keepBar is the strip at the foot of every calculator screen: Setups
// (the calculator's named setups: save as, open, rename, duplicate,
// delete with undo), Log result (one tap logs the inputs, rows, verdicts
// and cautions; a note may follow) and Copy result (plain text to the
// clipboard). One per calculator, kept by the Env.
type keepBar struct {
	env *Env
	id  sheet.ID

	setups, log, copy widget.Clickable
	panel             bool // the setups panel shows instead of the screen
	page              *Page

	name                             widget.Editor
	saveAs, openIt, rename, dup, del widget.Clickable
	action, all                      widget.Clickable
	rows                             []widget.Clickable
	listed                           []string // the setup names of the rows, as last laid out
	selected                         string
	note                             widget.Editor
	keepNote, dropNote               widget.Clickable
	logged                           time.Time // the entry a note may be added to
	local                            string    // the bar's own message (Copy, a missing name)
	localBad                         bool
	since                            uint64 // keeper statuses up to this one are not the bar's
	status                           keepStatus
	statusLive                       bool
	noteShown                        bool
	lastCopied                       string // the text last put on the clipboard

	// The setups panel's widgets, made again only when the library, its
	// loading or the selection changes (see layoutPanel).
	panelWs  []layout.Widget
	panelKey keepPanelKey
	panelOK  bool
}

// keepPanelKey is what the setups panel is made from.
type keepPanelKey struct {
	version  uint64
	lib      *store.Library
	loaded   bool
	selected string
}

// bar returns the bar of calculator id.
func (ks *keepSide) bar(env *Env, id sheet.ID) *keepBar {
	b := ks.bars[id]
	if b == nil {
		b = &keepBar{env: env, id: id, page: NewPage(env), since: ks.keeper.Status().Seq}
		b.name.SingleLine, b.name.Submit = true, true
		b.note.SingleLine, b.note.Submit = true, true
		ks.bars[id] = b
	}
	return b
}

// layoutScreen draws the screen s on top; a calculator's screen gets the
// keep bar at its foot (and the setups panel in its place while open).
func (a *App) layoutScreen(gtx layout.Context, s Screen) layout.Dimensions {
	ks := keepFor(a.env)
	f := ks.forms[a.Current()]
	if f == nil {
		return s.Layout(gtx)
	}
	b := ks.bar(a.env, a.Current())
	b.update(gtx, f)
	gtx.Constraints.Min = gtx.Constraints.Max
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min = gtx.Constraints.Max
			if b.panel {
				return b.layoutPanel(gtx, f)
			}
			return s.Layout(gtx)
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions { return b.layoutStrip(gtx, f) }),
	)
}

func (b *keepBar) keeper() *Keeper { return keepFor(b.env).keeper }

// do queues a change and shows its outcome when it arrives.
func (b *keepBar) do(what string, run func(s *store.Shelf) (keepStatus, error)) {
	b.local = ""
	b.since = b.keeper().Status().Seq
	b.keeper().Do(what, run)
}

func (b *keepBar) say(text string, bad bool) {
	b.local, b.localBad = text, bad
	b.since = b.keeper().Status().Seq
}

// update handles the bar's and the panel's taps.
func (b *keepBar) update(gtx layout.Context, f *Form) {
	k := b.keeper()
	if st := k.Status(); st.Seq > b.since {
		// A device editor's changes answer in that editor (see
		// statusClaims): the bar does not say them again.
		b.status, b.statusLive = st, claimedBy(k, st.Seq) == nil
		b.since = st.Seq
		b.local = ""
	}
	if b.setups.Clicked(gtx) {
		b.panel = !b.panel
		b.local = ""
	}
	if b.log.Clicked(gtx) {
		b.logResult(f)
	}
	if b.copy.Clicked(gtx) {
		if res := f.Result(); res == nil {
			b.say("There is no result to copy: fix the inputs marked first.", true)
		} else {
			e := store.EntryOf(f.Sheet, f.Texts(), res, "")
			e.Time = time.Now()
			b.lastCopied = entryText(e)
			gtx.Execute(clipboard.WriteCmd{Type: "application/text", Data: io.NopCloser(strings.NewReader(b.lastCopied))})
			b.say("The result is on the clipboard as plain text.", false)
		}
	}
	if b.keepNote.Clicked(gtx) || submitted(gtx, &b.note) {
		if !b.logged.IsZero() {
			b.do("Keeping the note", opNote(string(f.Sheet.ID), b.logged, strings.TrimSpace(b.note.Text())))
			b.noteShown = false
		}
	}
	if b.dropNote.Clicked(gtx) {
		b.noteShown = false
	}
	if b.action.Clicked(gtx) && b.statusLive && b.status.Then != nil {
		b.do(b.status.Action, b.status.Then)
		b.statusLive = false
	}
	if b.all.Clicked(gtx) {
		b.panel = false
		b.env.Open(sheet.IDSaved)
	}
	if !b.panel {
		return
	}
	for i := range b.listed {
		if i < len(b.rows) && b.rows[i].Clicked(gtx) {
			b.selected = b.listed[i]
			b.name.SetText(b.selected)
		}
	}
	name := strings.TrimSpace(b.name.Text())
	if b.saveAs.Clicked(gtx) || submitted(gtx, &b.name) {
		if name == "" {
			b.say("Type a name for these inputs first.", true)
		} else {
			st := store.Setup{Name: name, Calculator: string(f.Sheet.ID), Inputs: f.Texts(), Saved: time.Now()}
			b.do("Saving the setup", opSaveSetup(st))
			b.selected = name
		}
	}
	if b.selected == "" {
		return
	}
	lib := k.Library()
	var sel store.Setup
	ok := false
	if lib != nil {
		sel, ok = lib.Setup(b.selected)
	}
	switch {
	case b.openIt.Clicked(gtx) && ok:
		applyTexts(f, sel.Inputs)
		f.Invalidate()
		b.panel = false
		msg := "Opened “" + sel.Name + "”."
		if d, has := sel.Inputs[keyDevice]; has && d != f.Text(keyDevice) {
			msg += " Its device is kept with it but not put into the editor: the editor keeps the device it shows."
		}
		b.say(msg, false)
	case b.rename.Clicked(gtx) && ok:
		if name == "" || name == b.selected {
			b.say("Type the new name in the Name field, then tap Rename.", true)
		} else {
			b.do("Renaming", opRenameSetup(b.selected, name))
			b.selected = name
		}
	case b.dup.Clicked(gtx) && ok:
		b.do("Copying", opDuplicateSetup(b.selected))
	case b.del.Clicked(gtx) && ok:
		b.do("Deleting", opDeleteSetup(b.selected))
		b.selected = ""
		b.name.SetText("")
	}
}

// logResult logs the Form's result now; a note may follow.
func (b *keepBar) logResult(f *Form) {
	res := f.Result()
	if res == nil {
		b.say("There is no result to log: fix the inputs marked first.", true)
		return
	}
	e := store.EntryOf(f.Sheet, f.Texts(), res, "")
	e.Time = time.Now()
	b.logged = e.Time
	b.note.SetText("")
	b.noteShown = true
	b.do("Logging the result", opLog(e))
}

// submitted reports whether Enter was pressed in ed.
func submitted(gtx layout.Context, ed *widget.Editor) bool {
	for {
		ev, ok := ed.Update(gtx)
		if !ok {
			return false
		}
		if _, ok := ev.(widget.SubmitEvent); ok {
			return true
		}
	}
}

// layoutStrip draws the bar: a hairline, the last message, the note row
// after a log, and the three buttons, which stay at the very foot so a
// thumb finds them in the same place whatever is shown above.
func (b *keepBar) layoutStrip(gtx layout.Context, f *Form) layout.Dimensions {
	c := b.env.Colors
	m := op.Record(gtx.Ops)
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	dims := layout.Inset{Left: 8, Right: 8, Top: 6, Bottom: 6}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		buttons := layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			label := "Setups"
			if b.panel {
				label = "Close setups"
			}
			return layout.Flex{}.Layout(gtx,
				layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					return keepButton(b.env, gtx, &b.setups, label, b.panel)
				}),
				layout.Rigid(layout.Spacer{Width: 8}.Layout),
				layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					return keepButton(b.env, gtx, &b.log, "Log result", true)
				}),
				layout.Rigid(layout.Spacer{Width: 8}.Layout),
				layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					return keepButton(b.env, gtx, &b.copy, "Copy result", false)
				}),
			)
		})
		// The rows sit in an array on the stack, not a slice that grows,
		// so that their widgets are not made on the heap each frame.
		var rows [3]layout.FlexChild
		n := 0
		if !b.panel {
			rows[n] = layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				if dims := b.layoutStatus(gtx); dims.Size.Y > 0 {
					return layout.Dimensions{Size: dims.Size.Add(image.Pt(0, gtx.Dp(6)))}
				}
				return layout.Dimensions{}
			})
			n++
		}
		if b.noteShown {
			rows[n] = layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				return layout.Inset{Bottom: 6}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
						layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
							return keepEditor(b.env, gtx, &b.note, "Note for this result (optional)", "Log note")
						}),
						layout.Rigid(layout.Spacer{Width: 8}.Layout),
						layout.Rigid(func(gtx layout.Context) layout.Dimensions {
							return keepButton(b.env, gtx, &b.keepNote, "Keep note", true)
						}),
						layout.Rigid(layout.Spacer{Width: 8}.Layout),
						layout.Rigid(func(gtx layout.Context) layout.Dimensions {
							return keepButton(b.env, gtx, &b.dropNote, "No note", false)
						}),
					)
				})
			})
			n++
		}
		rows[n] = buttons
		n++
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx, rows[:n]...)
	})
	call := m.Stop()
	fill(gtx, c.Surface, dims.Size)
	fill(gtx, c.Divider, image.Pt(dims.Size.X, gtx.Dp(1)))
	call.Add(gtx.Ops)
	return dims
}

// layoutStatus draws the bar's message or the keeper's last status, with
// its follow-up button (Undo, Replace it).
func (b *keepBar) layoutStatus(gtx layout.Context) layout.Dimensions {
	text, bad := b.local, b.localBad
	action := ""
	if text == "" && b.statusLive {
		text, bad = b.status.Text, b.status.Bad
		if b.status.Then != nil {
			action = b.status.Action
		}
	}
	if text == "" {
		return layout.Dimensions{}
	}
	return layout.Inset{}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
			layout.Flexed(1, keepMessage(b.env, "Saved work status", text, bad)),
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				if action == "" {
					return layout.Dimensions{}
				}
				return layout.Inset{Left: 8}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
					return keepButton(b.env, gtx, &b.action, action, true)
				})
			}),
		)
	})
}

// setupsOf returns the setups of calculator id, newest first.
func setupsOf(lib *store.Library, id sheet.ID) []store.Setup {
	if lib == nil {
		return nil
	}
	var out []store.Setup
	for _, s := range lib.Setups {
		if s.Calculator == string(id) {
			out = append(out, s)
		}
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].Saved.After(out[j].Saved) })
	return out
}

// layoutPanel draws the calculator's setups in place of its screen.
func (b *keepBar) layoutPanel(gtx layout.Context, f *Form) layout.Dimensions {
	k := b.keeper()
	key := keepPanelKey{version: k.Version(), lib: k.Library(), loaded: k.Loaded(), selected: b.selected}
	if !b.panelOK || key != b.panelKey {
		b.panelOK, b.panelKey = true, key
		b.panelWs = b.panelWidgets(f, key.lib)
	}
	return b.page.Layout(gtx, b.panelWs...)
}

// panelWidgets makes the setups panel's widgets from library lib.
func (b *keepBar) panelWidgets(f *Form, lib *store.Library) []layout.Widget {
	env := b.env
	k := b.keeper()
	list := setupsOf(lib, b.id)
	b.listed = b.listed[:0]
	for _, s := range list {
		b.listed = append(b.listed, s.Name)
	}
	if len(b.rows) < len(list) {
		b.rows = append(b.rows, make([]widget.Clickable, len(list)-len(b.rows))...)
	}
	ws := []layout.Widget{
		Heading(env, "Setups of "+f.Sheet.Title),
		Note(env, "Your last inputs are kept as you type. A setup keeps them under a name: type one and tap Save as. Tap a setup to open, rename, copy or delete it."),
		func(gtx layout.Context) layout.Dimensions {
			return keepEditor(env, gtx, &b.name, "Name, e.g. 12 bar He-Ar rig", "Setup name")
		},
		func(gtx layout.Context) layout.Dimensions {
			return keepButton(env, gtx, &b.saveAs, "Save as", true)
		},
		b.layoutStatus,
	}
	if !k.Loaded() {
		ws = append(ws, Note(env, "Reading your saved work…"))
	}
	if len(list) == 0 && k.Loaded() {
		ws = append(ws, Para(env, "No setup of this calculator saved yet."))
	}
	for i, s := range list {
		ws = append(ws, b.layoutRow(i, s))
		if s.Name == b.selected {
			ws = append(ws, b.layoutRowActions)
		}
	}
	return append(ws, func(gtx layout.Context) layout.Dimensions {
		return keepButton(env, gtx, &b.all, "All saved work…", false)
	})
}

// layoutRow draws one setup: its name and when it was saved.
func (b *keepBar) layoutRow(i int, s store.Setup) layout.Widget {
	desc, saved := "Setup "+s.Name, "saved "+s.Saved.Local().Format("2006-01-02 15:04")
	return func(gtx layout.Context) layout.Dimensions {
		return keepListRow(b.env, gtx, &b.rows[i], desc, s.Name, saved, s.Name == b.selected)
	}
}

// layoutRowActions draws the buttons of the selected setup.
func (b *keepBar) layoutRowActions(gtx layout.Context) layout.Dimensions {
	btn := func(c *widget.Clickable, label string, primary bool) layout.Widget {
		return func(gtx layout.Context) layout.Dimensions { return keepButton(b.env, gtx, c, label, primary) }
	}
	return keepFlow(gtx, btn(&b.openIt, "Open", true), btn(&b.rename, "Rename", false), btn(&b.dup, "Duplicate", false), btn(&b.del, "Delete", false))
}

// keepFlow lays buttons out left to right, wrapping, 8 dp apart.
func keepFlow(gtx layout.Context, ws ...layout.Widget) layout.Dimensions {
	return flow(gtx, gtx.Dp(8), gtx.Dp(8), len(ws), func(gtx layout.Context, i int) layout.Dimensions { return ws[i](gtx) })
}

// keepButton is a button at least 48 dp tall (gloved fingers).
func keepButton(env *Env, gtx layout.Context, c *widget.Clickable, label string, primary bool) layout.Dimensions {
	bt := material.Button(env.Theme, c, label)
	bt.TextSize = unit.Sp(15)
	bt.Inset = layout.Inset{Left: 12, Right: 12, Top: 8, Bottom: 8}
	if !primary {
		bt.Background = env.Colors.Selected
		bt.Color = env.Colors.Text
	}
	gtx.Constraints.Min.Y = gtx.Dp(48)
	return bt.Layout(gtx)
}

// keepEditor is a one-line text box with a hint, described desc for tests
// and screen readers.
func keepEditor(env *Env, gtx layout.Context, ed *widget.Editor, hint, desc string) layout.Dimensions {
	gtx.Constraints.Min.X = gtx.Constraints.Max.X
	return editorBox(env, gtx, ed, desc, func(gtx layout.Context) layout.Dimensions {
		return background(gtx, env.Colors.Background, env.Colors.Muted, gtx.Dp(6), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min.X = gtx.Constraints.Max.X
			gtx.Constraints.Min.Y = gtx.Dp(48) - 2*gtx.Dp(13)
			return layout.Inset{Left: 12, Right: 12, Top: 13, Bottom: 13}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				e := material.Editor(env.Theme, ed, hint)
				e.Color = env.Colors.Text
				e.HintColor = env.Colors.Muted
				e.TextSize = unit.Sp(16)
				return e.Layout(gtx)
			})
		})
	})
}

// keepMessage is a line of status text, red when bad.
func keepMessage(env *Env, desc, text string, bad bool) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		l := material.Body1(env.Theme, text)
		l.Color = env.Colors.Text
		if bad {
			l.Color = env.Colors.Error
		}
		return Described(desc, l.Layout)(gtx)
	}
}

// keepListRow draws a tappable list entry with a title and a muted second
// line, described desc; selected rows are shaded.
func keepListRow(env *Env, gtx layout.Context, c *widget.Clickable, desc, title, sub string, selected bool) layout.Dimensions {
	return c.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
		semantic.DescriptionOp(desc).Add(gtx.Ops)
		m := op.Record(gtx.Ops)
		dims := layout.Inset{Left: 12, Right: 12, Top: 10, Bottom: 10}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
			gtx.Constraints.Min.X = gtx.Constraints.Max.X
			gtx.Constraints.Min.Y = gtx.Dp(48) - gtx.Dp(20)
			return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					l := material.Body1(env.Theme, title)
					l.Color = env.Colors.Text
					l.Font.Weight = 600
					return l.Layout(gtx)
				}),
				layout.Rigid(func(gtx layout.Context) layout.Dimensions {
					if sub == "" {
						return layout.Dimensions{}
					}
					l := material.Body2(env.Theme, sub)
					l.Color = env.Colors.Muted
					return l.Layout(gtx)
				}),
			)
		})
		call := m.Stop()
		bg := env.Colors.Surface
		if selected {
			bg = env.Colors.Selected
		}
		fill(gtx, bg, dims.Size)
		call.Add(gtx.Ops)
		st := op.Offset(image.Pt(0, dims.Size.Y-gtx.Dp(1))).Push(gtx.Ops)
		fill(gtx, env.Colors.Divider, image.Pt(dims.Size.X, gtx.Dp(1)))
		st.Pop()
		return dims
	})
}
