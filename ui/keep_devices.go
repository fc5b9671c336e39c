package ui

import (
	"encoding/json"
	"errors"
	"fmt"
	"sort"
	"sync"

	"gioui.org/layout"
	"gioui.org/widget"

	"tubewright/calc/linear"
	"tubewright/ui/store"
)

// Named devices in the keeper's library: the changes the device editor and
// the Saved work page queue, and how a device opened from Saved work
// reaches the editor of the screen it opens in.

// opSaveDevice saves d under its name; a name in use is not overwritten
// but offered to be replaced.
func opSaveDevice(d store.Device) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		err := s.SaveDevice(d, false)
		if errors.Is(err, store.ErrExists) {
			return keepStatus{Text: fmt.Sprintf("A device named “%s” is already saved. Replace it with this one?", d.Name),
				Action: "Replace it", Then: func(s *store.Shelf) (keepStatus, error) {
					if err := s.SaveDevice(d, true); err != nil {
						return keepStatus{}, err
					}
					return keepStatus{Text: fmt.Sprintf("Replaced the device “%s”.", d.Name)}, nil
				}}, nil
		}
		if err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Saved the device “%s”.", d.Name)}, nil
	}
}

// opRenameDevice renames a saved device.
func opRenameDevice(old, name string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		if err := s.RenameDevice(old, name); err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Renamed the device “%s” to “%s”.", old, name)}, nil
	}
}

// opDuplicateDevice copies a saved device under a name not yet used ("NAME
// copy", "NAME copy 2", ...), as setups are copied.
func opDuplicateDevice(name string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		lib := s.Library()
		copyName := freeCopyName(name, func(n string) bool { _, used := lib.Device(n); return used })
		if err := s.DuplicateDevice(name, copyName); err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Copied the device “%s” as “%s”.", name, copyName)}, nil
	}
}

// opDeleteDevice deletes a saved device and offers to undo it.
func opDeleteDevice(name string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		undo, err := s.DeleteDevice(name)
		if err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Deleted the device “%s”.", name), Action: "Undo",
			Then: func(*store.Shelf) (keepStatus, error) {
				if err := undo(); err != nil {
					return keepStatus{}, err
				}
				return keepStatus{Text: fmt.Sprintf("The device “%s” is back.", name)}, nil
			}}, nil
	}
}

// statusClaims remembers, per keeper, which statuses answer a change that
// a device editor queued, so that the message shows once: in that editor,
// beside the saved devices and their Undo or Replace, and not again in the
// keep bar at the foot of the screen (which shows the rest). The keeper
// runs one change at a time on its worker and numbers its status one past
// the last right after the change returns, so the change itself can note
// the number. A change that never ran (no storage could be opened) is
// claimed by no one and shows in the keep bar.
var statusClaims struct {
	sync.Mutex
	m map[*Keeper]map[uint64]any
}

// doClaimed queues run on k like k.Do, its status claimed by owner.
func doClaimed(k *Keeper, owner any, what string, run func(s *store.Shelf) (keepStatus, error)) {
	k.Do(what, func(s *store.Shelf) (keepStatus, error) {
		st, err := run(s)
		seq := k.Status().Seq + 1
		statusClaims.Lock()
		defer statusClaims.Unlock()
		if statusClaims.m == nil {
			statusClaims.m = map[*Keeper]map[uint64]any{}
		}
		m := statusClaims.m[k]
		if m == nil {
			m = map[uint64]any{}
			statusClaims.m[k] = m
		}
		for old := range m {
			if old+64 < seq {
				delete(m, old)
			}
		}
		m[seq] = owner
		return st, err
	})
}

// claimedBy returns the owner of k's status seq, or nil when no one
// claimed it.
func claimedBy(k *Keeper, seq uint64) any {
	statusClaims.Lock()
	defer statusClaims.Unlock()
	return statusClaims.m[k][seq]
}

// devicesNewestFirst returns the library's devices, the last saved first.
func devicesNewestFirst(lib *store.Library) []store.Device {
	if lib == nil {
		return nil
	}
	out := append([]store.Device(nil), lib.Devices...)
	sort.SliceStable(out, func(i, j int) bool { return out[i].Saved.After(out[j].Saved) })
	return out
}

// deviceSummary is a saved device's second line: "saved 2026-12-05 18:40 ·
// 7 parts · helium", or what is wrong with a document that does not read.
func deviceSummary(d store.Device) string {
	s := "saved " + d.Saved.Local().Format("2006-01-02 15:04")
	var f linear.DeviceFile
	if err := json.Unmarshal(d.Device, &f); err != nil {
		return s + " · does not read as a device"
	}
	if n := len(f.PartsList); n == 1 {
		s += " · 1 part"
	} else {
		s += fmt.Sprintf(" · %d parts", n)
	}
	if f.Gas != "" {
		s += " · " + f.Gas
	}
	return s
}

// keepAction is one button of the actions shown under a selected item.
type keepAction struct {
	c       *widget.Clickable
	label   string
	primary bool
}

// deviceRows lists devices as tappable rows, described "Device NAME", with
// the date, parts and gas; the selected one is followed by its actions.
// rows holds at least one Clickable per device.
func deviceRows(env *Env, list []store.Device, rows []widget.Clickable, selected string, actions ...keepAction) []layout.Widget {
	var ws []layout.Widget
	for i, d := range list {
		sel := d.Name == selected
		desc, summary := "Device "+d.Name, deviceSummary(d)
		ws = append(ws, func(gtx layout.Context) layout.Dimensions {
			return keepListRow(env, gtx, &rows[i], desc, d.Name, summary, sel)
		})
		if sel {
			bs := make([]layout.Widget, len(actions))
			for j, a := range actions {
				bs[j] = func(gtx layout.Context) layout.Dimensions { return keepButton(env, gtx, a.c, a.label, a.primary) }
			}
			ws = append(ws, func(gtx layout.Context) layout.Dimensions { return keepFlow(gtx, bs...) })
		}
	}
	return ws
}

// keepStatusLine draws a status message described desc, red when bad, with
// its follow-up button (action, on c) below it when action is not "".
func keepStatusLine(gtx layout.Context, env *Env, desc, text string, bad bool, action string, c *widget.Clickable) layout.Dimensions {
	if text == "" {
		return layout.Dimensions{}
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(keepMessage(env, desc, text, bad)),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			if action == "" {
				return layout.Dimensions{}
			}
			return layout.Inset{Top: 8}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				return keepButton(env, gtx, c, action, true)
			})
		}),
	)
}

// storedDeviceFile reads a saved device's document for the editor, named as
// it is saved. A document that is not a device is an error that says so;
// the caller leaves the editor as it is.
func storedDeviceFile(d store.Device) (*linear.DeviceFile, error) {
	var f linear.DeviceFile
	if err := jsonDecode(d.Device, &f); err != nil {
		return nil, fmt.Errorf("the saved device “%s” does not read and was left as it is: %v", d.Name, err)
	}
	f.Name = d.Name
	return &f, nil
}

// deviceHandoff carries a saved device from the Saved work page to the
// device editor of the screen it is opened in, by Env: the editor takes it
// on its next frame (see deviceFile.update).
var deviceHandoff struct {
	sync.Mutex
	m map[*Env]deviceRequest
}

// deviceRequest is a saved device waiting for the editor of one example
// ("engine" for Engine onset, "heatpump" for Heat pump).
type deviceRequest struct {
	example string
	device  store.Device
}

// handSavedDevice leaves d for the editor of example in env.
func handSavedDevice(env *Env, example string, d store.Device) {
	deviceHandoff.Lock()
	defer deviceHandoff.Unlock()
	if deviceHandoff.m == nil {
		deviceHandoff.m = map[*Env]deviceRequest{}
	}
	deviceHandoff.m[env] = deviceRequest{example: example, device: d}
}

// takeSavedDevice returns the device left for the editor of example in
// env, once.
func takeSavedDevice(env *Env, example string) (store.Device, bool) {
	deviceHandoff.Lock()
	defer deviceHandoff.Unlock()
	r, ok := deviceHandoff.m[env]
	if !ok || r.example != example {
		return store.Device{}, false
	}
	delete(deviceHandoff.m, env)
	return r.device, true
}
