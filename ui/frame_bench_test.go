package ui

import (
	"image"
	"reflect"
	"testing"
	"time"
	"unsafe"

	"gioui.org/io/input"
	"gioui.org/layout"
	"gioui.org/op"
	"gioui.org/unit"
)

// BenchmarkScreenFrame measures one whole frame of the app (top bar and
// screen) with each catalog screen open, at phone size (412 by 915 dp, one
// pixel per dp): "idle" with nothing changed, and "recompute" with the
// screen's first form marked changed, so it recomputes and rebuilds its
// results (screens without a form have no recompute case). The budget is
// 1 ms and no allocations for an idle frame.
func BenchmarkScreenFrame(b *testing.B) {
	for _, e := range Catalog() {
		for _, recompute := range []bool{false, true} {
			name := string(e.ID) + "/idle"
			if recompute {
				name = string(e.ID) + "/recompute"
			}
			b.Run(name, func(b *testing.B) {
				a := NewApp(func() {})
				a.Open(e.ID)
				form := firstForm(a.Screen(e.ID))
				if recompute && form == nil {
					b.Skip("no form on this screen")
				}
				var r input.Router
				var ops op.Ops
				gtx := frameContext(&ops, &r, image.Pt(412, 915))
				frame := func() {
					ops.Reset()
					if recompute {
						form.Invalidate()
					}
					a.Layout(gtx)
					r.Frame(&ops)
				}
				for range 5 { // first frames: text shaped, caches filled
					frame()
				}
				b.ReportAllocs()
				for b.Loop() {
					frame()
				}
			})
		}
	}
}

// frameContext is the layout context of the frame tests and benchmarks: a
// window of size pixels at one pixel per dp, a fixed time, ops, and r's
// events.
func frameContext(ops *op.Ops, r *input.Router, size image.Point) layout.Context {
	return layout.Context{
		Ops:         ops,
		Now:         time.Unix(1_800_000_000, 0),
		Metric:      unit.Metric{PxPerDp: 1, PxPerSp: 1},
		Constraints: layout.Exact(size),
		Source:      r.Source(),
	}
}

// firstForm finds the first *Form held by the screen s, looking through its
// fields (pointers, embedded structs, slices and arrays) breadth first, or
// nil when it holds none. It reads unexported fields, which is why it lives
// in a test.
func firstForm(s Screen) *Form {
	formType := reflect.TypeFor[*Form]()
	seen := map[uintptr]bool{}
	queue := []reflect.Value{reflect.ValueOf(s)}
	for len(queue) > 0 {
		v := queue[0]
		queue = queue[1:]
		switch v.Kind() {
		case reflect.Interface:
			if !v.IsNil() {
				queue = append(queue, v.Elem())
			}
		case reflect.Pointer:
			if v.IsNil() || seen[v.Pointer()] {
				continue
			}
			seen[v.Pointer()] = true
			if v.Type() == formType {
				return (*Form)(unsafe.Pointer(v.Pointer()))
			}
			queue = append(queue, v.Elem())
		case reflect.Struct:
			if v.Type() == formType.Elem() && v.CanAddr() {
				return (*Form)(unsafe.Pointer(v.UnsafeAddr()))
			}
			for i := range v.NumField() {
				queue = append(queue, v.Field(i))
			}
		case reflect.Slice, reflect.Array:
			for i := range min(v.Len(), 8) {
				queue = append(queue, v.Index(i))
			}
		}
	}
	return nil
}
