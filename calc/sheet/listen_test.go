package sheet

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/listen"
)

// TestListenSheetSoxRing: the ring-down made by sox (testdata/
// gen_listen_sox.sh, SoX v14.4.2: one full-scale sample through "bandpass
// 523.3 50q") against the decay time and frequency of the filter's poles
// as sox prints them: r = √a2, cos θ = -a1/(2r), τ = -1/(fs ln r),
// f = θ fs/(2π) (Oppenheim & Schafer, Discrete-Time Signal Processing, 3rd
// ed. 2010, §5.3).
func TestListenSheetSoxRing(t *testing.T) {
	t.Parallel()
	b, err := os.ReadFile(filepath.Join("..", "..", "testdata", "listen_sox_ring16_filter.txt"))
	if err != nil {
		t.Fatal(err)
	}
	m := regexp.MustCompile(`\],\[1 (\S+) (\S+)\]`).FindSubmatch(b)
	if m == nil {
		t.Fatalf("no denominator in %q", b)
	}
	a1, _ := strconv.ParseFloat(string(m[1]), 64)
	a2, _ := strconv.ParseFloat(string(m[2]), 64)
	const fs = 8000
	r := math.Sqrt(a2)
	tau := -1 / (fs * math.Log(r))
	f := math.Acos(-a1/(2*r)) * fs / (2 * math.Pi)

	res, err := listenSheet.Evaluate(map[string]string{"file": filepath.Join("..", "..", "testdata", "listen_sox_ring16.wav")})
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		key  string
		want float64
		tol  float64 // relative
	}{
		{"frequency", f, 5e-4},    // issue 14: 0.05 %
		{"decay_time", tau, 0.05}, // issue 14: 5 %
		{"quality_factor", math.Pi * f * tau, 0.05},
	}
	for _, c := range cases {
		row, ok := res.Row(c.key)
		if !ok || !scalar.EqualWithinRel(row.Value, c.want, c.tol) {
			t.Errorf("%s = %v (found %v), want %v within %g", c.key, row.Value, ok, c.want, c.tol)
		}
		if ok && !(row.PM > 0) {
			t.Errorf("%s has no ±", c.key)
		}
	}
	if row, _ := res.Row("clipping"); row.Outcome != Pass {
		t.Errorf("clipping check %v (%s), want pass for a -3 dBFS file", row.Outcome, row.Text)
	}
	if res.Table != nil || len(res.Cautions) == 0 {
		t.Errorf("a track table without --track, or no cautions: %+v", res)
	}
	// with the track: one row per frame of 0.128 s every 0.064 s (8 kHz),
	// frequency 0 where no tone, else near f
	res, err = listenSheet.Evaluate(map[string]string{"file": filepath.Join("..", "..", "testdata", "listen_sox_ring16.wav"), "track": "true"})
	if err != nil {
		t.Fatal(err)
	}
	if res.Table == nil || len(res.Table.Rows) != 6 {
		t.Fatalf("track table %+v", res.Table)
	}
	for _, row := range res.Table.Rows {
		if row[1] != 0 && !scalar.EqualWithinRel(row[1], f, 0.01) {
			t.Errorf("track row %v, want frequency 0 or %.1f Hz within 1 %%", row, f)
		}
	}
}

// TestListenSheetSteadyTone: a steady sox tone has a frequency with ± and no
// decay rows, and says why.
func TestListenSheetSteadyTone(t *testing.T) {
	t.Parallel()
	res, err := listenSheet.Evaluate(map[string]string{"file": filepath.Join("..", "..", "testdata", "listen_sox_sine16.wav"), "lowest": "100 Hz", "highest": "2 kHz"})
	if err != nil {
		t.Fatal(err)
	}
	// sox synth 0.5 sine 431.7: the frequency given to sox
	if row, _ := res.Row("frequency"); !scalar.EqualWithinRel(row.Value, 431.7, 5e-4) {
		t.Errorf("frequency %v, want 431.7 Hz", row.Value)
	}
	if _, ok := res.Row("decay_time"); ok {
		t.Error("a steady tone has a decay_time row")
	}
	if len(res.Warnings) == 0 {
		t.Error("no warning saying there is no ring-down")
	}
}

// TestListenSheetErrorsNameTheirInput: a missing file, a file that is not a
// WAV and a search band beyond the recording are reported by key.
func TestListenSheetErrorsNameTheirInput(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	text := filepath.Join(dir, "notes.wav")
	if err := os.WriteFile(text, []byte("time,frequency\n0,440\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	sine := filepath.Join("..", "..", "testdata", "listen_sox_sine16.wav") // 8 kHz
	cases := []struct {
		texts map[string]string
		key   string
		is    error
	}{
		{map[string]string{"file": filepath.Join(dir, "missing.wav")}, "file", os.ErrNotExist},
		{map[string]string{"file": text}, "file", listen.ErrNotWAV},
		{map[string]string{"file": sine, "lowest": "5 kHz"}, "lowest", nil},
		{map[string]string{"file": sine, "highest": "6 kHz"}, "highest", nil},
		{map[string]string{"file": sine, "lowest": "0.5 Hz"}, "lowest", nil},
	}
	for _, c := range cases {
		_, err := listenSheet.Evaluate(c.texts)
		fe, ok := AsFieldError(err)
		if !ok || fe.Key != c.key {
			t.Errorf("%v: error %v, want one about %s", c.texts, err, c.key)
			continue
		}
		if c.is != nil && !errors.Is(err, c.is) {
			t.Errorf("%v: error %v, want %v", c.texts, err, c.is)
		}
	}
}

// TestListenSheetClock: the sample clock's tolerance reaches the
// frequency's ± as f·tol/√3 in quadrature (GUM, JCGM 100:2008, 4.3.7): the
// default 100 ppm against a clock taken as exact, on the sox ring-down
// (testdata/gen_listen_sox.sh); a tolerance out of range names its input.
func TestListenSheetClock(t *testing.T) {
	t.Parallel()
	file := filepath.Join("..", "..", "testdata", "listen_sox_ring16.wav")
	exact, err := listenSheet.Evaluate(map[string]string{"file": file, "clock-ppm": "0"})
	if err != nil {
		t.Fatal(err)
	}
	def, err := listenSheet.Evaluate(map[string]string{"file": file})
	if err != nil {
		t.Fatal(err)
	}
	e, _ := exact.Row("frequency")
	d, _ := def.Row("frequency")
	want := math.Hypot(e.PM, e.Value*100e-6/math.Sqrt(3))
	if e.Value != d.Value || !scalar.EqualWithinRel(d.PM, want, 1e-9) {
		t.Errorf("frequency %v ± %v with 100 ppm, want %v ± %v", d.Value, d.PM, e.Value, want)
	}
	_, err = listenSheet.Evaluate(map[string]string{"file": file, "clock-ppm": "20000"})
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Key != "clock-ppm" {
		t.Errorf("clock-ppm 20000: error %v, want one about clock-ppm", err)
	}
}
