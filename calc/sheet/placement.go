package sheet

import (
	"strings"

	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// placementSheet is the stack-placement calculator: where a short stack
// sits in a plane standing wave and what that means (kx, the heat-flux and
// viscous-loss factors, the critical temperature gradient and difference,
// the gas displacement for a drive ratio and the heat exchanger length),
// with advice for an engine or a heat pump. A typed ± on the operating
// point, the centre, the length or the drive ratio is carried to every
// number.
var placementSheet = &Sheet{
	ID:      IDPlacement,
	Title:   "Stack placement",
	Summary: "Where a short stack sits in the standing wave: heat-flux and loss factors, critical temperature difference, gas displacement and exchanger length",
	Inputs: append([]Input{
		{Key: "device", Label: "Device", Kind: Pick, Default: "engine",
			Hint: "what the stack is for, for the position advice (heat-pump includes refrigerators)",
			Choices: []Choice{
				{Key: "engine", Words: "Engine", Value: pore.Engine},
				{Key: "heat-pump", Words: "Heat pump or refrigerator", Value: pore.HeatPump},
			}},
		{Key: "centre", Label: "Stack centre, from the closed end (pressure antinode)", Kind: Quantity, Dim: units.DimLength,
			Example: "0.3 m", PM: true, Min: 0, MinOpen: true, Max: placementMaxLength,
			Hint: "m, cm, mm or in, from the closed end or other pressure antinode; ± or +- for an uncertainty"},
		{Key: "stack-length", Label: "Stack length", Kind: Quantity, Dim: units.DimLength, Optional: true,
			Example: "80 mm", PM: true, Max: placementMaxLength,
			Hint: "mm, cm, in or m; leave empty or 0 for a point estimate"},
		{Key: "drive-ratio", Label: "Drive ratio |p1|/pm at the pressure antinode", Kind: Quantity, Dim: units.DimNone,
			Optional: true, Example: "3 %", PM: true, Min: 0, Max: 1, MaxOpen: true,
			Hint: "0 to 1 or a percentage (2 %); leave empty or 0 if unknown"},
	}, poreOperatingInputs()...),
	About: "Short-stack standing-wave estimates (Swift, JASA 84, 1145, 1988); the rules used and their sources are listed with the results. " +
		"For a full onset calculation use the engine onset solver.",
	Examples: []string{
		"twcalc placement --gas air --temperature 300K --frequency 500Hz --centre 25mm --stack-length 20mm --drive-ratio 2%",
		"twcalc placement --gas helium --temperature 300K --pressure 10bar --frequency 100Hz --centre 0.3m --stack-length 80mm --json",
	},
	Run: runPlacement,
}

// placementMaxLength bounds the centre and the length of a stack (m): far
// beyond any bench device, close enough to catch a slipped unit.
const placementMaxLength = 1000

// placementRows are the numeric rows of the placement sheet in order, with
// the value each takes from a pore.Placement; when says when a row applies
// (a length or a drive ratio given).
var placementRows = []struct {
	key, label string
	dim        units.Dimension
	show, note string
	value      func(pl *pore.Placement) float64
	when       func(length, drive float64) bool
}{
	{"wavelength", "Wavelength λ", units.DimLength, "", "", func(pl *pore.Placement) float64 { return pl.Wavelength }, nil},
	{"wavenumber", "Wavenumber k", units.DimPerLength, "", "", func(pl *pore.Placement) float64 { return pl.K }, nil},
	{"kx", "kx of the stack centre", units.DimNone, "", "π/4 = 0.785 is λ/8 from the closed end",
		func(pl *pore.Placement) float64 { return pl.KX }, nil},
	{"k_stack_length", "Stack length kΔx", units.DimNone, "", "", func(pl *pore.Placement) float64 { return pl.KLength }, nil},
	{"lambda_eighth", "λ/8 from the closed end", units.DimLength, "", "", func(pl *pore.Placement) float64 { return pl.LambdaEighth }, nil},
	{"heat_flux_factor", "Heat-flux factor |sin 2kx|", units.DimNone, "",
		"1 at λ/8: the most heat pumped per unit drive in short-stack theory",
		func(pl *pore.Placement) float64 { return pl.HeatFluxFactor }, nil},
	{"viscous_loss_factor", "Viscous-loss factor sin² kx", units.DimNone, "", "",
		func(pl *pore.Placement) float64 { return pl.ViscousFactor }, nil},
	{"critical_gradient", "Critical temperature gradient", units.DimTemperatureGradient, "", "",
		func(pl *pore.Placement) float64 { return pl.CriticalGradient }, nil},
	{"critical_temperature_difference", "Critical temperature difference across the stack", units.DimTemperatureDifference, "",
		"an engine needs more than this across its stack to start; a heat pump held below it pumps heat",
		func(pl *pore.Placement) float64 { return pl.CriticalDifference }, func(l, _ float64) bool { return l > 0 }},
	{"displacement_amplitude", "Gas displacement amplitude ξ", units.DimLength, "mm", "",
		func(pl *pore.Placement) float64 { return pl.Displacement }, func(_, d float64) bool { return d > 0 }},
	{"exchanger_length", "Heat exchanger length ≈ 2ξ", units.DimLength, "mm",
		"peak-to-peak displacement: common practice, no published source",
		func(pl *pore.Placement) float64 { return pl.ExchangerLength }, func(_, d float64) bool { return d > 0 }},
}

// placeAt places the stack for temperature x[0] (K), pressure x[1] (Pa),
// frequency x[2] (Hz), centre x[3] (m), length x[4] (m) and drive ratio
// x[5].
func placeAt(op *operatingPoint, x []float64) (pore.Placement, error) {
	props, err := op.mix.Properties(units.Temperature(x[0]), units.Pressure(x[1]), op.opts)
	if err != nil {
		return pore.Placement{}, err
	}
	return pore.PlaceStack(pore.PlacementInput{
		SoundSpeed: props.SoundSpeed, Density: props.Density, Gamma: props.Gamma,
		MeanTemperature: x[0], MeanPressure: x[1], Frequency: x[2],
		Centre: x[3], Length: x[4], DriveRatio: x[5],
	})
}

func runPlacement(v *Values) (*Result, error) {
	op, err := readOperatingPoint(v)
	if err != nil {
		return nil, err
	}
	centre, length, drive := v.Q("centre"), v.Q("stack-length"), v.Q("drive-ratio")
	x := append(op.x(), centre.Value, length.Value, drive.Value)
	u := append(op.u(), centre.Uncertainty, length.Uncertainty, drive.Uncertainty)
	pl, err := placeAt(op, x)
	if err != nil {
		// the operating point, the length and the drive ratio are checked
		// above and by their ranges: what is left is the centre (at a
		// node of cot kx)
		return nil, v.Blame(err, "centre")
	}
	sig, ok := Spread(func(x, out []float64) error {
		q, err := placeAt(op, x)
		for k, row := range placementRows {
			out[k] = row.value(&q)
		}
		return err
	}, x, u, len(placementRows))
	r := &Result{}
	for k, row := range placementRows {
		if row.when != nil && !row.when(length.Value, drive.Value) {
			continue
		}
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		added := r.AddPM(row.key, row.label, row.value(&pl), sig[k], row.dim)
		added.Show, added.Note = row.show, row.note
	}
	r.AddWords("position_advice", "Position advice", pore.PositionAdvice(v.Pick("device").(pore.Device), pl))
	r.AddObject("rules", "Rules used", pl.Rules, strings.Join(pl.Rules, "; "))
	r.Warn(pl.Warnings...)
	r.Warn(op.Props.Warnings...)
	r.Caution(pl.Cautions...)
	return r, nil
}
