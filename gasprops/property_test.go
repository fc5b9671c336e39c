package gasprops

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

// Property tests: scaling laws of ideal gases and dilute-gas transport,
// which hold for any correct implementation.

// TestMonatomicPrandtl: kinetic theory gives Pr = cp η/λ = 2/3 for a
// monatomic gas in the first approximation, slightly less in higher ones
// (Chapman & Cowling, The Mathematical Theory of Non-uniform Gases, 3rd
// ed., 1970, §10.3); the published fits must agree within 2 %.
func TestMonatomicPrandtl(t *testing.T) {
	t.Parallel()
	for _, s := range []*Species{helium, neon, argon, krypton, xenon} {
		for _, T := range []float64{200, 300, 600, 1000, 2000} {
			pr := props(t, Pure(s), T, 1e5).Prandtl
			if !scalar.EqualWithinRel(pr, 2.0/3, 0.02) {
				t.Errorf("%s Prandtl at %g K = %.4f, want 2/3 within 2 %%", s.Name, T, pr)
			}
		}
	}
}

// TestPressureScaling: ideal gas at fixed T: density ∝ p; η, λ, cp, c and
// Pr do not depend on p; thermal diffusivity and kinematic viscosity ∝ 1/p
// (so penetration depths √(2α/ω) ∝ p^−½).
func TestPressureScaling(t *testing.T) {
	t.Parallel()
	he70 := mustParse(t, "helium:0.7,argon:0.3")
	for _, m := range []Mixture{Pure(helium), Pure(nitrogen), Pure(carbonDioxide), he70} {
		for _, T := range []float64{320, 700} { // above CO2's critical point
			a := props(t, m, T, 1e5)
			for _, k := range []float64{0.01, 7, 100} {
				b := props(t, m, T, k*1e5)
				rel := func(name string, got, want float64) {
					if !scalar.EqualWithinRel(got, want, 1e-12) {
						t.Errorf("%v at %g K, ×%g pressure: %s %.12g, want %.12g", m, T, k, name, got, want)
					}
				}
				rel("density", b.Density, k*a.Density)
				rel("viscosity", b.Viscosity, a.Viscosity)
				rel("conductivity", b.ThermalConductivity, a.ThermalConductivity)
				rel("cp", b.IsobaricSpecificHeat, a.IsobaricSpecificHeat)
				rel("sound speed", b.SoundSpeed, a.SoundSpeed)
				rel("Prandtl", b.Prandtl, a.Prandtl)
				rel("thermal diffusivity", b.ThermalDiffusivity, a.ThermalDiffusivity/k)
				rel("kinematic viscosity", b.KinematicViscosity, a.KinematicViscosity/k)
			}
		}
	}
}

// TestSoundSpeedSqrtT: with constant γ (monatomic) the ideal sound speed
// is ∝ √T.
func TestSoundSpeedSqrtT(t *testing.T) {
	t.Parallel()
	for _, m := range []Mixture{Pure(helium), Pure(xenon), mustParse(t, "He:0.6,Xe:0.4")} {
		c0 := props(t, m, 250, 1e5).SoundSpeed
		for _, T := range []float64{300, 500, 1000} {
			c := props(t, m, T, 1e5).SoundSpeed
			if !scalar.EqualWithinRel(c, c0*math.Sqrt(T/250), 1e-12) {
				t.Errorf("%v: c(%g K) = %.10g, √T scaling gives %.10g", m, T, c, c0*math.Sqrt(T/250))
			}
		}
	}
}

// TestDerivedProperties: the derived fields follow from the primary ones.
func TestDerivedProperties(t *testing.T) {
	t.Parallel()
	for _, s := range table {
		p := props(t, Pure(s), 400, 2e5)
		checks := [][3]float64{
			{p.ThermalDiffusivity, p.ThermalConductivity / (p.Density * p.IsobaricSpecificHeat)},
			{p.KinematicViscosity, p.Viscosity / p.Density},
			{p.Prandtl, p.Viscosity * p.IsobaricSpecificHeat / p.ThermalConductivity},
			{p.Density, 2e5 * p.MolarMass / (codataR * 400)},
			{p.SoundSpeed, math.Sqrt(p.Gamma * codataR * 400 / p.MolarMass)},
			{p.Gamma, p.IsobaricSpecificHeat / (p.IsobaricSpecificHeat - codataR/p.MolarMass)},
		}
		for i, c := range checks {
			if !scalar.EqualWithinRel(c[0], c[1], 1e-12) {
				t.Errorf("%s check %d: %.12g vs %.12g", s.Name, i, c[0], c[1])
			}
		}
	}
}

// TestTransportIncreasesWithT: dilute-gas viscosity and conductivity rise
// with temperature for every gas over its range.
func TestTransportIncreasesWithT(t *testing.T) {
	t.Parallel()
	for _, s := range table {
		lo, hi := s.Range()
		prev := props(t, Pure(s), lo, 1e5)
		for T := lo * 1.05; T <= hi; T *= 1.05 {
			p := props(t, Pure(s), T, 1e5)
			if !(p.Viscosity > prev.Viscosity && p.ThermalConductivity > prev.ThermalConductivity) {
				t.Errorf("%s at %g K: viscosity or conductivity did not rise", s.Name, T)
				break
			}
			prev = p
		}
	}
}

// TestRangeChecks: in range no warning; up to 20 % outside a warning that
// names the model; beyond that a *units.RangeError; bad pressures too.
func TestRangeChecks(t *testing.T) {
	t.Parallel()
	he := Pure(helium)
	if p := props(t, he, 300, 1e5); p.Warnings != nil {
		t.Errorf("warnings in range: %v", p.Warnings)
	}
	for _, T := range []float64{90, 5900} {
		p := props(t, he, T, 1e5)
		if len(p.Warnings) != 1 || !strings.Contains(p.Warnings[0], "helium model") || !strings.Contains(p.Warnings[0], "validated range 100–5000 K") {
			t.Errorf("%g K: warnings %q", T, p.Warnings)
		}
	}
	mix := mustParse(t, "He:0.5,Xe:0.5")
	if p := props(t, mix, 3300, 1e5); len(p.Warnings) != 1 || !strings.Contains(p.Warnings[0], "xenon") {
		t.Errorf("He-Xe at 3300 K: warnings %q, want one naming xenon", p.Warnings)
	}
	bad := []struct {
		T, p  float64
		field string
	}{
		{70, 1e5, "temperature"}, {7000, 1e5, "temperature"}, {math.NaN(), 1e5, "temperature"},
		{math.Inf(1), 1e5, "temperature"}, {-5, 1e5, "temperature"},
		{300, 0, "pressure"}, {300, 0.5, "pressure"}, {300, -1e5, "pressure"}, {300, math.NaN(), "pressure"}, {300, math.Inf(1), "pressure"},
	}
	for _, b := range bad {
		_, err := he.Properties(units.Temperature(b.T), units.Pressure(b.p), nil)
		var re *units.RangeError
		if !errors.As(err, &re) || re.Field != b.field {
			t.Errorf("T=%g p=%g: error %v, want a RangeError on %s", b.T, b.p, err, b.field)
		}
	}
	// departure from ideality: argon at 300 K, 50 bar (B ≈ −15 cm³/mol,
	// Bp/RT ≈ −3 %) warns in both modes; at 600 bar the virial option
	// refuses (|Bp/RT| ≈ 0.36)
	ar := Pure(argon)
	for _, o := range []*Options{nil, {NonIdeal: true}} {
		p, err := ar.Properties(300, 50e5, o)
		if err != nil || len(p.Warnings) != 1 || !strings.Contains(p.Warnings[0], "departs from the ideal gas by about 3") {
			t.Errorf("argon 50 bar (%v): %q %v", o, p.Warnings, err)
		}
	}
	if _, err := ar.Properties(300, 600e5, &Options{NonIdeal: true}); err == nil {
		t.Error("argon at 600 bar with the virial option accepted")
	}
	// hydrogen has no B: the virial option says so above 5 bar
	h2 := Pure(hydrogen)
	if p, err := h2.Properties(300, 20e5, &Options{NonIdeal: true}); err != nil || !containsAny(p.Warnings, "ideal-gas values") {
		t.Errorf("hydrogen 20 bar non-ideal: %q %v", p.Warnings, err)
	}
	if p := props(t, h2, 300, 20e5); p.Warnings != nil {
		t.Errorf("hydrogen 20 bar ideal: %q", p.Warnings)
	}
	_, err := he.Properties(70, 1e5, nil)
	if err == nil || !strings.Contains(err.Error(), "helium model") {
		t.Errorf("error %v should name the helium model", err)
	}
	if _, err := (Mixture{}).Properties(300, 1e5, nil); !errors.Is(err, ErrEmptyMixture) {
		t.Errorf("zero Mixture: %v", err)
	}
}

// TestNoNonFinite: across every gas, the whole accepted temperature band
// and pressures from 1 Pa to 100 MPa, with and without the virial option,
// every field is finite and positive.
func TestNoNonFinite(t *testing.T) {
	t.Parallel()
	mixes := []Mixture{mustParse(t, "He:0.7,Ar:0.3"), mustParse(t, "He:0.2,Ne:0.2,Ar:0.2,Kr:0.2,Xe:0.2")}
	for _, s := range table {
		mixes = append(mixes, Pure(s))
	}
	for _, m := range mixes {
		lo, hi := m.Range()
		for _, T := range []float64{lo * 0.81, lo, (lo + hi) / 2, hi, hi * 1.19} {
			for _, p := range []float64{MinPressure, 1e5, 1e7, 1e8} {
				for _, o := range []*Options{nil, {NonIdeal: true}} {
					pr, err := m.Properties(units.Temperature(T), units.Pressure(p), o)
					if err != nil {
						// the virial option refuses |Bp/RT| > 0.25, and a
						// component at or above its vapour pressure is refused
						var re *units.RangeError
						if errors.As(err, &re) && re.Field == "pressure" &&
							(o != nil && p >= 1e7 || strings.Contains(re.Why, "condenses")) {
							continue
						}
						t.Errorf("%v at %g K, %g Pa: %v", m, T, p, err)
						continue
					}
					if !finite(pr) {
						t.Errorf("%v at %g K, %g Pa: non-finite %+v", m, T, p, pr)
					}
				}
			}
		}
	}
}
