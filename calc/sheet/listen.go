package sheet

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/listen"
	"tubewright/calc/units"
)

// IDListen identifies the calculator that hears a tube from a recording.
const IDListen ID = "listen"

// listenSheet is the recording calculator: from a WAV recording of the
// tube, its resonance frequency with ±, the ring-down's decay time and Q,
// the harmonics, and frequency and level against time (calc/listen's
// Analyze). The app's screen opens a file by its path or, in the browser,
// records from the microphone and analyses the recording with ListenTo.
var listenSheet = &Sheet{
	ID:      IDListen,
	Title:   "Listen to the tube",
	Summary: "From a recording of the tube: its frequency with ±, and after a tap its decay time and Q, with the harmonics and the pitch against time",
	Inputs: []Input{
		{Key: "file", Label: "Recording (WAV file)", Kind: Text, Positional: true, Example: "tap.wav",
			Hint: fmt.Sprintf("a WAV recording: PCM 8, 16, 24 or 32 bit or 32-bit float, mono or stereo, at most %.0f minutes", listen.MaxDuration/60)},
		{Key: "lowest", Label: "Lowest frequency searched", Kind: Quantity, Dim: units.DimFrequency, Default: "20 Hz",
			Min: 1, Max: listen.MaxSampleRate / 2, Advanced: true,
			Hint: "the search for the resonance starts here, e.g. 20 Hz; raise it above hum or wind noise"},
		{Key: "highest", Label: "Highest frequency searched", Kind: Quantity, Dim: units.DimFrequency, Optional: true,
			Min: 1, Max: listen.MaxSampleRate / 2, Advanced: true,
			Hint: "the search ends here; empty means 20 kHz or 0.45 × the sample rate, whichever is lower"},
		{Key: "clock-ppm", Label: "Sample clock tolerance, ppm", Kind: Number, Default: "100",
			Min: 0, Max: listen.MaxClockTolerance * 1e6, Advanced: true,
			Hint: "how far the recorder's sample rate may be from its nominal rate, in parts per million; it adds f × tolerance / √3 to the frequency's ±. " +
				"100 ppm is a common figure for ordinary sound cards and phones (common practice, no published source); 0 for a recorder checked against a reference"},
		{Key: "track", Label: "Frequency and level against time as a table", Kind: Switch,
			Hint: "give the frequency and level of each frame (about 0.1 s, half overlapping) as a table, e.g. for an engine warming up to onset"},
	},
	About: "The strongest peak of the loud part of the recording (Hann window; Grandke 1983 interpolation on gonum's FFT), refined by a least-squares sine fit " +
		"with the measured envelope as its amplitude (the periodogram maximum of Rife & Boorstyn 1974, variable projection of Golub & Pereyra 1973). " +
		"The ± is one standard deviation from the noise and the width of the peak, combined with how much the pitch wandered and with the sample clock's tolerance (uniform over ± the tolerance, GUM 4.3.7). " +
		"The decay time is the amplitude 1/e time of a straight-line fit to the log of the envelope (complex demodulation, Bingham, Godfrey & Tukey 1967); Q = π f τ. " +
		"Checked against tones and a filtered click made by sox. Levels are dBFS (0 dBFS: a sine reaching full scale), never dB SPL: a recording cannot tell how loud the tube was.",
	Examples: []string{
		"twcalc listen tap.wav",
		"twcalc listen warmup.wav --lowest 50Hz --highest 2kHz --json",
		"twcalc listen warmup.wav --track > warmup.csv",
	},
	Run: runListen,
}

// listenTrackNote says how the track table marks frames without a tone.
const listenTrackNote = "In the track table, frequency_Hz is 0 where the frame holds no clear tone."

func runListen(v *Values) (*Result, error) {
	path := strings.TrimSpace(v.Text("file"))
	if path == "" {
		return nil, v.Blame(errors.New("give the WAV file to analyse"), "file")
	}
	rec, err := listen.ReadWAVFile(path)
	if err != nil {
		return nil, v.Blame(err, "file")
	}
	return analyseListen(v, rec)
}

// ListenTo returns the recording calculator analysing rec instead of
// reading the file its "file" input names: what the app uses for a
// recording it holds in memory (made from the microphone in the browser).
// The "file" text stays the recording's name; the other inputs, the rows,
// warnings and cautions are the description's own. rec must not change
// while the sheet is in use.
func ListenTo(rec *listen.Recording) *Sheet {
	s := *listenSheet
	s.Run = func(v *Values) (*Result, error) {
		if rec == nil {
			return nil, v.Blame(errors.New("no recording to analyse"), "file")
		}
		return analyseListen(v, rec)
	}
	return &s
}

// analyseListen runs calc/listen's Analyze on rec with the band of v and
// writes the rows.
func analyseListen(v *Values, rec *listen.Recording) (*Result, error) {
	nyquist := rec.SampleRate / 2
	s := &listen.Settings{MinFrequency: v.SI("lowest"), ClockTolerance: v.Number("clock-ppm") * 1e-6}
	if s.MinFrequency >= nyquist {
		return nil, v.Blame(units.NewRangeError("lowest frequency", s.MinFrequency, 1, nyquist, "Hz"), "lowest")
	}
	if v.Has("highest") {
		s.MaxFrequency = v.SI("highest")
		if s.MaxFrequency <= s.MinFrequency || s.MaxFrequency > nyquist {
			return nil, v.Blame(units.NewRangeError("highest frequency", s.MaxFrequency, s.MinFrequency, nyquist, "Hz"), "highest")
		}
	}
	a, err := listen.Analyze(rec, s)
	if err != nil {
		return nil, v.Blame(err, "file")
	}

	r := &Result{}
	channels := "mono"
	if rec.Channels == 2 {
		channels = "stereo mixed to mono"
	}
	r.DeriveWords("encoding", "Recording", fmt.Sprintf("%s, %s, %g samples per second", rec.Encoding, channels, rec.SampleRate))
	r.Derive("duration", "Length", a.Duration, units.DimTime)

	r.AddPM("frequency", "Frequency", a.Frequency, a.FrequencyUncertainty, units.DimFrequency)
	if a.DecayFound {
		r.AddPM("decay_time", "Decay time (amplitude 1/e)", a.DecayTime, a.DecayTimeUncertainty, units.DimTime)
		r.AddPM("quality_factor", "Quality factor Q = π f τ", a.QualityFactor, a.QualityFactorUncertainty, units.DimNone)
	}
	r.Add("snr_dB", "Tone above the noise near it, dB", a.SNR, units.DimNone)
	r.Add("peak_level_dBFS", "Loudest sample, dBFS", a.PeakLevel, units.DimNone)
	r.AddObject("harmonics", "Harmonics", listenHarmonics(a.Harmonics), harmonicsText(a.Harmonics))
	switch {
	case a.Clipped:
		r.Check("clipping", "Clipping", "clipped", Fail, "flat tops at full scale: record again farther from the tube or with lower gain")
	case a.NearFullScale:
		r.Check("clipping", "Clipping", "near full scale", Warn, "the loudest sample is within 1 dB of full scale")
	default:
		r.Check("clipping", "Clipping", "none", Pass, "the loudest sample is more than 1 dB below full scale")
	}

	if v.On("track") {
		t := &Table{Header: []string{"time_s", "frequency_Hz", "level_dBFS"}}
		for _, p := range a.Track {
			f := 0.0
			if p.Clear {
				f = p.Frequency
			}
			t.Rows = append(t.Rows, []float64{p.Time, f, p.Level})
		}
		r.Table = t
		r.Note(listenTrackNote)
	}
	r.Warn(a.Warnings...)
	r.Caution(a.Cautions...)
	return r, nil
}

// ListenHarmonic is one entry of the "harmonics" result: JSON
// {"number": 2, "frequency_Hz": 1046.6, "level_dB": -12.3}, the level
// relative to the resonance peak.
type ListenHarmonic struct {
	Number    int     `json:"number"`
	Frequency float64 `json:"frequency_Hz"`
	Level     float64 `json:"level_dB"`
}

func listenHarmonics(h []listen.Harmonic) []ListenHarmonic {
	out := make([]ListenHarmonic, len(h))
	for i, x := range h {
		out[i] = ListenHarmonic{Number: x.Number, Frequency: x.Frequency, Level: x.Level}
	}
	return out
}

// harmonicsText reads like "2 × at 1046.6 Hz, -12 dB; 3 × at 1570.1 Hz, -30 dB".
func harmonicsText(h []listen.Harmonic) string {
	if len(h) == 0 {
		return "none above the noise"
	}
	parts := make([]string, len(h))
	for i, x := range h {
		parts[i] = fmt.Sprintf("%d × at %s, %.0f dB", x.Number, units.Format(x.Frequency, units.DimFrequency), x.Level)
	}
	return strings.Join(parts, "; ")
}
