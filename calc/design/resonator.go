package design

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// errTooHigh marks a target frequency that even the shortest resonator
// cannot reach with the stack in place.
var errTooHigh = errors.New("design: the target frequency needs a resonator shorter than the shortest one")

// tune solves g.Resonator (m) so that the onset frequency of g is the
// target: solveLength (Brent's method) on
//
//	F(L) = f_onset(L) - f_target
//
// tol is the relative tolerance of the onset solves and, times the tube
// length, Brent's tolerance on L. It returns the onset at the answer.
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
	total := g.Length() - g.Resonator + math.Max(g.Resonator, lo)
	x, highest, err := solveLength(F, g.Resonator, lo, total, ft, tol)
	switch {
	case errors.Is(err, errShortest):
		sv.highest = math.Max(sv.highest, highest)
		return nil, errTooHigh
	case err != nil:
		lastErr := err
		if _, e := eval(math.Max(g.Resonator, lo)); e != nil {
			lastErr = e
		}
		return nil, lastErr
	}
	g.Resonator = x
	return eval(x)
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
