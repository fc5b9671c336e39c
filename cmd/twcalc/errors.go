package main

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/units"
)

// usageError is bad input from the user: run() prints it on one line and
// exits with status 2.
type usageError struct{ msg string }

func (e *usageError) Error() string { return e.msg }

// helpRequest is returned for -h or --help; run() prints text on stdout and
// exits 0.
type helpRequest struct{ text string }

func (e *helpRequest) Error() string { return "help requested" }

// finite reports whether v is neither NaN nor ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// isRangeError reports whether err is, or wraps, a units.RangeError: input
// outside a model's range, which run() reports as a usage error (exit 2).
func isRangeError(err error) bool {
	var re *units.RangeError
	return errors.As(err, &re)
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
