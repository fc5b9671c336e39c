package sheet

import (
	"fmt"
	"strings"

	"tubewright/calc/linear"
	"tubewright/calc/pore"
	"tubewright/calc/units"
)

// depthsSheet is the penetration-depth calculator: the thermal and viscous
// penetration depths of a gas at a temperature, mean pressure and
// frequency, the wavelength, and the plate gap and hydraulic radius the
// usual rules of thumb give for a stack and a regenerator. A typed ± on
// temperature, pressure or frequency is carried to every length.
var depthsSheet = &Sheet{
	ID:      IDDepths,
	Title:   "Penetration depths",
	Summary: "Thermal and viscous penetration depths at your gas, temperature, pressure and frequency, with the pore sizes they call for",
	Inputs:  poreOperatingInputs(),
	About: "δκ = √(2k/(ωρcp)), δν = √(2μ/(ωρ)), ω = 2πf; Rott's theory as in Swift, " +
		"Thermoacoustics: A Unifying Perspective (2002), ch. 4. Both fall as 1/√f and, at a fixed temperature, as 1/√p.",
	Examples: []string{
		"twcalc depths --gas helium --temperature 300K --pressure 10bar --frequency 100Hz",
		"twcalc depths --gas air --temperature 20degC --frequency 440Hz+-5Hz --json",
	},
	Run: runDepths,
}

// Notes on the rule-of-thumb rows, with where each comes from.
const (
	depthsStackNote = "common practice, no published source; Tijani, Zeegers & de Waele (JASA 112, 128, 2002) found about 3 δκ optimal"
	depthsRegenNote = "common practice, no published source"
)

// depthValues are the lengths of the depths sheet that scale with the
// operating point, in the order of runDepths' rows: δκ, δν, wavelength,
// the stack plate gap band (2 r_h of the stack rule) and the regenerator
// hydraulic-radius band.
func depthValues(dk, dn, c, f float64) []float64 {
	stack, regen := pore.RuleFor(pore.RoleStack), pore.RuleFor(pore.RoleRegenerator)
	return []float64{dk, dn, c / f, 2 * stack.Low * dk, 2 * stack.High * dk, regen.Low * dk, regen.High * dk}
}

func runDepths(v *Values) (*Result, error) {
	op, err := readOperatingPoint(v)
	if err != nil {
		return nil, err
	}
	vals := depthValues(op.DK, op.DN, op.Props.SoundSpeed, op.F.Value)
	sig, ok := Spread(func(x, out []float64) error {
		props, dk, dn, err := op.at(x)
		copy(out, depthValues(dk, dn, props.SoundSpeed, x[2]))
		return err
	}, op.x(), op.u(), len(vals))
	stack, regen := pore.RuleFor(pore.RoleStack), pore.RuleFor(pore.RoleRegenerator)
	rows := []struct{ key, label, show, note string }{
		{"thermal_penetration_depth", "Thermal penetration depth δκ", "mm", ""},
		{"viscous_penetration_depth", "Viscous penetration depth δν", "mm", ""},
		{"wavelength", "Wavelength", "", ""},
		{"stack_plate_gap_low", fmt.Sprintf("Stack plate gap 2y0, narrow end (%g δκ; half gap y0 = %g δκ)", 2*stack.Low, stack.Low), "mm", depthsStackNote},
		{"stack_plate_gap_high", fmt.Sprintf("Stack plate gap 2y0, wide end (%g δκ; half gap y0 = %g δκ)", 2*stack.High, stack.High), "mm", ""},
		{"regenerator_hydraulic_radius_low", fmt.Sprintf("Regenerator hydraulic radius, narrow end (%g δκ)", regen.Low), "mm", depthsRegenNote},
		{"regenerator_hydraulic_radius_high", fmt.Sprintf("Regenerator hydraulic radius, wide end (%g δκ)", regen.High), "mm", ""},
	}
	r := &Result{}
	for k, row := range rows {
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		added := r.AddPM(row.key, row.label, vals[k], sig[k], units.DimLength)
		added.Show, added.Note = row.show, row.note
		if k == 3 || k == 4 { // the plate gaps: the half gap beside them
			added.Note = strings.TrimSuffix(linear.GapWords(vals[k]/2)+"; "+row.note, "; ")
		}
	}
	r.Add("viscous_over_thermal_depth", "δν / δκ (= √Prandtl)", op.DN/op.DK, units.DimNone)
	r.Add("prandtl", "Prandtl number", op.Props.Prandtl, units.DimNone)
	r.Warn(op.Props.Warnings...)
	return r, nil
}
