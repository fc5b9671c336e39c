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
		{"plain", []string{"temperature_K", "sound_speed_m/s"}, [][]float64{{300, 1019.3}, {1e-7, -2.5e12}, {101325.04, 578.24999999999}},
			"temperature_K,sound_speed_m/s\n300,1019.3\n0.0000001,-2500000000000\n101325,578.25\n", ""},
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

// TestWriteCSVRoundTrip: values over 24 decades are written with 7
// significant digits and no exponent, and read back within 1e-6 relative
// (7 digits round to within 5e-7; the bound is our own choice, see
// csvDigits).
func TestWriteCSVRoundTrip(t *testing.T) {
	t.Parallel()
	vals := []float64{math.Pi, 1.0 / 3, -0.1, 578.2499999999999, 0, 101325, 1.6049999e-4}
	for e := -12; e <= 12; e++ {
		vals = append(vals, math.Pow(10, float64(e))*(1+math.Sqrt2/3), -math.Pow(10, float64(e))*math.E/3)
	}
	rows := make([][]float64, len(vals))
	for i, v := range vals {
		rows[i] = []float64{v}
	}
	var b bytes.Buffer
	if err := writeCSV(&b, []string{"x"}, rows); err != nil {
		t.Fatal(err)
	}
	if strings.ContainsAny(b.String(), "eE") {
		t.Errorf("CSV has an exponent:\n%s", b.String())
	}
	recs, err := csv.NewReader(&b).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	for i, v := range vals {
		text := recs[i+1][0]
		got, err := strconv.ParseFloat(text, 64)
		if err != nil || math.Abs(got-v) > 1e-6*math.Abs(v) {
			t.Errorf("row %d: read %v (%v) from %q, wrote %v", i, got, err, text, v)
		}
		if digits := len(strings.TrimLeft(strings.NewReplacer("-", "", ".", "").Replace(text), "0")); digits > 7 && !strings.HasSuffix(text, "0") {
			t.Errorf("row %d: %q has %d significant digits, want at most 7", i, text, digits)
		}
	}
}
