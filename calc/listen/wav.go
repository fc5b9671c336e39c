package listen

import (
	"bufio"
	"encoding/binary"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
)

// WAV format codes (Microsoft and IBM, Multimedia Programming Interface and
// Data Specifications 1.0, 1991, "WAVE Form Definition"; Microsoft,
// "Multiple Channel Audio Data and WAVE Files", 2007, for
// WAVE_FORMAT_EXTENSIBLE and its sub-format GUIDs).
const (
	formatPCM        = 0x0001
	formatFloat      = 0x0003
	formatExtensible = 0xFFFE
)

// guidTail is bytes 2–15 of the KSDATAFORMAT_SUBTYPE GUIDs: the sub-format
// GUID of a WAVE_FORMAT_EXTENSIBLE file is the format code (2 bytes, little
// endian) followed by these.
var guidTail = [14]byte{0x00, 0x00, 0x00, 0x00, 0x10, 0x00, 0x80, 0x00, 0x00, 0xAA, 0x00, 0x38, 0x9B, 0x71}

// fmtChunk is the part of the "fmt " chunk the reader uses.
type fmtChunk struct {
	format     uint16
	channels   int
	rate       float64
	blockAlign int
	bits       int // container bits per sample
	validBits  int // significant bits (WAVE_FORMAT_EXTENSIBLE), else bits
}

// ReadWAVFile opens path and reads it with ReadWAV.
func ReadWAVFile(path string) (*Recording, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	return ReadWAV(f)
}

// ReadWAV decodes a RIFF/WAVE recording and mixes it to mono.
//
// Accepted: integer PCM of 8 (unsigned), 16, 24 and 32 bits and IEEE float
// of 32 and 64 bits, each plain (format 1 or 3) or as WAVE_FORMAT_EXTENSIBLE
// with the PCM or float sub-format; one or two channels (two are averaged);
// sample rates from MinSampleRate to MaxSampleRate. Chunks other than
// "fmt " and "data" are skipped. A data chunk that claims more bytes than
// the file holds (a recording cut short, or a streaming writer's size
// 0xFFFFFFFF) is read to the end of the file and noted in Recording.Notes.
// Layout from Microsoft and IBM, Multimedia Programming Interface and Data
// Specifications 1.0 (1991), and Microsoft, "Multiple Channel Audio Data
// and WAVE Files" (2007).
//
// Errors wrap ErrNotWAV (wrong signature, broken chunk structure),
// ErrUnsupported (with the encoding found), ErrEmpty (no or too few
// samples) or ErrTooLong (beyond MaxDuration or MaxSamples; checked from
// the header before decoding where the header says the size). Silence is
// found by Analyze, not here.
func ReadWAV(r io.Reader) (*Recording, error) {
	br := bufio.NewReaderSize(r, 1<<16)
	var head [12]byte
	if n, err := io.ReadFull(br, head[:]); err != nil {
		if n == 0 {
			return nil, fmt.Errorf("%w: the file is empty", ErrEmpty)
		}
		return nil, fmt.Errorf("%w: only %d bytes, shorter than a WAV header", ErrNotWAV, n)
	}
	if string(head[0:4]) != "RIFF" || string(head[8:12]) != "WAVE" {
		if string(head[0:4]) == "RF64" {
			return nil, fmt.Errorf("%w: RF64 (a WAV over 4 GB) is not read; cut the recording shorter", ErrUnsupported)
		}
		return nil, fmt.Errorf("%w: the file starts with %q, not RIFF…WAVE", ErrNotWAV, printable(head[:]))
	}
	var fc *fmtChunk
	for {
		var ch [8]byte
		if _, err := io.ReadFull(br, ch[:]); err != nil {
			if fc == nil {
				return nil, fmt.Errorf("%w: no fmt chunk (the file ends before saying how its samples are stored)", ErrNotWAV)
			}
			return nil, fmt.Errorf("%w: the file has a header but no audio data chunk", ErrEmpty)
		}
		id := string(ch[0:4])
		size := binary.LittleEndian.Uint32(ch[4:8])
		switch id {
		case "fmt ":
			if fc != nil {
				return nil, fmt.Errorf("%w: two fmt chunks", ErrNotWAV)
			}
			f, err := readFmt(br, size)
			if err != nil {
				return nil, err
			}
			fc = f
		case "data":
			if fc == nil {
				return nil, fmt.Errorf("%w: the audio data comes before the fmt chunk that says how it is stored", ErrNotWAV)
			}
			return readData(br, fc, size)
		default:
			if err := skip(br, int64(size)+int64(size&1)); err != nil {
				return nil, fmt.Errorf("%w: chunk %q runs past the end of the file before any audio", ErrNotWAV, printable(ch[0:4]))
			}
		}
	}
}

func skip(r io.Reader, n int64) error {
	m, err := io.CopyN(io.Discard, r, n)
	if m == n {
		return nil
	}
	if err == nil {
		err = io.ErrUnexpectedEOF
	}
	return err
}

// printable shows bytes for a message, replacing non-printing ones by '?'.
func printable(b []byte) string {
	s := make([]byte, len(b))
	for i, c := range b {
		if c < 0x20 || c > 0x7e {
			c = '?'
		}
		s[i] = c
	}
	return string(s)
}

func readFmt(r io.Reader, size uint32) (*fmtChunk, error) {
	if size < 16 {
		return nil, fmt.Errorf("%w: the fmt chunk is %d bytes, shorter than the 16 it needs", ErrNotWAV, size)
	}
	if size > 1<<16 {
		return nil, fmt.Errorf("%w: the fmt chunk claims %d bytes", ErrNotWAV, size)
	}
	b := make([]byte, int(size)+int(size&1))
	if _, err := io.ReadFull(r, b); err != nil {
		return nil, fmt.Errorf("%w: the file ends inside the fmt chunk", ErrNotWAV)
	}
	le := binary.LittleEndian
	f := &fmtChunk{
		format:     le.Uint16(b[0:2]),
		channels:   int(le.Uint16(b[2:4])),
		rate:       float64(le.Uint32(b[4:8])),
		blockAlign: int(le.Uint16(b[12:14])),
		bits:       int(le.Uint16(b[14:16])),
	}
	f.validBits = f.bits
	if f.format == formatExtensible {
		if size < 40 {
			return nil, fmt.Errorf("%w: a WAVE_FORMAT_EXTENSIBLE fmt chunk of %d bytes (needs 40)", ErrNotWAV, size)
		}
		if vb := int(le.Uint16(b[18:20])); vb > 0 && vb <= f.bits {
			f.validBits = vb
		}
		sub := le.Uint16(b[24:26])
		if [14]byte(b[26:40]) != guidTail {
			return nil, fmt.Errorf("%w: WAVE_FORMAT_EXTENSIBLE with a sub-format that is neither PCM nor IEEE float", ErrUnsupported)
		}
		f.format = sub
	}
	switch f.format {
	case formatPCM, formatFloat:
	default:
		return nil, fmt.Errorf("%w: format code 0x%04X is a compressed or special encoding; save the recording as PCM (8, 16, 24 or 32 bit) or 32-bit float", ErrUnsupported, f.format)
	}
	if f.channels < 1 || f.channels > 2 {
		return nil, fmt.Errorf("%w: %d channels; only mono or stereo is read", ErrUnsupported, f.channels)
	}
	if err := checkRate(f.rate); err != nil {
		return nil, err
	}
	if f.blockAlign <= 0 || f.blockAlign%f.channels != 0 {
		return nil, fmt.Errorf("%w: block size %d bytes does not fit %d channels", ErrNotWAV, f.blockAlign, f.channels)
	}
	cb := f.blockAlign / f.channels // container bytes per sample
	f.bits = cb * 8
	if f.validBits > f.bits || f.validBits <= 0 {
		f.validBits = f.bits
	}
	switch {
	case f.format == formatPCM && cb >= 1 && cb <= 4:
	case f.format == formatFloat && (cb == 4 || cb == 8):
	default:
		kind := "PCM"
		if f.format == formatFloat {
			kind = "float"
		}
		return nil, fmt.Errorf("%w: %d-bit %s; read are PCM of 8, 16, 24 or 32 bits and float of 32 or 64 bits", ErrUnsupported, f.bits, kind)
	}
	return f, nil
}

// readData decodes the data chunk of declared size bytes.
func readData(r io.Reader, f *fmtChunk, size uint32) (*Recording, error) {
	ba := f.blockAlign
	streaming := size == 0xFFFFFFFF
	if !streaming {
		if err := checkLength(int(size)/ba, f.rate); errors.Is(err, ErrTooLong) {
			return nil, err
		}
	}
	limit := int64(MaxSamples) + 1
	if d := int64(MaxDuration*f.rate) + 1; d < limit {
		limit = d
	}
	want := int64(size) / int64(ba)
	if streaming || want > limit {
		want = limit
	}
	rec := &Recording{
		SampleRate: f.rate,
		Channels:   f.channels,
		Encoding:   Encoding{Float: f.format == formatFloat, Bits: f.bits},
		Samples:    make([]float64, 0, min(want, 1<<16)),
	}
	dec := decoder(f)
	clips := make([]clipCounter, f.channels)
	for i := range clips {
		clips[i].rail = 1 - 1.5/math.Exp2(float64(f.validBits-1))
		if rec.Encoding.Float {
			clips[i].rail = 1 - 1.0/32768
		}
	}
	buf := make([]byte, ba*4096)
	var got int64
	for got < want {
		n := min(int64(len(buf)/ba), want-got)
		m, err := io.ReadFull(r, buf[:n*int64(ba)])
		frames := m / ba
		for k := range frames {
			var sum float64
			for c := range f.channels {
				v := dec(buf[k*ba+c*(ba/f.channels):])
				if math.IsNaN(v) || math.IsInf(v, 0) {
					v = 0
				}
				clips[c].add(v)
				rec.Peak = math.Max(rec.Peak, math.Abs(v))
				sum += v
			}
			rec.Samples = append(rec.Samples, sum/float64(f.channels))
		}
		got += int64(frames)
		if err != nil {
			if !streaming {
				rec.Notes = append(rec.Notes, fmt.Sprintf("the data chunk says %d samples but the file ends after %d (recording cut short?); analysed what is there", int64(size)/int64(ba), got))
			}
			break
		}
	}
	for i := range clips {
		clips[i].end()
		rec.ClippedRuns += clips[i].runs
		rec.ClippedSamples += clips[i].samples
	}
	if err := checkLength(len(rec.Samples), rec.SampleRate); err != nil {
		return nil, err
	}
	return rec, nil
}

// decoder returns the function that reads one sample (full scale ±1) from
// the start of b.
func decoder(f *fmtChunk) func(b []byte) float64 {
	le := binary.LittleEndian
	switch {
	case f.format == formatFloat && f.bits == 32:
		return func(b []byte) float64 { return float64(math.Float32frombits(le.Uint32(b))) }
	case f.format == formatFloat:
		return func(b []byte) float64 { return math.Float64frombits(le.Uint64(b)) }
	case f.bits == 8: // unsigned, 128 is zero
		return func(b []byte) float64 { return (float64(b[0]) - 128) / 128 }
	case f.bits == 16:
		return func(b []byte) float64 { return float64(int16(le.Uint16(b))) / (1 << 15) }
	case f.bits == 24:
		return func(b []byte) float64 {
			v := int32(uint32(b[0])<<8|uint32(b[1])<<16|uint32(b[2])<<24) >> 8
			return float64(v) / (1 << 23)
		}
	default: // 32-bit PCM
		return func(b []byte) float64 { return float64(int32(le.Uint32(b))) / (1 << 31) }
	}
}
