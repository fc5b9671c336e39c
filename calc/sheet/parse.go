package sheet

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// ErrRequired is the reason of a FieldError for a required input left
// empty.
var ErrRequired = errors.New("required")

// MaxSweepPoints bounds a sweep, so that a slip ("1e9") cannot hang the
// app or the terminal.
const MaxSweepPoints = 100000

// ParseInput reads text for input in. An empty text means the default;
// empty with no default leaves the value unset, which is an error when the
// input is required. Every error is a *FieldError naming in.Key.
func ParseInput(in *Input, text string) (Value, error) {
	v := Value{In: in, Text: text, Given: strings.TrimSpace(text) != ""}
	if !v.Given {
		v.Text = in.Default
		if strings.TrimSpace(in.Default) == "" {
			if in.Required() {
				return v, &FieldError{Key: in.Key, Label: in.Label, Err: fmt.Errorf("%w: type a value%s", ErrRequired, hintSuffix(in))}
			}
			if in.Kind == Switch {
				v.Set = true
			}
			return v, nil
		}
	}
	if err := read(in, &v); err != nil {
		return v, &FieldError{Key: in.Key, Label: in.Label, Text: v.Text, Err: err}
	}
	v.Set = true
	return v, nil
}

func hintSuffix(in *Input) string {
	if in.Hint == "" {
		return ""
	}
	return " (" + in.Hint + ")"
}

// read parses v.Text into v according to in.Kind.
func read(in *Input, v *Value) error {
	s := strings.TrimSpace(v.Text)
	switch in.Kind {
	case Quantity:
		q, err := units.ParseWith(s, in.Dim, in.Units)
		if err != nil {
			return err
		}
		if !finite(q.Value) || !finite(q.Uncertainty) {
			return errors.New("not a finite number")
		}
		if q.Uncertainty > 0 && !in.PM {
			return errors.New("takes no ± here; type the value alone")
		}
		if err := checkRange(in, q.Value, units.SIUnit(in.Dim)); err != nil {
			return err
		}
		v.Q = q
	case Gas:
		m, err := gasprops.ParseMixture(s)
		if err != nil {
			return err
		}
		v.Mix = m
	case Pick:
		for _, c := range in.Choices {
			if strings.EqualFold(s, c.Key) || strings.EqualFold(s, c.Words) {
				v.Pick = c
				return nil
			}
		}
		return fmt.Errorf("%s is not a choice; choose one of %s", quote(s), strings.Join(in.ChoiceKeys(), ", "))
	case Count:
		n, err := strconv.Atoi(s)
		if err != nil {
			return fmt.Errorf("%s is not a whole number%s", quote(s), rangeSuffix(in))
		}
		if err := checkRange(in, float64(n), ""); err != nil {
			return err
		}
		v.N = n
	case Number:
		x, err := strconv.ParseFloat(s, 64)
		if err != nil || !finite(x) {
			return fmt.Errorf("%s is not a finite number%s", quote(s), rangeSuffix(in))
		}
		if err := checkRange(in, x, ""); err != nil {
			return err
		}
		v.X = x
	case Switch:
		b, ok := switchWords[strings.ToLower(s)]
		if !ok {
			return fmt.Errorf("%s: say on or off (yes/no, true/false)", quote(s))
		}
		v.On = b
	case Text:
		// taken as typed; the Run checks it
	case Sweep:
		sp, err := readSpan(s, in)
		if err != nil {
			return err
		}
		v.Span = sp
	default:
		panic(fmt.Sprintf("calc: input %s has unknown kind %d", in.Key, in.Kind))
	}
	return nil
}

// checkRange returns a units.RangeError when x lies outside in's bounds.
func checkRange(in *Input, x float64, unit string) error {
	if !in.bounded() {
		return nil
	}
	lo, hi := in.Min, in.Max
	if hi == 0 && lo != 0 {
		hi = math.Inf(1)
	}
	bad := x < lo || x > hi || (in.MinOpen && x == lo) || (in.MaxOpen && x == hi)
	if !bad {
		return nil
	}
	return units.NewRangeError(strings.ToLower(in.Label), x, lo, hi, unit)
}

func rangeSuffix(in *Input) string {
	if !in.bounded() {
		return ""
	}
	if in.Max == 0 {
		return " (at least " + units.Number(in.Min, 6) + ")"
	}
	return " (valid range " + units.Number(in.Min, 6) + " to " + units.Number(in.Max, 6) + ")"
}

// switchWords are the words a Switch takes.
var switchWords = map[string]bool{
	"on": true, "yes": true, "true": true, "1": true, "t": true,
	"off": false, "no": false, "false": false, "0": false, "f": false,
}

// readSpan parses FROM:TO or FROM:TO:N (11 points by default).
func readSpan(s string, in *Input) (Span, error) {
	parts := strings.Split(s, ":")
	if len(parts) < 2 || len(parts) > 3 {
		return Span{}, errors.New("write the range as FROM:TO or FROM:TO:N, e.g. 250K:350K:11")
	}
	var ends [2]float64
	for i, p := range parts[:2] {
		q, err := units.ParseWith(p, in.Dim, in.Units)
		if err != nil {
			return Span{}, err
		}
		if !finite(q.Value) {
			return Span{}, errors.New("not a finite number")
		}
		if err := checkRange(in, q.Value, units.SIUnit(in.Dim)); err != nil {
			return Span{}, err
		}
		ends[i] = q.Value
	}
	n := 11
	if len(parts) == 3 {
		v, err := strconv.Atoi(strings.TrimSpace(parts[2]))
		if err != nil {
			return Span{}, fmt.Errorf("the number of points %s is not a whole number", quote(parts[2]))
		}
		if v < 2 || v > MaxSweepPoints {
			return Span{}, units.NewRangeError("number of points", float64(v), 2, MaxSweepPoints, "")
		}
		n = v
	}
	return Span{From: ends[0], To: ends[1], N: n}, nil
}

// quote quotes typed text for a message, shortened to 40 characters.
func quote(s string) string {
	if r := []rune(s); len(r) > 40 {
		s = string(r[:40]) + "…"
	}
	return strconv.Quote(s)
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }
