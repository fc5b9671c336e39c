package ui

import (
	"image"
	"testing"
)

// TestHeatPumpScreenBestMark: the span plot marks the result's best drive
// frequency and its span; the mark is inside the plotted frequencies and
// no lower than any plotted point (the plot is a coarser sweep of the same
// solve, so a refined maximum cannot be below it; 1 µK for rounding).
func TestHeatPumpScreenBestMark(t *testing.T) {
	env := NewEnv(nil)
	s := newHeatPumpScreen(env).(*heatPumpScreen)
	h := newHarness(t, image.Pt(412, 915), s.Layout)
	waitSolved(t, h, s.job.Running, s.job.Has)
	c := s.plots[3].Chart()
	if c == nil || len(c.Lines) != 1 || len(c.Marks) != 1 {
		t.Fatalf("span plot %+v: want one line and one mark", c)
	}
	r := s.form.Result()
	f, okF := r.Row("best_drive_frequency")
	span, okS := r.Row("best_span")
	if !okF || !okS {
		t.Fatalf("result without the best drive frequency: %+v", r.Rows)
	}
	m, line := c.Marks[0], c.Lines[0]
	if m.X != f.Value || m.Y != span.Value {
		t.Errorf("mark (%g Hz, %g K), result (%g Hz, %g K)", m.X, m.Y, f.Value, span.Value)
	}
	if m.X < line[0].X || m.X > line[len(line)-1].X {
		t.Errorf("mark at %g Hz outside the plotted %g to %g Hz", m.X, line[0].X, line[len(line)-1].X)
	}
	for _, p := range line {
		if p.Y > m.Y+1e-6 {
			t.Errorf("plotted span %g K at %g Hz above the best %g K", p.Y, p.X, m.Y)
		}
	}
}
