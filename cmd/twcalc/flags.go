package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// flagKind says how the text given to one flag is read.
type flagKind int

const (
	kindQuantity flagKind = iota
	kindString
	kindChoice
	kindInt
	kindFloat
	kindBool
	kindGas
	kindSpan
)

// flagDef is one flag of a subcommand: its text as typed and where the
// parsed value goes. Values are read in flags.parse, after the whole command
// line is known, so that every message can name the flag and the value.
type flagDef struct {
	name, usage string
	kind        flagKind
	def         string // default text; "" with required means none
	required    bool
	typed       string // text as typed (or the default)
	count       int    // how many times the flag was given

	dim     units.Dimension
	opts    units.Options
	choices []string
	imin    int
	imax    int
	fmin    float64
	fmax    float64

	q *units.Quantity
	s *string
	i *int
	f *float64
	b *bool
	g *gasprops.Mixture
	r *span
}

// rawValue is the flag.Value of every flagDef: it only records the text.
type rawValue struct{ d *flagDef }

func (v rawValue) String() string {
	if v.d == nil {
		return ""
	}
	return v.d.typed
}

func (v rawValue) Set(s string) error {
	v.d.typed = s
	v.d.count++
	return nil
}

// IsBoolFlag lets `--non-ideal` stand alone, as the flag package expects.
func (v rawValue) IsBoolFlag() bool { return v.d != nil && v.d.kind == kindBool }

// flags is the flag set of one subcommand. Make it with newFlags, declare the
// flags, call parse, then read the values through the returned pointers.
type flags struct {
	name     string
	fs       *flag.FlagSet
	defs     []*flagDef
	json     bool     // --json was given
	maxArgs  int      // positional arguments allowed (see positional)
	argsName string   // how help names them, e.g. "FILE"
	rest     []string // positional arguments, in order
	about    string   // extra help text (see describe)
}

// usageError is bad input from the user: run() prints it on one line and
// exits with status 2.
type usageError struct{ msg string }

func (e *usageError) Error() string { return e.msg }

// helpRequest is returned by parse for -h or --help; run() prints text on
// stdout and exits 0.
type helpRequest struct{ text string }

func (e *helpRequest) Error() string { return "help requested" }

// badInput returns a usage error of the form `--flag "value": why`.
func badInput(name, value string, why error) error {
	return &usageError{msg: fmt.Sprintf("--%s %s: %v", name, quoteValue(value), why)}
}

// newFlags returns the empty flag set of subcommand name. Every set has
// --json; -h and --help print the help.
func newFlags(name string) *flags {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard) // run() prints our own one-line messages
	fl := &flags{name: name, fs: fs}
	fs.BoolVar(&fl.json, "json", false, "print one JSON object instead of a table")
	return fl
}

func (fl *flags) define(d *flagDef) *flagDef {
	if fl.fs.Lookup(d.name) != nil {
		panic("twcalc: flag --" + d.name + " defined twice in " + fl.name)
	}
	d.required = d.def == "" && d.kind != kindBool && d.kind != kindString && d.kind != kindSpan
	d.typed = d.def
	fl.defs = append(fl.defs, d)
	fl.fs.Var(rawValue{d}, d.name, d.usage)
	if d.def != "" {
		// A default that does not parse is a programmer error: fail loudly
		// the first time the command runs, in its tests.
		if err := d.read(); err != nil {
			panic(fmt.Sprintf("twcalc: default of --%s in %s: %v", d.name, fl.name, err))
		}
	}
	return d
}

// quantity declares a flag holding a physical quantity of dimension dim, in
// any unit units.Parse accepts ("300K", "27 degC", "10bar", "30barg", "3/8 in"),
// optionally with an uncertainty ("440Hz+-5Hz", "440 Hz ± 5 Hz"). def is the
// default text; def "" makes the flag required. Pressures come back absolute.
func (fl *flags) quantity(name string, dim units.Dimension, def, usage string) *units.Quantity {
	return fl.quantityWith(name, dim, def, usage, units.Options{})
}

// quantityWith is quantity with parser options (atmosphere for gauge
// pressures, a default unit for bare numbers, negative values allowed).
func (fl *flags) quantityWith(name string, dim units.Dimension, def, usage string, o units.Options) *units.Quantity {
	d := &flagDef{name: name, usage: usage, kind: kindQuantity, def: def, dim: dim, opts: o, q: new(units.Quantity)}
	return fl.define(d).q
}

// str declares a free-text flag; it is never required.
func (fl *flags) str(name, def, usage string) *string {
	d := &flagDef{name: name, usage: usage, kind: kindString, def: def, s: new(string)}
	*d.s = def
	return fl.define(d).s
}

// choice declares a flag that takes one of choices (compared ignoring case;
// the result is the spelling in choices). def "" makes it required.
func (fl *flags) choice(name string, choices []string, def, usage string) *string {
	if len(choices) == 0 {
		panic("twcalc: choice --" + name + " has no choices")
	}
	d := &flagDef{name: name, usage: usage, kind: kindChoice, def: def, choices: choices, s: new(string)}
	return fl.define(d).s
}

// integer declares an integer flag valid in [min, max] with default def.
func (fl *flags) integer(name string, def, min, max int, usage string) *int {
	d := &flagDef{name: name, usage: usage, kind: kindInt, def: strconv.Itoa(def), imin: min, imax: max, i: new(int)}
	return fl.define(d).i
}

// float declares a plain-number flag (no unit) valid in [min, max] with
// default def. Use quantity for anything that has a unit.
func (fl *flags) float(name string, def, min, max float64, usage string) *float64 {
	d := &flagDef{name: name, usage: usage, kind: kindFloat, def: strconv.FormatFloat(def, 'g', -1, 64), fmin: min, fmax: max, f: new(float64)}
	return fl.define(d).f
}

// boolean declares an on/off flag, off unless given (`--non-ideal`).
func (fl *flags) boolean(name, usage string) *bool {
	d := &flagDef{name: name, usage: usage, kind: kindBool, b: new(bool)}
	return fl.define(d).b
}

// gas declares a working-gas flag read with gasprops.ParseMixture: "helium",
// "He" or "helium:0.7,argon:0.3" (mole fractions). def "" makes it required.
func (fl *flags) gas(name, def, usage string) *gasprops.Mixture {
	d := &flagDef{name: name, usage: usage, kind: kindGas, def: def, g: new(gasprops.Mixture)}
	return fl.define(d).g
}

// span declares an optional range flag for sweeps, typed FROM:TO:N
// ("250K:350K:11", "10bar:30bar:5") or FROM:TO for 11 points; each end in
// any unit of dim. Unset, the span's Set field is false.
func (fl *flags) span(name string, dim units.Dimension, usage string) *span {
	d := &flagDef{name: name, usage: usage, kind: kindSpan, dim: dim, r: new(span)}
	return fl.define(d).r
}

// positional allows up to n positional arguments (e.g. a file name), named
// argsName in the help. Without it any positional argument is an error, so
// that `--temperature 300 K` (a space inside a value) cannot pass silently.
func (fl *flags) positional(n int, argsName string) {
	fl.maxArgs = n
	fl.argsName = argsName
}

// args returns the positional arguments after parse.
func (fl *flags) args() []string { return fl.rest }

// describe adds text (examples, notes) to the command's help.
func (fl *flags) describe(text string) { fl.about = text }

// given reports whether the user typed flag name (rather than the default).
func (fl *flags) given(name string) bool {
	for _, d := range fl.defs {
		if d.name == name {
			return d.count > 0
		}
	}
	return false
}

// typed returns the text given for flag name, or its default.
func (fl *flags) typed(name string) string {
	for _, d := range fl.defs {
		if d.name == name {
			return d.typed
		}
	}
	return ""
}

// parse reads args. Flags may come before and after positional arguments;
// "--" ends the flags. Errors are usage errors naming the flag and value;
// -h or --help returns a help request.
func (fl *flags) parse(args []string) error {
	rest := args
	for {
		if err := fl.fs.Parse(rest); err != nil {
			return fl.flagError(err)
		}
		left := fl.fs.Args()
		if len(left) == 0 {
			break
		}
		used := len(rest) - len(left)
		if used > 0 && rest[used-1] == "--" {
			fl.rest = append(fl.rest, left...)
			break
		}
		fl.rest = append(fl.rest, left[0])
		rest = left[1:]
	}
	if len(fl.rest) > fl.maxArgs {
		extra := fl.rest[fl.maxArgs]
		if fl.maxArgs == 0 {
			return &usageError{msg: fmt.Sprintf("unexpected argument %q: %s takes only flags; quote values that contain spaces, e.g. --temperature \"300 K\"", extra, fl.name)}
		}
		return &usageError{msg: fmt.Sprintf("unexpected argument %q: %s takes at most %d %s", extra, fl.name, fl.maxArgs, fl.argsName)}
	}
	for _, d := range fl.defs {
		if d.count > 1 {
			return &usageError{msg: fmt.Sprintf("--%s given %d times; give it once", d.name, d.count)}
		}
		if d.count == 0 {
			if d.required {
				return &usageError{msg: fmt.Sprintf("--%s is required: %s (see \"twcalc %s -h\")", d.name, d.usage, fl.name)}
			}
			if d.def == "" {
				continue
			}
		}
		if err := d.read(); err != nil {
			return badInput(d.name, d.typed, err)
		}
	}
	return nil
}

// flagError turns the flag package's messages into ours.
func (fl *flags) flagError(err error) error {
	if errors.Is(err, flag.ErrHelp) {
		return &helpRequest{text: fl.help()}
	}
	msg := err.Error()
	if name, ok := strings.CutPrefix(msg, "flag provided but not defined: "); ok {
		return &usageError{msg: fmt.Sprintf("unknown flag --%s for %s (see \"twcalc %s -h\")", strings.TrimLeft(name, "-"), fl.name, fl.name)}
	}
	if name, ok := strings.CutPrefix(msg, "flag needs an argument: "); ok {
		return &usageError{msg: fmt.Sprintf("--%s needs a value", strings.TrimLeft(name, "-"))}
	}
	return &usageError{msg: strings.ReplaceAll(msg, "\n", " ")}
}

// read parses d.typed into d's destination.
func (d *flagDef) read() error {
	s := d.typed
	switch d.kind {
	case kindQuantity:
		q, err := units.ParseWith(s, d.dim, d.opts)
		if err != nil {
			return err
		}
		if !finite(q.Value) || !finite(q.Uncertainty) {
			return errors.New("not a finite number")
		}
		*d.q = q
	case kindString:
		*d.s = s
	case kindChoice:
		for _, c := range d.choices {
			if strings.EqualFold(strings.TrimSpace(s), c) {
				*d.s = c
				return nil
			}
		}
		return fmt.Errorf("must be one of %s", strings.Join(d.choices, ", "))
	case kindInt:
		v, err := strconv.Atoi(strings.TrimSpace(s))
		if err != nil {
			return fmt.Errorf("not a whole number (valid range %d to %d)", d.imin, d.imax)
		}
		if v < d.imin || v > d.imax {
			return units.NewRangeError(d.name, float64(v), float64(d.imin), float64(d.imax), "")
		}
		*d.i = v
	case kindFloat:
		v, err := strconv.ParseFloat(strings.TrimSpace(s), 64)
		if err != nil || !finite(v) {
			return fmt.Errorf("not a finite number (valid range %g to %g)", d.fmin, d.fmax)
		}
		if v < d.fmin || v > d.fmax {
			return units.NewRangeError(d.name, v, d.fmin, d.fmax, "")
		}
		*d.f = v
	case kindBool:
		v, err := strconv.ParseBool(s)
		if err != nil {
			return errors.New("must be true or false")
		}
		*d.b = v
	case kindGas:
		m, err := gasprops.ParseMixture(s)
		if err != nil {
			return err
		}
		*d.g = m
	case kindSpan:
		return d.r.read(s, d.dim, d.opts)
	}
	return nil
}

// blame turns an error from a computation into a usage error naming the
// flag that caused it, when it is a units.RangeError whose Field names one
// of the flags (`temperature` matches --temperature, `mean pressure` matches
// --mean-pressure). names limits the search; none means every flag. Other
// errors come back unchanged, so run() reports them as computation failures.
func (fl *flags) blame(err error, names ...string) error {
	if err == nil {
		return nil
	}
	field, ok := rangeField(err)
	if !ok {
		return err
	}
	field = strings.ToLower(strings.ReplaceAll(field, " ", "-"))
	var cands []*flagDef
	for _, d := range fl.defs {
		if len(names) == 0 || contains(names, d.name) {
			cands = append(cands, d)
		}
	}
	var best *flagDef
	for _, d := range cands {
		if strings.Contains(field, d.name) || strings.Contains(d.name, field) {
			if best == nil || len(d.name) > len(best.name) {
				best = d
			}
		}
	}
	if best == nil && len(names) == 1 && len(cands) == 1 {
		best = cands[0]
	}
	if best == nil {
		return &usageError{msg: err.Error()}
	}
	return badInput(best.name, best.typed, err)
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

// help is the text of `twcalc NAME -h`.
func (fl *flags) help() string {
	var b strings.Builder
	fmt.Fprintf(&b, "usage: twcalc %s [flags]", fl.name)
	if fl.maxArgs > 0 {
		fmt.Fprintf(&b, " [%s]", fl.argsName)
	}
	b.WriteString("\n\nflags:\n")
	for _, d := range fl.defs {
		arg := ""
		switch d.kind {
		case kindQuantity:
			arg = " " + strings.ToUpper(strings.ReplaceAll(d.dim.String(), " ", "_"))
		case kindGas:
			arg = " GAS"
		case kindChoice:
			arg = " " + strings.Join(d.choices, "|")
		case kindInt:
			arg = " N"
		case kindFloat:
			arg = " X"
		case kindString:
			arg = " TEXT"
		case kindSpan:
			arg = " FROM:TO[:N]"
		}
		fmt.Fprintf(&b, "  --%s%s\n        %s", d.name, arg, d.usage)
		switch {
		case d.required:
			b.WriteString(" (required)")
		case d.kind == kindQuantity && d.def != "":
			fmt.Fprintf(&b, " (default %s)", d.def)
		case d.kind == kindInt:
			fmt.Fprintf(&b, " (%d to %d, default %s)", d.imin, d.imax, d.def)
		case d.kind == kindFloat:
			fmt.Fprintf(&b, " (%g to %g, default %s)", d.fmin, d.fmax, d.def)
		case d.def != "":
			fmt.Fprintf(&b, " (default %s)", d.def)
		}
		b.WriteString("\n")
	}
	b.WriteString("  --json\n        print one JSON object instead of a table\n")
	if fl.about != "" {
		b.WriteString("\n" + strings.TrimRight(fl.about, "\n") + "\n")
	}
	return b.String()
}

// echo records every flag of fl, as typed or defaulted, in r's inputs:
// quantities as {"value","unit","typed"} in SI (plus "uncertainty" when one
// was given), other flags as their value. Unset optional flags are left out.
func (fl *flags) echo(r *report) {
	for _, d := range fl.defs {
		if d.count == 0 && d.def == "" && d.kind != kindBool {
			continue
		}
		switch d.kind {
		case kindQuantity:
			r.inputQuantity(d.name, *d.q, d.typed)
		case kindString, kindChoice:
			r.input(d.name, *d.s)
		case kindInt:
			r.input(d.name, *d.i)
		case kindFloat:
			r.input(d.name, *d.f)
		case kindBool:
			r.input(d.name, *d.b)
		case kindGas:
			r.input(d.name, d.typed)
		case kindSpan:
			r.input(d.name, map[string]any{"from": d.r.From, "to": d.r.To, "points": d.r.N, "unit": units.SIUnit(d.dim), "typed": d.typed})
		}
	}
}

// finite reports whether v is neither NaN nor ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// rangeField returns the Field of the units.RangeError in err's chain.
func rangeField(err error) (string, bool) {
	var re *units.RangeError
	if errors.As(err, &re) {
		return re.Field, true
	}
	return "", false
}

// isRangeError reports whether err is, or wraps, a units.RangeError: input
// outside a model's range, which run() reports as a usage error (exit 2).
func isRangeError(err error) bool {
	_, ok := rangeField(err)
	return ok
}

// quoteValue quotes typed text for a one-line message, shortened to 60
// characters; control characters are escaped by %q.
func quoteValue(s string) string {
	const max = 60
	if r := []rune(s); len(r) > max {
		s = string(r[:max]) + "…"
	}
	return fmt.Sprintf("%q", s)
}

// span is a range of a quantity for a sweep, in SI.
type span struct {
	From, To float64 // ends, SI; From may exceed To (a falling sweep)
	N        int     // number of points including both ends, 2..maxSpanPoints
	Set      bool    // the flag was given
}

// maxSpanPoints bounds a sweep so a slip ("1e9") cannot hang the terminal.
const maxSpanPoints = 100000

// read parses FROM:TO[:N].
func (sp *span) read(s string, dim units.Dimension, o units.Options) error {
	parts := strings.Split(s, ":")
	if len(parts) < 2 || len(parts) > 3 {
		return errors.New("write the range as FROM:TO or FROM:TO:N, e.g. 250K:350K:11")
	}
	var ends [2]float64
	for i, p := range parts[:2] {
		q, err := units.ParseWith(p, dim, o)
		if err != nil {
			return err
		}
		if !finite(q.Value) {
			return errors.New("not a finite number")
		}
		ends[i] = q.Value
	}
	n := 11
	if len(parts) == 3 {
		v, err := strconv.Atoi(strings.TrimSpace(parts[2]))
		if err != nil {
			return fmt.Errorf("the number of points %q is not a whole number", parts[2])
		}
		if v < 2 || v > maxSpanPoints {
			return units.NewRangeError("number of points", float64(v), 2, maxSpanPoints, "")
		}
		n = v
	}
	*sp = span{From: ends[0], To: ends[1], N: n, Set: true}
	return nil
}

// values returns the N evenly spaced points from From to To, both ends
// exact.
func (sp *span) values() []float64 {
	v := make([]float64, sp.N)
	for i := range v {
		t := float64(i) / float64(sp.N-1)
		v[i] = sp.From + t*(sp.To-sp.From)
	}
	v[sp.N-1] = sp.To
	return v
}
