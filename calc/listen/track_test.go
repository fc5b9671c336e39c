package listen

import (
	"bytes"
	"encoding/csv"
	"math"
	"strconv"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// The CSV has a header, one row per frame, an empty frequency where the
// frame holds no clear tone, and numbers that read back.
func TestWriteTrackCSV(t *testing.T) {
	t.Parallel()
	track := []TrackPoint{
		{Time: 0.05, Level: MinLevel},
		{Time: 0.1, Frequency: 431.7123, Level: -6.02, Clear: true},
	}
	var b bytes.Buffer
	if err := WriteTrackCSV(&b, track); err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(&b).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != 3 || rows[0][0] != "time_s" || rows[0][1] != "frequency_hz" || rows[0][2] != "level_dbfs" {
		t.Fatalf("rows %q", rows)
	}
	if rows[1][1] != "" || rows[1][2] != "-150.00" {
		t.Errorf("silent frame %q", rows[1])
	}
	f, _ := strconv.ParseFloat(rows[2][1], 64)
	if !scalar.EqualWithinAbs(f, 431.7123, 5e-4) {
		t.Errorf("frequency %q", rows[2][1])
	}
}

// The track of a tone whose pitch glides follows the glide: frequency
// against time within 0.1 % (a slow glide of 2 % per second, so each frame
// holds a nearly steady tone), and the level of a steady sine of amplitude
// A is 20 log10(A) dBFS.
func TestTrackFollowsGlide(t *testing.T) {
	t.Parallel()
	const fs, f0, rate, amp = 16000.0, 300.0, 0.02, 0.25
	x := make([]float64, int(3*fs))
	var phase float64
	for i := range x {
		tt := float64(i) / fs
		phase += 2 * math.Pi * f0 * (1 + rate*tt) / fs
		x[i] = amp * math.Sin(phase)
	}
	tr := frames(x, fs, 20, 7000)
	if len(tr) < 40 {
		t.Fatalf("%d frames", len(tr))
	}
	for _, p := range tr {
		want := f0 * (1 + rate*p.Time)
		if !p.Clear || !scalar.EqualWithinRel(p.Frequency, want, 1e-3) {
			t.Errorf("t = %.3f s: %.3f Hz (clear %v), want %.3f Hz", p.Time, p.Frequency, p.Clear, want)
		}
		if !scalar.EqualWithinAbs(p.Level, -12.04, 0.05) {
			t.Errorf("t = %.3f s: level %.2f dBFS, want -12.04", p.Time, p.Level)
		}
	}
}
