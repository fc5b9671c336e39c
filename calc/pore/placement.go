package pore

import (
	"math"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// PlacementInput describes a short stack in a plane standing wave.
type PlacementInput struct {
	SoundSpeed      float64 // m/s, of the gas at the stack
	Density         float64 // kg/m³, mean
	Gamma           float64 // cp/cv
	MeanTemperature float64 // K, at the stack
	MeanPressure    float64 // Pa, absolute
	Frequency       float64 // Hz
	Centre          float64 // m, stack centre measured from the nearest pressure antinode (closed end)
	Length          float64 // m, stack length Δx; 0 for a point estimate
	DriveRatio      float64 // |p1|/pm at the pressure antinode; 0 if unknown
}

// Placement holds the standing-wave numbers of a short stack.
type Placement struct {
	Wavelength float64 // m, c/f
	K          float64 // 1/m, wavenumber ω/c
	KX         float64 // rad, k·x of the stack centre
	KLength    float64 // rad, k·Δx
	// HeatFluxFactor is |sin 2kx|: in the short-stack, boundary-layer theory
	// the heat a standing wave pumps along a stack is proportional to it
	// (p1 ∝ cos kx, u1 ∝ sin kx); it is 1 at kx = π/4, λ/8 from the
	// pressure antinode.
	HeatFluxFactor float64
	// ViscousFactor is sin² kx: the viscous loss per unit length goes with
	// |u1|² ∝ sin² kx (0 at the pressure antinode, 1 at the velocity antinode).
	ViscousFactor float64
	// CriticalGradient is ∇T_crit = (γ-1) T k |cot kx| in K/m: the mean
	// temperature gradient at which the stack neither pumps heat nor makes
	// sound. An engine needs a steeper gradient; a heat pump with a smaller
	// one pumps heat up it.
	CriticalGradient float64
	// CriticalDifference is ∇T_crit·Δx, the temperature difference across
	// the stack at the critical gradient (K); 0 when Length is 0.
	CriticalDifference float64
	LambdaEighth       float64 // m, distance λ/8 from the pressure antinode (kx = π/4)
	// Displacement is the gas displacement amplitude ξ = |u1|/ω at the
	// stack end nearer the velocity antinode (the larger one), m; 0 when
	// DriveRatio is 0.
	Displacement float64
	// ExchangerLength is the peak-to-peak displacement 2ξ, the usual length
	// of the heat exchangers beside the stack (m); 0 when DriveRatio is 0.
	ExchangerLength float64
	Rules           []string // every rule used, with its source
	Warnings        []string // validity warnings
	Cautions        []string // safety cautions that go with the numbers
}

// Short-stack validity: warn when kΔx exceeds this (common practice, no
// published source: the short-stack estimates assume kΔx ≪ 1).
const shortStackLimit = 0.3

// PlaceStack computes the standing-wave placement numbers. The standing
// wave is p1 = P cos kx, |u1| = P sin kx/(ρc) with x from the pressure
// antinode and P = DriveRatio·MeanPressure.
//
// Sources: the short-stack, boundary-layer analysis of G. W. Swift,
// "Thermoacoustic engines", J. Acoust. Soc. Am. 84, 1145 (1988), from
// memory: the critical temperature gradient ∇T_crit = T β ω |p1|/(ρ cp |u1|),
// which for an ideal gas (β = 1/T, c² = (γ-1) cp T) in a standing wave is
// (γ-1) T k cot kx; and the standing-wave heat flux ∝ p1·u1 ∝ sin 2kx.
// The exchanger length rule and the kΔx limit are common practice with no
// published source.
//
// Errors: a non-positive or non-finite input (DriveRatio and Length may be
// 0), a drive ratio of 1 or more, a centre at the pressure antinode itself.
func PlaceStack(in PlacementInput) (Placement, error) {
	for _, c := range []struct {
		name, unit string
		v          float64
		zero       bool
	}{
		{"sound speed", "m/s", in.SoundSpeed, false},
		{"density", "kg/m³", in.Density, false},
		{"mean temperature", "K", in.MeanTemperature, false},
		{"mean pressure", "Pa", in.MeanPressure, false},
		{"frequency", "Hz", in.Frequency, false},
		{"stack centre", "m", in.Centre, false},
		{"stack length", "m", in.Length, true},
		{"drive ratio", "", in.DriveRatio, true},
	} {
		ok := finitePositive(c.v) || (c.zero && c.v == 0)
		if !ok {
			return Placement{}, units.NewRangeError(c.name, c.v, 0, math.Inf(1), c.unit)
		}
	}
	if !(in.Gamma > 1 && in.Gamma <= 5.0/3+1e-9) {
		return Placement{}, units.NewRangeError("gamma", in.Gamma, 1, 5.0/3, "")
	}
	if in.DriveRatio >= 1 {
		return Placement{}, units.NewRangeError("drive ratio", in.DriveRatio, 0, 1, "")
	}
	var out Placement
	omega := 2 * math.Pi * in.Frequency
	out.K = omega / in.SoundSpeed
	out.Wavelength = in.SoundSpeed / in.Frequency
	out.KX = out.K * in.Centre
	out.KLength = out.K * in.Length
	s, c := math.Sincos(out.KX)
	out.HeatFluxFactor = math.Abs(2 * s * c)
	out.ViscousFactor = s * s
	out.LambdaEighth = out.Wavelength / 8
	out.Rules = []string{
		"heat flux along a short stack goes as sin 2kx, largest at kx = π/4 (λ/8 from the pressure antinode): Swift, JASA 84, 1145 (1988), short-stack boundary-layer analysis",
		"critical gradient (dT/dx)crit = (γ-1) T k cot kx for an ideal gas in a standing wave: from Swift (1988), (dT/dx)crit = T β ω p1/(ρ cp u1)",
		"viscous loss goes as |u1|², so as sin² kx: standing-wave velocity profile",
		"short-stack estimates need kΔx much less than 1; warning above 0.3: common practice, no published source",
	}
	if math.Abs(s) < 1e-12 || math.Abs(c) < 1e-12 {
		return Placement{}, units.NewRangeError("stack centre kx", out.KX, 0, math.Pi/2, "rad")
	}
	out.CriticalGradient = (in.Gamma - 1) * in.MeanTemperature * out.K * math.Abs(c/s)
	out.CriticalDifference = out.CriticalGradient * in.Length
	if in.DriveRatio > 0 {
		p := in.DriveRatio * in.MeanPressure
		// larger |sin kx| of the two ends, capped at the velocity antinode
		lo, hi := out.KX-out.KLength/2, out.KX+out.KLength/2
		smax := math.Max(math.Abs(math.Sin(lo)), math.Abs(math.Sin(hi)))
		if math.Floor((lo-math.Pi/2)/math.Pi) != math.Floor((hi-math.Pi/2)/math.Pi) {
			smax = 1 // the stack spans a velocity antinode
		}
		u := p * smax / (in.Density * in.SoundSpeed)
		out.Displacement = u / omega
		out.ExchangerLength = 2 * out.Displacement
		out.Rules = append(out.Rules,
			"displacement ξ = |u1|/ω with |u1| = D pm sin kx/(ρc), D the drive ratio at the pressure antinode: standing-wave acoustics",
			"heat exchanger length about the peak-to-peak displacement 2ξ: common practice, no published source")
		if in.DriveRatio > 0.1 {
			out.Warnings = append(out.Warnings, "drive ratio above 10 %: linear acoustics underestimates losses and streaming; treat the displacement as rough")
		}
	}
	if out.KLength > shortStackLimit {
		out.Warnings = append(out.Warnings, "stack longer than the short-stack limit (kΔx > 0.3): these estimates lose accuracy; use the onset solver")
	}
	if out.KX-out.KLength/2 < 0 {
		out.Warnings = append(out.Warnings, "the stack reaches past the pressure antinode (x - Δx/2 < 0)")
	}
	if out.KX > math.Pi/2 {
		out.Warnings = append(out.Warnings, "the stack centre lies beyond the velocity antinode (kx > π/2): check that x is measured from the nearest pressure antinode")
	}
	out.Cautions = []string{safety.CautionHotSurfaces}
	return out, nil
}
