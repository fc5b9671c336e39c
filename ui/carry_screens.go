package ui

import (
	"strings"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// What the screens beyond their Forms give to and take from the Bench.

// publish puts the tube's resonance frequency on the Bench for the
// penetration-depth, pore and placement screens, and, when the length was
// solved for, the length for What the pitch says (a typed length, radius
// and ends go with the Form's inputs).
func (s *resonanceScreen) publish() {
	res := s.form.Result()
	if res == nil {
		return
	}
	b, from := s.env.Bench, s.Title()
	if row, ok := res.Row("frequency"); ok {
		b.put(carryFrequency, Carried{SI: row.Value, PM: row.PM, From: from})
	} else if _, ok := res.Row("length"); ok && res.Values.Has("frequency") {
		// the target frequency a length was solved for, as typed
		val := res.Values.Get("frequency")
		b.put(carryFrequency, Carried{Text: val.Text, SI: val.Q.Value, PM: val.Q.Uncertainty, From: from})
	}
	if row, ok := res.Row("length"); ok && s.kind() == sheet.ResonatorTube {
		b.put(carryTubeLength, Carried{SI: row.Value, PM: row.PM, From: from})
	}
}

// publish puts what a device screen's result says about its operating
// point on the Bench: the gas, the mean pressure and the frequency (for
// the penetration-depth, pore and placement screens); an engine also
// gives the size, fill and hot temperature of the rig for the safety
// pass.
func (v *deviceView) publish() {
	res := v.form.Result()
	if res == nil || v.dev == nil {
		return
	}
	b, from := v.env.Bench, v.form.Sheet.Title
	b.carry(carryGas, v.dev.GasText, 0, from)
	b.carry(carryPressure, "", v.dev.MeanPressure, from)
	if row, ok := res.Row("frequency"); ok && usable(row.Value) {
		b.put(carryFrequency, Carried{SI: row.Value, PM: row.PM, From: from})
	}
	if v.form.Sheet.ID != sheet.IDOnset {
		return
	}
	b.carry(carryRigPressure, "", v.dev.MeanPressure, from)
	b.carry(carryRigBore, "", v.dev.WidestDiameter(), from)
	b.carry(carryRigVolume, "", v.dev.GasVolume(), from)
	if row, ok := res.Row("hot_temperature"); ok {
		b.carry(carryHot, "", row.Value, from)
	} else if res.Values.Has("hot") {
		b.carry(carryHot, "", res.Values.SI("hot"), from)
	}
}

// Enter takes the rig's values another screen left on the Bench (an
// engine's size, fill, gas and hot end) into the pass's calculators.
func (s *safetyScreen) Enter() {
	for _, f := range []*Form{s.forms.vessel, s.forms.energy, s.forms.oxygen, s.forms.spl} {
		f.Enter()
	}
}

// operatingPoint is the device screens' operating-point line: the gas,
// fill pressure and ambient temperature of the device, and the frequency
// the result found or was driven at.
func (v *deviceView) operatingPoint() string {
	res := v.form.Result()
	if res == nil || v.dev == nil {
		return ""
	}
	// A new result or device is a new value: the line is written once for
	// each pair.
	if !v.pointDone || res != v.pointRes || v.dev != v.pointDev {
		v.pointDone, v.pointRes, v.pointDev, v.point = true, res, v.dev, v.writePoint(res)
	}
	return v.point
}

// writePoint writes the operating-point line of result res.
func (v *deviceView) writePoint(res *sheet.Result) string {
	vals := []string{v.dev.Gas.String(), writtenIn(v.dev.MeanPressure, units.DimPressure)[0],
		writtenIn(v.dev.AmbientTemperature, units.DimTemperature)[0] + " ambient"}
	how := "gas, fill and ambient as set under Operating conditions"
	if row, ok := res.Row("frequency"); ok && usable(row.Value) {
		vals = append(vals, units.Format(row.Value, units.DimFrequency))
		how += ", frequency solved"
		switch {
		case v.form.Sheet.Input("frequency") != nil && res.Values.Has("frequency"):
			how = "gas, fill and ambient as set under Operating conditions, frequency typed here"
		case v.form.Sheet.ID == sheet.IDHeatPump:
			how = "gas, fill and ambient as set under Operating conditions, frequency the driver's"
		}
	}
	return "At " + strings.Join(vals, ", ") + " · " + how
}
