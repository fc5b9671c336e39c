package ui

import (
	"bytes"
	"encoding/json"
	"image"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strings"
	"sync"
	"testing"

	"tubewright/calc/sheet"
)

// agreeCase is one set of inputs for a calculator, run through the app (typed
// into its screen through the input router) and through the terminal
// companion (its --json output). Inputs not named keep their defaults
// (or, for required inputs, the screen's example, which the case must then
// name for the terminal too).
type agreeCase struct {
	id    sheet.ID
	name  string
	texts map[string]string
	// errKey, when set, is the input the case's error must name: the app
	// marks that field, the terminal names that flag.
	errKey string
	// taps are chips the app's screen needs tapped before the texts are
	// typed (a radius instead of a diameter); the terminal has flags.
	taps []string
}

// agreeCases are the cases of every calculator; each calculator's cases
// live in agree_<id>_test.go and add themselves here.
var agreeCases []agreeCase

func addAgreeCases(cs ...agreeCase) bool {
	agreeCases = append(agreeCases, cs...)
	return true
}

var twcalcOnce struct {
	sync.Once
	exe string
	err error
	out []byte
}

// twcalcExe builds the terminal companion once per test run.
func twcalcExe(t *testing.T) string {
	t.Helper()
	twcalcOnce.Do(func() {
		gobin, err := exec.LookPath("go")
		if err != nil {
			twcalcOnce.err = err
			return
		}
		dir, err := tempDirOutsideTest()
		if err != nil {
			twcalcOnce.err = err
			return
		}
		twcalcOnce.exe = filepath.Join(dir, "twcalc")
		twcalcOnce.out, twcalcOnce.err = exec.Command(gobin, "build", "-o", twcalcOnce.exe, "tubewright/cmd/twcalc").CombinedOutput()
	})
	if twcalcOnce.err != nil {
		t.Fatalf("go build twcalc: %v\n%s", twcalcOnce.err, twcalcOnce.out)
	}
	return twcalcOnce.exe
}

// terminalOut is what twcalc --json printed, decoded.
type terminalOut struct {
	Results  map[string]json.RawMessage `json:"results"`
	Details  map[string]json.RawMessage `json:"details"`
	Warnings []string                   `json:"warnings"`
	Cautions []string                   `json:"cautions"`
	Verdicts []sheet.Verdict            `json:"verdicts"`
}

// runTerminal runs twcalc ID --json with the case's texts as flags (or
// positional arguments) and returns the decoded output, or the stderr line
// of a failure.
func runTerminal(t *testing.T, s *sheet.Sheet, c agreeCase) (*terminalOut, string) {
	t.Helper()
	args := []string{string(s.ID), "--json"}
	keys := make([]string, 0, len(c.texts))
	for k := range c.texts {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		in := s.Input(k)
		if in == nil {
			t.Fatalf("%s/%s: no input %q", s.ID, c.name, k)
		}
		if in.Positional {
			args = append(args, c.texts[k])
			continue
		}
		args = append(args, "--"+k+"="+c.texts[k])
	}
	cmd := exec.Command(twcalcExe(t), args...)
	var o, e bytes.Buffer
	cmd.Stdout, cmd.Stderr = &o, &e
	if err := cmd.Run(); err != nil {
		return nil, strings.TrimSpace(e.String())
	}
	var out terminalOut
	if err := json.Unmarshal(o.Bytes(), &out); err != nil {
		t.Fatalf("twcalc %q: %v\n%s", args, err, o.String())
	}
	return &out, ""
}

// formScreen is a screen built on a calculator's Form.
type formScreen interface {
	Screen
	Form() *Form
}

// Form implements formScreen.
func (s *sheetScreen) Form() *Form { return s.form }

// runApp opens the calculator's screen in a fresh app, types the case's
// texts into its fields through the input router (chips are tapped; a gas
// is set on its picker), and returns the form.
func runApp(t *testing.T, s *sheet.Sheet, c agreeCase) *Form {
	t.Helper()
	a := NewApp(nil)
	scr, ok := a.Screen(s.ID).(formScreen)
	if !ok {
		t.Fatalf("%s: the screen is not built on its description's Form", s.ID)
	}
	f := scr.Form()
	h := newHarness(t, image.Pt(1000, 9000), scr.Layout)
	for _, label := range c.taps {
		h.tap(label)
		h.frames(2)
	}
	for _, in := range s.Inputs {
		text, ok := c.texts[in.Key]
		if !ok {
			continue
		}
		typeInput(h, f, &in, text)
		h.frames(2)
	}
	h.frames(2)
	return f
}

// twcalcDir holds the twcalc built for the tests; TestMain removes it.
var twcalcDir string

func tempDirOutsideTest() (string, error) {
	dir, err := os.MkdirTemp("", "twcalc-agree-")
	twcalcDir = dir
	return dir, err
}

// typeInput gives input in the text as a person would: typed into its field
// through the router, a chip or the switch tapped; a gas is set on its
// picker (the picker's own tests cover its chips).
func typeInput(h *harness, f *Form, in *sheet.Input, text string) {
	h.t.Helper()
	switch in.Kind {
	case sheet.Gas:
		if err := f.Gas(in.Key).SetText(text); err != nil {
			f.SetText(in.Key, text)
		}
		f.Invalidate()
	case sheet.Pick:
		words := text
		for _, ch := range in.Choices {
			if strings.EqualFold(ch.Key, text) {
				words = ch.Words
			}
		}
		h.tap(words)
	case sheet.Switch:
		if f.Text(in.Key) != text {
			h.tap(in.Label)
		}
	default:
		h.retype(in.Label, f.Field(in.Key).Text(), text)
	}
}

// TestAppAndTerminalAgree runs every calculator's cases through both front
// ends and asserts identical values, ±, warnings, cautions, verdicts and
// the input named by an error.
func TestAppAndTerminalAgree(t *testing.T) {
	if testing.Short() {
		t.Skip("builds twcalc; skipped with -short")
	}
	covered := map[sheet.ID]int{}
	for _, c := range agreeCases {
		s, ok := sheet.Lookup(c.id)
		if !ok {
			t.Fatalf("case %s/%s: no calculator %s", c.id, c.name, c.id)
		}
		covered[c.id]++
		t.Run(string(c.id)+"/"+c.name, func(t *testing.T) {
			term, stderr := runTerminal(t, s, c)
			checkAgreement(t, runApp(t, s, c), c.errKey, term, stderr)
		})
	}
	for _, e := range sheet.Catalog() {
		if e.Sheet != nil && e.Place&sheet.InApp != 0 && covered[e.ID] < 3 {
			t.Errorf("calculator %s has %d agreement cases; want at least 3 (one with ±, one bad input)", e.ID, covered[e.ID])
		}
	}
}

// checkAgreement asserts that the app's form and the terminal's output
// agree: on an error, both name input errKey; otherwise the same rows,
// values, ±, warnings, cautions and verdicts.
func checkAgreement(t *testing.T, f *Form, errKey string, term *terminalOut, stderr string) {
	t.Helper()
	if errKey != "" {
		if term != nil {
			t.Fatalf("terminal gave a result, want an error about --%s", errKey)
		}
		if want := "twcalc: --" + errKey + " "; !strings.HasPrefix(stderr, want) {
			t.Errorf("terminal error %q does not start with %q", stderr, want)
		}
		var keys []string
		for _, fe := range sheet.FieldErrors(f.Err()) {
			keys = append(keys, fe.Key)
		}
		if len(keys) == 0 || keys[0] != errKey {
			t.Fatalf("app error %v names inputs %v, want %s first", f.Err(), keys, errKey)
		}
		if fd := f.Field(errKey); fd != nil && fd.ErrorText() == "" {
			t.Errorf("app field %s shows no error", errKey)
		}
		return
	}
	if term == nil {
		t.Fatalf("terminal failed: %s", stderr)
	}
	res := f.Result()
	if res == nil {
		t.Fatalf("app gave no result: %v", f.Err())
	}
	compareRows(t, res, term)
	compareDetails(t, res, term)
	if !equalStrings(res.Warnings, term.Warnings) {
		t.Errorf("warnings differ:\napp:      %q\nterminal: %q", res.Warnings, term.Warnings)
	}
	if !equalStrings(res.Cautions, term.Cautions) {
		t.Errorf("cautions differ:\napp:      %q\nterminal: %q", res.Cautions, term.Cautions)
	}
	if v := res.Verdicts(); !equalVerdicts(v, term.Verdicts) {
		t.Errorf("verdicts differ:\napp:      %+v\nterminal: %+v", v, term.Verdicts)
	}
}

// compareRows checks that every row the app computed is in the terminal's
// JSON with the same value and ±, and that the JSON has no other rows.
func compareRows(t *testing.T, res *sheet.Result, term *terminalOut) {
	t.Helper()
	if len(res.Rows) != len(term.Results) {
		t.Errorf("app has %d rows, terminal %d results", len(res.Rows), len(term.Results))
	}
	for _, row := range res.Rows {
		raw, ok := term.Results[row.Key]
		if !ok {
			t.Errorf("terminal has no result %s", row.Key)
			continue
		}
		switch row.Kind {
		case sheet.Num:
			var got struct {
				Value       float64 `json:"value"`
				Uncertainty float64 `json:"uncertainty"`
			}
			if err := json.Unmarshal(raw, &got); err != nil {
				t.Errorf("result %s: %v", row.Key, err)
				continue
			}
			if got.Value != row.Value || got.Uncertainty != row.PM {
				t.Errorf("result %s: app %v ± %v, terminal %v ± %v", row.Key, row.Value, row.PM, got.Value, got.Uncertainty)
			}
		case sheet.Words:
			var got struct {
				Value string `json:"value"`
			}
			if err := json.Unmarshal(raw, &got); err != nil || got.Value != row.Text {
				t.Errorf("result %s: app %q, terminal %s", row.Key, row.Text, raw)
			}
		case sheet.Complex:
			var got struct {
				Value struct{ Re, Im float64 } `json:"value"`
			}
			if err := json.Unmarshal(raw, &got); err != nil || complex(got.Value.Re, got.Value.Im) != row.Z {
				t.Errorf("result %s: app %v, terminal %s", row.Key, row.Z, raw)
			}
		case sheet.Object:
			want, err := json.Marshal(struct {
				Value any    `json:"value"`
				Unit  string `json:"unit"`
			}{row.Any, ""})
			if err != nil || !jsonEqual(raw, want) {
				t.Errorf("result %s: app %s, terminal %s", row.Key, want, raw)
			}
		}
	}
}

// compareDetails checks that the solve's diagnostics the app keeps in its
// Details section are the terminal's "details", and nothing more.
func compareDetails(t *testing.T, res *sheet.Result, term *terminalOut) {
	t.Helper()
	if len(res.Details) != len(term.Details) {
		t.Errorf("app has %d details, terminal %d", len(res.Details), len(term.Details))
	}
	for _, d := range res.Details {
		raw, ok := term.Details[d.Key]
		if !ok {
			t.Errorf("terminal has no detail %s", d.Key)
			continue
		}
		want, err := json.Marshal(struct {
			Value any    `json:"value"`
			Unit  string `json:"unit"`
		}{d.Any, ""})
		if err != nil || !jsonEqual(raw, want) {
			t.Errorf("detail %s: app %s, terminal %s", d.Key, want, raw)
		}
	}
}

func jsonEqual(a, b []byte) bool {
	var x, y any
	if json.Unmarshal(a, &x) != nil || json.Unmarshal(b, &y) != nil {
		return false
	}
	xa, _ := json.Marshal(x)
	ya, _ := json.Marshal(y)
	return bytes.Equal(xa, ya)
}

func equalStrings(a, b []string) bool {
	if len(a) != len(b) {
		return false
	}
	for i := range a {
		// the terminal writes each on one line
		if strings.Join(strings.Fields(a[i]), " ") != b[i] {
			return false
		}
	}
	return true
}

func equalVerdicts(a, b []sheet.Verdict) bool {
	if len(a) != len(b) {
		return false
	}
	for i := range a {
		if a[i] != b[i] {
			return false
		}
	}
	return true
}
