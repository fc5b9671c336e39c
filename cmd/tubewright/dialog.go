//go:build !js

package main

import (
	"errors"
	"fmt"
	"io"

	"gioui.org/x/explorer"

	"tubewright/ui"
	"tubewright/ui/store"
)

// fileDialog is what dialogPorter needs of gioui.org/x/explorer: the
// system's dialogs to choose a file to read and a place to write one.
// Both block until the user answers (the app calls them off the UI
// goroutine).
type fileDialog interface {
	ChooseFile(extensions ...string) (io.ReadCloser, error)
	CreateFile(name string) (io.WriteCloser, error)
}

// dialogPorter moves export files through the desktop's file dialog
// (gioui.org/x/explorer: the desktop portal over D-Bus on Linux, the
// system dialogs on Windows and macOS). Where the desktop offers none, an
// export goes to the data folder's "exports" folder and an import reads a
// path typed on the Saved work page, as folderPorter does; the message
// says which happened.
type dialogPorter struct {
	dialog fileDialog
	folder folderPorter
}

// Export implements ui.Porter.
func (p dialogPorter) Export(name string, data []byte) (string, error) {
	w, err := p.dialog.CreateFile(name)
	switch {
	case errors.Is(err, explorer.ErrUserDecline):
		return "", fmt.Errorf("%w; nothing was exported", ui.ErrCancelled)
	case err != nil:
		where, ferr := p.folder.Export(name, data)
		if ferr != nil {
			return "", ferr
		}
		return "no file dialog on this desktop (" + err.Error() + "), so " + where, nil
	}
	if _, err := w.Write(data); err != nil {
		w.Close()
		return "", err
	}
	if err := w.Close(); err != nil {
		return "", err
	}
	return "saved as " + name + " where you chose", nil
}

// Import implements ui.Porter: a file chosen in the dialog.
func (p dialogPorter) Import() ([]byte, error) { return p.ImportFrom("") }

// ImportPath implements ui.PathPorter: empty, so that Import opens the
// dialog unless a path is typed.
func (p dialogPorter) ImportPath() string { return "" }

// PathHint is the hint of the Saved work page's path field.
func (p dialogPorter) PathHint() string {
	return "Leave empty to choose the file in a dialog, or type its path"
}

// ImportFrom implements ui.PathPorter: the file at path, or with path
// empty the file chosen in the dialog (at most store.MaxLibraryBytes).
func (p dialogPorter) ImportFrom(path string) ([]byte, error) {
	if path != "" {
		return p.folder.ImportFrom(path)
	}
	r, err := p.dialog.ChooseFile(".json")
	switch {
	case errors.Is(err, explorer.ErrUserDecline):
		return nil, ui.ErrCancelled
	case err != nil:
		return nil, fmt.Errorf("no file dialog on this desktop (%v): type the path of the file to import", err)
	}
	defer r.Close()
	data, err := io.ReadAll(io.LimitReader(r, store.MaxLibraryBytes+1))
	if err != nil {
		return nil, err
	}
	if len(data) > store.MaxLibraryBytes {
		return nil, fmt.Errorf("the file chosen is larger than the %d MB a library may have", store.MaxLibraryBytes>>20)
	}
	return data, nil
}
