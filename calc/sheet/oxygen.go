package sheet

import (
	"errors"
	"fmt"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// oxygenSheet is the oxygen left in a room after a release of inert gas:
// the release typed, a cylinder emptied into the room and the rig's vessel
// emptied into it are added; the oxygen by the displacement, well-mixed or
// sealed-room model is checked against 19.5 % (safety.OxygenDeficient),
// with the largest release that keeps it and the time ventilation needs
// to bring the room back.
var oxygenSheet = &Sheet{
	ID:      IDOxygen,
	Title:   "Room oxygen",
	Summary: "Oxygen left in a room after a gas release from a cylinder, the rig or both, against the oxygen-deficient threshold (safety)",
	Inputs: []Input{
		{Key: "room", Label: "Room volume", Kind: Quantity, Dim: units.DimVolume, Example: "30 m3",
			Hint: "free air volume of the room, e.g. 30 m³, 1000 ft³; ± or +- for an uncertainty", Min: 0, Max: 1e7, MinOpen: true, PM: true},
		{Key: "release", Label: "Gas released", Kind: Quantity, Dim: units.DimVolume, Optional: true,
			Hint: "volume released at room conditions, e.g. 9 m³; or give a cylinder or the rig's vessel emptied into the room (they add up); ± or +- for an uncertainty", Min: 0, Max: 1e7, PM: true},
		{Key: "release-from-cylinder", Label: "Cylinder water capacity", Kind: Quantity, Dim: units.DimVolume, Optional: true,
			Hint: "the internal volume stamped on a cylinder emptied into the room, e.g. 50 L", Min: 0, Max: 1e3, MinOpen: true},
		optional(SafetyPressureInput("fill-pressure", "Cylinder fill pressure", "", "", "as on the label or gauge, e.g. 200 bar")),
		{Key: "fill-temperature", Label: "Cylinder temperature", Kind: Quantity, Dim: units.DimTemperature, Default: "15 degC",
			Units: units.Options{DefaultUnit: "K"}, Hint: "e.g. 15 degC, 288 K"},
		{Key: "release-from-vessel", Label: "Rig vessel gas volume", Kind: Quantity, Dim: units.DimVolume, Optional: true,
			Hint: "gas volume of the rig's vessel emptied into the room, e.g. 50 L", Min: 0, Max: 1e3, MinOpen: true},
		optional(SafetyPressureInput("vessel-pressure", "Rig vessel charge pressure", "", "", "e.g. 30 barg")),
		{Key: "vessel-temperature", Label: "Rig vessel gas temperature", Kind: Quantity, Dim: units.DimTemperature, Default: "20 degC",
			Units: units.Options{DefaultUnit: "K"}, Hint: "mean gas temperature in the vessel, e.g. 20 degC", Advanced: true},
		oxygenGas(),
		{Key: "room-temperature", Label: "Room temperature", Kind: Quantity, Dim: units.DimTemperature, Default: "20 degC",
			Units: units.Options{DefaultUnit: "K"}, Hint: "e.g. 20 degC", Advanced: true},
		{Key: "model", Label: "How gas and air mix", Kind: Pick, Default: "displacement", Choices: roomModelChoices(),
			Hint: "displacement (air pushed out, worst case), mixed (well mixed, mixture flows out), sealed (nothing leaves)"},
		{Key: "ventilation", Label: "Ventilation", Kind: Quantity, Dim: units.DimRate, Default: "0 /h",
			Hint: "fresh-air changes per hour, e.g. 2 /h; 0 when unknown", Min: 0, Max: 1},
	},
	About: "Oxygen fraction 20.9 % of air diluted by the release: displacement 20.9 % (1 − V/Vroom), well mixed 20.9 % e^(−V/Vroom), " +
		"sealed room 20.9 %/(1 + V/Vroom). " + oxygenLimit + " is the oxygen-deficient threshold of US OSHA 29 CFR 1910.134. " +
		"A cylinder's release from its contents with the gas model's compressibility at the fill state (ISO 13443 reference state).",
	Examples: []string{
		"twcalc oxygen --release 9m3 --room 30m3 --model mixed --ventilation 2/h",
		"twcalc oxygen --release-from-cylinder 50L --fill-pressure 200bar --gas helium --room 30m3 --json",
		"twcalc oxygen --release-from-vessel 50L --vessel-pressure 30barg --release-from-cylinder 50L --fill-pressure 200bar --room 30m3",
	},
	Run: runOxygen,
}

func oxygenGas() Input {
	in := GasInput("gas", "helium")
	in.Label = "Which gas is released"
	// the gas of a cylinder or a release, not necessarily the rig's
	// working gas: not carried between screens
	in.Share = ShareNone
	in.Hint = "the gas in the cylinder and the vessel: helium, argon, nitrogen, a mixture such as helium:0.7,argon:0.3"
	return in
}

func roomModelChoices() []Choice {
	out := make([]Choice, len(safety.RoomModels))
	for i, m := range safety.RoomModels {
		out[i] = Choice{Key: m.Key(), Words: m.Label(), Value: m}
	}
	return out
}

// errNoRelease is the reason when no release is given.
var errNoRelease = fmt.Errorf("%w: give the gas released, a cylinder emptied into the room (release-from-cylinder with fill-pressure) or the rig's vessel (release-from-vessel with vessel-pressure)", ErrRequired)

func runOxygen(v *Values) (*Result, error) {
	cyl, ves := v.Has("release-from-cylinder"), v.Has("release-from-vessel")
	if !v.Has("release") && !cyl && !ves {
		return nil, v.Blame(errNoRelease, "release")
	}
	r := &Result{}
	mix := v.Gas("gas")
	total := v.SI("release")
	var cautions []string
	if cyl {
		rel, more, err := cylinderRows(r, v)
		if err != nil {
			return nil, err
		}
		cautions = append(cautions, more...)
		total += rel
	}
	if ves {
		rel, err := vesselRelease(r, v, !cyl)
		if err != nil {
			return nil, err
		}
		total += rel
	}
	if cyl || ves {
		for _, comp := range mix.Components() {
			if comp.Species != nil && comp.Species.Name == "air" {
				r.Warn("air holds oxygen: the oxygen figures treat the released gas as oxygen-free, so they overstate the loss")
			}
		}
	}
	model := v.Pick("model").(safety.RoomModel)
	room, vent := v.Q("room"), v.SI("ventilation")
	o, err := safety.RoomOxygen(model, total, room.Value, vent)
	if err != nil {
		var re *units.RangeError
		if errors.As(err, &re) && re.Field == "release volume" {
			key := "release"
			if !v.Has("release") {
				key = "room"
			}
			return nil, v.Blame(fmt.Errorf("a release of %s into a room of %s: %w; try the well-mixed or sealed model, or check the volumes",
				units.Format(total, units.DimVolume), units.Format(room.Value, units.DimVolume), err), key)
		}
		return nil, blameField(v, err, map[string]string{"room volume": "room", "ventilation rate": "ventilation"})
	}
	r.Add("release_volume", "Gas released in all", total, units.DimVolume)
	r.AddWords("model", "Model", model.Label())
	// ± of the oxygen figures from the room and the release typed.
	x := []float64{v.SI("release"), room.Value}
	u := []float64{v.Q("release").Uncertainty, room.Uncertainty}
	sig, ok := Spread(func(x, out []float64) error {
		q, err := safety.RoomOxygen(model, total-v.SI("release")+x[0], x[1], vent)
		out[0], out[1] = q.Fraction, q.MaxRelease
		return err
	}, x, u, 2)
	for k, key := range []string{"oxygen_fraction", "max_release"} {
		if !ok[k] {
			r.Warn(noSpreadWarning(key))
		}
	}
	r.AddPM("oxygen_fraction", "Oxygen after the release", o.Fraction, sig[0], units.DimNone).Show = "%"
	oxygenCheck(r, o)
	r.Add("threshold", "Oxygen-deficient below", safety.OxygenDeficient, units.DimNone).Show = "%"
	r.AddPM("max_release", "Largest release keeping "+oxygenLimit, o.MaxRelease, sig[1], units.DimVolume)
	r.Warn(o.Warnings...)
	if o.Ventilated {
		r.Add("recovery_time", "Back to "+oxygenLimit+" after", o.RecoveryTime, units.DimTime).Show = "min"
	} else if o.Deficient {
		r.Warn("no ventilation given: the oxygen stays low until the room is ventilated (give the ventilation to estimate the recovery time)")
	}
	for _, other := range safety.RoomModels {
		if other == model {
			continue
		}
		if oo, err := safety.RoomOxygen(other, total, room.Value, 0); err == nil {
			r.Add("oxygen_fraction_"+other.Key(), "Oxygen, "+other.Label(), oo.Fraction, units.DimNone).Show = "%"
		}
	}
	cautionOnce(r, o.Cautions...)
	cautionOnce(r, cautions...)
	cautionOnce(r, safety.GasCautions(mix)...)
	return r, nil
}

// oxygenLimit is safety.OxygenDeficient in words, "19.5 %".
var oxygenLimit = fmt.Sprintf("%.1f %%", 100*safety.OxygenDeficient)

// oxygenCheck is the check of the oxygen left against oxygenLimit.
func oxygenCheck(r *Result, o safety.Oxygen) {
	limit := oxygenLimit
	left := fmt.Sprintf("%.1f %%", 100*o.Fraction)
	words, out := "above "+limit, Pass
	why := "oxygen " + left + " after the release (" + o.Model.Label() + "), at or above the " + limit + " oxygen-deficient threshold of US OSHA 29 CFR 1910.134"
	if o.Deficient {
		words, out = "below "+limit, Fail
		why = "oxygen " + left + " after the release (" + o.Model.Label() + "), below the " + limit + " oxygen-deficient threshold of US OSHA 29 CFR 1910.134: people lose judgement without noticing; ventilate and monitor before anyone enters"
		if o.Ventilated {
			why += fmt.Sprintf("; back to %s after about %s", limit, minutes(o.RecoveryTime))
		}
	}
	row := r.AddObject("oxygen_deficient", "Oxygen against "+limit, o.Deficient, words)
	row.Outcome, row.Note = out, why
}

// cylinderRows adds the contents and release of a cylinder emptied into
// the room and returns the release (m³ at room conditions) and the
// cylinder's cautions.
func cylinderRows(r *Result, v *Values) (float64, []string, error) {
	if !v.Has("fill-pressure") {
		return 0, nil, v.Blame(fmt.Errorf("%w with a cylinder: its fill pressure, e.g. 200 bar", ErrRequired), "fill-pressure")
	}
	mix := v.Gas("gas")
	V := v.SI("release-from-cylinder")
	p, T := units.Pressure(v.SI("fill-pressure")), units.Temperature(v.SI("fill-temperature"))
	pa := units.Pressure(units.StandardAtmosphere)
	fields := map[string]string{"water capacity": "release-from-cylinder", "fill pressure (absolute)": "fill-pressure",
		"fill temperature": "fill-temperature", "gas temperature": "fill-temperature", "room temperature": "room-temperature",
		"vessel volume": "release-from-cylinder"}
	subjects := map[units.Subject]string{units.SubjectPressure: "fill-pressure", units.SubjectTemperature: "fill-temperature"}
	c, err := safety.CylinderContents(mix, V, p, T, safety.StandardISO13443)
	if err != nil {
		return 0, nil, v.BlameSubject(blameField(v, err, fields), subjects)
	}
	rel, err := safety.ReleaseVolume(V, p, T, c.Z, pa, units.Temperature(v.SI("room-temperature")))
	if err != nil {
		return 0, nil, v.BlameSubject(blameField(v, err, fields), subjects)
	}
	deriveReading(r, v, "fill-pressure")
	r.Add("cylinder_contents_ideal", "Cylinder contents, ideal gas", c.Ideal, units.DimVolume)
	r.Add("cylinder_contents", "Cylinder contents, with the real-gas correction", c.NonIdeal, units.DimVolume)
	r.AddWords("cylinder_contents_basis", "Contents as", "free gas at "+c.Standard.Name)
	r.Add("compressibility", "Compressibility Z", c.Z, units.DimNone)
	r.Add("cylinder_release", "Cylinder's release into the room", rel, units.DimVolume)
	r.Warn(c.Warnings...)
	return rel, c.Cautions, nil
}

// vesselRelease adds the release of the rig's vessel emptied into the
// room; warn says whether to pass on the gas model's warnings (not when
// the cylinder gave them already).
func vesselRelease(r *Result, v *Values, warn bool) (float64, error) {
	if !v.Has("vessel-pressure") {
		return 0, v.Blame(fmt.Errorf("%w with the rig's vessel: its charge pressure, e.g. 30 barg", ErrRequired), "vessel-pressure")
	}
	mix := v.Gas("gas")
	V := v.SI("release-from-vessel")
	p, T := units.Pressure(v.SI("vessel-pressure")), units.Temperature(v.SI("vessel-temperature"))
	pa := units.Pressure(units.StandardAtmosphere)
	if p < pa {
		return 0, v.Blame(fmt.Errorf("is %s absolute, below the atmosphere: no gas would leave the vessel", units.Format(float64(p), units.DimPressure)), "vessel-pressure")
	}
	fields := map[string]string{"water capacity": "release-from-vessel", "vessel volume": "release-from-vessel",
		"fill pressure (absolute)": "vessel-pressure", "fill temperature": "vessel-temperature", "gas temperature": "vessel-temperature",
		"room temperature": "room-temperature"}
	subjects := map[units.Subject]string{units.SubjectPressure: "vessel-pressure", units.SubjectTemperature: "vessel-temperature"}
	// CylinderContents gives the compressibility Z of the charge and
	// checks the temperature against the gas model's range.
	c, err := safety.CylinderContents(mix, V, p, T, safety.StandardISO13443)
	if err != nil {
		return 0, v.BlameSubject(blameField(v, err, fields), subjects)
	}
	rel, err := safety.ReleaseVolume(V, p, T, c.Z, pa, units.Temperature(v.SI("room-temperature")))
	if err != nil {
		return 0, v.BlameSubject(blameField(v, err, fields), subjects)
	}
	deriveReading(r, v, "vessel-pressure")
	r.Add("vessel_release", "Rig vessel's release into the room", rel, units.DimVolume)
	if warn {
		r.Warn(c.Warnings...)
	}
	return rel, nil
}

// minutes writes a time in minutes.
func minutes(s float64) string {
	if t, err := units.FormatIn(s, "min"); err == nil {
		return t
	}
	return units.Format(s, units.DimTime)
}
