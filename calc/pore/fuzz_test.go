package pore

import (
	"math"
	"math/cmplx"
	"testing"
)

// FuzzGeometry feeds arbitrary numbers to every geometry constructor: each
// either returns an error or a shape with porosity in (0, 1], a positive
// finite hydraulic radius and a finite f at δ = r_h.
func FuzzGeometry(f *testing.F) {
	f.Add(uint8(0), 0.25e-3, 0.1e-3, 0.0, 0.0)
	f.Add(uint8(4), 7874.0, 41e-6, 0.0, 0.0)
	f.Add(uint8(4), 7874.0, 200e-6, 0.0, 0.0)
	f.Add(uint8(6), 620000.0, 0.15e-3, 0.0, 0.0)
	f.Add(uint8(7), 25e-6, 0.03, 7900.0, 50e-6)
	f.Add(uint8(3), 0.1e-3, 0.15e-3, 0.0, 0.0)
	f.Add(uint8(1), -1.0, math.Inf(1), math.NaN(), 0.0)
	f.Fuzz(func(t *testing.T, kind uint8, a, b, c, d float64) {
		var s Shape
		var err error
		switch kind % 10 {
		case 0:
			s, err = Plates(a, b)
		case 1:
			s, err = Circular(a)
		case 2:
			s, err = Rectangular(a, b)
		case 3:
			s, err = Pins(a, b)
		case 4:
			s, err = Screens(a, b, c)
		case 5:
			s, err = Fibres(a, b)
		case 6:
			s, err = Honeycomb(a, b)
		case 7:
			s, err = FibresFromMass(a, b, c, d)
		case 8:
			s, err = PlatesFromPitch(a, b)
		case 9:
			s, err = CircularPores(a, b)
		}
		if err != nil {
			if err.Error() == "" {
				t.Fatal("empty error message")
			}
			return
		}
		phi, rh := s.Porosity(), s.HydraulicRadius()
		if !(phi > 0 && phi <= 1) {
			t.Fatalf("kind %d (%g, %g, %g, %g): porosity %g", kind%10, a, b, c, d, phi)
		}
		if !(rh > 0) || math.IsInf(rh, 0) {
			t.Fatalf("kind %d (%g, %g, %g, %g): r_h %g", kind%10, a, b, c, d, rh)
		}
		if v := s.F(rh); cmplx.IsNaN(v) || cmplx.IsInf(v) {
			t.Fatalf("kind %d (%g, %g, %g, %g): f(r_h) = %v", kind%10, a, b, c, d, v)
		}
	})
}

// FuzzNames feeds arbitrary text to the parsers of names typed by users:
// they return a known value or an error, never panic, and a known name
// round-trips.
func FuzzNames(f *testing.F) {
	for _, s := range []string{"steel", "Stainless", " copper ", "gold", "", "stack", "regen", "heat-pump", "\x00"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		if m, err := LookupMaterial(s); err == nil {
			back, err := LookupMaterial(m.Name)
			if err != nil || back.Name != m.Name || !(m.Density > 0) {
				t.Fatalf("%q -> %+v, round trip %+v %v", s, m, back, err)
			}
		} else if err.Error() == "" {
			t.Fatal("empty error")
		}
		if r, err := ParseRole(s); err == nil && r != RoleStack && r != RoleRegenerator {
			t.Fatalf("role %q -> %v", s, r)
		}
		if d, err := ParseDevice(s); err == nil && d != Engine && d != HeatPump {
			t.Fatalf("device %q -> %v", s, d)
		}
	})
}
