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

// BenchmarkGasScreenFrame measures one frame of the working-gas screen on a
// phone-sized window: once with nothing changed (layout only) and once with
// a recomputation (gasprops evaluation and the results card rebuilt).
func BenchmarkGasScreenFrame(b *testing.B) {
	for _, tc := range []struct {
		name      string
		recompute bool
	}{{"idle", false}, {"recompute", true}} {
		b.Run(tc.name, func(b *testing.B) {
			s := newGasScreen(NewEnv(nil)).(*sheetScreen)
			var r input.Router
			var ops op.Ops
			gtx := layout.Context{
				Ops:         &ops,
				Now:         time.Unix(1_800_000_000, 0),
				Metric:      unit.Metric{PxPerDp: 1, PxPerSp: 1},
				Constraints: layout.Exact(image.Pt(412, 915)),
				Source:      r.Source(),
			}
			b.ReportAllocs()
			for b.Loop() {
				ops.Reset()
				if tc.recompute {
					s.form.Invalidate()
				}
				s.Layout(gtx)
				r.Frame(&ops)
			}
		})
	}
}
