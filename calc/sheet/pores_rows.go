package sheet

import (
	"fmt"

	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// Outcomes of the pore verdict: about right passes, too tight or too open
// asks for a check.
var poreOutcomes = map[pore.Call]Outcome{pore.AboutRight: Pass, pore.TooTight: Warn, pore.TooOpen: Warn}

// poresRows adds the rows of the pores calculator in order.
func poresRows(r *Result, v *Values, g poreGeometry, op *operatingPoint, j poresJudgement) {
	s, verdict := g.shape, j.verdict
	if d, ok := s.(pore.Named); ok {
		r.DeriveWords("geometry", "Geometry", d.Describe())
	}
	if v.Pick("shape").(PoreShape) == ShapeFibres {
		r.Add("solid_fraction", "Solid fraction", g.solid, units.DimNone)
	}
	r.Add("porosity", "Porosity", s.Porosity(), units.DimNone)
	r.Add("hydraulic_radius", "Hydraulic radius r_h", s.HydraulicRadius(), units.DimLength).Show = "mm"
	depth := func(k int, key, label, show string) {
		if !j.ok[k] {
			r.Warn(noSpreadWarning(key))
		}
		r.AddPM(key, label, j.depthRows[k], j.sig[k], dimOfDepthRow(k)).Show = show
	}
	depth(0, "thermal_penetration_depth", "Thermal penetration depth δκ", "mm")
	depth(1, "viscous_penetration_depth", "Viscous penetration depth δν", "mm")
	r.AddComplex("f_kappa", "Rott's fκ", s.F(op.DK))
	r.AddComplex("f_nu", "Rott's fν", s.F(op.DN)).Note = "time dependence e^(+iωt), as in Swift 2002: Im f < 0"
	depth(2, "hydraulic_radius_over_thermal_depth", "Hydraulic radius / δκ", "")
	depth(3, "spacing_over_thermal_depth", "Equivalent plate spacing / δκ (2 r_h/δκ)", "")
	r.Check("verdict", "Verdict for a "+verdict.Role.String(), verdict.Call.String(), poreOutcomes[verdict.Call],
		fmt.Sprintf("the hydraulic radius is %s δκ; the usual range for a %s is %s–%s δκ",
			units.Number(verdict.RhOverDelta, 3), verdict.Role, units.Number(verdict.Rule.Low, 3), units.Number(verdict.Rule.High, 3)))
	r.AddWords("explanation", "What it means", verdict.Words)
	r.AddWords("rule_of_thumb", "Rule of thumb", verdict.Rule.Text)
	depth(4, "target_hydraulic_radius", "Hydraulic radius for the aim", "mm")
	r.AddWords("suggestion", "What would hit the aim", verdict.Suggestion)
	if g.byMass {
		depth(5, "target_packed_mass", "Packed mass for the aim, same volume", "g")
	}
}

// dimOfDepthRow is the dimension of poresJudgement.depthRows[k].
func dimOfDepthRow(k int) units.Dimension {
	switch k {
	case 2, 3:
		return units.DimNone
	case 5:
		return units.DimMass
	}
	return units.DimLength
}

// poresWarnings adds the warnings on the model used for the shape.
func poresWarnings(r *Result, shape PoreShape, j poresJudgement) {
	switch shape {
	case ShapeScreens, ShapeFibres:
		r.Warn("fκ and fν of screens and fibres are those of a round pore with the same hydraulic radius, an approximation")
	case ShapeCircular, ShapeRectangular, ShapeWide:
		r.Warn("porosity is that of the open channel alone (1): the solid between channels is not part of these inputs")
	}
	if shape == ShapeWide && j.verdict.RhOverDelta < wideChannelMinRh {
		r.Warn("the wide-channel (boundary-layer) limit is poor for a hydraulic radius below a few δκ; choose the real shape")
	}
}

// wideChannelMinRh is the r_h/δκ below which the boundary-layer limit is
// poor (common practice, no published source: the limit's f is within a
// few per cent of the exact ones from about 3 δκ).
const wideChannelMinRh = 3

// materialNote lists the packing materials with their densities.
func materialNote() string {
	out := ""
	for i, m := range pore.Materials() {
		if i > 0 {
			out += ", "
		}
		out += m.Label + " " + units.Format(m.Density, units.DimDensity)
	}
	return out + " (nominal handbook values, from memory)"
}
