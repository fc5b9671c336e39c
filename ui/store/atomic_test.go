package store

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"
)

func TestWriteFileAtomic(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	path := filepath.Join(dir, "f.json")
	if err := WriteFileAtomic(path, []byte("first"), 0o600); err != nil {
		t.Fatal(err)
	}
	if err := WriteFileAtomic(path, []byte("second, longer"), 0o640); err != nil {
		t.Fatal(err)
	}
	got, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(got, []byte("second, longer")) {
		t.Errorf("content %q, want %q", got, "second, longer")
	}
	st, err := os.Stat(path)
	if err != nil {
		t.Fatal(err)
	}
	if st.Mode().Perm() != 0o640 {
		t.Errorf("perm %v, want 0640", st.Mode().Perm())
	}
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	if len(entries) != 1 {
		var names []string
		for _, e := range entries {
			names = append(names, e.Name())
		}
		t.Errorf("directory holds %v, want only f.json (no temporary files left)", names)
	}
}

func TestWriteFileAtomicMissingDir(t *testing.T) {
	t.Parallel()
	path := filepath.Join(t.TempDir(), "no", "such", "dir", "f.json")
	if err := WriteFileAtomic(path, []byte("x"), 0o600); err == nil {
		t.Error("want an error for a missing directory")
	}
}
