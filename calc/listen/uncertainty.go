package listen

import "math"

// frequencySigma returns the standard deviation (Hz) of the frequency found
// by maximising the weighted fit of a sinusoid (see sineFit) to
// x_n = a_n cos(ω n + φ) + noise, for white noise of variance sigma2 per
// sample, analysis weights v_n (window times amplitude shape) and amplitude
// profile a_n:
//
//	var(ω̂) = 2σ² Σ v_n² m_n² / (Σ v_n a_n m_n²)²   (rad/sample)²,
//	m_n = n - c,  c = Σ v_n a_n n / Σ v_n a_n,
//	σ_f = fs/(2π) · √var(ω̂).
//
// It is the first-order (high signal-to-noise) error of the maximum of
// |Σ v_n x_n e^{-iωn}|²: set its derivative in ω to zero, keep the terms
// linear in the noise, and the error is Im(Σ v_n ν_n m_n e^{-iωn}) over
// ½ Σ v_n a_n m_n² (ν the noise). For a constant amplitude A and v = 1 over
// N samples it is 24σ²/(A² N³) = 12/(SNR·N³) with SNR = A²/(2σ²), the
// large-N Cramér–Rao bound of Rife & Boorstyn ("Single-tone parameter
// estimation from discrete-time observations", IEEE Trans. Inf. Theory
// IT-20(5), 591–598, 1974). A shorter ring (a wider peak) has fewer cycles
// above the noise and so a larger σ_f: this is how the width of the peak
// enters. The package tests check it against the scatter of the frequency
// over repeated noisy synthetic recordings.
func frequencySigma(v, a []float64, sigma2, fs float64) float64 {
	if len(v) == 0 || sigma2 <= 0 {
		return 0
	}
	var sva, svan float64
	for n := range v {
		sva += v[n] * a[n]
		svan += v[n] * a[n] * float64(n)
	}
	if !(sva > 0) {
		return 0
	}
	c := svan / sva
	var s1, s2 float64
	for n := range v {
		m := float64(n) - c
		s1 += v[n] * v[n] * m * m
		s2 += v[n] * a[n] * m * m
	}
	if !(s2 > 0) {
		return 0
	}
	return fs / (2 * math.Pi) * math.Sqrt(2*sigma2*s1/(s2*s2))
}
