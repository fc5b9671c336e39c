package units

import "math"

// This file picks, for each dimension, the unit a person reads a value in:
// an SI prefix or a unit of the trade that keeps the number short and free
// of exponents ("243.9 µm", "1 MPa", "19.93 µPa·s", "160.5 mg/m³").

// rung is one step of a ladder: the unit (canonical name, looked up within
// the ladder's dimension) used from the SI magnitude from upward.
type rung struct {
	unit string
	from float64
}

// ladders lists, per dimension, the units Format chooses from, smallest
// first. A value takes the last rung whose from is at most its magnitude
// (after rounding to the shown digits); zero takes the SI unit. The steps
// are our own choice, made so that bench quantities read as people at the
// bench say them: tube lengths in mm below 1 m, gaps in µm or mm, gas
// densities in kg/m³ down to 10 g/m³, pressures and stresses with SI
// prefixes (BIPM SI Brochure, 9th ed. (2019), §3, for the prefixes).
// A dimension without a ladder is written in its SI unit.
var ladders = map[Dimension][]rung{
	DimLength:                {{"nm", 0}, {"um", 1e-6}, {"mm", 1e-3}, {"m", 1}, {"km", 1e4}},
	DimArea:                  {{"um2", 0}, {"mm2", 1e-6}, {"cm2", 1e-4}, {"m2", 1e-2}},
	DimVolume:                {{"mm3", 0}, {"mL", 1e-6}, {"L", 1e-3}, {"m3", 1}},
	DimTemperatureDifference: {{"mK", 0}, {"K", 0.01}},
	DimPressure:              {{"Pa", 0}, {"kPa", 1e3}, {"MPa", 1e6}, {"GPa", 1e9}},
	DimStress:                {{"Pa", 0}, {"kPa", 1e3}, {"MPa", 1e6}, {"GPa", 1e9}},
	DimFrequency:             {{"mHz", 0}, {"Hz", 0.1}, {"kHz", 1e4}, {"MHz", 1e7}},
	DimRate:                  {{"/h", 0}, {"/min", 1.0 / 60}, {"/s", 1}},
	DimTime:                  {{"us", 0}, {"ms", 1e-3}, {"s", 1}, {"min", 600}, {"h", 36000}, {"d", 864000}},
	DimDensity:               {{"mg/m3", 0}, {"g/m3", 1e-3}, {"kg/m3", 1e-2}},
	DimSpeed:                 {{"mm/s", 0}, {"m/s", 1e-2}},
	DimDynamicViscosity:      {{"uPa.s", 0}, {"mPa.s", 1e-3}, {"Pa.s", 1}},
	DimKinematicViscosity:    {{"mm2/s", 0}, {"cm2/s", 1e-4}, {"m2/s", 1e-2}},
	DimDiffusivity:           {{"mm2/s", 0}, {"cm2/s", 1e-4}, {"m2/s", 1e-2}},
	DimThermalConductivity:   {{"mW/(m.K)", 0}, {"W/(m.K)", 1e-2}},
	DimSpecificHeat:          {{"J/(kg.K)", 0}, {"kJ/(kg.K)", 1e5}},
	DimMolarMass:             {{"g/mol", 0}, {"kg/mol", 10}},
	DimEnergy:                {{"mJ", 0}, {"J", 1}, {"kJ", 1e3}, {"MJ", 1e6}, {"GJ", 1e9}},
	DimPower:                 {{"mW", 0}, {"W", 1}, {"kW", 1e3}, {"MW", 1e6}},
	DimMass:                  {{"mg", 0}, {"g", 1e-3}, {"kg", 1}, {"t", 1e3}},
	DimVolumeFlow:            {{"mL/min", 0}, {"L/min", 1e-3 / 60}, {"m3/h", 1.0 / 60}, {"m3/s", 10}},
	DimPerLength:             {{"/m", 0}, {"/mm", 1e3}},
	DimPerArea:               {{"/m2", 0}, {"/cm2", 1e4}, {"/mm2", 1e6}},
	DimTemperatureGradient:   {{"K/m", 0}, {"K/mm", 1e3}},
}

// ladderDefs holds the ladders resolved to table entries, built once.
var ladderDefs = buildLadders()

func buildLadders() map[Dimension][]*unitDef {
	out := map[Dimension][]*unitDef{}
	for d, steps := range ladders {
		for _, st := range steps {
			def := idx.find(d, st.unit)
			if def == nil {
				panic("calc: units: ladder unit " + st.unit + " is not a " + d.String() + " unit")
			}
			out[d] = append(out[d], def)
		}
	}
	return out
}

// readableUnit returns the unit of d that Format writes the SI value v in,
// or nil for d's SI unit.
func readableUnit(v float64, d Dimension) *unitDef {
	steps, defs := ladders[d], ladderDefs[d]
	if len(steps) == 0 {
		return nil
	}
	a := math.Abs(v)
	if a == 0 {
		return idx.find(d, siName(d))
	}
	k := 0
	for i, st := range steps {
		if a >= st.from {
			k = i
		}
	}
	return defs[k]
}

// siName is the canonical name of d's SI unit (the first table entry).
func siName(d Dimension) string { return idx.byDim[d][0].name }

// ReadableUnit returns the symbol of the unit Format writes the SI value v
// of dimension d in: ReadableUnit(2.439e-4, DimLength) is "µm",
// ReadableUnit(1e6, DimPressure) is "MPa". DimNone gives "" (see Format for
// the words it uses for millions).
func ReadableUnit(v float64, d Dimension) string {
	if def := readableUnit(roundSig(v, 4), d); def != nil {
		return def.symbol
	}
	return SIUnit(d)
}

// roundSig rounds v to sig significant digits.
func roundSig(v float64, sig int) float64 {
	if v == 0 || !isFinite(v) {
		return v
	}
	p := math.Pow(10, float64(sig-1-int(math.Floor(math.Log10(math.Abs(v))))))
	r := math.Round(v*p) / p
	if !isFinite(r) {
		return v
	}
	return r
}

// scaleWords name the large plain numbers Format writes in words ("45.8
// million"), short scale as in English usage today; Parse reads them back
// as dimensionless units.
var scaleWords = []struct {
	word string
	v    float64
}{{"trillion", 1e12}, {"billion", 1e9}, {"million", 1e6}}

// formatPlain writes a dimensionless v with sig significant digits and no
// exponent: plain decimals below a million ("0.00001234", "186900") and
// words from a million up ("45.8 million", "1.2 billion").
func formatPlain(v float64, sig int) string {
	r := roundSig(v, sig)
	for _, w := range scaleWords {
		if math.Abs(r) >= w.v {
			return formatNumber(r/w.v, sig) + " " + w.word
		}
	}
	return formatNumber(v, sig)
}

// formatReadable writes v (SI, dimension d) with sig significant digits in
// the readable unit of d.
func formatReadable(v float64, d Dimension, sig int) string {
	if !isFinite(v) {
		return NotANumber
	}
	if d == DimNone {
		return formatPlain(v, sig)
	}
	def := readableUnit(roundSig(v, sig), d)
	if def == nil {
		return joinUnit(formatNumber(v, sig), SIUnit(d))
	}
	return formatDef(v, def, StandardAtmosphere, sig)
}

// FormatDigits is Format with sig significant digits (1 to 17), for echoes
// that must show every digit typed: FormatDigits(101325, DimPressure, 6)
// is "101.325 kPa".
func FormatDigits(v float64, d Dimension, sig int) string {
	return formatReadable(v, d, min(max(sig, 1), 17))
}

// Number writes a plain dimensionless number with sig significant digits
// and no exponent, for numbers inside sentences: Number(4.58e7, 3) is
// "45.8 million", Number(0.000123, 2) is "0.00012".
func Number(v float64, sig int) string {
	if !isFinite(v) {
		return NotANumber
	}
	return formatPlain(v, min(max(sig, 1), 17))
}

// FormatComplex writes a dimensionless complex number with 4 significant
// digits in each part and no exponent: "0.8437 − 0.1234i" (U+2212 minus
// before a negative imaginary part). NaN or ±Inf in either part gives "—".
func FormatComplex(z complex128) string {
	re, im := real(z), imag(z)
	if !isFinite(re) || !isFinite(im) {
		return NotANumber
	}
	sign := " + "
	if im < 0 || (im == 0 && math.Signbit(im)) {
		sign = " − "
	}
	return formatPlain(re, 4) + sign + formatPlain(math.Abs(im), 4) + "i"
}

// FormatSI writes v, given in the unit whose symbol is unit, as Format
// would when unit is the SI symbol of a dimension ("Pa", "m²/s", "" for a
// plain number); any other unit is kept and the number written plainly:
// FormatSI(3e6, "Pa") is "3 MPa", FormatSI(2.5, "bar") is "2.5 bar".
func FormatSI(v float64, unit string) string {
	if d, ok := siDim(unit); ok {
		return formatReadable(v, d, 4)
	}
	return joinUnit(Number(v, 4), unit)
}

// Decimal writes v with sig significant digits (1 to 17) in plain decimal
// notation, without words or an exponent, for files that tools read:
// Decimal(101325.04, 7) is "101325", Decimal(2.5e-9, 7) is "0.0000000025".
// NaN and ±Inf give "—".
func Decimal(v float64, sig int) string {
	return formatNumber(v, min(max(sig, 1), 17))
}

// FormatPMPrefer is FormatPMIn in the preferred unit of a result row
// (the unit a screen usually shows it in, "mm²/s"), unless the number
// there would read below 0.001 or from 10000 up ("186900 mm²/s",
// "0.0001605 kg/m³"): then the readable unit of Format takes over
// ("0.1869 m²/s", "160.5 mg/m³"). Zero stays in the preferred unit.
func FormatPMPrefer(v, u float64, d Dimension, unit string) (string, error) {
	def, err := resolve(unit, d, true)
	if err != nil {
		return "", err
	}
	if !isFinite(v) {
		return NotANumber, nil
	}
	x := math.Abs(roundSig(toUnit(v, def, StandardAtmosphere), 4))
	if x == 0 || (x >= 1e-3 && x < 1e4) || def.offset != 0 || def.gauge {
		return FormatPMIn(v, u, d, unit)
	}
	return FormatPM(v, u, d), nil
}
