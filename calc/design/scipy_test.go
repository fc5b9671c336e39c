package design

import (
	"bytes"
	"encoding/json"
	"flag"
	"math"
	"os"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/linear"
)

// The designs checked against an independent solver. Each is designed
// with a power-law gas (linear.PowerLawGas, the law of
// testdata/gen_onset.py; its values are shared inputs, from memory as
// noted there, not reference values), written to
// testdata/design_devices.json by this package with -update-design-devices,
// and solved by testdata/design_onset.py with scipy (solve_ivp DOP853,
// fsolve), which writes testdata/design_onset_ref.json.
var updateDesignDevices = flag.Bool("update-design-devices", false, "design the reference devices again and write testdata/design_devices.json (then run /usr/bin/python3 testdata/design_onset.py)")

var (
	powerHelium = linear.PowerLawGas{Label: "helium (power law)", MolarMass: 4.002602e-3, Gamma: 5.0 / 3, T0: 300, Mu0: 19.9e-6, K0: 0.155, Exponent: 0.68}
	powerArgon  = linear.PowerLawGas{Label: "argon (power law)", MolarMass: 39.948e-3, Gamma: 5.0 / 3, T0: 300, Mu0: 22.7e-6, K0: 0.0177, Exponent: 0.8}
)

type scipyGas struct {
	Label     string  `json:"label"`
	MolarMass float64 `json:"molar_mass"`
	Gamma     float64 `json:"gamma"`
	T0        float64 `json:"t0"`
	Mu0       float64 `json:"mu0"`
	K0        float64 `json:"k0"`
	Exponent  float64 `json:"exponent"`
}

func (g scipyGas) law() linear.PowerLawGas {
	return linear.PowerLawGas{Label: g.Label, MolarMass: g.MolarMass, Gamma: g.Gamma, T0: g.T0, Mu0: g.Mu0, K0: g.K0, Exponent: g.Exponent}
}

// designEntry is one designed device of testdata/design_devices.json.
type designEntry struct {
	Name            string            `json:"name"`
	TargetFrequency float64           `json:"target_frequency"`
	HotTemperature  float64           `json:"available_hot_temperature"`
	Gas             scipyGas          `json:"gas"`
	Device          linear.DeviceFile `json:"device"`
	DesignOnset     float64           `json:"design_onset"`
	DesignFrequency float64           `json:"design_frequency"`
}

type designDevices struct {
	Generator string        `json:"generator"`
	Designs   []designEntry `json:"designs"`
}

type designRef struct {
	Generator string `json:"generator"`
	Scipy     string `json:"scipy"`
	Designs   []struct {
		Name           string  `json:"name"`
		HotTemperature float64 `json:"hot_temperature"`
		Frequency      float64 `json:"frequency"`
	} `json:"designs"`
}

// TestWriteDesignDevices designs the reference devices (only with
// -update-design-devices).
func TestWriteDesignDevices(t *testing.T) {
	if !*updateDesignDevices {
		t.Skip("run with -update-design-devices to design the reference devices again")
	}
	cases := []struct {
		name string
		gas  linear.PowerLawGas
		t    Target
	}{
		{"helium half-wave plates", powerHelium, Target{Frequency: 300, Gas: "helium", MeanPressure: 10e5, HotTemperature: 650, Ambient: 295, Diameter: 0.05}},
		{"argon quarter-wave round pores", powerArgon, Target{Frequency: 120, Gas: "argon", MeanPressure: 3e5, HotTemperature: 800, Ambient: 295, Diameter: 0.04, Ends: QuarterWave, Stack: RoundPores}},
	}
	out := designDevices{Generator: "calc/design TestWriteDesignDevices -update-design-devices"}
	for _, c := range cases {
		r, err := Design(c.t, &Settings{Gas: c.gas, NoSensitivity: true})
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		g := c.gas
		out.Designs = append(out.Designs, designEntry{c.name, c.t.Frequency, c.t.HotTemperature, scipyGas{g.Label, g.MolarMass, g.Gamma, g.T0, g.Mu0, g.K0, g.Exponent}, r.File, r.Onset.HotTemperature, r.Onset.Frequency})
	}
	b, err := json.MarshalIndent(out, "", " ")
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile("../../testdata/design_devices.json", append(b, '\n'), 0o644); err != nil {
		t.Fatal(err)
	}
}

// TestDesignAgainstScipy: designed devices, solved by an independent
// implementation of Rott's equations (scipy 1.10.1 via
// testdata/design_onset.py, testdata/design_onset_ref.json), start where
// the design says: onset temperature and frequency within 1e-5 (the two
// solvers agree far better than the 1 % the issue asks of the frequency),
// the frequency within 1 % of the target and the onset below the heater.
func TestDesignAgainstScipy(t *testing.T) {
	t.Parallel()
	var dev designDevices
	var ref designRef
	for path, v := range map[string]any{"../../testdata/design_devices.json": &dev, "../../testdata/design_onset_ref.json": &ref} {
		b, err := os.ReadFile(path)
		if err != nil {
			t.Fatal(err)
		}
		if err := json.Unmarshal(b, v); err != nil {
			t.Fatalf("%s: %v", path, err)
		}
	}
	if len(dev.Designs) != 2 || len(ref.Designs) != len(dev.Designs) {
		t.Fatalf("%d designs, %d reference answers; want 2 each", len(dev.Designs), len(ref.Designs))
	}
	for i, c := range dev.Designs {
		want := ref.Designs[i]
		if want.Name != c.Name {
			t.Fatalf("reference %d is %q, design %q: regenerate with testdata/design_onset.py", i, want.Name, c.Name)
		}
		b, _ := json.Marshal(c.Device)
		d, err := linear.ParseDevice(bytes.NewReader(b))
		if err != nil {
			t.Fatalf("%s: %v", c.Name, err)
		}
		on, err := linear.Onset(d, &linear.Settings{Gas: c.Gas.law()})
		if err != nil {
			t.Fatalf("%s: %v", c.Name, err)
		}
		if !scalar.EqualWithinRel(on.HotTemperature, want.HotTemperature, 1e-5) || !scalar.EqualWithinRel(on.Frequency, want.Frequency, 1e-5) {
			t.Errorf("%s: Go %.6f K %.6f Hz, scipy %.6f K %.6f Hz", c.Name, on.HotTemperature, on.Frequency, want.HotTemperature, want.Frequency)
		}
		if !scalar.EqualWithinRel(on.HotTemperature, c.DesignOnset, 1e-8) {
			t.Errorf("%s: onset %.6f K, the design recorded %.6f K", c.Name, on.HotTemperature, c.DesignOnset)
		}
		if math.Abs(want.Frequency-c.TargetFrequency) > 0.01*c.TargetFrequency || want.HotTemperature >= c.HotTemperature {
			t.Errorf("%s: scipy finds onset at %.2f K and %.3f Hz: the design misses %g Hz below %g K", c.Name, want.HotTemperature, want.Frequency, c.TargetFrequency, c.HotTemperature)
		}
	}
}
