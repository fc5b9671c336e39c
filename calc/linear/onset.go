package linear

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/units"
)

// Settings adjusts the solves. A nil *Settings means the defaults.
type Settings struct {
	// Gas overrides the device's gas model (tests inject a PowerLawGas).
	Gas Gas
	// RelTol is the integrator's relative tolerance (default 1e-9).
	RelTol float64
	// Tolerance ends the Newton iterations when every change is below
	// Tolerance times the unknown's size (default 1e-9).
	Tolerance float64
	// MaxIterations bounds the Newton iterations (default 40).
	MaxIterations int
	// FrequencyGuess starts the frequency (Hz); 0 estimates it from the
	// length of the device (quarter or half wave) and refines it with the
	// complex-frequency solve at ambient temperature.
	FrequencyGuess float64
	// HotGuess starts the hot temperature of Onset (K); 0 uses the
	// short-stack estimate.
	HotGuess float64
	// NoProfile skips recording the profile of the answer.
	NoProfile bool
}

func (s *Settings) values() Settings {
	var v Settings
	if s != nil {
		v = *s
	}
	if v.RelTol <= 0 {
		v.RelTol = 1e-9
	}
	if v.Tolerance <= 0 {
		v.Tolerance = 1e-9
	}
	if v.MaxIterations <= 0 {
		v.MaxIterations = 40
	}
	return v
}

// OnsetResult is the answer of Onset.
type OnsetResult struct {
	HotTemperature   float64 // Th at onset, K
	Frequency        float64 // Hz
	TemperatureRatio float64 // Th / T_ambient, 1
	Iterations       int     // Newton iterations
	Evaluations      int     // integrations through the device
	Converged        bool
	Profile          Profile // along the device at onset, with p1 = 1 Pa at the start end
	// ShortStack is the quick short-stack estimate for the first stack at
	// the onset frequency (nil when it cannot be made); compare its
	// CriticalDifference with HotTemperature - ambient.
	ShortStack *ShortStackResult
	Warnings   []string
}

// ConvergenceError reports a solve that did not converge, with its last
// iterate. The last iterate is not an answer.
type ConvergenceError struct {
	Solve      string    // "onset", "mode", "heat pump"
	Iterations int       // iterations done
	Last       []float64 // last iterate, in the order of Names
	Names      []string  // names with units, e.g. "hot temperature (K)"
	Why        string    // why the iteration stopped
}

// Error says which solve failed, why, and the last iterate with its units.
func (e *ConvergenceError) Error() string {
	s := fmt.Sprintf("%s solve did not converge after %d iterations (%s); last iterate:", e.Solve, e.Iterations, e.Why)
	for i, v := range e.Last {
		s += " " + e.Names[i] + " " + units.Number(v, 6)
		if i < len(e.Last)-1 {
			s += ","
		}
	}
	return s
}

// Is lets errors.Is(err, ErrNotConverged) match.
func (e *ConvergenceError) Is(target error) bool { return target == ErrNotConverged }

// ErrNotConverged matches every *ConvergenceError with errors.Is.
var ErrNotConverged = errNotConverged

// Onset finds the hot temperature and the real frequency at which the
// device's nearest mode neither grows nor decays: the parts at "hot" are at
// Th, the far-end boundary condition is met with p1 = 1 Pa and U1 = 0 at the
// start end. Two real unknowns (Th, f) and one complex residual are solved
// by damped Newton iterations with a finite-difference Jacobian (gonum/mat
// for the 2×2 solve), with steps limited to 25 % of Th and 10 % of f and Th
// kept within 0.3 to 8 times ambient.
//
// Errors: a device without a part at "hot" or without a stack, gas
// properties outside their range, and *ConvergenceError (matching
// ErrNotConverged) carrying the last iterate.
func Onset(dev *Device, s *Settings) (*OnsetResult, error) {
	set := s.values()
	if !dev.has(TempHot) {
		return nil, &FieldError{Part: -1, Msg: "no part is at \"hot\": mark the hot exchanger or tube with \"temperature\": \"hot\" (the onset solve finds that temperature)"}
	}
	if !dev.hasKind(KindStack) {
		return nil, &FieldError{Part: -1, Msg: "the device has no stack: onset needs one"}
	}
	if dev.has(TempCold) {
		return nil, &FieldError{Part: -1, Msg: "parts at \"cold\" belong to a heat pump; for onset give them \"ambient\" or a value"}
	}
	m, err := newModel(dev, set.Gas, set.RelTol)
	if err != nil {
		return nil, err
	}
	ta := dev.AmbientTemperature
	f0, err := m.startFrequency(set)
	if err != nil {
		return nil, fmt.Errorf("onset: %w", err)
	}
	th0 := set.HotGuess
	if th0 <= 0 {
		th0 = m.shortStackGuess(f0)
	}
	res := &OnsetResult{}
	pb := &newtonProblem{
		n: 2, x: []float64{th0, f0}, scale: []float64{ta, f0},
		lo: []float64{0.3 * ta, 0.2 * f0}, hi: []float64{8 * ta, 5 * f0},
		maxStep: []float64{0.25 * th0, 0.1 * f0},
		tol:     set.Tolerance, maxIter: set.MaxIterations,
		f: func(x, r []float64) error {
			m.th = x[0]
			m.omega = complex(2*math.Pi*x[1], 0)
			y, err := m.run(1, 0, nil)
			if err != nil {
				return err
			}
			z := m.residual(y)
			r[0], r[1] = real(z), imag(z)
			return nil
		},
	}
	err = pb.solve()
	res.Iterations, res.Evaluations = pb.iterations, pb.evaluations
	if err != nil {
		return nil, &ConvergenceError{Solve: "onset", Iterations: pb.iterations, Last: pb.x,
			Names: []string{"hot temperature (K)", "frequency (Hz)"}, Why: err.Error()}
	}
	res.HotTemperature, res.Frequency = pb.x[0], pb.x[1]
	res.TemperatureRatio = res.HotTemperature / ta
	res.Converged = true
	m.th, m.omega = res.HotTemperature, complex(2*math.Pi*res.Frequency, 0)
	if !set.NoProfile {
		if _, err := m.run(1, 0, &res.Profile); err != nil {
			return nil, err
		}
	}
	res.Warnings = m.warnings(res.Frequency, res.HotTemperature)
	if ss, err := m.shortStack(res.Frequency, res.HotTemperature-ta, false); err == nil {
		res.ShortStack = &ss
	}
	return res, nil
}

// shortStack evaluates ShortStack for the first stack at frequency f (Hz)
// with the temperatures of the answer: gas at the stack's mean
// temperature (half way between its ends), y0 the pores' hydraulic radius,
// dT the actual temperature difference across the stack (K, for Γ; 0
// leaves Γ at zero). The phase kx of the stack centre is counted from the
// start end (a closed end or a driver, taken as a pressure antinode), or
// with fromEnd from the far end (for a heat pump whose far end is closed:
// a rigid end is a pressure antinode, a driver only near resonance),
// adding ωℓ/a over the parts on the way at their own temperatures.
func (m *model) shortStack(f, dT float64, fromEnd bool) (ShortStackResult, error) {
	w := 2 * math.Pi * f
	for i, s := range m.segs {
		if s.kind != KindStack {
			continue
		}
		tm := (m.resolve(s.leftRef, s.leftFix) + m.resolve(s.rightRef, s.rightFix)) / 2
		g, err := m.gas.State(tm, m.pm)
		if err != nil {
			return ShortStackResult{}, err
		}
		phase := w * s.length / 2 / g.SoundSpeed
		var on []segment
		if fromEnd {
			on = m.segs[i+1:]
		} else {
			on = m.segs[:i]
		}
		pos := s.length / 2
		for _, o := range on {
			if o.length == 0 {
				continue
			}
			t := m.resolve(o.temp, o.tfix)
			if o.kind == KindStack {
				t = (m.resolve(o.leftRef, o.leftFix) + m.resolve(o.rightRef, o.rightFix)) / 2
			}
			og, err := m.gas.State(t, m.pm)
			if err != nil {
				return ShortStackResult{}, err
			}
			phase += w * o.length / og.SoundSpeed
			pos += o.length
		}
		return ShortStack(ShortStackInput{
			Gamma: g.Gamma, Prandtl: g.Prandtl(), MeanTemperature: tm, SoundSpeed: g.SoundSpeed,
			Frequency: f, Position: pos, Length: s.length, HalfGap: s.rh,
			ThermalDepth:          math.Sqrt(2 * g.Conductivity / (g.Density * g.Cp * w)),
			TemperatureDifference: math.Abs(dT),
			Phase:                 phase,
		})
	}
	return ShortStackResult{}, errors.New("no stack")
}

func (d *Device) has(r TempRef) bool {
	for _, p := range d.Parts {
		if p.Temp == r {
			return true
		}
	}
	return false
}

func (d *Device) hasKind(k string) bool {
	for _, p := range d.Parts {
		if p.Kind == k {
			return true
		}
	}
	return false
}

// estimateFrequency is the quarter-wave (open far end) or half-wave (closed
// far end) frequency of the device's total length at ambient temperature,
// the usual first guess (common practice).
func (m *model) estimateFrequency() (float64, error) {
	g, err := m.gas.State(m.ta, m.pm)
	if err != nil {
		return 0, err
	}
	l := m.dev.Length()
	if m.dev.Parts[len(m.dev.Parts)-1].Kind == KindOpenEnd {
		return g.SoundSpeed / (4 * l), nil
	}
	return g.SoundSpeed / (2 * l), nil
}

// startFrequency returns the settings' guess or the real part of the
// nearest mode's complex frequency at ambient temperature.
func (m *model) startFrequency(set Settings) (float64, error) {
	if set.FrequencyGuess > 0 {
		return set.FrequencyGuess, nil
	}
	fe, err := m.estimateFrequency()
	if err != nil {
		return 0, err
	}
	th, tc := m.th, m.tc
	m.th, m.tc = m.ta, m.ta
	mr, err := m.mode(fe, set)
	m.th, m.tc = th, tc
	if err != nil {
		return fe, nil // fall back to the length estimate
	}
	return mr.Frequency, nil
}

// shortStackGuess starts Th from the short-stack critical gradient at the
// centre of the first stack, measured from the start end (a pressure
// antinode): Th = Ta + 1.5 ∇Tcrit Δx, kept within 1.2 to 4 times ambient.
func (m *model) shortStackGuess(f float64) float64 {
	ta := m.ta
	g, err := m.gas.State(ta, m.pm)
	if err != nil {
		return 1.5 * ta
	}
	for _, s := range m.segs {
		if s.kind != KindStack {
			continue
		}
		k := 2 * math.Pi * f / g.SoundSpeed
		grad := CriticalGradient(g.Gamma, ta, k, s.x0+s.length/2)
		th := ta + 1.5*math.Abs(grad)*s.length
		return math.Min(math.Max(th, 1.2*ta), 4*ta)
	}
	return 1.5 * ta
}

// warnings lists validity limits met at the answer.
func (m *model) warnings(f, th float64) []string {
	var w []string
	omega := 2 * math.Pi * f
	for _, s := range m.segs {
		if s.kind != KindTube {
			continue
		}
		T := m.resolve(s.temp, s.tfix)
		g, err := m.gas.State(T, m.pm)
		if err != nil {
			continue
		}
		dn := math.Sqrt(2 * g.Viscosity / (g.Density * omega))
		if dn > 0.1*s.rh {
			w = append(w, fmt.Sprintf("part %d (tube): viscous penetration depth %s is not small against the hydraulic radius %s; the boundary-layer losses are rough", s.part+1, units.Format(dn, units.DimLength), units.Format(s.rh, units.DimLength)))
		}
		if ka := omega / g.SoundSpeed * s.radius; ka > 0.5 && s.part == len(m.segs)-2 && m.dev.Parts[len(m.dev.Parts)-1].Kind == KindOpenEnd {
			w = append(w, fmt.Sprintf("open end: ka = %.2f is not small; the low-frequency radiation impedance is rough", ka))
		}
	}
	if lo, hi := 0.0, 0.0; m.dev.Gas.Components() != nil {
		lo, hi = m.dev.Gas.Range()
		if th > hi || th < lo {
			w = append(w, fmt.Sprintf("hot temperature %.0f K is outside the gas model's range %.0f–%.0f K", th, lo, hi))
		}
	}
	return w
}

// ModeResult is the answer of Mode.
type ModeResult struct {
	Frequency  float64 // Re ω / 2π, Hz
	GrowthRate float64 // -Im ω, 1/s: > 0 grows (above onset), < 0 decays
	Q          float64 // Re ω / (2 |Im ω|); +Inf exactly at onset
	Growing    bool
	Iterations int
	Profile    Profile
	Warnings   []string // model-range warnings (as OnsetResult.Warnings)
}

// Mode finds the complex frequency ω of the mode nearest the start
// frequency with the parts at "hot" held at hot (K; 0 means ambient). With
// time dependence e^{iωt}, a mode grows when Im ω < 0. The thermoviscous
// functions fν, fκ are evaluated at the real part of ω, which is the usual
// approximation for modes with Q ≫ 1 (the loss per cycle is small); the
// wave equations themselves use the complex ω.
func Mode(dev *Device, hot float64, s *Settings) (*ModeResult, error) {
	set := s.values()
	m, err := newModel(dev, set.Gas, set.RelTol)
	if err != nil {
		return nil, err
	}
	if hot <= 0 {
		hot = dev.AmbientTemperature
	}
	m.th, m.tc = hot, dev.AmbientTemperature
	f0 := set.FrequencyGuess
	if f0 <= 0 {
		if f0, err = m.estimateFrequency(); err != nil {
			return nil, err
		}
	}
	r, err := m.mode(f0, set)
	if err != nil {
		return nil, err
	}
	r.Warnings = m.warnings(r.Frequency, hot)
	if !set.NoProfile {
		if _, err := m.run(1, 0, &r.Profile); err != nil {
			return nil, err
		}
	}
	return r, nil
}

// mode solves for the complex frequency from f0 with the model's current
// temperatures; m.omega holds the answer afterwards.
func (m *model) mode(f0 float64, set Settings) (*ModeResult, error) {
	pb := &newtonProblem{
		n: 2, x: []float64{f0, 0}, scale: []float64{f0, f0},
		lo: []float64{0.1 * f0, -f0}, hi: []float64{10 * f0, f0},
		maxStep: []float64{0.1 * f0, 0.05 * f0},
		tol:     set.Tolerance, maxIter: set.MaxIterations,
		f: func(x, r []float64) error {
			m.omega = complex(2*math.Pi*x[0], 2*math.Pi*x[1])
			y, err := m.run(1, 0, nil)
			if err != nil {
				return err
			}
			z := m.residual(y)
			r[0], r[1] = real(z), imag(z)
			return nil
		},
	}
	if err := pb.solve(); err != nil {
		return nil, &ConvergenceError{Solve: "mode", Iterations: pb.iterations, Last: pb.x,
			Names: []string{"frequency (Hz)", "imaginary part of frequency (Hz)"}, Why: err.Error()}
	}
	w := complex(2*math.Pi*pb.x[0], 2*math.Pi*pb.x[1])
	m.omega = w
	r := &ModeResult{Frequency: pb.x[0], GrowthRate: -imag(w), Iterations: pb.iterations}
	r.Growing = r.GrowthRate > 0
	if imag(w) == 0 {
		r.Q = math.Inf(1)
	} else {
		r.Q = real(w) / (2 * math.Abs(imag(w)))
	}
	return r, nil
}
