package units

import (
	"math"
	"math/rand/v2"
	"regexp"
	"testing"
)

// exponent matches a number written with an exponent ("1.2e-5", "3E+07").
var exponent = regexp.MustCompile(`[0-9.][eE][-+]?[0-9]`)

// TestFormatReadsBackWithoutExponent is a property test over every
// dimension and every decade from 1e-15 to 1e15 (up to what Parse accepts):
// Format and FormatPM write no exponent, and Parse reads the text back
// within the digits shown (4 significant digits round to within 5e-4 of
// the value; the ± keeps at most 2 digits, so within half of its last
// place). The tolerances follow from the rounding rules, not from a source.
func TestFormatReadsBackWithoutExponent(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(15, 2026))
	for d := range dims {
		dim := Dimension(d)
		for e := -15; e <= 15; e++ {
			for range 4 {
				v := math.Pow(10, float64(e)+rng.Float64())
				if v > MaxMagnitude(dim) {
					continue
				}
				if AllowsNegative(dim) && rng.IntN(2) == 0 {
					v = -v
				}
				checkReadBack(t, v, dim)
				checkReadBackPM(t, v, math.Abs(v)*math.Pow(10, -1-3*rng.Float64()), dim)
			}
		}
	}
}

func checkReadBack(t *testing.T, v float64, d Dimension) {
	t.Helper()
	s := Format(v, d)
	if exponent.MatchString(s) {
		t.Errorf("Format(%g, %v) = %q has an exponent", v, d, s)
		return
	}
	q, err := ParseWith(s, d, Options{AllowNegative: true})
	if err != nil {
		t.Errorf("Format(%g, %v) = %q does not read back: %v", v, d, s, err)
		return
	}
	if rel := math.Abs(q.Value-v) / math.Abs(v); rel > 5.0001e-4 {
		t.Errorf("Format(%g, %v) = %q reads back as %g (relative error %.2g)", v, d, s, q.Value, rel)
	}
}

func checkReadBackPM(t *testing.T, v, u float64, d Dimension) {
	t.Helper()
	s := FormatPM(v, u, d)
	if exponent.MatchString(s) {
		t.Errorf("FormatPM(%g, %g, %v) = %q has an exponent", v, u, d, s)
		return
	}
	q, err := ParseWith(s, d, Options{AllowNegative: true})
	if err != nil {
		t.Errorf("FormatPM(%g, %g, %v) = %q does not read back: %v", v, u, d, s, err)
		return
	}
	// The ± is rounded to 1 or 2 significant digits: within 26 % of itself
	// (3.49 shown as 3); the value to the same decimal place, so within
	// half of the ± as shown.
	if math.Abs(q.Uncertainty-u) > 0.26*u {
		t.Errorf("FormatPM(%g, %g, %v) = %q reads back ± %g", v, u, d, s, q.Uncertainty)
	}
	if math.Abs(q.Value-v) > 0.5*q.Uncertainty*(1+1e-9)+1e-12*math.Abs(v) {
		t.Errorf("FormatPM(%g, %g, %v) = %q reads back as %g", v, u, d, s, q.Value)
	}
}

// TestReadableUnit checks the unit chosen at the edges of a few ladders:
// our own steps (readable.go).
func TestReadableUnit(t *testing.T) {
	t.Parallel()
	cases := []struct {
		v    float64
		d    Dimension
		want string
	}{
		{0.99999, DimLength, "m"}, // rounds to 1.000 m
		{0.9999, DimLength, "mm"},
		{1e-6, DimLength, "µm"},
		{999.9, DimPressure, "Pa"},
		{1000, DimPressure, "kPa"},
		{1e6, DimPressure, "MPa"},
		{0.0099, DimDensity, "g/m³"},
		{0.01, DimDensity, "kg/m³"},
		{9.9e-5, DimKinematicViscosity, "mm²/s"},
		{1e-4, DimKinematicViscosity, "cm²/s"},
		{0.01, DimKinematicViscosity, "m²/s"},
		{0, DimPressure, "Pa"},
		{300, DimTemperature, "K"},
		{4.58e7, DimNone, ""},
	}
	for _, c := range cases {
		if got := ReadableUnit(c.v, c.d); got != c.want {
			t.Errorf("ReadableUnit(%g, %v) = %q, want %q", c.v, c.d, got, c.want)
		}
	}
}

// TestNumberAndDigits checks the plain-number helpers.
func TestNumberAndDigits(t *testing.T) {
	t.Parallel()
	cases := []struct {
		got, want string
	}{
		{Number(4.58e7, 3), "45.8 million"},
		{Number(0.000123, 2), "0.00012"},
		{Number(-1.5e9, 4), "-1.5 billion"},
		{Number(999999.9, 4), "1 million"},
		{FormatDigits(101325, DimPressure, 6), "101.325 kPa"},
		{FormatDigits(1e6, DimPressure, 6), "1 MPa"},
		{FormatDigits(2.5e-4, DimLength, 10), "250 µm"},
	}
	for _, c := range cases {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}

// TestFormatPMPrefer: a row's preferred unit is kept while its number
// reads well and gives way to the readable unit outside 0.001–10000 (our
// own bounds); 1 mm²/s = 1e-6 m²/s by definition.
func TestFormatPMPrefer(t *testing.T) {
	t.Parallel()
	cases := []struct {
		v, u float64
		d    Dimension
		unit string
		want string
	}{
		{1.242e-5, 0, DimKinematicViscosity, "mm2/s", "12.42 mm²/s"},
		{0.1869, 0, DimKinematicViscosity, "mm2/s", "0.1869 m²/s"},
		{1.605e-4, 0, DimDensity, "kg/m3", "160.5 mg/m³"},
		{0.1625, 0, DimDensity, "kg/m3", "0.1625 kg/m³"},
		{0.209, 0, DimNone, "%", "20.9 %"},
		{2.5e-4, 1e-5, DimLength, "mm", "0.250 ± 0.010 mm"},
		{0, 0, DimLength, "mm", "0 mm"},
		{300, 0, DimTemperature, "degC", "26.85 °C"},
	}
	for _, c := range cases {
		got, err := FormatPMPrefer(c.v, c.u, c.d, c.unit)
		if err != nil || got != c.want {
			t.Errorf("FormatPMPrefer(%g, %g, %v, %q) = %q, %v; want %q", c.v, c.u, c.d, c.unit, got, err, c.want)
		}
	}
}
