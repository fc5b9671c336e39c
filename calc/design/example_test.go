package design_test

import (
	"fmt"

	"tubewright/calc/design"
)

// An engine for 300 Hz with helium at 10 bar in a 50 mm tube closed at
// both ends, for a heater that reaches 650 K in a 295 K room.
func ExampleDesign() {
	r, err := design.Design(design.Target{
		Frequency: 300, Gas: "helium", MeanPressure: 10e5,
		HotTemperature: 650, Ambient: 295, Diameter: 0.05,
		Ends: design.HalfWave, Stack: design.Plates,
	}, &design.Settings{NoSensitivity: true})
	if err != nil {
		fmt.Println(err)
		return
	}
	g := r.Geometry
	fmt.Printf("starts at %.0f K and %.1f Hz, below the heater's 650 K: %v\n", r.Onset.HotTemperature, r.Onset.Frequency, r.Margin > 0)
	fmt.Printf("tube %.2f m long, plate gap %.1f mm (δκ %.2f mm)\n", g.Length(), g.Gap*1e3, r.ThermalDepth*1e3)
	for _, p := range r.File.PartsList {
		fmt.Printf("%s (%s)\n", p.Label, p.Kind)
	}
	// Output:
	// starts at 353 K and 300.0 Hz, below the heater's 650 K: true
	// tube 1.69 m long, plate gap 0.4 mm (δκ 0.14 mm)
	// closed end (closed-end)
	// hot space (tube)
	// heater (exchanger)
	// stack (stack)
	// cooler (exchanger)
	// resonator (tube)
	// far end (closed-end)
}
