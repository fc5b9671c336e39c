package ui

import (
	"context"
	"sync"
)

// Job runs one computation at a time off the UI goroutine. Start cancels the
// computation still running (its context is cancelled and its result
// dropped), runs the new one on a goroutine and asks for a frame when it is
// done; the screen picks the result up with Poll at the start of its next
// Layout, on the UI goroutine, so widgets are only ever touched there.
//
//	if s.solve.Poll() { v, err := s.solve.Result(); ... }
//	if inputsChanged { s.solve.Start(func(ctx context.Context) (Result, error) { ... }) }
type Job[T any] struct {
	invalidate func()

	mu     sync.Mutex
	gen    uint64
	cancel context.CancelFunc
	done   *jobResult[T]

	running bool
	value   T
	err     error
	have    bool
}

type jobResult[T any] struct {
	gen   uint64
	value T
	err   error
}

// NewJob returns a job that calls invalidate (e.g. env.Invalidate) when a
// result is ready. invalidate may be nil.
func NewJob[T any](invalidate func()) *Job[T] {
	if invalidate == nil {
		invalidate = func() {}
	}
	return &Job[T]{invalidate: invalidate}
}

// Start cancels any running computation and starts f on a new goroutine.
// f should return promptly with ctx.Err() once ctx is cancelled.
func (j *Job[T]) Start(f func(ctx context.Context) (T, error)) {
	ctx, cancel := context.WithCancel(context.Background())
	j.mu.Lock()
	if j.cancel != nil {
		j.cancel()
	}
	j.gen++
	gen := j.gen
	j.cancel = cancel
	j.done = nil
	j.mu.Unlock()
	j.running = true
	go func() {
		v, err := f(ctx)
		j.mu.Lock()
		if gen == j.gen {
			j.done = &jobResult[T]{gen: gen, value: v, err: err}
		}
		j.mu.Unlock()
		cancel()
		j.invalidate()
	}()
}

// Cancel cancels the running computation, if any; its result is dropped.
func (j *Job[T]) Cancel() {
	j.mu.Lock()
	if j.cancel != nil {
		j.cancel()
		j.cancel = nil
	}
	j.gen++
	j.done = nil
	j.mu.Unlock()
	j.running = false
}

// Poll takes a finished result, if one arrived, and reports whether it did
// (once per result). Call it on the UI goroutine.
func (j *Job[T]) Poll() bool {
	j.mu.Lock()
	d := j.done
	j.done = nil
	j.mu.Unlock()
	if d == nil {
		return false
	}
	j.running = false
	j.value, j.err, j.have = d.value, d.err, true
	return true
}

// Result returns the last result taken by Poll.
func (j *Job[T]) Result() (T, error) { return j.value, j.err }

// Has reports whether Poll has taken at least one result.
func (j *Job[T]) Has() bool { return j.have }

// Running reports whether a computation was started and its result has not
// been taken yet (UI goroutine only).
func (j *Job[T]) Running() bool { return j.running }
