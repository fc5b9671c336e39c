package ui

import (
	"slices"

	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
)

// headline shows the main answer large, or nothing when there is none.
func headline(env *Env, label, value string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions { return layoutHeadline(gtx, env, label, value) }
}

// layoutHeadline draws the headline of headline without making a widget.
func layoutHeadline(gtx layout.Context, env *Env, label, value string) layout.Dimensions {
	if value == "" {
		return layout.Dimensions{}
	}
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			l := material.Body2(env.Theme, label)
			l.Color = env.Colors.Muted
			return l.Layout(gtx)
		}),
		layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			l := material.Label(env.Theme, unit.Sp(30), value)
			l.Color = env.Colors.Accent
			l.Font.Weight = 700
			return describe(gtx, "Answer", l.Layout)
		}),
	)
}

// formHead is the headline of a form's first result row: its label and
// its value as the results card shows it, with the operating point it was
// worked out at beneath. Its widget is bound once
// and reads the form each frame.
type formHead struct {
	env *Env
	f   *Form
	w   layout.Widget
}

// newFormHead returns the headline of f.
func newFormHead(env *Env, f *Form) *formHead {
	h := &formHead{env: env, f: f}
	h.w = h.layout
	return h
}

// widget returns the headline's widget. While the form has a result, the
// results card then leaves the operating point out (the headline shows it).
func (h *formHead) widget() layout.Widget {
	if res := h.f.Result(); res != nil && len(res.Rows) > 0 {
		h.f.cs.headed = true
	}
	return h.w
}

// layout draws the headline, or nothing without a result.
func (h *formHead) layout(gtx layout.Context) layout.Dimensions {
	res := h.f.Result()
	if res == nil || len(res.Rows) == 0 {
		return layout.Dimensions{}
	}
	label := res.Rows[0].Label
	value, _ := h.f.Results.Value(label)
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(func(gtx layout.Context) layout.Dimensions { return layoutHeadline(gtx, h.env, label, value) }),
		layout.Rigid(layout.Spacer{Height: 4}.Layout),
		layout.Rigid(h.f.PointWidget),
	)
}

// curveChart draws a calculator's curve with its result marked; nil when
// there is no curve.
func curveChart(c sheet.Curve, ok bool) *Chart {
	if !ok {
		return nil
	}
	xy := make(XYs, len(c.X))
	for i := range c.X {
		xy[i].X, xy[i].Y = c.X[i], c.Y[i]
	}
	return linePlot(xy, c.MarkX, c.MarkY, c.XLabel, c.XUnit, c.Title).WithError(c.MarkDX, c.MarkDY)
}

// linePlot draws xy as a line and marks (x0, y0) when finite.
func linePlot(xy XYs, x0, y0 float64, xLabel, xUnit, title string) *Chart {
	p := NewXYPlot(xLabel, xUnit, "Resonance frequency", "Hz")
	p.Title = title
	p.AddLine(xy)
	if finite(x0) && finite(y0) {
		p.AddMark(x0, y0, 0, 0)
	}
	return p
}

// hideInputs empties the typed inputs of f that are not in shown, keeping
// their texts in stash, and gives back the texts of those shown again, so
// that a value left in a hidden field can neither be sent nor stop the
// result with an error about a field nobody sees. Choices, switches and
// gases are left alone (they always hold a valid value), and so are the
// values carried between screens (a hidden temperature keeps the one
// last used, rather than sending its default back to the Bench). It
// reports whether anything changed.
func hideInputs(f *Form, shown []string, stash map[string]string) bool {
	changed := false
	for i := range f.Sheet.Inputs {
		in := &f.Sheet.Inputs[i]
		if in.Kind == sheet.Pick || in.Kind == sheet.Switch || in.Kind == sheet.Gas || in.Share != sheet.ShareNone {
			continue
		}
		text, visible := f.Text(in.Key), slices.Contains(shown, in.Key)
		switch {
		case !visible && text != in.Default:
			stash[in.Key] = text
			f.SetText(in.Key, in.Default)
			changed = true
		case visible && text == in.Default && stash[in.Key] != "":
			f.SetText(in.Key, stash[in.Key])
			delete(stash, in.Key)
			changed = true
		}
	}
	return changed
}
