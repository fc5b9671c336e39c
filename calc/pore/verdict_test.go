package pore

import (
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestJudgeStack: parallel plates against δκ = 0.1 mm. The band 1–2 δκ for
// the half gap is common practice (no published source); Tijani, Zeegers &
// de Waele, JASA 112, 128 (2002), abstract (read; page number from
// memory): spacings 0.15–0.7 mm tested, 0.25 mm (2.5 δκ) most cooling
// power, 0.3 mm (3 δκ) concluded optimal and 0.4 mm (4 δκ) lowest
// temperature, all within or at the edge of our band.
func TestJudgeStack(t *testing.T) {
	t.Parallel()
	const dk = 0.1e-3
	cases := []struct {
		gap  float64
		call Call
	}{
		{0.10e-3, TooTight},   // half gap 0.5 δκ
		{0.15e-3, TooTight},   // 0.75 δκ: Tijani's tightest stack
		{0.25e-3, AboutRight}, // 2.5 δκ spacing: most cooling power (Tijani 2002)
		{0.30e-3, AboutRight}, // 3 δκ: optimal (Tijani 2002)
		{0.40e-3, AboutRight}, // 4 δκ: lowest temperature (Tijani 2002), edge of band
		{0.70e-3, TooOpen},    // 7 δκ: Tijani's widest stack
	}
	for _, c := range cases {
		v, err := Judge(must(Plates(c.gap/2, 0.1e-3)), RoleStack, dk)
		if err != nil {
			t.Fatal(err)
		}
		if v.Call != c.call {
			t.Errorf("gap %g: %v, want %v (%s)", c.gap, v.Call, c.call, v.Words)
		}
		if !scalar.EqualWithinAbsOrRel(v.SpacingOverDelta, c.gap/dk, 0, 1e-12) {
			t.Errorf("gap %g: spacing/δκ %g", c.gap, v.SpacingOverDelta)
		}
		if !strings.Contains(v.Suggestion, "0.3 mm") { // aim: spacing 3 δκ
			t.Errorf("gap %g: suggestion %q does not aim at a 0.3 mm gap", c.gap, v.Suggestion)
		}
		if !strings.Contains(v.Words, c.call.String()[1:]) {
			t.Errorf("words %q do not say %q", v.Words, c.call)
		}
	}
}

// TestJudgeRegenerator: band 0.1–0.3 δκ, common practice, no published source.
func TestJudgeRegenerator(t *testing.T) {
	t.Parallel()
	const dk = 0.25e-3 // helium 300 K, 10 bar, 100 Hz (see depths_test.go)
	cases := []struct {
		s    Shape
		call Call
	}{
		{must(Screens(200/inch, 41e-6, 0)), AboutRight},  // r_h 30.2 µm = 0.121 δκ, just inside
		{must(Screens(100/inch, 0.1e-3, 0)), AboutRight}, // 55.9 µm = 0.22 δκ
		{must(Screens(30/inch, 0.25e-3, 0)), TooOpen},    // 207 µm = 0.83 δκ
		{must(Fibres(10e-6, 0.3)), TooTight},             // 5.8 µm = 0.023 δκ
	}
	for _, c := range cases {
		v, err := Judge(c.s, RoleRegenerator, dk)
		if err != nil {
			t.Fatal(err)
		}
		if v.Call != c.call {
			t.Errorf("%s: %v (r_h/δκ = %.3g), want %v", c.s.(Named).Describe(), v.Call, v.RhOverDelta, c.call)
		}
		if v.Suggestion == "" || !strings.Contains(v.Rule.Text, "common practice") {
			t.Errorf("missing suggestion or rule source: %+v", v)
		}
	}
	if _, err := Judge(cases[0].s, RoleStack, 0); err == nil {
		t.Error("δκ = 0 accepted")
	}
}

// TestSuggestionRoundTrip: the geometry each suggestion names has the
// aimed-for hydraulic radius (forward then inverse).
func TestSuggestionRoundTrip(t *testing.T) {
	t.Parallel()
	const aim = 50e-6
	d := 41e-6
	checks := []struct {
		name string
		s    Shape
	}{
		{"screens", must(Screens(meshFor(d, aim), d, 0))},
		{"fibres", must(Fibres(d, SolidFractionFor(d, aim)))},
		{"pins", must(Pins(0.1e-3, pinPitchFor(0.1e-3, aim)))},
		{"honeycomb", must(Honeycomb(cellsFor(0.1e-3, aim), 0.1e-3))},
	}
	for _, c := range checks {
		if !scalar.EqualWithinAbsOrRel(c.s.HydraulicRadius(), aim, 0, 1e-12) {
			t.Errorf("%s: r_h %g, want %g", c.name, c.s.HydraulicRadius(), aim)
		}
	}
}
