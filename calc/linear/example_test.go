package linear_test

import (
	"fmt"

	"tubewright/calc/linear"
)

// A stack centred 0.2 m from the closed end of a standing wave with
// k = 2 rad/m in a monatomic gas at 300 K: (γ-1) Tm k cot(kx).
func ExampleCriticalGradient() {
	g := linear.CriticalGradient(5.0/3, 300, 2, 0.2)
	fmt.Printf("%.1f K/m\n", g)
	// Output: 946.1 K/m
}

// The built-in example devices.
func ExampleExampleNames() {
	fmt.Println(linear.ExampleNames())
	// Output: [engine heatpump]
}
