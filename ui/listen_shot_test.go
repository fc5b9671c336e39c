package ui

import (
	"path/filepath"
	"testing"
)

// TestScreenshotListen pictures Listen to the tube with a tap analysed
// from a file (desktop), recording from a microphone with its level meter,
// and a recording that clipped, at phone, tablet and desktop sizes.
func TestScreenshotListen(t *testing.T) {
	dir := t.TempDir()
	tap := filepath.Join(dir, "tap.wav")
	writeWAV16(t, tap, tapSamples(tapRate, tapFreq, tapTau, 0.5, 1e-3), tapRate)
	loud := filepath.Join(dir, "loud.wav")
	writeWAV16(t, loud, tapSamples(tapRate, tapFreq, tapTau, 1.6, 1e-3), tapRate)

	t.Run("file", func(t *testing.T) {
		env := NewEnv(nil)
		s := newListenScreen(env).(*listenScreen)
		s.setMic(nil)
		s.form.SetText("file", tap)
		shoot(t, "listen-file", env, s)
	})
	t.Run("clipped", func(t *testing.T) {
		env := NewEnv(nil)
		s := newListenScreen(env).(*listenScreen)
		s.setMic(nil)
		s.form.SetText("file", loud)
		shoot(t, "listen-clipped", env, s)
	})
	t.Run("recording", func(t *testing.T) {
		env := NewEnv(nil)
		s := newListenScreen(env).(*listenScreen)
		mic := &fakeMic{x: tapSamples(tapRate, tapFreq, tapTau, 0.5, 1e-3)}
		mic.Start()
		s.setMic(mic)
		shoot(t, "listen-recording", env, s)
	})
}
