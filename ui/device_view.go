package ui

import (
	"context"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
)

// deviceView is what the engine-onset and heat-pump screens share: the
// Form of the calculator's description (its fields, results and cautions),
// the device editor, which supplies the Form's "device" input as the
// device document it shows, the chips of the "example" input, which load a
// built-in example into the editor, and the plots, drawn from the tables
// the description returns for the profile and the sweep. The result rows
// are computed with the Form (one solve, a few milliseconds); the plots,
// several solves, run off the UI goroutine, and a newer edit cancels a
// stale run.
type deviceView struct {
	env    *Env
	page   *Page // the one column, or the inputs' column when wide
	side   *Page // the results' column when wide
	editor *deviceEditor
	form   *Form
	dev    *linear.Device // last valid device, for the strip
	plots  []*Plot
	job    *Job[*deviceTables]
	status string

	// Kept between frames (see retain.go): the columns' widgets, bound
	// for the intro and heading they were made for, the slices columns
	// returns, and the operating-point line with what it was written
	// from.
	cols      deviceColumns
	point     string
	pointRes  *sheet.Result
	pointDev  *linear.Device
	pointDone bool
}

// deviceColumns are the widgets of a device screen's columns.
type deviceColumns struct {
	intro, heading                         string
	introW, headW, condHead, devHead, card layout.Widget
	caution                                layout.Widget
	top, inputs                            []layout.Widget
	// outs is the screen's own results column, made once (see
	// outputs).
	outs []layout.Widget
}

// outputs returns the screen's own widgets of the results column, made by
// make on the first call and kept.
func (v *deviceView) outputs(make func() []layout.Widget) []layout.Widget {
	if v.cols.outs == nil {
		v.cols.outs = make()
	}
	return v.cols.outs
}

// deviceTables are the tables a screen's plots are drawn from.
type deviceTables struct {
	profile *sheet.Table // along the device
	sweep   *sheet.Table // against mean pressure or drive frequency
}

// Input keys of the device calculators that the view handles itself.
const (
	keyDevice  = "device"
	keyExample = "example"
	noExample  = "none"
)

// newDeviceView returns a view of calculator s on the example device
// example ("engine", "heatpump") with n empty plots.
func newDeviceView(env *Env, s *sheet.Sheet, example string, n int) deviceView {
	v := deviceView{
		env:    env,
		page:   NewPage(env),
		side:   NewPage(env),
		editor: newDeviceEditor(env, example),
		form:   NewForm(env, s),
		job:    NewJob[*deviceTables](env.Invalidate),
	}
	for range n {
		v.plots = append(v.plots, NewPlot(env))
	}
	v.takeDevice()
	v.form.cs.point = v.operatingPoint
	return v
}

// Form implements formScreen: the screen is built on its description.
func (v *deviceView) Form() *Form { return v.form }

// Leave cancels the plots' run.
func (v *deviceView) Leave() { v.job.Cancel() }

// takeDevice hands the editor's device to the Form and keeps the last
// valid one for the strip.
func (v *deviceView) takeDevice() {
	v.form.SetText(keyDevice, v.editor.document())
	if d, err := v.editor.File().Validate(); err == nil {
		v.dev = d
	}
}

// update handles the example chips, the editor and the Form, in that
// order, and reports whether the Form computed anew. A device problem is
// shown as the device check words it, naming the part and field, and
// marked under that field of the editor.
func (v *deviceView) update(gtx layout.Context) bool {
	if ex := v.form.Pick(keyExample); ex.Update(gtx) {
		if name := ex.Selected(); name != noExample {
			if err := v.editor.openExample(name); err != nil {
				panic("ui: built-in example " + name + ": " + err.Error())
			}
		}
		ex.Select(noExample)
	}
	if v.editor.Update(gtx) {
		v.takeDevice()
	}
	if !v.form.Update(gtx) {
		return false
	}
	v.publish()
	var devErr error
	if fes := sheet.FieldErrors(v.form.Err()); len(fes) > 0 && fes[0].Key == keyDevice {
		devErr = fes[0].Err
		v.form.Results.Reset()
		v.form.Results.Fail(devErr)
	}
	v.editor.mark(devErr)
	return true
}

// tablesFunc computes a screen's plot tables from its calculator s and
// the texts of the Form's inputs; it runs off the UI goroutine.
type tablesFunc func(ctx context.Context, s *sheet.Sheet, texts map[string]string) (*deviceTables, error)

// begin starts a frame of a device screen: it draws the plots whose tables
// arrived (show), handles the inputs, and for a new result starts the
// plots' run (tables).
func (v *deviceView) begin(gtx layout.Context, tables tablesFunc, show func(*deviceTables)) {
	if t := v.polled(); t != nil {
		show(t)
	}
	if v.update(gtx) {
		v.startPlots(tables)
	}
}

// startPlots runs tables off the UI goroutine for the Form's new result,
// or clears the plots when there is none.
func (v *deviceView) startPlots(tables tablesFunc) {
	if v.form.Result() == nil {
		v.job.Cancel()
		v.status = ""
		for _, p := range v.plots {
			p.Set(nil)
		}
		return
	}
	s, texts := v.form.Sheet, v.form.Texts()
	v.status = "Drawing the plots…"
	v.job.Start(func(ctx context.Context) (*deviceTables, error) { return tables(ctx, s, texts) })
}

// polled takes the plots' tables when they are ready (nil otherwise).
func (v *deviceView) polled() *deviceTables {
	if !v.job.Poll() {
		return nil
	}
	v.status = ""
	t, err := v.job.Result()
	if err != nil {
		return nil
	}
	return t
}

// evaluateWith evaluates s on texts changed by the key-value pairs kv, for
// the plots; a cancelled ctx stops before the solve.
func evaluateWith(ctx context.Context, s *sheet.Sheet, texts map[string]string, kv ...string) (*sheet.Result, error) {
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	t := make(map[string]string, len(texts))
	for k, x := range texts {
		t[k] = x
	}
	for i := 0; i+1 < len(kv); i += 2 {
		t[kv[i]] = kv[i+1]
	}
	return s.Evaluate(t)
}

// columns returns the widgets of the screen's results column (top: the
// heading, the results and their cautions) and of its inputs column: the
// operating conditions (the gas and fill, then the screen's own inputs,
// by key), the example chips and the device editor. The intro, which says
// how to build the device, leads the inputs beside the results on wide
// windows and the whole page on a phone.
func (v *deviceView) columns(gtx layout.Context, intro, heading string, keys ...string) (top, inputs []layout.Widget) {
	c := &v.cols
	if c.introW == nil || c.intro != intro || c.heading != heading {
		c.intro, c.heading = intro, heading
		c.introW, c.headW = Para(v.env, intro), Heading(v.env, heading)
		c.condHead, c.devHead = Heading(v.env, "Operating conditions"), Heading(v.env, "The device")
		c.card, c.caution = v.form.resultCard, v.form.CautionWidget
	}
	c.top, c.inputs = c.top[:0], c.inputs[:0]
	if splitWide(gtx) {
		c.inputs = append(c.inputs, c.introW)
	} else {
		c.top = append(c.top, c.introW)
	}
	c.top = append(c.top, c.headW, c.card, c.caution)
	c.inputs = append(c.inputs, c.condHead)
	c.inputs = append(c.inputs, v.editor.Conditions()...)
	for _, k := range keys {
		c.inputs = append(c.inputs, v.form.InputWidget(k))
	}
	c.inputs = append(c.inputs, c.devHead, v.form.InputWidget(keyExample))
	c.inputs = append(c.inputs, v.editor.Layout(gtx, v.dev)...)
	return c.top, c.inputs
}

// statusLine shows what runs in the background, or nothing.
func (v *deviceView) statusLine(gtx layout.Context) layout.Dimensions {
	if v.status == "" {
		return layout.Dimensions{}
	}
	return layoutNote(gtx, v.env, v.status)
}

// tableXY returns columns x and y of t as points.
func tableXY(t *sheet.Table, x, y int, xScale float64) XYs {
	if t == nil {
		return nil
	}
	xy := make(XYs, 0, len(t.Rows))
	for _, r := range t.Rows {
		xy = append(xy, XY{X: r[x] * xScale, Y: r[y]})
	}
	return xy
}
