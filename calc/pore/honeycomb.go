package pore

import (
	"math"
	"math/cmplx"
)

// honeycomb is an extruded ceramic honeycomb with square cells.
type honeycomb struct {
	pitch, wall float64
	channel     rectangular
}

// Honeycomb returns an extruded honeycomb with square cells, cellsPerSquareMetre
// cells per m² of face (1/m²; 400 cells per square inch is 620000 /m²)
// and wall thickness wallThickness (m). Cell pitch P = 1/√N, open side
// s = P - t; porosity (s/P)²; hydraulic radius s/4; f of the square
// channel (Rectangular with both half sides s/2). Geometry from the square
// cell directly; corner fillets of real ceramics are neglected.
//
// Errors: walls at least as thick as the pitch (no open cell), naming both.
func Honeycomb(cellsPerSquareMetre, wallThickness float64) (Shape, error) {
	if err := positive("cell density", cellsPerSquareMetre); err != nil {
		return nil, err
	}
	if err := nonNegative("wall thickness", wallThickness, "m"); err != nil {
		return nil, err
	}
	p := 1 / math.Sqrt(cellsPerSquareMetre)
	if wallThickness >= p {
		return nil, impossible("wall thickness %s is not smaller than the cell pitch %s (from the cell density): no open cell is left", mm(wallThickness), mm(p))
	}
	s := p - wallThickness
	return checked(&honeycomb{pitch: p, wall: wallThickness, channel: rectangular{a: s / 2, b: s / 2, phi: 1}})
}

func (h *honeycomb) HydraulicRadius() float64 { return (h.pitch - h.wall) / 4 }
func (h *honeycomb) Porosity() float64 {
	s := h.pitch - h.wall
	return s * s / (h.pitch * h.pitch)
}
func (h *honeycomb) Describe() string {
	return "square-cell honeycomb, " + trimFloat(0.0254*0.0254/(h.pitch*h.pitch)) + " cells/in², wall " + mm(h.wall)
}

func (h *honeycomb) F(delta float64) complex128 {
	if badDelta(delta) {
		return cmplx.NaN()
	}
	return h.channel.F(delta)
}
