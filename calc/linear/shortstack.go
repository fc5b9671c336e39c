package linear

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// CriticalGradient returns the critical mean-temperature gradient (K/m) of a
// short stack at distance x (m) from the pressure antinode of a standing
// wave with wavenumber k (1/m), in an ideal gas of ratio of specific heats
// gamma at mean temperature tm (K):
//
//	∇T_crit = Tm β ω p1s / (ρm cp u1s) = (γ - 1) Tm k cot(kx)
//
// (Swift, "Thermoacoustic engines", J. Acoust. Soc. Am. 84, 1145 (1988),
// the critical gradient of the short-stack analysis; the second form uses
// β = 1/Tm, p1 = pA cos kx, u1 = pA sin kx / (ρm a) and a²/cp = (γ-1) Tm).
// A stack whose actual gradient exceeds it works as an engine; below it, as
// a heat pump. The sign follows cot(kx): positive for 0 < kx < π/2.
// At kx = 0 (a pressure antinode, no motion) the result is +Inf.
func CriticalGradient(gamma, tm, k, x float64) float64 {
	return (gamma - 1) * tm * k / math.Tan(k*x)
}

// ShortStackInput describes a short parallel-plate stack in a standing
// wave, SI units.
type ShortStackInput struct {
	Gamma           float64 // γ, 1
	Prandtl         float64 // σ, 1
	MeanTemperature float64 // Tm, K
	SoundSpeed      float64 // a, m/s
	Frequency       float64 // f, Hz
	Position        float64 // stack centre from the pressure antinode, m
	Length          float64 // Δx, m
	HalfGap         float64 // y0, m
	ThermalDepth    float64 // δκ at Tm and f, m
	// TemperatureDifference is the actual |ΔTm| across the stack, K; zero
	// leaves GradientRatio at zero.
	TemperatureDifference float64
	// Phase is the wave's phase kx at the stack centre counted from the
	// pressure antinode, rad, when the wave crosses parts at other
	// temperatures on its way (Σ ωℓ/a over them); zero means
	// k·Position with k = 2πf/SoundSpeed.
	Phase float64
}

// ShortStackResult holds the short-stack estimates.
type ShortStackResult struct {
	CriticalGradient   float64 // |∇T_crit|, K/m
	CriticalDifference float64 // |∇T_crit| Δx, K
	GradientRatio      float64 // Γ = actual / critical gradient, 1
	// ZeroLoadRatio is Γ at zero heat load with the viscous correction of
	// the boundary-layer short-stack total power, solid and gas conduction
	// neglected:
	//   Γ0 = (1 + √σ)(1 + √σ - δν/y0) / (1 + √σ + σ)
	// (from setting the total power of Swift 1988's short-stack boundary-
	// layer result to zero; from memory of its form). Γ0 → 1 for an
	// inviscid gas (σ → 0), the textbook statement that a heat pump's span
	// at zero load is the critical one.
	ZeroLoadRatio float64
	// ZeroLoadSpan is Γ0 |∇T_crit| Δx, K: the largest span a heat pump
	// with this stack reaches with no load and no conduction.
	ZeroLoadSpan float64
	KDeltaX      float64 // k Δx: the estimate needs k Δx ≪ 1
	DepthRatio   float64 // δκ / y0: the boundary-layer form needs δκ ≪ y0
	// MeanTemperature is the Tm the estimates were made at, K (the input's
	// MeanTemperature): Onset and HeatPump use the stack's mean
	// temperature, half way between its two ends at the answer.
	MeanTemperature float64
	// Phase is the kx used for the stack centre, rad.
	Phase    float64
	Warnings []string
}

// ShortStack evaluates the short-stack estimates of Swift 1988: the
// critical gradient (CriticalGradient), Γ, the zero-load ratio Γ0 and the
// validity numbers kΔx and δκ/y0 (formulas on ShortStackResult), with a
// warning when kΔx or δκ/y0 is not small. Tm, γ, σ, a and δκ are those of
// the gas in the stack (in Swift's derivation Tm, ρm, cp and the local
// p1/u1 belong to the stack itself), and cot(kx) takes the wave's phase
// at the stack (Phase); the result echoes the Tm used. Errors name the field that is
// not positive and finite.
func ShortStack(in ShortStackInput) (ShortStackResult, error) {
	for _, f := range []struct {
		name string
		v    float64
	}{{"gamma", in.Gamma - 1}, {"Prandtl number", in.Prandtl}, {"mean temperature", in.MeanTemperature},
		{"sound speed", in.SoundSpeed}, {"frequency", in.Frequency}, {"position", in.Position},
		{"length", in.Length}, {"half gap", in.HalfGap}, {"thermal penetration depth", in.ThermalDepth}} {
		if !(f.v > 0) || math.IsInf(f.v, 0) {
			return ShortStackResult{}, fmt.Errorf("short stack: %s must be positive and finite (γ above 1), got %s", f.name, units.Number(f.v, 4))
		}
	}
	if !(in.Phase >= 0) || math.IsInf(in.Phase, 0) {
		return ShortStackResult{}, fmt.Errorf("short stack: phase must be zero or positive and finite, got %s", units.Number(in.Phase, 4))
	}
	r := ShortStackResult{MeanTemperature: in.MeanTemperature}
	k := 2 * math.Pi * in.Frequency / in.SoundSpeed
	r.Phase = k * in.Position
	if in.Phase > 0 {
		r.Phase = in.Phase
	}
	r.CriticalGradient = math.Abs(CriticalGradient(in.Gamma, in.MeanTemperature, k, r.Phase/k))
	r.CriticalDifference = r.CriticalGradient * in.Length
	if in.TemperatureDifference > 0 {
		r.GradientRatio = in.TemperatureDifference / r.CriticalDifference
	}
	s := math.Sqrt(in.Prandtl)
	dn := in.ThermalDepth * s // δν = √σ δκ
	r.ZeroLoadRatio = (1 + s) * (1 + s - dn/in.HalfGap) / (1 + s + in.Prandtl)
	r.ZeroLoadSpan = r.ZeroLoadRatio * r.CriticalDifference
	r.KDeltaX = k * in.Length
	r.DepthRatio = in.ThermalDepth / in.HalfGap
	if r.KDeltaX > 0.3 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("k·Δx = %.2f is not small: the stack is not short and the estimate is rough", r.KDeltaX))
	}
	if r.DepthRatio > 0.5 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("δκ/y0 = %.2f is not small: the boundary-layer form is rough", r.DepthRatio))
	}
	if r.ZeroLoadRatio <= 0 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("δν/y0 = %.2f: viscous losses outweigh the pumping, so the short-stack estimate gives no zero-load span", dn/in.HalfGap))
	}
	if kx := math.Mod(r.Phase, math.Pi); kx < 0.05 || math.Abs(kx-math.Pi/2) < 0.05 || kx > math.Pi-0.05 {
		r.Warnings = append(r.Warnings, "the stack sits at a pressure or velocity node, where the critical gradient is infinite or zero")
	}
	return r, nil
}
