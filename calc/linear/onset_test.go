package linear

import (
	"encoding/json"
	"errors"
	"math"
	"os"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

type refFile struct {
	Devices []struct {
		Device json.RawMessage `json:"device"`
		Gas    struct {
			Label     string  `json:"label"`
			MolarMass float64 `json:"molar_mass"`
			Gamma     float64 `json:"gamma"`
			T0        float64 `json:"t0"`
			Mu0       float64 `json:"mu0"`
			K0        float64 `json:"k0"`
			Exponent  float64 `json:"exponent"`
		} `json:"gas"`
		HotTemperature float64 `json:"hot_temperature"`
		Frequency      float64 `json:"frequency"`
	} `json:"devices"`
}

// TestOnsetAgainstScipy compares Onset with an independent implementation
// of the same equations: scipy 1.10.1 solve_ivp (DOP853, rtol 1e-11) and
// fsolve, via testdata/gen_onset.py (testdata/onset_ref.json). The issue asks
// for 0.2 % in hot temperature and 0.05 % in frequency; the two agree far
// better, so the test holds them to 1e-5 to catch regressions.
func TestOnsetAgainstScipy(t *testing.T) {
	t.Parallel()
	b, err := os.ReadFile("../../testdata/onset_ref.json")
	if err != nil {
		t.Fatal(err)
	}
	var ref refFile
	if err := json.Unmarshal(b, &ref); err != nil {
		t.Fatal(err)
	}
	if len(ref.Devices) != 3 {
		t.Fatalf("%d reference devices, want 3", len(ref.Devices))
	}
	for _, c := range ref.Devices {
		d := mustDevice(t, string(c.Device))
		g := PowerLawGas{Label: c.Gas.Label, MolarMass: c.Gas.MolarMass, Gamma: c.Gas.Gamma, T0: c.Gas.T0, Mu0: c.Gas.Mu0, K0: c.Gas.K0, Exponent: c.Gas.Exponent}
		r, err := Onset(d, &Settings{Gas: g})
		if err != nil {
			t.Errorf("%s: %v", d.Name, err)
			continue
		}
		if !scalar.EqualWithinRel(r.HotTemperature, c.HotTemperature, 1e-5) {
			t.Errorf("%s: hot temperature %.6f K, scipy %.6f K", d.Name, r.HotTemperature, c.HotTemperature)
		}
		if !scalar.EqualWithinRel(r.Frequency, c.Frequency, 1e-5) {
			t.Errorf("%s: frequency %.6f Hz, scipy %.6f Hz", d.Name, r.Frequency, c.Frequency)
		}
		if !scalar.EqualWithinRel(r.TemperatureRatio, r.HotTemperature/d.AmbientTemperature, 1e-14) || !r.Converged {
			t.Errorf("%s: ratio %g or converged %v inconsistent", d.Name, r.TemperatureRatio, r.Converged)
		}
		// The profile starts at p1 = 1 Pa, U1 = 0 and ends on the boundary.
		p := r.Profile
		if n := len(p.X); n < 10 || p.PressureAmp[0] != 1 || p.FlowAmp[0] != 0 || p.X[n-1] != d.Length() {
			t.Errorf("%s: profile of %d points, start |p1| %g |U1| %g, end x %g (length %g)", d.Name, len(p.X), p.PressureAmp[0], p.FlowAmp[0], p.X[len(p.X)-1], d.Length())
		}
	}
}

// tubeDevice is a stackless tube of radius a and length l, closed at the
// start, with the far end given.
func tubeDevice(t testing.TB, l, a string, far string) *Device {
	return mustDevice(t, `{"gas":"helium","mean_pressure":"30 bar","ambient_temperature":"300 K","parts":[
 {"kind":"closed-end"},{"kind":"tube","length":"`+l+`","diameter":"`+a+`"},`+far+`]}`)
}

// TestModeStacklessTube checks the complex-frequency solve against the
// Kirchhoff wall loss of a wide tube: attenuation
//
//	α = (1/(a c)) √(ωμ/(2ρ)) (1 + (γ-1)/√σ)
//
// (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed.
// 2000, sect. 8.9, from memory of the form), a phase speed lowered by the
// same amount (k = ω/c + α in the boundary-layer limit), Q_wall = k/(2α),
// plus for the open end the radiation of an unflanged pipe (Levine &
// Schwinger 1948: end correction 0.6133 a, radiation resistance (ka)²/4
// ρc/A, which gives Q_rad = π/(ka)² for a quarter-wave tube: energy
// balance, elementary). Energy accounting for the open end (elementary):
// the stored energy fills L_eff = L + Δ, while the wall loss acts on L only,
// viscous on ∫sin² = (L-Δ)/2 and thermal on ∫cos² = (L+Δ)/2, so
//
//	1/Q = (2α/k) [δν(L-Δ) + (γ-1)δκ(L+Δ)] / ([δν + (γ-1)δκ] L_eff) + (ka)²/π
//
// A wide tube at 30 bar keeps δν/a near 0.15 %, where the first-order
// Kirchhoff form is good to about 0.2 %. Within 0.5 % (the issue's
// tolerance).
func TestModeStacklessTube(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name   string
		far    string
		quarts float64 // resonance at k L_eff = quarts·π/2
		open   bool
	}{
		{"closed-open", `{"kind":"open-end","flange":"none"}`, 1, true},
		{"closed-closed", `{"kind":"closed-end"}`, 2, false},
	}
	const l, a, pm = 1.0, 0.05, 30e5
	for _, c := range cases {
		d := tubeDevice(t, "1 m", "100 mm", c.far)
		r, err := Mode(d, 0, &Settings{Gas: testHelium})
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		g, _ := testHelium.State(300, pm)
		sigma := g.Prandtl()
		alpha := func(w float64) float64 {
			return math.Sqrt(w*g.Viscosity/(2*g.Density)) * (1 + (g.Gamma-1)/math.Sqrt(sigma)) / (a * g.SoundSpeed)
		}
		delta := 0.0
		if c.open {
			delta = 0.6133 * a
		}
		leff := l + delta
		// Solve (ω/c + α(ω)) L_eff = quarts·π/2 by fixed-point iteration.
		w := c.quarts * math.Pi / 2 * g.SoundSpeed / leff
		for i := 0; i < 50; i++ {
			w = (c.quarts*math.Pi/2/leff - alpha(w)) * g.SoundSpeed
		}
		k := w/g.SoundSpeed + alpha(w)
		dn := math.Sqrt(2 * g.Viscosity / (g.Density * w))
		dk := dn / math.Sqrt(sigma)
		lw := (dn*(l-delta) + (g.Gamma-1)*dk*(l+delta)) / (dn + (g.Gamma-1)*dk)
		invQ := 2 * alpha(w) / k * lw / leff
		if c.open {
			ka := w / g.SoundSpeed * a
			invQ += ka * ka / math.Pi
		}
		t.Logf("%s: f %.4f Hz vs %.4f Hz, Q %.3f vs %.3f", c.name, r.Frequency, w/(2*math.Pi), r.Q, 1/invQ)
		if !scalar.EqualWithinRel(r.Frequency, w/(2*math.Pi), 0.005) {
			t.Errorf("%s: frequency %.4f Hz, Kirchhoff %.4f Hz", c.name, r.Frequency, w/(2*math.Pi))
		}
		if !scalar.EqualWithinRel(r.Q, 1/invQ, 0.005) {
			t.Errorf("%s: Q %.3f, Kirchhoff %.3f", c.name, r.Q, 1/invQ)
		}
		if r.Growing || r.GrowthRate >= 0 {
			t.Errorf("%s: a stackless tube must decay, growth rate %g", c.name, r.GrowthRate)
		}
	}
}

// TestModeAroundOnset: at ambient the engine's mode decays, above the onset
// temperature it grows, at onset its growth rate is about zero (property
// test of the complex-frequency solve against Onset).
func TestModeAroundOnset(t *testing.T) {
	t.Parallel()
	d, err := Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	s := &Settings{Gas: testHelium, NoProfile: true}
	on, err := Onset(d, s)
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		hot  float64
		sign int
	}{{d.AmbientTemperature, -1}, {0.9 * on.HotTemperature, -1}, {on.HotTemperature, 0}, {1.1 * on.HotTemperature, +1}}
	for _, c := range cases {
		m, err := Mode(d, c.hot, s)
		if err != nil {
			t.Fatalf("hot %g: %v", c.hot, err)
		}
		w := 2 * math.Pi * m.Frequency
		switch {
		case c.sign == 0 && math.Abs(m.GrowthRate) > 1e-6*w:
			t.Errorf("at onset %g K: growth rate %g 1/s, want about 0", c.hot, m.GrowthRate)
		case c.sign < 0 && (m.GrowthRate >= 0 || m.Growing):
			t.Errorf("hot %g K: growth %g, want decay", c.hot, m.GrowthRate)
		case c.sign > 0 && (m.GrowthRate <= 0 || !m.Growing):
			t.Errorf("hot %g K: growth %g, want growth", c.hot, m.GrowthRate)
		}
		if c.sign == 0 && !scalar.EqualWithinRel(m.Frequency, on.Frequency, 1e-6) {
			t.Errorf("mode frequency at onset %g Hz, onset solve %g Hz", m.Frequency, on.Frequency)
		}
	}
}

// TestOnsetStepConvergence: the onset temperature converges as the
// integrator's tolerance tightens; the change from the tightest answer stays
// within a small multiple of the tolerance (step-size convergence; the
// adaptive steps make the sequence not strictly monotonic).
func TestOnsetStepConvergence(t *testing.T) {
	t.Parallel()
	d, err := Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	tols := []float64{1e-3, 1e-5, 1e-7, 1e-9, 1e-12}
	var th []float64
	steps, first := 0, 0
	for _, tol := range tols {
		r, err := Onset(d, &Settings{Gas: testHelium, RelTol: tol})
		if err != nil {
			t.Fatal(err)
		}
		th = append(th, r.HotTemperature)
		n := 0
		for _, p := range r.Profile.Part {
			if d.Parts[p].Kind == KindStack {
				n++
			}
		}
		if n < steps {
			t.Errorf("tolerance %g: %d profile rows in the stack, fewer than %d at the looser tolerance", tol, n, steps)
		}
		if first == 0 {
			first = n
		}
		steps = n
	}
	best := th[len(th)-1]
	for i, tol := range tols[:len(tols)-1] {
		if e := math.Abs(th[i]-best) / best; e > 50*tol {
			t.Errorf("tolerance %g: relative change %g from the tightest answer exceeds 50×tolerance", tol, e)
		}
	}
	if steps <= first {
		t.Errorf("the tightest tolerance takes %d steps in the stack, the loosest %d", steps, first)
	}
	if e := math.Abs(th[0] - best); e < 1e-12 {
		t.Errorf("loosest tolerance gives exactly the tightest answer (%g K): the tolerance is not used", th[0])
	}
}

// TestOnsetNotConverged: a starved solve reports failure with its last
// iterate, never an answer.
func TestOnsetNotConverged(t *testing.T) {
	t.Parallel()
	d, err := Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	r, err := Onset(d, &Settings{Gas: testHelium, MaxIterations: 1, HotGuess: 1500})
	if err == nil || r != nil {
		t.Fatalf("1 iteration from 1500 K: result %+v, err %v; want a convergence error", r, err)
	}
	var ce *ConvergenceError
	if !errors.As(err, &ce) || !errors.Is(err, ErrNotConverged) || len(ce.Last) != 2 || ce.Last[0] <= 0 {
		t.Errorf("error %v is not a ConvergenceError with the last iterate", err)
	}
}

// TestOnsetNeedsHotAndStack: devices the onset solve cannot handle.
func TestOnsetNeedsHotAndStack(t *testing.T) {
	t.Parallel()
	if _, err := Onset(tubeDevice(t, "1 m", "50 mm", `{"kind":"closed-end"}`), nil); err == nil {
		t.Error("tube without hot part: no error")
	}
}

var sinkOnset *OnsetResult

// BenchmarkOnsetExampleEngine is the onset solve of the example engine with
// the gasprops mixture model, profile included (issue target: < 5 ms).
func BenchmarkOnsetExampleEngine(b *testing.B) {
	d, err := Example("engine")
	if err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		r, err := Onset(d, nil)
		if err != nil {
			b.Fatal(err)
		}
		sinkOnset = r
	}
}

var sinkY [3]complex128

// BenchmarkIntegrationPass is one integration through the example engine at
// fixed temperature and frequency; it must not allocate.
func BenchmarkIntegrationPass(b *testing.B) {
	d, err := Example("engine")
	if err != nil {
		b.Fatal(err)
	}
	m, err := newModel(d, nil, 1e-9)
	if err != nil {
		b.Fatal(err)
	}
	m.th, m.tc, m.omega = 700, d.AmbientTemperature, complex(2*math.Pi*260, 0)
	b.ReportAllocs()
	for b.Loop() {
		y, err := m.run(1, 0, nil)
		if err != nil {
			b.Fatal(err)
		}
		sinkY = y
	}
}

// TestIntegrationPassNoAllocs: an integration through a device allocates
// nothing once the model is built.
func TestIntegrationPassNoAllocs(t *testing.T) {
	d, err := Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	m, err := newModel(d, nil, 1e-9)
	if err != nil {
		t.Fatal(err)
	}
	m.th, m.tc, m.omega = 700, d.AmbientTemperature, complex(2*math.Pi*260, 0)
	if n := testing.AllocsPerRun(10, func() { _, _ = m.run(1, 0, nil) }); n != 0 {
		t.Errorf("%g allocations per integration pass, want 0", n)
	}
}

// TestOnsetShortStackEstimate: the quick estimate for the example engine is
// reported, with its validity numbers, and the full solve needs more than
// the critical difference (an engine must exceed the critical gradient to
// pay for its losses: common practice, no published source checked; a
// check of sign and order only).
func TestOnsetShortStackEstimate(t *testing.T) {
	t.Parallel()
	d, _ := Example("engine")
	r, err := Onset(d, &Settings{NoProfile: true})
	if err != nil {
		t.Fatal(err)
	}
	ss := r.ShortStack
	if ss == nil {
		t.Fatal("no short-stack estimate")
	}
	span := r.HotTemperature - d.AmbientTemperature
	if !(ss.CriticalDifference > 0 && ss.CriticalDifference < span) || ss.KDeltaX <= 0 || ss.DepthRatio <= 0 {
		t.Errorf("short stack %+v against onset span %g K", ss, span)
	}
}

// TestModeAgainstResonator: the check that a stackless closed-open
// tube's complex-frequency solve reproduces the resonance frequency and the
// Kirchhoff-loss Q of the resonator calculators (calc/resonator,
// TubeFrequency, itself checked against Kinsler et al.'s Kirchhoff form and
// Levine & Schwinger's open end) within 0.5 %, with the same gasprops
// helium on both sides. The wave equations here have no boundary layer on
// the closed end caps, so the resonator's Q is taken without its cap term
// (1/Q = 1/Q_wall + 1/Q_radiation); the end correction there is the
// ka-dependent fit, here the fixed 0.6133 a (ka ≈ 0.08: 0.1 % of δ apart).
func TestModeAgainstResonator(t *testing.T) {
	t.Parallel()
	mix, err := gasprops.ParseMixture("helium")
	if err != nil {
		t.Fatal(err)
	}
	props, err := mix.Properties(units.Temperature(300), units.Pressure(30e5), nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name string
		far  string
		ends resonator.Ends
	}{
		{"closed-open", `{"kind":"open-end","flange":"none"}`, resonator.ClosedOpen},
		{"closed-closed", `{"kind":"closed-end"}`, resonator.ClosedClosed},
	} {
		d := tubeDevice(t, "1 m", "100 mm", c.far)
		m, err := Mode(d, 0, &Settings{NoProfile: true})
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		ref, err := resonator.TubeFrequency(resonator.Tube{Ends: c.ends, Correction: resonator.Unflanged, Mode: 1, Length: 1, Radius: 0.05}, props)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		q := 1 / (1/ref.Q.Wall + 1/ref.Q.Radiation)
		t.Logf("%s: f %.4f Hz vs resonator %.4f Hz; Q %.3f vs %.3f (resonator with caps %.3f)", c.name, m.Frequency, ref.Frequency, m.Q, q, ref.Q.Total)
		if !scalar.EqualWithinRel(m.Frequency, ref.Frequency, 0.005) {
			t.Errorf("%s: frequency %.4f Hz, resonator %.4f Hz", c.name, m.Frequency, ref.Frequency)
		}
		if !scalar.EqualWithinRel(m.Q, q, 0.005) {
			t.Errorf("%s: Q %.3f, resonator (wall and radiation) %.3f", c.name, m.Q, q)
		}
	}
}

// TestModeWarnsOutsideGasRange: a hot temperature beyond the gas model's
// range (the example engine's helium-argon: 200-5000 K in gasprops) gives
// a warning with the mode, none at ambient.
func TestModeWarnsOutsideGasRange(t *testing.T) {
	t.Parallel()
	d, err := Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		hot  float64
		warn bool
	}{{d.AmbientTemperature, false}, {5500, true}} {
		m, err := Mode(d, c.hot, &Settings{NoProfile: true})
		if err != nil {
			t.Fatalf("hot %g K: %v", c.hot, err)
		}
		got := false
		for _, w := range m.Warnings {
			got = got || strings.Contains(w, "outside the gas model's range")
		}
		if got != c.warn {
			t.Errorf("hot %g K: warnings %q, want a range warning: %v", c.hot, m.Warnings, c.warn)
		}
	}
}
