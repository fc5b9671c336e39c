package ui

import (
	"encoding/json"
	"image"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"time"

	"tubewright/calc/safety"
	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// richPass is a pass with every part a pass can have.
func richPass() store.Pass {
	return store.Pass{
		Time:  time.Date(2026, 12, 2, 9, 15, 30, 0, time.FixedZone("CET", 3600)),
		Title: "Safety pass before pressurising",
		Rig:   "12 bar rig",
		Notes: "all good",
		Items: []store.Item{
			{ID: "rating", Title: "Vessel rating and markings known", Done: true, Note: "plate read"},
			{ID: "relief", Title: "Relief device set at or below the MAWP", Done: false,
				Inputs:   []store.ItemInput{{Key: "relief-set", Label: "Relief set pressure", Text: "30 barg"}, {Key: "mawp", Label: "Vessel MAWP", Text: "25 barg"}},
				Numbers:  []store.Number{{Name: "Margin", Value: -5e5, Unit: "Pa", Shown: "-5 bar"}, {Name: "Ratio", Value: 0, Unit: "1"}},
				Cautions: []string{"Relief first."},
				Verdicts: []store.ItemVerdict{{Check: "relief_check", Outcome: "fail", Why: "above the MAWP"}}},
			{ID: "hearing", Title: "Hearing protection", Done: true,
				Verdicts: []store.ItemVerdict{{Check: "spl", Outcome: "warn", Why: "near the limit"}}},
		},
		Cautions: []string{safety.CautionGeneral, "Relief first."},
	}
}

// TestBenchLogEntryRoundTrip: a pass kept as a log entry reads back the
// same, also after the library is written and parsed, and its entry carries
// the inputs and verdicts where a program reading the export finds them.
func TestBenchLogEntryRoundTrip(t *testing.T) {
	p := richPass()
	e := passEntry(p)
	if e.Calculator != "safety" || e.Inputs["relief/relief-set"] != "30 barg" || e.Inputs["rig"] != "12 bar rig" {
		t.Errorf("entry inputs %q", e.Inputs)
	}
	if len(e.Verdicts) != 2 || e.Verdicts[0] != (store.Verdict{Check: "relief/relief_check", Outcome: "fail", Why: "above the MAWP"}) {
		t.Errorf("entry verdicts %+v", e.Verdicts)
	}
	lib := store.NewLibrary()
	lib.Log = append(lib.Log, e)
	data, err := lib.Marshal()
	if err != nil {
		t.Fatal(err)
	}
	back, err := store.ParseLibrary(data)
	if err != nil {
		t.Fatal(err)
	}
	got, err := entryPass(back.Log[0])
	if err != nil {
		t.Fatal(err)
	}
	if !got.Time.Equal(p.Time) {
		t.Errorf("time %v, want %v", got.Time, p.Time)
	}
	got.Time = p.Time
	if !reflect.DeepEqual(got, p) {
		g, _ := json.Marshal(got)
		w, _ := json.Marshal(p)
		t.Errorf("round trip:\n got %s\nwant %s", g, w)
	}
	if got.Text() != p.Text() {
		t.Errorf("text differs:\n%s\nwant\n%s", got.Text(), p.Text())
	}
}

// TestBenchLogEntryRefusesStrangers: entries that do not follow the layout
// are errors, not passes with missing parts.
func TestBenchLogEntryRefusesStrangers(t *testing.T) {
	cases := map[string]func(e *store.Entry){
		"row before its item":     func(e *store.Entry) { e.Rows[0], e.Rows[2] = e.Rows[2], e.Rows[0] },
		"unknown row kind":        func(e *store.Entry) { e.Rows[1].Key = "rating/colour" },
		"tick neither way":        func(e *store.Entry) { e.Rows[0].Shown = "maybe" },
		"verdict of no item":      func(e *store.Entry) { e.Verdicts[0].Check = "boiler/relief_check" },
		"no cautions":             func(e *store.Entry) { e.Cautions = nil },
		"item twice":              func(e *store.Entry) { e.Rows = append(e.Rows, e.Rows[0]) },
		"item row made a sub-row": func(e *store.Entry) { e.Rows[len(e.Rows)-1].Key = "hearing/number" },
	}
	for name, spoil := range cases {
		e := passEntry(richPass())
		spoil(&e)
		if _, err := entryPass(e); err == nil {
			t.Errorf("%s: read as a pass", name)
		}
	}
}

// benchApp is an app on the keeper k with no older bench log file (or the
// one at path), showing screen id at phone size.
func benchApp(t *testing.T, k *Keeper, path, id string) (*App, *harness) {
	t.Helper()
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	useBookAt(a.Env(), path)
	a.Open(sheet.ID(id))
	h := newHarness(t, image.Pt(412, 6000), a.Layout)
	settle(h, k)
	return a, h
}

// TestBenchLogSurvivesReload saves a pass through the safety screen, then
// builds a new app on the same storage (a reload in the browser): the
// bench log lists the pass with its inputs and verdicts.
func TestBenchLogSurvivesReload(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	a, h := benchApp(t, k, "", "safety")
	s := a.Screen("safety").(*safetyScreen)
	s.now = func() time.Time { return time.Date(2026, 12, 3, 10, 5, 0, 0, time.UTC) }
	h.tap("Done: Vessel rating and markings known")
	h.tap("Next ›")
	h.retype("Allowable stress at the hot-end temperature", "", "138 MPa")
	h.tap("Next ›")
	h.retype("Relief set pressure", "", "30 barg")
	h.tap("Review")
	h.tap("Save to the bench log")
	if st, _ := h.shown("Save status"); !strings.HasPrefix(st, "Saved 2026-12-03 10:05 with 1 of 11") || !strings.Contains(st, "memory only") {
		t.Fatalf("save status %q", st)
	}
	settle(h, k)
	if b, err := mem.Load("library"); err != nil || !strings.Contains(string(b), `"calculator": "safety"`) {
		t.Fatalf("library after save: %v\n%s", err, b)
	}

	k2 := on(mem)
	a2, h2 := benchApp(t, k2, "", "benchlog")
	if a2.Current() != "benchlog" {
		t.Fatalf("top is %q", a2.Current())
	}
	waitFor(t, h2, k2, func() bool { return h2.hasLabel("2026-12-03 10:05 · 1 of 11 ticked") })
	if !h2.hasLabel("1 saved pass") {
		t.Errorf("count missing:\n%s", h2.dump())
	}
	// The pass text is a selectable label, which gives the semantic tree
	// no text: read what the screen lays out.
	if _, ok := h2.byDesc("Pass text"); !ok {
		t.Fatalf("no pass text:\n%s", h2.dump())
	}
	lg := a2.Screen("benchlog").(*benchLogScreen)
	text := lg.passes[lg.open].Text()
	for _, want := range []string{"[x] Vessel rating", "Allowable stress at the hot-end temperature: 138 MPa",
		"Relief set pressure: 30 barg", "PASS relief_check", "CAUTIONS"} {
		if !strings.Contains(text, want) {
			t.Errorf("pass text lacks %q:\n%s", want, text)
		}
	}
	h2.tap("Export as text")
	if st, _ := h2.shown("Export status"); !strings.HasPrefix(st, "No file system here") {
		t.Errorf("export status %q", st)
	}
	if !h2.hasLabel("keeps your saved work in memory only") {
		t.Errorf("where note missing:\n%s", h2.dump())
	}
}

// TestBenchLogReadsOlderFile: passes of the older bench log file are
// listed beside those of the log, copied into the log once, and the file
// is left as it was; a damaged older file is reported and can be set aside.
func TestBenchLogReadsOlderFile(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "benchlog.json")
	old := richPass()
	old.Time = time.Date(2025, 6, 1, 8, 0, 0, 0, time.UTC)
	if err := store.Append(path, old); err != nil {
		t.Fatal(err)
	}
	before, _ := os.ReadFile(path)
	mem := store.NewMemory()
	newer := passEntry(richPass())
	lib := store.NewLibrary()
	lib.Log = append(lib.Log, newer)
	data, _ := lib.Marshal()
	if err := mem.Save("library", data); err != nil {
		t.Fatal(err)
	}
	for round := 1; round <= 2; round++ {
		k := on(mem)
		_, h := benchApp(t, k, path, "benchlog")
		waitFor(t, h, k, func() bool { return h.hasLabel("2 saved passes") })
		for _, row := range []string{"2025-06-01 08:00 · 2 of 3 ticked · 12 bar rig", "2026-12-02 09:15 · 2 of 3 ticked · 12 bar rig"} {
			if !h.hasLabel(row) {
				t.Errorf("round %d: row %q missing:\n%s", round, row, h.dump())
			}
		}
		waitFor(t, h, k, func() bool { l := k.Library(); return l != nil && len(l.Log) == 2 })
		settle(h, k)
		if n := len(k.Library().Log); n != 2 {
			t.Errorf("round %d: %d log entries, want 2 (copied once)", round, n)
		}
		if !h.hasLabel("The older bench log file is read too") {
			t.Errorf("round %d: the older file is not named:\n%s", round, h.dump())
		}
	}
	if after, _ := os.ReadFile(path); string(after) != string(before) {
		t.Error("the older bench log file was changed")
	}

	// A damaged older file: reported with its way out; the log still shows.
	bad := []byte(`{"format":"tubewright-benchlog","vers`)
	if err := os.WriteFile(path, bad, 0o600); err != nil {
		t.Fatal(err)
	}
	k := on(mem)
	a, h := benchApp(t, k, path, "benchlog")
	a.Screen("benchlog").(*benchLogScreen).now = func() time.Time { return time.Date(2026, 12, 4, 7, 0, 0, 0, time.UTC) }
	if v, _ := h.shown("Bench log error"); !strings.Contains(v, "damaged") {
		t.Errorf("damaged file not reported: %q\n%s", v, h.dump())
	}
	if !h.hasLabel("2 saved passes") || !h.hasLabel(safety.CautionGeneral) {
		t.Errorf("log or caution missing beside the damaged file:\n%s", h.dump())
	}
	h.tap("Set the damaged log aside")
	if b, err := os.ReadFile(path + ".damaged-20261204T070000"); err != nil || string(b) != string(bad) {
		t.Fatalf("set-aside file: %q, %v", b, err)
	}
	if _, ok := h.shown("Bench log error"); ok {
		t.Errorf("still reported after setting aside:\n%s", h.dump())
	}
}

// TestBenchLogShowsFailedSave: a pass the storage refused is not listed,
// and the bench log says why in the error colour.
func TestBenchLogShowsFailedSave(t *testing.T) {
	k := on(&failing{})
	a, h := benchApp(t, k, "", "safety")
	a.Screen("safety").(*safetyScreen).now = func() time.Time { return time.Date(2026, 12, 3, 11, 0, 0, 0, time.UTC) }
	h.tap("Review")
	h.tap("Save to the bench log")
	settle(h, k)
	h.tap("Open the bench log")
	settle(h, k)
	if v, _ := h.shown("Bench log error"); !strings.Contains(v, "Saving the safety pass failed: disk full") {
		t.Errorf("failure not shown: %q\n%s", v, h.dump())
	}
	if !h.hasLabel("No safety pass saved yet") {
		t.Errorf("a refused pass is listed:\n%s", h.dump())
	}
}

// TestBenchLogOnFiles: on the desktop's file storage the pass lands in the
// library file of the data folder and a new app finds it there; the note
// says where.
func TestBenchLogOnFiles(t *testing.T) {
	dir := t.TempDir()
	files, err := store.NewFiles(dir)
	if err != nil {
		t.Fatal(err)
	}
	k := on(files)
	a, h := benchApp(t, k, filepath.Join(dir, "none", "benchlog.json"), "safety")
	a.Screen("safety").(*safetyScreen).now = func() time.Time { return time.Date(2026, 12, 3, 12, 0, 0, 0, time.UTC) }
	h.tap("Review")
	h.tap("Save to the bench log")
	if st, _ := h.shown("Save status"); !strings.Contains(st, "Kept in: files in "+dir+".") {
		t.Errorf("save status %q", st)
	}
	settle(h, k)

	again, err := store.NewFiles(dir)
	if err != nil {
		t.Fatal(err)
	}
	k2 := on(again)
	_, h2 := benchApp(t, k2, filepath.Join(dir, "none", "benchlog.json"), "benchlog")
	waitFor(t, h2, k2, func() bool { return h2.hasLabel("2026-12-03 12:00 · 0 of 11 ticked") })
	if h2.hasLabel("older bench log file") {
		t.Errorf("a missing older file is named:\n%s", h2.dump())
	}
}
