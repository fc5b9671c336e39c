package pore

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/gasprops"
)

// TestDepthsWorked checks δκ = √(2k/(ωρcp)) and δν = √(2μ/(ωρ)) on
// properties from published tables, hand-computed:
//
// Helium, 300 K, 10 bar, 100 Hz: λ = 155.9 mW/(m·K), η = 19.9 µPa·s and
// B = 11.798 cm³/mol from NIST SRD 134 (helium-4 table, 300 K, values of
// Hurly & Moldover, J. Res. NIST 105, 667 (2000)); cp = 5R/(2M) =
// 5193.16 J/(kg·K) (monatomic ideal gas); ρ = pM/(ZRT) with
// Z = 1 + Bp/(RT) = 1.0047299, ρ = 1.5971203 kg/m³. Then
// δκ = 0.24460392 mm, δν = 0.19915113 mm.
//
// Air, 300 K, 1 atm, 500 Hz: ρ = 1.1614 kg/m³, cp = 1007 J/(kg·K),
// μ = 184.6e-7 Pa·s, k = 26.3e-3 W/(m·K) from Incropera & DeWitt,
// Fundamentals of Heat and Mass Transfer, Table A.4 (from memory). Then
// δκ = 0.11964989 mm, δν = 0.10059236 mm.
func TestDepthsWorked(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name   string
		p      gasprops.Properties
		f      float64
		dk, dn float64
	}{
		{"helium 300 K 10 bar 100 Hz", gasprops.Properties{Density: 1.5971203261, IsobaricSpecificHeat: 5193.160985,
			Viscosity: 19.9e-6, ThermalConductivity: 0.1559}, 100, 0.24460392e-3, 0.19915113e-3},
		{"air 300 K 1 atm 500 Hz", gasprops.Properties{Density: 1.1614, IsobaricSpecificHeat: 1007,
			Viscosity: 184.6e-7, ThermalConductivity: 26.3e-3}, 500, 0.11964989e-3, 0.10059236e-3},
	}
	for _, c := range cases {
		dk, dn, err := PenetrationDepths(c.p, c.f)
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinAbsOrRel(dk, c.dk, 0, 1e-7) || !scalar.EqualWithinAbsOrRel(dn, c.dn, 0, 1e-7) {
			t.Errorf("%s: δκ = %.8g, δν = %.8g; want %.8g, %.8g", c.name, dk, dn, c.dk, c.dn)
		}
	}
}

// TestDepthsFromGasModel runs the project's gas model at the helium point
// above; its properties should match the NIST table to about 1 %, so the
// depths to about 1 %.
func TestDepthsFromGasModel(t *testing.T) {
	t.Parallel()
	m, err := gasprops.ParseMixture("helium")
	if err != nil {
		t.Fatal(err)
	}
	p, err := m.Properties(300, 1e6, nil)
	if err != nil {
		t.Fatal(err)
	}
	dk, dn := Depths(p, 100)
	if !scalar.EqualWithinAbsOrRel(dk, 0.24460392e-3, 0, 0.01) || !scalar.EqualWithinAbsOrRel(dn, 0.19915113e-3, 0, 0.01) {
		t.Errorf("helium model: δκ = %.5g, δν = %.5g", dk, dn)
	}
}

// TestDepthsScaling: δ ∝ f^-½ and, at fixed temperature (ρ ∝ p, transport
// properties independent of p), δ ∝ p^-½.
func TestDepthsScaling(t *testing.T) {
	t.Parallel()
	m, err := gasprops.ParseMixture("argon")
	if err != nil {
		t.Fatal(err)
	}
	p1, err := m.Properties(300, 1e5, nil)
	if err != nil {
		t.Fatal(err)
	}
	p4, err := m.Properties(300, 4e5, nil)
	if err != nil {
		t.Fatal(err)
	}
	k1, n1 := Depths(p1, 50)
	k2, n2 := Depths(p1, 200) // 4× frequency: half the depth
	k3, n3 := Depths(p4, 50)  // 4× pressure: half the depth
	for _, r := range []struct {
		name string
		a, b float64
	}{{"δκ vs f", k1, 2 * k2}, {"δν vs f", n1, 2 * n2}, {"δκ vs p", k1, 2 * k3}, {"δν vs p", n1, 2 * n3}} {
		if !scalar.EqualWithinAbsOrRel(r.a, r.b, 0, 1e-9) {
			t.Errorf("%s: %.10g vs %.10g", r.name, r.a, r.b)
		}
	}
	// δν/δκ = √Pr
	if !scalar.EqualWithinAbsOrRel(n1/k1, math.Sqrt(p1.Prandtl), 0, 1e-9) {
		t.Errorf("δν/δκ = %g, √Pr = %g", n1/k1, math.Sqrt(p1.Prandtl))
	}
	for _, f := range []float64{0, -1, math.NaN(), math.Inf(1)} {
		if _, _, err := PenetrationDepths(p1, f); err == nil {
			t.Errorf("frequency %g accepted", f)
		}
	}
}
