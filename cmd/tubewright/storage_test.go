//go:build !js

package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"tubewright/ui/store"
)

// TestFolderPorter writes an export into the data folder and reads it back
// from a typed path; a missing file and a file over the size limit are
// refused with a message naming the path.
func TestFolderPorter(t *testing.T) {
	dir := t.TempDir()
	p := folderPorter{dir: dir}
	where, err := p.Export("tubewright-x.json", []byte(`{"a":1}`))
	want := filepath.Join(dir, "exports", "tubewright-x.json")
	if err != nil || !strings.Contains(where, want) {
		t.Fatalf("export: %q, %v; want it saved as %s", where, err, want)
	}
	got, err := p.ImportFrom(want)
	if err != nil || string(got) != `{"a":1}` {
		t.Fatalf("import of the export: %q, %v", got, err)
	}
	if _, err := p.Import(); err == nil || !strings.Contains(err.Error(), p.ImportPath()) {
		t.Errorf("import with no import.json: %v, want a message naming %s", err, p.ImportPath())
	}
	big := filepath.Join(dir, "big.json")
	if err := os.WriteFile(big, make([]byte, store.MaxLibraryBytes+1), 0o644); err != nil {
		t.Fatal(err)
	}
	if _, err := p.ImportFrom(big); err == nil || !strings.Contains(err.Error(), "more than") {
		t.Errorf("oversized import: %v", err)
	}
	if _, err := p.ImportFrom(""); err == nil {
		t.Error("an empty path was accepted")
	}
}

// TestOpenStorage keeps the work in files under the data folder that Gio
// names (here a temporary configuration folder).
func TestOpenStorage(t *testing.T) {
	dir := t.TempDir()
	t.Setenv("XDG_CONFIG_HOME", dir)
	t.Setenv("HOME", dir)
	k, _, _ := openStorage(nil)
	if !k.Loaded() {
		t.Fatal("the files did not load before the first frame")
	}
	kind, persist, ok := k.Where()
	if !ok || !strings.Contains(kind, filepath.Join(dir)) || !strings.HasSuffix(kind, "tubewright") || persist != store.PersistGranted {
		t.Fatalf("kept in %q (%v), %v; want files under %s", kind, ok, persist, dir)
	}
}
