package pore

import "testing"

var sink complex128

// BenchmarkF times one f evaluation per shape at r_h/δ = 1 (the stack
// regime) and r_h/δ = 50 (wide channels, where the series are longest).
func BenchmarkF(b *testing.B) {
	shapes := []struct {
		name string
		s    Shape
	}{
		{"plates", must(Plates(0.25e-3, 0.1e-3))},
		{"circular", must(Circular(0.3e-3))},
		{"rectangular", must(Rectangular(0.2e-3, 0.5e-3))},
		{"pins", must(Pins(0.1e-3, 0.8e-3))},
		{"screens", must(Screens(200/inch, 41e-6, 0))},
		{"fibres", must(Fibres(25e-6, 0.2))},
		{"honeycomb", must(Honeycomb(400/(inch*inch), 0.15e-3))},
		{"boundary", must(BoundaryLayer(1e-3))},
	}
	for _, ratio := range []struct {
		name string
		x    float64
	}{{"rh=1delta", 1}, {"rh=50delta", 50}} {
		for _, c := range shapes {
			delta := c.s.HydraulicRadius() / ratio.x
			b.Run(c.name+"/"+ratio.name, func(b *testing.B) {
				b.ReportAllocs()
				for b.Loop() {
					sink = c.s.F(delta)
				}
			})
		}
	}
}
