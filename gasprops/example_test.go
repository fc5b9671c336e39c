package gasprops_test

import (
	"fmt"

	"tubewright/gasprops"
)

// Helium at room temperature and 10 bar.
func ExampleMixture_Properties() {
	he, _ := gasprops.ParseMixture("helium")
	p, err := he.Properties(300, 10e5, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("density %.4f kg/m³\n", p.Density)
	fmt.Printf("sound speed %.1f m/s\n", p.SoundSpeed)
	fmt.Printf("viscosity %.2f µPa·s\n", p.Viscosity*1e6)
	fmt.Printf("Prandtl %.3f\n", p.Prandtl)
	// Output:
	// density 1.6047 kg/m³
	// sound speed 1019.1 m/s
	// viscosity 19.93 µPa·s
	// Prandtl 0.665
}

// A helium-xenon mixture has a much lower Prandtl number than either gas.
func ExampleParseMixture() {
	m, err := gasprops.ParseMixture("He:65%,Xe:35%")
	if err != nil {
		fmt.Println(err)
		return
	}
	p, _ := m.Properties(300, 1e5, nil)
	fmt.Println(m)
	fmt.Printf("Prandtl %.2f\n", p.Prandtl)
	// Output:
	// helium 65 % + xenon 35 %
	// Prandtl 0.21
}

// Compressibility of argon in a filled vessel, for the contents of a
// cylinder.
func ExampleMixture_Compressibility() {
	ar, _ := gasprops.Lookup("argon")
	z := gasprops.Pure(ar).Compressibility(293.15, 30e5)
	fmt.Printf("Z = %.3f\n", z)
	// Output:
	// Z = 0.980
}
