package ui

import "tubewright/calc/units"

// complexText writes a complex number with 4 significant digits in each
// part and no exponent, or "—" (see units.FormatComplex).
func complexText(c complex128) string { return units.FormatComplex(c) }
