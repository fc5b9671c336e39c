package ui

import (
	"slices"
	"strings"

	"gioui.org/layout"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// carryState is what a Form keeps about carried values and the operating
// point line.
type carryState struct {
	// entered is set once the screen took values from the Bench, so that
	// values carried in before the storage loaded win over the kept ones.
	entered bool
	// headed is set when a headline shows the operating point, so that the
	// results card does not repeat it.
	headed bool
	// shown lists the inputs on screen (nil: all); hidden inputs are left
	// out of the operating point.
	shown func() []string
	// point, when set, writes the operating point instead of the Form's
	// inputs (the device screens, whose point is in the device).
	point func() string
	// memo is the last line written from the inputs, kept while the
	// result and the inputs it names (and where they came from) are the
	// same, so that a steady frame writes nothing.
	memo pointMemo
}

// pointMemo is the operating-point line and what it was written from.
type pointMemo struct {
	res  *sheet.Result
	key  pointKey
	line string
}

// pointKey is, for each kind of opKinds, the index of the input that
// gives it (-1 for none) and the screen its value came from.
type pointKey struct {
	item [len(opKinds)]int
	from [len(opKinds)]string
}

// opKinds are the values of an operating point, in the order the line
// names them.
var opKinds = [...]carryKind{carryGas, carryPressure, carryTemperature, carryFrequency}

// opPart is one value of the operating point: what it is, as shown, and
// the screen it came from ("" when typed here).
type opPart struct {
	kind  carryKind
	value string
	from  string
}

// writtenWithExponent reports whether s holds a number written with an
// exponent ("1e5", "2.5E-3": a digit, e or E, an optional sign, a digit),
// which the screen never shows. (A loop rather than a regular expression:
// Go's regexp package adds about 100 kB to the browser download.)
func writtenWithExponent(s string) bool {
	digit := func(c byte) bool { return '0' <= c && c <= '9' }
	for i := 1; i+1 < len(s); i++ {
		if (s[i] != 'e' && s[i] != 'E') || !digit(s[i-1]) {
			continue
		}
		j := i + 1
		if s[j] == '+' || s[j] == '-' {
			j++
		}
		if j < len(s) && digit(s[j]) {
			return true
		}
	}
	return false
}

// OperatingPoint returns the line that says at which gas, pressure,
// temperature and frequency the result was worked out and where each came
// from, e.g. "At helium, 10 bar, 300 K, 400 Hz · frequency from Tube
// resonance; the rest set here"; "" when there is no result. The line is
// written again only when the result or the inputs it names change.
func (f *Form) OperatingPoint() string {
	if f.result == nil {
		return ""
	}
	if f.cs.point != nil {
		return f.cs.point()
	}
	key := f.pointKey()
	if m := &f.cs.memo; m.res != f.result || m.key != key || m.line == "" {
		m.res, m.key, m.line = f.result, key, pointLine(f.pointParts(key), "set here")
	}
	return f.cs.memo.line
}

// pointKey finds, for each kind of opKinds, the first of the Form's inputs
// shown that gives it and has a value, and where that value came from.
func (f *Form) pointKey() pointKey {
	var shown []string
	if f.cs.shown != nil {
		shown = f.cs.shown()
	}
	v := f.result.Values
	var key pointKey
	for n, k := range opKinds {
		key.item[n] = -1
		for i := range f.items {
			it := &f.items[i]
			fk := f.kind(it)
			if fk == carryMeasured {
				fk = carryFrequency
			}
			if fk != k || (f.cs.shown != nil && !slices.Contains(shown, it.in.Key)) || !v.Has(it.in.Key) {
				continue
			}
			key.item[n], key.from[n] = i, it.carriedFrom()
			break
		}
	}
	return key
}

// pointParts are the operating-point values of the inputs key names, in
// the order of opKinds.
func (f *Form) pointParts(key pointKey) []opPart {
	v := f.result.Values
	var parts []opPart
	for n, k := range opKinds {
		if i := key.item[n]; i >= 0 {
			parts = append(parts, opPart{kind: k, value: shownValue(v.Get(f.items[i].in.Key)), from: key.from[n]})
		}
	}
	return parts
}

// shownValue writes an input's value for the operating point: as typed
// when that reads plainly, else formatted with its unit.
func shownValue(val *sheet.Value) string {
	if val.In.Kind == sheet.Gas {
		return val.Mix.String()
	}
	t := strings.TrimSpace(val.Text)
	if t != "" && !writtenWithExponent(t) && strings.ContainsAny(t, "abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ°") {
		return t
	}
	if w := writtenIn(val.Q.Value, val.In.Dim); len(w) > 0 {
		return w[0]
	}
	return units.Format(val.Q.Value, val.In.Dim)
}

// pointLine joins the parts into the operating-point line, naming each
// source once ("temperature and frequency from Tube resonance"); rest
// says where the values without a source came from ("set here").
func pointLine(parts []opPart, rest string) string {
	if len(parts) == 0 {
		return ""
	}
	vals := make([]string, len(parts))
	var froms []string
	kinds := map[string][]string{}
	carried := 0
	for i, p := range parts {
		vals[i] = p.value
		if p.from == "" {
			continue
		}
		if _, ok := kinds[p.from]; !ok {
			froms = append(froms, p.from)
		}
		kinds[p.from] = append(kinds[p.from], string(p.kind))
		carried++
	}
	srcs := make([]string, len(froms))
	for i, from := range froms {
		srcs[i] = andList(kinds[from]) + " from " + from
	}
	line := "At " + strings.Join(vals, ", ") + " · "
	switch {
	case carried == 0:
		return line + "all " + rest
	case carried == len(parts):
		return line + strings.Join(srcs, "; ")
	}
	return line + strings.Join(srcs, "; ") + "; the rest " + rest
}

// andList joins words as people do: "a", "a and b", "a, b and c".
func andList(w []string) string {
	if len(w) < 2 {
		return strings.Join(w, "")
	}
	return strings.Join(w[:len(w)-1], ", ") + " and " + w[len(w)-1]
}

// PointWidget draws the operating-point line, or nothing without a
// result. It is described "Operating point" for tests and screen readers.
func (f *Form) PointWidget(gtx layout.Context) layout.Dimensions {
	line := f.OperatingPoint()
	if line == "" {
		return layout.Dimensions{}
	}
	l := material.Body2(f.env.Theme, line)
	l.Color = f.env.Colors.Text
	return describe(gtx, "Operating point", l.Layout)
}

// resultCard is the results card with the operating point on top, unless
// a headline already shows it.
func (f *Form) resultCard(gtx layout.Context) layout.Dimensions {
	if f.cs.headed || f.OperatingPoint() == "" {
		return f.Results.Layout(gtx)
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(f.PointWidget),
		layout.Rigid(layout.Spacer{Height: 6}.Layout),
		layout.Rigid(f.Results.Layout),
	)
}
