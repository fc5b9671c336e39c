package ui

import (
	"bytes"
	"encoding/json"
	"image"
	"os"
	"strings"
	"testing"
	"time"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// deviceApp is an app on keeper k with a device screen open, tall enough
// that the device editor's buttons are on screen without scrolling.
func deviceApp(t *testing.T, k *Keeper, id sheet.ID) (*App, *harness, *deviceEditor) {
	t.Helper()
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	a.Open(id)
	h := newHarness(t, image.Pt(412, 6000), a.Layout)
	h.frames(2)
	var e *deviceEditor
	switch s := a.Screen(id).(type) {
	case *onsetScreen:
		e = s.editor
	case *heatPumpScreen:
		e = s.editor
	default:
		t.Fatalf("%s is not a device screen", id)
	}
	return a, h, e
}

// storedDevices returns the devices a shelf opened anew on b finds.
func storedDevices(t *testing.T, b store.Backend) []store.Device {
	t.Helper()
	s, err := store.OpenShelf(b)
	if err != nil {
		t.Fatal(err)
	}
	return s.Library().Devices
}

// TestDeviceSaveReopenOpenRenameDelete saves the editor's device under a
// name (a second Save asks before replacing), reopens the app on the same
// storage, opens the device into a changed editor, renames it (the
// editor's device follows), deletes it and brings it back with Undo.
func TestDeviceSaveReopenOpenRenameDelete(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	_, h, e := deviceApp(t, k, sheet.IDOnset)
	n := len(e.parts)
	h.tap("Save device as…")
	// The name field takes the keyboard with the device's name selected,
	// so that typing replaces it.
	if !h.r.Source().Focused(&e.saved.name) || e.saved.name.SelectedText() != e.name || e.name == "" {
		t.Errorf("after Save device as…: name field focused %v, selected %q, want the device's name %q",
			h.r.Source().Focused(&e.saved.name), e.saved.name.SelectedText(), e.name)
	}
	h.retype("Device name", e.name, rigName)
	h.tap("Save device")
	settle(h, k)
	if msg, _ := h.shown("Device save status"); msg != "Saved the device “"+rigName+"”." {
		t.Fatalf("status %q after Save device", msg)
	}
	if e.name != rigName {
		t.Errorf("the editor's device is named %q, want %q", e.name, rigName)
	}
	row := nodeText(h.mustDesc("Device " + rigName))
	for _, want := range []string{"saved " + time.Now().Format("2006-01-02"), "parts", "helium:0.7,argon:0.3"} {
		if !strings.Contains(row, want) {
			t.Errorf("device row %q lacks %q", row, want)
		}
	}
	h.tap("Save device")
	settle(h, k)
	if msg, _ := h.shown("Device save status"); !strings.Contains(msg, "already saved") {
		t.Errorf("second Save device: %q, want a question", msg)
	}
	h.tap("Replace it")
	settle(h, k)
	if msg, _ := h.shown("Device save status"); !strings.HasPrefix(msg, "Replaced") {
		t.Errorf("after Replace it: %q", msg)
	}
	if ds := storedDevices(t, mem); len(ds) != 1 || ds[0].Name != rigName {
		t.Fatalf("stored devices %+v, want the one rig", ds)
	}

	// A new app on the same storage: change the device, then open the saved one.
	k2 := on(mem)
	k2.WaitLoaded(5 * time.Second)
	_, h2, e2 := deviceApp(t, k2, sheet.IDOnset)
	h2.click(h2.mustDesc("Remove part 2").Desc.Bounds)
	if len(e2.parts) != n-1 {
		t.Fatalf("%d parts after removing one of %d", len(e2.parts), n)
	}
	h2.tap("Open a saved device…")
	h2.tap(rigName)
	h2.tap("Open")
	h2.frames(2)
	if len(e2.parts) != n || e2.name != rigName {
		t.Errorf("opened device: %d parts named %q, want %d named %q", len(e2.parts), e2.name, n, rigName)
	}
	if msg, _ := h2.shown("Device save status"); !strings.Contains(msg, "Opened the device") {
		t.Errorf("status %q after Open", msg)
	}
	if _, ok := h2.byDesc("Device name"); ok {
		t.Error("the saved devices stayed open after Open")
	}
	if d, ok := h2.shown("Device shown"); !ok || !strings.Contains(d, rigName) {
		t.Errorf("the editor says %q about its device", d)
	}

	// Rename: onto a name in use refused; otherwise the stored device and
	// the editor's device take the new name.
	k2.Do("Saving", opSaveDevice(store.Device{Name: "spare", Saved: time.Now().Add(-time.Hour), Device: []byte(`{}`)}))
	k2.Flush()
	h2.tap("Open a saved device…")
	h2.tap(rigName)
	h2.retype("Device name", rigName, "spare")
	h2.tap("Rename")
	settle(h2, k2)
	if msg, _ := h2.shown("Device save status"); !strings.Contains(msg, "already saved") {
		t.Errorf("rename onto a used name: %q", msg)
	}
	if e2.name != rigName {
		t.Errorf("a refused rename changed the editor's device name to %q", e2.name)
	}
	h2.tap("spare")
	h2.tap("Delete")
	settle(h2, k2)
	h2.tap(rigName)
	h2.retype("Device name", rigName, "rig B")
	h2.tap("Rename")
	settle(h2, k2)
	h2.mustDesc("Device rig B")
	if _, ok := h2.byDesc("Device " + rigName); ok {
		t.Error("the old name is still listed after Rename")
	}
	if e2.name != "rig B" {
		t.Errorf("the editor's device is named %q after the rename", e2.name)
	}
	if ds := storedDevices(t, mem); len(ds) != 1 || ds[0].Name != "rig B" {
		t.Fatalf("stored devices after rename %+v", ds)
	}

	// Delete (the renamed device stays selected), then Undo.
	h2.tap("Delete")
	settle(h2, k2)
	if _, ok := h2.byDesc("Device rig B"); ok {
		t.Fatal("deleted device still listed")
	}
	if msg, _ := h2.shown("Device save status"); msg != "Deleted the device “rig B”." {
		t.Errorf("status %q after Delete", msg)
	}
	if ds := storedDevices(t, mem); len(ds) != 0 {
		t.Fatalf("%d devices stored after the delete", len(ds))
	}
	h2.tap("Undo")
	settle(h2, k2)
	h2.mustDesc("Device rig B")
	if ds := storedDevices(t, mem); len(ds) != 1 || ds[0].Name != "rig B" {
		t.Errorf("stored devices after Undo %+v", ds)
	}
}

// TestDeviceSaveRefusesBadDevice: a device that does not check is not
// saved, and the message says why; an empty name is asked for.
func TestDeviceSaveRefusesBadDevice(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	_, h, e := deviceApp(t, k, sheet.IDOnset)
	h.tap("Save device as…")
	h.retype("Device name", e.name, "")
	h.tap("Save device")
	if msg, _ := h.shown("Device save status"); !strings.Contains(msg, "Type a name") {
		t.Errorf("empty name: %q", msg)
	}
	e.pressure.SetText("-3 bar")
	h.retype("Device name", "", "broken rig")
	h.tap("Save device")
	settle(h, k)
	if msg, _ := h.shown("Device save status"); !strings.HasPrefix(msg, "Not saved: fix the device first.") || !strings.Contains(msg, "pressure") {
		t.Errorf("bad device: %q, want it refused naming the pressure", msg)
	}
	if ds := storedDevices(t, mem); len(ds) != 0 {
		t.Errorf("a bad device was stored: %+v", ds)
	}
}

// TestDeviceOpenUnreadable: a stored device that is not a device document
// (an import from elsewhere) is reported and the editor keeps its device.
func TestDeviceOpenUnreadable(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	k.Do("Saving", opSaveDevice(store.Device{Name: "odd one", Saved: time.Now(), Device: []byte(`{"parts": 3}`)}))
	k.Flush()
	_, h, e := deviceApp(t, k, sheet.IDHeatPump)
	n, name := len(e.parts), e.name
	h.tap("Open a saved device…")
	if row := nodeText(h.mustDesc("Device odd one")); !strings.Contains(row, "does not read") {
		t.Errorf("row %q does not say the device does not read", row)
	}
	h.tap("odd one")
	h.tap("Open")
	if msg, _ := h.shown("Device save status"); !strings.Contains(msg, "does not read") {
		t.Errorf("status %q", msg)
	}
	if len(e.parts) != n || e.name != name {
		t.Errorf("the editor's device changed: %d parts named %q", len(e.parts), e.name)
	}
}

// TestDeviceFileOfEarlierVersion: a device an earlier version kept in a
// file is offered in the list and opens into the editor; a damaged one is
// reported, and the file and the editor are left as they are.
func TestDeviceFileOfEarlierVersion(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	_, h, e := deviceApp(t, k, sheet.IDOnset)
	path := t.TempDir() + "/engine.json"
	e.saved.path = path
	h.tap("Open a saved device…")
	if _, ok := h.byDesc("Device file of an earlier version"); ok {
		t.Fatal("an earlier version's file is offered where there is none")
	}
	h.tap("Close saved devices")
	data, err := e.File().Marshal()
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, data, 0o644); err != nil {
		t.Fatal(err)
	}
	h.click(h.mustDesc("Remove part 2").Desc.Bounds)
	n := len(e.parts)
	h.tap("Open a saved device…")
	h.click(h.mustDesc("Device file of an earlier version").Desc.Bounds)
	if len(e.parts) != n+1 {
		t.Errorf("the earlier version's device: %d parts, want %d", len(e.parts), n+1)
	}
	bad := `{"gas": "helium", "parts": [`
	if err := os.WriteFile(path, []byte(bad), 0o644); err != nil {
		t.Fatal(err)
	}
	h.click(h.mustDesc("Remove part 2").Desc.Bounds)
	h.tap("Open a saved device…")
	h.click(h.mustDesc("Device file of an earlier version").Desc.Bounds)
	if msg, _ := h.shown("Device save status"); !strings.Contains(msg, "damaged") {
		t.Errorf("damaged file: status %q", msg)
	}
	if len(e.parts) != n {
		t.Errorf("a damaged file replaced the editor's device (%d parts, want %d)", len(e.parts), n)
	}
	if b, _ := os.ReadFile(path); string(b) != bad {
		t.Error("the damaged file was changed")
	}
}

// TestSavedWorkListsDevices finds a device saved on the Engine onset screen
// on the Saved work page with its date, opens it in the Heat pump screen's
// editor, and deletes it there with undo.
func TestSavedWorkListsDevices(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a, h, e := deviceApp(t, k, sheet.IDOnset)
	h.tap("Save device as…")
	h.retype("Device name", e.name, "tube on the bench")
	h.tap("Save device")
	settle(h, k)
	a.Open(sheet.IDSaved)
	h.frames(2)
	if txt := nodeText(h.mustDesc("Device tube on the bench")); !strings.Contains(txt, "saved "+time.Now().Format("2006-01-02")) {
		t.Errorf("Saved work row %q shows no date", txt)
	}
	if !strings.Contains(h.dump(), "| 1 saved device\n") {
		t.Errorf("no heading counting the device:\n%s", h.dump())
	}
	h.tap("tube on the bench")
	h.tap("Open in Heat pump span")
	h.frames(3)
	hp, ok := a.Screen(sheet.IDHeatPump).(*heatPumpScreen)
	if !ok || a.Current() != sheet.IDHeatPump {
		t.Fatalf("Open in Heat pump span shows %s", a.Current())
	}
	if hp.editor.name != "tube on the bench" || hp.editor.parts[0].kind == linear.KindDriver {
		t.Errorf("heat pump editor holds %q (first part %s), want the saved engine", hp.editor.name, hp.editor.parts[0].kind)
	}
	a.Open(sheet.IDSaved)
	h.frames(2)
	h.tap("tube on the bench")
	h.tap("Delete")
	settle(h, k)
	if _, ok := h.byDesc("Device tube on the bench"); ok {
		t.Fatal("deleted device still listed")
	}
	h.tap("Undo")
	settle(h, k)
	h.mustDesc("Device tube on the bench")
}

// labelsSaying counts the text labels on screen that contain text: a
// message drawn twice (the device editor and the keep bar) counts two.
func labelsSaying(h *harness, text string) int {
	n := 0
	for _, nd := range h.nodes() {
		if strings.Contains(nd.Desc.Label, text) {
			n++
		}
	}
	return n
}

// TestDeviceDuplicate copies a saved device from the device editor's list
// (a second copy takes the next free name), finds both in a new app on
// the same storage, each with the original's parts, and checks that every
// device message (save, copy, rename, delete) is drawn once, in the editor,
// while the keep bar still answers its own Log result.
func TestDeviceDuplicate(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	_, h, e := deviceApp(t, k, sheet.IDOnset)
	n := len(e.parts)
	once := func(step, want string) {
		t.Helper()
		if msg, _ := h.shown("Device save status"); msg != want {
			t.Errorf("%s: editor says %q, want %q", step, msg, want)
		}
		if c := labelsSaying(h, want); c != 1 {
			t.Errorf("%s: %q drawn %d times, want once", step, want, c)
		}
		if msg, ok := h.shown("Saved work status"); ok {
			t.Errorf("%s: the keep bar also says %q", step, msg)
		}
	}
	h.tap("Save device as…")
	h.retype("Device name", e.name, rigName)
	h.tap("Save device")
	settle(h, k)
	once("save", "Saved the device “"+rigName+"”.")

	h.tap("Duplicate")
	settle(h, k)
	once("duplicate", "Copied the device “"+rigName+"” as “"+rigName+" copy”.")
	h.mustDesc("Device " + rigName + " copy")
	// The original stays listed and selected: a second Duplicate copies it
	// again under the next free name.
	if _, ok := h.byDesc("Device " + rigName); !ok {
		t.Fatal("the original is no longer listed after the copy")
	}
	h.tap("Duplicate")
	settle(h, k)
	once("second duplicate", "Copied the device “"+rigName+"” as “"+rigName+" copy 2”.")

	h.tap(rigName + " copy 2")
	h.retype("Device name", rigName+" copy 2", "rig spare")
	h.tap("Rename")
	settle(h, k)
	once("rename", "Renamed the device “"+rigName+" copy 2” to “rig spare”.")
	h.tap("Delete")
	settle(h, k)
	once("delete", "Deleted the device “rig spare”.")
	if c := labelsSaying(h, "Undo"); c != 1 {
		t.Errorf("Undo drawn %d times after the delete, want once", c)
	}

	// The keep bar's own change still answers in the bar, and only there.
	h.tap("Log result")
	settle(h, k)
	if msg, _ := h.shown("Saved work status"); !strings.HasPrefix(msg, "Logged this result") {
		t.Errorf("keep bar after Log result: %q", msg)
	}
	if msg, ok := h.shown("Device save status"); ok && msg != "" {
		t.Errorf("the device editor also says %q after Log result", msg)
	}

	// A new app on the same storage lists both, with the same document.
	ds := storedDevices(t, mem)
	byName := map[string]store.Device{}
	for _, d := range ds {
		byName[d.Name] = d
	}
	orig, ok1 := byName[rigName]
	cp, ok2 := byName[rigName+" copy"]
	if len(ds) != 2 || !ok1 || !ok2 {
		t.Fatalf("stored devices %d, want %q and its copy", len(ds), rigName)
	}
	if compactJSON(t, orig.Device) != compactJSON(t, cp.Device) {
		t.Errorf("the copy's document differs:\n%s\n%s", orig.Device, cp.Device)
	}
	k2 := on(mem)
	k2.WaitLoaded(5 * time.Second)
	_, h2, e2 := deviceApp(t, k2, sheet.IDOnset)
	h2.click(h2.mustDesc("Remove part 2").Desc.Bounds)
	h2.tap("Open a saved device…")
	h2.mustDesc("Device " + rigName)
	h2.tap(rigName + " copy")
	h2.tap("Open")
	h2.frames(2)
	if len(e2.parts) != n || e2.name != rigName+" copy" {
		t.Errorf("opened copy: %d parts named %q, want %d named %q", len(e2.parts), e2.name, n, rigName+" copy")
	}
}

// compactJSON returns doc without its indentation.
func compactJSON(t *testing.T, doc []byte) string {
	t.Helper()
	var b bytes.Buffer
	if err := json.Compact(&b, doc); err != nil {
		t.Fatal(err)
	}
	return b.String()
}
