package ui

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"runtime"
	"sort"
	"time"

	"tubewright/ui/store"
)

// benchBook is where the safety passes of one App are kept. New passes go
// into the log of the user's library through the keeper (see passEntry), so
// they live wherever the rest of the saved work does: the app's data folder
// on desktop, IndexedDB in the browser. Passes saved by earlier versions
// sit in the older bench log file (os.UserConfigDir()/tubewright/
// benchlog.json); that file is still read, never written again, and its
// passes are copied into the log the first time the bench log screen sees
// them (the file is left as it was, so nothing is lost either way). A text
// export is written next to that file on desktop. Both screens reach the
// book through bookFor(env), which keeps it in the Env.
type benchBook struct {
	env  *Env
	path string // the older bench log file; "" where there is no file system
}

// bookFor returns env's bench log book, opening the default place on
// first use. Called on the UI goroutine only.
func bookFor(env *Env) *benchBook {
	if env.book == nil {
		env.book = defaultBook()
		env.book.env = env
	}
	return env.book
}

// useBookAt makes path env's older bench log file ("" for none). Tests use
// it with t.TempDir(); call it before the screens are first laid out.
func useBookAt(env *Env, path string) *benchBook {
	b := &benchBook{env: env, path: path}
	env.book = b
	return b
}

// defaultBook finds the older bench log file in the user's config folder;
// WebAssembly has no file system, so there is none in the browser.
func defaultBook() *benchBook {
	if runtime.GOOS == "js" {
		return &benchBook{}
	}
	dir, err := os.UserConfigDir()
	if err != nil {
		return &benchBook{} // no config folder: no older file to read
	}
	return &benchBook{path: filepath.Join(dir, "tubewright", "benchlog.json")}
}

// keeper is the app's storage worker.
func (b *benchBook) keeper() *Keeper { return keepFor(b.env).keeper }

// Where says where the passes are kept, for the screens.
func (b *benchBook) Where() string { return b.whereWith(b.oldThere()) }

// oldThere reports whether the older bench log file exists (a call to the
// file system: screens keep the answer, see benchLogScreen.reload).
func (b *benchBook) oldThere() bool {
	if b.path == "" {
		return false
	}
	_, err := os.Stat(b.path)
	return err == nil
}

// whereKey is what Where's text depends on.
type whereKey struct {
	kind                 string
	persist              store.Persistence
	ok, loaded, mem, old bool
}

// whereKeyOf reads the keeper's state for Where, with the older file's
// presence old.
func (b *benchBook) whereKeyOf(old bool) whereKey {
	k := b.keeper()
	kind, persist, ok := k.Where()
	return whereKey{kind: kind, persist: persist, ok: ok, loaded: k.Loaded(), mem: ok && k.InMemory(), old: old}
}

// whereWith is Where with the older file's presence given.
func (b *benchBook) whereWith(old bool) string {
	return b.whereText(b.whereKeyOf(old))
}

// whereText writes Where's text for state w.
func (b *benchBook) whereText(w whereKey) string {
	var s string
	switch {
	case !w.ok && !w.loaded:
		s = "Safety passes are kept with your saved work; the storage is still opening."
	case !w.ok:
		s = "No storage could be opened, so safety passes cannot be kept: export each pass as text."
	case w.mem:
		s = "This app keeps your saved work in memory only, so safety passes are lost when it closes: export each pass as text to keep it."
	case w.persist == store.PersistDenied:
		s = "Safety passes are kept with your saved work and go into its export file. Kept in: " + w.kind + "; the browser may clear it when space runs low, so export now and then."
	default:
		s = "Safety passes are kept with your saved work and go into its export file. Kept in: " + w.kind + "."
	}
	if w.old {
		s += " The older bench log file is read too and left as it is: " + b.path
	}
	return s
}

// Legacy returns the passes of the older bench log file, oldest first (none
// when there is no file). A damaged file gives a *store.DamagedError and no
// passes.
func (b *benchBook) Legacy() ([]store.Pass, error) {
	if b.path == "" {
		return nil, nil
	}
	if _, err := os.Stat(b.path); errors.Is(err, fs.ErrNotExist) {
		return nil, nil
	}
	l, err := store.Load(b.path)
	if err != nil {
		return nil, err
	}
	return l.Passes, nil
}

// Kept returns the passes kept in the library's log, oldest first, and one
// error for each safety entry that could not be read as a pass (reported
// on screen, never dropped).
func (b *benchBook) Kept() ([]store.Pass, []error) {
	lib := b.keeper().Library()
	if lib == nil {
		return nil, nil
	}
	var out []store.Pass
	var bad []error
	for _, e := range lib.Log {
		if e.Calculator != safetyCalc {
			continue
		}
		p, err := entryPass(e)
		if err != nil {
			bad = append(bad, fmt.Errorf("the safety pass logged at %s cannot be shown (%v); it is kept in your saved work and its export file", e.Time.Format("2006-01-02 15:04"), err))
			continue
		}
		out = append(out, p)
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].Time.Before(out[j].Time) })
	return out, bad
}

// missing returns the passes of legacy that are not in kept (same time).
func missing(legacy, kept []store.Pass) []store.Pass {
	var out []store.Pass
	for _, p := range legacy {
		if !hasPass(kept, p.Time) {
			out = append(out, p)
		}
	}
	return out
}

func hasPass(ps []store.Pass, t time.Time) bool {
	for _, p := range ps {
		if p.Time.Equal(t) {
			return true
		}
	}
	return false
}

// What the keeper is doing for the bench log, as its failures begin.
const (
	whatSavePass   = "Saving the safety pass"
	whatCopyPasses = "Copying the older bench log file"
)

// Save queues pass p to be kept in the log and returns what to tell the
// user. With aside, a damaged library is first set aside (kept under a
// dated name; the user chose that). A damaged library without aside is
// refused with its *store.DamagedLibrary, and nothing is queued.
func (b *benchBook) Save(p store.Pass, aside bool) (string, error) {
	if err := p.Validate(); err != nil {
		return "", fmt.Errorf("the pass is incomplete: %w", err)
	}
	k := b.keeper()
	if d := k.Damaged(); d != nil && !aside {
		return "", d
	}
	if k.Loaded() && k.Library() == nil {
		if errs := k.Problems(); len(errs) > 0 {
			return "", errs[0]
		}
	}
	if aside {
		k.Do("Setting the unreadable library aside", opSetAside)
	}
	k.Do(whatSavePass, opSavePass(passEntry(p)))
	return b.Where(), nil
}

// opCopyPasses copies passes of the older bench log file into the log,
// skipping those already there (same time); the file is not changed.
func opCopyPasses(ps []store.Pass) func(s *store.Shelf) (keepStatus, error) {
	return func(s *store.Shelf) (keepStatus, error) {
		n := 0
		err := s.Update(func(l *store.Library) error {
			for _, p := range ps {
				dup := false
				for _, e := range l.Log {
					if e.Calculator == safetyCalc && e.Time.Equal(p.Time) {
						dup = true
						break
					}
				}
				if !dup {
					l.Log = append(l.Log, passEntry(p))
					n++
				}
			}
			return nil
		})
		if err != nil {
			return keepStatus{}, err
		}
		return keepStatus{Text: fmt.Sprintf("Copied %s of the older bench log file into your saved work; the file is left as it was.", passCount(n))}, nil
	}
}

// SetAside renames a damaged older bench log file so that its passes stop
// being reported as unreadable, and returns a sentence saying where it went.
func (b *benchBook) SetAside(now time.Time) (string, error) {
	if b.path == "" {
		return "", errors.New("there is no bench log file to set aside")
	}
	name, err := store.SetAside(b.path, now)
	if err != nil {
		return "", err
	}
	return fmt.Sprintf("The damaged bench log file was kept as %s.", name), nil
}

// Export writes the text of pass p next to the older bench log file as
// benchlog-YYYYMMDD-HHMMSS.txt, atomically, and returns its path. Where
// there is no file system it returns "" and no error: the screen shows the
// text for copying instead.
func (b *benchBook) Export(p store.Pass) (string, error) {
	if b.path == "" {
		return "", nil
	}
	name := filepath.Join(filepath.Dir(b.path), "benchlog-"+p.Time.Format("20060102-150405")+".txt")
	if err := os.MkdirAll(filepath.Dir(name), 0o700); err != nil {
		return "", err
	}
	if err := store.WriteFileAtomic(name, []byte(p.Text()), 0o600); err != nil {
		return "", err
	}
	return name, nil
}

// isDamaged reports whether err says the bench log file or the library
// document is damaged.
func isDamaged(err error) bool {
	var d *store.DamagedError
	var l *store.DamagedLibrary
	return errors.As(err, &d) || errors.As(err, &l)
}

// passCount says "1 safety pass" or "N safety passes".
func passCount(n int) string {
	if n == 1 {
		return "1 safety pass"
	}
	return fmt.Sprintf("%d safety passes", n)
}
