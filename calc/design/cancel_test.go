package design

import (
	"context"
	"errors"
	"testing"
)

// TestDesignCancel: a screen runs the design off its UI goroutine and may
// cancel it: the search stops at the next solve and the context's error
// comes back. Progress reports each solve, counting up.
func TestDesignCancel(t *testing.T) {
	t.Parallel()
	ctx, cancel := context.WithCancel(context.Background())
	defer cancel()
	last, calls := 0, 0
	set := &Settings{Context: ctx, Progress: func(solves, limit int) {
		calls++
		if solves <= last || limit != 2000 {
			t.Errorf("progress %d of %d after %d", solves, limit, last)
		}
		last = solves
		if solves == 20 {
			cancel()
		}
	}}
	_, err := Design(doneWhen, set)
	if !errors.Is(err, context.Canceled) {
		t.Fatalf("err = %v, want context.Canceled", err)
	}
	if calls < 20 || last > 22 {
		t.Errorf("%d progress calls, last %d: the search went on after the cancel", calls, last)
	}
	_, err = DesignHeatPump(pumpTarget, &Settings{Context: ctx})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("heat pump: err = %v, want context.Canceled", err)
	}
}
