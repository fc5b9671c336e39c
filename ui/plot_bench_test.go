package ui

import (
	"image"
	"testing"
	"time"

	"gioui.org/io/input"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
)

// BenchmarkPlotFrame lays out a plot of a 41-point sweep with a mark, as
// the screens draw it each frame once the chart is set (steady state: the
// ticks are worked out on the first frame and kept).
func BenchmarkPlotFrame(b *testing.B) {
	c := shotCharts()["sweep"]
	w := NewPlot(NewEnv(nil))
	w.Set(c)
	var r input.Router
	var ops op.Ops
	frame := func() {
		ops.Reset()
		gtx := layout.Context{Ops: &ops, Now: time.Unix(1_800_000_000, 0), Metric: unit.Metric{PxPerDp: 1, PxPerSp: 1},
			Constraints: layout.Exact(image.Pt(412, 400)), Source: r.Source()}
		w.Layout(gtx)
		r.Frame(&ops)
	}
	frame()
	b.ReportAllocs()
	b.ResetTimer()
	for b.Loop() {
		frame()
	}
}
