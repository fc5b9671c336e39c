package ui

import (
	"image"
	"testing"

	"tubewright/calc/sheet"
)

// The safety calculators (vessel, energy, oxygen, spl) have no screen of
// their own: they are steps of the Safety pass. Their cases run through
// the pass (each input typed on the step that shows it) and through twcalc
// --json, and must agree as every other calculator does.
var safetyAgreeCases = []agreeCase{
	// The vessel of issue 9: the same relief verdict and test pressures
	// on both sides.
	{id: sheet.IDVessel, name: "issue 9 vessel", texts: map[string]string{"pressure": "30 bar", "inside-diameter": "100 mm",
		"wall-thickness": "3 mm", "allowable-stress": "138 MPa", "relief-set": "30 barg"}},
	{id: sheet.IDVessel, name: "nameplate, relief above it, ±", texts: map[string]string{"pressure": "30 barg ± 1 bar", "inner-radius": "50 mm +- 0.1 mm",
		"wall-thickness": "6 mm", "allowable-stress": "138 MPa", "joint-efficiency": "0.85", "mawp": "25 barg", "relief-set": "28 barg", "stress-ratio": "1.2"}},
	{id: sheet.IDVessel, name: "eu family", texts: map[string]string{"pressure": "30 barg", "inside-diameter": "100 mm",
		"wall-thickness": "6 mm", "allowable-stress": "138 MPa", "code-family": "eu", "mawp": "30 barg"}},
	{id: sheet.IDVessel, name: "joint efficiency over 1", texts: map[string]string{"pressure": "30 barg", "inner-radius": "50 mm",
		"wall-thickness": "6 mm", "allowable-stress": "138 MPa", "joint-efficiency": "1.2"}, errKey: "joint-efficiency"},
	{id: sheet.IDVessel, name: "outside diameter agreeing, ±", texts: map[string]string{"pressure": "30 barg", "inside-diameter": "100 mm ± 0.2 mm",
		"outside-diameter": "112 mm", "wall-thickness": "6 mm +- 0.2 mm", "allowable-stress": "138 MPa"}},
	{id: sheet.IDVessel, name: "outside diameter disagreeing", texts: map[string]string{"pressure": "30 barg", "inner-radius": "50 mm",
		"outside-diameter": "120 mm", "wall-thickness": "6 mm", "allowable-stress": "138 MPa"}, errKey: "outside-diameter"},
	{id: sheet.IDVessel, name: "relief below the atmosphere", texts: map[string]string{"pressure": "30 barg", "inner-radius": "50 mm",
		"wall-thickness": "6 mm", "allowable-stress": "138 MPa", "relief-set": "0.5 bara"}, errKey: "relief-set"},

	{id: sheet.IDEnergy, name: "helium 30 barg", texts: map[string]string{"gas": "helium", "pressure": "30 barg", "volume": "50 L"}},
	{id: sheet.IDEnergy, name: "argon with ± and a gas test", texts: map[string]string{"gas": "argon", "pressure": "10 bar ± 0.5 bar",
		"volume": "2 L +- 0.1 L", "test-pressure": "12 barg"}},
	{id: sheet.IDEnergy, name: "not above the atmosphere", texts: map[string]string{"gas": "helium", "pressure": "1 atm", "volume": "5 L"}, errKey: "pressure"},

	{id: sheet.IDOxygen, name: "release, mixed, ventilated", texts: map[string]string{"room": "30 m3", "release": "9 m3", "model": "mixed", "ventilation": "2/h"}},
	{id: sheet.IDOxygen, name: "room and release with ±", texts: map[string]string{"room": "30 m3 ± 2 m3", "release": "3 m3 +- 0.5 m3"}},
	{id: sheet.IDOxygen, name: "cylinder and vessel", texts: map[string]string{"room": "30 m3", "release-from-cylinder": "50 L", "fill-pressure": "200 bar",
		"release-from-vessel": "50 L", "vessel-pressure": "30 barg", "gas": "helium"}},
	{id: sheet.IDOxygen, name: "release larger than the room", texts: map[string]string{"room": "30 m3", "release": "40 m3"}, errKey: "release"},

	{id: sheet.IDSPL, name: "10 kPa", texts: map[string]string{"amplitude": "10 kPa"}},
	{id: sheet.IDSPL, name: "± and a level at the ear", texts: map[string]string{"amplitude": "2 kPa ± 0.1 kPa", "at-ear": "92 dBA"}},
	{id: sheet.IDSPL, name: "above 115 dBA", texts: map[string]string{"amplitude": "1 kPa", "at-ear": "120 dBA"}},
	{id: sheet.IDSPL, name: "gauge amplitude", texts: map[string]string{"amplitude": "1 barg"}, errKey: "amplitude"},
}

// runSafetyApp opens the Safety pass in a fresh app and types the case's
// texts into the steps that show them, through the input router; it
// returns the calculator's form.
func runSafetyApp(t *testing.T, s *sheet.Sheet, c agreeCase) *Form {
	t.Helper()
	a := NewApp(nil)
	scr := a.Screen(sheet.IDSafety).(*safetyScreen)
	f := scr.forms.byID(s.ID)
	if f == nil {
		t.Fatalf("the Safety pass has no form for %s", s.ID)
	}
	h := newHarness(t, image.Pt(1000, 9000), scr.Layout)
	for _, in := range s.Inputs {
		text, ok := c.texts[in.Key]
		if !ok {
			continue
		}
		step := scr.stepShowing(f, in.Key)
		if step < 0 {
			t.Fatalf("%s: no step of the Safety pass shows input %s", s.ID, in.Key)
		}
		scr.goTo(step)
		h.frames(2)
		// a size typed as its half (the shell's inner radius) is a chip
		// away from the whole shown first
		for _, p := range scr.calcs[step].(*sheetStep).parts {
			if p.pair != nil && p.pair.half == in.Key && !p.pair.halfShown() {
				h.tap("Radius")
				h.frames(2)
			}
		}
		typeInput(h, f, &in, text)
		h.frames(2)
	}
	h.frames(2)
	return f
}

// TestSafetyPassAgreesWithTerminal runs the safety calculators' cases
// through the Safety pass and twcalc, and asserts identical values, ±,
// warnings, cautions, verdicts and the input named by an error.
func TestSafetyPassAgreesWithTerminal(t *testing.T) {
	if testing.Short() {
		t.Skip("builds twcalc; skipped with -short")
	}
	covered := map[sheet.ID]int{}
	for _, c := range safetyAgreeCases {
		s, ok := sheet.Lookup(c.id)
		if !ok {
			t.Fatalf("no calculator %s", c.id)
		}
		covered[c.id]++
		t.Run(string(c.id)+"/"+c.name, func(t *testing.T) {
			term, stderr := runTerminal(t, s, c)
			checkAgreement(t, runSafetyApp(t, s, c), c.errKey, term, stderr)
		})
	}
	for _, id := range []sheet.ID{sheet.IDVessel, sheet.IDEnergy, sheet.IDOxygen, sheet.IDSPL} {
		if covered[id] < 3 {
			t.Errorf("calculator %s has %d agreement cases; want at least 3", id, covered[id])
		}
	}
}
