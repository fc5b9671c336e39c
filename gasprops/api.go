package gasprops

import "tubewright/calc/units"

// This file fixes the package's API so that other packages can be written
// against it. TEMPORARY scaffold: the bodies are replaced by the real models.

// MaxComponents is the largest number of species in one Mixture.
const MaxComponents = 5

// Species is one pure gas with its model parameters.
type Species struct {
	Name      string  // lower-case English name used on the command line: "helium"
	Symbol    string  // chemical symbol: "He"
	MolarMass float64 // kg/mol
	// model parameters are unexported
}

// Component is one species in a mixture with its mole fraction.
type Component struct {
	Species *Species
	X       float64 // mole fraction, 0..1
}

// Mixture is a pure gas (one component) or a mixture of up to MaxComponents
// species by mole fraction. It is a value type and never allocates when
// evaluated.
type Mixture struct {
	comps [MaxComponents]Component
	n     int
}

// Options adjusts Properties. A nil *Options means ideal gas.
type Options struct {
	// NonIdeal applies the second-virial correction to density and sound
	// speed.
	NonIdeal bool
}

// Properties are the thermophysical properties of a gas at one state, SI units.
type Properties struct {
	MolarMass            float64  // kg/mol
	Density              float64  // kg/m³
	IsobaricSpecificHeat float64  // J/(kg·K)
	Gamma                float64  // cp/cv, 1
	SoundSpeed           float64  // m/s
	Viscosity            float64  // Pa·s, dynamic
	ThermalConductivity  float64  // W/(m·K)
	ThermalDiffusivity   float64  // m²/s
	KinematicViscosity   float64  // m²/s
	Prandtl              float64  // 1
	Warnings             []string // non-nil only when the state is outside a model's validated range
}

// Names lists the species names accepted by Lookup, in a stable order.
func Names() []string { panic("gasprops: scaffold") }

// Lookup finds a species by name or symbol, case-insensitive ("helium", "He").
func Lookup(name string) (*Species, error) { panic("gasprops: scaffold") }

// Pure returns the mixture made of one species.
func Pure(s *Species) Mixture { panic("gasprops: scaffold") }

// Binary returns a two-species mixture with mole fraction x2 of the second.
// x2 = 0 and x2 = 1 give the pure gases exactly.
func Binary(first, second *Species, x2 float64) (Mixture, error) { panic("gasprops: scaffold") }

// ParseMixture reads "helium", "He" or "helium:0.7,argon:0.3" (fractions
// normalised; a sum off 1 by more than 1 % is an error).
func ParseMixture(s string) (Mixture, error) { panic("gasprops: scaffold") }

// Components returns the species and mole fractions.
func (m Mixture) Components() []Component { return m.comps[:m.n] }

// String names the mixture for people: "helium" or "helium 70 % + argon 30 %".
func (m Mixture) String() string { panic("gasprops: scaffold") }

// Range returns the temperature range (K) over which every component's
// model is validated.
func (m Mixture) Range() (tmin, tmax float64) { panic("gasprops: scaffold") }

// Properties evaluates the gas at temperature T and absolute pressure p.
func (m Mixture) Properties(T units.Temperature, p units.Pressure, o *Options) (Properties, error) {
	panic("gasprops: scaffold")
}
