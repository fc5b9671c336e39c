//go:build !js

package main

import (
	"bytes"
	"errors"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gioui.org/x/explorer"

	"tubewright/ui"
	"tubewright/ui/store"
)

// fakeDialog stands in for the desktop's file dialog: it answers with
// chosen (a file's bytes), or with err, and keeps what was written.
type fakeDialog struct {
	chosen  []byte
	err     error
	written bytes.Buffer
	name    string
}

func (f *fakeDialog) ChooseFile(...string) (io.ReadCloser, error) {
	if f.err != nil {
		return nil, f.err
	}
	return io.NopCloser(bytes.NewReader(f.chosen)), nil
}

type nopWriteCloser struct{ io.Writer }

func (nopWriteCloser) Close() error { return nil }

func (f *fakeDialog) CreateFile(name string) (io.WriteCloser, error) {
	if f.err != nil {
		return nil, f.err
	}
	f.name = name
	return nopWriteCloser{&f.written}, nil
}

// TestDialogPorter: export and import go through the dialog; a declined
// dialog is a cancel that changes nothing; where the desktop has no dialog
// the export falls back to the data folder and says so, and an import asks
// for a typed path; a typed path is read without the dialog; an oversize
// file is refused.
func TestDialogPorter(t *testing.T) {
	dir := t.TempDir()
	folder := folderPorter{dir: dir}

	d := &fakeDialog{}
	p := dialogPorter{dialog: d, folder: folder}
	where, err := p.Export("tw.json", []byte(`{"x":1}`))
	if err != nil || d.written.String() != `{"x":1}` || d.name != "tw.json" || !strings.Contains(where, "where you chose") {
		t.Fatalf("export through the dialog: %q %v, wrote %q as %q", where, err, d.written.String(), d.name)
	}
	d.chosen = []byte(`{"format":"tubewright-library"}`)
	if got, err := p.Import(); err != nil || !bytes.Equal(got, d.chosen) {
		t.Fatalf("import through the dialog: %q %v", got, err)
	}
	if p.ImportPath() != "" {
		t.Errorf("the path field should start empty so that Import opens the dialog")
	}

	d.err = explorer.ErrUserDecline
	if _, err := p.Export("tw.json", []byte("x")); !errors.Is(err, ui.ErrCancelled) {
		t.Errorf("declined export: %v", err)
	}
	if _, err := p.Import(); !errors.Is(err, ui.ErrCancelled) {
		t.Errorf("declined import: %v", err)
	}

	d.err = errors.New("no desktop portal")
	where, err = p.Export("tw.json", []byte("kept"))
	if err != nil || !strings.Contains(where, "no file dialog") {
		t.Fatalf("export without a dialog: %q %v", where, err)
	}
	if got, _ := os.ReadFile(filepath.Join(dir, "exports", "tw.json")); string(got) != "kept" {
		t.Errorf("fallback export wrote %q", got)
	}
	if _, err := p.Import(); err == nil || !strings.Contains(err.Error(), "type the path") {
		t.Errorf("import without a dialog: %v", err)
	}
	path := filepath.Join(dir, "in.json")
	if err := os.WriteFile(path, []byte("typed"), 0o644); err != nil {
		t.Fatal(err)
	}
	if got, err := p.ImportFrom(path); err != nil || string(got) != "typed" {
		t.Errorf("typed path: %q %v", got, err)
	}

	d.err, d.chosen = nil, bytes.Repeat([]byte(" "), store.MaxLibraryBytes+1)
	if _, err := p.Import(); err == nil || !strings.Contains(err.Error(), "larger") {
		t.Errorf("oversize file: %v", err)
	}
}
