package design

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/linear"
	"tubewright/calc/numeric"
	"tubewright/calc/pore"
	"tubewright/calc/safety"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// HeatPumpTarget is what the builder of a driven heat pump asks for, SI
// units. The driver (a loudspeaker or piston) closes the start end.
type HeatPumpTarget struct {
	// Frequency is the resonance the tube is built for, with the stack in
	// place and everything at ambient temperature, Hz. It sets the tube's
	// length; the drive frequency is found for the cooled tube.
	Frequency       float64
	Gas             string  // as the device file writes it
	MeanPressure    float64 // absolute, Pa
	Ambient         float64 // K, the warm exchanger's temperature
	Diameter        float64 // tube inside diameter, m
	Ends            Ends    // far end closed (half-wave) or open (quarter-wave)
	Stack           StackKind
	WireDiameter    float64 // screens or metal wool, m; 0: as for Target
	DriverAmplitude float64 // pressure amplitude at the driver face, Pa
	// ColdTemperature is the wanted cold-side temperature, K; 0 means
	// Span is given instead.
	ColdTemperature float64
	Span            float64 // wanted span below ambient, K, when ColdTemperature is 0
	MaxLength       float64 // longest tube, m; 0: no limit
	MinGap          float64 // smallest gap, m (as Target.MinGap); 0: no limit
}

// HeatPumpGeometry is one driven heat pump of the design family: driver,
// driver space, warm exchanger, stack, cold exchanger, resonator, far end.
type HeatPumpGeometry struct {
	DriverSpace   float64 // driver face to warm exchanger, m
	WarmExchanger float64 // m
	Stack         float64 // m
	ColdExchanger float64 // m
	Resonator     float64 // cold exchanger to far end, m

	HydraulicRadius float64      // of the stack, m
	Porosity        float64      // of the stack, 1
	Pores           linear.Pores // of the stack
	Gap             float64      // as Target.MinGap, m
}

// Position returns the distance from the driver face to the stack's warm
// face, m.
func (g HeatPumpGeometry) Position() float64 { return g.DriverSpace + g.WarmExchanger }

// Length returns the whole tube length, m.
func (g HeatPumpGeometry) Length() float64 {
	return g.DriverSpace + g.WarmExchanger + g.Stack + g.ColdExchanger + g.Resonator
}

// HeatPumpResult is a designed heat pump.
type HeatPumpResult struct {
	Target   HeatPumpTarget
	Geometry HeatPumpGeometry
	File     linear.DeviceFile // with the drive frequency written on the driver
	Device   *linear.Device    // File as read back
	// Pump is linear.HeatPump of Device at zero load and DriveFrequency.
	Pump *linear.HeatPumpResult
	// DriveFrequency is the resonance of the tube with its cold side at the
	// reached cold temperature (linear.Mode, the start end rigid), Hz:
	// about where the pressure-driven driver needs the least motion.
	DriveFrequency float64
	// Span is ambient less the reached cold temperature at zero load, K;
	// Margin is Span less the wanted span, K.
	Span, Margin float64
	ThermalDepth float64 // δκ at ambient, the target frequency and the mean pressure, m
	Solves       int
	Iterations   int
	Status       string
	Rules        []string
	Warnings     []string
	Cautions     []string
}

// wanted returns the wanted span, K.
func (t *HeatPumpTarget) wanted() float64 {
	if t.ColdTemperature > 0 {
		return t.Ambient - t.ColdTemperature
	}
	return t.Span
}

// engineTarget returns the engine target sharing the checks of the common
// fields.
func (t *HeatPumpTarget) engineTarget() Target {
	return Target{Frequency: t.Frequency, Gas: t.Gas, MeanPressure: t.MeanPressure, HotTemperature: t.Ambient + 1,
		Ambient: t.Ambient, Diameter: t.Diameter, Ends: t.Ends, Stack: t.Stack, WireDiameter: t.WireDiameter,
		MaxLength: t.MaxLength, MinGap: t.MinGap}
}

func (t *HeatPumpTarget) validate() (gasprops.Mixture, error) {
	et := t.engineTarget()
	gas, err := et.validate()
	if err != nil {
		return gas, err
	}
	if !(t.DriverAmplitude > 0 && t.DriverAmplitude <= 0.2*t.MeanPressure) {
		return gas, units.NewRangeError("driver amplitude", t.DriverAmplitude, 0, 0.2*t.MeanPressure, "Pa").Of(units.SubjectPressure)
	}
	lo, _ := gas.Range()
	switch {
	case t.ColdTemperature != 0:
		if !(t.ColdTemperature >= math.Max(lo, 20) && t.ColdTemperature < t.Ambient) {
			return gas, units.NewRangeError("cold temperature", t.ColdTemperature, math.Max(lo, 20), t.Ambient, "K").Of(units.SubjectTemperature)
		}
	case !(t.Span > 0 && t.Span < t.Ambient-math.Max(lo, 20)):
		return gas, units.NewRangeError("span", t.Span, 0, t.Ambient-math.Max(lo, 20), "K")
	}
	return gas, nil
}

// Heat-pump stack pores: r_h = 2 δκ, the plate spacing 4 δκ that gave the
// lowest temperature in Tijani, Zeegers & de Waele, JASA 112, 128 (2002)
// (as quoted by pore.RuleFor).
const heatPumpRhOverDelta = 2.0

// DesignHeatPump finds a driven heat pump for the target: the stack's
// position and length that give the largest zero-load span at the driver
// amplitude (gonum/optimize Nelder-Mead over linear.HeatPump, each
// candidate driven at its own drive frequency), pores of
// r_h = 2 δκ, exchangers and the shortest stack from the gas displacement
// at the driver amplitude (as for Design), the resonator length solved by
// Brent so that the tube at ambient resonates at the target frequency, and
// the drive frequency: the resonance once the cold side has cooled, solved
// with linear.HeatPump and linear.Mode together (see pump).
//
// Errors: bad input as *units.RangeError; a span the design cannot reach,
// or a tube longer than the limit, as *UnreachableError whose Nearest is
// empty and whose message names the best span; the Result is then the
// nearest design.
func DesignHeatPump(t HeatPumpTarget, s *Settings) (HeatPumpResult, error) {
	set := s.values()
	if s == nil || s.MaxSolves <= 0 {
		set.MaxSolves = 4000 // each candidate costs more solves than an engine's
	}
	gas, err := t.validate()
	if err != nil {
		return HeatPumpResult{}, err
	}
	set.DriveRatio = t.DriverAmplitude / t.MeanPressure
	et := t.engineTarget()
	w, err := newWave(&et, gas)
	if err != nil {
		return HeatPumpResult{}, err
	}
	if err := w.checkLength(&et); err != nil {
		return HeatPumpResult{}, err
	}
	hp := &pumpSolver{t: &t, gas: gas, w: w, set: set}
	hp.fast = searchGas(set, linear.MixtureGas{Mixture: gas}, t.MeanPressure, 0.3*t.Ambient, 1.1*t.Ambient)
	rhLo, rhHi := rhLimits(t.Stack, et.wire(), t.MinGap)
	if rhLo > rhHi {
		return HeatPumpResult{}, units.NewRangeError("smallest gap", t.MinGap, 0, gapOf(t.Stack, rhHi, et.wire()), "m")
	}
	rh := clamp(heatPumpRhOverDelta*w.deltaKappa, rhLo, rhHi)
	pores, phi, gap := poresFor(t.Stack, rh, et.wire())
	g0 := HeatPumpGeometry{HydraulicRadius: rh, Porosity: phi, Pores: pores, Gap: gap}
	// Start: the stack's warm face at λ/16 from the driver (kx = π/8, between
	// the pressure antinode and λ/8, where refrigerator stacks commonly
	// sit: pore.PositionAdvice, common practice), the shortest stack.
	pos0 := w.lambda / 16
	hp.place(&g0, pos0, w.minStack(pos0, set.DriveRatio))
	g0.Resonator = math.Max(w.tubeGuess(&et)-g0.Length(), minResonator(&et))
	res := HeatPumpResult{Target: t, ThermalDepth: w.deltaKappa}
	best, status, iters := hp.search(g0)
	res.Status, res.Iterations = status, iters
	if err := set.stop(); err != nil {
		return HeatPumpResult{}, err
	}
	if best == nil {
		return res, &UnreachableError{Problem: fmt.Sprintf("no heat pump of this kind in a %s tube with %s at %s could be solved at a %s drive", mm(t.Diameter, 1), t.Gas, pressureText(t.MeanPressure), pressureText(t.DriverAmplitude))}
	}
	res.Geometry = *best
	limited := hp.solves >= set.MaxSolves
	if err := hp.write(&res); err != nil {
		return res, err
	}
	if limited {
		res.Warnings = append(res.Warnings, fmt.Sprintf("the search stopped at its limit of %d solves; a longer search may find a larger span", set.MaxSolves))
	}
	want := t.wanted()
	res.Margin = res.Span - want
	switch {
	case res.Margin < 0:
		return res, &UnreachableError{Problem: fmt.Sprintf(
			"the largest span found at a %s drive is %s (cold side %s), less than the wanted %s; the nearest design is returned. A larger drive amplitude, a higher mean pressure or a gas of lower Prandtl number may reach it",
			pressureText(t.DriverAmplitude), units.Format(res.Span, units.DimTemperatureDifference),
			units.Format(res.Pump.ColdTemperature, units.DimTemperature), units.Format(want, units.DimTemperatureDifference))}
	case t.MaxLength > 0 && res.Geometry.Length() > t.MaxLength:
		return res, &UnreachableError{Problem: fmt.Sprintf("the target needs a %s tube, longer than the longest %s; choose a higher frequency", units.Format(res.Geometry.Length(), units.DimLength), units.Format(t.MaxLength, units.DimLength))}
	}
	return res, nil
}

type pumpSolver struct {
	t      *HeatPumpTarget
	gas    gasprops.Mixture
	w      wave
	set    Settings
	solves int
	slope  float64 // d f_res(Tc(f)) / df at the last drive frequency solved
	fast   linear.Gas
}

// gasFor returns the tabulated gas for the search's tolerance, the gas
// itself (Settings.Gas or nil for the device's) for final solves.
func (hp *pumpSolver) gasFor(tol float64) linear.Gas {
	if tol >= searchTol {
		return hp.fast
	}
	return hp.set.Gas
}

// place sets the driver space, exchangers and stack for a stack whose warm
// face is at pos (m) from the driver and whose length is dx (m).
func (hp *pumpSolver) place(g *HeatPumpGeometry, pos, dx float64) {
	w, dr := hp.w, hp.set.DriveRatio
	g.WarmExchanger = math.Max(math.Min(w.exchangerLength(pos, dr), pos-minHotSpace), minExchanger)
	g.DriverSpace = math.Max(pos-g.WarmExchanger, minHotSpace)
	g.Stack = dx
	g.ColdExchanger = w.exchangerLength(pos+dx, dr)
}

// device builds the device of g driven at f (Hz).
func (hp *pumpSolver) device(g HeatPumpGeometry, f float64) *linear.Device {
	t := hp.t
	d := t.Diameter
	far := linear.Part{Kind: linear.KindClosedEnd}
	resT := linear.TempCold
	if t.Ends == QuarterWave {
		far = linear.Part{Kind: linear.KindOpenEnd}
		resT = linear.TempAmbient
	}
	hx := exchangerPores(g.HydraulicRadius)
	return &linear.Device{
		Name: "design", GasText: t.Gas, Gas: hp.gas, MeanPressure: t.MeanPressure, AmbientTemperature: t.Ambient,
		Parts: []linear.Part{
			{Kind: linear.KindDriver, Label: "driver", Diameter: d, PressureAmplitude: t.DriverAmplitude, Frequency: f},
			{Kind: linear.KindTube, Label: "driver space", Length: g.DriverSpace, Diameter: d, Temp: linear.TempAmbient},
			{Kind: linear.KindExchanger, Label: "warm exchanger", Length: g.WarmExchanger, Diameter: d, Temp: linear.TempAmbient, Porosity: exchangerPorosity, Pores: hx},
			{Kind: linear.KindStack, Label: "stack", Length: g.Stack, Diameter: d, Porosity: g.Porosity, Pores: g.Pores},
			{Kind: linear.KindExchanger, Label: "cold exchanger", Length: g.ColdExchanger, Diameter: d, Temp: linear.TempCold, Porosity: exchangerPorosity, Pores: hx},
			{Kind: linear.KindTube, Label: "resonator", Length: g.Resonator, Diameter: d, Temp: resT},
			far,
		},
	}
}

// resonance returns the frequency (Hz) of the tube's mode near f0 with
// the start end rigid and the cold parts held at tc (K).
func (hp *pumpSolver) resonance(g HeatPumpGeometry, f0, tc, tol float64) (float64, error) {
	d := hp.device(g, f0)
	for i := range d.Parts {
		if d.Parts[i].Temp == linear.TempCold {
			d.Parts[i].Temp, d.Parts[i].Temperature = linear.TempFixed, tc
		}
	}
	hp.set.done(&hp.solves)
	m, err := linear.Mode(d, 0, &linear.Settings{Gas: hp.gasFor(tol), NoProfile: true, FrequencyGuess: f0})
	if err != nil {
		return 0, err
	}
	return m.Frequency, nil
}

// tune solves g.Resonator so that the ambient resonance is the target
// frequency: solveLength (Brent's method) on f(L) - f_target.
func (hp *pumpSolver) tune(g *HeatPumpGeometry, tol float64) error {
	ft := hp.t.Frequency
	lo := minResonator(&Target{Diameter: hp.t.Diameter})
	F := func(lr float64) float64 {
		gg := *g
		gg.Resonator = lr
		f, err := hp.resonance(gg, ft*gg.Length()/g.Length(), hp.t.Ambient, tol)
		if err != nil {
			return math.NaN()
		}
		return f - ft
	}
	x, _, err := solveLength(F, g.Resonator, lo, g.Length()-g.Resonator+math.Max(g.Resonator, lo), ft, tol)
	if errors.Is(err, errShortest) {
		return fmt.Errorf("%w: %s is too high for this stack in this tube", errSolve, units.Format(ft, units.DimFrequency))
	}
	if err != nil {
		return err
	}
	g.Resonator = x
	return nil
}

// pump returns the zero-load heat pump of g at its drive frequency f:
// the resonance of the tube with its cold parts at the cold temperature
// that driving at f gives. The cold temperature falls steeply as f moves,
// and the resonance with it, so plain alternation oscillates; instead it
// solves
//
//	h(f) = f_res(Tc(f)) - f = 0
//
// by secant steps from f0 (the first with the slope of the last solve),
// falling back to Brent's method bracketed by the alternation's own
// steps. tol is the relative tolerance of the solves and of f.
func (hp *pumpSolver) pump(g HeatPumpGeometry, f0 float64, tol float64) (*linear.HeatPumpResult, float64, error) {
	type point struct {
		r   *linear.HeatPumpResult
		h   float64
		err error
	}
	cache := map[float64]point{}
	eval := func(f float64) point {
		if p, ok := cache[f]; ok {
			return p
		}
		hp.set.done(&hp.solves)
		r, err := linear.HeatPump(hp.device(g, f), &linear.HeatPumpSettings{Settings: linear.Settings{Gas: hp.gasFor(tol), NoProfile: true, RelTol: tol, Tolerance: tol}})
		p := point{r: r, err: err, h: math.NaN()}
		if err == nil {
			fr, err := hp.resonance(g, f, r.ColdTemperature, tol)
			if err == nil {
				p.h = fr - f
			} else {
				p.err = err
			}
		}
		cache[f] = p
		return p
	}
	h := func(f float64) float64 { return eval(f).h }
	a, ha := f0, h(f0)
	if math.IsNaN(ha) {
		return nil, 0, eval(f0).err
	}
	// Secant steps first, the first one with the slope of the last
	// solve; they converge in a few solves from a near start.
	slope := hp.slope
	if !(slope < 0.9) {
		slope = -1
	}
	x0, h0 := a, ha
	x1 := x0 + h0/(1-slope)
	for range 6 {
		if math.Abs(x1-x0) <= tol*f0 {
			break
		}
		h1 := h(x1)
		if math.IsNaN(h1) || h1 == h0 {
			break
		}
		if math.Abs(h1) <= tol*f0 {
			hp.slope = 1 + (h1-h0)/(x1-x0)
			return eval(x1).r, x1, nil
		}
		x0, h0, x1 = x1, h1, x1-h1*(x1-x0)/(h1-h0)
	}
	// Fallback: bracket by the alternation's own steps and Brent.
	if ha == 0 {
		return eval(f0).r, f0, nil
	}
	b := a + ha
	hb := h(b)
	for i := 0; !(ha*hb <= 0); i++ {
		if math.IsNaN(hb) || i >= 12 {
			return nil, 0, fmt.Errorf("%w: the drive frequency (resonance of the cooled tube) could not be bracketed near %s", errSolve, units.Format(f0, units.DimFrequency))
		}
		a, ha = b, hb
		b = a + 1.5*ha
		hb = h(b)
	}
	lo, hi := math.Min(a, b), math.Max(a, b)
	r, err := numeric.Brent(h, lo, hi, &numeric.RootSettings{AbsTol: tol * f0, MaxIterations: 60})
	if err != nil {
		return nil, 0, fmt.Errorf("%w: drive frequency: %v", errSolve, err)
	}
	p := eval(r.X)
	return p.r, r.X, p.err
}

// search runs Nelder-Mead over the logarithms of the stack position and
// length, each candidate tuned to the target frequency, minimising the
// cold temperature at zero load when driven at its own drive frequency.
func (hp *pumpSolver) search(g0 HeatPumpGeometry) (*HeatPumpGeometry, string, int) {
	w, t := hp.w, hp.t
	var best *HeatPumpGeometry
	bestTc := math.Inf(1)
	pos0, dx0 := g0.Position(), g0.Stack
	lastLr := g0.Resonator
	lastF := t.Frequency
	status, iters := minimize(func(x []float64) float64 {
		var bx box
		pos := bx.at(pos0, x[0], minHotSpace+minExchanger, positionMax(w))
		dx := bx.at(dx0, x[1], w.minStack(pos, hp.set.DriveRatio), w.lambda/8)
		pen := bx.penalty
		g := g0
		g.Resonator = lastLr
		hp.place(&g, pos, dx)
		if hp.solves >= hp.set.MaxSolves || hp.set.stop() != nil {
			return 2 * t.Ambient
		}
		if err := hp.tune(&g, searchTol); err != nil {
			return 2*t.Ambient + t.Ambient*pen
		}
		lastLr = g.Resonator
		r, f, err := hp.pump(g, lastF, searchTol)
		if err != nil {
			return 2*t.Ambient + t.Ambient*pen
		}
		lastF = f
		if pen == 0 && r.ColdTemperature < bestTc {
			bestTc = r.ColdTemperature
			gg := g
			best = &gg
		}
		return r.ColdTemperature + t.Ambient*pen
	}, 2, 150, 20, 0.05, hp.set.stop)
	return best, status, iters
}

// write tunes res.Geometry, finds its drive frequency, writes the file,
// reads it back and solves the heat pump of the file.
func (hp *pumpSolver) write(res *HeatPumpResult) error {
	t := hp.t
	g := res.Geometry
	if err := hp.tune(&g, 1e-8); err != nil {
		return err
	}
	_, f, err := hp.pump(g, t.Frequency, 1e-8)
	if err != nil {
		return fmt.Errorf("design: heat pump of the final design: %w", err)
	}
	res.Geometry = g
	res.File = hp.file(g, f)
	d, err := readBack(&res.File)
	if err != nil {
		return err
	}
	res.Device = d
	hp.set.done(&hp.solves)
	pr, err := linear.HeatPump(d, &linear.HeatPumpSettings{Settings: linear.Settings{Gas: hp.set.Gas}})
	if err != nil {
		return fmt.Errorf("design: heat pump of the written device: %w", err)
	}
	res.Pump = pr
	res.DriveFrequency = d.Parts[0].Frequency
	res.Span = pr.TemperatureSpan
	res.Solves = hp.solves
	res.Warnings = append(res.Warnings, pr.Warnings...)
	res.Rules = []string{
		fmt.Sprintf("stack pores r_h = %.0f δκ at ambient: %s", heatPumpRhOverDelta, pore.RuleFor(pore.RoleStack).Text),
		"stack start with its warm face λ/16 from the driver, between the pressure antinode and λ/8 (common practice, no published source; see pore.PositionAdvice)",
		"heat exchangers as long as the peak-to-peak gas displacement 2ξ at the driver amplitude, at least 1 mm; the stack at least twice 2ξ at its centre (common practice, no published source)",
		"position and length chosen by minimising the zero-load cold temperature of the linear heat-pump solve (Swift 2002, ch. 7) with gonum/optimize Nelder-Mead",
		"resonator length solved by Brent's method (calc/numeric) for the target resonance at ambient; drive frequency the resonance with the cold side at its solved temperature (linear.Mode)",
	}
	res.Cautions = []string{
		"Sound: a driven resonator is very loud near the driver and any opening; wear hearing protection and measure the level where people stand.",
		fmt.Sprintf("Cold parts: the cold side may reach %s; below 0 °C wet skin can freeze to metal.", units.Format(pr.ColdTemperature, units.DimTemperature)),
		"This is a linear estimate at zero load: heat leaks through the stack and the walls lower the span; approach it slowly.",
	}
	if t.MeanPressure > 1.5e5 {
		res.Cautions = append(res.Cautions, safety.CautionGeneral, fmt.Sprintf("Pressure: the tube is charged to %s absolute; the driver housing and the tube must be rated for it. Defer to local pressure-vessel codes and licensed practice.", pressureText(t.MeanPressure)))
	}
	return nil
}

// file writes g driven at f (Hz) as a device file.
func (hp *pumpSolver) file(g HeatPumpGeometry, f float64) linear.DeviceFile {
	t := hp.t
	d := mm(t.Diameter, 3)
	hx := exchangerPores(g.HydraulicRadius)
	far := linear.PartFile{Kind: linear.KindClosedEnd, Label: "far end"}
	resT := "cold"
	if t.Ends == QuarterWave {
		far = linear.PartFile{Kind: linear.KindOpenEnd, Label: "far end", Flange: "none"}
		resT = "ambient"
	}
	return linear.DeviceFile{
		Name:               fmt.Sprintf("Designed heat pump, %s Hz", trim(t.Frequency)),
		Gas:                t.Gas,
		MeanPressure:       fmt.Sprintf("%s bar", trimFull(t.MeanPressure/1e5)),
		AmbientTemperature: trimFull(t.Ambient) + " K",
		Notes: fmt.Sprintf("Designed by Tubewright for a span of %s at a %s drive with %s; drive near %s Hz once cold.",
			units.Format(t.wanted(), units.DimTemperatureDifference), pressureText(t.DriverAmplitude), t.Gas, fmt.Sprintf("%.2f", f)),
		PartsList: []linear.PartFile{
			{Kind: linear.KindDriver, Label: "driver", Diameter: d, PressureAmplitude: trimFull(t.DriverAmplitude) + " Pa", Frequency: fmt.Sprintf("%.4f Hz", f)},
			{Kind: linear.KindTube, Label: "driver space", Length: mm(g.DriverSpace, 3), Diameter: d, Temperature: "ambient"},
			{Kind: linear.KindExchanger, Label: "warm exchanger", Length: mm(g.WarmExchanger, 3), Diameter: d, Temperature: "ambient", Porosity: frac(exchangerPorosity), Pores: poresFile(hx)},
			{Kind: linear.KindStack, Label: "stack", Length: mm(g.Stack, 3), Diameter: d, Porosity: frac(g.Porosity), Pores: poresFile(g.Pores)},
			{Kind: linear.KindExchanger, Label: "cold exchanger", Length: mm(g.ColdExchanger, 3), Diameter: d, Temperature: "cold", Porosity: frac(exchangerPorosity), Pores: poresFile(hx)},
			{Kind: linear.KindTube, Label: "resonator", Length: mm(g.Resonator, 3), Diameter: d, Temperature: resT},
			far,
		},
	}
}
