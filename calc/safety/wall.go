package safety

import (
	"math"

	"tubewright/calc/units"
)

// WallStress is the stress state in the wall of a closed-end cylinder under
// internal pressure, compared with the allowable stress the user entered.
type WallStress struct {
	Method       string  // "thin-wall (mean radius)" or "thick-wall (Lamé), inner surface"
	Hoop         float64 // circumferential stress σθ, Pa
	Longitudinal float64 // axial stress σz for closed ends, Pa
	Radial       float64 // radial stress σr at the inner surface, Pa (−P)
	// Intensity is the largest difference of two principal stresses
	// (Tresca stress intensity, σθ − σr at the inner surface), Pa.
	Intensity float64
	// HoopRatio is Hoop / allowable stress: above 1 the wall is over the
	// allowable stress the user entered.
	HoopRatio float64
	// IntensityRatio is Intensity / allowable stress.
	IntensityRatio float64
	Warnings       []string // limits of the method met by this input
	Cautions       []string // always non-empty
}

// ThinWallStress returns the membrane stresses of a thin closed-end
// cylinder from the internal gauge pressure P (Pa), inner radius ri (m),
// wall thickness t (m) and the allowable stress S (Pa) of the material at
// the wall's highest temperature:
//
//	r  = ri + t/2            (mean radius)
//	σθ = P r / t             (hoop)
//	σz = P r / (2 t)         (longitudinal, closed ends)
//	σr = −P                  (radial, inner face)
//
// The mean radius is used because it agrees with Lamé's peak (inner
// surface) hoop stress to first order in t/r; Barlow's formula written with
// the outside diameter, P Do/(2t), gives a slightly larger value.
// Source: the membrane equilibrium of a closed cylinder, as in W. C. Young
// and R. G. Budynas, Roark's Formulas for Stress and Strain, 7th ed., 2002,
// Table 13.1 case 1 (table number from memory).
//
// Valid for t ≪ r: t ≥ ri is an error, t > ri/10 adds a warning that the
// thick-wall (Lamé) result should be used.
func ThinWallStress(p GaugePressure, ri, t, allowable float64) (WallStress, error) {
	if err := wallInputs(p, ri, t, allowable); err != nil {
		return WallStress{}, err
	}
	if t >= ri {
		e := units.NewRangeError("wall thickness", t, 0, ri, "m")
		e.Why = "the thin-wall formula needs a wall thinner than the inner radius; use the thick-wall (Lamé) result"
		return WallStress{}, e
	}
	P := float64(p)
	r := ri + t/2
	w := WallStress{
		Method:       "thin-wall (mean radius)",
		Hoop:         P * r / t,
		Longitudinal: P * r / (2 * t),
		Radial:       -P,
		Cautions:     cautions(CautionStress),
	}
	if t > ri/10 {
		w.Warnings = append(w.Warnings, "wall thickness is "+units.Number(t/ri, 3)+" of the inner radius, more than 1/10: the thin-wall formula is inaccurate, use the thick-wall (Lamé) result")
	}
	w.finish(allowable)
	return w, nil
}

// ThickWallStress returns Lamé's stresses at the inner surface, where they
// are largest, of a closed-end cylinder with inner radius ri and outer
// radius ro = ri + t (m) under internal gauge pressure P (Pa), outside at
// atmospheric pressure:
//
//	σθ = P (ro² + ri²) / (ro² − ri²)
//	σr = −P
//	σz = P ri² / (ro² − ri²)          (closed ends, away from them)
//
// compared with the allowable stress S (Pa). Valid for any wall thickness
// within linear elasticity. Source: Lamé's solution
// σθ(r) = (a² pi − b² po)/(b² − a²) + a² b² (pi − po)/((b² − a²) r²), here at
// r = a with po = 0 (as written in "Lame's Equations for Thick-Walled
// Cylinder Stress Analysis", industrialmonitordirect.com); the axial stress
// is the end load P π ri² over the wall area π (ro² − ri²). Textbook
// treatment: S. P. Timoshenko and J. N. Goodier, Theory of Elasticity, 3rd
// ed., 1970, §28 (section number from memory).
func ThickWallStress(p GaugePressure, ri, t, allowable float64) (WallStress, error) {
	if err := wallInputs(p, ri, t, allowable); err != nil {
		return WallStress{}, err
	}
	P := float64(p)
	ro := ri + t
	d := ro*ro - ri*ri
	w := WallStress{
		Method:       "thick-wall (Lamé), inner surface",
		Hoop:         P * (ro*ro + ri*ri) / d,
		Longitudinal: P * ri * ri / d,
		Radial:       -P,
		Cautions:     cautions(CautionStress),
	}
	w.finish(allowable)
	return w, nil
}

func (w *WallStress) finish(allowable float64) {
	w.Intensity = math.Max(w.Hoop, w.Longitudinal) - math.Min(w.Radial, 0)
	w.HoopRatio = w.Hoop / allowable
	w.IntensityRatio = w.Intensity / allowable
	if w.HoopRatio > 1 {
		w.Warnings = append(w.Warnings, "hoop stress is "+units.Number(w.HoopRatio, 3)+" times the allowable stress")
	}
}

func wallInputs(p GaugePressure, ri, t, allowable float64) error {
	if err := gaugeInput(p); err != nil {
		return err
	}
	if err := positive("inner radius", ri, "m"); err != nil {
		return err
	}
	if err := positive("wall thickness", t, "m"); err != nil {
		return err
	}
	return positive("allowable stress", allowable, "Pa")
}
