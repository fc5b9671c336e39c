package sheet

import (
	"strings"
	"testing"
)

// safetyBase are typical inputs of the safety calculators, into which the
// fuzzer puts its text one input at a time.
var safetyBase = map[*Sheet]map[string]string{
	vesselSheet: {"pressure": "30 bar", "inner-radius": "50 mm", "wall-thickness": "3 mm", "allowable-stress": "138 MPa", "relief-set": "30 barg", "mawp": "40 barg"},
	energySheet: {"gas": "helium", "pressure": "30 barg", "volume": "50 L", "test-pressure": "33 barg"},
	oxygenSheet: {"room": "30 m3", "release": "3 m3", "release-from-cylinder": "50 L", "fill-pressure": "200 bar", "release-from-vessel": "5 L", "vessel-pressure": "30 barg"},
	splSheet:    {"amplitude": "1 kPa", "at-ear": "90 dBA"},
}

// FuzzSafetySheets types arbitrary text into each input of the safety
// calculators: the Run must never panic, an error about an input names one
// of the sheet's inputs, and no result is an internal error (a NaN or an
// infinity that reached a row).
func FuzzSafetySheets(f *testing.F) {
	for _, s := range []string{"30 bar", "0 bara", "-1 barg", "1e30 Pa", "200 psia", "0.5", "1.2", "eu", "sealed", "hydrogen", "0 L", "1e-30 mm", "300 dBA", "± 1 bar", "30 bar ± 40 bar"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, text string) {
		for s, base := range safetyBase {
			for _, in := range s.Inputs {
				texts := plus(base, in.Key, text)
				_, err := s.Evaluate(texts)
				if err == nil {
					continue
				}
				if strings.HasPrefix(err.Error(), "internal:") {
					t.Fatalf("%s --%s %q: %v", s.ID, in.Key, text, err)
				}
				for _, fe := range FieldErrors(err) {
					if s.Input(fe.Key) == nil {
						t.Fatalf("%s --%s %q: error names %q, not an input", s.ID, in.Key, text, fe.Key)
					}
				}
			}
		}
	})
}
