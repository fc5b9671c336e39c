package ui

import (
	"image"
	"testing"

	"tubewright/calc/sheet"
)

// TestScreenshotCarry pictures the tube-to-depths-to-pores chain at phone
// size in both themes: the frequency carried from Tube resonance with its
// line and Undo under the field, and the operating point on the results
// (SHOT_DIR/carry-<screen>-<theme>.png; the pores screen whole, as
// carry-pores-<theme>-tall.png).
func TestScreenshotCarry(t *testing.T) {
	for _, dark := range []bool{false, true} {
		theme := "bright"
		if dark {
			theme = "dark"
		}
		t.Run(theme, func(t *testing.T) {
			a := NewApp(nil)
			a.env.SetDark(dark)
			a.Open(sheet.IDResonance)
			res := a.Screen(sheet.IDResonance).(formScreen).Form()
			res.SetText("gas", "helium")
			res.SetText("length", "250 mm")
			h := newHarness(t, image.Pt(412, 915), a.Layout)
			h.frames(2)
			shootApp(t, "carry-resonance-"+theme, image.Pt(412, 915), a)
			a.Open(sheet.IDDepths)
			h.frames(2)
			shootApp(t, "carry-depths-"+theme, image.Pt(412, 915), a)
			a.Open(sheet.IDPores)
			h.frames(2)
			shootApp(t, "carry-pores-"+theme+"-tall", image.Pt(412, 2600), a)
		})
	}
}

// TestScreenshotCarryEngine pictures an engine's operating point on Engine
// onset and its size, fill and hot end arriving on the safety pass's wall
// step (SHOT_DIR/carry-onset.png, carry-safety-wall.png).
func TestScreenshotCarryEngine(t *testing.T) {
	a := NewApp(nil)
	a.Open(sheet.IDOnset)
	h := newHarness(t, image.Pt(412, 915), a.Layout)
	h.frames(2)
	shootApp(t, "carry-onset", image.Pt(412, 915), a)
	a.Open(sheet.IDSafety)
	sc := a.Screen(sheet.IDSafety).(*safetyScreen)
	sc.goTo(sc.stepShowing(sc.forms.vessel, "inside-diameter"))
	h.frames(2)
	shootApp(t, "carry-safety-wall", image.Pt(412, 1800), a)
}
