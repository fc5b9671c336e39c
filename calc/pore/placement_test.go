package pore

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// air-like gas at 300 K, 1 atm: c = 347.25 m/s, ρ = 1.1764 kg/m³, γ = 1.4
// (ideal-gas values, hand-computed from R = 8.314462618, M = 28.9586 g/mol).
func airInput() PlacementInput {
	return PlacementInput{SoundSpeed: 347.25, Density: 1.1764, Gamma: 1.4, MeanTemperature: 300,
		MeanPressure: 101325, Frequency: 578, Centre: 0.02, Length: 0.02, DriveRatio: 0.02}
}

// TestPlacementNumbers checks the standing-wave formulas on a hand-computed
// case (python3 as a calculator): f = 578 Hz (common practice, no published
// source: a 0.147 m closed-open tube at 340 m/s by the quarter-wave rule),
// x = Δx = 20 mm, D = 2 %.
//
//	k = 2π·578/347.25 = 10.458405 /m, kx = 0.20916810
//	∇T_crit = 0.4·300·k·cot(kx) = 5912.241 K/m, ΔT_crit = 118.2448 K
//	ξ at the far end (kx = 0.3137521): |u1| = 0.02·101325·sin/(ρc) = 1.531042 m/s,
//	ξ = |u1|/ω = 0.4215795 mm
func TestPlacementNumbers(t *testing.T) {
	t.Parallel()
	in := airInput()
	out, err := PlaceStack(in)
	if err != nil {
		t.Fatal(err)
	}
	k := 2 * math.Pi * 578 / 347.25
	kx := k * 0.02
	gradient := 0.4 * 300 * k / math.Tan(kx)
	u := 0.02 * 101325 * math.Sin(k*0.03) / (1.1764 * 347.25)
	xi := u / (2 * math.Pi * 578)
	checks := []struct {
		name      string
		got, want float64
	}{
		{"k", out.K, 10.458405},
		{"kx", out.KX, 0.20916810},
		{"∇T_crit", out.CriticalGradient, gradient},
		{"ΔT_crit", out.CriticalDifference, gradient * 0.02},
		{"ξ", out.Displacement, xi},
		{"exchanger", out.ExchangerLength, 2 * xi},
		{"heat flux factor", out.HeatFluxFactor, math.Sin(2 * kx)},
		{"λ/8", out.LambdaEighth, 347.25 / 578 / 8},
	}
	for _, c := range checks {
		if !scalar.EqualWithinAbsOrRel(c.got, c.want, 0, 1e-6) {
			t.Errorf("%s = %.8g, want %.8g", c.name, c.got, c.want)
		}
	}
	// the hand numbers in the comment
	if !scalar.EqualWithinAbsOrRel(gradient, 5912.241, 0, 1e-6) || !scalar.EqualWithinAbsOrRel(xi, 0.4215795e-3, 0, 1e-6) {
		t.Errorf("hand values: ∇T_crit %g, ξ %g", gradient, xi)
	}
	if len(out.Cautions) == 0 || len(out.Rules) < 5 {
		t.Errorf("cautions %v, rules %v", out.Cautions, out.Rules)
	}
}

// TestPlacementProperties: the heat-flux factor peaks at λ/8; the critical
// gradient falls monotonically from the pressure antinode to the velocity
// antinode; warnings for long stacks and large drive.
func TestPlacementProperties(t *testing.T) {
	t.Parallel()
	in := airInput()
	in.Centre = 347.25 / 578 / 8
	out, err := PlaceStack(in)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinAbsOrRel(out.HeatFluxFactor, 1, 0, 1e-12) {
		t.Errorf("heat flux factor at λ/8 = %g", out.HeatFluxFactor)
	}
	prev := math.Inf(1)
	for x := 0.005; x < 0.15; x += 0.01 {
		in.Centre = x
		out, err := PlaceStack(in)
		if err != nil {
			t.Fatal(err)
		}
		if out.CriticalGradient >= prev {
			t.Errorf("critical gradient not falling at x = %g", x)
		}
		prev = out.CriticalGradient
	}
	in = airInput()
	in.Length, in.DriveRatio = 0.05, 0.15
	out, _ = PlaceStack(in)
	w := strings.Join(out.Warnings, " | ")
	if !strings.Contains(w, "short-stack") || !strings.Contains(w, "drive ratio") || !strings.Contains(w, "past the pressure antinode") {
		t.Errorf("warnings: %s", w)
	}
	in = airInput()
	in.DriveRatio = 0
	out, _ = PlaceStack(in)
	if out.Displacement != 0 || out.ExchangerLength != 0 {
		t.Errorf("no drive ratio but displacement %g", out.Displacement)
	}
}

func TestPlacementErrors(t *testing.T) {
	t.Parallel()
	bad := []func(*PlacementInput){
		func(p *PlacementInput) { p.Frequency = 0 },
		func(p *PlacementInput) { p.Centre = -1 },
		func(p *PlacementInput) { p.DriveRatio = 1.5 },
		func(p *PlacementInput) { p.Gamma = 0.9 },
		func(p *PlacementInput) { p.Length = math.NaN() },
		func(p *PlacementInput) { p.SoundSpeed = math.Inf(1) },
	}
	for i, f := range bad {
		in := airInput()
		f(&in)
		if _, err := PlaceStack(in); err == nil {
			t.Errorf("case %d: no error for %+v", i, in)
		}
	}
}

// TestPositionAdvice: the advice names the region the stack is in and the
// device's trade-off.
func TestPositionAdvice(t *testing.T) {
	t.Parallel()
	in := airInput()
	for _, c := range []struct {
		centre float64
		d      Device
		words  []string
	}{
		{0.02, Engine, []string{"between the pressure antinode and λ/8", "An engine", "common practice"}},
		{0.1, HeatPump, []string{"between λ/8 and the velocity antinode", "heat pump", "common practice"}},
		{0.2, HeatPump, []string{"beyond the velocity antinode"}},
	} {
		in.Centre = c.centre
		pl, err := PlaceStack(in)
		if err != nil {
			t.Fatal(err)
		}
		a := PositionAdvice(c.d, pl)
		for _, w := range c.words {
			if !strings.Contains(a, w) {
				t.Errorf("x = %g, %v: advice %q lacks %q", c.centre, c.d, a, w)
			}
		}
	}
	if _, err := ParseDevice("toaster"); err == nil {
		t.Error("unknown device accepted")
	}
}
