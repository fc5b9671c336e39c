package safety

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// AirOxygen is the oxygen fraction of normal air by volume used here,
// 20.9 % (the value OSHA's respiratory protection rule treats as normal,
// 29 CFR 1910.134; dry air holds 20.95 %).
const AirOxygen = 0.209

// OxygenDeficient is the threshold below which air is oxygen-deficient,
// 19.5 % by volume: US OSHA 29 CFR 1910.134, which "considers any
// atmosphere with an oxygen level below 19.5 percent to be oxygen-deficient
// and immediately dangerous to life or health" (paragraph (d)(2)(iii), in
// OSHA's interpretation letter of 2 April 2007 to FirePASS Corporation);
// the same 19.5 % is the definition in 1910.134(b) (wording from memory).
const OxygenDeficient = 0.195

// RoomModel is how released gas and room air are assumed to mix.
type RoomModel int

const (
	// Displacement: the released gas pushes the same volume of room air
	// out and does not mix; O2 = 20.9 % × (1 − Vrel/Vroom). The worst case
	// for a gas that pools (heavier than air, or cold) in a leaky room.
	Displacement RoomModel = iota
	// WellMixed: the gas mixes completely as it enters while the mixture
	// leaves at the same rate; O2 = 20.9 % × exp(−Vrel/Vroom).
	WellMixed
	// Sealed: nothing leaves, the room pressure rises;
	// O2 = 20.9 % × Vroom/(Vroom + Vrel).
	Sealed
)

// RoomModels lists the models in the order screens offer them.
var RoomModels = []RoomModel{Displacement, WellMixed, Sealed}

// Label is the model's name as shown to users.
func (m RoomModel) Label() string {
	switch m {
	case Displacement:
		return "displacement (air pushed out, no mixing)"
	case WellMixed:
		return "well mixed (mixture flows out)"
	case Sealed:
		return "sealed room (nothing leaves)"
	}
	return fmt.Sprintf("RoomModel(%d)", int(m))
}

// Key is the model's short name for the terminal: displacement, mixed,
// sealed.
func (m RoomModel) Key() string {
	switch m {
	case Displacement:
		return "displacement"
	case WellMixed:
		return "mixed"
	case Sealed:
		return "sealed"
	}
	return ""
}

// Oxygen is the oxygen left in a room after an oxygen-free gas is released
// into it.
type Oxygen struct {
	Model    RoomModel
	Fraction float64 // oxygen fraction after the release, 0..1 by volume
	// Deficient is Fraction < OxygenDeficient (19.5 %).
	Deficient bool
	// MaxRelease is the largest release, m³ at room conditions, that keeps
	// the oxygen at or above 19.5 % in this room and model.
	MaxRelease float64
	// RecoveryTime is how long ventilation at the given rate takes to bring
	// the oxygen back to 19.5 %, s; 0 when it never fell below, and 0 with
	// Ventilated false when no ventilation rate was given.
	RecoveryTime float64
	Ventilated   bool
	// SealedRise is, for the sealed model, the rise of the room pressure,
	// Pa: the atmosphere times Vrel/Vroom (isothermal ideal gas); 0 for the
	// other models.
	SealedRise float64
	Warnings   []string // limits of the model met by this input
	Cautions   []string
}

// RoomOxygen returns the oxygen fraction in a room of volume room (m³)
// after release m³ of an oxygen-free gas (measured at room temperature and
// pressure) enters it all at once, by the chosen model:
//
//	displacement: x = 0.209 (1 − Vrel/Vroom)      needs Vrel < Vroom
//	well mixed:   x = 0.209 exp(−Vrel/Vroom)
//	sealed:       x = 0.209 Vroom/(Vroom + Vrel)
//
// and the largest release keeping x ≥ 0.195 (solve each for Vrel). The
// displacement form is the one university safety offices use for a full
// release, %O2 = 100 × 0.2095 (Vr − Vg)/Vr, with the 19.5 % minimum
// recommended by the BCGA (University of Nottingham Safety Office, oxygen
// depletion calculator, nottingham.ac.uk/safetyCalculators; we take
// 20.9 %, see AirOxygen). The well-mixed result is the room purge
// (dilution) equation ln(C_end/C_start) = −Q t/V of industrial hygiene,
// with the released gas as the purge volume Q t; the sealed result follows
// from conservation of the room's air (the air stays, the total becomes
// Vroom + Vrel). The sealed and well-mixed forms are derived here, not
// quoted from a guidance note.
//
// With a ventilation rate n (air changes per second, ≥ 0; 0 for none) the
// oxygen deficit decays as exp(−n t) in a well-mixed room (the room purge
// equation D_t = (V/Q) ln(C_initial/C_ending), e.g. as written on
// tickerdossier.com/wiki/dilution-equation), so the time back to 19.5 % is
//
//	t = ln((0.209 − x)/(0.209 − 0.195)) / n.
//
// In the sealed model the room pressure rises by pa Vrel/Vroom (the room's
// air and the release share the room at one temperature; pa = 101 325 Pa),
// which Oxygen.SealedRise reports with a warning: no real room holds that.
//
// Errors: room ≤ 0, release < 0, release ≥ room for displacement (the room
// would hold no air), n < 0 (*units.RangeError).
func RoomOxygen(model RoomModel, release, room, n float64) (Oxygen, error) {
	if err := positive("room volume", room, "m³"); err != nil {
		return Oxygen{}, err
	}
	if err := nonNegative("release volume", release, "m³"); err != nil {
		return Oxygen{}, err
	}
	if err := nonNegative("ventilation rate", n, "1/s"); err != nil {
		return Oxygen{}, err
	}
	r := release / room
	o := Oxygen{Model: model, Cautions: cautions(CautionAsphyxiation)}
	switch model {
	case Displacement:
		if release >= room {
			e := units.NewRangeError("release volume", release, 0, room, "m³")
			e.Why = "the displacement model needs a release smaller than the room; the room would hold no air"
			return Oxygen{}, e
		}
		o.Fraction = AirOxygen * (1 - r)
		o.MaxRelease = room * (1 - OxygenDeficient/AirOxygen)
	case WellMixed:
		o.Fraction = AirOxygen * math.Exp(-r)
		o.MaxRelease = room * math.Log(AirOxygen/OxygenDeficient)
	case Sealed:
		o.Fraction = AirOxygen / (1 + r)
		o.MaxRelease = room * (AirOxygen/OxygenDeficient - 1)
		o.SealedRise = units.StandardAtmosphere * r
		if r > 0 {
			o.Warnings = append(o.Warnings, "a sealed room would rise in pressure by "+units.Format(o.SealedRise, units.DimPressure)+"; real rooms leak, and this model gives the highest oxygen of the three")
		}
	default:
		panic(fmt.Sprintf("calc: unknown room model %d", int(model)))
	}
	o.Deficient = o.Fraction < OxygenDeficient
	if n > 0 {
		o.Ventilated = true
		if o.Deficient {
			o.RecoveryTime = math.Log((AirOxygen-o.Fraction)/(AirOxygen-OxygenDeficient)) / n
		}
	}
	return o, nil
}

// ReleaseVolume returns the volume, m³ at the room's temperature Troom (K)
// and pressure pa (Pa absolute), of the gas that leaves a vessel of volume
// V (m³) holding gas at absolute pressure p (Pa) and temperature T (K) when
// it empties to pa, with compressibility factor z of the charge (1 for an
// ideal gas; the gas left at pa is taken as ideal):
//
//	Vrel = V (p/(z T) − pa/Troom) Troom/pa
//
// This is the ideal-gas law applied to the amount of gas that leaves.
// Errors: non-positive V, T, Troom, pa or z, or p < pa (*units.RangeError).
func ReleaseVolume(V float64, p units.Pressure, T units.Temperature, z float64, pa units.Pressure, Troom units.Temperature) (float64, error) {
	if err := positive("vessel volume", V, "m³"); err != nil {
		return 0, err
	}
	if err := positive("gas temperature", float64(T), "K"); err != nil {
		return 0, err
	}
	if err := positive("room temperature", float64(Troom), "K"); err != nil {
		return 0, err
	}
	if err := positive("room pressure", float64(pa), "Pa"); err != nil {
		return 0, err
	}
	if err := positive("compressibility factor", z, ""); err != nil {
		return 0, err
	}
	if !finite(float64(p)) || p < pa {
		e := units.NewRangeError("fill pressure (absolute)", float64(p), float64(pa), math.Inf(1), "Pa")
		e.Why = "the room pressure: below it no gas leaves"
		return 0, e
	}
	return V * (float64(p)/(z*float64(T)) - float64(pa)/float64(Troom)) * float64(Troom) / float64(pa), nil
}
