package units

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestBareGauge: with Options.BareGauge a bare pressure is gauge, an
// absolute spelling stays absolute and a gauge unit is gauge. Values: the
// standard atmosphere 101 325 Pa (ISO 2533) added to the gauge reading;
// 1 psi = 6894.757293 Pa (NIST SP 811, 2008, B.8).
func TestBareGauge(t *testing.T) {
	t.Parallel()
	const atm = StandardAtmosphere
	psi := 6894.757293168361
	cases := []struct {
		in             string
		want           float64 // Pa absolute
		gauge, assumed bool
		words          string
	}{
		{"30 bar", 30e5 + atm, true, true, "30 bar read as 30 barg = 31.01 bar absolute"},
		{"30 barg", 30e5 + atm, true, false, "30 barg = 31.01 bar absolute"},
		{"31 bara", 31e5, false, false, "31 bara absolute = 29.99 barg"},
		{"31 bar(a)", 31e5, false, false, "31 bar(a) absolute = 29.99 barg"},
		{"145 psi", 145*psi + atm, true, true, "145 psi read as 145 psig = 159.7 psi absolute"},
		{"145 psia", 145 * psi, false, false, "145 psia absolute = 130.3 psig"},
		{"145 psig", 145*psi + atm, true, false, "145 psig = 159.7 psi absolute"},
		{"3 MPa", 3e6 + atm, true, true, "3 MPa read as 30 barg = 31.01 bar absolute"},
		{"500 Pa", 500 + atm, true, true, "500 Pa read as 0.005 barg = 1.018 bar absolute"},
		{"1 atm", atm, false, false, "1 atm absolute = 0 barg"},
		{"760 torr", atm, false, false, "760 torr absolute = 0 barg"},
		{"-0.5 bar", -0.5e5 + atm, true, true, "-0.5 bar read as -0.5 barg = 0.5132 bar absolute"},
	}
	for _, c := range cases {
		q, err := ParseWith(c.in, DimPressure, Options{BareGauge: true})
		if err != nil {
			t.Errorf("%q: %v", c.in, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(q.Value, c.want, 1e-9, 1e-12) || q.Gauge != c.gauge || q.Assumed != c.assumed {
			t.Errorf("%q: %v Pa gauge %v assumed %v, want %v Pa %v %v", c.in, q.Value, q.Gauge, q.Assumed, c.want, c.gauge, c.assumed)
		}
		if got := DescribePressure(c.in, q, 0); got != c.words {
			t.Errorf("%q: described %q, want %q", c.in, got, c.words)
		}
	}
	// Without the option nothing changes: a bare bar is absolute.
	q, err := ParseWith("30 bar", DimPressure, Options{})
	if err != nil || q.Value != 30e5 || q.Gauge || q.Assumed {
		t.Errorf("30 bar without BareGauge: %+v, %v", q, err)
	}
	// A ± on a bare-gauge pressure is a difference, not shifted.
	q, err = ParseWith("30 bar ± 0.5 bar", DimPressure, Options{BareGauge: true})
	if err != nil || q.Uncertainty != 0.5e5 || !q.Gauge {
		t.Errorf("30 bar ± 0.5 bar: %+v, %v", q, err)
	}
}

// FuzzBareGauge: whatever is typed, a gauge-first reading that parses is
// the plain reading plus at most one atmosphere, and never NaN.
func FuzzBareGauge(f *testing.F) {
	for _, s := range []string{"30 bar", "145 psia", "2 MPa", "1 atm", "10 barg ± 1", "-3 kPa"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		q, err := ParseWith(s, DimPressure, Options{BareGauge: true})
		if err != nil {
			return
		}
		if !isFinite(q.Value) || q.Value < 0 {
			t.Fatalf("%q: %v", s, q.Value)
		}
		if q.Assumed && !q.Gauge {
			t.Fatalf("%q: assumed gauge but not gauge", s)
		}
		_ = DescribePressure(s, q, 0)
	})
}
