package sheet

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/linear"
	"tubewright/calc/numeric"
	"tubewright/calc/units"
)

// The search for the best drive frequency: a coarse sweep of bestPoints
// frequencies from (1 - bestReach) to (1 + bestReach) times the driver's
// own frequency, then the maximum refined to bestTol.
const (
	bestReach  = 0.3
	bestPoints = 13
	bestTol    = 0.01 // Hz, on the position of the maximum
	bestStep   = 1e-4 // central-difference step, relative to the frequency
)

// pumpBest is the drive frequency of the largest span near a centre
// frequency and the span it gives, at the cooling load of the settings.
type pumpBest struct {
	Frequency float64 // Hz
	Span      float64 // K
	Refined   bool    // false: the best point of the coarse sweep
	AtEdge    bool    // the largest span lies at an end of the sweep
	Solves    int     // heat-pump solves spent
}

// bestDrive finds the drive frequency (Hz) of the largest span of device
// d near centre (Hz, > 0), holding the driver's amplitude and the load of
// hs. It sweeps bestPoints frequencies evenly over centre·(1 ± bestReach)
// with calc/linear's SpanVsFrequency, takes the converged point of the
// largest span, and, when it has converged neighbours on both sides,
// refines it by Brent's method (calc/numeric) on the derivative dSpan/df
// taken by central differences (step bestStep·f), within the bracket of
// the two neighbours, to bestTol: the coarse maximum is above both
// neighbours, so a smooth span has its maximum between them, where the
// derivative changes sign. When the derivative does not change sign over
// the bracket, a solve fails during refinement, or the refined span is
// below the coarse one, the coarse maximum stands (Refined false). On the
// example pump this is 13 coarse solves and about 15 more. It fails only
// when no point of the sweep converges.
func bestDrive(d *linear.Device, centre float64, hs linear.HeatPumpSettings) (pumpBest, error) {
	hs.NoProfile = true
	freqs := linear.Grid((1-bestReach)*centre, (1+bestReach)*centre, bestPoints, false)
	pts := linear.SpanVsFrequency(d, freqs, &hs)
	b := pumpBest{Solves: len(pts)}
	at := -1
	for i, p := range pts {
		if p.Err == nil && (at < 0 || p.Result.TemperatureSpan > pts[at].Result.TemperatureSpan) {
			at = i
		}
	}
	if at < 0 {
		return b, errors.New("heat pump: no point of the search for the best drive frequency converged")
	}
	b.Frequency, b.Span = pts[at].Frequency, pts[at].Result.TemperatureSpan
	if at == 0 || at == len(pts)-1 {
		b.AtEdge = true
		return b, nil
	}
	if pts[at-1].Err != nil || pts[at+1].Err != nil {
		return b, nil
	}
	span := func(f float64) float64 {
		hs.Frequency = f
		b.Solves++
		r, err := linear.HeatPump(d, &hs)
		if err != nil {
			return math.NaN()
		}
		return r.TemperatureSpan
	}
	slope := func(f float64) float64 {
		h := bestStep * f
		return (span(f+h) - span(f-h)) / (2 * h)
	}
	root, err := numeric.Brent(slope, pts[at-1].Frequency, pts[at+1].Frequency, &numeric.RootSettings{AbsTol: bestTol, MaxIterations: 40})
	if err != nil || !root.Converged {
		return b, nil
	}
	s := span(root.X)
	if !(s >= b.Span) || math.IsNaN(s) {
		// A slope root that is no higher than the coarse point is no maximum.
		return b, nil
	}
	b.Frequency, b.Span, b.Refined = root.X, s, true
	return b, nil
}

// addBest appends the best drive frequency and its span to r, with the
// method in the rows' notes and a warning when the search could not
// refine it.
func addBest(r *Result, b pumpBest, centre float64) {
	how := fmt.Sprintf("largest span of %d drive frequencies from %s to %s, refined by Brent's method on dSpan/df",
		bestPoints, units.Format((1-bestReach)*centre, units.DimFrequency), units.Format((1+bestReach)*centre, units.DimFrequency))
	if !b.Refined {
		how = fmt.Sprintf("largest span of %d drive frequencies from %s to %s (not refined)",
			bestPoints, units.Format((1-bestReach)*centre, units.DimFrequency), units.Format((1+bestReach)*centre, units.DimFrequency))
	}
	r.Add("best_drive_frequency", "Best drive frequency", b.Frequency, units.DimFrequency).Note = how
	r.Add("best_span", "Span at the best drive frequency", b.Span, units.DimTemperatureDifference).Note = "same driver amplitude and load"
	switch {
	case b.AtEdge:
		r.Warn("the largest span of the search lies at its end; the best drive frequency may lie further out: sweep the span against drive frequency more widely")
	case !b.Refined:
		r.Warn("the best drive frequency could not be refined (a solve near it failed); it is the best point of the coarse search")
	}
}
