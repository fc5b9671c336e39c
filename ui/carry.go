package ui

import (
	"math"
	"strings"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// carryKind names a value the app carries from one screen to the next.
type carryKind string

// The values carried. The first four are the operating point every
// gas-property screen shares (sheet.Input.Share); the tube goes from Tube
// resonance to What the pitch says; the rig's size, fill and hot end go
// from Engine onset to the safety pass.
const (
	carryGas         carryKind = "gas"
	carryTemperature carryKind = "temperature"
	carryPressure    carryKind = "pressure"
	carryFrequency   carryKind = "frequency"
	carryMeasured    carryKind = "measured frequency"
	carryTubeLength  carryKind = "tube length"
	carryTubeRadius  carryKind = "tube radius"
	carryTubeBore    carryKind = "tube inside diameter"
	carryTubeEnds    carryKind = "tube ends"
	carryRigBore     carryKind = "rig inside diameter"
	carryRigRadius   carryKind = "rig inner radius" // older kept benches
	carryRigPressure carryKind = "rig fill pressure"
	carryRigVolume   carryKind = "rig gas volume"
	carryHot         carryKind = "hot temperature"
)

// shareKinds maps the calculators' Share tags to what is carried.
var shareKinds = map[sheet.Share]carryKind{
	sheet.ShareGas:         carryGas,
	sheet.ShareTemperature: carryTemperature,
	sheet.SharePressure:    carryPressure,
	sheet.ShareFrequency:   carryFrequency,
}

// carryInputs are the inputs that give or take a carried value beyond the
// Share tags of the descriptions (which the terminal ignores, so the app
// keeps these here): the tube of the resonance and diagnosis screens, and
// the rig values the safety pass takes from an engine.
var carryInputs = map[sheet.ID]map[string]carryKind{
	sheet.IDResonance: {"length": carryTubeLength, "diameter": carryTubeBore, "radius": carryTubeRadius, "ends": carryTubeEnds},
	sheet.IDDiagnose: {"length": carryTubeLength, "diameter": carryTubeBore, "radius": carryTubeRadius, "ends": carryTubeEnds,
		"measured-frequency": carryMeasured},
	sheet.IDVessel: {"pressure": carryRigPressure, "inside-diameter": carryRigBore, "inner-radius": carryRigRadius},
	sheet.IDEnergy: {"volume": carryRigVolume},
	sheet.IDOxygen: {"release-from-vessel": carryRigVolume, "vessel-pressure": carryRigPressure},
}

// carryOf returns what input in of calculator id gives and takes, or "".
func carryOf(id sheet.ID, in *sheet.Input) carryKind {
	if k, ok := carryInputs[id][in.Key]; ok {
		return k
	}
	return shareKinds[in.Share]
}

// Carried is one value on the Bench: the text it was given in where it was
// used (kept, so that "20 degC" arrives as "20 degC"; "" when it was
// computed), its SI value (0 for a gas or a choice), the standard
// uncertainty of a measured value, and the title of the screen it came
// from.
type Carried struct {
	Text string
	SI   float64
	PM   float64
	From string
}

// put records a carried value and mirrors the operating point in the
// Bench's named fields.
func (b *Bench) put(k carryKind, c Carried) {
	if b.values == nil {
		b.values = map[carryKind]Carried{}
	}
	b.values[k] = c
	// A tube's size is carried as typed, a diameter or a radius: the
	// newer replaces the older, so that a screen never gets both. So is a
	// rig's bore (an engine gives its diameter; a radius is what benches
	// kept before).
	switch k {
	case carryTubeBore:
		delete(b.values, carryTubeRadius)
	case carryTubeRadius:
		delete(b.values, carryTubeBore)
	case carryRigBore:
		delete(b.values, carryRigRadius)
	case carryRigRadius:
		delete(b.values, carryRigBore)
	}
	switch k {
	case carryGas:
		b.Gas = c.Text
	case carryTemperature:
		b.Temperature = c.SI
	case carryPressure:
		b.Pressure = c.SI
	case carryFrequency:
		b.Frequency, b.FrequencyFrom, b.FrequencyPM = c.SI, c.From, c.PM
	}
}

// carried returns the value of kind k, if the Bench holds one.
func (b *Bench) carried(k carryKind) (Carried, bool) {
	c, ok := b.values[k]
	return c, ok
}

// Carry records a value computed or typed on the screen titled from, for
// other screens to take: text as the user gave it ("" to have it written
// from si), si its SI value. Non-finite or non-positive values of a
// quantity are ignored.
func (b *Bench) carry(k carryKind, text string, si float64, from string) {
	if text == "" && !usable(si) {
		return
	}
	if math.IsNaN(si) || math.IsInf(si, 0) {
		return
	}
	b.put(k, Carried{Text: text, SI: si, From: from})
}

// carryText returns the text input in takes for the carried value c: the
// text c was given in when in reads it as the same value, else c written
// in a unit people use for in's dimension (absolute or gauge, as in
// reads it); "" when no text gives the value.
func carryText(in *sheet.Input, c Carried) string {
	if in.Kind == sheet.Gas || in.Kind == sheet.Pick {
		return c.Text
	}
	var cands []string
	if c.Text != "" {
		cands = append(cands, c.Text, withoutPM(c.Text))
	}
	exact := len(cands) // the first ones are the text as given
	if c.PM > 0 && in.PM {
		cands = append(cands, units.FormatPM(c.SI, c.PM, in.Dim))
	}
	cands = append(cands, writtenIn(c.SI, in.Dim)...)
	for i, t := range cands {
		v, err := sheet.ParseInput(in, t)
		if err != nil || !v.Given {
			continue
		}
		tol := 1e-9
		if i >= exact {
			tol = 1e-3 // written with 4 significant digits
		}
		if math.Abs(v.Q.Value-c.SI) <= tol*math.Abs(c.SI) {
			return t
		}
	}
	return ""
}

// withoutPM is text with a typed uncertainty ("± 2 K", "+- 2 K") cut off.
func withoutPM(text string) string {
	for _, sep := range []string{"±", "+-"} {
		if i := strings.Index(text, sep); i > 0 {
			return strings.TrimSpace(text[:i])
		}
	}
	return text
}

// writtenIn writes an SI value of dimension d in the units a bench worker
// reads, without exponents: bar (absolute, then gauge), mm, L; the SI unit
// otherwise.
func writtenIn(si float64, d units.Dimension) []string {
	var out []string
	add := func(s string, err error) {
		if err == nil {
			out = append(out, s)
		}
	}
	switch d {
	case units.DimPressure:
		add(units.FormatIn(si, "bar"))
		add(units.FormatGauge(si, units.StandardAtmosphere, "barg"))
	case units.DimLength:
		add(units.FormatIn(si, "mm"))
	case units.DimVolume:
		add(units.FormatIn(si, "L"))
	}
	return append(out, units.Format(si, d))
}
