package ui

import (
	"gioui.org/layout"

	"tubewright/calc/linear"
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
