package design

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/linear"
	"tubewright/calc/numeric"
	"tubewright/calc/units"
)

// errTooHigh marks a target frequency that even the shortest resonator
// cannot reach with the stack in place.
var errTooHigh = errors.New("design: the target frequency needs a resonator shorter than the shortest one")

// tune solves g.Resonator (m) so that the onset frequency of g is the
// target, by Brent's method (numeric.Brent) on
//
//	F(L) = f_onset(L) - f_target
//
// bracketed around the secant estimate L' = L + L_total (f_onset/f_target - 1)
// (the frequency of a tube goes as one over its length) and widened three
// times per step until F changes sign. tol is the relative tolerance of
// the onset solves and, times the tube length, Brent's tolerance on L.
// It returns the onset at the answer.
func (sv *solver) tune(g *Geometry, tol float64) (*linear.OnsetResult, error) {
	ft := sv.t.Frequency
	lo := minResonator(sv.t)
	type point struct {
		r   *linear.OnsetResult
		err error
	}
	cache := map[float64]point{}
	eval := func(lr float64) (*linear.OnsetResult, error) {
		if p, ok := cache[lr]; ok {
			return p.r, p.err
		}
		gg := *g
		gg.Resonator = lr
		r, err := sv.onset(gg, tol)
		cache[lr] = point{r, err}
		return r, err
	}
	F := func(lr float64) float64 {
		r, err := eval(lr)
		if err != nil {
			return math.NaN()
		}
		return r.Frequency - ft
	}
	lr0 := math.Max(g.Resonator, lo)
	f0 := F(lr0)
	if math.IsNaN(f0) {
		_, err := eval(lr0)
		return nil, err
	}
	rest := g.Length() - g.Resonator
	total := rest + lr0
	lr1 := math.Max(lr0+total*f0/ft, lo)
	delta := 0.002*total + 1e-4
	a, b := math.Max(lr1-delta, lo), lr1+delta
	fa, fb := F(a), F(b)
	for i := 0; !(fa*fb <= 0); i++ {
		if math.IsNaN(fa) || math.IsNaN(fb) || i >= 10 {
			return nil, fmt.Errorf("%w: the resonator length that gives %s could not be bracketed", errSolve, units.Format(ft, units.DimFrequency))
		}
		delta *= 3
		if fa > 0 { // both too high: longer
			a, fa = b, fb
			b += delta
			fb = F(b)
			continue
		}
		if a == lo { // both too low even at the shortest resonator
			sv.highest = math.Max(sv.highest, fa+ft)
			return nil, errTooHigh
		}
		b, fb = a, fa
		a = math.Max(a-delta, lo)
		fa = F(a)
	}
	rr, err := numeric.Brent(F, a, b, &numeric.RootSettings{AbsTol: math.Max(tol*total, 1e-9), MaxIterations: 60})
	if err != nil {
		return nil, fmt.Errorf("%w: resonator length: %v", errSolve, err)
	}
	g.Resonator = rr.X
	return eval(rr.X)
}

// tooLong returns the error for a design longer than the longest tube,
// with the nearest design: the same stack and exchangers with the
// resonator cut so that the whole tube is the longest allowed.
func (sv *solver) tooLong(res *Result) error {
	t := sv.t
	need := res.Geometry.Length()
	near := *res
	near.Warnings = nil
	near.Geometry.Resonator = t.MaxLength - (need - res.Geometry.Resonator)
	if near.Geometry.Resonator < minResonator(t) {
		return &UnreachableError{Nearest: *res, Problem: fmt.Sprintf("the target needs a %s tube; the stack, exchangers and hot space alone are longer than the longest tube %s", units.Format(need, units.DimLength), units.Format(t.MaxLength, units.DimLength))}
	}
	if err := sv.write(&near); err != nil {
		return &UnreachableError{Nearest: *res, Problem: fmt.Sprintf("the target needs a %s tube, longer than the longest %s; cut to that length the design does not solve (%v)", units.Format(need, units.DimLength), units.Format(t.MaxLength, units.DimLength), err)}
	}
	return &UnreachableError{Nearest: near, Problem: fmt.Sprintf(
		"the target needs a %s tube, longer than the longest %s; cut to the longest tube the design sings at %s with onset at %s (the nearest design, returned)",
		units.Format(need, units.DimLength), units.Format(t.MaxLength, units.DimLength),
		units.Format(near.Onset.Frequency, units.DimFrequency), units.Format(near.Onset.HotTemperature, units.DimTemperature))}
}
