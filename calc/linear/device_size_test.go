package linear

import (
	"math"
	"testing"
)

// TestDeviceGasVolume checks the gas volume and the widest diameter against
// the cylinder volume πD²L/4 (elementary geometry), worked by hand with
// Python's math module: for the built-in engine, D = 60 mm and
// Σ φL = 40 mm + 0.62·8 mm + 0.76·60 mm + 0.62·8 mm + 0.9 m, so
// V = 0.00281476648665154 m³; for a tube of 50 mm × 0.5 m, a stack of
// 50 mm × 0.1 m at φ = 0.8 and a 1 L cavity, V = 0.0021388273369263 m³.
func TestDeviceGasVolume(t *testing.T) {
	engine, err := Example("engine")
	if err != nil {
		t.Fatal(err)
	}
	built := &Device{Parts: []Part{
		{Kind: KindClosedEnd},
		{Kind: KindTube, Length: 0.5, Diameter: 0.05},
		{Kind: KindStack, Length: 0.1, Diameter: 0.05, Porosity: 0.8},
		{Kind: KindCavity, Volume: 1e-3},
	}}
	for _, c := range []struct {
		name        string
		d           *Device
		volume, dia float64
	}{
		{"engine example", engine, 0.00281476648665154, 0.06},
		{"tube, stack and cavity", built, 0.0021388273369263, 0.05},
		{"no ducts", &Device{Parts: []Part{{Kind: KindClosedEnd}}}, 0, 0},
	} {
		if got := c.d.GasVolume(); math.Abs(got-c.volume) > 1e-12 {
			t.Errorf("%s: gas volume %v m³, want %v", c.name, got, c.volume)
		}
		if got := c.d.WidestDiameter(); math.Abs(got-c.dia) > 1e-12 {
			t.Errorf("%s: widest diameter %v m, want %v", c.name, got, c.dia)
		}
	}
	// property: the volume grows with every duct's length
	longer := *built
	longer.Parts = append([]Part(nil), built.Parts...)
	longer.Parts[1].Length *= 2
	if longer.GasVolume() <= built.GasVolume() {
		t.Error("a longer tube holds no more gas")
	}
}
