package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strings"
	"text/tabwriter"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// report is what a subcommand computed: the inputs it used, named results
// with SI units, model warnings and safety cautions. run() prints it as an
// aligned table or, with --json, as one JSON object:
//
//	{"inputs":{...},
//	 "results":{"NAME":{"value":N,"unit":"SI unit"[,"uncertainty":U]}},
//	 "warnings":[...], "cautions":[...]}
//
// followed by "verdicts", and where there are any "notes", "details" (the
// solver's diagnostics, {"NAME":{"value":V,"unit":""}}, which tools can
// ignore) and a sweep's "table".
//
// Names keep their insertion order in both forms. A result that is NaN or
// ±Inf is never printed: adding one records an error, and run() exits 1
// with "internal: result NAME is not finite".
type report struct {
	inputs    []entry
	results   []entry
	details   []entry // diagnostics of the solve, apart from the results
	warnings  []string
	cautions  []string
	tableData *sweepTable
	notes     []string        // plain remarks on how the result was obtained
	verdicts  []sheet.Verdict // the rows that are checks
	err       error           // first programming error found while building
}

// entry is one named input or result.
type entry struct {
	name  string
	json  json.RawMessage // the JSON value of the entry
	shown string          // the table text
}

// sweepTable is a CSV table attached to a report (see report.table).
type sweepTable struct {
	header []string
	rows   [][]float64
}

// newReport returns an empty report.
func newReport() *report { return &report{} }

func (r *report) fail(format string, a ...any) {
	if r.err == nil {
		r.err = fmt.Errorf(format, a...)
	}
}

func (r *report) put(list *[]entry, kind, name string, v any, shown string) {
	for _, e := range *list {
		if e.name == name {
			r.fail("internal: %s %s added twice", kind, name)
			return
		}
	}
	raw, err := json.Marshal(v)
	if err != nil {
		r.fail("internal: %s %s cannot be written: %v", kind, name, err)
		return
	}
	*list = append(*list, entry{name: name, json: raw, shown: shown})
}

// input records an input as the command used it: a string as typed, a
// number, a bool, or any JSON-encodable value.
func (r *report) input(name string, value any) {
	r.put(&r.inputs, "input", name, value, fmt.Sprint(value))
}

// inputQuantity records a parsed quantity input in SI with the text typed:
// {"value":V,"unit":"SI unit"[,"uncertainty":U],"typed":"27degC"}. The table
// shows the typed text and, when it differs, the SI value it was read as.
func (r *report) inputQuantity(name string, q units.Quantity, typed string) {
	if !finite(q.Value) || !finite(q.Uncertainty) {
		r.fail("internal: input %s is not finite", name)
		return
	}
	v := struct {
		Value       float64  `json:"value"`
		Unit        string   `json:"unit"`
		Uncertainty *float64 `json:"uncertainty,omitempty"`
		Typed       string   `json:"typed"`
	}{Value: q.Value, Unit: units.SIUnit(q.Dim), Typed: typed}
	si := exactSI(q.Value, q.Dim)
	if q.Uncertainty > 0 {
		v.Uncertainty = &q.Uncertainty
		si = units.FormatPM(q.Value, q.Uncertainty, q.Dim)
	}
	shown := typed
	if q.Value != 0 && strings.ReplaceAll(si, " ", "") != strings.ReplaceAll(typed, " ", "") {
		shown += "  (= " + si + ")"
	}
	if q.Dim == units.DimPressure {
		shown = units.DescribePressure(typed, q, 0) + "  (= " + si + ")"
	}
	r.put(&r.inputs, "input", name, v, shown)
}

// inputSI records an input the command derived rather than read, a number
// in the SI unit of dim: JSON {"value":V,"unit":"SI unit"}.
func (r *report) inputSI(name string, v float64, dim units.Dimension) {
	if !finite(v) {
		r.fail("internal: input %s is not finite", name)
		return
	}
	r.put(&r.inputs, "input", name, resultJSON{Value: v, Unit: units.SIUnit(dim)}, shownSI(v, 0, dim))
}

// exactSI formats an input's SI value in its readable unit (see
// units.Format) with as many digits as it takes to show what was used
// ("101.325 kPa" for 1 atm rather than "101.3 kPa"; at most 10), never with
// an exponent.
func exactSI(v float64, dim units.Dimension) string {
	for sig := 4; sig < 10; sig++ {
		s := units.FormatDigits(v, dim, sig)
		q, err := units.ParseWith(s, dim, units.Options{AllowNegative: true})
		if err == nil && math.Abs(q.Value-v) <= 1e-12*math.Abs(v) {
			return s
		}
	}
	return units.FormatDigits(v, dim, 10)
}

// resultJSON is the JSON form of one numeric result. Basis is "gauge" for a
// pressure measured above the atmosphere and empty otherwise.
type resultJSON struct {
	Value       float64  `json:"value"`
	Unit        string   `json:"unit"`
	Uncertainty *float64 `json:"uncertainty,omitempty"`
	Basis       string   `json:"basis,omitempty"`
}

// benchUnits is the unit the table adds in brackets after an SI value, for
// people who think in bar, MPa, mm, litres or °C at the bench.
var benchUnits = map[units.Dimension]string{
	units.DimPressure:    "bar",
	units.DimStress:      "MPa",
	units.DimTemperature: "degC",
	units.DimVolume:      "L",
	units.DimEnergy:      "kJ",
}

// shownSI formats v (or v ± u when u > 0) in the readable unit of dim and, where
// the bench uses another unit, again in that unit in brackets:
// "800 kPa (8 bar)", "710.7 K (437.6 °C)", "243.9 µm (0.2439 mm)"; the
// unit in brackets is left out where it is the one already shown.
func shownSI(v, u float64, dim units.Dimension) string {
	si := units.Format(v, dim)
	if u > 0 {
		si = units.FormatPM(v, u, dim)
	}
	unit, ok := benchUnits[dim]
	if dim == units.DimLength && math.Abs(v) < 1 && v != 0 {
		unit, ok = "mm", true
	}
	if !ok {
		return si
	}
	var alt string
	var err error
	if u > 0 {
		alt, err = units.FormatPMIn(v, u, dim, unit)
	} else {
		alt, err = units.FormatInDim(v, dim, unit)
	}
	if err != nil || strings.HasSuffix(alt, " "+units.ReadableUnit(v, dim)) {
		return si
	}
	return si + " (" + alt + ")"
}

// add records result name with SI value v of dimension dim.
func (r *report) add(name string, v float64, dim units.Dimension) { r.addPM(name, v, 0, dim) }

// addGauge records result name, a pressure in Pa above the atmosphere:
// JSON {"value":V,"unit":"Pa","basis":"gauge"}; the table says "gauge" and
// repeats the value in barg.
func (r *report) addGauge(name string, v float64) {
	if !finite(v) {
		r.fail("internal: result %s is not finite", name)
		return
	}
	shown := units.Format(v, units.DimPressure) + " gauge"
	if b, err := units.FormatInDim(v, units.DimPressure, "bar"); err == nil {
		shown += " (" + b + "g)"
	}
	r.put(&r.results, "result", name, resultJSON{Value: v, Unit: units.SIUnit(units.DimPressure), Basis: "gauge"}, shown)
}

// addPM records result name with SI value v and standard uncertainty u;
// the uncertainty is shown only when u > 0.
func (r *report) addPM(name string, v, u float64, dim units.Dimension) {
	if !finite(v) || !finite(u) || u < 0 {
		r.fail("internal: result %s is not finite", name)
		return
	}
	res := resultJSON{Value: v, Unit: units.SIUnit(dim)}
	if u > 0 {
		res.Uncertainty = &u
	}
	r.put(&r.results, "result", name, res, shownSI(v, u, dim))
}

// addObjectShown records a result that is not a number with a unit (words,
// a list, an object), shown in the table as text: JSON {"value":v,"unit":""}.
// v must encode as JSON without NaN or Inf.
func (r *report) addObjectShown(name string, v any, shown string) {
	r.put(&r.results, "result", name, struct {
		Value any    `json:"value"`
		Unit  string `json:"unit"`
	}{v, ""}, shown)
}

// addComplex records a dimensionless complex result as
// {"value":{"re":..,"im":..},"unit":"1"}.
func (r *report) addComplex(name string, c complex128) {
	re, im := real(c), imag(c)
	if !finite(re) || !finite(im) {
		r.fail("internal: result %s is not finite", name)
		return
	}
	type reim struct {
		Re float64 `json:"re"`
		Im float64 `json:"im"`
	}
	shown := units.FormatComplex(c)
	r.put(&r.results, "result", name, struct {
		Value reim   `json:"value"`
		Unit  string `json:"unit"`
	}{reim{re, im}, units.SIUnit(units.DimNone)}, shown)
}

// detail records a diagnostic of the solve (not an answer): JSON
// {"value":v,"unit":""} under "details", the table's "details" block.
func (r *report) detail(name string, v any, shown string) {
	r.put(&r.details, "detail", name, struct {
		Value any    `json:"value"`
		Unit  string `json:"unit"`
	}{v, ""}, shown)
}

// warn adds a model warning (a state outside a model's validated range, a
// result near a limit of the method).
func (r *report) warn(s string) { r.warnings = append(r.warnings, oneLine(s)) }

// caution adds a safety caution; it is always printed, also with --json.
func (r *report) caution(s string) { r.cautions = append(r.cautions, oneLine(s)) }

// table attaches a sweep: without --json run() prints it as CSV (see
// writeCSV) instead of the result table; with --json it is added to the
// object as "table":{"columns":[...],"rows":[[...]...]}. Header names carry
// their unit, e.g. "temperature_K".
func (r *report) table(header []string, rows [][]float64) {
	if err := checkTable(header, rows); err != nil {
		r.fail("internal: %v", err)
		return
	}
	r.tableData = &sweepTable{header: header, rows: rows}
}

func oneLine(s string) string {
	return strings.Join(strings.Fields(s), " ")
}

// writeJSON writes r as one indented JSON object with keys in insertion
// order.
func (r *report) writeJSON(w io.Writer) error {
	var b bytes.Buffer
	b.WriteString(`{"inputs":`)
	writeObject(&b, r.inputs)
	b.WriteString(`,"results":`)
	writeObject(&b, r.results)
	for _, list := range []struct {
		key string
		v   []string
	}{{"warnings", r.warnings}, {"cautions", r.cautions}} {
		v := list.v
		if v == nil {
			v = []string{}
		}
		raw, err := json.Marshal(v)
		if err != nil {
			return err
		}
		fmt.Fprintf(&b, `,%q:%s`, list.key, raw)
	}
	verdicts := r.verdicts
	if verdicts == nil {
		verdicts = []sheet.Verdict{}
	}
	raw, err := json.Marshal(verdicts)
	if err != nil {
		return err
	}
	b.WriteString(`,"verdicts":`)
	b.Write(raw)
	if len(r.notes) > 0 {
		raw, err := json.Marshal(r.notes)
		if err != nil {
			return err
		}
		b.WriteString(`,"notes":`)
		b.Write(raw)
	}
	if len(r.details) > 0 {
		b.WriteString(`,"details":`)
		writeObject(&b, r.details)
	}
	if t := r.tableData; t != nil {
		raw, err := json.Marshal(struct {
			Columns []string    `json:"columns"`
			Rows    [][]float64 `json:"rows"`
		}{t.header, t.rows})
		if err != nil {
			return err
		}
		b.WriteString(`,"table":`)
		b.Write(raw)
	}
	b.WriteString("}")
	var out bytes.Buffer
	if err := json.Indent(&out, b.Bytes(), "", "  "); err != nil {
		return err
	}
	out.WriteString("\n")
	_, err = w.Write(out.Bytes())
	return err
}

func writeObject(b *bytes.Buffer, list []entry) {
	b.WriteString("{")
	for i, e := range list {
		if i > 0 {
			b.WriteString(",")
		}
		key, _ := json.Marshal(e.name)
		b.Write(key)
		b.WriteString(":")
		b.Write(e.json)
	}
	b.WriteString("}")
}

// writeText writes r for people: inputs, results, warnings, then the
// cautions, set apart so that they cannot be missed. A report with a sweep
// table writes the CSV instead of the result list, and the warnings and
// cautions as "# " comment lines after it.
func (r *report) writeText(w io.Writer) error {
	var b bytes.Buffer
	if t := r.tableData; t != nil {
		if err := writeCSV(&b, t.header, t.rows); err != nil {
			return err
		}
		for _, s := range r.warnings {
			fmt.Fprintf(&b, "# warning: %s\n", s)
		}
		for _, s := range r.cautions {
			fmt.Fprintf(&b, "# CAUTION: %s\n", s)
		}
		_, err := w.Write(b.Bytes())
		return err
	}
	tw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', 0)
	section := func(title string, list []entry) {
		if len(list) == 0 {
			return
		}
		fmt.Fprintf(tw, "%s\n", title)
		for _, e := range list {
			fmt.Fprintf(tw, "  %s\t%s\n", e.name, e.shown)
		}
	}
	section("inputs", r.inputs)
	section("results", r.results)
	if err := tw.Flush(); err != nil {
		return err
	}
	if len(r.verdicts) > 0 {
		b.WriteString("checks\n")
		for _, v := range r.verdicts {
			fmt.Fprintf(&b, "  %s  %s: %s\n", outcomeMark(v.Outcome), v.Check, v.Why)
		}
	}
	for _, n := range r.notes {
		fmt.Fprintf(&b, "note: %s\n", n)
	}
	if len(r.details) > 0 {
		dw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', 0)
		fmt.Fprintf(dw, "details\n")
		for _, e := range r.details {
			fmt.Fprintf(dw, "  %s\t%s\n", e.name, e.shown)
		}
		if err := dw.Flush(); err != nil {
			return err
		}
	}
	if len(r.warnings) > 0 {
		b.WriteString("warnings\n")
		for _, s := range r.warnings {
			fmt.Fprintf(&b, "  - %s\n", s)
		}
	}
	if len(r.cautions) > 0 {
		b.WriteString("\n!! CAUTION !!\n")
		for _, s := range r.cautions {
			fmt.Fprintf(&b, "  ! %s\n", s)
		}
	}
	_, err := w.Write(b.Bytes())
	return err
}

// outcomeMark is how the table shows a check's outcome: a failure cannot
// be mistaken for a pass.
func outcomeMark(o string) string {
	switch o {
	case "fail":
		return "FAIL ✗"
	case "warn":
		return "WARN !"
	}
	return "pass ✓"
}
