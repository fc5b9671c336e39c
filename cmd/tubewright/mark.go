//go:build !js

package main

// mark does nothing on the desktop; in the browser it sets a performance
// mark (mark_js.go).
func mark(string) {}
