package sheet

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// TestHeatPumpSheetThermodynamics: the example pump through the
// description, with a load. Its rows obey the definitions of any
// thermodynamics text: COP = load / acoustic power, the Carnot COP of a
// refrigerator Tc / (Ta - Tc), span = Ta - Tc (Ta the device's ambient
// 293 K); and they are calc/linear's solve unchanged (whose span is checked
// against Swift 1988's short-stack total power, see
// calc/linear/heatpump_test.go).
func TestHeatPumpSheetThermodynamics(t *testing.T) {
	t.Parallel()
	r := devEval(t, heatPumpSheet, map[string]string{"example": "heatpump", "load": "100 mW"})
	get := func(k string) float64 { return devRow(t, r, k).Value }
	tc, span, w := get("cold_temperature"), get("temperature_span"), get("acoustic_power")
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"span = Ta - Tc", span, 293 - tc},
		{"COP = Q / W", get("cop"), 0.1 / w},
		{"COP / Carnot", get("cop_relative_to_carnot"), (0.1 / w) / (tc / span)},
	} {
		if !scalar.EqualWithinRel(c.got, c.want, 1e-9) {
			t.Errorf("%s: %g, want %g", c.name, c.got, c.want)
		}
	}
	d, _ := linear.Example("heatpump")
	want, err := linear.HeatPump(d, &linear.HeatPumpSettings{CoolingLoad: 0.1})
	if err != nil {
		t.Fatal(err)
	}
	if tc != want.ColdTemperature || get("driver_pressure_amplitude") != want.DriverPressure {
		t.Errorf("cold %g K, driver %g Pa; calc/linear %g K, %g Pa", tc, get("driver_pressure_amplitude"), want.ColdTemperature, want.DriverPressure)
	}
	if len(r.Cautions) != 4 || !strings.HasPrefix(r.Cautions[0], "Sound:") || !strings.Contains(r.Cautions[0], "3 kPa") {
		t.Errorf("cautions %q", r.Cautions)
	}
}

// TestHeatPumpSheetSpread: a ± on the load reaches the span to first
// order: it grows in proportion to the ± typed, and it matches a central
// difference of the span over ±10 mW (within 2 %). More load, less span.
func TestHeatPumpSheetSpread(t *testing.T) {
	t.Parallel()
	span := func(load string) Row {
		return devRow(t, devEval(t, heatPumpSheet, map[string]string{"example": "heatpump", "load": load}), "temperature_span")
	}
	s1, s2 := span("100 mW ± 10 mW").PM, span("100 mW ± 20 mW").PM
	if !(s1 > 0) || !scalar.EqualWithinRel(s2, 2*s1, 0.01) {
		t.Errorf("span ± %g for ±10 mW, %g for ±20 mW: want > 0 and twice", s1, s2)
	}
	lo, hi := span("90 mW").Value, span("110 mW").Value
	if !(hi < lo) {
		t.Errorf("span %g K at 110 mW is not below %g K at 90 mW", hi, lo)
	}
	if !scalar.EqualWithinRel(s1, (lo-hi)/2, 0.02) {
		t.Errorf("span ± %g, central difference %g", s1, (lo-hi)/2)
	}
}

// TestHeatPumpSheetSweep: the sweep is a table of the solve at each drive
// frequency; its first point is the solve at that frequency.
func TestHeatPumpSheetSweep(t *testing.T) {
	t.Parallel()
	r := devEval(t, heatPumpSheet, map[string]string{"example": "heatpump", "sweep-frequency": "380Hz:420Hz:3"})
	if r.Table == nil || len(r.Table.Rows) != 3 {
		t.Fatalf("sweep table %+v", r.Table)
	}
	one := devEval(t, heatPumpSheet, map[string]string{"example": "heatpump", "frequency": "380 Hz"})
	if got, want := r.Table.Rows[0][2], devRow(t, one, "temperature_span").Value; !scalar.EqualWithinRel(got, want, 1e-9) {
		t.Errorf("span at 380 Hz in the sweep %g K, alone %g K", got, want)
	}
}

// TestHeatPumpSheetBadInput: each bad input names its key.
func TestHeatPumpSheetBadInput(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name  string
		texts map[string]string
		key   string
		words string
	}{
		{"engine is no heat pump", map[string]string{"example": "engine"}, "example", "driver"},
		{"negative load", map[string]string{"example": "heatpump", "load": "-1 W"}, "load", "-1"},
		{"frequency with ±", map[string]string{"example": "heatpump", "frequency": "400 Hz ± 5 Hz"}, "frequency", "±"},
		{"sweep with profile", map[string]string{"example": "heatpump", "sweep-frequency": "300Hz:400Hz", "profile": "true"}, "sweep-frequency", "combined"},
		{"no device", map[string]string{}, "device", "required"},
	} {
		_, err := heatPumpSheet.Evaluate(c.texts)
		fes := FieldErrors(err)
		if len(fes) == 0 || fes[0].Key != c.key || !strings.Contains(err.Error(), c.words) {
			t.Errorf("%s: error %v, want one about %s saying %q", c.name, err, c.key, c.words)
		}
	}
}

// TestHeatPumpSheetBestDrive: the best drive frequency of the example pump
// (zero load).
//
// Against the same solver, brute force: calc/linear's span on a dense grid
// every 0.05 Hz over 405 to 420 Hz (the coarse search's bracket around the
// peak). The refined frequency must lie within one grid step of the grid's
// best, and its span must be no lower than the grid's best less 1 mK (the
// refinement finds the top of the same smooth curve).
//
// Outside check: the half-wave resonance c/(2L) of the bare closed-closed
// tube of the pump's total length, in air at the ambient temperature
// (calc/resonator's TubeFrequency, checked there against Kinsler et al.,
// "Fundamentals of Acoustics", 4th ed. 2000, sec. 10.2). With the driver's
// pressure amplitude held, the stack close to the driver sits nearest a
// pressure antinode, with the largest ratio of pressure to velocity, when
// the whole tube is a half-wave standing wave, so the span peaks near that
// resonance. The stack's porosity and the colder gas of the cold side
// shift the peak by a few percent; the tolerance is 3 % (the example is at
// about 1 %).
func TestHeatPumpSheetBestDrive(t *testing.T) {
	t.Parallel()
	r := devEval(t, heatPumpSheet, map[string]string{"example": "heatpump"})
	fBest, sBest := devRow(t, r, "best_drive_frequency").Value, devRow(t, r, "best_span").Value
	if !strings.Contains(devRow(t, r, "best_drive_frequency").Note, "Brent") {
		t.Errorf("best drive frequency not refined: note %q, warnings %q", devRow(t, r, "best_drive_frequency").Note, r.Warnings)
	}
	d, err := linear.Example("heatpump")
	if err != nil {
		t.Fatal(err)
	}
	const step = 0.05
	gridF, gridS := 0.0, math.Inf(-1)
	for _, p := range linear.SpanVsFrequency(d, linear.Grid(405, 420, 301, false), nil) {
		if p.Err != nil {
			t.Fatalf("%g Hz: %v", p.Frequency, p.Err)
		}
		if p.Result.TemperatureSpan > gridS {
			gridF, gridS = p.Frequency, p.Result.TemperatureSpan
		}
	}
	if math.Abs(fBest-gridF) > step || sBest < gridS-1e-3 {
		t.Errorf("best %.3f Hz, %.4f K; dense grid %.3f Hz, %.4f K (want within %g Hz, span no lower by 1 mK)", fBest, sBest, gridF, gridS, step)
	}
	length := 0.0
	for _, p := range d.Parts {
		length += p.Length
	}
	g, err := d.Gas.Properties(units.Temperature(d.AmbientTemperature), units.Pressure(d.MeanPressure), nil)
	if err != nil {
		t.Fatal(err)
	}
	res, err := resonator.TubeFrequency(resonator.Tube{Ends: resonator.ClosedClosed, Mode: 1, Length: length, Radius: d.Parts[1].Diameter / 2}, g)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(fBest, res.Frequency, 0.03) {
		t.Errorf("best %.1f Hz, bare tube's half-wave resonance %.1f Hz (L = %.3f m): want within 3 %%", fBest, res.Frequency, length)
	}
	// The best span is at least the span at the driver's own frequency.
	if span := devRow(t, r, "temperature_span").Value; sBest < span {
		t.Errorf("best span %.3f K below the span %.3f K at the driver's frequency", sBest, span)
	}
}
