package store

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"sort"
	"strings"
)

// Files keeps each document as a file NAME.json in a folder (the app's
// data folder, Gio's app.DataDir plus "tubewright"), written atomically
// with WriteFileAtomic.
type Files struct {
	Dir string
}

// NewFiles returns a backend in dir, creating the folder when missing.
func NewFiles(dir string) (*Files, error) {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, fmt.Errorf("store: %w", err)
	}
	return &Files{Dir: dir}, nil
}

func (f *Files) path(name string) string { return filepath.Join(f.Dir, name+".json") }

// Load implements Backend.
func (f *Files) Load(name string) ([]byte, error) {
	if err := checkName(name); err != nil {
		return nil, err
	}
	b, err := os.ReadFile(f.path(name))
	if errors.Is(err, fs.ErrNotExist) {
		return nil, fmt.Errorf("store: %s: %w", name, ErrNotFound)
	}
	return b, err
}

// Save implements Backend.
func (f *Files) Save(name string, data []byte) error {
	if err := checkName(name); err != nil {
		return err
	}
	return WriteFileAtomic(f.path(name), data, 0o644)
}

// Delete implements Backend.
func (f *Files) Delete(name string) error {
	if err := checkName(name); err != nil {
		return err
	}
	err := os.Remove(f.path(name))
	if errors.Is(err, fs.ErrNotExist) {
		return nil
	}
	return err
}

// Names implements Backend.
func (f *Files) Names() ([]string, error) {
	ents, err := os.ReadDir(f.Dir)
	if err != nil {
		return nil, err
	}
	var out []string
	for _, e := range ents {
		if n, ok := strings.CutSuffix(e.Name(), ".json"); ok && !e.IsDir() && checkName(n) == nil {
			out = append(out, n)
		}
	}
	sort.Strings(out)
	return out, nil
}

// Kind implements Backend.
func (f *Files) Kind() string { return "files in " + f.Dir }

// Persistence implements Backend: files stay.
func (f *Files) Persistence() Persistence { return PersistGranted }
