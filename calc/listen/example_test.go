package listen_test

import (
	"fmt"
	"math"
	"os"

	"tubewright/calc/listen"
	"tubewright/calc/units"
)

// A ring-down recorded to a WAV file: here one made by sox (a click through
// a band-pass filter at 523.3 Hz, see testdata/gen_listen_sox.sh).
func ExampleAnalyze() {
	rec, err := listen.ReadWAVFile("../../testdata/listen_sox_ring16.wav")
	if err != nil {
		fmt.Println(err)
		return
	}
	r, err := listen.Analyze(rec, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s, %s\n", rec.Encoding, units.Format(rec.SampleRate, units.DimFrequency))
	fmt.Println("frequency", units.FormatPM(r.Frequency, r.FrequencyUncertainty, units.DimFrequency))
	fmt.Printf("decay time %.1f ms, Q %.0f\n", r.DecayTime*1e3, r.QualityFactor)
	// Output:
	// 16-bit PCM, 8000 Hz
	// frequency 523.27672 ± 0.00008 Hz
	// decay time 31.3 ms, Q 51
}

// Frequency and level against time, as CSV, for a tone that starts after
// a quarter of a second. Frames are 128 ms long at 8 kHz, one every 64 ms;
// the frame that holds the start of the tone reads low (it hears only its
// last few cycles).
func ExampleWriteTrackCSV() {
	x := make([]float64, 4000) // 0.5 s at 8 kHz
	for i := 2000; i < len(x); i++ {
		x[i] = 0.5 * math.Sin(2*math.Pi*440*float64(i)/8000)
	}
	for i := range x {
		x[i] += 1e-4 * math.Sin(float64(i*i)) // a little hiss
	}
	rec, _ := listen.NewRecording(x, 8000)
	r, err := listen.Analyze(rec, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	_ = listen.WriteTrackCSV(os.Stdout, r.Track)
	// Output:
	// time_s,frequency_hz,level_dbfs
	// 0.0640,,-79.98
	// 0.1280,,-80.00
	// 0.1920,437.892,-19.49
	// 0.2560,439.926,-8.64
	// 0.3200,440.000,-6.01
	// 0.3840,440.000,-6.03
}
