package ui

import (
	"strings"
	"testing"
	"time"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// undoBounds returns the height (dp; the harness draws 1 px per dp) of
// the control labelled Undo, failing when there is none.
func undoHeight(t *testing.T, h *harness) int {
	t.Helper()
	r, ok := h.control("Undo")
	if !ok {
		t.Fatalf("no Undo shown; have:\n%s", h.dump())
	}
	return r.Dy()
}

// TestDeviceRemoveUndo: Remove takes the part away at once and offers
// Undo (at least 48 dp tall) in its place; Undo puts the same device back
// exactly and the result with it. Another change withdraws the offer.
func TestDeviceRemoveUndo(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a, h, e := deviceApp(t, k, sheet.IDOnset)
	s := a.Screen(sheet.IDOnset).(*onsetScreen)
	before := e.document()
	n := len(e.parts)
	result, _ := s.form.Results.Value("Hot temperature at onset")
	if result == "" {
		t.Fatal("no onset result to compare")
	}
	title := partTitle(2, e.parts[2].file())
	h.click(h.mustDesc("Remove part 3").Desc.Bounds)
	h.frames(2)
	if len(e.parts) != n-1 {
		t.Fatalf("Remove: %d parts, want %d", len(e.parts), n-1)
	}
	if msg, ok := h.shown("Removed part"); !ok || msg != "Removed "+title+"." {
		t.Errorf("after Remove the bar says %q (shown %v), want %q", msg, ok, "Removed "+title+".")
	}
	if got := undoHeight(t, h); got < 48 {
		t.Errorf("Undo is %d dp tall, want at least 48", got)
	}
	h.tap("Undo")
	h.frames(2)
	if got := e.document(); got != before {
		t.Errorf("after Undo the device is\n%s\nwant\n%s", got, before)
	}
	if got, _ := s.form.Results.Value("Hot temperature at onset"); got != result {
		t.Errorf("after Undo the onset is %q, want %q", got, result)
	}
	if _, ok := h.byDesc("Removed part"); ok {
		t.Error("the Undo bar stayed after Undo")
	}

	// Remove, then change something else: Undo is no longer offered.
	h.click(h.mustDesc("Remove part 2").Desc.Bounds)
	h.frames(2)
	h.retype("Mean pressure", "8 bar", "9 bar")
	if _, ok := h.control("Undo"); ok {
		t.Error("Undo is still offered after another change")
	}
}

// TestDeviceOpenUndo: opening a saved device, and loading an example,
// replace the editor's device at once and offer Undo (at least 48 dp
// tall) beside the message; Undo brings back the device shown before,
// exactly, with its name.
func TestDeviceOpenUndo(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	_, h, e := deviceApp(t, k, sheet.IDOnset)

	// Save the example minus one part as "rig", then change the editor's
	// device so that it differs from both.
	h.click(h.mustDesc("Remove part 2").Desc.Bounds)
	h.tap("Save device as…")
	h.retype("Device name", e.name, rigName)
	h.tap("Save device")
	settle(h, k)
	h.tap("Close saved devices")
	h.retype("Mean pressure", "8 bar", "12 bar")
	h.click(h.mustDesc("Remove part 3").Desc.Bounds)
	h.frames(2)
	before, name := e.document(), e.name

	h.tap("Open a saved device…")
	h.tap(rigName)
	h.tap("Open")
	h.frames(2)
	if e.document() == before {
		t.Fatal("Open did not change the device")
	}
	if msg, _ := h.shown("Device save status"); !strings.Contains(msg, "Opened the device") {
		t.Errorf("status %q after Open", msg)
	}
	if got := undoHeight(t, h); got < 48 {
		t.Errorf("Undo is %d dp tall, want at least 48", got)
	}
	h.tap("Undo")
	h.frames(2)
	if got := e.document(); got != before || e.name != name {
		t.Errorf("after Undo of Open the device %q is\n%s\nwant %q\n%s", e.name, got, name, before)
	}
	if msg, _ := h.shown("Device save status"); !strings.Contains(msg, "back") {
		t.Errorf("status %q after Undo", msg)
	}

	// The example chips replace the device too, with Undo.
	h.tap("The example engine")
	h.frames(2)
	if e.document() == before {
		t.Fatal("the example did not replace the device")
	}
	h.tap("Undo")
	h.frames(2)
	if got := e.document(); got != before {
		t.Errorf("after Undo of the example the device is\n%s\nwant\n%s", got, before)
	}
}
