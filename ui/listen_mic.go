package ui

import (
	"fmt"
	"image"
	"math"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/listen"
)

// recorder is a microphone the app records from (the browser's, through
// getUserMedia; see listen_mic_js.go). Its methods are called on the UI
// goroutine; it calls the invalidate function it was made with (from any
// goroutine) when its state or level changes. Nothing it records leaves
// the device.
type recorder interface {
	// Start asks for the microphone (the platform may ask the user) and
	// starts recording; the answer comes later through State.
	Start()
	// State says what the recorder is doing; Err why it failed.
	State() micState
	Err() error
	// Level is the peak of the last block, dBFS (full scale 0), and
	// Seconds the length recorded so far.
	Level() float64
	Seconds() float64
	// Stop ends the recording, lets the microphone go and returns what was
	// recorded.
	Stop() (*listen.Recording, error)
}

// micState is what a recorder is doing.
type micState int

const (
	micIdle      micState = iota // nothing asked yet, or stopped
	micAsking                    // waiting for the user's permission
	micRecording                 // samples arriving
	micFailed                    // refused or not available: see Err
)

// micMaxSeconds is the longest recording from the microphone: five
// minutes cover an engine warming up to onset and keep the samples held
// (4 bytes each while recording, 8 while analysing) near 100 MB at 48 kHz.
const micMaxSeconds = 300.0

// micView is the microphone's part of the listen screen: one button that
// starts and stops, the live level meter, and what happens to the sound.
type micView struct {
	env   *Env
	mic   recorder
	btn   widget.Clickable
	count int
	err   error
}

func newMicView(env *Env, r recorder) *micView { return &micView{env: env, mic: r} }

// update handles the button and the time limit; when a recording has just
// been stopped it returns it with a name for the file input.
func (m *micView) update(gtx layout.Context) (*listen.Recording, string, bool) {
	stop := m.mic.State() == micRecording && m.mic.Seconds() >= micMaxSeconds
	if m.btn.Clicked(gtx) {
		switch m.mic.State() {
		case micRecording:
			stop = true
		case micIdle, micFailed:
			m.err = nil
			m.mic.Start()
		}
	}
	if !stop {
		return nil, "", false
	}
	rec, err := m.mic.Stop()
	if err != nil {
		m.err = err
		return nil, "", false
	}
	m.count++
	return rec, fmt.Sprintf("Microphone recording %d (%.1f s)", m.count, rec.Duration()), true
}

// Layout draws the button, the meter while recording and the privacy note.
func (m *micView) Layout(gtx layout.Context) layout.Dimensions {
	st := m.mic.State()
	label := "Record from the microphone"
	switch st {
	case micAsking:
		label = "Waiting for the microphone…"
	case micRecording:
		label = "Stop and analyse"
	}
	err := m.err
	if st == micFailed {
		err = m.mic.Err()
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			b := material.Button(m.env.Theme, &m.btn, label)
			b.TextSize = unit.Sp(17)
			if st == micRecording {
				b.Background = m.env.Colors.Fail
			}
			return b.Layout(atTarget(gtx))
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			if st != micRecording {
				return layout.Dimensions{}
			}
			return layout.Inset{Top: 10}.Layout(gtx, m.meter)
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			if err == nil {
				return layout.Dimensions{}
			}
			l := material.Body2(m.env.Theme, "Microphone: "+err.Error())
			l.Color = m.env.Colors.Error
			return layout.Inset{Top: 6}.Layout(gtx, Described("Microphone problem", l.Layout))
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			return layout.Inset{Top: 6}.Layout(gtx, Note(m.env, fmt.Sprintf(
				"The sound stays on this device: it is analysed here and nothing is sent anywhere. At most %.0f minutes; tap the tube or switch its drive off, and let it ring out before you stop.",
				micMaxSeconds/60)))
		}),
	)
}

// meterFloor is the level at the meter's left end, dBFS.
const meterFloor = -60.0

// meter draws the live level as a bar from meterFloor to 0 dBFS, amber from
// -6 dBFS and red from -1 dBFS (near clipping), with the level and time in
// words beside it.
func (m *micView) meter(gtx layout.Context) layout.Dimensions {
	lv := m.mic.Level()
	if !finite(lv) {
		lv = meterFloor
	}
	frac := math.Max(0, math.Min(1, (lv-meterFloor)/-meterFloor))
	col := m.env.Colors.Pass
	switch {
	case lv >= listen.NearFullScaleDB:
		col = m.env.Colors.Fail
	case lv >= -6:
		col = m.env.Colors.Check
	}
	words := fmt.Sprintf("%.0f dBFS peak · %.1f s", math.Max(lv, meterFloor), m.mic.Seconds())
	if lv >= listen.NearFullScaleDB {
		words += " · too loud: move away or lower the gain"
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(Described("Level meter", func(gtx layout.Context) layout.Dimensions {
			size := image.Pt(gtx.Constraints.Max.X, gtx.Dp(18))
			box(gtx, size, m.env.Colors.Surface, m.env.Colors.Divider, gtx.Dp(4), gtx.Dp(1))
			fill(gtx, col, image.Pt(int(frac*float64(size.X)), size.Y))
			return layout.Dimensions{Size: size}
		})),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			l := material.Body2(m.env.Theme, words)
			l.Color = m.env.Colors.Text
			return layout.Inset{Top: 4}.Layout(gtx, Described("Level", l.Layout))
		}),
	)
}
