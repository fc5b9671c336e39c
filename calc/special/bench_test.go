package special

import (
	"math"
	"math/cmplx"
	"testing"
)

var sink complex128

// BenchmarkScaled times one call of each scaled pair on the ray ph z = π/4
// (the pore functions' ray) in each method's regime.
func BenchmarkScaled(b *testing.B) {
	for _, r := range []struct {
		name string
		abs  float64
	}{{"series/1", 1}, {"mid/8", 8}, {"hankel/50", 50}} {
		z := cmplx.Rect(r.abs, math.Pi/4)
		b.Run("I/"+r.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				i0, i1 := IScaled(z)
				sink = i0 + i1
			}
		})
		b.Run("K/"+r.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				k0, k1 := KScaled(z)
				sink = k0 + k1
			}
		})
	}
}
