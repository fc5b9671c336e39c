package ui

import (
	"gioui.org/layout"
	"gioui.org/widget"
)

// themeToggle is the top bar's theme button: it names the theme a tap
// switches to ("Dark" on the bright theme, "Bright" on the dark one) and
// overrides the system's setting. The choice is kept with the saved work
// (Keeper.SetTheme) and put back when the app starts again; until the
// user chooses, the app follows the system.
type themeToggle struct {
	click    widget.Clickable
	restored bool // the kept choice was applied, or the user chose first
}

// update puts back the kept theme once the storage has loaded, and
// switches the theme of env when the button was tapped.
func (t *themeToggle) update(gtx layout.Context, env *Env) {
	k := keepFor(env).keeper
	if !t.restored && k.Loaded() {
		t.restored = true
		if theme, ok := k.Theme(); ok && (theme == themeDark) != env.Dark() {
			env.SetDark(theme == themeDark)
		}
	}
	for t.click.Clicked(gtx) {
		env.SetDark(!env.Dark())
		t.restored = true
		theme := themeBright
		if env.Dark() {
			theme = themeDark
		}
		k.SetTheme(theme)
	}
}

// layout draws the button the full height of the bar (56 dp, above the
// 48 dp minimum for gloved fingers), at the bar's right end.
func (t *themeToggle) layout(gtx layout.Context, env *Env) layout.Dimensions {
	word, desc := "Dark", "Theme: bright. Switch to the dark theme"
	if env.Dark() {
		word, desc = "Bright", "Theme: dark. Switch to the bright theme"
	}
	return barButton(gtx, env, &t.click, word, desc)
}
