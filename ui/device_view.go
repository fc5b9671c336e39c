package ui

import (
	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// deviceView is what the engine-onset and heat-pump screens share: a page
// with the device editor, the results of the last solve and the caution
// that goes with them, a status line while a solve runs, and the plots.
// The screens embed it and add their own solve.
type deviceView struct {
	env     *Env
	page    *Page
	editor  *deviceEditor
	dev     *linear.Device // last valid device
	results *Results
	caution *Caution
	plots   []*Plot
	status  string
}

// newDeviceView returns a view on the example device example ("engine",
// "heatpump") with n empty plots and a caution box under heading.
func newDeviceView(env *Env, example, heading string, n int) deviceView {
	v := deviceView{
		env:     env,
		page:    NewPage(env),
		editor:  newDeviceEditor(env, example),
		results: NewResults(env),
		caution: NewCaution(env, heading),
	}
	for range n {
		v.plots = append(v.plots, NewPlot(env))
	}
	return v
}

// solving records d as the device being solved and says so.
func (v *deviceView) solving(d *linear.Device) {
	v.dev = d
	v.status = "Solving…"
}

// fail shows err in place of results: no status, no plots and no caution
// (its lines quote the numbers of the last solve, which no longer stand).
func (v *deviceView) fail(err error) {
	v.status = ""
	v.results.Reset()
	v.results.Fail(err)
	v.caution.Lines = nil
	for _, p := range v.plots {
		p.Set(nil)
	}
}

// done empties the results and the status line before a finished solve
// is shown.
func (v *deviceView) done() {
	v.status = ""
	v.results.Reset()
}

// top returns the first widgets of the screen: the intro, the heading, the
// status line while solving, the results, the caution when it has lines
// (always with results that bear on safety), the screen's own field, then
// the device editor.
func (v *deviceView) top(gtx layout.Context, intro, heading string, field *Field) []layout.Widget {
	ws := []layout.Widget{Para(v.env, intro), Heading(v.env, heading)}
	if v.status != "" {
		ws = append(ws, Note(v.env, v.status))
	}
	ws = append(ws, v.results.Layout)
	if len(v.caution.Lines) > 0 {
		ws = append(ws, v.caution.Layout)
	}
	ws = append(ws, field.Layout)
	return append(ws, v.editor.Layout(gtx, v.dev)...)
}

// shortStackRows shows calc/linear's quick short-stack estimates under the
// solved results, each with what it means and when it holds; the
// estimate's own warnings go with the results' warnings. With pump, the
// zero-load span of a heat pump is shown and Γ is the solved span over
// the critical one; otherwise (an engine at onset) the critical
// temperature difference, with Γ the onset difference over it.
func shortStackRows(r *Results, ss *linear.ShortStackResult, pump bool) {
	if ss == nil {
		return
	}
	if pump {
		if ss.ZeroLoadRatio > 0 {
			r.Add("Short-stack zero-load span (quick estimate)", ss.ZeroLoadSpan, units.DimTemperatureDifference)
			r.AddNote("with no load and no heat conducted back; compare with the solved span")
		} else {
			r.AddText("Short-stack zero-load span (quick estimate)", "none")
			r.AddNote("viscous losses outweigh the pumping in this estimate")
		}
		r.Add("Short-stack Γ (solved span / critical)", ss.GradientRatio, units.DimNone)
		r.AddNote("below 1 the stack pumps heat; at 1, the critical gradient, pumping stops")
	} else {
		r.Add("Short-stack critical ΔT (quick estimate)", ss.CriticalDifference, units.DimTemperatureDifference)
		r.AddNote("gas at ambient temperature, stack centre from the closed end")
		r.Add("Short-stack Γ (onset ΔT / critical)", ss.GradientRatio, units.DimNone)
		r.AddNote("above 1 the stack can drive sound; losses elsewhere push onset higher")
	}
	r.Add("k·Δx of the stack", ss.KDeltaX, units.DimNone)
	r.AddNote("the short-stack estimate needs k·Δx much less than 1; rough above 0.3")
	r.Add("δκ / y0 of the stack", ss.DepthRatio, units.DimNone)
	r.AddNote("its boundary-layer form needs δκ much smaller than y0; rough above 0.5")
	for _, w := range ss.Warnings {
		r.Warn("Short-stack estimate: " + w)
	}
}
