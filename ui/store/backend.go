package store

import (
	"errors"
	"fmt"
	"strings"
)

// Backend keeps whole documents by name. Save replaces a document at once:
// a reader sees the previous version or the new one, never a mix, and the
// previous version stays until the new one is committed. Implementations:
// Files (desktop and Android: the app's data folder), Memory (tests), and
// in the browser IndexedDB with a localStorage fallback (NewBrowser, js
// builds only).
type Backend interface {
	// Load returns the document name, or an error wrapping ErrNotFound.
	Load(name string) ([]byte, error)
	// Save replaces the document name with data, atomically.
	Save(name string, data []byte) error
	// Delete removes the document name; a missing one is not an error.
	Delete(name string) error
	// Names lists the documents kept, sorted.
	Names() ([]string, error)
	// Kind says in plain words where documents are kept ("files in
	// /home/x/.local/share/tubewright", "browser storage (IndexedDB)").
	Kind() string
	// Persistence says whether the storage survives the browser clearing
	// space on its own; file storage always does.
	Persistence() Persistence
}

// ErrNotFound is wrapped by Load's error for a document that does not
// exist.
var ErrNotFound = errors.New("not found")

// Persistence is what a browser granted when asked to keep the app's
// storage (navigator.storage.persist).
type Persistence int

// The answers.
const (
	PersistUnknown Persistence = iota // not asked, or the browser cannot say
	PersistGranted                    // kept until the user clears it
	PersistDenied                     // the browser may clear it when space runs low
)

// String says it in plain words.
func (p Persistence) String() string {
	switch p {
	case PersistGranted:
		return "kept until you clear it"
	case PersistDenied:
		return "the browser may clear it when space runs low"
	}
	return "not known whether the browser keeps it"
}

// checkName refuses document names that could escape a folder or are not
// plain: letters, digits, '-', '_' and '.', not starting with '.'.
func checkName(name string) error {
	if name == "" || len(name) > 100 || strings.HasPrefix(name, ".") {
		return fmt.Errorf("store: bad document name %q", name)
	}
	for _, r := range name {
		ok := r == '-' || r == '_' || r == '.' || (r >= 'a' && r <= 'z') || (r >= 'A' && r <= 'Z') || (r >= '0' && r <= '9')
		if !ok {
			return fmt.Errorf("store: bad document name %q", name)
		}
	}
	return nil
}
