package ui

import (
	"image"
	"strings"
	"testing"
	"time"

	"tubewright/ui/store"
)

// TestThemeKeptAcrossRestarts chooses the dark theme with the top bar's
// button, starts a new app on the same storage and finds it dark; choosing
// bright again is kept too.
func TestThemeKeptAcrossRestarts(t *testing.T) {
	mem := store.NewMemory()
	start := func() (*App, *harness, *Keeper) {
		t.Helper()
		k := on(mem)
		if !k.WaitLoaded(5 * time.Second) {
			t.Fatal("memory keeper did not load")
		}
		a := NewApp(nil)
		a.UseKeeper(k, nil)
		h := newHarness(t, image.Pt(412, 915), a.Layout)
		h.frames(2)
		return a, h, k
	}
	a, h, k := start()
	if a.env.Dark() {
		t.Fatal("a fresh app on empty storage starts dark here (the system setting is bright outside the browser)")
	}
	h.click(h.mustDesc("Theme: bright. Switch to the dark theme").Desc.Bounds)
	if !a.env.Dark() {
		t.Fatal("the theme button did not switch to dark")
	}
	settle(h, k)
	data, err := mem.Load(settingsDoc)
	if err != nil || !strings.Contains(string(data), `"theme": "dark"`) {
		t.Fatalf("stored settings %q (%v)", data, err)
	}

	a2, h2, k2 := start()
	if !a2.env.Dark() {
		t.Fatal("the dark theme was not kept across a restart")
	}
	h2.click(h2.mustDesc("Theme: dark. Switch to the bright theme").Desc.Bounds)
	settle(h2, k2)
	a3, _, _ := start()
	if a3.env.Dark() {
		t.Fatal("the bright theme chosen after dark was not kept")
	}
}

// TestThemeSettingsDamaged: a settings document that does not read is kept
// under another name, reported, and the app starts with the system theme.
func TestThemeSettingsDamaged(t *testing.T) {
	mem := store.NewMemory()
	bad := []byte(`{"format":"tubewright-settings","version":1,"theme":"purple"}`)
	if err := mem.Save(settingsDoc, bad); err != nil {
		t.Fatal(err)
	}
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	if _, ok := k.Theme(); ok {
		t.Error("a damaged settings document gave a theme")
	}
	probs := k.Problems()
	if len(probs) != 1 || !strings.Contains(probs[0].Error(), "settings-damaged-") {
		t.Fatalf("problems %v, want the settings kept aside", probs)
	}
	names, _ := mem.Names()
	kept := false
	for _, n := range names {
		if strings.HasPrefix(n, "settings-damaged-") {
			data, _ := mem.Load(n)
			kept = string(data) == string(bad)
		}
	}
	if !kept {
		t.Errorf("the damaged settings were not kept aside: %v", names)
	}
}
