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

// TestShelfDuplicateDevice copies a named device on every back end and
// finds both, each with its own date and the same document, in a shelf
// opened anew on the same back end; copies onto a used or empty name and
// of a missing device are refused and leave the library as it was.
func TestShelfDuplicateDevice(t *testing.T) {
	t.Parallel()
	doc := json.RawMessage(`{"gas":"argon","parts":[{"duct":{"length":"0.147 m"}}]}`)
	for name, b := range backends(t) {
		t.Run(name, func(t *testing.T) {
			s, err := OpenShelf(b)
			if err != nil {
				t.Fatal(err)
			}
			when := time.Date(2026, 12, 1, 9, 30, 0, 0, time.UTC)
			later := time.Date(2026, 12, 2, 14, 5, 0, 0, time.UTC)
			s.now = func() time.Time { return later }
			if err := s.SaveDevice(Device{Name: "rig A", Saved: when, Device: doc}, false); err != nil {
				t.Fatal(err)
			}
			if err := s.SaveDevice(Device{Name: "rig B", Saved: when, Device: json.RawMessage(`{"gas":"air","parts":[]}`)}, false); err != nil {
				t.Fatal(err)
			}
			if err := s.DuplicateDevice("rig A", "rig B"); !errors.Is(err, ErrExists) {
				t.Errorf("duplicate onto rig B: %v, want ErrExists", err)
			}
			if err := s.DuplicateDevice("rig A", " "); err == nil {
				t.Error("duplicate to a blank name succeeded")
			}
			if err := s.DuplicateDevice("no such rig", "x"); err == nil {
				t.Error("duplicating a missing device succeeded")
			}
			if n := len(s.Library().Devices); n != 2 {
				t.Fatalf("%d devices after the refused copies, want 2", n)
			}
			if err := s.DuplicateDevice("rig A", "rig A copy"); err != nil {
				t.Fatal(err)
			}
			reopened, err := OpenShelf(b)
			if err != nil {
				t.Fatal(err)
			}
			lib := reopened.Library()
			if n := len(lib.Devices); n != 3 {
				t.Fatalf("%d devices stored after the copy, want 3", n)
			}
			orig, ok := lib.Device("rig A")
			if !ok || !orig.Saved.Equal(when) || compact(t, orig.Device) != string(doc) {
				t.Errorf("original after the copy: %+v (found %v), want it unchanged", orig, ok)
			}
			cp, ok := lib.Device("rig A copy")
			if !ok || !cp.Saved.Equal(later) || compact(t, cp.Device) != string(doc) {
				t.Errorf("copy: %+v (found %v), want rig A's document dated %v", cp, ok, later)
			}
			b2, _ := lib.Device("rig B")
			if compact(t, b2.Device) != `{"gas":"air","parts":[]}` {
				t.Errorf("rig B changed by the refused copy: %s", b2.Device)
			}
			// The copy is its own: deleting the original leaves it.
			if _, err := s.DeleteDevice("rig A"); err != nil {
				t.Fatal(err)
			}
			reopened, _ = OpenShelf(b)
			if _, ok := reopened.Library().Device("rig A copy"); !ok {
				t.Error("the copy went with the deleted original")
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
