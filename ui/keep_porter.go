package ui

import (
	"errors"
	"fmt"
	"sort"
	"strings"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// Porter moves export files out of the app and import files in: a file
// dialog on the desktop, a download and a file picker in the browser (set
// by cmd/tubewright). Both calls may block until the user answers; the app
// calls them off the UI goroutine.
type Porter interface {
	// Export offers data to the user as a file named name and says where
	// it went, in plain words ("saved as /home/x/tubewright.json", "sent
	// to your downloads").
	Export(name string, data []byte) (string, error)
	// Import asks the user for a file and returns its bytes; ErrCancelled
	// when the user chose none.
	Import() ([]byte, error)
}

// PathPorter is a Porter without a file dialog (the desktop build): the
// Saved work page shows a field for the path of the file to import,
// starting at ImportPath, and reads it with ImportFrom.
type PathPorter interface {
	Porter
	// ImportPath is the path offered at first.
	ImportPath() string
	// ImportFrom reads the file at path (at most store.MaxLibraryBytes).
	ImportFrom(path string) ([]byte, error)
}

// ErrCancelled is returned by Porter.Import when the user chose no file.
var ErrCancelled = errors.New("no file chosen")

// noPorter is the Porter of an app given none.
type noPorter struct{}

func (noPorter) Export(string, []byte) (string, error) {
	return "", errors.New("this build has no way to write files")
}

func (noPorter) Import() ([]byte, error) {
	return nil, errors.New("this build has no way to read files")
}

// entryText writes a logged result as plain text for the clipboard or a
// lab book: title and time, the note, inputs, rows, verdicts, warnings and
// cautions, one per line.
func entryText(e store.Entry) string {
	var b strings.Builder
	fmt.Fprintf(&b, "%s, %s\n", keepLine(e.Title), e.Time.Format("2006-01-02 15:04:05"))
	if e.Note != "" {
		fmt.Fprintf(&b, "Note: %s\n", keepLine(e.Note))
	}
	if len(e.Inputs) > 0 {
		b.WriteString("Inputs:\n")
		s, _ := sheet.Lookup(sheet.ID(e.Calculator))
		for _, k := range inputOrder(s, e.Inputs) {
			label := k
			if s != nil {
				if in := s.Input(k); in != nil && in.Label != "" {
					label = in.Label
				}
			}
			if v := e.Inputs[k]; strings.Contains(v, "\n") {
				fmt.Fprintf(&b, "  %s: (%d lines, kept in the export file)\n", keepLine(label), strings.Count(v, "\n")+1)
				continue
			}
			fmt.Fprintf(&b, "  %s: %s\n", keepLine(label), keepLine(e.Inputs[k]))
		}
	}
	if len(e.Rows) > 0 {
		b.WriteString("Results:\n")
		for _, r := range e.Rows {
			fmt.Fprintf(&b, "  %s: %s\n", keepLine(r.Label), keepLine(r.Shown))
		}
	}
	for _, v := range e.Verdicts {
		fmt.Fprintf(&b, "%s %s: %s\n", strings.ToUpper(v.Outcome), keepLine(v.Check), keepLine(v.Why))
	}
	for _, w := range e.Warnings {
		fmt.Fprintf(&b, "Warning: %s\n", keepLine(w))
	}
	for _, c := range e.Cautions {
		fmt.Fprintf(&b, "CAUTION: %s\n", keepLine(c))
	}
	return b.String()
}

// keepLine folds control characters into spaces.
func keepLine(s string) string {
	return strings.Map(func(r rune) rune {
		if r < 0x20 || r == 0x7f {
			return ' '
		}
		return r
	}, s)
}

// inputOrder lists the keys of texts in the order of s's inputs (s may be
// nil), then any others sorted.
func inputOrder(s *sheet.Sheet, texts map[string]string) []string {
	var out, rest []string
	seen := map[string]bool{}
	if s != nil {
		for _, in := range s.Inputs {
			if _, ok := texts[in.Key]; ok {
				out = append(out, in.Key)
				seen[in.Key] = true
			}
		}
	}
	for k := range texts {
		if !seen[k] {
			rest = append(rest, k)
		}
	}
	sort.Strings(rest)
	return append(out, rest...)
}
