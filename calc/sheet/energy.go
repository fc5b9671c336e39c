package sheet

import (
	"fmt"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// energySheet is the stored energy of a gas charge: the work of its
// isentropic expansion to the ambient pressure, the larger Brode value,
// their TNT equivalents and a hazard tier, from calc/safety with γ from
// gasprops; and, where a gas test pressure is given, the energy a gas test
// at that pressure would store.
var energySheet = &Sheet{
	ID:      IDEnergy,
	Title:   "Stored energy",
	Summary: "Stored energy of a gas charge, its TNT equivalent and hazard tier, and the energy of a gas test (safety)",
	Inputs: []Input{
		GasInput("gas", ""),
		withPM(SafetyPressureInput("pressure", "Charge pressure", "", "30 barg", "the pressure the vessel is filled to, e.g. its MAWP")),
		{Key: "volume", Label: "Gas volume of the rig", Kind: Quantity, Dim: units.DimVolume, Example: "5 L",
			Hint: "e.g. 5 L, 0.005 m³, 300 in³; ± or +- for an uncertainty", Min: 0, Max: 1e6, MinOpen: true, PM: true},
		{Key: "temperature", Label: "Gas temperature", Kind: Quantity, Dim: units.DimTemperature, Default: "20 degC",
			Units: units.Options{DefaultUnit: "K"}, Hint: "e.g. 20 degC, 293 K", Advanced: true},
		{Key: "ambient", Label: "Ambient pressure (absolute)", Kind: Quantity, Dim: units.DimPressure, Default: "1 atm",
			Hint: "absolute pressure the gas would expand to, e.g. 1 atm, 1013 mbar", Min: 0, Max: 1e7, MinOpen: true, Advanced: true},
		optional(SafetyPressureInput("test-pressure", "Gas test pressure", "", "", "a pneumatic test pressure, to see what a gas test would store")),
	},
	About: "The isentropic value is the work of reversible adiabatic expansion to the ambient pressure, " +
		"p V/(γ − 1) (1 − (pa/p)^((γ−1)/γ)); the Brode value (p − pa) V/(γ − 1) is larger. " +
		"γ from the gas model at the charge state; TNT equivalent at 4.184 MJ per kg of TNT.",
	Examples: []string{
		"twcalc energy --gas helium --pressure 30barg --volume 50L",
		"twcalc energy --gas argon --pressure 10bara --volume 2L --temperature 400degC --json",
	},
	Run: runEnergy,
}

// energyRows are the number rows of the energy sheet, in the order of
// energyValues.
var energyRows = []struct {
	key, label string
	dim        units.Dimension
	show       string
}{
	{"stored_energy", "Stored energy (isentropic)", units.DimEnergy, "kJ"},
	{"brode_energy", "Brode (isochoric) value", units.DimEnergy, "kJ"},
	{"tnt_equivalent", "TNT equivalent (4.184 MJ/kg)", units.DimMass, ""},
	{"tnt_equivalent_brode", "TNT equivalent of the Brode value", units.DimMass, ""},
}

func energyValues(e safety.StoredEnergy) []float64 {
	return []float64{e.Isentropic, e.Brode, e.TNTMass, e.TNTBrode}
}

// energyFields maps calc/safety's and the gas model's range errors to the
// inputs.
var energyFields = map[string]string{
	"pressure (absolute)": "pressure",
	"volume":              "volume",
	"ambient pressure":    "ambient",
}

func runEnergy(v *Values) (*Result, error) {
	mix := v.Gas("gas")
	p, V, T, pa := v.Q("pressure"), v.Q("volume"), v.Q("temperature"), v.SI("ambient")
	if p.Value <= pa {
		return nil, v.Blame(fmt.Errorf("is not above the ambient %s absolute: no energy is stored", units.Format(pa, units.DimPressure)), "pressure")
	}
	e, warns, err := safety.GasExpansionEnergy(mix, units.Temperature(T.Value), units.Pressure(p.Value), units.Pressure(pa), V.Value)
	if err != nil {
		return nil, energyBlame(v, err, "pressure")
	}
	r := &Result{}
	deriveReading(r, v, "pressure")
	r.Derive("pressure_absolute", "Charge pressure (absolute)", p.Value, units.DimPressure)
	vals := energyValues(e)
	sig, ok := Spread(func(x, out []float64) error {
		q, _, err := safety.GasExpansionEnergy(mix, units.Temperature(x[2]), units.Pressure(x[0]), units.Pressure(pa), x[1])
		copy(out, energyValues(q))
		return err
	}, []float64{p.Value, V.Value, T.Value}, []float64{p.Uncertainty, V.Uncertainty, T.Uncertainty}, len(vals))
	for k, row := range energyRows {
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		r.AddPM(row.key, row.label, vals[k], sig[k], row.dim).Show = row.show
	}
	r.AddWords("tnt_convention", "TNT convention", "4.184 MJ per kg of TNT")
	r.Add("gamma", "Ratio of specific heats γ", e.Gamma, units.DimNone)
	r.AddWords("hazard_tier", "Hazard tier", e.Tier.Label()).Note = e.Tier.Advice()
	r.AddWords("hazard_advice", "What to do", e.Tier.Advice())
	r.Warn(warns...)
	cautionOnce(r, e.Cautions...)
	if v.Has("test-pressure") {
		tp := v.Q("test-pressure")
		if tp.Value <= pa {
			return nil, v.Blame(fmt.Errorf("is not above the ambient %s absolute", units.Format(pa, units.DimPressure)), "test-pressure")
		}
		g, _, err := safety.GasExpansionEnergy(mix, units.Temperature(T.Value), units.Pressure(tp.Value), units.Pressure(pa), V.Value)
		if err != nil {
			return nil, energyBlame(v, err, "test-pressure")
		}
		deriveReading(r, v, "test-pressure")
		row := r.Add("gas_test_energy", "Stored in a gas test at "+barg(safety.GaugeOf(tp, 0)), g.Isentropic, units.DimEnergy)
		row.Show, row.Note = "kJ", "a liquid-filled test stores only the liquid's small compression energy"
	}
	return r, nil
}

// energyBlame names the input of a range error from the energy formulas
// or the gas model; pressure is the pressure input the call used.
func energyBlame(v *Values, err error, pressure string) error {
	fields := map[string]string{}
	for k, key := range energyFields {
		fields[k] = key
	}
	fields["pressure (absolute)"] = pressure
	err = blameField(v, err, fields)
	return v.BlameSubject(err, map[units.Subject]string{units.SubjectTemperature: "temperature", units.SubjectPressure: pressure})
}
