package store

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"strings"
	"time"
)

// LibraryFormat marks a library document and an export file.
const LibraryFormat = "tubewright-library"

// LibraryVersion is the version of the library format written by this
// code; a document of a higher version comes from a newer program and is
// refused.
const LibraryVersion = 1

// MaxLibraryBytes bounds what is read as a library or imported: a library
// of thousands of setups and log entries is well under it.
const MaxLibraryBytes = 8 << 20

// Library is everything a user saves: named setups of any calculator, named
// devices, and the log of results. It is kept as one document and exported
// as one file.
type Library struct {
	Format  string    `json:"format"`
	Version int       `json:"version"`
	Setups  []Setup   `json:"setups"`
	Devices []Device  `json:"devices"`
	Log     []Entry   `json:"log"`
	Saved   time.Time `json:"saved"`
}

// Setup is a calculator's inputs saved under a name: the texts as typed,
// by input key (the keys of the calculator's description).
type Setup struct {
	Name       string            `json:"name"`
	Calculator string            `json:"calculator"`
	Inputs     map[string]string `json:"inputs"`
	Saved      time.Time         `json:"saved"`
}

// Device is a device (a list of parts) saved under a name: the device
// document itself, in the device-file format of calc/linear.
type Device struct {
	Name   string          `json:"name"`
	Saved  time.Time       `json:"saved"`
	Device json.RawMessage `json:"device"`
}

// Entry is one logged result: the calculator, its inputs as typed, the
// rows shown, the verdicts and the cautions shown with them, and the
// user's note.
type Entry struct {
	Time       time.Time         `json:"time"`
	Calculator string            `json:"calculator"`
	Title      string            `json:"title"`
	Inputs     map[string]string `json:"inputs"`
	Rows       []Row             `json:"rows"`
	Verdicts   []Verdict         `json:"verdicts,omitempty"`
	Cautions   []string          `json:"cautions,omitempty"`
	Warnings   []string          `json:"warnings,omitempty"`
	Note       string            `json:"note,omitempty"`
}

// Row is one logged result row: its key and label, the SI value, ± and
// unit for a number, and the text the user saw.
type Row struct {
	Key         string  `json:"key"`
	Label       string  `json:"label"`
	Value       float64 `json:"value,omitempty"`
	Uncertainty float64 `json:"uncertainty,omitempty"`
	Unit        string  `json:"unit,omitempty"`
	Shown       string  `json:"shown"`
}

// Verdict is a check with its outcome ("pass", "warn" or "fail") and why,
// in the calculator's words: in a logged result and in a safety pass.
type Verdict struct {
	Check   string `json:"check"`
	Outcome string `json:"outcome"`
	Why     string `json:"why"`
}

// NewLibrary returns an empty library.
func NewLibrary() *Library {
	return &Library{Format: LibraryFormat, Version: LibraryVersion, Setups: []Setup{}, Devices: []Device{}, Log: []Entry{}}
}

// ParseLibrary reads a library document or export file. Anything that is
// not one, is of a newer version, is larger than MaxLibraryBytes or does
// not validate is an error that says what is wrong.
func ParseLibrary(data []byte) (*Library, error) {
	if len(data) > MaxLibraryBytes {
		return nil, fmt.Errorf("the file is %d bytes, more than the %d MB a library may have", len(data), MaxLibraryBytes>>20)
	}
	var head struct {
		Format  string `json:"format"`
		Version int    `json:"version"`
	}
	if err := json.Unmarshal(data, &head); err != nil {
		return nil, fmt.Errorf("not a Tubewright library: %v", err)
	}
	if head.Format != LibraryFormat {
		return nil, fmt.Errorf("not a Tubewright library (format %q, want %q)", head.Format, LibraryFormat)
	}
	if head.Version > LibraryVersion {
		return nil, fmt.Errorf("written by a newer Tubewright (format version %d; this one reads up to %d): update the app first", head.Version, LibraryVersion)
	}
	if head.Version < 1 {
		return nil, fmt.Errorf("format version %d is not valid", head.Version)
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	lib := NewLibrary()
	if err := dec.Decode(lib); err != nil {
		return nil, fmt.Errorf("damaged library: %v", err)
	}
	if err := lib.Validate(); err != nil {
		return nil, fmt.Errorf("damaged library: %w", err)
	}
	return lib, nil
}

// Validate checks names (present, unique within their kind), calculators,
// times and numbers (finite).
func (l *Library) Validate() error {
	seen := map[string]bool{}
	for i, s := range l.Setups {
		if err := checkItemName(s.Name); err != nil {
			return fmt.Errorf("setup %d: %w", i+1, err)
		}
		if seen[s.Name] {
			return fmt.Errorf("two setups named %q", s.Name)
		}
		seen[s.Name] = true
		if s.Calculator == "" {
			return fmt.Errorf("setup %q names no calculator", s.Name)
		}
	}
	seen = map[string]bool{}
	for i, d := range l.Devices {
		if err := checkItemName(d.Name); err != nil {
			return fmt.Errorf("device %d: %w", i+1, err)
		}
		if seen[d.Name] {
			return fmt.Errorf("two devices named %q", d.Name)
		}
		seen[d.Name] = true
		if !json.Valid(d.Device) {
			return fmt.Errorf("device %q is not a JSON document", d.Name)
		}
	}
	for i, e := range l.Log {
		if e.Time.IsZero() || e.Calculator == "" {
			return fmt.Errorf("log entry %d has no time or calculator", i+1)
		}
		for _, r := range e.Rows {
			if math.IsNaN(r.Value) || math.IsInf(r.Value, 0) || math.IsNaN(r.Uncertainty) || math.IsInf(r.Uncertainty, 0) {
				return fmt.Errorf("log entry %d: row %s is not a finite number", i+1, r.Key)
			}
		}
		for _, v := range e.Verdicts {
			switch v.Outcome {
			case "pass", "warn", "fail":
			default:
				return fmt.Errorf("log entry %d: verdict %s has outcome %q", i+1, v.Check, v.Outcome)
			}
		}
	}
	return nil
}

// checkItemName refuses empty, overlong or multi-line names.
func checkItemName(name string) error {
	switch {
	case strings.TrimSpace(name) == "":
		return errors.New("empty name")
	case len(name) > 200:
		return errors.New("name longer than 200 characters")
	case strings.ContainsAny(name, "\n\r\t"):
		return errors.New("name with a line break or tab")
	}
	return nil
}

// Marshal writes the library as indented JSON.
func (l *Library) Marshal() ([]byte, error) {
	l.Format, l.Version = LibraryFormat, LibraryVersion
	if err := l.Validate(); err != nil {
		return nil, err
	}
	return json.MarshalIndent(l, "", "  ")
}

// Setup returns the setup named name.
func (l *Library) Setup(name string) (Setup, bool) {
	for _, s := range l.Setups {
		if s.Name == name {
			return s, true
		}
	}
	return Setup{}, false
}

// Conflicts are the names an import found already in use.
type Conflicts struct {
	Setups, Devices []string
}

// Empty reports whether there are none.
func (c Conflicts) Empty() bool { return len(c.Setups) == 0 && len(c.Devices) == 0 }

// Merge adds in's setups, devices and log entries to l. A setup or device
// whose name l already uses is not taken unless replace is set, and is
// reported; log entries already present (same time, calculator and note)
// are skipped. It returns how many items were added and the conflicts.
func (l *Library) Merge(in *Library, replace bool) (added int, c Conflicts) {
	n, names := mergeNamed(&l.Setups, in.Setups, func(s Setup) string { return s.Name }, replace)
	added, c.Setups = added+n, names
	n, names = mergeNamed(&l.Devices, in.Devices, func(d Device) string { return d.Name }, replace)
	added, c.Devices = added+n, names
	for _, e := range in.Log {
		dup := false
		for _, have := range l.Log {
			if have.Time.Equal(e.Time) && have.Calculator == e.Calculator && have.Note == e.Note {
				dup = true
				break
			}
		}
		if !dup {
			l.Log = append(l.Log, e)
			added++
		}
	}
	return added, c
}

// mergeNamed adds the items of src to dst; an item whose name dst already
// uses replaces it when replace is set and is otherwise left out and named
// in conflicts.
func mergeNamed[T any](dst *[]T, src []T, name func(T) string, replace bool) (added int, conflicts []string) {
	for _, item := range src {
		i := indexNamed(*dst, name(item), name)
		switch {
		case i < 0:
			*dst = append(*dst, item)
			added++
		case replace:
			(*dst)[i] = item
			added++
		default:
			conflicts = append(conflicts, name(item))
		}
	}
	return added, conflicts
}

// indexNamed returns the index of the item called name, or -1.
func indexNamed[T any](list []T, name string, nameOf func(T) string) int {
	for i, item := range list {
		if nameOf(item) == name {
			return i
		}
	}
	return -1
}

func indexSetup(list []Setup, name string) int {
	return indexNamed(list, name, func(s Setup) string { return s.Name })
}

func indexDevice(list []Device, name string) int {
	return indexNamed(list, name, func(d Device) string { return d.Name })
}
