package ui

import (
	"path/filepath"
	"testing"
)

// TestScreenshotListen pictures Listen to the tube with a tap analysed
// from a file (desktop), a recording that clipped, and recording from a
// microphone with its level meter, at phone, tablet and desktop sizes.
func TestScreenshotListen(t *testing.T) {
	dir := t.TempDir()
	tap := filepath.Join(dir, "tap.wav")
	writeWAV16(t, tap, tapSamples(tapRate, tapFreq, tapTau, 0.5, 1e-3), tapRate)
	loud := filepath.Join(dir, "loud.wav")
	writeWAV16(t, loud, tapSamples(tapRate, tapFreq, tapTau, 1.6, 1e-3), tapRate)
	recording := &fakeMic{x: tapSamples(tapRate, tapFreq, tapTau, 0.5, 1e-3)}
	recording.Start()
	for _, c := range []struct {
		name, file string
		mic        recorder
	}{
		{"file", tap, nil},
		{"clipped", loud, nil},
		{"recording", "", recording},
	} {
		t.Run(c.name, func(t *testing.T) {
			env := NewEnv(nil)
			s := newListenScreen(env).(*listenScreen)
			s.setMic(c.mic)
			if c.file != "" {
				s.form.SetText("file", c.file)
			}
			shoot(t, "listen-"+c.name, env, s)
		})
	}
}
