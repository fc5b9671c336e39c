package listen

import (
	"fmt"
	"math"
)

// MaxHarmonic is the highest multiple searched for.
const MaxHarmonic = 10

// harmonicSpread is how far (relative) a peak may lie from n·f and still be
// listed as the n-th: the overtones of a tube are not exact multiples
// (end corrections depend on frequency), so the search allows 4 %.
// Common practice, no published source.
const harmonicSpread = 0.04

// harmonicFloor is how far (dB) above the noise a harmonic must stand.
const harmonicFloor = 13.0

// harmonics lists peaks near n·f (n = 2 … MaxHarmonic, below highHz) that
// stand harmonicFloor dB above the median bin power of the band.
func harmonics(sp spectrum, f, lowHz, highHz float64) []Harmonic {
	lo, hi := sp.band(lowHz, highHz)
	k0 := int(math.Round(f / sp.binHz))
	if k0 <= 0 || k0 >= len(sp.power) {
		return nil
	}
	p0 := peakAround(sp, k0, 1)
	sigma2 := sp.noisePower(lo, hi, 0, 0)
	if sigma2 < 0 || !(p0 > 0) {
		return nil
	}
	noise := sigma2 * sp.sumW2 // mean noise power per bin
	var out []Harmonic
	for n := 2; n <= MaxHarmonic; n++ {
		fn := float64(n) * f
		if fn*(1+harmonicSpread) > highHz {
			break
		}
		k := peakIn(sp, fn*(1-harmonicSpread), fn*(1+harmonicSpread))
		if k < 0 || sp.power[k] < noise*math.Pow(10, harmonicFloor/10) {
			continue
		}
		out = append(out, Harmonic{Number: n, Frequency: sp.grandke(k), Level: 10 * math.Log10(sp.power[k]/p0)})
	}
	return out
}

// peakAround returns the largest power within ±r bins of k.
func peakAround(sp spectrum, k, r int) float64 {
	var p float64
	for j := max(0, k-r); j <= min(len(sp.power)-1, k+r); j++ {
		p = math.Max(p, sp.power[j])
	}
	return p
}

// peakIn returns the bin of largest power between lowHz and highHz (at
// least two bins either side of their middle), or -1.
func peakIn(sp spectrum, lowHz, highHz float64) int {
	mid := (lowHz + highHz) / 2 / sp.binHz
	lo := min(int(math.Floor(lowHz/sp.binHz)), int(mid)-2)
	hi := max(int(math.Ceil(highHz/sp.binHz)), int(mid)+2)
	lo, hi = max(lo, 1), min(hi, len(sp.power)-2)
	if lo > hi {
		return -1
	}
	return sp.peak(lo, hi)
}

// lowerFundamental warns when a peak near f/2 or f/3 is within 10 dB of the
// strongest one: the strongest peak may then be an overtone.
func lowerFundamental(sp spectrum, f, lowHz float64) string {
	k0 := int(math.Round(f / sp.binHz))
	p0 := peakAround(sp, k0, 1)
	if !(p0 > 0) {
		return ""
	}
	for _, d := range []int{2, 3} {
		fd := f / float64(d)
		if fd*(1-harmonicSpread) < lowHz {
			continue
		}
		k := peakIn(sp, fd*(1-harmonicSpread), fd*(1+harmonicSpread))
		if k > 0 && sp.power[k] >= p0/10 && math.Abs(float64(k-k0)) > 2 {
			return fmt.Sprintf("A peak at %.1f Hz, about 1/%d of the strongest, is within 10 dB of it: it may be the fundamental and the strongest peak an overtone.", sp.grandke(k), d)
		}
	}
	return ""
}
