package pore_test

import (
	"fmt"

	"tubewright/calc/pore"
	"tubewright/gasprops"
)

// Plates with a 0.3 mm gap judged as a stack where δκ = 0.1 mm.
func ExampleJudge() {
	s, err := pore.Plates(0.15e-3, 0.1e-3)
	if err != nil {
		panic(err)
	}
	v, err := pore.Judge(s, pore.RoleStack, 0.1e-3)
	if err != nil {
		panic(err)
	}
	fmt.Printf("%s, r_h/δκ = %.2f, porosity %.2f\n", v.Call, v.RhOverDelta, s.Porosity())
	// Output: about right, r_h/δκ = 1.50, porosity 0.75
}

// Rott's f of the same plates at δκ = 0.1 mm (python3 cmath: tanh(z)/z with
// z = 1.5(1+i) gives 0.373040 - 0.362676i).
func ExampleShape_F() {
	s, _ := pore.Plates(0.15e-3, 0.1e-3)
	f := s.F(0.1e-3)
	fmt.Printf("f = %.4f %+.4fi\n", real(f), imag(f))
	// Output: f = 0.3730 -0.3627i
}

// Penetration depths of air at 300 K, 1 atm and 500 Hz from handbook
// properties (Incropera & DeWitt, Table A.4, from memory; see depths_test.go).
func ExamplePenetrationDepths() {
	air := gasprops.Properties{Density: 1.1614, IsobaricSpecificHeat: 1007, Viscosity: 184.6e-7, ThermalConductivity: 26.3e-3}
	dk, dn, err := pore.PenetrationDepths(air, 500)
	if err != nil {
		panic(err)
	}
	fmt.Printf("δκ = %.4f mm, δν = %.4f mm\n", dk*1e3, dn*1e3)
	// Output: δκ = 0.1196 mm, δν = 0.1006 mm
}

// A 20 mm stack centred 25 mm from the closed end of an air-filled tube
// at 500 Hz, driven at 2 % (python3 as a calculator with the formulas of
// placement_test.go: kx = 0.22618, ΔT_crit = 94.357 K, ξ = 0.49169 mm).
func ExamplePlaceStack() {
	pl, err := pore.PlaceStack(pore.PlacementInput{SoundSpeed: 347.25, Density: 1.1764, Gamma: 1.4,
		MeanTemperature: 300, MeanPressure: 101325, Frequency: 500, Centre: 0.025, Length: 0.02, DriveRatio: 0.02})
	if err != nil {
		panic(err)
	}
	fmt.Printf("kx = %.4f, ΔT_crit = %.1f K, ξ = %.4f mm\n", pl.KX, pl.CriticalDifference, pl.Displacement*1e3)
	// Output: kx = 0.2262, ΔT_crit = 94.4 K, ξ = 0.4917 mm
}
