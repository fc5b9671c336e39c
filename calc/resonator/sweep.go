package resonator

import (
	"fmt"

	"tubewright/gasprops"
)

// Point is one point of a sweep: the swept variable X (K or mole
// fraction) and the resonance frequency (Hz).
type Point struct {
	X         float64
	Frequency float64
}

// MaxSweepPoints bounds the length of a sweep.
const MaxSweepPoints = 10001

func sweepCheck(n int) error {
	if n < 2 || n > MaxSweepPoints {
		return fmt.Errorf("sweep points %d: want 2 to %d", n, MaxSweepPoints)
	}
	return nil
}

// SweepTemperature returns the resonance frequency of s's tube at n
// temperatures evenly spaced from t0 to t1 (K, both included), at
// s.Pressure with s.Gas. The first temperature the gas model rejects
// stops the sweep with its error.
func (s Setup) SweepTemperature(t0, t1 float64, n int) ([]Point, error) {
	if err := sweepCheck(n); err != nil {
		return nil, err
	}
	pts := make([]Point, n)
	for i := range pts {
		T := t0 + (t1-t0)*float64(i)/float64(n-1)
		g, err := s.properties(T, s.Pressure)
		if err != nil {
			return nil, err
		}
		r, err := tubeFrequency(s.Tube, g)
		if err != nil {
			return nil, err
		}
		pts[i] = Point{T, r.Frequency}
	}
	return pts, nil
}

// SweepFraction returns the resonance frequency of s's tube at n mole
// fractions of second in first, evenly spaced from x0 to x1 (within
// [0, 1], both included), at s.Temperature and s.Pressure (s.Gas is
// ignored).
func (s Setup) SweepFraction(first, second *gasprops.Species, x0, x1 float64, n int) ([]Point, error) {
	if err := sweepCheck(n); err != nil {
		return nil, err
	}
	if err := checkRange("mole fraction", x0, 0, 1, ""); err != nil {
		return nil, err
	}
	if err := checkRange("mole fraction", x1, 0, 1, ""); err != nil {
		return nil, err
	}
	pts := make([]Point, n)
	for i := range pts {
		x := x0 + (x1-x0)*float64(i)/float64(n-1)
		mix, err := gasprops.Binary(first, second, x)
		if err != nil {
			return nil, err
		}
		ss := s
		ss.Gas = mix
		g, err := ss.properties(s.Temperature, s.Pressure)
		if err != nil {
			return nil, err
		}
		r, err := tubeFrequency(s.Tube, g)
		if err != nil {
			return nil, err
		}
		pts[i] = Point{x, r.Frequency}
	}
	return pts, nil
}
