package ui

import (
	"errors"
	"fmt"

	"gioui.org/layout"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// zoneInputs describe a tube of two or three zones, each with its own
// length, radius and gas temperature, for the Tube resonance screen.
type zoneInputs struct {
	count *Choice
	zones [3]zoneFields
}

type zoneFields struct {
	length, radius, temp *Field
}

func newZoneInputs(env *Env) *zoneInputs {
	z := &zoneInputs{count: NewChoice(env, "Number of zones", []string{"2", "3"}, []string{"Two zones", "Three zones"})}
	start := [3][3]string{{"100 mm", "12 mm", "600 K"}, {"400 mm", "12 mm", "20 degC"}, {"200 mm", "12 mm", "20 degC"}}
	for i := range z.zones {
		n := fmt.Sprintf("Zone %d ", i+1)
		z.zones[i] = zoneFields{
			length: NewField(env, n+"length", units.DimLength, start[i][0]),
			radius: NewField(env, n+"radius", units.DimLength, start[i][1]),
			temp:   NewField(env, n+"temperature", units.DimTemperature, start[i][2]),
		}
		z.zones[i].temp.Options.DefaultUnit = "K"
		z.zones[i].length.Hint = "e.g. 100 mm, 0.4 m, 4 in"
		z.zones[i].radius.Hint = "half the inner diameter: 12 mm, 0.5 in"
		z.zones[i].temp.Hint = "mean gas temperature in this zone: 295 K, 20 degC"
	}
	z.zones[0].length.Hint = "zone 1 starts at the first end named above (the closed end of a closed – open tube)"
	z.zones[0].temp.Hint = "mean gas temperature in this zone, e.g. 600 K for a hot end"
	z.zones[1].temp.Hint = "mean gas temperature in this zone, e.g. 20 degC for an ambient section"
	return z
}

// n returns the number of zones in use.
func (z *zoneInputs) n() int {
	if z.count.Selected() == "3" {
		return 3
	}
	return 2
}

func (z *zoneInputs) update(gtx layout.Context) bool {
	ch := z.count.Update(gtx)
	for i := range z.zones {
		f := &z.zones[i]
		ch = f.length.Update(gtx) || ch
		ch = f.radius.Update(gtx) || ch
		ch = f.temp.Update(gtx) || ch
	}
	return ch
}

// widgets lists the controls in layout order.
func (z *zoneInputs) widgets() []layout.Widget {
	ws := []layout.Widget{z.count.Layout}
	for i := 0; i < z.n(); i++ {
		f := &z.zones[i]
		ws = append(ws, f.length.Layout, f.radius.Layout, f.temp.Layout)
	}
	return ws
}

// read returns the zones; parse errors are shown under their fields.
func (z *zoneInputs) read() ([]resonator.Zone, error) {
	var errs []error
	zs := make([]resonator.Zone, z.n())
	for i := range zs {
		f := &z.zones[i]
		for _, fl := range []*Field{f.length, f.radius, f.temp} {
			fl.SetError(nil)
		}
		l, e1 := f.length.Value()
		r, e2 := f.radius.Value()
		t, e3 := f.temp.Value()
		if !e1 || !e2 || !e3 {
			errs = append(errs, errors.New("bad zone"))
		}
		zs[i] = resonator.Zone{Length: l, Radius: r, Temperature: t}
	}
	if len(errs) > 0 {
		return nil, errors.New("check the fields marked in red")
	}
	return zs, nil
}

// computeZones solves the zoned tube for its first modes.
func (s *resonanceScreen) computeZones() {
	r := s.results
	zs, err := s.zones.read()
	if err != nil {
		r.Fail(err)
		return
	}
	mix, err := s.picker.Mixture()
	if err != nil {
		r.Fail(err)
		return
	}
	pq, err := s.press.Quantity()
	if err != nil {
		r.Fail(errors.New("check the fields marked in red"))
		return
	}
	ends, _ := resonator.ParseEnds(s.tube.ends.Selected())
	corr, _ := resonator.ParseEndCorrection(s.tube.corr.Selected())
	zt := resonator.ZonedTube{Ends: ends, Correction: corr, Zones: zs, Gas: mix, Pressure: pq.Value}
	res, err := zt.Modes(3)
	if err != nil {
		fields := map[string]*Field{"pressure": s.press}
		for i := range zs {
			f := &s.zones.zones[i]
			n := fmt.Sprintf("zone %d ", i+1)
			fields[n+"length"], fields[n+"radius"], fields[n+"temperature"] = f.length, f.radius, f.temp
		}
		blameField(err, fields)
		r.Fail(err)
		return
	}
	s.env.Bench.SetGas(s.picker.Text())
	s.env.Bench.SetPressure(pq.Value)
	for _, m := range res.Modes {
		r.Add(fmt.Sprintf("Mode %d", m.Number), m.Frequency, units.DimFrequency)
		r.AddNote(fmt.Sprintf("travel-time estimate %s, %s", units.Format(m.TravelTime, units.DimFrequency), differenceText(m)))
	}
	s.head, _ = r.Value("Mode 1")
	s.last = res.Modes[0].Frequency
	r.Warn(res.Warnings...)
}

// differenceText says how far the travel-time estimate is off, in Hz and %.
func differenceText(m resonator.ZoneMode) string {
	pct := 100 * m.Difference / m.Frequency
	word := "higher"
	if m.Difference < 0 {
		word = "lower"
	}
	return fmt.Sprintf("%s %s (%.2g %%)", units.Format(abs(m.Difference), units.DimFrequency), word, abs(pct))
}

// helmholtzInputs describe a Helmholtz resonator.
type helmholtzInputs struct {
	volume, neckLength, neckRadius *Field
	outer                          *Choice
}

func newHelmholtzInputs(env *Env) *helmholtzInputs {
	h := &helmholtzInputs{
		volume:     NewField(env, "Cavity volume", units.DimVolume, "1 L"),
		neckLength: NewField(env, "Neck length", units.DimLength, "50 mm"),
		neckRadius: NewField(env, "Neck inner radius", units.DimLength, "10 mm"),
		outer: NewChoice(env, "Outer end of the neck", []string{"none", "unflanged", "flanged"},
			[]string{"No correction", "Unflanged (bare tube end)", "Flanged (end in a wall)"}),
	}
	h.outer.Select("unflanged")
	h.volume.Hint = "e.g. 1 L, 500 mL, 0.002 m3"
	h.neckLength.Hint = "e.g. 50 mm, 2 in; at least the neck radius"
	h.neckRadius.Hint = "half the neck's inner diameter: 10 mm"
	return h
}

func (h *helmholtzInputs) update(gtx layout.Context) bool {
	ch := h.volume.Update(gtx)
	ch = h.neckLength.Update(gtx) || ch
	ch = h.neckRadius.Update(gtx) || ch
	return h.outer.Update(gtx) || ch
}

// computeHelmholtz solves the Helmholtz resonator.
func (s *resonanceScreen) computeHelmholtz() {
	r := s.results
	h := s.helm
	for _, f := range []*Field{h.volume, h.neckLength, h.neckRadius} {
		f.SetError(nil)
	}
	v, ok1 := h.volume.Value()
	l, ok2 := h.neckLength.Value()
	a, ok3 := h.neckRadius.Value()
	mix, gerr := s.picker.Mixture()
	tq, terr := s.temp.Quantity()
	pq, perr := s.press.Quantity()
	if gerr != nil {
		r.Fail(gerr)
		return
	}
	if !ok1 || !ok2 || !ok3 || terr != nil || perr != nil {
		r.Fail(errors.New("check the fields marked in red"))
		return
	}
	g, err := mix.Properties(units.Temperature(tq.Value), units.Pressure(pq.Value), nil)
	if err != nil {
		blameField(err, map[string]*Field{"temperature": s.temp, "pressure": s.press})
		r.Fail(err)
		return
	}
	outer, _ := resonator.ParseEndCorrection(h.outer.Selected())
	res, err := resonator.HelmholtzFrequency(resonator.Helmholtz{Volume: v, NeckLength: l, NeckRadius: a, Outer: outer}, g)
	if err != nil {
		blameField(err, map[string]*Field{"cavity volume": h.volume, "neck length": h.neckLength, "neck radius": h.neckRadius})
		r.Fail(err)
		return
	}
	s.env.Bench.SetGas(s.picker.Text())
	s.env.Bench.SetTemperature(tq.Value)
	s.env.Bench.SetPressure(pq.Value)
	r.Add("Resonance frequency", res.Frequency, units.DimFrequency)
	s.head, _ = r.Value("Resonance frequency")
	s.last = res.Frequency
	r.AddIn("Inner end correction", res.InnerCorrection, "mm")
	r.AddNote("where the neck opens into the cavity (flanged)")
	r.AddIn("Outer end correction", res.OuterCorrection, "mm")
	r.Add("Effective neck length", res.EffectiveLength, units.DimLength)
	r.Add("Sound speed", res.SoundSpeed, units.DimSpeed)
	r.Add("Wavelength", res.Wavelength, units.DimLength)
	r.Warn(res.Warnings...)
}
