package units

// This file fixes the package's API: the dimensions, the typed SI quantities
// used at package borders, the parsed Quantity and the Options of Parse.

// Dimension says what kind of physical quantity a number is.
type Dimension int

// The dimensions known to the parser. Each has one SI unit used inside the
// program (see SIUnit).
const (
	DimNone                  Dimension = iota // 1 (also accepts %)
	DimLength                                 // m (mm, cm, µm, um, in, ", ft)
	DimArea                                   // m² (mm², cm², in²)
	DimVolume                                 // m³ (L, mL, cm³, ft³)
	DimTemperature                            // K, absolute (°C, degC, degF, °F)
	DimTemperatureDifference                  // K, a difference: 2 K = 2 degC = 3.6 degF
	DimPressure                               // Pa, absolute (bar, barg, psi, psig, MPa, kPa, atm, torr, mbar)
	DimStress                                 // Pa (MPa, N/mm², psi, ksi); never gauge
	DimFrequency                              // Hz (kHz)
	DimRate                                   // 1/s (per hour: "2/h", "2 per hour", "/min")
	DimTime                                   // s (ms, min, h)
	DimDensity                                // kg/m³ (g/cm³, g/L)
	DimSpeed                                  // m/s
	DimDynamicViscosity                       // Pa·s (µPa·s, cP)
	DimKinematicViscosity                     // m²/s
	DimDiffusivity                            // m²/s
	DimThermalConductivity                    // W/(m·K)
	DimSpecificHeat                           // J/(kg·K)
	DimMolarMass                              // kg/mol (g/mol)
	DimEnergy                                 // J (kJ, MJ, Wh, kWh)
	DimPower                                  // W (mW, kW)
	DimMass                                   // kg (g, mg, lb, oz)
	DimVolumeFlow                             // m³/s (L/min, m³/h)
	DimPerLength                              // 1/m (mesh counts: "200 /in", "8 per mm")
	DimPerArea                                // 1/m² (cell densities: "400 cpsi", "400 /in²")
	DimSoundLevel                             // dB re 20 µPa (dB)
	DimTemperatureGradient                    // K/m (K/cm, K/mm): a mean-temperature gradient along a stack
)

// Typed SI quantities for package borders. Inside tight loops use float64.
type (
	Length       float64 // m
	Area         float64 // m²
	Volume       float64 // m³
	Temperature  float64 // K, absolute
	Pressure     float64 // Pa, absolute unless a name says gauge
	Frequency    float64 // Hz
	Density      float64 // kg/m³
	Speed        float64 // m/s
	Viscosity    float64 // Pa·s, dynamic
	Conductivity float64 // W/(m·K)
	SpecificHeat float64 // J/(kg·K)
	Energy       float64 // J
	Power        float64 // W
	Mass         float64 // kg
	Stress       float64 // Pa
)

// StandardAtmosphere is the standard atmosphere in Pa (ISO 2533).
const StandardAtmosphere = 101325.0

// Quantity is one parsed user input: an SI value, an optional ± uncertainty
// and how it was written.
type Quantity struct {
	Value       float64   // SI value; absolute for temperature and pressure
	Uncertainty float64   // SI, as typed after "±" or "+-"; 0 when none
	Dim         Dimension // dimension of Value
	Unit        string    // the unit as recognised, canonical spelling, e.g. "bar", "degC", "in"
	Gauge       bool      // pressure was typed as gauge (barg, psig); Value is still absolute
	// Assumed marks a pressure whose unit named neither gauge nor
	// absolute and was read as gauge (Options.BareGauge); Gauge is set too.
	Assumed bool
}

// Options adjusts ParseWith.
type Options struct {
	// Atmosphere is the ambient absolute pressure in Pa added to gauge
	// pressures (barg, psig). Zero means StandardAtmosphere.
	Atmosphere float64
	// DefaultUnit is assumed when the input has no unit ("300" with
	// DefaultUnit "K"). Empty means a bare number is an error for every
	// dimension except DimNone.
	DefaultUnit string
	// AllowNegative lets a negative value through for dimensions where it
	// is otherwise absurd (length, volume, mass ...). Temperatures below
	// absolute zero and absolute pressures below zero are always errors.
	AllowNegative bool
	// BareGauge reads a pressure whose unit says neither gauge nor
	// absolute ("30 bar", "145 psi") as gauge, the way a gauge shows it;
	// "bara", "psia" and the vacuum units torr and mmHg stay absolute (see
	// gaugeread.go).
	BareGauge bool
}
