package ui

import (
	"errors"
	"fmt"
	"slices"
	"strconv"
	"strings"

	"gioui.org/layout"

	"tubewright/calc/safety"
	"tubewright/calc/units"
	"tubewright/ui/store"
)

// inlineCalc is the calculator shown inside a checklist item where a
// number decides it. It keeps its fields and last result; Update handles
// events and recomputes, Inputs and Outputs draw it.
type inlineCalc interface {
	Update(gtx layout.Context)
	// Inputs are the fields and choices; Outputs the results card and the
	// caution box beside it.
	Inputs() []layout.Widget
	Outputs() []layout.Widget
	// Numbers returns the last result's numbers for the bench log, nil
	// when the inputs do not give one.
	Numbers() []store.Number
	// Cautions returns the cautions shown beside the numbers.
	Cautions() []string
}

// pressureHint is the hint of the safety screens' pressure fields.
const pressureHint = "gauge: 30 barg, 435 psig; absolute: 31 bar, 450 psi"

// calcBase holds what every inline calculator has: its fields (checked
// for changes each frame), the results card and the caution box. The box
// holds the item's fixed cautions (base) plus those of the current inputs
// and result: each compute starts from base (begin) and adds the gas's and
// the result's cautions (addCautions, addGas).
type calcBase struct {
	env      *Env
	base     []string
	fields   []*Field
	extras   []func(gtx layout.Context) bool // other controls: true when changed
	compute  func()                          // fills rec from the inputs
	onChange func(f *Field)                  // optional: a field changed by the user
	rec      *record
	caution  *Caution
	ok       bool
	dirty    bool
}

func newCalcBase(env *Env, heading string, cautions []string) calcBase {
	base := append([]string(nil), cautions...)
	return calcBase{env: env, base: base, rec: newRecord(env), caution: NewCaution(env, heading, cautions...), dirty: true}
}

// addCautions adds lines to the caution box, each once.
func (b *calcBase) addCautions(lines ...string) {
	for _, l := range lines {
		if !slices.Contains(b.caution.Lines, l) {
			b.caution.Lines = append(b.caution.Lines, l)
		}
	}
}

// addGas adds the cautions of the picked gas (hydrogen burns, carbon
// dioxide is toxic) whenever the picker gives a gas, with or without a
// result: the gas is chosen, so its hazard stands. They go right after the
// general caution, where they are read first.
func (b *calcBase) addGas(g *GasPicker) {
	m, err := g.Mixture()
	if err != nil {
		return
	}
	at := 0
	if len(b.caution.Lines) > 0 && b.caution.Lines[0] == safety.CautionGeneral {
		at = 1
	}
	for _, l := range safety.GasCautions(m) {
		if !slices.Contains(b.caution.Lines, l) {
			b.caution.Lines = slices.Insert(b.caution.Lines, at, l)
			at++
		}
	}
}

// field makes a field and registers it for change tracking.
func (b *calcBase) field(label string, dim units.Dimension, text, hint string) *Field {
	f := NewField(b.env, label, dim, text)
	f.Hint = hint
	b.fields = append(b.fields, f)
	return f
}

// Update implements inlineCalc: it handles the controls' events and
// recomputes when one changed.
func (b *calcBase) Update(gtx layout.Context) {
	for _, f := range b.fields {
		if f.Update(gtx) {
			b.dirty = true
			if b.onChange != nil {
				b.onChange(f)
			}
		}
	}
	for _, x := range b.extras {
		if x(gtx) {
			b.dirty = true
		}
	}
	if b.dirty {
		b.dirty = false
		b.compute()
	}
}

// begin clears the result, the fields' calculation errors and the caution
// box down to the item's fixed cautions, and reports whether every field
// parsed.
func (b *calcBase) begin() bool {
	b.rec.reset()
	b.caution.Lines = append(b.caution.Lines[:0], b.base...)
	b.ok = false
	good := true
	for _, f := range b.fields {
		f.SetError(nil)
		if _, err := f.Quantity(); err != nil {
			good = false
		}
	}
	if !good {
		b.rec.res.Fail(errors.New("check the fields marked in red"))
	}
	return good
}

// fail shows err, under the field it names when it is a RangeError.
func (b *calcBase) fail(err error, byField map[string]*Field) {
	var re *units.RangeError
	if errors.As(err, &re) {
		name := strings.ToLower(re.Field)
		for key, f := range byField {
			if strings.Contains(name, key) {
				f.SetError(err)
				break
			}
		}
	}
	b.rec.res.Fail(err)
}

// Numbers implements inlineCalc.
func (b *calcBase) Numbers() []store.Number {
	if !b.ok {
		return nil
	}
	return b.rec.numbers()
}

// Outputs implements inlineCalc.
func (b *calcBase) Outputs() []layout.Widget {
	return []layout.Widget{b.rec.res.Layout, b.caution.Layout}
}

// Cautions implements inlineCalc.
func (b *calcBase) Cautions() []string { return append([]string(nil), b.caution.Lines...) }

// value returns the SI value of a field that parsed (begin checked them).
func value(f *Field) float64 {
	v, _ := f.Value()
	return v
}

// gaugeOf returns the gauge pressure of a pressure field that parsed.
func gaugeOf(f *Field) safety.GaugePressure {
	q, _ := f.Quantity()
	return safety.GaugeOf(q, 0)
}

// ---- wall stress and the ASME shell ----

// wallCalc: stresses of the shell at the hot-end allowable stress, and the
// code thickness and MAWP.
type wallCalc struct {
	calcBase
	press, ri, wall, allow, eff, corr *Field
	family                            *Choice
	mawp                              safety.GaugePressure // of the entered wall, when ok and ASME
	design                            safety.GaugePressure // the design pressure, when mawpOK
	mawpOK                            bool
}

func newWallCalc(env *Env) *wallCalc {
	c := &wallCalc{calcBase: newCalcBase(env, "Beside these stresses", []string{safety.CautionGeneral, safety.CautionStress, safety.CautionHotSurfaces})}
	c.press = c.field("Design pressure", units.DimPressure, "30 barg", pressureHint)
	c.ri = c.field("Inner radius", units.DimLength, "50 mm", "e.g. 50 mm, 2 in")
	c.wall = c.field("Wall thickness", units.DimLength, "6 mm", "e.g. 6 mm, 0.25 in")
	c.allow = c.field("Allowable stress at the hot-end temperature", units.DimStress, "", "your material's allowable stress at the hottest wall temperature, e.g. 115 MPa, 16.7 ksi")
	c.eff = c.field("Joint efficiency", units.DimNone, "1", "1 for seamless tube; 0.85 or 0.7 for welded seams (ASME UW-12)")
	c.corr = c.field("Corrosion allowance", units.DimLength, "0 mm", "extra wall kept for corrosion or wear, e.g. 1 mm")
	keys := []string{"asme", "eu", "other"}
	labels := make([]string, len(safety.Families))
	for i, f := range safety.Families {
		labels[i] = f.Label()
	}
	c.family = NewChoice(env, "Code family to compare with", keys, labels)
	c.calcBase.compute = c.compute
	c.extras = append(c.extras, c.family.Update)
	return c
}

func (c *wallCalc) familyOf() safety.CodeFamily {
	switch c.family.Selected() {
	case "eu":
		return safety.FamilyEU
	case "other":
		return safety.FamilyOther
	}
	return safety.FamilyASME
}

func (c *wallCalc) compute() {
	c.mawpOK = false
	if !c.begin() {
		return
	}
	byField := map[string]*Field{"pressure": c.press, "inner radius": c.ri, "wall": c.wall, "allowable": c.allow, "joint": c.eff, "corrosion": c.corr}
	P := gaugeOf(c.press)
	lame, err := safety.ThickWallStress(P, value(c.ri), value(c.wall), value(c.allow))
	if err != nil {
		c.fail(err, byField)
		return
	}
	c.addCautions(lame.Cautions...)
	r := c.rec
	r.add("Pressure on the wall (gauge)", float64(P), units.DimPressure, gaugeText(P))
	r.add("Hoop stress (Lamé, inner surface)", lame.Hoop, units.DimStress, shownIn(lame.Hoop, "MPa", units.DimStress))
	r.add("Longitudinal stress", lame.Longitudinal, units.DimStress, shownIn(lame.Longitudinal, "MPa", units.DimStress))
	r.add("Radial stress", lame.Radial, units.DimStress, shownIn(lame.Radial, "MPa", units.DimStress))
	r.add("Hoop stress / allowable", lame.HoopRatio, units.DimNone, fmt.Sprintf("%.2f", lame.HoopRatio))
	r.res.Warn(lame.Warnings...)
	if thin, err := safety.ThinWallStress(P, value(c.ri), value(c.wall), value(c.allow)); err == nil {
		r.add("Hoop stress (thin-wall, mean radius)", thin.Hoop, units.DimStress, shownIn(thin.Hoop, "MPa", units.DimStress))
		for _, w := range thin.Warnings {
			if strings.Contains(w, "thin-wall") {
				r.res.Warn(w)
			}
		}
	} else {
		r.res.Warn("Thin-wall stress not shown: " + err.Error())
	}
	fam := c.familyOf()
	if fam != safety.FamilyASME {
		r.text("Code", fam.Label())
		r.res.Warn("No wall formula for this family here: " + fam.ShellReference())
		c.ok = true
		return
	}
	s, err := safety.ASMEShell(safety.ShellInput{Pressure: P, InnerRadius: value(c.ri), Wall: value(c.wall), Allowable: value(c.allow), JointEfficiency: value(c.eff), Corrosion: value(c.corr)})
	if err != nil {
		c.fail(err, byField)
		return
	}
	c.addCautions(s.Cautions...)
	r.text("Code", fam.Label()+", "+s.ClauseThickCircum)
	r.add("Minimum wall for this pressure", s.MinThickness, units.DimLength, shownIn(s.MinThickness, "mm", units.DimLength))
	r.add("MAWP of this wall (gauge)", float64(s.MAWP), units.DimPressure, gaugeText(s.MAWP))
	if s.WallEnough {
		r.text("Wall against the code formula", "thick enough")
	} else {
		r.text("Wall against the code formula", "TOO THIN")
	}
	r.res.Warn(s.Warnings...)
	c.mawp, c.design, c.mawpOK = s.MAWP, P, true
	c.ok = true
}

// Inputs implements inlineCalc.
func (c *wallCalc) Inputs() []layout.Widget {
	return []layout.Widget{c.press.Layout, c.ri.Layout, c.wall.Layout, c.allow.Layout, c.eff.Layout, c.corr.Layout, c.family.Layout}
}

// ---- relief set pressure ----

type reliefCalc struct {
	calcBase
	set, mawp *Field
}

func newReliefCalc(env *Env) *reliefCalc {
	c := &reliefCalc{calcBase: newCalcBase(env, "Relief devices", []string{safety.CautionGeneral, "A relief device must be sized for the worst flow it may have to pass (a failed-open regulator, a fire) and vent somewhere safe; its set pressure alone does not make it adequate."})}
	c.set = c.field("Relief set pressure", units.DimPressure, "30 barg", pressureHint)
	c.mawp = c.field("Vessel MAWP", units.DimPressure, "", "from the nameplate; until you type, the lower of the design pressure and the wall's code MAWP; "+pressureHint)
	c.calcBase.compute = c.compute
	return c
}

func (c *reliefCalc) compute() {
	if !c.begin() {
		return
	}
	rel, err := safety.CheckRelief(gaugeOf(c.set), gaugeOf(c.mawp))
	if err != nil {
		c.fail(err, map[string]*Field{"pressure": c.set, "mawp": c.mawp})
		return
	}
	c.addCautions(rel.Cautions...)
	c.rec.add("Set pressure (gauge)", float64(rel.Set), units.DimPressure, gaugeText(rel.Set))
	c.rec.add("MAWP (gauge)", float64(rel.MAWP), units.DimPressure, gaugeText(rel.MAWP))
	verdict := "at or below the MAWP"
	if !rel.OK {
		verdict = "ABOVE the MAWP"
	}
	c.rec.text("Set pressure is", verdict)
	c.rec.res.AddNote(rel.Message)
	c.ok = true
}

// Inputs implements inlineCalc.
func (c *reliefCalc) Inputs() []layout.Widget {
	return []layout.Widget{c.set.Layout, c.mawp.Layout}
}

// ---- test pressures and stored energy ----

type testCalc struct {
	calcBase
	mawp, ratio, volume *Field
	gas                 *GasPicker
}

func newTestCalc(env *Env) *testCalc {
	c := &testCalc{calcBase: newCalcBase(env, "Pressure tests and stored energy", []string{safety.CautionGeneral, safety.CautionTestPressure, safety.CautionStoredEnergy})}
	c.mawp = c.field("Vessel MAWP", units.DimPressure, "", "from the nameplate; until you type, the lower of the design pressure and the wall's code MAWP; "+pressureHint)
	c.ratio = c.field("Stress ratio, test to design temperature", units.DimNone, "1", "allowable stress at the test temperature / at the design temperature; 1 if unsure")
	c.volume = c.field("Gas volume of the rig", units.DimVolume, "5 L", "e.g. 5 L, 0.005 m³, 300 in³")
	c.gas = NewGasPicker(env, env.Bench.Gas)
	c.calcBase.compute = c.compute
	c.extras = append(c.extras, c.gas.Update)
	return c
}

func (c *testCalc) compute() {
	good := c.begin()
	c.addGas(c.gas)
	if !good {
		return
	}
	byField := map[string]*Field{"pressure": c.mawp, "mawp": c.mawp, "stress ratio": c.ratio, "volume": c.volume}
	mawp := gaugeOf(c.mawp)
	tp, err := safety.ReferenceTestPressures(mawp, value(c.ratio))
	if err != nil {
		c.fail(err, byField)
		return
	}
	mix, err := c.gas.Mixture()
	if err != nil {
		c.rec.res.Fail(err)
		return
	}
	const roomT = 293.15 // K; γ of the gases offered hardly depends on it
	atm := units.Pressure(units.StandardAtmosphere)
	c.addCautions(tp.Cautions...)
	r := c.rec
	r.add("Hydrostatic test, ASME UG-99(b)", float64(tp.ASMEHydrostatic), units.DimPressure, gaugeText(tp.ASMEHydrostatic))
	r.add("Pneumatic test, ASME UG-100(b)", float64(tp.ASMEPneumatic), units.DimPressure, gaugeText(tp.ASMEPneumatic))
	r.add("Test pressure, PED 2014/68/EU Annex I 7.4", float64(tp.EUHydrostatic), units.DimPressure, gaugeText(tp.EUHydrostatic))
	work, warns, err := safety.GasExpansionEnergy(mix, roomT, mawp.Absolute(0), atm, value(c.volume))
	if err != nil {
		c.fail(err, byField)
		return
	}
	c.addCautions(work.Cautions...)
	r.add("Stored energy at the MAWP (isentropic)", work.Isentropic, units.DimEnergy, energyText(work.Isentropic))
	r.add("Brode (isochoric) value", work.Brode, units.DimEnergy, energyText(work.Brode))
	r.add("TNT equivalent (4.184 MJ/kg)", work.TNTMass, units.DimMass, massText(work.TNTMass))
	r.text("Hazard tier", work.Tier.Label())
	r.res.AddNote(work.Tier.Advice())
	if pn, _, err := safety.GasExpansionEnergy(mix, roomT, tp.ASMEPneumatic.Absolute(0), atm, value(c.volume)); err == nil {
		r.add("Stored energy in a gas test at "+gaugeText(tp.ASMEPneumatic), pn.Isentropic, units.DimEnergy, energyText(pn.Isentropic))
		r.res.AddNote("A liquid-filled test stores only the liquid's small compression energy.")
	}
	r.res.Warn(warns...)
	r.res.Warn("Stored energy of " + mix.String() + " at 20 °C; the test pressures are reference values, the code and the inspector decide.")
	c.ok = true
}

// Inputs implements inlineCalc.
func (c *testCalc) Inputs() []layout.Widget {
	return []layout.Widget{c.mawp.Layout, c.ratio.Layout, c.volume.Layout, c.gas.Layout}
}

// ---- cylinder contents ----

type cylinderCalc struct {
	calcBase
	water, fill, temp *Field
	gas               *GasPicker
	release           float64 // m³ at 20 °C and 1 atm, when ok
}

func newCylinderCalc(env *Env) *cylinderCalc {
	c := &cylinderCalc{calcBase: newCalcBase(env, "Gas cylinders", []string{safety.CautionGeneral, safety.CautionCylinder, safety.CautionAsphyxiation})}
	c.water = c.field("Cylinder water capacity", units.DimVolume, "50 L", "the internal volume stamped on the cylinder, e.g. 50 L")
	c.fill = c.field("Fill pressure", units.DimPressure, "200 bar", "as on the label or gauge; "+pressureHint)
	c.temp = c.field("Cylinder temperature", units.DimTemperature, "15 degC", "e.g. 15 degC, 288 K")
	c.gas = NewGasPicker(env, env.Bench.Gas)
	c.calcBase.compute = c.compute
	c.extras = append(c.extras, c.gas.Update)
	return c
}

func (c *cylinderCalc) compute() {
	c.release = 0
	good := c.begin()
	c.addGas(c.gas)
	if !good {
		return
	}
	byField := map[string]*Field{"water": c.water, "pressure": c.fill, "temperature": c.temp}
	mix, err := c.gas.Mixture()
	if err != nil {
		c.rec.res.Fail(err)
		return
	}
	p, T := units.Pressure(value(c.fill)), units.Temperature(value(c.temp))
	ct, err := safety.CylinderContents(mix, value(c.water), p, T, safety.StandardISO13443)
	if err != nil {
		c.fail(err, byField)
		return
	}
	rel, err := safety.ReleaseVolume(value(c.water), p, T, ct.Z, units.StandardAtmosphere, 293.15)
	if err != nil {
		c.fail(err, byField)
		return
	}
	c.addCautions(ct.Cautions...)
	r := c.rec
	r.add("Contents, ideal gas", ct.Ideal, units.DimVolume, shownIn(ct.Ideal, "m3", units.DimVolume))
	r.add("Contents, with the real-gas correction", ct.NonIdeal, units.DimVolume, shownIn(ct.NonIdeal, "m3", units.DimVolume))
	r.res.AddNote("free gas at " + ct.Standard.Name)
	r.add("Compressibility Z", ct.Z, units.DimNone, fmt.Sprintf("%.3f", ct.Z))
	r.add("Released into a room at 20 °C", rel, units.DimVolume, shownIn(rel, "m3", units.DimVolume))
	r.res.AddNote("used by the room-oxygen item")
	r.res.Warn(ct.Warnings...)
	c.release = rel
	c.ok = true
}

// Inputs implements inlineCalc.
func (c *cylinderCalc) Inputs() []layout.Widget {
	return []layout.Widget{c.water.Layout, c.fill.Layout, c.temp.Layout, c.gas.Layout}
}

// ---- room oxygen ----

type oxygenCalc struct {
	calcBase
	room, release, vent *Field
	// gas is the released gas: the oxygen figures hold for any oxygen-free
	// gas, but hydrogen and carbon dioxide bring cautions of their own.
	gas          *GasPicker
	releaseTyped bool // the user typed the release: do not fill it from the cylinder item
	gasPicked    bool // the user picked the gas: do not take it from the cylinder item
}

func newOxygenCalc(env *Env) *oxygenCalc {
	c := &oxygenCalc{calcBase: newCalcBase(env, "Oxygen-deficient air", []string{safety.CautionGeneral, safety.CautionAsphyxiation})}
	c.room = c.field("Room volume", units.DimVolume, "30 m3", "free air volume of the room, e.g. 30 m³, 1000 ft³")
	c.release = c.field("Gas released", units.DimVolume, "9 m3", "at room conditions: the cylinder's release plus the rig's; e.g. 9 m³")
	c.vent = c.field("Ventilation", units.DimRate, "0 /h", "fresh-air changes per hour, e.g. 2 /h; 0 when unknown")
	c.gas = NewGasPicker(env, env.Bench.Gas)
	c.gas.gas.Label = "Which gas is released"
	c.calcBase.compute = c.compute
	c.extras = append(c.extras, func(gtx layout.Context) bool {
		if c.gas.Update(gtx) {
			c.gasPicked = true
			return true
		}
		return false
	})
	c.onChange = func(f *Field) {
		if f == c.release {
			c.releaseTyped = true
		}
	}
	return c
}

func (c *oxygenCalc) compute() {
	good := c.begin()
	c.addGas(c.gas)
	if !good {
		return
	}
	byField := map[string]*Field{"room": c.room, "release": c.release, "ventilation": c.vent}
	r := c.rec
	shown := false
	for _, m := range safety.RoomModels {
		o, err := safety.RoomOxygen(m, value(c.release), value(c.room), value(c.vent))
		if err != nil {
			var re *units.RangeError
			if errors.As(err, &re) && re.Field == "release volume" && m == safety.Displacement {
				r.text("Oxygen, "+m.Label(), "—")
				r.res.AddNote("the release is larger than the room: " + err.Error())
				continue
			}
			c.fail(err, byField)
			return
		}
		shown = true
		c.addCautions(o.Cautions...)
		r.res.Warn(o.Warnings...)
		verdict := "above 19.5 %"
		if o.Deficient {
			verdict = "BELOW 19.5 %"
		}
		r.add("Oxygen, "+m.Label(), o.Fraction, units.DimNone, percentText(o.Fraction))
		note := verdict + "; largest release keeping 19.5 %: " + shownIn(o.MaxRelease, "m3", units.DimVolume)
		if o.Deficient && o.Ventilated {
			note += "; back to 19.5 % after about " + durationText(o.RecoveryTime)
		}
		r.res.AddNote(note)
	}
	if !shown {
		return
	}
	if value(c.vent) == 0 {
		r.res.Warn("No ventilation given: the oxygen stays low until the room is ventilated.")
	}
	r.res.Warn("19.5 % is the oxygen-deficient threshold of US OSHA 29 CFR 1910.134.")
	c.ok = true
}

// setRelease fills the release field from another item (code, not user).
func (c *oxygenCalc) setRelease(v float64) {
	c.release.SetText(shownIn(v, "m3", units.DimVolume))
	c.dirty = true
}

// setGas sets the released gas from another item (code, not user) unless
// the user picked one here.
func (c *oxygenCalc) setGas(text string) {
	if c.gasPicked || text == "" || text == c.gas.Text() {
		return
	}
	if c.gas.SetText(text) == nil {
		c.dirty = true
	}
}

// Inputs implements inlineCalc.
func (c *oxygenCalc) Inputs() []layout.Widget {
	return []layout.Widget{c.room.Layout, c.release.Layout, c.vent.Layout, c.gas.Layout}
}

// ---- sound level ----

type soundCalc struct {
	calcBase
	amp, ear *Field
}

func newSoundCalc(env *Env) *soundCalc {
	c := &soundCalc{calcBase: newCalcBase(env, "Hearing", []string{safety.CautionGeneral, safety.CautionHearing})}
	c.amp = c.field("Pressure amplitude in the resonator", units.DimPressure, "5 kPa", "peak amplitude of the oscillation, e.g. 5 kPa, 0.05 bar")
	c.ear = c.field("Level measured where people stand", units.DimSoundLevel, "85 dBA", "A-weighted, from a sound level meter, e.g. 85 dBA")
	c.calcBase.compute = c.compute
	return c
}

func (c *soundCalc) compute() {
	if !c.begin() {
		return
	}
	if q, _ := c.amp.Quantity(); q.Gauge {
		err := errors.New("an amplitude is neither gauge nor absolute: give it in Pa, kPa or bar")
		c.amp.SetError(err)
		c.rec.res.Fail(err)
		return
	}
	s, err := safety.Level(value(c.amp))
	if err != nil {
		c.fail(err, map[string]*Field{"amplitude": c.amp})
		return
	}
	c.addCautions(s.Cautions...)
	r := c.rec
	r.add("Sound pressure level in the resonator (rms)", s.SPL, units.DimSoundLevel, dBText(s.SPL))
	r.add("Peak level in the resonator", s.Peak, units.DimSoundLevel, dBText(s.Peak))
	n, top := 0, -1
	for i, l := range s.Limits {
		if l.Over {
			n++
			if top < 0 || l.Level > s.Limits[top].Level {
				top = i
			}
		}
	}
	reached := fmt.Sprintf("%d of %d", n, len(s.Limits))
	note := "none of the EU 2003/10/EC and OSHA 1910.95 limits"
	if n == len(s.Limits) {
		reached = fmt.Sprintf("all %d", n)
	}
	if top >= 0 {
		l := s.Limits[top]
		note = "the highest: " + l.Name + ", " + strconv.FormatFloat(l.Level, 'g', -1, 64) + " for " + l.Metric
	}
	r.text("Occupational limits this level reaches", reached)
	r.res.AddNote(note + "; a level inside the vessel is not exposure")
	osha, eu := safety.PermittedHours(value(c.ear))
	r.add("At the measured level: OSHA permitted time per day", osha*3600, units.DimTime, durationText(osha*3600))
	r.add("At the measured level: time to the EU limit of 87 dB(A)", eu*3600, units.DimTime, durationText(eu*3600))
	r.res.Warn("The EU upper action value, 85 dB(A), already requires hearing protection to be worn.")
	c.ok = true
}

// Inputs implements inlineCalc.
func (c *soundCalc) Inputs() []layout.Widget {
	return []layout.Widget{c.amp.Layout, c.ear.Layout}
}
