package resonator

import (
	"fmt"
	"math"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Helmholtz is a cavity with one cylindrical neck.
type Helmholtz struct {
	Volume     float64       // cavity volume, m³ (not counting the neck)
	NeckLength float64       // physical neck length, m
	NeckRadius float64       // neck inner radius, m
	Outer      EndCorrection // the neck's outer end; its inner end opens through the cavity wall and is taken as flanged
}

// HelmholtzResult is a solved Helmholtz resonator.
type HelmholtzResult struct {
	Frequency       float64 // Hz
	InnerCorrection float64 // δ at the cavity end of the neck, m
	OuterCorrection float64 // δ at the outer end, m
	EffectiveLength float64 // L + δ_inner + δ_outer, m
	Wavelength      float64 // m
	SoundSpeed      float64 // m/s
	Warnings        []string
}

// HelmholtzFrequency returns the resonance of a Helmholtz resonator filled
// with gas of properties g, the lumped-element result
//
//	f = (c / 2π) · sqrt(S / (V · L_eff)),   S = π a²,
//	L_eff = L + δ_inner + δ_outer
//
// (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed.
// 2000, section 10.8, the Helmholtz resonator, from memory). The inner end
// of the neck opens into the cavity wall and gets the flanged correction;
// the outer end gets the chosen one (see CorrectionLength), each at the
// resonance's ka (solved by fixed-point iteration; the dependence is weak).
//
// Domain: every size small compared with the wavelength (a warning when
// the cavity's size V^(1/3) or the effective neck length exceeds λ/10), a
// neck at least as long as its radius (shorter necks are orifices, for
// which this model's end corrections are not valid: error), and a neck
// whose volume is below the cavity's (error otherwise).
func HelmholtzFrequency(h Helmholtz, g gasprops.Properties) (HelmholtzResult, error) {
	for _, c := range []struct {
		name string
		v    float64
		unit string
	}{{"cavity volume", h.Volume, "m³"}, {"neck length", h.NeckLength, "m"}, {"neck radius", h.NeckRadius, "m"}} {
		if err := checkPositive(c.name, c.v, c.unit); err != nil {
			return HelmholtzResult{}, err
		}
	}
	if h.Outer < NoCorrection || h.Outer > Flanged {
		panic("resonator: unknown EndCorrection")
	}
	if err := checkProps(g); err != nil {
		return HelmholtzResult{}, err
	}
	a, L := h.NeckRadius, h.NeckLength
	if a > L {
		e := units.NewRangeError("neck radius", a, 0, L, "m")
		e.Why = "the neck must be at least as long as its radius; a shorter neck is an orifice"
		return HelmholtzResult{}, e
	}
	S := math.Pi * a * a
	if S*L >= h.Volume {
		e := units.NewRangeError("cavity volume", h.Volume, S*L, math.Inf(1), "m³")
		e.Why = "the cavity must be larger than the neck's own volume"
		return HelmholtzResult{}, e
	}
	c := g.SoundSpeed
	freq := func(leff float64) float64 { return c / (2 * math.Pi) * math.Sqrt(S/(h.Volume*leff)) }
	f := freq(L + (FlangedLimit+UnflangedLimit)*a)
	var din, dout float64
	var wOut string
	for i := 0; i < 30; i++ {
		ka := 2 * math.Pi * f * a / c
		din, _ = CorrectionLength(Flanged, a, ka)
		dout, wOut = CorrectionLength(h.Outer, a, ka)
		fn := freq(L + din + dout)
		done := math.Abs(fn-f) <= 1e-13*f
		f = fn
		if done {
			break
		}
	}
	r := HelmholtzResult{
		Frequency:       f,
		InnerCorrection: din,
		OuterCorrection: dout,
		EffectiveLength: L + din + dout,
		Wavelength:      c / f,
		SoundSpeed:      c,
	}
	if wOut != "" {
		r.Warnings = append(r.Warnings, wOut)
	}
	if side := math.Cbrt(h.Volume); side > r.Wavelength/10 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the cavity (size %.3g m) is not small compared with the wavelength %.3g m: the lumped Helmholtz model is only approximate", side, r.Wavelength))
	}
	if r.EffectiveLength > r.Wavelength/10 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the neck (effective length %.3g m) is not short compared with the wavelength %.3g m: the lumped Helmholtz model is only approximate", r.EffectiveLength, r.Wavelength))
	}
	r.Warnings = append(r.Warnings, g.Warnings...)
	return r, nil
}
