package sheet

import (
	"fmt"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Span is a parsed Sweep input: N evenly spaced points from From to To
// (SI), both ends included.
type Span struct {
	From, To float64
	N        int
}

// Points returns the N evenly spaced values from From to To, both ends
// exact.
func (s Span) Points() []float64 {
	v := make([]float64, s.N)
	for i := range v {
		t := float64(i) / float64(s.N-1)
		v[i] = s.From + t*(s.To-s.From)
	}
	v[s.N-1] = s.To
	return v
}

// Value is one parsed input.
type Value struct {
	In    *Input
	Text  string // as typed, or the default
	Given bool   // typed by the user rather than defaulted
	Set   bool   // holds a value: given, or a default

	Q    units.Quantity   // Quantity
	Mix  gasprops.Mixture // Gas
	Pick Choice           // Pick
	N    int              // Count
	X    float64          // Number
	On   bool             // Switch
	Span Span             // Sweep
}

// Values are the parsed inputs of one sheet, in the order of its Inputs.
type Values struct {
	sheet *Sheet
	list  []Value
}

// All returns the parsed inputs in order.
func (v *Values) All() []Value { return v.list }

// Get returns the value of input key. An unknown key is a programming
// error and panics.
func (v *Values) Get(key string) *Value {
	for i := range v.list {
		if v.list[i].In.Key == key {
			return &v.list[i]
		}
	}
	panic(fmt.Sprintf("calc: sheet %s has no input %q", v.sheet.ID, key))
}

// Q returns the quantity of input key (zero when not set).
func (v *Values) Q(key string) units.Quantity { return v.Get(key).Q }

// SI returns the SI value of quantity input key.
func (v *Values) SI(key string) float64 { return v.Get(key).Q.Value }

// Gas returns the mixture of gas input key.
func (v *Values) Gas(key string) gasprops.Mixture { return v.Get(key).Mix }

// Pick returns the calc value of the choice made for input key.
func (v *Values) Pick(key string) any { return v.Get(key).Pick.Value }

// PickKey returns the key of the choice made for input key.
func (v *Values) PickKey(key string) string { return v.Get(key).Pick.Key }

// Count returns the whole number of input key.
func (v *Values) Count(key string) int { return v.Get(key).N }

// Number returns the plain number of input key.
func (v *Values) Number(key string) float64 { return v.Get(key).X }

// On reports whether switch key is on.
func (v *Values) On(key string) bool { return v.Get(key).On }

// Text returns the text of input key as typed (or its default).
func (v *Values) Text(key string) string { return v.Get(key).Text }

// Given reports whether the user typed input key.
func (v *Values) Given(key string) bool { return v.Get(key).Given }

// Has reports whether input key holds a value (typed or defaulted).
func (v *Values) Has(key string) bool { return v.Get(key).Set }

// Span returns the sweep of input key.
func (v *Values) Span(key string) Span { return v.Get(key).Span }

// Blame returns err as a *FieldError about input key, unless it is one
// already or nil. Use it where a call depends on that one input.
func (v *Values) Blame(err error, key string) error {
	if err == nil {
		return nil
	}
	if _, ok := AsFieldError(err); ok {
		return err
	}
	val := v.Get(key)
	return &FieldError{Key: key, Label: val.In.Label, Text: val.Text, Err: err}
}

// BlameSubject returns err as a *FieldError about the input that bySubject
// names for the err's units.RangeError Subject; other errors come back
// unchanged. Use it where a call checks several inputs (a gas model checks
// temperature and pressure).
func (v *Values) BlameSubject(err error, bySubject map[units.Subject]string) error {
	if err == nil {
		return nil
	}
	if _, ok := AsFieldError(err); ok {
		return err
	}
	if re, ok := asRangeError(err); ok {
		if key, ok := bySubject[re.Subject]; ok && re.Subject != units.SubjectNone {
			return v.Blame(err, key)
		}
	}
	return err
}
