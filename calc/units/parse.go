package units

import (
	"math"
	"strings"
	"unicode"
)

// This file reads what people type at the bench: "10 bar", "30 barg",
// "27 °C", "3/8 in", "0,25 mm", "440 Hz ± 5 Hz".

// Parse reads s as a quantity of dimension dim and returns it in SI units
// with the default Options. See ParseWith.
func Parse(s string, dim Dimension) (Quantity, error) {
	return ParseWith(s, dim, Options{})
}

// ParseWith reads s as a quantity of dimension dim and returns its SI value.
//
// The input is a number, an optional unit and an optional uncertainty after
// "±", "+-" or "+/-": "10 bar", "10bar", "1 1/2 in", "0,25 mm", "2e-3 m",
// "440 ± 5 Hz", "0.25 m ± 1 mm", "20 °C ± 2 K", "440 Hz ± 1 %". A number
// may use a decimal point or a decimal comma (not both; a comma followed
// by exactly three digits, as in "1,500", is refused as ambiguous), an
// exponent, and for inch sizes a fraction ("3/8", "1 1/2", "1-1/2", "1½").
// When only one side of "±" has a unit the other shares it. An uncertainty
// on a temperature is a difference ("± 3.6 degF" is 2 K); a "%" uncertainty
// is relative to the value, except for DimNone where % is the unit itself.
// Units(dim) lists the units offered; more spellings are accepted.
//
// Gauge pressures ("30 barg", "30 psig") are returned absolute, adding
// o.Atmosphere (StandardAtmosphere when zero), with Gauge set.
//
// ParseWith returns a *ParseError, naming the input, for: empty input, a
// missing number, NaN or infinities, an unknown unit (listing the accepted
// ones), a unit of another dimension ("\"10 bar\" is a pressure, not a
// length"), a bare number when dim needs a unit and o.DefaultUnit is empty,
// temperatures at or below absolute zero, absolute pressures below zero,
// negative values of dimensions that cannot be negative (unless
// o.AllowNegative; see AllowsNegative), negative uncertainties, and values
// whose magnitude exceeds MaxMagnitude(dim). For range problems the
// *ParseError wraps a *RangeError.
func ParseWith(s string, dim Dimension, o Options) (Quantity, error) {
	if !dim.valid() {
		panic("calc: units: unknown Dimension")
	}
	p := parser{input: s, dim: dim, opt: o}
	return p.parse()
}

type parser struct {
	input string
	dim   Dimension
	opt   Options
}

func (p *parser) fail(msg string, err error) error {
	return &ParseError{Input: p.input, Dim: p.dim, Msg: msg, Err: err}
}

func (p *parser) failUnits(msg string) error {
	return &ParseError{Input: p.input, Dim: p.dim, Msg: msg, Accepted: Units(p.dim), Err: ErrUnknownUnit}
}

// splitPM splits s at its "±", "+/-" or "+-"; found reports whether there
// was one.
func splitPM(s string) (value, unc string, found bool, ok bool) {
	for _, sep := range [...]string{"±", "+/-", "+-"} {
		if i := strings.Index(s, sep); i >= 0 {
			value, unc = s[:i], s[i+len(sep):]
			if strings.Contains(unc, "±") || strings.Contains(unc, "+/-") || strings.Contains(unc, "+-") {
				return "", "", true, false
			}
			return value, unc, true, true
		}
	}
	return s, "", false, true
}

// piece is one side of "±": a number and its unit text (maybe empty).
type piece struct {
	x    float64
	unit string
}

func (p *parser) readPiece(s string) (piece, error) {
	x, rest, err := scanNumber(s)
	if err != nil {
		return piece{}, p.fail(err.Error(), nil)
	}
	unit := normalizeUnit(rest)
	perUnit := strings.HasPrefix(unit, "1/") && len(unit) > 2 && !isDigit(unit[2]) // "1/s", "1/m²"
	if unit != "" && !perUnit && (isDigit(unit[0]) || unit[0] == '.' || unit[0] == ',' || strings.HasPrefix(unit, "/0") ||
		len(unit) > 1 && unit[0] == '/' && isDigit(unit[1])) {
		return piece{}, p.fail("has more than one number; write numbers without spaces or thousands separators", nil)
	}
	return piece{x: x, unit: unit}, nil
}

func (p *parser) parse() (Quantity, error) {
	s := strings.TrimSpace(strings.Map(func(r rune) rune {
		if unicode.IsSpace(r) { // tabs, no-break and thin spaces
			return ' '
		}
		return r
	}, p.input))
	if s == "" {
		return Quantity{}, p.fail("is empty; type "+article(p.dim.String())+" "+p.dim.String()+" such as "+p.dim.info().example, nil)
	}
	vs, us, hasPM, ok := splitPM(s)
	if !ok {
		return Quantity{}, p.fail("has more than one ±", nil)
	}
	val, err := p.readPiece(vs)
	if err != nil {
		return Quantity{}, err
	}
	var unc piece
	if hasPM {
		if strings.TrimSpace(us) == "" {
			return Quantity{}, p.fail("has nothing after ±; write e.g. 440 ± 5 Hz", nil)
		}
		if unc, err = p.readPiece(us); err != nil {
			return Quantity{}, err
		}
	}
	// One side without a unit shares the other's (not a relative %).
	valUnit := val.unit
	if valUnit == "" && hasPM && unc.unit != "" && !(unc.unit == "%" && p.dim != DimNone) {
		valUnit = unc.unit
	}
	def, err := p.unit(valUnit)
	if err != nil {
		return Quantity{}, err
	}
	assumed := false
	if p.opt.BareGauge && p.dim == DimPressure {
		def, assumed = bareAsGauge(def, valUnit)
	}
	atm := p.opt.Atmosphere
	if atm == 0 {
		atm = StandardAtmosphere
	}
	if def != nil && def.gauge && (!isFinite(atm) || atm < 0) {
		return Quantity{}, p.fail("cannot be read: the atmosphere for gauge pressures is not a valid pressure", NewRangeError("atmosphere", atm, 0, math.Inf(1), "Pa"))
	}
	q := Quantity{Dim: p.dim}
	if def == nil { // DimNone, bare number
		q.Value = val.x
	} else {
		q.Value = fromUnit(val.x, def, atm)
		q.Unit = def.name
		q.Gauge = def.gauge
		q.Assumed = assumed
	}
	if err := p.checkValue(q.Value); err != nil {
		return Quantity{}, err
	}
	if hasPM {
		if q.Uncertainty, err = p.uncertainty(unc, val, def); err != nil {
			return Quantity{}, err
		}
	}
	return q, nil
}

// unit resolves the unit of the value; nil means a bare number of DimNone.
func (p *parser) unit(unit string) (*unitDef, error) {
	if unit == "" {
		if p.opt.DefaultUnit != "" {
			def := idx.find(p.dim, normalizeUnit(p.opt.DefaultUnit))
			if def == nil {
				return nil, &ParseError{Input: p.input, Dim: p.dim, Msg: "has no unit, and the default unit " + quoteInput(p.opt.DefaultUnit) + " is not " + article(p.dim.String()) + " " + p.dim.String() + " unit", Accepted: Units(p.dim)}
			}
			return def, nil
		}
		if p.dim == DimNone {
			return nil, nil
		}
		return nil, &ParseError{Input: p.input, Dim: p.dim, Msg: "has no unit; add one, e.g. " + p.dim.info().example, Accepted: Units(p.dim)}
	}
	if def := idx.find(p.dim, unit); def != nil {
		return def, nil
	}
	return nil, p.unitError(unit)
}

// unitError explains a unit that is not one of dim's.
func (p *parser) unitError(unit string) error {
	if other := idx.findAny(unit); other != nil && other.dim != p.dim {
		msg := "is " + article(other.dim.String()) + " " + other.dim.String() + ", not " + article(p.dim.String()) + " " + p.dim.String()
		if other.gauge && p.dim == DimStress {
			msg += "; a stress is never gauge"
		}
		return &ParseError{Input: p.input, Dim: p.dim, Msg: msg, Accepted: Units(p.dim)}
	}
	msg := "has an unknown " + p.dim.String() + " unit " + quoteInput(unit)
	switch {
	case (p.dim == DimTemperature || p.dim == DimTemperatureDifference) && (unit == "C" || unit == "F" || unit == "c" || unit == "f"):
		msg += " (write °" + strings.ToUpper(unit) + " or deg" + strings.ToUpper(unit) + "; " + unit + " alone is ambiguous)"
	case (p.dim == DimTemperature || p.dim == DimTemperatureDifference) && (unit == "°" || unit == "deg"):
		msg += " (write °C or °F)"
	case len(idx.clash[p.dim][strings.ToLower(unit)]) > 0:
		msg += " (letter case matters here: " + strings.Join(idx.clash[p.dim][strings.ToLower(unit)], " or ") + ")"
	case idx.foldHint(p.dim, unit) != "":
		msg += " (letter case matters here: did you mean " + idx.foldHint(p.dim, unit) + "?)"
	}
	return p.failUnits(msg)
}

// checkValue applies the sign and magnitude rules to an SI value.
func (p *parser) checkValue(v float64) error {
	info := p.dim.info()
	si := info.si
	switch {
	case !isFinite(v):
		return p.fail("is not a finite number", NewRangeError(info.name, v, -info.maxAbs, info.maxAbs, si))
	case p.dim == DimTemperature && v <= 0:
		return p.fail("is at or below absolute zero ("+Format(v, DimTemperature)+")", NewRangeError(info.name, v, 0, info.maxAbs, si))
	case p.dim == DimPressure && v < 0:
		return p.fail("is below vacuum: absolute pressure "+Format(v, DimPressure)+" is negative", NewRangeError(info.name, v, 0, info.maxAbs, si))
	case v < 0 && !info.negative && !p.opt.AllowNegative:
		return p.fail("is negative; "+article(info.name)+" "+info.name+" cannot be negative here", NewRangeError(info.name, v, 0, info.maxAbs, si))
	case math.Abs(v) > info.maxAbs:
		return p.fail("is absurdly large for "+article(info.name)+" "+info.name+" (at most "+Format(info.maxAbs, p.dim)+" is accepted)", NewRangeError(info.name, v, -info.maxAbs, info.maxAbs, si))
	}
	return nil
}

// uncertainty converts the part after ± to SI. Its unit is read as a
// difference: offsets and the atmosphere are not applied.
func (p *parser) uncertainty(unc, val piece, valDef *unitDef) (float64, error) {
	if unc.x < 0 {
		return 0, p.fail("has a negative uncertainty; write the ± amount as a positive number", NewRangeError("uncertainty", unc.x, 0, math.Inf(1), ""))
	}
	var u float64
	switch {
	case unc.unit == "%" && p.dim != DimNone:
		if valDef != nil && (valDef.offset != 0 || valDef.gauge || p.dim == DimSoundLevel) {
			return 0, p.fail("has a % uncertainty on a value in "+valDef.symbol+", where a percentage is ambiguous; write the ± amount in a unit", nil)
		}
		u = unc.x / 100 * math.Abs(fromUnit(val.x, valDef, 0))
	case unc.unit == "" && valDef == nil: // DimNone bare numbers
		u = unc.x
	default:
		udim := p.dim
		if udim == DimTemperature {
			udim = DimTemperatureDifference
		}
		var def *unitDef
		if unc.unit == "" {
			def = idx.find(udim, valDef.name)
		} else if def = idx.find(udim, unc.unit); def == nil && udim != p.dim {
			def = idx.find(p.dim, unc.unit) // e.g. "± 2 degR" on a temperature
		}
		if def == nil {
			if unc.unit == "" {
				return 0, p.fail("has an uncertainty without a unit; add one after the number", nil)
			}
			return 0, p.unitError(unc.unit)
		}
		u = unc.x * def.factor
	}
	if !isFinite(u) || u > p.dim.info().maxAbs {
		return 0, p.fail("has an absurd uncertainty", NewRangeError("uncertainty", u, 0, p.dim.info().maxAbs, p.dim.info().si))
	}
	return u, nil
}
