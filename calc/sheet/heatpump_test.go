package sheet

import (
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
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
	if len(r.Cautions) != 4 || !strings.HasPrefix(r.Cautions[0], "Sound:") || !strings.Contains(r.Cautions[0], "3000 Pa") {
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
