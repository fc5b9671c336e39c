package listen

import "math"

// clockSigma is the standard uncertainty (Hz) of a frequency f (Hz)
// measured against a sample clock known only to lie within ±tol (a
// fraction, e.g. 1e-4 for ±100 ppm) of its nominal rate. A frequency
// counted in samples scales with the true sample rate, so its relative
// error equals the clock's. With nothing known but the bounds, the error is
// taken as uniform over ±tol, whose standard deviation is tol/√3 (JCGM
// 100:2008, GUM, 4.3.7, rectangular distribution):
//
//	u_clock = f · tol / √3.
func clockSigma(f, tol float64) float64 {
	return f * tol / math.Sqrt(3)
}

// clockTolerance returns s's clock tolerance, 0 for nil settings.
func clockTolerance(s *Settings) float64 {
	if s == nil {
		return 0
	}
	return s.ClockTolerance
}
