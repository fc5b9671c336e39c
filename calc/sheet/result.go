package sheet

import (
	"fmt"

	"tubewright/calc/units"
)

// Outcome is the verdict of a row that is a check.
type Outcome int

// The outcomes. None marks a row that is not a check.
const (
	None Outcome = iota
	Pass
	Warn
	Fail
)

// String returns "pass", "warn", "fail" or "".
func (o Outcome) String() string {
	switch o {
	case Pass:
		return "pass"
	case Warn:
		return "warn"
	case Fail:
		return "fail"
	}
	return ""
}

// RowKind says what a row's value is.
type RowKind int

// The kinds of row.
const (
	// Num is a number with a dimension, optionally with a ±.
	Num RowKind = iota
	// Words is a value in words (a verdict, a name).
	Words
	// Complex is a dimensionless complex number.
	Complex
	// Object is any other JSON-encodable value (a list of modes).
	Object
)

// Row is one output of a calculator.
type Row struct {
	// Key is the stable name: the JSON key of the result.
	Key string
	// Label names the row on screen.
	Label string
	Kind  RowKind
	// Value and PM (standard uncertainty, 0 for none) in the SI unit of
	// Dim, for Num rows.
	Value, PM float64
	Dim       units.Dimension
	// Show is the unit a screen shows the value in ("g/mol", "mm"); ""
	// means the SI unit of Dim with the usual formatting.
	Show string
	// Gauge marks a pressure measured above the atmosphere.
	Gauge bool
	// Text is the value of a Words row.
	Text string
	// Z is the value of a Complex row.
	Z complex128
	// Any is the value of an Object row, and its words for people in Text.
	Any any
	// Note is a short remark shown with the row (the why of a check).
	Note string
	// Outcome is the verdict when the row is a check.
	Outcome Outcome
}

// Verdict is a row that is a check, as the terminal's JSON and the bench
// log keep it.
type Verdict struct {
	Check   string `json:"check"`
	Outcome string `json:"outcome"`
	Why     string `json:"why"`
}

// Table is a sweep: named columns (with their unit in the name,
// "temperature_K") and rows of SI values.
type Table struct {
	Header []string
	Rows   [][]float64
}

// Result is what a calculator's Run returns.
type Result struct {
	// Values are the parsed inputs the result was computed from (set by
	// Evaluate).
	Values *Values
	// Derived are inputs the Run worked out rather than read (a mixture's
	// name, a cylinder's release volume), echoed with the inputs.
	Derived []Row
	// Rows are the results in order.
	Rows []Row
	// Details are diagnostics of how the answer was reached (the Newton
	// iterations of a solve), not answers: the app shows them in a
	// collapsed section under the results, twcalc in a "details" block of
	// the table and a "details" object of its JSON that tools can ignore.
	Details []Row
	// Warnings are model warnings: a state near the edge of a model, a
	// result near a limit of the method.
	Warnings []string
	// Cautions are safety cautions; front ends always show them.
	Cautions []string
	// Notes are plain remarks on how the result was obtained (the model's
	// range for this gas).
	Notes []string
	// Table is an optional sweep.
	Table *Table
}

// Row returns the row with key.
func (r *Result) Row(key string) (Row, bool) {
	for _, row := range r.Rows {
		if row.Key == key {
			return row, true
		}
	}
	return Row{}, false
}

// Add appends a number row in the SI unit of dim.
func (r *Result) Add(key, label string, v float64, dim units.Dimension) *Row {
	return r.AddPM(key, label, v, 0, dim)
}

// AddPM appends a number row with its standard uncertainty u (SI).
func (r *Result) AddPM(key, label string, v, u float64, dim units.Dimension) *Row {
	r.Rows = append(r.Rows, Row{Key: key, Label: label, Kind: Num, Value: v, PM: u, Dim: dim})
	return &r.Rows[len(r.Rows)-1]
}

// AddGauge appends a pressure row measured above the atmosphere (Pa).
func (r *Result) AddGauge(key, label string, v float64) *Row {
	row := r.Add(key, label, v, units.DimPressure)
	row.Gauge = true
	return row
}

// AddWords appends a row whose value is words.
func (r *Result) AddWords(key, label, text string) *Row {
	r.Rows = append(r.Rows, Row{Key: key, Label: label, Kind: Words, Text: text})
	return &r.Rows[len(r.Rows)-1]
}

// AddComplex appends a dimensionless complex row.
func (r *Result) AddComplex(key, label string, z complex128) *Row {
	r.Rows = append(r.Rows, Row{Key: key, Label: label, Kind: Complex, Z: z, Dim: units.DimNone})
	return &r.Rows[len(r.Rows)-1]
}

// AddObject appends a row whose value is a JSON-encodable object v, shown
// to people as text.
func (r *Result) AddObject(key, label string, v any, text string) *Row {
	r.Rows = append(r.Rows, Row{Key: key, Label: label, Kind: Object, Any: v, Text: text})
	return &r.Rows[len(r.Rows)-1]
}

// Detail appends a diagnostic of the solve: v is its JSON value (a
// count, a number) and text its words for people ("6").
func (r *Result) Detail(key, label string, v any, text string) *Row {
	r.Details = append(r.Details, Row{Key: key, Label: label, Kind: Object, Any: v, Text: text})
	return &r.Details[len(r.Details)-1]
}

// Check appends a check row: words for the verdict, its outcome and why.
func (r *Result) Check(key, label, words string, o Outcome, why string) *Row {
	row := r.AddWords(key, label, words)
	row.Outcome, row.Note = o, why
	return row
}

// Derive records an input the Run worked out, in the SI unit of dim.
func (r *Result) Derive(key, label string, v float64, dim units.Dimension) {
	r.Derived = append(r.Derived, Row{Key: key, Label: label, Kind: Num, Value: v, Dim: dim})
}

// DeriveWords records an input the Run worked out, in words.
func (r *Result) DeriveWords(key, label, text string) {
	r.Derived = append(r.Derived, Row{Key: key, Label: label, Kind: Words, Text: text})
}

// Warn adds model warnings.
func (r *Result) Warn(msgs ...string) { r.Warnings = append(r.Warnings, msgs...) }

// Caution adds safety cautions.
func (r *Result) Caution(msgs ...string) { r.Cautions = append(r.Cautions, msgs...) }

// Note adds plain remarks.
func (r *Result) Note(msgs ...string) { r.Notes = append(r.Notes, msgs...) }

// Verdicts lists the rows that are checks, in order.
func (r *Result) Verdicts() []Verdict {
	var out []Verdict
	for _, row := range r.Rows {
		if row.Outcome != None {
			out = append(out, Verdict{Check: row.Key, Outcome: row.Outcome.String(), Why: row.Note})
		}
	}
	return out
}

// Worst returns the worst outcome among the rows (None when no row is a
// check).
func (r *Result) Worst() Outcome {
	w := None
	for _, row := range r.Rows {
		w = max(w, row.Outcome)
	}
	return w
}

// check returns an error naming the first row, derived input or table cell
// that is not finite, or a key used twice: programming errors that must
// never reach a screen or a file.
func (r *Result) check() error {
	seen := map[string]bool{}
	for _, list := range [][]Row{r.Derived, r.Rows, r.Details} {
		for _, row := range list {
			if seen[row.Key] {
				return fmt.Errorf("internal: result %s added twice", row.Key)
			}
			seen[row.Key] = true
			switch row.Kind {
			case Num:
				if !finite(row.Value) || !finite(row.PM) || row.PM < 0 {
					return fmt.Errorf("internal: result %s is not finite", row.Key)
				}
			case Complex:
				if !finite(real(row.Z)) || !finite(imag(row.Z)) {
					return fmt.Errorf("internal: result %s is not finite", row.Key)
				}
			}
		}
		seen = map[string]bool{}
	}
	if t := r.Table; t != nil {
		if len(t.Header) == 0 {
			return fmt.Errorf("internal: sweep table has no columns")
		}
		for i, row := range t.Rows {
			if len(row) != len(t.Header) {
				return fmt.Errorf("internal: sweep row %d has %d values for %d columns", i+1, len(row), len(t.Header))
			}
			for j, v := range row {
				if !finite(v) {
					return fmt.Errorf("internal: sweep row %d column %s is not finite", i+1, t.Header[j])
				}
			}
		}
	}
	return nil
}
