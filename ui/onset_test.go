package ui

import (
	"image"
	"math"
	"os"
	"strings"
	"testing"
	"time"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// waitSolved runs frames until the screen's plots job has delivered its
// tables (the result rows come with the Form, at once).
func waitSolved(t *testing.T, h *harness, running func() bool, have func() bool) {
	t.Helper()
	deadline := time.Now().Add(20 * time.Second)
	for time.Now().Before(deadline) {
		h.frame()
		if !running() && have() {
			h.frames(2)
			return
		}
		time.Sleep(5 * time.Millisecond)
	}
	t.Fatal("the solve did not finish within 20 s")
}

// wantOnset is the hot temperature the screen should show for the device
// in its editor, computed with calc/linear directly.
func wantOnset(t *testing.T, e *deviceEditor) string {
	t.Helper()
	hot, _ := onsetOf(t, e)
	s, _ := units.FormatIn(hot, "K")
	return s
}

// TestOnsetScreenEdits drives the engine screen through the input router:
// the example solves off the UI goroutine; moving, editing, breaking and
// removing parts re-solve or report the part and field at fault; adding a
// part adds it.
func TestOnsetScreenEdits(t *testing.T) {
	env := NewEnv(nil)
	s := newOnsetScreen(env).(*onsetScreen)
	h := newHarness(t, image.Pt(412, 6000), s.Layout)
	solved := func() { waitSolved(t, h, s.job.Running, s.job.Has) }
	solved()
	row := "Hot temperature at onset"
	got, ok := s.form.Results.Value(row)
	if want := wantOnset(t, s.editor); !ok || got != want {
		t.Fatalf("example engine: %q shows %q, want %q (calc/linear)", row, got, want)
	}
	if c := cautions(s.form); len(c) == 0 || !strings.Contains(c[0], "Hot parts") {
		t.Errorf("no hot-parts caution beside the onset temperature: %q", c)
	}
	// Γ of the short-stack estimate, as calc/linear gives it.
	d0, _ := s.editor.File().Validate()
	o0, err := linear.Onset(d0, nil)
	if err != nil || o0.ShortStack == nil {
		t.Fatalf("calc/linear onset: %v, short stack %v", err, o0.ShortStack)
	}
	if got, want := rowValue(s.form.Results, "Short-stack Γ (onset ΔT / critical)"), units.Format(o0.ShortStack.GradientRatio, units.DimNone); got != want {
		t.Errorf("onset Γ %q, want %q", got, want)
	}
	// Open the stack and break its porosity: one message naming part and field.
	h.click(h.mustDesc("Edit part 4").Desc.Bounds)
	h.retype("Porosity (open fraction)", "0.76", "1.4")
	if f := s.form.Results.Failure(); !strings.Contains(f, `part 4 (stack): field "porosity" = 1.4 must be in (0, 1]`) {
		t.Errorf("porosity 1.4: failure %q", f)
	}
	if e := s.editor.parts[3].fields[2].f.ErrorText(); e != "Porosity (open fraction): 1.4 must be in (0, 1]" {
		t.Errorf("porosity 1.4: the field shows %q", e)
	}
	// No result, no caution: its lines quoted the last onset temperature.
	if c := cautions(s.form); len(c) != 0 {
		t.Errorf("porosity 1.4: a stale caution is still shown: %q", c)
	}
	// Mend it (a porosity that disagrees with the plates is refused too),
	// then shorten the stack: a new solve with the new value.
	h.retype("Porosity (open fraction)", "1.4", "0.76")
	if got1, _ := s.form.Results.Value(row); got1 != got {
		t.Errorf("porosity 0.76 again: %q, want the first %q", got1, got)
	}
	h.retype("Length", "60 mm", "45 mm")
	solved()
	got2, _ := s.form.Results.Value(row)
	if want := wantOnset(t, s.editor); got2 != want || got2 == got {
		t.Errorf("stack 45 mm: %q, want %q (and not the old %q)", got2, want, got)
	}
	// Move part 2 (hot tube) down: part 2 is now the heater.
	h.click(h.mustDesc("Down part 2").Desc.Bounds)
	if title := nodeText(h.mustDesc("part 2")); !strings.Contains(title, "Exchanger") {
		t.Errorf("after Down, part 2 is %q", title)
	}
	solved()
	// Remove the hot tube (now part 3): the device still solves.
	n := len(s.editor.parts)
	h.click(h.mustDesc("Remove part 3").Desc.Bounds)
	if len(s.editor.parts) != n-1 {
		t.Fatalf("Remove: %d parts, want %d", len(s.editor.parts), n-1)
	}
	solved()
	if f := s.form.Results.Failure(); f != "" {
		t.Errorf("after removing the hot tube: %q", f)
	}
	// Add a cavity: it goes right after the open part (the stack).
	open := s.editor.selected
	if open < 0 || s.editor.parts[open].kind != linear.KindStack {
		t.Fatalf("the stack is not the open part (%d)", open)
	}
	h.tap("Cavity")
	h.tap("Add part")
	if len(s.editor.parts) != n || s.editor.parts[open+1].kind != linear.KindCavity || s.editor.selected != open+1 {
		t.Errorf("Add cavity after part %d: kinds %v, open %d", open+1, kinds(s.editor), s.editor.selected)
	}
	solved()
}

func kinds(e *deviceEditor) []string {
	var k []string
	for _, p := range e.parts {
		k = append(k, p.kind)
	}
	return k
}

// TestOnsetScreenStaleSolve: an edit made while the plots are drawn
// cancels their run; the result and the plots shown are the newest
// device's.
func TestOnsetScreenStaleSolve(t *testing.T) {
	env := NewEnv(nil)
	s := newOnsetScreen(env).(*onsetScreen)
	h := newHarness(t, image.Pt(412, 6000), s.Layout)
	if !s.job.Running() {
		t.Fatal("no plots started for the example")
	}
	h.click(h.mustDesc("Edit part 4").Desc.Bounds)
	h.retype("Length", "60 mm", "45 mm")
	waitSolved(t, h, s.job.Running, s.job.Has)
	got, _ := s.form.Results.Value("Hot temperature at onset")
	if want := wantOnset(t, s.editor); got != want {
		t.Errorf("shown %q, want %q for the edited device", got, want)
	}
	d, _ := s.editor.File().Validate()
	prof := s.plots[0].Chart()
	if prof == nil || len(prof.Lines) != 1 {
		t.Fatalf("no profile plot after the edit")
	}
	if l := prof.Lines[0]; l[len(l)-1].X != d.Length() {
		t.Errorf("profile ends at %g m, the edited device is %g m long", l[len(l)-1].X, d.Length())
	}
	if s.plots[4].Chart() == nil {
		t.Error("no onset-against-pressure plot")
	}
}

// TestHeatPumpScreen: the example pump solves; the span shown is the one of
// calc/linear; a load gives a COP.
func TestHeatPumpScreen(t *testing.T) {
	env := NewEnv(nil)
	s := newHeatPumpScreen(env).(*heatPumpScreen)
	h := newHarness(t, image.Pt(412, 6000), s.Layout)
	waitSolved(t, h, s.job.Running, s.job.Has)
	d, _ := s.editor.File().Validate()
	r, err := linear.HeatPump(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	if got, want := rowValue(s.form.Results, "Temperature span"), units.Format(r.TemperatureSpan, units.DimTemperatureDifference); got != want {
		t.Errorf("span %q, want %q", got, want)
	}
	// The driver's volume velocity in L/s, the short-stack estimates as
	// calc/linear gives them (its tests check them against Swift 1988).
	if got, want := rowValue(s.form.Results, "Volume-velocity amplitude at the driver"), devIn(t, r.DriverFlow, "L/s"); got != want || !strings.HasSuffix(got, " L/s") {
		t.Errorf("driver volume velocity %q, want %q", got, want)
	}
	ss := r.ShortStack
	if ss == nil {
		t.Fatal("calc/linear gave no short-stack estimate for the example pump")
	}
	for _, c := range []struct {
		row  string
		v    float64
		dim  units.Dimension
		note string
	}{
		{"Short-stack zero-load span (quick estimate)", ss.ZeroLoadSpan, units.DimTemperatureDifference, "no load"},
		{"Short-stack Γ (solved span / critical)", ss.GradientRatio, units.DimNone, "below 1"},
		{"k·Δx of the stack", ss.KDeltaX, units.DimNone, "k·Δx much less than 1"},
		{"δκ / y0 of the stack", ss.DepthRatio, units.DimNone, "δκ much smaller than y0"},
	} {
		if got, want := rowValue(s.form.Results, c.row), units.Format(c.v, c.dim); got != want {
			t.Errorf("%s: %q, want %q", c.row, got, want)
		}
		if !strings.Contains(s.form.Results.String(), c.note) {
			t.Errorf("%s: validity note %q missing:\n%s", c.row, c.note, s.form.Results.String())
		}
	}
	h.retype("Cooling load at the cold side", "0 W", "100 mW")
	waitSolved(t, h, s.job.Running, s.job.Has)
	if v := rowValue(s.form.Results, "COP / Carnot COP"); v == "" || v == "0" {
		t.Errorf("with a load: COP/Carnot %q", v)
	}
	if c := cautions(s.form); len(c) == 0 || !strings.Contains(c[0], "Sound") {
		t.Errorf("no sound caution: %q", c)
	}
}

func rowValue(r *Results, label string) string {
	v, _ := r.Value(label)
	return v
}

// cautions are the cautions shown with the form's result (none without a
// result).
func cautions(f *Form) []string {
	if f.Result() == nil {
		return nil
	}
	return f.Result().Cautions
}

func devIn(t *testing.T, v float64, unit string) string {
	t.Helper()
	s, err := units.FormatIn(v, unit)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// TestScreenshotOnsetSolved pictures both screens solved, with one part
// open, at phone, tablet and desktop sizes and on a tall phone (SHOT_DIR to
// keep the files).
func TestScreenshotOnsetSolved(t *testing.T) {
	for _, id := range []string{"onset", "heatpump"} {
		env := NewEnv(nil)
		var s Screen
		var running, have func() bool
		var ed *deviceEditor
		if id == "onset" {
			o := newOnsetScreen(env).(*onsetScreen)
			s, running, have, ed = o, o.job.Running, o.job.Has, o.editor
		} else {
			p := newHeatPumpScreen(env).(*heatPumpScreen)
			s, running, have, ed = p, p.job.Running, p.job.Has, p.editor
		}
		h := newHarness(t, image.Pt(412, 915), s.Layout)
		waitSolved(t, h, running, have)
		ed.selected = 3
		sizes := shotSizes
		if os.Getenv("SHOT_DIR") != "" {
			sizes = append(append([]shotSize(nil), shotSizes...), shotSize{"tallphone", image.Pt(412, 5600)})
		}
		for _, sz := range sizes {
			t.Run(id+"/"+sz.name, func(t *testing.T) {
				a := NewApp(nil)
				a.env = env
				env.open = a.Open
				a.screens[sheet.ID(id)] = s
				a.stack = []sheet.ID{sheet.ID(id)}
				shootApp(t, id+"-solved-"+sz.name, sz.size, a)
			})
		}
	}
}

// TestOnsetScreenProbe: the growth or decay at a typed hot temperature is
// the one of linear.Mode (decay below onset, growth above); a typed ± is
// carried to the growth rate.
func TestOnsetScreenProbe(t *testing.T) {
	env := NewEnv(nil)
	s := newOnsetScreen(env).(*onsetScreen)
	h := newHarness(t, image.Pt(412, 6000), s.Layout)
	waitSolved(t, h, s.job.Running, s.job.Has)
	const probe, verdict = "Check a hot temperature below or above onset", "The sound at this hot temperature"
	h.retype(probe, "", "500 K")
	if v := rowValue(s.form.Results, verdict); v != "decays (below onset)" {
		t.Errorf("at 500 K: %q, want decay (onset of the example is about 711 K)", v)
	}
	h.retype(probe, "500 K", "800 K")
	if v := rowValue(s.form.Results, verdict); v != "grows (above onset)" {
		t.Errorf("at 800 K: %q, want growth", v)
	}
	d, _ := s.editor.File().Validate()
	m, err := linear.Mode(d, 800, nil)
	if err != nil {
		t.Fatal(err)
	}
	if got, want := rowValue(s.form.Results, "Growth rate (negative: decays)"), units.Format(m.GrowthRate, units.DimRate); got != want {
		t.Errorf("growth rate at 800 K %q, linear.Mode %q", got, want)
	}
	h.retype(probe, "800 K", "800 K ± 10 K")
	if got := rowValue(s.form.Results, "Growth rate (negative: decays)"); !strings.Contains(got, "±") {
		t.Errorf("growth rate at 800 K ± 10 K shows no ±: %q", got)
	}
}

// TestOnsetScreenDevicePM: a ± typed into the device (the mean pressure of
// the editor) is refused with the device check's own words, the ones the
// terminal prints for a file with the same ±, naming the field.
func TestOnsetScreenDevicePM(t *testing.T) {
	env := NewEnv(nil)
	s := newOnsetScreen(env).(*onsetScreen)
	h := newHarness(t, image.Pt(412, 6000), s.Layout)
	h.retype("Mean pressure", s.editor.pressure.Text(), "8 bar ± 0.5 bar")
	_, err := s.form.Sheet.Evaluate(map[string]string{"device": s.editor.document()})
	fes := sheet.FieldErrors(err)
	if len(fes) != 1 || fes[0].Key != "device" {
		t.Fatalf("the description gives %v for the device with ±", err)
	}
	want := fes[0].Err.Error()
	if f := s.form.Results.Failure(); f != want || !strings.Contains(f, `field "mean_pressure"`) {
		t.Errorf("failure %q, want %q", f, want)
	}
	if s.form.Result() != nil || s.plots[0].Chart() != nil {
		t.Error("a result or a plot is still shown")
	}
	if e := s.editor.pressure.ErrorText(); !strings.Contains(e, "Mean pressure") || !strings.Contains(e, "uncertainty") {
		t.Errorf("the mean-pressure field shows %q", e)
	}
	h.retype("Mean pressure", s.editor.pressure.Text(), "8 bar")
	if e := s.editor.pressure.ErrorText(); e != "" || s.form.Result() == nil {
		t.Errorf("8 bar again: field error %q, result %v", e, s.form.Result() != nil)
	}
}

// TestDeviceScreenExampleChips: the example chips load a built-in example
// into the editor (the heat pump's driver is then the first part, which an
// engine refuses by the part's kind) and the engine back.
func TestDeviceScreenExampleChips(t *testing.T) {
	env := NewEnv(nil)
	s := newOnsetScreen(env).(*onsetScreen)
	h := newHarness(t, image.Pt(412, 9000), s.Layout)
	h.tap("The example heat pump")
	h.frames(2)
	if k := s.editor.parts[0].kind; k != linear.KindDriver {
		t.Fatalf("after the heat-pump chip the first part is %s", k)
	}
	if s.form.Text("example") != "none" {
		t.Errorf("the chip stays on %q; the editor holds the device", s.form.Text("example"))
	}
	if s.form.Result() != nil && rowValue(s.form.Results, "Hot temperature at onset") != "" {
		t.Error("the heat pump shows an onset temperature")
	}
	h.tap("The example engine")
	h.frames(2)
	if got, want := rowValue(s.form.Results, "Hot temperature at onset"), wantOnset(t, s.editor); got != want {
		t.Errorf("engine again: %q, want %q", got, want)
	}
}

// TestOnsetScreenOwnPressureMark: the onset-against-pressure plot marks
// the device's own mean pressure (in bar, as the axis) at the onset the
// result shows; the sweep passes through that pressure, where it solves
// the same onset from its own start, so the mark lies on the line (within
// 0.1 %, the solver's convergence from two starts).
func TestOnsetScreenOwnPressureMark(t *testing.T) {
	env := NewEnv(nil)
	s := newOnsetScreen(env).(*onsetScreen)
	h := newHarness(t, image.Pt(412, 915), s.Layout)
	waitSolved(t, h, s.job.Running, s.job.Has)
	c := s.plots[4].Chart()
	if c == nil || len(c.Lines) != 1 || len(c.Marks) != 1 {
		t.Fatalf("onset plot %+v: want one line and one mark", c)
	}
	hot, _ := s.form.Result().Row("hot_temperature")
	m := c.Marks[0]
	if pm := s.dev.MeanPressure * 1e-5; m.X != pm || m.Y != hot.Value {
		t.Errorf("mark (%g bar, %g K), want (%g bar, %g K)", m.X, m.Y, pm, hot.Value)
	}
	on := false
	for _, p := range c.Lines[0] {
		if math.Abs(p.X-m.X) <= 1e-9*m.X && math.Abs(p.Y-m.Y) <= 1e-3*m.Y {
			on = true
		}
	}
	if !on {
		t.Errorf("mark (%g bar, %g K) is not on the swept line %v", m.X, m.Y, c.Lines[0])
	}
}
