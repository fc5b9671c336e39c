package linear

import (
	"errors"
	"fmt"
	"math"
	"math/cmplx"

	"tubewright/calc/numeric"

	"tubewright/calc/units"
)

// This file turns a Device into segments and integrates the linear wave
// equations through them.

// poreShape is what the solver needs of a pore geometry; calc/pore's Shape
// satisfies it.
type poreShape interface {
	HydraulicRadius() float64
	Porosity() float64
	F(delta float64) complex128
}

// segment is one part ready for integration.
type segment struct {
	part    int
	kind    string
	x0      float64 // position of the start, m
	length  float64 // m
	area    float64 // whole cross-section, m²
	gasArea float64 // porosity × area, m²
	radius  float64 // tube radius, m
	rh      float64 // hydraulic radius, m
	shape   poreShape
	temp    TempRef
	tfix    float64
	volume  float64
	// stacks: where the mean temperature comes from at each side
	leftRef, rightRef   TempRef
	leftFix, rightFix   float64
	leftName, rightName string
}

// Profile is the solution along the device, one row per integration point.
type Profile struct {
	X             []float64 // position from the start end, m
	PressureAmp   []float64 // |p1|, Pa
	FlowAmp       []float64 // |U1|, m³/s
	Phase         []float64 // phase of p1 minus phase of U1, degrees
	Temperature   []float64 // mean temperature Tm, K
	AcousticPower []float64 // E2 = ½ Re[p1 conj(U1)], W
	Part          []int     // part index of each row
}

func (pr *Profile) add(x float64, y []complex128, part int) {
	p, u := y[0], y[1]
	pr.X = append(pr.X, x)
	pr.PressureAmp = append(pr.PressureAmp, cmplx.Abs(p))
	pr.FlowAmp = append(pr.FlowAmp, cmplx.Abs(u))
	ph := 0.0
	if p != 0 && u != 0 {
		ph = (cmplx.Phase(p) - cmplx.Phase(u)) * 180 / math.Pi
		for ph > 180 {
			ph -= 360
		}
		for ph <= -180 {
			ph += 360
		}
	}
	pr.Phase = append(pr.Phase, ph)
	pr.Temperature = append(pr.Temperature, real(y[2]))
	pr.AcousticPower = append(pr.AcousticPower, 0.5*real(p*cmplx.Conj(u)))
	pr.Part = append(pr.Part, part)
}

// integration modes
const (
	modeLinear   = iota // stack Tm linear between its neighbours
	modeHeatPump        // stack Tm from the total-power equation
)

// model holds a compiled device and the work space of one solve. It is not
// safe for concurrent use; each solve makes its own.
type model struct {
	dev  *Device
	gas  Gas
	segs []segment
	it   *numeric.Integrator
	ode  numeric.ODESettings
	y    [3]complex128

	// state of the current evaluation
	omega      complex128
	th, tc, ta float64
	pm         float64
	runMode    int
	h2         float64 // total power through the stack, W (heat pump)
	stackMis   float64 // heat pump: Tm at the stack end minus its neighbour's temperature, K
	cur        *segment
	ca, cb     complex128 // uniform segment: dp/dx = ca U, dU/dx = cb p
	tL, tR     float64
	err        error
	deriv      func(x float64, y, dydx []complex128)
	observe    func(x float64, y []complex128)
	profile    *Profile
	lastState  GasState // gas state at the far end
	lastArea   float64  // gas area of the last duct
	lastRadius float64
	steps      int
}

// newModel compiles dev for integration with gas g (nil: the device's gas).
func newModel(dev *Device, g Gas, rtol float64) (*model, error) {
	if g == nil {
		g = MixtureGas{dev.Gas}
	}
	m := &model{dev: dev, gas: g, it: numeric.NewIntegrator(3), pm: dev.MeanPressure, ta: dev.AmbientTemperature}
	if rtol <= 0 {
		rtol = 1e-8
	}
	m.ode = numeric.ODESettings{RelTol: rtol, AbsTol: rtol * 1e-6}
	m.deriv = m.derivative
	m.observe = m.record
	x := 0.0
	for i, p := range dev.Parts {
		s := segment{part: i, kind: p.Kind, x0: x, length: p.Length, temp: p.Temp, tfix: p.Temperature, volume: p.Volume}
		switch p.Kind {
		case KindTube:
			s.area = p.Area()
			s.gasArea = s.area
			s.radius = p.Diameter / 2
			s.rh = p.Diameter / 4
		case KindStack, KindExchanger:
			s.area = p.Area()
			s.gasArea = p.Porosity * s.area
			sh, err := shapeFor(p.Pores, p.Porosity)
			if err != nil {
				return nil, &FieldError{Part: i, Kind: p.Kind, Field: "pores", Msg: err.Error()}
			}
			s.shape = sh
			s.rh = sh.HydraulicRadius()
		case KindDriver:
			if p.Diameter > 0 {
				s.area = p.Area()
			}
		}
		x += p.Length
		m.segs = append(m.segs, s)
	}
	for i := range m.segs {
		s := &m.segs[i]
		if s.kind != KindStack {
			continue
		}
		s.leftRef, s.leftFix, s.leftName = m.neighbourTemp(i, -1)
		s.rightRef, s.rightFix, s.rightName = m.neighbourTemp(i, +1)
		if s.leftRef == TempNone && s.rightRef == TempNone {
			s.leftRef, s.rightRef = TempAmbient, TempAmbient
		} else if s.leftRef == TempNone {
			s.leftRef, s.leftFix = s.rightRef, s.rightFix
		} else if s.rightRef == TempNone {
			s.rightRef, s.rightFix = s.leftRef, s.leftFix
		}
	}
	return m, nil
}

// neighbourTemp returns the temperature reference of the part next to
// stack i in direction dir, or TempNone when it has none (ends, stacks).
func (m *model) neighbourTemp(i, dir int) (TempRef, float64, string) {
	j := i + dir
	if j < 0 || j >= len(m.segs) {
		return TempNone, 0, ""
	}
	s := m.segs[j]
	switch s.kind {
	case KindTube, KindExchanger, KindCavity:
		return s.temp, s.tfix, fmt.Sprintf("part %d (%s)", j+1, s.kind)
	}
	return TempNone, 0, ""
}

func (m *model) resolve(r TempRef, fix float64) float64 {
	switch r {
	case TempHot:
		return m.th
	case TempCold:
		return m.tc
	case TempFixed:
		return fix
	}
	return m.ta
}

// state evaluates the gas, recording the first error.
func (m *model) state(T float64) GasState {
	g, err := m.gas.State(T, m.pm)
	if err != nil && m.err == nil {
		m.err = err
	}
	return g
}

// thermoviscous returns fν and fκ for segment s at temperature T with gas
// state g. The penetration depths use the real part of ω (for a complex
// frequency this is the usual high-Q approximation, documented on Mode).
//
//	δκ = √(2k/(ρ cp ω)),  δν = √(2μ/(ρ ω))
//
// Tubes use the boundary-layer limit f = (1 - i) δ / (2 rh) (Swift 2002,
// ch. 4, boundary-layer limit of Rott's functions), stacks and exchangers
// the pore shape's exact f.
func (m *model) thermoviscous(s *segment, g GasState) (fnu, fk complex128) {
	w := real(m.omega)
	dk := math.Sqrt(2 * g.Conductivity / (g.Density * g.Cp * w))
	dn := math.Sqrt(2 * g.Viscosity / (g.Density * w))
	if s.shape == nil {
		return complex(1, -1) * complex(dn/(2*s.rh), 0), complex(1, -1) * complex(dk/(2*s.rh), 0)
	}
	return s.shape.F(dn), s.shape.F(dk)
}

// coefficients returns the uniform-temperature coefficients of
//
//	dp1/dx = -iωρm / (A (1 - fν)) U1                    (momentum)
//	dU1/dx = -iωA (1 + (γ-1) fκ) / (γ pm) p1 + ...       (continuity)
//
// (Swift 2002, ch. 4, the momentum and continuity equations written with
// fν and fκ; the continuity equation's dTm/dx term is added in derivative;
// equation numbers not checked here, the forms are from memory and agree
// with the tests' short-stack and Kirchhoff limits).
func (m *model) coefficients(s *segment, g GasState, fnu, fk complex128) (ca, cb complex128) {
	iw := complex(0, 1) * m.omega
	ca = -iw * complex(g.Density/s.gasArea, 0) / (1 - fnu)
	cb = -iw * complex(s.gasArea/(g.Gamma*m.pm), 0) * (1 + complex(g.Gamma-1, 0)*fk)
	return ca, cb
}

// derivative is the right-hand side for y = (p1, U1, Tm) in the current
// segment; x is measured from the segment's start.
func (m *model) derivative(x float64, y, d []complex128) {
	s := m.cur
	if s.kind != KindStack {
		d[0] = m.ca * y[1]
		d[1] = m.cb * y[0]
		d[2] = 0
		return
	}
	var T, dTdx float64
	if m.runMode == modeLinear {
		dTdx = (m.tR - m.tL) / s.length
		T = m.tL + dTdx*x
	} else {
		T = real(y[2])
	}
	if !(T > 0) {
		if m.err == nil {
			m.err = fmt.Errorf("mean temperature fell to %s in part %d (stack)", units.Format(T, units.DimTemperature), s.part+1)
		}
		d[0], d[1], d[2] = 0, 0, 0
		return
	}
	g := m.state(T)
	if g.Density == 0 {
		d[0], d[1], d[2] = 0, 0, 0
		return
	}
	fnu, fk := m.thermoviscous(s, g)
	ca, cb := m.coefficients(s, g, fnu, fk)
	sigma := g.Prandtl()
	if math.Abs(1-sigma) < 1e-6 {
		sigma = 1 - 1e-6 // the σ → 1 limit is finite; avoid 0/0
	}
	p, u := y[0], y[1]
	if m.runMode == modeHeatPump {
		dTdx = m.gradient(s, g, sigma, fnu, fk, p, u)
	}
	d[0] = ca * u
	d[1] = cb*p + (fk-fnu)/((1-fnu)*complex(1-sigma, 0))*complex(dTdx/T, 0)*u
	d[2] = complex(dTdx, 0)
}

// gradient solves the total-power equation for dTm/dx (εs = 0, no solid
// conduction; Swift 2002, ch. 7, the total power H2 through a stack, from
// memory of its form):
//
//	H2 = ½ Re[p1 Ũ1 (1 - (fκ - f̃ν)/((1+σ)(1 - f̃ν)))]
//	   + ρm cp |U1|² / (2 A ω (1-σ) |1-fν|²) Im[f̃ν + (fκ - f̃ν)/(1+σ)] dTm/dx
//	   - A k dTm/dx
//
// with ˜ the complex conjugate and A the gas area.
func (m *model) gradient(s *segment, g GasState, sigma float64, fnu, fk, p, u complex128) float64 {
	w := real(m.omega)
	cfnu := cmplx.Conj(fnu)
	e := 0.5 * real(p*cmplx.Conj(u)*(1-(fk-cfnu)/(complex(1+sigma, 0)*(1-cfnu))))
	a := s.gasArea
	un := cmplx.Abs(u)
	one := cmplx.Abs(1 - fnu)
	c := g.Density * g.Cp * un * un / (2 * a * w * (1 - sigma) * one * one) * imag(cfnu+(fk-cfnu)/complex(1+sigma, 0))
	return (m.h2 - e) / (c - a*g.Conductivity)
}

func (m *model) record(x float64, y []complex128) {
	s := m.cur
	yy := [3]complex128{y[0], y[1], y[2]}
	if s.kind == KindStack && m.runMode == modeLinear {
		yy[2] = complex(m.tL+(m.tR-m.tL)*x/s.length, 0)
	}
	m.profile.add(s.x0+x, yy[:], s.part)
}

// run integrates from the start end with p1 = p0, U1 = u0 and returns the
// state at the far end. With prof non-nil it records the profile.
func (m *model) run(p0, u0 complex128, prof *Profile) ([3]complex128, error) {
	m.err = nil
	m.steps = 0
	m.profile = prof
	if prof != nil {
		m.it.Observer = m.observe
	} else {
		m.it.Observer = nil
	}
	y := m.y[:]
	y[0], y[1], y[2] = p0, u0, complex(m.ta, 0)
	m.stackMis = 0
	for i := range m.segs {
		s := &m.segs[i]
		m.cur = s
		switch s.kind {
		case KindClosedEnd, KindOpenEnd, KindDriver:
			continue
		case KindCavity:
			T := m.resolve(s.temp, s.tfix)
			g := m.state(T)
			if m.err != nil {
				return m.y, m.wrapErr(s)
			}
			y[1] -= complex(0, 1) * m.omega * complex(s.volume/(g.Gamma*m.pm), 0) * y[0]
			y[2] = complex(T, 0)
			if prof != nil {
				prof.add(s.x0, y, s.part)
			}
			continue
		case KindStack:
			m.tL = m.resolve(s.leftRef, s.leftFix)
			m.tR = m.resolve(s.rightRef, s.rightFix)
			y[2] = complex(m.tL, 0)
		default:
			T := m.resolve(s.temp, s.tfix)
			g := m.state(T)
			if m.err != nil {
				return m.y, m.wrapErr(s)
			}
			fnu, fk := m.thermoviscous(s, g)
			m.ca, m.cb = m.coefficients(s, g, fnu, fk)
			y[2] = complex(T, 0)
			m.lastState = g
			m.lastArea = s.gasArea
			m.lastRadius = s.radius
		}
		if s.kind != KindStack {
			m.propagate(s, y, prof)
			continue
		}
		res, err := m.it.Integrate(m.deriv, 0, s.length, y, &m.ode)
		m.steps += res.Steps
		if m.err != nil {
			return m.y, m.wrapErr(s)
		}
		if err != nil {
			return m.y, fmt.Errorf("part %d (%s): %w", s.part+1, s.kind, err)
		}
		if m.runMode == modeHeatPump {
			m.stackMis = real(y[2]) - m.tR
		}
		g := m.state(real(y[2]))
		if m.err != nil {
			return m.y, m.wrapErr(s)
		}
		m.lastState = g
		m.lastArea = s.gasArea
		m.lastRadius = 0
	}
	return m.y, nil
}

func (m *model) wrapErr(s *segment) error {
	return fmt.Errorf("part %d (%s): %w", s.part+1, s.kind, m.err)
}

// profilePoints is the number of profile rows per uniform part.
const profilePoints = 24

// propagate carries y across a part of uniform temperature with the exact
// solution of the constant-coefficient equations dp/dx = ca U, dU/dx = cb p:
//
//	p(x) = p0 cosh(Γx) + ca U0 sinh(Γx)/Γ
//	U(x) = cb p0 sinh(Γx)/Γ + U0 cosh(Γx),   Γ² = ca cb
//
// (the integrator would approximate the same solution; tests compare both).
func (m *model) propagate(s *segment, y []complex128, prof *Profile) {
	p0, u0 := y[0], y[1]
	gam := cmplx.Sqrt(m.ca * m.cb)
	at := func(x float64) (complex128, complex128) {
		gx := gam * complex(x, 0)
		ch, sh := cmplx.Cosh(gx), cmplx.Sinh(gx)
		shg := complex(x, 0) // sinh(Γx)/Γ → x as Γ → 0
		if gam != 0 {
			shg = sh / gam
		}
		return p0*ch + m.ca*u0*shg, m.cb*p0*shg + u0*ch
	}
	if prof != nil {
		for i := 0; i < profilePoints; i++ {
			x := s.length * float64(i) / profilePoints
			p, u := at(x)
			prof.add(s.x0+x, []complex128{p, u, y[2]}, s.part)
		}
	}
	y[0], y[1] = at(s.length)
	if prof != nil {
		prof.add(s.x0+s.length, y, s.part)
	}
}

// residual returns the far-end boundary residual in Pa for the end state y:
// closed end: (ρa/A) U1; open end: p1 - Z U1 with the low-ka radiation
// impedance of an unflanged pipe (Levine & Schwinger, Phys. Rev. 73,
// 383-406, 1948: end correction 0.6133 a, as printed in the paper's
// abstract; real part (ka)²/4, checked against the exact integrals in
// calc/resonator's tests) or of a pipe in an infinite flange (end
// correction 0.8216 a, Norris & Sheng 1989, as quoted by Dalmont,
// Nederveen & Joly, J. Sound Vib. 2001; real part (ka)²/2, the low-ka
// limit of the baffled piston, Kinsler, Frey, Coppens & Sanders,
// Fundamentals of Acoustics, 4th ed. 2000, ch. 7, from memory):
//
//	Z = ρa/A [(ka)²/4 + i k 0.6133 a]
func (m *model) residual(y [3]complex128) complex128 {
	last := m.dev.Parts[len(m.dev.Parts)-1]
	g := m.lastState
	zc := complex(g.Density*g.SoundSpeed/m.lastArea, 0)
	if last.Kind == KindClosedEnd {
		return zc * y[1]
	}
	k := m.omega / complex(g.SoundSpeed, 0)
	a := complex(m.lastRadius, 0)
	ka := k * a
	z := zc * (ka*ka/4 + complex(0, 1)*k*0.6133*a)
	if last.Flanged {
		z = zc * (ka*ka/2 + complex(0, 1)*k*0.8216*a)
	}
	return y[0] - z*y[1]
}

// errNotConverged marks a solve that did not converge.
var errNotConverged = errors.New("did not converge")
