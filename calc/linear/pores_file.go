package linear

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"tubewright/calc/units"
)

// PoresFile describes the pores of a stack or exchanger. Sizes are given
// whole, as people measure them: the gap between plates, a pore's or a
// pin's diameter, a channel's width and height. Files written before the
// whole sizes were the rule gave halves ("half_gap", "radius",
// "half_width", "half_height", "pin_radius"); they are still read (give
// one of each pair), and Upgrade turns them into the whole sizes.
type PoresFile struct {
	Shape         string `json:"shape"`
	Gap           string `json:"gap,omitempty"`            // plates: 2y0, plate to plate
	Thickness     string `json:"thickness,omitempty"`      // plates (optional)
	Diameter      string `json:"diameter,omitempty"`       // circular
	Width         string `json:"width,omitempty"`          // rectangular
	Height        string `json:"height,omitempty"`         // rectangular
	PinDiameter   string `json:"pin_diameter,omitempty"`   // pins
	Pitch         string `json:"pitch,omitempty"`          // pins
	Mesh          string `json:"mesh,omitempty"`           // screens, per length
	WireDiameter  string `json:"wire_diameter,omitempty"`  // screens
	FibreDiameter string `json:"fibre_diameter,omitempty"` // fibres

	// The half sizes of older files: read, turned into the whole sizes by
	// Upgrade, never written by the app.
	HalfGap    string `json:"half_gap,omitempty"`    // plates: y0
	Radius     string `json:"radius,omitempty"`      // circular
	HalfWidth  string `json:"half_width,omitempty"`  // rectangular
	HalfHeight string `json:"half_height,omitempty"` // rectangular
	PinRadius  string `json:"pin_radius,omitempty"`  // pins
}

// poreSize is one size of a pore shape as a file gives it: whole (the
// key written) or, in older files, as its half.
type poreSize struct {
	whole, half       string  // JSON keys: "gap", "half_gap"
	wholeText, halfTx *string // the file's texts
	dst               *float64
}

// sizes lists the sizes of pf's shape that come whole or as a half, with
// where each goes in ps (the half, in SI).
func (pf *PoresFile) sizes(ps *Pores) []poreSize {
	switch pf.Shape {
	case "plates":
		return []poreSize{{"gap", "half_gap", &pf.Gap, &pf.HalfGap, &ps.HalfGap}}
	case "circular":
		return []poreSize{{"diameter", "radius", &pf.Diameter, &pf.Radius, &ps.Radius}}
	case "rectangular":
		return []poreSize{{"width", "half_width", &pf.Width, &pf.HalfWidth, &ps.HalfWidth},
			{"height", "half_height", &pf.Height, &pf.HalfHeight, &ps.HalfHeight}}
	case "pins":
		return []poreSize{{"pin_diameter", "pin_radius", &pf.PinDiameter, &pf.PinRadius, &ps.PinRadius}}
	}
	return nil
}

// Bounds of a pore size, SI, on the half (a half gap, a radius).
const (
	poreHalfMin = 1e-7 // m
	poreHalfMax = 0.1  // m
)

func (pf *PoresFile) validate(i int, kind string) (Pores, error) {
	ps := Pores{Shape: pf.Shape}
	fe := func(field, msg string) error {
		return &FieldError{Part: i, Kind: kind, Field: "pores." + field, Msg: msg}
	}
	var err error
	get := func(dst *float64, text string, field string, dim units.Dimension, lo, hi float64) {
		if err != nil {
			return
		}
		*dst, err = positive(text, dim, "pores."+field, i, kind, lo, hi)
	}
	used := map[string]bool{}
	use := func(f ...string) {
		for _, s := range f {
			used[s] = true
		}
	}
	for _, sz := range pf.sizes(&ps) {
		use(sz.whole, sz.half)
		switch w, h := *sz.wholeText != "", *sz.halfTx != ""; {
		case err != nil:
		case w && h:
			err = fe(sz.half, fmt.Sprintf("and %q are both given; give one (%q is the whole size, %q its half)", sz.whole, sz.whole, sz.half))
		case h:
			get(sz.dst, *sz.halfTx, sz.half, units.DimLength, poreHalfMin, poreHalfMax)
		default:
			get(sz.dst, *sz.wholeText, sz.whole, units.DimLength, 2*poreHalfMin, 2*poreHalfMax)
			*sz.dst /= 2
		}
	}
	switch pf.Shape {
	case "plates":
		use("thickness")
		if pf.Thickness != "" {
			get(&ps.Thickness, pf.Thickness, "thickness", units.DimLength, 1e-7, 0.1)
		}
	case "circular", "rectangular":
	case "pins":
		use("pitch")
		get(&ps.Pitch, pf.Pitch, "pitch", units.DimLength, 1e-7, 0.1)
	case "screens":
		use("mesh", "wire_diameter")
		get(&ps.Mesh, pf.Mesh, "mesh", units.DimPerLength, 1, 1e6)
		get(&ps.WireDiameter, pf.WireDiameter, "wire_diameter", units.DimLength, 1e-7, 0.01)
	case "fibres":
		use("fibre_diameter")
		get(&ps.FibreDiameter, pf.FibreDiameter, "fibre_diameter", units.DimLength, 1e-7, 0.01)
	case "":
		return ps, fe("shape", fmt.Sprintf("is missing; use one of %s", strings.Join(PoreShapes, ", ")))
	default:
		return ps, fe("shape", fmt.Sprintf("= %q is not a pore shape; use one of %s", pf.Shape, strings.Join(PoreShapes, ", ")))
	}
	if err != nil {
		return ps, err
	}
	for _, kv := range pf.texts() {
		if kv.val != "" && !used[kv.key] {
			return ps, fe(kv.key, fmt.Sprintf("does not apply to %s pores", pf.Shape))
		}
	}
	return ps, nil
}

// texts lists every field of pf but the shape with its JSON key.
func (pf *PoresFile) texts() []struct{ key, val string } {
	return []struct{ key, val string }{
		{"gap", pf.Gap}, {"half_gap", pf.HalfGap}, {"thickness", pf.Thickness},
		{"diameter", pf.Diameter}, {"radius", pf.Radius},
		{"width", pf.Width}, {"half_width", pf.HalfWidth}, {"height", pf.Height}, {"half_height", pf.HalfHeight},
		{"pin_diameter", pf.PinDiameter}, {"pin_radius", pf.PinRadius}, {"pitch", pf.Pitch},
		{"mesh", pf.Mesh}, {"wire_diameter", pf.WireDiameter}, {"fibre_diameter", pf.FibreDiameter},
	}
}

// Upgrade turns the half sizes of an older file into the whole sizes the
// app writes: "half_gap": "0.3 mm" becomes "gap": "0.6 mm" (the number
// doubled in the unit it was typed in). A half that does not read as a
// length, or that comes beside its whole, is left for Validate to report.
func (f *DeviceFile) Upgrade() {
	for i := range f.PartsList {
		if p := f.PartsList[i].Pores; p != nil {
			p.Upgrade()
		}
	}
}

// Upgrade turns the half sizes of pf into whole sizes (see
// DeviceFile.Upgrade).
func (pf *PoresFile) Upgrade() {
	for _, sz := range []struct{ whole, half *string }{
		{&pf.Gap, &pf.HalfGap}, {&pf.Diameter, &pf.Radius}, {&pf.Width, &pf.HalfWidth},
		{&pf.Height, &pf.HalfHeight}, {&pf.PinDiameter, &pf.PinRadius},
	} {
		if *sz.half == "" || *sz.whole != "" {
			continue
		}
		if t, ok := ScaleLength(*sz.half, 2); ok {
			*sz.whole, *sz.half = t, ""
		}
	}
}

// ScaleLength multiplies the length typed in text by k, keeping the unit
// it was typed in: ScaleLength("0.3 mm", 2) is "0.6 mm",
// ScaleLength("3/8 in", 2) is "0.75 in". The number keeps 14 significant
// digits, so that reading the result gives k times the value to about
// 1e-14. ok is false when text is not a finite positive length without an
// uncertainty, or k is not positive.
func ScaleLength(text string, k float64) (string, bool) {
	q, err := units.Parse(text, units.DimLength)
	if err != nil || q.Uncertainty != 0 || !(q.Value > 0) || math.IsInf(q.Value, 0) || !(k > 0) {
		return "", false
	}
	unit := q.Unit
	if unit == "" {
		unit = "m"
	}
	x, err := units.ToUnitDim(q.Value*k, units.DimLength, unit)
	if err != nil || !(x > 0) || math.IsInf(x, 0) {
		return "", false
	}
	num := strconv.FormatFloat(x, 'g', 14, 64)
	if strings.ContainsAny(num, "e") {
		num = strconv.FormatFloat(x, 'f', -1, 64)
	} else if strings.Contains(num, ".") {
		num = strings.TrimSuffix(strings.TrimRight(num, "0"), ".")
	}
	return num + " " + unit, true
}
