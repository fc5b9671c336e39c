package gasprops

import (
	"errors"
	"math"

	"tubewright/calc/units"
)

// This file holds the package's exported types and entry points.

// MaxComponents is the largest number of species in one Mixture.
const MaxComponents = 5

// Species is one pure gas with its model parameters.
type Species struct {
	Name      string  // lower-case English name used on the command line: "helium"
	Symbol    string  // chemical symbol: "He"
	MolarMass float64 // kg/mol
	m         model   // model parameters, see species.go
}

// Noble reports whether the species is a noble gas (helium to xenon); only
// noble gases may be mixed.
func (s *Species) Noble() bool { return s.m.noble }

// Range returns the temperature range (K) over which the species' models
// are validated.
func (s *Species) Range() (tmin, tmax float64) { return s.m.tmin, s.m.tmax }

// Component is one species in a mixture with its mole fraction.
type Component struct {
	Species *Species
	X       float64 // mole fraction, 0..1
}

// Mixture is a pure gas (one component) or a mixture of up to MaxComponents
// noble-gas species by mole fraction. It is a value type and never
// allocates when evaluated in range. The zero Mixture is invalid.
type Mixture struct {
	comps [MaxComponents]Component
	n     int
}

// Options adjusts Properties. A nil *Options means ideal gas.
type Options struct {
	// NonIdeal applies the second-virial correction to density and sound
	// speed (see SecondVirial). Gases without a coefficient stay ideal.
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

// MinPressure is the lowest absolute pressure Properties accepts, in Pa.
// Far below it the gas is no longer a continuum at the scale of any
// thermoacoustic channel, and the formulas lose meaning.
const MinPressure = 1.0

// ErrEmptyMixture is returned when a zero Mixture is evaluated.
var ErrEmptyMixture = errors.New("gasprops: no gas chosen")

// Names lists the species names accepted by Lookup, in a stable order:
// helium, neon, argon, krypton, xenon, hydrogen, nitrogen, air, carbon
// dioxide.
func Names() []string {
	out := make([]string, len(table))
	for i, s := range table {
		out[i] = s.Name
	}
	return out
}

// Pure returns the mixture made of one species. It panics on a nil species
// (programmer error).
func Pure(s *Species) Mixture {
	if s == nil {
		panic("gasprops: Pure of nil species")
	}
	var m Mixture
	m.comps[0] = Component{Species: s, X: 1}
	m.n = 1
	return m
}

// Binary returns a two-species mixture of noble gases with mole fraction
// x2 of the second. x2 = 0 and x2 = 1 give the pure gases exactly. x2
// outside 0..1, the same species twice, or a species that is not a noble
// gas are errors.
func Binary(first, second *Species, x2 float64) (Mixture, error) {
	if first == nil || second == nil {
		panic("gasprops: Binary of nil species")
	}
	if !(x2 >= 0 && x2 <= 1) {
		return Mixture{}, units.NewRangeError("mole fraction of "+second.Name, x2, 0, 1, "").Of(units.SubjectComposition)
	}
	switch x2 {
	case 0:
		return Pure(first), nil
	case 1:
		return Pure(second), nil
	}
	if first == second {
		return Mixture{}, errors.New("gasprops: " + first.Name + " is given twice; a mixture needs two different gases")
	}
	for _, s := range [2]*Species{first, second} {
		if !s.m.noble {
			return Mixture{}, errNotNoble(s)
		}
	}
	var m Mixture
	m.comps[0] = Component{first, 1 - x2}
	m.comps[1] = Component{second, x2}
	m.n = 2
	return m, nil
}

// Components returns the species and mole fractions.
func (m Mixture) Components() []Component { return m.comps[:m.n] }

// Range returns the temperature range (K) over which every component's
// model is validated: the intersection of the components' ranges.
func (m Mixture) Range() (tmin, tmax float64) {
	if m.n == 0 {
		return 0, 0
	}
	tmin, tmax, _ = m.limits(0)
	return tmin, tmax
}

// Properties evaluates the gas at temperature T and absolute pressure p.
//
// Ideal gas (o == nil or !o.NonIdeal): ρ = pM/(RT), c = √(γRT/M),
// cp from the species' ideal-gas heat capacities averaged by mole fraction,
// γ = cp/(cp − R) on a molar basis. Transport properties are the
// dilute-gas (low-density) values of each species' model, and for
// mixtures the first Chapman–Enskog approximation (see mixTransport); they
// do not depend on pressure. Derived: α = λ/(ρ cp), ν = η/ρ, Pr = η cp/λ.
//
// With o.NonIdeal and a known B(T): ρ = pM/(ZRT) with Z = 1 + Bp/(RT),
// and c² = (γRT/M)(1 + β_a p/(RT)) with the acoustic virial β_a
// (acousticVirial); cp, γ and transport stay ideal.
//
// Errors (*units.RangeError): pressure below MinPressure or not finite,
// at or above the vapour pressure of a component (its partial pressure,
// see checkCondensation), or with o.NonIdeal so high that |Bp/(RT)| >
// 0.25; temperature not finite, or more than 20 % outside Range. Within 20 % outside Range the result is
// returned with a sentence in Warnings; so it is when |Bp/(RT)| > 2 %
// (the ideal-gas density is that far off, or the virial correction is
// becoming a rough estimate).
func (m Mixture) Properties(T units.Temperature, p units.Pressure, o *Options) (Properties, error) {
	t, pa := float64(T), float64(p)
	if m.n == 0 {
		return Properties{}, ErrEmptyMixture
	}
	if !(pa >= MinPressure) || math.IsInf(pa, 1) {
		return Properties{}, units.NewRangeError("pressure", pa, MinPressure, math.Inf(1), "Pa").Of(units.SubjectPressure)
	}
	warn, err := m.checkTemperature(t)
	if err != nil {
		return Properties{}, err
	}
	nonIdeal := o != nil && o.NonIdeal
	if warn, err = m.checkPressure(t, pa, nonIdeal, warn); err != nil {
		return Properties{}, err
	}
	if warn, err = m.checkCondensation(t, pa, warn); err != nil {
		return Properties{}, err
	}
	var mm, cpm float64
	for _, c := range m.comps[:m.n] {
		mm += c.X * c.Species.MolarMass
		cpm += c.X * c.Species.molarCp(t)
	}
	gamma := cpm / (cpm - R)
	cp := cpm / mm
	eta, lam := m.mixTransport(t)
	rho := pa * mm / (R * t)
	c2 := gamma * R * t / mm
	if nonIdeal {
		if b, d1, d2, ok := m.virialB(t); ok {
			rho /= 1 + b*pa/(R*t)
			c2 *= 1 + acousticVirial(t, gamma, b, d1, d2)*pa/(R*t)
		}
	}
	pr := Properties{
		MolarMass:            mm,
		Density:              rho,
		IsobaricSpecificHeat: cp,
		Gamma:                gamma,
		SoundSpeed:           math.Sqrt(c2),
		Viscosity:            eta,
		ThermalConductivity:  lam,
		ThermalDiffusivity:   lam / (rho * cp),
		KinematicViscosity:   eta / rho,
		Prandtl:              eta * cp / lam,
		Warnings:             warn,
	}
	if !finite(pr) {
		// not reached for valid states; kept so that NaN or Inf never
		// leaves the package
		e := units.NewRangeError("pressure", pa, MinPressure, math.Inf(1), "Pa").Of(units.SubjectPressure)
		e.Why = "the " + m.String() + " properties overflow at this state"
		return Properties{}, e
	}
	return pr, nil
}

// finite reports whether every numeric field is finite and positive.
func finite(p Properties) bool {
	for _, v := range [...]float64{p.MolarMass, p.Density, p.IsobaricSpecificHeat, p.Gamma, p.SoundSpeed,
		p.Viscosity, p.ThermalConductivity, p.ThermalDiffusivity, p.KinematicViscosity, p.Prandtl} {
		if !(v > 0) || math.IsInf(v, 1) {
			return false
		}
	}
	return true
}
