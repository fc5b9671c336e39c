package listen

import "math"

// EnvelopePoint is one point of the amplitude envelope of the resonance.
type EnvelopePoint struct {
	Time      float64 // s from the start of the recording
	Amplitude float64 // amplitude of the component at the resonance, full scale 1
}

// envelope is the amplitude of the component near f0 against time, at a
// reduced rate.
type envelope struct {
	t, a      []float64 // time (s) and amplitude (full scale 1)
	m         int       // boxcar length, samples
	d         int       // decimation: one point every d samples
	noiseGain float64   // Σ h_k² of the normalised filter (for noise: E a² = 4σ² Σ h²)
}

// demodEnvelope returns the amplitude envelope of the part of x near f0
// (Hz) by complex demodulation: each sample is multiplied by e^{-i2πf0 t}
// and the product is low-pass filtered by three cascaded moving averages of
// M = round(2 fs/f0) samples (two periods), so
//
//	a(t) = 2 |Σ_k h_k x_{n-k} e^{-iω0 (n-k)}|,   ω0 = 2π f0/fs,
//
// where h is the normalised triple boxcar (a quadratic B-spline of 3M-2
// samples). A tone A cos(ω0 n + φ) gives a = A. The filter's zeros at
// multiples of fs/M ≈ f0/2 remove the 2f0 image and the harmonics, and for
// an exponentially decaying tone its output is the same exponential once
// the filter has seen only the decay, so the decay time is kept. Method:
// Bingham, Godfrey & Tukey, "Modern techniques of power spectrum
// estimation", IEEE Trans. Audio Electroacoust. AU-15(2), 56–66, 1967
// (complex demodulation). Runs in one pass with memory for 3M samples;
// the output has one point every max(1, M/4) samples, timed at the centre
// of the filter.
func demodEnvelope(x []float64, fs, f0 float64) envelope {
	m := max(1, int(math.Round(2*fs/f0)))
	d := max(1, m/4)
	span := 3*m - 2 // support of the cascade
	e := envelope{m: m, d: d}
	if len(x) < span {
		return e
	}
	e.noiseGain = tripleBoxGain(m)
	n := len(x)
	e.t = make([]float64, 0, (n-span)/d+2)
	e.a = make([]float64, 0, (n-span)/d+2)
	// ring buffers of the inputs of each stage
	r1r, r1i := make([]float64, m), make([]float64, m)
	r2r, r2i := make([]float64, m), make([]float64, m)
	r3r, r3i := make([]float64, m), make([]float64, m)
	var s1r, s1i, s2r, s2i, s3r, s3i float64
	omega := 2 * math.Pi * f0 / fs
	rs, rc := math.Sincos(omega)
	inv := 1 / (float64(m) * float64(m) * float64(m))
	centre := float64(span-1) / 2
	var zr, zi float64
	for k := range n {
		if k%1024 == 0 {
			s, c := math.Sincos(omega * float64(k))
			zr, zi = c, -s
		}
		ur, ui := x[k]*zr, x[k]*zi
		zr, zi = zr*rc+zi*rs, zi*rc-zr*rs // multiply by e^{-iω}
		j := k % m
		s1r += ur - r1r[j]
		s1i += ui - r1i[j]
		r1r[j], r1i[j] = ur, ui
		s2r += s1r - r2r[j]
		s2i += s1i - r2i[j]
		r2r[j], r2i[j] = s1r, s1i
		s3r += s2r - r3r[j]
		s3i += s2i - r3i[j]
		r3r[j], r3i[j] = s2r, s2i
		if k >= span-1 && (k-(span-1))%d == 0 {
			e.t = append(e.t, (float64(k)-centre)/fs)
			e.a = append(e.a, 2*math.Hypot(s3r, s3i)*inv)
		}
	}
	return e
}

// tripleBoxGain returns Σ h_k² for h the convolution of three boxcars of
// length m, normalised to Σ h = 1.
func tripleBoxGain(m int) float64 {
	// triangle t = box*box, length 2m-1; then h ∝ t*box by prefix sums
	tri := make([]float64, 2*m-1)
	for k := range tri {
		tri[k] = float64(min(k+1, 2*m-1-k))
	}
	pre := make([]float64, len(tri)+1)
	for k, v := range tri {
		pre[k+1] = pre[k] + v
	}
	var s2 float64
	for j := 0; j < 3*m-2; j++ {
		lo, hi := max(0, j-m+1), min(j, len(tri)-1)
		c := pre[hi+1] - pre[lo]
		s2 += c * c
	}
	m3 := float64(m) * float64(m) * float64(m)
	return s2 / (m3 * m3)
}

// noiseAmplitude returns the rms envelope of the noise near f0. The
// envelope of Gaussian noise alone follows a Rayleigh law, so its square is
// exponentially distributed with mean P = a_rms². Starting from the 10th
// percentile p (P₀ = p²/(-ln 0.9)), P is refined by keeping the points with
// a² < 3P (95 % of the noise points, few of the tone's) and dividing their
// mean by 0.843, the mean of an exponential variable below 3 times its mean
// relative to its mean, (1 - 4e⁻³)/(1 - e⁻³); ten rounds. This finds the
// noise before a tap and after the ring has died even when they are a
// minority of the recording. It is too high when the tone never stops; the
// caller also has a spectral estimate and takes the lower.
func (e envelope) noiseAmplitude() float64 {
	if len(e.a) == 0 {
		return 0
	}
	v := append([]float64(nil), e.a...)
	p := quickSelect(v, len(v)/10)
	P := p * p / -math.Log(0.9)
	const c, corr = 3.0, 0.8428
	for range 10 {
		var s float64
		var n int
		for _, a := range e.a {
			if a*a < c*P {
				s += a * a
				n++
			}
		}
		if n < 8 || s == 0 {
			break
		}
		P = s / float64(n) / corr
	}
	return math.Sqrt(P)
}

// quickSelect returns the k-th smallest element of v (v is reordered).
func quickSelect(v []float64, k int) float64 {
	lo, hi := 0, len(v)-1
	for lo < hi {
		p := v[(lo+hi)/2]
		i, j := lo, hi
		for i <= j {
			for v[i] < p {
				i++
			}
			for v[j] > p {
				j--
			}
			if i <= j {
				v[i], v[j] = v[j], v[i]
				i++
				j--
			}
		}
		switch {
		case k <= j:
			hi = j
		case k >= i:
			lo = i
		default:
			return v[k]
		}
	}
	return v[k]
}

// thin returns at most n points of the envelope, evenly spread, for a plot.
func (e envelope) thin(n int) []EnvelopePoint {
	if len(e.a) == 0 {
		return nil
	}
	step := max(1, (len(e.a)+n-1)/n)
	out := make([]EnvelopePoint, 0, len(e.a)/step+1)
	for i := 0; i < len(e.a); i += step {
		out = append(out, EnvelopePoint{Time: e.t[i], Amplitude: e.a[i]})
	}
	return out
}
