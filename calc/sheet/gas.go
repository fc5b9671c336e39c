package sheet

import (
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// gasSheet is the working-gas calculator: the thermophysical properties of
// a gas or noble-gas mixture at one temperature and mean pressure, from
// gasprops, with a typed ± carried to first order.
//
// It is the worked example of DEVELOPERS.md: inputs with keys, a Run that
// calls the model and propagates ±, rows with keys.
var gasSheet = &Sheet{
	ID:      IDGas,
	Title:   "Working gas",
	Summary: "Density, sound speed, viscosity, conductivity and Prandtl number of a gas or noble-gas mixture at your temperature and pressure",
	Inputs: []Input{
		GasInput("gas", ""),
		TemperatureInput("temperature", "Temperature", "", "300 K"),
		MeanPressureInput("pressure", "Mean pressure", "1 atm"),
		NonIdealInput(),
	},
	About: "Ideal gas unless the real-gas correction is on (second virial: density and sound speed only; not hydrogen). " +
		"Viscosity and conductivity are low-pressure values, the same at any pressure, from published fits and reference tables " +
		"(NASA CEA; Lemmon & Jacobsen for air; Huber et al. for carbon dioxide; xenon scaled from krypton); " +
		"noble-gas mixtures by Chapman–Enskog kinetic theory. Viscosity and conductivity checked against CRC Handbook tables at 200–600 K within 2 %.",
	Examples: []string{
		"twcalc gas --gas helium --temperature 300K --pressure 10bar",
		"twcalc gas --gas helium:0.7,argon:0.3 --temperature 27degC --pressure 30barg --json",
	},
	Run: runGas,
}

// gasRows names the rows of the gas sheet in order; gasValues lists the
// values in the same order.
var gasRows = []struct {
	key, label string
	dim        units.Dimension
	show       string
}{
	{"molar_mass", "Molar mass", units.DimMolarMass, "g/mol"},
	{"density", "Density", units.DimDensity, ""},
	{"sound_speed", "Sound speed", units.DimSpeed, ""},
	{"isobaric_specific_heat", "Isobaric specific heat cp", units.DimSpecificHeat, ""},
	{"gamma", "Ratio of specific heats γ", units.DimNone, ""},
	{"viscosity", "Dynamic viscosity", units.DimDynamicViscosity, "uPa.s"},
	{"thermal_conductivity", "Thermal conductivity", units.DimThermalConductivity, "mW/(m.K)"},
	{"thermal_diffusivity", "Thermal diffusivity", units.DimDiffusivity, "mm2/s"},
	{"kinematic_viscosity", "Kinematic viscosity", units.DimKinematicViscosity, "mm2/s"},
	{"prandtl", "Prandtl number", units.DimNone, ""},
}

func gasValues(p gasprops.Properties) []float64 {
	return []float64{p.MolarMass, p.Density, p.SoundSpeed, p.IsobaricSpecificHeat, p.Gamma,
		p.Viscosity, p.ThermalConductivity, p.ThermalDiffusivity, p.KinematicViscosity, p.Prandtl}
}

// gasSubjects maps the gas model's range errors to the inputs they concern.
var gasSubjects = map[units.Subject]string{
	units.SubjectTemperature: "temperature",
	units.SubjectPressure:    "pressure",
}

func runGas(v *Values) (*Result, error) {
	mix := v.Gas("gas")
	t, p := v.Q("temperature"), v.Q("pressure")
	opts := GasOptions(v)
	props, err := mix.Properties(units.Temperature(t.Value), units.Pressure(p.Value), opts)
	if err != nil {
		return nil, v.BlameSubject(err, gasSubjects)
	}
	r := &Result{}
	if name := mix.String(); name != v.Text("gas") {
		r.DeriveWords("mixture", "Mixture", name)
	}
	vals := gasValues(props)
	sig, ok := Spread(func(x, out []float64) error {
		q, err := mix.Properties(units.Temperature(x[0]), units.Pressure(x[1]), opts)
		copy(out, gasValues(q))
		return err
	}, []float64{t.Value, p.Value}, []float64{t.Uncertainty, p.Uncertainty}, len(vals))
	for k, row := range gasRows {
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		r.AddPM(row.key, row.label, vals[k], sig[k], row.dim).Show = row.show
	}
	r.Warn(props.Warnings...)
	if lo, hi := mix.Range(); finite(lo) && finite(hi) && lo > 0 {
		r.Note("Model validated for this gas from " + units.Format(lo, units.DimTemperature) + " to " +
			units.Format(hi, units.DimTemperature) + "; just outside it the results carry a warning, further out there is no result.")
	}
	return r, nil
}
