package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
)

// exponent matches a number written with an exponent ("2.439e-4", "1E+07").
var exponent = regexp.MustCompile(`[0-9.][eE][-+]?[0-9]`)

// exampleArgs turns a help example ("twcalc onset mydevice.json --json")
// into arguments that run here: files named in it are the project's own
// example devices and recordings, files it writes go to dir.
func exampleArgs(t *testing.T, line, dir string) []string {
	t.Helper()
	args := sheet.ExampleArgs(line)
	if len(args) < 2 || args[0] != "twcalc" {
		t.Fatalf("example %q does not start with twcalc", line)
	}
	args = args[1:]
	recordings := map[string]string{
		"tap.wav":       "../../testdata/listen_sox_ring16.wav",
		"warmup.wav":    "../../testdata/listen_sox_sine16.wav",
		"mydevice.json": "engine",
		"mypump.json":   "heatpump",
	}
	for i, a := range args {
		switch {
		case a == ">":
			return args[:i] // a shell redirection: the CSV goes to stdout here
		case strings.HasSuffix(a, ".wav"):
			args[i] = recordings[a]
		case strings.HasSuffix(a, ".json") && i > 0 && args[i-1] == "--device-out":
			args[i] = filepath.Join(dir, a)
		case strings.HasSuffix(a, ".json"):
			b, err := linear.ExampleFile(recordings[a])
			if err != nil {
				t.Fatalf("example %q: %v", line, err)
			}
			args[i] = filepath.Join(dir, a)
			if err := os.WriteFile(args[i], b, 0o600); err != nil {
				t.Fatal(err)
			}
		}
	}
	return args
}

// TestExamplesReadWithoutExponents runs every example of every terminal
// calculator's help, as a table (or CSV for a sweep) and as JSON, and
// asserts that what a person reads has no number with an exponent: the
// table, its echo of the inputs, warnings, cautions, notes, checks and
// details, the CSV, and each calculator's help. The JSON's values are numbers for tools and may
// use exponents; its texts (warnings, cautions, verdicts) may not.
func TestExamplesReadWithoutExponents(t *testing.T) {
	t.Parallel()
	ran := 0
	for _, e := range sheet.Catalog() {
		if e.Sheet == nil || e.Place&sheet.InTerminal == 0 {
			continue
		}
		var help, herr bytes.Buffer
		run([]string{string(e.ID), "-h"}, &help, &herr)
		if exponent.MatchString(help.String() + herr.String()) {
			t.Errorf("twcalc %s -h has an exponent:\n%s%s", e.ID, help.String(), herr.String())
		}
		for _, line := range e.Sheet.Examples {
			args := exampleArgs(t, line, t.TempDir())
			var out, errb bytes.Buffer
			if code := run(args, &out, &errb); code != 0 {
				t.Errorf("%s: exit %d: %s", line, code, errb.String())
				continue
			}
			ran++
			text := out.String()
			if hasJSON(args) {
				text = jsonTexts(t, out.Bytes())
			}
			for _, l := range strings.Split(text, "\n") {
				if exponent.MatchString(l) {
					t.Errorf("%s: %q has an exponent", line, l)
				}
			}
		}
	}
	if ran < 30 {
		t.Errorf("only %d examples ran", ran)
	}
}

func hasJSON(args []string) bool {
	for _, a := range args {
		if a == "--json" {
			return true
		}
	}
	return false
}

// jsonTexts returns the words of a --json output that people read: the
// warnings, cautions, notes and the why of each verdict, one per line.
func jsonTexts(t *testing.T, b []byte) string {
	t.Helper()
	var v struct {
		Warnings []string        `json:"warnings"`
		Cautions []string        `json:"cautions"`
		Notes    []string        `json:"notes"`
		Verdicts []sheet.Verdict `json:"verdicts"`
	}
	if err := json.Unmarshal(b, &v); err != nil {
		t.Fatalf("JSON: %v\n%s", err, b)
	}
	lines := append(append(append([]string{}, v.Warnings...), v.Cautions...), v.Notes...)
	for _, x := range v.Verdicts {
		lines = append(lines, x.Why)
	}
	return strings.Join(lines, "\n")
}
