package ui

import (
	"io"
	"strconv"
	"strings"

	"gioui.org/font"
	"gioui.org/io/clipboard"
	"gioui.org/layout"
	"gioui.org/unit"
	"gioui.org/widget"
	"gioui.org/widget/material"
)

// This file holds the text around a plot: its title and buttons, the
// readout of the point being read, and the table view of every sweep with
// its copy button.

// headerWidgets makes the header's widgets once (see NewPlot).
func (w *Plot) headerWidgets() {
	th := w.env.Theme
	btn := func(c *widget.Clickable, label func() string) layout.Widget {
		return func(gtx layout.Context) layout.Dimensions {
			return layout.Inset{Left: 6}.Layout(gtx, func(gtx layout.Context) layout.Dimensions {
				b := material.Button(th, c, label())
				b.Background = w.env.Colors.Selected
				b.Color = w.env.Colors.Text
				b.TextSize = unit.Sp(14)
				b.Inset = layout.Inset{Top: 10, Bottom: 10, Left: 12, Right: 12}
				return b.Layout(atTarget(gtx))
			})
		}
	}
	w.toggleW = btn(&w.tableBtn, func() string {
		if w.table {
			return "Plot"
		}
		return "Table"
	})
	w.copyW = btn(&w.copyBtn, func() string {
		if w.copied {
			return "Copied"
		}
		return "Copy"
	})
	w.titleW = func(gtx layout.Context) layout.Dimensions {
		l := material.Label(th, unit.Sp(16), w.chart.Title)
		l.Font.Weight = font.SemiBold
		l.Color = w.env.Colors.Text
		return l.Layout(gtx)
	}
	w.headerW = func(gtx layout.Context) layout.Dimensions {
		ch := [3]layout.FlexChild{layout.Flexed(1, w.titleW)}
		n := 1
		if w.table {
			ch[n] = layout.Rigid(w.copyW)
			n++
		}
		ch[n] = layout.Rigid(w.toggleW)
		return layout.Flex{Alignment: layout.Middle}.Layout(gtx, ch[:n+1]...)
	}
	w.readoutW = Described("Plot readout", func(gtx layout.Context) layout.Dimensions {
		if w.readoutFor != w.sel || w.readoutStr == "" {
			// Written when the point changes, not every frame.
			w.readoutStr, w.readoutFor = w.readoutText(), w.sel
		}
		l := material.Body2(w.env.Theme, w.readoutStr)
		l.Color = w.env.Colors.Text
		if !w.sel.ok {
			l.Color = w.env.Colors.Muted
		}
		return l.Layout(gtx)
	})
}

// layoutHeader draws the chart's title and the Table / Plot switch (and
// Copy in the table view).
func (w *Plot) layoutHeader(gtx layout.Context) layout.Dimensions {
	return layout.Inset{Bottom: 6}.Layout(gtx, w.headerW)
}

// readoutText is the line under the plot: the point being read with its
// units, or how to read one.
func (w *Plot) readoutText() string {
	if !w.sel.ok {
		return "Touch the plot to read the nearest point."
	}
	x, y := w.point(w.sel)
	var dx, dy float64
	what := ""
	if w.sel.l < 0 {
		m := w.chart.Marks[w.sel.i]
		dx, dy = m.DX, m.DY
		what = "Marked point: "
	}
	c := w.chart
	return what + c.X.Label + " " + w.cache.x.scale.readout(x, dx) + " · " +
		c.Y.Label + " " + w.cache.y.scale.readout(y, dy)
}

// layoutReadout writes readoutText under the plot.
func (w *Plot) layoutReadout(gtx layout.Context) layout.Dimensions {
	return layout.Inset{Top: 4}.Layout(gtx, w.readoutW)
}

// tableRows returns the table as rows of cells: a header with the axis
// titles, then every point of every sweep in the axes' display units, then
// the marked points. The first column names the sweep or mark when there
// is more than one block.
func (w *Plot) tableRows() [][]string {
	c := w.chart
	xs, ys := w.scales()
	rows := [][]string{{xs.title(c.X.Label), ys.title(c.Y.Label)}}
	for li, l := range c.Lines {
		if len(c.Lines) > 1 && li > 0 {
			rows = append(rows, []string{"", ""})
		}
		for _, p := range l {
			if finite(p.X) && finite(p.Y) {
				rows = append(rows, []string{xs.number(p.X), ys.number(p.Y)})
			}
		}
	}
	for _, m := range c.Marks {
		if !finite(m.X) || !finite(m.Y) {
			continue
		}
		x, y := xs.number(m.X), ys.number(m.Y)
		if m.DX > 0 {
			x += " ± " + xs.number(m.DX)
		}
		if m.DY > 0 {
			y += " ± " + ys.number(m.DY)
		}
		rows = append(rows, []string{"Marked point", ""}, []string{x, y})
	}
	return rows
}

// scales returns the axes' display scales; before the plot has been drawn
// at some size they are worked out here.
func (w *Plot) scales() (axisScale, axisScale) {
	if w.cacheSize.X > 0 {
		return w.cache.x.scale, w.cache.y.scale
	}
	return w.chart.makeTicks(false, 5).scale, w.chart.makeTicks(true, 5).scale
}

// TableText returns the table as tab-separated lines, what Copy puts on
// the clipboard (minus signs as ASCII hyphens, so spreadsheets read them).
func (w *Plot) TableText() string {
	if w.chart == nil {
		return ""
	}
	var b strings.Builder
	for _, r := range w.tableRows() {
		b.WriteString(strings.ReplaceAll(strings.Join(r, "\t"), "−", "-"))
		b.WriteByte('\n')
	}
	return b.String()
}

// copyTable puts TableText on the clipboard.
func (w *Plot) copyTable(gtx layout.Context) {
	gtx.Execute(clipboard.WriteCmd{Type: "application/text", Data: io.NopCloser(strings.NewReader(w.TableText()))})
}

// layoutTable draws the table in two columns with a header.
func (w *Plot) layoutTable(gtx layout.Context) layout.Dimensions {
	rows := w.tableRows()
	th := w.env.Theme
	col := w.env.Colors
	children := make([]layout.FlexChild, 0, len(rows)+1)
	for i, r := range rows {
		children = append(children, layout.Rigid(func(gtx layout.Context) layout.Dimensions {
			cell := func(s string) layout.FlexChild {
				return layout.Flexed(1, func(gtx layout.Context) layout.Dimensions {
					l := material.Body2(th, s)
					l.Color = col.Text
					if i == 0 {
						l.Font.Weight = font.SemiBold
					}
					return layout.Inset{Top: 2, Bottom: 2, Right: 8}.Layout(gtx, l.Layout)
				})
			}
			return layout.Flex{}.Layout(gtx, cell(r[0]), cell(r[1]))
		}))
	}
	children = append(children, layout.Rigid(func(gtx layout.Context) layout.Dimensions {
		n := 0
		for _, l := range w.chart.Lines {
			n += len(l)
		}
		return layout.Inset{Top: 4}.Layout(gtx, Note(w.env, strconv.Itoa(n)+" points; Copy puts the table on the clipboard, tab-separated."))
	}))
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx, children...)
}
