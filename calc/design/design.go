package design

import (
	"context"
	"errors"
	"fmt"
	"math"

	"tubewright/calc/linear"
	"tubewright/calc/pore"
	"tubewright/calc/safety"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Settings adjusts Design and DesignHeatPump. A nil *Settings means the
// defaults.
type Settings struct {
	// DriveRatio is the working pressure amplitude at the closed end over
	// the mean pressure, used only to size the heat exchangers (2ξ) and
	// the shortest stack (twice 2ξ). Default 0.03 (common practice, no
	// published source: standing-wave engines commonly run at a few per
	// cent).
	DriveRatio float64
	// MaxSolves bounds the solves of the search: onset solves for
	// Design (default 2000), heat-pump and mode solves for DesignHeatPump
	// (default 4000). A search stopped by it says so in the warnings.
	MaxSolves int
	// NoSensitivity skips the sensitivity table.
	NoSensitivity bool
	// Gas, when not nil, replaces the target's gas model in every solve
	// (tests use linear.PowerLawGas to compare with an independent
	// solver). The start rules still use the target's gas.
	Gas linear.Gas
	// Context, when not nil, cancels the design: once it is done the
	// search stops and Design (or DesignHeatPump) returns its error. A
	// screen runs the design off its UI goroutine with one.
	Context context.Context
	// Progress, when not nil, is called after each solve with the solves
	// so far and the limit MaxSolves (the search usually ends well before
	// it), on the goroutine that runs the design.
	Progress func(solves, limit int)
}

// stop returns the context's error, if any.
func (s *Settings) stop() error {
	if s.Context == nil {
		return nil
	}
	return s.Context.Err()
}

// done counts one solve and reports progress.
func (s *Settings) done(solves *int) {
	*solves++
	if s.Progress != nil {
		s.Progress(*solves, s.MaxSolves)
	}
}

func (s *Settings) values() Settings {
	var v Settings
	if s != nil {
		v = *s
	}
	if !(v.DriveRatio > 0 && v.DriveRatio < 0.3) {
		v.DriveRatio = 0.03
	}
	if v.MaxSolves <= 0 {
		v.MaxSolves = 2000
	}
	return v
}

// Result is a designed engine.
type Result struct {
	Target   Target
	Geometry Geometry // the chosen engine
	Start    Geometry // the start of the search, from the rules
	// StartOnset is the onset temperature of the start geometry with its
	// resonator tuned to the target (K), or 0 when it did not solve.
	StartOnset float64
	// File is the device file of the design, in the project's own format.
	File linear.DeviceFile
	// Device is File as read back by linear's parser.
	Device *linear.Device
	// Onset is linear.Onset of Device with default settings, the same
	// solve `twcalc onset` runs on the written file (with Settings.Gas
	// when one is given).
	Onset *linear.OnsetResult
	// Margin is the available hot temperature less the onset temperature,
	// K; negative means the design does not start.
	Margin float64
	// FrequencyError is (onset frequency - target) / target, 1.
	FrequencyError float64
	// ThermalDepth and ViscousDepth are δκ and δν of the gas at ambient
	// temperature, the mean pressure and the target frequency, m.
	ThermalDepth, ViscousDepth float64
	// Wavelength is a/f at ambient temperature, m.
	Wavelength float64
	// Sensitivity tells how onset and frequency move with the build.
	Sensitivity []Sensitivity
	// Solves counts the onset solves of the whole design; Iterations the
	// optimiser's major iterations; Status is its stopping reason.
	Solves, Iterations int
	Status             string
	Rules              []string // every rule and method used, with its source
	Warnings           []string
	Cautions           []string
}

// UnreachableError says why a target cannot be met and carries the
// nearest design that can be built.
type UnreachableError struct {
	Problem string // what cannot be met, with the numbers
	Nearest Result // the nearest design found
}

// Error names the problem and the nearest design.
func (e *UnreachableError) Error() string { return "design: " + e.Problem }

// searchTol is the relative tolerance of the search's solves; they use
// the tabulated gas (tableGas). Final solves use 1e-9 and the gas itself.
const searchTol = 1e-5

// errSolve marks an evaluation that did not solve.
var errSolve = errors.New("design: no solution")

// Design finds an engine for the target: a hot space, heater, stack,
// cooler and resonator, all of the target's diameter, closed at the hot
// end and closed or open at the far end.
//
// Method:
//  1. Stack pores: hydraulic radius r_h = 1.5 δκ at ambient temperature
//     (pore.RuleFor(pore.RoleStack): 1–2 δκ, common practice; Tijani,
//     Zeegers & de Waele, JASA 112, 128 (2002): plate spacing about 3 δκ;
//     Swift 2002, "Thermoacoustics: a unifying perspective", ch. 7, y0
//     about δκ to 2δκ for standing-wave stacks, from memory), kept within
//     the smallest gap and the packing limits of the kind.
//  2. Position: the stack hot face where the short-stack onset estimate
//     (shortStackOnset, after Swift 1988) is lowest, with the shortest
//     stack the displacement rule allows (Settings.DriveRatio).
//  3. Search: gonum/optimize Nelder-Mead over the logarithms of position,
//     stack length and r_h minimising the onset temperature of
//     linear.Onset, each candidate's resonator length solved by Brent
//     (calc/numeric) so that its onset frequency is the target.
//  4. The best candidate is written as a device file, read back, tuned
//     again and solved with linear.Onset's defaults.
//
// Errors: bad input as *units.RangeError naming the field; an onset above
// the available hot temperature, a tube longer than Target.MaxLength or a
// frequency no tube of the design can reach as *UnreachableError. The
// error's Nearest is the nearest design that can be built: the design
// itself, or for a tube too long the same stack in the longest tube. The
// Result returned with it is the design found for the target.
func Design(t Target, s *Settings) (Result, error) {
	set := s.values()
	gas, err := t.validate()
	if err != nil {
		return Result{}, err
	}
	w, err := newWave(&t, gas)
	if err != nil {
		return Result{}, err
	}
	if err := w.checkLength(&t); err != nil {
		return Result{}, err
	}
	sv := &solver{t: &t, gas: gas, w: w, set: set}
	sv.fast = searchGas(set, linear.MixtureGas{Mixture: gas}, t.MeanPressure, 0.3*t.Ambient, 1.5*t.HotTemperature)
	rhLo, rhHi := rhLimits(t.Stack, t.wire(), t.MinGap)
	if rhLo > rhHi {
		return Result{}, units.NewRangeError("smallest gap", t.MinGap, 0, gapOf(t.Stack, rhHi, t.wire()), "m")
	}
	sv.rhLo = rhLo
	res := Result{Target: t, ThermalDepth: w.deltaKappa, ViscousDepth: w.deltaNu, Wavelength: w.lambda}
	start := t.startGeometry(w, set.DriveRatio, rhLo, rhHi)
	res.Start = start
	if r, err := sv.tune(&start, searchTol); err == nil {
		res.StartOnset = r.HotTemperature
		res.Start = start
	}
	best, status, iters := sv.search(res.Start, rhLo, rhHi)
	res.Status, res.Iterations = status, iters
	if err := set.stop(); err != nil {
		return Result{}, err
	}
	if best == nil {
		if res.StartOnset > 0 {
			g := res.Start
			best = &g
		} else {
			return sv.noOnset(res)
		}
	}
	res.Geometry = *best
	limited := sv.solves >= set.MaxSolves
	if err := sv.finish(&res); err != nil {
		return res, err
	}
	if limited {
		res.Warnings = append(res.Warnings, fmt.Sprintf("the search stopped at its limit of %d solves; a longer search may find a lower onset", set.MaxSolves))
	}
	return res, sv.check(&res)
}

// solver holds one design's state.
type solver struct {
	t      *Target
	gas    gasprops.Mixture
	w      wave
	set    Settings
	solves int
	// warm start of the next onset solve
	lastTh, lastF, lastLen float64
	// highest is the highest onset frequency met with the shortest
	// resonator when the target was higher, Hz (0: never).
	highest float64
	// fast is the tabulated gas of the search's solves (tableGas).
	fast linear.Gas
	// rhLo is the smallest hydraulic radius the kind and the smallest gap
	// allow, m.
	rhLo float64
}

// onset solves the onset of geometry g, warm-started from the last answer.
func (sv *solver) onset(g Geometry, tol float64) (*linear.OnsetResult, error) {
	if err := sv.set.stop(); err != nil {
		return nil, err
	}
	if sv.solves >= sv.set.MaxSolves {
		return nil, fmt.Errorf("%w: the limit of %d solves was reached", errSolve, sv.set.MaxSolves)
	}
	d := sv.t.device(g, sv.gas)
	ls := &linear.Settings{Gas: sv.set.Gas, NoProfile: true, RelTol: tol, Tolerance: tol}
	if tol >= searchTol {
		ls.Gas = sv.fast
	}
	if sv.lastTh > 0 {
		ls.HotGuess = sv.lastTh
		ls.FrequencyGuess = sv.lastF * sv.lastLen / g.Length()
	}
	sv.set.done(&sv.solves)
	r, err := linear.Onset(d, ls)
	if err != nil && sv.lastTh > 0 {
		ls.HotGuess, ls.FrequencyGuess = 0, 0
		sv.set.done(&sv.solves)
		r, err = linear.Onset(d, ls)
	}
	if err != nil {
		return nil, err
	}
	sv.lastTh, sv.lastF, sv.lastLen = r.HotTemperature, r.Frequency, g.Length()
	return r, nil
}

// search runs Nelder-Mead from g0 and returns the best geometry that met
// its bounds, or nil.
func (sv *solver) search(g0 Geometry, rhLo, rhHi float64) (*Geometry, string, int) {
	t, w := sv.t, sv.w
	ta := t.Ambient
	pos0, dx0, rh0 := g0.Position(), g0.Stack, g0.HydraulicRadius
	var best *Geometry
	bestTh := math.Inf(1)
	lastLr := g0.Resonator
	status, iters := minimize(func(x []float64) float64 {
		var bx box
		pos := bx.at(pos0, x[0], minHotSpace+minExchanger, positionMax(w))
		dx := bx.at(dx0, x[1], w.minStack(pos, sv.set.DriveRatio), w.lambda/8)
		rh := bx.at(rh0, x[2], rhLo, rhHi)
		pen := bx.penalty
		pores, phi, gap := poresFor(t.Stack, rh, t.wire())
		g := Geometry{HydraulicRadius: rh, Porosity: phi, Pores: pores, Gap: gap, Resonator: lastLr}
		t.place(&g, w, pos, dx, sv.set.DriveRatio)
		r, err := sv.tune(&g, searchTol)
		if err != nil {
			return 10*ta + 10*ta*pen
		}
		lastLr = g.Resonator
		if pen == 0 && r.HotTemperature < bestTh {
			bestTh = r.HotTemperature
			gg := g
			best = &gg
		}
		return r.HotTemperature + 10*ta*pen
	}, 3, 250, 25, 0.05, sv.set.stop)
	return best, status, iters
}

// finish tunes the best geometry tightly and writes it.
func (sv *solver) finish(res *Result) error {
	g := res.Geometry
	if _, err := sv.tune(&g, 1e-9); err != nil {
		return fmt.Errorf("design: the final resonator solve failed: %w", err)
	}
	res.Geometry = g
	return sv.write(res)
}

// write writes res.Geometry as a device file, reads it back and solves its
// onset with default settings, then fills the rest of res.
func (sv *solver) write(res *Result) error {
	t := sv.t
	g := res.Geometry
	res.File = t.file(g, fmt.Sprintf("Designed engine, %s Hz", trim(t.Frequency)), sv.notes(res))
	d, err := readBack(&res.File)
	if err != nil {
		return err
	}
	res.Device = d
	on, err := linear.Onset(d, &linear.Settings{Gas: sv.set.Gas})
	sv.solves++
	if err != nil {
		return fmt.Errorf("design: onset of the written device: %w", err)
	}
	res.Onset = on
	res.Margin = t.HotTemperature - on.HotTemperature
	res.FrequencyError = (on.Frequency - t.Frequency) / t.Frequency
	res.Solves = sv.solves
	res.Rules = rules(sv.set)
	res.Cautions = cautions(t, on.HotTemperature)
	res.Warnings = append(res.Warnings, on.Warnings...)
	if g.HotSpace > 2*t.Diameter {
		res.Warnings = append(res.Warnings, fmt.Sprintf("the hot space is %s long, more than two tube diameters: the whole of it is taken to be at the hot temperature, so heat and insulate it along its length", mm(g.HotSpace, 1)))
	}
	if !sv.set.NoSensitivity {
		sens, err := sv.sensitivity(res)
		if err != nil {
			res.Warnings = append(res.Warnings, "sensitivity table not computed: "+err.Error())
		}
		res.Sensitivity = sens
		res.Solves = sv.solves
	}
	return nil
}

// check returns an *UnreachableError when the design misses the target.
func (sv *solver) check(res *Result) error {
	t := sv.t
	on := res.Onset
	if math.Abs(res.FrequencyError) > 0.01 {
		return &UnreachableError{Nearest: *res, Problem: fmt.Sprintf("the nearest design sings at %s, not within 1 %% of %s", units.Format(on.Frequency, units.DimFrequency), units.Format(t.Frequency, units.DimFrequency))}
	}
	if res.Margin < 0 {
		why := "A higher mean pressure, a wider tube or a hotter heater may reach it"
		if g := res.Geometry; t.MinGap > 0 && g.HydraulicRadius <= sv.rhLo*(1+1e-3) {
			why = fmt.Sprintf("The smallest gap you can make, %s, holds the stack's pores at %.1f δκ, wider than the 1–2 δκ that start lowest; a finer stack, a higher mean pressure or a hotter heater may reach it",
				mm(t.MinGap, 2), g.HydraulicRadius/res.ThermalDepth)
		}
		return &UnreachableError{Nearest: *res, Problem: fmt.Sprintf(
			"with %s at %s in a %s tube, the lowest onset found is %s, above the %s the heater reaches; the nearest design (returned) needs %s more. %s",
			t.Gas, pressureText(t.MeanPressure), mm(t.Diameter, 1),
			units.Format(on.HotTemperature, units.DimTemperature), units.Format(t.HotTemperature, units.DimTemperature),
			units.Format(-res.Margin, units.DimTemperatureDifference), why)}
	}
	if t.MaxLength > 0 && res.Geometry.Length() > t.MaxLength {
		return sv.tooLong(res)
	}
	return nil
}

// noOnset reports a target for which no candidate had an onset at all.
func (sv *solver) noOnset(res Result) (Result, error) {
	if sv.highest > 0 {
		return res, &UnreachableError{Nearest: res, Problem: fmt.Sprintf(
			"%s is too high for this stack in a %s tube: even with the shortest resonator (one diameter) the onset frequency is only about %s. Choose a lower frequency or a gas with a higher sound speed",
			units.Format(sv.t.Frequency, units.DimFrequency), mm(sv.t.Diameter, 1), units.Format(sv.highest, units.DimFrequency))}
	}
	return res, &UnreachableError{Nearest: res, Problem: fmt.Sprintf(
		"no stack of this kind in a %s tube with %s at %s has an onset below %s (eight times ambient): the losses outweigh any gain. Try a higher mean pressure or a wider tube",
		mm(sv.t.Diameter, 1), sv.t.Gas, pressureText(sv.t.MeanPressure), units.Format(8*sv.t.Ambient, units.DimTemperature))}
}

// cautions are the cautions of a built engine.
func cautions(t *Target, onset float64) []string {
	c := []string{
		safety.CautionHotSurfaces,
		fmt.Sprintf("Hot parts: the hot end must reach about %s before the engine starts and the heater can reach %s.", units.Format(onset, units.DimTemperature), units.Format(t.HotTemperature, units.DimTemperature)),
		"Sound: a running engine can be very loud; wear hearing protection near it.",
		"This is a linear estimate: real onset also depends on heat leaks, streaming and construction details; approach it slowly.",
	}
	if t.MeanPressure > 1.5e5 {
		c = append(c, safety.CautionGeneral, fmt.Sprintf("Pressure: the tube is charged to %s absolute; it must be rated for that at the hot temperature. Defer to local pressure-vessel codes and licensed practice.", pressureText(t.MeanPressure)))
	}
	return c
}

// rules lists the rules and methods of the design with their sources.
func rules(set Settings) []string {
	return []string{
		"stack pores start at r_h = 1.5 δκ (δκ of the gas at ambient temperature): " + pore.RuleFor(pore.RoleStack).Text + "; Swift 2002, Thermoacoustics: a unifying perspective, ch. 7: y0 about δκ to 2δκ (from memory)",
		"stack position starts where the short-stack onset estimate is lowest: boundary-layer short-stack work and wall loss after Swift, JASA 84, 1145 (1988) (from memory of their form)",
		fmt.Sprintf("heat exchangers as long as the peak-to-peak gas displacement 2ξ at their place, at least 1 mm; the stack at least twice 2ξ at its centre; ξ at a working amplitude of %.0f %% of the mean pressure at the closed end (common practice, no published source)", 100*set.DriveRatio),
		"plate and round-pore stacks 75 % open, exchanger fins 70 % open with the stack's hydraulic radius as half gap (common practice, no published source)",
		"position, length and pore size chosen by minimising the onset temperature of the linear onset solver (Rott's linear thermoacoustics, Swift 2002 ch. 4) with gonum/optimize Nelder-Mead",
		"resonator length solved by Brent's method (calc/numeric) so that the onset frequency is the target, with the stack in place and hot",
	}
}

// notes is the free text of the device file.
func (sv *solver) notes(res *Result) string {
	t := sv.t
	return fmt.Sprintf("Designed by Tubewright for %s Hz with %s at %s, heater up to %s, ambient %s, %s, %s stack. Check the onset with the onset solve before building.",
		trim(t.Frequency), t.Gas, pressureText(t.MeanPressure), units.Format(t.HotTemperature, units.DimTemperature),
		units.Format(t.Ambient, units.DimTemperature), t.Ends, t.Stack)
}

func trim(v float64) string { return units.Decimal(v, 4) }

// gapOf returns the gap of kind k at hydraulic radius rh.
func gapOf(k StackKind, rh, wire float64) float64 {
	_, _, gap := poresFor(k, rh, wire)
	return gap
}
