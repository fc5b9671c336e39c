package safety

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/units"
)

// CodeFamily is the pressure-equipment code the user chose to compare with.
// Only the ASME family has formulas here; for the others the result names
// the reference and computes nothing, rather than guess at their rules.
type CodeFamily int

const (
	// FamilyASME is ASME BPVC Section VIII Division 1.
	FamilyASME CodeFamily = iota
	// FamilyEU is the EU Pressure Equipment Directive 2014/68/EU with its
	// harmonised standards (EN 13445 for unfired pressure vessels).
	FamilyEU
	// FamilyOther is any other national code.
	FamilyOther
)

// Families lists the code families in the order screens offer them.
var Families = []CodeFamily{FamilyASME, FamilyEU, FamilyOther}

// Label is the family's name as shown to users.
func (f CodeFamily) Label() string {
	switch f {
	case FamilyASME:
		return "ASME BPVC Section VIII Div. 1"
	case FamilyEU:
		return "EU Pressure Equipment Directive 2014/68/EU"
	case FamilyOther:
		return "Other national code"
	}
	return fmt.Sprintf("CodeFamily(%d)", int(f))
}

// ShellReference says where the wall-thickness rule of a family is found,
// for families without formulas here.
func (f CodeFamily) ShellReference() string {
	switch f {
	case FamilyASME:
		return "ASME BPVC Section VIII Division 1, UG-27(c) and Mandatory Appendix 1-2"
	case FamilyEU:
		return "EN 13445-3 (unfired pressure vessels, design), the cylindrical-shell clause; not computed here: use the standard's text"
	}
	return "the cylindrical-shell rule of the code that applies where the rig is used; not computed here"
}

// ShellInput describes a cylindrical shell for the code formulas.
type ShellInput struct {
	Pressure        GaugePressure // design (internal, gauge) pressure P, Pa
	InnerRadius     float64       // inside radius R, new, m
	Wall            float64       // nominal wall thickness t, m (for the MAWP)
	Allowable       float64       // maximum allowable stress S at the design temperature, Pa
	JointEfficiency float64       // E, 0 < E ≤ 1 (1 for seamless tube)
	Corrosion       float64       // corrosion allowance c, m (0 for none)
}

// Shell is the result of the ASME UG-27 cylindrical shell formulas.
type Shell struct {
	Family CodeFamily // the family the user picked; always FamilyASME here
	// MinThickness is the required thickness for Pressure including the
	// corrosion allowance: the greater of the circumferential and
	// longitudinal requirements plus c, m.
	MinThickness      float64
	ThicknessCircum   float64 // UG-27(c)(1) or 1-2(a)(1), without c, m
	ThicknessLong     float64 // UG-27(c)(2) or 1-2(a)(2), without c, m
	ClauseThickCircum string  // which formula gave ThicknessCircum
	ClauseThickLong   string  // which formula gave ThicknessLong
	MAWP              GaugePressure
	MAWPCircum        GaugePressure // from the circumferential stress, Pa
	MAWPLong          GaugePressure // from the longitudinal stress, Pa
	ClauseMAWPCircum  string
	ClauseMAWPLong    string
	WallEnough        bool // Wall ≥ MinThickness
	// NoWall is true when no wall thickness can hold Pressure at the
	// allowable stress (Pressure ≥ S·E; ASMEShell then also returns an
	// error matching ErrNoWall). The thickness fields are then zero and
	// mean nothing; the MAWP of a given wall is still computed.
	NoWall   bool
	Warnings []string
	Cautions []string
}

// Clause names used in Shell.
const (
	ClauseUG27c1 = "UG-27(c)(1)"
	ClauseUG27c2 = "UG-27(c)(2)"
	Clause1_2a1  = "Appendix 1-2(a)(1)"
	Clause1_2a2  = "Appendix 1-2(a)(2)"
)

// ASMEShell applies ASME BPVC Section VIII Division 1, UG-27(c), to a
// cylindrical shell under internal pressure, with R and t in the corroded
// condition (R = ri + c, t = wall − c):
//
//	(c)(1) circumferential stress (longitudinal joints):
//	       t = P R / (S E − 0.6 P),      P = S E t / (R + 0.6 t)
//	       when t ≤ R/2 and P ≤ 0.385 S E
//	(c)(2) longitudinal stress (circumferential joints):
//	       t = P R / (2 S E + 0.4 P),    P = 2 S E t / (R − 0.4 t)
//	       when t ≤ R/2 and P ≤ 1.25 S E
//
// Outside those limits it uses the thick-shell formulas of Mandatory
// Appendix 1-2(a), in the logarithmic form of recent editions:
//
//	(1) t = R (exp(P/(S E)) − 1),      P = S E ln((R + t)/R)
//	(2) t = R (√Z − 1), Z = P/(S E) + 1;   P = S E (Z − 1), Z = ((R + t)/R)²
//
// The required thickness is the greater of the two, plus c; the MAWP is the
// lesser. One joint efficiency is used for both joints. Units: Pa and m.
// Sources: ASME BPVC Section VIII Division 1, UG-27(c)(1) and (c)(2)
// (formulas as reproduced in the table "General Vessel Formulas" of the
// 1983 edition, and with their limits P ≤ 0.385 S E and P ≤ 1.25 S E on
// engineersedge.com, "Thin Wall Pressure Vessels ASME Equation"); Mandatory
// Appendix 1, 1-2(a)(1) and (a)(2), formulas (1) to (4) and the rule that
// they apply "when the thickness ... exceeds one-half of the inside radius,
// or when P exceeds 0.385SE" (1.25SE for (a)(2)), as reproduced from a
// recent edition (scribd.com document 217723344, "Mandatory Appendices").
// Earlier editions wrote 1-2(a)(1) as t = R(√Z − 1), Z = (S E + P)/(S E − P)
// (from memory); the two differ by well under 1 % where 1-2 applies at
// ordinary pressures.
//
// Between P = 0.385 S E and S E ln 1.5 ≈ 0.405 S E the two sets overlap:
// Appendix 1-2 gives a thickness under R/2 for which UG-27 gives a MAWP
// below P. Both are reported as the code writes them.
//
// When a wall is given, a warning reminds that it must be the thinnest
// wall: pipe ordered by nominal wall may be supplied 12.5 % thinner
// (UG-16(d) and the pipe specifications, as explained in "ASME UG-16 plate
// vs pipe tolerance calculations for shell thickness",
// industrialmonitordirect.com).
//
// No wall at all: when P ≥ S E no thickness keeps the hoop stress within
// the allowable stress. By Lamé's solution the hoop stress at the bore,
// P (ro² + ri²)/(ro² − ri²), exceeds P for every finite wall (see
// ThickWallStress), and the earlier editions' 1-2(a)(1) formula
// t = R(√Z − 1), Z = (S E + P)/(S E − P), has no solution there; the
// logarithmic form would return an ever thicker wall (1.3e42 m for
// P = 100 S E and R = 50 mm). ASMEShell then returns a *NoWallError
// (matching ErrNoWall) together with a Shell whose NoWall is set, whose
// thickness fields are zero and whose MAWP fields are those of the given
// wall, if any.
//
// Errors: P < 0, R ≤ 0, S ≤ 0, E outside (0, 1], c < 0 and wall ≤ c (when
// a wall is given) are *units.RangeError. Wall = 0 means "no wall given": the MAWP
// fields are then zero.
func ASMEShell(in ShellInput) (Shell, error) {
	if err := gaugeInput(in.Pressure); err != nil {
		return Shell{}, err
	}
	if err := positive("inner radius", in.InnerRadius, "m"); err != nil {
		return Shell{}, err
	}
	if err := positive("allowable stress", in.Allowable, "Pa"); err != nil {
		return Shell{}, err
	}
	if E := in.JointEfficiency; !finite(E) || E <= 0 || E > 1 {
		// (0, 1] is half open: say the bound that was crossed.
		e := units.NewRangeError("joint efficiency", E, 0, math.Inf(1), "")
		if E > 1 {
			e = units.NewRangeError("joint efficiency", E, math.Inf(-1), 1, "")
		}
		e.Why = "1 for seamless tube, less for welded seams (UW-12)"
		return Shell{}, e
	}
	if err := nonNegative("corrosion allowance", in.Corrosion, "m"); err != nil {
		return Shell{}, err
	}
	if err := nonNegative("wall thickness", in.Wall, "m"); err != nil {
		return Shell{}, err
	}
	if in.Wall > 0 && in.Wall <= in.Corrosion {
		e := units.NewRangeError("wall thickness", in.Wall, in.Corrosion, math.Inf(1), "m")
		e.Why = "the corrosion allowance"
		return Shell{}, e
	}
	SE := in.Allowable * in.JointEfficiency
	P := float64(in.Pressure)
	R := in.InnerRadius + in.Corrosion
	s := Shell{Family: FamilyASME, Cautions: cautions(CautionStress)}

	// Required thickness.
	var noWall error
	if P >= SE {
		s.NoWall = true
		noWall = &NoWallError{Pressure: in.Pressure, Stress: SE}
		s.Warnings = append(s.Warnings, noWall.Error())
	} else {
		s.ThicknessCircum, s.ClauseThickCircum = thicknessCircum(P, R, SE)
		s.ThicknessLong, s.ClauseThickLong = thicknessLong(P, R, SE)
		s.MinThickness = math.Max(s.ThicknessCircum, s.ThicknessLong) + in.Corrosion
	}

	// MAWP of the given wall.
	if in.Wall > 0 {
		t := in.Wall - in.Corrosion
		pc, cc := mawpCircum(t, R, SE)
		pl, cl := mawpLong(t, R, SE)
		s.MAWPCircum, s.ClauseMAWPCircum = GaugePressure(pc), cc
		s.MAWPLong, s.ClauseMAWPLong = GaugePressure(pl), cl
		s.MAWP = GaugePressure(math.Min(pc, pl))
		s.WallEnough = !s.NoWall && in.Wall >= s.MinThickness
		s.Warnings = append(s.Warnings, "the MAWP is for the wall as entered: enter the thinnest wall, not the nominal one; pipe ordered by nominal wall may be 12.5 % thinner (UG-16(d))")
		if !s.WallEnough && !s.NoWall {
			s.Warnings = append(s.Warnings, "the wall is thinner than the required "+units.FormatDigits(s.MinThickness, units.DimLength, 4))
		}
	}
	if s.ClauseThickCircum == Clause1_2a1 || s.ClauseMAWPCircum == Clause1_2a1 {
		s.Warnings = append(s.Warnings, "thick shell: the Appendix 1-2 formulas were used, outside the UG-27 limits (t ≤ R/2, P ≤ 0.385 S E)")
	}
	return s, noWall
}

// ErrNoWall is matched (errors.Is) by the *NoWallError of ASMEShell.
var ErrNoWall = errors.New("no wall thickness can hold this pressure at this allowable stress")

// NoWallError says that no wall of any thickness holds the pressure at the
// allowable stress: the pressure is at or above S·E (see ASMEShell).
type NoWallError struct {
	Pressure GaugePressure // the design pressure, Pa gauge
	Stress   float64       // S·E, Pa
}

// Error names both values and what would help.
func (e *NoWallError) Error() string {
	return fmt.Sprintf("no wall can hold %s (gauge) at an allowable stress of %s (S·E): the pressure must be below S·E whatever the thickness; choose a stronger material, lower the pressure or have the vessel designed by a qualified engineer",
		formatIn(float64(e.Pressure), "bar"), formatIn(e.Stress, "MPa"))
}

// formatIn formats v (SI) in unit, falling back to the SI form.
func formatIn(v float64, unit string) string {
	if s, err := units.FormatIn(v, unit); err == nil {
		return s
	}
	return units.Format(v, units.DimPressure)
}

// Is lets errors.Is(err, ErrNoWall) match.
func (e *NoWallError) Is(target error) bool { return target == ErrNoWall }

// thicknessCircum is UG-27(c)(1), or 1-2(a)(1) beyond its limits.
func thicknessCircum(P, R, SE float64) (float64, string) {
	if P <= 0.385*SE {
		t := P * R / (SE - 0.6*P)
		if t <= R/2 {
			return t, ClauseUG27c1
		}
	}
	return R * math.Expm1(P/SE), Clause1_2a1
}

// thicknessLong is UG-27(c)(2), or 1-2(a)(2) beyond its limits.
func thicknessLong(P, R, SE float64) (float64, string) {
	if P <= 1.25*SE {
		t := P * R / (2*SE + 0.4*P)
		if t <= R/2 {
			return t, ClauseUG27c2
		}
	}
	return R * (math.Sqrt(P/SE+1) - 1), Clause1_2a2
}

// mawpCircum is UG-27(c)(1), or 1-2(a)(1) beyond its limits.
func mawpCircum(t, R, SE float64) (float64, string) {
	if t <= R/2 {
		P := SE * t / (R + 0.6*t)
		if P <= 0.385*SE {
			return P, ClauseUG27c1
		}
	}
	return SE * math.Log1p(t/R), Clause1_2a1
}

// mawpLong is UG-27(c)(2), or 1-2(a)(2) beyond its limits.
func mawpLong(t, R, SE float64) (float64, string) {
	if t <= R/2 {
		P := 2 * SE * t / (R - 0.4*t)
		if P <= 1.25*SE {
			return P, ClauseUG27c2
		}
	}
	z := (R + t) / R
	return SE * (z*z - 1), Clause1_2a2
}
