package units

import (
	"encoding/json"
	"os"
	"path/filepath"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// referenceFactors is testdata/units_factors.json, written by
// testdata/gen_units_factors.py from scipy.constants (Debian python3-scipy 1.10.1).
type referenceFactors struct {
	ScipyVersion string             `json:"scipy_version"`
	Factors      map[string]float64 `json:"factors"`
	Temperatures []struct {
		Value  float64 `json:"value"`
		Unit   string  `json:"unit"`
		Kelvin float64 `json:"kelvin"`
	} `json:"temperatures"`
}

func loadFactors(t *testing.T) referenceFactors {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("..", "..", "testdata", "units_factors.json"))
	if err != nil {
		t.Fatalf("reading reference factors: %v", err)
	}
	var r referenceFactors
	if err := json.Unmarshal(b, &r); err != nil {
		t.Fatalf("testdata/units_factors.json is damaged: %v", err)
	}
	if len(r.Factors) < 20 || len(r.Temperatures) < 10 {
		t.Fatalf("testdata/units_factors.json holds too little: %d factors, %d temperatures", len(r.Factors), len(r.Temperatures))
	}
	return r
}

// TestFactorsAgainstScipy compares every conversion factor with
// scipy.constants 1.10.1 via testdata/gen_units_factors.py.
func TestFactorsAgainstScipy(t *testing.T) {
	t.Parallel()
	ref := loadFactors(t)
	for unit, want := range ref.Factors {
		got, err := FromUnit(1, unit)
		if err != nil {
			t.Errorf("FromUnit(1, %q): %v", unit, err)
			continue
		}
		if !scalar.EqualWithinRel(got, want, 1e-12) {
			t.Errorf("1 %s = %.15g SI, scipy.constants %s gives %.15g", unit, got, ref.ScipyVersion, want)
		}
		back, err := ToUnit(want, unit)
		if err != nil || !scalar.EqualWithinRel(back, 1, 1e-12) {
			t.Errorf("ToUnit(%g, %q) = %g, %v; want 1", want, unit, back, err)
		}
	}
	for _, c := range ref.Temperatures {
		q, err := Parse(formatNumber(c.Value, 17)+" "+c.Unit, DimTemperature)
		if err != nil {
			t.Errorf("Parse(%g %s): %v", c.Value, c.Unit, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(q.Value, c.Kelvin, 1e-9, 1e-12) {
			t.Errorf("%g %s = %.12g K, scipy convert_temperature gives %.12g K", c.Value, c.Unit, q.Value, c.Kelvin)
		}
	}
}

// TestFactorsAgainstNIST compares factors with NIST SP 811 (2008 edition),
// Appendix B.8, "Factors for units listed alphabetically", which prints
// seven significant digits (bold where exact). The printed values are
// quoted from memory of that table; tolerance 5e-7 relative covers its
// rounding.
func TestFactorsAgainstNIST(t *testing.T) {
	t.Parallel()
	cases := []struct {
		unit string
		dim  Dimension
		want float64 // SI value of 1 unit, as printed in SP 811 B.8
	}{
		{"in", DimLength, 2.54e-2},                      // exact
		{"ft", DimLength, 3.048e-1},                     // exact
		{"mil", DimLength, 2.54e-5},                     // exact
		{"psi", DimPressure, 6.894757e3},                // pound-force per square inch
		{"ksi", DimStress, 6.894757e6},                  // kip per square inch
		{"atm", DimPressure, 1.01325e5},                 // exact
		{"torr", DimPressure, 1.333224e2},               // torr
		{"mmHg", DimPressure, 1.333224e2},               // millimeter of mercury, conventional
		{"bar", DimPressure, 1e5},                       // exact
		{"lb", DimMass, 4.535924e-1},                    // pound (avoirdupois)
		{"oz", DimMass, 2.834952e-2},                    // ounce (avoirdupois)
		{"lb/ft3", DimDensity, 1.601846e1},              // pound per cubic foot
		{"ft3", DimVolume, 2.831685e-2},                 // cubic foot
		{"in3", DimVolume, 1.638706e-5},                 // cubic inch
		{"in2", DimArea, 6.4516e-4},                     // exact
		{"cfm", DimVolumeFlow, 4.719474e-4},             // cubic foot per minute
		{"cal", DimEnergy, 4.184},                       // calorie (thermochemical), exact
		{"kWh", DimEnergy, 3.6e6},                       // exact
		{"cP", DimDynamicViscosity, 1e-3},               // centipoise, exact
		{"cSt", DimKinematicViscosity, 1e-6},            // centistokes, exact
		{"ft/s", DimSpeed, 3.048e-1},                    // exact
		{"km/h", DimSpeed, 2.777778e-1},                 // kilometer per hour
		{"degF", DimTemperatureDifference, 5.555556e-1}, // degree Fahrenheit (interval)
	}
	for _, c := range cases {
		got, err := FromUnitDim(1, c.dim, c.unit)
		if err != nil {
			t.Errorf("FromUnitDim(1, %v, %q): %v", c.dim, c.unit, err)
			continue
		}
		if !scalar.EqualWithinRel(got, c.want, 5e-7) {
			t.Errorf("1 %s = %.10g, NIST SP 811 B.8 prints %.7g", c.unit, got, c.want)
		}
	}
}

// TestConversionIdentities checks properties: ToUnit undoes FromUnit for
// every unit, and a temperature difference in °F is 5/9 of its °C value.
func TestConversionIdentities(t *testing.T) {
	t.Parallel()
	for i := range unitTable {
		def := &unitTable[i]
		for _, x := range []float64{-3.5, 0, 1, 42.25, 1e4} {
			v, err := FromUnitDim(x, def.dim, def.name)
			if err != nil {
				t.Fatalf("FromUnitDim(%g, %v, %q): %v", x, def.dim, def.name, err)
			}
			back, err := ToUnitDim(v, def.dim, def.name)
			if err != nil || !scalar.EqualWithinAbsOrRel(back, x, 1e-9, 1e-12) {
				t.Errorf("%v %q: %g → %g SI → %g", def.dim, def.name, x, v, back)
			}
		}
	}
	// 100 °C − 0 °C = 180 °F − 32 °F = 100 K (SP 811 B.9).
	hot, _ := Parse("212 degF", DimTemperature)
	cold, _ := Parse("32 degF", DimTemperature)
	if !scalar.EqualWithinAbs(hot.Value-cold.Value, 100, 1e-9) {
		t.Errorf("212 °F − 32 °F = %g K, want 100 K", hot.Value-cold.Value)
	}
}
