//go:build js && wasm

package main

import "syscall/js"

// mark sets a performance mark named name in the page, so the browser's
// timeline (and the size table of `make web-size`) shows how long each step
// of the start took: "tw-main" when main begins (the Go runtime and every
// package's init done), "tw-app" when the app is built, "tw-frame" when the
// first frame has been handed to the browser.
func mark(name string) {
	perf := js.Global().Get("performance")
	if perf.Truthy() && perf.Get("mark").Truthy() {
		perf.Call("mark", name)
	}
}
