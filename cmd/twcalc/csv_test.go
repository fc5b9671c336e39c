package main

import (
	"bytes"
	"encoding/csv"
	"math"
	"strconv"
	"strings"
	"testing"
)

func TestWriteCSV(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name    string
		header  []string
		rows    [][]float64
		want    string // exact output when ok
		wantErr string // part of the error text otherwise
	}{
		{"plain", []string{"temperature_K", "sound_speed_m/s"}, [][]float64{{300, 1019.3}, {1e-7, -2.5e12}},
			"temperature_K,sound_speed_m/s\n300,1019.3\n1e-07,-2.5e+12\n", ""},
		{"header only", []string{"x_m"}, nil, "x_m\n", ""},
		{"header needing quotes", []string{"a,b"}, [][]float64{{1}}, "\"a,b\"\n1\n", ""},
		{"NaN", []string{"a", "b"}, [][]float64{{1, 2}, {3, math.NaN()}}, "", "row 2 column b"},
		{"+Inf", []string{"a"}, [][]float64{{math.Inf(1)}}, "", "not a finite number"},
		{"-Inf", []string{"a"}, [][]float64{{math.Inf(-1)}}, "", "not a finite number"},
		{"short row", []string{"a", "b"}, [][]float64{{1}}, "", "row 1 has 1 values for 2 columns"},
		{"no columns", nil, nil, "", "no columns"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			var b bytes.Buffer
			err := writeCSV(&b, c.header, c.rows)
			if c.wantErr != "" {
				if err == nil || !strings.Contains(err.Error(), c.wantErr) {
					t.Fatalf("err = %v, want one containing %q", err, c.wantErr)
				}
				if b.Len() != 0 {
					t.Errorf("wrote %q before failing", b.String())
				}
				return
			}
			if err != nil || b.String() != c.want {
				t.Fatalf("got %q, %v; want %q", b.String(), err, c.want)
			}
		})
	}
}

// TestWriteCSVRoundTrip: every float64 written reads back bit for bit
// (strconv 'g' with precision -1 is the shortest round-trip form).
func TestWriteCSVRoundTrip(t *testing.T) {
	t.Parallel()
	vals := []float64{math.Pi, 1.0 / 3, 5e-324, math.MaxFloat64, -0.1, 578.2499999999999, 0}
	rows := make([][]float64, len(vals))
	for i, v := range vals {
		rows[i] = []float64{v}
	}
	var b bytes.Buffer
	if err := writeCSV(&b, []string{"x"}, rows); err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(&b).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	for i, v := range vals {
		got, err := strconv.ParseFloat(recs[i+1][0], 64)
		if err != nil || got != v {
			t.Errorf("row %d: read %v (%v), wrote %v", i, got, err, v)
		}
	}
}
