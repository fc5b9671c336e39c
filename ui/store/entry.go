package store

import (
	"strconv"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// EntryOf makes the log entry of a calculator's result: its inputs as
// typed (texts, by input key), every row with its SI value and the text
// shown, the verdicts, warnings and cautions, and the user's note. Both
// the app and twcalc log through it, so an entry reads the same whichever
// wrote it.
func EntryOf(s *sheet.Sheet, texts map[string]string, res *sheet.Result, note string) Entry {
	e := Entry{Calculator: string(s.ID), Title: s.Title, Inputs: map[string]string{}, Note: note,
		Cautions: append([]string(nil), res.Cautions...), Warnings: append([]string(nil), res.Warnings...)}
	for _, v := range res.Values.All() {
		switch {
		case v.In.Kind == sheet.Switch:
			e.Inputs[v.In.Key] = strconv.FormatBool(v.On)
		case v.Set:
			e.Inputs[v.In.Key] = v.Text
		}
	}
	for k, t := range texts {
		if t != "" {
			e.Inputs[k] = t
		}
	}
	for _, r := range res.Rows {
		row := Row{Key: r.Key, Label: r.Label}
		switch r.Kind {
		case sheet.Num:
			row.Value, row.Uncertainty, row.Unit = r.Value, r.PM, units.SIUnit(r.Dim)
			row.Shown = units.FormatPM(r.Value, r.PM, r.Dim)
			if r.Show != "" {
				if s, err := units.FormatPMPrefer(r.Value, r.PM, r.Dim, r.Show); err == nil {
					row.Shown = s
				}
			}
			if r.Gauge {
				row.Shown += " gauge"
			}
		case sheet.Complex:
			row.Shown = units.FormatComplex(r.Z)
		default:
			row.Shown = r.Text
		}
		e.Rows = append(e.Rows, row)
	}
	for _, v := range res.Verdicts() {
		e.Verdicts = append(e.Verdicts, Verdict{Check: v.Check, Outcome: v.Outcome, Why: v.Why})
	}
	return e
}
