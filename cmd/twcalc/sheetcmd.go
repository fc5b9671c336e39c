package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"strings"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
	"tubewright/ui/store"
)

// sheetCommand makes the twcalc subcommand of a calculator description:
// its flags, help, table, JSON and CSV all come from s.
func sheetCommand(s *sheet.Sheet) command {
	return command{name: string(s.ID), summary: s.Summary, run: func(args []string) (*report, error) {
		return runSheet(s, args)
	}}
}

// textValue is the flag.Value of every input: it records the text typed
// and how often the flag was given.
type textValue struct {
	text  string
	count int
	isOn  bool // a Switch: may stand alone
}

func (v *textValue) String() string { return v.text }
func (v *textValue) Set(s string) error {
	v.text, v.count = s, v.count+1
	return nil
}
func (v *textValue) IsBoolFlag() bool { return v.isOn }

// runSheet parses args against s's inputs, evaluates s and returns the
// report. Every error about one input names its flag and the value.
func runSheet(s *sheet.Sheet, args []string) (*report, error) {
	fs := flag.NewFlagSet(string(s.ID), flag.ContinueOnError)
	fs.SetOutput(io.Discard)
	var asJSON bool
	var logTo, note string
	fs.BoolVar(&asJSON, "json", false, "print one JSON object instead of a table")
	fs.StringVar(&logTo, "log-to", "", "add the result to the log of this export file of the app")
	fs.StringVar(&note, "note", "", "a note for the logged result")
	vals := map[string]*textValue{}
	var positional []*sheet.Input
	for i := range s.Inputs {
		in := &s.Inputs[i]
		if in.Positional {
			positional = append(positional, in)
			continue
		}
		tv := &textValue{isOn: in.Kind == sheet.Switch}
		vals[in.Key] = tv
		fs.Var(tv, in.Key, in.Hint)
	}
	rest, err := parseInterleaved(fs, args)
	if err != nil {
		if errors.Is(err, flag.ErrHelp) {
			return nil, &helpRequest{text: sheetHelp(s)}
		}
		return nil, flagMessage(s, err)
	}
	if len(rest) > len(positional) {
		extra := rest[len(positional)]
		if len(positional) == 0 {
			return nil, &usageError{msg: fmt.Sprintf("unexpected argument %q: %s takes only flags; quote values that contain spaces, e.g. --temperature \"300 K\"", extra, s.ID)}
		}
		return nil, &usageError{msg: fmt.Sprintf("unexpected argument %q: %s takes at most %d %s", extra, s.ID, len(positional), argsName(positional))}
	}
	texts := map[string]string{}
	for key, tv := range vals {
		if tv.count > 1 {
			return nil, &usageError{msg: fmt.Sprintf("--%s given %d times; give it once", key, tv.count)}
		}
		if tv.count == 1 {
			text := tv.text
			if tv.isOn && text == "" {
				text = "true"
			}
			if strings.TrimSpace(text) == "" {
				return nil, &usageError{msg: fmt.Sprintf("--%s %q: empty; type a value", key, text)}
			}
			texts[key] = text
		}
	}
	for i, a := range rest {
		texts[positional[i].Key] = a
	}
	res, err := s.Evaluate(texts)
	if err != nil {
		return nil, flagError(s, err)
	}
	if logTo != "" {
		if err := store.AppendLogFile(logTo, store.EntryOf(s, texts, res, note)); err != nil {
			return nil, &usageError{msg: fmt.Sprintf("--log-to %s: %v", quoteValue(logTo), err)}
		}
	}
	return sheetReport(res), nil
}

// parseInterleaved parses flags that may come before and after positional
// arguments; "--" ends the flags.
func parseInterleaved(fs *flag.FlagSet, args []string) ([]string, error) {
	var rest []string
	for {
		if err := fs.Parse(args); err != nil {
			return nil, err
		}
		left := fs.Args()
		if len(left) == 0 {
			return rest, nil
		}
		used := len(args) - len(left)
		if used > 0 && args[used-1] == "--" {
			return append(rest, left...), nil
		}
		rest = append(rest, left[0])
		args = left[1:]
	}
}

func argsName(pos []*sheet.Input) string {
	names := make([]string, len(pos))
	for i, in := range pos {
		names[i] = strings.ToUpper(in.Key)
	}
	return strings.Join(names, " ")
}

// flagMessage turns the flag package's messages into ours.
func flagMessage(s *sheet.Sheet, err error) error {
	msg := err.Error()
	if name, ok := strings.CutPrefix(msg, "flag provided but not defined: "); ok {
		return &usageError{msg: fmt.Sprintf("unknown flag --%s for %s (see \"twcalc %s -h\")", strings.TrimLeft(name, "-"), s.ID, s.ID)}
	}
	if name, ok := strings.CutPrefix(msg, "flag needs an argument: "); ok {
		return &usageError{msg: fmt.Sprintf("--%s needs a value", strings.TrimLeft(name, "-"))}
	}
	return &usageError{msg: strings.ReplaceAll(msg, "\n", " ")}
}

// flagError names the flag of the first input an error is about, by its
// key; other errors are computation failures and come back unchanged.
func flagError(s *sheet.Sheet, err error) error {
	fes := sheet.FieldErrors(err)
	if len(fes) == 0 {
		return err
	}
	fe := fes[0]
	in := s.Input(fe.Key)
	name := "--" + fe.Key
	if in != nil && in.Positional {
		name = strings.ToUpper(fe.Key)
	}
	if errors.Is(fe.Err, sheet.ErrRequired) && in != nil {
		return &usageError{msg: fmt.Sprintf("%s is required: %s (see \"twcalc %s -h\")", name, in.Hint, s.ID)}
	}
	return &usageError{msg: fmt.Sprintf("%s %s: %v", name, quoteValue(fe.Text), fe.Err)}
}

// sheetHelp is the text of `twcalc NAME -h`.
func sheetHelp(s *sheet.Sheet) string {
	var b strings.Builder
	fmt.Fprintf(&b, "usage: twcalc %s [flags]", s.ID)
	var pos []*sheet.Input
	for i := range s.Inputs {
		if s.Inputs[i].Positional {
			pos = append(pos, &s.Inputs[i])
		}
	}
	if len(pos) > 0 {
		fmt.Fprintf(&b, " %s", argsName(pos))
	}
	b.WriteString("\n\n")
	for _, in := range pos {
		fmt.Fprintf(&b, "  %s\n        %s: %s\n", strings.ToUpper(in.Key), in.Label, in.Hint)
	}
	b.WriteString("flags:\n")
	for i := range s.Inputs {
		in := &s.Inputs[i]
		if in.Positional {
			continue
		}
		fmt.Fprintf(&b, "  --%s%s\n        %s", in.Key, argText(in), in.Label)
		if in.Hint != "" {
			b.WriteString(": " + in.Hint)
		}
		var notes []string
		if (in.Kind == sheet.Count || in.Kind == sheet.Number) && (in.Min != 0 || in.Max != 0) {
			notes = append(notes, units.Number(in.Min, 6)+" to "+units.Number(in.Max, 6))
		}
		switch {
		case in.Required():
			notes = append(notes, "required")
		case in.Default != "":
			notes = append(notes, "default "+in.Default)
		}
		if len(notes) > 0 {
			b.WriteString(" (" + strings.Join(notes, ", ") + ")")
		}
		b.WriteString("\n")
	}
	b.WriteString("  --json\n        print one JSON object instead of a table\n")
	b.WriteString("  --log-to FILE\n        add the result to the log of an export file of the app (made when missing)\n")
	b.WriteString("  --note TEXT\n        a note for the logged result\n")
	if len(s.Examples) > 0 {
		b.WriteString("\nexamples:\n")
		for _, e := range s.Examples {
			b.WriteString("  " + e + "\n")
		}
	}
	if s.About != "" {
		b.WriteString("\n" + s.About + "\n")
	}
	return b.String()
}

// argText is the placeholder after a flag in the help.
func argText(in *sheet.Input) string {
	switch in.Kind {
	case sheet.Quantity:
		return " " + strings.ToUpper(strings.ReplaceAll(in.Dim.String(), " ", "_"))
	case sheet.Gas:
		return " GAS"
	case sheet.Pick:
		return " " + strings.Join(in.ChoiceKeys(), "|")
	case sheet.Count:
		return " N"
	case sheet.Number:
		return " X"
	case sheet.Text:
		return " TEXT"
	case sheet.Sweep:
		return " FROM:TO[:N]"
	}
	return ""
}

// sheetReport turns a calculator's result into the report run() prints.
func sheetReport(res *sheet.Result) *report {
	r := newReport()
	for _, v := range res.Values.All() {
		if !v.Set {
			continue
		}
		key := v.In.Key
		switch v.In.Kind {
		case sheet.Quantity:
			r.inputQuantity(key, v.Q, v.Text)
		case sheet.Gas, sheet.Text:
			r.input(key, v.Text)
		case sheet.Pick:
			r.input(key, v.Pick.Key)
		case sheet.Count:
			r.input(key, v.N)
		case sheet.Number:
			r.input(key, v.X)
		case sheet.Switch:
			r.input(key, v.On)
		case sheet.Sweep:
			r.input(key, map[string]any{"from": v.Span.From, "to": v.Span.To, "points": v.Span.N, "unit": units.SIUnit(v.In.Dim), "typed": v.Text})
		}
	}
	for _, d := range res.Derived {
		if d.Kind == sheet.Num {
			r.inputSI(d.Key, d.Value, d.Dim)
		} else {
			r.input(d.Key, d.Text)
		}
	}
	for _, row := range res.Rows {
		switch row.Kind {
		case sheet.Num:
			if row.Gauge {
				r.addGauge(row.Key, row.Value)
			} else {
				r.addPM(row.Key, row.Value, row.PM, row.Dim)
			}
		case sheet.Words:
			r.addObjectShown(row.Key, row.Text, row.Text)
		case sheet.Complex:
			r.addComplex(row.Key, row.Z)
		case sheet.Object:
			r.addObjectShown(row.Key, row.Any, row.Text)
		}
	}
	for _, d := range res.Details {
		r.detail(d.Key, d.Any, d.Text)
	}
	for _, w := range res.Warnings {
		r.warn(w)
	}
	for _, c := range res.Cautions {
		r.caution(c)
	}
	r.notes = append(r.notes, res.Notes...)
	r.verdicts = res.Verdicts()
	if t := res.Table; t != nil {
		r.table(t.Header, t.Rows)
	}
	return r
}
