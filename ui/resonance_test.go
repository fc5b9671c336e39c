package ui

import (
	"fmt"
	"image"
	"os"
	"strings"
	"testing"

	"tubewright/calc/resonator"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// TestScreenshotResonanceTall pictures the whole tube-resonance and
// diagnosis pages on a tall phone and a desktop window, to look at the
// results and the plot below the fold (SHOT_DIR to keep the files).
func TestScreenshotResonanceTall(t *testing.T) {
	if os.Getenv("SHOT_DIR") == "" {
		t.Skip("set SHOT_DIR to look at the full pages")
	}
	for _, id := range []sheet.ID{sheet.IDResonance, sheet.IDDiagnose} {
		a := NewApp(nil)
		a.Open(id)
		shootApp(t, string(id)+"-tallphone", image.Pt(412, 2900), a)
	}
}

// wantTube formats the frequency the resonance screen should show, computed
// with calc/resonator directly (the screen must add nothing of its own).
func wantTube(t *testing.T, length, radius float64, uLength float64) string {
	t.Helper()
	air, err := gasprops.ParseMixture("air")
	if err != nil {
		t.Fatal(err)
	}
	s := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: length, Radius: radius, Losses: resonator.WallLosses},
		Gas: air, Temperature: 293.15, Pressure: units.StandardAtmosphere, U: resonator.Uncertainty{Length: uLength}}
	r, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	if uLength > 0 {
		return units.FormatPM(r.Frequency, r.FrequencySigma, units.DimFrequency)
	}
	return units.Format(r.Frequency, units.DimFrequency)
}

// TestResonanceScreenTyping drives the tube-resonance screen through the
// input router: type a length, see the frequency change to what the
// calculator gives; a ± on the length shows a ± on the frequency; a zero
// length is refused under its field with no number shown; the carry button
// puts the frequency on the Bench. The physics is calc/resonator's (checked
// there); this checks that the screen passes the typed values through.
func TestResonanceScreenTyping(t *testing.T) {
	env := NewEnv(nil)
	s := newResonanceScreen(env)
	h := newHarness(t, image.Pt(412, 3200), s.Layout)

	// starting values: 500 mm, 12 mm, air, 20 degC = 293.15 K, 1 atm
	got, ok := h.shown("Resonance frequency")
	if want := wantTube(t, 0.5, 0.012, 0); !ok || got != want {
		t.Fatalf("initial frequency shown %q (found %v), want %q", got, ok, want)
	}
	before := got

	h.retype("Tube length", "500 mm", "1 m")
	got, _ = h.shown("Resonance frequency")
	if want := wantTube(t, 1, 0.012, 0); got != want || got == before {
		t.Fatalf("after typing 1 m: shown %q, want %q (was %q)", got, want, before)
	}
	if a, _ := h.shown("Answer"); a != got {
		t.Errorf("headline %q differs from the result row %q", a, got)
	}

	h.retype("Tube length", "1 m", "1 m ± 2 mm")
	got, _ = h.shown("Resonance frequency")
	if want := wantTube(t, 1, 0.012, 0.002); got != want || !strings.Contains(got, "±") {
		t.Fatalf("with a ± on the length: shown %q, want %q", got, want)
	}

	h.retype("Tube length", "1 m ± 2 mm", "0 m")
	if _, ok := h.shown("Resonance frequency"); ok {
		t.Fatal("a zero length still shows a frequency")
	}
	if e := s.(*resonanceScreen).form.Field("length").ErrorText(); !strings.Contains(e, "length") {
		t.Fatalf("error under the length field %q does not name the length", e)
	}
	if _, ok := h.byDesc("No result"); !ok {
		t.Fatal("no failure line for a zero length")
	}

	// the frequency found goes to the Bench by itself (no button to tap)
	h.retype("Tube length", "0 m", "2 m")
	want := wantTube(t, 2, 0.012, 0)
	if got := units.Format(env.Bench.Frequency, units.DimFrequency); got != want || env.Bench.FrequencyFrom != "Tube resonance" {
		t.Fatalf("Bench has %q from %q, want %q from Tube resonance", got, env.Bench.FrequencyFrom, want)
	}
}

// TestResonanceScreenRealGas: the real-gas switch, once only in the
// terminal, is on the screen and changes the frequency of helium at 30 bar
// to what the calculator gives with the second-virial correction.
func TestResonanceScreenRealGas(t *testing.T) {
	env := NewEnv(nil)
	s := newResonanceScreen(env).(*resonanceScreen)
	h := newHarness(t, image.Pt(412, 3600), s.Layout)
	s.form.Gas("gas").SetText("helium")
	s.form.Invalidate()
	h.retype("Mean pressure", "1 atm", "30 bar")
	he, _ := gasprops.ParseMixture("helium")
	setup := resonator.Setup{Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1, Length: 0.5, Radius: 0.012, Losses: resonator.WallLosses},
		Gas: he, Temperature: 293.15, Pressure: 30e5}
	ideal, _ := setup.SolveFrequency()
	setup.GasOptions = &gasprops.Options{NonIdeal: true}
	real, _ := setup.SolveFrequency()
	if got, _ := h.shown("Resonance frequency"); got != units.Format(ideal.Frequency, units.DimFrequency) {
		t.Fatalf("ideal helium at 30 bar: shown %q, want %q", got, units.Format(ideal.Frequency, units.DimFrequency))
	}
	h.tap(s.form.Sheet.Input("non-ideal").Label)
	h.frames(2)
	if got, _ := h.shown("Resonance frequency"); got != units.Format(real.Frequency, units.DimFrequency) || real.Frequency == ideal.Frequency {
		t.Fatalf("with the real-gas correction: shown %q, want %q (ideal %q)", got,
			units.Format(real.Frequency, units.DimFrequency), units.Format(ideal.Frequency, units.DimFrequency))
	}
}

// TestResonanceScreenZonesAndHelmholtz: the zoned tube shows the
// calculator's modes for the starting zones; the zone fields and the
// one-line zones input stay in step; up to five zones and the number of
// modes chosen; a zone the gas model refuses is marked on its own field;
// the Helmholtz resonator shows its frequency and a neck shorter than its
// radius is refused under the field.
func TestResonanceScreenZonesAndHelmholtz(t *testing.T) {
	env := NewEnv(nil)
	s := newResonanceScreen(env).(*resonanceScreen)
	h := newHarness(t, image.Pt(412, 5000), s.Layout)
	h.tap("Hot and cold zones")
	air, _ := gasprops.ParseMixture("air")
	zt := resonator.ZonedTube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Gas: air, Pressure: units.StandardAtmosphere, Losses: resonator.WallLosses,
		Zones: []resonator.Zone{{Length: 0.1, Radius: 0.012, Temperature: 600}, {Length: 0.4, Radius: 0.012, Temperature: 293.15}}}
	want, err := zt.Modes(3)
	if err != nil {
		t.Fatal(err)
	}
	if got, _ := h.shown("Lowest mode"); got != units.Format(want.Modes[0].Frequency, units.DimFrequency) {
		t.Errorf("lowest mode shown %q, want %q", got, units.Format(want.Modes[0].Frequency, units.DimFrequency))
	}
	for _, m := range want.Modes {
		if got, _ := h.shown(fmt.Sprintf("Mode %d", m.Number)); got != units.Format(m.Frequency, units.DimFrequency) {
			t.Errorf("mode %d shown %q, want %q", m.Number, got, units.Format(m.Frequency, units.DimFrequency))
		}
	}
	// the zone's size is its inside diameter, the radius a chip away
	if f := s.zones.zones[0]; f.size.Label != "Zone 1 inside diameter" || f.size.Text() != "24 mm" || f.sizeAs.half() {
		t.Errorf("zone 1 size: %q %q (radius %v), want the inside diameter 24 mm", f.size.Label, f.size.Text(), f.sizeAs.half())
	}
	h.retype("Zone 1 temperature", "600 K", "700 K")
	zt.Zones[0].Temperature = 700
	want, _ = zt.Modes(3)
	if got, _ := h.shown("Lowest mode"); got != units.Format(want.Modes[0].Frequency, units.DimFrequency) {
		t.Errorf("after 700 K: lowest mode shown %q, want %q", got, units.Format(want.Modes[0].Frequency, units.DimFrequency))
	}
	if line := s.form.Text("zones"); !strings.Contains(line, "700 K") {
		t.Errorf("the zones line %q did not take the zone field", line)
	}

	// five zones and ten modes, as in the terminal
	h.tap("5 zones")
	h.retype("Modes to list", "3", "10")
	if zs := strings.Count(s.form.Text("zones"), ";") + 1; zs != 5 {
		t.Errorf("%d zones in %q, want 5", zs, s.form.Text("zones"))
	}
	if _, ok := h.shown("Mode 10"); !ok {
		t.Errorf("no mode 10; failure %q", s.form.Results.Failure())
	}
	if _, ok := h.shown("Mode 11"); ok {
		t.Error("mode 11 shown when 10 were asked for")
	}
	// the one-line input fills the fields
	h.retype("Zones from the first end", s.form.Text("zones"), "0.2 m, 10 mm, 500 K; 0.3 m, 10 mm, 300 K")
	if got := s.zones.zones[1].length.Text(); got != "0.3 m" || s.zones.n() != 2 {
		t.Errorf("after typing the line: %d zones, zone 2 length %q", s.zones.n(), got)
	}
	// a bare size in the line is a radius, as older text wrote it: the
	// zone's field shows it as a radius; the same tube by its diameters
	// gives the same lowest mode
	if f := s.zones.zones[1]; !f.sizeAs.half() || f.size.Text() != "10 mm" || !strings.Contains(f.size.Label, "radius") {
		t.Errorf("zone 2 after a bare 10 mm: %q %q (radius %v), want the radius 10 mm", f.size.Label, f.size.Text(), f.sizeAs.half())
	}
	byRadius, _ := h.shown("Lowest mode")
	h.retype("Zones from the first end", s.form.Text("zones"), "0.2 m, d 20 mm, 500 K; 0.3 m, d 20 mm, 300 K")
	if f := s.zones.zones[1]; f.sizeAs.half() || f.size.Text() != "20 mm" || f.size.Label != "Zone 2 inside diameter" {
		t.Errorf("zone 2 after d 20 mm: %q %q (radius %v), want the inside diameter 20 mm", f.size.Label, f.size.Text(), f.sizeAs.half())
	}
	if got, _ := h.shown("Lowest mode"); got != byRadius || got == "" {
		t.Errorf("by diameters the lowest mode is %q, by radii %q", got, byRadius)
	}
	h.retype("Zone 2 temperature", "300 K", "5 K")
	if e := s.zones.zones[1].temp.ErrorText(); !strings.Contains(e, "zone 2") {
		t.Errorf("zone 2 temperature of 5 K: field error %q", e)
	}
	if e := s.zones.zones[0].temp.ErrorText(); e != "" {
		t.Errorf("zone 1 marked too: %q", e)
	}

	h.tap("Helmholtz resonator")
	g, _ := air.Properties(293.15, units.StandardAtmosphere, nil)
	hr, _ := resonator.HelmholtzFrequency(resonator.Helmholtz{Volume: 1e-3, NeckLength: 0.05, NeckRadius: 0.01, Outer: resonator.Unflanged}, g)
	if got, _ := h.shown("Resonance frequency"); got != units.Format(hr.Frequency, units.DimFrequency) {
		t.Errorf("Helmholtz shown %q, want %q", got, units.Format(hr.Frequency, units.DimFrequency))
	}
	h.retype("Neck length", "50 mm", "5 mm")
	if e := s.form.Field("neck-diameter").ErrorText(); !strings.Contains(e, "neck") {
		t.Errorf("error under the neck's diameter %q", e)
	}
}

// TestScreenshotResonanceKinds pictures the zoned-tube and Helmholtz forms
// of the Tube resonance screen at the three sizes (checked like every
// screenshot; kept as files when SHOT_DIR is set).
func TestScreenshotResonanceKinds(t *testing.T) {
	for _, kind := range []string{"zones", "helmholtz"} {
		env := NewEnv(nil)
		s := newResonanceScreen(env).(*resonanceScreen)
		s.form.SetText("resonator", kind)
		shoot(t, "resonance-"+kind, env, s)
	}
}

// TestResonanceScreenHiddenInputs: a bad value left in a field that the
// choice of what to solve for hides does not stop the result, and comes
// back when the field is shown again.
func TestResonanceScreenHiddenInputs(t *testing.T) {
	env := NewEnv(nil)
	s := newResonanceScreen(env).(*resonanceScreen)
	h := newHarness(t, image.Pt(412, 3600), s.Layout)
	h.tap("Length from frequency")
	h.retype("Target frequency", "400 Hz", "40O Hz")
	if _, ok := h.shown("Tube length to cut"); ok {
		t.Fatal("a bad target frequency still shows a length")
	}
	h.tap("Frequency from length")
	h.frames(2)
	if got, _ := h.shown("Resonance frequency"); got != wantTube(t, 0.5, 0.012, 0) {
		t.Fatalf("with the bad frequency hidden: shown %q, failure %q", got, s.form.Results.Failure())
	}
	h.tap("Length from frequency")
	h.frames(2)
	if got := s.form.Text("frequency"); got != "40O Hz" {
		t.Errorf("the hidden text came back as %q", got)
	}
}

// TestResonanceScreenKeepsBenchTemperature: the zoned tube hides the mean
// temperature; working there must not send a default temperature back to
// the other screens.
func TestResonanceScreenKeepsBenchTemperature(t *testing.T) {
	env := NewEnv(nil)
	env.Bench.SetTemperature(300)
	s := newResonanceScreen(env).(*resonanceScreen)
	s.Enter()
	h := newHarness(t, image.Pt(412, 3600), s.Layout)
	h.tap("Hot and cold zones")
	h.frames(2)
	if _, ok := h.shown("Lowest mode"); !ok {
		t.Fatalf("no zoned result: %q", s.form.Results.Failure())
	}
	if env.Bench.Temperature != 300 {
		t.Errorf("Bench temperature %v K after the zoned tube, want 300 K", env.Bench.Temperature)
	}
}

// TestResonanceScreenSweep: a sweep typed on screen (once only a terminal
// option) is drawn: the plot holds its points, the gas temperatures typed.
func TestResonanceScreenSweep(t *testing.T) {
	env := NewEnv(nil)
	s := newResonanceScreen(env).(*resonanceScreen)
	h := newHarness(t, image.Pt(412, 4000), s.Layout)
	h.retype(s.form.Sheet.Input("sweep").Label, "", "temperature:250 K:450 K:5")
	c := s.plot.Chart()
	if c == nil || len(c.Lines) != 1 || len(c.Lines[0]) != 5 {
		t.Fatalf("chart %+v after a sweep of 5 points; failure %q", c, s.form.Results.Failure())
	}
	if x := c.Lines[0]; x[0].X != 250 || x[4].X != 450 {
		t.Errorf("sweep from %v K to %v K, want 250 K to 450 K", x[0].X, x[4].X)
	}
}
