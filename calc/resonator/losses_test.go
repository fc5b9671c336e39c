package resonator

import (
	"math"
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/pore"
)

// Kirchhoff attenuation against the form printed by Kinsler, Frey, Coppens
// & Sanders, Fundamentals of Acoustics, 4th ed. (2000), wall losses in a
// pipe (from memory): α = (1/(a c))·sqrt(ηω/(2ρ))·[1 + (γ-1)/sqrt(Pr)].
func TestKirchhoffAgainstKinsler(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		gas  string
		T, p float64
		a, f float64
	}{
		{"air", 293.15, 101325, 0.0125, 1000},
		{"helium", 300, 1e6, 0.03, 200},
		{"argon", 500, 3e5, 0.005, 5000},
	} {
		g := gas(t, c.gas, c.T, c.p)
		got, _, err := KirchhoffAttenuation(g, c.a, c.f)
		if err != nil {
			t.Fatal(err)
		}
		w := 2 * math.Pi * c.f
		want := 1 / (c.a * g.SoundSpeed) * math.Sqrt(g.Viscosity*w/(2*g.Density)) * (1 + (g.Gamma-1)/math.Sqrt(g.Prandtl))
		if !scalar.EqualWithinRel(got, want, 1e-6) {
			t.Errorf("%s a=%g f=%g: α = %.8g Np/m, Kinsler form %.8g", c.gas, c.a, c.f, got, want)
		}
	}
}

// From memory: for air at room temperature the wall attenuation is about
// α ≈ 3×10⁻⁵ √f / a (Np/m, f in Hz, a in m), a rule quoted in acoustics
// textbooks (Kinsler et al. 2000 give a number of this size). Checked
// within 5 %.
func TestKirchhoffRuleOfThumb(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 293.15, 101325)
	for _, f := range []float64{100, 1000, 10000} {
		a := 0.02
		got, _, _ := KirchhoffAttenuation(g, a, f)
		want := 3e-5 * math.Sqrt(f) / a
		if !scalar.EqualWithinRel(got, want, 0.05) {
			t.Errorf("f = %g: α = %.4g Np/m, rule of thumb %.4g", f, got, want)
		}
	}
	// narrow tube warning
	if _, w, _ := KirchhoffAttenuation(g, 1e-4, 100); w == "" {
		t.Error("0.1 mm radius at 100 Hz: no boundary-layer warning")
	}
	if _, _, err := KirchhoffAttenuation(g, 0, 100); err == nil {
		t.Error("zero radius: no error")
	}
}

// Q by mechanism against independent derivations:
//   - wall: Q = k/(2α), the travelling-wave attenuation turned into a
//     standing-wave quality factor (Kinsler et al. 2000, ch. 10, damped
//     standing waves, from memory), equal to a/(δν + (γ-1)δκ);
//   - radiation from one unflanged open end: the reflection coefficient
//     |R| ≈ 1 - (ka)²/2 (Levine & Schwinger 1948, low-frequency limit)
//     loses (ka)² of the energy per round trip 2L/c, so Q = 2kL_eff/(ka)²;
//   - bandwidth f/Q and amplitude decay time Q/(πf) (definitions).
func TestQuality(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 300, 101325)
	for _, ends := range []Ends{ClosedClosed, ClosedOpen, OpenOpen} {
		for mode := 1; mode <= 3; mode++ {
			tube := Tube{Ends: ends, Mode: mode, Length: 0.7, Radius: 0.015}
			r, err := TubeFrequency(tube, g)
			if err != nil {
				t.Fatal(err)
			}
			k := 2 * math.Pi * r.Frequency / r.SoundSpeed
			if !scalar.EqualWithinRel(r.Q.Wall, k/(2*r.Attenuation), 1e-10) {
				t.Errorf("%v n=%d: Q_wall %.6g, k/(2α) = %.6g", ends, mode, r.Q.Wall, k/(2*r.Attenuation))
			}
			dk, dn := Depths(g, r.Frequency)
			if !scalar.EqualWithinRel(r.Q.Wall, tube.Radius/(dn+(g.Gamma-1)*dk), 1e-10) {
				t.Errorf("%v n=%d: Q_wall %.6g, a/(δν+(γ-1)δκ) = %.6g", ends, mode, r.Q.Wall, tube.Radius/(dn+(g.Gamma-1)*dk))
			}
			nOpen := float64(ends.OpenEnds())
			if nOpen > 0 {
				ka := k * tube.Radius
				want := 2 * k * r.EffectiveLength / (ka * ka) / nOpen
				if !scalar.EqualWithinRel(r.Q.Radiation, want, 1e-10) {
					t.Errorf("%v n=%d: Q_rad %.6g, reflection-loss estimate %.6g", ends, mode, r.Q.Radiation, want)
				}
			} else if !math.IsInf(r.Q.Radiation, 1) {
				t.Errorf("closed-closed radiates: Q_rad = %g", r.Q.Radiation)
			}
			if ends == OpenOpen && !math.IsInf(r.Q.Caps, 1) {
				t.Errorf("open-open has cap losses: Q_caps = %g", r.Q.Caps)
			}
			inv := 1/r.Q.Wall + 1/r.Q.Caps + 1/r.Q.Radiation
			if !scalar.EqualWithinRel(r.Q.Total, 1/inv, 1e-12) {
				t.Errorf("Q_total %g not the harmonic sum", r.Q.Total)
			}
			if !scalar.EqualWithinRel(r.Bandwidth, r.Frequency/r.Q.Total, 1e-12) ||
				!scalar.EqualWithinRel(r.DecayTime, r.Q.Total/(math.Pi*r.Frequency), 1e-12) {
				t.Errorf("bandwidth %g or decay time %g off", r.Bandwidth, r.DecayTime)
			}
		}
	}
}

// Q grows with radius (wall losses ∝ 1/a) for a closed tube and the
// end-cap share grows as the tube gets shorter.
func TestQualityTrends(t *testing.T) {
	t.Parallel()
	g := gas(t, "helium", 300, 1e6)
	prev := 0.0
	for _, a := range []float64{0.002, 0.005, 0.01, 0.02, 0.05} {
		r, _ := TubeFrequency(Tube{Ends: ClosedClosed, Mode: 1, Length: 1, Radius: a}, g)
		if r.Q.Total <= prev {
			t.Errorf("a = %g: Q %g not above %g", a, r.Q.Total, prev)
		}
		prev = r.Q.Total
	}
	long, _ := TubeFrequency(Tube{Ends: ClosedClosed, Mode: 1, Length: 2, Radius: 0.02}, g)
	short, _ := TubeFrequency(Tube{Ends: ClosedClosed, Mode: 1, Length: 0.1, Radius: 0.02}, g)
	if long.Q.Total/long.Q.Caps >= short.Q.Total/short.Q.Caps {
		t.Errorf("end-cap share: long %g, short %g", long.Q.Total/long.Q.Caps, short.Q.Total/short.Q.Caps)
	}
}

// TestKirchhoffAgainstRottCircular: Kirchhoff's wide-tube attenuation is
// the first term of the exact circular-duct result of Rott's theory,
//
//	k = (ω/c) √([1 + (γ-1) fκ] / (1 - fν)),  α = -Im k  (e^{iωt}, wave e^{-ikx})
//
// with fν, fκ = 2 J1(z)/(z J0(z)) from calc/pore (itself checked against
// scipy.special.jv 1.10.1 in testdata/rott_f.csv). The next term is of
// relative size δ/a (seen: Kirchhoff lower by 0.73 δν/a at a = 30, 100
// and 1000 δν, air at 500 Hz); held to 1.5 δν/a.
func TestKirchhoffAgainstRottCircular(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 293.15, 101325)
	const f = 500.0
	_, dn := Depths(g, f)
	for _, ratio := range []float64{30, 100, 1000} {
		a := ratio * dn
		got, _, err := KirchhoffAttenuation(g, a, f)
		if err != nil {
			t.Fatal(err)
		}
		sh, err := pore.Circular(a)
		if err != nil {
			t.Fatal(err)
		}
		dk, _ := Depths(g, f)
		fk, fn := sh.F(dk), sh.F(dn)
		w := 2 * math.Pi * f
		k := complex(w/g.SoundSpeed, 0) * cmplx.Sqrt((1+complex(g.Gamma-1, 0)*fk)/(1-fn))
		exact := -imag(k)
		t.Logf("a = %g δν: Kirchhoff %.6g Np/m, Rott %.6g Np/m, relative %.3g", ratio, got, exact, got/exact-1)
		if !scalar.EqualWithinRel(got, exact, 1.5/ratio) {
			t.Errorf("a = %g δν: Kirchhoff %.6g Np/m, exact circular duct %.6g Np/m", ratio, got, exact)
		}
	}
}
