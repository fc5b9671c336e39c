package linear

import "math"

// PressurePoint is one point of OnsetVsPressure.
type PressurePoint struct {
	Pressure       float64 // mean pressure, Pa
	HotTemperature float64 // K, 0 when Err != nil
	Frequency      float64 // Hz, 0 when Err != nil
	Err            error
}

// OnsetVsPressure solves Onset at each mean pressure (Pa), starting each
// solve from the previous answer. The onset temperature against pressure is
// usually U-shaped: at low pressure the pores are narrow against δκ and
// thermal contact is too good; at high pressure they are wide and contact
// too poor. A failed point carries its error and the sweep goes on.
func OnsetVsPressure(dev *Device, pressures []float64, s *Settings) []PressurePoint {
	set := s.values()
	set.NoProfile = true
	out := make([]PressurePoint, len(pressures))
	d := *dev
	for i, p := range pressures {
		d.MeanPressure = p
		out[i].Pressure = p
		r, err := Onset(&d, &set)
		if err != nil {
			out[i].Err = err
			continue
		}
		out[i].HotTemperature, out[i].Frequency = r.HotTemperature, r.Frequency
		set.HotGuess, set.FrequencyGuess = r.HotTemperature, r.Frequency
	}
	return out
}

// FrequencyPoint is one point of SpanVsFrequency.
type FrequencyPoint struct {
	Frequency float64 // drive frequency, Hz
	Result    *HeatPumpResult
	Err       error
}

// SpanVsFrequency solves HeatPump at each drive frequency (Hz) with the
// driver's amplitude, to find the frequency of the largest span.
func SpanVsFrequency(dev *Device, freqs []float64, hs *HeatPumpSettings) []FrequencyPoint {
	var in HeatPumpSettings
	if hs != nil {
		in = *hs
	}
	in.NoProfile = true
	out := make([]FrequencyPoint, len(freqs))
	for i, f := range freqs {
		in.Frequency = f
		out[i].Frequency = f
		out[i].Result, out[i].Err = HeatPump(dev, &in)
	}
	return out
}

// Grid returns n values from lo to hi inclusive, evenly spaced (n >= 2), or
// geometrically spaced when geometric is true (lo, hi > 0).
func Grid(lo, hi float64, n int, geometric bool) []float64 {
	if n < 2 {
		return []float64{lo}
	}
	out := make([]float64, n)
	for i := range out {
		t := float64(i) / float64(n-1)
		if geometric {
			out[i] = lo * math.Pow(hi/lo, t)
		} else {
			out[i] = lo + (hi-lo)*t
		}
	}
	out[n-1] = hi
	return out
}
