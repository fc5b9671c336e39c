package ui

import (
	"testing"
	"time"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// keepShotApp is an app with a few setups and logged results of the
// working-gas calculator, saved through the keeper as the bar would.
func keepShotApp(t *testing.T) (*App, *Keeper) {
	t.Helper()
	k := NewMemoryKeeper()
	k.WaitLoaded(5 * time.Second)
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	s, _ := sheet.Lookup(sheet.IDGas)
	when := time.Date(2026, 11, 30, 9, 15, 0, 0, time.Local)
	for i, st := range []struct{ name, gas, p string }{
		{"12 bar He-Ar rig", "helium:0.7,argon:0.3", "12 bar"},
		{"Air at the bench", "air", "1 atm"},
		{"Helium fill, cold morning", "helium", "10 bar"},
	} {
		texts := map[string]string{"gas": st.gas, "temperature": "285 K", "pressure": st.p, "non-ideal": "false"}
		k.Do("Saving", opSaveSetup(store.Setup{Name: st.name, Calculator: string(sheet.IDGas), Inputs: texts, Saved: when.Add(time.Duration(i) * 26 * time.Hour)}))
		res, err := s.Evaluate(texts)
		if err != nil {
			t.Fatal(err)
		}
		e := store.EntryOf(s, texts, res, []string{"after refilling", "", "reading before the run"}[i])
		e.Time = when.Add(time.Duration(i)*26*time.Hour + 40*time.Minute)
		k.Do("Logging", opLog(e))
	}
	k.Flush()
	return a, k
}

// TestScreenshotKeep pictures the setups panel of a calculator and the
// Saved work page (an entry opened) at phone, tablet and desktop sizes.
func TestScreenshotKeep(t *testing.T) {
	for _, sz := range shotSizes {
		t.Run("setups-"+sz.name, func(t *testing.T) {
			a, _ := keepShotApp(t)
			a.Open(sheet.IDGas)
			b := keepFor(a.env).bar(a.env, sheet.IDGas)
			b.panel = true
			b.selected = "Air at the bench"
			b.name.SetText(b.selected)
			shootApp(t, "keep-setups-"+sz.name, sz.size, a)
		})
		t.Run("bar-"+sz.name, func(t *testing.T) {
			a, _ := keepShotApp(t)
			a.Open(sheet.IDGas)
			b := keepFor(a.env).bar(a.env, sheet.IDGas)
			b.noteShown = true
			b.logged = time.Now()
			b.say("Logged this result at 10:02:11.", false)
			shootApp(t, "keep-bar-"+sz.name, sz.size, a)
		})
		t.Run("saved-"+sz.name, func(t *testing.T) {
			a, k := keepShotApp(t)
			a.Open(sheet.IDSaved)
			s := a.Screen(sheet.IDSaved).(*savedScreen)
			lib := k.Library()
			e := lib.Log[len(lib.Log)-1]
			s.entry = &e
			shootApp(t, "keep-saved-"+sz.name, sz.size, a)
		})
	}
}
