package sheet

import (
	"context"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"

	"tubewright/calc/design"
	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// IDDesign identifies the design-from-a-target calculator.
const IDDesign ID = "design"

// designSheet is the design calculator: from a target frequency, gas,
// pressure, heater temperature and tube to a complete engine in the device
// file format (calc/design's Design), with its onset, margin and
// sensitivity table; or, for a heat pump, from a wanted cold temperature
// or span and a driver amplitude to a driven tube (DesignHeatPump). With
// --device-out the device file is written.
var designSheet = &Sheet{
	ID:      IDDesign,
	Title:   "Design from a target",
	Summary: "From your frequency, gas, pressure and heater to an engine that starts: every part, the margin and what moves it; or a driven heat pump",
	Inputs: []Input{
		{Key: "for", Label: "Design", Kind: Pick, Default: "engine",
			Hint: "engine (heat in, sound out) or heat-pump (a loudspeaker drives the tube and the stack pumps heat)",
			Choices: []Choice{
				{Key: "engine", Words: "An engine that starts below my heater's temperature", Value: "engine"},
				{Key: "heat-pump", Words: "A driven heat pump that reaches my cold temperature", Value: "heat-pump"},
			}},
		GasInput("gas", ""),
		bounded(noPM(MeanPressureInput("pressure", "Mean pressure", ""), "10 bar"), 1e3, 50e6),
		{Key: "frequency", Label: "Target frequency", Kind: Quantity, Dim: units.DimFrequency, Example: "300 Hz",
			Min: 1, Max: 20000, Hint: "engine: the frequency it should sing at; heat pump: the tube's resonance at room temperature; e.g. 300 Hz", Share: ShareFrequency},
		unshared(bounded(askedFor(noPM(TemperatureInput("hot", "Hottest the heater reaches (engine)", "", "650 K"), "")), 150, 2000)),
		bounded(noPM(TemperatureInput("ambient", "Ambient (cooler) temperature", "295 K", ""), ""), 150, 500),
		{Key: "diameter", Label: "Tube inside diameter", Kind: Quantity, Dim: units.DimLength, Example: "50 mm",
			Min: 1e-3, Max: 2, Hint: "inside diameter of the tube, e.g. 50 mm or 2 in"},
		{Key: "ends", Label: "Tube ends", Kind: Pick, Default: design.HalfWave.String(),
			Hint: "closed-closed (a half-wave tube) or closed-open (a quarter-wave tube, open at the far end)",
			Choices: []Choice{
				{Key: design.HalfWave.String(), Words: "Closed at both ends (half-wave)", Value: design.HalfWave},
				{Key: design.QuarterWave.String(), Words: "Closed at the hot end, open at the far end (quarter-wave)", Value: design.QuarterWave},
			}},
		{Key: "stack", Label: "Stack made of", Kind: Pick, Default: design.Plates.String(),
			Hint: "plates, round-pores (capillaries or ceramic cells), screens or metal-wool",
			Choices: []Choice{
				{Key: design.Plates.String(), Words: "Parallel plates", Value: design.Plates},
				{Key: design.RoundPores.String(), Words: "Round pores (capillaries, ceramic cells)", Value: design.RoundPores},
				{Key: design.Screens.String(), Words: "Stacked woven screens", Value: design.Screens},
				{Key: design.MetalWool.String(), Words: "Metal wool", Value: design.MetalWool},
			}},
		{Key: "wire", Label: "Wire or fibre diameter", Kind: Quantity, Dim: units.DimLength, Optional: true,
			Min: 1e-6, Max: 2e-3, Advanced: true,
			Hint: "of screens or metal wool, e.g. 0.1 mm or 50 um (empty: 0.1 mm for screens, 50 µm for wool)"},
		{Key: "max-length", Label: "Longest tube you can build", Kind: Quantity, Dim: units.DimLength, Optional: true,
			Min: 0, MinOpen: true, Max: 100, Advanced: true, Hint: "e.g. 1.2 m (empty: no limit)"},
		{Key: "min-gap", Label: "Smallest gap you can make", Kind: Quantity, Dim: units.DimLength, Optional: true,
			Min: 0, MinOpen: true, Max: 0.05, Advanced: true,
			Hint: "plate gap, pore diameter, screen opening or the wool's hydraulic diameter, e.g. 0.3 mm (empty: no limit)"},
		{Key: "drive", Label: "Driver pressure amplitude (heat pump)", Kind: Quantity, Dim: units.DimPressure, Optional: true,
			Min: 0, MinOpen: true, Max: 10e6, Example: "3 kPa", Hint: "pressure amplitude at the driver face, e.g. 3 kPa"},
		unshared(bounded(askedFor(noPM(TemperatureInput("cold", "Cold temperature wanted (heat pump)", "", "273 K"), "")), 20, 500)),
		{Key: "span", Label: "Or the span wanted below ambient (heat pump)", Kind: Quantity, Dim: units.DimTemperatureDifference, Optional: true,
			Min: 0, MinOpen: true, Max: 1000, Hint: "e.g. 20 K, when no cold temperature is given"},
		{Key: "device-out", Label: "Write the device file to", Kind: Text, Optional: true, Advanced: true,
			Hint: "a file name, e.g. d.json: the designed device is written there (replaced whole, never half-written)"},
	},
	About: "The stack's hydraulic radius starts at 1.5 δκ (1–2 δκ, common practice; Tijani et al. 2002; Swift 2002), its place where Swift's (1988) short-stack onset estimate is lowest, " +
		"then position, length and pore size are chosen by minimising the onset temperature of the linear onset solver (gonum Nelder-Mead), " +
		"each candidate's resonator length solved by Brent's method for the target frequency. Exchangers are as long as the peak-to-peak gas displacement at a 3 % working amplitude, " +
		"the stack at least twice that (common practice). The design's file is read back and solved by the same onset solve as the Engine onset calculator. " +
		"A heat pump: pores of 2 δκ (Tijani et al. 2002: lowest temperature), the stack placed and sized for the largest zero-load span of the linear heat-pump solve at the driver's amplitude, " +
		"the tube tuned to the target at room temperature and driven at the resonance of the cooled tube.",
	Examples: []string{
		"twcalc design --gas helium --pressure 10bar --frequency 300Hz --hot 650K --ambient 295K --diameter 50mm --ends closed-closed --device-out d.json",
		"twcalc design --gas air --pressure 1atm --frequency 120Hz --hot 800K --diameter 30mm --ends closed-open --stack metal-wool --wire 50um --json",
		"twcalc design --for heat-pump --gas air --pressure 1atm --frequency 400Hz --diameter 40mm --drive 3kPa --span 20K",
	},
	Run: runDesign,
}

// askedFor returns in as an optional input (the Run says when it is
// needed).
func askedFor(in Input) Input {
	in.Optional = true
	return in
}

// unshared returns in without the temperature the app carries between
// screens: the heater's and the cold end's temperatures are not the gas
// temperature other screens use, and must not become it.
func unshared(in Input) Input {
	in.Share = ShareNone
	return in
}

// bounded returns in with the range calc/design accepts (SI), so that a
// value outside it is blamed on its input when read.
func bounded(in Input, lo, hi float64) Input {
	in.Min, in.Max = lo, hi
	return in
}

// noPM returns in without ± (the design takes none) and with example ex
// when given.
func noPM(in Input, ex string) Input {
	in.PM = false
	in.Hint = strings.TrimSuffix(in.Hint, "; ± or +- for an uncertainty")
	if ex != "" {
		in.Example = ex
	}
	return in
}

// designSubjects maps calc/design's range errors to the inputs they
// concern.
var designSubjects = map[units.Subject]string{
	units.SubjectFrequency: "frequency",
	units.SubjectPressure:  "pressure",
}

// EvaluateDesign is the design calculator's Evaluate for a front end that
// runs it off its UI goroutine: the same parse and Run as the terminal's,
// with ctx to cancel the search (the error is then ctx.Err()) and
// progress, when not nil, called after each solve with the solves so far
// and the most the search will make, on the goroutine that runs it.
func EvaluateDesign(ctx context.Context, progress func(solves, limit int), texts map[string]string) (*Result, error) {
	s := *designSheet
	s.Run = func(v *Values) (*Result, error) {
		return runDesignWith(v, &design.Settings{Context: ctx, Progress: progress})
	}
	r, err := s.Evaluate(texts)
	if ctx.Err() != nil {
		return nil, ctx.Err()
	}
	return r, err
}

func runDesign(v *Values) (*Result, error) { return runDesignWith(v, nil) }

// runDesignWith runs the engine or heat-pump design with set (nil: the
// defaults).
func runDesignWith(v *Values, set *design.Settings) (*Result, error) {
	if v.Pick("for") == "heat-pump" {
		return runDesignHeatPump(v, set)
	}
	if !v.Has("hot") {
		return nil, v.Blame(fmt.Errorf("%w: the hottest temperature the heater reaches, e.g. 650 K", ErrRequired), "hot")
	}
	t := design.Target{
		Frequency:      v.SI("frequency"),
		Gas:            v.Text("gas"),
		MeanPressure:   v.SI("pressure"),
		HotTemperature: v.SI("hot"),
		Ambient:        v.SI("ambient"),
		Diameter:       v.SI("diameter"),
		Ends:           v.Pick("ends").(design.Ends),
		Stack:          v.Pick("stack").(design.StackKind),
		WireDiameter:   v.SI("wire"),
		MaxLength:      v.SI("max-length"),
		MinGap:         v.SI("min-gap"),
	}
	if t.HotTemperature <= t.Ambient {
		return nil, v.Blame(fmt.Errorf("the heater's %s must be above the ambient %s", units.Format(t.HotTemperature, units.DimTemperature), units.Format(t.Ambient, units.DimTemperature)), "hot")
	}
	res, err := design.Design(t, set)
	var ue *design.UnreachableError
	switch {
	case errors.As(err, &ue):
		res = ue.Nearest
	case err != nil:
		return nil, v.BlameSubject(err, designSubjects)
	}
	if res.Onset == nil {
		return nil, err
	}
	r := &Result{}
	designRows(r, &res)
	if ue != nil {
		r.Check("reachable", "Target reached", "no", Fail, "the nearest design is shown: "+ue.Problem)
	} else {
		r.Check("reachable", "Target reached", "yes", Pass, fmt.Sprintf("onset within 1 %% of %s and %s below the heater's %s",
			units.Format(t.Frequency, units.DimFrequency), units.Format(res.Margin, units.DimTemperatureDifference), units.Format(t.HotTemperature, units.DimTemperature)))
	}
	if err := deviceOut(v, r, &res.File); err != nil {
		return nil, err
	}
	return r, nil
}

// runDesignHeatPump is the heat-pump variant: calc/design's DesignHeatPump.
func runDesignHeatPump(v *Values, set *design.Settings) (*Result, error) {
	if !v.Has("drive") {
		return nil, v.Blame(fmt.Errorf("%w for a heat pump: the driver's pressure amplitude, e.g. 3 kPa", ErrRequired), "drive")
	}
	if v.Has("cold") == v.Has("span") {
		return nil, v.Blame(errors.New("give the cold temperature wanted or the span, one of the two"), "cold")
	}
	t := design.HeatPumpTarget{
		Frequency: v.SI("frequency"), Gas: v.Text("gas"), MeanPressure: v.SI("pressure"), Ambient: v.SI("ambient"),
		Diameter: v.SI("diameter"), Ends: v.Pick("ends").(design.Ends), Stack: v.Pick("stack").(design.StackKind),
		WireDiameter: v.SI("wire"), DriverAmplitude: v.SI("drive"), ColdTemperature: v.SI("cold"), Span: v.SI("span"),
		MaxLength: v.SI("max-length"), MinGap: v.SI("min-gap"),
	}
	res, err := design.DesignHeatPump(t, set)
	var ue *design.UnreachableError
	if err != nil && !errors.As(err, &ue) {
		return nil, v.BlameSubject(err, heatPumpSubjects)
	}
	if res.Pump == nil {
		return nil, err
	}
	r := &Result{}
	p, g := res.Pump, res.Geometry
	r.Add("cold_temperature", "Cold temperature at zero load", p.ColdTemperature, units.DimTemperature).Show = "K"
	r.Add("span", "Span below ambient", res.Span, units.DimTemperatureDifference)
	r.Add("margin", "Span beyond the one wanted", res.Margin, units.DimTemperatureDifference)
	r.Add("drive_frequency", "Drive frequency (resonance of the cooled tube)", res.DriveFrequency, units.DimFrequency)
	r.Add("acoustic_power", "Acoustic power the driver puts in", p.AcousticPower, units.DimPower)
	r.Add("tube_length", "Whole tube", g.Length(), units.DimLength)
	mm := func(key, label string, v float64) { r.Add(key, label, v, units.DimLength).Show = "mm" }
	mm("driver_space", "Driver to warm exchanger", g.DriverSpace)
	mm("warm_exchanger", "Warm exchanger", g.WarmExchanger)
	mm("stack_position", "Stack warm face from the driver", g.Position())
	mm("stack_length", "Stack", g.Stack)
	mm("cold_exchanger", "Cold exchanger", g.ColdExchanger)
	mm("resonator", "Resonator (cold exchanger to far end)", g.Resonator)
	mm("hydraulic_radius", "Stack hydraulic radius", g.HydraulicRadius)
	mm("gap", "Stack gap", g.Gap)
	r.Add("porosity", "Stack porosity", g.Porosity, units.DimNone)
	text := ""
	if b, err := res.File.Marshal(); err == nil {
		text = string(b)
	}
	r.AddObject("device", "Device file", res.File, text)
	if ue != nil {
		r.Check("reachable", "Target reached", "no", Fail, "the nearest design is shown: "+ue.Problem)
	} else {
		r.Check("reachable", "Target reached", "yes", Pass, fmt.Sprintf("a span of %s at zero load, %s more than wanted",
			units.Format(res.Span, units.DimTemperatureDifference), units.Format(res.Margin, units.DimTemperatureDifference)))
	}
	r.Warn(res.Warnings...)
	r.Caution(res.Cautions...)
	r.Note(res.Rules...)
	if err := deviceOut(v, r, &res.File); err != nil {
		return nil, err
	}
	return r, nil
}

// heatPumpSubjects maps calc/design's heat-pump range errors to inputs.
var heatPumpSubjects = map[units.Subject]string{
	units.SubjectFrequency:   "frequency",
	units.SubjectPressure:    "drive",
	units.SubjectTemperature: "cold",
}

// deviceOut writes the device file when device-out names one.
func deviceOut(v *Values, r *Result, f *linear.DeviceFile) error {
	path := strings.TrimSpace(v.Text("device-out"))
	if path == "" {
		return nil
	}
	b, err := f.Marshal()
	if err == nil {
		err = writeAtomic(path, b)
	}
	if err != nil {
		return v.Blame(err, "device-out")
	}
	r.Note("Device file written to " + path + ".")
	return nil
}

// designRows adds the design's figures, geometry, sensitivity and the
// device itself.
func designRows(r *Result, res *design.Result) {
	on, g := res.Onset, res.Geometry
	row := r.Add("onset_temperature", "Hot temperature at onset", on.HotTemperature, units.DimTemperature)
	row.Show = "K"
	r.Add("frequency", "Onset frequency", on.Frequency, units.DimFrequency)
	r.Add("margin", "Heater margin above onset", res.Margin, units.DimTemperatureDifference).Note = "the heater's temperature less the onset temperature"
	mm := func(key, label string, v float64, note string) {
		row := r.Add(key, label, v, units.DimLength)
		row.Show, row.Note = "mm", note
	}
	r.Add("tube_length", "Whole tube", g.Length(), units.DimLength)
	mm("hot_space", "Hot space (closed end to heater)", g.HotSpace, "at the hot temperature; insulate it")
	mm("heater", "Heater", g.Heater, "")
	mm("stack_position", "Stack hot face from the closed end", g.Position(), "")
	mm("stack_length", "Stack", g.Stack, "")
	mm("cooler", "Cooler", g.Cooler, "")
	mm("resonator", "Resonator (cooler to far end)", g.Resonator, "")
	mm("hydraulic_radius", "Stack hydraulic radius", g.HydraulicRadius, fmt.Sprintf("%.2f δκ", g.HydraulicRadius/res.ThermalDepth))
	mm("gap", "Stack gap", g.Gap, gapNote(res.Target.Stack))
	r.Add("porosity", "Stack porosity", g.Porosity, units.DimNone)
	switch p := g.Pores; p.Shape {
	case "plates":
		mm("plate_thickness", "Plate thickness", p.Thickness, "")
	case "circular":
		mm("pore_radius", "Pore radius", p.Radius, "")
	case "screens":
		row := r.Add("mesh", "Screen mesh", p.Mesh, units.DimPerLength)
		row.Show = "/in"
	}
	mm("thermal_depth", "Thermal penetration depth δκ", res.ThermalDepth, "at ambient temperature and the target frequency")
	for _, s := range res.Sensitivity {
		in := "mm"
		switch {
		case s.Unit == "Pa":
			in = "bar"
		case s.Step < 0.1e-3:
			in = "um" // a pore's 2 % step reads better in µm
		}
		step, err := units.FormatIn(s.Step, in)
		if err != nil {
			step = units.Format(s.Step, units.DimLength)
		}
		change := step + " more " + s.Quantity
		r.Add(onsetChangeKey+s.Key, onsetChangeLabel+change, s.OnsetChange, units.DimTemperatureDifference)
		r.Add(frequencyChangeKey+s.Key, frequencyChangeLabel+change, s.FrequencyChange, units.DimFrequency)
	}
	text := ""
	if b, err := res.File.Marshal(); err == nil {
		text = string(b)
	}
	r.AddObject("device", "Device file", res.File, text)
	r.Warn(res.Warnings...)
	r.Caution(res.Cautions...)
	r.Note(res.Rules...)
}

// The keys and labels of the sensitivity rows start with these, followed
// by calc/design's key and the change in words.
const (
	onsetChangeKey       = "onset_change_"
	frequencyChangeKey   = "frequency_change_"
	onsetChangeLabel     = "Onset change for "
	frequencyChangeLabel = "Frequency change for "
)

// SensitivityLine is one line of a design's sensitivity table, for a
// front end that draws the table rather than rows: the change made in
// words ("1 mm more stack length (other parts kept, so the tube grows)")
// and the result rows of the onset temperature change (K) and the
// frequency change (Hz) it brings.
type SensitivityLine struct {
	Change           string
	Onset, Frequency Row
}

// DesignSensitivity returns the sensitivity table of a design calculator's
// result, in the order of its rows; none for a heat pump or a result
// without the table.
func DesignSensitivity(r *Result) []SensitivityLine {
	var out []SensitivityLine
	for _, row := range r.Rows {
		key, ok := strings.CutPrefix(row.Key, onsetChangeKey)
		if !ok {
			continue
		}
		f, ok := r.Row(frequencyChangeKey + key)
		if !ok {
			continue
		}
		out = append(out, SensitivityLine{Change: strings.TrimPrefix(row.Label, onsetChangeLabel), Onset: row, Frequency: f})
	}
	return out
}

// gapNote says what the gap of a stack kind is.
func gapNote(k design.StackKind) string {
	switch k {
	case design.RoundPores:
		return "pore diameter"
	case design.Screens:
		return "opening between wires"
	case design.MetalWool:
		return "hydraulic diameter 4 r_h"
	}
	return "between plates"
}

// writeAtomic writes data to path through a temporary file in the same
// folder and a rename, so that the file is never left half-written.
func writeAtomic(path string, data []byte) error {
	f, err := os.CreateTemp(filepath.Dir(path), "."+filepath.Base(path)+".tmp*")
	if err != nil {
		return err
	}
	tmp := f.Name()
	if _, err := f.Write(data); err != nil {
		f.Close()
		os.Remove(tmp)
		return err
	}
	if err := f.Close(); err != nil {
		os.Remove(tmp)
		return err
	}
	if err := os.Rename(tmp, path); err != nil {
		os.Remove(tmp)
		return err
	}
	return nil
}
