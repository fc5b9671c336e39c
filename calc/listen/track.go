package listen

import (
	"bufio"
	"fmt"
	"io"
	"math"
)

// TrackPoint is the sound in one frame of a recording.
type TrackPoint struct {
	Time float64 // centre of the frame, s from the start
	// Frequency of the strongest peak in the frame, Hz (Hann window,
	// Grandke interpolation refined to the periodogram maximum); 0 when
	// Clear is false.
	Frequency float64
	// Level is the frame's rms level in dBFS, where a sine reaching full
	// scale reads 0 dBFS (the AES17 convention: 20 log10(√2 · rms)); at
	// least MinLevel.
	Level float64
	// Clear is true when the peak stands at least ClearPeak dB above the
	// median of the frame's spectrum (a tone, not noise).
	Clear bool
}

// MinLevel is the lowest level reported, dBFS (digital silence reads this).
const MinLevel = -150.0

// ClearPeak is how far (dB) a frame's peak must stand above the median of
// its spectrum to count as a tone. Common practice, no published source.
const ClearPeak = 20.0

// frameLen returns the frame length for the track: the power of two
// nearest 0.1 s (85 ms at 48 kHz, 128 ms at 8 kHz), at most n.
func frameLen(fs float64, n int) int {
	f := 1 << int(math.Round(math.Log2(0.1*fs)))
	for f > n && f > 16 {
		f /= 2
	}
	return f
}

// levelDB returns 20 log10(√2 · rms), at least MinLevel.
func levelDB(rms float64) float64 {
	if rms <= 0 {
		return MinLevel
	}
	return math.Max(MinLevel, 20*math.Log10(math.Sqrt2*rms))
}

// frames cuts x into Hann frames of length fl with half-frame hop and
// returns the frequency and level of each, searching lowHz–highHz.
func frames(x []float64, fs, lowHz, highHz float64) []TrackPoint {
	fl := frameLen(fs, len(x))
	hop := fl / 2
	sm := newSpectrometer(fl)
	var power, scratch []float64
	y := make([]float64, fl)
	var out []TrackPoint
	for s := 0; s+fl <= len(x); s += hop {
		seg := x[s : s+fl]
		var ss float64
		for _, v := range seg {
			ss += v * v
		}
		p := TrackPoint{Time: (float64(s) + float64(fl)/2) / fs, Level: levelDB(math.Sqrt(ss / float64(fl)))}
		sp := sm.of(seg, fs, power)
		power = sp.power
		lo, hi := sp.band(lowHz, highHz)
		if k := sp.peak(lo, hi); k > 0 && ss > 0 {
			if cap(scratch) < hi-lo+1 {
				scratch = make([]float64, 0, hi-lo+1)
			}
			med := sp.noisePowerBuf(lo, hi, k, 2, scratch) * math.Ln2 * sp.sumW2
			if med <= 0 || sp.power[k] >= med*math.Pow(10, ClearPeak/10) {
				p.Clear = true
				for i := range seg {
					y[i] = seg[i] * sm.w[i]
				}
				bin := 2 * math.Pi / float64(fl)
				p.Frequency = refinePeak(y, 2*math.Pi*sp.grandke(k)/fs, 0.6*bin, 2*math.Pi*lowHz/fs, 2*math.Pi*highHz/fs, 1e-3*bin) * fs / (2 * math.Pi)
			}
		}
		out = append(out, p)
	}
	return out
}

// WriteTrackCSV writes the track as comma-separated values with a header
// line: time_s, frequency_hz (empty where the frame has no clear tone) and
// level_dbfs.
func WriteTrackCSV(w io.Writer, track []TrackPoint) error {
	b := bufio.NewWriter(w)
	fmt.Fprintln(b, "time_s,frequency_hz,level_dbfs")
	for _, p := range track {
		f := ""
		if p.Clear {
			f = fmt.Sprintf("%.3f", p.Frequency)
		}
		fmt.Fprintf(b, "%.4f,%s,%.2f\n", p.Time, f, p.Level)
	}
	return b.Flush()
}
