package listen

import (
	"math"

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
	// cos(2πk/n) by a rotating phasor, re-set every 1024 samples
	rs, rc := math.Sincos(2 * math.Pi / float64(n))
	var c, s float64
	for k := range w {
		if k%1024 == 0 {
			s, c = math.Sincos(2 * math.Pi * float64(k) / float64(n))
		}
		w[k] = 0.5 - 0.5*c
		c, s = c*rc-s*rs, s*rc+c*rs
	}
	return w
}

// spectrum is the Hann-windowed power spectrum of one stretch of samples.
type spectrum struct {
	power []float64 // |X_k|², k = 0 … n/2
	binHz float64   // bin spacing fs/n, Hz
	sumW2 float64   // Σ w_k², for noise power: E|X_k|² = σ² Σ w_k² for white noise σ²
	sumW  float64   // Σ w_k: a tone of amplitude A gives |X| = A Σw / 2 at its peak
}

// spectrometer makes Hann-windowed power spectra of stretches of one
// length, reusing its window, FFT plan and buffers.
type spectrometer struct {
	fft         *fourier.FFT
	w, y        []float64
	c           []complex128
	sumW, sumW2 float64
}

func newSpectrometer(n int) *spectrometer {
	m := &spectrometer{fft: fourier.NewFFT(n), w: hann(n), y: make([]float64, n)}
	for _, v := range m.w {
		m.sumW += v
		m.sumW2 += v * v
	}
	return m
}

// of returns the spectrum of x (len(x) must be the spectrometer's length).
// The result's power slice is power when that is large enough.
func (m *spectrometer) of(x []float64, fs float64, power []float64) spectrum {
	n := len(x)
	for k := range x {
		m.y[k] = x[k] * m.w[k]
	}
	m.c = m.fft.Coefficients(m.c, m.y)
	if cap(power) < len(m.c) {
		power = make([]float64, len(m.c))
	}
	power = power[:len(m.c)]
	for k, v := range m.c {
		power[k] = real(v)*real(v) + imag(v)*imag(v)
	}
	return spectrum{power: power, binHz: fs / float64(n), sumW2: m.sumW2, sumW: m.sumW}
}

// newSpectrum windows x with Hann and takes its FFT.
func newSpectrum(x []float64, fs float64) spectrum {
	return newSpectrometer(len(x)).of(x, fs, nil)
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
	return s.noisePowerBuf(lo, hi, centre, guard, nil)
}

// noisePowerBuf is noisePower with a scratch slice to reuse.
func (s spectrum) noisePowerBuf(lo, hi, centre, guard int, v []float64) float64 {
	v = v[:0]
	for k := max(lo, 1); k <= min(hi, len(s.power)-1); k++ {
		if k >= centre-guard && k <= centre+guard {
			continue
		}
		v = append(v, s.power[k])
	}
	if len(v) < 8 {
		return -1
	}
	return quickSelect(v, len(v)/2) / (math.Ln2 * s.sumW2)
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

// dtft2 returns Σ y_n e^{-iωn} and Σ u_n e^{-2iωn} in one pass.
func dtft2(y, u []float64, omega float64) (re, im, re2, im2 float64) {
	rs, rc := math.Sincos(omega)
	for start := 0; start < len(y); start += 1024 {
		end := min(start+1024, len(y))
		s, c := math.Sincos(omega * float64(start))
		zr, zi := c, -s
		uu := u[start:end]
		for k, v := range y[start:end] {
			re += v * zr
			im += v * zi
			z2r, z2i := zr*zr-zi*zi, 2*zr*zi
			re2 += uu[k] * z2r
			im2 += uu[k] * z2i
			zr, zi = zr*rc+zi*rs, zi*rc-zr*rs
		}
	}
	return re, im, re2, im2
}

// dtftPower returns |Σ y_n e^{-iωn}|².
func dtftPower(y []float64, omega float64) float64 {
	re, im := dtft(y, omega)
	return re*re + im*im
}

// maximize returns where a unimodal f on [a, b] is largest, to a width of
// about tol, by Brent's method: parabolic interpolation through the three
// best points, with a golden-section step whenever the parabola is not
// trusted (Brent, Algorithms for Minimization without Derivatives, 1973,
// ch. 5; as written in Press, Teukolsky, Vetterling & Flannery, Numerical
// Recipes, 3rd ed. 2007, §10.3). Near a smooth peak it needs far fewer
// evaluations than golden section alone.
func maximize(f func(float64) float64, a, b, tol float64) float64 {
	const cgold = 0.3819660112501051
	if b < a {
		a, b = b, a
	}
	x := a + cgold*(b-a)
	w, v := x, x
	fx := -f(x)
	fw, fv := fx, fx
	var d, e float64
	for range 200 {
		xm := (a + b) / 2
		tol1 := tol/2 + 1e-15*math.Abs(x)
		tol2 := 2 * tol1
		if math.Abs(x-xm) <= tol2-(b-a)/2 {
			return x
		}
		golden := true
		if math.Abs(e) > tol1 {
			r := (x - w) * (fx - fv)
			q := (x - v) * (fx - fw)
			p := (x-v)*q - (x-w)*r
			q = 2 * (q - r)
			if q > 0 {
				p = -p
			}
			q = math.Abs(q)
			etemp := e
			e = d
			if math.Abs(p) < math.Abs(q*etemp/2) && p > q*(a-x) && p < q*(b-x) {
				d = p / q
				u := x + d
				if u-a < tol2 || b-u < tol2 {
					d = math.Copysign(tol1, xm-x)
				}
				golden = false
			}
		}
		if golden {
			if x >= xm {
				e = a - x
			} else {
				e = b - x
			}
			d = cgold * e
		}
		u := x + d
		if math.Abs(d) < tol1 {
			u = x + math.Copysign(tol1, d)
		}
		fu := -f(u)
		if fu <= fx {
			if u >= x {
				a = x
			} else {
				b = x
			}
			v, w, x = w, x, u
			fv, fw, fx = fw, fx, fu
		} else {
			if u < x {
				a = u
			} else {
				b = u
			}
			if fu <= fw || w == x {
				v, w = w, u
				fv, fw = fw, fu
			} else if fu <= fv || v == x || v == w {
				v, fv = u, fu
			}
		}
		if !(fx == fx) { // NaN: give up with the middle
			return (a + b) / 2
		}
	}
	return x
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
	return maximize(func(w float64) float64 { return dtftPower(y, w) }, math.Max(lo, omega0-h), math.Min(hi, omega0+h), tol)
}
