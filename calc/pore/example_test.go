package pore_test

import (
	"fmt"

	"tubewright/calc/pore"
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
