package special

import (
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"tubewright/calc/internal/reftable"
)

// refRow is one line of testdata/rott_bessel.csv: scipy.special 1.10.1
// (jve, ive, kve, jv, iv, kv of complex argument) via testdata/gen_rott.py.
type refRow struct {
	name string
	z, v complex128
}

func readBessel(t testing.TB) []refRow {
	t.Helper()
	var rows []refRow
	for _, r := range reftable.Read(t, "../../testdata/rott_bessel.csv", 4, 1000, "testdata/gen_rott.py") {
		v := r.Values
		rows = append(rows, refRow{r.Name, complex(v[0], v[1]), complex(v[2], v[3])})
	}
	return rows
}

var funcs = map[string]func(complex128) complex128{
	"J0": J0, "J1": J1, "I0": I0, "I1": I1, "K0": K0, "K1": K1,
	"J0e": J0e, "J1e": J1e, "I0e": I0e, "I1e": I1e, "K0e": K0e, "K1e": K1e,
}

// TestAgainstScipy compares every function with scipy.special 1.10.1
// (testdata/gen_rott.py). Tolerance: 1e-12 relative to |value|, or absolute
// 1e-12 times the size of the scaled function where the value sits near a
// zero (J of almost real argument), since a relative error is meaningless
// at a zero.
func TestAgainstScipy(t *testing.T) {
	t.Parallel()
	worst := map[string]float64{}
	for _, r := range readBessel(t) {
		fn, ok := funcs[r.name]
		if !ok {
			t.Fatalf("unknown function %q in table", r.name)
		}
		got := fn(r.z)
		scale := cmplx.Abs(r.v)
		if strings.HasPrefix(r.name, "J") && !strings.HasSuffix(r.name, "e") {
			// near-zero J values: size of the scaled function times exp|Im z|
			scale = math.Max(scale, math.Exp(math.Abs(imag(r.z)))/math.Sqrt(1+cmplx.Abs(r.z)))
		}
		if strings.HasPrefix(r.name, "J") && strings.HasSuffix(r.name, "e") {
			scale = math.Max(scale, 1/math.Sqrt(1+cmplx.Abs(r.z)))
		}
		rel := cmplx.Abs(got-r.v) / scale
		if rel > worst[r.name] {
			worst[r.name] = rel
		}
		if !(rel <= 1e-12) {
			t.Errorf("%s(%v) = %v, scipy %v, relative error %.2e", r.name, r.z, got, r.v, rel)
		}
	}
	t.Logf("worst relative errors: %v", worst)
}

// TestWronskian checks I1(z)K0(z) + I0(z)K1(z) = 1/z (DLMF 10.28.2), an
// identity that ties the I and K routines together independently of any
// table, on the ray ph z = π/4 used by the pore functions.
func TestWronskian(t *testing.T) {
	t.Parallel()
	for _, r := range []float64{1e-3, 0.1, 1, 1.9, 2.1, 5, 16.9, 17.1, 40, 141, 500} {
		z := cmplx.Rect(r, math.Pi/4)
		i0, i1 := IScaled(z)
		k0, k1 := KScaled(z)
		// unscaled product = scaled product · exp(Re z) exp(-z) = · exp(-i Im z)
		w := (i1*k0 + i0*k1) * cmplx.Exp(complex(0, -imag(z)))
		if e := cmplx.Abs(w*z - 1); e > 1e-13 {
			t.Errorf("|z| = %g: z·W - 1 = %.2e", r, e)
		}
	}
}

// TestSmallArgument checks the leading terms I0 ≈ 1 + z²/4, I1 ≈ z/2,
// K0 ≈ -ln(z/2) - γ, K1 ≈ 1/z (DLMF 10.30.2, 10.30.3) at |z| = 1e-6.
func TestSmallArgument(t *testing.T) {
	t.Parallel()
	z := complex(7e-7, 7e-7)
	cases := []struct {
		name      string
		got, want complex128
	}{
		{"I0", I0(z), 1 + z*z/4},
		{"I1", I1(z), z / 2},
		{"K0", K0(z), -cmplx.Log(z/2) - eulerGamma},
		{"K1", K1(z), 1 / z},
		{"J0", J0(z), 1 - z*z/4},
		{"J1", J1(z), z / 2},
	}
	for _, c := range cases {
		if e := cmplx.Abs(c.got-c.want) / cmplx.Abs(c.want); e > 1e-11 {
			t.Errorf("%s: got %v want %v (rel %.1e)", c.name, c.got, c.want, e)
		}
	}
}

// TestNoOverflowScaled checks that the scaled ratio I1/I0 is finite and
// tends to 1 - 1/(2z) (DLMF 10.40.1) at |z| = 141 and 1e4, where the
// unscaled values are astronomically large.
func TestNoOverflowScaled(t *testing.T) {
	t.Parallel()
	for _, r := range []float64{141, 1e4} {
		z := cmplx.Rect(r, math.Pi/4)
		i0, i1 := IScaled(z)
		q := i1 / i0
		want := 1 - 1/(2*z) - 1/(8*z*z)
		if cmplx.IsNaN(q) || cmplx.IsInf(q) || cmplx.Abs(q-want) > 1e-5/r {
			t.Errorf("|z| = %g: I1/I0 = %v, want ≈ %v", r, q, want)
		}
	}
	if !cmplx.IsNaN(K0(-1)) || !cmplx.IsNaN(K1(complex(0, 2))) {
		t.Error("K outside Re z > 0 should be NaN")
	}
}
