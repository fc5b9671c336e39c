package pore

import (
	"math"
	"math/cmplx"
	"strconv"
	"testing"

	"tubewright/calc/internal/reftable"
)

// fRow is one line of testdata/rott_f.csv: Rott's f computed with
// scipy.special 1.10.1 (jv, iv, kv of complex argument) and numpy by
// testdata/gen_rott.py, independently of the Go code.
type fRow struct {
	shape        string
	param, ratio float64
	f            complex128
}

func readF(t testing.TB) []fRow {
	t.Helper()
	var rows []fRow
	for _, r := range reftable.Read(t, "../../testdata/rott_f.csv", 4, 1, "testdata/gen_rott.py") {
		v := r.Values
		rows = append(rows, fRow{r.Name, v[0], v[1], complex(v[2], v[3])})
	}
	return rows
}

// TestFAgainstScipy compares every shape's f with the reference table over
// length/δ from 0.01 to 100, to 1e-10 relative. The length is the half gap
// (plates), the radius (circular), the shorter half side with the aspect
// ratio b/a as param (rectangular), the pin radius with r_o/r_i as param
// (pins); δ = 1 mm.
func TestFAgainstScipy(t *testing.T) {
	t.Parallel()
	const delta = 1e-3
	seen := map[string]int{}
	worst := map[string]float64{}
	for _, r := range readF(t) {
		L := r.ratio * delta
		var s Shape
		var err error
		switch r.shape {
		case "plates":
			s, err = Plates(L, 0)
		case "circular":
			s, err = Circular(L)
		case "rectangular":
			s, err = Rectangular(L, r.param*L)
		case "pins":
			// the table's pins use r_o/r_i directly; invert the hexagonal cell
			s, err = Pins(L, r.param*L/hexCell)
		default:
			t.Fatalf("unknown shape %q", r.shape)
		}
		if err != nil {
			t.Fatalf("%s %g %g: %v", r.shape, r.param, r.ratio, err)
		}
		got := s.F(delta)
		rel := cmplx.Abs(got-r.f) / cmplx.Abs(r.f)
		key := r.shape + " " + strconv.FormatFloat(r.param, 'g', -1, 64)
		seen[key]++
		worst[key] = math.Max(worst[key], rel)
		if !(rel <= 1e-10) {
			t.Errorf("%s param %g, L/δ = %g: f = %v, scipy %v (rel %.2e)", r.shape, r.param, r.ratio, got, r.f, rel)
		}
	}
	for _, k := range []string{"plates 0", "circular 0", "rectangular 1", "rectangular 2", "rectangular 5", "pins 3", "pins 6"} {
		if seen[k] < 41 {
			t.Errorf("%s: only %d reference points", k, seen[k])
		}
	}
	t.Logf("worst relative differences: %v", worst)
}
