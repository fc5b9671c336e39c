package units

import (
	"errors"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// Factors used for expected values below. Sources:
//   - in = 0.0254 m, ft = 0.3048 m, lb = 0.45359237 kg exact: NIST SP 811
//     (2008) Appendix B.8, footnotes on the international inch and pound.
//   - psi = 6894.757293168 Pa: NIST SP 811 (2008) B.8 prints 6.894 757 E+03;
//     the longer digits are lbf/in² = 0.45359237 × 9.80665 / 0.0254² worked
//     by hand and matching scipy.constants.psi 1.10.1 (factors.json).
//   - atm = 101325 Pa, torr = 101325/760 Pa, bar = 1e5 Pa: NIST SP 811 (2008)
//     B.8 (exact). °C: T = t + 273.15; °F: T = (t + 459.67)·5/9 (SP 811
//     B.9, exact).
const (
	tIn  = 0.0254
	tFt  = 0.3048
	tPsi = 6894.757293168
	tAtm = 101325.0
)

func TestParseAccepted(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in    string
		dim   Dimension
		want  float64 // SI
		unc   float64 // SI uncertainty
		unit  string  // canonical
		gauge bool
	}{
		// Pressures (NIST SP 811 (2008) B.8 factors, see above).
		{"10 bar", DimPressure, 10e5, 0, "bar", false},
		{"10bar", DimPressure, 10e5, 0, "bar", false},
		{"  10   bar ", DimPressure, 10e5, 0, "bar", false},
		{"10\u00a0bar", DimPressure, 10e5, 0, "bar", false},      // no-break space
		{"1\u20091/2\tin", DimLength, 1.5 * tIn, 0, "in", false}, // thin space, tab
		{"145 psi", DimPressure, 145 * tPsi, 0, "psi", false},
		{"145 psia", DimPressure, 145 * tPsi, 0, "psi", false},
		{"1.2 MPa", DimPressure, 1.2e6, 0, "MPa", false},
		{"1,2 MPa", DimPressure, 1.2e6, 0, "MPa", false},
		{"30 barg", DimPressure, 30e5 + tAtm, 0, "barg", true},
		{"30 bar(g)", DimPressure, 30e5 + tAtm, 0, "barg", true},
		{"30 psig", DimPressure, 30*tPsi + tAtm, 0, "psig", true},
		{"1 atm", DimPressure, tAtm, 0, "atm", false},
		{"750 torr", DimPressure, 750 * tAtm / 760, 0, "torr", false},
		{"750 Torr", DimPressure, 750 * tAtm / 760, 0, "torr", false},
		{"500 mbar", DimPressure, 500e2, 0, "mbar", false},
		{"101.325 kPa", DimPressure, tAtm, 0, "kPa", false},
		{"101.325 KPA", DimPressure, tAtm, 0, "kPa", false}, // case folded
		{"0 Pa", DimPressure, 0, 0, "Pa", false},
		// Temperatures (NIST SP 811 (2008) B.9).
		{"300 K", DimTemperature, 300, 0, "K", false},
		{"27 °C", DimTemperature, 300.15, 0, "degC", false},
		{"27°C", DimTemperature, 300.15, 0, "degC", false},
		{"27 degC", DimTemperature, 300.15, 0, "degC", false},
		{"27 deg C", DimTemperature, 300.15, 0, "degC", false},
		{"27 celsius", DimTemperature, 300.15, 0, "degC", false},
		{"27 ℃", DimTemperature, 300.15, 0, "degC", false},
		{"-40 degC", DimTemperature, 233.15, 0, "degC", false},
		{"−40 °C", DimTemperature, 233.15, 0, "degC", false}, // U+2212 minus
		{"-40 °F", DimTemperature, 233.15, 0, "degF", false},
		{"80 degF", DimTemperature, (80 + 459.67) * 5 / 9, 0, "degF", false},
		{"80 °F", DimTemperature, (80 + 459.67) * 5 / 9, 0, "degF", false},
		{"540 °R", DimTemperature, 300, 0, "degR", false},
		// Temperature differences: a degree is a kelvin or 5/9 K.
		{"23 K", DimTemperatureDifference, 23, 0, "K", false},
		{"23 degC", DimTemperatureDifference, 23, 0, "degC", false},
		{"3.6 degF", DimTemperatureDifference, 2, 0, "degF", false},
		{"-5 K", DimTemperatureDifference, -5, 0, "K", false},
		// Lengths, with inch fractions and a decimal comma.
		{"14.7 cm", DimLength, 0.147, 0, "cm", false},
		{"0.147 m", DimLength, 0.147, 0, "m", false},
		{"3/8 in", DimLength, 3.0 / 8 * tIn, 0, "in", false},
		{"3/8\"", DimLength, 3.0 / 8 * tIn, 0, "in", false},
		{"1 1/2 in", DimLength, 1.5 * tIn, 0, "in", false},
		{"1-1/2 in", DimLength, 1.5 * tIn, 0, "in", false},
		{"1½ in", DimLength, 1.5 * tIn, 0, "in", false},
		{"¾ inch", DimLength, 0.75 * tIn, 0, "in", false},
		{"0.5\"", DimLength, 0.5 * tIn, 0, "in", false},
		{"0.5 in", DimLength, 0.5 * tIn, 0, "in", false},
		{"2 ft", DimLength, 2 * tFt, 0, "ft", false},
		{"2'", DimLength, 2 * tFt, 0, "ft", false},
		{"25 µm", DimLength, 25e-6, 0, "um", false},
		{"25 μm", DimLength, 25e-6, 0, "um", false}, // Greek mu
		{"25 um", DimLength, 25e-6, 0, "um", false},
		{"25 microns", DimLength, 25e-6, 0, "um", false},
		{"2e-3 m", DimLength, 2e-3, 0, "m", false},
		{"2E-3m", DimLength, 2e-3, 0, "m", false},
		{"0,25 mm", DimLength, 0.25e-3, 0, "mm", false},
		{"0,250 mm", DimLength, 0.25e-3, 0, "mm", false},
		{".5 mm", DimLength, 0.5e-3, 0, "mm", false},
		{"+3 mm", DimLength, 3e-3, 0, "mm", false},
		{"2 mil", DimLength, 2e-3 * tIn, 0, "mil", false},
		// Volumes, areas.
		{"50 L", DimVolume, 0.05, 0, "L", false},
		{"50 l", DimVolume, 0.05, 0, "L", false},
		{"9 m3", DimVolume, 9, 0, "m3", false},
		{"9 m³", DimVolume, 9, 0, "m3", false},
		{"9 m^3", DimVolume, 9, 0, "m3", false},
		{"250 mL", DimVolume, 250e-6, 0, "mL", false},
		{"1.5 cm²", DimArea, 1.5e-4, 0, "cm2", false},
		{"2 in2", DimArea, 2 * tIn * tIn, 0, "in2", false},
		// Rates (air changes), mesh counts, cell densities.
		{"2/h", DimRate, 2.0 / 3600, 0, "/h", false},
		{"2 /h", DimRate, 2.0 / 3600, 0, "/h", false},
		{"2 per hour", DimRate, 2.0 / 3600, 0, "/h", false},
		{"6 ACH", DimRate, 6.0 / 3600, 0, "/h", false},
		{"3 /min", DimRate, 3.0 / 60, 0, "/min", false},
		{"200 /in", DimPerLength, 200 / tIn, 0, "/in", false},
		{"200 per inch", DimPerLength, 200 / tIn, 0, "/in", false},
		{"200 mesh", DimPerLength, 200 / tIn, 0, "mesh", false},
		{"8 per mm", DimPerLength, 8e3, 0, "/mm", false},
		{"400 cpsi", DimPerArea, 400 / (tIn * tIn), 0, "cpsi", false},
		{"400 /in²", DimPerArea, 400 / (tIn * tIn), 0, "/in2", false},
		{"400 /in2", DimPerArea, 400 / (tIn * tIn), 0, "/in2", false},
		// Stress.
		{"138 MPa", DimStress, 138e6, 0, "MPa", false},
		{"20 ksi", DimStress, 20e3 * tPsi, 0, "ksi", false},
		{"138 N/mm2", DimStress, 138e6, 0, "N/mm2", false},
		{"138 N/mm²", DimStress, 138e6, 0, "N/mm2", false},
		// Density, mass, frequency, time, energy, power, molar mass, viscosity.
		{"7.9 g/cm3", DimDensity, 7900, 0, "g/cm3", false},
		{"7900 kg/m3", DimDensity, 7900, 0, "kg/m3", false},
		{"7900 kg/m³", DimDensity, 7900, 0, "kg/m3", false},
		{"10 kg", DimMass, 10, 0, "kg", false},
		{"15 g", DimMass, 15e-3, 0, "g", false},
		{"2 lb", DimMass, 2 * 0.45359237, 0, "lb", false},
		{"1.2 kHz", DimFrequency, 1200, 0, "kHz", false},
		{"578 Hz", DimFrequency, 578, 0, "Hz", false},
		{"10 min", DimTime, 600, 0, "min", false},
		{"1.5 kWh", DimEnergy, 1.5 * 3.6e6, 0, "kWh", false},
		{"50 W", DimPower, 50, 0, "W", false},
		{"4.0026 g/mol", DimMolarMass, 4.0026e-3, 0, "g/mol", false},
		{"19.9 µPa·s", DimDynamicViscosity, 19.9e-6, 0, "uPa.s", false},
		{"19.9 uPa*s", DimDynamicViscosity, 19.9e-6, 0, "uPa.s", false},
		{"0.156 W/(m·K)", DimThermalConductivity, 0.156, 0, "W/(m.K)", false},
		{"0.156 W/m/K", DimThermalConductivity, 0.156, 0, "W/(m.K)", false},
		{"5.193 kJ/(kg·K)", DimSpecificHeat, 5193, 0, "kJ/(kg.K)", false},
		{"2 L/min", DimVolumeFlow, 2e-3 / 60, 0, "L/min", false},
		// Sound level and plain numbers.
		{"94 dB", DimSoundLevel, 94, 0, "dB", false},
		{"-3 dB", DimSoundLevel, -3, 0, "dB", false},
		{"85 dB(A)", DimSoundLevel, 85, 0, "dBA", false},
		{"30 %", DimNone, 0.3, 0, "%", false},
		{"30%", DimNone, 0.3, 0, "%", false},
		{"0.3", DimNone, 0.3, 0, "", false},
		{"-1.5", DimNone, -1.5, 0, "", false},
		// Uncertainties, stored in SI.
		{"567 Hz ± 8 Hz", DimFrequency, 567, 8, "Hz", false},
		{"567Hz+-8Hz", DimFrequency, 567, 8, "Hz", false},
		{"567 ± 8 Hz", DimFrequency, 567, 8, "Hz", false},
		{"567 Hz ± 8", DimFrequency, 567, 8, "Hz", false},
		{"567 Hz +/- 8 Hz", DimFrequency, 567, 8, "Hz", false},
		{"0.25 m ± 1 mm", DimLength, 0.25, 1e-3, "m", false},
		{"20 °C ± 2 K", DimTemperature, 293.15, 2, "degC", false},
		{"20 °C ± 2 degC", DimTemperature, 293.15, 2, "degC", false},
		{"20 °C ± 2", DimTemperature, 293.15, 2, "degC", false},
		{"68 °F ± 3.6 degF", DimTemperature, 293.15, 2, "degF", false},
		{"20 °C ± 3.6 degF", DimTemperature, 293.15, 2, "degC", false},
		{"578 Hz ± 1 %", DimFrequency, 578, 5.78, "Hz", false},
		{"300 K ± 1%", DimTemperature, 300, 3, "K", false},
		{"30 barg ± 0.5 bar", DimPressure, 30e5 + tAtm, 0.5e5, "barg", true},
		{"30 % ± 2 %", DimNone, 0.3, 0.02, "%", false},
		{"0.3 ± 0.02", DimNone, 0.3, 0.02, "", false},
	}
	for _, c := range cases {
		q, err := Parse(c.in, c.dim)
		if err != nil {
			t.Errorf("Parse(%q, %v): unexpected error %v", c.in, c.dim, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(q.Value, c.want, 1e-12, 1e-12) {
			t.Errorf("Parse(%q, %v) = %.15g, want %.15g", c.in, c.dim, q.Value, c.want)
		}
		if !scalar.EqualWithinAbsOrRel(q.Uncertainty, c.unc, 1e-12, 1e-12) {
			t.Errorf("Parse(%q, %v) uncertainty = %.15g, want %.15g", c.in, c.dim, q.Uncertainty, c.unc)
		}
		if q.Unit != c.unit || q.Gauge != c.gauge || q.Dim != c.dim {
			t.Errorf("Parse(%q, %v) = unit %q gauge %v dim %v, want %q %v %v", c.in, c.dim, q.Unit, q.Gauge, q.Dim, c.unit, c.gauge, c.dim)
		}
	}
}

func TestParseOptions(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in   string
		dim  Dimension
		opt  Options
		want float64
	}{
		// A gauge pressure at altitude: 30 barg with a 90 kPa atmosphere
		// (arithmetic on the definition of gauge pressure).
		{"30 barg", DimPressure, Options{Atmosphere: 90e3}, 30e5 + 90e3},
		{"0 psig", DimPressure, Options{Atmosphere: 95e3}, 95e3},
		{"30 bar", DimPressure, Options{Atmosphere: 90e3}, 30e5}, // absolute: no change
		{"300", DimTemperature, Options{DefaultUnit: "K"}, 300},
		{"27", DimTemperature, Options{DefaultUnit: "degC"}, 300.15},
		{"12", DimLength, Options{DefaultUnit: "mm"}, 12e-3},
		{"-12 mm", DimLength, Options{AllowNegative: true}, -12e-3},
		{"-2 MJ", DimEnergy, Options{AllowNegative: true}, -2e6},
	}
	for _, c := range cases {
		q, err := ParseWith(c.in, c.dim, c.opt)
		if err != nil {
			t.Errorf("ParseWith(%q, %v, %+v): %v", c.in, c.dim, c.opt, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(q.Value, c.want, 1e-12, 1e-12) {
			t.Errorf("ParseWith(%q, %v, %+v) = %.15g, want %.15g", c.in, c.dim, c.opt, q.Value, c.want)
		}
	}
}

func TestParseErrors(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in       string
		dim      Dimension
		opt      Options
		contains []string // fragments the message must hold
		rangeErr bool     // a *RangeError must be wrapped
	}{
		{"", DimLength, Options{}, []string{`""`, "empty", "length"}, false},
		{"   ", DimPressure, Options{}, []string{"empty", "pressure"}, false},
		{"bar", DimPressure, Options{}, []string{`"bar"`, "does not start with a number"}, false},
		{"NaN m", DimLength, Options{}, []string{`"NaN m"`, "not a finite number"}, false},
		{"nan", DimNone, Options{}, []string{"not a finite number"}, false},
		{"Inf Pa", DimPressure, Options{}, []string{"not a finite number"}, false},
		{"-inf K", DimTemperature, Options{}, []string{"not a finite number"}, false},
		{"∞ m", DimLength, Options{}, []string{"not a finite number"}, false},
		{"1e999 m", DimLength, Options{}, []string{"too large"}, false},
		{"10 parsec", DimLength, Options{}, []string{`"10 parsec"`, `unknown length unit "parsec"`, "accepted: m, mm, cm, µm, in, ft"}, false},
		{"10 bar", DimLength, Options{}, []string{`"10 bar" is a pressure, not a length`, "accepted: m, mm"}, false},
		{"300 K", DimPressure, Options{}, []string{"is a temperature, not a pressure"}, false},
		{"30 barg", DimStress, Options{}, []string{"is a pressure, not a stress", "never gauge"}, false},
		{"27 C", DimTemperature, Options{}, []string{`unknown temperature unit "C"`, "°C or degC", "accepted: K, °C, °F"}, false},
		{"80 F", DimTemperature, Options{}, []string{"°F or degF"}, false},
		{"12", DimLength, Options{}, []string{`"12" has no unit`, "accepted: m"}, false},
		{"12", DimLength, Options{DefaultUnit: "bar"}, []string{`default unit "bar" is not a length unit`}, false},
		{"-5 mm", DimLength, Options{}, []string{`"-5 mm" is negative`, "length"}, true},
		{"-1 L", DimVolume, Options{}, []string{"negative", "volume"}, true},
		{"-1 kg", DimMass, Options{}, []string{"negative", "mass"}, true},
		{"-50 Hz", DimFrequency, Options{}, []string{"negative", "frequency"}, true},
		{"-300 degC", DimTemperature, Options{}, []string{"absolute zero"}, true},
		{"0 K", DimTemperature, Options{}, []string{"absolute zero"}, true},
		{"-500 degF", DimTemperature, Options{AllowNegative: true}, []string{"absolute zero"}, true},
		{"-1 bar", DimPressure, Options{}, []string{"below vacuum"}, true},
		{"-2 barg", DimPressure, Options{}, []string{"below vacuum"}, true},
		{"-2 barg", DimPressure, Options{AllowNegative: true}, []string{"below vacuum"}, true},
		{"2e7 m", DimLength, Options{}, []string{"absurdly large", "at most 1000 km"}, true},
		{"1e20 Pa", DimPressure, Options{}, []string{"absurdly large"}, true},
		{"2e6 K", DimTemperature, Options{}, []string{"absurdly large"}, true},
		{"567 Hz ± -8 Hz", DimFrequency, Options{}, []string{"negative uncertainty"}, true},
		{"567 Hz ±", DimFrequency, Options{}, []string{"nothing after ±"}, false},
		{"567 Hz ± 8 Hz ± 1 Hz", DimFrequency, Options{}, []string{"more than one ±"}, false},
		{"567 Hz ± 8 mm", DimFrequency, Options{}, []string{"is a length, not a frequency"}, false},
		{"20 °C ± 1 %", DimTemperature, Options{}, []string{"% uncertainty", "ambiguous"}, false},
		{"30 barg ± 1 %", DimPressure, Options{}, []string{"% uncertainty"}, false},
		{"1,500 m", DimLength, Options{}, []string{"ambiguous", "1.5 or 1500"}, false},
		{"1,000.5 m", DimLength, Options{}, []string{"two separators"}, false},
		{"1 000 mm", DimLength, Options{}, []string{"more than one number"}, false},
		{"1 1/0 in", DimLength, Options{}, []string{"divides by zero"}, false},
		{"3/0 in", DimLength, Options{}, []string{"divides by zero"}, false},
		{"1 mhz", DimFrequency, Options{}, []string{`unknown frequency unit "mhz"`, "letter case matters here: MHz or mHz"}, false},
		{"20 °", DimTemperature, Options{}, []string{"write °C or °F"}, false},
		// Milli and mega, gram and giga are never confused by case folding.
		{"5 mw", DimPower, Options{}, []string{`unknown power unit "mw"`, "letter case matters here: mW or MW"}, false},
		{"2 mpa", DimPressure, Options{}, []string{"did you mean MPa?"}, false},
		{"3 ML", DimVolume, Options{}, []string{"did you mean mL?"}, false},
		{"1 gpa", DimStress, Options{}, []string{"did you mean GPa?"}, false},
	}
	for _, c := range cases {
		_, err := ParseWith(c.in, c.dim, c.opt)
		if err == nil {
			t.Errorf("ParseWith(%q, %v, %+v): no error", c.in, c.dim, c.opt)
			continue
		}
		var pe *ParseError
		if !errors.As(err, &pe) {
			t.Errorf("ParseWith(%q): error %T is not a *ParseError", c.in, err)
			continue
		}
		msg := err.Error()
		for _, frag := range c.contains {
			if !strings.Contains(msg, frag) {
				t.Errorf("ParseWith(%q, %v): message %q lacks %q", c.in, c.dim, msg, frag)
			}
		}
		var re *RangeError
		if got := errors.As(err, &re); got != c.rangeErr {
			t.Errorf("ParseWith(%q): wraps *RangeError = %v, want %v (%v)", c.in, got, c.rangeErr, err)
		}
	}
}

// TestParseLongInputQuoted checks that a long input is shortened in the
// message rather than repeated whole.
func TestParseLongInputQuoted(t *testing.T) {
	t.Parallel()
	in := strings.Repeat("9", 30) + " parsecs of something long"
	_, err := Parse(in, DimLength)
	if err == nil {
		t.Fatal("no error")
	}
	if strings.Contains(err.Error(), in) || !strings.Contains(err.Error(), "…") {
		t.Errorf("long input not shortened: %v", err)
	}
}

// TestEveryOfferedUnitParses checks that each unit Units offers is
// accepted for its dimension, with the value 2 and the SI factor of the
// table (so a unit offered by a screen can always be typed back).
func TestEveryOfferedUnitParses(t *testing.T) {
	t.Parallel()
	for d := range dims {
		dim := Dimension(d)
		for _, sym := range Units(dim) {
			in := "2 " + sym
			q, err := Parse(in, dim)
			if err != nil {
				t.Errorf("Parse(%q, %v): %v", in, dim, err)
				continue
			}
			want, err := FromUnitDim(2, dim, sym)
			if err != nil {
				t.Errorf("FromUnitDim(2, %v, %q): %v", dim, sym, err)
				continue
			}
			if !scalar.EqualWithinAbsOrRel(q.Value, want, 1e-12, 1e-12) {
				t.Errorf("Parse(%q) = %g, FromUnitDim = %g", in, q.Value, want)
			}
		}
		if dim != DimNone && len(Units(dim)) == 0 {
			t.Errorf("%v offers no units", dim)
		}
		if dim != DimNone {
			// The first offered unit is the SI one: factor 1, no offset.
			if v, err := FromUnitDim(1, dim, Units(dim)[0]); err != nil || v != 1 {
				t.Errorf("%v: first offered unit %q is not SI (1 → %g, %v)", dim, Units(dim)[0], v, err)
			}
		}
	}
}

// TestSIUnitParses checks that Format's output unit reads back.
func TestSIUnitParses(t *testing.T) {
	t.Parallel()
	for d := range dims {
		dim := Dimension(d)
		if dim == DimNone {
			continue
		}
		in := "3 " + SIUnit(dim)
		q, err := Parse(in, dim)
		if err != nil {
			t.Errorf("Parse(%q, %v): %v", in, dim, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(q.Value, 3, 1e-15, 1e-15) {
			t.Errorf("Parse(%q) = %g, want 3", in, q.Value)
		}
	}
}
