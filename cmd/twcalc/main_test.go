package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// probeSheets are calculators for testing the terminal front end on its
// own, independent of any physics: "probe" has one input of each kind and
// repeats what it read; "fails" returns a computation error; "nan" adds a
// non-finite result; "sweep" attaches a table.
var probeSheets = []*sheet.Sheet{
	{ID: "probe", Summary: "reads one input of each kind", Inputs: []sheet.Input{
		{Key: "frequency", Label: "Frequency", Kind: sheet.Quantity, Dim: units.DimFrequency, PM: true, Min: 0, MinOpen: true, Max: 1e9, Hint: "a frequency"},
		{Key: "pressure", Label: "Pressure", Kind: sheet.Quantity, Dim: units.DimPressure, Default: "1bar", Hint: "a pressure"},
		{Key: "mode", Label: "Mode", Kind: sheet.Pick, Default: "engine", Choices: []sheet.Choice{{Key: "engine", Words: "Engine"}, {Key: "heat-pump", Words: "Heat pump"}}},
		{Key: "points", Label: "Points", Kind: sheet.Count, Default: "11", Min: 2, Max: 1000},
		{Key: "fraction", Label: "Fraction", Kind: sheet.Number, Default: "0.5", Min: 0, Max: 1},
		{Key: "verbose", Label: "Verbose", Kind: sheet.Switch},
		{Key: "label", Label: "Label", Kind: sheet.Text, Optional: true},
		{Key: "file", Label: "File", Kind: sheet.Text, Optional: true, Positional: true},
	}, Run: runProbe},
	{ID: "plain", Summary: "one frequency, no positional argument", Inputs: []sheet.Input{
		{Key: "frequency", Label: "Frequency", Kind: sheet.Quantity, Dim: units.DimFrequency, Default: "1 Hz"},
	}, Run: func(*sheet.Values) (*sheet.Result, error) { return &sheet.Result{}, nil }},
	{ID: "fails", Summary: "always fails to compute", Run: func(*sheet.Values) (*sheet.Result, error) {
		return nil, errors.New("no resonance found between 10 Hz and 10 kHz")
	}},
	{ID: "nan", Summary: "adds a result that is not finite", Run: func(*sheet.Values) (*sheet.Result, error) {
		r := &sheet.Result{}
		r.Add("length", "Length", math.NaN(), units.DimLength)
		return r, nil
	}},
	{ID: "sweep", Summary: "attaches a table", Run: func(*sheet.Values) (*sheet.Result, error) {
		r := &sheet.Result{Table: &sheet.Table{Header: []string{"length_m", "frequency_Hz"}, Rows: [][]float64{{0.147, 578.2}, {0.2, 425}}}}
		r.Caution("test caution")
		return r, nil
	}},
}

func probeCommands() []command {
	var cmds []command
	for _, s := range probeSheets {
		cmds = append(cmds, sheetCommand(s))
	}
	return cmds
}

// runProbe repeats the inputs as results so the tests can see what the
// parser produced.
func runProbe(v *sheet.Values) (*sheet.Result, error) {
	r := &sheet.Result{}
	f, p := v.Q("frequency"), v.Q("pressure")
	r.AddPM("frequency", "Frequency", f.Value, f.Uncertainty, units.DimFrequency)
	r.Add("pressure", "Pressure", p.Value, units.DimPressure)
	r.AddWords("mode", "Mode", v.PickKey("mode"))
	r.AddWords("points", "Points", strconv.Itoa(v.Count("points")))
	r.Add("fraction", "Fraction", v.Number("fraction"), units.DimNone)
	r.AddWords("verbose", "Verbose", strconv.FormatBool(v.On("verbose")))
	r.AddWords("label", "Label", v.Text("label"))
	r.AddWords("file", "File", v.Text("file"))
	r.AddComplex("f_kappa", "f_κ", complex(0.25, -0.5))
	if v.On("verbose") {
		r.Warn("a warning\nover two lines")
	}
	r.Caution("probe caution: defer to local codes")
	if p.Value > 100e5 {
		return nil, v.Blame(units.NewRangeError("pressure", p.Value, 0, 100e5, "Pa"), "pressure")
	}
	return r, nil
}

func runProbe1(t *testing.T, args ...string) (code int, stdout, stderr string) {
	t.Helper()
	var o, e bytes.Buffer
	code = runWith(probeCommands(), args, &o, &e)
	return code, o.String(), e.String()
}

// TestExitCodes checks the exit status and the one-line stderr message for
// good and bad command lines. The expected texts are this program's own
// messages (no outside source applies).
func TestExitCodes(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name string
		args []string
		code int
		// each string must appear in stderr (code != 0) or stdout (code 0)
		want []string
	}{
		{"no args lists commands", nil, exitUsage, []string{"probe", "reads one input"}},
		{"help lists commands", []string{"help"}, exitOK, []string{"probe", "fails"}},
		{"help of a command", []string{"help", "probe"}, exitOK, []string{"--frequency", "(required)", "--json"}},
		{"-h of a command", []string{"probe", "-h"}, exitOK, []string{"--points N", "2 to 1000", "FILE"}},
		{"flags after the positional argument", []string{"probe", "dev.json", "--frequency", "1kHz"}, exitOK, []string{"dev.json"}},
		{"two positional arguments", []string{"probe", "a.json", "b.json", "--frequency", "1kHz"}, exitUsage, []string{`unexpected argument "b.json"`}},
		{"-- ends the flags", []string{"probe", "--frequency", "1kHz", "--", "-odd.json"}, exitOK, []string{"-odd.json"}},
		{"unknown command", []string{"frobnicate"}, exitUsage, []string{`unknown command "frobnicate"`}},
		{"unknown flag", []string{"probe", "--frequency", "1kHz", "--colour", "red"}, exitUsage, []string{"unknown flag --colour"}},
		{"missing required flag", []string{"probe"}, exitUsage, []string{"--frequency is required"}},
		{"flag without value", []string{"probe", "--frequency"}, exitUsage, []string{"--frequency needs a value"}},
		{"wrong unit", []string{"probe", "--frequency", "3 bar"}, exitUsage, []string{`--frequency "3 bar"`}},
		{"not a number", []string{"probe", "--frequency", "NaN Hz"}, exitUsage, []string{`--frequency "NaN Hz"`}},
		{"infinite", []string{"probe", "--frequency", "Inf Hz"}, exitUsage, []string{`--frequency "Inf Hz"`}},
		{"empty", []string{"probe", "--frequency", ""}, exitUsage, []string{`--frequency ""`}},
		{"negative frequency", []string{"probe", "--frequency", "-5 Hz"}, exitUsage, []string{`--frequency "-5 Hz"`}},
		{"integer out of range", []string{"probe", "--frequency", "1Hz", "--points", "5000"}, exitUsage, []string{`--points "5000"`, "1000"}},
		{"integer not whole", []string{"probe", "--frequency", "1Hz", "--points", "2.5"}, exitUsage, []string{`--points "2.5"`, "whole number"}},
		{"float out of range", []string{"probe", "--frequency", "1Hz", "--fraction", "1.5"}, exitUsage, []string{`--fraction "1.5"`}},
		{"float NaN", []string{"probe", "--frequency", "1Hz", "--fraction", "NaN"}, exitUsage, []string{`--fraction "NaN"`, "finite"}},
		{"bad choice", []string{"probe", "--frequency", "1Hz", "--mode", "fridge"}, exitUsage, []string{`--mode "fridge"`, "engine, heat-pump"}},
		{"bad bool", []string{"probe", "--frequency", "1Hz", "--verbose=maybe"}, exitUsage, []string{`--verbose "maybe"`}},
		{"flag given twice", []string{"probe", "--frequency", "1Hz", "--frequency", "2Hz"}, exitUsage, []string{"--frequency given 2 times"}},
		{"space inside a value", []string{"plain", "--frequency", "578", "Hz"}, exitUsage, []string{`unexpected argument "Hz"`, "quote"}},
		{"range error from the computation names the flag", []string{"probe", "--frequency", "1Hz", "--pressure", "200bar"}, exitUsage, []string{`--pressure "200bar"`}},
		{"computation failure", []string{"fails"}, exitFail, []string{"twcalc: no resonance found"}},
		{"non-finite result", []string{"nan"}, exitFail, []string{"internal: result length is not finite"}},
		{"good input", []string{"probe", "--frequency", "567Hz+-8Hz"}, exitOK, []string{"frequency", "Hz"}},
		{"gauge pressure and case-insensitive choice", []string{"probe", "--frequency", "1 kHz", "--pressure", "30barg", "--mode", "Heat-Pump"}, exitOK, []string{"heat-pump"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			code, out, errs := runProbe1(t, c.args...)
			if code != c.code {
				t.Fatalf("exit %d, want %d\nstdout: %s\nstderr: %s", code, c.code, out, errs)
			}
			text := out
			if code != exitOK {
				text = errs
				if code != exitUsage || len(c.args) > 0 {
					// Errors are exactly one line on stderr, nothing on stdout.
					if strings.Count(errs, "\n") != 1 || !strings.HasSuffix(errs, "\n") {
						t.Errorf("stderr is not one line: %q", errs)
					}
					if !strings.HasPrefix(errs, "twcalc: ") {
						t.Errorf("stderr does not start with \"twcalc: \": %q", errs)
					}
					if out != "" {
						t.Errorf("stdout not empty on error: %q", out)
					}
				}
			} else if errs != "" {
				t.Errorf("stderr not empty on success: %q", errs)
			}
			for _, w := range c.want {
				if !strings.Contains(text, w) {
					t.Errorf("output lacks %q:\n%s", w, text)
				}
			}
		})
	}
}

// TestJSONShape decodes --json output and checks keys and types.
func TestJSONShape(t *testing.T) {
	t.Parallel()
	code, out, errs := runProbe1(t, "probe", "--frequency", "567Hz+-8Hz", "--pressure", "30barg", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var obj map[string]any
	if err := json.Unmarshal([]byte(out), &obj); err != nil {
		t.Fatalf("not one JSON object: %v\n%s", err, out)
	}
	for _, k := range []string{"inputs", "results"} {
		if _, ok := obj[k].(map[string]any); !ok {
			t.Errorf("%q is %T, want an object", k, obj[k])
		}
	}
	for _, k := range []string{"warnings", "cautions"} {
		if _, ok := obj[k].([]any); !ok {
			t.Errorf("%q is %T, want an array (never null)", k, obj[k])
		}
	}
	results := obj["results"].(map[string]any)
	for name, v := range results {
		m, ok := v.(map[string]any)
		if !ok {
			t.Errorf("result %s is %T, want an object", name, v)
			continue
		}
		if _, ok := m["value"]; !ok {
			t.Errorf("result %s has no value", name)
		}
		if _, ok := m["unit"].(string); !ok {
			t.Errorf("result %s has no string unit", name)
		}
	}
	f := results["frequency"].(map[string]any)
	// 567 Hz ± 8 Hz as typed: the uncertainty travels through unchanged.
	if f["value"] != 567.0 || f["unit"] != "Hz" || f["uncertainty"] != 8.0 {
		t.Errorf("frequency = %v, want value 567, unit Hz, uncertainty 8", f)
	}
	p := results["pressure"].(map[string]any)
	// 30 barg = 30e5 Pa + standard atmosphere 101325 Pa (ISO 2533; 1 bar =
	// 1e5 Pa by definition).
	if v := p["value"].(float64); math.Abs(v-3101325) > 1e-6 || p["unit"] != "Pa" {
		t.Errorf("pressure = %v, want 3101325 Pa", p)
	}
	if _, has := p["uncertainty"]; has {
		t.Errorf("pressure has an uncertainty although none was given: %v", p)
	}
	fk := results["f_kappa"].(map[string]any)["value"].(map[string]any)
	if fk["re"] != 0.25 || fk["im"] != -0.5 {
		t.Errorf("f_kappa = %v, want re 0.25 im -0.5", fk)
	}
	in := obj["inputs"].(map[string]any)
	fin, ok := in["frequency"].(map[string]any)
	if !ok || fin["typed"] != "567Hz+-8Hz" || fin["value"] != 567.0 || fin["unit"] != "Hz" {
		t.Errorf("input frequency = %v, want typed text with SI value and unit", in["frequency"])
	}
	if in["mode"] != "engine" || in["points"] != 11.0 || in["verbose"] != false || in["fraction"] != 0.5 {
		t.Errorf("defaults not echoed: %v", in)
	}
	if c := obj["cautions"].([]any); len(c) != 1 {
		t.Errorf("cautions = %v, want the probe caution", c)
	}
	if w := obj["warnings"].([]any); len(w) != 0 {
		t.Errorf("warnings = %v, want empty array", w)
	}
}

// TestJSONOrder checks that results keep insertion order in the JSON text.
func TestJSONOrder(t *testing.T) {
	t.Parallel()
	_, out, _ := runProbe1(t, "probe", "--frequency", "1kHz", "--json")
	order := []string{`"frequency"`, `"pressure"`, `"mode"`, `"points"`, `"fraction"`, `"verbose"`, `"label"`, `"f_kappa"`}
	res := out[strings.Index(out, `"results"`):]
	last := -1
	for _, k := range order {
		i := strings.Index(res, k)
		if i <= last {
			t.Fatalf("result %s out of insertion order in\n%s", k, res)
		}
		last = i
	}
}

// TestTableOutput checks the readable table: units on numbers, the ±, the
// warnings and the cautions set apart.
func TestTableOutput(t *testing.T) {
	t.Parallel()
	code, out, errs := runProbe1(t, "probe", "--frequency", "567Hz+-8Hz", "--verbose")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, w := range []string{
		"inputs", "results",
		units.FormatPM(567, 8, units.DimFrequency),
		units.Format(1e5, units.DimPressure),
		"0.25 − 0.5i",
		"warnings", "a warning over two lines",
		"CAUTION", "probe caution: defer to local codes",
	} {
		if !strings.Contains(out, w) {
			t.Errorf("table lacks %q:\n%s", w, out)
		}
	}
	if strings.Contains(out, "NaN") || strings.Contains(out, "Inf") {
		t.Errorf("table shows a non-finite number:\n%s", out)
	}
	if strings.Index(out, "CAUTION") < strings.Index(out, "results") {
		t.Errorf("cautions should follow the results")
	}
}

// TestSweepOutput checks that a report with a table prints CSV (with the
// caution as a comment) or, with --json, a "table" member.
func TestSweepOutput(t *testing.T) {
	t.Parallel()
	code, out, _ := runProbe1(t, "sweep")
	want := "length_m,frequency_Hz\n0.147,578.2\n0.2,425\n# CAUTION: test caution\n"
	if code != exitOK || out != want {
		t.Errorf("sweep CSV = %q (exit %d), want %q", out, code, want)
	}
	code, out, _ = runProbe1(t, "sweep", "--json")
	var obj struct {
		Table struct {
			Columns []string    `json:"columns"`
			Rows    [][]float64 `json:"rows"`
		} `json:"table"`
		Cautions []string `json:"cautions"`
	}
	if err := json.Unmarshal([]byte(out), &obj); err != nil || code != exitOK {
		t.Fatalf("sweep --json: exit %d, %v\n%s", code, err, out)
	}
	if len(obj.Table.Columns) != 2 || len(obj.Table.Rows) != 2 || obj.Table.Rows[1][1] != 425 || len(obj.Cautions) != 1 {
		t.Errorf("sweep --json = %+v", obj)
	}
}

func TestWantJSON(t *testing.T) {
	t.Parallel()
	cases := []struct {
		args []string
		want bool
	}{
		{[]string{"--json"}, true},
		{[]string{"-json"}, true},
		{[]string{"--json=true"}, true},
		{[]string{"--json=false"}, false},
		{[]string{"--json", "--json=false"}, false},
		{[]string{"--gas", "helium"}, false},
		{[]string{"--", "--json"}, false},
		{[]string{"json"}, false},
	}
	for _, c := range cases {
		if got := wantJSON(c.args); got != c.want {
			t.Errorf("wantJSON(%q) = %v, want %v", c.args, got, c.want)
		}
	}
}

// TestCommandTable checks the real table: unique names, a summary each, and
// every command answers -h with its help and exit 0.
func TestCommandTable(t *testing.T) {
	t.Parallel()
	seen := map[string]bool{}
	for _, c := range commands {
		if c.name == "" || c.summary == "" || c.run == nil {
			t.Errorf("incomplete command %+v", c)
		}
		if seen[c.name] {
			t.Errorf("command %s listed twice", c.name)
		}
		seen[c.name] = true
		var o, e bytes.Buffer
		if code := run([]string{c.name, "-h"}, &o, &e); code != exitOK || !strings.Contains(o.String(), "--json") {
			t.Errorf("twcalc %s -h: exit %d, stdout %q, stderr %q", c.name, code, o.String(), e.String())
		}
	}
}

// decodeRun runs twcalc with args and --json, wants exit 0, and decodes the
// printed object into a T.
func decodeRun[T any](t *testing.T, args ...string) T {
	t.Helper()
	var o, e bytes.Buffer
	if code := run(append(args, "--json"), &o, &e); code != exitOK {
		t.Fatalf("twcalc %q: exit %d: %s", args, code, e.String())
	}
	var out T
	if err := json.Unmarshal(o.Bytes(), &out); err != nil {
		t.Fatalf("%v\n%s", err, o.String())
	}
	return out
}
