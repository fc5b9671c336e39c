package ui

import (
	"context"
	"image"
	"strings"
	"testing"
	"time"

	"gioui.org/layout"
	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// backgroundDesign clears designWaits for one test, so that the screen runs
// its design in the background as the app does.
func backgroundDesign(t *testing.T) {
	t.Helper()
	was := designWaits.Swap(false)
	t.Cleanup(func() { designWaits.Store(was) })
}

// waitDesign runs frames until the screen's design has finished and been
// shown.
func waitDesign(t *testing.T, h *harness, s *designScreen) {
	t.Helper()
	deadline := time.Now().Add(60 * time.Second)
	for time.Now().Before(deadline) {
		h.frame()
		if !s.run.running() && s.state() != designBusy {
			h.frames(2)
			return
		}
		time.Sleep(5 * time.Millisecond)
	}
	t.Fatal("the design did not finish within 60 s")
}

// terminalDesign is the design of the screen's current inputs through the
// terminal's path (the description's Evaluate).
func terminalDesign(t *testing.T, s *designScreen) *sheet.Result {
	t.Helper()
	base, _ := sheet.Lookup(sheet.IDDesign)
	r, err := base.Evaluate(s.form.Texts())
	if err != nil {
		t.Fatal(err)
	}
	return r
}

func kelvin(t *testing.T, v float64) string { return devIn(t, v, "K") }

// TestDesignScreenInBackground drives the screen as the app runs it: the
// design starts off the UI goroutine with its progress shown, the result
// is the terminal's, the sensitivity table holds the description's rows;
// Cancel stops a design and "Design again" restarts it; an input that
// stops parsing cancels the design and marks the field.
func TestDesignScreenInBackground(t *testing.T) {
	backgroundDesign(t)
	env := NewEnv(nil)
	s := newDesignScreen(env).(*designScreen)
	h := newHarness(t, image.Pt(412, 8000), s.Layout)
	if s.state() != designBusy || !s.run.running() {
		t.Fatalf("first frame: state %v, running %v; want the design running", s.state(), s.run.running())
	}
	if txt, ok := h.shown("design status"); !ok || !strings.HasPrefix(txt, "Designing") {
		t.Errorf("progress shown %q, want Designing…", txt)
	}
	waitDesign(t, h, s)
	want := terminalDesign(t, s)
	on, _ := want.Row("onset_temperature")
	if got, _ := s.head.Value("Hot temperature at onset"); got != kelvin(t, on.Value) {
		t.Errorf("onset shown %q, the terminal's design %q", got, kelvin(t, on.Value))
	}
	mg, _ := want.Row("margin")
	if got, _ := s.head.Value("Heater margin above onset"); got != units.Format(mg.Value, units.DimTemperatureDifference) {
		t.Errorf("margin shown %q, want %q", got, units.Format(mg.Value, units.DimTemperatureDifference))
	}
	if !strings.Contains(s.head.String(), "Target reached: [PASS] yes") {
		t.Errorf("no passing reachable check in\n%s", s.head.String())
	}
	if s.strip.dev == nil || s.doc == "" {
		t.Error("no device drawn or kept")
	}
	lines := sheet.DesignSensitivity(want)
	if len(lines) != 4 || len(s.sens) != 4 {
		t.Fatalf("sensitivity: %d lines shown, the description has %d", len(s.sens), len(lines))
	}
	for _, l := range lines {
		if got, ok := h.shown(l.Onset.Label); !ok || got != signed(l.Onset.Value, 2, "K") {
			t.Errorf("%s: shown %q, want %q", l.Onset.Label, got, signed(l.Onset.Value, 2, "K"))
		}
		if got, ok := h.shown(l.Frequency.Label); !ok || got != signed(l.Frequency.Value, 3, "Hz") {
			t.Errorf("%s: shown %q, want %q", l.Frequency.Label, got, signed(l.Frequency.Value, 3, "Hz"))
		}
	}
	if _, ok := s.parts.Value("Stack"); !ok {
		t.Errorf("no stack length in the parts card:\n%s", s.parts.String())
	}
	if c := cautions(s.form); len(c) == 0 {
		t.Error("no cautions with a hot, pressurised engine")
	}

	// A new frequency starts a new design; Cancel stops it.
	h.retype("Target frequency", "300 Hz", "250 Hz")
	if s.state() != designBusy {
		t.Fatalf("after a change: state %v, want busy", s.state())
	}
	h.tap("Cancel")
	if s.run.running() || s.state() != designCancelled {
		t.Fatalf("after Cancel: running %v, state %v", s.run.running(), s.state())
	}
	if txt, _ := h.shown("design status"); !strings.Contains(txt, "cancelled") {
		t.Errorf("after Cancel the status reads %q", txt)
	}
	h.tap("Design again")
	if s.state() != designBusy {
		t.Fatalf("Design again: state %v, want busy", s.state())
	}
	waitDesign(t, h, s)
	fr, _ := s.form.Result().Row("frequency")
	if !scalar.EqualWithinRel(fr.Value, 250, 0.01) {
		t.Errorf("designed for 250 Hz, onset at %v Hz", fr.Value)
	}

	// A diameter that does not parse: no design runs, the field is marked.
	h.retype("Target frequency", "250 Hz", "260 Hz")
	h.retype("Tube inside diameter", "50 mm", "fifty")
	if s.run.running() || s.state() != designIdle {
		t.Errorf("bad diameter: running %v, state %v; want no design", s.run.running(), s.state())
	}
	if s.form.Field("diameter").ErrorText() == "" {
		t.Error("bad diameter: the field shows no error")
	}
}

// TestDesignScreenUnreachable: a heater too cool gives the failing check
// with the nearest design, drawn as a failure.
func TestDesignScreenUnreachable(t *testing.T) {
	backgroundDesign(t)
	env := NewEnv(nil)
	s := newDesignScreen(env).(*designScreen)
	s.form.SetText("hot", "300 K")
	h := newHarness(t, image.Pt(412, 8000), s.Layout)
	waitDesign(t, h, s)
	if !s.fail || !strings.Contains(s.head.String(), "Target reached: [FAIL] no") {
		t.Errorf("want a failing check, fail=%v:\n%s", s.fail, s.head.String())
	}
	if _, ok := h.byDesc("Target reached outcome"); !ok {
		t.Error("no outcome badge drawn")
	}
	if s.doc == "" {
		t.Error("the nearest design has no device to open")
	}
}

// TestDesignOpensInOnsetEditor: one tap hands the design to the Engine
// onset screen, which takes it into its editor on Enter and solves the
// same onset as the design's (same device, same solve: the check
// that the written device gives the design's own onset figures).
func TestDesignOpensInOnsetEditor(t *testing.T) {
	backgroundDesign(t)
	a := NewApp(nil)
	a.Open(sheet.IDDesign)
	s := a.Screen(sheet.IDDesign).(*designScreen)
	h := newHarness(t, image.Pt(1440, 9000), func(gtx layout.Context) layout.Dimensions { return a.Layout(gtx) })
	waitDesign(t, h, s)
	design := s.form.Result()
	name, doc, ok := s.designedDevice()
	if !ok || !strings.HasPrefix(name, "Designed engine") {
		t.Fatalf("no designed device to keep: %q", name)
	}
	h.tap("Open in Engine onset")
	if a.Current() != sheet.IDOnset {
		t.Fatalf("after the tap the app shows %q", a.Current())
	}
	o := a.Screen(sheet.IDOnset).(*onsetScreen)
	waitSolved(t, h, o.job.Running, o.job.Has)
	var want linear.DeviceFile
	if err := jsonDecode([]byte(doc), &want); err != nil {
		t.Fatal(err)
	}
	got := o.editor.File()
	if got.Name != want.Name || len(got.PartsList) != len(want.PartsList) || got.PartsList[3].Length != want.PartsList[3].Length {
		t.Errorf("editor holds %q with %d parts, want %q with %d", got.Name, len(got.PartsList), want.Name, len(want.PartsList))
	}
	r := o.form.Result()
	if r == nil {
		t.Fatalf("onset screen: %v", o.form.Err())
	}
	for dkey, okey := range map[string]string{"onset_temperature": "hot_temperature", "frequency": "frequency"} {
		w, _ := design.Row(dkey)
		g, ok := r.Row(okey)
		// The same device and the same default onset solve: agreement to
		// the solver's tolerance.
		if !ok || !scalar.EqualWithinRel(g.Value, w.Value, 1e-6) {
			t.Errorf("%s: onset screen %v, design %v", okey, g.Value, w.Value)
		}
	}
	// The handed device is taken once: Back and forth keeps the editor's.
	if _, ok := a.env.takeHandedDevice(); ok {
		t.Error("the handed device was not taken")
	}
}

// TestScreenshotDesignUnreachable pictures the failing check with the
// nearest design (SHOT_DIR/design-unreachable-<size>.png).
func TestScreenshotDesignUnreachable(t *testing.T) {
	env := NewEnv(nil)
	s := newDesignScreen(env).(*designScreen)
	s.form.SetText("hot", "300 K")
	shoot(t, "design-unreachable", env, s)
}

// TestScreenshotDesignRunning pictures the progress card with its Cancel
// button (SHOT_DIR/design-running-<size>.png): the screen is given a
// design that waits until cancelled, at 312 solves so far.
func TestScreenshotDesignRunning(t *testing.T) {
	backgroundDesign(t)
	env := NewEnv(nil)
	s := newDesignScreen(env).(*designScreen)
	s.run.key = textsKey(s.form.Texts())
	s.run.job.Start(func(ctx context.Context) (*sheet.Result, error) {
		<-ctx.Done()
		return nil, ctx.Err()
	})
	t.Cleanup(s.run.job.Cancel)
	s.run.solves.Store(312)
	s.run.limit.Store(2000)
	shoot(t, "design-running", env, s)
	if s.state() != designBusy {
		t.Errorf("state %v, want the progress shown", s.state())
	}
}

// TestDesignLeaveCancels: covering the design screen cancels its running
// design; uncovering it starts the design again and finishes it.
func TestDesignLeaveCancels(t *testing.T) {
	backgroundDesign(t)
	a := NewApp(nil)
	a.Open(sheet.IDDesign)
	s := a.Screen(sheet.IDDesign).(*designScreen)
	h := newHarness(t, image.Pt(1440, 4000), func(gtx layout.Context) layout.Dimensions { return a.Layout(gtx) })
	if !s.run.running() {
		t.Fatal("the design did not start")
	}
	a.Open(sheet.IDGas)
	if s.run.running() {
		t.Error("covered by another screen, the design still runs")
	}
	h.frames(2)
	a.Back()
	h.frame()
	if a.Current() != sheet.IDDesign || !s.run.running() {
		t.Fatalf("back on %q, running %v: want the design started again", a.Current(), s.run.running())
	}
	waitDesign(t, h, s)
	if s.form.Result() == nil {
		t.Errorf("no design after returning: %v", s.form.Err())
	}
}

// TestScreenshotOnsetFromDesign pictures the Engine onset screen after
// "Open in Engine onset": the designed engine in its editor
// (SHOT_DIR/onset-from-design-<size>.png).
func TestScreenshotOnsetFromDesign(t *testing.T) {
	base, _ := sheet.Lookup(sheet.IDDesign)
	r, err := base.Evaluate(map[string]string{"gas": "helium", "pressure": "10 bar", "frequency": "300 Hz", "hot": "650 K", "diameter": "50 mm"})
	if err != nil {
		t.Fatal(err)
	}
	row, _ := r.Row("device")
	env := NewEnv(nil)
	env.handDevice(row.Text)
	s := newOnsetScreen(env).(*onsetScreen)
	shoot(t, "onset-from-design", env, s)
	if got := s.editor.File().Name; got != "Designed engine, 300 Hz" {
		t.Errorf("the onset editor holds %q", got)
	}
}

// TestTextsKey: the design's inputs are one key whatever their order, an
// empty text is the same as none, and any other difference is another key.
func TestTextsKey(t *testing.T) {
	t.Parallel()
	a := textsKey(map[string]string{"gas": "helium", "hot": "650 K", "wire": ""})
	if b := textsKey(map[string]string{"hot": "650 K", "gas": "helium"}); a != b {
		t.Errorf("order or an empty text changed the key: %q, %q", a, b)
	}
	for _, other := range []map[string]string{
		{"gas": "helium", "hot": "651 K"},
		{"gas": "helium", "hot": "650 K", "wire": "50 um"},
		{"gas": "heliumhot", "": "650 K"},
	} {
		if textsKey(other) == a {
			t.Errorf("%v gives the same key as the first inputs", other)
		}
	}
}
