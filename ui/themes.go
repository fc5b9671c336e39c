package ui

// The two palettes. Contrast ratios (WCAG 2.1 formula) are checked in
// themes_test.go: body, muted, error and badge text at least 4.5:1,
// outlines of fields and chips and a selected chip against an unselected
// one at least 3:1. The colours are our own choice.

// brightColors is the bench theme: a near-white page with dark text and
// outlines strong enough to read in sunlight and under workshop lamps. The
// accent, the selected shade and the badges are the colours the browser
// tests (assets/web/browsertest) look for on screen: change them together.
func brightColors() Colors {
	return Colors{
		Background:  rgb(0xf7f6f2),
		Surface:     rgb(0xffffff),
		Text:        rgb(0x111a20),
		Muted:       rgb(0x4a5560),
		Accent:      rgb(0x23636b),
		OnAccent:    rgb(0xffffff),
		Divider:     rgb(0xc9c4b8),
		Outline:     rgb(0x6b7479),
		Error:       rgb(0xa3261f),
		Warning:     rgb(0x7a4f00),
		CautionBg:   rgb(0xfff3d1),
		CautionEdge: rgb(0x9a5f00),
		CautionText: rgb(0x3d2a00),
		Selected:    rgb(0xd6e8e9),
		Pass:        rgb(0x1b6e33),
		Check:       rgb(0x8a5300),
		Fail:        rgb(0xb00020),
		OnBadge:     rgb(0xffffff),
	}
}

// darkColors is the dark theme, for a dim lab or a phone at night: light
// text on a near-black page, the accent lightened so that it still reads.
// The check badges keep their bright-theme colours and white words, so a
// FAIL looks the same in both themes.
func darkColors() Colors {
	return Colors{
		Background:  rgb(0x121619),
		Surface:     rgb(0x1b2126),
		Text:        rgb(0xe9edf0),
		Muted:       rgb(0xa9b4bc),
		Accent:      rgb(0x6cc5cc),
		OnAccent:    rgb(0x0b1f22),
		Divider:     rgb(0x363f46),
		Outline:     rgb(0x7d8a94),
		Error:       rgb(0xff8a80),
		Warning:     rgb(0xf0b24a),
		CautionBg:   rgb(0x2e2410),
		CautionEdge: rgb(0xe0a030),
		CautionText: rgb(0xf6e3b8),
		Selected:    rgb(0x24474b),
		Pass:        rgb(0x1b6e33),
		Check:       rgb(0x8a5300),
		Fail:        rgb(0xb00020),
		OnBadge:     rgb(0xffffff),
	}
}

// SetDark switches the palette: dark true for the dark theme, false for
// the bright bench theme. It changes the shared material theme in place,
// so widgets holding e.Theme see the new colours in the next frame.
func (e *Env) SetDark(dark bool) {
	e.dark = dark
	c := brightColors()
	if dark {
		c = darkColors()
	}
	e.Colors = c
	applyPalette(e.Theme, c)
	e.Invalidate()
}

// Dark reports whether the dark theme is showing.
func (e *Env) Dark() bool { return e.dark }
