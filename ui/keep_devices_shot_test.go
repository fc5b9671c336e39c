package ui

import (
	"testing"
	"time"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// deviceShotApp is an app with three devices saved through the keeper: the
// two built-in examples (invented demo devices) under names of the kind a
// bench would use, and the engine again a day later.
func deviceShotApp(t *testing.T) (*App, *Keeper) {
	t.Helper()
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	when := time.Date(2026, 11, 30, 9, 15, 0, 0, time.Local)
	for i, d := range []struct{ name, example string }{
		{"Demo engine, first stack", "engine"},
		{"Demo speaker-driven pump", "heatpump"},
		{"12 bar He-Ar rig", "engine"},
	} {
		doc, err := linear.ExampleFile(d.example)
		if err != nil {
			t.Fatal(err)
		}
		k.Do("Saving", opSaveDevice(store.Device{Name: d.name, Saved: when.Add(time.Duration(i) * 26 * time.Hour), Device: doc}))
	}
	k.Flush()
	return a, k
}

// TestScreenshotDevices pictures the device editor's saved devices (one
// selected, its Open, Rename and Delete shown) on the Engine onset screen,
// scrolled to the editor, the editor just after a device was opened, and
// the Saved work page's devices, at phone, tablet and desktop sizes.
func TestScreenshotDevices(t *testing.T) {
	for _, sz := range shotSizes {
		t.Run("open-"+sz.name, func(t *testing.T) {
			a, _ := deviceShotApp(t)
			a.Open(sheet.IDOnset)
			s := a.Screen(sheet.IDOnset).(*onsetScreen)
			f := &s.editor.saved
			f.show(s.editor)
			f.selected = "12 bar He-Ar rig"
			f.name.SetText(f.selected)
			// The intro, heading, results, cautions, two inputs and the
			// example chips come before the editor.
			s.page.list.Position.First = 7
			shootApp(t, "devices-open-"+sz.name, sz.size, a)
		})
		t.Run("opened-"+sz.name, func(t *testing.T) {
			a, k := deviceShotApp(t)
			a.Open(sheet.IDOnset)
			s := a.Screen(sheet.IDOnset).(*onsetScreen)
			d, _ := k.Library().Device("12 bar He-Ar rig")
			handSavedDevice(a.env, "engine", d)
			s.page.list.Position.First = 7
			shootApp(t, "devices-opened-"+sz.name, sz.size, a)
		})
		t.Run("saved-"+sz.name, func(t *testing.T) {
			a, _ := deviceShotApp(t)
			a.Open(sheet.IDSaved)
			s := a.Screen(sheet.IDSaved).(*savedScreen)
			s.devices.selected = "Demo speaker-driven pump"
			shootApp(t, "devices-saved-"+sz.name, sz.size, a)
		})
	}
}
