package main

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// runOxygen is `twcalc oxygen`: the oxygen left in a room after a release
// of inert gas, by the displacement, well-mixed or sealed-room model, the
// largest release that keeps 19.5 %, and the time ventilation needs to
// bring the room back to 19.5 %.
func runOxygen(args []string) (*report, error) {
	fl := newFlags("oxygen")
	room := fl.quantity("room", units.DimVolume, "", "free volume of the room: 30m3, 1000ft3")
	rel := fl.quantity("release", units.DimVolume, "0m3", "volume of gas released, at room conditions: 9m3")
	cyl := fl.quantity("release-from-cylinder", units.DimVolume, "0L", "water capacity of a cylinder emptied into the room: 50L")
	fill := fl.quantity("fill-pressure", units.DimPressure, "0bar", "cylinder fill pressure: 200bar (absolute) or 200barg; required with --release-from-cylinder")
	vessel := fl.quantity("release-from-vessel", units.DimVolume, "0L", "gas volume of the rig's vessel emptied into the room: 50L")
	vpres := fl.quantity("vessel-pressure", units.DimPressure, "0bar", "charge pressure of the vessel: 30barg (gauge) or 31bar (absolute); required with --release-from-vessel")
	vtemp := fl.quantity("vessel-temperature", units.DimTemperature, "20degC", "mean gas temperature in the vessel")
	gas := fl.gas("gas", "helium", "gas in the cylinder and the vessel, for its non-ideal correction")
	ftemp := fl.quantity("fill-temperature", units.DimTemperature, "15degC", "temperature of the cylinder")
	rtemp := fl.quantity("room-temperature", units.DimTemperature, "20degC", "temperature of the room")
	model := fl.choice("model", []string{"displacement", "mixed", "sealed"}, "displacement", "how gas and air mix: displacement (air pushed out, worst case), mixed (well mixed, mixture flows out), sealed (nothing leaves)")
	vent := fl.quantity("ventilation", units.DimRate, "0/h", "fresh-air rate in air changes per hour, for the recovery time: 2/h")
	fl.describe(`Releases from --release, --release-from-cylinder and --release-from-vessel
are added. Oxygen is compared with 19.5 %, the oxygen-deficient threshold of
US OSHA 29 CFR 1910.134.

examples:
  twcalc oxygen --release 9m3 --room 30m3 --model mixed --ventilation 2/h
  twcalc oxygen --release-from-cylinder 50L --fill-pressure 200bar --gas helium --room 30m3 --json
  twcalc oxygen --release-from-vessel 50L --vessel-pressure 30barg --release-from-cylinder 50L --fill-pressure 200bar --room 30m3`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	if !fl.given("release") && !fl.given("release-from-cylinder") && !fl.given("release-from-vessel") {
		return nil, &usageError{msg: "give --release VOLUME, --release-from-cylinder VOLUME --fill-pressure PRESSURE or --release-from-vessel VOLUME --vessel-pressure PRESSURE (see \"twcalc oxygen -h\")"}
	}
	r := newReport()
	fl.echo(r)
	total := rel.Value
	var cautions []string
	if fl.given("release-from-cylinder") {
		if !fl.given("fill-pressure") {
			return nil, &usageError{msg: "--fill-pressure is required with --release-from-cylinder: the cylinder's fill pressure, e.g. 200bar"}
		}
		pa := units.Pressure(units.StandardAtmosphere)
		c, err := safety.CylinderContents(*gas, cyl.Value, units.Pressure(fill.Value), units.Temperature(ftemp.Value), safety.StandardISO13443)
		if err != nil {
			return nil, fl.blame(err, "release-from-cylinder", "fill-pressure", "fill-temperature")
		}
		v, err := safety.ReleaseVolume(cyl.Value, units.Pressure(fill.Value), units.Temperature(ftemp.Value), c.Z, pa, units.Temperature(rtemp.Value))
		if err != nil {
			return nil, fl.blame(err, "release-from-cylinder", "fill-pressure", "fill-temperature", "room-temperature")
		}
		r.add("cylinder_contents", c.NonIdeal, units.DimVolume)
		r.addValue("cylinder_contents_basis", "free gas at "+c.Standard.Name)
		r.add("cylinder_release", v, units.DimVolume)
		r.add("compressibility", c.Z, units.DimNone)
		for _, w := range c.Warnings {
			r.warn(w)
		}
		cautions = append(cautions, c.Cautions...)
		total += v
	}
	if fl.given("release-from-vessel") {
		if !fl.given("vessel-pressure") {
			return nil, &usageError{msg: "--vessel-pressure is required with --release-from-vessel: the vessel's charge pressure, e.g. 30barg"}
		}
		pa := units.Pressure(units.StandardAtmosphere)
		if vpres.Value < float64(pa) {
			return nil, badInput("vessel-pressure", fl.typed("vessel-pressure"), fmt.Errorf("is %s absolute, below the atmosphere: no gas would leave the vessel", units.Format(vpres.Value, units.DimPressure)))
		}
		if vessel.Value <= 0 {
			return nil, badInput("release-from-vessel", fl.typed("release-from-vessel"), errors.New("must be a volume above zero, e.g. 50L"))
		}
		// CylinderContents gives the compressibility Z of the charge and
		// checks the temperature against the gas model's range.
		c, err := safety.CylinderContents(*gas, vessel.Value, units.Pressure(vpres.Value), units.Temperature(vtemp.Value), safety.StandardISO13443)
		if err != nil {
			return nil, vesselBlame(fl, err)
		}
		v, err := safety.ReleaseVolume(vessel.Value, units.Pressure(vpres.Value), units.Temperature(vtemp.Value), c.Z, pa, units.Temperature(rtemp.Value))
		if err != nil {
			return nil, vesselBlame(fl, err)
		}
		r.add("vessel_release", v, units.DimVolume)
		if !fl.given("release-from-cylinder") {
			for _, w := range c.Warnings {
				r.warn(w)
			}
		}
		cautions = append(cautions, safety.GasCautions(*gas)...)
		total += v
	}
	if fl.given("release-from-cylinder") || fl.given("release-from-vessel") {
		for _, comp := range gas.Components() {
			if comp.Species.Name == "air" {
				r.warn("air holds oxygen: the oxygen figures treat the released gas as oxygen-free, so they overstate the loss")
			}
		}
	}
	m := map[string]safety.RoomModel{"displacement": safety.Displacement, "mixed": safety.WellMixed, "sealed": safety.Sealed}[*model]
	o, err := safety.RoomOxygen(m, total, room.Value, vent.Value)
	if err != nil {
		var re *units.RangeError
		if errors.As(err, &re) && re.Field == "release volume" {
			return nil, &usageError{msg: fmt.Sprintf("release of %s into a room of %s: %v; try --model mixed or sealed, or check the volumes", units.Format(total, units.DimVolume), units.Format(room.Value, units.DimVolume), err)}
		}
		return nil, fl.blame(err, "room", "ventilation")
	}
	r.add("release_volume", total, units.DimVolume)
	r.addValue("model", m.Label())
	r.add("oxygen_fraction", o.Fraction, units.DimNone)
	r.addValue("oxygen_deficient", o.Deficient)
	r.add("threshold", safety.OxygenDeficient, units.DimNone)
	r.add("max_release", o.MaxRelease, units.DimVolume)
	for _, w := range o.Warnings {
		r.warn(w)
	}
	if o.Ventilated {
		r.add("recovery_time", o.RecoveryTime, units.DimTime)
	} else if o.Deficient {
		r.warn("no ventilation given: the oxygen stays low until the room is ventilated (give --ventilation to estimate the recovery time)")
	}
	for _, other := range safety.RoomModels {
		if other == m {
			continue
		}
		if oo, err := safety.RoomOxygen(other, total, room.Value, 0); err == nil {
			r.add("oxygen_fraction_"+other.Key(), oo.Fraction, units.DimNone)
		}
	}
	seen := map[string]bool{}
	for _, c := range append(o.Cautions, cautions...) {
		if !seen[c] { // the cylinder repeats the general and asphyxiation cautions
			seen[c] = true
			r.caution(c)
		}
	}
	return r, nil
}

// vesselBlame names the --release-from-vessel flag that a range error from
// the contents and release formulas (whose fields speak of a cylinder's
// fill) belongs to.
func vesselBlame(fl *flags, err error) error {
	field, ok := rangeField(err)
	if !ok {
		return err
	}
	switch {
	case strings.Contains(field, "pressure"):
		return badInput("vessel-pressure", fl.typed("vessel-pressure"), err)
	case strings.Contains(field, "room"):
		return fl.blame(err, "room-temperature")
	case strings.Contains(field, "temperature"):
		return badInput("vessel-temperature", fl.typed("vessel-temperature"), err)
	}
	return badInput("release-from-vessel", fl.typed("release-from-vessel"), err)
}
