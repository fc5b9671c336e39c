package listen

import "math"

// decayFit is the result of fitting an exponential to the envelope.
type decayFit struct {
	found      bool
	tau, uTau  float64 // amplitude 1/e decay time and its standard uncertainty, s
	start, end float64 // the fitted stretch, s
	why        string  // why no decay was found
}

// Decay-fit thresholds. The fit starts where the envelope has fallen to
// e^-0.5 of its peak (past the tap or the switch-off) plus the filter's
// length, and ends where the envelope, less the noise, falls below 3 times
// the noise (about 10 dB above it) or to e^-7 of the peak. It needs at
// least one neper of decay in at least five points.
const (
	decayStartNepers = 0.5
	decayEndNepers   = 7.0
	decayMinNepers   = 1.0
	decayNoiseFactor = 3.0
)

// fitDecay fits ln a(t) = ln A - t/τ to the envelope by weighted linear
// least squares with weights a², the inverse of the variance of ln a when
// the noise on a is constant (Bevington & Robinson, Data Reduction and Error
// Analysis for the Physical Sciences, 3rd ed. 2003, §6.4, fits to ln y).
// Before taking the log each point is corrected for the noise that adds in
// power, a_c = √(a² - n²), n the rms noise envelope. The standard
// uncertainty of the slope comes from the weighted residuals, enlarged by
// √(points per filter length), since points closer than the filter length
// are not independent.
func fitDecay(e envelope, noise float64) decayFit {
	n := len(e.a)
	if n < 5 {
		return decayFit{why: "the recording is too short for a ring-down"}
	}
	ac := make([]float64, n)
	ip := 0
	for i, a := range e.a {
		ac[i] = math.Sqrt(math.Max(a*a-noise*noise, 0))
		if ac[i] > ac[ip] {
			ip = i
		}
	}
	peak := ac[ip]
	if peak <= 0 {
		return decayFit{why: "no signal above the noise"}
	}
	lo := math.Max(decayNoiseFactor*noise, peak*math.Exp(-decayEndNepers))
	end := n
	for i := ip + 1; i < n; i++ {
		if ac[i] < lo {
			end = i
			break
		}
	}
	start := ip
	for i := end - 1; i >= ip; i-- {
		if ac[i] >= peak*math.Exp(-decayStartNepers) {
			start = i
			break
		}
	}
	start += (3*e.m + e.d - 1) / e.d
	if end-start < 5 {
		return decayFit{why: "the sound does not die away within the recording"}
	}
	if math.Log(ac[start]/ac[end-1]) < decayMinNepers {
		return decayFit{why: "the sound does not die away within the recording (less than a factor e of decay)"}
	}
	var sw, st, sy float64
	for i := start; i < end; i++ {
		w := ac[i] * ac[i]
		sw += w
		st += w * e.t[i]
		sy += w * math.Log(ac[i])
	}
	tm, ym := st/sw, sy/sw
	var sxx, sxy float64
	for i := start; i < end; i++ {
		w := ac[i] * ac[i]
		dt := e.t[i] - tm
		sxx += w * dt * dt
		sxy += w * dt * (math.Log(ac[i]) - ym)
	}
	b := sxy / sxx
	if !(b < 0) {
		return decayFit{why: "the level does not fall after its peak"}
	}
	var ss float64
	for i := start; i < end; i++ {
		w := ac[i] * ac[i]
		r := math.Log(ac[i]) - ym - b*(e.t[i]-tm)
		ss += w * r * r
	}
	k := end - start
	corr := math.Max(1, float64(3*e.m)/float64(e.d))
	seb := math.Sqrt(ss / float64(k-2) / sxx * corr)
	tau := -1 / b
	return decayFit{found: true, tau: tau, uTau: tau * tau * seb, start: e.t[start], end: e.t[end-1]}
}
