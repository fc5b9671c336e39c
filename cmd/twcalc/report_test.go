package main

import (
	"bytes"
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
		{"NaN inside a value", func(r *report) { r.addValue("v", []float64{1, math.NaN()}) }, "result v cannot be written"},
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
