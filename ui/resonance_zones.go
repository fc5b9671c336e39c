package ui

import (
	"errors"
	"fmt"
	"math"
	"strconv"

	"gioui.org/layout"

	"tubewright/calc/resonator"
	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// zoneEditor edits the "zones" input of the resonance form one field per
// value: how many zones, then the length, inside diameter (or radius, a
// chip away) and gas temperature of each. The form's one-line zones field
// stays below it (it takes a list pasted from twcalc); the two are kept in
// step, and an error about one zone marks that zone's field.
type zoneEditor struct {
	env   *Env
	form  *Form
	count *Choice
	zones [resonator.MaxZones]zoneFields
	// line is the form's zones text the fields last agreed with.
	line string
	// Kept between frames (see widgets).
	countW layout.Widget
	zoneWs [][3]layout.Widget
	ws     []layout.Widget
}

// zoneFields are the fields of one zone; size is its inside diameter, or
// its radius when sizeAs says so.
type zoneFields struct {
	length, size, temp *Field
	sizeAs             *sizeAs
}

// sizeText is the zone's size as the zones text writes it: "d 24 mm" or
// "r 12 mm".
func (f *zoneFields) sizeText() string {
	return sheet.ZoneSizeJoin(f.size.Text(), f.sizeAs.half())
}

// field returns the field of part p (nil for the zone as a whole).
func (f *zoneFields) field(p sheet.ZonePart) *Field {
	switch p {
	case sheet.ZoneLength:
		return f.length
	case sheet.ZoneSize:
		return f.size
	case sheet.ZoneTemperature:
		return f.temp
	}
	return nil
}

func newZoneEditor(env *Env, form *Form) *zoneEditor {
	keys, words := make([]string, resonator.MaxZones), make([]string, resonator.MaxZones)
	for i := range keys {
		keys[i] = strconv.Itoa(i + 1)
		words[i] = fmt.Sprintf("%d zones", i+1)
	}
	words[0] = "1 zone"
	z := &zoneEditor{env: env, form: form, count: NewChoice(env, "Number of zones", keys, words), line: "\x00"}
	for i := range z.zones {
		n := fmt.Sprintf("Zone %d ", i+1)
		z.zones[i] = zoneFields{
			length: NewField(env, n+"length", units.DimLength, "200 mm"),
			size:   NewField(env, n+"inside diameter", units.DimLength, "24 mm"),
			temp:   NewField(env, n+"temperature", units.DimTemperature, "20 degC"),
		}
		z.zones[i].temp.Options.DefaultUnit = "K"
		z.zones[i].length.Hint = "e.g. 100 mm, 0.4 m, 4 in"
		z.zones[i].sizeAs = roundSize(env, n+"inside diameter", n+"radius (half the inside diameter)", "")
		z.zones[i].size.Hint = "the tube's bore in this zone: 24 mm, 1 in"
		z.zones[i].temp.Hint = "mean gas temperature in this zone: 295 K, 20 degC"
	}
	z.zones[0].length.Hint = "zone 1 starts at the first end named above (the closed end of a closed – open tube)"
	z.zones[0].temp.Hint = "mean gas temperature in this zone, e.g. 600 K for a hot end"
	z.sync()
	return z
}

// n returns the number of zones in use.
func (z *zoneEditor) n() int {
	n, _ := strconv.Atoi(z.count.Selected())
	return n
}

// update handles the zone fields' events; a change by the user writes the
// zones into the form's input.
func (z *zoneEditor) update(gtx layout.Context) {
	ch := z.count.Update(gtx)
	for i := range z.zones {
		f := &z.zones[i]
		ch = f.length.Update(gtx) || ch
		ch = f.sizeAs.update(gtx, f.size) || ch
		ch = f.size.Update(gtx) || ch
		ch = f.temp.Update(gtx) || ch
	}
	if !ch {
		return
	}
	texts := make([][3]string, z.n())
	for i := range texts {
		f := &z.zones[i]
		texts[i] = [3]string{f.length.Text(), f.sizeText(), f.temp.Text()}
	}
	z.line = sheet.JoinZones(texts)
	z.form.SetText("zones", z.line)
}

// sync takes the form's zones text into the fields when it was changed
// there (typed into the one-line field), and marks the field of the zone
// an error is about.
func (z *zoneEditor) sync() {
	if t := z.form.Text("zones"); t != z.line {
		z.line = t
		if zs, err := sheet.SplitZones(t); err == nil && len(zs) > 0 {
			z.count.Select(strconv.Itoa(len(zs)))
			for i, texts := range zs {
				zf := &z.zones[i]
				size, radius := sheet.ZoneSizeText(texts[1])
				texts[1] = size
				if radius != zf.sizeAs.half() {
					form := sizeWhole
					if radius {
						form = sizeHalf
					}
					zf.sizeAs.choice.Select(form)
					zf.sizeAs.relabel(zf.size)
				}
				for j, fd := range []*Field{zf.length, zf.size, zf.temp} {
					if fd.Text() != texts[j] {
						fd.SetText(texts[j])
					}
				}
			}
		}
	}
	for i := range z.zones {
		for _, fd := range [...]*Field{z.zones[i].length, z.zones[i].size, z.zones[i].temp} {
			fd.SetError(nil)
		}
	}
	err := z.form.Err()
	if err == nil {
		return // errors.As would put ze on the heap each frame
	}
	var ze *sheet.ZoneError
	if errors.As(err, &ze) && ze.Zone >= 0 && ze.Zone < len(z.zones) {
		if fd := z.zones[ze.Zone].field(ze.Part); fd != nil {
			fd.SetError(ze)
		}
	}
}

// widgets lists the count and the fields of the zones in use. The slice
// is the editor's own, valid until the next call; the widgets are made
// once.
func (z *zoneEditor) widgets() []layout.Widget {
	if z.countW == nil {
		z.countW = z.count.Layout
		for i := range z.zones {
			f := &z.zones[i]
			z.zoneWs = append(z.zoneWs, [3]layout.Widget{f.length.Layout, f.sizeAs.layout(z.env, f.size), f.temp.Layout})
		}
	}
	z.ws = append(z.ws[:0], z.countW)
	for i := 0; i < z.n(); i++ {
		z.ws = append(z.ws, z.zoneWs[i][:]...)
	}
	return z.ws
}

// showModes fills the results card of a zoned-tube result with one row
// per mode (frequency, with the travel-time estimate in the note) in place
// of the one-line list the terminal prints, which is too wide for a row.
func showModes(r *Results, res *sheet.Result) {
	row, ok := res.Row("modes")
	modes, isList := row.Any.([]sheet.ZoneMode)
	if !ok || !isList {
		return
	}
	rest := *res
	rest.Rows = nil
	for _, row := range res.Rows {
		if row.Key != "modes" {
			rest.Rows = append(rest.Rows, row)
		}
	}
	r.Reset()
	r.Show(&rest)
	for _, m := range modes {
		r.Add(fmt.Sprintf("Mode %d", m.Mode), m.Frequency, units.DimFrequency)
		word := "higher"
		if m.Difference < 0 {
			word = "lower"
		}
		r.AddNote(fmt.Sprintf("travel-time estimate %s, %s %s", units.Format(m.TravelTime, units.DimFrequency),
			units.Format(math.Abs(m.Difference), units.DimFrequency), word))
	}
}
