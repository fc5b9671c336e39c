package store

import (
	"bytes"
	"encoding/json"
	"errors"
	"testing"
	"time"
)

// TestShelfDevices saves, renames and deletes named devices on every back
// end, undoes the delete, and finds each change in a shelf opened anew on
// the same back end (what the app sees after a restart).
func TestShelfDevices(t *testing.T) {
	t.Parallel()
	doc := json.RawMessage(`{"gas":"helium","parts":[]}`)
	for name, b := range backends(t) {
		t.Run(name, func(t *testing.T) {
			s, err := OpenShelf(b)
			if err != nil {
				t.Fatal(err)
			}
			when := time.Date(2026, 12, 1, 9, 30, 0, 0, time.UTC)
			if err := s.SaveDevice(Device{Name: "rig A", Saved: when, Device: doc}, false); err != nil {
				t.Fatal(err)
			}
			if err := s.SaveDevice(Device{Name: "rig B", Device: doc}, false); err != nil {
				t.Fatal(err)
			}
			if err := s.SaveDevice(Device{Name: "rig A", Device: doc}, false); !errors.Is(err, ErrExists) {
				t.Errorf("saving over rig A without replace: %v, want ErrExists", err)
			}
			// Rename: to a used name refused, to a free one kept.
			if err := s.RenameDevice("rig A", "rig B"); !errors.Is(err, ErrExists) {
				t.Errorf("rename onto rig B: %v, want ErrExists", err)
			}
			if err := s.RenameDevice("no such rig", "x"); err == nil {
				t.Error("renaming a missing device succeeded")
			}
			if err := s.RenameDevice("rig A", ""); err == nil {
				t.Error("renaming to an empty name succeeded")
			}
			if err := s.RenameDevice("rig A", "rig C"); err != nil {
				t.Fatal(err)
			}
			reopened, err := OpenShelf(b)
			if err != nil {
				t.Fatal(err)
			}
			lib := reopened.Library()
			if _, ok := lib.Device("rig A"); ok {
				t.Error("rig A still there after the rename")
			}
			d, ok := lib.Device("rig C")
			if !ok || !d.Saved.Equal(when) || compact(t, d.Device) != string(doc) {
				t.Fatalf("renamed device %+v (found %v): want its date and document kept", d, ok)
			}
			// Delete, then undo: back with its date.
			undo, err := s.DeleteDevice("rig C")
			if err != nil {
				t.Fatal(err)
			}
			if _, err := s.DeleteDevice("rig C"); err == nil {
				t.Error("deleting twice succeeded")
			}
			reopened, _ = OpenShelf(b)
			if n := len(reopened.Library().Devices); n != 1 {
				t.Fatalf("%d devices stored after the delete, want 1", n)
			}
			if err := undo(); err != nil {
				t.Fatal(err)
			}
			reopened, _ = OpenShelf(b)
			d, ok = reopened.Library().Device("rig C")
			if !ok || !d.Saved.Equal(when) {
				t.Errorf("after undo: %+v (found %v)", d, ok)
			}
			// An undo whose name was taken again meanwhile is refused.
			undo, _ = s.DeleteDevice("rig B")
			if err := s.SaveDevice(Device{Name: "rig B", Device: doc}, false); err != nil {
				t.Fatal(err)
			}
			if err := undo(); !errors.Is(err, ErrExists) {
				t.Errorf("undo onto a new rig B: %v, want ErrExists", err)
			}
		})
	}
}

// compact returns a JSON document without its indentation (a stored
// device document is indented with the library).
func compact(t *testing.T, doc []byte) string {
	t.Helper()
	var b bytes.Buffer
	if err := json.Compact(&b, doc); err != nil {
		t.Fatal(err)
	}
	return b.String()
}
