package sheet

import (
	"slices"
	"strings"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// Helpers shared by the safety calculators (vessel, energy, oxygen, spl).

// gaugeHint is the hint of every pressure input of the safety checks.
const gaugeHint = "a bare pressure is gauge (30 bar = 30 barg); absolute: 31 bara, 450 psia"

// SafetyPressureInput is a pressure of the safety checks: a bare unit
// ("30 bar", "145 psi") is read as gauge, the conservative reading for
// walls, stored energy and releases; bara and psia are absolute, barg and
// psig gauge. The Run echoes how it was read (ReadingOf).
func SafetyPressureInput(key, label, def, example, hint string) Input {
	if hint == "" {
		hint = gaugeHint
	} else {
		hint += "; " + gaugeHint
	}
	return Input{Key: key, Label: label, Kind: Quantity, Dim: units.DimPressure,
		Units: units.Options{BareGauge: true}, Default: def, Example: example, Hint: hint}
}

// ReadingOf says how the pressure input key was read ("30 bar read as
// 30 barg = 31.01 bar absolute"), or "" when it holds no value.
func ReadingOf(v *Values, key string) string { return ReadingOfValue(*v.Get(key)) }

// ReadingOfValue says how a parsed pressure value was read, or "" when it
// is not a safety pressure (SafetyPressureInput) or holds no value. A screen shows it under the field.
func ReadingOfValue(val Value) string {
	if !val.Set || val.In == nil || val.In.Kind != Quantity || val.In.Dim != units.DimPressure || !val.In.Units.BareGauge {
		return ""
	}
	return units.DescribePressure(val.Text, val.Q, val.In.Units.Atmosphere)
}

// deriveReading echoes how pressure input key was read, as the derived
// input key+"_read" (dashes written as underscores), when it holds a value.
func deriveReading(r *Result, v *Values, key string) {
	if s := ReadingOf(v, key); s != "" {
		r.DeriveWords(strings.ReplaceAll(key, "-", "_")+"_read", v.Get(key).In.Label+" read as", s)
	}
}

// gaugeValue returns the gauge pressure (Pa above the atmosphere) of
// pressure input key.
func gaugeValue(v *Values, key string) safety.GaugePressure {
	val := v.Get(key)
	return safety.GaugeOf(val.Q, val.In.Units.Atmosphere)
}

// cautionOnce adds the cautions not yet in r, in order.
func cautionOnce(r *Result, lines ...string) {
	for _, l := range lines {
		if !slices.Contains(r.Cautions, l) {
			r.Caution(l)
		}
	}
}

// barg writes a gauge pressure (Pa above the atmosphere) in barg.
func barg(g safety.GaugePressure) string {
	s, err := units.FormatGauge(float64(g)+units.StandardAtmosphere, units.StandardAtmosphere, "bar")
	if err != nil {
		return units.Format(float64(g), units.DimPressure) + " gauge"
	}
	return s
}

// percent writes a ratio as a whole percentage.
func percent(x float64) string { return units.Number(100*x, 3) + " %" }

// mm writes a length in mm.
func mm(x float64) string {
	if s, err := units.FormatIn(x, "mm"); err == nil {
		return s
	}
	return units.Format(x, units.DimLength)
}

// optional returns in made optional: left empty, the Run sees it unset.
func optional(in Input) Input {
	in.Optional = true
	return in
}

// withPM returns in accepting a typed ±.
func withPM(in Input) Input {
	in.PM = true
	in.Hint += "; ± or +- for an uncertainty"
	return in
}

// hours writes a time in hours.
func hours(s float64) string {
	if t, err := units.FormatIn(s, "h"); err == nil {
		return t
	}
	return units.Format(s, units.DimTime)
}
