package ui

import "math"

// This file places axis ticks: the extended Wilkinson search of Talbot, Lin
// and Hanrahan for linear axes, and decades (with 2 and 5 between them on
// short spans) for log axes.

// tickQ is the ordered list of nice step mantissas of Talbot, Lin and
// Hanrahan (2010), §4.1: earlier is simpler.
var tickQ = [...]float64{1, 5, 2, 2.5, 4, 3}

// tickWeights are the weights of simplicity, coverage, density and
// legibility, as recommended by Talbot, Lin and Hanrahan (2010), §4.5.
var tickWeights = [4]float64{0.25, 0.2, 0.5, 0.05}

// Ticks is the outcome of a tick search: labels at Min, Min+Step, ...,
// Max (Count of them).
type Ticks struct {
	Min, Max, Step float64
	Count          int
	// Score is the weighted score of the paper; -Inf when no search ran.
	Score float64
}

// Values returns the tick positions Min, Min+Step, ..., Max.
func (t Ticks) Values() []float64 {
	v := make([]float64, t.Count)
	for i := range v {
		v[i] = t.Min + float64(i)*t.Step
		if math.Abs(v[i]) < 1e-9*t.Step {
			v[i] = 0 // no -0 or 1e-17 where the ticks cross zero
		}
	}
	return v
}

// tickSimplicity is the simplicity score of Talbot, Lin and Hanrahan
// (2010), §4.1:
//
//	s = 1 − (i−1)/(|Q|−1) − j + v
//
// where i (1-based) is the position of q in Q, j the skip factor and v is 1
// when zero is one of the labels, 0 otherwise.
func tickSimplicity(i, j int, lmin, lmax, lstep float64) float64 {
	v := 0.0
	if lmin <= 0 && lmax >= 0 {
		r := math.Mod(lmin, lstep)
		if r < 0 {
			r += lstep
		}
		if r < 1e-10*lstep || lstep-r < 1e-10*lstep {
			v = 1
		}
	}
	return 1 - float64(i-1)/float64(len(tickQ)-1) - float64(j) + v
}

// tickSimplicityMax is the upper bound of tickSimplicity over all label
// ranges for the given q position and skip (v = 1).
func tickSimplicityMax(i, j int) float64 {
	return 1 - float64(i-1)/float64(len(tickQ)-1) - float64(j) + 1
}

// tickCoverage is the coverage score of Talbot, Lin and Hanrahan (2010),
// §4.2:
//
//	c = 1 − ½ [(dmax−lmax)² + (dmin−lmin)²] / (0.1 (dmax−dmin))²
func tickCoverage(dmin, dmax, lmin, lmax float64) float64 {
	r := 0.1 * (dmax - dmin)
	return 1 - 0.5*((dmax-lmax)*(dmax-lmax)+(dmin-lmin)*(dmin-lmin))/(r*r)
}

// tickCoverageMax bounds tickCoverage for labels spanning span: the best is
// a span centred on the data.
func tickCoverageMax(dmin, dmax, span float64) float64 {
	rng := dmax - dmin
	if span > rng {
		half := (span - rng) / 2
		r := 0.1 * rng
		return 1 - half*half/(r*r)
	}
	return 1
}

// tickDensity is the density score of Talbot, Lin and Hanrahan (2010),
// §4.3, with k labels against m wanted:
//
//	r = (k−1)/(lmax−lmin), rt = (m−1)/(max(lmax,dmax) − min(dmin,lmin))
//	d = 2 − max(r/rt, rt/r)
func tickDensity(k, m int, dmin, dmax, lmin, lmax float64) float64 {
	r := float64(k-1) / (lmax - lmin)
	rt := float64(m-1) / (math.Max(lmax, dmax) - math.Min(dmin, lmin))
	return 2 - math.Max(r/rt, rt/r)
}

// tickDensityMax bounds tickDensity for k labels against m wanted.
func tickDensityMax(k, m int) float64 {
	if k >= m {
		return 2 - float64(k-1)/float64(m-1)
	}
	return 1
}

// tickScore is the weighted sum of the four scores; legibility is taken as
// 1 for every candidate (the labels are all drawn in one face and size, and
// the format is chosen afterwards for the whole axis).
func tickScore(s, c, d float64) float64 {
	return tickWeights[0]*s + tickWeights[1]*c + tickWeights[2]*d + tickWeights[3]
}

// LinearTicks chooses about m tick labels for data in [dmin, dmax] by the
// extended Wilkinson algorithm of J. Talbot, S. Lin and P. Hanrahan, "An
// Extension of Wilkinson's Algorithm for Positioning Tick Labels on Axes",
// IEEE Trans. Visualization and Computer Graphics 16(6), 2010 (InfoVis),
// Algorithm 1. Steps are q·j·10^z with q from Q = [1, 5, 2, 2.5, 4, 3];
// the labels may fall inside the data range (the axis then runs to the
// data). A zero-width range is widened by 1 % (or by 1 at zero); m is at
// least 2. NaN or infinite bounds give Ticks{Count: 0}.
func LinearTicks(dmin, dmax float64, m int) Ticks {
	if !finite(dmin) || !finite(dmax) {
		return Ticks{Score: math.Inf(-1)}
	}
	if dmin > dmax {
		dmin, dmax = dmax, dmin
	}
	if dmax-dmin < 1e-12*math.Max(math.Abs(dmin), math.Abs(dmax)) || dmax == dmin {
		d := 0.01 * math.Abs(dmin)
		if d == 0 {
			d = 1
		}
		dmin, dmax = dmin-d, dmax+d
	}
	if m < 2 {
		m = 2
	}
	best := Ticks{Score: -2}
	for j := 1; j < 50; j++ {
		for qi, q := range tickQ {
			i := qi + 1
			sm := tickSimplicityMax(i, j)
			if tickScore(sm, 1, 1) < best.Score {
				j = 1000 // no larger skip can win either
				break
			}
			for k := 2; k < 100; k++ {
				dm := tickDensityMax(k, m)
				if tickScore(sm, 1, dm) < best.Score {
					break
				}
				delta := (dmax - dmin) / float64(k+1) / float64(j) / q
				for z := int(math.Ceil(math.Log10(delta))); z < 400; z++ {
					step := float64(j) * q * math.Pow(10, float64(z))
					cm := tickCoverageMax(dmin, dmax, step*float64(k-1))
					if tickScore(sm, cm, dm) < best.Score {
						break
					}
					minStart := int(math.Floor(dmax/step))*j - (k-1)*j
					maxStart := int(math.Ceil(dmin/step)) * j
					for start := minStart; start <= maxStart; start++ {
						lmin := float64(start) * (step / float64(j))
						lmax := lmin + step*float64(k-1)
						s := tickSimplicity(i, j, lmin, lmax, step)
						c := tickCoverage(dmin, dmax, lmin, lmax)
						d := tickDensity(k, m, dmin, dmax, lmin, lmax)
						if sc := tickScore(s, c, d); sc > best.Score {
							best = Ticks{Min: lmin, Max: lmax, Step: step, Count: k, Score: sc}
						}
					}
				}
			}
		}
	}
	return best
}

// LogTicks returns tick values for a log axis over [dmin, dmax] (both > 0):
// every decade, every second or third decade on wide spans, and 2 and 5
// within each decade (then 3, then every digit) when fewer than three
// labels would show. Only values within the range are returned; the axis
// runs from dmin to dmax. Non-positive or non-finite bounds give nil.
func LogTicks(dmin, dmax float64) []float64 {
	if !(dmin > 0) || !(dmax > 0) || !finite(dmin) || !finite(dmax) {
		return nil
	}
	if dmin > dmax {
		dmin, dmax = dmax, dmin
	}
	lo := math.Log10(dmin)
	hi := math.Log10(dmax)
	span := hi - lo
	// Decade steps: a linear tick search on the exponents, integer steps.
	dstep := 1
	if span > 6 {
		t := LinearTicks(lo, hi, 6)
		dstep = int(math.Max(1, math.Round(t.Step)))
	}
	var out []float64
	for _, mant := range logMantissas {
		out = logTicksWith(out[:0], dmin, dmax, mant, dstep)
		if len(out) >= 3 {
			break
		}
	}
	return out
}

// logMantissas are the tick sets tried within a decade, sparsest first.
var logMantissas = [][]float64{{1}, {1, 2, 5}, {1, 2, 3, 5}, {1, 2, 3, 4, 5, 6, 7, 8, 9}}

// logTicksWith appends m·10^z for z every dstep decades and m in mant, for
// the values within [dmin, dmax].
func logTicksWith(out []float64, dmin, dmax float64, mant []float64, dstep int) []float64 {
	const tol = 1e-9
	z0 := int(math.Floor(math.Log10(dmin)))
	z1 := int(math.Ceil(math.Log10(dmax)))
	z0 -= ((z0 % dstep) + dstep) % dstep
	for z := z0; z <= z1; z += dstep {
		p := math.Pow(10, float64(z))
		for _, m := range mant {
			v := m * p
			if v >= dmin*(1-tol) && v <= dmax*(1+tol) {
				out = append(out, v)
			}
		}
	}
	return out
}
