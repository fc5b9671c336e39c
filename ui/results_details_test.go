package ui

import (
	"image"
	"strings"
	"testing"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// TestResultsDetailsClosed: a solve's diagnostics are not among the
// result rows; they sit in a Details section that is closed until tapped,
// and its toggle is at least 48 dp high.
func TestResultsDetailsClosed(t *testing.T) {
	res := &sheet.Result{}
	res.Add("frequency", "Frequency", 262.2, units.DimFrequency)
	res.Detail("iterations", "Newton iterations", 5, "5")
	r := NewResults(NewEnv(nil))
	r.Show(res)
	if _, ok := r.Value("Newton iterations"); ok || r.Len() != 1 {
		t.Errorf("a diagnostic is among the %d result rows:\n%s", r.Len(), r.String())
	}
	if got, ok := r.Detail("Newton iterations"); !ok || got != "5" {
		t.Errorf("detail Newton iterations = %q (%v), want 5", got, ok)
	}
	h := newHarness(t, image.Pt(412, 800), r.Layout)
	if strings.Contains(h.dump(), "Newton iterations") || r.DetailsOpen() {
		t.Fatalf("details drawn before they were opened:\n%s", h.dump())
	}
	toggle, ok := h.control("Show details of the solve")
	if !ok {
		t.Fatalf("no Details toggle:\n%s", h.dump())
	}
	if toggle.Dy() < 48 || toggle.Dx() < 300 { // the harness draws 1 px per dp
		t.Errorf("Details toggle is %v, want a full-width row at least 48 high", toggle)
	}
	h.tap("Show details of the solve")
	h.frames(2)
	if !r.DetailsOpen() {
		t.Fatal("tapping the toggle did not open the details")
	}
	if got, ok := h.shown("Newton iterations"); !ok || got != "5" {
		t.Errorf("opened details show %q (%v), want 5:\n%s", got, ok, h.dump())
	}
	r.Reset()
	if _, ok := r.Detail("Newton iterations"); ok {
		t.Error("Reset kept the details")
	}
}

// TestResultsDetailsShot pictures the onset screen with its Details
// section opened, at phone, tablet and desktop sizes (SHOT_DIR/
// onset-details-<size>.png), and checks each picture.
func TestResultsDetailsShot(t *testing.T) {
	for _, sz := range shotSizes {
		t.Run(sz.name, func(t *testing.T) {
			a := NewApp(nil)
			a.Open(sheet.IDOnset)
			scr, ok := a.Screen(sheet.IDOnset).(formScreen)
			if !ok {
				t.Fatal("the onset screen has no Form")
			}
			scr.Form().Results.details.open = true
			shootApp(t, "onset-details-"+sz.name, sz.size, a)
		})
	}
}

// TestResultsPreferredUnitGivesWay: a row's preferred unit gives way to a
// readable one where its number would be huge or tiny: helium's kinematic
// viscosity at a low pressure is not "186900 mm²/s" (1 mm²/s = 1e-6 m²/s).
func TestResultsPreferredUnitGivesWay(t *testing.T) {
	res := &sheet.Result{}
	res.Add("kinematic_viscosity", "Kinematic viscosity", 0.1869, units.DimKinematicViscosity).Show = "mm2/s"
	res.Add("density", "Density", 1.605e-4, units.DimDensity).Show = "kg/m3"
	res.Add("gap", "Gap", 3.731e-4, units.DimLength).Show = "mm"
	r := NewResults(NewEnv(nil))
	r.Show(res)
	for label, want := range map[string]string{"Kinematic viscosity": "0.1869 m²/s", "Density": "160.5 mg/m³", "Gap": "0.3731 mm"} {
		if got, _ := r.Value(label); got != want {
			t.Errorf("%s shown %q, want %q", label, got, want)
		}
	}
}
