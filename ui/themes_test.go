package ui

import (
	"image"
	"image/color"
	"math"
	"path/filepath"
	"testing"
)

// Contrast by the WCAG 2.x formula (W3C, Web Content Accessibility
// Guidelines 2.1, https://www.w3.org/TR/WCAG21/, definitions "relative
// luminance" and "contrast ratio"): each sRGB channel c in [0, 1] is
// linearised as c/12.92 when c <= 0.04045, else ((c+0.055)/1.055)^2.4 (the
// sRGB transfer function of IEC 61966-2-1, with the threshold the W3C
// text gives as 0.03928, which selects the same 8-bit levels);
// L = 0.2126 R + 0.7152 G + 0.0722 B; the ratio is (L1+0.05)/(L2+0.05)
// with L1 the lighter. Success criterion 1.4.3 asks 4.5:1 for body text;
// 1.4.11 asks 3:1 for the outlines of controls and for the states that
// tell them apart.

// srgbLinear linearises one 8-bit sRGB channel.
func srgbLinear(v uint8) float64 {
	c := float64(v) / 255
	if c <= 0.04045 {
		return c / 12.92
	}
	return math.Pow((c+0.055)/1.055, 2.4)
}

// luminance is the WCAG relative luminance of an opaque colour, 0 to 1.
func luminance(c color.NRGBA) float64 {
	return 0.2126*srgbLinear(c.R) + 0.7152*srgbLinear(c.G) + 0.0722*srgbLinear(c.B)
}

// contrast is the WCAG contrast ratio of two opaque colours, 1 to 21.
func contrast(a, b color.NRGBA) float64 {
	la, lb := luminance(a), luminance(b)
	if la < lb {
		la, lb = lb, la
	}
	return (la + 0.05) / (lb + 0.05)
}

// TestContrastFormula checks the formula against values fixed by the
// definition itself: black on white is (1+0.05)/(0+0.05) = 21, a colour
// on itself 1, and mid grey #777777 on white 4.48 (L = 0.1845), the
// well-known grey that just misses 4.5:1.
func TestContrastFormula(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		a, b uint32
		want float64
	}{
		{0x000000, 0xffffff, 21},
		{0xffffff, 0x000000, 21},
		{0x3366aa, 0x3366aa, 1},
		{0x777777, 0xffffff, 1.05 / (0.18447 + 0.05)},
	} {
		if got := contrast(rgb(tc.a), rgb(tc.b)); math.Abs(got-tc.want) > 0.005 {
			t.Errorf("contrast(%06x, %06x) = %.4f, want %.4f", tc.a, tc.b, got, tc.want)
		}
	}
}

// TestThemeContrast computes the contrast ratios of both palettes and
// holds them to WCAG 2.1: 4.5:1 for text (1.4.3), 3:1 for the outlines of
// fields and chips against the page and for a selected chip against an
// unselected one (1.4.11).
func TestThemeContrast(t *testing.T) {
	t.Parallel()
	const text, ui = 4.5, 3.0
	for _, p := range []struct {
		name string
		c    Colors
	}{{"bright", brightColors()}, {"dark", darkColors()}} {
		c := p.c
		for _, tc := range []struct {
			what   string
			fg, bg color.NRGBA
			min    float64
		}{
			{"body text on background", c.Text, c.Background, text},
			{"body text on surface", c.Text, c.Surface, text},
			{"muted text on background", c.Muted, c.Background, text},
			{"muted text on surface", c.Muted, c.Surface, text},
			{"muted text on a selected entry", c.Muted, c.Selected, text},
			{"body text on a selected entry", c.Text, c.Selected, text},
			{"error text on background", c.Error, c.Background, text},
			{"error text on surface", c.Error, c.Surface, text},
			{"warning text on surface", c.Warning, c.Surface, text},
			{"text on accent (top bar, buttons, selected chip)", c.OnAccent, c.Accent, text},
			{"caution text on the caution box", c.CautionText, c.CautionBg, text},
			{"caution heading on the caution box", c.CautionEdge, c.CautionBg, text},
			{"PASS badge text", c.OnBadge, c.Pass, text},
			{"CHECK badge text", c.OnBadge, c.Check, text},
			{"FAIL badge text", c.OnBadge, c.Fail, text},
			{"field and chip outline against the page", c.Outline, c.Background, ui},
			{"field and chip outline against a card", c.Outline, c.Surface, ui},
			{"focused field edge against the page", c.Accent, c.Background, ui},
			{"selected chip (accent) against an unselected one (surface)", c.Accent, c.Surface, ui},
			{"selected chip against the page", c.Accent, c.Background, ui},
		} {
			got := contrast(tc.fg, tc.bg)
			t.Logf("%s: %s %.2f:1", p.name, tc.what, got)
			if got < tc.min {
				t.Errorf("%s theme: %s is %.2f:1, want at least %.1f:1", p.name, tc.what, got, tc.min)
			}
		}
	}
}

// TestThemeToggle taps the top bar's theme button through the input
// router: the palette, the material theme and the button's words change,
// and the button is at least 48 dp tall, on the catalog and on an open
// screen.
func TestThemeToggle(t *testing.T) {
	a := NewApp(nil)
	env := a.Env()
	h := newHarness(t, image.Pt(412, 915), a.Layout)
	if env.Dark() || env.Colors != brightColors() {
		t.Fatal("app does not start in the bright theme here (no system setting outside the browser)")
	}
	toDark := "Theme: bright. Switch to the dark theme"
	toBright := "Theme: dark. Switch to the bright theme"
	b := h.mustDesc(toDark).Desc.Bounds
	if b.Dy() < 48 {
		t.Errorf("theme button is %d dp tall, want at least 48", b.Dy())
	}
	h.click(b)
	if !env.Dark() || env.Colors != darkColors() {
		t.Fatalf("after a tap: dark %v, colours %+v", env.Dark(), env.Colors)
	}
	if env.Theme.Palette.Bg != darkColors().Background || env.Theme.Palette.ContrastBg != darkColors().Accent {
		t.Errorf("material palette not switched: %+v", env.Theme.Palette)
	}
	if _, ok := h.byDesc(toDark); ok {
		t.Errorf("button still offers the dark theme")
	}
	// On an open screen the same button switches back.
	h.click(h.mustDesc("Working gas").Desc.Bounds)
	if a.Current() != "gas" {
		t.Fatalf("Working gas did not open: %q", a.Current())
	}
	h.click(h.mustDesc(toBright).Desc.Bounds)
	if env.Dark() || env.Colors != brightColors() || env.Theme.Palette.Bg != brightColors().Background {
		t.Fatalf("second tap did not bring the bright theme back")
	}
	if a.Current() != "gas" {
		t.Errorf("the theme button changed the screen to %q", a.Current())
	}
}

// TestScreenshotThemes pictures the failing relief step in both themes
// (SHOT_DIR/theme-<theme>-safety-relief-fail-<size>.png); checkShot holds
// each picture to its own palette. The catalog and every screen in both
// themes are TestScreenshot's.
func TestScreenshotThemes(t *testing.T) {
	for _, dark := range []bool{false, true} {
		name := "theme-bright-"
		if dark {
			name = "theme-dark-"
		}
		env := NewEnv(nil)
		env.SetDark(dark)
		useBookAt(env, filepath.Join(t.TempDir(), "benchlog.json"))
		s := newSafetyScreen(env).(*safetyScreen)
		s.forms.vessel.SetText("allowable-stress", "138 MPa")
		s.forms.vessel.SetText("relief-set", "30 barg")
		s.forms.vessel.SetText("mawp", "25 barg")
		s.goTo(2)
		shoot(t, name+"safety-relief-fail", env, s)
	}
}
