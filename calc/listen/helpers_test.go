package listen

import (
	"bytes"
	"encoding/binary"
	"math"
	"math/rand/v2"
)

// tone describes a synthetic recording: silence, then a sinusoid that
// starts at Onset and decays with amplitude time constant Tau (0: steady),
// with a second harmonic, in white Gaussian noise of standard deviation
// Noise (full scale 1).
type tone struct {
	Rate      float64 // Hz
	Length    float64 // s
	Freq      float64 // Hz
	Amp       float64 // amplitude at onset, full scale 1
	Tau       float64 // amplitude 1/e decay time, s; 0 for a steady tone
	Onset     float64 // s
	Harmonic2 float64 // amplitude of 2f relative to f
	Noise     float64 // noise standard deviation
	Hold      float64 // s the amplitude stays at Amp before decaying (a drive switched off)
	Click     float64 // amplitude of a 20-sample noise burst at the onset (the tap itself)
	Seed      uint64
}

func (t tone) samples() []float64 {
	n := int(t.Rate * t.Length)
	x := make([]float64, n)
	r := rand.New(rand.NewPCG(t.Seed, 7))
	for i := range x {
		tt := float64(i) / t.Rate
		if tt >= t.Onset {
			d := tt - t.Onset
			a := t.Amp
			if t.Tau > 0 && d > t.Hold {
				a *= math.Exp(-(d - t.Hold) / t.Tau)
			}
			x[i] = a * (math.Sin(2*math.Pi*t.Freq*d+0.3) + t.Harmonic2*math.Sin(4*math.Pi*t.Freq*d+1.1))
		}
		x[i] += t.Noise * r.NormFloat64()
		if on := int(math.Ceil(t.Onset * t.Rate)); t.Click > 0 && i >= on && i < on+20 {
			x[i] += t.Click * r.NormFloat64()
		}
	}
	return x
}

// wavSpec is how the test encoder writes a WAV file.
type wavSpec struct {
	Float      bool
	Bits       int // 8, 16, 24, 32 (PCM) or 32, 64 (float)
	Extensible bool
	Rate       int
}

// encodeWAV writes channels (each a slice of samples, full scale ±1) as a
// WAV file, with an extra "LIST" chunk before the data to exercise
// skipping.
func encodeWAV(spec wavSpec, channels ...[]float64) []byte {
	nc := len(channels)
	bps := spec.Bits / 8
	var data bytes.Buffer
	le := binary.LittleEndian
	for i := range channels[0] {
		for _, ch := range channels {
			v := ch[i]
			switch {
			case spec.Float && spec.Bits == 32:
				_ = binary.Write(&data, le, math.Float32bits(float32(v)))
			case spec.Float:
				_ = binary.Write(&data, le, math.Float64bits(v))
			default:
				full := math.Exp2(float64(spec.Bits - 1))
				q := math.Round(v * full)
				q = math.Max(-full, math.Min(full-1, q))
				iv := int64(q)
				switch spec.Bits {
				case 8:
					data.WriteByte(byte(iv + 128))
				case 16:
					_ = binary.Write(&data, le, int16(iv))
				case 24:
					data.Write([]byte{byte(iv), byte(iv >> 8), byte(iv >> 16)})
				case 32:
					_ = binary.Write(&data, le, int32(iv))
				}
			}
		}
	}
	var f bytes.Buffer
	code := uint16(formatPCM)
	if spec.Float {
		code = formatFloat
	}
	fmtLen := uint32(16)
	if spec.Extensible {
		fmtLen = 40
	}
	list := []byte("INFOISFT\x05\x00\x00\x00test\x00\x00") // odd-sized sub-chunk padded
	total := 4 + (8 + fmtLen) + (8 + uint32(len(list))) + (8 + uint32(data.Len()))
	f.WriteString("RIFF")
	_ = binary.Write(&f, le, total)
	f.WriteString("WAVE")
	f.WriteString("fmt ")
	_ = binary.Write(&f, le, fmtLen)
	if spec.Extensible {
		_ = binary.Write(&f, le, uint16(formatExtensible))
	} else {
		_ = binary.Write(&f, le, code)
	}
	_ = binary.Write(&f, le, uint16(nc))
	_ = binary.Write(&f, le, uint32(spec.Rate))
	_ = binary.Write(&f, le, uint32(spec.Rate*nc*bps))
	_ = binary.Write(&f, le, uint16(nc*bps))
	_ = binary.Write(&f, le, uint16(spec.Bits))
	if spec.Extensible {
		_ = binary.Write(&f, le, uint16(22))
		_ = binary.Write(&f, le, uint16(spec.Bits))
		_ = binary.Write(&f, le, uint32(nc)) // channel mask
		_ = binary.Write(&f, le, code)
		f.Write(guidTail[:])
	}
	f.WriteString("LIST")
	_ = binary.Write(&f, le, uint32(len(list)))
	f.Write(list)
	f.WriteString("data")
	_ = binary.Write(&f, le, uint32(data.Len()))
	f.Write(data.Bytes())
	return f.Bytes()
}

func readBytes(b []byte) (*Recording, error) { return ReadWAV(bytes.NewReader(b)) }
