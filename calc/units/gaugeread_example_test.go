package units_test

import (
	"fmt"

	"tubewright/calc/units"
)

// A safety check reads a bare pressure as gauge and says so.
func ExampleDescribePressure() {
	for _, typed := range []string{"12 bar", "12 barg", "12 bara", "80 psi"} {
		q, err := units.ParseWith(typed, units.DimPressure, units.Options{BareGauge: true})
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Println(units.DescribePressure(typed, q, 0))
	}
	// Output:
	// 12 bar read as 12 barg = 13.01 bar absolute
	// 12 barg = 13.01 bar absolute
	// 12 bara absolute = 10.99 barg
	// 80 psi read as 80 psig = 94.7 psi absolute
}
