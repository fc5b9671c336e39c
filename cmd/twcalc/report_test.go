package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"strings"
	"testing"

	"tubewright/calc/units"
)

// TestReportErrors: programming errors while building a report are kept,
// the first one wins, and nothing non-finite is written.
func TestReportErrors(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		build func(r *report)
		want  string
	}{
		{"NaN result", func(r *report) { r.add("x", math.NaN(), units.DimLength) }, "result x is not finite"},
		{"Inf result", func(r *report) { r.add("x", math.Inf(1), units.DimLength) }, "result x is not finite"},
		{"NaN uncertainty", func(r *report) { r.addPM("x", 1, math.NaN(), units.DimLength) }, "result x is not finite"},
		{"negative uncertainty", func(r *report) { r.addPM("x", 1, -1, units.DimLength) }, "result x is not finite"},
		{"NaN complex", func(r *report) { r.addComplex("f", complex(0, math.Inf(-1))) }, "result f is not finite"},
		{"NaN inside a value", func(r *report) { r.addObjectShown("v", []float64{1, math.NaN()}, "") }, "result v cannot be written"},
		{"NaN input", func(r *report) { r.input("v", math.NaN()) }, "input v cannot be written"},
		{"duplicate", func(r *report) { r.add("x", 1, units.DimLength); r.add("x", 2, units.DimLength) }, "result x added twice"},
		{"bad table", func(r *report) { r.table([]string{"a"}, [][]float64{{math.NaN()}}) }, "column a"},
		{"first error wins", func(r *report) {
			r.add("a", math.NaN(), units.DimLength)
			r.add("b", math.NaN(), units.DimLength)
		}, "result a is not finite"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			r := newReport()
			c.build(r)
			if r.err == nil || !strings.Contains(r.err.Error(), c.want) {
				t.Fatalf("err = %v, want one containing %q", r.err, c.want)
			}
			var b bytes.Buffer
			if err := r.writeJSON(&b); err != nil {
				t.Fatal(err)
			}
			if s := b.String(); strings.Contains(s, "NaN") || strings.Contains(s, "Inf") {
				t.Errorf("non-finite value written: %s", s)
			}
		})
	}
}

// TestReportZeroUncertainty: addPM with u = 0 is a plain result.
func TestReportZeroUncertainty(t *testing.T) {
	t.Parallel()
	r := newReport()
	r.addPM("f", 578, 0, units.DimFrequency)
	var b bytes.Buffer
	if err := r.writeJSON(&b); err != nil || r.err != nil {
		t.Fatal(err, r.err)
	}
	if strings.Contains(b.String(), "uncertainty") {
		t.Errorf("zero uncertainty written: %s", b.String())
	}
	if !strings.Contains(b.String(), `"warnings": []`) || !strings.Contains(b.String(), `"cautions": []`) {
		t.Errorf("empty warnings/cautions not written as []: %s", b.String())
	}
}

// TestReportBenchUnits: the table repeats SI values in the units of the
// bench, and a gauge pressure says so in both forms. Conversion factors are
// the SI definitions (1 bar = 1e5 Pa, 1 MPa = 1e6 Pa, 0 °C = 273.15 K; BIPM SI
// Brochure 2019).
func TestReportBenchUnits(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		build func(r *report)
		table string // expected in the table line
		json  string // expected in the JSON
	}{
		{"pressure in bar", func(r *report) { r.add("p", 8e5, units.DimPressure) }, "800 kPa (8 bar)", `"unit":"Pa"`},
		{"stress in MPa", func(r *report) { r.add("s", 2.658e7, units.DimStress) }, "s  26.58 MPa\n", `"unit":"Pa"`},
		{"temperature in degC", func(r *report) { r.add("t", 373.15, units.DimTemperature) }, "373.1 K (100 °C)", `"unit":"K"`},
		{"small length in mm", func(r *report) { r.add("l", 2.5e-4, units.DimLength) }, "l  250 µm (0.25 mm)\n", `"unit":"m"`},
		{"length in mm once", func(r *report) { r.add("l", 0.147, units.DimLength) }, "l  147 mm\n", `"unit":"m"`},
		{"long length stays in m", func(r *report) { r.add("l", 2.5, units.DimLength) }, "l  2.5 m\n", `"unit":"m"`},
		{"gauge pressure", func(r *report) { r.addGauge("g", 3e6) }, "3 MPa gauge (30 barg)", `"basis":"gauge"`},
		{"derived input", func(r *report) { r.inputSI("i", 1e6, units.DimPressure) }, "1 MPa (10 bar)", `"unit":"Pa"`},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			r := newReport()
			c.build(r)
			if r.err != nil {
				t.Fatal(r.err)
			}
			var text, js bytes.Buffer
			if err := r.writeText(&text); err != nil {
				t.Fatal(err)
			}
			if err := r.writeJSON(&js); err != nil {
				t.Fatal(err)
			}
			if !strings.Contains(text.String(), c.table) {
				t.Errorf("table %q does not contain %q", text.String(), c.table)
			}
			if !strings.Contains(strings.Join(strings.Fields(js.String()), ""), c.json) {
				t.Errorf("JSON %s does not contain %s", js.String(), c.json)
			}
		})
	}
}

// stringerModes is a list with a String method, as a value a report may
// hold.
type stringerModes []struct {
	Mode      int     `json:"mode"`
	Frequency float64 `json:"frequency_Hz"`
}

// String lists the modes for the table: "1: 347.6 Hz".
func (l stringerModes) String() string {
	parts := make([]string, len(l))
	for i, m := range l {
		parts[i] = fmt.Sprintf("%d: %s", m.Mode, units.Format(m.Frequency, units.DimFrequency))
	}
	return strings.Join(parts, "; ")
}

// TestReportStringerValue: a value with a String method reads as that text
// in the table and keeps its structure in the JSON.
func TestReportStringerValue(t *testing.T) {
	t.Parallel()
	r := newReport()
	m := stringerModes{{Mode: 1, Frequency: 347.6}}
	r.addObjectShown("modes", m, m.String())
	var text, js bytes.Buffer
	if err := r.writeText(&text); err != nil {
		t.Fatal(err)
	}
	if err := r.writeJSON(&js); err != nil {
		t.Fatal(err)
	}
	if want := "1: 347.6 Hz"; !strings.Contains(text.String(), want) {
		t.Errorf("table %q does not contain %q", text.String(), want)
	}
	if want := `"frequency_Hz":347.6`; !strings.Contains(strings.Join(strings.Fields(js.String()), ""), want) {
		t.Errorf("JSON %s does not contain %s", js.String(), want)
	}
}

// TestReportInputEcho: a typed input is echoed with the SI value it was read
// as, in a readable unit and with every digit that matters, never with an
// exponent (1 atm = 101325 Pa exactly, 1 bar = 1e5 Pa, BIPM SI Brochure
// 2019; 20 °C = 293.15 K); nothing is echoed where it would repeat the text.
func TestReportInputEcho(t *testing.T) {
	t.Parallel()
	cases := []struct {
		typed string
		dim   units.Dimension
		want  string
	}{
		{"1atm", units.DimPressure, "1atm absolute = 0 barg  (= 101.325 kPa)"},
		{"10 bar", units.DimPressure, "10 bar absolute = 8.987 barg  (= 1 MPa)"},
		{"138MPa", units.DimStress, "138MPa\n"},
		{"0.1mm", units.DimLength, "0.1mm  (= 100 µm)"},
		{"20degC", units.DimTemperature, "20degC  (= 293.15 K)"},
		{"12mm", units.DimLength, "12mm\n"},
		{"0.5m", units.DimLength, "0.5m  (= 500 mm)"},
		{"0.3", units.DimNone, "0.3\n"},
		{"0 mm", units.DimLength, "0 mm\n"},
	}
	for _, c := range cases {
		t.Run(c.typed, func(t *testing.T) {
			t.Parallel()
			q, err := units.Parse(c.typed, c.dim)
			if err != nil {
				t.Fatal(err)
			}
			r := newReport()
			r.inputQuantity("x", q, c.typed)
			var text bytes.Buffer
			if err := r.writeText(&text); err != nil {
				t.Fatal(err)
			}
			if !strings.Contains(text.String(), c.want) {
				t.Errorf("table %q does not contain %q", text.String(), c.want)
			}
		})
	}
}

// TestReportDetails: a solver's diagnostics are kept apart from the
// results: a "details" block after them in the table, a "details" object in
// the JSON, and nothing of them among the results.
func TestReportDetails(t *testing.T) {
	t.Parallel()
	r := newReport()
	r.add("frequency", 262.2, units.DimFrequency)
	r.detail("iterations", 5, "5")
	var text, js bytes.Buffer
	if err := r.writeText(&text); err != nil || r.err != nil {
		t.Fatal(err, r.err)
	}
	if err := r.writeJSON(&js); err != nil {
		t.Fatal(err)
	}
	if want := "results\n  frequency  262.2 Hz\ndetails\n  iterations  5\n"; !strings.Contains(text.String(), want) {
		t.Errorf("table %q does not contain %q", text.String(), want)
	}
	var got struct {
		Results map[string]any `json:"results"`
		Details map[string]struct {
			Value float64 `json:"value"`
		} `json:"details"`
	}
	if err := json.Unmarshal(js.Bytes(), &got); err != nil {
		t.Fatal(err)
	}
	if _, ok := got.Results["iterations"]; ok || len(got.Results) != 1 {
		t.Errorf("results %v hold a diagnostic", got.Results)
	}
	if got.Details["iterations"].Value != 5 {
		t.Errorf("details %v, want iterations 5", got.Details)
	}
}
