package safety

import (
	"math"
	"strings"
	"testing"
)

func TestLevelWorked(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name      string
		A         float64
		spl, peak float64
	}{
		// 1 Pa rms (amplitude √2 Pa) is 93.98 dB: the level of the usual
		// 94 dB acoustic calibrator (IEC 60942 calibrators; common
		// practice). 20 log10(1/20e-6) = 93.9794 dB; peak +3.0103 dB.
		{"1 Pa rms", math.Sqrt2, 93.97940009, 96.98970004},
		// Hand calculation for the 10 kPa amplitude:
		// rms = 7071.07 Pa, 20 log10(7071.07/2e-5) = 20 × 8.548455 =
		// 170.969 dB; peak 20 log10(1e4/2e-5) = 20 × 8.698970 = 173.979 dB.
		{"10 kPa amplitude", 1e4, 170.9691001, 173.9794001},
		// EU 2003/10/EC: p_peak 200 Pa is 140 dB(C) (the directive gives
		// both; 20 log10(200/2e-5) = 140.000 dB).
		{"200 Pa peak", 200, 136.9897000, 140},
	}
	for _, c := range cases {
		s, err := Level(c.A)
		if err != nil {
			t.Fatal(err)
		}
		near(t, c.name+" SPL", s.SPL, c.spl, 1e-9)
		near(t, c.name+" peak", s.Peak, c.peak, 1e-9)
		near(t, c.name+" rms", s.RMS, c.A/math.Sqrt2, 1e-15)
		near(t, c.name+" round trip", AmplitudeOfSPL(s.SPL), c.A, 1e-12)
		wantGeneralCaution(t, s.Cautions)
		if len(s.Cautions) < 2 || s.Cautions[1] != CautionHearing {
			t.Errorf("%s: hearing caution missing", c.name)
		}
	}
}

func TestLevelLimits(t *testing.T) {
	t.Parallel()
	// 200 Pa peak sits exactly at the EU peak limit and OSHA's 140 dB peak;
	// its rms level 137 dB is over every dB(A) value.
	s, err := Level(200)
	if err != nil {
		t.Fatal(err)
	}
	if len(s.Limits) != 9 {
		t.Fatalf("%d limits", len(s.Limits))
	}
	for _, l := range s.Limits {
		if !l.Over {
			t.Errorf("200 Pa amplitude: %s (%g dB) not flagged", l.Name, l.Level)
		}
	}
	// 0.2 Pa amplitude: SPL 77 dB, peak 80 dB: under every limit.
	s, _ = Level(0.2)
	for _, l := range s.Limits {
		if l.Over {
			t.Errorf("0.2 Pa amplitude: %s flagged", l.Name)
		}
	}
	_, err = Level(0)
	wantRangeError(t, err, "pressure amplitude")
	_, err = Level(-5)
	wantRangeError(t, err, "pressure amplitude")
}

func TestPermittedHours(t *testing.T) {
	t.Parallel()
	// OSHA 1910.95 Table G-16: 90 dBA 8 h, 95 dBA 4 h, 100 dBA 2 h,
	// 115 dBA 0.25 h (osha.gov text of 1910.95 and of Appendix A,
	// Table G-16a).
	// EU: L_EX,8h = 87 dB(A) at 87 dB(A) for 8 h, 90 dB(A) about 4 h
	// (equal energy, 3 dB halving).
	cases := []struct{ L, osha, eu float64 }{
		{90, 8, 8 * math.Pow(10, -0.3)},
		{95, 4, 8 * math.Pow(10, -0.8)},
		{100, 2, 8 * math.Pow(10, -1.3)},
		{115, 0.25, 8 * math.Pow(10, -2.8)},
		{87, 8 * math.Pow(2, 0.6), 8},
	}
	for _, c := range cases {
		o, e := PermittedHours(c.L)
		near(t, "OSHA", o, c.osha, 1e-12)
		near(t, "EU", e, c.eu, 1e-12)
	}
	// OSHA 1910.95 Appendix A, Table G-16a, reference durations T (hours)
	// as printed (osha.gov, "Appendix A to § 1910.95 - Noise Exposure
	// Computation"), to the digits printed: the formula must round to them.
	// They are for adding up a dose, not permitted times.
	table := []struct{ L, T, halfDigit float64 }{
		{80, 32, 0.5}, {85, 16, 0.5}, {87, 12.1, 0.05}, {91, 7.0, 0.05},
		{92, 6.1, 0.05}, {97, 3.0, 0.05}, {106, 0.87, 0.005},
		{110, 0.5, 0.05}, {120, 0.125, 0.0005}, {130, 0.031, 0.0005},
	}
	for _, r := range table {
		if o := ReferenceDurationHours(r.L); math.Abs(o-r.T) > r.halfDigit {
			t.Errorf("OSHA %g dBA: %.4g h, Table G-16a prints %g h", r.L, o, r.T)
		}
	}
	// Above 115 dBA PermittedHours gives no time for OSHA, and the EU
	// time stays the equal-energy one.
	for _, L := range []float64{115.01, 120, 130} {
		o, e := PermittedHours(L)
		if o != 0 {
			t.Errorf("OSHA %g dBA: %g h permitted, want none", L, o)
		}
		near(t, "EU above 115", e, 8*math.Pow(10, (87-L)/10), 1e-12)
	}
}

// OSHA 1910.95(b) Table G-16, permissible noise exposures: the printed
// durations (as reproduced by CEJN, "OSHA 1910.95(b)(1)"), which the
// formula reproduces within the table's rounding (2 %: 92 dBA is 6.06 h by
// the formula, printed 6). Above 115 dBA ("¼ or less" is the last row) no
// time is permitted: the 15 min at 115 dB of the usual reading
// ("Exposure Guidelines", progressivegardening.com) is the last one.
func TestOSHAPermitted(t *testing.T) {
	t.Parallel()
	table := []struct{ L, hours float64 }{
		{90, 8}, {92, 6}, {95, 4}, {97, 3}, {100, 2}, {102, 1.5}, {105, 1}, {110, 0.5}, {115, 0.25},
	}
	for _, r := range table {
		e := OSHAPermitted(r.L)
		if !e.Permitted || math.Abs(e.Hours-r.hours) > 0.02*r.hours {
			t.Errorf("%g dBA: %+v, Table G-16 prints %g h", r.L, e, r.hours)
		}
	}
	for _, L := range []float64{115.05, 116, 120, 140, math.Inf(1), math.NaN()} {
		e := OSHAPermitted(L)
		if e.Permitted || e.Hours != 0 || !strings.Contains(e.Note, "not permitted") {
			t.Errorf("%g dBA: %+v, want not permitted", L, e)
		}
	}
	if e := OSHAPermitted(120); !strings.Contains(e.Note, "115 dBA") {
		t.Errorf("120 dBA: note %q does not name the table's limit", e.Note)
	}
}
