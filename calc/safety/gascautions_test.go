package safety

import (
	"slices"
	"testing"

	"tubewright/gasprops"
)

func TestGasCautions(t *testing.T) {
	t.Parallel()
	// Hydrogen is flammable and carbon dioxide toxic; the noble gases,
	// nitrogen and air are neither (common practice, no published source).
	cases := []struct {
		gas  string
		want []string
	}{
		{"helium", nil},
		{"helium:0.7,argon:0.3", nil},
		{"nitrogen", nil},
		{"air", nil},
		{"hydrogen", []string{CautionFlammable}},
		{"carbon dioxide", []string{CautionCarbonDioxide}},
	}
	for _, c := range cases {
		m, err := gasprops.ParseMixture(c.gas)
		if err != nil {
			t.Fatalf("%s: %v", c.gas, err)
		}
		if got := GasCautions(m); !slices.Equal(got, c.want) {
			t.Errorf("%s: cautions %q, want %q", c.gas, got, c.want)
		}
		// The cylinder contents and the stored energy carry them after
		// the general and their own cautions.
		cyl, err := CylinderContents(m, 0.05, 20e5, 293.15, StandardISO13443)
		if err != nil {
			t.Fatalf("%s: %v", c.gas, err)
		}
		wantGeneralCaution(t, cyl.Cautions)
		for _, w := range c.want {
			if !slices.Contains(cyl.Cautions, w) {
				t.Errorf("%s: cylinder cautions lack %q", c.gas, w)
			}
		}
		e, _, err := GasExpansionEnergy(m, 293.15, 10e5, 101325, 0.01)
		if err != nil {
			t.Fatalf("%s: %v", c.gas, err)
		}
		wantGeneralCaution(t, e.Cautions)
		if len(e.Cautions) != 2+len(c.want) {
			t.Errorf("%s: energy cautions %q", c.gas, e.Cautions)
		}
		for _, w := range c.want {
			if !slices.Contains(e.Cautions, w) {
				t.Errorf("%s: energy cautions lack %q", c.gas, w)
			}
		}
	}
}
