package pore

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// Role is what the porous part is for.
type Role int

const (
	// RoleStack is a standing-wave stack: pores about a thermal penetration
	// depth wide, so the gas exchanges heat with a phase lag.
	RoleStack Role = iota
	// RoleRegenerator is a travelling-wave regenerator: pores much narrower
	// than the thermal penetration depth, so the gas follows the solid's
	// temperature.
	RoleRegenerator
)

// String names the role for people.
func (r Role) String() string {
	if r == RoleRegenerator {
		return "regenerator"
	}
	return "stack"
}

// ParseRole reads "stack" or "regenerator" (also "regen").
func ParseRole(s string) (Role, error) {
	switch s {
	case "stack", "":
		return RoleStack, nil
	case "regenerator", "regen":
		return RoleRegenerator, nil
	}
	return RoleStack, fmt.Errorf("role %q is not known; use stack or regenerator", s)
}

// Call is the plain-words judgement of a pore size.
type Call int

// The three calls.
const (
	TooTight Call = iota - 1
	AboutRight
	TooOpen
)

// String is "too tight", "about right" or "too open".
func (c Call) String() string {
	switch c {
	case TooTight:
		return "too tight"
	case TooOpen:
		return "too open"
	}
	return "about right"
}

// Rule is a rule of thumb for r_h/δκ with where it comes from.
type Rule struct {
	Low, High, Target float64 // band and aim of r_h/δκ
	Text              string  // the rule in words, with its source
}

// RuleFor returns the rule of thumb used for a role.
//
// Stack: common practice, no published source: half gap (r_h of plates)
// about 1–2 δκ, full plate spacing 2–4 δκ. M. E. H. Tijani, J. C. H. Zeegers
// and A. T. A. M. de Waele, "The optimal stack spacing for thermoacoustic
// refrigeration", J. Acoust. Soc. Am. 112, 128 (2002), abstract (read on
// the Eindhoven University of Technology research portal; the first page,
// 128, is from memory): parallel-plate stacks with spacings 0.15–0.7 mm; a
// spacing of 0.25 mm (2.5 δκ) gave the most cooling power, 0.4 mm (4 δκ)
// the lowest temperature, and about 0.3 mm (3 δκ) is concluded optimal. The aim is
// r_h = 1.5 δκ, i.e. a 3 δκ plate spacing.
//
// Regenerator: common practice, no published source: r_h about 0.1–0.3 δκ,
// aim 0.2 δκ.
func RuleFor(role Role) Rule {
	if role == RoleRegenerator {
		return Rule{0.1, 0.3, 0.2,
			"regenerator: hydraulic radius about 0.1–0.3 δκ (common practice, no published source)"}
	}
	return Rule{1, 2, 1.5,
		"stack: half gap or hydraulic radius about 1–2 δκ, plate spacing 2–4 δκ (common practice, no published source); " +
			"Tijani, Zeegers & de Waele, JASA 112, 128 (2002): plate spacing about 3 δκ optimal for a refrigerator, 2.5 δκ most cooling power, 4 δκ lowest temperature"}
}

// Verdict is the judgement of a pore for a role at one δκ.
type Verdict struct {
	Role             Role
	Call             Call
	RhOverDelta      float64 // r_h / δκ
	SpacingOverDelta float64 // 2 r_h / δκ: the plate spacing of plates, the equivalent plate spacing otherwise
	Rule             Rule
	TargetRh         float64 // r_h that hits the aim of the rule, m
	Words            string  // the judgement in plain words
	Suggestion       string  // what geometry would hit the aim, in plain words
}

// Judge compares the hydraulic radius of s with the thermal penetration
// depth deltaKappa (m) for the role and says in plain words what would hit
// the rule's aim. Errors: deltaKappa not positive and finite.
func Judge(s Shape, role Role, deltaKappa float64) (Verdict, error) {
	if badDelta(deltaKappa) {
		return Verdict{}, units.NewRangeError("thermal penetration depth", deltaKappa, 0, math.Inf(1), "m")
	}
	rule := RuleFor(role)
	rh := s.HydraulicRadius()
	x := rh / deltaKappa
	v := Verdict{Role: role, RhOverDelta: x, SpacingOverDelta: 2 * x, Rule: rule, TargetRh: rule.Target * deltaKappa}
	switch {
	case x < rule.Low:
		v.Call = TooTight
	case x > rule.High:
		v.Call = TooOpen
	}
	v.Words = words(v)
	v.Suggestion = suggest(s, v.TargetRh)
	return v, nil
}

// words phrases the verdict.
func words(v Verdict) string {
	band := units.Number(v.Rule.Low, 3) + "–" + units.Number(v.Rule.High, 3) + " δκ"
	head := fmt.Sprintf("%s for a %s: the hydraulic radius is %s δκ, the usual range is %s.", capital(v.Call.String()), v.Role, units.Number(v.RhOverDelta, 3), band)
	switch {
	case v.Role == RoleStack && v.Call == TooTight:
		return head + " The gas is held close to the wall's temperature, so little heat is pumped per cycle and viscous loss grows."
	case v.Role == RoleStack && v.Call == TooOpen:
		return head + " Much of the gas lies farther than a penetration depth from any wall and takes no part in the heat exchange."
	case v.Role == RoleRegenerator && v.Call == TooTight:
		return head + " Thermal contact is already excellent; tighter pores only add flow resistance."
	case v.Role == RoleRegenerator && v.Call == TooOpen:
		return head + " The gas is not in good thermal contact with the solid; a regenerator this open behaves partly like a stack and loses efficiency."
	}
	return head + " This is within the usual range."
}

func capital(s string) string {
	if s == "" {
		return s
	}
	return string(s[0]-'a'+'A') + s[1:]
}

// suggest says what geometry of the same kind has hydraulic radius t.
func suggest(s Shape, t float64) string {
	aim := "To aim for r_h = " + mm(t)
	switch p := s.(type) {
	case *plates:
		return aim + ": plates with gap 2y0 = " + mm(2*t) + " (half gap y0 = " + mm(t) + "), keeping the plate thickness " + mm(2*p.half) + "."
	case *circular:
		return aim + ": pore diameter " + mm(4*t) + " (radius " + mm(2*t) + ")."
	case *rectangular:
		k := t / p.HydraulicRadius()
		return aim + ": channels " + mm(2*p.a*k) + " × " + mm(2*p.b*k) + " (same aspect ratio)."
	case *honeycomb:
		return aim + ": open cell side " + mm(4*t) + "; with walls " + mm(p.wall) + " that is about " +
			trimFloat(0.0254*0.0254*cellsFor(p.wall, t)) + " cells/in²."
	case *pins:
		return aim + ": pin pitch " + mm(pinPitchFor(p.ri, t)) + " for the same pin diameter " + mm(2*p.ri) + "."
	case *matrix:
		return aim + ": " + matrixSuggestion(p, t)
	case *boundary:
		return aim + ": a channel of hydraulic radius " + mm(t) + "."
	}
	return aim + "."
}

// matrixSuggestion handles screens and fibres, which share a type; the
// description tells them apart, and the wire/fibre diameter is recovered
// from r_h and φ (d = 4 r_h (1-φ)/φ).
func matrixSuggestion(p *matrix, t float64) string {
	d := 4 * p.rh * (1 - p.phi) / p.phi
	phi := 1 - SolidFractionFor(d, t)
	if len(p.desc) >= 6 && p.desc[:6] == "woven " {
		m := meshFor(d, t)
		if m*d >= 1 {
			return "no woven screen of this wire can be that tight; use a finer wire."
		}
		return "with the same wire " + mm(d) + ", about " + trimFloat(m*0.0254) + " mesh per inch (" +
			trimFloat(m/1000) + " per mm), porosity " + pct(phi) + "."
	}
	return "with the same fibre " + mm(d) + ", solid fraction " + pct(1-phi) + " (porosity " + pct(phi) +
		"); packed mass = solid fraction × material density × packed volume."
}

// solidFractionFor returns the solid fraction of fibres (or screens) of
// diameter d with hydraulic radius t: from r_h = (1-s)d/(4s), s = d/(d+4t).
func SolidFractionFor(d, t float64) float64 { return d / (d + 4*t) }

// meshFor returns the mesh count (1/m) of stacked screens of wire d with
// hydraulic radius t: 1-φ = π m d/4 with φ = 4t/(d+4t).
func meshFor(d, t float64) float64 { return 4 * SolidFractionFor(d, t) / (math.Pi * d) }

// pinPitchFor returns the hexagonal pitch for pins of radius ri with
// hydraulic radius t: r_o² = r_i² + 2 r_i t, pitch = r_o/√(√3/(2π)).
func pinPitchFor(ri, t float64) float64 { return math.Sqrt(ri*ri+2*ri*t) / hexCell }

// cellsFor returns the cell density (1/m²) of a square honeycomb with walls
// w and hydraulic radius t: side 4t, pitch 4t + w.
func cellsFor(w, t float64) float64 {
	p := 4*t + w
	return 1 / (p * p)
}
