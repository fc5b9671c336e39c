package main

import (
	"path/filepath"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestOnsetOldDeviceFile: a device file saved before pore sizes were whole
// (half_gap, in calc/linear/testdata) gives the terminal the same onset
// as the example it was saved from, to 1e-12 relative.
func TestOnsetOldDeviceFile(t *testing.T) {
	old := filepath.Join("..", "..", "calc", "linear", "testdata", "engine_half_sizes.json")
	a := runJSON(t, "onset", old)
	b := runJSON(t, "onset", "--example", "engine")
	for _, key := range []string{"hot_temperature", "frequency", "temperature_ratio"} {
		x, _ := num(t, a, key)
		y, _ := num(t, b, key)
		if !scalar.EqualWithinRel(x, y, 1e-12) {
			t.Errorf("%s: %.15g from the old file, %.15g from the example", key, x, y)
		}
	}
}
