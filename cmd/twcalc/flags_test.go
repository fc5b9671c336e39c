package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"math"
	"strings"
	"testing"

	"tubewright/calc/units"
)

// TestPositional: flags may come before and after positional arguments,
// "--" ends the flags, and more arguments than declared are refused.
func TestPositional(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name    string
		args    []string
		max     int
		rest    []string
		json    bool
		wantErr string
	}{
		{"file then flag", []string{"device.txt", "--json"}, 1, []string{"device.txt"}, true, ""},
		{"flag then file", []string{"--json", "device.txt"}, 1, []string{"device.txt"}, true, ""},
		{"double dash", []string{"--", "--json"}, 1, []string{"--json"}, false, ""},
		{"too many", []string{"a.txt", "b.txt"}, 1, nil, false, `unexpected argument "b.txt"`},
		{"none allowed", []string{"a.txt"}, 0, nil, false, "takes only flags"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			fl := newFlags("probe")
			if c.max > 0 {
				fl.positional(c.max, "FILE")
			}
			err := fl.parse(c.args)
			if c.wantErr != "" {
				var u *usageError
				if !errors.As(err, &u) || !strings.Contains(err.Error(), c.wantErr) {
					t.Fatalf("err = %v, want a usage error containing %q", err, c.wantErr)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			if strings.Join(fl.args(), "|") != strings.Join(c.rest, "|") || fl.json != c.json {
				t.Errorf("args %q json %v, want %q %v", fl.args(), fl.json, c.rest, c.json)
			}
		})
	}
}

// TestQuantityFlag: values typed in other units arrive in SI. Conversion
// factors: 0 °C = 273.15 K and 1 bar = 1e5 Pa (BIPM, The International
// System of Units, 9th edition, 2019); 1 in = 0.0254 m exactly
// (international yard and pound agreement, 1959).
func TestQuantityFlag(t *testing.T) {
	t.Parallel()
	cases := []struct {
		typed string
		dim   units.Dimension
		want  float64
	}{
		{"27degC", units.DimTemperature, 300.15},
		{"300 K", units.DimTemperature, 300},
		{"10bar", units.DimPressure, 1e6},
		{"3/8 in", units.DimLength, 0.009525},
		{"1.2 kHz", units.DimFrequency, 1200},
	}
	for _, c := range cases {
		fl := newFlags("probe")
		q := fl.quantity("x", c.dim, "", "test")
		if err := fl.parse([]string{"--x", c.typed}); err != nil {
			t.Errorf("%q: %v", c.typed, err)
			continue
		}
		if d := q.Value - c.want; d > 1e-9*c.want || d < -1e-9*c.want {
			t.Errorf("%q = %v, want %v", c.typed, q.Value, c.want)
		}
		if !fl.given("x") {
			t.Errorf("%q: given(x) = false", c.typed)
		}
	}
}

// TestBadDefaultPanics: a default that does not parse is a programmer
// error found the first time the command runs.
func TestBadDefaultPanics(t *testing.T) {
	t.Parallel()
	defer func() {
		if recover() == nil {
			t.Error("no panic for a default in the wrong dimension")
		}
	}()
	newFlags("probe").quantity("x", units.DimLength, "3 bar", "test")
}

// TestBlame: a range error from a computation is turned into a usage error
// naming the flag whose name matches the error's field.
func TestBlame(t *testing.T) {
	t.Parallel()
	fl := newFlags("probe")
	fl.quantity("mean-pressure", units.DimPressure, "10bar", "p")
	fl.quantity("temperature", units.DimTemperature, "300K", "T")
	if err := fl.parse(nil); err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		err  error
		want string // "" means the error comes back unchanged
	}{
		{units.NewRangeError("temperature", 15, 20, 3000, "K"), `--temperature "300K": `},
		{units.NewRangeError("mean pressure", 1, 2, 3, "Pa"), `--mean-pressure "10bar": `},
		{errors.New("no root"), ""},
	}
	for _, c := range cases {
		got := fl.blame(c.err)
		if c.want == "" {
			if got != c.err {
				t.Errorf("blame(%v) = %v, want it unchanged", c.err, got)
			}
			continue
		}
		var u *usageError
		if !errors.As(got, &u) || !strings.HasPrefix(got.Error(), c.want) {
			t.Errorf("blame(%v) = %v, want a usage error starting %q", c.err, got, c.want)
		}
	}
}

// TestSpan: sweep ranges FROM:TO[:N] in any unit; 0 °C = 273.15 K (BIPM,
// The International System of Units, 9th edition, 2019).
func TestSpan(t *testing.T) {
	t.Parallel()
	cases := []struct {
		typed    string
		from, to float64
		n        int
		wantErr  string
	}{
		{"250K:350K:5", 250, 350, 5, ""},
		{"0degC:100degC", 273.15, 373.15, 11, ""},
		{"350K:250K:2", 350, 250, 2, ""},
		{"250K:350K:1", 0, 0, 0, "number of points 1"},
		{"250K:350K:1e9", 0, 0, 0, "not a whole number"},
		{"250K", 0, 0, 0, "FROM:TO"},
		{"250K:3bar:5", 0, 0, 0, `"3bar"`},
		{"250K:350K:5:7", 0, 0, 0, "FROM:TO"},
	}
	for _, c := range cases {
		fl := newFlags("probe")
		sp := fl.span("sweep", units.DimTemperature, "test")
		err := fl.parse([]string{"--sweep", c.typed})
		if c.wantErr != "" {
			if err == nil || !strings.Contains(err.Error(), c.wantErr) || !strings.HasPrefix(err.Error(), "--sweep ") {
				t.Errorf("%q: err = %v, want one naming --sweep and containing %q", c.typed, err, c.wantErr)
			}
			continue
		}
		if err != nil {
			t.Errorf("%q: %v", c.typed, err)
			continue
		}
		v := sp.values()
		if !sp.Set || len(v) != c.n || v[0] != sp.From || v[len(v)-1] != c.to ||
			math.Abs(sp.From-c.from) > 1e-9 || math.Abs(sp.To-c.to) > 1e-9 {
			t.Errorf("%q: span %+v values %v", c.typed, *sp, v)
		}
		for i := 1; i < len(v); i++ {
			step := (c.to - c.from) / float64(c.n-1)
			if math.Abs(v[i]-v[i-1]-step) > 1e-9 {
				t.Errorf("%q: uneven step at %d: %v", c.typed, i, v)
			}
		}
	}
	fl := newFlags("probe")
	sp := fl.span("sweep", units.DimTemperature, "test")
	if err := fl.parse(nil); err != nil || sp.Set {
		t.Errorf("unset span: err %v, Set %v", err, sp.Set)
	}
}

// FuzzRunProbe feeds arbitrary text to every kind of flag through the whole
// command line of a physics-free command: never a panic, errors are one
// line on stderr with exit 2, and no NaN or Inf reaches the results.
func FuzzRunProbe(f *testing.F) {
	for _, s := range [][3]string{
		{"567Hz+-8Hz", "30barg", "11"}, {"NaN Hz", "Inf bar", "x"}, {"", "", ""},
		{"1e308 kHz", "-1 bar", "-3"}, {"0,5 kHz", "145 psi", "1000"}, {"3/8 Hz", "1e-400 Pa", "2"},
	} {
		f.Add(s[0], s[1], s[2])
	}
	f.Fuzz(func(t *testing.T, freq, pres, points string) {
		var o, e bytes.Buffer
		code := runWith(probeCommands(), []string{"probe", "--frequency", freq, "--pressure", pres, "--points", points, "--fraction", points, "--json"}, &o, &e)
		switch code {
		case exitOK:
			var obj struct {
				Results map[string]json.RawMessage `json:"results"`
			}
			if err := json.Unmarshal(o.Bytes(), &obj); err != nil || len(obj.Results) == 0 {
				t.Fatalf("bad JSON (%v):\n%s", err, o.String())
			}
		case exitUsage:
			if o.Len() != 0 || strings.Count(e.String(), "\n") != 1 || !strings.HasPrefix(e.String(), "twcalc: --") {
				t.Fatalf("stdout %q stderr %q", o.String(), e.String())
			}
		default:
			t.Fatalf("exit %d: %s", code, e.String())
		}
	})
}
