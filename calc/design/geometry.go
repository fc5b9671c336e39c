package design

import (
	"bytes"
	"fmt"
	"math"
	"strconv"

	"tubewright/calc/linear"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Geometry is one engine of the design family, SI units: the closed hot
// end, a hot space, the heater, the stack, the cooler, the resonator and
// the far end, all of the tube's inside diameter.
type Geometry struct {
	HotSpace  float64 // closed end to heater, m
	Heater    float64 // heater length, m
	Stack     float64 // stack length, m
	Cooler    float64 // cooler length, m
	Resonator float64 // cooler to far end, m

	// HydraulicRadius is the stack's gas volume over wetted area, m: the
	// half gap y0 of plates, half the radius of round pores.
	HydraulicRadius float64
	// Porosity is the stack's open fraction of the cross-section, 1.
	Porosity float64
	// Pores are the stack's pores as the device file writes them.
	Pores linear.Pores
	// Gap is the stack's gap in the sense of Target.MinGap, m.
	Gap float64
}

// Position returns the distance from the closed hot end to the stack's hot
// face, m.
func (g Geometry) Position() float64 { return g.HotSpace + g.Heater }

// Centre returns the distance from the closed hot end to the stack's
// centre, m.
func (g Geometry) Centre() float64 { return g.Position() + g.Stack/2 }

// Length returns the whole tube length, m.
func (g Geometry) Length() float64 {
	return g.HotSpace + g.Heater + g.Stack + g.Cooler + g.Resonator
}

// Porosities used for the stack kinds whose porosity the design does not
// derive, and for the heat exchangers' fins (common practice, no published
// source: plate stacks and ceramic cell stacks are commonly 70–80 % open,
// finned exchangers about 60–70 %).
const (
	stackPorosity     = 0.75
	exchangerPorosity = 0.7
)

// Packing limits of screens and metal wool, as porosity (common practice,
// no published source: stacked screens are about 60–90 % open, the coarse
// meshes of stacks at the open end; metal wool about 70–98 %).
const (
	screenPorosityMin, screenPorosityMax = 0.6, 0.9
	woolPorosityMin, woolPorosityMax     = 0.7, 0.98
)

// poresFor returns the stack pores of kind k with hydraulic radius rh (m),
// their porosity and their gap (as Target.MinGap defines it).
//
//	plates:      y0 = r_h, plate thickness 2 y0 (1/φ - 1) for φ = 0.75
//	round pores: R = 2 r_h, φ = 0.75
//	screens:     mesh m = 1 / (π (r_h + d/4)), φ = 1 - π m d/4 = r_h / (r_h + d/4)
//	metal wool:  φ = 4 r_h / (d + 4 r_h)
//
// The screen and wool forms invert r_h = φ d / (4 (1 - φ)) of calc/pore's
// Screens and Fibres (Swift 2002, ch. 7, from memory, as cited there).
func poresFor(k StackKind, rh, wire float64) (p linear.Pores, porosity, gap float64) {
	switch k {
	case RoundPores:
		return linear.Pores{Shape: "circular", Radius: 2 * rh}, stackPorosity, 4 * rh
	case Screens:
		m := 1 / (math.Pi * (rh + wire/4))
		return linear.Pores{Shape: "screens", Mesh: m, WireDiameter: wire}, rh / (rh + wire/4), 1/m - wire
	case MetalWool:
		return linear.Pores{Shape: "fibres", FibreDiameter: wire}, 4 * rh / (wire + 4*rh), 4 * rh
	}
	return linear.Pores{Shape: "plates", HalfGap: rh, Thickness: 2 * rh * (1/stackPorosity - 1)}, stackPorosity, 2 * rh
}

// rhLimits returns the hydraulic radii (m) the stack kind can be built
// with: the packing limits of screens and wool, and the smallest gap.
func rhLimits(k StackKind, wire, minGap float64) (lo, hi float64) {
	lo, hi = 1e-6, 0.05
	switch k {
	case Plates:
		lo = math.Max(lo, minGap/2)
	case RoundPores, MetalWool:
		lo = math.Max(lo, minGap/4)
	case Screens:
		// opening π(r_h + d/4) - d >= minGap
		lo = math.Max(lo, (minGap+wire)/math.Pi-wire/4)
	}
	switch k {
	case Screens:
		// φ = r_h/(r_h + d/4): r_h = φ d / (4 (1 - φ))
		lo = math.Max(lo, screenPorosityMin*wire/(4*(1-screenPorosityMin)))
		hi = math.Min(hi, screenPorosityMax*wire/(4*(1-screenPorosityMax)))
	case MetalWool:
		lo = math.Max(lo, woolPorosityMin*wire/(4*(1-woolPorosityMin)))
		hi = math.Min(hi, woolPorosityMax*wire/(4*(1-woolPorosityMax)))
	}
	return lo, hi
}

// exchangerPores are the fins of heater and cooler: parallel plates with
// the stack's hydraulic radius as half gap, 70 % open.
func exchangerPores(rh float64) linear.Pores {
	return linear.Pores{Shape: "plates", HalfGap: rh, Thickness: 2 * rh * (1/exchangerPorosity - 1)}
}

// device builds the validated device of geometry g directly (no text),
// for the solves inside the search.
func (t *Target) device(g Geometry, gas gasprops.Mixture) *linear.Device {
	d := t.Diameter
	far := linear.Part{Kind: linear.KindClosedEnd}
	if t.Ends == QuarterWave {
		far = linear.Part{Kind: linear.KindOpenEnd}
	}
	hx := exchangerPores(g.HydraulicRadius)
	return &linear.Device{
		Name: "design", GasText: t.Gas, Gas: gas,
		MeanPressure: t.MeanPressure, AmbientTemperature: t.Ambient,
		Parts: []linear.Part{
			{Kind: linear.KindClosedEnd},
			{Kind: linear.KindTube, Label: "hot space", Length: g.HotSpace, Diameter: d, Temp: linear.TempHot},
			{Kind: linear.KindExchanger, Label: "heater", Length: g.Heater, Diameter: d, Temp: linear.TempHot, Porosity: exchangerPorosity, Pores: hx},
			{Kind: linear.KindStack, Label: "stack", Length: g.Stack, Diameter: d, Porosity: g.Porosity, Pores: g.Pores},
			{Kind: linear.KindExchanger, Label: "cooler", Length: g.Cooler, Diameter: d, Temp: linear.TempAmbient, Porosity: exchangerPorosity, Pores: hx},
			{Kind: linear.KindTube, Label: "resonator", Length: g.Resonator, Diameter: d, Temp: linear.TempAmbient},
			far,
		},
	}
}

// File writes the design as a device file in the project's own format.
// Lengths are written in mm to 1 µm, pore sizes to 0.1 µm, porosities to
// four decimals, so the file reads back as the device within those
// roundings; Result.Onset is solved on the file as read back.
func (t *Target) file(g Geometry, name, notes string) linear.DeviceFile {
	d := mm(t.Diameter, 3)
	hx := exchangerPores(g.HydraulicRadius)
	far := linear.PartFile{Kind: linear.KindClosedEnd, Label: "far end"}
	if t.Ends == QuarterWave {
		far = linear.PartFile{Kind: linear.KindOpenEnd, Label: "far end", Flange: "none"}
	}
	return linear.DeviceFile{
		Name:               name,
		Gas:                t.Gas,
		MeanPressure:       trimFull(t.MeanPressure/1e5) + " bar",
		AmbientTemperature: trimFull(t.Ambient) + " K",
		Notes:              notes,
		PartsList: []linear.PartFile{
			{Kind: linear.KindClosedEnd, Label: "closed end"},
			{Kind: linear.KindTube, Label: "hot space", Length: mm(g.HotSpace, 3), Diameter: d, Temperature: "hot"},
			{Kind: linear.KindExchanger, Label: "heater", Length: mm(g.Heater, 3), Diameter: d, Temperature: "hot",
				Porosity: frac(exchangerPorosity), Pores: poresFile(hx)},
			{Kind: linear.KindStack, Label: "stack", Length: mm(g.Stack, 3), Diameter: d,
				Porosity: frac(g.Porosity), Pores: poresFile(g.Pores)},
			{Kind: linear.KindExchanger, Label: "cooler", Length: mm(g.Cooler, 3), Diameter: d, Temperature: "ambient",
				Porosity: frac(exchangerPorosity), Pores: poresFile(hx)},
			{Kind: linear.KindTube, Label: "resonator", Length: mm(g.Resonator, 3), Diameter: d, Temperature: "ambient"},
			far,
		},
	}
}

// poresFile writes pores with the fields of their shape, in the whole
// sizes the device file saves (gap 2y0, pore diameter), as linear's
// writer does; the half sizes are for reading older files only.
func poresFile(p linear.Pores) *linear.PoresFile {
	f := &linear.PoresFile{Shape: p.Shape}
	switch p.Shape {
	case "plates":
		f.Gap = mm(2*p.HalfGap, 4)
		if p.Thickness > 0 {
			f.Thickness = mm(p.Thickness, 4)
		}
	case "circular":
		f.Diameter = mm(2*p.Radius, 4)
	case "screens":
		f.Mesh = strconv.FormatFloat(p.Mesh, 'f', 2, 64) + " /m"
		f.WireDiameter = mm(p.WireDiameter, 4)
	case "fibres":
		f.FibreDiameter = mm(p.FibreDiameter, 4)
	default:
		panic("calc: design: pore shape " + p.Shape + " is not written by the design")
	}
	return f
}

// mm writes a length (m) in millimetres with dec decimals.
func mm(v float64, dec int) string {
	return strconv.FormatFloat(v*1e3, 'f', dec, 64) + " mm"
}

// frac writes a fraction with four decimals.
func frac(v float64) string { return fmt.Sprintf("%.4f", v) }

// trimFull writes v with all the digits it needs to read back exactly.
func trimFull(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

// pressureText writes a pressure for people without exponents: in bar
// from 0.1 bar up, in Pa below.
func pressureText(p float64) string {
	unit := "bar"
	if p < 1e4 {
		unit = "Pa"
	}
	s, err := units.FormatIn(p, unit)
	if err != nil {
		return units.Format(p, units.DimPressure)
	}
	return s
}

// readBack writes f with linear's writer and reads it with linear's
// parser, so that what is reported is what the file says.
func readBack(f *linear.DeviceFile) (*linear.Device, error) {
	b, err := f.Marshal()
	if err != nil {
		return nil, err
	}
	d, err := linear.ParseDevice(bytes.NewReader(b))
	if err != nil {
		return nil, fmt.Errorf("design: the written device does not read back (a bug): %w", err)
	}
	return d, nil
}
