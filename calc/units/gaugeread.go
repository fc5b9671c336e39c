package units

import "strings"

// This file holds the gauge-first reading of pressures (Options.BareGauge)
// used by the safety checks, and the words that say how a pressure was
// read.
//
// At the bench a pressure is read off a gauge, which shows the pressure
// above the atmosphere; and for a wall, a stored charge or a release the
// gauge reading is the conservative one (it loads the wall 1 atm more than
// the same number read as absolute). So where Options.BareGauge is set, a
// unit that names neither gauge nor absolute ("bar", "psi", "kPa", "MPa",
// "mbar", "Pa", "hPa") is read as gauge. A unit that says absolute
// ("bara", "bar(a)", "psia", "psi(a)") and the units that only measure
// absolute pressure (atm, torr, mmHg) stay absolute; gauge units (barg,
// psig, kPag, MPag, mbarg) are gauge as always.

// absoluteSpellings are the unit spellings that say absolute, lower case.
var absoluteSpellings = map[string]bool{
	"bara": true, "bar(a)": true, "bar a": true, "bar(abs)": true,
	"psia": true, "psi(a)": true,
}

// absoluteOnly are the canonical names of pressure units that measure from
// vacuum only.
var absoluteOnly = map[string]bool{"atm": true, "torr": true, "mmHg": true}

// bareAsGauge returns the unit to read a pressure in when bare units are
// gauge: def's gauge twin (bar → barg) or, for a unit without one (Pa,
// hPa), def itself marked gauge. typed is the unit text as written. It
// reports whether the gauge reading was assumed.
func bareAsGauge(def *unitDef, typed string) (*unitDef, bool) {
	if def == nil || def.gauge || absoluteOnly[def.name] || absoluteSpellings[strings.ToLower(typed)] {
		return def, false
	}
	if twin := idx.find(DimPressure, def.name+"g"); twin != nil && twin.gauge && twin.factor == def.factor {
		return twin, true
	}
	g := *def
	g.gauge = true
	return &g, true
}

// DescribePressure says, for people, how a parsed pressure q was read from
// the text typed, against the atmosphere atm (Pa; 0 means
// StandardAtmosphere):
//
//	"30 bar read as 30 barg = 31.01 bar absolute"   (a bare unit read as gauge)
//	"30 barg = 31.01 bar absolute"                   (typed gauge)
//	"31 bara = 29.99 barg"                            (typed absolute)
//
// The other side is written in the family of the unit typed (psi for psi,
// bar otherwise). A quantity that is not a pressure returns typed.
func DescribePressure(typed string, q Quantity, atm float64) string {
	if q.Dim != DimPressure {
		return typed
	}
	if atm <= 0 {
		atm = StandardAtmosphere
	}
	typed = strings.TrimSpace(typed)
	base := "bar"
	if strings.HasPrefix(q.Unit, "psi") {
		base = "psi"
	}
	abs, err := FormatIn(q.Value, base)
	if err != nil {
		abs = Format(q.Value, DimPressure)
	}
	gauge, err := FormatGauge(q.Value, atm, base)
	if err != nil {
		gauge = Format(q.Value-atm, DimPressure) + " above the atmosphere"
	}
	switch {
	case q.Assumed:
		return typed + " read as " + gauge + " = " + abs + " absolute"
	case q.Gauge:
		return typed + " = " + abs + " absolute"
	}
	return typed + " absolute = " + gauge
}
