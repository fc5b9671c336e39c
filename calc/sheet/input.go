package sheet

import (
	"tubewright/calc/units"
)

// Kind is how the text of one input is read.
type Kind int

// The kinds of input.
const (
	// Quantity is a physical quantity in any unit units.ParseWith accepts,
	// optionally with a ± when the input allows it.
	Quantity Kind = iota
	// Gas is a working gas or mixture read by gasprops.ParseMixture.
	Gas
	// Pick is one of the input's Choices, matched by key or words,
	// ignoring case.
	Pick
	// Count is a whole number in [Min, Max].
	Count
	// Number is a plain number without a unit in [Min, Max].
	Number
	// Switch is on or off (a terminal flag that stands alone).
	Switch
	// Text is free text (a file name, a list the Run reads itself).
	Text
	// Sweep is a range FROM:TO or FROM:TO:N of a quantity, for a sweep.
	Sweep
)

// Share names an input whose value the app carries between screens (the
// gas, temperature, pressure and frequency last used). The terminal ignores
// it.
type Share int

// The shared values.
const (
	ShareNone Share = iota
	ShareGas
	ShareTemperature
	SharePressure
	ShareFrequency
)

// Choice is one allowed value of a Pick input: its stable Key (what the
// terminal and the JSON take), the Words a screen shows, and the calc enum
// Value it stands for.
type Choice struct {
	Key   string
	Words string
	Value any
}

// Input is one input of a calculator.
type Input struct {
	// Key is the stable name: the terminal flag (--key) and the JSON key.
	Key string
	// Label names the input on screen, in plain words.
	Label string
	// Kind says how the text is read.
	Kind Kind
	// Dim is the dimension of a Quantity or Sweep.
	Dim units.Dimension
	// Units adjusts the quantity parser (default unit, atmosphere,
	// negatives).
	Units units.Options
	// Default is the text used when nothing is typed. An empty Default
	// makes the input required unless Optional is set.
	Default string
	// Optional inputs may be left empty; the Run sees Given false.
	Optional bool
	// Example is what a screen starts with for a required input that has
	// no default, and what the terminal help shows as an example.
	Example string
	// Hint says what to type, e.g. "300 K, 27 degC, 80 degF".
	Hint string
	// Min and Max bound a Quantity (SI), Count or Number; both zero means
	// no bound beyond the parser's own. MinOpen and MaxOpen exclude the
	// bound itself.
	Min, Max         float64
	MinOpen, MaxOpen bool
	// PM says whether a typed ± is accepted (and carried to the results).
	PM bool
	// Choices are the allowed values of a Pick input.
	Choices []Choice
	// Share marks a value the app carries between screens.
	Share Share
	// Positional makes the input a positional argument on the terminal
	// (e.g. a device FILE) instead of a flag.
	Positional bool
	// Advanced inputs are shown after the others on screen.
	Advanced bool
}

// bounded reports whether the input has a range to check.
func (in *Input) bounded() bool { return in.Min != 0 || in.Max != 0 }

// Required reports whether the input must be given: no default and not
// optional. Switches are never required.
func (in *Input) Required() bool {
	return in.Default == "" && !in.Optional && in.Kind != Switch
}

// ChoiceKeys lists the keys of a Pick input's choices, in order.
func (in *Input) ChoiceKeys() []string {
	keys := make([]string, len(in.Choices))
	for i, c := range in.Choices {
		keys[i] = c.Key
	}
	return keys
}
