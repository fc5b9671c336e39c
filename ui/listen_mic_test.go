package ui

import (
	"image"
	"strings"
	"testing"

	"tubewright/calc/listen"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// fakeMic is a recorder that records the synthetic tap at once, for the
// screen's microphone path outside a browser.
type fakeMic struct {
	state micState
	x     []float64
	stops int
}

func (m *fakeMic) Start()           { m.state = micRecording }
func (m *fakeMic) State() micState  { return m.state }
func (m *fakeMic) Err() error       { return nil }
func (m *fakeMic) Level() float64   { return -12.3 }
func (m *fakeMic) Seconds() float64 { return float64(len(m.x)) / tapRate }
func (m *fakeMic) Stop() (*listen.Recording, error) {
	m.state = micIdle
	m.stops++
	return listen.NewRecording(m.x, tapRate)
}

// TestListenMicrophone: where there is a microphone the screen records
// instead of asking for a path: Record starts it, the level meter shows
// the level and time, Stop analyses what was recorded (off the UI
// goroutine) and shows what the description gives for it.
func TestListenMicrophone(t *testing.T) {
	env := NewEnv(nil)
	s := newListenScreen(env).(*listenScreen)
	mic := &fakeMic{x: tapSamples(tapRate, tapFreq, tapTau, 0.5, 1e-3)}
	s.setMic(mic)
	s.inlineWait = 0
	h := newHarness(t, image.Pt(412, 5000), s.Layout)
	if _, ok := h.byDesc("Recording (WAV file)"); ok {
		t.Error("the path field is shown beside the microphone")
	}
	if !strings.Contains(h.dump(), "nothing is sent anywhere") {
		t.Error("no word on where the sound goes")
	}
	h.tap("Record from the microphone")
	if mic.state != micRecording {
		t.Fatal("Record did not start the microphone")
	}
	h.frame()
	if got, _ := h.shown("Level"); got != "-12 dBFS peak · 1.0 s" {
		t.Errorf("level %q", got)
	}
	if _, ok := h.byDesc("Level meter"); !ok {
		t.Error("no level meter while recording")
	}
	h.tap("Stop and analyse")
	if mic.stops != 1 {
		t.Fatalf("Stop called %d times", mic.stops)
	}
	waitAnalysis(t, h, s)
	name := s.form.Text("file")
	if name != "Microphone recording 1 (1.0 s)" {
		t.Errorf("recording named %q", name)
	}
	rec, _ := listen.NewRecording(mic.x, tapRate)
	want, err := sheet.ListenTo(rec).Evaluate(map[string]string{"file": name})
	if err != nil {
		t.Fatal(err)
	}
	checkTap(t, want)
	f, _ := want.Row("frequency")
	if got, _ := h.shown("Frequency"); got != units.FormatPM(f.Value, f.PM, units.DimFrequency) {
		t.Errorf("frequency shown %q, want %q", got, units.FormatPM(f.Value, f.PM, units.DimFrequency))
	}
	if _, ok := h.byDesc("Level meter"); ok {
		t.Error("the meter stays after Stop")
	}
}

// TestListenMicrophoneSilent: a silent recording from the microphone says
// why it gives no result on screen (the path field is not shown there),
// and a recording's name restored from an earlier session, with no
// recording held, is the starting state rather than an error.
func TestListenMicrophoneSilent(t *testing.T) {
	env := NewEnv(nil)
	s := newListenScreen(env).(*listenScreen)
	mic := &fakeMic{x: make([]float64, tapRate)}
	s.setMic(mic)
	s.inlineWait = 0
	s.form.SetText("file", "Microphone recording 3 (2.0 s)")
	h := newHarness(t, image.Pt(412, 4000), s.Layout)
	if got, _ := h.shown("Progress"); !strings.HasPrefix(got, "No recording yet") {
		t.Errorf("a stale recording name: progress %q", got)
	}
	if _, ok := h.byDesc("No result"); ok {
		t.Error("a stale recording name shows a failure")
	}
	h.tap("Record from the microphone")
	if got, _ := h.shown("Progress"); !strings.HasPrefix(got, "Recording:") {
		t.Errorf("while recording: progress %q", got)
	}
	h.tap("Stop and analyse")
	waitAnalysis(t, h, s)
	got, ok := h.shown("No result")
	if !ok || !strings.Contains(got, "silent recording") || strings.Contains(got, "marked in red") {
		t.Errorf("silent recording: %q (shown %v)", got, ok)
	}
}
