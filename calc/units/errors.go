package units

import (
	"math"
	"strings"
	"unicode/utf8"
)

// RangeError reports a value outside the range where a model or formula is
// valid. Every package of the project returns it for out-of-range input so
// that screens and the terminal companion can name the field, the value and
// the bounds the same way.
type RangeError struct {
	Field string  // what the value is, e.g. "temperature", "plate spacing"
	Value float64 // the offending value, in Unit
	Min   float64 // lower bound in Unit; -Inf when there is none
	Max   float64 // upper bound in Unit; +Inf when there is none
	Unit  string  // unit symbol of Value, Min and Max, normally the SI one ("K", "m")
	Why   string  // optional: whose range it is, e.g. "helium model"
	// Subject says, typed, which kind of input the value is, set where the
	// value is checked, so that a front end finds the field by equality
	// (never by reading Field or the message). Zero when not set.
	Subject Subject
}

// Subject is the kind of input a RangeError is about.
type Subject int

// The subjects a calculator input can be. SubjectNone means not said.
const (
	SubjectNone        Subject = iota
	SubjectTemperature         // a gas temperature
	SubjectPressure            // a mean or charge pressure
	SubjectFrequency           // an operating or measured frequency
	SubjectComposition         // a mixture fraction
)

// Of returns e with its Subject set, for chaining at the place of the
// check: units.NewRangeError(...).Of(units.SubjectTemperature).
func (e *RangeError) Of(s Subject) *RangeError {
	e.Subject = s
	return e
}

// NewRangeError returns a RangeError for field with the given value, bounds
// and unit symbol. Use ±Inf for a bound that does not exist.
func NewRangeError(field string, value, min, max float64, unit string) *RangeError {
	return &RangeError{Field: field, Value: value, Min: min, Max: max, Unit: unit}
}

// Error reads like "temperature 15 K is outside the valid range 20–3000 K
// (helium model)", or for one-sided ranges "length -0.005 m must be at least
// 0 m". A value exactly on a bound was refused, so that bound is open: "gap
// 0 m must be greater than zero", "solid fraction 1 must be less than 1
// (valid range 0–1, ends excluded)". Numbers have 4 significant digits.
func (e *RangeError) Error() string {
	field := e.Field
	if field == "" {
		field = "value"
	}
	var b strings.Builder
	b.WriteString(field)
	b.WriteByte(' ')
	b.WriteString(e.withUnit(e.Value))
	lo, hi := !math.IsInf(e.Min, -1) && !math.IsNaN(e.Min), !math.IsInf(e.Max, 1) && !math.IsNaN(e.Max)
	// A value sitting on a bound was refused, so that bound is open: say
	// "greater than" or "less than" rather than "at least 0 m" or "outside
	// 0–1", which read as if the value typed were allowed.
	switch {
	case lo && hi && e.Value == e.Min:
		b.WriteString(" must be greater than ")
		b.WriteString(e.withUnit(e.Min))
		b.WriteString(" (valid range ")
		b.WriteString(e.rangeText())
		b.WriteString(", ends excluded)")
	case lo && hi && e.Value == e.Max:
		b.WriteString(" must be less than ")
		b.WriteString(e.withUnit(e.Max))
		b.WriteString(" (valid range ")
		b.WriteString(e.rangeText())
		b.WriteString(", ends excluded)")
	case lo && hi:
		b.WriteString(" is outside the valid range ")
		b.WriteString(e.rangeText())
	case lo && e.Value == 0 && e.Min == 0:
		b.WriteString(" must be greater than zero")
	case lo && e.Value == e.Min:
		b.WriteString(" must be greater than ")
		b.WriteString(e.withUnit(e.Min))
	case lo:
		b.WriteString(" must be at least ")
		b.WriteString(e.withUnit(e.Min))
	case hi:
		b.WriteString(" must be at most ")
		b.WriteString(e.withUnit(e.Max))
	default:
		b.WriteString(" is not a finite number")
	}
	if e.Why != "" {
		b.WriteString(" (")
		b.WriteString(e.Why)
		b.WriteByte(')')
	}
	return b.String()
}

// rangeText writes the bounds as "0–1", "20–3000 K" or "0–100 MPa": the
// lower bound in the upper bound's readable unit, unless it would read
// below 0.001 there ("100 µm–3 m").
func (e *RangeError) rangeText() string {
	d, ok := siDim(e.Unit)
	if !ok || !isFinite(e.Max) {
		return formatNumber(e.Min, 4) + "–" + e.withUnit(e.Max)
	}
	if d == DimNone {
		return formatPlain(e.Min, 4) + "–" + formatPlain(e.Max, 4)
	}
	def := readableUnit(roundSig(e.Max, 4), d)
	if def == nil {
		return formatNumber(e.Min, 4) + "–" + e.withUnit(e.Max)
	}
	lo := toUnit(e.Min, def, StandardAtmosphere)
	if lo != 0 && math.Abs(roundSig(lo, 4)) < 1e-3 {
		return e.withUnit(e.Min) + "–" + e.withUnit(e.Max)
	}
	return formatNumber(lo, 4) + "–" + formatDef(e.Max, def, StandardAtmosphere, 4)
}

// withUnit writes v with the error's unit; a value in the SI unit of a
// dimension is written in that dimension's readable unit (see Format).
func (e *RangeError) withUnit(v float64) string {
	if !isFinite(v) {
		return formatNumber(v, 4)
	}
	if d, ok := siDim(e.Unit); ok {
		return formatReadable(v, d, 4)
	}
	s := formatNumber(v, 4)
	if e.Unit == "" {
		return s
	}
	return s + " " + e.Unit
}

// siDim returns the first dimension whose SI symbol is unit ("" gives
// DimNone, "K" an absolute temperature, "m²/s" a kinematic viscosity).
func siDim(unit string) (Dimension, bool) {
	for d := range dims {
		if dims[d].si == unit {
			return Dimension(d), true
		}
	}
	return 0, false
}

// ParseError reports typed input that Parse could not accept. Its message
// quotes the input, says what is wrong and, where it helps, lists the units
// accepted for the dimension.
type ParseError struct {
	Input    string    // the text as typed
	Dim      Dimension // the dimension that was asked for
	Msg      string    // what is wrong, phrased to follow the quoted input
	Accepted []string  // units accepted for Dim, when the unit was the problem
	Err      error     // underlying error, e.g. a *RangeError; may be nil
}

// Error reads like `"10 bar" is a pressure, not a length` or
// `"3 parsec" has an unknown length unit "parsec"; accepted: m, mm, ...`.
func (e *ParseError) Error() string {
	var b strings.Builder
	b.WriteString(quoteInput(e.Input))
	b.WriteByte(' ')
	b.WriteString(e.Msg)
	if len(e.Accepted) > 0 {
		b.WriteString("; accepted: ")
		b.WriteString(strings.Join(e.Accepted, ", "))
	}
	return b.String()
}

// Unwrap returns the underlying error, so errors.As finds a *RangeError.
func (e *ParseError) Unwrap() error { return e.Err }

// quoteInput quotes s for a message, shortened to 40 characters.
func quoteInput(s string) string {
	const max = 40
	if utf8.RuneCountInString(s) > max {
		r := []rune(s)
		s = string(r[:max]) + "…"
	}
	var b strings.Builder
	b.WriteByte('"')
	for _, r := range s {
		switch {
		case r == '"':
			b.WriteString(`\"`)
		case r == utf8.RuneError || r < ' ' || r == 0x7f:
			b.WriteString("\uFFFD")
		default:
			b.WriteRune(r)
		}
	}
	b.WriteByte('"')
	return b.String()
}
