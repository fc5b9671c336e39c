package sheet

import (
	"math"
	"testing"
)

// FuzzParseInput feeds arbitrary text to every kind of input of the probe
// sheet: it must never panic, and a value it accepts is finite.
func FuzzParseInput(f *testing.F) {
	for _, s := range []string{"440 Hz ± 5 Hz", "1 kHz +- 2", "250K:350K:3", "closed at both ends", "3", "0.5", "true", "helium:0.7,argon:0.3", "", "1e400 Hz", "NaN Hz", "-0 m"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		for i := range probe.Inputs {
			in := &probe.Inputs[i]
			v, err := ParseInput(in, s)
			if err != nil {
				if fe, ok := AsFieldError(err); !ok || fe.Key != in.Key {
					t.Fatalf("%s: error %v does not name the input", in.Key, err)
				}
				continue
			}
			for _, x := range []float64{v.Q.Value, v.Q.Uncertainty, v.X, v.Span.From, v.Span.To} {
				if math.IsNaN(x) || math.IsInf(x, 0) {
					t.Fatalf("%s: accepted %q as a non-finite value", in.Key, s)
				}
			}
		}
	})
}
