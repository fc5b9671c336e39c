package resonator

import (
	"fmt"
	"math"

	"tubewright/gasprops"

	"tubewright/calc/units"
)

// KnudsenLimit is the Knudsen number above which the continuum model of
// the gas (and so the boundary-layer losses and Rott's functions) starts to
// fail: below 0.01 a gas "may be approximated as a continuous medium"
// (the usual regime boundary, as quoted from Rohsenow and Choi in ASME J.
// Heat Transfer 123(3), 486, 2001); above it the gas slips at the wall.
const KnudsenLimit = 0.01

// MeanFreePath returns the mean free path (m) of the gas molecules from
// the viscosity, by kinetic theory:
//
//	λ = (μ/p) √(π R T / (2M)) = ν √(πγ/2) / c
//
// (the second form uses p/ρ = RT/M = c²/γ of an ideal gas; it is the
// relation Kn = (Ma/Re) √(πγ/2) between the Knudsen, Mach and Reynolds
// numbers, CFD Online wiki, "Knudsen number"). For air at room conditions
// it gives about 65 nm; the usual figure is 68 nm (Wikipedia, "Knudsen
// gas"). Properties must be complete; otherwise the result is 0.
func MeanFreePath(g gasprops.Properties) float64 {
	if checkProps(g) != nil {
		return 0
	}
	return g.KinematicViscosity * math.Sqrt(math.Pi*g.Gamma/2) / g.SoundSpeed
}

// knudsenWarning returns a warning when the mean free path is not small
// against the radius a (m), else "".
func knudsenWarning(g gasprops.Properties, a float64) string {
	lam := MeanFreePath(g)
	if !(a > 0) || lam/a <= KnudsenLimit {
		return ""
	}
	return fmt.Sprintf("the mean free path of the gas (%s) is %s of the radius, above the continuum limit 0.01 (Knudsen number): the gas slips at the wall and the wall losses and frequency are only approximate; raise the pressure or widen the tube", units.Format(lam, units.DimLength), units.Number(lam/a, 2))
}
