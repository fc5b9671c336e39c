package main

import (
	"bytes"
	"encoding/json"
	"math/cmplx"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/pore"
	"tubewright/gasprops"
)

// poreOut is the decoded --json output of depths, pores and placement.
type poreOut struct {
	Results map[string]struct {
		Value json.RawMessage `json:"value"`
		Unit  string          `json:"unit"`
	} `json:"results"`
	Warnings []string `json:"warnings"`
	Cautions []string `json:"cautions"`
}

func runPoreJSON(t *testing.T, args ...string) poreOut {
	t.Helper()
	return decodeRun[poreOut](t, args...)
}

func (o poreOut) num(t *testing.T, name, unit string) float64 {
	t.Helper()
	r, ok := o.Results[name]
	if !ok {
		t.Fatalf("result %q missing; have %v", name, keys(o.Results))
	}
	if r.Unit != unit {
		t.Errorf("result %q: unit %q, want %q", name, r.Unit, unit)
	}
	var v float64
	if err := json.Unmarshal(r.Value, &v); err != nil {
		t.Fatalf("result %q: %v", name, err)
	}
	return v
}

func (o poreOut) complex(t *testing.T, name string) complex128 {
	t.Helper()
	var v struct{ Re, Im float64 }
	if err := json.Unmarshal(o.Results[name].Value, &v); err != nil {
		t.Fatalf("result %q: %v", name, err)
	}
	return complex(v.Re, v.Im)
}

func (o poreOut) text(t *testing.T, name string) string {
	t.Helper()
	var v string
	if err := json.Unmarshal(o.Results[name].Value, &v); err != nil {
		t.Fatalf("result %q: %v", name, err)
	}
	return v
}

func heliumProps(t *testing.T) gasprops.Properties {
	t.Helper()
	m, err := gasprops.ParseMixture("helium")
	if err != nil {
		t.Fatal(err)
	}
	p, err := m.Properties(300, 1e6, nil)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// TestDepthsCommand: the JSON keys the issue names, equal to the library,
// and near the hand-computed NIST-based helium value of calc/pore's tests
// (δκ = 0.2446 mm at 300 K, 10 bar, 100 Hz; within 1 %).
func TestDepthsCommand(t *testing.T) {
	t.Parallel()
	out := runPoreJSON(t, "depths", "--gas", "helium", "--temperature", "300K", "--pressure", "10bar", "--frequency", "100Hz")
	dk := out.num(t, "thermal_penetration_depth", "m")
	dn := out.num(t, "viscous_penetration_depth", "m")
	wk, wn := pore.Depths(heliumProps(t), 100)
	if dk != wk || dn != wn {
		t.Errorf("depths %g %g, library %g %g", dk, dn, wk, wn)
	}
	if !scalar.EqualWithinAbsOrRel(dk, 0.2446e-3, 0, 0.01) {
		t.Errorf("δκ = %g", dk)
	}
	// a ± on the frequency gives an uncertainty: δ ∝ f^-½, so u(δ)/δ = ½ u(f)/f
	var o, e bytes.Buffer
	if code := run([]string{"depths", "--gas", "helium", "--temperature", "300K", "--pressure", "10bar", "--frequency", "100Hz+-4Hz", "--json"}, &o, &e); code != exitOK {
		t.Fatal(e.String())
	}
	var pm struct {
		Results map[string]struct{ Value, Uncertainty float64 } `json:"results"`
	}
	if err := json.Unmarshal(o.Bytes(), &pm); err != nil {
		t.Fatal(err)
	}
	r := pm.Results["thermal_penetration_depth"]
	if !scalar.EqualWithinAbsOrRel(r.Uncertainty/r.Value, 0.02, 0, 1e-3) {
		t.Errorf("relative uncertainty %g, want 0.02", r.Uncertainty/r.Value)
	}
}

// TestPoresCommand runs every shape and checks the keys the issue names and
// that porosity, r_h and fκ equal the library's for the same geometry.
func TestPoresCommand(t *testing.T) {
	t.Parallel()
	op := []string{"pores", "--gas", "helium", "--temperature", "300K", "--pressure", "10bar", "--frequency", "100Hz"}
	inch := 0.0254
	cases := []struct {
		args  []string
		shape pore.Shape
	}{
		{[]string{"--shape", "plates", "--half-gap", "0.25mm", "--plate-thickness", "0.1mm"}, mustPore(pore.Plates(0.25e-3, 0.1e-3))},
		{[]string{"--shape", "circular", "--radius", "0.3mm"}, mustPore(pore.Circular(0.3e-3))},
		{[]string{"--shape", "rectangular", "--half-width", "0.2mm", "--half-height", "0.5mm"}, mustPore(pore.Rectangular(0.2e-3, 0.5e-3))},
		{[]string{"--shape", "pins", "--pin-radius", "0.1mm", "--pitch", "0.8mm"}, mustPore(pore.Pins(0.1e-3, 0.8e-3))},
		{[]string{"--shape", "screens", "--mesh-per-inch", "200", "--wire-diameter", "41um", "--role", "regenerator"}, mustPore(pore.Screens(200/inch, 41e-6, 0))},
		{[]string{"--shape", "screens", "--mesh-per-mm", "8", "--wire-diameter", "41um"}, mustPore(pore.Screens(8000, 41e-6, 0))},
		{[]string{"--shape", "fibres", "--fibre-diameter", "25um", "--solid-fraction", "0.2"}, mustPore(pore.Fibres(25e-6, 0.2))},
		{[]string{"--shape", "screens", "--mesh-per-inch", "200", "--wire-radius", "20.5um"}, mustPore(pore.Screens(200/inch, 41e-6, 0))},
		{[]string{"--shape", "fibres", "--fibre-radius", "12.5um", "--solid-fraction", "0.2"}, mustPore(pore.Fibres(25e-6, 0.2))},
		{[]string{"--shape", "fibres", "--fibre-radius", "12.5um", "--packed-mass", "30g", "--material", "steel", "--packed-volume", "50cm3"}, mustPore(pore.FibresFromMass(25e-6, 0.03, 7900, 50e-6))},
		{[]string{"--shape", "fibres", "--fibre-diameter", "25um", "--packed-mass", "30g", "--material", "steel", "--packed-volume", "50cm3"}, mustPore(pore.FibresFromMass(25e-6, 0.03, 7900, 50e-6))},
		{[]string{"--shape", "honeycomb", "--cells-per-square-inch", "400", "--wall-thickness", "0.15mm"}, mustPore(pore.Honeycomb(400/(inch*inch), 0.15e-3))},
		{[]string{"--shape", "wide", "--hydraulic-radius", "5mm"}, mustPore(pore.BoundaryLayer(5e-3))},
	}
	dk, _ := pore.Depths(heliumProps(t), 100)
	for _, c := range cases {
		out := runPoreJSON(t, append(append([]string{}, op...), c.args...)...)
		if v := out.num(t, "porosity", ""); !scalar.EqualWithinAbsOrRel(v, c.shape.Porosity(), 0, 1e-12) {
			t.Errorf("%v: porosity %g, want %g", c.args, v, c.shape.Porosity())
		}
		if v := out.num(t, "hydraulic_radius", "m"); !scalar.EqualWithinAbsOrRel(v, c.shape.HydraulicRadius(), 0, 1e-12) {
			t.Errorf("%v: r_h %g, want %g", c.args, v, c.shape.HydraulicRadius())
		}
		if f := out.complex(t, "f_kappa"); cmplx.Abs(f-c.shape.F(dk)) > 1e-12 {
			t.Errorf("%v: f_kappa %v, want %v", c.args, f, c.shape.F(dk))
		}
		if f := out.complex(t, "f_nu"); !(imag(f) < 0) {
			t.Errorf("%v: f_nu %v", c.args, f)
		}
		if v := out.text(t, "verdict"); v != "too tight" && v != "about right" && v != "too open" {
			t.Errorf("%v: verdict %q", c.args, v)
		}
		if out.text(t, "suggestion") == "" || out.text(t, "explanation") == "" {
			t.Errorf("%v: no suggestion or explanation", c.args)
		}
	}
}

func mustPore(s pore.Shape, err error) pore.Shape {
	if err != nil {
		panic(err)
	}
	return s
}

// TestPoresTargetMass: packed by mass, the target mass reproduces the
// aimed-for hydraulic radius when fed back (forward then inverse).
func TestPoresTargetMass(t *testing.T) {
	t.Parallel()
	args := []string{"pores", "--gas", "helium", "--temperature", "300K", "--pressure", "10bar", "--frequency", "100Hz",
		"--shape", "fibres", "--fibre-diameter", "25um", "--packed-mass", "30g", "--material", "steel", "--packed-volume", "50cm3", "--role", "regenerator"}
	out := runPoreJSON(t, args...)
	m := out.num(t, "target_packed_mass", "kg")
	aim := out.num(t, "target_hydraulic_radius", "m")
	s, err := pore.FibresFromMass(25e-6, m, 7900, 50e-6)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinAbsOrRel(s.HydraulicRadius(), aim, 0, 1e-9) {
		t.Errorf("mass %g kg gives r_h %g, aim %g", m, s.HydraulicRadius(), aim)
	}
}

// TestPoresErrors: impossible or missing geometry is a usage error (exit 2)
// whose one line names the flags.
func TestPoresErrors(t *testing.T) {
	t.Parallel()
	op := []string{"pores", "--gas", "helium", "--temperature", "300K", "--frequency", "100Hz"}
	cases := []struct {
		args  []string
		words []string
	}{
		{[]string{"--shape", "screens", "--mesh-per-inch", "200", "--wire-diameter", "0.2mm"}, []string{`--wire-diameter "0.2mm"`, "mesh count 200", "overlap"}},
		{[]string{"--shape", "plates"}, []string{"--gap is required", "half-gap"}},
		{[]string{"--shape", "pins", "--pin-radius", "0.5mm", "--pitch", "0.8mm"}, []string{`--pitch "0.8mm"`, "pin radius 0.5mm", "touch"}},
		{[]string{"--shape", "fibres", "--fibre-diameter", "25um", "--packed-mass", "1kg", "--material", "copper", "--packed-volume", "50cm3"}, []string{`--packed-mass "1kg"`, "solid material"}},
		{[]string{"--shape", "fibres", "--fibre-diameter", "25um", "--packed-mass", "10g", "--material", "gold", "--packed-volume", "50cm3"}, []string{"--material", "gold", "steel"}},
		{[]string{"--shape", "screens", "--mesh-per-inch", "200", "--mesh-per-mm", "8", "--wire-diameter", "41um"}, []string{"--mesh-per-mm", "mesh-per-inch"}},
		{[]string{"--shape", "honeycomb", "--cells-per-square-inch", "400", "--wall-thickness", "2mm"}, []string{`--wall-thickness "2mm"`, "pitch"}},
		{[]string{"--shape", "plates", "--half-gap", "0mm"}, []string{"--half-gap", "half", "greater than 0"}},
		// a flag of another shape is refused, not silently ignored
		{[]string{"--shape", "circular", "--radius", "0.3mm", "--half-gap", "1mm"}, []string{`--half-gap "1mm": is for the plates shape`, "radius"}},
		{[]string{"--shape", "fibres", "--fibre-diameter", "25um", "--solid-fraction", "0.2", "--wire-diameter", "30um"}, []string{"--wire-diameter", "screens"}},
		// a size given twice, in full and as its half
		{[]string{"--shape", "plates", "--gap", "0.5mm", "--half-gap", "0.25mm"}, []string{"--half-gap", "not both"}},
		{[]string{"--shape", "screens", "--mesh-per-inch", "200", "--wire-diameter", "41um", "--wire-radius", "20.5um"}, []string{"--wire-radius", "not both"}},
		{[]string{"--shape", "fibres", "--fibre-diameter", "25um", "--fibre-radius", "12.5um", "--solid-fraction", "0.2"}, []string{"--fibre-radius", "not both"}},
		{[]string{"--shape", "screens", "--mesh-per-inch", "200", "--wire-radius", "0.1mm"}, []string{`--wire-radius "0.1mm"`, "mesh count 200", "overlap"}},
	}
	for _, c := range cases {
		var o, e bytes.Buffer
		code := run(append(append([]string{}, op...), c.args...), &o, &e)
		if code != exitUsage {
			t.Errorf("%v: exit %d, want %d (%s)", c.args, code, exitUsage, e.String())
		}
		msg := e.String()
		if strings.Count(strings.TrimSpace(msg), "\n") != 0 {
			t.Errorf("%v: message not one line: %q", c.args, msg)
		}
		for _, w := range c.words {
			if !strings.Contains(msg, w) {
				t.Errorf("%v: message %q does not contain %q", c.args, msg, w)
			}
		}
	}
}

// TestPlacementCommand: keys and values against calc/pore, caution present.
func TestPlacementCommand(t *testing.T) {
	t.Parallel()
	out := runPoreJSON(t, "placement", "--gas", "air", "--temperature", "300K", "--frequency", "500Hz",
		"--centre", "20mm", "--stack-length", "20mm", "--drive-ratio", "2%")
	m, _ := gasprops.ParseMixture("air")
	p, err := m.Properties(300, 101325, nil)
	if err != nil {
		t.Fatal(err)
	}
	want, err := pore.PlaceStack(pore.PlacementInput{SoundSpeed: p.SoundSpeed, Density: p.Density, Gamma: p.Gamma,
		MeanTemperature: 300, MeanPressure: 101325, Frequency: 500, Centre: 0.02, Length: 0.02, DriveRatio: 0.02})
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name, unit string
		want       float64
	}{
		{"kx", "", want.KX},
		{"critical_gradient", "K/m", want.CriticalGradient},
		{"critical_temperature_difference", "K", want.CriticalDifference},
		{"displacement_amplitude", "m", want.Displacement},
		{"exchanger_length", "m", want.ExchangerLength},
		{"lambda_eighth", "m", want.LambdaEighth},
	} {
		if v := out.num(t, c.name, c.unit); !scalar.EqualWithinAbsOrRel(v, c.want, 0, 1e-12) {
			t.Errorf("%s = %g, want %g", c.name, v, c.want)
		}
	}
	if len(out.Cautions) == 0 {
		t.Error("no caution with the critical temperature difference")
	}
	if a := out.text(t, "position_advice"); a != pore.PositionAdvice(pore.Engine, want) {
		t.Errorf("position advice %q", a)
	}
	var o, e bytes.Buffer
	if code := run([]string{"placement", "--gas", "air", "--temperature", "300K", "--frequency", "500Hz", "--centre", "20mm", "--drive-ratio", "150%"}, &o, &e); code != exitUsage || !strings.Contains(e.String(), "--drive-ratio") {
		t.Errorf("drive ratio 150%%: exit %d, %q", code, e.String())
	}
}
