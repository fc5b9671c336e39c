package linear

import (
	"math"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// GasState holds the gas properties the wave equations need at one mean
// temperature and pressure, SI units.
type GasState struct {
	Density      float64 // ρm, kg/m³
	SoundSpeed   float64 // a, m/s
	Gamma        float64 // γ = cp/cv, 1
	Cp           float64 // isobaric specific heat, J/(kg·K)
	Viscosity    float64 // μ, Pa·s
	Conductivity float64 // k, W/(m·K)
}

// Prandtl returns σ = μ cp / k.
func (g GasState) Prandtl() float64 { return g.Viscosity * g.Cp / g.Conductivity }

// Gas gives the gas state at mean temperature T (K) and mean pressure p
// (Pa). Implementations must not allocate on the success path.
type Gas interface {
	State(T, p float64) (GasState, error)
	// Name names the gas for people.
	Name() string
}

// MixtureGas evaluates a gasprops mixture as an ideal gas.
type MixtureGas struct{ Mixture gasprops.Mixture }

// State implements Gas with gasprops.Mixture.Properties (ideal gas).
func (g MixtureGas) State(T, p float64) (GasState, error) {
	pr, err := g.Mixture.Properties(units.Temperature(T), units.Pressure(p), nil)
	if err != nil {
		return GasState{}, err
	}
	return GasState{pr.Density, pr.SoundSpeed, pr.Gamma, pr.IsobaricSpecificHeat, pr.Viscosity, pr.ThermalConductivity}, nil
}

// Name implements Gas.
func (g MixtureGas) Name() string { return g.Mixture.String() }

// PowerLawGas is a simple ideal gas with constant γ and transport
// properties that follow a power law of temperature:
//
//	μ = μ0 (T/T0)^b,  k = k0 (T/T0)^b,  ρ = p M / (R T),  a = √(γ R T / M)
//
// It is the property model shared by the tests and the independent
// reference script testdata/gen_onset.py, so that the comparison tests the
// solver alone. A power law with b ≈ 0.7 is a rough fit for helium near
// room temperature and above (from memory, not checked against a table).
type PowerLawGas struct {
	Label      string
	MolarMass  float64 // kg/mol
	Gamma      float64 // 1
	T0         float64 // reference temperature, K
	Mu0        float64 // viscosity at T0, Pa·s
	K0         float64 // conductivity at T0, W/(m·K)
	Exponent   float64 // b
	TMin, TMax float64 // validity range, K; zero means 10 K and 3000 K
}

// GasConstant is the molar gas constant R, J/(mol·K) (CODATA 2018, exact).
const GasConstant = 8.314462618

// State implements Gas.
func (g PowerLawGas) State(T, p float64) (GasState, error) {
	lo, hi := g.TMin, g.TMax
	if lo == 0 {
		lo = 10
	}
	if hi == 0 {
		hi = 3000
	}
	if !(T >= lo && T <= hi) {
		return GasState{}, units.NewRangeError("temperature", T, lo, hi, "K")
	}
	rs := GasConstant / g.MolarMass
	s := math.Pow(T/g.T0, g.Exponent)
	return GasState{
		Density:      p / (rs * T),
		SoundSpeed:   math.Sqrt(g.Gamma * rs * T),
		Gamma:        g.Gamma,
		Cp:           g.Gamma * rs / (g.Gamma - 1),
		Viscosity:    g.Mu0 * s,
		Conductivity: g.K0 * s,
	}, nil
}

// Name implements Gas.
func (g PowerLawGas) Name() string {
	if g.Label != "" {
		return g.Label
	}
	return "power-law gas M = " + units.Format(g.MolarMass, units.DimMolarMass)
}
