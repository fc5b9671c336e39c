package linear

import "math"

// GasVolume returns the volume of gas the device holds (m³): each duct's
// cross-section times its length times its porosity (1 for tubes), plus
// each cavity's volume,
//
//	V = Σ φᵢ π Dᵢ² Lᵢ / 4 + Σ V_cavity
//
// (the volume of a right circular cylinder, elementary geometry). Ends and
// drivers hold none. It is the gas a safety check must assume released or
// expanding.
func (d *Device) GasVolume() float64 {
	var v float64
	for _, p := range d.Parts {
		switch p.Kind {
		case KindCavity:
			v += p.Volume
		case KindTube, KindStack, KindExchanger:
			phi := p.Porosity
			if phi <= 0 {
				phi = 1
			}
			v += phi * p.Area() * p.Length
		}
	}
	return v
}

// WidestDiameter returns the largest inner diameter of the device's ducts
// (m), the diameter a pressure-vessel check of the shell must take; 0 when
// it has no duct. Cavities, given by volume only, are not counted.
func (d *Device) WidestDiameter() float64 {
	var w float64
	for _, p := range d.Parts {
		switch p.Kind {
		case KindTube, KindStack, KindExchanger:
			w = math.Max(w, p.Diameter)
		}
	}
	return w
}
