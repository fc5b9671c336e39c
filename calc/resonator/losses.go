package resonator

import (
	"fmt"
	"math"

	"tubewright/gasprops"

	"tubewright/calc/units"
)

// Depths returns the thermal and viscous penetration depths (m) of a gas at
// frequency f (Hz):
//
//	δκ = sqrt(2κ/ω),  δν = sqrt(2ν/ω)
//
// with κ the thermal diffusivity and ν the kinematic viscosity (m²/s),
// ω = 2πf (G. W. Swift, Thermoacoustics: A Unifying Perspective for Some
// Engines and Refrigerators, 2002, ch. 3; the chapter is cited from memory).
func Depths(g gasprops.Properties, f float64) (deltaKappa, deltaNu float64) {
	w := 2 * math.Pi * f
	return math.Sqrt(2 * g.ThermalDiffusivity / w), math.Sqrt(2 * g.KinematicViscosity / w)
}

// KirchhoffAttenuation returns the amplitude attenuation coefficient α
// (nepers per metre) of a plane sound wave travelling in a rigid circular
// tube of radius a (m) at frequency f (Hz), from the viscous and thermal
// boundary layers at the wall (Kirchhoff 1868):
//
//	α = ω/(2 c a) · [δν + (γ-1) δκ]
//
// This is the form of Kinsler, Frey, Coppens & Sanders, Fundamentals of
// Acoustics, 4th ed. (2000), section on wall losses in pipes,
// α = (1/(a c))·sqrt(ηω/(2ρ))·[1 + (γ-1)/sqrt(Pr)] (equation number not
// checked: from memory), rewritten with the penetration depths; the tests
// compare the two forms. Valid for a ≫ δν (wide tube, boundary-layer
// limit) and ka < 1.84; a warning is returned when a < 10 δν.
func KirchhoffAttenuation(g gasprops.Properties, a, f float64) (alpha float64, warning string, err error) {
	if err := checkPositive("radius", a, "m"); err != nil {
		return 0, "", err
	}
	if err := checkPositive("frequency", f, "Hz"); err != nil {
		return 0, "", err
	}
	if err := checkProps(g); err != nil {
		return 0, "", err
	}
	dk, dn := Depths(g, f)
	w := 2 * math.Pi * f
	alpha = w / (2 * g.SoundSpeed * a) * (dn + (g.Gamma-1)*dk)
	if a < 10*dn {
		warning = fmt.Sprintf("radius %s is less than 10 viscous penetration depths (δν = %s): the boundary-layer (Kirchhoff) loss is only approximate", units.Format(a, units.DimLength), units.Format(dn, units.DimLength))
	}
	return alpha, warning, nil
}

// Quality splits the quality factor of a tube resonance by loss mechanism.
// 1/Total = 1/Wall + 1/Caps + 1/Radiation; a mechanism that is absent has
// the value +Inf (e.g. Caps for an open-open tube).
type Quality struct {
	Total     float64
	Wall      float64 // viscous and thermal boundary layers on the side wall
	Caps      float64 // thermal boundary layer on closed end caps
	Radiation float64 // sound radiated from open ends
}

// tubeQuality computes the quality factor of the mode with wavenumber k
// (rad/m) in a uniform tube of physical length L and radius a, by energy
// balance on the lossless mode shape, Q = ω E / (dissipated power):
//
//	p(x) = P cos(kx + φ),  u(x) = P/(ρc) sin(kx + φ),  x in [0, L]
//	E       = S P² L_eff / (4ρc²)                      (stored energy)
//	Ė_wall  = ¼ω P²/(ρc²) · 2πa · [(γ-1)δκ ∫cos² + δν ∫sin²]
//	Ė_cap   = ¼ω P²/(ρc²) · (γ-1)δκ · πa²             (each closed end)
//	Ė_rad   = ½ R |U|² = S P² r(ka) / (2ρc)           (each open end)
//
// with the per-area losses of Swift (2002) ch. 5 (boundary-layer
// dissipation, from memory) and r(ka) the normalised radiation resistance
// (see radiationResistance). For a uniform closed-closed tube without end
// correction this gives Q_wall = a/(δν + (γ-1)δκ) = k/(2α), the classic
// result the tests check.
func tubeQuality(t Tube, g gasprops.Properties, f, k, delta float64) Quality {
	dk, dn := Depths(g, f)
	a, L := t.Radius, t.Length
	leff := L + float64(t.Ends.OpenEnds())*delta
	// phase so that the closed end (or the virtual pressure node of an
	// open end) sits at the right place
	var phi float64
	if t.Ends == OpenOpen {
		phi = k*delta - math.Pi/2
	}
	ic := 0.5*L + (math.Sin(2*(k*L+phi))-math.Sin(2*phi))/(4*k)
	is := L - ic
	// common factor ¼ω P²/(ρc²) cancels against E = (ρc²)^-1 · S P² L_eff/4
	S := math.Pi * a * a
	omega := 2 * math.Pi * f
	eStore := S * leff // ×P²/(4ρc²)
	wall := 2 * math.Pi * a * ((g.Gamma-1)*dk*ic + dn*is)
	caps := float64(t.Ends.ClosedEnds()) * (g.Gamma - 1) * dk * S
	ka := k * a
	// radiation: S P² r/(2ρc) = ¼ω P²/(ρc²) · (2 S r c/ω)
	rad := float64(t.Ends.OpenEnds()) * 2 * S * radiationResistance(t.Correction, ka) * g.SoundSpeed / omega
	q := Quality{
		Wall:      eStore / wall,
		Caps:      inv(caps / eStore),
		Radiation: inv(rad / eStore),
	}
	q.Total = 1 / (1/q.Wall + 1/q.Caps + 1/q.Radiation)
	return q
}

// inv returns 1/x, +Inf for x == 0.
func inv(x float64) float64 {
	if x == 0 {
		return math.Inf(1)
	}
	return 1 / x
}
