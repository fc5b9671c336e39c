package ui

import (
	"testing"

	"tubewright/calc/sheet"
)

// TestScreenshotDeviceUndo pictures the device editor on the Engine onset
// screen just after the hot tube was removed (Undo in its place) with the
// stack open, its plates given as a half gap (the gap and half gap shown
// together under the field), at phone, tablet and desktop sizes
// (SHOT_DIR/device-undo-<size>.png, and scrolled to the pores
// device-gap-<size>.png).
func TestScreenshotDeviceUndo(t *testing.T) {
	for _, sz := range shotSizes {
		t.Run(sz.name, func(t *testing.T) {
			a := NewApp(nil)
			a.Open(sheet.IDOnset)
			s := a.Screen(sheet.IDOnset).(*onsetScreen)
			e := s.editor
			e.removePart(1)
			e.selected = 2 // the stack
			gap := e.parts[2].fields[3]
			gap.size.choice.Select(sizeHalf)
			gap.f.SetText("0.4 mm")
			gap.size.relabel(gap.f)
			// The intro, heading, results, cautions, two inputs, the
			// example chips and the save row come before the parts.
			s.page.list.Position.First = 10
			shootApp(t, "device-undo-"+sz.name, sz.size, a)
			s.page.list.Position.First = 16
			shootApp(t, "device-gap-"+sz.name, sz.size, a)
		})
	}
}
