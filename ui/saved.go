package ui

import (
	"errors"
	"fmt"
	"io"
	"sort"
	"strings"
	"sync"
	"time"

	"gioui.org/io/clipboard"
	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// savedScreen is "Saved work": the log of results (newest first; tap one
// to read it whole and copy it), the setups of every calculator (tap one
// to open it in its calculator, or delete it with undo), the saved devices
// (see savedDevices), where the work is
// kept and whether the browser promised to keep it, a damaged library with
// a way to export its raw text and to set it aside, and Export everything
// and Import (a merge: names already used are reported and replaced only
// when asked).
type savedScreen struct {
	env  *Env
	page *Page

	export, importIt, exportRaw, setAside, action widget.Clickable
	copyEntry, openSetup, delSetup                widget.Clickable
	logRows, setupRows                            []widget.Clickable
	logShown                                      []store.Entry
	setupsShown                                   []store.Setup
	path                                          widget.Editor // the file to import, where there is no file dialog
	pathSet                                       bool
	entry                                         *store.Entry // the entry shown whole
	setup                                         string       // the setup selected
	devices                                       savedDevices

	since      uint64
	status     keepStatus
	statusLive bool
	local      string
	localBad   bool

	// files carries what the Porter answered, from its goroutine.
	files struct {
		sync.Mutex
		busy bool
		done []func()
	}

	// Kept between frames (see retain.go): widgets bound once
	// (bindWidgets), the line saying where the work is kept, and the
	// lists of the log, setups and devices, made again only when the
	// library or the selection changes (listKey).
	w         savedWidgets
	whereKey  whereKey
	whereText string
	lists     []layout.Widget
	listKey   savedListKey
	listOK    bool
	ws        []layout.Widget
}

// newSavedScreen builds the Saved work page.
func newSavedScreen(env *Env) Screen {
	return &savedScreen{env: env, page: NewPage(env), since: keepFor(env).keeper.Status().Seq}
}

// Title implements Screen.
func (s *savedScreen) Title() string { return "Saved work" }

func (s *savedScreen) keeper() *Keeper { return keepFor(s.env).keeper }

func (s *savedScreen) do(what string, run func(sh *store.Shelf) (keepStatus, error)) {
	s.local = ""
	s.since = s.keeper().Status().Seq
	s.keeper().Do(what, run)
}

func (s *savedScreen) say(text string, bad bool) {
	s.local, s.localBad = text, bad
	s.since = s.keeper().Status().Seq
	s.statusLive = false
}

// background runs f off the UI goroutine (the Porter may wait for the user
// or the browser); f returns what to do on the UI goroutine afterwards.
func (s *savedScreen) background(f func() func()) {
	s.files.Lock()
	if s.files.busy {
		s.files.Unlock()
		s.say("Still waiting for the last file to be chosen or written.", false)
		return
	}
	s.files.busy = true
	s.files.Unlock()
	go func() {
		then := f()
		s.files.Lock()
		s.files.busy = false
		s.files.done = append(s.files.done, then)
		s.files.Unlock()
		s.env.Invalidate()
	}()
}

// update handles what came back and the taps.
func (s *savedScreen) update(gtx layout.Context) {
	s.files.Lock()
	done := s.files.done
	s.files.done = nil
	s.files.Unlock()
	for _, f := range done {
		f()
	}
	k := s.keeper()
	if st := k.Status(); st.Seq > s.since {
		s.status, s.statusLive, s.since, s.local = st, true, st.Seq, ""
	}
	porter := keepFor(s.env).porter
	if s.export.Clicked(gtx) {
		s.exportAll(porter)
	}
	if s.importIt.Clicked(gtx) {
		read := porter.Import
		if pp, ok := porter.(PathPorter); ok {
			p := strings.TrimSpace(s.path.Text())
			read = func() ([]byte, error) { return pp.ImportFrom(p) }
		} else {
			s.say("Choose the file to import…", false)
		}
		s.background(func() func() {
			data, err := read()
			return func() {
				switch {
				case errors.Is(err, ErrCancelled):
					s.say("No file was chosen; nothing changed.", false)
				case err != nil:
					s.say("Import failed: "+err.Error(), true)
				default:
					s.do("Importing", opImport(data, false))
				}
			}
		})
	}
	if d := k.Damaged(); d != nil && s.exportRaw.Clicked(gtx) {
		raw := append([]byte(nil), d.Raw...)
		s.background(func() func() {
			where, err := porter.Export("tubewright-unreadable-"+time.Now().Format("2006-01-02-150405")+".json", raw)
			return func() { s.exported("The unreadable text", where, err) }
		})
	}
	if s.setAside.Clicked(gtx) {
		s.do("Setting the library aside", opSetAside)
	}
	if s.action.Clicked(gtx) && s.statusLive && s.status.Then != nil {
		s.do(s.status.Action, s.status.Then)
		s.statusLive = false
	}
	for i := range s.logShown {
		if i < len(s.logRows) && s.logRows[i].Clicked(gtx) {
			e := s.logShown[i]
			if s.entry != nil && s.entry.Time.Equal(e.Time) && s.entry.Calculator == e.Calculator {
				s.entry = nil
			} else {
				s.entry = &e
			}
		}
	}
	if s.copyEntry.Clicked(gtx) && s.entry != nil {
		gtx.Execute(clipboard.WriteCmd{Type: "application/text", Data: io.NopCloser(strings.NewReader(entryText(*s.entry)))})
		s.say("The result is on the clipboard as plain text.", false)
	}
	for i := range s.setupsShown {
		if i < len(s.setupRows) && s.setupRows[i].Clicked(gtx) {
			if s.setup == s.setupsShown[i].Name {
				s.setup = ""
			} else {
				s.setup = s.setupsShown[i].Name
			}
		}
	}
	s.devices.update(gtx, s)
	if s.setup != "" {
		if s.openSetup.Clicked(gtx) {
			s.openIn(s.setup)
		}
		if s.delSetup.Clicked(gtx) {
			s.do("Deleting", opDeleteSetup(s.setup))
			s.setup = ""
		}
	}
}

// exportAll writes the whole library through the Porter.
func (s *savedScreen) exportAll(porter Porter) {
	lib := s.keeper().Library()
	if lib == nil {
		s.say("Nothing to export: your saved work has not been read.", true)
		return
	}
	c := *lib
	data, err := c.Marshal()
	if err != nil {
		s.say("Export failed: "+err.Error(), true)
		return
	}
	name := "tubewright-" + time.Now().Format("2006-01-02-150405") + ".json"
	s.background(func() func() {
		where, err := porter.Export(name, data)
		return func() { s.exported("Everything", where, err) }
	})
}

func (s *savedScreen) exported(what, where string, err error) {
	if err != nil {
		s.say("Export failed: "+err.Error(), true)
		return
	}
	s.say(what+" was exported: "+where+".", false)
}

// openIn opens a setup in its calculator's screen.
func (s *savedScreen) openIn(name string) {
	lib := s.keeper().Library()
	if lib == nil {
		return
	}
	st, ok := lib.Setup(name)
	if !ok {
		return
	}
	id := sheet.ID(st.Calculator)
	if _, ok := lookupEntry(id); !ok {
		s.say(fmt.Sprintf("“%s” is a setup of %q, which this app has no screen for.", name, st.Calculator), true)
		return
	}
	s.env.Open(id)
	f := keepFor(s.env).forms[id]
	if f == nil {
		s.say(fmt.Sprintf("“%s” could not be opened: its calculator has no inputs here.", name), true)
		return
	}
	applyTexts(f, st.Inputs)
	f.Invalidate()
	b := keepFor(s.env).bar(s.env, id)
	b.panel = false
	b.say("Opened “"+name+"”.", false)
}

// savedWidgets are the Saved work page's widgets, bound once.
type savedWidgets struct {
	where, path, buttons, exportNote, status, reading layout.Widget
}

// savedListKey is what the lists of the Saved work page are made from.
type savedListKey struct {
	version       uint64
	lib           *store.Library
	entry         *store.Entry
	setup, device string
}

// bindWidgets makes the page's widgets once; they read the page when
// drawn.
func (s *savedScreen) bindWidgets() {
	env := s.env
	s.w = savedWidgets{
		where: s.where,
		path: func(gtx layout.Context) layout.Dimensions {
			_, hint, _ := keepFor(env).pathPorter()
			return keepEditor(env, gtx, &s.path, hint, "File to import")
		},
		buttons: func(gtx layout.Context) layout.Dimensions {
			return keepFlow(gtx,
				func(gtx layout.Context) layout.Dimensions {
					return keepButton(env, gtx, &s.export, "Export everything", true)
				},
				func(gtx layout.Context) layout.Dimensions {
					return keepButton(env, gtx, &s.importIt, "Import a file", false)
				})
		},
		exportNote: Note(env, "Export writes your setups, devices and log to one file of Tubewright's own format. Import adds a file's items to yours: items whose names you already use are listed and changed only if you ask."),
		status:     s.layoutStatus,
		reading:    Note(env, "Reading your saved work…"),
	}
}

// Layout implements Screen.
func (s *savedScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	if s.w.where == nil {
		s.bindWidgets()
	}
	env, k := s.env, s.keeper()
	lib := k.Library()
	ws := append(s.ws[:0], s.w.where)
	for _, p := range k.Problems() {
		ws = append(ws, keepMessage(env, "Storage problem", p.Error(), true))
	}
	if d := k.Damaged(); d != nil {
		ws = append(ws,
			keepMessage(env, "Damaged library", d.Error(), true),
			func(gtx layout.Context) layout.Dimensions {
				return keepFlow(gtx,
					func(gtx layout.Context) layout.Dimensions {
						return keepButton(env, gtx, &s.exportRaw, "Export the unreadable text", true)
					},
					func(gtx layout.Context) layout.Dimensions {
						return keepButton(env, gtx, &s.setAside, "Set it aside, start afresh", false)
					})
			})
	}
	if pp, _, ok := keepFor(env).pathPorter(); ok {
		if !s.pathSet {
			s.path.SingleLine, s.pathSet = true, true
			s.path.SetText(pp.ImportPath())
		}
		ws = append(ws, s.w.path)
	}
	ws = append(ws, s.w.buttons, s.w.exportNote, s.w.status)
	if !k.Loaded() {
		ws = append(ws, s.w.reading)
	}
	// The lists are made again only when what they show changes.
	if key := (savedListKey{version: k.Version(), lib: lib, entry: s.entry, setup: s.setup, device: s.devices.selected}); !s.listOK || key != s.listKey {
		s.listOK, s.listKey = true, key
		s.lists = append(s.lists[:0], s.logWidgets(lib)...)
		s.lists = append(s.lists, s.setupWidgets(lib)...)
		s.lists = append(s.lists, s.devices.widgets(s, lib)...)
	}
	s.ws = append(ws, s.lists...)
	return s.page.Layout(gtx, s.ws...)
}

// where says where the work is kept and whether it will stay.
func (s *savedScreen) where(gtx layout.Context) layout.Dimensions {
	k := s.keeper()
	kind, persist, ok := k.Where()
	key := whereKey{kind: kind, persist: persist, ok: ok, loaded: k.Loaded(), mem: ok && k.InMemory()}
	if s.whereText == "" || key != s.whereKey {
		s.whereKey, s.whereText = key, savedWhere(key)
	}
	return describe(gtx, "Where saved work is kept", func(gtx layout.Context) layout.Dimensions {
		return layoutPara(gtx, s.env, s.whereText)
	})
}

// savedWhere says where the work is kept and whether it will stay, for
// the keeper's state w.
func savedWhere(w whereKey) string {
	kind, persist, ok := w.kind, w.persist, w.ok
	text := "Looking for your storage…"
	switch {
	case ok && w.mem:
		text = "Kept in " + kind + "."
	case ok:
		text = "Kept in " + kind + "; " + persist.String() + "."
	case w.loaded:
		text = "Nothing can be kept on this device: no storage could be opened (see below), so setups and results cannot be saved."
	}
	return text
}

// layoutStatus draws the last message with its follow-up button.
func (s *savedScreen) layoutStatus(gtx layout.Context) layout.Dimensions {
	text, bad, action := s.local, s.localBad, ""
	if text == "" && s.statusLive {
		text, bad = s.status.Text, s.status.Bad
		if s.status.Then != nil {
			action = s.status.Action
		}
	}
	return keepStatusLine(gtx, s.env, "Saved work status", text, bad, action, &s.action)
}

// logWidgets lists the log newest first, the entry opened shown whole.
func (s *savedScreen) logWidgets(lib *store.Library) []layout.Widget {
	env := s.env
	s.logShown = s.logShown[:0]
	if lib != nil {
		s.logShown = append(s.logShown, lib.Log...)
	}
	sort.SliceStable(s.logShown, func(i, j int) bool { return s.logShown[i].Time.After(s.logShown[j].Time) })
	if len(s.logRows) < len(s.logShown) {
		s.logRows = append(s.logRows, make([]widget.Clickable, len(s.logShown)-len(s.logRows))...)
	}
	ws := []layout.Widget{Heading(env, countWords(len(s.logShown), "logged result", "logged results"))}
	if len(s.logShown) == 0 {
		ws = append(ws, Note(env, "Nothing logged yet. On any calculator, Log result keeps its inputs, results, verdicts and cautions with the date and time."))
	}
	for i, e := range s.logShown {
		sub := e.Time.Local().Format("2006-01-02 15:04:05")
		if e.Note != "" {
			sub += " · " + e.Note
		}
		if w := worstOutcome(e); w != "" {
			sub += " · " + w
		}
		open := s.entry != nil && s.entry.Time.Equal(e.Time) && s.entry.Calculator == e.Calculator
		desc := "Logged " + e.Title + " " + e.Time.Format(time.RFC3339)
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			return keepListRow(env, gtx, &s.logRows[i], desc, e.Title, sub, open)
		})
		if open {
			text := entryText(e)
			ws = append(ws,
				func(gtx layout.Context) layout.Dimensions {
					return background(gtx, env.Colors.Surface, env.Colors.Divider, gtx.Dp(8), gtx.Dp(1), func(gtx layout.Context) layout.Dimensions {
						gtx.Constraints.Min.X = gtx.Constraints.Max.X
						return layout.UniformInset(14).Layout(gtx, func(gtx layout.Context) layout.Dimensions {
							l := material.Body2(env.Theme, text)
							l.Color = env.Colors.Text
							return describe(gtx, "Logged result text", l.Layout)
						})
					})
				},
				func(gtx layout.Context) layout.Dimensions {
					return keepButton(env, gtx, &s.copyEntry, "Copy as text", true)
				})
		}
	}
	return ws
}

// worstOutcome says the worst verdict of an entry in words, "" for none.
func worstOutcome(e store.Entry) string {
	worst := ""
	for _, v := range e.Verdicts {
		switch {
		case v.Outcome == "fail":
			return "a check FAILED"
		case v.Outcome == "warn":
			worst = "a check warns"
		case worst == "":
			worst = "checks pass"
		}
	}
	return worst
}

// setupWidgets lists the setups of every calculator, by calculator.
func (s *savedScreen) setupWidgets(lib *store.Library) []layout.Widget {
	env := s.env
	s.setupsShown = s.setupsShown[:0]
	if lib != nil {
		s.setupsShown = append(s.setupsShown, lib.Setups...)
	}
	title := func(id string) string {
		if e, ok := lookupEntry(sheet.ID(id)); ok {
			return e.Title
		}
		return id
	}
	sort.SliceStable(s.setupsShown, func(i, j int) bool {
		a, b := s.setupsShown[i], s.setupsShown[j]
		if a.Calculator != b.Calculator {
			return title(a.Calculator) < title(b.Calculator)
		}
		return a.Saved.After(b.Saved)
	})
	if len(s.setupRows) < len(s.setupsShown) {
		s.setupRows = append(s.setupRows, make([]widget.Clickable, len(s.setupsShown)-len(s.setupRows))...)
	}
	ws := []layout.Widget{Heading(env, countWords(len(s.setupsShown), "named setup", "named setups"))}
	if len(s.setupsShown) == 0 {
		ws = append(ws, Note(env, "No setup saved yet. On any calculator, Setups › Save as keeps its inputs under a name."))
	}
	for i, st := range s.setupsShown {
		sub := title(st.Calculator) + " · saved " + st.Saved.Local().Format("2006-01-02 15:04")
		sel := st.Name == s.setup
		desc := "Setup " + st.Name
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			return keepListRow(env, gtx, &s.setupRows[i], desc, st.Name, sub, sel)
		})
		if sel {
			openIn := "Open in " + title(st.Calculator)
			ws = append(ws, func(gtx layout.Context) layout.Dimensions {
				return keepFlow(gtx,
					func(gtx layout.Context) layout.Dimensions {
						return keepButton(env, gtx, &s.openSetup, openIn, true)
					},
					func(gtx layout.Context) layout.Dimensions {
						return keepButton(env, gtx, &s.delSetup, "Delete", false)
					})
			})
		}
	}
	return ws
}

// countWords writes "no named setups", "1 named setup", "3 named setups".
func countWords(n int, one, many string) string {
	switch n {
	case 0:
		return "No " + many
	case 1:
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}
