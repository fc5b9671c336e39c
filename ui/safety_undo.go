package ui

import (
	"slices"

	"gioui.org/layout"
)

// passUndo is what "Start a new pass" cleared: the ticks, the notes, the
// step shown and the outcome of the last save. One tap on Undo puts them
// back, until the new pass gets its first tick or note.
type passUndo struct {
	done              []bool
	notes             []string
	step              int
	status            string
	statusBad, damage bool
	saved             bool
}

// restartWithUndo starts a new pass and keeps what it clears for Undo.
func (s *safetyScreen) restartWithUndo() {
	s.undo = &passUndo{
		done:      slices.Clone(s.pass.Done),
		notes:     slices.Clone(s.pass.Notes),
		step:      s.step,
		status:    s.status,
		statusBad: s.statusBad,
		damage:    s.damaged,
		saved:     s.saved,
	}
	s.reset()
}

// undoRestart puts back the pass "Start a new pass" cleared.
func (s *safetyScreen) undoRestart() {
	u := s.undo
	if u == nil {
		return
	}
	s.undo = nil
	for i := range s.ticks {
		s.pass.Done[i] = u.done[i]
		s.ticks[i].Value = u.done[i]
		s.pass.Notes[i] = u.notes[i]
		s.notes[i].SetText(u.notes[i])
	}
	s.status, s.statusBad, s.damaged, s.saved = u.status, u.statusBad, u.damage, u.saved
	s.goTo(u.step)
}

// undoWidgets is the line that says a new pass was started, with its
// Undo button; none when there is nothing to undo.
func (s *safetyScreen) undoWidgets() []layout.Widget {
	if s.undo == nil {
		return nil
	}
	if s.undoWs == nil {
		s.undoWs = []layout.Widget{
			statusLine(s.env, "New pass status", "A new pass is started: ticks and notes are cleared. The saved pass stays in the bench log.", false),
			func(gtx layout.Context) layout.Dimensions {
				return s.button(gtx, &s.undoBtn, "Undo: back to the last pass", false)
			},
		}
	}
	return s.undoWs
}
