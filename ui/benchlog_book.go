package ui

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"runtime"
	"time"

	"tubewright/ui/store"
)

// benchBook is where the safety passes of one App are kept: the bench log
// file on desktop (os.UserConfigDir()/tubewright/benchlog.json), or memory
// only where there is no file system (the browser build) or no config
// folder. The safety screen saves into it and the bench-log screen lists
// it; both reach the same book through bookFor(env), which keeps it in
// the Env.
type benchBook struct {
	path string     // "" means memory only
	mem  *store.Log // the log in memory-only mode
	why  string     // why the book is in memory, for the screen's note
}

// bookFor returns env's bench log book, opening the default place on
// first use. Called on the UI goroutine only.
func bookFor(env *Env) *benchBook {
	if env.book == nil {
		env.book = defaultBook()
	}
	return env.book
}

// useBookAt makes env's book the file path ("" for memory only). Tests use
// it with t.TempDir(); call it before the screens are first laid out.
func useBookAt(env *Env, path string) *benchBook {
	b := &benchBook{path: path}
	if path == "" {
		b.mem = store.NewLog()
		b.why = "This build keeps the bench log in memory only"
	}
	env.book = b
	return b
}

// defaultBook opens the bench log in the user's config folder, or memory
// when there is none (WebAssembly has no file system).
func defaultBook() *benchBook {
	if runtime.GOOS == "js" {
		return &benchBook{mem: store.NewLog(), why: "The browser build keeps the bench log in memory only: export each pass as text to keep it"}
	}
	dir, err := os.UserConfigDir()
	if err != nil {
		return &benchBook{mem: store.NewLog(), why: "No configuration folder was found (" + err.Error() + "), so the bench log is kept in memory only: export each pass as text to keep it"}
	}
	return &benchBook{path: filepath.Join(dir, "tubewright", "benchlog.json")}
}

// Where says where the log is kept, for the screens.
func (b *benchBook) Where() string {
	if b.path == "" {
		return b.why
	}
	return "Bench log file: " + b.path
}

// Load returns the passes, newest last. A damaged file gives a
// *store.DamagedError and no passes.
func (b *benchBook) Load() ([]store.Pass, error) {
	if b.path == "" {
		return append([]store.Pass(nil), b.mem.Passes...), nil
	}
	l, err := store.Load(b.path)
	if err != nil {
		return nil, err
	}
	return l.Passes, nil
}

// Append saves a pass. A damaged file is not touched: the
// *store.DamagedError comes back and the caller offers SetAside.
func (b *benchBook) Append(p store.Pass) error {
	if b.path == "" {
		if err := p.Validate(); err != nil {
			return err
		}
		b.mem.Passes = append(b.mem.Passes, p)
		return nil
	}
	return store.Append(b.path, p)
}

// SetAside renames a damaged log so a new one can start, and returns a
// sentence saying where the old one went.
func (b *benchBook) SetAside(now time.Time) (string, error) {
	if b.path == "" {
		return "", errors.New("nothing to set aside: the log is in memory")
	}
	name, err := store.SetAside(b.path, now)
	if err != nil {
		return "", err
	}
	return fmt.Sprintf("The damaged bench log was kept as %s; a new log starts with the next save.", name), nil
}

// Export writes the text of pass p next to the log as
// benchlog-YYYYMMDD-HHMMSS.txt, atomically, and returns its path. In
// memory-only mode it returns "" and no error: the screen shows the text
// for copying instead.
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

// isDamaged reports whether err says the log file is damaged.
func isDamaged(err error) bool {
	var d *store.DamagedError
	return errors.As(err, &d)
}
