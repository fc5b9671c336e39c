package main

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// runSPL is `twcalc spl`: sound pressure levels of a sinusoidal pressure
// amplitude (rms and peak) against occupational noise limits, and, for a
// level measured where people stand, the daily time those limits allow.
func runSPL(args []string) (*report, error) {
	fl := newFlags("spl")
	amp := fl.quantity("amplitude", units.DimPressure, "", "pressure amplitude (peak) of the oscillation: 10kPa, 0.1bar, 2psi")
	ear := fl.quantity("at-ear", units.DimSoundLevel, "0dB", "A-weighted level measured where people stand, for the permitted daily time: 92dBA")
	fl.describe(`The level inside a resonator is not a person's exposure: measure where people
stand. No frequency weighting is applied to the amplitude.

examples:
  twcalc spl --amplitude 10kPa
  twcalc spl --amplitude 2kPa --at-ear 92dBA --json`)
	if v, ok := negativeValue(args, "amplitude"); ok {
		return nil, badInput("amplitude", v, errors.New("is negative: an amplitude is the size of the pressure swing, give it as a positive number, e.g. 10kPa"))
	}
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	if amp.Gauge {
		return nil, badInput("amplitude", fl.typed("amplitude"), errors.New("an amplitude is neither gauge nor absolute: give it in Pa, kPa, bar or psi"))
	}
	s, err := safety.Level(amp.Value)
	if err != nil {
		return nil, fl.blame(err, "amplitude")
	}
	r := newReport()
	fl.echo(r)
	r.add("rms_pressure", s.RMS, units.DimPressure)
	r.add("spl", s.SPL, units.DimSoundLevel)
	r.add("peak_level", s.Peak, units.DimSoundLevel)
	var over []string
	for _, l := range s.Limits {
		if l.Over {
			over = append(over, fmt.Sprintf("%s (%g dB, %s)", l.Name, l.Level, l.Metric))
		}
	}
	if over == nil {
		over = []string{}
	}
	r.addValue("limits_reached_in_vessel", over)
	if fl.given("at-ear") {
		osha, eu := safety.PermittedHours(ear.Value)
		r.add("osha_permitted_time", osha*3600, units.DimTime)
		r.add("eu_limit_time", eu*3600, units.DimTime)
		r.addValue("exposure_basis", "OSHA 1910.95 Table G-16: 8 h / 2^((L−90)/5); EU 2003/10/EC: time to reach L_EX,8h = 87 dB(A)")
	}
	r.warn("levels inside a vessel are not exposure: compare only a level measured where people stand with the limits")
	for _, c := range s.Cautions {
		r.caution(c)
	}
	return r, nil
}

// negativeValue returns the text given to --name (or -name, with "=" or as
// the next argument) when it starts with a minus sign. The units parser
// reads a negative pressure as "below vacuum", which is the wrong message
// for an amplitude.
func negativeValue(args []string, name string) (string, bool) {
	for i, a := range args {
		if a == "--" {
			break
		}
		var v string
		switch {
		case a == "--"+name || a == "-"+name:
			if i+1 >= len(args) {
				return "", false
			}
			v = args[i+1]
		case strings.HasPrefix(a, "--"+name+"="):
			v = strings.TrimPrefix(a, "--"+name+"=")
		case strings.HasPrefix(a, "-"+name+"="):
			v = strings.TrimPrefix(a, "-"+name+"=")
		default:
			continue
		}
		if strings.HasPrefix(strings.TrimSpace(v), "-") {
			return v, true
		}
	}
	return "", false
}
