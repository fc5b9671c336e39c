package store

import (
	"bytes"
	"errors"
	"strings"
	"testing"
)

// TestBackendContract runs the same checks against every back end: a
// missing document is ErrNotFound, a save replaces the whole document,
// names list sorted, delete is idempotent, bad names are refused.
func TestBackendContract(t *testing.T) {
	t.Parallel()
	for name, b := range backends(t) {
		t.Run(name, func(t *testing.T) {
			if _, err := b.Load("library"); !errors.Is(err, ErrNotFound) {
				t.Fatalf("missing document: %v", err)
			}
			for _, doc := range []string{"first version, longer than the second", "second"} {
				if err := b.Save("library", []byte(doc)); err != nil {
					t.Fatal(err)
				}
				got, err := b.Load("library")
				if err != nil || string(got) != doc {
					t.Fatalf("load after save = %q, %v; want %q", got, err, doc)
				}
			}
			if err := b.Save("a-1", []byte("x")); err != nil {
				t.Fatal(err)
			}
			names, err := b.Names()
			if err != nil || strings.Join(names, ",") != "a-1,library" {
				t.Fatalf("names %v, %v", names, err)
			}
			for range 2 {
				if err := b.Delete("a-1"); err != nil {
					t.Fatal(err)
				}
			}
			for _, bad := range []string{"", "../x", ".hidden", "a/b", "a b"} {
				if err := b.Save(bad, nil); err == nil {
					t.Errorf("name %q accepted", bad)
				}
			}
			if b.Kind() == "" {
				t.Error("no words for where documents are kept")
			}
		})
	}
}

// TestShelfOnEveryBackend: setups saved, renamed, duplicated, deleted and
// restored, a log entry added, and everything read back by a new shelf on
// the same back end.
func TestShelfOnEveryBackend(t *testing.T) {
	t.Parallel()
	for name, b := range backends(t) {
		t.Run(name, func(t *testing.T) {
			s, err := OpenShelf(b)
			if err != nil {
				t.Fatal(err)
			}
			st := Setup{Name: "12 bar He-Ar rig", Calculator: "resonance", Inputs: map[string]string{"gas": "helium:0.7,argon:0.3", "pressure": "12 bar"}}
			if err := s.SaveSetup(st, false); err != nil {
				t.Fatal(err)
			}
			if err := s.SaveSetup(st, false); !errors.Is(err, ErrExists) {
				t.Fatalf("saving a used name: %v", err)
			}
			if err := s.DuplicateSetup(st.Name, "copy"); err != nil {
				t.Fatal(err)
			}
			if err := s.RenameSetup("copy", "second rig"); err != nil {
				t.Fatal(err)
			}
			undo, err := s.DeleteSetup("second rig")
			if err != nil {
				t.Fatal(err)
			}
			if _, ok := s.Library().Setup("second rig"); ok {
				t.Fatal("deleted setup still there")
			}
			if err := undo(); err != nil {
				t.Fatal(err)
			}
			e := Entry{Calculator: "gas", Title: "Working gas", Inputs: map[string]string{"gas": "helium"},
				Rows:     []Row{{Key: "sound_speed", Label: "Sound speed", Value: 1019.1, Unit: "m/s", Shown: "1019 m/s"}},
				Verdicts: []Verdict{{Check: "relief", Outcome: "fail", Why: "set above the MAWP"}}, Note: "first fill"}
			if err := s.AddEntry(e); err != nil {
				t.Fatal(err)
			}
			again, err := OpenShelf(b)
			if err != nil || again.Damaged() != nil {
				t.Fatalf("reopen: %v %v", err, again.Damaged())
			}
			lib := again.Library()
			if len(lib.Setups) != 2 || len(lib.Log) != 1 || lib.Log[0].Verdicts[0].Outcome != "fail" || lib.Log[0].Note != "first fill" {
				t.Fatalf("read back %+v", lib)
			}
			if got, _ := lib.Setup("second rig"); got.Inputs["pressure"] != "12 bar" {
				t.Fatalf("restored setup %+v", got)
			}
		})
	}
}

// TestDamagedLibraryIsKept: a document that is not a library opens the
// shelf read-only, keeps the bytes for export, refuses changes, and is set
// aside under a dated name only when asked.
func TestDamagedLibraryIsKept(t *testing.T) {
	t.Parallel()
	for name, b := range backends(t) {
		t.Run(name, func(t *testing.T) {
			raw := []byte(`{"format":"tubewright-library","version":1,"setups":[{"name":`)
			if err := b.Save(libraryDoc, raw); err != nil {
				t.Fatal(err)
			}
			s, err := OpenShelf(b)
			if err != nil {
				t.Fatal(err)
			}
			d := s.Damaged()
			if d == nil || !bytes.Equal(d.Raw, raw) {
				t.Fatalf("damaged = %v", d)
			}
			if err := s.AddEntry(Entry{Calculator: "gas"}); err == nil {
				t.Fatal("a change was written over a damaged library")
			}
			if got, _ := b.Load(libraryDoc); !bytes.Equal(got, raw) {
				t.Fatal("the damaged document changed")
			}
			aside, err := s.SetAside()
			if err != nil {
				t.Fatal(err)
			}
			if got, _ := b.Load(aside); !bytes.Equal(got, raw) {
				t.Fatalf("set-aside copy %q differs", aside)
			}
			if err := s.AddEntry(Entry{Calculator: "gas"}); err != nil {
				t.Fatalf("after setting aside: %v", err)
			}
		})
	}
}

// TestImportRules: export then import into another library merges; names
// in use are reported and not overwritten unless asked; a damaged file, a
// newer version and an oversize file are refused and nothing changes.
func TestImportRules(t *testing.T) {
	t.Parallel()
	src, _ := OpenShelf(NewMemory())
	if err := src.SaveSetup(Setup{Name: "rig A", Calculator: "gas", Inputs: map[string]string{"gas": "argon"}}, false); err != nil {
		t.Fatal(err)
	}
	if err := src.SaveSetup(Setup{Name: "rig B", Calculator: "gas", Inputs: map[string]string{"gas": "neon"}}, false); err != nil {
		t.Fatal(err)
	}
	if err := src.AddEntry(Entry{Calculator: "gas", Note: "n"}); err != nil {
		t.Fatal(err)
	}
	file, err := src.Export()
	if err != nil {
		t.Fatal(err)
	}
	dst, _ := OpenShelf(NewMemory())
	if err := dst.SaveSetup(Setup{Name: "rig A", Calculator: "gas", Inputs: map[string]string{"gas": "xenon"}}, false); err != nil {
		t.Fatal(err)
	}
	added, c, err := dst.Import(file, false)
	if err != nil || added != 2 || len(c.Setups) != 1 || c.Setups[0] != "rig A" {
		t.Fatalf("import: added %d conflicts %+v err %v", added, c, err)
	}
	if a, _ := dst.Library().Setup("rig A"); a.Inputs["gas"] != "xenon" {
		t.Fatal("an import overwrote a setup without being asked")
	}
	if _, _, err := dst.Import(file, true); err != nil {
		t.Fatal(err)
	}
	if a, _ := dst.Library().Setup("rig A"); a.Inputs["gas"] != "argon" {
		t.Fatal("replace did not replace")
	}
	if n := len(dst.Library().Log); n != 1 {
		t.Fatalf("log entries after importing twice: %d, want 1", n)
	}
	before, _ := dst.Export()
	newer := bytes.Replace(file, []byte(`"version": 1`), []byte(`"version": 2`), 1)
	for what, bad := range map[string][]byte{
		"damaged": file[:len(file)/2],
		"newer":   newer,
		"other":   []byte(`{"format":"something-else","version":1}`),
		"oversize": append([]byte(`{"format":"tubewright-library","version":1,"setups":[],"devices":[],"log":[],"saved":"2026-01-01T00:00:00Z"}`),
			bytes.Repeat([]byte(" "), MaxLibraryBytes)...),
	} {
		_, _, err := dst.Import(bad, false)
		if err == nil || !strings.Contains(err.Error(), "nothing changed") {
			t.Errorf("%s file: %v", what, err)
		}
		if after, _ := dst.Export(); !bytes.Equal(before, after) {
			t.Errorf("%s file changed the library", what)
		}
	}
	if _, _, err := dst.Import(newer, false); err == nil || !strings.Contains(err.Error(), "newer") {
		t.Errorf("newer file: message %v does not say so", err)
	}
}

// FuzzParseLibrary: any bytes either parse to a library that validates
// and writes back, or give an error; never a panic.
func FuzzParseLibrary(f *testing.F) {
	lib := NewLibrary()
	lib.Setups = append(lib.Setups, Setup{Name: "a", Calculator: "gas", Inputs: map[string]string{"gas": "helium"}})
	good, _ := lib.Marshal()
	f.Add(good)
	f.Add([]byte(`{"format":"tubewright-library","version":2}`))
	f.Add([]byte(`not json`))
	f.Fuzz(func(t *testing.T, data []byte) {
		l, err := ParseLibrary(data)
		if err != nil {
			return
		}
		if _, err := l.Marshal(); err != nil {
			t.Fatalf("parsed but does not write back: %v", err)
		}
	})
}
