package sheet

import (
	"errors"
	"fmt"
)

// Sheet describes one calculator once, for every front end.
type Sheet struct {
	// ID is the stable identifier: the terminal command name and the
	// screen's identifier.
	ID ID
	// Title names the calculator on screen, in plain words.
	Title string
	// Summary is one line saying what it answers.
	Summary string
	// Inputs in the order they are shown and listed.
	Inputs []Input
	// About is a paragraph on the models and their sources, shown under
	// the results and in the terminal help.
	About string
	// Examples are terminal command lines shown in the help.
	Examples []string
	// Run computes the result from parsed inputs. It does all the
	// orchestration: ± propagation, derived inputs, warnings, cautions and
	// verdicts. An error about one input is a *FieldError (Values.Blame).
	Run func(v *Values) (*Result, error)
}

// Input returns the input with key, or nil.
func (s *Sheet) Input(key string) *Input {
	for i := range s.Inputs {
		if s.Inputs[i].Key == key {
			return &s.Inputs[i]
		}
	}
	return nil
}

// Defaults returns every input's default text by key.
func (s *Sheet) Defaults() map[string]string {
	m := make(map[string]string, len(s.Inputs))
	for _, in := range s.Inputs {
		m[in.Key] = in.Default
	}
	return m
}

// Parse reads the typed texts by input key; a key that is missing or
// empty takes the input's default. It returns the values and the errors of
// every input that did not parse (an errors.Join of *FieldError), so a
// screen can mark them all at once. A text for a key the sheet does not
// have is a programming error and panics.
func (s *Sheet) Parse(texts map[string]string) (*Values, error) {
	for k := range texts {
		if s.Input(k) == nil {
			panic(fmt.Sprintf("calc: sheet %s has no input %q", s.ID, k))
		}
	}
	v := &Values{sheet: s, list: make([]Value, len(s.Inputs))}
	var errs []error
	for i := range s.Inputs {
		in := &s.Inputs[i]
		val, err := ParseInput(in, texts[in.Key])
		v.list[i] = val
		if err != nil {
			errs = append(errs, err)
		}
	}
	return v, errors.Join(errs...)
}

// Evaluate parses texts and runs the calculator. The result carries the
// values it came from. Every row is checked to be finite: a NaN or Inf is
// reported as an internal error, never returned as a number.
func (s *Sheet) Evaluate(texts map[string]string) (*Result, error) {
	v, err := s.Parse(texts)
	if err != nil {
		return nil, err
	}
	return s.RunValues(v)
}

// RunValues runs the calculator on values already parsed.
func (s *Sheet) RunValues(v *Values) (*Result, error) {
	r, err := s.Run(v)
	if err != nil {
		return nil, err
	}
	if r == nil {
		return nil, fmt.Errorf("internal: %s returned no result", s.ID)
	}
	if err := r.check(); err != nil {
		return nil, err
	}
	r.Values = v
	return r, nil
}
