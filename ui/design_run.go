package ui

import (
	"context"
	"errors"
	"runtime"
	"sort"
	"strings"
	"sync/atomic"
	"time"

	"tubewright/calc/sheet"
)

// designRun runs the design calculator off the UI goroutine for the design
// screen's Form. The Form computes on every change by calling its sheet's
// Run; the screen's Form holds a copy of the design description whose Run
// is designRun.run: for inputs whose design has finished it returns that
// result (the description's own rows, computed by sheet.EvaluateDesign,
// the terminal's parse and Run with a context and progress); otherwise it
// starts the design in a Job, cancelling a design for older inputs, and
// returns errDesigning, which the screen shows as progress with a Cancel
// button rather than as a failure.
type designRun struct {
	env *Env
	job *Job[*sheet.Result]
	// key identifies the inputs of the design running or finished.
	key       string
	have      bool // res and err are the finished design for key
	res       *sheet.Result
	err       error
	cancelled bool // the design for key was cancelled by the user
	asked     bool // run was called (the screen clears it before the Form's Update)

	solves, limit atomic.Int64 // progress of the running design
}

// designWaits, when set, makes designRun.run wait for the design it
// started (still run by the Job, with its context and progress) before it
// returns, so that Form.Result is the finished design as soon as the
// inputs are typed. The app never sets it; the agreement test sets it
// (agree_design_test.go), because it reads Form.Result right after typing
// and the Form has no way yet to say that background work is pending. The
// design screen's own tests clear it to drive the background path.
var designWaits atomic.Bool

// The Form's errors while no result is there to show.
var (
	errDesigning = errors.New("designing")
	errCancelled = errors.New("the design was cancelled; tap Design again or change an input")
)

func newDesignRun(env *Env) *designRun {
	return &designRun{env: env, job: NewJob[*sheet.Result](env.Invalidate)}
}

// textsKey is one string for a set of input texts, the same for the same
// texts in any order; an empty text counts as none (both take the
// input's default).
func textsKey(texts map[string]string) string {
	keys := make([]string, 0, len(texts))
	for k, v := range texts {
		if strings.TrimSpace(v) != "" {
			keys = append(keys, k)
		}
	}
	sort.Strings(keys)
	var b strings.Builder
	for _, k := range keys {
		b.WriteString(k)
		b.WriteByte(0)
		b.WriteString(texts[k])
		b.WriteByte(0)
	}
	return b.String()
}

// run answers the Form for texts (UI goroutine): the finished design, or
// errDesigning while it runs, or errCancelled after a Cancel.
func (d *designRun) run(texts map[string]string) (*sheet.Result, error) {
	d.asked = true
	key := textsKey(texts)
	if key == d.key {
		switch {
		case d.have:
			return d.res, d.err
		case d.cancelled:
			return nil, errCancelled
		case d.job.Running():
			return nil, errDesigning
		}
	}
	d.start(key, texts)
	if designWaits.Load() {
		for !d.poll() {
			time.Sleep(2 * time.Millisecond)
		}
		return d.res, d.err
	}
	return nil, errDesigning
}

// start runs the design for texts in the Job, cancelling any other.
func (d *designRun) start(key string, texts map[string]string) {
	d.key, d.have, d.res, d.err, d.cancelled = key, false, nil, nil, false
	d.solves.Store(0)
	d.limit.Store(0)
	d.job.Start(func(ctx context.Context) (*sheet.Result, error) {
		return sheet.EvaluateDesign(ctx, d.progress, texts)
	})
}

// progress records the solves so far (design goroutine). It asks for a
// frame every few solves so the count moves on screen. In the browser,
// where goroutines share one thread with the page, it also sleeps a
// moment now and then so that the page can draw and take the Cancel tap.
func (d *designRun) progress(solves, limit int) {
	d.solves.Store(int64(solves))
	d.limit.Store(int64(limit))
	if solves%16 == 0 {
		d.env.Invalidate()
	}
	if runtime.GOOS == "js" && solves%8 == 0 {
		time.Sleep(time.Millisecond)
	}
}

// poll takes a finished design, if one arrived (UI goroutine), and
// reports whether it did.
func (d *designRun) poll() bool {
	if !d.job.Poll() {
		return false
	}
	d.res, d.err = d.job.Result()
	d.have = true
	return true
}

// running reports whether a design is running (UI goroutine).
func (d *designRun) running() bool { return d.job.Running() }

// cancel stops the running design; the Form then reads errCancelled for
// these inputs until again is called or an input changes.
func (d *designRun) cancel() {
	if !d.job.Running() {
		return
	}
	d.job.Cancel()
	d.cancelled = true
}

// again forgets a cancelled design so that the next Compute starts it.
func (d *designRun) again() {
	d.key, d.cancelled = "", false
}

// drop cancels a design the Form no longer asks for (its inputs stopped
// parsing) and forgets it.
func (d *designRun) drop() {
	if d.job.Running() {
		d.job.Cancel()
	}
	d.key, d.have, d.cancelled = "", false, false
}

// progressCounts returns the solves of the running design so far and the
// most its search makes (0 before the first solve).
func (d *designRun) progressCounts() (solves, limit int) {
	return int(d.solves.Load()), int(d.limit.Load())
}
