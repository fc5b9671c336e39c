package sheet

import (
	"context"
	"errors"
	"strings"
	"testing"
)

// TestEvaluateDesignIsTheTerminalsRun: the entry point a screen runs off
// its UI goroutine gives the very rows of Evaluate (the terminal's path),
// reports progress counting up, and stops with the context's error once it
// is cancelled.
func TestEvaluateDesignIsTheTerminalsRun(t *testing.T) {
	t.Parallel()
	want, err := designSheet.Evaluate(doneWhenTexts)
	if err != nil {
		t.Fatal(err)
	}
	last, calls := 0, 0
	got, err := EvaluateDesign(context.Background(), func(solves, limit int) {
		calls++
		if solves <= last || solves > limit {
			t.Errorf("progress %d of %d after %d", solves, limit, last)
		}
		last = solves
	}, doneWhenTexts)
	if err != nil {
		t.Fatal(err)
	}
	if calls == 0 {
		t.Error("no progress reported")
	}
	if len(got.Rows) != len(want.Rows) {
		t.Fatalf("%d rows, Evaluate gives %d", len(got.Rows), len(want.Rows))
	}
	for i, w := range want.Rows {
		g := got.Rows[i]
		if g.Key != w.Key || g.Value != w.Value || g.Text != w.Text || g.Outcome != w.Outcome {
			t.Errorf("row %d: %s = %v %q, Evaluate gives %s = %v %q", i, g.Key, g.Value, g.Text, w.Key, w.Value, w.Text)
		}
	}

	ctx, cancel := context.WithCancel(context.Background())
	r, err := EvaluateDesign(ctx, func(solves, _ int) {
		if solves == 5 {
			cancel()
		}
	}, doneWhenTexts)
	if !errors.Is(err, context.Canceled) || r != nil {
		t.Errorf("cancelled after 5 solves: %v, %v; want no result and context.Canceled", r, err)
	}
}

// TestDesignSensitivityLines: the table a screen draws holds every
// sensitivity row of the result, paired by quantity, with the change in
// words; a heat pump has none.
func TestDesignSensitivityLines(t *testing.T) {
	t.Parallel()
	r, err := designSheet.Evaluate(doneWhenTexts)
	if err != nil {
		t.Fatal(err)
	}
	lines := DesignSensitivity(r)
	keys := []string{"position", "stack_length", "hydraulic_radius", "mean_pressure"}
	if len(lines) != len(keys) {
		t.Fatalf("%d lines, want %d: %+v", len(lines), len(keys), lines)
	}
	for i, k := range keys {
		l := lines[i]
		if l.Onset.Key != "onset_change_"+k || l.Frequency.Key != "frequency_change_"+k {
			t.Errorf("line %d pairs %s with %s, want %s", i, l.Onset.Key, l.Frequency.Key, k)
		}
		if !strings.Contains(l.Change, " more ") || strings.HasPrefix(l.Change, "Onset") || l.Frequency.Label != "Frequency change for "+l.Change {
			t.Errorf("line %d: change %q, frequency label %q", i, l.Change, l.Frequency.Label)
		}
	}
	pump, err := designSheet.Evaluate(map[string]string{"for": "heat-pump", "gas": "air", "pressure": "1atm", "frequency": "400Hz",
		"diameter": "40mm", "drive": "3kPa", "span": "20K"})
	if err != nil {
		t.Fatal(err)
	}
	if l := DesignSensitivity(pump); len(l) != 0 {
		t.Errorf("heat pump: %d sensitivity lines, want none", len(l))
	}
}

// TestDesignSharesOnlyGasTemperatures: the heater's and the cold end's
// temperatures are not carried between screens as the gas temperature
// (a heater at 650 K must not become the next screen's gas temperature);
// the ambient is.
func TestDesignSharesOnlyGasTemperatures(t *testing.T) {
	t.Parallel()
	for key, want := range map[string]Share{"hot": ShareNone, "cold": ShareNone, "ambient": ShareTemperature, "gas": ShareGas, "pressure": SharePressure} {
		if got := designSheet.Input(key).Share; got != want {
			t.Errorf("input %s shares %v, want %v", key, got, want)
		}
	}
}
