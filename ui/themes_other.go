//go:build !js

package ui

// systemPrefersDark reports the system's colour scheme where the app can
// read it. Gio v0.10.3 passes no light or dark setting to the app on
// desktop or Android, so outside the browser the bright bench theme is the
// start and the top bar's theme button the way to change it.
func systemPrefersDark() bool { return false }
