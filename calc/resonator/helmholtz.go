package resonator

import (
	"fmt"
	"math"

	"tubewright/calc/numeric"
	"tubewright/calc/pore"
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
	// NeckVolumeRatio is S·L_eff/V, the volume of the moving gas in the
	// neck (with its end corrections) over the cavity volume, 1.
	NeckVolumeRatio float64
	// DistributedFrequency treats the neck as a short tube instead of a
	// lumped mass (see HelmholtzFrequency), Hz; it is below Frequency,
	// by about NeckVolumeRatio/6 in relative terms.
	DistributedFrequency float64
	// ViscousDepth is the viscous penetration depth δν at Frequency, m.
	ViscousDepth float64
	// NeckViscousShift is the relative change of the frequency (negative)
	// from the mass the viscous boundary layer adds in the neck (see
	// HelmholtzFrequency), 1.
	NeckViscousShift float64
	Warnings         []string
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
//
// Two validity checks, each with a warning when it moves the frequency
// by more than stated:
//
// The neck's volume not small against the cavity (above 1 %): the neck as
// a loss-free tube of length L_eff open at its outer end and loaded by the
// cavity's compliance V/(ρc²) gives
//
//	k L_eff tan(k L_eff) = S L_eff / V,   k = 2πf/c
//
// (pressure node at the outer end, momentum in the neck and the cavity's
// continuity; reasoning in the test, elementary), which tends to the
// lumped result as S L_eff/V → 0 and lies below it by about S L_eff/(6V):
// 5 % at a ratio of 31 % (issue 12). DistributedFrequency holds it.
//
// The viscous boundary layer in the neck (above 2 %): in a duct the mass
// per length is ρ/(S(1 − fν)) (Rott's momentum equation, Swift 2002,
// ch. 4, from memory of the form), so the neck's mass grows by the factor
// Re[1/(1 − fν)] ≈ 1 + δν/a over its physical length (calc/pore Circular
// at δν); the frequency changes by NeckViscousShift =
// [(L Re[1/(1 − fν)] + δ_inner + δ_outer)/L_eff]^(−1/2) − 1, about
// −δν/(2a) for a long neck. A neck a few penetration depths wide is far
// outside the lumped model.
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
		r.Warnings = append(r.Warnings, fmt.Sprintf("the cavity (size %s) is not small compared with the wavelength %s: the lumped Helmholtz model is only approximate", units.Format(side, units.DimLength), units.Format(r.Wavelength, units.DimLength)))
	}
	if r.EffectiveLength > r.Wavelength/10 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the neck (effective length %s) is not short compared with the wavelength %s: the lumped Helmholtz model is only approximate", units.Format(r.EffectiveLength, units.DimLength), units.Format(r.Wavelength, units.DimLength)))
	}
	r.neckChecks(h, g)
	r.Warnings = append(r.Warnings, g.Warnings...)
	return r, nil
}

// neckChecks fills the distributed-neck and viscous-neck fields of r and
// their warnings (see HelmholtzFrequency).
func (r *HelmholtzResult) neckChecks(h Helmholtz, g gasprops.Properties) {
	a, L, leff, c := h.NeckRadius, h.NeckLength, r.EffectiveLength, r.SoundSpeed
	S := math.Pi * a * a
	r.NeckVolumeRatio = S * leff / h.Volume
	// x tan x = ratio on (0, π/2): x tan x rises from 0 to +Inf there
	x0 := math.Sqrt(r.NeckVolumeRatio) // the lumped value, above the root
	res, err := numeric.Brent(func(x float64) float64 { return x*math.Tan(x) - r.NeckVolumeRatio },
		0, math.Min(x0, math.Pi/2*(1-1e-12)), &numeric.RootSettings{RelTol: 1e-13})
	r.DistributedFrequency = r.Frequency
	if err == nil {
		r.DistributedFrequency = res.X * c / (2 * math.Pi * leff)
	}
	if d := r.Frequency/r.DistributedFrequency - 1; d > 0.01 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the neck holds %.0f %% of the cavity's volume (with its end corrections): the lumped Helmholtz formula is %.1f %% high; the neck treated as a short tube gives %s", 100*r.NeckVolumeRatio, 100*d, units.Format(r.DistributedFrequency, units.DimFrequency)))
	}
	_, dn := Depths(g, r.Frequency)
	r.ViscousDepth = dn
	sh, err := pore.Circular(a)
	if err != nil {
		return
	}
	m := real(1 / (1 - sh.F(dn)))
	r.NeckViscousShift = 1/math.Sqrt((L*m+r.InnerCorrection+r.OuterCorrection)/leff) - 1
	if r.NeckViscousShift < -0.02 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the neck radius is only %s viscous penetration depths (δν = %s): the boundary layer's added mass lowers the frequency by about %.0f %% and damps it strongly; the lumped formula does not include this", units.Number(a/dn, 3), units.Format(dn, units.DimLength), -100*r.NeckViscousShift))
	}
}
