package ui

import (
	"image"
	"math"
	"strings"
	"testing"
	"time"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/ui/store"
)

// The carry-over between screens, driven through the App as a person
// would: type on one screen, open the next, find the value there with a
// line saying where it came from, and Undo it. The physics of each screen
// is checked in its own tests; these check that nothing arrives silently,
// that the text arrives as it was typed, and that Undo gives back the
// earlier text exactly.

// carryApp is an app driven through the input router, one phone-wide
// column tall enough that every widget is laid out.
func carryApp(t *testing.T) (*App, *harness) {
	t.Helper()
	a := NewApp(nil)
	return a, newHarness(t, image.Pt(412, 7000), a.Layout)
}

// openScreen opens id on top of the current screen and lets it settle.
func openScreen(a *App, h *harness, id sheet.ID) *Form {
	a.Open(id)
	h.frames(3)
	if s, ok := a.Screen(id).(formScreen); ok {
		return s.Form()
	}
	return nil
}

// wantCarried asserts that input key (labelled label) of f reads text and
// is marked on screen as carried from the screen titled from.
func wantCarried(t *testing.T, h *harness, f *Form, key, label, text, from string) {
	t.Helper()
	if got := f.Text(key); got != text {
		t.Errorf("%s: %s reads %q, want %q", f.Sheet.ID, key, got, text)
	}
	if got, _ := f.Carried(key); got != from {
		t.Errorf("%s: %s carried from %q, want %q", f.Sheet.ID, key, got, from)
	}
	if got, ok := h.shown(label + " carried"); !ok || (got != "from "+from && !strings.HasPrefix(got, "from "+from+": ")) {
		t.Errorf("%s: the line under %s reads %q (shown %v), want %q", f.Sheet.ID, label, got, ok, "from "+from)
	}
}

// undo taps the Undo under the field labelled label and asserts that
// input key reads want again, with no mark left.
func undo(t *testing.T, h *harness, f *Form, key, label, want string) {
	t.Helper()
	r := h.mustDesc(label + " undo").Desc.Bounds
	if r.Dx() < 48 || r.Dy() < 48 { // the harness draws 1 px per dp
		t.Errorf("%s: Undo under %s is %v dp, under 48 × 48", f.Sheet.ID, label, r.Size())
	}
	h.click(r)
	h.frames(2)
	if got := f.Text(key); got != want {
		t.Errorf("%s: after Undo %s reads %q, want %q", f.Sheet.ID, key, got, want)
	}
	if _, ok := h.shown(label + " carried"); ok {
		t.Errorf("%s: %s is still marked carried after Undo", f.Sheet.ID, label)
	}
	if from, _ := f.Carried(key); from != "" {
		t.Errorf("%s: %s still says it came from %q", f.Sheet.ID, key, from)
	}
}

// wantPoint asserts that the operating-point line on screen holds every
// part of want.
func wantPoint(t *testing.T, h *harness, id sheet.ID, want ...string) {
	t.Helper()
	got, ok := h.shown("Operating point")
	if !ok {
		t.Errorf("%s: no operating point on screen", id)
		return
	}
	for _, w := range want {
		if !strings.Contains(got, w) {
			t.Errorf("%s: operating point %q does not say %q", id, got, w)
		}
	}
	if writtenWithExponent(got) {
		t.Errorf("%s: operating point %q shows an exponent", id, got)
	}
}

// TestCarryGasToResonance: the gas, temperature and pressure used on
// Working gas arrive on Tube resonance in the words typed ("35 degC",
// not "308.1 K"), each marked, the headline names the gas and where it
// came from, and Undo restores the resonance screen's own texts.
func TestCarryGasToResonance(t *testing.T) {
	a, h := carryApp(t)
	openScreen(a, h, sheet.IDGas)
	h.tap("Argon")
	h.retype("Temperature", "300 K", "35 degC")
	h.retype("Mean pressure", "1 atm", "10 bar")

	f := openScreen(a, h, sheet.IDResonance)
	wantCarried(t, h, f, "gas", "Working gas", "argon", "Working gas")
	wantCarried(t, h, f, "temperature", "Mean gas temperature", "35 degC", "Working gas")
	wantCarried(t, h, f, "pressure", "Mean pressure", "10 bar", "Working gas")
	wantPoint(t, h, sheet.IDResonance, "argon", "10 bar", "35 degC", "gas, pressure and temperature from Working gas")

	undo(t, h, f, "temperature", "Mean gas temperature", "20 degC")
	undo(t, h, f, "pressure", "Mean pressure", "1 atm")
	undo(t, h, f, "gas", "Working gas", "air")
	wantPoint(t, h, sheet.IDResonance, "air", "1 atm", "20 degC", "all set here")
}

// TestCarryResonanceDepthsPores is the chain of the issue: the tube's
// frequency goes to Penetration depths and on to Pores and packing with
// no retyping, each screen saying it came from Tube resonance, and the
// pores' verdict names the operating point it assumed.
func TestCarryResonanceDepthsPores(t *testing.T) {
	a, h := carryApp(t)
	res := openScreen(a, h, sheet.IDResonance)
	h.tap("Argon")
	h.retype("Tube length", "500 mm", "250 mm")
	row, ok := res.Result().Row("frequency")
	if !ok {
		t.Fatal("no resonance frequency")
	}
	hz := units.Format(row.Value, units.DimFrequency)

	depths := openScreen(a, h, sheet.IDDepths)
	wantCarried(t, h, depths, "frequency", "Frequency", hz, "Tube resonance")
	wantCarried(t, h, depths, "gas", "Working gas", "argon", "Tube resonance")
	wantCarried(t, h, depths, "temperature", "Mean temperature", "20 degC", "Tube resonance")
	wantPoint(t, h, sheet.IDDepths, "argon", "1 atm", "20 degC", hz, "frequency from Tube resonance")
	if f, _ := depths.Field("frequency").Value(); math.Abs(f-row.Value) > 1e-3*row.Value {
		t.Errorf("depths at %v Hz, resonance at %v Hz", f, row.Value)
	}

	pores := openScreen(a, h, sheet.IDPores)
	wantCarried(t, h, pores, "frequency", "Frequency", hz, "Tube resonance")
	wantCarried(t, h, pores, "temperature", "Mean temperature", "20 degC", "Tube resonance")
	wantPoint(t, h, sheet.IDPores, hz, "frequency from Tube resonance")
	if pores.Result() == nil {
		t.Fatalf("pores gave no result: %v", pores.Err())
	}
	undo(t, h, pores, "frequency", "Frequency", "100 Hz")

	// a frequency typed on the pores is theirs: Stack placement takes it
	// from there, and the temperature still from Tube resonance
	h.retype("Frequency", "100 Hz", "150 Hz")
	place := openScreen(a, h, sheet.IDPlacement)
	wantCarried(t, h, place, "frequency", "Frequency", "150 Hz", "Pores and packing")
	wantCarried(t, h, place, "temperature", "Mean temperature", "20 degC", "Tube resonance")
}

// TestCarryDepthsToPores: 400 Hz typed on Penetration depths is the
// frequency Pores and packing opens at, even when the pores' kept inputs
// (at 250 Hz) arrive from the storage after the screen opened; Undo then
// gives the kept 250 Hz back.
func TestCarryDepthsToPores(t *testing.T) {
	mem := store.NewMemory()
	seed := on(mem)
	seed.WaitLoaded(5 * time.Second)
	d, _ := sheet.Lookup(sheet.IDPores)
	kept := map[string]string{}
	for _, in := range d.Inputs {
		kept[in.Key] = in.Default
		if kept[in.Key] == "" {
			kept[in.Key] = in.Example
		}
	}
	kept["frequency"] = "250 Hz"
	seed.Remember(sheet.IDPores, kept)
	seed.Flush()

	g := &gate{release: make(chan struct{}), b: mem}
	k := NewKeeper(g.open)
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	h := newHarness(t, image.Pt(412, 7000), a.Layout)
	openScreen(a, h, sheet.IDDepths)
	h.retype("Frequency", "100 Hz", "400 Hz")
	pores := openScreen(a, h, sheet.IDPores)
	wantCarried(t, h, pores, "frequency", "Frequency", "400 Hz", "Penetration depths")

	close(g.release)
	k.WaitLoaded(5 * time.Second)
	h.frames(3)
	wantCarried(t, h, pores, "frequency", "Frequency", "400 Hz", "Penetration depths")
	wantPoint(t, h, sheet.IDPores, "400 Hz", "frequency from Penetration depths")
	undo(t, h, pores, "frequency", "Frequency", "250 Hz")
}

// TestCarryTubeToDiagnose: the tube of Tube resonance (length, diameter and
// ends) is the tube What the pitch says starts from; a computed frequency
// is not taken as the measurement. With the length solved for, the
// length found is carried.
func TestCarryTubeToDiagnose(t *testing.T) {
	a, h := carryApp(t)
	openScreen(a, h, sheet.IDResonance)
	h.retype("Tube length", "500 mm", "300 mm")
	h.retype("Inside diameter", "24 mm", "20 mm")
	h.tap("Closed – closed (half-wave)")

	diag := openScreen(a, h, sheet.IDDiagnose)
	wantCarried(t, h, diag, "length", "Tube length", "300 mm", "Tube resonance")
	wantCarried(t, h, diag, "diameter", "Inside diameter", "20 mm", "Tube resonance")
	wantCarried(t, h, diag, "ends", "Ends", "closed-closed", "Tube resonance")
	if got := diag.Text("measured-frequency"); got != "140 Hz ± 2 Hz" {
		t.Errorf("the measurement reads %q: a computed frequency was taken as measured", got)
	}
	undo(t, h, diag, "length", "Tube length", "600 mm")
	undo(t, h, diag, "ends", "Ends", "closed-open")

	// the tube goes both ways: after Undo, What the pitch says used its
	// own 600 mm last, and Tube resonance takes it, marked
	a.Back()
	h.frames(2)
	res := a.Screen(sheet.IDResonance).(formScreen).Form()
	wantCarried(t, h, res, "length", "Tube length", "600 mm", "What the pitch says")

	// length solved from a target frequency
	h.tap("Length from frequency")
	h.retype("Target frequency", res.Text("frequency"), "300 Hz")
	row, ok := res.Result().Row("length")
	if !ok {
		t.Fatalf("no length solved: %v", res.Err())
	}
	diag = openScreen(a, h, sheet.IDDiagnose)
	if v, ok := diag.Field("length").Value(); !ok || math.Abs(v-row.Value) > 1e-3*row.Value {
		t.Errorf("diagnose length %v m (%q), resonance solved %v m", v, diag.Text("length"), row.Value)
	}
	if from, _ := diag.Carried("length"); from != "Tube resonance" {
		t.Errorf("solved length carried from %q", from)
	}

	// a length typed on What the pitch says is not pushed into the length
	// Tube resonance hides while it solves for one: the 600 mm it had
	// comes back when the length is shown again
	h.retype("Tube length", diag.Text("length"), "610 mm")
	if diag.Result() == nil {
		t.Fatalf("no diagnosis at 610 mm: %v", diag.Err())
	}
	a.Back()
	h.frames(2)
	if from, _ := res.Carried("length"); from != "" {
		t.Errorf("the hidden length took a value from %q", from)
	}
	h.tap("Frequency from length")
	h.frames(2)
	if got := res.Text("length"); got != "600 mm" {
		t.Errorf("the length shown again reads %q, want the 600 mm it had", got)
	}
}

// TestCarryOnsetToDepthsAndSafety: an engine's gas, fill pressure and
// onset frequency go to Penetration depths; its widest radius, fill, gas
// volume and hot end go to the safety pass, each marked.
func TestCarryOnsetToDepthsAndSafety(t *testing.T) {
	a, h := carryApp(t)
	onset := openScreen(a, h, sheet.IDOnset)
	if onset.Result() == nil {
		t.Fatalf("no onset result: %v", onset.Err())
	}
	wantPoint(t, h, sheet.IDOnset, "8 bar", "295 K ambient", "as set under Operating conditions")
	row, _ := onset.Result().Row("frequency")
	hot, _ := onset.Result().Row("hot_temperature")
	hz := units.Format(row.Value, units.DimFrequency)

	depths := openScreen(a, h, sheet.IDDepths)
	wantCarried(t, h, depths, "gas", "Working gas", "helium:0.7,argon:0.3", "Engine onset")
	wantCarried(t, h, depths, "pressure", "Mean pressure", "8 bar", "Engine onset")
	wantCarried(t, h, depths, "frequency", "Frequency", hz, "Engine onset")
	undo(t, h, depths, "pressure", "Mean pressure", "1 atm")

	a.Open(sheet.IDSafety)
	sc := a.Screen(sheet.IDSafety).(*safetyScreen)
	sc.goTo(sc.stepShowing(sc.forms.vessel, "inside-diameter"))
	h.frames(3)
	v := sc.forms.vessel
	// the example engine is 60 mm across (calc/linear/examples/engine.json):
	// its widest duct arrives as the shell's inside diameter, the field
	// shown first, and the radius stays empty
	wantCarried(t, h, v, "inside-diameter", "Inside diameter", "60 mm", "Engine onset")
	if r := v.Text("inner-radius"); r != "" {
		t.Errorf("inner radius %q beside the carried inside diameter", r)
	}
	if both, _ := h.shown("Both sizes of Inside diameter"); !strings.Contains(both, "60 mm") || !strings.Contains(both, "radius 30 mm") {
		t.Errorf("under the shell's inside diameter %q, want both 60 mm and its radius 30 mm", both)
	}
	// the radius is a tap away and converts the text; the diameter comes back
	h.tap("Radius")
	if r, d := v.Text("inner-radius"), v.Text("inside-diameter"); r != "30 mm" || d != "" {
		t.Errorf("after the Radius chip: inner radius %q, inside diameter %q; want 30 mm and none", r, d)
	}
	h.tap("Diameter")
	if r, d := v.Text("inner-radius"), v.Text("inside-diameter"); r != "" || d != "60 mm" {
		t.Errorf("after the Diameter chip: inner radius %q, inside diameter %q; want none and 60 mm", r, d)
	}
	if p, ok := v.Field("pressure").Value(); !ok || math.Abs(p-8e5) > 1e-3*8e5 {
		t.Errorf("design pressure %q reads %v Pa absolute, want the 8 bar fill", v.Text("pressure"), p)
	}
	if from, _ := v.Carried("pressure"); from != "Engine onset" {
		t.Errorf("design pressure carried from %q", from)
	}
	note, ok := h.shown("Allowable stress at the hot-end temperature carried")
	if want := writtenIn(hot.Value, units.DimTemperature)[0]; !ok || !strings.Contains(note, want) {
		t.Errorf("hot end note %q (shown %v), want it to name %s", note, ok, want)
	}
	undo(t, h, v, "inside-diameter", "Inside diameter", "100 mm")

	// gas volume: 2.815 L, worked in calc/linear's TestDeviceGasVolume
	for _, c := range []struct {
		f   *Form
		key string
	}{{sc.forms.energy, "volume"}, {sc.forms.oxygen, "release-from-vessel"}} {
		if got := c.f.Text(c.key); got != "2.815 L" {
			t.Errorf("%s %s reads %q, want the engine's 2.815 L", c.f.Sheet.ID, c.key, got)
		}
		if from, _ := c.f.Carried(c.key); from != "Engine onset" {
			t.Errorf("%s %s carried from %q", c.f.Sheet.ID, c.key, from)
		}
	}
	if got := sc.forms.energy.Text("gas"); got != "helium:0.7,argon:0.3" {
		t.Errorf("stored energy of %q, want the engine's gas", got)
	}
}

// TestCarryHeatPumpToPores: a heat pump's drive frequency is the one Pores
// and packing opens at.
func TestCarryHeatPumpToPores(t *testing.T) {
	a, h := carryApp(t)
	hp := openScreen(a, h, sheet.IDHeatPump)
	row, ok := hp.Result().Row("frequency")
	if !ok {
		t.Fatalf("no heat-pump result: %v", hp.Err())
	}
	wantPoint(t, h, sheet.IDHeatPump, "as set under Operating conditions", "frequency the driver's")
	pores := openScreen(a, h, sheet.IDPores)
	wantCarried(t, h, pores, "frequency", "Frequency", units.Format(row.Value, units.DimFrequency), "Heat pump span")
}

// TestCarryTextRules: a carried text is kept when the field reads it as
// the same value, written anew when it does not (a gauge field, no ±).
func TestCarryTextRules(t *testing.T) {
	tempIn := sheet.TemperatureInput("t", "T", "", "300 K")
	gauge := sheet.SafetyPressureInput("p", "P", "", "30 barg", "")
	noPM := tempIn
	noPM.PM = false
	for _, c := range []struct {
		name string
		in   *sheet.Input
		c    Carried
		want string
	}{
		{"kept as typed", &tempIn, Carried{Text: "20 degC", SI: 293.15}, "20 degC"},
		{"± kept", &tempIn, Carried{Text: "20 degC ± 2 K", SI: 293.15, PM: 2}, "20 degC ± 2 K"},
		{"± dropped where none is taken", &noPM, Carried{Text: "20 degC ± 2 K", SI: 293.15, PM: 2}, "20 degC"},
		{"computed, written in K", &tempIn, Carried{SI: 612.34}, "612.3 K"},
		// 1 bar = 1e5 Pa; 1 atm = 101325 Pa (SI Brochure, 9th ed., Table 8)
		{"absolute into a gauge field", &gauge, Carried{Text: "8 bar", SI: 8e5}, "6.987 barg"},
	} {
		if got := carryText(c.in, c.c); got != c.want {
			t.Errorf("%s: %q, want %q", c.name, got, c.want)
		}
	}
}
