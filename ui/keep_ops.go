package ui

import (
	"errors"
	"fmt"
	"strings"
	"time"

	"tubewright/ui/store"
)

// The changes of the library the screens queue on the Keeper. Each runs on
// the keeper's worker and returns the words to show.

// opSaveSetup saves st under its name; a name in use is not overwritten but
// offered to be replaced.
func opSaveSetup(st store.Setup) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		err := s.SaveSetup(st, false)
		if errors.Is(err, store.ErrExists) {
			return keepStatus{Text: fmt.Sprintf("A setup named “%s” is already saved. Replace it with these inputs?", st.Name),
				Action: "Replace it", Then: func(s *store.Shelf) (keepStatus, error) {
					if err := s.SaveSetup(st, true); err != nil {
						return keepStatus{}, err
					}
					return keepStatus{Text: fmt.Sprintf("Replaced “%s”.", st.Name)}, nil
				}}, nil
		}
		if err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Saved “%s”.", st.Name)}, nil
	}
}

// opRenameSetup renames a setup.
func opRenameSetup(old, name string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		if err := s.RenameSetup(old, name); err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Renamed “%s” to “%s”.", old, name)}, nil
	}
}

// opDuplicateSetup copies a setup under a name not yet used ("NAME copy",
// "NAME copy 2", ...).
func opDuplicateSetup(name string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		lib := s.Library()
		copyName := freeCopyName(name, func(n string) bool { _, used := lib.Setup(n); return used })
		if err := s.DuplicateSetup(name, copyName); err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Copied “%s” as “%s”.", name, copyName)}, nil
	}
}

// freeCopyName is the first of "NAME copy", "NAME copy 2", ... that used
// says is free.
func freeCopyName(name string, used func(string) bool) string {
	copyName := name + " copy"
	for i := 2; used(copyName); i++ {
		copyName = fmt.Sprintf("%s copy %d", name, i)
	}
	return copyName
}

// opDeleteSetup deletes a setup and offers to undo it.
func opDeleteSetup(name string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		undo, err := s.DeleteSetup(name)
		if err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Deleted “%s”.", name), Action: "Undo",
			Then: func(*store.Shelf) (keepStatus, error) {
				if err := undo(); err != nil {
					return keepStatus{}, err
				}
				return keepStatus{Text: fmt.Sprintf("“%s” is back.", name)}, nil
			}}, nil
	}
}

// opLog adds a logged result.
func opLog(e store.Entry) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		if err := s.AddEntry(e); err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Logged this result at %s.", e.Time.Format("15:04:05"))}, nil
	}
}

// opSavePass keeps a safety pass (its entry, see passEntry) in the log.
func opSavePass(e store.Entry) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		if err := s.AddEntry(e); err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Kept the safety pass of %s in the log.", e.Time.Format("2006-01-02 15:04"))}, nil
	}
}

// opNote sets the note of the entry of calculator calc logged at t.
func opNote(calc string, t time.Time, note string) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		err := s.Update(func(l *store.Library) error {
			for i := range l.Log {
				if l.Log[i].Calculator == calc && l.Log[i].Time.Equal(t) {
					l.Log[i].Note = note
					return nil
				}
			}
			return errors.New("that logged result is no longer there")
		})
		if err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: "Note kept with the result of " + t.Format("15:04:05") + "."}, nil
	}
}

// opImport merges an export file; names already used are reported and
// offered to be replaced, nothing is overwritten without asking.
func opImport(data []byte, replace bool) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		added, c, err := s.Import(data, replace)
		if err != nil {
			return keepStatus{}, err
		}
		st := keepStatus{Text: fmt.Sprintf("Imported %d new items.", added)}
		if added == 1 {
			st.Text = "Imported 1 new item."
		}
		if !c.Empty() {
			var parts []string
			if len(c.Setups) > 0 {
				parts = append(parts, "setups “"+strings.Join(c.Setups, "”, “")+"”")
			}
			if len(c.Devices) > 0 {
				parts = append(parts, "devices “"+strings.Join(c.Devices, "”, “")+"”")
			}
			st.Text += " Already here under the same names, and left as they were: " + strings.Join(parts, "; ") + "."
			st.Action, st.Then = "Replace those with the imported ones", opImport(data, true)
		}
		return st, nil
	}
}

// opSetAside keeps a damaged library under a dated name and starts afresh.
func opSetAside(s *store.Shelf) (keepStatus, error) {
	name, err := s.SetAside()
	if err != nil {
		return keepStatus{}, err
	}
	return keepStatus{Text: fmt.Sprintf("The unreadable library was kept as “%s” and a new one started.", name)}, nil
}
