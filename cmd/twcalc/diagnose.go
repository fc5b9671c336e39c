package main

import (
	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// runDiagnose is `twcalc diagnose`: from a measured resonance frequency and
// the tube's geometry, the mean gas temperature (--find temperature) or
// the mole fraction of a second gas in the first (--find fraction), with
// the ± of every input carried to the answer.
func runDiagnose(args []string) (*report, error) {
	fl := newFlags("diagnose")
	gas := fl.gas("gas", "", "working gas: helium, air, helium:0.9,argon:0.1 (for --find fraction the first, pure gas)")
	pres := fl.quantity("pressure", units.DimPressure, "1atm", "mean pressure, absolute (10bar) or gauge (30barg)")
	tf := addTubeFlags(fl, "")
	meas := fl.quantity("measured-frequency", units.DimFrequency, "", "measured resonance frequency, with its ±: 140Hz+-2Hz")
	find := fl.choice("find", []string{"temperature", "fraction"}, "temperature", "what to infer: the mean gas temperature, or the mole fraction of --second-gas")
	second := fl.str("second-gas", "", "second gas of the mixture for --find fraction: argon")
	temp := fl.quantity("temperature", units.DimTemperature, "20degC", "known gas temperature for --find fraction: 300K, 20degC+-1K")
	fl.describe(`examples:
  twcalc diagnose --gas helium --pressure 1bar --ends closed-closed --length 1m --radius 20mm --end-correction none --measured-frequency 510Hz
  twcalc diagnose --gas helium --second-gas argon --find fraction --temperature 300K --ends closed-open --length 0.5m --radius 10mm --measured-frequency 480Hz+-2Hz --json`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	tube, err := tf.tube(fl)
	if err != nil {
		return nil, err
	}
	s := resonator.Setup{Tube: tube, Gas: *gas, Temperature: temp.Value, Pressure: pres.Value,
		U: resonator.Uncertainty{Length: tf.length.Uncertainty, Radius: tf.radius.Uncertainty, Temperature: temp.Uncertainty,
			Pressure: pres.Uncertainty, Frequency: meas.Uncertainty}}
	r := newReport()
	recordInputs(fl, r, "gas")
	var e resonator.Estimate
	if *find == "fraction" {
		first, sec, err := binaryPair(*gas, *second)
		if err != nil {
			return nil, err
		}
		e, err = s.DiagnoseFraction(first, sec, meas.Value)
		if err != nil {
			return nil, fl.blame(err, "measured-frequency", "length", "radius", "temperature", "pressure", "mode")
		}
		r.input("second-gas", sec.Name)
		recordInputs(fl, r, "temperature")
	} else {
		e, err = s.DiagnoseTemperature(meas.Value)
		if err != nil {
			return nil, fl.blame(err, "measured-frequency", "length", "radius", "pressure", "mode")
		}
	}
	recordInputs(fl, r, "pressure", "ends", "end-correction", "mode", "length", "radius", "measured-frequency", "find")
	if *find == "fraction" {
		r.addPM("mole_fraction", e.Value, e.Sigma, units.DimNone)
	} else {
		r.addPM("temperature", e.Value, e.Sigma, units.DimTemperature)
	}
	for _, w := range e.Warnings {
		r.warn(w)
	}
	return r, nil
}
