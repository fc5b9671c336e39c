package sheet

import (
	"tubewright/calc/pore"
)

// poresJudgement is the verdict on a pore geometry at the operating point,
// with the values that depend on the penetration depths and their ±.
type poresJudgement struct {
	verdict pore.Verdict
	// depthRows are δκ, δν, r_h/δκ, 2r_h/δκ, the target r_h and, for
	// fibres packed by mass, the target mass; sig and ok their ± and
	// whether it could be estimated.
	depthRows []float64
	sig       []float64
	ok        []bool
}

// poreDepthValues are the values of poresJudgement.depthRows for depths
// dk and dn (m).
func poreDepthValues(v *Values, g poreGeometry, role pore.Role, dk, dn float64) []float64 {
	rh := g.shape.HydraulicRadius()
	target := pore.RuleFor(role).Target * dk
	out := []float64{dk, dn, rh / dk, 2 * rh / dk, target}
	if g.byMass {
		// same fibre, same volume: the mass scales with the solid fraction
		out = append(out, v.SI("packed-mass")*pore.SolidFractionFor(g.fibre, target)/g.solid)
	}
	return out
}

// judgePores judges the geometry for the role at the operating point and
// carries the operating point's ± to the depth-dependent values.
func judgePores(v *Values, g poreGeometry, op *operatingPoint) (poresJudgement, error) {
	role := v.Pick("role").(pore.Role)
	verdict, err := pore.Judge(g.shape, role, op.DK)
	if err != nil {
		return poresJudgement{}, v.Blame(err, "frequency")
	}
	j := poresJudgement{verdict: verdict, depthRows: poreDepthValues(v, g, role, op.DK, op.DN)}
	j.sig, j.ok = Spread(func(x, out []float64) error {
		_, dk, dn, err := op.at(x)
		copy(out, poreDepthValues(v, g, role, dk, dn))
		return err
	}, op.x(), op.u(), len(j.depthRows))
	return j, nil
}
