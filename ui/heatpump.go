package ui

import (
	"context"
	"strconv"

	"gioui.org/layout"

	"tubewright/calc/sheet"
)

// heatPumpScreen builds a driven heat pump from parts and shows, from the
// heat-pump description, the cold temperature, the span, the acoustic
// power and the COP against Carnot, then the profiles and the span against
// drive frequency, drawn from the description's tables off the UI
// goroutine.
type heatPumpScreen struct {
	deviceView
}

// newHeatPumpScreen builds the heat-pump screen with the example pump.
func newHeatPumpScreen(env *Env) Screen {
	s, _ := sheet.Lookup(sheet.IDHeatPump)
	return &heatPumpScreen{deviceView: newDeviceView(env, s, "heatpump", 4)}
}

// Title implements Screen.
func (s *heatPumpScreen) Title() string { return s.form.Sheet.Title }

// pumpTables is the plots' run: the profile at the result shown, then the
// span from 0.8 to 1.2 times its drive frequency.
func pumpTables(ctx context.Context, s *sheet.Sheet, texts map[string]string) (*deviceTables, error) {
	prof, err := evaluateWith(ctx, s, texts, "profile", "true")
	if err != nil {
		return nil, err
	}
	out := &deviceTables{profile: prof.Table}
	row, ok := prof.Row("frequency")
	if !ok || row.Value <= 0 {
		return out, nil
	}
	f := row.Value
	span := strconv.FormatFloat(0.8*f, 'g', -1, 64) + " Hz:" + strconv.FormatFloat(1.2*f, 'g', -1, 64) + " Hz:17"
	sw, err := evaluateWith(ctx, s, texts, "sweep-frequency", span)
	if err == nil {
		out.sweep = sw.Table
	}
	return out, ctx.Err()
}

// showPlots draws Tm, |p1| and acoustic power along the device and the
// span against drive frequency, with the best drive frequency of the
// result shown marked on it.
func (s *heatPumpScreen) showPlots(t *deviceTables) {
	s.plots[0].Set(lineXY(tableXY(t.profile, 0, 4, 1), "Position from the driver", "m", "Mean temperature Tm", "K", "Mean temperature along the device"))
	s.plots[1].Set(lineXY(tableXY(t.profile, 0, 1, 1), "Position from the driver", "m", "|p1|", "Pa", "Pressure amplitude along the device"))
	s.plots[2].Set(lineXY(tableXY(t.profile, 0, 5, 1), "Position from the driver", "m", "Acoustic power", "W", "Acoustic power along the device"))
	sp := lineXY(tableXY(t.sweep, 0, 2, 1), "Drive frequency", "Hz", "Span", "K", "Span against drive frequency")
	if sp != nil {
		if r := s.form.Result(); r != nil {
			f, okF := r.Row("best_drive_frequency")
			span, okS := r.Row("best_span")
			if okF && okS {
				sp.AddMark(f.Value, span.Value, 0, 0)
			}
		}
	}
	s.plots[3].Set(sp)
}

// Layout implements Screen.
func (s *heatPumpScreen) Layout(gtx layout.Context) layout.Dimensions {
	s.begin(gtx, pumpTables, s.showPlots)
	top, inputs := s.columns(gtx, "Build the heat pump from parts, driver first; mark the stack's cold side \"cold\". The span is solved with Rott's linear theory and the total-power equation through the stack after every change.",
		"Heat pump", "load", "frequency")
	ws := s.outputs(func() []layout.Widget {
		ws := []layout.Widget{Heading(s.env, "Along the device"), s.statusLine, s.plots[0].Layout, s.plots[1].Layout, s.plots[2].Layout}
		ws = append(ws, Heading(s.env, "Best drive frequency"), s.plots[3].Layout)
		return append(ws, Note(s.env, s.form.Sheet.About))
	})
	return splitLayout(gtx, s.page, s.side, top, inputs, ws)
}
