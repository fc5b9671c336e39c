package ui

import (
	"math"
	"strconv"
	"strings"
)

// This file writes the numbers of a plot: tick labels in one scale per
// axis (an SI prefix on the unit, or one power of ten in the axis title,
// never 1e-06 on a tick) and the readout of a point with its unit.

// siPrefixes are the prefixes used on plot axes, by power of ten.
var siPrefixes = map[int]string{-12: "p", -9: "n", -6: "µ", -3: "m", 0: "", 3: "k", 6: "M", 9: "G"}

// prefixable lists the unit symbols that read well with an SI prefix
// (kPa, mm, ms, kHz, mW). Others (K, bar, °C, dimensionless) keep their
// symbol and take a power of ten in the title when the numbers are very
// large or small.
var prefixable = map[string]bool{"Pa": true, "Hz": true, "W": true, "m": true, "s": true, "J": true,
	"N": true, "V": true, "A": true, "g": true, "L/s": true, "m/s": true, "W/m²": true, "J/kg": true}

// unitSwap turns a unit that reads badly with a prefix into one that reads
// well: volume flow in L/s (then mL/s), as the screens show it elsewhere.
var unitSwap = map[string]struct {
	unit   string
	factor float64 // the new unit's value per SI value
}{"m³/s": {"L/s", 1000}}

// axisScale is how one axis writes its numbers: a value v reads as
// v·mul in unit, and the title says so.
type axisScale struct {
	mul   float64 // multiply SI values by this for display
	unit  string  // the unit the numbers are in, prefix included: "kPa"
	power int     // a power of ten the numbers are in (0: none)
}

// suffix is what follows the label in the axis title: "(kPa)",
// "(10⁻⁶ m³/s)", "(×10⁻⁶)" or "".
func (s axisScale) suffix() string {
	switch {
	case s.power != 0 && s.unit != "":
		return "(10" + superscript(s.power) + " " + s.unit + ")"
	case s.power != 0:
		return "(×10" + superscript(s.power) + ")"
	case s.unit != "":
		return "(" + s.unit + ")"
	}
	return ""
}

// title is the axis title: label and suffix.
func (s axisScale) title(label string) string {
	if suf := s.suffix(); suf != "" {
		return label + " " + suf
	}
	return label
}

// chooseScale picks the display scale of an axis in unit whose tick
// labels reach maxAbs (SI). A prefixable unit takes the engineering prefix
// that puts maxAbs in [1, 1000); another unit takes a power of ten only
// when maxAbs is outside [0.01, 10000).
func chooseScale(unit string, maxAbs float64) axisScale {
	if unit == "1" {
		unit = ""
	}
	s := axisScale{mul: 1, unit: unit}
	if sw, ok := unitSwap[unit]; ok {
		s.unit, s.mul = sw.unit, sw.factor
		maxAbs *= sw.factor
	}
	if !(maxAbs > 0) || !finite(maxAbs) {
		return s
	}
	e := int(math.Floor(math.Log10(maxAbs) + 1e-9))
	if prefixable[s.unit] {
		e3 := 3 * int(math.Floor(float64(e)/3))
		e3 = max(-12, min(9, e3))
		s.mul /= math.Pow(10, float64(e3))
		s.unit = siPrefixes[e3] + s.unit
		return s
	}
	if e < -2 || e > 3 {
		s.power = e
		s.mul /= math.Pow(10, float64(e))
	}
	return s
}

// superscript writes n in superscript digits: -6 gives "⁻⁶".
func superscript(n int) string {
	const digits = "⁰¹²³⁴⁵⁶⁷⁸⁹"
	sup := []rune(digits)
	var b strings.Builder
	if n < 0 {
		b.WriteRune('⁻')
		n = -n
	}
	for _, c := range strconv.Itoa(n) {
		b.WriteRune(sup[c-'0'])
	}
	return b.String()
}

// tickDecimals is the fewest decimals (at most 6) that write every value
// of vs exactly enough to tell neighbouring ticks apart.
func tickDecimals(vs []float64) int {
	for d := 0; d < 6; d++ {
		p := math.Pow(10, float64(d))
		ok := true
		for _, v := range vs {
			if x := v * p; math.Abs(x-math.Round(x)) > 1e-6*math.Max(1, math.Abs(x)) {
				ok = false
				break
			}
		}
		if ok {
			return d
		}
	}
	return 6
}

// tickTexts writes display values (already scaled) with one number of
// decimals, and a true minus sign.
func tickTexts(vs []float64) []string {
	d := tickDecimals(vs)
	out := make([]string, len(vs))
	for i, v := range vs {
		out[i] = minusSign(strconv.FormatFloat(v, 'f', d, 64))
	}
	return out
}

// logTickText writes one tick of a log axis (a display value): plain
// below 10000 and from 0.01 ("0.05", "200"), else a power of ten ("10⁻⁶",
// "2×10⁵").
func logTickText(v float64) string {
	if v >= 0.01 && v < 1e4 {
		return minusSign(strconv.FormatFloat(v, 'f', tickDecimals([]float64{v}), 64))
	}
	e := int(math.Floor(math.Log10(v) + 1e-9))
	m := v / math.Pow(10, float64(e))
	if math.Abs(m-1) < 1e-6 {
		return "10" + superscript(e)
	}
	return strconv.FormatFloat(m, 'f', tickDecimals([]float64{m}), 64) + "×10" + superscript(e)
}

// minusSign replaces a leading hyphen with the minus sign U+2212.
func minusSign(s string) string {
	if strings.HasPrefix(s, "-") {
		return "−" + s[1:]
	}
	return s
}

// number writes the SI value v in this scale with 4 significant digits,
// without the unit: "2.315", "3.2 ×10⁻⁶".
func (s axisScale) number(v float64) string {
	if !finite(v) {
		return "—"
	}
	x := v * s.mul
	num := "0"
	if x != 0 {
		e := int(math.Floor(math.Log10(math.Abs(x))))
		num = strconv.FormatFloat(x, 'f', max(0, 3-e), 64)
		if strings.Contains(num, ".") {
			num = strings.TrimSuffix(strings.TrimRight(num, "0"), ".")
		}
		num = minusSign(num)
	}
	if s.power != 0 {
		num += " ×10" + superscript(s.power)
	}
	return num
}

// withUnit appends the scale's unit to a number written by number.
func (s axisScale) withUnit(num string) string {
	if s.unit == "" {
		return num
	}
	return num + " " + s.unit
}

// readout writes the SI value v with its unit: "2.315 kPa", "578.3 Hz",
// "3.2 ×10⁻⁶"; with a half-width dv > 0, "578.3 ± 8 Hz"; "—" for NaN or ±Inf.
func (s axisScale) readout(v, dv float64) string {
	if !finite(v) {
		return "—"
	}
	n := s.number(v)
	if dv > 0 && finite(dv) {
		n += " ± " + s.number(dv)
	}
	return s.withUnit(n)
}
