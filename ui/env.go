package ui

import (
	"math"
	"strings"
	"sync/atomic"

	"gioui.org/gesture"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// Env is what every screen and widget shares: the theme, a way to ask for a
// new frame from another goroutine, the Bench of carried-over values and
// navigation. One Env exists per App; it is touched only on the UI
// goroutine, except Invalidate, which is safe from any goroutine.
type Env struct {
	// Theme is the material theme (embedded fonts, our palette).
	Theme *material.Theme
	// Colors is the palette beyond the material one (muted text, errors,
	// cautions).
	Colors Colors
	// Invalidate asks the window for a new frame. Safe from any goroutine;
	// never nil.
	Invalidate func()
	// Bench carries the last used gas, temperature, pressure and computed
	// frequency from one screen to the next.
	Bench *Bench

	open   func(id sheet.ID)
	notify atomic.Pointer[func()]
	book   *benchBook // the bench log of the safety screens; see bookFor
	keep   *keepSide  // saved inputs, setups and the log; see keepFor
	handed string     // a device document for the onset editor; see handDevice
	dark   bool       // the dark palette shows; see SetDark
	typing bool       // a text box has the focus; see editorBox
	// boxTaps are the tap gestures of the text boxes; see editorBox.
	boxTaps map[*widget.Editor]*gesture.Click
}

// NewEnv returns an Env with the app theme: dark when the system asks for
// a dark colour scheme (systemPrefersDark), else the bright bench theme.
// invalidate may be nil (tests); Open does nothing until an App owns the
// Env.
func NewEnv(invalidate func()) *Env {
	th, c := NewTheme()
	e := &Env{Theme: th, Colors: c, Bench: new(Bench), open: func(sheet.ID) {}}
	e.setInvalidate(invalidate)
	// Widgets may keep the func value; it always calls the current target.
	e.Invalidate = func() {
		if f := e.notify.Load(); f != nil {
			(*f)()
		}
	}
	if systemPrefersDark() {
		e.SetDark(true)
	}
	return e
}

// setInvalidate changes what Invalidate calls (nil: nothing). Safe from
// any goroutine.
func (e *Env) setInvalidate(f func()) {
	if f == nil {
		f = func() {}
	}
	e.notify.Store(&f)
}

// Open shows the screen with the catalog ID id on top of the current one
// (Back returns). Unknown IDs are ignored.
func (e *Env) Open(id sheet.ID) { e.open(id) }

// Bench is the small carry-over between screens: what the user last used,
// so that, say, the penetration-depth screen can take the resonator's
// frequency in one tap. Zero values and "" mean "not set". Values are SI:
// K, Pa absolute, Hz.
type Bench struct {
	// Gas is the last used gas as text understood by
	// gasprops.ParseMixture: "helium" or "helium:0.7,argon:0.3".
	Gas string
	// Temperature is the last used mean gas temperature in K.
	Temperature float64
	// Pressure is the last used mean (fill) pressure in Pa, absolute.
	Pressure float64
	// Frequency is the last computed or measured operating frequency in Hz.
	Frequency float64
	// FrequencyFrom names the screen that set Frequency, e.g. "Tube
	// resonance", for a "from ..." note beside the value.
	FrequencyFrom string
	// FrequencyPM is the standard uncertainty of a measured Frequency in
	// Hz (set with SetMeasuredFrequency); 0 when none was given.
	FrequencyPM float64

	// values holds every carried value with the text it was given in and
	// the screen it came from (ui/carry.go); the fields above mirror the
	// four operating-point values.
	values map[carryKind]Carried
}

// usable reports whether v is a finite, positive number.
func usable(v float64) bool { return v > 0 && !math.IsInf(v, 0) && !math.IsNaN(v) }

// SetGas records the gas text. Empty text is ignored.
func (b *Bench) SetGas(text string) {
	if text != "" {
		b.put(carryGas, Carried{Text: text})
	}
}

// SetTemperature records a temperature in K; non-finite or non-positive
// values are ignored.
func (b *Bench) SetTemperature(k float64) {
	if usable(k) {
		b.put(carryTemperature, Carried{SI: k})
	}
}

// SetPressure records an absolute pressure in Pa; non-finite or
// non-positive values are ignored.
func (b *Bench) SetPressure(pa float64) {
	if usable(pa) {
		b.put(carryPressure, Carried{SI: pa})
	}
}

// SetFrequency records a frequency in Hz and the title of the screen that
// produced it; non-finite or non-positive values are ignored.
func (b *Bench) SetFrequency(hz float64, from string) {
	if usable(hz) {
		b.put(carryFrequency, Carried{SI: hz, From: from})
	}
}

// SetMeasuredFrequency records a measured frequency in Hz with its
// standard uncertainty pm (Hz; non-finite or negative is taken as none) and
// the title of the screen that measured it.
func (b *Bench) SetMeasuredFrequency(hz, pm float64, from string) {
	if !usable(hz) {
		return
	}
	c := Carried{SI: hz, From: from}
	if usable(pm) {
		c.PM = pm
		c.Text = units.FormatPM(hz, pm, units.DimFrequency)
	}
	b.put(carryFrequency, c)
	b.put(carryMeasured, c)
}

// Summary describes what the Bench holds for people, e.g. "helium, 300 K,
// 10 bar, 262.9 Hz (from Engine onset)"; "" when it holds nothing.
func (b *Bench) Summary() string {
	var parts []string
	if b.Gas != "" {
		parts = append(parts, b.Gas)
	}
	if b.Temperature > 0 {
		parts = append(parts, units.Format(b.Temperature, units.DimTemperature))
	}
	if b.Pressure > 0 {
		if p, err := units.FormatIn(b.Pressure, "bar"); err == nil {
			parts = append(parts, p)
		}
	}
	if b.Frequency > 0 {
		f := units.Format(b.Frequency, units.DimFrequency)
		if b.FrequencyFrom != "" {
			f += " (from " + b.FrequencyFrom + ")"
		}
		parts = append(parts, f)
	}
	return strings.Join(parts, ", ")
}

// near reports whether a and b agree to 1e-9 relative (other screens use
// it too, to see whether a Bench value differs from a field's).
func near(a, b float64) bool {
	return math.Abs(a-b) <= 1e-9*max(math.Abs(a), math.Abs(b))
}
