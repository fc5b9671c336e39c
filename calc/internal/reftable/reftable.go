// Package reftable reads the reference tables that the committed scripts
// under testdata/ write, for the tests that compare with them.
//
// A table is comma-separated text: lines that start with "#" are comments
// (the script and library versions that made it), the first other line is
// the header, and every later line is a name followed by numbers.
package reftable

import (
	"bufio"
	"os"
	"strconv"
	"strings"
	"testing"
)

// Row is one line of a reference table: its leading name and its numbers.
type Row struct {
	Name   string
	Values []float64
}

// Read reads the table at path (relative to the test's package folder)
// whose lines hold a name and exactly numbers values. It fails the test
// on a missing file, a malformed line or a table with fewer than minRows
// rows, and says which script regenerates it.
func Read(t testing.TB, path string, numbers, minRows int, script string) []Row {
	t.Helper()
	fh, err := os.Open(path)
	if err != nil {
		t.Fatalf("reference table: %v (regenerate with /usr/bin/python3 %s)", err, script)
	}
	defer fh.Close()
	var rows []Row
	header := true
	sc := bufio.NewScanner(fh)
	for sc.Scan() {
		line := sc.Text()
		if strings.HasPrefix(line, "#") || strings.TrimSpace(line) == "" {
			continue
		}
		if header {
			header = false
			continue
		}
		p := strings.Split(line, ",")
		if len(p) != numbers+1 {
			t.Fatalf("%s: bad row %q: want a name and %d numbers", path, line, numbers)
		}
		r := Row{Name: p[0], Values: make([]float64, numbers)}
		for i := range r.Values {
			if r.Values[i], err = strconv.ParseFloat(p[i+1], 64); err != nil {
				t.Fatalf("%s: bad number in %q: %v", path, line, err)
			}
		}
		rows = append(rows, r)
	}
	if err := sc.Err(); err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	if len(rows) < minRows {
		t.Fatalf("%s: only %d rows, want at least %d (regenerate with /usr/bin/python3 %s)", path, len(rows), minRows, script)
	}
	return rows
}
