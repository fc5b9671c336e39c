package sheet

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
)

// doneWhenTexts are the flags of the acceptance line.
var doneWhenTexts = map[string]string{"gas": "helium", "pressure": "10bar", "frequency": "300Hz", "hot": "650K",
	"ambient": "295K", "diameter": "50mm", "ends": "closed-closed"}

// TestDesignSheetWritesTheDevice: the acceptance line of the issue through
// the description: the device file written with device-out reads back, and
// its onset by the same solve the onset calculator runs (linear.Onset,
// default settings) is the sheet's, within 1 % of 300 Hz and below 650 K.
func TestDesignSheetWritesTheDevice(t *testing.T) {
	t.Parallel()
	path := filepath.Join(t.TempDir(), "d.json")
	texts := map[string]string{"device-out": path}
	for k, v := range doneWhenTexts {
		texts[k] = v
	}
	r, err := designSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	d, err := linear.ParseDevice(f)
	if err != nil {
		t.Fatalf("written device does not read back: %v", err)
	}
	on, err := linear.Onset(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	hot, _ := r.Row("onset_temperature")
	freq, _ := r.Row("frequency")
	if !scalar.EqualWithinRel(hot.Value, on.HotTemperature, 1e-8) || !scalar.EqualWithinRel(freq.Value, on.Frequency, 1e-8) {
		t.Errorf("sheet says %.6f K %.6f Hz, the written file %.6f K %.6f Hz", hot.Value, freq.Value, on.HotTemperature, on.Frequency)
	}
	if math.Abs(on.Frequency-300) > 3 || on.HotTemperature >= 650 {
		t.Errorf("written device starts at %.1f K and %.2f Hz: want below 650 K within 1 %% of 300 Hz", on.HotTemperature, on.Frequency)
	}
	if v := r.Verdicts(); len(v) != 1 || v[0].Check != "reachable" || v[0].Outcome != "pass" {
		t.Errorf("verdicts %+v, want reachable: pass", v)
	}
	if row, ok := r.Row("device"); !ok || !strings.Contains(row.Text, `"kind": "stack"`) {
		t.Errorf("device row missing or without the stack: %+v", row)
	}
	for _, key := range []string{"onset_change_position", "frequency_change_stack_length", "onset_change_mean_pressure"} {
		if _, ok := r.Row(key); !ok {
			t.Errorf("sensitivity row %s missing", key)
		}
	}
	if len(r.Cautions) == 0 {
		t.Error("no cautions for a hot, pressurised engine")
	}
}

// TestDesignSheetUnreachable: a heater too cool for any stack gives a
// failing check with the nearest design, not a bare error.
func TestDesignSheetUnreachable(t *testing.T) {
	t.Parallel()
	texts := map[string]string{}
	for k, v := range doneWhenTexts {
		texts[k] = v
	}
	texts["hot"] = "300 K"
	r, err := designSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	if r.Worst() != Fail {
		t.Fatalf("verdicts %+v: want a failing check", r.Verdicts())
	}
	if m, _ := r.Row("margin"); m.Value >= 0 {
		t.Errorf("margin %.1f K should be negative", m.Value)
	}
}

// TestDesignSheetBlamesInputs: a bad input is reported against its key.
func TestDesignSheetBlamesInputs(t *testing.T) {
	t.Parallel()
	for _, c := range []struct{ key, text string }{
		{"hot", "280 K"},
		{"frequency", "0 Hz"},
		{"ends", "open-open"},
		{"ambient", "10 K"},
		{"pressure", "10 Pa"},
		{"device-out", filepath.Join(t.TempDir(), "no", "such", "folder", "d.json")},
	} {
		texts := map[string]string{}
		for k, v := range doneWhenTexts {
			texts[k] = v
		}
		texts[c.key] = c.text
		_, err := designSheet.Evaluate(texts)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Key != c.key {
			t.Errorf("%s = %q: err = %v, want a field error on %s", c.key, c.text, err, c.key)
		}
	}
}

// TestDesignSheetHeatPump: the heat-pump variant designs a driven tube
// that reaches the span wanted; its file, solved by linear.HeatPump with
// default settings, gives the sheet's span; leaving out the driver
// amplitude names that input.
func TestDesignSheetHeatPump(t *testing.T) {
	t.Parallel()
	texts := map[string]string{"for": "heat-pump", "gas": "air", "pressure": "1 atm", "frequency": "400 Hz",
		"diameter": "40 mm", "drive": "3 kPa", "span": "20 K", "ambient": "293 K"}
	r, err := designSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	row, _ := r.Row("device")
	d, err := linear.ParseDevice(strings.NewReader(row.Text))
	if err != nil {
		t.Fatal(err)
	}
	hp, err := linear.HeatPump(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	span, _ := r.Row("span")
	if !scalar.EqualWithinRel(span.Value, hp.TemperatureSpan, 1e-8) || span.Value < 20 {
		t.Errorf("sheet span %.4f K, file %.4f K, wanted at least 20 K", span.Value, hp.TemperatureSpan)
	}
	if r.Worst() != Pass {
		t.Errorf("verdicts %+v", r.Verdicts())
	}
	delete(texts, "drive")
	_, err = designSheet.Evaluate(texts)
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Key != "drive" || !errors.Is(err, ErrRequired) {
		t.Errorf("without a drive: err = %v, want drive required", err)
	}
}

// TestDesignSheetEngineNeedsHot: an engine design without the heater's
// temperature names that input as required.
func TestDesignSheetEngineNeedsHot(t *testing.T) {
	t.Parallel()
	texts := map[string]string{}
	for k, v := range doneWhenTexts {
		texts[k] = v
	}
	delete(texts, "hot")
	_, err := designSheet.Evaluate(texts)
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Key != "hot" || !errors.Is(err, ErrRequired) {
		t.Errorf("err = %v, want hot required", err)
	}
}
