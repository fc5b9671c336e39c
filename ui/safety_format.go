package ui

import (
	"fmt"
	"math"
	"strconv"

	"gioui.org/layout"
	"gioui.org/widget/material"

	"tubewright/calc/safety"
	"tubewright/calc/units"
	"tubewright/ui/store"
)

// This file holds the small formatting and recording helpers of the safety
// screens: every number shown is also recorded (SI value, SI unit and the
// text shown) for the bench log.

// shownIn formats SI value v in unit, falling back to the SI unit of dim.
func shownIn(v float64, unit string, dim units.Dimension) string {
	if s, err := units.FormatIn(v, unit); err == nil {
		return s
	}
	return units.Format(v, dim)
}

// gaugeText writes a gauge pressure (Pa above the atmosphere) in barg.
func gaugeText(g safety.GaugePressure) string {
	s, err := units.FormatGauge(float64(g)+units.StandardAtmosphere, units.StandardAtmosphere, "barg")
	if err != nil {
		return units.Format(float64(g), units.DimPressure) + " above the atmosphere"
	}
	return s
}

// energyText writes an energy in J, kJ or MJ.
func energyText(e float64) string {
	switch {
	case e >= 1e6:
		return shownIn(e, "MJ", units.DimEnergy)
	case e >= 1e3:
		return shownIn(e, "kJ", units.DimEnergy)
	}
	return units.Format(e, units.DimEnergy)
}

// massText writes a mass in g below 1 kg, else kg.
func massText(m float64) string {
	if m < 1 {
		return shownIn(m, "g", units.DimMass)
	}
	return shownIn(m, "kg", units.DimMass)
}

// percentText writes a fraction as a percentage with one decimal.
func percentText(x float64) string {
	return strconv.FormatFloat(100*x, 'f', 1, 64) + " %"
}

// durationText writes seconds as minutes or hours.
func durationText(s float64) string {
	switch {
	case s >= 2*3600:
		return fmt.Sprintf("%.1f h", s/3600)
	case s >= 60:
		return fmt.Sprintf("%.0f min", s/60)
	}
	return fmt.Sprintf("%.0f s", s)
}

// dBText writes a level in dB with one decimal.
func dBText(l float64) string { return strconv.FormatFloat(l, 'f', 1, 64) + " dB" }

// record is a results card that also keeps each number for the bench log.
type record struct {
	res  *Results
	nums []store.Number
}

func newRecord(env *Env) *record { return &record{res: NewResults(env)} }

// reset empties the card and the recorded numbers.
func (r *record) reset() {
	r.res.Reset()
	r.nums = r.nums[:0]
}

// add shows label with the text shown and records v (SI, of dimension dim).
// A non-finite v is shown as "—" and not recorded.
func (r *record) add(label string, v float64, dim units.Dimension, shown string) {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		r.res.Add(label, v, dim)
		return
	}
	r.res.AddText(label, shown)
	unit := units.SIUnit(dim)
	if unit == "" {
		unit = "1"
	}
	r.nums = append(r.nums, store.Number{Name: label, Value: v, Unit: unit, Shown: shown})
}

// text shows a verdict row; it is not a number and is not recorded.
func (r *record) text(label, value string) { r.res.AddText(label, value) }

// numbers returns a copy of the recorded numbers.
func (r *record) numbers() []store.Number { return append([]store.Number(nil), r.nums...) }

// statusLine draws a status sentence (errors in the error colour) as a
// semantic node described desc.
func statusLine(env *Env, desc, text string, bad bool) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		l := material.Body1(env.Theme, text)
		l.Color = env.Colors.Text
		if bad {
			l.Color = env.Colors.Error
		}
		return Described(desc, l.Layout)(gtx)
	}
}
