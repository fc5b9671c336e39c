package ui

import (
	"strings"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// safetyForms are the calculators the safety pass walks through, one Form
// each, shared by the steps that show parts of them: the vessel (wall,
// relief and test steps), the stored energy (test step), the room oxygen
// (cylinder and oxygen steps) and the sound level (hearing step).
type safetyForms struct {
	vessel, energy, oxygen, spl *Form
}

func newSafetyForms(env *Env) *safetyForms {
	form := func(id sheet.ID) *Form {
		s, ok := sheet.Lookup(id)
		if !ok {
			panic("ui: no calculator " + string(id))
		}
		f := NewForm(env, s)
		f.Enter()
		return f
	}
	return &safetyForms{vessel: form(sheet.IDVessel), energy: form(sheet.IDEnergy), oxygen: form(sheet.IDOxygen), spl: form(sheet.IDSPL)}
}

// byID returns the form of calculator id, or nil.
func (f *safetyForms) byID(id sheet.ID) *Form {
	for _, x := range []*Form{f.vessel, f.energy, f.oxygen, f.spl} {
		if x.Sheet.ID == id {
			return x
		}
	}
	return nil
}

// carry keeps one input of a form filled from another step's result until
// the user types into it: text set by code is remembered, and a text that
// differs from it was typed.
type carry struct {
	form *Form
	key  string
	last string // the text last set by code
}

// set puts text into the input unless the user has typed another there.
func (c *carry) set(text string) {
	cur := strings.TrimSpace(c.form.Text(c.key))
	if cur != "" && cur != c.last {
		return // typed by the user
	}
	if text != cur {
		c.form.SetText(c.key, text)
	}
	c.last = text
}

// gaugeRowText writes a gauge pressure row of a result as barg text, or ""
// when the row is missing.
func gaugeRowText(r *sheet.Result, key string) string {
	if r == nil {
		return ""
	}
	row, ok := r.Row(key)
	if !ok || !row.Gauge {
		return ""
	}
	s, err := units.FormatGauge(row.Value+units.StandardAtmosphere, units.StandardAtmosphere, "barg")
	if err != nil {
		return ""
	}
	return s
}
