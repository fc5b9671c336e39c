package safety

import (
	"fmt"
	"math"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// TNTSpecificEnergy is the energy equivalent of TNT used for the TNT
// equivalent mass, J/kg: the conventional value 4.184 MJ/kg (one
// kilocalorie per gram), the convention that defines the "ton of TNT" as
// 4.184 × 10⁹ J (listed as such in B. N. Taylor and A. Thompson, NIST
// Special Publication 811, 2008, Appendix B.8: from memory, the listing
// not seen here). ASME PCC-2-2008, Article 5.1, Mandatory Appendix II,
// eq. (II-3), divides by 4 266 920 J/kg instead, so its TNT mass for the
// same energy is 1.9 % smaller; results here state the constant used.
const TNTSpecificEnergy = 4.184e6

// StoredEnergy is the energy a gas charge could release if its vessel
// failed, with its TNT equivalent and a hazard tier.
type StoredEnergy struct {
	Gamma      float64 // ratio of specific heats used, 1
	Isentropic float64 // isentropic expansion energy to the ambient pressure, J
	Brode      float64 // isochoric (Brode) energy, J; the larger of the two
	TNTMass    float64 // Isentropic / TNTSpecificEnergy, kg
	TNTBrode   float64 // Brode / TNTSpecificEnergy, kg
	Tier       Tier    // of the isentropic energy
	Cautions   []string
}

// ExpansionEnergy returns the energy stored in gas at absolute pressure p
// (Pa) in volume V (m³) expanding to the ambient absolute pressure pa (Pa),
// for a ratio of specific heats gamma:
//
//	isentropic:  E = p V/(γ−1) · [1 − (pa/p)^((γ−1)/γ)]
//	Brode:       E = (p − pa) V/(γ−1)
//
// The isentropic value is the work the gas can do expanding adiabatically
// and reversibly to pa: D. A. Crowl, Understanding Explosions, AIChE/CCPS,
// 2003, Appendix B, eq. (B-2); the same form is ASME PCC-2-2008, Article
// 5.1, Mandatory Appendix II, eq. (II-1), for pneumatic test energy. Brode's
// value is the energy to raise the pressure of the gas at constant volume
// from pa to p, Crowl eq. (B-1), after H. L. Brode, "Blast wave from a
// spherical charge", Physics of Fluids 2, 217, 1959; it is always larger.
// Both assume an ideal gas.
//
// Errors: p ≤ pa (nothing stored), V ≤ 0, gamma ≤ 1 (*units.RangeError).
func ExpansionEnergy(p, pa units.Pressure, V, gamma float64) (StoredEnergy, error) {
	if err := positive("ambient pressure", float64(pa), "Pa"); err != nil {
		return StoredEnergy{}, err
	}
	if !finite(float64(p)) || p <= pa {
		e := units.NewRangeError("pressure (absolute)", float64(p), float64(pa), math.Inf(1), "Pa")
		e.Why = "the ambient pressure: no energy is stored at or below it"
		return StoredEnergy{}, e
	}
	if err := positive("volume", V, "m³"); err != nil {
		return StoredEnergy{}, err
	}
	if !finite(gamma) || gamma <= 1 || gamma > 2 {
		return StoredEnergy{}, units.NewRangeError("ratio of specific heats", gamma, 1, 2, "")
	}
	P, Pa := float64(p), float64(pa)
	k := (gamma - 1) / gamma
	// 1 − (pa/p)^k written with expm1 to keep digits at small overpressure.
	frac := -math.Expm1(k * math.Log(Pa/P))
	s := StoredEnergy{
		Gamma:      gamma,
		Isentropic: P * V / (gamma - 1) * frac,
		Brode:      (P - Pa) * V / (gamma - 1),
		Cautions:   cautions(CautionStoredEnergy),
	}
	s.TNTMass = s.Isentropic / TNTSpecificEnergy
	s.TNTBrode = s.Brode / TNTSpecificEnergy
	s.Tier = TierOf(s.Isentropic)
	return s, nil
}

// GasExpansionEnergy is ExpansionEnergy with γ of the gas m at temperature
// T and absolute pressure p from gasprops (ideal-gas γ; for the noble gases
// 5/3). The returned warnings hold the gas model's and, when the gas
// departs from the ideal gas by more than 2 % (Z from
// gasprops.Mixture.Compressibility), a note that the formulas assume an
// ideal gas. The cautions include GasCautions(m) (hydrogen burns; carbon
// dioxide is toxic). Gas-model errors (temperature out of range) are
// returned unchanged.
func GasExpansionEnergy(m gasprops.Mixture, T units.Temperature, p, pa units.Pressure, V float64) (StoredEnergy, []string, error) {
	if !finite(float64(p)) || p <= 0 {
		return StoredEnergy{}, nil, units.NewRangeError("pressure (absolute)", float64(p), 0, math.Inf(1), "Pa")
	}
	props, err := m.Properties(T, p, &gasprops.Options{NonIdeal: true})
	if err != nil {
		return StoredEnergy{}, nil, err
	}
	warns := props.Warnings
	if z := m.Compressibility(float64(T), float64(p)); math.Abs(z-1) > 0.02 {
		warns = append(warns, fmt.Sprintf("the energy formulas assume an ideal gas (here Z = %.3f)", z))
	}
	s, err := ExpansionEnergy(p, pa, V, props.Gamma)
	if err == nil {
		s.Cautions = append(s.Cautions, GasCautions(m)...)
	}
	return s, warns, err
}

// Tier is a rough hazard tier of a stored energy, in our own words, for
// orientation only. The thresholds are ours, at factors of 100 in energy
// (no code or standard sets them): below 1 kJ, 1 kJ to 100 kJ, 100 kJ to
// 10 MJ, and above. For scale, 1 kJ is about a quarter of a gram of TNT and
// 100 kJ about 24 g.
type Tier int

// The tiers, from the smallest energy up.
const (
	TierLow Tier = iota
	TierSerious
	TierSevere
	TierExtreme
)

// TierThresholds are the lower energy bounds, J, of TierSerious,
// TierSevere and TierExtreme.
var TierThresholds = [3]float64{1e3, 1e5, 1e7}

// TierOf returns the tier of energy E (J).
func TierOf(E float64) Tier {
	t := TierLow
	for i, th := range TierThresholds {
		if E >= th {
			t = Tier(i + 1)
		}
	}
	return t
}

// Label is the tier's short name.
func (t Tier) Label() string {
	switch t {
	case TierLow:
		return "low"
	case TierSerious:
		return "serious"
	case TierSevere:
		return "severe"
	}
	return "extreme"
}

// Advice says in plain words what the tier means at the bench.
func (t Tier) Advice() string {
	switch t {
	case TierLow:
		return "A failure can still throw a fitting or a window fragment: wear eye protection and keep your face away."
	case TierSerious:
		return "A failure can seriously injure people nearby: shield the vessel and stay out of line with its ends, windows and fittings."
	case TierSevere:
		return "A failure can kill people nearby and throw parts across the room: pressurise remotely from behind a barrier and keep the room clear."
	}
	return "Blast hazard beyond the room: get a professional hazard assessment before any filling."
}
