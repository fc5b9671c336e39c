package resonator

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestCorrectionLength(t *testing.T) {
	t.Parallel()
	const a = 0.01
	cases := []struct {
		name string
		c    EndCorrection
		ka   float64
		want float64 // δ/a
		tol  float64
		warn bool
	}{
		// Levine & Schwinger (1948), low-frequency limit 0.6133 a.
		{"unflanged limit", Unflanged, 0, 0.6133, 1e-12, false},
		// Norris & Sheng (1989), infinite-flange limit 0.8216 a.
		{"flanged limit", Flanged, 0, 0.8216, 1e-12, false},
		// Davies, Bento Coelho & Bhattacharya (1980) first piece at ka = 0.3
		// (from memory): 0.6133 - 0.1168·0.09 = 0.602788.
		{"unflanged ka 0.3", Unflanged, 0.3, 0.602788, 1e-12, false},
		// second piece at ka = 1: 0.6393 - 0.1104 = 0.5289, with a warning
		// (ka > 0.5).
		{"unflanged ka 1", Unflanged, 1, 0.5289, 1e-12, true},
		// Norris & Sheng at ka = 1 (from memory): 0.8216/(1 + 0.5929/1.77)
		// = 0.615444..., hand-calculated.
		{"flanged ka 1", Flanged, 1, 0.8216 / (1 + 0.5929/1.77), 1e-12, true},
		// beyond the cross-mode cutoff the result is held and a warning given
		{"unflanged ka 3", Unflanged, 3, 0.6393 - 0.1104*2, 1e-12, true},
		{"none", NoCorrection, 0.3, 0, 0, false},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			d, w := CorrectionLength(c.c, a, c.ka)
			if !scalar.EqualWithinAbsOrRel(d/a, c.want, c.tol, c.tol) {
				t.Errorf("δ/a = %.10g, want %.10g", d/a, c.want)
			}
			if (w != "") != c.warn {
				t.Errorf("warning %q, want one: %v", w, c.warn)
			}
		})
	}
}

// The two pieces of the unflanged fit must meet at ka = 0.5 (a check on the
// coefficients quoted from memory: 0.6133 - 0.1168/4 = 0.5841 = 0.6393 -
// 0.1104/2), and both corrections must fall as ka grows (radiation makes
// the open end look shorter at higher frequency).
func TestCorrectionLengthShape(t *testing.T) {
	t.Parallel()
	below, _ := CorrectionLength(Unflanged, 1, 0.5-1e-9)
	above, _ := CorrectionLength(Unflanged, 1, 0.5)
	if !scalar.EqualWithinAbs(below, above, 1e-6) {
		t.Errorf("unflanged fit jumps at ka = 0.5: %.8f vs %.8f", below, above)
	}
	for _, c := range []EndCorrection{Unflanged, Flanged} {
		prev, _ := CorrectionLength(c, 1, 0)
		for ka := 0.05; ka <= 1.8; ka += 0.05 {
			d, _ := CorrectionLength(c, 1, ka)
			if d >= prev {
				t.Errorf("%v: δ(%.2f) = %.5f not below δ(%.2f) = %.5f", c, ka, d, ka-0.05, prev)
			}
			prev = d
		}
	}
	// flanged is longer than unflanged at low ka (more mass outside)
	f, _ := CorrectionLength(Flanged, 1, 0.1)
	u, _ := CorrectionLength(Unflanged, 1, 0.1)
	if f <= u {
		t.Errorf("flanged %.4f not above unflanged %.4f", f, u)
	}
}

func TestParseNames(t *testing.T) {
	t.Parallel()
	for _, e := range []Ends{ClosedOpen, ClosedClosed, OpenOpen} {
		got, err := ParseEnds(e.String())
		if err != nil || got != e {
			t.Errorf("ParseEnds(%q) = %v, %v", e.String(), got, err)
		}
	}
	for _, c := range []EndCorrection{NoCorrection, Unflanged, Flanged} {
		got, err := ParseEndCorrection(c.String())
		if err != nil || got != c {
			t.Errorf("ParseEndCorrection(%q) = %v, %v", c.String(), got, err)
		}
	}
	if _, err := ParseEnds("closed"); err == nil {
		t.Error("ParseEnds(closed): no error")
	}
	if _, err := ParseEndCorrection("baffled"); err == nil {
		t.Error("ParseEndCorrection(baffled): no error")
	}
}
