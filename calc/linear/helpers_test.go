package linear

import (
	"encoding/json"
	"strings"
	"testing"
)

// testHelium is the power-law helium shared with testdata/gen_onset.py.
// Reference values at 300 K from memory (μ ≈ 19.9 µPa·s, k ≈ 0.155 W/(m·K),
// close to handbook values); exponent 0.68 a rough fit, from memory. These
// are inputs, not expected values: the same numbers feed the Go solver and
// the independent script, so their accuracy does not affect what the
// comparison checks.
var testHelium = PowerLawGas{Label: "helium (power law)", MolarMass: 4.002602e-3, Gamma: 5.0 / 3, T0: 300, Mu0: 19.9e-6, K0: 0.155, Exponent: 0.68}

// testAir is a power-law stand-in for air (γ = 1.4, μ ≈ 18.5 µPa·s and
// k ≈ 0.0263 W/(m·K) at 300 K, from memory; exponent 0.75 a rough fit).
var testAir = PowerLawGas{Label: "air (power law)", MolarMass: 28.9586e-3, Gamma: 1.4, T0: 300, Mu0: 18.5e-6, K0: 0.0263, Exponent: 0.75}

// mustDevice parses a device file given as text.
func mustDevice(t testing.TB, text string) *Device {
	t.Helper()
	d, err := ParseDevice(strings.NewReader(text))
	if err != nil {
		t.Fatalf("ParseDevice: %v\n%s", err, text)
	}
	return d
}

func jsonUnmarshal(b []byte, v any) error { return json.Unmarshal(b, v) }
