package listen

import (
	"math"
	"sort"

	"gonum.org/v1/gonum/dsp/fourier"
)

// hann returns the DFT-even ("periodic") Hann window of length n,
//
//	w_k = ½ (1 - cos(2πk/n)),  k = 0 … n-1,
//
// whose DFT has exactly three non-zero bins, the property the Grandke
// interpolation relies on (Harris, "On the use of windows for harmonic
// analysis with the discrete Fourier transform", Proc. IEEE 66(1), 1978,
// section IV.C).
func hann(n int) []float64 {
	w := make([]float64, n)
	for k := range w {
		w[k] = 0.5 - 0.5*math.Cos(2*math.Pi*float64(k)/float64(n))
	}
	return w
}

// smoothLen returns the largest n' ≤ n whose only prime factors are 2, 3
// and 5, the lengths gonum's FFT (a port of FFTPACK) handles fastest.
func smoothLen(n int) int {
	best := 1
	for p2 := 1; p2 <= n; p2 *= 2 {
		for p3 := p2; p3 <= n; p3 *= 3 {
			for p5 := p3; p5 <= n; p5 *= 5 {
				best = max(best, p5)
			}
		}
	}
	return best
}

// spectrum is the Hann-windowed power spectrum of one stretch of samples.
type spectrum struct {
	power []float64 // |X_k|², k = 0 … n/2
	binHz float64   // bin spacing fs/n, Hz
	sumW2 float64   // Σ w_k², for noise power: E|X_k|² = σ² Σ w_k² for white noise σ²
	sumW  float64   // Σ w_k: a tone of amplitude A gives |X| = A Σw / 2 at its peak
}

// newSpectrum windows x (whole length, which should be smoothLen-friendly)
// with Hann and takes its FFT.
func newSpectrum(x []float64, fs float64, fft *fourier.FFT) spectrum {
	n := len(x)
	if fft == nil || fft.Len() != n {
		fft = fourier.NewFFT(n)
	}
	w := hann(n)
	y := make([]float64, n)
	var s1, s2 float64
	for k := range x {
		y[k] = x[k] * w[k]
		s1 += w[k]
		s2 += w[k] * w[k]
	}
	c := fft.Coefficients(nil, y)
	p := make([]float64, len(c))
	for k, v := range c {
		p[k] = real(v)*real(v) + imag(v)*imag(v)
	}
	return spectrum{power: p, binHz: fs / float64(n), sumW2: s2, sumW: s1}
}

// band returns the bin range [lo, hi] covering lowHz–highHz, clipped to the
// spectrum and kept one bin away from DC and Nyquist so a peak has two
// neighbours.
func (s spectrum) band(lowHz, highHz float64) (lo, hi int) {
	lo = max(1, int(math.Ceil(lowHz/s.binHz)))
	hi = min(len(s.power)-2, int(math.Floor(highHz/s.binHz)))
	return lo, hi
}

// peak returns the bin of largest power in [lo, hi], or -1 when empty.
func (s spectrum) peak(lo, hi int) int {
	best := -1
	for k := lo; k <= hi; k++ {
		if best < 0 || s.power[k] > s.power[best] {
			best = k
		}
	}
	return best
}

// grandke returns the peak frequency (Hz) interpolated between bin k and its
// larger neighbour for a Hann window:
//
//	α = |X_{k±1}| / |X_k|   (the larger neighbour),
//	δ = (2α - 1)/(α + 1),   f = (k ± δ)·fs/n,
//
// exact for one sinusoid with no noise and no other component (Grandke,
// "Interpolation algorithms for discrete Fourier transforms of weighted
// signals", IEEE Trans. Instrum. Meas. IM-32(2), 350–355, 1983, eq. for
// the Hann window). δ is kept in [0, 1).
func (s spectrum) grandke(k int) float64 {
	if k <= 0 || k >= len(s.power)-1 {
		return float64(k) * s.binHz
	}
	m := math.Sqrt(s.power[k])
	if m == 0 {
		return float64(k) * s.binHz
	}
	l, r := math.Sqrt(s.power[k-1]), math.Sqrt(s.power[k+1])
	sign, a := 1.0, r/m
	if l > r {
		sign, a = -1, l/m
	}
	d := (2*a - 1) / (a + 1)
	d = math.Max(0, math.Min(d, 0.999))
	return (float64(k) + sign*d) * s.binHz
}

// noisePower returns the median of |X_k|² over bins lo–hi excluding
// |k-centre| ≤ guard, converted to a per-sample white-noise variance σ²:
//
//	σ² = median|X_k|² / (ln 2 · Σ w²),
//
// since |X_k|² of white Gaussian noise is exponentially distributed with
// mean σ² Σ w² and median ln 2 times its mean. Returns -1 when fewer than 8
// bins are left.
func (s spectrum) noisePower(lo, hi, centre, guard int) float64 {
	var v []float64
	for k := max(lo, 1); k <= min(hi, len(s.power)-1); k++ {
		if k >= centre-guard && k <= centre+guard {
			continue
		}
		v = append(v, s.power[k])
	}
	if len(v) < 8 {
		return -1
	}
	sort.Float64s(v)
	return v[len(v)/2] / (math.Ln2 * s.sumW2)
}

// dtft returns Σ y_n e^{-iωn} (real and imaginary parts) for ω in
// rad/sample, by a rotating phasor re-set from sin and cos every 1024
// samples so rounding does not build up.
func dtft(y []float64, omega float64) (re, im float64) {
	rs, rc := math.Sincos(omega)
	for start := 0; start < len(y); start += 1024 {
		end := min(start+1024, len(y))
		s, c := math.Sincos(omega * float64(start))
		zr, zi := c, -s
		for _, v := range y[start:end] {
			re += v * zr
			im += v * zi
			zr, zi = zr*rc+zi*rs, zi*rc-zr*rs
		}
	}
	return re, im
}

// dtftPower returns |Σ y_n e^{-iωn}|².
func dtftPower(y []float64, omega float64) float64 {
	re, im := dtft(y, omega)
	return re*re + im*im
}

// goldenMax returns the maximum of a unimodal f on [a, b] to a width of tol
// by golden-section search (Press, Teukolsky, Vetterling & Flannery,
// Numerical Recipes, 3rd ed. 2007, §10.2).
func goldenMax(f func(float64) float64, a, b, tol float64) float64 {
	const g = 0.6180339887498949
	c, d := b-g*(b-a), a+g*(b-a)
	fc, fd := f(c), f(d)
	for b-a > tol {
		if fc > fd {
			b, d, fd = d, c, fc
			c = b - g*(b-a)
			fc = f(c)
		} else {
			a, c, fc = c, d, fd
			d = a + g*(b-a)
			fd = f(d)
		}
	}
	return (a + b) / 2
}

// refinePeak maximises the windowed periodogram |Σ y_n e^{-iωn}|² (y the
// windowed samples) over ω in [ω0 - h, ω0 + h] ∩ [lo, hi] to a width of
// tol (all in rad/sample; ω0 is first moved into [lo, hi]). The maximum of
// the periodogram is the maximum-likelihood estimate of one tone's
// frequency in white noise (Rife & Boorstyn, "Single-tone parameter
// estimation from discrete-time observations", IEEE Trans. Inf. Theory
// IT-20(5), 591–598, 1974); the window keeps other components (harmonics,
// hum) from pulling it. Its magnitude is symmetric about the tone's
// frequency for any real window or amplitude profile, which the Grandke
// formula is not built for.
func refinePeak(y []float64, omega0, h, lo, hi, tol float64) float64 {
	omega0 = math.Max(lo, math.Min(hi, omega0))
	return goldenMax(func(w float64) float64 { return dtftPower(y, w) }, math.Max(lo, omega0-h), math.Min(hi, omega0+h), tol)
}
