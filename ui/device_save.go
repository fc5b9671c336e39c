package ui

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"time"

	"gioui.org/io/key"
	"gioui.org/layout"
	"gioui.org/widget"

	"tubewright/calc/linear"
	"tubewright/ui/store"
)

// deviceFile is the device editor's Save as and Open: named devices kept
// in the keeper's library (every device screen lists them all), with the
// date and time they were saved. Save as keeps the editor's device under
// the name typed (a name in use is replaced only when asked) and the
// editor's device takes that name; a saved device can be opened into the
// editor, renamed, copied under a free name, or deleted with undo; the
// answers to these changes show here only, not again in the keep bar. The
// browser keeps them as every other platform does. A device that does not
// read is reported and the editor keeps its own.
//
// An earlier version kept one device per editor in a file (path); when
// that file is there it is offered in the list, to be opened and saved
// under a name.
type deviceFile struct {
	path   string        // the earlier version's file; "" where there are no files
	editor *deviceEditor // the editor, as of the last update

	saveAs, openList, close                widget.Clickable
	shown                                  bool // the saved devices show in the editor
	name                                   widget.Editor
	save, openIt, rename, dup, del, action widget.Clickable
	fromOld                                widget.Clickable
	rows                                   []widget.Clickable
	listed                                 []store.Device // as last laid out, newest first
	selected                               string
	oldThere                               bool // the earlier version's file exists

	started    bool   // since was set, at the first update
	since      uint64 // keeper statuses up to this one are not the editor's
	status     keepStatus
	statusLive bool
	local      string // the editor's own message
	localBad   bool

	// Kept between frames (see retain.go): the widgets bound once, the
	// slice widgets returns and the name line.
	ws                       []layout.Widget
	nameW, buttonsW, statusW layout.Widget
	nameLine                 joined
	panelWs                  []layout.Widget
	panelKey                 keepPanelKey
	panelOld, panelOK        bool
}

// defaultDevicePath is the file an earlier version kept an example's
// device in, or "" when the platform has no config folder.
func defaultDevicePath(example string) string {
	dir, err := os.UserConfigDir()
	if err != nil || dir == "" {
		return ""
	}
	return filepath.Join(dir, "tubewright", "devices", example+".json")
}

func (f *deviceFile) keeper(e *deviceEditor) *Keeper { return keepFor(e.env).keeper }

// do queues a change of the library and shows its outcome when it arrives.
func (f *deviceFile) do(e *deviceEditor, what string, run func(s *store.Shelf) (keepStatus, error)) {
	f.local = ""
	e.undo = nil
	f.since = f.keeper(e).Status().Seq
	doClaimed(f.keeper(e), f, what, run)
}

func (f *deviceFile) say(e *deviceEditor, text string, bad bool) {
	f.local, f.localBad = text, bad
	e.undo = nil
	f.since = f.keeper(e).Status().Seq
	f.statusLive = false
}

// show opens the saved devices with the editor's device name to save
// under, selected, so that typing replaces it.
func (f *deviceFile) show(e *deviceEditor) {
	f.shown, f.selected, f.local = true, "", ""
	e.undo = nil
	f.name.SingleLine, f.name.Submit = true, true
	f.name.SetText(e.name)
	f.name.SetCaret(f.name.Len(), 0)
	f.oldThere = false
	if f.path != "" {
		_, err := os.Stat(f.path)
		f.oldThere = err == nil
	}
}

// update handles the taps for editor e, and takes a device opened from
// the Saved work page.
func (f *deviceFile) update(gtx layout.Context, e *deviceEditor) {
	f.editor = e
	k := f.keeper(e)
	if !f.started {
		f.started, f.since = true, k.Status().Seq
	}
	if st := k.Status(); st.Seq > f.since {
		// Only the answers to this editor's changes show here; the others
		// show where they were asked for, and clear this one's message.
		f.status, f.statusLive, f.since, f.local = st, claimedBy(k, st.Seq) == f, st.Seq, ""
	}
	if d, ok := takeSavedDevice(e.env, e.example); ok {
		f.openStored(e, d)
	}
	if f.saveAs.Clicked(gtx) {
		// Save as wants a name: the keyboard comes up on it at once.
		f.show(e)
		gtx.Execute(key.FocusCmd{Tag: &f.name})
	}
	if f.openList.Clicked(gtx) {
		f.show(e)
	}
	if f.close.Clicked(gtx) {
		f.shown = false
	}
	if f.action.Clicked(gtx) && f.statusLive && f.status.Then != nil {
		f.do(e, f.status.Action, f.status.Then)
		f.statusLive = false
	}
	if !f.shown {
		return
	}
	for i := range f.listed {
		if i < len(f.rows) && f.rows[i].Clicked(gtx) {
			if f.selected == f.listed[i].Name {
				f.selected = ""
			} else {
				f.selected = f.listed[i].Name
				f.name.SetText(f.selected)
			}
		}
	}
	if f.fromOld.Clicked(gtx) {
		if file, err := f.read(); err != nil {
			f.say(e, capitalize(err.Error()), true)
		} else {
			f.shown = false
			e.open(file, "Opened the device an earlier version kept in "+f.path+". Save it under a name to keep it here.")
		}
	}
	name := strings.TrimSpace(f.name.Text())
	if f.save.Clicked(gtx) || submitted(gtx, &f.name) {
		f.saveNamed(e, name)
	}
	if f.selected == "" {
		return
	}
	var sel store.Device
	ok := false
	if lib := k.Library(); lib != nil {
		sel, ok = lib.Device(f.selected)
	}
	switch {
	case f.openIt.Clicked(gtx) && ok:
		f.openStored(e, sel)
	case f.rename.Clicked(gtx) && ok:
		if name == "" || name == f.selected {
			f.say(e, "Type the new name in the Device name field, then tap Rename.", true)
			break
		}
		if _, used := k.Library().Device(name); used {
			f.say(e, "A device named “"+name+"” is already saved: choose another name, or delete that one first.", true)
			break
		}
		f.do(e, "Renaming the device", opRenameDevice(f.selected, name))
		if e.name == f.selected {
			e.name = name
		}
		f.selected = name
	case f.dup.Clicked(gtx) && ok:
		f.do(e, "Copying the device", opDuplicateDevice(f.selected))
	case f.del.Clicked(gtx) && ok:
		f.do(e, "Deleting the device", opDeleteDevice(f.selected))
		f.selected = ""
		f.name.SetText(e.name)
	}
}

// saveNamed saves the editor's device under name; an invalid device is not
// saved, and says why.
func (f *deviceFile) saveNamed(e *deviceEditor, name string) {
	if name == "" {
		f.say(e, "Type a name for this device first.", true)
		return
	}
	file := e.File()
	file.Name = name
	if _, err := file.Validate(); err != nil {
		f.say(e, "Not saved: fix the device first. "+err.Error(), true)
		return
	}
	data, err := file.Marshal()
	if err != nil {
		f.say(e, "Not saved: "+err.Error(), true)
		return
	}
	f.do(e, "Saving the device", opSaveDevice(store.Device{Name: name, Saved: time.Now(), Device: data}))
	e.name = name
	f.selected = name
}

// openStored puts a saved device into the editor, unless it does not read.
func (f *deviceFile) openStored(e *deviceEditor, d store.Device) {
	file, err := storedDeviceFile(d)
	if err != nil {
		f.say(e, capitalize(err.Error()), true)
		return
	}
	f.shown = false
	e.open(file, "Opened the device “"+d.Name+"”.")
}

// read reads the earlier version's file for the editor, unless it is
// missing or damaged (then the file is left as it is).
func (f *deviceFile) read() (*linear.DeviceFile, error) {
	data, err := os.ReadFile(f.path)
	if errors.Is(err, os.ErrNotExist) {
		return nil, errors.New("there is no device file at " + f.path + " any more")
	}
	if err != nil {
		return nil, err
	}
	if _, err := linear.ParseDevice(bytes.NewReader(data)); err != nil {
		return nil, errors.New("the device file at " + f.path + " is damaged and was left as it is: " + err.Error())
	}
	var file linear.DeviceFile
	if err := jsonDecode(data, &file); err != nil {
		return nil, errors.New("the device file at " + f.path + " is damaged and was left as it is: " + err.Error())
	}
	return &file, nil
}

// widgets returns the editor's device name, the Save as and Open buttons,
// the last message, and, while shown, the saved devices (nothing before
// the editor's first update).
func (f *deviceFile) widgets(env *Env) []layout.Widget {
	e := f.editor
	if e == nil {
		return nil
	}
	if f.nameW == nil {
		f.bindWidgets(env)
	}
	f.ws = append(f.ws[:0], f.nameW)
	if !f.shown {
		f.ws = append(f.ws, f.buttonsW, f.statusW)
	} else {
		k := f.keeper(e)
		key := keepPanelKey{version: k.Version(), lib: k.Library(), loaded: k.Loaded(), selected: f.selected}
		if !f.panelOK || key != f.panelKey || f.oldThere != f.panelOld {
			f.panelOK, f.panelKey, f.panelOld = true, key, f.oldThere
			f.panelWs = f.panel(env, e)
		}
		f.ws = append(f.ws, f.panelWs...)
	}
	return f.ws
}

// bindWidgets makes the widgets of the device's name, the buttons and the
// message once.
func (f *deviceFile) bindWidgets(env *Env) {
	f.nameW = func(gtx layout.Context) layout.Dimensions {
		name := f.editor.name
		if name == "" {
			name = "not named yet"
		}
		text := f.nameLine.of("Device: ", name)
		return describe(gtx, "Device shown", func(gtx layout.Context) layout.Dimensions { return layoutNote(gtx, env, text) })
	}
	f.buttonsW = func(gtx layout.Context) layout.Dimensions {
		return keepFlow(gtx,
			func(gtx layout.Context) layout.Dimensions {
				return keepButton(env, gtx, &f.saveAs, "Save device as…", true)
			},
			func(gtx layout.Context) layout.Dimensions {
				return keepButton(env, gtx, &f.openList, "Open a saved device…", false)
			})
	}
	f.statusW = func(gtx layout.Context) layout.Dimensions { return f.layoutStatus(gtx, env) }
}

// panel lists the saved devices under the name field and Save device.
func (f *deviceFile) panel(env *Env, e *deviceEditor) []layout.Widget {
	k := f.keeper(e)
	f.listed = devicesNewestFirst(k.Library())
	if len(f.rows) < len(f.listed) {
		f.rows = append(f.rows, make([]widget.Clickable, len(f.listed)-len(f.rows))...)
	}
	ws := []layout.Widget{
		Heading(env, "Saved devices"),
		Note(env, "Type a name and tap Save device to keep the device shown. Tap a saved device to open, rename, copy or delete it. Every device screen lists the same devices."),
		func(gtx layout.Context) layout.Dimensions {
			return keepEditor(env, gtx, &f.name, "Name, e.g. 12 bar He-Ar rig", "Device name")
		},
		func(gtx layout.Context) layout.Dimensions {
			return keepFlow(gtx,
				func(gtx layout.Context) layout.Dimensions {
					return keepButton(env, gtx, &f.save, "Save device", true)
				},
				func(gtx layout.Context) layout.Dimensions {
					return keepButton(env, gtx, &f.close, "Close saved devices", false)
				})
		},
		func(gtx layout.Context) layout.Dimensions { return f.layoutStatus(gtx, env) },
	}
	switch {
	case !k.Loaded():
		ws = append(ws, Note(env, "Reading your saved work…"))
	case len(f.listed) == 0:
		ws = append(ws, Para(env, "No device saved yet."))
	}
	ws = append(ws, deviceRows(env, f.listed, f.rows, f.selected,
		keepAction{&f.openIt, "Open", true}, keepAction{&f.rename, "Rename", false},
		keepAction{&f.dup, "Duplicate", false}, keepAction{&f.del, "Delete", false})...)
	if f.oldThere {
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			return keepListRow(env, gtx, &f.fromOld, "Device file of an earlier version", "Kept in a file by an earlier version", f.path, false)
		})
	}
	return ws
}

// layoutStatus draws the editor's message or the keeper's answer, with
// its follow-up button (Replace it, Undo).
func (f *deviceFile) layoutStatus(gtx layout.Context, env *Env) layout.Dimensions {
	text, bad, action := f.local, f.localBad, ""
	click := &f.action
	if u := f.editor.openUndo(text); u != nil {
		action, click = "Undo", &u.button
	}
	if text == "" && f.statusLive {
		text, bad = f.status.Text, f.status.Bad
		if f.status.Then != nil {
			action = f.status.Action
		}
	}
	return keepStatusLine(gtx, env, "Device save status", text, bad, action, click)
}
