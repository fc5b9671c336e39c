package units

import "testing"

// sinkQ keeps results alive so the compiler cannot drop the work.
var sinkQ Quantity

func BenchmarkParse(b *testing.B) {
	for _, c := range []struct {
		name, in string
		dim      Dimension
	}{
		{"plain", "10 bar", DimPressure},
		{"gauge", "30 barg", DimPressure},
		{"celsius", "27 °C", DimTemperature},
		{"fraction", "1 1/2 in", DimLength},
		{"uncertainty", "567 Hz ± 8 Hz", DimFrequency},
		{"error", "10 parsec", DimLength},
	} {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkQ, _ = Parse(c.in, c.dim)
			}
		})
	}
}

var sinkS string

func BenchmarkFormat(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		sinkS = Format(578.34, DimFrequency)
	}
}
