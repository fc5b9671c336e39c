package store

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"math"
	"os"
	"path/filepath"
	"strings"
	"time"
)

// LogFormat is the value of the "format" field that marks a bench log file.
const LogFormat = "tubewright-benchlog"

// LogVersion is the version of the bench log format written by this code.
// Files with a higher version are refused (they come from a newer program);
// files with a lower or missing version are damaged.
const LogVersion = 1

// maxLogBytes bounds the size of a bench log that Load will read. A log of a
// few hundred passes is well under a megabyte.
const maxLogBytes = 16 << 20

// Log is the bench log: every safety pass the user saved, oldest first.
type Log struct {
	Format  string `json:"format"`  // always LogFormat
	Version int    `json:"version"` // LogVersion
	Passes  []Pass `json:"passes"`
}

// Pass is one completed safety pass: when it was saved, each checklist item
// with its tick and note, the numbers that decided it and the cautions shown
// with them.
type Pass struct {
	Time     time.Time `json:"time"`            // when the pass was saved, with its zone
	Title    string    `json:"title"`           // e.g. "Safety pass before pressurising"
	Rig      string    `json:"rig,omitempty"`   // the user's name for the rig, optional
	Items    []Item    `json:"items"`           // in checklist order
	Cautions []string  `json:"cautions"`        // general cautions shown with the pass; never empty
	Notes    string    `json:"notes,omitempty"` // free text for the whole pass
}

// Item is one checklist item as the user left it.
type Item struct {
	ID       string   `json:"id"`                 // stable key, e.g. "relief"
	Title    string   `json:"title"`              // the item's text when saved
	Done     bool     `json:"done"`               // ticked
	Note     string   `json:"note,omitempty"`     // the user's note
	Numbers  []Number `json:"numbers,omitempty"`  // results of the inline calculator
	Cautions []string `json:"cautions,omitempty"` // cautions shown beside those numbers
	// Inputs are what the user typed into the item's calculator.
	Inputs []ItemInput `json:"inputs,omitempty"`
	// Verdicts are the item's checks with their outcomes.
	Verdicts []ItemVerdict `json:"verdicts,omitempty"`
}

// ItemVerdict is one check of an item: its stable key, its outcome
// ("pass", "warn" or "fail") and why, in the calculator's words.
type ItemVerdict struct {
	Check   string `json:"check"`
	Outcome string `json:"outcome"`
	Why     string `json:"why"`
}

// ItemInput is one input of an item's calculator as typed: its stable
// key, its label and the text.
type ItemInput struct {
	Key   string `json:"key"`
	Label string `json:"label"`
	Text  string `json:"text"`
}

// Number is one result with its unit, kept in SI so that the log can be read
// back by a program, plus the text the user saw.
type Number struct {
	Name  string  `json:"name"`            // e.g. "hoop stress"
	Value float64 `json:"value"`           // SI value
	Unit  string  `json:"unit"`            // SI unit, e.g. "Pa"; "1" for a ratio
	Shown string  `json:"shown,omitempty"` // as displayed, e.g. "25.33 MPa"
}

// DamagedError reports a bench log file that exists but cannot be read as a
// log. The file is left untouched.
type DamagedError struct {
	Path string // the file
	Err  error  // what is wrong with it
}

// Error says which file is damaged, why, and that it was left alone.
func (e *DamagedError) Error() string {
	return fmt.Sprintf("bench log %s is damaged (%v); it was left as it is", e.Path, e.Err)
}

// Unwrap returns the underlying reason.
func (e *DamagedError) Unwrap() error { return e.Err }

// ErrNewerVersion is wrapped by Parse for a log written by a newer program.
var ErrNewerVersion = errors.New("the file was written by a newer version of Tubewright")

// NewLog returns an empty log of the current version.
func NewLog() *Log {
	return &Log{Format: LogFormat, Version: LogVersion, Passes: []Pass{}}
}

// Parse reads a bench log from its JSON bytes and checks it. It never
// panics; any problem is returned as an error saying what is wrong.
func Parse(data []byte) (*Log, error) {
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	var l Log
	if err := dec.Decode(&l); err != nil {
		if errors.Is(err, io.EOF) {
			return nil, errors.New("the file is empty")
		}
		return nil, err
	}
	if _, err := dec.Token(); !errors.Is(err, io.EOF) {
		return nil, errors.New("unexpected data after the log")
	}
	if err := l.Validate(); err != nil {
		return nil, err
	}
	if l.Passes == nil {
		l.Passes = []Pass{}
	}
	return &l, nil
}

// Validate checks the log's format marker, version and every pass.
func (l *Log) Validate() error {
	if l.Format != LogFormat {
		return fmt.Errorf("format is %q, want %q", l.Format, LogFormat)
	}
	if l.Version > LogVersion {
		return fmt.Errorf("version %d: %w", l.Version, ErrNewerVersion)
	}
	if l.Version < 1 {
		return fmt.Errorf("version %d is not valid", l.Version)
	}
	for i := range l.Passes {
		if err := l.Passes[i].Validate(); err != nil {
			return fmt.Errorf("pass %d: %w", i+1, err)
		}
	}
	return nil
}

// Validate checks one pass: a time, at least one caution, and items with
// ids and finite numbers with units.
func (p *Pass) Validate() error {
	if p.Time.IsZero() {
		return errors.New("no time")
	}
	if len(p.Cautions) == 0 {
		return errors.New("no cautions: a safety pass is never kept without them")
	}
	for j, it := range p.Items {
		if strings.TrimSpace(it.ID) == "" {
			return fmt.Errorf("item %d has no id", j+1)
		}
		for _, n := range it.Numbers {
			if math.IsNaN(n.Value) || math.IsInf(n.Value, 0) {
				return fmt.Errorf("item %q: number %q is not finite", it.ID, n.Name)
			}
			if n.Unit == "" {
				return fmt.Errorf("item %q: number %q has no unit", it.ID, n.Name)
			}
		}
	}
	return nil
}

// Marshal encodes the log as indented JSON ending in a newline.
func (l *Log) Marshal() ([]byte, error) {
	if err := l.Validate(); err != nil {
		return nil, fmt.Errorf("store: refusing to write an invalid bench log: %w", err)
	}
	b, err := json.MarshalIndent(l, "", "  ")
	if err != nil {
		return nil, fmt.Errorf("store: %w", err)
	}
	return append(b, '\n'), nil
}

// Load reads the bench log at path. A missing file gives an empty log and
// no error. A file that exists but is not a valid log gives a *DamagedError
// (the file is not touched).
func Load(path string) (*Log, error) {
	f, err := os.Open(path)
	if errors.Is(err, fs.ErrNotExist) {
		return NewLog(), nil
	}
	if err != nil {
		return nil, fmt.Errorf("store: reading bench log: %w", err)
	}
	defer f.Close()
	data, err := io.ReadAll(io.LimitReader(f, maxLogBytes+1))
	if err != nil {
		return nil, fmt.Errorf("store: reading bench log: %w", err)
	}
	if len(data) > maxLogBytes {
		return nil, &DamagedError{Path: path, Err: fmt.Errorf("larger than %d bytes", maxLogBytes)}
	}
	l, err := Parse(data)
	if err != nil {
		return nil, &DamagedError{Path: path, Err: err}
	}
	return l, nil
}

// Append adds a pass to the bench log at path and writes the log back
// atomically, creating the directory and file when missing. If the existing
// file is damaged, Append returns the *DamagedError and writes nothing: the
// caller asks the user, then calls SetAside and appends again.
func Append(path string, p Pass) error {
	if err := p.Validate(); err != nil {
		return fmt.Errorf("store: refusing to save the pass: %w", err)
	}
	l, err := Load(path)
	if err != nil {
		return err
	}
	l.Passes = append(l.Passes, p)
	data, err := l.Marshal()
	if err != nil {
		return err
	}
	if err := os.MkdirAll(filepath.Dir(path), 0o700); err != nil {
		return fmt.Errorf("store: %w", err)
	}
	return WriteFileAtomic(path, data, 0o600)
}

// SetAside renames a damaged bench log to path + ".damaged-YYYYMMDDTHHMMSS"
// (with a counter if that name is taken) so that its bytes are kept and a
// new log can be started. It returns the new name.
func SetAside(path string, now time.Time) (string, error) {
	base := path + ".damaged-" + now.UTC().Format("20060102T150405")
	name := base
	for i := 2; ; i++ {
		if _, err := os.Lstat(name); errors.Is(err, fs.ErrNotExist) {
			break
		}
		if i > 1000 {
			return "", fmt.Errorf("store: no free name to set %s aside", path)
		}
		name = fmt.Sprintf("%s-%d", base, i)
	}
	if err := os.Rename(path, name); err != nil {
		return "", fmt.Errorf("store: setting the damaged bench log aside: %w", err)
	}
	return name, nil
}
