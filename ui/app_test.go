package ui

import (
	"image"
	"math"
	"strings"
	"testing"

	"gioui.org/io/key"

	"tubewright/calc/sheet"
)

// TestAppNavigation opens a screen from the catalog by tapping it, goes
// back with the Back button and with the platform Back key (Android's
// button, the browser's history back), on a phone and on a wide window.
func TestAppNavigation(t *testing.T) {
	for _, size := range []image.Point{{412, 915}, {1440, 900}} {
		a := NewApp(nil)
		h := newHarness(t, size, a.Layout)
		if a.Current() != "" {
			t.Fatalf("%v: app opens on %q, want the catalog", size, a.Current())
		}
		if _, ok := h.byDesc("Working gas"); !ok {
			t.Fatalf("%v: catalog entry not shown:\n%s", size, h.dump())
		}
		h.click(h.mustDesc("Working gas").Desc.Bounds)
		if a.Current() != "gas" {
			t.Fatalf("%v: after tapping Working gas, top is %q", size, a.Current())
		}
		if _, ok := h.byDesc("Temperature"); !ok {
			t.Fatalf("%v: gas screen not drawn:\n%s", size, h.dump())
		}
		h.tap("‹ Back")
		if a.Current() != "" {
			t.Fatalf("%v: Back button left %q on top", size, a.Current())
		}
		a.Open("gas")
		h.frame()
		h.r.Queue(key.Event{Name: key.NameBack, State: key.Press})
		h.frames(2)
		if a.Current() != "" || a.Depth() != 0 {
			t.Fatalf("%v: Back key left %q on top (depth %d)", size, a.Current(), a.Depth())
		}

		// The browser asks whether Back was handled right after the tap
		// that opened a screen, with no frame in between: the frame of
		// the tap must already claim Back. At the catalog it must not, so
		// that Back leaves the app.
		h.clickOnce(h.mustDesc("Working gas").Desc.Bounds)
		if a.Current() != "gas" {
			t.Fatalf("%v: tap did not open the gas screen", size)
		}
		h.r.Queue(key.Event{Name: key.NameBack, State: key.Press})
		if _, claimed := h.r.WakeupTime(); !claimed {
			t.Fatalf("%v: Back not claimed with a screen open", size)
		}
		h.frame()
		if a.Depth() != 0 {
			t.Fatalf("%v: Back did not pop", size)
		}
		h.frame() // the frame Back asked for with Invalidate
		h.r.Queue(key.Event{Name: key.NameBack, State: key.Press})
		if _, claimed := h.r.WakeupTime(); claimed {
			t.Fatalf("%v: Back claimed at the catalog; the platform could not leave the app", size)
		}
	}
}

// TestAppBackStack checks the stack itself: Open pushes (and ignores
// unknown IDs and the screen already on top), Back pops and reports
// whether there was anything to pop, and Env.Open reaches the app.
func TestAppBackStack(t *testing.T) {
	a := NewApp(nil)
	if a.Back() {
		t.Fatal("Back at the catalog reported a pop")
	}
	a.Env().Open("no-such-screen")
	if a.Depth() != 0 {
		t.Fatalf("unknown ID pushed: depth %d", a.Depth())
	}
	a.Env().Open("gas")
	a.Env().Open("gas")
	if a.Depth() != 1 || a.Current() != "gas" {
		t.Fatalf("depth %d top %q, want 1 gas", a.Depth(), a.Current())
	}
	if a.Screen("gas") != a.Screen("gas") {
		t.Fatal("screens are rebuilt instead of kept")
	}
	if !a.Back() || a.Depth() != 0 {
		t.Fatal("Back did not pop the screen")
	}
}

// TestCatalogTable checks the catalog's invariants: unique IDs usable in
// file names, titles and summaries present, constructors that build a
// screen whose title matches the catalog's.
func TestCatalogTable(t *testing.T) {
	seen := map[sheet.ID]bool{}
	env := NewEnv(nil)
	for _, e := range Catalog() {
		if e.ID == "" || strings.ContainsAny(string(e.ID), " /\\.") || seen[e.ID] {
			t.Errorf("bad or duplicate ID %q", e.ID)
		}
		seen[e.ID] = true
		if e.Title == "" || e.Summary == "" || e.New == nil {
			t.Errorf("%s: title, summary and constructor are required", e.ID)
			continue
		}
		if s := e.New(env); s == nil || s.Title() == "" {
			t.Errorf("%s: constructor gave no screen or an untitled one", e.ID)
		}
	}
}

// TestBenchCarriesValues checks the Bench setters (finite, positive values
// only) and its summary text with units. 1 bar = 1e5 Pa by definition (SI
// Brochure, 9th ed., 2019, Table 8).
func TestBenchCarriesValues(t *testing.T) {
	var b Bench
	if b.Summary() != "" {
		t.Fatalf("empty bench summary %q", b.Summary())
	}
	b.SetGas("helium")
	b.SetTemperature(300)
	b.SetPressure(1e6)
	b.SetFrequency(440, "Tube resonance")
	for _, bad := range []float64{0, -1, math.NaN(), math.Inf(1)} {
		b.SetTemperature(bad)
		b.SetPressure(bad)
		b.SetFrequency(bad, "nowhere")
	}
	if b.Temperature != 300 || b.Pressure != 1e6 || b.Frequency != 440 || b.FrequencyFrom != "Tube resonance" {
		t.Fatalf("bench kept %+v after bad values", b)
	}
	if got, want := b.Summary(), "helium, 300 K, 10 bar, 440 Hz (from Tube resonance)"; got != want {
		t.Fatalf("summary %q, want %q", got, want)
	}
}
