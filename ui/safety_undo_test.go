package ui

import (
	"path/filepath"
	"testing"
)

// TestSafetyStartAgainUndo saves a pass with a tick and a note, starts a
// new pass (ticks and notes cleared), and puts the last pass back with
// Undo; once the new pass gets a tick, Undo is gone.
func TestSafetyStartAgainUndo(t *testing.T) {
	a, h := safetyApp(t, filepath.Join(t.TempDir(), "benchlog.json"), "safety", tallPhone)
	s := a.Screen("safety").(*safetyScreen)
	h.tap("Done: Vessel rating and markings known")
	h.retype("Note (optional)", "", "plate photographed")
	h.tap("Review")
	h.tap("Save to the bench log")
	if !s.saved {
		t.Fatalf("the pass was not saved:\n%s", h.dump())
	}
	h.tap("Start a new pass")
	if s.pass.Done[0] || s.notes[0].Text() != "" || s.step != 0 {
		t.Fatalf("Start a new pass left tick %v, note %q, step %d", s.pass.Done[0], s.notes[0].Text(), s.step)
	}
	h.frames(2)
	if s.pass.Notes[0] != "" || s.undo == nil {
		t.Fatalf("after a new pass: note %q, undo %v", s.pass.Notes[0], s.undo != nil)
	}
	h.tap("Undo: back to the last pass")
	h.frames(2)
	if !s.pass.Done[0] || !s.ticks[0].Value || s.notes[0].Text() != "plate photographed" || s.pass.Notes[0] != "plate photographed" {
		t.Fatalf("Undo put back tick %v/%v, note %q/%q", s.pass.Done[0], s.ticks[0].Value, s.notes[0].Text(), s.pass.Notes[0])
	}
	if !s.saved || s.step != s.items() {
		t.Errorf("Undo: saved %v, step %d; want the saved review", s.saved, s.step)
	}
	if _, ok := h.control("Undo: back to the last pass"); ok {
		t.Error("Undo still offered after it was used")
	}
	h.tap("Start a new pass")
	h.tap("Done: Vessel rating and markings known")
	if _, ok := h.control("Undo: back to the last pass"); ok {
		t.Error("Undo still offered after the new pass got a tick")
	}
}
