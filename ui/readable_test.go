package ui

import (
	"image"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
)

// numberWithExponent matches a number written with an exponent ("2.439e-4", "1E+07").
var numberWithExponent = regexp.MustCompile(`[0-9.][eE][-+]?[0-9]`)

// exampleTexts reads a help example ("twcalc pores --gas helium ...
// --json") as the texts of the calculator's inputs; files it names are the
// project's example devices and recordings, written to dir where needed.
// Terminal-only flags (--json, --device-out, a redirection) are dropped.
func exampleTexts(t *testing.T, s *sheet.Sheet, line, dir string) map[string]string {
	t.Helper()
	args := sheet.ExampleArgs(line)[2:]
	files := map[string]string{
		"tap.wav":       "../testdata/listen_sox_ring16.wav",
		"warmup.wav":    "../testdata/listen_sox_sine16.wav",
		"mydevice.json": "engine",
		"mypump.json":   "heatpump",
	}
	texts := map[string]string{}
	for i := 0; i < len(args); i++ {
		a := args[i]
		switch {
		case a == ">":
			return texts
		case a == "--json":
			continue
		case a == "--device-out" || a == "--log-to" || a == "--note":
			i++
			continue
		case strings.HasPrefix(a, "--"):
			key, val, ok := strings.Cut(strings.TrimPrefix(a, "--"), "=")
			in := s.Input(key)
			if in == nil {
				t.Fatalf("%s: no input %q", line, key)
			}
			if !ok && in.Kind == sheet.Switch {
				val = "true"
			} else if !ok {
				i++
				val = args[i]
			}
			texts[key] = val
		default:
			for _, in := range s.Inputs {
				if !in.Positional {
					continue
				}
				path := files[a]
				if strings.HasSuffix(a, ".json") {
					b, err := linear.ExampleFile(path)
					if err != nil {
						t.Fatal(err)
					}
					path = filepath.Join(dir, a)
					if err := os.WriteFile(path, b, 0o600); err != nil {
						t.Fatal(err)
					}
				}
				texts[in.Key] = path
			}
		}
	}
	return texts
}

// TestAppExamplesReadWithoutExponents runs every example of every
// calculator of the app and asserts that nothing a person reads has a
// number with an exponent: the result card as the app fills it (rows,
// opened details, warnings), the cautions and notes, and, where the
// screen's own choices take the example as it stands (the resonance screen
// asks which resonator and what to solve for, where twcalc infers them),
// every text the whole screen draws.
func TestAppExamplesReadWithoutExponents(t *testing.T) {
	ran, screens := 0, 0
	for _, e := range sheet.Catalog() {
		if e.Sheet == nil || e.Place&sheet.InApp == 0 {
			continue
		}
		for _, line := range e.Sheet.Examples {
			texts := exampleTexts(t, e.Sheet, line, t.TempDir())
			res, err := e.Sheet.Evaluate(texts)
			if err != nil {
				t.Errorf("%s: %v", line, err)
				continue
			}
			ran++
			r := NewResults(NewEnv(nil))
			r.Show(res)
			h := newHarness(t, image.Pt(412, 4000), r.Layout)
			if len(res.Details) > 0 {
				h.tap("Show details of the solve")
				h.frames(2)
			}
			read := []string{r.String(), h.dump()}
			read = append(append(append(read, res.Warnings...), res.Cautions...), res.Notes...)

			a := NewApp(nil)
			scr, ok := a.Screen(e.ID).(formScreen)
			if !ok {
				t.Fatalf("%s: the screen is not built on a Form", e.ID)
			}
			f := scr.Form()
			for _, in := range e.Sheet.Inputs {
				f.SetText(in.Key, in.Default) // as twcalc starts: defaults only
			}
			for k, v := range texts {
				f.SetText(k, v)
			}
			if f.Compute(); f.Result() != nil {
				screens++
				sh := newHarness(t, image.Pt(1000, 9000), scr.Layout)
				sh.frames(2)
				read = append(read, sh.dump())
			}
			for _, l := range strings.Split(strings.Join(read, "\n"), "\n") {
				if numberWithExponent.MatchString(l) {
					t.Errorf("%s: the app shows %q", line, l)
				}
			}
		}
	}
	t.Logf("%d examples, %d on their screens", ran, screens)
	if ran < 25 || screens < 20 {
		t.Errorf("only %d examples ran, %d on their screens", ran, screens)
	}
}
