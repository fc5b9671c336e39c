package main

import (
	"bytes"
	"encoding/json"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// gasJSON runs twcalc gas with --json and decodes the result values.
func gasJSON(t *testing.T, args ...string) (map[string]float64, []any) {
	t.Helper()
	var o, e bytes.Buffer
	if code := run(append([]string{"gas", "--json"}, args...), &o, &e); code != exitOK {
		t.Fatalf("twcalc gas %q: exit %d: %s", args, code, e.String())
	}
	var obj struct {
		Results map[string]struct {
			Value float64 `json:"value"`
			Unit  string  `json:"unit"`
		} `json:"results"`
		Warnings []any `json:"warnings"`
	}
	if err := json.Unmarshal(o.Bytes(), &obj); err != nil {
		t.Fatal(err)
	}
	vals := map[string]float64{}
	for k, v := range obj.Results {
		vals[k] = v.Value
	}
	return vals, obj.Warnings
}

// TestGasAgreesWithLibrary: twcalc gas prints exactly what gasprops
// returns for the same state, so the terminal and the app's gas screen (the
// same library call) agree.
func TestGasAgreesWithLibrary(t *testing.T) {
	t.Parallel()
	cases := []struct {
		gas, temp, pres string
		T, p            float64 // the same state in SI, converted by hand
		nonIdeal        bool
	}{
		{"helium", "300K", "10bar", 300, 1e6, false},
		{"argon", "27degC", "1bar", 300.15, 1e5, false},
		{"helium:0.7,argon:0.3", "500 K", "30barg", 500, 30e5 + units.StandardAtmosphere, false},
		{"He", "300K", "50bar", 300, 5e6, true},
	}
	for _, c := range cases {
		args := []string{"--gas", c.gas, "--temperature", c.temp, "--pressure", c.pres}
		var opts *gasprops.Options
		if c.nonIdeal {
			args = append(args, "--non-ideal")
			opts = &gasprops.Options{NonIdeal: true}
		}
		got, _ := gasJSON(t, args...)
		m, err := gasprops.ParseMixture(c.gas)
		if err != nil {
			t.Fatal(err)
		}
		p, err := m.Properties(units.Temperature(c.T), units.Pressure(c.p), opts)
		if err != nil {
			t.Fatal(err)
		}
		want := map[string]float64{
			"molar_mass": p.MolarMass, "density": p.Density, "sound_speed": p.SoundSpeed,
			"isobaric_specific_heat": p.IsobaricSpecificHeat, "gamma": p.Gamma,
			"viscosity": p.Viscosity, "thermal_conductivity": p.ThermalConductivity,
			"thermal_diffusivity": p.ThermalDiffusivity, "kinematic_viscosity": p.KinematicViscosity,
			"prandtl": p.Prandtl,
		}
		if len(got) != len(want) {
			t.Errorf("%s: %d results, want %d: %v", c.gas, len(got), len(want), got)
		}
		for k, w := range want {
			// JSON carries the shortest round-trip text: equal to 1e-12
			// relative (the °C and barg conversions may differ in the last bit).
			if g, ok := got[k]; !ok || !scalar.EqualWithinRel(g, w, 1e-12) {
				t.Errorf("%s %s %s: %s = %v, gasprops %v", c.gas, c.temp, c.pres, k, g, w)
			}
		}
	}
}

// TestGasHeliumSoundSpeed: an outside check through the whole command
// line. Ideal monatomic gas, c = sqrt(γRT/M) with γ = 5/3, R = 8.314462618
// J/(mol·K) (CODATA 2018) and M(He) = 4.002602 g/mol (IUPAC standard atomic
// weight): 1019.3 m/s at 300 K. The tolerance 0.1 % is the bound
// for ideal sound speed.
func TestGasHeliumSoundSpeed(t *testing.T) {
	t.Parallel()
	want := math.Sqrt(5.0 / 3 * 8.314462618 * 300 / 4.002602e-3)
	got, _ := gasJSON(t, "--gas", "helium", "--temperature", "26.85 degC", "--pressure", "1 atm")
	if !scalar.EqualWithinRel(got["sound_speed"], want, 1e-3) {
		t.Errorf("sound speed %v, want %v ± 0.1 %%", got["sound_speed"], want)
	}
}

// TestGasBadInput: errors name the flag and exit 2.
func TestGasBadInput(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name string
		args []string
		want string
	}{
		{"fractions off 1", []string{"--gas", "helium:0.7,argon:0.5", "--temperature", "300K"}, `--gas "helium:0.7,argon:0.5"`},
		{"unknown gas", []string{"--gas", "unobtainium", "--temperature", "300K"}, `--gas "unobtainium"`},
		{"far below the model", []string{"--gas", "helium", "--temperature", "0.5K"}, `--temperature "0.5K"`},
		{"far above the model", []string{"--gas", "helium", "--temperature", "1e5K"}, `--temperature "1e5K"`},
		{"missing temperature", []string{"--gas", "helium"}, "--temperature is required"},
		{"missing gas", []string{"--temperature", "300K"}, "--gas is required"},
		{"pressure in a length unit", []string{"--gas", "helium", "--temperature", "300K", "--pressure", "10 mm"}, `--pressure "10 mm"`},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			var o, e bytes.Buffer
			code := run(append([]string{"gas"}, c.args...), &o, &e)
			if code != exitUsage || !strings.Contains(e.String(), c.want) || strings.Count(e.String(), "\n") != 1 {
				t.Errorf("exit %d, stderr %q; want exit 2 and one line containing %q", code, e.String(), c.want)
			}
		})
	}
}

// TestGasTable: the readable table shows each result with its SI unit.
func TestGasTable(t *testing.T) {
	t.Parallel()
	var o, e bytes.Buffer
	if code := run([]string{"gas", "--gas", "helium", "--temperature", "300K", "--pressure", "10bar"}, &o, &e); code != exitOK {
		t.Fatalf("exit %d: %s", code, e.String())
	}
	for _, w := range []string{"sound_speed", "m/s", "kg/m³", "Pa·s", "W/(m·K)", "J/(kg·K)", "g/mol", "mm²/s", "prandtl"} {
		if !strings.Contains(o.String(), w) {
			t.Errorf("table lacks %q:\n%s", w, o.String())
		}
	}
}

// FuzzRunGas feeds arbitrary temperature, pressure and gas text through
// the whole command line: it must never panic, errors must be one line on
// stderr with exit 2 (or 1), and no output may contain NaN or Inf.
func FuzzRunGas(f *testing.F) {
	for _, s := range [][3]string{
		{"300K", "10bar", "helium"}, {"27 degC", "30barg", "helium:0.7,argon:0.3"},
		{"NaN K", "1bar", "argon"}, {"-5K", "1e400 Pa", "He"}, {"", "", ""},
		{"1e-300 K", "145psi", "xenon:1"}, {"300K±5K", "0 Pa", "neon,argon"},
	} {
		f.Add(s[0], s[1], s[2])
	}
	f.Fuzz(func(t *testing.T, temp, pres, gas string) {
		for _, js := range []bool{false, true} {
			args := []string{"gas", "--gas", gas, "--temperature", temp, "--pressure", pres}
			if js {
				args = append(args, "--json")
			}
			var o, e bytes.Buffer
			code := run(args, &o, &e)
			switch code {
			case exitOK:
				if e.Len() != 0 {
					t.Fatalf("stderr on success: %q", e.String())
				}
				// Inputs are echoed as typed, so look only at the results.
				s := o.String()
				if js {
					var obj map[string]any
					if err := json.Unmarshal(o.Bytes(), &obj); err != nil {
						t.Fatalf("not JSON: %v\n%s", err, s)
					}
				} else if i := strings.Index(s, "\nresults\n"); i < 0 {
					t.Fatalf("no results in\n%s", s)
				} else if res := resultLines(s[i:]); strings.Contains(res, "NaN") || strings.Contains(res, "Inf") || strings.Contains(res, "—") {
					t.Fatalf("non-finite output for %q %q %q:\n%s", temp, pres, gas, s)
				}
			case exitUsage, exitFail:
				if o.Len() != 0 || strings.Count(e.String(), "\n") != 1 {
					t.Fatalf("exit %d: stdout %q stderr %q", code, o.String(), e.String())
				}
			default:
				t.Fatalf("exit %d", code)
			}
		}
	})
}

// resultLines cuts the table text after the results at the warnings or the
// cautions, whose prose may contain any character.
func resultLines(s string) string {
	for _, end := range []string{"\nwarnings\n", "\n!! CAUTION"} {
		if j := strings.Index(s, end); j >= 0 {
			s = s[:j]
		}
	}
	return s
}

// TestGasUncertainty: a ± on temperature and pressure reaches the results.
// Expected values by first-order propagation (GUM, JCGM 100:2008, eq. 10)
// of the ideal-gas laws: c = sqrt(γRT/M) gives u_c/c = u_T/(2T), and
// ρ = pM/(RT) gives u_ρ/ρ = sqrt((u_T/T)² + (u_p/p)²). The library's ideal
// helium follows these laws to better than the 1 % allowed here.
func TestGasUncertainty(t *testing.T) {
	t.Parallel()
	var o, e bytes.Buffer
	if code := run([]string{"gas", "--json", "--gas", "helium", "--temperature", "300K+-3K", "--pressure", "1bar+-2kPa"}, &o, &e); code != exitOK {
		t.Fatalf("exit %d: %s", code, e.String())
	}
	var obj struct {
		Results map[string]struct {
			Value       float64  `json:"value"`
			Uncertainty *float64 `json:"uncertainty"`
		} `json:"results"`
	}
	if err := json.Unmarshal(o.Bytes(), &obj); err != nil {
		t.Fatal(err)
	}
	c, rho := obj.Results["sound_speed"], obj.Results["density"]
	if c.Uncertainty == nil || rho.Uncertainty == nil {
		t.Fatalf("no uncertainty on sound speed or density: %s", o.String())
	}
	if want := c.Value * 3 / 600; !scalar.EqualWithinRel(*c.Uncertainty, want, 0.01) {
		t.Errorf("u(sound_speed) = %v, want %v", *c.Uncertainty, want)
	}
	if want := rho.Value * math.Hypot(3.0/300, 2e3/1e5); !scalar.EqualWithinRel(*rho.Uncertainty, want, 0.01) {
		t.Errorf("u(density) = %v, want %v", *rho.Uncertainty, want)
	}
	// Molar mass does not depend on the state: no uncertainty at all.
	if u := obj.Results["molar_mass"].Uncertainty; u != nil {
		t.Errorf("molar mass has uncertainty %v", *u)
	}
}
