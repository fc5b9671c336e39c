// Package safety computes the numbers behind the safety pass a builder
// walks before pressurising a thermoacoustic rig: wall stresses of a
// cylindrical vessel (thin-wall and Lamé), the minimum wall and the maximum
// allowable working pressure by ASME BPVC Section VIII Division 1 UG-27,
// reference test pressures, the stored energy of the gas charge, the oxygen
// left in a room after a release, cylinder contents as free gas, and sound
// levels against occupational limits. It also holds the guided checklist
// (checklist.go) as pure data and logic.
//
// Units are SI inside: Pa, m, m³, K, J, s. Pressures are absolute unless a
// name or type says gauge: wall stresses and the code formulas take a
// GaugePressure (the pressure difference across the wall, inside minus the
// surrounding atmosphere), the energy of expansion takes absolute pressures.
// GaugeOf converts a parsed units.Quantity, so that a "30 barg" entry is
// never read as 30 bar absolute.
//
// Every result carries the cautions that apply to it (cautions.go): these
// are estimates for planning; pressure equipment must be designed, tested
// and approved under the locally applicable code by qualified and, where
// required, licensed people, and this package is no substitute for that.
//
// Input outside a formula's domain gives a *units.RangeError naming the
// field, the value and the valid range.
package safety
