package ui

import (
	"context"
	"errors"
	"sync/atomic"
	"testing"
	"time"
)

// waitPoll polls j until a result arrives or a second passes.
func waitPoll[T any](t *testing.T, j *Job[T]) {
	t.Helper()
	deadline := time.Now().Add(time.Second)
	for !j.Poll() {
		if time.Now().After(deadline) {
			t.Fatal("no result within a second")
		}
		time.Sleep(time.Millisecond)
	}
}

// TestJobCancelsStale starts a slow computation, then a fast one: the slow
// one's context must be cancelled, its result dropped, and only the fast
// one's result delivered, with a frame requested.
func TestJobCancelsStale(t *testing.T) {
	var frames atomic.Int32
	j := NewJob[int](func() { frames.Add(1) })
	cancelled := make(chan struct{})
	release := make(chan struct{})
	j.Start(func(ctx context.Context) (int, error) {
		<-ctx.Done()
		close(cancelled)
		<-release
		return 1, ctx.Err()
	})
	if !j.Running() {
		t.Fatal("Running false right after Start")
	}
	j.Start(func(ctx context.Context) (int, error) { return 2, nil })
	select {
	case <-cancelled:
	case <-time.After(time.Second):
		t.Fatal("the stale computation's context was not cancelled")
	}
	waitPoll(t, j)
	if v, err := j.Result(); v != 2 || err != nil {
		t.Fatalf("Result = %v, %v; want 2, nil", v, err)
	}
	close(release) // the stale goroutine now finishes; its result must not show
	time.Sleep(20 * time.Millisecond)
	if j.Poll() {
		v, _ := j.Result()
		t.Fatalf("stale result %v delivered after the fresh one", v)
	}
	if j.Running() || !j.Has() {
		t.Fatalf("Running %v Has %v after the result, want false true", j.Running(), j.Has())
	}
	if frames.Load() == 0 {
		t.Fatal("no frame was requested when the result arrived")
	}
}

// TestJobError delivers an error and checks Cancel drops a pending result.
func TestJobError(t *testing.T) {
	j := NewJob[float64](nil)
	boom := errors.New("boom")
	j.Start(func(ctx context.Context) (float64, error) { return 0, boom })
	waitPoll(t, j)
	if _, err := j.Result(); !errors.Is(err, boom) {
		t.Fatalf("err = %v, want boom", err)
	}
	done := make(chan struct{})
	j.Start(func(ctx context.Context) (float64, error) { defer close(done); return 3, nil })
	<-done
	j.Cancel()
	time.Sleep(10 * time.Millisecond)
	if j.Poll() {
		t.Fatal("a result arrived after Cancel")
	}
}
