package linear

import (
	"errors"
	"fmt"
	"math"
	"math/cmplx"

	"tubewright/calc/units"
)

// HeatPumpSettings adds the heat pump's own inputs to Settings.
type HeatPumpSettings struct {
	Settings
	// Frequency overrides the driver's frequency (Hz); 0 uses the driver's.
	Frequency float64
	// CoolingLoad is the heat (W) taken from the cold side; 0 is zero load.
	CoolingLoad float64
}

// HeatPumpResult is the answer of HeatPump.
type HeatPumpResult struct {
	Frequency       float64 // drive frequency, Hz
	ColdTemperature float64 // Tc at the stack's cold end, K
	TemperatureSpan float64 // T_ambient - Tc, K
	AcousticPower   float64 // acoustic power the driver puts in, W
	CoolingLoad     float64 // heat taken from the cold side, W
	COP             float64 // CoolingLoad / AcousticPower
	CarnotCOP       float64 // Tc / (T_ambient - Tc)
	COPRelative     float64 // COP / CarnotCOP
	DriverPressure  float64 // |p1| at the driver, Pa
	DriverFlow      float64 // |U1| at the driver, m³/s
	Iterations      int
	Evaluations     int
	Profile         Profile
	// ShortStack is the quick short-stack estimate for the stack at the
	// drive frequency (nil when it cannot be formed): its ZeroLoadSpan is
	// the short-stack zero-load span, its GradientRatio Γ the solved span
	// over the critical one (negative when the span is: heat pumped the
	// other way), with the validity numbers kΔx and δκ/y0. The
	// stack's place in the standing wave is measured from the far end when
	// that is closed, else from the driver.
	ShortStack *ShortStackResult
	Warnings   []string
}

// HeatPump finds the mean-temperature profile through the device's one
// stack for a driver at the start end, at a given frequency and amplitude.
// The stack's neighbour on one side is held at ambient (or a value); the
// parts marked "cold" on the other side float at the cold temperature Tc.
// Along the stack, dTm/dx follows from the total power H2 (see gradient in
// model.go), which is constant through the stack: with the cold side beyond
// the stack (x larger) H2 = -Q, with the cold side between the driver and
// the stack H2 = W + Q, where Q is the cooling load and W the driver's
// acoustic power (energy conservation in the insulated cold region).
//
// Unknowns: the complex free amplitude at the driver (U1 when the pressure
// amplitude is given, p1 otherwise) and Tc; residuals: the far-end boundary
// condition and the mismatch between the integrated Tm at the stack's end
// and its neighbour's temperature. Damped Newton, as in Onset, started
// from the linear answer with every part at ambient; when that fails, by
// continuation in the drive amplitude (a tenth, two tenths, ... of it).
func HeatPump(dev *Device, hs *HeatPumpSettings) (*HeatPumpResult, error) {
	var in HeatPumpSettings
	if hs != nil {
		in = *hs
	}
	set := in.Settings.values()
	drv, f, err := pumpDrive(dev, &in)
	if err != nil {
		return nil, err
	}
	m, err := newModel(dev, set.Gas, set.RelTol)
	if err != nil {
		return nil, err
	}
	coldRight, err := pumpStack(m, dev)
	if err != nil {
		return nil, err
	}
	ps := &pumpSolve{m: m, set: set, ta: dev.AmbientTemperature, load: in.CoolingLoad,
		coldRight: coldRight, usePressure: drv.PressureAmplitude > 0, ampScale: 1}
	m.omega = complex(2*math.Pi*f, 0)
	ps.amp = complex(drv.PressureAmplitude, 0)
	if !ps.usePressure {
		ps.amp = complex(drv.VolumeVelocityAmplitude, 0)
	}
	free, err := ps.linearStart(drv)
	if err != nil {
		return nil, err
	}
	x, iters, evals, err := ps.solve(free)
	if err != nil {
		return nil, err
	}
	res := &HeatPumpResult{Frequency: f, Iterations: iters, Evaluations: evals, CoolingLoad: ps.load}
	if err := ps.finish(res, x, dev, f); err != nil {
		return nil, err
	}
	return res, nil
}

// pumpDrive checks the heat pump's driver, frequency and load, and returns
// the driver and the drive frequency (Hz).
func pumpDrive(dev *Device, in *HeatPumpSettings) (*Part, float64, error) {
	drv := dev.Driver()
	if drv == nil {
		return nil, 0, &FieldError{Part: 0, Kind: dev.Parts[0].Kind, Field: "kind", Msg: "must be a driver for a heat pump"}
	}
	f := in.Frequency
	if f <= 0 {
		f = drv.Frequency
	}
	if f <= 0 {
		return nil, 0, &FieldError{Part: 0, Kind: KindDriver, Field: "frequency", Msg: "is missing: the heat pump needs the drive frequency"}
	}
	if !(in.CoolingLoad >= 0) || math.IsInf(in.CoolingLoad, 0) {
		return nil, 0, fmt.Errorf("heat pump: cooling load %s must be zero or positive", units.Format(in.CoolingLoad, units.DimPower))
	}
	return drv, f, nil
}

// pumpStack finds the device's one stack, checks that exactly one of its
// neighbours is cold, sets the hot temperature where parts are "hot", and
// reports whether the cold side lies beyond the stack (x larger).
func pumpStack(m *model, dev *Device) (coldRight bool, err error) {
	stack := -1
	for i, s := range m.segs {
		if s.kind == KindStack {
			if stack >= 0 {
				return false, &FieldError{Part: i, Kind: KindStack, Msg: "is a second stack; the heat pump solve handles one"}
			}
			stack = i
		}
	}
	if stack < 0 {
		return false, &FieldError{Part: -1, Msg: "the device has no stack: a heat pump needs one"}
	}
	st := &m.segs[stack]
	coldRight = st.rightRef == TempCold
	if coldRight == (st.leftRef == TempCold) {
		return false, &FieldError{Part: stack, Kind: KindStack, Msg: "needs exactly one neighbour at \"cold\" (the side it cools) and the other at \"ambient\" or a value"}
	}
	if dev.has(TempHot) {
		if dev.HotTemperature <= 0 {
			return false, &FieldError{Part: -1, Field: "hot_temperature", Msg: "is needed: some parts are at \"hot\""}
		}
		m.th = dev.HotTemperature
	}
	return coldRight, nil
}

// pumpSolve is the state of one heat-pump solve: the model, the drive and
// the scales of the Newton problem.
type pumpSolve struct {
	m           *model
	set         Settings
	ta          float64    // ambient temperature, K
	load        float64    // cooling load, W
	coldRight   bool       // the cold side lies beyond the stack
	usePressure bool       // the driver's pressure amplitude is given
	amp         complex128 // the given drive amplitude
	ampScale    float64    // drive amplitude factor, < 1 during continuation
	fs, rs      float64    // scales of the free amplitude and of the residual
}

// start returns p1 and U1 at the driver for a free amplitude.
func (ps *pumpSolve) start(free complex128) (p0, u0 complex128) {
	a := ps.amp * complex(ps.ampScale, 0)
	if ps.usePressure {
		return a, free
	}
	return free, a
}

// setPower sets the total power H2 through the stack for the driver state.
func (ps *pumpSolve) setPower(p0, u0 complex128) {
	if ps.coldRight {
		ps.m.h2 = -ps.load
	} else {
		ps.m.h2 = 0.5*real(p0*cmplx.Conj(u0)) + ps.load
	}
}

// linearStart returns the free amplitude of the linear answer with every
// part at ambient (two integrations: the residual is linear in the state at
// fixed temperatures), and sets the scales of the Newton problem.
func (ps *pumpSolve) linearStart(drv *Part) (complex128, error) {
	m := ps.m
	m.tc, m.runMode = ps.ta, modeLinear
	p0, u0 := ps.start(0)
	ya, err := m.run(p0, u0, nil)
	if err != nil {
		return 0, err
	}
	ra := m.residual(ya)
	pe, ue := complex128(0), complex128(1) // unit free amplitude, no drive
	if !ps.usePressure {
		pe, ue = 1, 0
	}
	yb, err := m.run(pe, ue, nil)
	if err != nil {
		return 0, err
	}
	rb := m.residual(yb)
	if rb == 0 {
		return 0, errors.New("heat pump: the driver cannot excite the device (degenerate start)")
	}
	free := -ra / rb
	ps.fs = math.Max(cmplx.Abs(free), 1e-30)
	ps.rs = drv.PressureAmplitude // residual scale, Pa
	if !ps.usePressure {
		ps.rs = ps.fs // the free amplitude is the driver's pressure
	}
	m.runMode = modeHeatPump
	return free, nil
}

// problem is the Newton problem in (Re free, Im free, Tc) from x0.
func (ps *pumpSolve) problem(x0 []float64) *newtonProblem {
	fs, ta, m := ps.fs, ps.ta, ps.m
	return &newtonProblem{
		n: 3, x: x0, scale: []float64{fs, fs, ta},
		lo: []float64{-1e3 * fs, -1e3 * fs, 0.05 * ta}, hi: []float64{1e3 * fs, 1e3 * fs, 3 * ta},
		maxStep: []float64{10 * fs, 10 * fs, 0.1 * ta},
		tol:     ps.set.Tolerance, maxIter: 2 * ps.set.MaxIterations,
		f: func(x, r []float64) error {
			m.tc = x[2]
			p0, u0 := ps.start(complex(x[0], x[1]))
			ps.setPower(p0, u0)
			y, err := m.run(p0, u0, nil)
			if err != nil {
				return err
			}
			z := m.residual(y)
			r[0], r[1], r[2] = real(z)/ps.rs, imag(z)/ps.rs, m.stackMis/ta
			return nil
		},
	}
}

// solve runs Newton from the linear start and, when that fails, by
// continuation in the drive amplitude: from a tenth of it, where the
// linear start is good, up to the full amplitude, each step starting from
// the last answer scaled to the new amplitude.
func (ps *pumpSolve) solve(free complex128) (x []float64, iters, evals int, err error) {
	pb := ps.problem([]float64{real(free), imag(free), ps.ta})
	err = pb.solve()
	iters, evals = pb.iterations, pb.evaluations
	if err != nil {
		x := []float64{0.1 * real(free), 0.1 * imag(free), ps.ta}
		for k := 1; k <= 10; k++ {
			ps.ampScale = float64(k) / 10
			pb = ps.problem(x)
			err = pb.solve()
			iters += pb.iterations
			evals += pb.evaluations
			if err != nil {
				break
			}
			g := float64(k+1) / float64(k)
			x = []float64{g * pb.x[0], g * pb.x[1], pb.x[2]}
		}
	}
	if err != nil {
		return nil, iters, evals, &ConvergenceError{Solve: "heat pump", Iterations: iters, Last: pb.x,
			Names: []string{"real part of free amplitude", "imaginary part of free amplitude", "cold temperature (K)"}, Why: err.Error()}
	}
	return pb.x, iters, evals, nil
}

// finish integrates once more at the solution x and fills res: the cold
// temperature, span, power, COP, the driver's amplitudes, the profile,
// the short-stack estimate and the warnings.
func (ps *pumpSolve) finish(res *HeatPumpResult, x []float64, dev *Device, f float64) error {
	m := ps.m
	m.tc = x[2]
	p0, u0 := ps.start(complex(x[0], x[1]))
	ps.setPower(p0, u0)
	var prof *Profile
	if !ps.set.NoProfile {
		prof = &res.Profile
	}
	if _, err := m.run(p0, u0, prof); err != nil {
		return err
	}
	res.ColdTemperature = m.tc
	res.TemperatureSpan = ps.ta - m.tc
	res.AcousticPower = 0.5 * real(p0*cmplx.Conj(u0))
	res.DriverPressure, res.DriverFlow = cmplx.Abs(p0), cmplx.Abs(u0)
	if res.AcousticPower > 0 {
		res.COP = ps.load / res.AcousticPower
	}
	if res.TemperatureSpan > 0 {
		res.CarnotCOP = m.tc / res.TemperatureSpan
		res.COPRelative = res.COP / res.CarnotCOP
	}
	res.Warnings = m.warnings(f, ps.ta)
	last := dev.Parts[len(dev.Parts)-1].Kind
	if ss, err := m.shortStack(f, res.TemperatureSpan, last == KindClosedEnd); err == nil {
		if res.TemperatureSpan < 0 {
			ss.GradientRatio = -ss.GradientRatio // heat pumped the other way
		}
		res.ShortStack = &ss
	}
	if res.TemperatureSpan < 0 {
		res.Warnings = append(res.Warnings, "the cold side ends up warmer than ambient: the stack pumps heat the other way at this frequency and position")
	}
	return nil
}
