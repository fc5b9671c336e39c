//go:build js

package ui

import (
	"encoding/binary"
	"errors"
	"math"
	"sync"
	"syscall/js"

	"tubewright/calc/listen"
)

// jsMic records from the browser's microphone: getUserMedia (asked only
// when the user taps Record), a Web Audio graph from the stream to an
// AudioWorklet that posts blocks of samples to the page (they queue while
// the page is busy drawing, so none are lost), copied into Go; where the
// browser has no AudioWorklet, a ScriptProcessorNode instead. The samples
// stay in this page's memory; the processor's output is left silent, so
// nothing is played back either. Echo cancellation, noise
// suppression and automatic gain are asked off: they would change the
// ring-down and the level.
type jsMic struct {
	invalidate func()

	mu      sync.Mutex
	state   micState
	err     error
	level   float64 // dBFS of the last block
	rate    float64 // Hz
	samples []float32
	buf     []byte

	// The Web Audio objects of the recording running (undefined when
	// none) and the block callback.
	ctx, stream, source, node js.Value
	onAudio, onBlock          js.Func
}

// tapWorklet is the AudioWorklet module: it collects the first input
// channel into blocks of 4096 samples and posts each to the page.
const tapWorklet = `class TwTap extends AudioWorkletProcessor {
  constructor() { super(); this.buf = new Float32Array(4096); this.n = 0; }
  process(inputs) {
    const ch = inputs[0] && inputs[0][0];
    if (ch) {
      for (let i = 0; i < ch.length; i++) {
        this.buf[this.n++] = ch[i];
        if (this.n === this.buf.length) {
          this.port.postMessage(this.buf, [this.buf.buffer]);
          this.buf = new Float32Array(4096);
          this.n = 0;
        }
      }
    }
    return true;
  }
}
registerProcessor("tw-tap", TwTap);`

// newRecorder returns the browser's microphone.
func newRecorder(invalidate func()) recorder {
	m := &jsMic{invalidate: invalidate, level: math.Inf(-1)}
	m.onAudio = js.FuncOf(func(this js.Value, args []js.Value) any {
		m.block(args[0].Get("inputBuffer").Call("getChannelData", 0))
		return nil
	})
	m.onBlock = js.FuncOf(func(this js.Value, args []js.Value) any {
		m.block(args[0].Get("data"))
		return nil
	})
	return m
}

// errNoMic is the answer where the page cannot have a microphone.
var errNoMic = errors.New("this browser offers no microphone to this page; it needs a secure page (https, or an address on this device)")

// Start implements recorder: it asks for the microphone and builds the
// audio graph when the user allows it.
func (m *jsMic) Start() {
	m.mu.Lock()
	if m.state == micAsking || m.state == micRecording {
		m.mu.Unlock()
		return
	}
	m.state, m.err, m.samples, m.level = micAsking, nil, m.samples[:0], math.Inf(-1)
	m.mu.Unlock()
	md := js.Global().Get("navigator").Get("mediaDevices")
	if md.IsUndefined() || md.IsNull() || md.Get("getUserMedia").IsUndefined() {
		m.fail(errNoMic)
		return
	}
	audio := map[string]any{"echoCancellation": false, "noiseSuppression": false, "autoGainControl": false, "channelCount": 1}
	p := md.Call("getUserMedia", map[string]any{"audio": audio, "video": false})
	var ok, bad js.Func
	ok = js.FuncOf(func(this js.Value, args []js.Value) any {
		ok.Release()
		bad.Release()
		m.begin(args[0])
		return nil
	})
	bad = js.FuncOf(func(this js.Value, args []js.Value) any {
		ok.Release()
		bad.Release()
		msg := "the browser refused it"
		if len(args) > 0 && args[0].Type() == js.TypeObject {
			if name := args[0].Get("name"); name.Type() == js.TypeString && name.String() == "NotAllowedError" {
				msg = "permission was not given; allow the microphone for this page in the browser's settings"
			} else if s := args[0].Get("message"); s.Type() == js.TypeString && s.String() != "" {
				msg = s.String()
			}
		}
		m.fail(errors.New(msg))
		return nil
	})
	p.Call("then", ok).Call("catch", bad)
}

// begin builds the graph stream → processor once the stream is granted.
func (m *jsMic) begin(stream js.Value) {
	ac := js.Global().Get("AudioContext")
	if ac.IsUndefined() {
		ac = js.Global().Get("webkitAudioContext")
	}
	if ac.IsUndefined() {
		stopTracks(stream)
		m.fail(errors.New("this browser has no Web Audio"))
		return
	}
	// The context runs at the microphone's own rate where the browser says
	// it, so the samples are not resampled on their way in (Firefox also
	// refuses a stream at another rate than its context).
	var ctx js.Value
	if rate := trackRate(stream); rate > 0 {
		ctx = ac.New(map[string]any{"sampleRate": rate})
	} else {
		ctx = ac.New()
	}
	ctx.Call("resume")
	source := ctx.Call("createMediaStreamSource", stream)
	wl := ctx.Get("audioWorklet")
	if wl.IsUndefined() || js.Global().Get("AudioWorkletNode").IsUndefined() {
		m.connect(ctx, stream, source, m.scriptNode(ctx))
		return
	}
	blob := js.Global().Get("Blob").New([]any{tapWorklet}, map[string]any{"type": "text/javascript"})
	url := js.Global().Get("URL").Call("createObjectURL", blob)
	var ok, bad js.Func
	ok = js.FuncOf(func(this js.Value, args []js.Value) any {
		ok.Release()
		bad.Release()
		js.Global().Get("URL").Call("revokeObjectURL", url)
		node := js.Global().Get("AudioWorkletNode").New(ctx, "tw-tap")
		node.Get("port").Set("onmessage", m.onBlock)
		m.connect(ctx, stream, source, node)
		return nil
	})
	bad = js.FuncOf(func(this js.Value, args []js.Value) any {
		ok.Release()
		bad.Release()
		js.Global().Get("URL").Call("revokeObjectURL", url)
		m.connect(ctx, stream, source, m.scriptNode(ctx))
		return nil
	})
	wl.Call("addModule", url).Call("then", ok).Call("catch", bad)
}

// scriptNode returns a ScriptProcessorNode that hands its blocks to Go.
func (m *jsMic) scriptNode(ctx js.Value) js.Value {
	node := ctx.Call("createScriptProcessor", 4096, 1, 1)
	node.Set("onaudioprocess", m.onAudio)
	return node
}

// connect joins source → node → destination and starts recording. A
// processor runs only when connected onwards; its output stays zero.
func (m *jsMic) connect(ctx, stream, source, node js.Value) {
	source.Call("connect", node)
	node.Call("connect", ctx.Get("destination"))
	m.mu.Lock()
	m.ctx, m.stream, m.source, m.node = ctx, stream, source, node
	m.rate = ctx.Get("sampleRate").Float()
	m.state = micRecording
	m.mu.Unlock()
	m.invalidate()
}

// block copies one block of samples (a Float32Array) into Go and updates
// the level.
func (m *jsMic) block(data js.Value) {
	n := data.Get("byteLength").Int()
	m.mu.Lock()
	defer m.mu.Unlock()
	if m.state != micRecording {
		return
	}
	if cap(m.buf) < n {
		m.buf = make([]byte, n)
	}
	b := m.buf[:n]
	js.CopyBytesToGo(b, js.Global().Get("Uint8Array").New(data.Get("buffer"), data.Get("byteOffset"), n))
	peak := 0.0
	for i := 0; i+4 <= n; i += 4 {
		v := math.Float32frombits(binary.LittleEndian.Uint32(b[i:]))
		m.samples = append(m.samples, v)
		peak = math.Max(peak, math.Abs(float64(v)))
	}
	m.level = 20 * math.Log10(peak)
	go m.invalidate()
}

// fail records why there is no recording.
func (m *jsMic) fail(err error) {
	m.mu.Lock()
	m.state, m.err = micFailed, err
	m.mu.Unlock()
	m.invalidate()
}

// State implements recorder.
func (m *jsMic) State() micState {
	m.mu.Lock()
	defer m.mu.Unlock()
	return m.state
}

// Err implements recorder.
func (m *jsMic) Err() error {
	m.mu.Lock()
	defer m.mu.Unlock()
	return m.err
}

// Level implements recorder.
func (m *jsMic) Level() float64 {
	m.mu.Lock()
	defer m.mu.Unlock()
	return m.level
}

// Seconds implements recorder.
func (m *jsMic) Seconds() float64 {
	m.mu.Lock()
	defer m.mu.Unlock()
	if m.rate <= 0 {
		return 0
	}
	return float64(len(m.samples)) / m.rate
}

// Stop implements recorder: the graph is taken down, the microphone's
// tracks stopped (the browser's recording light goes off) and the samples
// handed over.
func (m *jsMic) Stop() (*listen.Recording, error) {
	m.mu.Lock()
	ctx, stream, source, node := m.ctx, m.stream, m.source, m.node
	m.ctx, m.stream, m.source, m.node = js.Undefined(), js.Undefined(), js.Undefined(), js.Undefined()
	samples, rate := m.samples, m.rate
	m.samples = nil
	m.state = micIdle
	m.mu.Unlock()
	if !node.IsUndefined() {
		node.Set("onaudioprocess", js.Null())
		if port := node.Get("port"); !port.IsUndefined() {
			port.Set("onmessage", js.Null())
		}
		source.Call("disconnect")
		node.Call("disconnect")
		stopTracks(stream)
		ctx.Call("close")
	}
	x := make([]float64, len(samples))
	for i, v := range samples {
		x[i] = float64(v)
	}
	return listen.NewRecording(x, rate)
}

// trackRate returns the sample rate of the stream's first audio track, Hz,
// or 0 when the browser does not say.
func trackRate(stream js.Value) float64 {
	tracks := stream.Call("getAudioTracks")
	if tracks.Length() == 0 {
		return 0
	}
	st := tracks.Index(0).Call("getSettings")
	if r := st.Get("sampleRate"); r.Type() == js.TypeNumber && r.Float() >= listen.MinSampleRate && r.Float() <= listen.MaxSampleRate {
		return r.Float()
	}
	return 0
}

// stopTracks stops every track of a media stream.
func stopTracks(stream js.Value) {
	tracks := stream.Call("getTracks")
	for i := range tracks.Length() {
		tracks.Index(i).Call("stop")
	}
}
