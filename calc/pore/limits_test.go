package pore

import (
	"math"
	"math/cmplx"
	"testing"
)

// must returns s, panicking (a test failure) on a construction error.
func must(s Shape, err error) Shape {
	if err != nil {
		panic(err)
	}
	return s
}

// TestSmallPoreLimit checks f ≈ 1 - i c (r_h/δ)² for r_h ≪ δ, with c from
// the Taylor series of the exact solutions: plates tanh z/z ≈ 1 - z²/3,
// z² = 2i (y0/δ)², so c = 2/3; circular 2I1(w)/(wI0(w)) ≈ 1 - w²/8,
// w² = 2i (R/δ)² = 8i (r_h/δ)², so c = 1 (derived by hand, standard series
// DLMF 10.25.2).
func TestSmallPoreLimit(t *testing.T) {
	t.Parallel()
	const delta = 1e-3
	for _, c := range []struct {
		name  string
		shape Shape
		c     float64
	}{
		{"plates", must(Plates(1e-5, 0)), 2.0 / 3},
		{"circular", must(Circular(2e-5)), 1},
	} {
		x := c.shape.HydraulicRadius() / delta
		want := complex(1, -c.c*x*x)
		got := c.shape.F(delta)
		if e := cmplx.Abs(got - want); e > 10*x*x*x*x {
			t.Errorf("%s: f = %v, want %v (diff %.1e)", c.name, got, want, e)
		}
	}
	// every shape tends to 1 as δ grows
	for _, s := range allShapes(t) {
		if f := s.F(1e3 * s.HydraulicRadius()); cmplx.Abs(f-1) > 1e-5 {
			t.Errorf("%T: f(δ = 1000 r_h) = %v, want ≈ 1", s, f)
		}
	}
}

// TestLargePoreLimit checks f → (1-i)δ/(2 r_h) for r_h ≫ δ (boundary-layer
// limit, Swift 2002 ch. 4, from memory), to 1 % at r_h = 300 δ: the exact
// shapes differ from the limit by corner and curvature terms of order δ/r_h.
func TestLargePoreLimit(t *testing.T) {
	t.Parallel()
	for _, s := range allShapes(t) {
		delta := s.HydraulicRadius() / 300
		bl := must(BoundaryLayer(s.HydraulicRadius()))
		got, want := s.F(delta), bl.F(delta)
		if e := cmplx.Abs(got-want) / cmplx.Abs(want); e > 0.01 {
			t.Errorf("%T: f = %v, boundary layer %v (rel %.2e)", s, got, want, e)
		}
	}
}

// TestLongRectangleTendsToPlates: a rectangle with b/a → ∞ becomes a pair
// of plates with y0 = a; the difference falls like a/b.
func TestLongRectangleTendsToPlates(t *testing.T) {
	t.Parallel()
	const a = 1e-4
	for _, ratio := range []float64{0.1, 1, 10} {
		delta := a / ratio
		plate := must(Plates(a, 0)).F(delta)
		prev := math.Inf(1)
		for _, asp := range []float64{10, 100, 1000, 10000} {
			r := must(Rectangular(a, asp*a)).F(delta)
			e := cmplx.Abs(r-plate) / cmplx.Abs(plate)
			if e >= prev {
				t.Errorf("a/δ = %g, b/a = %g: difference %.2e did not shrink from %.2e", ratio, asp, e, prev)
			}
			if e > 2/asp {
				t.Errorf("a/δ = %g, b/a = %g: difference %.2e above 2a/b", ratio, asp, e)
			}
			prev = e
		}
	}
}

// TestSignConvention: Swift's exp(+iωt) gives Im f < 0 and |f| <= 1.
func TestSignConvention(t *testing.T) {
	t.Parallel()
	for _, s := range allShapes(t) {
		for _, x := range []float64{0.03, 0.3, 1, 3, 30} {
			f := s.F(s.HydraulicRadius() / x)
			if !(imag(f) < 0) || cmplx.Abs(f) > 1+1e-12 {
				t.Errorf("%T at r_h/δ = %g: f = %v", s, x, f)
			}
		}
	}
}

func TestBadDeltaIsNaN(t *testing.T) {
	t.Parallel()
	for _, s := range append(allShapes(t), must(BoundaryLayer(1e-3))) {
		for _, d := range []float64{0, -1, math.Inf(1), math.NaN()} {
			if f := s.F(d); !cmplx.IsNaN(f) {
				t.Errorf("%T: F(%g) = %v, want NaN", s, d, f)
			}
		}
	}
}

// allShapes returns one of each shape except the boundary-layer limit
// (which is wrong by design for r_h < δ), at bench-like sizes.
func allShapes(t testing.TB) []Shape {
	t.Helper()
	return []Shape{
		must(Plates(0.25e-3, 0.1e-3)),
		must(Circular(0.3e-3)),
		must(Rectangular(0.2e-3, 0.5e-3)),
		must(Pins(0.1e-3, 0.8e-3)),
		must(Screens(200/0.0254, 41e-6, 0)),
		must(Fibres(25e-6, 0.2)),
		must(Honeycomb(400/(0.0254*0.0254), 0.15e-3)),
	}
}
