package sheet

import (
	"errors"
	"fmt"
	"math"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// onsetSheet is the engine-onset calculator: the hot temperature and
// frequency at which a device starts to sing (calc/linear's Onset), or, at
// a given hot temperature, the growth or decay of the nearest mode (Mode),
// or the onset temperature against mean pressure.
var onsetSheet = &Sheet{
	ID:      IDOnset,
	Title:   "Engine onset",
	Summary: "Build an engine from parts and find the hot temperature and frequency at which it starts to sing, with profiles and onset against pressure",
	Inputs: []Input{
		deviceInput(),
		exampleInput(),
		{Key: "hot", Label: "Check a hot temperature below or above onset", Kind: Quantity, Dim: units.DimTemperature,
			Units: units.Options{DefaultUnit: "K"}, Optional: true, PM: true, Min: 2, Max: 3000,
			Hint: "instead of onset, the growth or decay of the nearest mode with the hot parts at this temperature, e.g. 500 K; ± or +- for an uncertainty"},
		{Key: "frequency-guess", Label: "Start the frequency at", Kind: Quantity, Dim: units.DimFrequency,
			Optional: true, Min: 0.1, Max: 1e6, Advanced: true,
			Hint: "start the frequency here to pick another mode, e.g. 120 Hz (empty: from the length)"},
		{Key: "sweep-pressure", Label: "Onset against mean pressure", Kind: Sweep, Dim: units.DimPressure,
			Optional: true, Min: 0, MinOpen: true, Max: 50e6,
			Hint: "onset temperature against mean pressure as a table, FROM:TO[:N], e.g. 2bar:30bar:15"},
		profileInput(),
	},
	About: "Rott's linear wave equations for p1 and U1 with the thermoviscous functions of each part (Swift 2002, ch. 4), integrated part by part; " +
		"onset is the hot temperature and real frequency that meet the far-end condition. " + deviceFileHelp,
	Examples: []string{
		"twcalc onset mydevice.json --json",
		"twcalc onset --example engine --hot 500K",
		"twcalc onset --example engine --sweep-pressure 1bar:40bar:20",
	},
	Run: runOnset,
}

func runOnset(v *Values) (*Result, error) {
	d, err := loadDevice(v)
	if err != nil {
		return nil, err
	}
	set := &linear.Settings{FrequencyGuess: v.SI("frequency-guess"), NoProfile: !v.On(keyProfile)}
	r := &Result{}
	deriveDevice(r, d)
	switch {
	case v.Has("sweep-pressure"):
		if v.Has("hot") || v.On(keyProfile) {
			return nil, v.Blame(errors.New("cannot be combined with a hot temperature to check or the profile"), "sweep-pressure")
		}
		return onsetSweep(r, d, v.Span("sweep-pressure").Points(), set)
	case v.Has("hot"):
		return onsetMode(r, v, d, set)
	}
	res, err := linear.Onset(d, set)
	if err != nil {
		return nil, blameDevice(v, err)
	}
	row := r.Add("hot_temperature", "Hot temperature at onset", res.HotTemperature, units.DimTemperature)
	row.Show = "K"
	if c, err := units.FormatIn(res.HotTemperature, "degC"); err == nil {
		row.Note = "= " + c + "; the parts marked hot must reach this before the engine starts"
	}
	r.Add("frequency", "Frequency", res.Frequency, units.DimFrequency)
	r.Add("temperature_ratio", "Hot / ambient temperature", res.TemperatureRatio, units.DimNone)
	iterationsRow(r, res.Iterations)
	shortStackRows(r, res.ShortStack, false)
	r.Warn(res.Warnings...)
	if v.On(keyProfile) {
		r.Table = profileTable(&res.Profile)
	}
	r.Caution(OnsetCautions(res.HotTemperature, d.MeanPressure, true, false)...)
	return r, nil
}

// onsetMode is the growth or decay of the nearest mode at the hot
// temperature typed, with its ± carried to the frequency and growth rate.
func onsetMode(r *Result, v *Values, d *linear.Device, set *linear.Settings) (*Result, error) {
	hot := v.Q("hot")
	m, err := linear.Mode(d, hot.Value, set)
	if err != nil {
		return nil, blameDevice(v, err)
	}
	quiet := *set
	quiet.NoProfile = true
	sig, ok := Spread(func(x, out []float64) error {
		mm, err := linear.Mode(d, x[0], &quiet)
		if err == nil {
			out[0], out[1] = mm.Frequency, mm.GrowthRate
		}
		return err
	}, []float64{hot.Value}, []float64{hot.Uncertainty}, 2)
	for k, key := range []string{"frequency", "growth_rate"} {
		if !ok[k] {
			r.Warn(noSpreadWarning(key))
		}
	}
	r.AddPM("frequency", "Frequency of the nearest mode", m.Frequency, sig[0], units.DimFrequency)
	r.AddPM("growth_rate", "Growth rate (negative: decays)", m.GrowthRate, sig[1], units.DimRate)
	if !math.IsInf(m.Q, 0) && finite(m.Q) {
		r.Add("quality_factor", "Quality factor Q", m.Q, units.DimNone)
	}
	verdict := "decays (below onset)"
	if m.Growing {
		verdict = "grows (above onset)"
	}
	r.AddWords("mode", "The sound at this hot temperature", verdict)
	iterationsRow(r, m.Iterations)
	r.Warn(m.Warnings...)
	if v.On(keyProfile) {
		r.Table = profileTable(&m.Profile)
	}
	r.Caution(OnsetCautions(hot.Value, d.MeanPressure, false, false)...)
	return r, nil
}

// onsetSweep is the onset temperature and frequency at each mean pressure,
// as a table; a pressure whose solve fails is a warning.
func onsetSweep(r *Result, d *linear.Device, pressures []float64, set *linear.Settings) (*Result, error) {
	t := &Table{Header: []string{"mean_pressure_Pa", "hot_temperature_K", "frequency_Hz"}}
	maxHot, maxP := 0.0, 0.0
	for _, p := range linear.OnsetVsPressure(d, pressures, set) {
		if p.Err != nil {
			r.Warn(fmt.Sprintf("%s: %v", units.Format(p.Pressure, units.DimPressure), p.Err))
			continue
		}
		t.Rows = append(t.Rows, []float64{p.Pressure, p.HotTemperature, p.Frequency})
		maxHot, maxP = max(maxHot, p.HotTemperature), max(maxP, p.Pressure)
	}
	if len(t.Rows) == 0 {
		return nil, errors.New("onset: no point of the sweep converged")
	}
	r.Table = t
	r.Caution(OnsetCautions(maxHot, maxP, true, true)...)
	return r, nil
}

// OnsetCautions are the cautions of every engine result: the hot
// temperature is a number people act on at the bench. hot is the hot
// temperature (K): at onset (atOnset) or the one the parts are held at;
// pressure (Pa) the highest mean pressure the result is for: the device's
// own, or the top of a pressure sweep (sweep).
func OnsetCautions(hot, pressure float64, atOnset, sweep bool) []string {
	what := "the hot end must reach about %s before the engine starts"
	if !atOnset {
		what = "the hot parts are at %s"
	}
	charged := "the device is charged to %s absolute"
	if sweep {
		charged = "the sweep goes up to %s absolute"
	}
	return []string{
		fmt.Sprintf("Hot parts: "+what+"; heaters, exchangers and tube walls at this temperature burn skin and can ignite nearby material. Let parts cool before touching; follow your lab's hot-work rules.",
			withAlt(hot, units.DimTemperature, "degC")),
		fmt.Sprintf("Pressure: "+charged+"; the vessel must be rated for it at the hot temperature (check its wall with the vessel calculation). Defer to local pressure-vessel codes and licensed practice.",
			withAlt(pressure, units.DimPressure, "bar")),
		"Sound: a running engine can be very loud; wear hearing protection near it, above all near an open end.",
		"This is a linear estimate: heat leaks, streaming and construction details change real onset; approach it slowly.",
	}
}
