package ui

import (
	"image"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"tubewright/calc/safety"
	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// tallPhone is a phone's width with room for a whole step, so that tests
// need not scroll (the list lays out only what is visible).
var tallPhone = image.Pt(412, 4000)

// hasLabel reports whether some node's label contains text.
func (h *harness) hasLabel(text string) bool {
	for _, n := range h.nodes() {
		if strings.Contains(n.Desc.Label, text) {
			return true
		}
	}
	return false
}

// safetyApp returns an app with its bench log at path, showing screen id.
func safetyApp(t *testing.T, path, id string, size image.Point) (*App, *harness) {
	t.Helper()
	a := NewApp(nil)
	useBookAt(a.Env(), path)
	a.Open(sheet.ID(id))
	h := newHarness(t, size, a.Layout)
	h.frames(2)
	return a, h
}

// TestSafetyCautionOnEveryStep: the general caution is on every step of the
// pass and on the review page, and each inline calculator shows its own
// caution box beside its numbers.
func TestSafetyCautionOnEveryStep(t *testing.T) {
	a, h := safetyApp(t, filepath.Join(t.TempDir(), "benchlog.json"), "safety", tallPhone)
	s := a.Screen("safety").(*safetyScreen)
	for i := 0; i <= s.items(); i++ {
		if s.step != i {
			t.Fatalf("on step %d, want %d", s.step, i)
		}
		if !h.hasLabel(safety.CautionGeneral) {
			t.Errorf("step %d: general caution missing:\n%s", i, h.dump())
		}
		if i < s.items() {
			if c := s.calcs[i]; c != nil {
				for _, line := range c.Cautions() {
					if !h.hasLabel(line) {
						t.Errorf("step %d (%s): caution %q not shown beside the numbers", i, s.pass.Items[i].ID, line[:30])
					}
				}
			}
			if i == s.items()-1 {
				h.tap("Review and save ›")
			} else {
				h.tap("Next ›")
			}
		}
	}
}

// TestBenchLogCaution: the bench-log screen shows the general caution when
// empty, with passes and with a damaged file.
func TestBenchLogCaution(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "benchlog.json")
	check := func(state string) {
		t.Helper()
		_, h := safetyApp(t, path, "benchlog", image.Pt(412, 915))
		if !h.hasLabel(safety.CautionGeneral) {
			t.Errorf("%s: caution missing:\n%s", state, h.dump())
		}
	}
	check("empty")
	p := store.Pass{Time: time.Date(2026, 12, 1, 21, 0, 0, 0, time.UTC), Items: []store.Item{{ID: "rating", Title: "Vessel rating", Done: true}}, Cautions: []string{safety.CautionGeneral}}
	if err := store.Append(path, p); err != nil {
		t.Fatal(err)
	}
	check("one pass")
	if err := os.WriteFile(path, []byte(`{"format":"tubewright-benchlog","vers`), 0o600); err != nil {
		t.Fatal(err)
	}
	check("damaged")
}

// TestSafetyWalkToSavedLog walks the pass on a phone-width window from the
// first item to a saved bench-log entry, with numbers and checks from the
// vessel items, then opens the bench log and exports the pass as text.
func TestSafetyWalkToSavedLog(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "benchlog.json")
	// Taller than tallPhone: the exported pass, with its inputs and
	// checks, pushes the export button past 4000 px.
	a, h := safetyApp(t, path, "safety", image.Pt(412, 6000))
	s := a.Screen("safety").(*safetyScreen)
	s.now = func() time.Time { return time.Date(2026, 12, 1, 22, 30, 0, 0, time.UTC) }

	// Item 1: tick it.
	h.tap("Done: Vessel rating and markings known")
	if !s.pass.Done[0] {
		t.Fatal("tick on item 1 not recorded")
	}
	h.tap("Next ›")
	// Item 2: the wall calculator needs the allowable stress.
	h.retype("Allowable stress at the hot-end temperature", "", "138 MPa")
	got, ok := h.shown("Hoop stress (Lamé, inner surface)")
	if !ok || got != "26.58 MPa" {
		// Lamé at 30 barg, 50 mm, 6 mm: 26.58 MPa (calc/safety wall tests).
		t.Fatalf("hoop stress shown %q (%v); nodes:\n%s", got, ok, h.dump())
	}
	if v, _ := h.shown("MAWP of this wall (gauge)"); !strings.Contains(v, "gauge") {
		t.Errorf("MAWP shown as %q, want gauge", v)
	}
	if v, _ := h.shown("Step verdict"); !strings.HasPrefix(v, "PASS") {
		t.Errorf("wall step verdict %q, want PASS at the top:\n%s", v, h.dump())
	}
	// Beside the MAWP, calc/safety's reminder to enter the thinnest wall
	// (ASME BPVC VIII-1 UG-16(d), pipe under-tolerance).
	if !h.hasLabel("UG-16(d)") {
		t.Errorf("no thinnest-wall reminder beside the MAWP:\n%s", h.dump())
	}
	// Gauge versus absolute: a bare "30 bar" is read as gauge, and the
	// field says so; "30 bara" loads the wall 1.013 bar less.
	h.retype("Design pressure", "30 barg", "30 bar")
	if v, _ := h.shown("Hoop stress (Lamé, inner surface)"); v != "26.58 MPa" {
		t.Errorf("30 bar shown as hoop %q, want the 30 barg value", v)
	}
	if !h.hasLabel("30 bar read as 30 barg = 31.01 bar absolute") {
		t.Errorf("the field does not say how 30 bar was read:\n%s", h.dump())
	}
	h.retype("Design pressure", "30 bar", "30 bara")
	if v, _ := h.shown("Hoop stress (Lamé, inner surface)"); v != "25.69 MPa" {
		// Lamé at 28.99 barg: 26.58 × 28.987/30 = 25.69 MPa.
		t.Errorf("30 bara shown as hoop %q, want 25.69 MPa", v)
	}
	// The vessel of issue 9: 100 mm inside, 3 mm wall, relief at 30 barg.
	h.retype("Design pressure", "30 bara", "30 bar")
	h.retype("Wall thickness", "6 mm", "3 mm")
	h.tap("Done: Wall stress checked at the hot-end temperature")
	h.tap("Next ›")
	// Item 3: the relief against the wall's own MAWP (79.92 barg): pass,
	// as in the terminal.
	h.retype("Relief set pressure", "", "30 barg")
	if v, _ := h.shown("Relief set against the MAWP"); v != "at or below the MAWP" {
		t.Errorf("relief verdict %q:\n%s", v, h.dump())
	}
	if v, _ := h.shown("Step verdict"); !strings.HasPrefix(v, "PASS") {
		t.Errorf("relief step verdict %q, want PASS:\n%s", v, h.dump())
	}
	// A nameplate of 25 barg: the relief is above it, a failure at the top
	// of the step in words.
	h.retype("Vessel MAWP from the nameplate", "", "25 barg")
	if v, _ := h.shown("Step verdict"); !strings.HasPrefix(v, "FAIL") || !strings.Contains(v, "Relief set against the MAWP: above the MAWP") {
		t.Errorf("relief above the nameplate MAWP: verdict %q, want FAIL naming the relief:\n%s", v, h.dump())
	}
	if v, _ := h.shown("Relief set against the MAWP outcome"); v != "FAIL" {
		t.Errorf("relief row badge %q", v)
	}
	h.retype("Vessel MAWP from the nameplate", "25 barg", "")
	h.tap("Done: Relief device set at or below the MAWP")
	h.tap("Next ›")
	// Item 4: UG-99(b) 1.3 × 79.92 barg = 103.9 barg, the terminal's value.
	if v, _ := h.shown("Hydrostatic test, ASME UG-99(b)"); v != "103.9 bar gauge" {
		t.Errorf("hydrostatic test %q:\n%s", v, h.dump())
	}
	// Tick the rest, with a note on the last item.
	for i := 3; i < s.items(); i++ {
		h.tap("Done: " + s.pass.Items[i].Title)
		if i == s.items()-1 {
			h.retype("Note (optional)", "", "vent valve opened, gauge at zero")
			h.tap("Review and save ›")
		} else {
			h.tap("Next ›")
		}
	}
	if !s.pass.Complete() {
		t.Fatalf("ticked %d of %d", s.pass.Ticked(), s.items())
	}
	h.tap("Save to the bench log")
	if st, _ := h.shown("Save status"); !strings.HasPrefix(st, "Saved 2026-12-01 22:30 with 11 of 11") {
		t.Fatalf("save status %q", st)
	}
	// The pass is kept in the log of the saved work, not in the file.
	a.Keeper().Flush()
	kept, bad := bookFor(a.Env()).Kept()
	if len(kept) != 1 || len(bad) != 0 {
		t.Fatalf("log after save: %+v, %v", kept, bad)
	}
	if _, err := os.Stat(path); err == nil {
		t.Errorf("the older bench log file %s was written", path)
	}
	p := kept[0]
	if len(p.Items) != 11 || !p.Items[10].Done || p.Items[10].Note != "vent valve opened, gauge at zero" {
		t.Errorf("saved items %+v", p.Items)
	}
	var hoop *store.Number
	for i, n := range p.Items[1].Numbers {
		if n.Name == "Hoop stress (Lamé, inner surface)" {
			hoop = &p.Items[1].Numbers[i]
		}
	}
	// Lamé at 30 barg, 50 mm, 3 mm: 30e5 × (53² + 50²)/(53² − 50²) =
	// 51.54 MPa (hand calculation).
	if hoop == nil || hoop.Unit != "Pa" || hoop.Shown != "51.54 MPa" || hoop.Value < 51.53e6 || hoop.Value > 51.55e6 {
		t.Errorf("hoop stress in the log: %+v", hoop)
	}
	if len(p.Items[1].Cautions) == 0 || len(p.Cautions) == 0 || p.Cautions[0] != safety.CautionGeneral {
		t.Errorf("cautions in the log: item %q pass %q", p.Items[1].Cautions, p.Cautions)
	}
	// The log keeps what was typed and the checks with their outcomes.
	relief := p.Items[2]
	if !slices.Contains(relief.Inputs, store.ItemInput{Key: "relief-set", Label: "Relief set pressure", Text: "30 barg"}) {
		t.Errorf("relief inputs in the log: %+v", relief.Inputs)
	}
	found := false
	for _, v := range relief.Verdicts {
		if v.Check == "relief_check" && v.Outcome == "pass" && v.Why != "" {
			found = true
		}
	}
	if !found {
		t.Errorf("relief verdicts in the log: %+v", relief.Verdicts)
	}

	// The bench log lists it; export writes the text next to the log.
	h.tap("Open the bench log")
	if a.Current() != "benchlog" {
		t.Fatalf("top is %q after Open the bench log", a.Current())
	}
	if !h.hasLabel("2026-12-01 22:30 · 11 of 11 ticked") {
		t.Fatalf("pass not listed:\n%s", h.dump())
	}
	h.tap("Export as text")
	st, _ := h.shown("Export status")
	txt, ok := strings.CutPrefix(st, "Written to ")
	if !ok {
		t.Fatalf("export status %q", st)
	}
	b, err := os.ReadFile(txt)
	if err != nil {
		t.Fatalf("export: %v\n%s", err, h.dump())
	}
	if !strings.Contains(string(b), "[x]") || !strings.Contains(string(b), "51.54 MPa") || !strings.Contains(string(b), "CAUTIONS") ||
		!strings.Contains(string(b), "PASS relief_check") {
		t.Errorf("exported text:\n%s", b)
	}
}

// TestSafetySaveKeepsDamagedLog: an unreadable library is reported and
// left untouched until the user chooses to set it aside; then the pass is
// saved into a new one and the old bytes are kept under a dated name.
func TestSafetySaveKeepsDamagedLog(t *testing.T) {
	mem := store.NewMemory()
	bad := []byte(`{"format":"tubewright-library","version":1,"log":[{"ti`)
	if err := mem.Save("library", bad); err != nil {
		t.Fatal(err)
	}
	k := on(mem)
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	useBookAt(a.Env(), "")
	a.Open("safety")
	h := newHarness(t, tallPhone, a.Layout)
	settle(h, k)
	s := a.Screen("safety").(*safetyScreen)
	s.now = func() time.Time { return time.Date(2026, 12, 1, 23, 0, 0, 0, time.UTC) }
	h.tap("Review")
	h.tap("Save to the bench log")
	st, _ := h.shown("Save status")
	if !strings.Contains(st, "Not saved") || !strings.Contains(st, "could not be read") {
		t.Fatalf("status %q", st)
	}
	settle(h, k)
	if b, _ := mem.Load("library"); string(b) != string(bad) {
		t.Fatal("the damaged library was changed")
	}
	h.tap("Keep the damaged log aside and save")
	settle(h, k)
	names, _ := mem.Names()
	aside := ""
	for _, n := range names {
		if strings.HasPrefix(n, "library-damaged-") {
			aside = n
		}
	}
	if b, err := mem.Load(aside); err != nil || string(b) != string(bad) {
		t.Fatalf("set-aside document %q: %q, %v (names %q)", aside, b, err, names)
	}
	kept, _ := bookFor(a.Env()).Kept()
	if len(kept) != 1 || kept[0].Items[0].Done || !kept[0].Time.Equal(s.now()) {
		t.Fatalf("new log: %+v", kept)
	}
}

// TestScreenshotSafetyStates pictures the pass at the wall-stress item with
// numbers, the relief item passing and failing, the test and oxygen items,
// the review after a save, and the bench log with that pass, for people to
// look at (SHOT_DIR).
func TestScreenshotSafetyStates(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "benchlog.json")
	env := NewEnv(nil)
	useBookAt(env, path)
	s := newSafetyScreen(env).(*safetyScreen)
	s.now = func() time.Time { return time.Date(2026, 12, 1, 22, 30, 0, 0, time.UTC) }
	f := s.forms
	f.vessel.SetText("allowable-stress", "138 MPa")
	f.vessel.SetText("relief-set", "30 barg")
	f.oxygen.SetText("release-from-cylinder", "50 L")
	f.oxygen.SetText("fill-pressure", "200 bar")
	f.spl.SetText("at-ear", "92 dBA")
	s.goTo(1)
	shoot(t, "safety-wall", env, s)
	shootTall(t, "safety-wall", env, s)
	s.goTo(2)
	shoot(t, "safety-relief", env, s)
	s.goTo(3)
	shoot(t, "safety-test", env, s)
	shootTall(t, "safety-test", env, s)
	s.goTo(6)
	shootTall(t, "safety-cylinder", env, s)
	s.goTo(7)
	shoot(t, "safety-oxygen", env, s)
	shootTall(t, "safety-oxygen", env, s)
	s.goTo(8)
	shootTall(t, "safety-hearing", env, s)
	for i := range s.ticks {
		s.ticks[i].Value = i != 4
		s.pass.Done[i] = i != 4
	}
	s.goTo(s.items())
	s.saveTo(false)
	if !s.saved {
		t.Fatalf("save failed: %s", s.status)
	}
	shoot(t, "safety-review", env, s)
	keepFor(env).keeper.Flush()
	lg := newBenchLogScreen(env)
	shoot(t, "benchlog-pass", env, lg)

	env2 := NewEnv(nil)
	bad := filepath.Join(dir, "damaged.json")
	if err := os.WriteFile(bad, []byte(`{"format":"tubewright-benchlog","vers`), 0o600); err != nil {
		t.Fatal(err)
	}
	useBookAt(env2, bad)
	shoot(t, "benchlog-damaged", env2, newBenchLogScreen(env2))
	// A relief set above the nameplate MAWP: the failure at the top.
	f.vessel.SetText("mawp", "25 barg")
	s.goTo(2)
	shoot(t, "safety-relief-fail", env, s)
	shootTall(t, "safety-relief-fail", env, s)
	s.goTo(s.items())
	shoot(t, "safety-review-fail", env, s)
	f.vessel.SetText("mawp", "")
	// Hydrogen in the rig, carbon dioxide in the cylinder: the gas
	// cautions beside the numbers.
	f.energy.SetText("gas", "hydrogen")
	s.goTo(3)
	shoot(t, "safety-test-hydrogen", env, s)
	shootTall(t, "safety-test-hydrogen", env, s)
	f.oxygen.SetText("gas", "carbon dioxide")
	f.oxygen.SetText("fill-pressure", "40 bar")
	s.goTo(6)
	shootTall(t, "safety-cylinder-co2", env, s)
	s.goTo(7)
	shoot(t, "safety-oxygen-co2", env, s)
	shootTall(t, "safety-oxygen-co2", env, s)
}

// shootTall pictures s at a phone's width and a long page, to see a whole
// step at once (only with SHOT_DIR: a picture for people, checked like the
// others).
func shootTall(t *testing.T, name string, env *Env, s Screen) {
	t.Helper()
	if os.Getenv("SHOT_DIR") == "" {
		return
	}
	t.Run("tall", func(t *testing.T) {
		a := NewApp(nil)
		a.env = env
		env.open = a.Open
		a.screens[sheet.ID(name)] = s
		a.stack = []sheet.ID{sheet.ID(name)}
		shootApp(t, name+"-tallphone", image.Pt(412, 2600), a)
	})
}

// TestSoundLimitsReached: the hearing item says how many of the
// occupational limits of calc/safety a level reaches and names the highest.
// Levels: SPL = 20 log10(A/√2 / 20 µPa), peak = 20 log10(A / 20 µPa) (ISO
// 80000-8 definition, as in calc/safety.Level); limits from EU Directive
// 2003/10/EC Art. 3 and OSHA 29 CFR 1910.95 as listed in calc/safety.
func TestSoundLimitsReached(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		amp          string
		reached      string
		noteContains string
	}{
		// 5 kPa: SPL 164.9 dB, peak 168.0 dB, over all nine (the
		// highest, 140 dB peak, first listed for the EU).
		{"5 kPa", "all 9", "EU 2003/10/EC exposure limit value, peak, 140"},
		// 0.02 Pa: SPL 57.0 dB, peak 60.0 dB, under the lowest (80 dB).
		{"0.02 Pa", "0 of 9", "none of the EU 2003/10/EC and OSHA 1910.95 limits"},
		// 1 Pa: SPL 91.0 dB, peak 94.0 dB: EU 80, 85, 87 and OSHA 85,
		// 90 reached, no peak limit; the highest is OSHA's 90.
		{"1 Pa", "5 of 9", "OSHA 1910.95 permissible exposure limit, 90"},
	} {
		env := NewEnv(nil)
		f := newSafetyForms(env)
		step := newHearingStep(env, f, safety.Item{})
		f.spl.SetText("amplitude", c.amp)
		f.spl.Compute()
		step.refresh()
		res := step.parts[0].results
		got, ok := res.Value("Occupational limits this level reaches")
		if !ok || got != c.reached {
			t.Errorf("%s: limits reached %q (shown %v), want %q", c.amp, got, ok, c.reached)
		}
		if txt := res.String(); !strings.Contains(txt, c.noteContains) {
			t.Errorf("%s: results do not say %q:\n%s", c.amp, c.noteContains, txt)
		}
	}
}

// TestSafetyGasCautions: the caution box beside the stored-energy numbers
// follows the gas picked on screen, through taps on the chips: hydrogen
// brings calc/safety's flammability caution, helium does not; carbon
// dioxide picked on the cylinder item brings its toxicity caution to the
// cylinder and, the released gas being the same input, to the room-oxygen
// item, where the sealed-room model's pressure-rise warning is shown
// beside its number. The caution texts are calc/safety's own (our words,
// no outside source); which gas brings which is calc/safety.GasCautions.
func TestSafetyGasCautions(t *testing.T) {
	a, h := safetyApp(t, filepath.Join(t.TempDir(), "benchlog.json"), "safety", tallPhone)
	s := a.Screen("safety").(*safetyScreen)
	for range 3 {
		h.tap("Next ›")
	}
	if s.step != 3 || s.pass.Items[3].Calc != safety.CalcTestEnergy {
		t.Fatalf("on step %d, want the stored-energy item", s.step)
	}
	h.retype("Vessel MAWP from the nameplate", "", "10 barg")
	if _, ok := h.shown("Stored energy (isentropic)"); !ok {
		t.Fatalf("no stored energy shown:\n%s", h.dump())
	}
	if h.hasLabel(safety.CautionFlammable) {
		t.Fatal("flammability caution shown for helium")
	}
	h.tap("Hydrogen")
	h.frames(2)
	if !h.hasLabel(safety.CautionFlammable) {
		t.Fatalf("hydrogen picked, no flammability caution:\n%s", h.dump())
	}
	if _, ok := h.shown("Stored energy (isentropic)"); !ok {
		t.Fatal("hydrogen: stored energy no longer shown")
	}
	for _, l := range []string{safety.CautionGeneral, safety.CautionTestPressure, safety.CautionStoredEnergy} {
		if !h.hasLabel(l) {
			t.Errorf("hydrogen: caution %.40q no longer shown", l)
		}
	}
	h.tap("Helium")
	h.frames(2)
	if h.hasLabel(safety.CautionFlammable) {
		t.Fatal("helium picked again, flammability caution still shown")
	}
	// With the volume emptied there are no numbers, but the gas is still
	// picked: its caution stays.
	h.tap("Hydrogen")
	h.retype("Gas volume of the rig", "5 L", "")
	if _, ok := h.shown("Stored energy (isentropic)"); ok {
		t.Fatal("stored energy shown without a volume")
	}
	if !h.hasLabel(safety.CautionFlammable) {
		t.Error("hydrogen picked, volume empty: flammability caution gone")
	}

	// Cylinder item: carbon dioxide.
	for s.step < 6 {
		h.tap("Next ›")
	}
	h.retype("Cylinder water capacity", "", "50 L")
	h.retype("Cylinder fill pressure", "", "200 bar")
	h.tap("Carbon dioxide")
	h.frames(2)
	if !h.hasLabel(safety.CautionCarbonDioxide) {
		t.Fatalf("carbon dioxide picked on the cylinder, no toxicity caution:\n%s", h.dump())
	}
	if h.hasLabel(safety.CautionFlammable) {
		t.Error("flammability caution on the cylinder item with carbon dioxide")
	}
	// 200 bar is beyond calc/safety's carbon dioxide model (a full CO2
	// cylinder holds liquid): the error shows and the caution stays. At
	// 40 bar, below the vapour pressure at 15 °C (about 51 bar, from
	// memory of CO2's saturation table), the contents are shown with it.
	if _, ok := h.shown("No result"); !ok {
		t.Error("carbon dioxide at 200 bar: no error shown")
	}
	h.retype("Cylinder fill pressure", "200 bar", "40 bar")
	if _, ok := h.shown("Cylinder contents, with the real-gas correction"); !ok || !h.hasLabel(safety.CautionCarbonDioxide) {
		t.Fatalf("carbon dioxide at 40 bar: contents or caution missing:\n%s", h.dump())
	}
	// Room oxygen: the released gas is the cylinder's.
	h.tap("Next ›")
	h.frames(2)
	if g := s.forms.oxygen.Text("gas"); g != "carbon dioxide" {
		t.Errorf("released gas %q, want the cylinder's carbon dioxide", g)
	}
	if !h.hasLabel(safety.CautionCarbonDioxide) || !h.hasLabel(safety.CautionAsphyxiation) {
		t.Errorf("oxygen item: carbon dioxide or asphyxiation caution missing:\n%s", h.dump())
	}
	h.tap("sealed room (nothing leaves)")
	h.frames(2)
	if !h.hasLabel("a sealed room would rise in pressure by") {
		t.Errorf("oxygen item: the sealed-room pressure rise is not shown:\n%s", h.dump())
	}
	// The saved pass keeps the gas caution of the cylinder's numbers.
	p := s.buildPass()
	if !slices.Contains(p.Items[6].Cautions, safety.CautionCarbonDioxide) || !slices.Contains(p.Cautions, safety.CautionCarbonDioxide) {
		t.Errorf("bench-log pass without the carbon dioxide caution: item %q, pass %q", p.Items[6].Cautions, p.Cautions)
	}
	h.tap("Nitrogen")
	h.frames(2)
	if h.hasLabel(safety.CautionCarbonDioxide) {
		t.Error("nitrogen released, carbon dioxide caution still shown")
	}
}

// TestSafetyLogFollowsSharedInputs: the relief item's checks in the saved
// pass follow a design pressure changed on the wall item after the relief
// item was shown (the two share the vessel calculator), and an item never
// shown logs no inputs. UG-27(c)(1) MAWP of 6 mm at 50 mm and 138 MPa:
// 154.5 barg (see calc/sheet/vessel_test.go), so 160 barg is above it.
func TestSafetyLogFollowsSharedInputs(t *testing.T) {
	a, h := safetyApp(t, filepath.Join(t.TempDir(), "benchlog.json"), "safety", tallPhone)
	s := a.Screen("safety").(*safetyScreen)
	h.tap("Next ›")
	h.retype("Allowable stress at the hot-end temperature", "", "138 MPa")
	h.tap("Next ›")
	h.retype("Relief set pressure", "", "30 barg")
	if v, _ := h.shown("Step verdict"); !strings.HasPrefix(v, "PASS") {
		t.Fatalf("relief verdict %q", v)
	}
	h.tap("‹ Previous")
	h.retype("Design pressure", "30 barg", "160 barg")
	p := s.buildPass()
	got := map[string]string{}
	for _, v := range p.Items[2].Verdicts {
		got[v.Check] = v.Outcome
	}
	if got["mawp_check"] != "fail" || got["relief_check"] != "warn" {
		t.Errorf("relief item verdicts after the design pressure changed: %v", got)
	}
	if len(p.Items[8].Inputs) != 0 || len(p.Items[8].Verdicts) != 0 {
		t.Errorf("hearing item never shown, logged %+v", p.Items[8])
	}
	// The review says which items fail, in words, and marks them.
	h.tap("Review")
	if v, _ := h.shown("Failing checks"); !strings.Contains(v, "2 items have a failing check (item 2, item 3)") {
		t.Errorf("review: failing checks %q:\n%s", v, h.dump())
	}
	if !h.hasLabel("3. Relief device set at or below the MAWP · open, checks FAIL") {
		t.Errorf("review: the relief item is not marked FAIL:\n%s", h.dump())
	}
}
