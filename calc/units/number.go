package units

import (
	"math"
	"strconv"
	"strings"
	"unicode/utf8"
)

// This file reads the number at the start of a typed quantity: decimals
// with a point or a comma, exponents, and the fractions of inch sizes
// ("3/8", "1 1/2", "1-1/2", "1½").

// vulgar maps the Unicode fraction characters to their values.
var vulgar = map[rune]float64{
	'½': 1.0 / 2, '⅓': 1.0 / 3, '⅔': 2.0 / 3, '¼': 1.0 / 4, '¾': 3.0 / 4,
	'⅕': 1.0 / 5, '⅖': 2.0 / 5, '⅗': 3.0 / 5, '⅘': 4.0 / 5, '⅙': 1.0 / 6,
	'⅚': 5.0 / 6, '⅛': 1.0 / 8, '⅜': 3.0 / 8, '⅝': 5.0 / 8, '⅞': 7.0 / 8,
}

// numError is a problem with the number itself; Parse wraps it.
type numError string

func (e numError) Error() string { return string(e) }

func isDigit(c byte) bool { return c >= '0' && c <= '9' }

// digits returns the length of the run of ASCII digits at the start of s.
func digits(s string) int {
	n := 0
	for n < len(s) && isDigit(s[n]) {
		n++
	}
	return n
}

// scanNumber reads a number at the start of s (leading spaces allowed) and
// returns its value and the rest of s. It fails when s does not start with
// a number, on NaN and infinities, and on ambiguous separators.
func scanNumber(s string) (float64, string, error) {
	s = strings.TrimLeft(s, " ")
	neg := false
	switch {
	case strings.HasPrefix(s, "-"):
		neg, s = true, s[1:]
	case strings.HasPrefix(s, "−"): // U+2212 minus sign
		neg, s = true, s[len("−"):]
	case strings.HasPrefix(s, "+"):
		s = s[1:]
	}
	s = strings.TrimLeft(s, " ")
	if low := strings.ToLower(s); strings.HasPrefix(low, "nan") || strings.HasPrefix(low, "inf") || strings.HasPrefix(s, "∞") {
		return 0, s, numError("is not a finite number")
	}
	// A leading Unicode fraction: "½ in".
	if r, size := utf8.DecodeRuneInString(s); vulgar[r] != 0 {
		return sign(neg, vulgar[r]), s[size:], nil
	}
	intLen := digits(s)
	i := intLen
	sep := byte(0)
	fracLen := 0
	if i < len(s) && (s[i] == '.' || s[i] == ',') && (intLen > 0 || i+1 < len(s) && isDigit(s[i+1])) {
		sep = s[i]
		fracLen = digits(s[i+1:])
		i += 1 + fracLen
	}
	if intLen == 0 && fracLen == 0 {
		return 0, s, numError("does not start with a number")
	}
	if i < len(s) && (s[i] == '.' || s[i] == ',') && i+1 < len(s) && isDigit(s[i+1]) {
		return 0, s, numError("has two separators in one number; write it without thousands separators, e.g. 1500.5")
	}
	if sep == ',' && fracLen == 3 && intLen > 0 && s[0] != '0' {
		return 0, s, numError("is ambiguous: is the comma a decimal comma or a thousands separator? Write e.g. 1.5 or 1500")
	}
	mant := s[:i]
	if sep == ',' {
		mant = strings.Replace(mant, ",", ".", 1)
	}
	// Exponent: e or E, optional sign, digits.
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		if n := digits(s[j:]); n > 0 {
			mant += "e" + s[i+1:j+n]
			i = j + n
		}
	}
	v, err := strconv.ParseFloat(mant, 64)
	if err != nil {
		return 0, s, numError("has a number too large or too small to represent")
	}
	rest := s[i:]
	plainInt := sep == 0 && !strings.ContainsAny(mant, "eE")
	if plainInt {
		if f, r, ok := fraction(rest, intLen > 0); ok {
			if f.err != nil {
				return 0, s, f.err
			}
			if f.mixed {
				v += f.value
			} else {
				v /= f.denominator
			}
			rest = r
		}
	}
	if !isFinite(v) {
		return 0, s, numError("has a number too large to represent")
	}
	return sign(neg, v), rest, nil
}

// fracPart is what follows an integer: "/8" (a simple fraction whose
// numerator is the integer) or " 1/2", "-1/2", "½" (a mixed number).
type fracPart struct {
	value       float64 // value of the fractional part of a mixed number
	denominator float64 // denominator of a simple fraction
	mixed       bool
	err         error
}

// fraction looks for a fraction after an integer; ok is false when there is
// none and rest should be read as a unit.
func fraction(rest string, haveInt bool) (fracPart, string, bool) {
	if !haveInt {
		return fracPart{}, rest, false
	}
	// Simple fraction "3/8".
	if len(rest) > 1 && rest[0] == '/' && isDigit(rest[1]) {
		n := digits(rest[1:])
		den := digitsValue(rest[1 : 1+n])
		if den == 0 {
			return fracPart{err: numError("divides by zero")}, rest, true
		}
		return fracPart{denominator: den}, rest[1+n:], true
	}
	// Unicode fraction straight after the integer: "1½".
	if r, size := utf8.DecodeRuneInString(rest); vulgar[r] != 0 {
		return fracPart{value: vulgar[r], mixed: true}, rest[size:], true
	}
	// Mixed number "1 1/2" or "1-1/2".
	t := rest
	switch {
	case strings.HasPrefix(t, "-"):
		t = t[1:]
	case strings.HasPrefix(t, " "):
		t = strings.TrimLeft(t, " ")
	default:
		return fracPart{}, rest, false
	}
	if r, size := utf8.DecodeRuneInString(t); vulgar[r] != 0 && !strings.HasPrefix(rest, "-") {
		return fracPart{value: vulgar[r], mixed: true}, t[size:], true
	}
	n := digits(t)
	if n == 0 || n+1 >= len(t) || t[n] != '/' || !isDigit(t[n+1]) {
		return fracPart{}, rest, false
	}
	m := digits(t[n+1:])
	num, den := digitsValue(t[:n]), digitsValue(t[n+1:n+1+m])
	if den == 0 {
		return fracPart{err: numError("divides by zero")}, rest, true
	}
	return fracPart{value: num / den, mixed: true}, t[n+1+m:], true
}

// digitsValue parses a run of ASCII digits already checked by the caller;
// a run too long to represent gives +Inf, which the caller rejects.
func digitsValue(s string) float64 {
	v, _ := strconv.ParseFloat(s, 64)
	return v
}

func sign(neg bool, v float64) float64 {
	if neg {
		return -v
	}
	return v
}

// isFinite reports whether v is neither NaN nor infinite.
func isFinite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
