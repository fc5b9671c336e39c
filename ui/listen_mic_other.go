//go:build !js

package ui

// newRecorder returns nil: the desktop app opens WAV files instead of
// recording (a recorder for the desktop would need an audio library with
// cgo per platform).
func newRecorder(invalidate func()) recorder { return nil }
