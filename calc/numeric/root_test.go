package numeric

import (
	"errors"
	"fmt"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestBrentKnownRoots(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name string
		f    func(float64) float64
		a, b float64
		want float64
		tol  float64
	}{
		// Dottie number, the fixed point of cos: from memory (OEIS A003957,
		// 0.739085133215160641...); confirmed with scipy.optimize.brentq
		// 1.10.1 at the prompt: 0.7390851332151607.
		{"cos x = x", func(x float64) float64 { return math.Cos(x) - x }, 0, 1, 0.7390851332151607, 1e-15},
		// Wallis's cubic x³ - 2x - 5, Newton's own example; from memory
		// 2.0945514815423265..., scipy.optimize.brentq 1.10.1: 2.094551481542327.
		{"Wallis cubic", func(x float64) float64 { return x*x*x - 2*x - 5 }, 2, 3, 2.094551481542327, 1e-15},
		// sqrt 2 and ln 2 are exact closed forms.
		{"x² = 2", func(x float64) float64 { return x*x - 2 }, 0, 2, math.Sqrt2, 1e-15},
		{"eˣ = 2", func(x float64) float64 { return math.Exp(x) - 2 }, -5, 5, math.Ln2, 1e-15},
		// first positive root of tan x = x above π: from memory 4.4934094579...,
		// scipy.optimize.brentq 1.10.1: 4.493409457909064. Written pole-free.
		{"tan x = x", func(x float64) float64 { return math.Sin(x) - x*math.Cos(x) }, 4, 4.7, 4.493409457909064, 1e-14},
		// A multiple root (x-1)^9: the classic hard case for interpolation
		// (Brent 1973 ch. 4 discusses slow convergence near multiple roots);
		// root exactly 1 but f is flat to ~1e-16 within ±0.02 of it, so only
		// a loose position is meaningful.
		{"(x-1)^9", func(x float64) float64 { return math.Pow(x-1, 9) }, 0, 3, 1, 0.05},
		// Step function: sign change without a root; Brent must still
		// shrink onto the jump at 1/3.
		{"step", func(x float64) float64 {
			if x < 1.0/3 {
				return -1
			}
			return 1
		}, 0, 1, 1.0 / 3, 1e-15},
		// Reversed interval (b < a) must work the same.
		{"reversed", func(x float64) float64 { return math.Cos(x) - x }, 1, 0, 0.7390851332151607, 1e-15},
		// exact zero at an end point
		{"zero at end", func(x float64) float64 { return x - 2 }, 0, 2, 2, 0},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			r, err := Brent(c.f, c.a, c.b, nil)
			if err != nil {
				t.Fatalf("Brent: %v", err)
			}
			if !r.Converged {
				t.Fatalf("not converged: %+v", r)
			}
			if !scalar.EqualWithinAbsOrRel(r.X, c.want, c.tol, c.tol) {
				t.Errorf("root %.17g, want %.17g ± %g", r.X, c.want, c.tol)
			}
			if r.Evaluations != r.Iterations+2 {
				t.Errorf("evaluations %d, iterations %d: expected one evaluation per iteration plus two", r.Evaluations, r.Iterations)
			}
		})
	}
}

// Brent's method must be much faster than bisection on a smooth function:
// bisection needs about 50 halvings from width 1 to 1e-15; Brent 1973 ch. 4
// shows superlinear convergence, so a dozen evaluations suffice.
func TestBrentFastOnSmooth(t *testing.T) {
	t.Parallel()
	r, err := Brent(func(x float64) float64 { return math.Cos(x) - x }, 0, 1, nil)
	if err != nil {
		t.Fatal(err)
	}
	if r.Evaluations > 15 {
		t.Errorf("cos x = x took %d evaluations, want ≤ 15", r.Evaluations)
	}
}

func TestBrentNoBracket(t *testing.T) {
	t.Parallel()
	_, err := Brent(func(x float64) float64 { return x*x + 1 }, -1, 1, nil)
	if !errors.Is(err, ErrNoBracket) {
		t.Errorf("x²+1 on [-1,1]: err = %v, want ErrNoBracket", err)
	}
	_, err = Brent(func(x float64) float64 { return math.NaN() }, -1, 1, nil)
	if !errors.Is(err, ErrNoBracket) {
		t.Errorf("NaN function: err = %v, want ErrNoBracket", err)
	}
}

func TestBrentNotConverged(t *testing.T) {
	t.Parallel()
	r, err := Brent(func(x float64) float64 { return math.Cos(x) - x }, 0, 1, &RootSettings{MaxIterations: 2})
	if !errors.Is(err, ErrNotConverged) {
		t.Fatalf("err = %v, want ErrNotConverged", err)
	}
	if r.Converged || r.X < 0 || r.X > 1 {
		t.Errorf("result %+v: want unconverged iterate inside [0, 1]", r)
	}
}

func TestBrentNotFinite(t *testing.T) {
	t.Parallel()
	// 1/(x-0.5) - 100 with a pole inside: the iteration may land on
	// values that overflow only if exactly at the pole; use log instead,
	// NaN below 0.2.
	f := func(x float64) float64 {
		if x > 0.2 && x < 0.9 {
			return math.NaN()
		}
		return x - 0.5
	}
	_, err := Brent(f, 0, 1, nil)
	if !errors.Is(err, ErrNotFinite) {
		t.Errorf("err = %v, want ErrNotFinite", err)
	}
}

func TestBrentAbsTol(t *testing.T) {
	t.Parallel()
	r, err := Brent(func(x float64) float64 { return x - 0.3 }, 0, 1, &RootSettings{AbsTol: 1e-3, RelTol: 1e-3})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.X-0.3) > 1e-3 {
		t.Errorf("root %g, want 0.3 within 1e-3", r.X)
	}
}

func TestFindBrackets(t *testing.T) {
	t.Parallel()
	// sin x on [0.5, 10]: roots π, 2π, 3π (exact).
	br := FindBrackets(math.Sin, 0.5, 10, 100)
	want := []float64{math.Pi, 2 * math.Pi, 3 * math.Pi}
	if len(br) != len(want) {
		t.Fatalf("sin: %d brackets %v, want %d", len(br), br, len(want))
	}
	for i, b := range br {
		if !(b[0] <= want[i] && want[i] <= b[1]) {
			t.Errorf("bracket %v does not hold %g", b, want[i])
		}
	}

	// tan x - x on [4, 11]: poles at 3π/2 ≈ 4.712 and 5π/2 ≈ 7.854 and 7π/2 ≈ 10.996
	// must be skipped; roots 4.493409457909064 and 7.725251836937707 (from
	// memory, confirmed with scipy.optimize.brentq 1.10.1 at the prompt).
	tanx := func(x float64) float64 { return math.Tan(x) - x }
	br = FindBrackets(tanx, 4, 10.9, 400)
	roots := []float64{4.493409457909064, 7.725251836937707}
	if len(br) != len(roots) {
		t.Fatalf("tan x - x: brackets %v, want %d (poles skipped)", br, len(roots))
	}
	for i, b := range br {
		r, err := Brent(tanx, b[0], b[1], nil)
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinAbsOrRel(r.X, roots[i], 1e-12, 1e-12) {
			t.Errorf("root %d: %.16g, want %.16g", i, r.X, roots[i])
		}
	}

	// no sign change
	if br := FindBrackets(func(x float64) float64 { return x*x + 1 }, -3, 3, 50); len(br) != 0 {
		t.Errorf("x²+1: brackets %v, want none", br)
	}
	// a root exactly on a grid point is reported once
	br = FindBrackets(func(x float64) float64 { return x - 1 }, 0, 2, 4)
	if len(br) != 1 || br[0][1] != 1 {
		t.Errorf("x-1 on grid point: brackets %v, want one ending at 1", br)
	}
	// a root exactly at a: one bracket that Brent accepts (no empty one)
	br = FindBrackets(func(x float64) float64 { return x }, 0, 2, 4)
	if len(br) != 1 || br[0][0] != 0 || br[0][1] <= 0 {
		t.Fatalf("root at a: brackets %v, want one [0, 0.5]", br)
	}
	if r, err := Brent(func(x float64) float64 { return x }, br[0][0], br[0][1], nil); err != nil || r.X != 0 {
		t.Errorf("root at a: %v, %v", r.X, err)
	}
}

func TestRootPanics(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name string
		f    func()
	}{
		{"Brent empty", func() { _, _ = Brent(math.Sin, 1, 1, nil) }},
		{"Brent inf", func() { _, _ = Brent(math.Sin, 0, math.Inf(1), nil) }},
		{"FindBrackets n=0", func() { FindBrackets(math.Sin, 0, 1, 0) }},
		{"FindBrackets a>b", func() { FindBrackets(math.Sin, 1, 0, 3) }},
	} {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", c.name)
				}
			}()
			c.f()
		}()
	}
}

var sinkRoot RootResult

func BenchmarkBrent(b *testing.B) {
	f := func(x float64) float64 { return math.Cos(x) - x }
	b.ReportAllocs()
	for b.Loop() {
		sinkRoot, _ = Brent(f, 0, 1, nil)
	}
}

func ExampleBrent() {
	r, err := Brent(func(x float64) float64 { return math.Cos(x) - x }, 0, 1, nil)
	fmt.Printf("%.12f %v %v\n", r.X, r.Converged, err)
	// Output: 0.739085133215 true <nil>
}

func ExampleFindBrackets() {
	for _, b := range FindBrackets(math.Sin, 1, 7, 6) {
		r, _ := Brent(math.Sin, b[0], b[1], nil)
		fmt.Printf("%.6f\n", r.X)
	}
	// Output:
	// 3.141593
	// 6.283185
}
