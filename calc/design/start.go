package design

import (
	"math"

	"tubewright/calc/pore"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// wave holds the plane standing wave of the target at ambient temperature:
// the numbers the start rules need.
type wave struct {
	gas        gasprops.Properties // at ambient and mean pressure
	k          float64             // 2πf/a, 1/m
	lambda     float64             // a/f, m
	deltaKappa float64             // δκ at ambient, m
	deltaNu    float64             // δν at ambient, m
}

func newWave(t *Target, gas gasprops.Mixture) (wave, error) {
	p, err := gas.Properties(units.Temperature(t.Ambient), units.Pressure(t.MeanPressure), nil)
	if err != nil {
		return wave{}, err
	}
	dk, dn, err := pore.PenetrationDepths(p, t.Frequency)
	if err != nil {
		return wave{}, err
	}
	return wave{gas: p, k: 2 * math.Pi * t.Frequency / p.SoundSpeed, lambda: p.SoundSpeed / t.Frequency, deltaKappa: dk, deltaNu: dn}, nil
}

// displacement returns the gas displacement amplitude ξ (m) at distance x
// (m) from the closed end in a standing wave whose pressure amplitude at
// the closed end is driveRatio·pm:
//
//	ξ = |u1|/ω = D pm sin kx / (ρ a ω) = D sin kx / (γ k)
//
// (ρa² = γ pm for an ideal gas; standing-wave acoustics).
func (w wave) displacement(x, driveRatio float64) float64 {
	return driveRatio * math.Abs(math.Sin(w.k*x)) / (w.gas.Gamma * w.k)
}

// Exchanger and stack lengths from the gas displacement (common practice,
// no published source): each heat exchanger as long as the peak-to-peak
// displacement 2ξ at its place, at least 1 mm; the stack at least twice the
// peak-to-peak displacement at its centre, so that gas does not shuttle
// from heater to cooler in one stroke (the linear stack model assumes ξ
// small against the stack length).
const (
	minExchanger       = 1e-3 // m
	minHotSpace        = 2e-3 // m
	stackDisplacements = 2.0  // stack length >= this × 2ξ at its centre
)

// exchangerLength returns 2ξ at x, at least minExchanger.
func (w wave) exchangerLength(x, driveRatio float64) float64 {
	return math.Max(2*w.displacement(x, driveRatio), minExchanger)
}

// minStack returns the shortest stack (m) whose hot face is at pos (m):
// stackDisplacements × 2ξ at the stack centre, by fixed-point iteration
// (the map contracts: its slope is below D/γ).
func (w wave) minStack(pos, driveRatio float64) float64 {
	l := minExchanger
	for range 8 {
		l = math.Max(stackDisplacements*2*w.displacement(pos+l/2, driveRatio), minExchanger)
	}
	return l
}

// shortStackOnset is the short-stack estimate of the onset temperature
// difference (K) of a stack of length dx (m) and hydraulic radius rh (m),
// porosity phi, centred at kx, in a tube of diameter d (m) whose resonator
// wall (length lres, m) is the only other loss. From the boundary-layer
// short-stack results of Swift, "Thermoacoustic engines", J. Acoust. Soc.
// Am. 84, 1145 (1988) (from memory of their form; solid heat capacity and
// conduction neglected), the acoustic power of the stack and the wall loss
// of the resonator, both per ω pA²/(4 ρ a²) with pA the pressure amplitude
// at the closed end, are
//
//	W_stack = Π Δx [(γ-1) δκ cos²kx (Γ - 1) - δν sin²kx]
//	W_wall  = π d (L/2) [δν + (γ-1) δκ]
//
// with Π = φ A / r_h the stack's wetted perimeter and Γ the temperature
// gradient over the critical one, (γ-1) T k cot kx. Onset is W_stack =
// W_wall, so
//
//	Γ = 1 + [δν sin²kx + π d L (δν + (γ-1) δκ) / (2 Π Δx)] / ((γ-1) δκ cos²kx)
//	ΔT = Γ (γ-1) T k Δx cot kx
func (w wave) shortStackOnset(t *Target, kx, dx, rh, phi, lres float64) float64 {
	g := w.gas.Gamma - 1
	area := math.Pi * t.Diameter * t.Diameter / 4
	perim := phi * area / rh
	s, c := math.Sincos(kx)
	wall := math.Pi * t.Diameter * lres * (w.deltaNu + g*w.deltaKappa) / (2 * perim * dx)
	gamma := 1 + (w.deltaNu*s*s+wall)/(g*w.deltaKappa*c*c)
	return gamma * g * t.Ambient * w.k * dx * c / s
}

// resonatorGuess returns the whole tube length (m) of the target's
// frequency at ambient temperature: a/(2f) for a half-wave tube, a/(4f)
// less the unflanged end correction 0.6133 r for a quarter-wave tube
// (Levine & Schwinger 1948, as used by calc/linear).
func (w wave) tubeGuess(t *Target) float64 {
	if t.Ends == QuarterWave {
		return w.lambda/4 - 0.6133*t.Diameter/2
	}
	return w.lambda / 2
}

// maxTube is the longest tube a device file may describe, m (calc/linear
// accepts parts up to 100 m; the design keeps a margin).
const maxTube = 90.0

// checkLength refuses a target frequency so low that the tube would be
// longer than maxTube, as a range error on the frequency.
func (w wave) checkLength(t *Target) error {
	if l := w.tubeGuess(t); l > maxTube {
		fmin := t.Frequency * l / maxTube
		return units.NewRangeError("target frequency", t.Frequency, fmin, 20000, "Hz").Of(units.SubjectFrequency)
	}
	return nil
}

// startGeometry returns the start of the search: the hydraulic radius from
// the penetration-depth rule of calc/pore (RuleFor(RoleStack): r_h = 1.5
// δκ), the stack at the position that minimises the short-stack onset
// estimate with the shortest stack the displacement rule allows there.
func (t *Target) startGeometry(w wave, driveRatio float64, rhLo, rhHi float64) Geometry {
	rh := clamp(pore.RuleFor(pore.RoleStack).Target*w.deltaKappa, rhLo, rhHi)
	pores, phi, gap := poresFor(t.Stack, rh, t.wire())
	total := w.tubeGuess(t)
	best, bestPos := math.Inf(1), 0.0
	hi := positionMax(w)
	for i := 1; i <= 200; i++ {
		pos := minHotSpace + (hi-minHotSpace)*float64(i)/200
		dx := w.minStack(pos, driveRatio)
		kx := w.k * (pos + dx/2)
		if kx >= math.Pi/2 {
			break
		}
		if dT := w.shortStackOnset(t, kx, dx, rh, phi, total); dT < best {
			best, bestPos = dT, pos
		}
	}
	g := Geometry{HydraulicRadius: rh, Porosity: phi, Pores: pores, Gap: gap}
	t.place(&g, w, bestPos, w.minStack(bestPos, driveRatio), driveRatio)
	g.Resonator = math.Max(total-g.Length(), minResonator(t))
	return g
}

// place sets the hot space, heater, stack and cooler lengths for a stack
// whose hot face is at pos (m) and whose length is dx (m).
func (t *Target) place(g *Geometry, w wave, pos, dx, driveRatio float64) {
	g.Heater = math.Min(w.exchangerLength(pos, driveRatio), pos-minHotSpace)
	g.Heater = math.Max(g.Heater, minExchanger)
	g.HotSpace = math.Max(pos-g.Heater, minHotSpace)
	g.Stack = dx
	g.Cooler = w.exchangerLength(pos+dx, driveRatio)
}

// positionMax is the farthest the stack's hot face may sit from the closed
// end: 3λ/16, beyond λ/8 where engine stacks commonly sit (common
// practice, no published source), and well short of the velocity antinode.
func positionMax(w wave) float64 {
	return 3 * w.lambda / 16
}

// minResonator is the shortest resonator tube the design builds: one tube
// diameter (common practice, no published source: the plane-wave model
// needs the tube longer than it is wide).
func minResonator(t *Target) float64 { return t.Diameter }

func clamp(v, lo, hi float64) float64 { return math.Min(math.Max(v, lo), hi) }
