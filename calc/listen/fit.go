package listen

import "math"

// sineFit finds the frequency of a sinusoid with a known amplitude shape g_n
// in x_n by weighted least squares with weights w_n (the Hann window):
//
//	minimise Σ w_n (x_n - g_n (a cos ωn + b sin ωn))²  over a, b, ω.
//
// For fixed ω the best a, b solve the 2×2 normal equations, and the fit
// explains the weighted energy
//
//	P(ω) = rᵀ G⁻¹ r,   r = (Σ v x cos ωn, Σ v x sin ωn),  v = w g,
//	G = ½ [[U + C, S], [S, U - C]],  U = Σ u,  C + iS = Σ u e^{2iωn},  u = w g²,
//
// which is maximised over ω by Brent's method, see maximize (variable projection:
// Golub & Pereyra, "The differentiation of pseudo-inverses and nonlinear
// least squares problems whose variables separate", SIAM J. Numer. Anal.
// 10(2), 413–432, 1973). Unlike the plain periodogram this accounts for the
// cos–sin cross terms, so the tail of the negative-frequency image of a
// short ring (a wide peak) does not pull the estimate; with g = 1 and many
// cycles it is the windowed periodogram. g comes from the measured
// envelope, so the noise after the ring has died carries no weight (a
// matched filter).
type sineFit struct {
	vx []float64 // v_n x_n
	u  []float64 // w_n g_n²
	uu float64   // Σ u_n
}

func newSineFit(x, w, g []float64) sineFit {
	s := sineFit{vx: make([]float64, len(x)), u: make([]float64, len(x))}
	for i := range x {
		s.vx[i] = w[i] * g[i] * x[i]
		s.u[i] = w[i] * g[i] * g[i]
		s.uu += s.u[i]
	}
	return s
}

// power returns P(ω) for ω in rad/sample.
func (s sineFit) power(omega float64) float64 {
	rr, ri, cr, ci := dtft2(s.vx, s.u, omega) // Σ vx cos, -Σ vx sin; Σ u cos 2ωn, -Σ u sin 2ωn
	U := s.uu
	a, b, d := (U+cr)/2, -ci/2, (U-cr)/2 // G = [[a, b], [b, d]]; Σ u sin 2ωn = -ci
	det := a*d - b*b
	if !(det > 0) {
		return 0
	}
	r1, r2 := rr, -ri
	return (d*r1*r1 - 2*b*r1*r2 + a*r2*r2) / det
}

// envelopeShape returns the amplitude of the resonance at each sample of
// x[start:start+n] from the envelope, less the noise in power
// (√(a² - noise²)), linearly interpolated between envelope points and held
// constant beyond them; constant amp when the envelope is empty.
func envelopeShape(e envelope, noise, fs float64, start, n int, amp float64) []float64 {
	g := make([]float64, n)
	if len(e.a) == 0 {
		for i := range g {
			g[i] = amp
		}
		return g
	}
	corr := func(i int) float64 { return math.Sqrt(math.Max(e.a[i]*e.a[i]-noise*noise, 0)) }
	dt := float64(e.d) / fs
	for i := range g {
		p := (float64(start+i)/fs - e.t[0]) / dt
		switch {
		case p <= 0:
			g[i] = corr(0)
		case p >= float64(len(e.a)-1):
			g[i] = corr(len(e.a) - 1)
		default:
			k := int(p)
			f := p - float64(k)
			g[i] = (1-f)*corr(k) + f*corr(k+1)
		}
	}
	return g
}
