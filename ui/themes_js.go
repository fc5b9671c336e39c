//go:build js

package ui

import "syscall/js"

// systemPrefersDark reports whether the browser asks for a dark colour
// scheme (the CSS media feature prefers-color-scheme, read once through
// window.matchMedia); false where the browser cannot tell.
func systemPrefersDark() bool {
	mm := js.Global().Get("matchMedia")
	if mm.Type() != js.TypeFunction {
		return false
	}
	q := js.Global().Call("matchMedia", "(prefers-color-scheme: dark)")
	if q.Type() != js.TypeObject {
		return false
	}
	m := q.Get("matches")
	return m.Type() == js.TypeBoolean && m.Bool()
}
