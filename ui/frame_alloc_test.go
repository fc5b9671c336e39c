package ui

import (
	"image"
	"runtime"
	"testing"
	"time"

	"gioui.org/io/input"
	"gioui.org/op"

	"tubewright/calc/sheet"
)

// TestIdleLayoutAllocatesNothing opens each catalog screen in the whole
// app (top bar and screen) at phone size, on a phone tall enough to draw
// the whole page (what a scroll brings into view) and on a desktop beside
// the catalog, lets its background work settle, and checks that App.Layout
// allocates nothing in a frame where nothing changed. Allocation counts
// are deterministic, unlike timings: the time budget lives in
// BenchmarkScreenFrame.
//
// The input router's Frame runs between the layouts, as a window runs it,
// but is left out of the count: in gioui.org v0.10.3 it allocates in
// keyQueue.updateFocusLayout (sort.SliceStable boxes the slice and its
// swap function, a few objects for each row of focusable widgets), which
// nothing in how we lay out can avoid; BenchmarkScreenFrame counts it.
func TestIdleLayoutAllocatesNothing(t *testing.T) {
	if raceDetector {
		t.Skip("allocation counts mean nothing under -race; make idle-allocs runs this test without it")
	}
	sizes := []struct {
		name string
		size image.Point
	}{{"phone", image.Pt(412, 915)}, {"whole page", image.Pt(412, 4000)}, {"desktop", image.Pt(1440, 900)}}
	for _, sz := range sizes {
		for _, e := range Catalog() {
			t.Run(sz.name+"/"+string(e.ID), func(t *testing.T) { checkIdleLayout(t, sz.size, e.ID) })
		}
	}
}

// checkIdleLayout is one case of TestIdleLayoutAllocatesNothing: screen id
// in a window of size, one pixel per dp.
func checkIdleLayout(t *testing.T, size image.Point, id sheet.ID) {
	a := NewApp(func() {})
	a.Open(id)
	var r input.Router
	var ops op.Ops
	gtx := frameContext(&ops, &r, size)
	frame := func() {
		ops.Reset()
		a.Layout(gtx)
		r.Frame(&ops)
	}
	if !layOutUntilQuiet(a.Env(), 300*time.Millisecond, frame) {
		t.Fatal("the screen's background work did not settle in 20 s")
	}
	for range 5 { // text shaped, caches and slices grown
		frame()
	}
	defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(1))
	const frames = 20
	var before, after runtime.MemStats
	var mallocs uint64
	for range frames {
		ops.Reset()
		runtime.ReadMemStats(&before)
		a.Layout(gtx)
		runtime.ReadMemStats(&after)
		mallocs += after.Mallocs - before.Mallocs
		r.Frame(&ops)
	}
	if mallocs != 0 {
		t.Errorf("an unchanged frame of %s at %v allocates %.1f objects in App.Layout, want none (go test -bench 'BenchmarkScreenFrame/%s/idle' -memprofile, then go tool pprof -sample_index=alloc_objects, shows where)",
			id, size, float64(mallocs)/frames, id)
	}
}
