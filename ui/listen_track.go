package ui

import (
	"encoding/csv"
	"io"
	"math"
	"strings"

	"gioui.org/io/clipboard"

	"tubewright/calc/sheet"

	"tubewright/calc/units"
)

// This file draws the listen screen's track (pitch and level against
// time, from the description's table) and writes it as CSV.

// showPlots draws the pitch and the level against time from the result's
// track table, or clears them.
func (s *listenScreen) showPlots() {
	t := s.track()
	if t == nil {
		s.freq.Set(nil)
		s.level.Set(nil)
		return
	}
	var fs, ls XYs
	for _, r := range t.Rows {
		f := r[1]
		if f <= 0 {
			// no clear tone in this frame: a gap in the line
			f = math.NaN()
		}
		fs = append(fs, XY{X: r[0], Y: f})
		ls = append(ls, XY{X: r[0], Y: r[2]})
	}
	s.freq.Set(lineXY(fs, "Time", "s", "Frequency", "Hz", "Pitch against time"))
	s.level.Set(lineXY(ls, "Time", "s", "Level", "dBFS", "Level against time"))
}

// trackCSV writes the track table as comma-separated values with its
// header line, numbers in plain decimals with 7 significant digits: what
// twcalc listen --track prints.
func trackCSV(t *sheet.Table) string {
	var b strings.Builder
	w := csv.NewWriter(&b)
	_ = w.Write(t.Header)
	rec := make([]string, len(t.Header))
	for _, r := range t.Rows {
		for j, v := range r {
			rec[j] = units.Decimal(v, 7)
		}
		_ = w.Write(rec)
	}
	w.Flush()
	return b.String()
}

// clipboardText is the command that puts text on the clipboard.
func clipboardText(text string) clipboard.WriteCmd {
	return clipboard.WriteCmd{Type: "application/text", Data: io.NopCloser(strings.NewReader(text))}
}
