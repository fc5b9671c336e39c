package units

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestFormat(t *testing.T) {
	t.Parallel()
	// Expected strings: our own output convention (4 significant digits,
	// no exponent, the unit of the ladder in readable.go), rounding worked
	// by hand.
	cases := []struct {
		v    float64
		dim  Dimension
		want string
	}{
		{578.3, DimFrequency, "578.3 Hz"},
		{578.34999, DimFrequency, "578.3 Hz"},
		{578.35001, DimFrequency, "578.4 Hz"},
		{101325, DimPressure, "101.3 kPa"},
		{1.01325e7, DimPressure, "10.13 MPa"},
		{0.147, DimLength, "147 mm"},
		{0.25, DimLength, "250 mm"},
		{1.5, DimLength, "1.5 m"},
		{2.5e-5, DimLength, "25 µm"},
		{0.001, DimLength, "1 mm"},
		{0.00099996, DimLength, "1 mm"}, // rounds up into the mm rung
		{999999.5, DimPressure, "1 MPa"},
		{1e6, DimPressure, "1 MPa"},
		{1.38e8, DimStress, "138 MPa"},
		{0, DimPressure, "0 Pa"},
		{math.Copysign(0, -1), DimTemperatureDifference, "0 K"},
		{-23.456, DimTemperatureDifference, "-23.46 K"},
		{7900, DimDensity, "7900 kg/m³"},
		{1.99e-5, DimDynamicViscosity, "19.9 µPa·s"},
		{1.605e-4, DimDensity, "160.5 mg/m³"},
		{0.1625, DimDensity, "0.1625 kg/m³"},
		{1.242e-5, DimKinematicViscosity, "12.42 mm²/s"},
		{0.1869, DimKinematicViscosity, "0.1869 m²/s"},
		{5e-4, DimKinematicViscosity, "5 cm²/s"},
		{0.0262, DimThermalConductivity, "0.0262 W/(m·K)"},
		{0.005, DimThermalConductivity, "5 mW/(m·K)"},
		{4.58e7, DimNone, "45.8 million"},
		{186900, DimNone, "186900"},
		{1.234e-5, DimNone, "0.00001234"},
		{2.5e12, DimNone, "2.5 trillion"},
		{5.6e-4, DimRate, "2.016 /h"},
		{1800, DimTime, "30 min"},
		{0.3, DimNone, "0.3"},
		{94, DimSoundLevel, "94 dB"},
		{math.NaN(), DimLength, "—"},
		{math.Inf(1), DimPressure, "—"},
		{math.Inf(-1), DimPressure, "—"},
	}
	for _, c := range cases {
		if got := Format(c.v, c.dim); got != c.want {
			t.Errorf("Format(%g, %v) = %q, want %q", c.v, c.dim, got, c.want)
		}
	}
}

func TestFormatIn(t *testing.T) {
	t.Parallel()
	// Expected values follow from the definitions in NIST SP 811 (2008)
	// B.8 and B.9 (see parse_test.go), rounded by hand to 4 digits.
	cases := []struct {
		v    float64
		unit string
		want string
	}{
		{101325, "bar", "1.013 bar"},
		{101325, "psi", "14.7 psi"},
		{31e5 + 101325, "barg", "31 barg"},
		{300, "degC", "26.85 °C"},
		{300, "°C", "26.85 °C"},
		{233.15, "degF", "-40 °F"},
		{0.0127, "in", "0.5 in"},
		{0.25e-3, "mm", "0.25 mm"},
		{1200, "kHz", "1.2 kHz"},
		{138e6, "MPa", "138 MPa"},
		{0.05, "L", "50 L"},
		{25e-6, "um", "25 µm"},
		{0.3, "%", "30 %"},
		{math.NaN(), "bar", "—"},
	}
	for _, c := range cases {
		got, err := FormatIn(c.v, c.unit)
		if err != nil || got != c.want {
			t.Errorf("FormatIn(%g, %q) = %q, %v; want %q", c.v, c.unit, got, err, c.want)
		}
	}
	if _, err := FormatIn(1, "parsec"); err == nil || !strings.Contains(err.Error(), "parsec") {
		t.Errorf("FormatIn with unknown unit: err = %v", err)
	}
	// Temperature differences need the dimension: 2 K = 3.6 °F (SP 811 B.9).
	if got, err := FormatInDim(2, DimTemperatureDifference, "degF"); err != nil || got != "3.6 °F" {
		t.Errorf("FormatInDim(2 K, degF) = %q, %v", got, err)
	}
	if _, err := FormatInDim(2, DimLength, "bar"); err == nil || !strings.Contains(err.Error(), "length unit") {
		t.Errorf("FormatInDim(length, bar): err = %v", err)
	}
}

func TestFormatGauge(t *testing.T) {
	t.Parallel()
	// Gauge = absolute − ambient (definition of gauge pressure).
	cases := []struct {
		abs, atm float64
		unit     string
		want     string
	}{
		{31e5, 1e5, "bar", "30 barg"},
		{31e5, 1e5, "barg", "30 barg"},
		{30e5 + 101325, 0, "bar", "30 barg"},
		{101325 + 10*6894.757293168, 0, "psi", "10 psig"},
		{2e5, 1e5, "kPa", "100 kPag"},
	}
	for _, c := range cases {
		got, err := FormatGauge(c.abs, c.atm, c.unit)
		if err != nil || got != c.want {
			t.Errorf("FormatGauge(%g, %g, %q) = %q, %v; want %q", c.abs, c.atm, c.unit, got, err, c.want)
		}
	}
	if _, err := FormatGauge(1e5, 0, "atm"); err == nil {
		t.Error("FormatGauge in atm: no error")
	}
	if g := Gauge(31e5, 1e5); g != 30e5 {
		t.Errorf("Gauge = %g", g)
	}
	if g := Gauge(101325, 0); g != 0 {
		t.Errorf("Gauge with default atmosphere = %g", g)
	}
}

func TestFormatPM(t *testing.T) {
	t.Parallel()
	// Rounding rule: JCGM 100:2008 (GUM) 7.2.6 (at most two significant
	// digits of uncertainty); two digits when the first is 1 or 2 is common
	// practice, no published source. Strings worked by hand.
	cases := []struct {
		v, u float64
		dim  Dimension
		want string
	}{
		{567, 8, DimFrequency, "567 ± 8 Hz"},
		{567.4, 8.3, DimFrequency, "567 ± 8 Hz"},
		{571.46, 1.23, DimFrequency, "571.5 ± 1.2 Hz"},
		{567, 0.96, DimFrequency, "567 ± 1 Hz"},
		{0.147, 0.0012, DimLength, "147.0 ± 1.2 mm"},
		{101325, 80, DimPressure, "101.33 ± 0.08 kPa"},
		{1.01325e7, 800, DimPressure, "10.1325 ± 0.0008 MPa"},
		{2.5e-5, 3e-7, DimLength, "25.0 ± 0.3 µm"},
		{4.58e7, 3e5, DimNone, "45.8 ± 0.3 million"},
		{0.001, 0.3, DimTemperatureDifference, "0.0 ± 0.3 K"},
		{567, 0, DimFrequency, "567 Hz"},
		{567, math.NaN(), DimFrequency, "567 Hz"},
		{math.NaN(), 8, DimFrequency, "—"},
		{-0.04, 0.3, DimTemperatureDifference, "0.0 ± 0.3 K"},
	}
	for _, c := range cases {
		if got := FormatPM(c.v, c.u, c.dim); got != c.want {
			t.Errorf("FormatPM(%g, %g, %v) = %q, want %q", c.v, c.u, c.dim, got, c.want)
		}
	}
	// A temperature ± in °F is a difference: 293.15 K ± 2 K = 68 ± 3.6 °F,
	// and 3.6 keeps one digit by the rule above.
	if got, err := FormatPMIn(293.15, 2, DimTemperature, "degF"); err != nil || got != "68 ± 4 °F" {
		t.Errorf("FormatPMIn(293.15 K ± 2 K, degF) = %q, %v", got, err)
	}
	if got, err := FormatPMIn(293.15, 2, DimTemperature, "degC"); err != nil || got != "20.0 ± 2.0 °C" {
		t.Errorf("FormatPMIn(293.15 K ± 2 K, degC) = %q, %v", got, err)
	}
}

// TestRoundTrip checks that what Format and FormatIn print reads back with
// Parse to the value within the printed precision (4 significant digits:
// relative 5e-4), and that FormatPM keeps the uncertainty.
func TestRoundTrip(t *testing.T) {
	t.Parallel()
	vals := []float64{1e-4, 2.5e-5, 0.147, 0.25, 1, 3.14159, 578.34, 12345.6, 101325, 9.87654e6}
	for d := range dims {
		dim := Dimension(d)
		for _, v := range vals {
			if v > MaxMagnitude(dim) {
				continue
			}
			for _, unit := range append([]string{""}, Units(dim)...) {
				var s string
				if unit == "" {
					s = Format(v, dim)
				} else {
					var err error
					if s, err = FormatInDim(v, dim, unit); err != nil {
						t.Fatalf("FormatInDim(%g, %v, %q): %v", v, dim, unit, err)
					}
				}
				q, err := Parse(s, dim)
				if err != nil {
					// Gauge and offset units can print negative values
					// that are legitimately refused (1e-4 Pa in barg).
					if strings.HasSuffix(unit, "g") || strings.Contains(err.Error(), "absolute zero") {
						continue
					}
					t.Errorf("Parse(%q) after formatting %g %v in %q: %v", s, v, dim, unit, err)
					continue
				}
				// Offset units lose absolute precision near their zero.
				tol := 5e-4 * math.Abs(v)
				if def := idx.find(dim, normalizeUnit(unit)); def != nil && (def.offset != 0 || def.gauge) {
					tol = 5e-4 * (math.Abs(v) + math.Abs(def.offset) + StandardAtmosphere)
				}
				if !scalar.EqualWithinAbs(q.Value, v, tol) {
					t.Errorf("round trip %g %v via %q → %q → %g", v, dim, unit, s, q.Value)
				}
			}
		}
	}
	// FormatPM reads back with its uncertainty.
	for _, c := range []struct {
		v, u float64
		dim  Dimension
	}{{567, 8, DimFrequency}, {0.147, 0.0012, DimLength}, {1.01325e7, 800, DimPressure}, {2.5e-5, 3e-7, DimLength}} {
		s := FormatPM(c.v, c.u, c.dim)
		q, err := Parse(s, c.dim)
		if err != nil {
			t.Errorf("Parse(FormatPM) %q: %v", s, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(q.Uncertainty, c.u, 0, 0.1) || !scalar.EqualWithinAbs(q.Value, c.v, c.u) {
			t.Errorf("FormatPM round trip %g ± %g → %q → %g ± %g", c.v, c.u, s, q.Value, q.Uncertainty)
		}
	}
}

func TestRangeError(t *testing.T) {
	t.Parallel()
	cases := []struct {
		e    *RangeError
		want string
	}{
		{NewRangeError("temperature", 15, 20, 3000, "K"), "temperature 15 K is outside the valid range 20–3000 K"},
		{&RangeError{Field: "temperature", Value: 15, Min: 20, Max: 3000, Unit: "K", Why: "helium model"},
			"temperature 15 K is outside the valid range 20–3000 K (helium model)"},
		{NewRangeError("length", -0.005, 0, math.Inf(1), "m"), "length -5 mm must be at least 0 m"},
		// a value on a bound was refused, so the bound is open (common
		// practice in wording, no published source)
		{NewRangeError("plate half gap", 0, 0, math.Inf(1), "m"), "plate half gap 0 m must be greater than zero"},
		{NewRangeError("pressure", 1, 1, math.Inf(1), "Pa"), "pressure 1 Pa must be greater than 1 Pa"},
		{NewRangeError("solid fraction", 1, 0, 1, ""), "solid fraction 1 must be less than 1 (valid range 0–1, ends excluded)"},
		{NewRangeError("porosity", 0, 0, 1, ""), "porosity 0 must be greater than 0 (valid range 0–1, ends excluded)"},
		{NewRangeError("mole fraction", 1.2, math.Inf(-1), 1, ""), "mole fraction 1.2 must be at most 1"},
		{NewRangeError("pressure", 123456789, 0, 1e8, "Pa"), "pressure 123.5 MPa is outside the valid range 0–100 MPa"},
		{NewRangeError("gap", 5e-5, 1e-4, 3, "m"), "gap 50 µm is outside the valid range 100 µm–3 m"},
		{NewRangeError("", 2, math.Inf(-1), math.Inf(1), "m"), "value 2 m is not a finite number"},
	}
	for _, c := range cases {
		if got := c.e.Error(); got != c.want {
			t.Errorf("Error() = %q, want %q", got, c.want)
		}
	}
}

func TestDimensionString(t *testing.T) {
	t.Parallel()
	cases := []struct {
		d    Dimension
		want string
	}{
		{DimLength, "length"},
		{DimPressure, "pressure"},
		{DimTemperatureDifference, "temperature difference"},
		{DimPerArea, "count per area"},
		{Dimension(99), "Dimension(99)"},
		{Dimension(-1), "Dimension(-1)"},
	}
	for _, c := range cases {
		if got := c.d.String(); got != c.want {
			t.Errorf("String(%d) = %q, want %q", int(c.d), got, c.want)
		}
	}
	if got := SIUnit(DimThermalConductivity); got != "W/(m·K)" {
		t.Errorf("SIUnit(conductivity) = %q", got)
	}
}
