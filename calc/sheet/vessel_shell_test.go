package sheet

import (
	"math"
	"testing"
)

// shellBase is the issue vessel without its shell sizes.
func shellBase(kv ...string) map[string]string {
	m := plus(issueVessel, kv...)
	delete(m, "inner-radius")
	delete(m, "wall-thickness")
	for i := 0; i+1 < len(kv); i += 2 {
		m[kv[i]] = kv[i+1]
	}
	return m
}

// TestVesselShellAnyTwo: the shell given by any two of inside size
// (diameter or radius), outside diameter and wall gives the same rows as
// the inner radius and wall (1e-12 relative: ID = 2 ri and OD = ID + 2 t
// are definitions), and the three sizes are shown whichever two were
// typed.
func TestVesselShellAnyTwo(t *testing.T) {
	t.Parallel()
	ref := evalOK(t, vesselSheet, issueVessel) // 50 mm radius, 3 mm wall
	for _, c := range []struct {
		name  string
		texts map[string]string
	}{
		{"inside diameter and wall", shellBase("inside-diameter", "100 mm", "wall-thickness", "3 mm")},
		{"inside and outside diameter", shellBase("inside-diameter", "100 mm", "outside-diameter", "106 mm")},
		{"inner radius and outside diameter", shellBase("inner-radius", "50 mm", "outside-diameter", "106 mm")},
		{"outside diameter and wall", shellBase("outside-diameter", "106 mm", "wall-thickness", "3 mm")},
		{"all three, agreeing", shellBase("inside-diameter", "100 mm", "outside-diameter", "106 mm", "wall-thickness", "3 mm")},
	} {
		r := evalOK(t, vesselSheet, c.texts)
		for _, key := range []string{"hoop_stress", "longitudinal_stress", "radial_stress", "thin_wall_hoop_stress",
			"minimum_wall_thickness", "max_allowable_pressure", "mawp_used", "hydrostatic_test_pressure"} {
			if a, b := rowOf(t, r, key).Value, rowOf(t, ref, key).Value; !near(a, b, 1e-12) {
				t.Errorf("%s: %s = %.15g, by inner radius and wall %.15g", c.name, key, a, b)
			}
		}
		for key, want := range map[string]float64{"inside_diameter": 0.1, "outside_diameter": 0.106, "wall_thickness": 0.003} {
			if got := rowOf(t, r, key).Value; !near(got, want, 1e-12) {
				t.Errorf("%s: %s = %g m, want %g m", c.name, key, got, want)
			}
		}
		for _, key := range []string{"stress_check", "wall_adequate", "relief_check", "mawp_check"} {
			if a, b := rowOf(t, r, key).Outcome, rowOf(t, ref, key).Outcome; a != b {
				t.Errorf("%s: %s %v, by inner radius and wall %v", c.name, key, a, b)
			}
		}
	}
}

// TestVesselShellSpread: the ± of a wall worked out from the inside and
// outside diameters is first-order propagation of t = (OD − ID)/2:
// u_t = √(u_OD² + u_ID²)/2 (JCGM 100:2008, eq. 10).
func TestVesselShellSpread(t *testing.T) {
	t.Parallel()
	r := evalOK(t, vesselSheet, shellBase("inside-diameter", "100 mm ± 0.2 mm", "outside-diameter", "106 mm ± 0.4 mm"))
	want := math.Hypot(0.2e-3, 0.4e-3) / 2
	if got := rowOf(t, r, "wall_thickness").PM; !near(got, want, 1e-6) {
		t.Errorf("wall ± %g m, want %g m", got, want)
	}
	if got := rowOf(t, r, "inside_diameter").PM; !near(got, 0.2e-3, 1e-6) {
		t.Errorf("inside diameter ± %g m, want 0.2 mm", got)
	}
}

// TestVesselShellErrors: each impossible or incomplete shell names one
// input.
func TestVesselShellErrors(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name  string
		texts map[string]string
		key   string
	}{
		{"diameter and radius", shellBase("inside-diameter", "100 mm", "inner-radius", "50 mm", "wall-thickness", "3 mm"), "inner-radius"},
		{"outside not larger", shellBase("inside-diameter", "100 mm", "outside-diameter", "100 mm"), "outside-diameter"},
		{"three disagreeing", shellBase("inside-diameter", "100 mm", "outside-diameter", "110 mm", "wall-thickness", "3 mm"), "outside-diameter"},
		{"wall too thick for the outside", shellBase("outside-diameter", "10 mm", "wall-thickness", "5 mm"), "wall-thickness"},
		{"only the wall", shellBase("wall-thickness", "3 mm"), "inside-diameter"},
		{"only the inside", shellBase("inside-diameter", "100 mm"), "wall-thickness"},
		{"zero radius", plus(issueVessel, "inner-radius", "0 mm"), "inner-radius"},
	} {
		wantFieldError(t, vesselSheet, c.texts, c.key)
	}
}
