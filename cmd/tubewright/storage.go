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
	"gioui.org/io/event"
	"gioui.org/x/explorer"

	"tubewright/ui"
	"tubewright/ui/store"
)

// openStorage keeps the user's work in files in the app's data folder
// (Gio's app.DataDir plus "tubewright"), written atomically. The keeper
// loads on its own goroutine; the window waits up to two seconds for it so
// the first frame already shows the last inputs.
//
// Export and import go through the desktop's file dialog (dialogPorter);
// listen must see every window event, for the dialog to know the window.
func openStorage(w *app.Window) (k *ui.Keeper, p ui.Porter, listen func(event.Event)) {
	base, err := app.DataDir()
	dir := filepath.Join(base, "tubewright")
	k = ui.NewKeeper(func() (store.Backend, error) {
		if err != nil {
			return nil, fmt.Errorf("no data folder: %v", err)
		}
		return store.NewFiles(dir)
	})
	k.WaitLoaded(2 * time.Second)
	ex := explorer.NewExplorer(w)
	return k, dialogPorter{dialog: ex, folder: folderPorter{dir: dir}}, ex.ListenEvents
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
// folder and reads an import file from a path the user types (the data
// folder's "import.json" at first): what dialogPorter falls back to where
// the desktop offers no file dialog.
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

// Import implements ui.Porter: the file at ImportPath.
func (p folderPorter) Import() ([]byte, error) { return p.ImportFrom(p.ImportPath()) }

// ImportPath implements ui.PathPorter.
func (p folderPorter) ImportPath() string { return filepath.Join(p.dir, "import.json") }

// ImportFrom implements ui.PathPorter.
func (p folderPorter) ImportFrom(path string) ([]byte, error) {
	if path == "" {
		return nil, errors.New("type the path of the file to import")
	}
	st, err := os.Stat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil, fmt.Errorf("there is no file %s", path)
	}
	if err != nil {
		return nil, err
	}
	if st.Size() > store.MaxLibraryBytes {
		return nil, fmt.Errorf("%s is %d bytes, more than the %d MB a library may have", path, st.Size(), store.MaxLibraryBytes>>20)
	}
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, err
	}
	return data, nil
}
