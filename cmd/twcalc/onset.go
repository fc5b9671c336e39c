package main

import (
	"errors"
	"fmt"
	"os"
	"strconv"
	"strings"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// deviceArgs declares the ways to name a device: a FILE argument or
// --example NAME.
func deviceArgs(fl *flags) *string {
	fl.positional(1, "FILE")
	return fl.str("example", "", "use a built-in example device instead of a file: "+strings.Join(linear.ExampleNames(), ", ")+" (invented demo data)")
}

// loadDevice reads the device named on the command line. Problems in the
// file are usage errors that name the part and field.
func loadDevice(fl *flags, example string) (*linear.Device, string, error) {
	args := fl.args()
	switch {
	case len(args) == 1 && example != "":
		return nil, "", &usageError{msg: "give a device FILE or --example, not both"}
	case example != "":
		d, err := linear.Example(example)
		if err != nil {
			return nil, "", &usageError{msg: "--example " + quoteValue(example) + ": " + err.Error()}
		}
		return d, "example " + example, nil
	case len(args) == 1:
		f, err := os.Open(args[0])
		if err != nil {
			return nil, "", &usageError{msg: err.Error()}
		}
		defer f.Close()
		d, err := linear.ParseDevice(f)
		if err != nil {
			return nil, "", &usageError{msg: args[0] + ": " + err.Error()}
		}
		return d, args[0], nil
	}
	return nil, "", &usageError{msg: fmt.Sprintf("name a device FILE (JSON) or use --example %s", strings.Join(linear.ExampleNames(), "|"))}
}

// solveError turns a solver error into a message for the terminal; device
// problems found by the solver are usage errors.
func solveError(err error) error {
	var fe *linear.FieldError
	if errors.As(err, &fe) {
		return &usageError{msg: err.Error()}
	}
	return err
}

// onsetCautions are printed with every onset result: the hot temperature
// is a number people act on at the bench. pressure is the highest mean
// pressure the result is for (Pa): the device's own, or the top of a
// pressure sweep (sweep true).
func onsetCautions(r *report, hot, pressure float64, atOnset, sweep bool) {
	charged := "the device is charged to %s absolute"
	if sweep {
		charged = "the sweep goes up to %s absolute"
	}
	what := "the hot end must reach about %s before the engine starts"
	if !atOnset {
		what = "the hot parts are at %s"
	}
	r.caution(fmt.Sprintf("Hot parts: "+what+"; heaters, exchangers and tube walls at this temperature burn skin and can ignite nearby material. Let parts cool before touching; follow your lab's hot-work rules.", inUnit(hot, units.DimTemperature, "degC")))
	r.caution(fmt.Sprintf("Pressure: "+charged+"; the vessel must be rated for it at the hot temperature (see twcalc vessel). Defer to local pressure-vessel codes and licensed practice.", inUnit(pressure, units.DimPressure, "bar")))
	r.caution("Sound: a running engine can be very loud; wear hearing protection near an open end.")
	r.caution("This is a linear estimate: real onset also depends on heat leaks, streaming and construction details; approach it slowly.")
}

// runOnset is `twcalc onset`: the hot temperature and frequency at which a
// device described in a file starts, the complex frequency below onset, and
// the onset temperature against mean pressure.
func runOnset(args []string) (*report, error) {
	fl := newFlags("onset")
	example := deviceArgs(fl)
	hotText := fl.str("hot", "", "instead of onset, the growth or decay of the nearest mode with the hot parts at this temperature, e.g. 500K")
	fguessText := fl.str("frequency-guess", "", "start the frequency here to pick another mode, e.g. 120Hz (default: from the length)")
	sweep := fl.span("sweep-pressure", units.DimPressure, "onset temperature against mean pressure as CSV, e.g. 2bar:30bar:15")
	profile := fl.boolean("profile", "print the profile along the device at onset as CSV (x, |p1|, |U1|, phase, Tm, acoustic power)")
	fl.describe(`The device file is JSON: "gas", "mean_pressure", "ambient_temperature" and an
ordered list of "parts" from the start (closed) end, each with a "kind":
closed-end, driver, tube, exchanger, stack, cavity, open-end; quantities are
text with units. A short one:
  {"gas": "helium", "mean_pressure": "10 bar", "ambient_temperature": "300 K",
   "parts": [{"kind": "closed-end"},
     {"kind": "exchanger", "length": "1 cm", "diameter": "5 cm", "temperature": "hot",
      "porosity": "0.6", "pores": {"shape": "plates", "half_gap": "0.4 mm"}},
     {"kind": "stack", "length": "5 cm", "diameter": "5 cm", "porosity": "0.75",
      "pores": {"shape": "plates", "half_gap": "0.3 mm", "thickness": "0.2 mm"}},
     {"kind": "tube", "length": "1 m", "diameter": "5 cm", "temperature": "ambient"},
     {"kind": "closed-end"}]}
examples:
  twcalc onset mydevice.json --json
  twcalc onset --example engine --hot 500K
  twcalc onset --example engine --sweep-pressure 1bar:40bar:20`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	below, err := optionalQuantity("hot", *hotText, units.DimTemperature)
	if err != nil {
		return nil, err
	}
	fguess, err := optionalQuantity("frequency-guess", *fguessText, units.DimFrequency)
	if err != nil {
		return nil, err
	}
	d, name, err := loadDevice(fl, *example)
	if err != nil {
		return nil, err
	}
	set := &linear.Settings{}
	set.FrequencyGuess = fguess.Value
	r := newReport()
	deviceInputs(r, d, name)
	switch {
	case sweep.Set:
		if below.Value > 0 || *profile {
			return nil, &usageError{msg: "--sweep-pressure cannot be combined with --hot or --profile"}
		}
		for _, p := range sweep.values() {
			if !(p > 0) {
				return nil, badInput("sweep-pressure", fl.typed("sweep-pressure"), errors.New("pressures must be above zero"))
			}
		}
		pts := linear.OnsetVsPressure(d, sweep.values(), set)
		var rows [][]float64
		maxHot, maxP := 0.0, 0.0
		for _, p := range pts {
			if p.Err != nil {
				r.warn(fmt.Sprintf("%s: %v", units.Format(p.Pressure, units.DimPressure), p.Err))
				continue
			}
			rows = append(rows, []float64{p.Pressure, p.HotTemperature, p.Frequency})
			maxHot = max(maxHot, p.HotTemperature)
			maxP = max(maxP, p.Pressure)
		}
		if len(rows) == 0 {
			return nil, errors.New("onset: no point of the sweep converged")
		}
		r.table([]string{"mean_pressure_Pa", "hot_temperature_K", "frequency_Hz"}, rows)
		onsetCautions(r, maxHot, maxP, true, true)
		return r, nil
	case below.Value > 0:
		m, err := linear.Mode(d, below.Value, set)
		if err != nil {
			return nil, solveError(err)
		}
		r.inputQuantity("hot", below, *hotText)
		r.add("frequency", m.Frequency, units.DimFrequency)
		r.add("growth_rate", m.GrowthRate, units.DimRate)
		if !isInf(m.Q) {
			r.add("quality_factor", m.Q, units.DimNone)
		}
		verdict := "decays (below onset)"
		if m.Growing {
			verdict = "grows (above onset)"
		}
		r.addValue("mode", verdict)
		r.addValue("iterations", m.Iterations)
		for _, w := range m.Warnings {
			r.warn(w)
		}
		onsetCautions(r, below.Value, d.MeanPressure, false, false)
		return r, nil
	}
	res, err := linear.Onset(d, set)
	if err != nil {
		return nil, solveError(err)
	}
	r.add("hot_temperature", res.HotTemperature, units.DimTemperature)
	r.add("frequency", res.Frequency, units.DimFrequency)
	r.add("temperature_ratio", res.TemperatureRatio, units.DimNone)
	r.addValue("iterations", res.Iterations)
	if ss := res.ShortStack; ss != nil {
		r.add("short_stack_critical_difference", ss.CriticalDifference, units.DimTemperatureDifference)
		addShortStack(r, ss)
	}
	for _, w := range res.Warnings {
		r.warn(w)
	}
	if *profile {
		r.table(profileHeader, profileRows(&res.Profile))
	}
	onsetCautions(r, res.HotTemperature, d.MeanPressure, true, false)
	return r, nil
}

// optionalQuantity parses an optional flag's text; empty text gives a zero
// Quantity. Values must be positive and finite.
func optionalQuantity(name, text string, dim units.Dimension) (units.Quantity, error) {
	if strings.TrimSpace(text) == "" {
		return units.Quantity{Dim: dim}, nil
	}
	q, err := units.Parse(text, dim)
	if err != nil {
		return q, badInput(name, text, err)
	}
	if !(q.Value > 0) || !finite(q.Value) {
		return q, badInput(name, text, errors.New("must be above zero"))
	}
	return q, nil
}

// deviceInputs records the device, its name, gas and top-level quantities
// in the report.
func deviceInputs(r *report, d *linear.Device, source string) {
	r.input("device", source)
	if d.Name != "" {
		r.input("device_name", d.Name)
	}
	r.input("gas", d.Gas.String())
	r.inputQuantity("mean_pressure", units.Quantity{Value: d.MeanPressure, Dim: units.DimPressure}, strconv.FormatFloat(d.MeanPressure, 'g', -1, 64)+" Pa")
	r.inputQuantity("ambient_temperature", units.Quantity{Value: d.AmbientTemperature, Dim: units.DimTemperature}, strconv.FormatFloat(d.AmbientTemperature, 'g', -1, 64)+" K")
}

// inUnit formats v in SI and, in brackets, in another unit: "710.7 K (437.6 degC)".
func inUnit(v float64, dim units.Dimension, unit string) string {
	s := units.Format(v, dim)
	if o, err := units.FormatIn(v, unit); err == nil {
		s += " (" + o + ")"
	}
	return s
}

func isInf(v float64) bool { return v > 1e308 || v < -1e308 }

var profileHeader = []string{"x_m", "pressure_amplitude_Pa", "volume_velocity_amplitude_m3_per_s", "phase_p_minus_U_deg", "mean_temperature_K", "acoustic_power_W"}

func profileRows(p *linear.Profile) [][]float64 {
	rows := make([][]float64, len(p.X))
	for i := range p.X {
		rows[i] = []float64{p.X[i], p.PressureAmp[i], p.FlowAmp[i], p.Phase[i], p.Temperature[i], p.AcousticPower[i]}
	}
	return rows
}

// addShortStack reports the ratio Γ and the validity numbers of a
// short-stack estimate, and its warnings, after the headline number that
// onset and heatpump each give first.
func addShortStack(r *report, ss *linear.ShortStackResult) {
	r.add("short_stack_gradient_ratio", ss.GradientRatio, units.DimNone)
	r.add("short_stack_k_dx", ss.KDeltaX, units.DimNone)
	r.add("short_stack_depth_ratio", ss.DepthRatio, units.DimNone)
	for _, w := range ss.Warnings {
		r.warn("short-stack estimate: " + w)
	}
}
