package ui

import (
	"image"
	"testing"
)

// TestSideListToggle: the catalog sits beside the screen on a tablet and
// starts hidden on a phone held sideways; the bar's button hides and shows
// it, and the screen takes the width it leaves. A phone held upright has
// no such button.
func TestSideListToggle(t *testing.T) {
	cases := []struct {
		name   string
		size   image.Point
		beside bool // at the start
	}{
		{"tablet", image.Pt(1024, 768), true},
		{"desktop", image.Pt(1440, 900), true},
		{"phone-landscape", image.Pt(915, 412), false},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			a := NewApp(nil)
			a.Open("gas")
			h := newHarness(t, c.size, a.Layout)
			h.frames(2)
			catalogShown := func() bool { _, ok := h.control("Tube resonance"); return ok }
			left := func() int { r, _ := h.control("Helium"); return r.Min.X }
			if got := catalogShown(); got != c.beside {
				t.Fatalf("catalog beside the screen at the start: %v, want %v", got, c.beside)
			}
			start := left()
			word := "Hide list"
			if !c.beside {
				word = "Show list"
			}
			h.tap(word)
			h.frames(2)
			if got := catalogShown(); got == c.beside {
				t.Fatalf("after %q the catalog beside the screen: %v", word, got)
			}
			if moved := left(); c.beside && moved >= start || !c.beside && moved <= start {
				t.Errorf("after %q the first gas chip moved from x=%d to x=%d", word, start, moved)
			}
			if a.Current() != "gas" {
				t.Errorf("after %q the screen is %q, want gas", word, a.Current())
			}
			back := "Show list"
			if !c.beside {
				back = "Hide list"
			}
			h.tap(back)
			h.frames(2)
			if got := catalogShown(); got != c.beside {
				t.Errorf("after %q the catalog beside the screen: %v, want %v", back, got, c.beside)
			}
		})
	}
	a := NewApp(nil)
	h := newHarness(t, image.Pt(412, 915), a.Layout)
	for _, word := range []string{"Hide list", "Show list"} {
		if _, ok := h.control(word); ok {
			t.Errorf("a phone held upright shows %q", word)
		}
	}
}
