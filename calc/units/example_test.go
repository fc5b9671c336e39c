package units_test

import (
	"fmt"

	"tubewright/calc/units"
)

func ExampleParse() {
	q, err := units.Parse("30 barg", units.DimPressure)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(q.Value, q.Unit, q.Gauge)

	q, _ = units.Parse("1 1/2 in", units.DimLength)
	fmt.Printf("%.4f m\n", q.Value)

	q, _ = units.Parse("440 Hz ± 5 Hz", units.DimFrequency)
	fmt.Println(q.Value, q.Uncertainty)

	_, err = units.Parse("10 bar", units.DimLength)
	fmt.Println(err)
	// Output:
	// 3.101325e+06 barg true
	// 0.0381 m
	// 440 5
	// "10 bar" is a pressure, not a length; accepted: m, mm, cm, µm, in, ft
}

func ExampleParseWith() {
	q, _ := units.ParseWith("27", units.DimTemperature, units.Options{DefaultUnit: "degC"})
	fmt.Printf("%.2f K\n", q.Value)
	q, _ = units.ParseWith("2 barg", units.DimPressure, units.Options{Atmosphere: 90000})
	fmt.Println(units.Format(q.Value, units.DimPressure))
	// Output:
	// 300.15 K
	// 290 kPa
}

func ExampleFormat() {
	fmt.Println(units.Format(440.34, units.DimFrequency))
	fmt.Println(units.Format(1.01325e7, units.DimPressure))
	fmt.Println(units.FormatPM(440, 5, units.DimFrequency))
	s, _ := units.FormatIn(300, "degC")
	fmt.Println(s)
	s, _ = units.FormatGauge(31e5, 1e5, "bar")
	fmt.Println(s)
	// Output:
	// 440.3 Hz
	// 10.13 MPa
	// 440 ± 5 Hz
	// 26.85 °C
	// 30 barg
}

func ExampleRangeError() {
	err := &units.RangeError{Field: "temperature", Value: 15, Min: 20, Max: 3000, Unit: "K", Why: "helium model"}
	fmt.Println(err)
	// Output:
	// temperature 15 K is outside the valid range 20–3000 K (helium model)
}

func ExampleUnits() {
	fmt.Println(units.Units(units.DimTemperature))
	// Output:
	// [K °C °F]
}
