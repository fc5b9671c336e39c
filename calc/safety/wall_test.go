package safety

import (
	"math"
	"strings"
	"testing"
)

func TestThinWallWorked(t *testing.T) {
	t.Parallel()
	// Hand calculation from the thin-wall membrane formulas (equilibrium of
	// half the shell; Roark's Formulas for Stress and Strain, 7th ed., 2002,
	// Table 13.1, table number from memory): P = 3 MPa, ri = 50 mm,
	// t = 4 mm, mean radius 52 mm:
	// σθ = 3e6 × 0.052 / 0.004 = 39.0 MPa, σz = 19.5 MPa, σr = −3 MPa.
	w, err := ThinWallStress(3e6, 0.050, 0.004, 130e6)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "hoop", w.Hoop, 39.0e6, 1e-12)
	near(t, "longitudinal", w.Longitudinal, 19.5e6, 1e-12)
	near(t, "radial", w.Radial, -3e6, 1e-12)
	near(t, "hoop ratio", w.HoopRatio, 0.3, 1e-12)
	near(t, "intensity", w.Intensity, 42e6, 1e-12)
	if len(w.Warnings) != 0 {
		t.Errorf("unexpected warnings %q", w.Warnings)
	}
	wantGeneralCaution(t, w.Cautions)
}

func TestLameWorked(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name               string
		P, ri, wall        float64
		hoop, long, intens float64
		tol                float64
	}{
		// Hand calculation of Lamé's inner-surface stresses,
		// σθ(a) = p (a² + b²)/(b² − a²) from σθ(r) = a² p/(b² − a²) +
		// a² b² p/((b² − a²) r²) ("Lame's Equations for Thick-Walled
		// Cylinder Stress Analysis", industrialmonitordirect.com):
		// ro = 56 mm, ro² − ri² = 6.36e-4 m², ro² + ri² = 5.636e-3 m²:
		// σθ = 3e6 × 5.636e-3/6.36e-4 = 26.5849 MPa,
		// σz = 3e6 × 2.5e-3/6.36e-4 = 11.7925 MPa.
		{"30 bar, 50 mm, 6 mm", 3e6, 0.050, 0.006, 26.584905660e6, 11.792452830e6, 29.584905660e6, 1e-9},
		// Classic check: ro = 2 ri gives σθ = P (4+1)/(4−1) = 5P/3 and
		// σz = P/3 (same source).
		{"ro = 2 ri", 9e6, 0.01, 0.01, 15e6, 3e6, 24e6, 1e-12},
	}
	for _, c := range cases {
		w, err := ThickWallStress(GaugePressure(c.P), c.ri, c.wall, 100e6)
		if err != nil {
			t.Fatal(err)
		}
		near(t, c.name+" hoop", w.Hoop, c.hoop, c.tol)
		near(t, c.name+" longitudinal", w.Longitudinal, c.long, c.tol)
		near(t, c.name+" radial", w.Radial, -c.P, 1e-15)
		near(t, c.name+" intensity", w.Intensity, c.intens, c.tol)
		near(t, c.name+" hoop ratio", w.HoopRatio, c.hoop/100e6, c.tol)
		wantGeneralCaution(t, w.Cautions)
	}
}

func TestThinApproachesLame(t *testing.T) {
	t.Parallel()
	// Limit: as t/r → 0 the mean-radius thin-wall hoop stress and Lamé's
	// inner-surface value agree to second order in t/r (expansion of the
	// Lamé formula; common practice, no published source).
	for _, ratio := range []float64{0.1, 0.03, 0.01, 0.001} {
		ri := 0.05
		thin, err := ThinWallStress(1e6, ri, ratio*ri, 1e8)
		if err != nil {
			t.Fatal(err)
		}
		thick, err := ThickWallStress(1e6, ri, ratio*ri, 1e8)
		if err != nil {
			t.Fatal(err)
		}
		rel := math.Abs(thin.Hoop-thick.Hoop) / thick.Hoop
		if rel > ratio*ratio {
			t.Errorf("t/r = %g: thin %g vs Lamé %g differ by %.3g, more than (t/r)²", ratio, thin.Hoop, thick.Hoop, rel)
		}
	}
}

func TestStressProportionalToPressure(t *testing.T) {
	t.Parallel()
	// Property: linear elasticity, every stress ∝ P.
	for _, f := range []func(GaugePressure, float64, float64, float64) (WallStress, error){ThinWallStress, ThickWallStress} {
		a, err := f(1e6, 0.04, 0.003, 1e8)
		if err != nil {
			t.Fatal(err)
		}
		b, err := f(7.5e6, 0.04, 0.003, 1e8)
		if err != nil {
			t.Fatal(err)
		}
		near(t, a.Method+" hoop", b.Hoop, 7.5*a.Hoop, 1e-13)
		near(t, a.Method+" longitudinal", b.Longitudinal, 7.5*a.Longitudinal, 1e-13)
		near(t, a.Method+" ratio", b.HoopRatio, 7.5*a.HoopRatio, 1e-13)
	}
}

func TestWallWarningsAndErrors(t *testing.T) {
	t.Parallel()
	// t > r/10 warns (thin-wall inaccurate).
	w, err := ThinWallStress(3e6, 0.05, 0.006, 138e6)
	if err != nil {
		t.Fatal(err)
	}
	if len(w.Warnings) == 0 || !strings.Contains(w.Warnings[0], "thin-wall formula is inaccurate") {
		t.Errorf("warnings %q, want the thin-wall accuracy warning", w.Warnings)
	}
	// Over the allowable stress warns.
	w, err = ThickWallStress(30e6, 0.05, 0.006, 138e6)
	if err != nil {
		t.Fatal(err)
	}
	if w.HoopRatio <= 1 || len(w.Warnings) == 0 {
		t.Errorf("ratio %g, warnings %q: want a warning above the allowable", w.HoopRatio, w.Warnings)
	}
	cases := []struct {
		name     string
		P        GaugePressure
		ri, t, S float64
		field    string
		thinOnly bool
	}{
		{"wall thicker than radius", 1e6, 0.01, 0.012, 1e8, "wall thickness", true},
		{"wall equal to radius", 1e6, 0.01, 0.01, 1e8, "wall thickness", true},
		{"negative pressure", -1e5, 0.05, 0.005, 1e8, "pressure (gauge)", false},
		{"NaN pressure", GaugePressure(math.NaN()), 0.05, 0.005, 1e8, "pressure (gauge)", false},
		{"zero radius", 1e6, 0, 0.005, 1e8, "inner radius", false},
		{"zero wall", 1e6, 0.05, 0, 1e8, "wall thickness", false},
		{"zero allowable", 1e6, 0.05, 0.005, 0, "allowable stress", false},
	}
	for _, c := range cases {
		_, err := ThinWallStress(c.P, c.ri, c.t, c.S)
		wantRangeError(t, err, c.field)
		_, err = ThickWallStress(c.P, c.ri, c.t, c.S)
		if c.thinOnly {
			if err != nil {
				t.Errorf("%s: Lamé should accept it, got %v", c.name, err)
			}
			continue
		}
		wantRangeError(t, err, c.field)
	}
}
