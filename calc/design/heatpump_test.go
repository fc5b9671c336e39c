package design

import (
	"bytes"
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
)

// A small air-filled heat pump like the built-in demo: a 40 mm half-wave
// tube at 1 atm, a 3 kPa drive, 20 K wanted.
var pumpTarget = HeatPumpTarget{Frequency: 400, Gas: "air", MeanPressure: 101325, Ambient: 293, Diameter: 0.04, DriverAmplitude: 3000, Span: 20}

// TestHeatPumpDesign: the written heat pump reads back and, solved by
// linear.HeatPump with its defaults, gives the design's span; the span
// meets the target; the drive frequency is the resonance of the cooled
// tube; the tube at ambient resonates at the target.
func TestHeatPumpDesign(t *testing.T) {
	t.Parallel()
	r, err := DesignHeatPump(pumpTarget, nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := r.File.Marshal()
	if err != nil {
		t.Fatal(err)
	}
	d, err := linear.ParseDevice(bytes.NewReader(b))
	if err != nil {
		t.Fatalf("the written heat pump does not read back: %v\n%s", err, b)
	}
	hp, err := linear.HeatPump(d, nil)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(hp.TemperatureSpan, r.Span, 1e-8) {
		t.Errorf("file span %.9g K, design %.9g K", hp.TemperatureSpan, r.Span)
	}
	if r.Span < 20 || r.Margin != r.Span-20 {
		t.Errorf("span %.2f K, margin %.2f K: want at least 20 K", r.Span, r.Margin)
	}
	// Drive frequency: the mode of the device with a rigid start and its
	// cold parts fixed at the solved cold temperature (linear.Mode).
	cold := *d
	cold.Parts = append([]linear.Part(nil), d.Parts...)
	for i := range cold.Parts {
		if cold.Parts[i].Temp == linear.TempCold {
			cold.Parts[i].Temp, cold.Parts[i].Temperature = linear.TempFixed, hp.ColdTemperature
		}
	}
	m, err := linear.Mode(&cold, 0, &linear.Settings{FrequencyGuess: r.DriveFrequency})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(m.Frequency-r.DriveFrequency) > 1e-4*r.DriveFrequency {
		t.Errorf("drive frequency %.4f Hz, resonance of the cooled tube %.4f Hz", r.DriveFrequency, m.Frequency)
	}
	// At ambient the tube resonates at the target (the resonator was
	// solved for it).
	amb, err := linear.Mode(d, 0, &linear.Settings{FrequencyGuess: 400})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(amb.Frequency-400) > 0.01*400 {
		t.Errorf("ambient resonance %.3f Hz, want 400 Hz within 1 %%", amb.Frequency)
	}
	// Parts in the project's words and order.
	want := []string{"driver", "tube", "exchanger", "stack", "exchanger", "tube", "closed-end"}
	for i, p := range r.File.PartsList {
		if p.Kind != want[i] {
			t.Errorf("part %d is %s, want %s", i+1, p.Kind, want[i])
		}
	}
}

// TestHeatPumpUnreachable: a span no design reaches at this drive gives an
// error with the best span found, and the nearest design.
func TestHeatPumpUnreachable(t *testing.T) {
	t.Parallel()
	tg := pumpTarget
	tg.Span = 0
	tg.ColdTemperature = 205 // a span of 88 K at a 3 kPa drive
	r, err := DesignHeatPump(tg, nil)
	var ue *UnreachableError
	if !errors.As(err, &ue) {
		t.Fatalf("err = %v, want *UnreachableError", err)
	}
	if r.Pump == nil || r.Span <= 0 || r.Span >= 293-205 || r.Margin >= 0 {
		t.Fatalf("nearest design span %.2f K, margin %.2f K", r.Span, r.Margin)
	}
	if !strings.Contains(err.Error(), "largest span found") {
		t.Errorf("message does not name the problem: %v", err)
	}
}
