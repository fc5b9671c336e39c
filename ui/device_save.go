package ui

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"

	"gioui.org/layout"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/linear"
	"tubewright/ui/store"
)

// deviceFile keeps one saved device per editor on the desktop, at
// os.UserConfigDir()/tubewright/devices/<example>.json. Saving writes a
// temporary file and renames it (store.WriteFileAtomic); opening a damaged
// file reports it and leaves both the file and the editor as they are.
// Where there is no config folder (the browser) the buttons are not shown.
type deviceFile struct {
	path        string // "" when files are not available
	save, open  widget.Clickable
	status      string
	statusIsErr bool
}

// defaultDevicePath is the saved-device file for an example's editor, or
// "" when the platform has no config folder.
func defaultDevicePath(example string) string {
	dir, err := os.UserConfigDir()
	if err != nil || dir == "" {
		return ""
	}
	return filepath.Join(dir, "tubewright", "devices", example+".json")
}

// update handles the two buttons for editor e.
func (f *deviceFile) update(gtx layout.Context, e *deviceEditor) {
	if f.path == "" {
		return
	}
	if f.save.Clicked(gtx) {
		f.status, f.statusIsErr = "Saved to "+f.path, false
		if err := f.write(e); err != nil {
			f.status, f.statusIsErr = capitalize(err.Error()), true
		}
	}
	if f.open.Clicked(gtx) {
		f.status, f.statusIsErr = "Opened "+f.path, false
		if err := f.read(e); err != nil {
			f.status, f.statusIsErr = capitalize(err.Error()), true
		}
	}
}

// write saves the editor's device; an invalid device is not saved.
func (f *deviceFile) write(e *deviceEditor) error {
	file := e.File()
	if _, err := file.Validate(); err != nil {
		return errors.New("not saved: fix the device first. " + err.Error())
	}
	data, err := file.Marshal()
	if err != nil {
		return err
	}
	if err := os.MkdirAll(filepath.Dir(f.path), 0o755); err != nil {
		return errors.New("not saved: " + err.Error())
	}
	if err := store.WriteFileAtomic(f.path, data, 0o644); err != nil {
		return errors.New("not saved: " + err.Error())
	}
	return nil
}

// read loads the saved device into the editor, unless the file is missing
// or damaged.
func (f *deviceFile) read(e *deviceEditor) error {
	data, err := os.ReadFile(f.path)
	if errors.Is(err, os.ErrNotExist) {
		return errors.New("no saved device yet at " + f.path)
	}
	if err != nil {
		return err
	}
	if _, err := linear.ParseDevice(bytes.NewReader(data)); err != nil {
		return errors.New("the saved device at " + f.path + " is damaged and was left as it is: " + err.Error())
	}
	var file linear.DeviceFile
	if err := jsonDecode(data, &file); err != nil {
		return errors.New("the saved device at " + f.path + " is damaged and was left as it is: " + err.Error())
	}
	e.set(&file)
	return nil
}

// widgets returns the buttons and the status line (none without files).
func (f *deviceFile) widgets(env *Env) []layout.Widget {
	if f.path == "" {
		return nil
	}
	ws := []layout.Widget{func(gtx layout.Context) layout.Dimensions {
		gtx.Constraints.Min.X = 0
		return flow(gtx, gtx.Dp(8), gtx.Dp(8), 2, func(gtx layout.Context, i int) layout.Dimensions {
			if i == 0 {
				return smallButton(env, gtx, &f.save, "Save device")
			}
			return smallButton(env, gtx, &f.open, "Open saved device")
		})
	}}
	if f.status != "" {
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			l := material.Body2(env.Theme, f.status)
			l.Color = env.Colors.Muted
			if f.statusIsErr {
				l.Color = env.Colors.Error
			}
			return Described("device file status", l.Layout)(gtx)
		})
	}
	return ws
}
