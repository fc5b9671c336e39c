package ui

import (
	"context"
	"strconv"

	"gioui.org/layout"

	"tubewright/calc/linear"
	"tubewright/calc/sheet"
)

// onsetScreen builds an engine from parts and shows, from the engine-onset
// description, the hot temperature and frequency at which it starts (or,
// with a hot temperature typed, the growth or decay of the nearest mode),
// then the profiles along it and the onset temperature against mean
// pressure, drawn from the description's tables off the UI goroutine.
type onsetScreen struct {
	deviceView
}

// newOnsetScreen builds the onset screen with the example engine.
func newOnsetScreen(env *Env) Screen {
	s, _ := sheet.Lookup(sheet.IDOnset)
	return &onsetScreen{deviceView: newDeviceView(env, s, "engine", 5)}
}

// Title implements Screen.
func (s *onsetScreen) Title() string { return s.form.Sheet.Title }

// Enter takes a device another screen handed over (the design screen's
// "Open in Engine onset") into the editor; the next frame solves it. The
// document is the device file our own screens write, so one that does not
// read is a programming error.
func (s *onsetScreen) Enter() {
	doc, ok := s.env.takeHandedDevice()
	if !ok {
		return
	}
	var f linear.DeviceFile
	if err := jsonDecode([]byte(doc), &f); err != nil {
		panic("ui: handed device does not read: " + err.Error())
	}
	s.editor.open(&f, "Opened the designed device.")
}

// onsetTables is the plots' run: the profile of the result shown, then the
// onset at mean pressures from an eighth to four times the device's, 16
// points spaced nearly geometrically.
func onsetTables(ctx context.Context, s *sheet.Sheet, texts map[string]string) (*deviceTables, error) {
	prof, err := evaluateWith(ctx, s, texts, "profile", "true")
	if err != nil {
		return nil, err
	}
	out := &deviceTables{profile: prof.Table}
	pm := 0.0
	for _, d := range prof.Derived {
		if d.Key == "mean_pressure" {
			pm = d.Value
		}
	}
	if pm <= 0 {
		return out, nil
	}
	// One octave at a time, so that the points are spaced nearly
	// geometrically (the log axis shows the U at low pressure).
	for lo := pm / 8; lo < 4*pm*0.99; lo *= 2 {
		span := strconv.FormatFloat(lo, 'g', -1, 64) + " Pa:" + strconv.FormatFloat(2*lo, 'g', -1, 64) + " Pa:4"
		sw, err := evaluateWith(ctx, s, texts, "hot", "", "frequency-guess", "", "sweep-pressure", span)
		if err != nil {
			if ctx.Err() != nil {
				return nil, ctx.Err()
			}
			continue
		}
		if out.sweep == nil {
			out.sweep = &sheet.Table{Header: sw.Table.Header}
		}
		for _, r := range sw.Table.Rows {
			if n := len(out.sweep.Rows); n == 0 || out.sweep.Rows[n-1][0] < r[0] {
				out.sweep.Rows = append(out.sweep.Rows, r)
			}
		}
	}
	return out, ctx.Err()
}

// showPlots draws the profiles and the onset against mean pressure, the
// device's own pressure marked.
func (s *onsetScreen) showPlots(t *deviceTables) {
	setProfilePlots(s.plots[:4], t.profile)
	pp := lineXY(tableXY(t.sweep, 0, 1, 1e-5), "Mean pressure", "bar", "Onset hot temperature", "K", "Onset against mean pressure")
	if pp != nil {
		pp.X.Log = true
		s.markOwnPressure(pp)
	}
	s.plots[4].Set(pp)
}

// markOwnPressure marks on the onset-against-pressure chart c (pressure
// in bar) the device's own mean pressure and the onset the result shown
// found there, with its ± when it has one.
func (s *onsetScreen) markOwnPressure(c *Chart) {
	r := s.form.Result()
	if r == nil {
		return
	}
	hot, ok := r.Row("hot_temperature")
	if !ok {
		return
	}
	for _, d := range r.Derived {
		if d.Key == "mean_pressure" && d.Value > 0 {
			c.AddMark(d.Value*1e-5, hot.Value, 0, 0)
			c.WithError(0, hot.PM)
		}
	}
}

// setProfilePlots draws |p1|, |U1|, Tm and acoustic power along x from a
// profile table (columns as calc/sheet writes them: x, |p1|, |U1|, phase,
// Tm, acoustic power).
func setProfilePlots(plots []*Plot, t *sheet.Table) {
	cols := []struct {
		col         int
		label, unit string
	}{
		{1, "|p1|", "Pa"},
		{2, "|U1|", "m³/s"},
		{4, "Mean temperature Tm", "K"},
		{5, "Acoustic power", "W"},
	}
	for i, c := range cols {
		if i >= len(plots) {
			break
		}
		plots[i].Set(lineXY(tableXY(t, 0, c.col, 1), "Position from the start end", "m", c.label, c.unit, c.label+" along the device"))
	}
}

// lineXY is a titled line plot; nil when there are fewer than two points.
func lineXY(xy XYs, xl, xu, yl, yu, title string) *Chart {
	if len(xy) < 2 {
		return nil
	}
	p := NewXYPlot(xl, xu, yl, yu)
	p.Title = title
	p.AddLine(xy)
	return p
}

// Layout implements Screen.
func (s *onsetScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.begin(gtx, onsetTables, s.showPlots)
	top, inputs := s.columns(gtx, "Build the engine from parts, closed end first. The hot temperature and frequency at which it starts are solved with Rott's linear theory after every change.",
		"Onset", "hot", "frequency-guess")
	ws := s.outputs(func() []layout.Widget {
		ws := []layout.Widget{Heading(s.env, "Along the device"), s.statusLine}
		for _, p := range s.plots[:4] {
			ws = append(ws, p.Layout)
		}
		ws = append(ws, Note(s.env, "Profiles for |p1| = 1 Pa at the start end: the linear theory fixes shapes, not amplitudes. With a hot temperature typed, they are the nearest mode's at that temperature."))
		ws = append(ws, Heading(s.env, "Onset and fill pressure"), s.plots[4].Layout)
		return append(ws, Note(s.env, s.form.Sheet.About))
	})
	return splitLayout(gtx, s.page, s.side, top, inputs, ws)
}
