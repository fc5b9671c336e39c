package design

import (
	"fmt"
	"math"
	"strings"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// Ends says how the tube is closed.
type Ends int

// The two tube kinds a design can have.
const (
	// HalfWave is a tube closed at both ends (closed-closed): the hot end
	// and the far end are pressure antinodes, the fundamental is about
	// half a wavelength long.
	HalfWave Ends = iota
	// QuarterWave is a tube closed at the hot end and open at the far end
	// (closed-open): about a quarter wavelength long.
	QuarterWave
)

// String returns "closed-closed" or "closed-open", the words ParseEnds reads.
func (e Ends) String() string {
	if e == QuarterWave {
		return "closed-open"
	}
	return "closed-closed"
}

// ParseEnds reads "closed-closed" (also "half-wave") or "closed-open"
// (also "quarter-wave").
func ParseEnds(s string) (Ends, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "closed-closed", "half-wave", "halfwave":
		return HalfWave, nil
	case "closed-open", "quarter-wave", "quarterwave":
		return QuarterWave, nil
	}
	return HalfWave, fmt.Errorf("ends %q are not known; use closed-closed (half-wave) or closed-open (quarter-wave)", s)
}

// StackKind is the kind of porous material the stack is made of.
type StackKind int

// The stack kinds a design can use.
const (
	Plates     StackKind = iota // parallel plates; the design chooses the gap
	RoundPores                  // round capillaries in a solid; the design chooses the radius
	Screens                     // stacked woven screens of a given wire; the design chooses the mesh
	MetalWool                   // random fibres of a given diameter; the design chooses the packing
)

// StackKinds lists the stack kinds in the order a front end offers them.
var StackKinds = []StackKind{Plates, RoundPores, Screens, MetalWool}

// String returns the word ParseStackKind reads.
func (k StackKind) String() string {
	switch k {
	case RoundPores:
		return "round-pores"
	case Screens:
		return "screens"
	case MetalWool:
		return "metal-wool"
	}
	return "plates"
}

// ParseStackKind reads "plates", "round-pores", "screens" or "metal-wool"
// (also "fibres", "wool").
func ParseStackKind(s string) (StackKind, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "plates", "parallel-plates":
		return Plates, nil
	case "round-pores", "circular", "capillaries":
		return RoundPores, nil
	case "screens", "mesh":
		return Screens, nil
	case "metal-wool", "wool", "fibres", "fibers":
		return MetalWool, nil
	}
	return Plates, fmt.Errorf("stack kind %q is not known; use plates, round-pores, screens or metal-wool", s)
}

// Target is what the builder asks for, SI units.
type Target struct {
	Frequency      float64 // wanted onset frequency, Hz
	Gas            string  // gas as the device file writes it: "helium" or "helium:0.7,argon:0.3"
	MeanPressure   float64 // absolute, Pa
	HotTemperature float64 // the highest temperature the heater reaches, K
	Ambient        float64 // ambient (cooler) temperature, K
	Diameter       float64 // tube inside diameter, m
	Ends           Ends
	Stack          StackKind
	// WireDiameter is the wire of screens or the fibre of metal wool, m;
	// unused for plates and round pores. Zero means 0.1 mm for screens and
	// 50 µm for metal wool (common sizes, common practice, no published
	// source).
	WireDiameter float64
	// MaxLength is the longest whole tube that can be built, m; 0: no limit.
	MaxLength float64
	// MinGap is the smallest gap that can be made, m; 0: no limit. It is
	// the plate gap 2y0 of plates, the pore diameter of round pores, the
	// opening between wires of screens and the hydraulic diameter 4 r_h of
	// metal wool.
	MinGap float64
}

// wire returns the wire or fibre diameter with its default.
func (t *Target) wire() float64 {
	if t.WireDiameter > 0 {
		return t.WireDiameter
	}
	if t.Stack == Screens {
		return 0.1e-3
	}
	return 50e-6
}

// validate checks every field and returns the parsed gas. Errors are
// *units.RangeError naming the field, or a message naming the gas.
func (t *Target) validate() (gasprops.Mixture, error) {
	g, err := gasprops.ParseMixture(t.Gas)
	if err != nil {
		return g, fmt.Errorf("gas %q: %w", t.Gas, err)
	}
	lo, hi := g.Range()
	type check struct {
		field, unit string
		v, lo, hi   float64
		subject     units.Subject
	}
	checks := []check{
		{"target frequency", "Hz", t.Frequency, 1, 20000, units.SubjectFrequency},
		{"mean pressure", "Pa", t.MeanPressure, 1e3, 50e6, units.SubjectPressure},
		{"ambient temperature", "K", t.Ambient, math.Max(lo, 150), math.Min(hi, 500), units.SubjectTemperature},
		{"hot temperature", "K", t.HotTemperature, math.Max(lo, 150), math.Min(hi, 2000), units.SubjectTemperature},
		{"tube diameter", "m", t.Diameter, 1e-3, 2, units.SubjectNone},
		{"wire or fibre diameter", "m", t.wire(), 1e-6, 2e-3, units.SubjectNone},
		{"longest tube", "m", t.MaxLength, 0, 100, units.SubjectNone},
		{"smallest gap", "m", t.MinGap, 0, 0.05, units.SubjectNone},
	}
	for _, c := range checks {
		if !(c.v >= c.lo && c.v <= c.hi) {
			return g, units.NewRangeError(c.field, c.v, c.lo, c.hi, c.unit).Of(c.subject)
		}
	}
	if t.HotTemperature <= t.Ambient {
		return g, units.NewRangeError("hot temperature", t.HotTemperature, t.Ambient, math.Min(hi, 2000), "K").Of(units.SubjectTemperature)
	}
	if t.Ends != HalfWave && t.Ends != QuarterWave {
		panic("calc: design: unknown Ends value")
	}
	if t.Stack < Plates || t.Stack > MetalWool {
		panic("calc: design: unknown StackKind value")
	}
	return g, nil
}
