package store

import (
	"encoding/json"
	"errors"
	"fmt"
	"sync"
	"time"
)

// libraryDoc is the name of the library document in a Backend.
const libraryDoc = "library"

// DamagedLibrary reports a library document that exists but cannot be
// read. Its bytes are kept (Raw) so that the user can export them; nothing
// is written over them until the user sets them aside.
type DamagedLibrary struct {
	Raw []byte
	Err error
}

// Error says what is wrong and that the document was kept.
func (e *DamagedLibrary) Error() string {
	return fmt.Sprintf("your saved setups and log could not be read (%v); they were kept as they are: export the raw text, or set it aside to start afresh", e.Err)
}

// Unwrap returns the reason.
func (e *DamagedLibrary) Unwrap() error { return e.Err }

// ErrExists is returned when a name is already used by a setup or device.
var ErrExists = errors.New("that name is already used")

// Shelf is the user's library kept in a Backend: every change is applied
// to a copy, written whole, and only then becomes the shelf's library, so
// a failed write changes nothing. Safe for use from several goroutines.
type Shelf struct {
	mu      sync.Mutex
	b       Backend
	lib     *Library
	damaged *DamagedLibrary
	now     func() time.Time
}

// OpenShelf loads the library from b. A missing document is an empty
// library; a damaged one opens the shelf read-only and is reported by
// Damaged until SetAside.
func OpenShelf(b Backend) (*Shelf, error) {
	s := &Shelf{b: b, lib: NewLibrary(), now: time.Now}
	data, err := b.Load(libraryDoc)
	switch {
	case errors.Is(err, ErrNotFound):
		return s, nil
	case err != nil:
		return nil, err
	}
	lib, err := ParseLibrary(data)
	if err != nil {
		s.damaged = &DamagedLibrary{Raw: data, Err: err}
		return s, nil
	}
	s.lib = lib
	return s, nil
}

// Backend returns where the shelf keeps its library.
func (s *Shelf) Backend() Backend { return s.b }

// Damaged returns the damaged document, or nil.
func (s *Shelf) Damaged() *DamagedLibrary {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.damaged
}

// SetAside keeps a damaged document under a dated name and starts an empty
// library; it returns that name.
func (s *Shelf) SetAside() (string, error) {
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.damaged == nil {
		return "", nil
	}
	name := "library-damaged-" + s.now().UTC().Format("20060102-150405")
	if err := s.b.Save(name, s.damaged.Raw); err != nil {
		return "", err
	}
	s.damaged = nil
	s.lib = NewLibrary()
	return name, nil
}

// Library returns a copy of the library.
func (s *Shelf) Library() *Library {
	s.mu.Lock()
	defer s.mu.Unlock()
	return copyLibrary(s.lib)
}

func copyLibrary(l *Library) *Library {
	c := *l
	c.Setups = append([]Setup(nil), l.Setups...)
	c.Devices = append([]Device(nil), l.Devices...)
	c.Log = append([]Entry(nil), l.Log...)
	return &c
}

// Update applies change to a copy of the library, writes it and keeps it.
// An error from change or from the write leaves the shelf as it was.
func (s *Shelf) Update(change func(l *Library) error) error {
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.damaged != nil {
		return s.damaged
	}
	next := copyLibrary(s.lib)
	if err := change(next); err != nil {
		return err
	}
	next.Saved = s.now()
	data, err := next.Marshal()
	if err != nil {
		return err
	}
	if err := s.b.Save(libraryDoc, data); err != nil {
		return err
	}
	s.lib = next
	return nil
}

// SaveSetup saves st under its name ("save as"); with replace false a used
// name is refused with ErrExists.
func (s *Shelf) SaveSetup(st Setup, replace bool) error {
	if err := checkItemName(st.Name); err != nil {
		return err
	}
	if st.Saved.IsZero() {
		st.Saved = s.now()
	}
	return s.Update(func(l *Library) error {
		if i := indexSetup(l.Setups, st.Name); i >= 0 {
			if !replace {
				return fmt.Errorf("setup %q: %w", st.Name, ErrExists)
			}
			l.Setups[i] = st
			return nil
		}
		l.Setups = append(l.Setups, st)
		return nil
	})
}

// RenameSetup renames a setup; the new name must be free.
func (s *Shelf) RenameSetup(old, name string) error {
	if err := checkItemName(name); err != nil {
		return err
	}
	return s.Update(func(l *Library) error {
		i := indexSetup(l.Setups, old)
		if i < 0 {
			return fmt.Errorf("no setup named %q", old)
		}
		if indexSetup(l.Setups, name) >= 0 {
			return fmt.Errorf("setup %q: %w", name, ErrExists)
		}
		l.Setups[i].Name = name
		return nil
	})
}

// DuplicateSetup copies a setup under a new name.
func (s *Shelf) DuplicateSetup(name, copyName string) error {
	st, ok := s.Library().Setup(name)
	if !ok {
		return fmt.Errorf("no setup named %q", name)
	}
	st.Name, st.Saved = copyName, s.now()
	st.Inputs = copyMap(st.Inputs)
	return s.SaveSetup(st, false)
}

// DeleteSetup removes a setup and returns a function that puts it back
// (the undo).
func (s *Shelf) DeleteSetup(name string) (undo func() error, err error) {
	var gone Setup
	err = s.Update(func(l *Library) error {
		i := indexSetup(l.Setups, name)
		if i < 0 {
			return fmt.Errorf("no setup named %q", name)
		}
		gone = l.Setups[i]
		l.Setups = append(l.Setups[:i:i], l.Setups[i+1:]...)
		return nil
	})
	if err != nil {
		return nil, err
	}
	return func() error { return s.SaveSetup(gone, false) }, nil
}

// SaveDevice saves a device under its name; with replace false a used name
// is refused with ErrExists.
func (s *Shelf) SaveDevice(d Device, replace bool) error {
	if err := checkItemName(d.Name); err != nil {
		return err
	}
	if d.Saved.IsZero() {
		d.Saved = s.now()
	}
	return s.Update(func(l *Library) error {
		if i := indexDevice(l.Devices, d.Name); i >= 0 {
			if !replace {
				return fmt.Errorf("device %q: %w", d.Name, ErrExists)
			}
			l.Devices[i] = d
			return nil
		}
		l.Devices = append(l.Devices, d)
		return nil
	})
}

// RenameDevice renames a device; the new name must be free.
func (s *Shelf) RenameDevice(old, name string) error {
	if err := checkItemName(name); err != nil {
		return err
	}
	return s.Update(func(l *Library) error {
		i := indexDevice(l.Devices, old)
		if i < 0 {
			return fmt.Errorf("no device named %q", old)
		}
		if indexDevice(l.Devices, name) >= 0 {
			return fmt.Errorf("device %q: %w", name, ErrExists)
		}
		l.Devices[i].Name = name
		return nil
	})
}

// DuplicateDevice copies the device named name under copyName, dated now;
// a used copyName is refused with ErrExists and an empty one with the
// name's own error. The copy's document is its own, not shared with the
// original.
func (s *Shelf) DuplicateDevice(name, copyName string) error {
	if err := checkItemName(copyName); err != nil {
		return err
	}
	return s.Update(func(l *Library) error {
		i := indexDevice(l.Devices, name)
		if i < 0 {
			return fmt.Errorf("no device named %q", name)
		}
		if indexDevice(l.Devices, copyName) >= 0 {
			return fmt.Errorf("device %q: %w", copyName, ErrExists)
		}
		d := l.Devices[i]
		d.Name, d.Saved = copyName, s.now()
		d.Device = append(json.RawMessage(nil), d.Device...)
		l.Devices = append(l.Devices, d)
		return nil
	})
}

// DeleteDevice removes a device and returns a function that puts it back
// (the undo); the undo refuses with ErrExists if the name was used again
// meanwhile.
func (s *Shelf) DeleteDevice(name string) (undo func() error, err error) {
	var gone Device
	err = s.Update(func(l *Library) error {
		i := indexDevice(l.Devices, name)
		if i < 0 {
			return fmt.Errorf("no device named %q", name)
		}
		gone = l.Devices[i]
		l.Devices = append(l.Devices[:i:i], l.Devices[i+1:]...)
		return nil
	})
	if err != nil {
		return nil, err
	}
	return func() error { return s.SaveDevice(gone, false) }, nil
}

// Device returns the device named name.
func (l *Library) Device(name string) (Device, bool) {
	if i := indexDevice(l.Devices, name); i >= 0 {
		return l.Devices[i], true
	}
	return Device{}, false
}

// AddEntry appends a logged result (its time set now when zero).
func (s *Shelf) AddEntry(e Entry) error {
	if e.Time.IsZero() {
		e.Time = s.now()
	}
	return s.Update(func(l *Library) error {
		l.Log = append(l.Log, e)
		return nil
	})
}

// Export returns the whole library as one file of our own format.
func (s *Shelf) Export() ([]byte, error) {
	return s.Library().Marshal()
}

// Import merges an exported file into the library. A damaged file, one of
// a newer version or one larger than MaxLibraryBytes is refused and nothing
// changes. Names already used are not overwritten unless replace is set;
// they are returned as conflicts.
func (s *Shelf) Import(data []byte, replace bool) (added int, c Conflicts, err error) {
	in, err := ParseLibrary(data)
	if err != nil {
		return 0, Conflicts{}, fmt.Errorf("import refused, nothing changed: %w", err)
	}
	err = s.Update(func(l *Library) error {
		added, c = l.Merge(in, replace)
		return nil
	})
	return added, c, err
}

func copyMap(m map[string]string) map[string]string {
	c := make(map[string]string, len(m))
	for k, v := range m {
		c[k] = v
	}
	return c
}
