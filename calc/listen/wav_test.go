package listen

import (
	"bytes"
	"encoding/binary"
	"errors"
	"math"
	"os"
	"path/filepath"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// Each encoding written by the test encoder reads back within half a
// quantisation step (integer PCM: full scale 2^(bits-1) codes, 8-bit
// unsigned with 128 as zero, as the WAVE specification of 1991 says).
func TestReadWAVEncodings(t *testing.T) {
	t.Parallel()
	x := tone{Rate: 11025, Length: 0.2, Freq: 523.1, Amp: 0.6, Noise: 0.01, Seed: 4}.samples()
	cases := []struct {
		spec wavSpec
		tol  float64
	}{
		{wavSpec{Bits: 8, Rate: 11025}, 0.5 / 128},
		{wavSpec{Bits: 16, Rate: 11025}, 0.5 / 32768},
		{wavSpec{Bits: 24, Rate: 11025}, 0.5 / (1 << 23)},
		{wavSpec{Bits: 32, Rate: 11025}, 0.5 / (1 << 31)},
		{wavSpec{Float: true, Bits: 32, Rate: 11025}, 1e-7},
		{wavSpec{Float: true, Bits: 64, Rate: 11025}, 0},
		{wavSpec{Bits: 16, Rate: 11025, Extensible: true}, 0.5 / 32768},
		{wavSpec{Bits: 24, Rate: 11025, Extensible: true}, 0.5 / (1 << 23)},
		{wavSpec{Float: true, Bits: 32, Rate: 11025, Extensible: true}, 1e-7},
	}
	for _, c := range cases {
		rec, err := readBytes(encodeWAV(c.spec, x))
		if err != nil {
			t.Errorf("%+v: %v", c.spec, err)
			continue
		}
		if rec.SampleRate != 11025 || rec.Channels != 1 || len(rec.Samples) != len(x) ||
			rec.Encoding.Float != c.spec.Float || rec.Encoding.Bits != c.spec.Bits {
			t.Errorf("%+v: read %g Hz, %d channels, %d samples, %v", c.spec, rec.SampleRate, rec.Channels, len(rec.Samples), rec.Encoding)
			continue
		}
		for i := range x {
			if !scalar.EqualWithinAbs(rec.Samples[i], x[i], c.tol+1e-15) {
				t.Errorf("%+v: sample %d = %.9g, want %.9g ± %g", c.spec, i, rec.Samples[i], x[i], c.tol)
				break
			}
		}
		if len(rec.Notes) != 0 {
			t.Errorf("%+v: notes %q, want none (the LIST chunk is skipped quietly)", c.spec, rec.Notes)
		}
	}
}

// Stereo is the mean of the channels.
func TestReadWAVStereo(t *testing.T) {
	t.Parallel()
	l := []float64{0.5, -0.25, 0.125, 0, 1 - 1.0/32768}
	r := []float64{-0.5, 0.25, 0.375, -1, -1}
	for range 20 { // at least MinSamples frames
		l, r = append(l, l[:5]...), append(r, r[:5]...)
	}
	rec, err := readBytes(encodeWAV(wavSpec{Bits: 16, Rate: 8000}, l, r))
	if err != nil {
		t.Fatal(err)
	}
	want := []float64{0, 0, 0.25, -0.5, -0.5 / 32768}
	for i, w := range want {
		if !scalar.EqualWithinAbs(rec.Samples[i], w, 1e-12) {
			t.Errorf("sample %d = %g, want %g", i, rec.Samples[i], w)
		}
	}
	if rec.Channels != 2 || rec.Peak != 1 {
		t.Errorf("channels %d peak %g, want 2 and 1", rec.Channels, rec.Peak)
	}
}

// Every kind of bad file gives its own error, and the message names the
// detail.
func TestReadWAVErrors(t *testing.T) {
	t.Parallel()
	x := tone{Rate: 8000, Length: 0.1, Freq: 500, Amp: 0.5}.samples()
	good := encodeWAV(wavSpec{Bits: 16, Rate: 8000}, x)
	le := binary.LittleEndian
	patch := func(off int, v uint16) []byte {
		b := bytes.Clone(good)
		le.PutUint16(b[off:], v)
		return b
	}
	patch32 := func(off int, v uint32) []byte {
		b := bytes.Clone(good)
		le.PutUint32(b[off:], v)
		return b
	}
	dataAt := bytes.Index(good, []byte("data"))
	noData := bytes.Clone(good[:dataAt])
	tooLong := bytes.Clone(good)
	le.PutUint32(tooLong[dataAt+4:], uint32(2*8000*601)) // 601 s claimed
	cases := []struct {
		name   string
		b      []byte
		want   error
		detail string
	}{
		{"empty file", nil, ErrEmpty, "empty"},
		{"a few bytes", []byte("RIFF"), ErrNotWAV, "4 bytes"},
		{"a text file", []byte("time,frequency\n0,440\n"), ErrNotWAV, "time,frequen"},
		{"AIFF", append([]byte("FORM\x00\x00\x00\x10AIFF"), make([]byte, 16)...), ErrNotWAV, "FORM"},
		{"RF64", append([]byte("RF64\xff\xff\xff\xffWAVE"), make([]byte, 16)...), ErrUnsupported, "RF64"},
		{"μ-law", patch(20, 7), ErrUnsupported, "0x0007"},
		{"ADPCM", patch(20, 2), ErrUnsupported, "compressed"},
		{"three channels", patch(22, 3), ErrUnsupported, "3 channels"},
		{"rate 100 Hz", patch32(24, 100), ErrUnsupported, "100 Hz"},
		{"float of 16 bits", patch(20, 3), ErrUnsupported, "16-bit float"},
		{"no fmt chunk", []byte("RIFF\x04\x00\x00\x00WAVE"), ErrNotWAV, "no fmt"},
		{"fmt only", noData, ErrEmpty, "no audio data"},
		{"data before fmt", append([]byte("RIFF\x10\x00\x00\x00WAVEdata\x00\x00\x00\x00"), good[12:]...), ErrNotWAV, "before the fmt"},
		{"claims 601 s", tooLong, ErrTooLong, "601"},
		{"data chunk of 0 bytes", patch32(dataAt+4, 0)[:dataAt+8], ErrEmpty, "no samples"},
	}
	for _, c := range cases {
		_, err := readBytes(c.b)
		if !errors.Is(err, c.want) {
			t.Errorf("%s: error %v, want %v", c.name, err, c.want)
			continue
		}
		if !bytes.Contains([]byte(err.Error()), []byte(c.detail)) {
			t.Errorf("%s: message %q does not name %q", c.name, err, c.detail)
		}
	}
}

// A data chunk cut short is read up to the end, with a note.
func TestReadWAVTruncated(t *testing.T) {
	t.Parallel()
	x := tone{Rate: 8000, Length: 0.1, Freq: 500, Amp: 0.5}.samples()
	b := encodeWAV(wavSpec{Bits: 16, Rate: 8000}, x)
	rec, err := readBytes(b[:len(b)-201]) // 100 whole samples and one byte less
	if err != nil {
		t.Fatal(err)
	}
	if len(rec.Samples) != len(x)-101 || !containsText(rec.Notes, "cut short") {
		t.Errorf("%d samples (want %d), notes %q", len(rec.Samples), len(x)-101, rec.Notes)
	}
	// a streaming writer's size 0xFFFFFFFF reads to the end without a note
	dataAt := bytes.Index(b, []byte("data"))
	binary.LittleEndian.PutUint32(b[dataAt+4:], 0xFFFFFFFF)
	rec, err = readBytes(b)
	if err != nil || len(rec.Samples) != len(x) || containsText(rec.Notes, "cut short") {
		t.Errorf("streaming size: %v, %d samples, notes %q", err, len(rec.Samples), rec.Notes)
	}
}

// ReadWAVFile reads from a path and reports a missing file.
func TestReadWAVFile(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	x := tone{Rate: 8000, Length: 0.1, Freq: 500, Amp: 0.5}.samples()
	p := filepath.Join(dir, "t.wav")
	if err := os.WriteFile(p, encodeWAV(wavSpec{Bits: 24, Rate: 8000}, x), 0o644); err != nil {
		t.Fatal(err)
	}
	rec, err := ReadWAVFile(p)
	if err != nil || len(rec.Samples) != len(x) {
		t.Fatalf("%v, %v", rec, err)
	}
	if _, err := ReadWAVFile(filepath.Join(dir, "none.wav")); !errors.Is(err, os.ErrNotExist) {
		t.Errorf("missing file: %v", err)
	}
}

// Clipped runs: three or more samples in a row at the rail, in any channel.
func TestReadWAVClipRuns(t *testing.T) {
	t.Parallel()
	x := make([]float64, 100)
	y := make([]float64, 100)
	copy(x[10:], []float64{1, 1, 1, 1})       // one run of 4 (the largest code)
	copy(x[30:], []float64{-1, -1})           // 2: not a run
	copy(y[50:], []float64{-1, -1, -1})       // a run of 3 in the right channel
	copy(y[70:], []float64{0.99, 0.99, 0.99}) // below the rail
	rec, err := readBytes(encodeWAV(wavSpec{Bits: 16, Rate: 8000}, x, y))
	if err != nil {
		t.Fatal(err)
	}
	if rec.ClippedRuns != 2 || rec.ClippedSamples != 7 {
		t.Errorf("clipped runs %d samples %d, want 2 and 7", rec.ClippedRuns, rec.ClippedSamples)
	}
	if math.Abs(rec.Peak-1) > 1e-12 {
		t.Errorf("peak %g", rec.Peak)
	}
}
