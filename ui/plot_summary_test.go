package ui

import (
	"image"
	"regexp"
	"strings"
	"testing"
)

// TestPlotSummary: the drawing's semantic label says in words what the
// plot shows. The tube is the quarter-wave rule f = c/(4L) with c =
// 340 m/s, marked at 0.147 m, 578.2 Hz ± 8 Hz (common practice, no
// published source).
func TestPlotSummary(t *testing.T) {
	c := NewXYPlot("Length", "m", "Frequency", "Hz")
	c.Title = "Frequency against length"
	c.AddLine(quarterWave())
	c.AddMark(0.147, 340/(4*0.147), 0, 8)
	w := NewPlot(NewEnv(nil))
	w.Set(c)
	h := newHarness(t, image.Pt(400, 700), w.Layout)
	want := "Plot: Frequency against length. Length from 100 mm to 290 mm. Frequency from 293.1 Hz to 850 Hz. " +
		"One line. The line, 20 points, runs from (100 mm, 850 Hz) to (290 mm, 293.1 Hz); highest 850 Hz at 100 mm. " +
		"Marked point: Length 147 mm, Frequency 578.2 ± 8 Hz."
	if got := h.mustDesc("Plot drawing").Desc.Label; got != want {
		t.Errorf("summary\n  %q\nwant\n  %q", got, want)
	}
}

// hasExponent finds a number written with an exponent ("1e-06", "2.5E+03").
var hasExponent = regexp.MustCompile(`[0-9][eE][-+]?[0-9]`)

// longZeros finds a number nobody reads: "0.0000002647".
var longZeros = regexp.MustCompile(`0\.0{6,}`)

// TestEveryPlotHasSummary opens every catalog screen at phone size and
// checks each plot's drawing carries a summary naming its axes, with no
// exponent in it.
func TestEveryPlotHasSummary(t *testing.T) {
	plots := 0
	for _, e := range Catalog() {
		a := NewApp(nil)
		a.Open(e.ID)
		h := newHarness(t, image.Pt(412, 12000), a.Layout)
		h.settleJobs(a)
		for _, n := range h.nodes() {
			if n.Desc.Description != "Plot drawing" {
				continue
			}
			plots++
			s := n.Desc.Label
			if !strings.HasPrefix(s, "Plot: ") || !strings.Contains(s, " from ") || !strings.Contains(s, " to ") {
				t.Errorf("%s: plot summary %q", e.ID, s)
			}
			if hasExponent.MatchString(s) || longZeros.MatchString(s) {
				t.Errorf("%s: exponent or a run of zeros in the plot summary %q", e.ID, s)
			}
		}
	}
	// The plots of tube resonance, what the pitch says, engine onset and
	// heat pump: 11 when this test was written.
	if plots < 11 {
		t.Errorf("only %d plots found on the catalog's screens", plots)
	}
	t.Logf("%d plots", plots)
}
