package units

import (
	"errors"
	"math"
	"testing"
)

// FuzzParse feeds arbitrary text to ParseWith for every dimension and
// checks the contract: no panic; an error is a *ParseError; a nil error
// means a finite value of the asked dimension within MaxMagnitude, not
// negative where the dimension forbids it, above 0 K for temperatures, and
// a finite non-negative uncertainty.
func FuzzParse(f *testing.F) {
	for _, s := range []string{
		"10 bar", "30 barg", "145 psi", "27 °C", "80 degF", "3/8 in", "1 1/2 in", "1-1/2\"",
		"0,25 mm", "2e-3 m", "567 Hz ± 8 Hz", "567Hz+-8Hz", "20 °C ± 2 K", "578 Hz ± 1 %",
		"200 /in", "400 cpsi", "2 per hour", "1½ in", "-5 mm", "NaN", "1e999 m", "", "±", "1,500 m",
		"3 1/s", "9 m³", "19.9 µPa·s", "30 %", "-2 barg", "1 1/0 in",
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		for d := range dims {
			dim := Dimension(d)
			for _, opt := range []Options{{}, {AllowNegative: true, DefaultUnit: SIUnit(dim)}} {
				q, err := ParseWith(s, dim, opt)
				if err != nil {
					var pe *ParseError
					if !errors.As(err, &pe) {
						t.Fatalf("ParseWith(%q, %v): error %T is not a *ParseError: %v", s, dim, err, err)
					}
					if pe.Error() == "" {
						t.Fatalf("ParseWith(%q, %v): empty message", s, dim)
					}
					continue
				}
				if q.Dim != dim {
					t.Fatalf("ParseWith(%q, %v): dimension %v", s, dim, q.Dim)
				}
				if !isFinite(q.Value) || math.Abs(q.Value) > MaxMagnitude(dim) {
					t.Fatalf("ParseWith(%q, %v) = %g: not finite or beyond %g", s, dim, q.Value, MaxMagnitude(dim))
				}
				if !opt.AllowNegative && !AllowsNegative(dim) && q.Value < 0 {
					t.Fatalf("ParseWith(%q, %v) = %g: negative", s, dim, q.Value)
				}
				if dim == DimTemperature && q.Value <= 0 || dim == DimPressure && q.Value < 0 {
					t.Fatalf("ParseWith(%q, %v) = %g: not physical", s, dim, q.Value)
				}
				if !isFinite(q.Uncertainty) || q.Uncertainty < 0 {
					t.Fatalf("ParseWith(%q, %v): uncertainty %g", s, dim, q.Uncertainty)
				}
				if got := Format(q.Value, dim); got == NotANumber {
					t.Fatalf("Format of a parsed value %g gave %q", q.Value, got)
				}
			}
		}
	})
}
