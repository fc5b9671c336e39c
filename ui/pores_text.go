package ui

import (
	"math"
	"strconv"
)

// complexText writes a complex number with 4 significant digits, or "—".
func complexText(c complex128) string {
	re, im := real(c), imag(c)
	if !finite(re) || !finite(im) {
		return "—"
	}
	sign := " + "
	if im < 0 {
		sign = " − "
	}
	return strconv.FormatFloat(re, 'g', 4, 64) + sign + strconv.FormatFloat(math.Abs(im), 'g', 4, 64) + "i"
}
