package design

import (
	"math"
	"testing"

	"tubewright/calc/linear"
	"tubewright/gasprops"
)

// TestTableGas: the tabulated gas of the searches agrees with the gas
// model within 3e-6 (the interpolation bound in tableGas's comment) inside
// its grid, and is the model itself outside it or at another pressure.
func TestTableGas(t *testing.T) {
	t.Parallel()
	for _, name := range []string{"helium", "air", "helium:0.7,argon:0.3"} {
		mix, err := gasprops.ParseMixture(name)
		if err != nil {
			t.Fatal(err)
		}
		base := linear.MixtureGas{Mixture: mix}
		g := newTableGas(base, 10e5, 150, 900)
		for T := 171.3; T < 900; T += 37.7 {
			got, err1 := g.State(T, 10e5)
			want, err2 := base.State(T, 10e5)
			if err1 != nil || err2 != nil {
				t.Fatalf("%s %g K: %v %v", name, T, err1, err2)
			}
			for i, pair := range [][2]float64{{got.Density, want.Density}, {got.SoundSpeed, want.SoundSpeed}, {got.Gamma, want.Gamma},
				{got.Cp, want.Cp}, {got.Viscosity, want.Viscosity}, {got.Conductivity, want.Conductivity}} {
				if math.Abs(pair[0]-pair[1]) > 3e-6*math.Abs(pair[1]) {
					t.Errorf("%s %g K: property %d %.9g, model %.9g", name, T, i, pair[0], pair[1])
				}
			}
		}
		for _, c := range []struct{ T, p float64 }{{100, 10e5}, {950, 10e5}, {300, 5e5}} {
			got, _ := g.State(c.T, c.p)
			want, _ := base.State(c.T, c.p)
			if got != want {
				t.Errorf("%s at %g K, %g Pa: %+v, want the model's %+v", name, c.T, c.p, got, want)
			}
		}
	}
}
