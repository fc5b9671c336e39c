package ui

import (
	"image/color"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// Show fills the card with a calculator's result rows and warnings, each
// row formatted from its dimension (or its Show unit) and, where the row
// is a check, marked with its outcome; the solve's diagnostics go to the
// closed Details section.
func (r *Results) Show(res *sheet.Result) {
	for _, row := range res.Rows {
		n := len(r.rows)
		switch row.Kind {
		case sheet.Num:
			switch {
			case row.Gauge:
				r.addGauge(row.Label, row.Value)
			case row.Show != "":
				r.addPMPrefer(row.Label, row.Value, row.PM, row.Dim, row.Show)
			default:
				r.AddPM(row.Label, row.Value, row.PM, row.Dim)
			}
		case sheet.Complex:
			r.AddText(row.Label, complexText(row.Z))
		default:
			r.AddText(row.Label, row.Text)
		}
		if len(r.rows) > n {
			last := &r.rows[len(r.rows)-1]
			last.outcome = row.Outcome
			if row.Note != "" && last.note == "" {
				last.note = row.Note
			}
		}
	}
	r.Warn(res.Warnings...)
	r.details.show(res.Details)
}

// addPMPrefer appends a row in its preferred unit, or in the readable
// unit where the number would be very large or small there (see
// units.FormatPMPrefer).
func (r *Results) addPMPrefer(label string, v, u float64, dim units.Dimension, unit string) {
	if !finite(v) {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: notDefined})
		return
	}
	note := ""
	if !finite(u) {
		u, note = 0, "uncertainty not available"
	}
	s, err := units.FormatPMPrefer(v, u, dim, unit)
	if err != nil {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: err.Error()})
		return
	}
	r.rows = append(r.rows, resultRow{label: label, value: s, note: note})
}

// addGauge appends a pressure above the atmosphere, in bar gauge.
func (r *Results) addGauge(label string, pa float64) {
	s, err := units.FormatIn(pa, "bar")
	if err != nil || !finite(pa) {
		r.rows = append(r.rows, resultRow{label: label, value: "—", note: notDefined})
		return
	}
	r.rows = append(r.rows, resultRow{label: label, value: s + " gauge"})
}

// outcomeLook is how a check's outcome is drawn: the words on its badge and
// the badge colour from the palette c (words in c.OnBadge). A failure is
// red with "FAIL", never plain text.
func outcomeLook(c Colors, o sheet.Outcome) (word string, bg color.NRGBA) {
	switch o {
	case sheet.Pass:
		return "PASS", c.Pass
	case sheet.Warn:
		return "CHECK", c.Check
	case sheet.Fail:
		return "FAIL", c.Fail
	}
	return "", color.NRGBA{}
}
