package ui

import (
	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget/material"

	"tubewright/calc/sheet"
)

// headline shows the main answer large, or nothing when there is none.
func headline(env *Env, label, value string) layout.Widget {
	return func(gtx layout.Context) layout.Dimensions {
		if value == "" {
			return layout.Dimensions{}
		}
		return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
			layout.Rigid(func(gtx layout.Context) layout.Dimensions {
				l := material.Body2(env.Theme, label)
				l.Color = env.Colors.Muted
				return l.Layout(gtx)
			}),
			layout.Rigid(Described("Answer", func(gtx layout.Context) layout.Dimensions {
				l := material.Label(env.Theme, unit.Sp(30), value)
				l.Color = env.Colors.Accent
				l.Font.Weight = 700
				return l.Layout(gtx)
			})),
		)
	}
}

// formHeadline is the headline of a form's first result row: its label
// and its value as the results card shows it, with the operating point it
// was worked out at beneath (see withPoint).
func formHeadline(env *Env, f *Form) layout.Widget {
	res := f.Result()
	if res == nil || len(res.Rows) == 0 {
		return headline(env, "", "")
	}
	row := res.Rows[0]
	value, _ := f.Results.Value(row.Label)
	return withPoint(f, headline(env, row.Label, value))
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
	visible := map[string]bool{}
	for _, k := range shown {
		visible[k] = true
	}
	changed := false
	for i := range f.Sheet.Inputs {
		in := &f.Sheet.Inputs[i]
		if in.Kind == sheet.Pick || in.Kind == sheet.Switch || in.Kind == sheet.Gas || in.Share != sheet.ShareNone {
			continue
		}
		text := f.Text(in.Key)
		switch {
		case !visible[in.Key] && text != in.Default:
			stash[in.Key] = text
			f.SetText(in.Key, in.Default)
			changed = true
		case visible[in.Key] && text == in.Default && stash[in.Key] != "":
			f.SetText(in.Key, stash[in.Key])
			delete(stash, in.Key)
			changed = true
		}
	}
	return changed
}
