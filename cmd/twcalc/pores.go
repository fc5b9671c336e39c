package main

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// poreShapes are the values of --shape; "wide" is the boundary-layer limit.
var poreShapes = []string{"plates", "circular", "rectangular", "pins", "screens", "fibres", "honeycomb", "wide"}

// runPores is `twcalc pores`: porosity, hydraulic radius and Rott's fκ, fν
// of a stack or regenerator geometry at an operating point, with a verdict
// on the pore size for the role and what geometry would hit the rule of
// thumb.
func runPores(args []string) (*report, error) {
	fl := newFlags("pores")
	op := declarePoreOperating(fl)
	shape := fl.choice("shape", poreShapes, "", "pore geometry")
	role := fl.choice("role", []string{"stack", "regenerator"}, "stack", "what the part is for")
	halfGap := fl.quantity("half-gap", units.DimLength, "0m", "plates: half the gap between neighbouring plates")
	plateT := fl.quantity("plate-thickness", units.DimLength, "0m", "plates: plate thickness")
	radius := fl.quantity("radius", units.DimLength, "0m", "circular: pore radius")
	halfW := fl.quantity("half-width", units.DimLength, "0m", "rectangular: half the channel width")
	halfH := fl.quantity("half-height", units.DimLength, "0m", "rectangular: half the channel height")
	pinR := fl.quantity("pin-radius", units.DimLength, "0m", "pins: pin radius")
	pitch := fl.quantity("pitch", units.DimLength, "0m", "pins: centre-to-centre distance of a hexagonal array")
	meshIn := fl.float("mesh-per-inch", 0, 0, 1e5, "screens: wires per inch")
	meshMM := fl.float("mesh-per-mm", 0, 0, 1e4, "screens: wires per mm")
	wire := fl.quantity("wire-diameter", units.DimLength, "0m", "screens: wire diameter (41um, 0.0016in)")
	measured := fl.float("porosity", 0, 0, 1, "screens: measured porosity, replacing the geometric one (0: use geometry)")
	fibreD := fl.quantity("fibre-diameter", units.DimLength, "0m", "fibres: fibre diameter (25um)")
	solid := fl.float("solid-fraction", 0, 0, 1, "fibres: volume fraction of solid")
	mass := fl.quantity("packed-mass", units.DimMass, "0kg", "fibres: mass of fibre packed (30g)")
	material := fl.str("material", "", "fibres: material for the density: steel, copper, nickel, brass, bronze, aluminium, carbon-steel")
	matRho := fl.quantity("material-density", units.DimDensity, "0kg/m3", "fibres: density of the fibre material, instead of --material")
	volume := fl.quantity("packed-volume", units.DimVolume, "0m3", "fibres: volume the packing fills (50cm3)")
	cells := fl.float("cells-per-square-inch", 0, 0, 1e6, "honeycomb: cell density (400)")
	wall := fl.quantity("wall-thickness", units.DimLength, "0m", "honeycomb: wall thickness")
	rh := fl.quantity("hydraulic-radius", units.DimLength, "0m", "wide: hydraulic radius of a wide channel")
	fl.describe(`Rott's f in Swift's exp(+iωt) convention (Im f < 0): pass δκ for fκ, δν for fν.
Screens and fibres use the circular pore of the same hydraulic radius (an
approximation); honeycomb uses the square-channel series.

examples:
  twcalc pores --gas helium --temperature 300K --pressure 10bar --frequency 100Hz --shape plates --half-gap 0.25mm --plate-thickness 0.1mm
  twcalc pores --gas helium --temperature 300K --pressure 10bar --frequency 100Hz --shape screens --mesh-per-inch 200 --wire-diameter 41um --role regenerator
  twcalc pores --gas air --temperature 300K --frequency 570Hz --shape fibres --fibre-diameter 30um --packed-mass 30g --material steel --packed-volume 50cm3 --json`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	need := func(names ...string) error {
		for _, n := range names {
			if !fl.given(n) {
				return &usageError{msg: fmt.Sprintf("--shape %s needs --%s", *shape, n)}
			}
		}
		return nil
	}
	if err := strayShapeFlags(fl, *shape); err != nil {
		return nil, err
	}
	var s pore.Shape
	var err error
	var solidFrac float64
	switch *shape {
	case "plates":
		if err = need("half-gap"); err == nil {
			s, err = pore.Plates(halfGap.Value, plateT.Value)
		}
	case "circular":
		if err = need("radius"); err == nil {
			s, err = pore.Circular(radius.Value)
		}
	case "rectangular":
		if err = need("half-width", "half-height"); err == nil {
			s, err = pore.Rectangular(halfW.Value, halfH.Value)
		}
	case "pins":
		if err = need("pin-radius", "pitch"); err == nil {
			s, err = pore.Pins(pinR.Value, pitch.Value)
		}
	case "screens":
		s, err = screensFromFlags(fl, *meshIn, *meshMM, wire.Value, *measured)
	case "fibres":
		if err = need("fibre-diameter"); err != nil {
			break
		}
		solidFrac, err = fibreSolidFraction(fl, *solid, mass.Value, *material, matRho.Value, volume.Value)
		if err == nil {
			s, err = pore.Fibres(fibreD.Value, solidFrac)
		}
	case "honeycomb":
		if err = need("cells-per-square-inch", "wall-thickness"); err == nil {
			s, err = pore.Honeycomb(*cells/(0.0254*0.0254), wall.Value)
		}
	case "wide":
		if err = need("hydraulic-radius"); err == nil {
			s, err = pore.BoundaryLayer(rh.Value)
		}
	}
	if err != nil {
		if _, isRange := rangeField(err); !isRange && !isUsage(err) {
			// impossible geometry: a usage error naming the flags typed
			return nil, &usageError{msg: shapeFlagsTyped(fl) + ": " + err.Error()}
		}
		return nil, fl.blame(err)
	}
	props, dk, dn, err := op.depths(fl)
	if err != nil {
		return nil, err
	}
	rl, _ := pore.ParseRole(*role)
	v, err := pore.Judge(s, rl, dk)
	if err != nil {
		return nil, err
	}
	r := newReport()
	echoGiven(fl, r, "half-gap", "plate-thickness", "radius", "half-width", "half-height", "pin-radius", "pitch",
		"mesh-per-inch", "mesh-per-mm", "wire-diameter", "porosity", "fibre-diameter", "solid-fraction", "packed-mass",
		"material", "material-density", "packed-volume", "cells-per-square-inch", "wall-thickness", "hydraulic-radius")
	if d, ok := s.(pore.Named); ok {
		r.input("geometry", d.Describe())
	}
	if *shape == "fibres" {
		r.add("solid_fraction", solidFrac, units.DimNone)
	}
	r.add("porosity", s.Porosity(), units.DimNone)
	r.add("hydraulic_radius", s.HydraulicRadius(), units.DimLength)
	r.add("thermal_penetration_depth", dk, units.DimLength)
	r.add("viscous_penetration_depth", dn, units.DimLength)
	r.addComplex("f_kappa", s.F(dk))
	r.addComplex("f_nu", s.F(dn))
	r.add("hydraulic_radius_over_thermal_depth", v.RhOverDelta, units.DimNone)
	r.add("spacing_over_thermal_depth", v.SpacingOverDelta, units.DimNone)
	r.addValue("verdict", v.Call.String())
	r.addValue("explanation", v.Words)
	r.addValue("rule_of_thumb", v.Rule.Text)
	r.add("target_hydraulic_radius", v.TargetRh, units.DimLength)
	r.addValue("suggestion", v.Suggestion)
	if *shape == "fibres" && fl.given("packed-mass") {
		// same fibre, same volume: mass scales with the solid fraction
		r.add("target_packed_mass", mass.Value*pore.SolidFractionFor(fibreD.Value, v.TargetRh)/solidFrac, units.DimMass)
	}
	if *shape == "screens" || *shape == "fibres" {
		r.warn("f of screens and fibres is that of a circular pore with the same hydraulic radius, an approximation")
	}
	if *shape == "circular" || *shape == "rectangular" || *shape == "wide" {
		r.warn("porosity is that of the open channel alone (1): the solid between channels is not part of these inputs")
	}
	if *shape == "wide" && v.RhOverDelta < 3 {
		r.warn("the wide-channel (boundary-layer) limit is poor for a hydraulic radius below a few δκ; choose the real shape")
	}
	for _, w := range props.Warnings {
		r.warn(w)
	}
	return r, nil
}

// screensFromFlags reads the mesh count in either unit (exactly one).
func screensFromFlags(fl *flags, perInch, perMM, wire, measured float64) (pore.Shape, error) {
	in, mmGiven := fl.given("mesh-per-inch"), fl.given("mesh-per-mm")
	if in == mmGiven {
		return nil, &usageError{msg: "--shape screens needs the mesh count: give --mesh-per-inch or --mesh-per-mm (one of them)"}
	}
	if !fl.given("wire-diameter") {
		return nil, &usageError{msg: "--shape screens needs --wire-diameter"}
	}
	m := perInch / 0.0254
	if mmGiven {
		m = perMM * 1000
	}
	s, err := pore.Screens(m, wire, measured)
	if err != nil {
		return nil, err
	}
	return s, nil
}

// fibreSolidFraction takes --solid-fraction, or the packed mass with a
// material (or its density) and the packed volume.
func fibreSolidFraction(fl *flags, solid, mass float64, material string, rho, volume float64) (float64, error) {
	if fl.given("solid-fraction") {
		if fl.given("packed-mass") {
			return 0, &usageError{msg: "give either --solid-fraction or --packed-mass with --packed-volume, not both"}
		}
		return solid, nil
	}
	if !fl.given("packed-mass") || !fl.given("packed-volume") {
		return 0, &usageError{msg: "--shape fibres needs --solid-fraction, or --packed-mass, --packed-volume and --material (or --material-density)"}
	}
	switch {
	case fl.given("material-density") && material != "":
		return 0, &usageError{msg: "give either --material or --material-density, not both"}
	case material != "":
		m, err := pore.LookupMaterial(material)
		if err != nil {
			return 0, badInput("material", material, err)
		}
		rho = m.Density
	case !fl.given("material-density"):
		return 0, &usageError{msg: "--packed-mass needs --material (steel, copper, ...) or --material-density"}
	}
	return pore.SolidFraction(mass, rho, volume)
}

// shapeFlags lists the geometry flags each --shape reads.
var shapeFlags = map[string][]string{
	"plates":      {"half-gap", "plate-thickness"},
	"circular":    {"radius"},
	"rectangular": {"half-width", "half-height"},
	"pins":        {"pin-radius", "pitch"},
	"screens":     {"mesh-per-inch", "mesh-per-mm", "wire-diameter", "porosity"},
	"fibres":      {"fibre-diameter", "solid-fraction", "packed-mass", "material", "material-density", "packed-volume"},
	"honeycomb":   {"cells-per-square-inch", "wall-thickness"},
	"wide":        {"hydraulic-radius"},
}

// strayShapeFlags refuses a geometry flag that the chosen shape does not
// read (`--shape circular --half-gap 1mm`), so that a value typed for the
// wrong shape is never silently ignored.
func strayShapeFlags(fl *flags, shape string) error {
	own := shapeFlags[shape]
	for _, name := range poreShapes {
		for _, f := range shapeFlags[name] {
			if fl.given(f) && !contains(own, f) {
				return &usageError{msg: fmt.Sprintf("--%s is for --shape %s; --shape %s takes --%s", f, name, shape, strings.Join(own, ", --"))}
			}
		}
	}
	return nil
}

// shapeFlagsTyped lists the geometry flags the user typed, as typed, for
// messages about impossible geometry: `--mesh-per-inch 200, --wire-diameter 0.2mm`.
func shapeFlagsTyped(fl *flags) string {
	var parts []string
	for _, d := range fl.defs {
		if d.count > 0 && !contains([]string{"gas", "temperature", "pressure", "frequency", "non-ideal", "shape", "role", "json"}, d.name) {
			parts = append(parts, "--"+d.name+" "+d.typed)
		}
	}
	return strings.Join(parts, ", ")
}

// isUsage reports whether err is already a usage error.
func isUsage(err error) bool {
	var u *usageError
	return errors.As(err, &u)
}
