package sheet

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// EU Directive 2003/10/EC (noise), Article 3(1), daily exposure values,
// dB(A): the lower and upper exposure action values and the exposure limit
// value (the last with hearing protection taken into account). Source: the
// text of Article 3 as reproduced in calc/safety/sound.go's limits.
const (
	EULowerActionLevel = 80.0
	EUUpperActionLevel = 85.0
	EUExposureLimit    = 87.0
)

// splSheet is the sound level of a pressure amplitude in the resonator
// against the occupational limits, and, for a level measured where people
// stand, the daily time OSHA 1910.95 permits (none above 115 dBA) and the
// time to the EU exposure limit.
var splSheet = &Sheet{
	ID:      IDSPL,
	Title:   "Sound level",
	Summary: "Sound pressure level of a pressure amplitude against hearing limits, and the daily time at a level measured where people stand (safety)",
	Inputs: []Input{
		{Key: "amplitude", Label: "Pressure amplitude in the resonator", Kind: Quantity, Dim: units.DimPressure, Example: "5 kPa",
			Hint: "peak amplitude of the oscillation, e.g. 5 kPa, 0.05 bar, 2 psi; ± or +- for an uncertainty", PM: true},
		{Key: "at-ear", Label: "Level measured where people stand", Kind: Quantity, Dim: units.DimSoundLevel, Optional: true,
			Hint: "A-weighted, from a sound level meter, e.g. 85 dBA", Min: 0, Max: 200},
	},
	About: "SPL = 20 log10(p_rms/20 µPa) with p_rms = amplitude/√2; peak = 20 log10(amplitude/20 µPa); no frequency weighting. " +
		"Limits: EU 2003/10/EC (80, 85, 87 dB(A); 135, 137, 140 dB(C) peak) and OSHA 29 CFR 1910.95 (85, 90 dBA; 140 dB peak). " +
		"OSHA Table G-16: 8 h / 2^((L − 90)/5), up to 115 dBA, no time above; EU: the time that brings L_EX,8h to 87 dB(A).",
	Examples: []string{
		"twcalc spl --amplitude 10kPa",
		"twcalc spl --amplitude 2kPa --at-ear 92dBA --json",
	},
	Run: runSPL,
}

func runSPL(v *Values) (*Result, error) {
	amp := v.Q("amplitude")
	if amp.Gauge {
		return nil, v.Blame(errors.New("an amplitude is neither gauge nor absolute: give it in Pa, kPa, bar or psi"), "amplitude")
	}
	s, err := safety.Level(amp.Value)
	if err != nil {
		return nil, v.Blame(err, "amplitude")
	}
	r := &Result{}
	sig, ok := Spread(func(x, out []float64) error {
		q, err := safety.Level(x[0])
		out[0], out[1], out[2] = q.RMS, q.SPL, q.Peak
		return err
	}, []float64{amp.Value}, []float64{amp.Uncertainty}, 3)
	for k, key := range []string{"rms_pressure", "spl", "peak_level"} {
		if !ok[k] {
			r.Warn(noSpreadWarning(key))
		}
	}
	r.AddPM("rms_pressure", "RMS pressure in the resonator", s.RMS, sig[0], units.DimPressure)
	r.AddPM("spl", "Sound pressure level in the resonator (rms)", s.SPL, sig[1], units.DimSoundLevel)
	r.AddPM("peak_level", "Peak level in the resonator", s.Peak, sig[2], units.DimSoundLevel)
	limitsRow(r, s)
	if v.Has("at-ear") {
		exposureRows(r, v.SI("at-ear"))
	}
	r.Warn("levels inside a vessel are not exposure: compare only a level measured where people stand with the limits")
	cautionOnce(r, s.Cautions...)
	return r, nil
}

// limitsRow lists the limits the level in the resonator reaches, as a
// check that warns (the level inside is not exposure).
func limitsRow(r *Result, s safety.SoundLevel) {
	over := []string{}
	top := -1
	for i, l := range s.Limits {
		if l.Over {
			over = append(over, fmt.Sprintf("%s (%g dB, %s)", l.Name, l.Level, l.Metric))
			if top < 0 || l.Level > s.Limits[top].Level {
				top = i
			}
		}
	}
	words := fmt.Sprintf("%d of %d", len(over), len(s.Limits))
	if len(over) == len(s.Limits) {
		words = fmt.Sprintf("all %d", len(over))
	}
	row := r.AddObject("limits_reached_in_vessel", "Occupational limits this level reaches", over, words)
	if top < 0 {
		row.Outcome, row.Note = Pass, "none of the EU 2003/10/EC and OSHA 1910.95 limits; a level inside the vessel is not exposure"
		return
	}
	l := s.Limits[top]
	row.Outcome = Warn
	row.Note = "the highest: " + l.Name + ", " + strings.TrimSuffix(fmt.Sprintf("%g", l.Level), ".0") + " for " + l.Metric +
		"; a level inside the vessel is not exposure: measure where people stand"
}

// exposureRows set a level measured where people stand against OSHA
// 1910.95 (no time above 115 dBA) and the EU action and limit values.
func exposureRows(r *Result, L float64) {
	osha := safety.OSHAPermitted(L)
	if osha.Permitted {
		row := r.Add("osha_permitted_time", "OSHA permitted time per day", osha.Hours*3600, units.DimTime)
		row.Show, row.Note = "h", osha.Note
	} else {
		r.Check("osha_permitted_time", "OSHA permitted time per day", "not permitted", Fail, osha.Note)
	}
	_, eu := safety.PermittedHours(L)
	r.Add("eu_limit_time", fmt.Sprintf("Time to the EU limit of %g dB(A)", EUExposureLimit), eu*3600, units.DimTime).Show = "h"
	r.AddWords("exposure_basis", "Exposure from", "OSHA 1910.95 Table G-16: 8 h / 2^((L−90)/5) up to 115 dBA, not permitted above; EU 2003/10/EC: time to reach L_EX,8h = 87 dB(A)")
	lvl := fmt.Sprintf("%.1f dB(A)", L)
	switch {
	case !osha.Permitted:
		r.Check("exposure_check", "Level where people stand", "not permitted", Fail,
			lvl+" is above "+fmt.Sprintf("%g dBA", safety.OSHAMaxLevel)+", the highest level of OSHA 1910.95 Table G-16: no exposure is permitted; stop the source or keep everyone out")
	case L >= EUUpperActionLevel:
		r.Check("exposure_check", "Level where people stand", "hearing protection", Warn,
			fmt.Sprintf("%s is at or above the EU upper exposure action value %g dB(A): hearing protection must be worn; OSHA permits %s per day", lvl, EUUpperActionLevel, hours(osha.Hours*3600)))
	case L >= EULowerActionLevel:
		r.Check("exposure_check", "Level where people stand", "protection available", Warn,
			fmt.Sprintf("%s is at or above the EU lower exposure action value %g dB(A): hearing protection must be made available", lvl, EULowerActionLevel))
	default:
		r.Check("exposure_check", "Level where people stand", "below the action values", Pass,
			fmt.Sprintf("%s is below the EU lower exposure action value %g dB(A)", lvl, EULowerActionLevel))
	}
}
