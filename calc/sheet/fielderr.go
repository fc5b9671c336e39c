package sheet

import (
	"errors"
	"strings"

	"tubewright/calc/units"
)

// FieldError is an error about one input: its Key (the flag and JSON key),
// its Label, the text typed and the reason. Front ends find the field or
// flag by comparing Key.
type FieldError struct {
	Key   string
	Label string
	Text  string // what was typed; "" when the error came from a calculation
	Err   error
}

// Error reads "Label: reason", or the reason alone when it already names
// the quantity (a units.RangeError with a Field).
func (e *FieldError) Error() string {
	if re, ok := asRangeError(e.Err); ok && re.Field != "" {
		return e.Err.Error()
	}
	msg := e.Err.Error()
	if strings.HasPrefix(strings.ToLower(msg), strings.ToLower(e.Label)) {
		return msg
	}
	return e.Label + ": " + msg
}

// Unwrap returns the reason.
func (e *FieldError) Unwrap() error { return e.Err }

// AsFieldError returns the first *FieldError in err's chain.
func AsFieldError(err error) (*FieldError, bool) {
	var fe *FieldError
	if errors.As(err, &fe) {
		return fe, true
	}
	return nil, false
}

// FieldErrors returns every *FieldError in err, which may be an
// errors.Join of several.
func FieldErrors(err error) []*FieldError {
	if err == nil {
		return nil
	}
	if j, ok := err.(interface{ Unwrap() []error }); ok {
		var out []*FieldError
		for _, e := range j.Unwrap() {
			out = append(out, FieldErrors(e)...)
		}
		return out
	}
	if fe, ok := AsFieldError(err); ok {
		return []*FieldError{fe}
	}
	return nil
}

func asRangeError(err error) (*units.RangeError, bool) {
	var re *units.RangeError
	if errors.As(err, &re) {
		return re, true
	}
	return nil, false
}
