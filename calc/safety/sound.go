package safety

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// ReferencePressure is the reference sound pressure in air, 20 µPa
// (IEC 61672-1 and ISO 80000-8 for sound pressure level).
const ReferencePressure = 20e-6

// SoundLevel is the level of a sinusoidal pressure oscillation.
type SoundLevel struct {
	Amplitude float64 // pressure amplitude (peak), Pa
	RMS       float64 // Amplitude/√2, Pa
	SPL       float64 // 20 log10(RMS/20 µPa), dB
	Peak      float64 // 20 log10(Amplitude/20 µPa), dB (peak sound pressure level)
	// Limits are the occupational limits with this level set against
	// them. The level inside a vessel is not a person's exposure: see
	// CautionHearing.
	Limits   []LimitCheck
	Cautions []string
}

// LimitCheck sets a level against one published occupational limit.
type LimitCheck struct {
	Name   string  // e.g. "EU 2003/10/EC upper exposure action value"
	Level  float64 // the limit, dB
	Metric string  // what the limit applies to, e.g. "8-hour daily exposure, dB(A)"
	Uses   string  // which of our levels is compared: "rms" or "peak"
	Over   bool    // our level is at or above the limit
}

// Occupational noise limits compared with (dB). EU Directive 2003/10/EC
// (noise), Article 3(1): "(a) exposure limit values: L_EX,8h = 87 dB(A) and
// p_peak = 200 Pa ... (b) upper exposure action values: L_EX,8h = 85 dB(A)
// and p_peak = 140 Pa ... (c) lower exposure action values: L_EX,8h =
// 80 dB(A) and p_peak = 112 Pa" (text of Article 3 as reproduced by CEJN,
// "Directive 2003/10/EC – Noise"); the directive's footnotes give the peak
// values as 140, 137 and 135 dB(C) re 20 µPa (as listed by Placid
// Instruments, "Noise at work: a practical guide to EU Directive
// 2003/10/EC"; 20 log10(200/20e-6) = 140 checks the first). US OSHA
// 29 CFR 1910.95: Table G-16, 90 dBA for 8 hours down to 115 dBA for
// 1/4 hour (osha.gov text of 1910.95); the 85 dBA 8-hour time-weighted
// average that starts monitoring and the hearing conservation programme
// (1910.95(c), (d); as summarised by Harvard EHS, "Noise"); impulsive or
// impact noise not to exceed 140 dB peak sound pressure level (Table G-16
// footnote, as quoted in the same wording by the Wyoming mine rule and
// secondary summaries; the osha.gov excerpt seen here stops before it).
var occupationalLimits = []LimitCheck{
	{Name: "EU 2003/10/EC lower exposure action value", Level: 80, Metric: "8-hour daily exposure, dB(A)", Uses: "rms"},
	{Name: "EU 2003/10/EC upper exposure action value", Level: 85, Metric: "8-hour daily exposure, dB(A)", Uses: "rms"},
	{Name: "EU 2003/10/EC exposure limit value", Level: 87, Metric: "8-hour daily exposure, dB(A), with hearing protection", Uses: "rms"},
	{Name: "EU 2003/10/EC lower action value, peak", Level: 135, Metric: "peak sound pressure, dB(C)", Uses: "peak"},
	{Name: "EU 2003/10/EC upper action value, peak", Level: 137, Metric: "peak sound pressure, dB(C)", Uses: "peak"},
	{Name: "EU 2003/10/EC exposure limit value, peak", Level: 140, Metric: "peak sound pressure, dB(C)", Uses: "peak"},
	{Name: "OSHA 1910.95 action level", Level: 85, Metric: "8-hour time-weighted average, dBA", Uses: "rms"},
	{Name: "OSHA 1910.95 permissible exposure limit", Level: 90, Metric: "8-hour time-weighted average, dBA", Uses: "rms"},
	{Name: "OSHA 1910.95 impulse or impact noise", Level: 140, Metric: "peak sound pressure level, dB", Uses: "peak"},
}

// Level returns the sound pressure levels of a sinusoidal oscillation of
// pressure amplitude A (Pa, peak, ≥ 0):
//
//	p_rms = A/√2,   SPL = 20 log10(p_rms/20 µPa),   peak = 20 log10(A/20 µPa)
//
// (peak = SPL + 3.01 dB for a sinusoid), set against the occupational
// limits above. The definition of sound pressure level: ISO 80000-8:2020,
// item 8-22, with the reference 20 µPa for air (from memory). No frequency
// weighting is applied. A-weighting lowers the level of low tones (by about
// 19 dB at 100 Hz, IEC 61672-1 table, from memory), so comparing an
// unweighted level with a dB(A) limit errs on the safe side below about
// 1 kHz; between about 1 and 5 kHz the weighting adds up to about 1 dB.
//
// Errors: A < 0 or not finite (*units.RangeError). A = 0 gives -Inf levels
// and is refused too.
func Level(A float64) (SoundLevel, error) {
	if err := positive("pressure amplitude", A, "Pa"); err != nil {
		return SoundLevel{}, err
	}
	s := SoundLevel{
		Amplitude: A,
		RMS:       A / math.Sqrt2,
		Cautions:  cautions(CautionHearing),
	}
	s.SPL = 20 * math.Log10(s.RMS/ReferencePressure)
	s.Peak = 20 * math.Log10(A/ReferencePressure)
	for _, l := range occupationalLimits {
		v := s.SPL
		if l.Uses == "peak" {
			v = s.Peak
		}
		l.Over = v >= l.Level
		s.Limits = append(s.Limits, l)
	}
	return s, nil
}

// AmplitudeOfSPL returns the pressure amplitude, Pa, of a sinusoid whose
// rms sound pressure level is L dB: A = √2 · 20 µPa · 10^(L/20).
func AmplitudeOfSPL(L float64) float64 {
	return math.Sqrt2 * ReferencePressure * math.Pow(10, L/20)
}

// OSHAMaxLevel is the highest sound level of OSHA 29 CFR 1910.95 Table
// G-16, dBA: "¼ or less" hour at 115 dBA. The table permits no exposure
// above it (a limit of 15 min per day at 115 dB is the usual reading, e.g.
// "Exposure Guidelines", progressivegardening.com); Appendix A's Table
// G-16a goes on to 130 dBA only to compute a dose from measured levels.
const OSHAMaxLevel = 115.0

// OSHAExposure is the OSHA 1910.95 permitted daily exposure at one level.
type OSHAExposure struct {
	Level     float64 // A-weighted level where the person stands, dBA
	Permitted bool    // false above OSHAMaxLevel (and for a level that is not a number)
	Hours     float64 // permitted hours per day; 0 when not permitted
	Note      string  // plain words, e.g. "not permitted: 120 dBA is above 115 dBA, the highest level of OSHA 1910.95 Table G-16"
}

// OSHAPermitted returns the daily exposure OSHA 1910.95 permits at a
// steady A-weighted level L (dBA):
//
//	T = 8 / 2^((L − 90)/5) hours   for L ≤ 115 dBA
//	no permitted time              for L > 115 dBA
//
// Table G-16 of 29 CFR 1910.95(b): 90 dBA 8 h, 92 6, 95 4, 97 3, 100 2,
// 102 1½, 105 1, 110 ½, 115 ¼ or less (as reproduced by CEJN, "OSHA
// 1910.95(b)(1)"); the formula is that of Appendix A, which reproduces the
// table's entries within its rounding. Above 115 dBA the result is "not
// permitted" with Hours 0, never an extrapolation. Below 90 dBA the
// formula's time is longer than a working day (the 85 dBA action level
// still applies: see the Limits of Level).
func OSHAPermitted(L float64) OSHAExposure {
	e := OSHAExposure{Level: L}
	switch {
	case math.IsNaN(L):
		e.Note = "not permitted: the level is not a number"
	case L > OSHAMaxLevel:
		e.Note = fmt.Sprintf("not permitted: %.1f dBA is above %g dBA, the highest level of OSHA 1910.95 Table G-16", L, OSHAMaxLevel)
	default:
		e.Permitted = true
		e.Hours = ReferenceDurationHours(L)
		e.Note = fmt.Sprintf("%s per day at %.1f dBA (OSHA 1910.95 Table G-16)", units.Format(e.Hours*3600, units.DimTime), L)
	}
	return e
}

// ReferenceDurationHours is the reference duration T of OSHA 1910.95
// Appendix A, hours, used to add up a daily dose from measured levels:
//
//	T = 8 / 2^((L − 90)/5)
//
// It reproduces Appendix A's Table G-16a (osha.gov, "Appendix A to
// § 1910.95 - Noise Exposure Computation"), 80 to 130 dBA. It is not a
// permitted time above 115 dBA: use OSHAPermitted for that.
func ReferenceDurationHours(L float64) float64 {
	return 8 / math.Pow(2, (L-90)/5)
}

// PermittedHours returns the daily exposure time, hours, allowed at a
// steady A-weighted level L (dB(A)) where a person stands:
//
//	OSHA 1910.95, Table G-16:   T = 8 / 2^((L − 90)/5) up to 115 dBA,
//	                            0 (not permitted) above (see OSHAPermitted)
//	EU 2003/10/EC, equal energy: T = 8 × 10^((87 − L)/10)
//
// The EU value is the time that brings L_EX,8h to the 87 dB(A) exposure
// limit value, which takes hearing protection into account; the upper
// action value 85 dB(A) already requires protection to be worn. Sources:
// 29 CFR 1910.95 Table G-16 and Appendix A (formula T = 8/2^((L−90)/5));
// Directive 2003/10/EC Article 2 (L_EX,8h definition, from memory). An
// osha of 0 means no permitted time: OSHAPermitted says so in words.
func PermittedHours(L float64) (osha, eu float64) {
	osha = OSHAPermitted(L).Hours
	eu = 8 * math.Pow(10, (87-L)/10)
	return osha, eu
}
