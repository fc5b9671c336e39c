package sheet

import (
	"strconv"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// poresAt returns the helium operating point of calc/pore's tests (300 K,
// 10 bar, 100 Hz: δκ = 0.2446 mm, see calc/pore/depths_test.go) with the
// geometry texts added.
func poresAt(geometry ...string) map[string]string {
	m := map[string]string{"gas": "helium", "temperature": "300 K", "pressure": "10 bar", "frequency": "100 Hz"}
	for i := 0; i+1 < len(geometry); i += 2 {
		m[geometry[i]] = geometry[i+1]
	}
	return m
}

// TestPoresSheetGeometry checks porosity and hydraulic radius for every
// way of typing each shape against the hand-computed values of
// calc/pore/geometry_test.go (Swift 2002, chs. 4 and 7, and Swift &
// Keolian 1993, formulas from memory; python3 as a calculator).
func TestPoresSheetGeometry(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name    string
		texts   map[string]string
		phi, rh float64
		tol     float64 // relative
	}{
		{"plates by gap", poresAt("shape", "plates", "gap", "0.5 mm", "plate-thickness", "0.1 mm"), 0.25 / 0.30, 0.25e-3, 1e-12},
		{"plates by half gap", poresAt("shape", "plates", "half-gap", "0.25 mm", "plate-thickness", "0.1 mm"), 0.25 / 0.30, 0.25e-3, 1e-12},
		{"round pores by diameter", poresAt("shape", "circular", "diameter", "0.6 mm"), 1, 0.15e-3, 1e-12},
		{"round pores by radius", poresAt("shape", "circular", "radius", "0.3 mm"), 1, 0.15e-3, 1e-12},
		{"rectangular, full sides", poresAt("shape", "rectangular", "width", "0.4 mm", "height", "1 mm"), 1, 0.2e-3 * 0.5e-3 / 0.7e-3, 1e-12},
		{"rectangular, half sides", poresAt("shape", "rectangular", "half-width", "0.2 mm", "half-height", "0.5 mm"), 1, 0.2e-3 * 0.5e-3 / 0.7e-3, 1e-12},
		{"pins by diameter", poresAt("shape", "pins", "pin-diameter", "0.2 mm", "pitch", "0.8 mm"), 0.9433187699, 0.8321262327e-3, 1e-9},
		{"pins by radius", poresAt("shape", "pins", "pin-radius", "0.1 mm", "pitch", "0.8 mm"), 0.9433187699, 0.8321262327e-3, 1e-9},
		{"screens per inch", poresAt("shape", "screens", "mesh-per-inch", "200", "wire-diameter", "41 um"), 0.7464462622, 30.175355545e-6, 1e-9},
		{"screens, unit typed", poresAt("shape", "screens", "mesh-per-inch", "200 /in", "wire-diameter", "41 um"), 0.7464462622, 30.175355545e-6, 1e-9},
		{"screens measured porosity", poresAt("shape", "screens", "mesh-per-inch", "200", "wire-diameter", "41 um", "porosity", "70 %"), 0.70, 23.916666667e-6, 1e-9},
		{"fibres by solid fraction", poresAt("shape", "fibres", "fibre-diameter", "25 um", "solid-fraction", "20 %"), 0.8, 25e-6, 1e-12},
		{"fibres by mass, steel", poresAt("shape", "fibres", "fibre-diameter", "25 um", "packed-mass", "30 g", "packed-volume", "50 cm3", "material", "steel"),
			1 - 0.0759493671, 0.9240506329 * 25e-6 / (4 * 0.0759493671), 1e-9},
		{"fibres by mass, density typed", poresAt("shape", "fibres", "fibre-diameter", "25 um", "packed-mass", "30 g", "packed-volume", "50 cm3",
			"material", "other", "material-density", "7900 kg/m3"), 1 - 0.0759493671, 0.9240506329 * 25e-6 / (4 * 0.0759493671), 1e-9},
		{"honeycomb", poresAt("shape", "honeycomb", "cells-per-square-inch", "400", "wall-thickness", "0.15 mm"), 0.7777295555, 0.28e-3, 1e-9},
		{"wide channel", poresAt("shape", "wide", "hydraulic-radius", "5 mm"), 1, 5e-3, 1e-12},
	}
	for _, c := range cases {
		r, err := poresSheet.Evaluate(c.texts)
		if err != nil {
			t.Errorf("%s: %v", c.name, err)
			continue
		}
		phi, _ := r.Row("porosity")
		rh, _ := r.Row("hydraulic_radius")
		if !scalar.EqualWithinRel(phi.Value, c.phi, c.tol) || !scalar.EqualWithinRel(rh.Value, c.rh, c.tol) {
			t.Errorf("%s: porosity %.10g, r_h %.10g; want %.10g, %.10g", c.name, phi.Value, rh.Value, c.phi, c.rh)
		}
	}
}

// TestPoresSheetVerdict: the verdict rows follow calc/pore's rule of thumb
// (see calc/pore/verdict_test.go: Tijani, Zeegers & de Waele, JASA 112,
// 128 (2002) for the stack band; regenerator band common practice, no
// published source), as a check row with an outcome.
func TestPoresSheetVerdict(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name    string
		texts   map[string]string
		call    string
		outcome Outcome
	}{
		// half gap 0.25 mm ≈ 1.02 δκ: inside the stack band 1–2 δκ
		{"plates 0.5 mm gap", poresAt("shape", "plates", "gap", "0.5 mm"), "about right", Pass},
		// half gap 0.1 mm ≈ 0.41 δκ
		{"plates 0.2 mm gap", poresAt("shape", "plates", "gap", "0.2 mm"), "too tight", Warn},
		// 200 mesh, 41 µm: r_h 30.2 µm ≈ 0.123 δκ, inside 0.1–0.3 δκ
		{"screens as regenerator", poresAt("shape", "screens", "mesh-per-inch", "200", "wire-diameter", "41 um", "role", "regenerator"), "about right", Pass},
		// 30 mesh, 0.25 mm: r_h 207 µm ≈ 0.85 δκ
		{"coarse screens as regenerator", poresAt("shape", "screens", "mesh-per-inch", "30", "wire-diameter", "0.25 mm", "role", "regenerator"), "too open", Warn},
	}
	for _, c := range cases {
		r, err := poresSheet.Evaluate(c.texts)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		row, _ := r.Row("verdict")
		if row.Text != c.call || row.Outcome != c.outcome {
			t.Errorf("%s: verdict %q %v, want %q %v", c.name, row.Text, row.Outcome, c.call, c.outcome)
		}
		if vs := r.Verdicts(); len(vs) != 1 || vs[0].Check != "verdict" || vs[0].Why == "" {
			t.Errorf("%s: verdicts %+v", c.name, vs)
		}
	}
}

// TestPoresSheetTargetMass: packed by mass, the target mass reproduces the
// aimed-for hydraulic radius when fed back (forward then inverse).
func TestPoresSheetTargetMass(t *testing.T) {
	t.Parallel()
	texts := poresAt("shape", "fibres", "fibre-diameter", "25 um", "packed-mass", "30 g", "packed-volume", "50 cm3", "role", "regenerator")
	r, err := poresSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	m, _ := r.Row("target_packed_mass")
	aim, _ := r.Row("target_hydraulic_radius")
	texts["packed-mass"] = strconv.FormatFloat(m.Value, 'g', -1, 64) + " kg"
	back, err := poresSheet.Evaluate(texts)
	if err != nil {
		t.Fatal(err)
	}
	rh, _ := back.Row("hydraulic_radius")
	if !scalar.EqualWithinRel(rh.Value, aim.Value, 1e-9) {
		t.Errorf("target mass %g kg gives r_h %g, aim %g", m.Value, rh.Value, aim.Value)
	}
}

// TestPoresSheetSpread: a ± on the frequency reaches δκ (∝ f^-½, so
// σ/δκ = σf/(2f), GUM eq. 10) and r_h/δκ (∝ f^½, the same relative ±),
// and leaves the geometry alone; twice the ± gives twice the spread.
func TestPoresSheetSpread(t *testing.T) {
	t.Parallel()
	one, err := poresSheet.Evaluate(poresAt("shape", "plates", "gap", "0.5 mm", "frequency", "100 Hz ± 2 Hz"))
	if err != nil {
		t.Fatal(err)
	}
	two, err := poresSheet.Evaluate(poresAt("shape", "plates", "gap", "0.5 mm", "frequency", "100 Hz +- 4 Hz"))
	if err != nil {
		t.Fatal(err)
	}
	for _, key := range []string{"thermal_penetration_depth", "hydraulic_radius_over_thermal_depth", "target_hydraulic_radius"} {
		a, _ := one.Row(key)
		b, _ := two.Row(key)
		if !scalar.EqualWithinRel(a.PM/a.Value, 0.01, 1e-3) {
			t.Errorf("%s: relative ± %v, want 0.01", key, a.PM/a.Value)
		}
		if !scalar.EqualWithinRel(b.PM, 2*a.PM, 1e-3) {
			t.Errorf("%s: ± %v with twice the typed ±, want %v", key, b.PM, 2*a.PM)
		}
	}
	if rh, _ := one.Row("hydraulic_radius"); rh.PM != 0 {
		t.Errorf("the hydraulic radius does not depend on the frequency, yet ± %v", rh.PM)
	}
}

// TestPoresSheetErrors: a missing, doubled, stray or impossible input is
// blamed on one key.
func TestPoresSheetErrors(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name  string
		texts map[string]string
		key   string
	}{
		{"no shape", poresAt("gap", "0.5 mm"), "shape"},
		{"no gap", poresAt("shape", "plates"), "gap"},
		{"gap twice", poresAt("shape", "plates", "gap", "0.5 mm", "half-gap", "0.25 mm"), "half-gap"},
		{"zero gap", poresAt("shape", "plates", "gap", "0 mm"), "gap"},
		{"stray half gap", poresAt("shape", "circular", "radius", "0.3 mm", "half-gap", "1 mm"), "half-gap"},
		{"stray material", poresAt("shape", "circular", "radius", "0.3 mm", "material", "copper"), "material"},
		{"overlapping wires", poresAt("shape", "screens", "mesh-per-inch", "200", "wire-diameter", "0.2 mm"), "wire-diameter"},
		{"mesh twice", poresAt("shape", "screens", "mesh-per-inch", "200", "mesh-per-mm", "8", "wire-diameter", "41 um"), "mesh-per-mm"},
		{"touching pins", poresAt("shape", "pins", "pin-radius", "0.5 mm", "pitch", "0.8 mm"), "pitch"},
		{"too heavy", poresAt("shape", "fibres", "fibre-diameter", "25 um", "packed-mass", "1 kg", "packed-volume", "50 cm3", "material", "copper"), "packed-mass"},
		{"material and density", poresAt("shape", "fibres", "fibre-diameter", "25 um", "packed-mass", "30 g", "packed-volume", "50 cm3",
			"material", "copper", "material-density", "8000 kg/m3"), "material-density"},
		{"other without density", poresAt("shape", "fibres", "fibre-diameter", "25 um", "packed-mass", "30 g", "packed-volume", "50 cm3",
			"material", "other"), "material-density"},
		{"fibres without packing", poresAt("shape", "fibres", "fibre-diameter", "25 um"), "solid-fraction"},
		{"thick walls", poresAt("shape", "honeycomb", "cells-per-square-inch", "400", "wall-thickness", "2 mm"), "wall-thickness"},
		{"bad frequency", poresAt("shape", "plates", "gap", "0.5 mm", "frequency", "0 Hz"), "frequency"},
	}
	for _, c := range cases {
		_, err := poresSheet.Evaluate(c.texts)
		fes := FieldErrors(err)
		if len(fes) == 0 || fes[0].Key != c.key {
			t.Errorf("%s: error %v names %v, want %s", c.name, err, fes, c.key)
		}
	}
}
