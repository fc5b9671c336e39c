//go:build !js

package main

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"time"

	"gioui.org/app"

	"tubewright/ui"
	"tubewright/ui/store"
)

// openStorage keeps the user's work in files in the app's data folder
// (Gio's app.DataDir plus "tubewright"), written atomically. The keeper
// loads on its own goroutine; the window waits up to two seconds for it so
// the first frame already shows the last inputs.
func openStorage() (*ui.Keeper, ui.Porter) {
	base, err := app.DataDir()
	dir := filepath.Join(base, "tubewright")
	k := ui.NewKeeper(func() (store.Backend, error) {
		if err != nil {
			return nil, fmt.Errorf("no data folder: %v", err)
		}
		return store.NewFiles(dir)
	})
	k.WaitLoaded(2 * time.Second)
	return k, folderPorter{dir: dir}
}

// closeStorage writes what is still pending before the app exits.
func closeStorage(k *ui.Keeper) {
	done := make(chan struct{})
	go func() { k.Flush(); close(done) }()
	select {
	case <-done:
	case <-time.After(5 * time.Second):
	}
}

// folderPorter writes export files into the data folder's "exports"
// folder and reads an import file from the data folder ("import.json"):
// the desktop build has no file dialog (the one Gio's extension module
// offers for this Gio version was not taken; see the package notes).
type folderPorter struct{ dir string }

// Export implements ui.Porter.
func (p folderPorter) Export(name string, data []byte) (string, error) {
	path := filepath.Join(p.dir, "exports", name)
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		return "", err
	}
	if err := store.WriteFileAtomic(path, data, 0o644); err != nil {
		return "", err
	}
	return "saved as " + path, nil
}

// Import implements ui.Porter.
func (p folderPorter) Import() ([]byte, error) {
	path := filepath.Join(p.dir, "import.json")
	data, err := os.ReadFile(path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil, fmt.Errorf("put the file to import at %s and tap Import again", path)
	}
	if err != nil {
		return nil, err
	}
	if len(data) > store.MaxLibraryBytes {
		return nil, fmt.Errorf("%s is %d bytes, more than the %d MB a library may have", path, len(data), store.MaxLibraryBytes>>20)
	}
	return data, nil
}
