package sheet

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/units"
)

// The shell of the vessel check is given by any two of its inside size,
// its outside diameter and its wall, the way a pipe is specified: inside
// and outside diameter, or either with the wall. The inside size is a
// diameter, or a radius (the key scripts used first). The third size is
// worked out and shown.

// shellInputs are the vessel's shell inputs, in the order shown.
func shellInputs() []Input {
	return []Input{
		{Key: "inside-diameter", Label: "Inside diameter", Kind: Quantity, Dim: units.DimLength, Example: "100 mm", Optional: true, PM: true,
			Hint: "bore of the shell, e.g. 100 mm, 4 in (or give inner-radius); give two of inside, outside and wall; ± or +- for an uncertainty",
			Min:  2e-4, Max: 2e3},
		{Key: "inner-radius", Label: "Inner radius", Kind: Quantity, Dim: units.DimLength, Optional: true, PM: true,
			Hint: "inside radius of the shell, e.g. 50 mm, 2 in (or give inside-diameter); ± or +- for an uncertainty", Min: 1e-4, Max: 1e3},
		{Key: "outside-diameter", Label: "Outside diameter", Kind: Quantity, Dim: units.DimLength, Optional: true, PM: true,
			Hint: "outside of the shell, e.g. 112 mm, 4.5 in; with the inside size or the wall; ± or +- for an uncertainty", Min: 2e-4, Max: 2e3},
		{Key: "wall-thickness", Label: "Wall thickness", Kind: Quantity, Dim: units.DimLength, Example: "6 mm", Optional: true, PM: true,
			Hint: "the thinnest wall, e.g. 6 mm, 0.25 in; ± or +- for an uncertainty", Min: 1e-5, Max: 1e3},
	}
}

// shellFrom says which two sizes the shell was given by.
type shellFrom int

// The pairs a shell is given by.
const (
	boreAndWall shellFrom = iota
	boreAndOutside
	outsideAndWall
)

// shellGeometry is the shell as read: the two sizes given (SI, with their
// standard uncertainties), how to turn them into the inner radius and the
// wall, and the keys to blame for each.
type shellGeometry struct {
	from       shellFrom
	a, b       float64 // the two sizes: bore radius or outside diameter, then wall or outside diameter
	ua, ub     float64
	boreKey    string // "inside-diameter" or "inner-radius"
	radiusKeys map[string]string
}

// radiusAndWall returns the inner radius and the wall (m) from the two
// sizes a and b.
func (g shellGeometry) radiusAndWall(a, b float64) (ri, t float64) {
	switch g.from {
	case boreAndOutside:
		return a, b/2 - a
	case outsideAndWall:
		return a/2 - b, b
	}
	return a, b
}

// readShell reads the shell from any two of the inside size, the outside
// diameter and the wall. All three may be given when they agree (to 1e-6
// of the outside diameter); an inside diameter and an inner radius together
// are refused, and so is an outside diameter not larger than the bore.
func readShell(v *Values) (shellGeometry, error) {
	g := shellGeometry{boreKey: "inner-radius"}
	var bore units.Quantity
	switch d, r := v.Has("inside-diameter"), v.Has("inner-radius"); {
	case d && r:
		return g, v.Blame(errors.New("give either the inside diameter or the inner radius, not both"), "inner-radius")
	case d:
		g.boreKey = "inside-diameter"
		q := v.Q("inside-diameter")
		bore = units.Quantity{Value: q.Value / 2, Uncertainty: q.Uncertainty / 2}
	case r:
		bore = v.Q("inner-radius")
	}
	hasBore, hasOut, hasWall := v.Has(g.boreKey), v.Has("outside-diameter"), v.Has("wall-thickness")
	out, wall := v.Q("outside-diameter"), v.Q("wall-thickness")
	switch {
	case hasBore && hasOut && hasWall:
		want := 2 * (bore.Value + wall.Value)
		if math.Abs(out.Value-want) > 1e-6*want {
			return g, v.Blame(fmt.Errorf("does not match the inside diameter %s plus twice the wall %s = %s; give two of the three",
				mm(2*bore.Value), mm(wall.Value), mm(want)), "outside-diameter")
		}
		g.from, g.a, g.b, g.ua, g.ub = boreAndWall, bore.Value, wall.Value, bore.Uncertainty, wall.Uncertainty
	case hasBore && hasWall:
		g.from, g.a, g.b, g.ua, g.ub = boreAndWall, bore.Value, wall.Value, bore.Uncertainty, wall.Uncertainty
	case hasBore && hasOut:
		g.from, g.a, g.b, g.ua, g.ub = boreAndOutside, bore.Value, out.Value, bore.Uncertainty, out.Uncertainty
		if out.Value <= 2*bore.Value {
			return g, v.Blame(fmt.Errorf("is not larger than the inside diameter %s: no wall is left", mm(2*bore.Value)), "outside-diameter")
		}
	case hasOut && hasWall:
		g.from, g.a, g.b, g.ua, g.ub = outsideAndWall, out.Value, wall.Value, out.Uncertainty, wall.Uncertainty
		if out.Value <= 2*wall.Value {
			return g, v.Blame(fmt.Errorf("is at least half the outside diameter %s: no bore is left", mm(out.Value)), "wall-thickness")
		}
	default:
		missing := "wall-thickness"
		switch {
		case !hasBore && !hasOut:
			missing = "inside-diameter"
		case !hasBore && !hasWall:
			missing = "inside-diameter"
		}
		in := v.Get(missing).In
		return g, &FieldError{Key: missing, Label: in.Label,
			Err: fmt.Errorf("%w: give two of the inside diameter (or inner radius), the outside diameter and the wall thickness", ErrRequired)}
	}
	// calc/safety names the inner radius and the wall; blame what was typed.
	g.radiusKeys = map[string]string{"inner radius": g.boreKey, "wall thickness": "wall-thickness"}
	switch g.from {
	case boreAndOutside:
		g.radiusKeys["wall thickness"] = "outside-diameter"
	case outsideAndWall:
		g.radiusKeys["inner radius"] = "outside-diameter"
	}
	return g, nil
}

// shellRows are the three sizes of the shell, shown whatever two were
// given, in the order of shellSizes.
var shellRows = []struct{ key, label string }{
	{"inside_diameter", "Inside diameter"},
	{"outside_diameter", "Outside diameter"},
	{"wall_thickness", "Wall thickness"},
}

// shellSizes returns the inside diameter, the outside diameter and the
// wall (m) of inner radius ri and wall t.
func shellSizes(ri, t float64) []float64 { return []float64{2 * ri, 2 * (ri + t), t} }
