package ui

import (
	"context"
	"errors"
	"image"
	"strings"
	"time"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"

	"tubewright/calc/listen"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// listenScreen is "Listen to the tube", built from the recording
// calculator's description: on the desktop the user types (or pastes) the
// path of a WAV file; where the platform has a microphone the app can use
// (the browser build) the user records the tube instead, with a live level
// meter. Either way the analysis runs off the UI goroutine and its result
// comes back to the Form through a sheet whose Run hands over the finished
// analysis (see run). The screen adds the pitch and level against time as
// plots, the track as CSV, and one tap that takes the frequency with its ±
// to What the pitch says.
type listenScreen struct {
	env  *Env
	page *Page
	side *Page
	form *Form
	// real is the description; the Form holds a copy whose Run is s.run.
	real *sheet.Sheet

	job     *Job[listenDone]
	done    *listenDone // the last finished analysis
	pending string      // key of the analysis running, "" when none
	// inlineWait is how long run waits for a fresh analysis before
	// showing the progress state (0: not at all). Tests that drive the
	// screen frame by frame without waiting for background work set it.
	inlineWait time.Duration

	// mic is the platform's microphone, nil where there is none (the
	// desktop: open a file instead).
	mic     recorder
	micView *micView
	// held is the last recording made with the microphone, analysed when
	// the file input names it.
	heldName string
	held     *listen.Recording

	again, send, copyCSV widget.Clickable
	copied               bool
	freq, level          *Plot

	// Kept between frames (see retain.go): widgets bound once (bindWidgets)
	// and the slices of children.
	w              listenWidgets
	ins, outs, top []layout.Widget
}

// listenWidgets are the listen screen's widgets, bound once.
type listenWidgets struct {
	intro, mic, again, status, failure, send, freq, level, csv, about layout.Widget
	head                                                              *formHead
	noHead                                                            layout.Widget
}

// listenDone is one finished analysis: the key of the inputs it was made
// for (listenKey) and what the description returned.
type listenDone struct {
	key string
	res *sheet.Result
	err error
}

// errAnalysing is the Form's "result" while the analysis runs; the screen
// shows its progress line instead of the results card.
var errAnalysing = errors.New("analysing the recording")

// errNothingOpened is the Form's error before a recording is opened (or,
// with a microphone, when the file input names no recording held, as a
// setup restored from an earlier session does).
var errNothingOpened = errors.New("no recording yet")

// opened reports whether the file input names something to analyse: a
// path on the desktop, the recording held where there is a microphone.
func (s *listenScreen) opened() bool {
	name := strings.TrimSpace(s.form.Text("file"))
	if s.micView != nil {
		return s.held != nil && name == s.heldName
	}
	return name != ""
}

// listenInlineWait is the inlineWait of new screens (see listenScreen).
var listenInlineWait time.Duration

func newListenScreen(env *Env) Screen {
	real, _ := sheet.Lookup(sheet.IDListen)
	s := &listenScreen{env: env, page: NewPage(env), side: NewPage(env), real: real,
		job: NewJob[listenDone](env.Invalidate), inlineWait: listenInlineWait,
		freq: NewPlot(env), level: NewPlot(env)}
	wrapped := *real
	wrapped.Run = s.run
	s.form = NewForm(env, &wrapped)
	// The app starts with no recording rather than the terminal's example
	// name, and an empty path is the starting state, not an error: the
	// field parses its text as an optional input (the Form still requires
	// it, and the screen shows no result without it).
	if fd := s.form.Field("file"); fd != nil && fd.In != nil {
		in := *fd.In
		in.Optional = true
		fd.In = &in
	}
	s.form.SetText("file", "")
	s.freq.Height, s.level.Height = 200, 160
	s.setMic(newRecorder(env.Invalidate))
	return s
}

// setMic gives the screen a microphone (nil: none).
func (s *listenScreen) setMic(r recorder) {
	s.mic = r
	s.micView = nil
	if r != nil {
		s.micView = newMicView(s.env, r)
	}
	s.bindWidgets()
}

// bindWidgets makes the screen's widgets once (again when the microphone
// changes), so that a frame only lists them.
func (s *listenScreen) bindWidgets() {
	s.w = listenWidgets{
		intro: Para(s.env, s.intro()), again: s.againButton, status: s.status, failure: s.failure,
		send: s.sendButton, freq: s.freq.Layout, level: s.level.Layout, csv: s.csvButton,
		about: Note(s.env, s.real.About), head: newFormHead(s.env, s.form), noHead: headline(s.env, "", ""),
	}
	if s.micView != nil {
		s.w.mic = s.micView.Layout
	}
}

// Form returns the screen's form.
func (s *listenScreen) Form() *Form { return s.form }

// Title implements Screen.
func (s *listenScreen) Title() string { return s.form.Sheet.Title }

// listenKey identifies the inputs an analysis is made for: every input's
// text but the track switch (the screen always asks for the track).
func listenKey(v *sheet.Values) string {
	var b strings.Builder
	for _, x := range v.All() {
		if x.In.Key == "track" {
			continue
		}
		b.WriteString(x.In.Key + "=" + x.Text + "\x00")
	}
	return b.String()
}

// run is the Form's Run, called on the UI goroutine when an input changed:
// it returns the finished analysis of these inputs, or starts it off the
// UI goroutine and returns errAnalysing until it is done.
func (s *listenScreen) run(v *sheet.Values) (*sheet.Result, error) {
	if !s.opened() {
		return nil, v.Blame(errNothingOpened, "file")
	}
	key := listenKey(v)
	if s.done != nil && s.done.key == key {
		return s.done.res, s.done.err
	}
	if s.pending != key {
		s.start(key)
	}
	if s.inlineWait > 0 {
		for deadline := time.Now().Add(s.inlineWait); time.Now().Before(deadline); time.Sleep(time.Millisecond) {
			if s.poll() && s.done.key == key {
				return s.done.res, s.done.err
			}
		}
	}
	return nil, errAnalysing
}

// start analyses the Form's inputs off the UI goroutine, with the track
// (for the plots), from the held microphone recording when the file input
// names it, else from the file.
func (s *listenScreen) start(key string) {
	texts := s.form.Texts()
	texts["track"] = "true"
	desc := s.real
	if s.held != nil && strings.TrimSpace(texts["file"]) == s.heldName {
		desc = sheet.ListenTo(s.held)
	}
	s.pending = key
	s.job.Start(func(ctx context.Context) (listenDone, error) {
		res, err := desc.Evaluate(texts)
		return listenDone{key: key, res: res, err: err}, ctx.Err()
	})
}

// poll takes a finished analysis, if one arrived, and reports whether it
// did.
func (s *listenScreen) poll() bool {
	if !s.job.Poll() {
		return false
	}
	d, err := s.job.Result()
	if err != nil {
		return false
	}
	s.done = &d
	if s.pending == d.key {
		s.pending = ""
	}
	return true
}

// analysing reports whether an analysis is running.
func (s *listenScreen) analysing() bool { return s.pending != "" }

// update takes a finished analysis into the Form, then handles the
// microphone, the inputs and the buttons.
func (s *listenScreen) update(gtx layout.Context) {
	if s.poll() {
		s.form.Invalidate()
	}
	if s.micView != nil {
		if rec, name, ok := s.micView.update(gtx); ok {
			s.held, s.heldName = rec, name
			s.form.SetText("file", name)
		}
	}
	if s.again.Clicked(gtx) {
		s.done = nil
		s.pending = ""
		s.job.Cancel()
		s.form.Invalidate()
	}
	if s.form.Update(gtx) {
		s.showPlots()
		s.copied = false
	}
	if !s.opened() {
		// Nothing opened yet: no red field.
		if fd := s.form.Field("file"); fd != nil {
			fd.SetError(nil)
		}
	}
	if s.send.Clicked(gtx) {
		s.sendToDiagnose()
	}
	if s.copyCSV.Clicked(gtx) {
		if t := s.track(); t != nil {
			gtx.Execute(clipboardText(trackCSV(t)))
			s.copied = true
		}
	}
}

// measured returns the frequency found and its ±, Hz.
func (s *listenScreen) measured() (hz, pm float64, ok bool) {
	res := s.form.Result()
	if res == nil {
		return 0, 0, false
	}
	row, ok := res.Row("frequency")
	return row.Value, row.PM, ok && row.Value > 0
}

// sendToDiagnose puts the frequency with its ± on the Bench and opens What
// the pitch says.
//
// Hook for the bench log (ui/keep*, being built): a measurement sent on is
// one worth keeping; the log should take s.form's inputs and rows here.
func (s *listenScreen) sendToDiagnose() {
	hz, pm, ok := s.measured()
	if !ok {
		return
	}
	s.env.Bench.SetMeasuredFrequency(hz, pm, s.Title())
	s.env.Open(sheet.IDDiagnose)
}

// track returns the frame table of the result shown, or nil.
func (s *listenScreen) track() *sheet.Table {
	if res := s.form.Result(); res != nil && res.Table != nil && len(res.Table.Rows) > 0 {
		return res.Table
	}
	return nil
}

// Layout implements Screen.
func (s *listenScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.update(gtx)
	w := &s.w
	s.ins = append(s.ins[:0], w.intro)
	if s.micView != nil {
		s.ins = append(s.ins, w.mic)
	} else {
		s.ins = append(s.ins, s.form.InputWidget("file"), w.again)
	}
	s.ins = append(s.ins, s.form.InputWidget("lowest"), s.form.InputWidget("highest"))

	out := s.form.Outputs()
	s.outs = append(s.outs[:0], w.status)
	switch {
	case s.showResults() && s.micView != nil && s.form.Result() == nil:
		// The file field is not on screen: say what is wrong with the
		// recording here rather than "check the fields marked in red".
		s.outs = append(s.outs, w.failure, out[1], w.about)
	case s.showResults():
		s.outs = append(s.outs, out[0], out[1], w.send, w.freq, w.level, w.csv)
		s.outs = append(s.outs, out[2:]...)
	default:
		s.outs = append(s.outs, out[1], w.about)
	}
	head := w.head.widget()
	if s.analysing() {
		head = w.noHead
	}
	s.top = append(s.top[:0], head)
	return splitLayout(gtx, s.page, s.side, s.top, s.ins, s.outs)
}

// intro says what to do, for the platform's way in.
func (s *listenScreen) intro() string {
	how := "Type or paste the path of a WAV recording of the tube."
	if s.micView != nil {
		how = "Record the tube with this device's microphone."
	}
	return how + " Tap the tube and let it ring for its decay time and Q, or record it while it sings for its pitch; " +
		"the frequency comes with its ±, ready for What the pitch says."
}

// showResults reports whether the results card has something to show: a
// result, or a failure other than "nothing opened yet" and "analysing".
func (s *listenScreen) showResults() bool {
	if s.form.Result() != nil {
		return true
	}
	if s.analysing() || s.form.errIs(errAnalysing) || !s.opened() {
		return false
	}
	return s.form.Err() != nil
}

// failure says why the recording gave no result, in red.
func (s *listenScreen) failure(gtx layout.Context) layout.Dimensions {
	msg := "no result"
	if err := s.form.Err(); err != nil {
		msg = err.Error()
		if fes := sheet.FieldErrors(err); len(fes) > 0 && fes[0].Err != nil {
			msg = fes[0].Err.Error()
		}
	}
	l := material.Body1(s.env.Theme, "No result: "+msg)
	l.Color = s.env.Colors.Error
	return Described("No result", l.Layout)(gtx)
}

// status is the progress line while the analysis runs, the first step
// before anything is opened, or nothing.
func (s *listenScreen) status(gtx layout.Context) layout.Dimensions {
	switch {
	case s.analysing():
		return layout.Flex{Alignment: layout.Middle}.Layout(gtx,
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				gtx.Constraints = layout.Exact(image.Pt(gtx.Dp(22), gtx.Dp(22)))
				l := material.Loader(s.env.Theme)
				l.Color = s.env.Colors.Accent
				return l.Layout(gtx)
			}),
			layout.Rigid(layout.Spacer{Width: 10}.Layout),
			layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
				return describe(gtx, "Progress", func(gtx layout.Context) layout.Dimensions {
					return layoutPara(gtx, s.env, "Analysing the recording…")
				})
			}),
		)
	case s.micView != nil && s.mic.State() == micRecording:
		return describe(gtx, "Progress", func(gtx layout.Context) layout.Dimensions {
			return layoutNote(gtx, s.env, "Recording: tap Stop and analyse once the tube has rung out.")
		})
	case !s.opened() && s.form.Result() == nil:
		what := "No recording yet: type its path to see its frequency."
		if s.micView != nil {
			what = "No recording yet: record the tube to see its frequency."
		}
		return describe(gtx, "Progress", func(gtx layout.Context) layout.Dimensions { return layoutNote(gtx, s.env, what) })
	}
	return layout.Dimensions{}
}

// againButton reads the file anew (after recording over it).
func (s *listenScreen) againButton(gtx layout.Context) layout.Dimensions {
	if !s.opened() {
		return layout.Dimensions{}
	}
	return smallButton(s.env, gtx, &s.again, "Read the file again")
}

// sendButton takes the frequency with its ± to What the pitch says.
func (s *listenScreen) sendButton(gtx layout.Context) layout.Dimensions {
	hz, pm, ok := s.measured()
	if !ok {
		return layout.Dimensions{}
	}
	b := material.Button(s.env.Theme, &s.send, "Use "+units.FormatPM(hz, pm, units.DimFrequency)+" in What the pitch says")
	b.TextSize = unit.Sp(16)
	return b.Layout(atTarget(gtx))
}

// csvButton copies the track table as CSV, as twcalc listen --track
// writes it.
func (s *listenScreen) csvButton(gtx layout.Context) layout.Dimensions {
	if s.track() == nil {
		return layout.Dimensions{}
	}
	label := "Copy the track as CSV"
	if s.copied {
		label = "Copied: time_s, frequency_Hz, level_dBFS"
	}
	return smallButton(s.env, gtx, &s.copyCSV, label)
}
