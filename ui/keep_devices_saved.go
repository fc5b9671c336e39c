package ui

import (
	"gioui.org/layout"
	"gioui.org/widget"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// savedDevices is the part of the Saved work page that lists the named
// devices (newest first, with the date and time saved, the number of parts
// and the gas): tap one to open it in the Engine onset or Heat pump span
// screen's editor, to copy it under a free name, or to delete it (with
// undo).
type savedDevices struct {
	rows     []widget.Clickable
	shown    []store.Device
	selected string

	inOnset, inHeatPump, dup, del widget.Clickable
}

// update handles the devices' taps on page s.
func (sd *savedDevices) update(gtx layout.Context, s *savedScreen) {
	for i := range sd.shown {
		if i < len(sd.rows) && sd.rows[i].Clicked(gtx) {
			if sd.selected == sd.shown[i].Name {
				sd.selected = ""
			} else {
				sd.selected = sd.shown[i].Name
			}
		}
	}
	if sd.selected == "" {
		return
	}
	var d store.Device
	ok := false
	if lib := s.keeper().Library(); lib != nil {
		d, ok = lib.Device(sd.selected)
	}
	switch {
	case !ok:
	case sd.inOnset.Clicked(gtx):
		handSavedDevice(s.env, "engine", d)
		sd.selected = ""
		s.env.Open(sheet.IDOnset)
	case sd.inHeatPump.Clicked(gtx):
		handSavedDevice(s.env, "heatpump", d)
		sd.selected = ""
		s.env.Open(sheet.IDHeatPump)
	case sd.dup.Clicked(gtx):
		s.do("Copying the device", opDuplicateDevice(sd.selected))
	case sd.del.Clicked(gtx):
		s.do("Deleting the device", opDeleteDevice(sd.selected))
		sd.selected = ""
	}
}

// widgets lists the saved devices of lib.
func (sd *savedDevices) widgets(s *savedScreen, lib *store.Library) []layout.Widget {
	env := s.env
	sd.shown = devicesNewestFirst(lib)
	if len(sd.rows) < len(sd.shown) {
		sd.rows = append(sd.rows, make([]widget.Clickable, len(sd.shown)-len(sd.rows))...)
	}
	ws := []layout.Widget{Heading(env, countWords(len(sd.shown), "saved device", "saved devices"))}
	if len(sd.shown) == 0 {
		ws = append(ws, Note(env, "No device saved yet. On "+screenTitle(sheet.IDOnset)+" or "+screenTitle(sheet.IDHeatPump)+", Save device as… keeps the device in the editor under a name."))
	}
	return append(ws, deviceRows(env, sd.shown, sd.rows, sd.selected,
		keepAction{&sd.inOnset, "Open in " + screenTitle(sheet.IDOnset), true},
		keepAction{&sd.inHeatPump, "Open in " + screenTitle(sheet.IDHeatPump), false},
		keepAction{&sd.dup, "Duplicate", false},
		keepAction{&sd.del, "Delete", false})...)
}

// screenTitle is the title of calculator id as the catalog shows it.
func screenTitle(id sheet.ID) string {
	if e, ok := lookupEntry(id); ok {
		return e.Title
	}
	return string(id)
}
