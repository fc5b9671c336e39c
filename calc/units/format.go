package units

import (
	"math"
	"strconv"
	"strings"
)

// This file writes numbers with their units for people to read.

// NotANumber is what every Format function prints for NaN and ±Inf. Callers
// should not pass such values; the dash keeps them off screens and files.
const NotANumber = "—"

// formatNumber writes v with sig significant digits in plain decimal
// notation, never with an exponent ("101300", "0.00002500" trimmed to
// "0.000025"), trailing zeros after the decimal point removed.
func formatNumber(v float64, sig int) string {
	if !isFinite(v) {
		return NotANumber
	}
	if v == 0 {
		return "0"
	}
	e := strconv.FormatFloat(v, 'e', sig-1, 64) // rounded: "-1.013e+05"
	k := strings.IndexByte(e, 'e')
	exp, _ := strconv.Atoi(e[k+1:])
	r, _ := strconv.ParseFloat(e, 64)
	dec := max(sig-1-exp, 0)
	return trimZeros(fixed(r, dec))
}

// trimZeros removes trailing zeros after a decimal point, and the point.
func trimZeros(s string) string {
	if !strings.Contains(s, ".") {
		return s
	}
	s = strings.TrimRight(s, "0")
	return strings.TrimSuffix(s, ".")
}

// joinUnit appends a unit symbol to a number with a space, as the BIPM SI
// Brochure, 9th ed. (2019), §5.4.3–5.4.7 asks, also before %: "When it is
// used, a space separates the number and the symbol %" (quoted from the
// Brochure as reproduced in public material; the section numbers are from
// memory). NIST SP 811 (2008) §7.2 says the same for °C.
func joinUnit(num, symbol string) string {
	if symbol == "" {
		return num
	}
	return num + " " + symbol
}

// Format writes an SI value of dimension d for people, with 4 significant
// digits, in the unit of d that keeps the number short (see ReadableUnit):
// "440.3 Hz", "101.3 kPa", "10.13 MPa", "250 mm", "243.9 µm",
// "19.93 µPa·s". It never writes an exponent: a dimensionless number of a
// million or more is written in words ("45.8 million"), a small one in
// plain decimals ("0.00002500" as "0.000025"). Parse reads every result
// back. NaN and ±Inf give "—".
func Format(v float64, d Dimension) string {
	return formatReadable(v, d, 4)
}

// FormatIn writes the SI value v in the unit named unit with 4 significant
// digits and the unit's display symbol: FormatIn(101325, "bar") is
// "1.013 bar", FormatIn(300, "degC") is "26.85 °C". The unit is looked up
// as in ToUnit; use FormatInDim for temperature differences.
func FormatIn(v float64, unit string) (string, error) {
	def, err := resolve(unit, DimNone, false)
	if err != nil {
		return "", err
	}
	return formatDef(v, def, StandardAtmosphere, 4), nil
}

// FormatInDim is FormatIn with the unit looked up within d:
// FormatInDim(2, DimTemperatureDifference, "degF") is "3.6 °F".
func FormatInDim(v float64, d Dimension, unit string) (string, error) {
	def, err := resolve(unit, d, true)
	if err != nil {
		return "", err
	}
	return formatDef(v, def, StandardAtmosphere, 4), nil
}

// FormatGauge writes the absolute pressure abs (Pa) as a gauge pressure
// against the ambient absolute pressure atm (Pa; ≤ 0 means
// StandardAtmosphere) in a gauge unit: "barg", "psig", "kPag", "MPag" or
// "mbarg"; the plain names "bar", "psi", "kPa", "MPa", "mbar" pick their
// gauge twin.
func FormatGauge(abs, atm float64, unit string) (string, error) {
	def, err := resolve(unit, DimPressure, true)
	if err != nil {
		return "", err
	}
	if !def.gauge {
		twin := idx.find(DimPressure, def.name+"g")
		if twin == nil || !twin.gauge {
			return "", &ParseError{Input: unit, Dim: DimPressure, Msg: "has no gauge form", Accepted: []string{"barg", "psig", "kPag", "MPag", "mbarg"}}
		}
		def = twin
	}
	if atm <= 0 {
		atm = StandardAtmosphere
	}
	return formatDef(abs, def, atm, 4), nil
}

// formatDef writes the SI value v in def's unit with sig significant digits.
func formatDef(v float64, def *unitDef, atm float64, sig int) string {
	if !isFinite(v) {
		return NotANumber
	}
	x := toUnit(v, def, atm)
	if !isFinite(x) {
		return NotANumber
	}
	return joinUnit(formatNumber(x, sig), def.symbol)
}

// FormatPM writes a value and its standard uncertainty u (both SI) in
// the readable unit of d (chosen by the larger of |v| and u, see Format):
// "440 ± 5 Hz", "147.0 ± 1.2 mm", "101.33 ± 0.08 kPa". The uncertainty
// keeps two significant digits when its first digit is 1 or 2, one
// otherwise, and the value is rounded to the same decimal place (common
// practice in reporting measurements; see JCGM 100:2008 (GUM) 7.2.6, which
// asks for at most two significant digits). No exponent is written. u = 0
// gives Format(v, d); NaN or Inf in v gives "—".
func FormatPM(v, u float64, d Dimension) string {
	if !isFinite(v) {
		return NotANumber
	}
	if u == 0 || !isFinite(u) {
		return Format(v, d)
	}
	big := roundSig(math.Max(math.Abs(v), math.Abs(u)), 4)
	if d == DimNone {
		for _, w := range scaleWords {
			if big >= w.v {
				return pm(v/w.v, u/w.v, w.word)
			}
		}
		return pm(v, u, "")
	}
	def := readableUnit(big, d)
	if def == nil {
		return pm(v, u, SIUnit(d))
	}
	return pm(toUnit(v, def, StandardAtmosphere), u/def.factor, def.symbol)
}

// FormatPMIn is FormatPM in a chosen unit of d; the uncertainty is
// converted as a difference (a temperature ± in °C or °F is a difference).
func FormatPMIn(v, u float64, d Dimension, unit string) (string, error) {
	def, err := resolve(unit, d, true)
	if err != nil {
		return "", err
	}
	if !isFinite(v) {
		return NotANumber, nil
	}
	return pm(toUnit(v, def, StandardAtmosphere), u/def.factor, def.symbol), nil
}

// pm formats v ± u (already in the unit of symbol).
func pm(v, u float64, symbol string) string {
	if !isFinite(v) {
		return NotANumber
	}
	u = math.Abs(u)
	if u == 0 || !isFinite(u) {
		return joinUnit(formatNumber(v, 4), symbol)
	}
	// Round u to 2 significant digits if its first digit is 1 or 2, else 1.
	e2 := strconv.FormatFloat(u, 'e', 1, 64)
	m2, _ := strconv.ParseFloat(e2[:strings.IndexByte(e2, 'e')], 64)
	ue := e2
	if m2 >= 3 {
		ue = strconv.FormatFloat(u, 'e', 0, 64)
	}
	k := strings.IndexByte(ue, 'e')
	uexp, _ := strconv.Atoi(ue[k+1:])
	last := uexp // decimal place of the last kept digit
	if strings.Contains(ue[:k], ".") {
		last--
	}
	ur, _ := strconv.ParseFloat(ue, 64)
	vexp := 0
	if v != 0 {
		vexp = int(math.Floor(math.Log10(math.Abs(v))))
	}
	top := max(vexp, uexp)
	if top-last > 15 {
		// The uncertainty is far below the value's precision.
		return joinUnit(formatNumber(v, 4)+" ± "+formatNumber(u, 2), symbol)
	}
	dec := max(0, -last)
	scale := math.Pow(10, float64(last))
	vr := math.Round(v/scale) * scale
	return joinUnit(fixed(vr, dec)+" ± "+fixed(ur, dec), symbol)
}

// fixed writes x with dec decimals, "-0" as "0".
func fixed(x float64, dec int) string {
	s := strconv.FormatFloat(x, 'f', dec, 64)
	if strings.TrimLeft(s, "-0.") == "" {
		return strings.TrimPrefix(s, "-")
	}
	return s
}
