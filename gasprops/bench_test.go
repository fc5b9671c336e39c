package gasprops

import (
	"testing"

	"tubewright/calc/units"
)

var sink Properties

// BenchmarkProperties measures one property evaluation; it must not
// allocate in range.
func BenchmarkProperties(b *testing.B) {
	heXe, err := Binary(helium, xenon, 0.35)
	if err != nil {
		b.Fatal(err)
	}
	five := mustParse(b, "He:0.2,Ne:0.2,Ar:0.2,Kr:0.2,Xe:0.2")
	cases := []struct {
		name string
		m    Mixture
		o    *Options
		p    float64 // Pa
	}{
		{"helium", Pure(helium), nil, 10e5},
		{"air", Pure(air), nil, 10e5},
		// at 10 bar CO2 is 5 % off ideal and gets a warning (a string);
		// at 1 bar it is in range
		{"carbon-dioxide", Pure(carbonDioxide), nil, 1e5},
		{"helium-nonideal", Pure(helium), &Options{NonIdeal: true}, 10e5},
		{"helium-xenon", heXe, nil, 10e5},
		{"helium-xenon-nonideal", heXe, &Options{NonIdeal: true}, 10e5},
		{"five-noble", five, nil, 10e5},
	}
	for _, c := range cases {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			for i := 0; i < b.N; i++ {
				p, err := c.m.Properties(300, units.Pressure(c.p), c.o)
				if err != nil {
					b.Fatal(err)
				}
				sink = p
			}
		})
	}
}

// TestPropertiesDoNotAllocate pins the 0 allocs/op of the benchmark as a
// test (counts, not timing).
func TestPropertiesDoNotAllocate(t *testing.T) {
	heXe, _ := Binary(helium, xenon, 0.35)
	for _, c := range []struct {
		m Mixture
		o *Options
		p units.Pressure
	}{
		{Pure(helium), &Options{NonIdeal: true}, 10e5},
		{Pure(air), &Options{NonIdeal: true}, 10e5},
		{Pure(xenon), nil, 1e5}, // at 10 bar xenon warns that it is 5 % off ideal
		{heXe, nil, 10e5},       // with NonIdeal a mixture warns that it has no B
	} {
		n := testing.AllocsPerRun(100, func() {
			sink, _ = c.m.Properties(300, c.p, c.o)
		})
		if n != 0 {
			t.Errorf("%v: %g allocations per Properties call", c.m, n)
		}
	}
}
