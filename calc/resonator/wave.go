package resonator

import (
	"errors"
	"fmt"
	"math"
	"math/cmplx"
	"strings"

	"tubewright/calc/pore"
	"tubewright/gasprops"
)

// Losses selects how the tube's walls enter its resonance frequency.
type Losses int

// The loss models of the resonance frequency.
const (
	// LossFree is the plane wave at the adiabatic sound speed: the walls
	// enter only the quality factor. The zero value, so existing callers
	// keep it.
	LossFree Losses = iota
	// WallLosses uses Rott's complex wave number of a circular duct (see
	// WaveNumber): the viscous and thermal boundary layers slow the wave
	// and lower the frequency, by about 1.8 % in a 10 mm radius helium tube
	// at 1 kHz and 1 bar and by more in narrow tubes. It is the model of
	// the onset solver of calc/linear, so the two agree.
	WallLosses
)

var lossesNames = [...]string{"none", "wall"}

// String returns "none" or "wall".
func (l Losses) String() string {
	if l < 0 || int(l) >= len(lossesNames) {
		return fmt.Sprintf("Losses(%d)", int(l))
	}
	return lossesNames[l]
}

// ParseLosses reads "none" (also "loss-free", "lossless") or "wall",
// case-insensitive.
func ParseLosses(s string) (Losses, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "none", "loss-free", "lossless":
		return LossFree, nil
	case "wall":
		return WallLosses, nil
	}
	return 0, fmt.Errorf("losses %q: want none or wall", s)
}

// WaveNumber returns the complex wave number k (rad/m) and the
// characteristic impedance Zc (Pa·s/m³, pressure over volume velocity) of
// plane waves at frequency f (Hz) in a rigid circular duct of radius a (m)
// filled with gas of properties g, from Rott's linear wave equations
//
//	dp/dx = -iωρ / (S (1 - fν)) U,   dU/dx = -iωS (1 + (γ-1) fκ) / (ρc²) p
//	k  = (ω/c) √[(1 + (γ-1) fκ) / (1 - fν)]
//	Zc = ρc / (S (1 - fν) √[(1 + (γ-1) fκ) / (1 - fν)]),   S = πa²
//
// with fν, fκ Rott's circular function at the viscous and thermal
// penetration depths (calc/pore Circular; G. W. Swift, Thermoacoustics: A
// Unifying Perspective for Some Engines and Refrigerators, 2002, ch. 4,
// from memory of the form; time dependence e^{iωt}, so Im k < 0 for a wave
// decaying along +x). Re k > ω/c: the phase speed ω/Re k is below c. For
// a ≫ δ this is Kirchhoff's result: Re k - ω/c = -Im k = α of
// KirchhoffAttenuation. Valid for any a/δ (the exact circular function),
// below the cross-mode cutoff ka < 1.841 and in the continuum regime (see
// MeanFreePath). Errors: a or f not positive, incomplete properties.
func WaveNumber(g gasprops.Properties, a, f float64) (k, zc complex128, err error) {
	if err := checkPositive("radius", a, "m"); err != nil {
		return 0, 0, err
	}
	if err := checkPositive("frequency", f, "Hz"); err != nil {
		return 0, 0, err
	}
	if err := checkProps(g); err != nil {
		return 0, 0, err
	}
	sh, err := pore.Circular(a)
	if err != nil {
		return 0, 0, err
	}
	gam, z := rottFactors(sh, g.Gamma, g.KinematicViscosity, g.ThermalDiffusivity, f, 1)
	S := math.Pi * a * a
	return complex(2*math.Pi*f/g.SoundSpeed, 0) * gam, complex(g.Density*g.SoundSpeed/S, 0) * z, nil
}

// rottFactors returns Γ = k c/ω and Zc S/(ρc) of a duct of shape sh at
// frequency f (Hz), with the thermoviscous functions scaled by s in [0, 1]
// (s = 1 is the physical duct; smaller s is used to follow a mode from the
// loss-free solution).
func rottFactors(sh pore.Shape, gamma, nu, kappa, f, s float64) (gam, zn complex128) {
	w := 2 * math.Pi * f
	fnu := sh.F(math.Sqrt(2*nu/w)) * complex(s, 0)
	fk := sh.F(math.Sqrt(2*kappa/w)) * complex(s, 0)
	gam = cmplx.Sqrt((1 + complex(gamma-1, 0)*fk) / (1 - fnu))
	return gam, 1 / ((1 - fnu) * gam)
}

// wavePiece is one uniform section of a tube for the complex-frequency
// solve, with its duct factors frozen at the current real frequency.
type wavePiece struct {
	sec   Section
	shape pore.Shape
	zl    float64    // loss-free characteristic impedance ρc/S
	gam   complex128 // k c/ω
	zc    complex128 // characteristic impedance
	delta float64    // end correction when the piece ends at an open end
}

// waveTube is a tube of sections for the complex-frequency solve.
type waveTube struct {
	ends   Ends
	corr   EndCorrection
	pieces []wavePiece
}

// errWave marks a complex-frequency solve that did not converge.
var errWave = errors.New("resonator: the wall-loss resonance did not converge")

func newWaveTube(ends Ends, corr EndCorrection, secs []Section) (*waveTube, error) {
	w := &waveTube{ends: ends, corr: corr, pieces: make([]wavePiece, len(secs))}
	for i, s := range secs {
		if !(s.Gamma > 1 && s.Gamma < 2) || !(s.KinematicViscosity > 0) || !(s.ThermalDiffusivity > 0) ||
			math.IsInf(s.KinematicViscosity, 0) || math.IsInf(s.ThermalDiffusivity, 0) {
			return nil, fmt.Errorf("zone %d: %w", i+1, errIncomplete)
		}
		sh, err := pore.Circular(s.Radius)
		if err != nil {
			return nil, err
		}
		w.pieces[i] = wavePiece{sec: s, shape: sh, zl: s.Density * s.SoundSpeed / (math.Pi * s.Radius * s.Radius)}
	}
	return w, nil
}

// freeze evaluates the duct factors and end corrections at the real
// frequency f (Hz) with the losses scaled by s.
func (w *waveTube) freeze(f, s float64) {
	for i := range w.pieces {
		p := &w.pieces[i]
		p.gam, p.zc = rottFactors(p.shape, p.sec.Gamma, p.sec.KinematicViscosity, p.sec.ThermalDiffusivity, f, s)
		p.zc *= complex(p.zl, 0)
		p.delta = 0
		if w.corr != NoCorrection {
			p.delta, _ = CorrectionLength(w.corr, p.sec.Radius, 2*math.Pi*f*p.sec.Radius/p.sec.SoundSpeed)
		}
	}
}

// extend carries (p, U) through the loss-free extension δ of piece p
// (its end correction) at complex angular frequency omega.
func (p *wavePiece) extend(omega, pr, u complex128) (complex128, complex128) {
	kl := omega * complex(p.delta/p.sec.SoundSpeed, 0)
	cs, sn := cmplx.Cos(kl), cmplx.Sin(kl)
	z := complex(p.zl, 0)
	return cs*pr - complex(0, 1)*z*sn*u, -complex(0, 1)*sn/z*pr + cs*u
}

// residual is the far-end condition at complex angular frequency omega,
// in Pa per unit start amplitude: zero at a resonance.
//
//	each section: p' = cos(kℓ) p - i Zc sin(kℓ) U,  U' = -i sin(kℓ)/Zc p + cos(kℓ) U
//
// A closed end has U = 0. An open end is a pressure node at the end of
// its end correction δ, a loss-free extension of the end section (the
// mass of gas moving outside the tube, with no wall), as in ZonedModes.
func (w *waveTube) residual(omega complex128) complex128 {
	first, last := &w.pieces[0], &w.pieces[len(w.pieces)-1]
	var p, u complex128 = 1, 0
	if w.ends == OpenOpen {
		p, u = first.extend(omega, 0, 1)
	}
	for i := range w.pieces {
		pc := &w.pieces[i]
		kl := omega * pc.gam * complex(pc.sec.Length/pc.sec.SoundSpeed, 0)
		cs, sn := cmplx.Cos(kl), cmplx.Sin(kl)
		p, u = cs*p-complex(0, 1)*pc.zc*sn*u, -complex(0, 1)*sn/pc.zc*p+cs*u
	}
	if w.ends == ClosedClosed {
		return u * complex(last.zl, 0)
	}
	p, _ = last.extend(omega, p, u)
	return p
}

// solve follows the loss-free resonance at f0 (Hz) to the complex angular
// frequency ω of the lossy duct. The thermoviscous functions are evaluated
// at the real part of ω (as in calc/linear's Mode, and exact at the onset
// of an engine, where ω is real); the losses are switched on in steps (continuation)
// so that a strongly damped narrow tube stays on the same mode. Each step
// is a fixed point on Re ω around a secant solve in the complex plane.
func (w *waveTube) solve(f0 float64) (complex128, error) {
	omega := complex(2*math.Pi*f0, 0)
	w.freeze(f0, 1)
	worst := 0.0
	for _, p := range w.pieces {
		worst = math.Max(worst, cmplx.Abs(p.gam-1))
	}
	steps := int(math.Min(math.Max(math.Ceil(worst/0.02), 1), 60))
	for j := 1; j <= steps; j++ {
		s := float64(j) / float64(steps)
		done := false
		for it := 0; it < 60 && !done; it++ {
			w.freeze(real(omega)/(2*math.Pi), s)
			next, err := secant(w.residual, omega)
			if err != nil {
				return 0, err
			}
			done = cmplx.Abs(next-omega) <= 1e-12*cmplx.Abs(omega)
			omega = next
		}
		if !done {
			return 0, errWave
		}
	}
	if !(real(omega) > 0) || cmplx.IsNaN(omega) || cmplx.IsInf(omega) {
		return 0, errWave
	}
	return omega, nil
}

// secant finds a root of the analytic function h near x0 by the secant
// method in the complex plane.
func secant(h func(complex128) complex128, x0 complex128) (complex128, error) {
	scale := cmplx.Abs(x0)
	x1 := x0 + complex(1e-6*scale, 1e-6*scale)
	h0, h1 := h(x0), h(x1)
	for i := 0; i < 100; i++ {
		if h1 == 0 {
			return x1, nil
		}
		d := h1 - h0
		if d == 0 || cmplx.IsNaN(d) || cmplx.IsInf(d) {
			return 0, errWave
		}
		x2 := x1 - h1*(x1-x0)/d
		if cmplx.Abs(x2-x1) <= 1e-14*scale {
			return x2, nil
		}
		x0, h0 = x1, h1
		x1, h1 = x2, h(x2)
	}
	return 0, errWave
}
