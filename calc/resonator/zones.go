package resonator

import (
	"fmt"
	"math"

	"tubewright/calc/numeric"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// MaxZones is the largest number of sections in a zoned tube.
const MaxZones = 5

// Section is one uniform piece of a zoned tube with the gas properties
// that matter to the lossless wave in it.
type Section struct {
	Length     float64 // m
	Radius     float64 // m
	SoundSpeed float64 // m/s
	Density    float64 // kg/m³
	// Needed only with WallLosses (ZonedModesLosses); zero otherwise.
	Gamma              float64 // cp/cv, 1
	KinematicViscosity float64 // m²/s
	ThermalDiffusivity float64 // m²/s
}

// Zone is one piece of a zoned tube described by its gas temperature.
type Zone struct {
	Length      float64 // m
	Radius      float64 // m
	Temperature float64 // mean gas temperature in the zone, K
}

// ZoneMode is one resonance of a zoned tube.
type ZoneMode struct {
	Number    int     // 1 for the lowest non-zero mode
	Frequency float64 // exact plane-wave frequency, Hz: loss-free, or with wall losses (ZonedModesLosses)
	// LossFree is the loss-free frequency of the same mode, Hz (equal to
	// Frequency without wall losses).
	LossFree float64
	// DecayRate is Im ω of the mode with wall losses, 1/s (the amplitude
	// decays as e^{-DecayRate·t}; wall losses only, no end caps or
	// radiation); 0 without wall losses.
	DecayRate float64
	// Q is Re ω/(2 Im ω) with wall losses (the side walls only; no end
	// caps or radiation), +Inf without.
	Q          float64
	TravelTime float64 // travel-time estimate of the same mode, Hz
	Difference float64 // TravelTime - Frequency, Hz
}

// ZoneResult lists the first modes of a zoned tube.
type ZoneResult struct {
	Modes    []ZoneMode
	Warnings []string
}

// ZonedModes returns the first n resonances (n from 1 to 20) of a tube made
// of the given sections in order, from the end named first in ends
// (closed for closed-open) to the other.
//
// Exact solution: in each section the lossless plane wave carries pressure
// p and volume velocity U = jW through the transfer matrix
//
//	p' = cos(kℓ) p + Z sin(kℓ) W
//	W' = -sin(kℓ)/Z p + cos(kℓ) W,    k = ω/c, Z = ρc/S
//
// (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed.
// 2000, ch. 10, transmission through a duct, cited from memory;
// continuity of p and U at each joint is built in). A closed end has W = 0, an open end p = 0 at the end
// of its end correction δ(ka), which is treated as an extension of the end
// section. The residual at the far end is a smooth function of f without
// poles; its sign changes are found with numeric.FindBrackets and refined
// with numeric.Brent.
//
// The travel-time estimate uses the one-way travel time τ = Σ ℓ_i/c_i
// (plus δ/c at open ends) in the uniform-tube rule: f = (2n-1)/(4τ) for
// closed-open, n/(2τ) for the others. It ignores the reflections at the
// joints; the difference shows how much they matter.
func ZonedModes(ends Ends, corr EndCorrection, secs []Section, n int) (ZoneResult, error) {
	if n < 1 || n > 20 {
		return ZoneResult{}, units.NewRangeError("number of modes", float64(n), 1, 20, "")
	}
	if len(secs) < 1 || len(secs) > MaxZones {
		return ZoneResult{}, units.NewRangeError("number of zones", float64(len(secs)), 1, MaxZones, "")
	}
	for i, s := range secs {
		for _, c := range []struct {
			name string
			v    float64
			unit string
		}{{"length", s.Length, "m"}, {"radius", s.Radius, "m"}, {"sound speed", s.SoundSpeed, "m/s"}, {"density", s.Density, "kg/m³"}} {
			if err := checkPositive(fmt.Sprintf("zone %d %s", i+1, c.name), c.v, c.unit); err != nil {
				return ZoneResult{}, err
			}
		}
	}
	z := zoned{ends: ends, corr: corr, secs: secs}
	var res ZoneResult
	// scan up to a little beyond the travel-time estimate of mode n+1;
	// widen when reflections push modes higher
	fEst := z.travelTime(1)
	lo := 1e-3 * fEst
	hi := 1.5 * z.travelTime(n+1)
	var roots []float64
	for attempt := 0; attempt < 4 && len(roots) < n; attempt++ {
		roots = roots[:0]
		grid := 48 * (n + 1) << attempt
		for _, b := range numeric.FindBrackets(z.residual, lo, hi, grid) {
			r, err := numeric.Brent(z.residual, b[0], b[1], &numeric.RootSettings{RelTol: 1e-13})
			if err != nil {
				continue
			}
			roots = append(roots, r.X)
			if len(roots) == n {
				break
			}
		}
		hi *= 2
	}
	if len(roots) < n {
		return ZoneResult{}, fmt.Errorf("resonator: found only %d of %d modes of the zoned tube", len(roots), n)
	}
	for i, f := range roots {
		tt := z.travelTime(i + 1)
		res.Modes = append(res.Modes, ZoneMode{Number: i + 1, Frequency: f, LossFree: f, Q: math.Inf(1), TravelTime: tt, Difference: tt - f})
		for j, s := range secs {
			ka := 2 * math.Pi * f * s.Radius / s.SoundSpeed
			if ka >= CutoffKA {
				res.Warnings = append(res.Warnings, fmt.Sprintf("mode %d: zone %d has ka = %s above the cross-mode cutoff 1.841; plane waves do not describe it", i+1, j+1, units.Number(ka, 3)))
			}
		}
	}
	if corr != NoCorrection && ends.OpenEnds() > 0 {
		s := secs[len(secs)-1]
		if _, w := CorrectionLength(corr, s.Radius, 2*math.Pi*roots[n-1]*s.Radius/s.SoundSpeed); w != "" {
			res.Warnings = append(res.Warnings, "highest mode: "+w)
		}
	}
	return res, nil
}

// zoned holds a zoned tube for the residual function.
type zoned struct {
	ends Ends
	corr EndCorrection
	secs []Section
}

// endCorrection returns δ at an open end made by section s at frequency f.
func (z *zoned) endCorrection(s Section, f float64) float64 {
	d, _ := CorrectionLength(z.corr, s.Radius, 2*math.Pi*f*s.Radius/s.SoundSpeed)
	return d
}

// step carries (p, W) through length l of section s at angular frequency w.
func step(p, W float64, s Section, l, w float64) (float64, float64) {
	Z := s.Density * s.SoundSpeed / (math.Pi * s.Radius * s.Radius)
	sn, cs := math.Sincos(w * l / s.SoundSpeed)
	return cs*p + Z*sn*W, -sn/Z*p + cs*W
}

// residual is the far-end boundary condition as a function of f (Hz):
// zero at a resonance.
func (z *zoned) residual(f float64) float64 {
	w := 2 * math.Pi * f
	first, last := z.secs[0], z.secs[len(z.secs)-1]
	Z1 := first.Density * first.SoundSpeed / (math.Pi * first.Radius * first.Radius)
	var p, W float64
	if z.ends == OpenOpen {
		// start at the virtual pressure node beyond the first open end
		p, W = 0, 1/Z1
		p, W = step(p, W, first, z.endCorrection(first, f), w)
	} else {
		p, W = 1, 0
	}
	for _, s := range z.secs {
		p, W = step(p, W, s, s.Length, w)
	}
	if z.ends == ClosedClosed {
		Zn := last.Density * last.SoundSpeed / (math.Pi * last.Radius * last.Radius)
		return W * Zn
	}
	p, _ = step(p, W, last, z.endCorrection(last, f), w)
	return p
}

// travelTime returns the travel-time estimate of mode n, with end
// corrections at the estimated frequency (three fixed-point passes).
func (z *zoned) travelTime(n int) float64 {
	var tau float64
	for _, s := range z.secs {
		tau += s.Length / s.SoundSpeed
	}
	var m float64
	if z.ends == ClosedOpen {
		m = float64(2*n-1) / 4
	} else {
		m = float64(n) / 2
	}
	f := m / tau
	if z.corr == NoCorrection || z.ends == ClosedClosed {
		return f
	}
	first, last := z.secs[0], z.secs[len(z.secs)-1]
	for i := 0; i < 3; i++ {
		t := tau + z.endCorrection(last, f)/last.SoundSpeed
		if z.ends == OpenOpen {
			t += z.endCorrection(first, f) / first.SoundSpeed
		}
		f = m / t
	}
	return f
}

// ZonedTube is a tube made of zones at their own temperatures, filled with
// one gas at one mean pressure.
type ZonedTube struct {
	Ends       Ends
	Correction EndCorrection
	Losses     Losses // LossFree (zero value) or WallLosses
	Zones      []Zone
	Gas        gasprops.Mixture
	Pressure   float64           // Pa, absolute
	GasOptions *gasprops.Options // nil: ideal gas
	// RelativeHumidity of air, 0 to 1 (see Setup.RelativeHumidity).
	RelativeHumidity float64
}

// Modes evaluates the gas in each zone with gasprops and returns the first
// n modes (see ZonedModes). Gas-model warnings are passed on.
func (t ZonedTube) Modes(n int) (ZoneResult, error) {
	if len(t.Zones) < 1 || len(t.Zones) > MaxZones {
		return ZoneResult{}, units.NewRangeError("number of zones", float64(len(t.Zones)), 1, MaxZones, "")
	}
	if err := checkPositive("pressure", t.Pressure, "Pa"); err != nil {
		return ZoneResult{}, err
	}
	secs := make([]Section, len(t.Zones))
	var warn []string
	for i, zn := range t.Zones {
		if err := checkPositive(fmt.Sprintf("zone %d temperature", i+1), zn.Temperature, "K"); err != nil {
			return ZoneResult{}, err
		}
		g, err := gasAt(t.Gas, zn.Temperature, t.Pressure, t.RelativeHumidity, t.GasOptions)
		if err != nil {
			return ZoneResult{}, fmt.Errorf("zone %d: %w", i+1, err)
		}
		for _, w := range g.Warnings {
			warn = append(warn, fmt.Sprintf("zone %d: %s", i+1, w))
		}
		secs[i] = Section{Length: zn.Length, Radius: zn.Radius, SoundSpeed: g.SoundSpeed, Density: g.Density,
			Gamma: g.Gamma, KinematicViscosity: g.KinematicViscosity, ThermalDiffusivity: g.ThermalDiffusivity}
		if w := knudsenWarning(g, zn.Radius); w != "" {
			warn = append(warn, fmt.Sprintf("zone %d: %s", i+1, w))
		}
	}
	r, err := ZonedModesLosses(t.Ends, t.Correction, secs, n, t.Losses)
	r.Warnings = append(warn, r.Warnings...)
	return r, err
}

// ZonedModesLosses is ZonedModes with a choice of loss model. With
// LossFree it is ZonedModes. With WallLosses each loss-free mode is
// followed to the complex angular frequency ω at which the far-end
// condition holds with Rott's complex wave number and characteristic
// impedance in every section (see WaveNumber; each section's Gamma,
// KinematicViscosity and ThermalDiffusivity must then be set):
//
//	p' = cos(kℓ) p - i Zc sin(kℓ) U,   U' = -i sin(kℓ)/Zc p + cos(kℓ) U
//
// (Swift 2002, ch. 4, the uniform-duct solution of the wave equations,
// from memory of the form). A closed end has U = 0; an open end is a
// pressure node at the end of its end correction δ(ka), a loss-free
// extension of the end section (the gas moving outside has no wall), as
// in ZonedModes, to which the result reduces as the losses vanish.
// The mode's Frequency is Re ω/2π, its DecayRate Im ω, its Q
// Re ω/(2 Im ω); LossFree keeps the loss-free frequency. A mode with Q
// below MinQ is an error matching ErrNoResonance.
//
// The thermoviscous functions are taken at the real frequency Re ω, as in
// calc/linear's Mode; that is exact at an engine's onset (real ω) and is
// the usual approximation for a decaying mode. The exact decaying mode
// (testdata/gen_wall_resonance.py evaluates them at the complex ω) lies
// higher by about s·q/2 in relative terms, s the relative frequency shift
// by the losses and q = Im ω/Re ω: 0.02 % for a 10 mm radius helium tube
// at 1 kHz and 1 bar, 0.2 % for a 1 mm air tube, 1 % for a 0.3 mm one.
func ZonedModesLosses(ends Ends, corr EndCorrection, secs []Section, n int, losses Losses) (ZoneResult, error) {
	if losses != LossFree && losses != WallLosses {
		panic("resonator: unknown Losses")
	}
	res, err := ZonedModes(ends, corr, secs, n)
	if err != nil || losses == LossFree {
		return res, err
	}
	w, err := newWaveTube(ends, corr, secs)
	if err != nil {
		return ZoneResult{}, err
	}
	for i := range res.Modes {
		m := &res.Modes[i]
		omega, err := w.solve(m.LossFree)
		if err != nil {
			return ZoneResult{}, fmt.Errorf("mode %d: %w", m.Number, err)
		}
		m.Frequency = real(omega) / (2 * math.Pi)
		m.DecayRate = imag(omega)
		m.Q = real(omega) / (2 * imag(omega))
		m.Difference = m.TravelTime - m.Frequency
		if m.Q < MinQ {
			return ZoneResult{}, fmt.Errorf("mode %d: %w", m.Number, &NoResonanceError{Q: m.Q})
		}
	}
	for i := 1; i < len(res.Modes); i++ {
		if res.Modes[i].Frequency <= res.Modes[i-1].Frequency {
			return ZoneResult{}, fmt.Errorf("resonator: with wall losses modes %d and %d merge; the tube is too narrow for distinct resonances", i, i+1)
		}
	}
	return res, nil
}
