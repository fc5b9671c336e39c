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
				// the preferred unit, or the readable one where the number
				// would be huge or tiny there (units.FormatPMPrefer)
				r.addPMWith(units.FormatPMPrefer, row.Label, row.Value, row.PM, row.Dim, row.Show)
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
