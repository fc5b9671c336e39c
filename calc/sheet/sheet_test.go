package sheet

import (
	"errors"
	"math"
	"strings"
	"testing"

	"tubewright/calc/units"
)

// probe is a sheet with one input of each kind, for testing the parsing
// rules on their own.
var probe = &Sheet{
	ID: "probe",
	Inputs: []Input{
		{Key: "frequency", Label: "Frequency", Kind: Quantity, Dim: units.DimFrequency, PM: true, Min: 1, Max: 1e5},
		{Key: "length", Label: "Length", Kind: Quantity, Dim: units.DimLength, Default: "1 m", Min: 0, MinOpen: true, Max: 100},
		{Key: "ends", Label: "Ends", Kind: Pick, Default: "closed-open", Choices: []Choice{
			{Key: "closed-open", Words: "Closed at one end", Value: 1},
			{Key: "closed-closed", Words: "Closed at both ends", Value: 2},
		}},
		{Key: "zones", Label: "Zones", Kind: Count, Default: "2", Min: 1, Max: 5},
		{Key: "fraction", Label: "Fraction", Kind: Number, Default: "0.5", Min: 0, Max: 1},
		{Key: "verbose", Label: "Verbose", Kind: Switch},
		{Key: "sweep", Label: "Sweep", Kind: Sweep, Dim: units.DimTemperature, Optional: true},
		{Key: "gas", Label: "Gas", Kind: Gas, Default: "helium"},
	},
	Run: func(v *Values) (*Result, error) {
		r := &Result{}
		q := v.Q("frequency")
		r.AddPM("frequency", "Frequency", q.Value, q.Uncertainty, units.DimFrequency)
		return r, nil
	},
}

// TestParseRules checks what each kind of input accepts and the key each
// error carries. The unit factors are the units package's (checked there
// against NIST SP 811).
func TestParseRules(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name    string
		texts   map[string]string
		errKeys []string // inputs the error must name, in order
		check   func(t *testing.T, v *Values)
	}{
		{"defaults and ±", map[string]string{"frequency": "440 Hz ± 5 Hz"}, nil, func(t *testing.T, v *Values) {
			if q := v.Q("frequency"); q.Value != 440 || q.Uncertainty != 5 {
				t.Errorf("frequency %+v", q)
			}
			if v.SI("length") != 1 || v.Given("length") || !v.Has("length") {
				t.Errorf("length default: %v given %v", v.SI("length"), v.Given("length"))
			}
			if v.Pick("ends") != 1 || v.Count("zones") != 2 || v.Number("fraction") != 0.5 || v.On("verbose") {
				t.Errorf("defaults: %v %v %v %v", v.Pick("ends"), v.Count("zones"), v.Number("fraction"), v.On("verbose"))
			}
			if v.Has("sweep") {
				t.Error("an optional sweep left empty holds a value")
			}
		}},
		{"+- and words of a choice", map[string]string{"frequency": "1 kHz +- 2 Hz", "ends": "closed at both ends", "verbose": "true", "sweep": "250K:350K:3"}, nil, func(t *testing.T, v *Values) {
			if q := v.Q("frequency"); q.Value != 1000 || q.Uncertainty != 2 {
				t.Errorf("frequency %+v", q)
			}
			if v.PickKey("ends") != "closed-closed" || !v.On("verbose") {
				t.Errorf("ends %q verbose %v", v.PickKey("ends"), v.On("verbose"))
			}
			if p := v.Span("sweep").Points(); len(p) != 3 || p[0] != 250 || p[1] != 300 || p[2] != 350 {
				t.Errorf("sweep %v", p)
			}
		}},
		{"required missing", map[string]string{}, []string{"frequency"}, nil},
		{"± where none is accepted", map[string]string{"frequency": "440 Hz", "length": "1 m ± 1 mm"}, []string{"length"}, nil},
		{"out of range and bad choice", map[string]string{"frequency": "0.5 Hz", "ends": "open-open"}, []string{"frequency", "ends"}, nil},
		{"open bound", map[string]string{"frequency": "440 Hz", "length": "0 m"}, []string{"length"}, nil},
		{"count and number", map[string]string{"frequency": "440 Hz", "zones": "6", "fraction": "x"}, []string{"zones", "fraction"}, nil},
		{"bad sweep and gas", map[string]string{"frequency": "440 Hz", "sweep": "250K", "gas": "unobtainium"}, []string{"sweep", "gas"}, nil},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			v, err := probe.Parse(c.texts)
			var keys []string
			for _, fe := range FieldErrors(err) {
				keys = append(keys, fe.Key)
			}
			if strings.Join(keys, ",") != strings.Join(c.errKeys, ",") {
				t.Fatalf("error %v names %v, want %v", err, keys, c.errKeys)
			}
			if err == nil && c.check != nil {
				c.check(t, v)
			}
		})
	}
}

// TestRequiredIsMarked: a required input left empty says so, typed.
func TestRequiredIsMarked(t *testing.T) {
	t.Parallel()
	_, err := probe.Parse(nil)
	fes := FieldErrors(err)
	if len(fes) != 1 || !errors.Is(fes[0], ErrRequired) || !strings.HasPrefix(fes[0].Error(), "Frequency: required") {
		t.Fatalf("got %v", err)
	}
}

// TestResultNeverCarriesNaN: a Run that produces a non-finite value is
// reported as an internal error, never returned.
func TestResultNeverCarriesNaN(t *testing.T) {
	t.Parallel()
	s := *probe
	s.Run = func(v *Values) (*Result, error) {
		r := &Result{}
		r.Add("x", "X", math.NaN(), units.DimLength)
		return r, nil
	}
	if _, err := s.Evaluate(map[string]string{"frequency": "1 Hz"}); err == nil || !strings.Contains(err.Error(), "not finite") {
		t.Fatalf("got %v", err)
	}
	s.Run = func(v *Values) (*Result, error) {
		r := &Result{}
		r.Add("x", "X", 1, units.DimLength)
		r.Add("x", "X again", 2, units.DimLength)
		return r, nil
	}
	if _, err := s.Evaluate(map[string]string{"frequency": "1 Hz"}); err == nil || !strings.Contains(err.Error(), "twice") {
		t.Fatalf("got %v", err)
	}
}

// TestVerdictsFollowChecks: the verdicts are the check rows, in order, and
// Worst is the worst of them.
func TestVerdictsFollowChecks(t *testing.T) {
	t.Parallel()
	r := &Result{}
	r.Add("a", "A", 1, units.DimNone)
	r.Check("wall", "Wall", "thick enough", Pass, "2.1 mm needed, 3 mm given")
	r.Check("relief", "Relief", "above the MAWP", Fail, "set 31 bar, MAWP 30 bar")
	v := r.Verdicts()
	if len(v) != 2 || v[0].Check != "wall" || v[0].Outcome != "pass" || v[1].Outcome != "fail" || r.Worst() != Fail {
		t.Fatalf("verdicts %+v worst %v", v, r.Worst())
	}
}

// TestCatalogIsConsistent: IDs are unique, every calculator's ID matches
// its catalog line, and every input key is unique within its sheet.
func TestCatalogIsConsistent(t *testing.T) {
	t.Parallel()
	seen := map[ID]bool{}
	for _, e := range Catalog() {
		if seen[e.ID] {
			t.Errorf("ID %s listed twice", e.ID)
		}
		seen[e.ID] = true
		if e.Title == "" || e.Summary == "" {
			t.Errorf("%s has no title or summary", e.ID)
		}
		if e.Sheet == nil {
			continue
		}
		if e.Sheet.ID != e.ID {
			t.Errorf("catalog line %s holds sheet %s", e.ID, e.Sheet.ID)
		}
		keys := map[string]bool{}
		for _, in := range e.Sheet.Inputs {
			if keys[in.Key] || in.Key == "json" {
				t.Errorf("%s: input key %q repeated or reserved", e.ID, in.Key)
			}
			keys[in.Key] = true
			if in.Label == "" {
				t.Errorf("%s: input %s has no label", e.ID, in.Key)
			}
			if in.Default != "" {
				if _, err := ParseInput(&in, ""); err != nil {
					t.Errorf("%s: default of %s does not parse: %v", e.ID, in.Key, err)
				}
			}
			if in.Example != "" {
				if _, err := ParseInput(&in, in.Example); err != nil {
					t.Errorf("%s: example of %s does not parse: %v", e.ID, in.Key, err)
				}
			}
		}
	}
}
