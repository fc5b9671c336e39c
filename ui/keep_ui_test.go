package ui

import (
	"errors"
	"strings"
	"testing"
	"time"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

const rigName = "12 bar He-Ar rig"

// TestSetupSaveReopenFind saves a named setup through the bar, reopens the
// app on the same storage, finds the setup with its date and opens it into
// the calculator.
func TestSetupSaveReopenFind(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	a, h := keepApp(t, k, sheet.IDGas)
	f := keepFor(a.env).forms[sheet.IDGas]
	h.retype("Mean pressure", f.Text("pressure"), "12 bar")
	h.tap("Setups")
	h.retype("Setup name", "", rigName)
	h.tap("Save as")
	settle(h, k)
	if msg, _ := h.shown("Saved work status"); msg != "Saved “"+rigName+"”." {
		t.Fatalf("status %q after Save as", msg)
	}
	row := h.mustDesc("Setup " + rigName)
	if txt := nodeText(row); !strings.Contains(txt, "saved "+time.Now().Format("2006-01-02")) {
		t.Errorf("setup row %q shows no date", txt)
	}
	// Saving again under the same name asks before replacing.
	h.tap("Save as")
	settle(h, k)
	if msg, _ := h.shown("Saved work status"); !strings.Contains(msg, "already saved") {
		t.Errorf("second Save as: %q, want a question", msg)
	}
	if _, ok := h.control("Replace it"); !ok {
		t.Error("no Replace button offered")
	}

	k2 := on(mem)
	k2.WaitLoaded(5 * time.Second)
	a2, h2 := keepApp(t, k2, sheet.IDGas)
	f2 := keepFor(a2.env).forms[sheet.IDGas]
	h2.retype("Mean pressure", f2.Text("pressure"), "3 bar")
	h2.tap("Setups")
	h2.mustDesc("Setup " + rigName)
	h2.tap(rigName)
	h2.tap("Open")
	h2.frames(2)
	if got := f2.Text("pressure"); got != "12 bar" {
		t.Errorf("opened setup: pressure %q, want 12 bar", got)
	}
	if _, ok := h2.byDesc("Setup name"); ok {
		t.Error("the setups panel stayed open after Open")
	}
}

// TestLogResultWithNote logs a result in one tap, adds a note, and finds it
// on the Saved work page with its inputs and rows.
func TestLogResultWithNote(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	a, h := keepApp(t, k, sheet.IDGas)
	f := keepFor(a.env).forms[sheet.IDGas]
	h.retype("Temperature", f.Text("temperature"), "293 K")
	h.tap("Log result")
	settle(h, k)
	lib := k.Library()
	if len(lib.Log) != 1 {
		t.Fatalf("%d entries after one tap", len(lib.Log))
	}
	e := lib.Log[0]
	if e.Calculator != string(sheet.IDGas) || e.Inputs["temperature"] != "293 K" || len(e.Rows) == 0 {
		t.Fatalf("entry %+v", e)
	}
	h.retype("Log note", "", "after the leak fix")
	h.tap("Keep note")
	settle(h, k)
	if got := k.Library().Log[0].Note; got != "after the leak fix" {
		t.Fatalf("note %q", got)
	}
	// The log survives in the stored library and is listed on the page.
	data, err := mem.Load("library")
	if err != nil || !strings.Contains(string(data), "after the leak fix") {
		t.Fatalf("stored library: %v", err)
	}
	a.Open(sheet.IDSaved)
	h.frames(2)
	desc := "Logged " + e.Title + " " + e.Time.Format(time.RFC3339)
	if txt := nodeText(h.mustDesc(desc)); !strings.Contains(txt, "after the leak fix") {
		t.Errorf("log row %q lacks the note", txt)
	}
	h.click(h.mustDesc(desc).Desc.Bounds)
	if txt, _ := h.shown("Logged result text"); !strings.Contains(txt, "Inputs:") || !strings.Contains(txt, "Temperature: 293 K") {
		t.Errorf("entry text %q", txt)
	}
}

// TestSetupDeleteUndo deletes a setup and brings it back with Undo; rename
// and duplicate work on the selected setup.
func TestSetupDeleteUndo(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	_, h := keepApp(t, k, sheet.IDGas)
	h.tap("Setups")
	h.retype("Setup name", "", "bench A")
	h.tap("Save as")
	settle(h, k)
	h.tap("bench A")
	h.tap("Duplicate")
	settle(h, k)
	h.mustDesc("Setup bench A copy")
	h.tap("bench A copy")
	h.retype("Setup name", "bench A copy", "bench B")
	h.tap("Rename")
	settle(h, k)
	h.mustDesc("Setup bench B")
	if _, ok := h.byDesc("Setup bench A copy"); ok {
		t.Error("the old name is still listed after Rename")
	}
	h.tap("bench A")
	h.tap("Delete")
	settle(h, k)
	if _, ok := h.byDesc("Setup bench A"); ok {
		t.Fatal("deleted setup still listed")
	}
	if msg, _ := h.shown("Saved work status"); msg != "Deleted “bench A”." {
		t.Errorf("status %q", msg)
	}
	h.tap("Undo")
	settle(h, k)
	h.mustDesc("Setup bench A")
	if n := len(k.Library().Setups); n != 2 {
		t.Errorf("%d setups after undo, want 2", n)
	}
}

// TestExportImportMerge exports everything, imports it into a fresh app
// (all back), then imports again: same-named setups are reported, left as
// they were, and replaced only when asked.
func TestExportImportMerge(t *testing.T) {
	p := &porterFake{}
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a := NewApp(nil)
	a.UseKeeper(k, p)
	a.Open(sheet.IDGas)
	h := newHarness(t, phone, a.Layout)
	h.tap("Setups")
	h.retype("Setup name", "", rigName)
	h.tap("Save as")
	h.tap("Close setups")
	h.tap("Log result")
	settle(h, k)
	a.Open(sheet.IDSaved)
	h.frames(2)
	h.tap("Export everything")
	waitFor(t, h, k, func() bool { msg, _ := h.shown("Saved work status"); return strings.Contains(msg, "exported") })
	if !strings.HasSuffix(p.name, ".json") || !strings.Contains(string(p.data), rigName) {
		t.Fatalf("exported %q: %s", p.name, p.data)
	}

	k2 := NewMemoryKeeper()
	k2.WaitLoaded(5 * time.Second)
	a2 := NewApp(nil)
	a2.UseKeeper(k2, p)
	a2.Open(sheet.IDSaved)
	h2 := newHarness(t, phone, a2.Layout)
	h2.tap("Import a file")
	waitFor(t, h2, k2, func() bool { lib := k2.Library(); return lib != nil && len(lib.Setups) == 1 && len(lib.Log) == 1 })
	h2.mustDesc("Setup " + rigName)
	// The same file again: the setup's name is in use.
	h2.tap("Import a file")
	waitFor(t, h2, k2, func() bool { msg, _ := h2.shown("Saved work status"); return strings.Contains(msg, "same names") })
	if msg, _ := h2.shown("Saved work status"); !strings.Contains(msg, rigName) || !strings.Contains(msg, "left as they were") {
		t.Errorf("conflict report %q", msg)
	}
	h2.tap("Replace those with the imported ones")
	settle(h2, k2)
	if n := len(k2.Library().Setups); n != 1 {
		t.Errorf("%d setups after replacing, want 1", n)
	}
	// A damaged file is refused and nothing changes.
	p.data = []byte(`{"format":"tubewright-library","version":99}`)
	h2.tap("Import a file")
	waitFor(t, h2, k2, func() bool { msg, _ := h2.shown("Saved work status"); return strings.Contains(msg, "failed") })
	if msg, _ := h2.shown("Saved work status"); !strings.Contains(msg, "newer") {
		t.Errorf("refusal %q does not say the file is newer", msg)
	}
}

// phone is the phone screen size of the UI tests.
var phone = shotSizes[0].size

// pathPorterFake is a Porter without a file dialog: it reads what the test
// put at a path.
type pathPorterFake struct {
	porterFake
	files map[string][]byte
}

func (p *pathPorterFake) ImportPath() string { return "/data/import.json" }

func (p *pathPorterFake) ImportFrom(path string) ([]byte, error) {
	if b, ok := p.files[path]; ok {
		return b, nil
	}
	return nil, errors.New("there is no file " + path)
}

// TestImportFromTypedPath imports from the path typed on the Saved work
// page where there is no file dialog.
func TestImportFromTypedPath(t *testing.T) {
	lib := store.NewLibrary()
	lib.Setups = append(lib.Setups, store.Setup{Name: "from a stick", Calculator: string(sheet.IDGas), Inputs: map[string]string{"gas": "argon"}, Saved: time.Now()})
	data, err := lib.Marshal()
	if err != nil {
		t.Fatal(err)
	}
	p := &pathPorterFake{files: map[string][]byte{"/media/usb/rig.json": data}}
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a := NewApp(nil)
	a.UseKeeper(k, p)
	a.Open(sheet.IDSaved)
	h := newHarness(t, phone, a.Layout)
	h.tap("Import a file")
	waitFor(t, h, k, func() bool { msg, _ := h.shown("Saved work status"); return strings.Contains(msg, "/data/import.json") })
	h.retype("File to import", "/data/import.json", "/media/usb/rig.json")
	h.tap("Import a file")
	waitFor(t, h, k, func() bool { _, ok := h.byDesc("Setup from a stick"); return ok })
}

// TestCopyResult puts one result on the clipboard as plain text from the
// bar: title, inputs by label, rows with their units.
func TestCopyResult(t *testing.T) {
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	_, h := keepApp(t, k, sheet.IDGas)
	h.tap("Copy result")
	mime, data, ok := h.r.WriteClipboard()
	text := string(data)
	if !ok || mime != "application/text" {
		t.Fatalf("clipboard written %v, type %q", ok, mime)
	}
	for _, want := range []string{"Working gas, ", "Temperature: 300 K", "Sound speed: ", " m/s"} {
		if !strings.Contains(text, want) {
			t.Errorf("clipboard text lacks %q:\n%s", want, text)
		}
	}
	if msg, _ := h.shown("Saved work status"); !strings.Contains(msg, "clipboard") {
		t.Errorf("status %q", msg)
	}
}
