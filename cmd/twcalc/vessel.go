package main

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

// runVessel is `twcalc vessel`: wall stresses of a cylindrical vessel
// (Lamé and thin-wall), the ASME UG-27 minimum wall and maximum allowable
// working pressure, and reference test pressures, from calc/safety.
// Pressures are read as typed: "30barg" is 30 bar above the atmosphere,
// "30bar" is absolute (29 bar gauge); results are gauge.
func runVessel(args []string) (*report, error) {
	fl := newFlags("vessel")
	pres := fl.quantity("pressure", units.DimPressure, "", "internal design pressure: 30barg or 435psig (gauge), 31bar (absolute)")
	ri := fl.quantity("inner-radius", units.DimLength, "", "inside radius of the shell: 50mm, 2in")
	wall := fl.quantity("wall-thickness", units.DimLength, "", "nominal wall thickness: 6mm, 0.25in")
	allow := fl.quantity("allowable-stress", units.DimStress, "", "allowable stress of the material at the hottest wall temperature: 138MPa, 20ksi")
	eff := fl.float("joint-efficiency", 1, 0, 1, "weld joint efficiency E (1 for seamless tube)")
	corr := fl.quantity("corrosion-allowance", units.DimLength, "0mm", "corrosion allowance added to the required wall")
	ratio := fl.float("stress-ratio", 1, 0.01, 100, "allowable stress at test temperature / at design temperature, for the test pressures")
	family := fl.choice("code-family", []string{"asme", "eu", "other"}, "asme", "code family to compare with; formulas only for asme, the others show their reference")
	marked := fl.quantity("mawp", units.DimPressure, "0barg", "maximum allowable working pressure of the whole vessel, the lowest of all its parts: 40barg; the test pressures and the relief check use it instead of the shell's")
	relief := fl.quantity("relief-set", units.DimPressure, "0barg", "set pressure of the relief valve or bursting disc: 33barg; compared with the MAWP")
	fl.describe(`Pressures: a gauge unit (barg, psig) is above the atmosphere (101325 Pa);
bar, psi, MPa are absolute and are converted to gauge. Results are gauge.

examples:
  twcalc vessel --pressure 30barg --inner-radius 50mm --wall-thickness 6mm --allowable-stress 138MPa --joint-efficiency 1
  twcalc vessel --pressure 435psig --inner-radius 2in --wall-thickness 0.25in --allowable-stress 20ksi --json
  twcalc vessel --pressure 30barg --inner-radius 50mm --wall-thickness 6mm --allowable-stress 138MPa --mawp 40barg --relief-set 38barg`)
	if err := fl.parse(args); err != nil {
		return nil, err
	}
	P := safety.GaugeOf(*pres, 0)
	if P < 0 {
		return nil, badInput("pressure", fl.typed("pressure"), fmt.Errorf("is %s below the atmosphere (a vacuum inside); these formulas are for internal pressure only", units.Format(-float64(P), units.DimPressure)))
	}
	lame, err := safety.ThickWallStress(P, ri.Value, wall.Value, allow.Value)
	if err != nil {
		return nil, fl.blame(err)
	}
	r := newReport()
	fl.echo(r)
	r.inputSI("pressure_gauge", float64(P), units.DimStress)
	r.addValue("pressure_basis", "gauge: pressures below are above the atmosphere (101325 Pa)")
	r.add("hoop_stress", lame.Hoop, units.DimStress)
	r.add("longitudinal_stress", lame.Longitudinal, units.DimStress)
	r.add("radial_stress", lame.Radial, units.DimStress)
	r.add("stress_intensity", lame.Intensity, units.DimStress)
	r.add("hoop_stress_ratio", lame.HoopRatio, units.DimNone)
	r.addValue("stress_method", lame.Method)
	for _, w := range lame.Warnings {
		r.warn(w)
	}
	thin, err := safety.ThinWallStress(P, ri.Value, wall.Value, allow.Value)
	if err == nil {
		r.add("thin_wall_hoop_stress", thin.Hoop, units.DimStress)
		r.add("thin_wall_longitudinal_stress", thin.Longitudinal, units.DimStress)
		r.add("thin_wall_hoop_stress_ratio", thin.HoopRatio, units.DimNone)
		for _, w := range thin.Warnings {
			if strings.Contains(w, "thin-wall") { // the over-allowable warning came with Lamé's
				r.warn(w)
			}
		}
	} else {
		r.warn("thin-wall stresses not shown: " + err.Error())
	}

	fam := map[string]safety.CodeFamily{"asme": safety.FamilyASME, "eu": safety.FamilyEU, "other": safety.FamilyOther}[*family]
	r.addValue("code_family", fam.Label())
	var mawp safety.GaugePressure
	cautions := append([]string(nil), lame.Cautions...)
	if fam == safety.FamilyASME {
		s, err := safety.ASMEShell(safety.ShellInput{
			Pressure: P, InnerRadius: ri.Value, Wall: wall.Value, Allowable: allow.Value,
			JointEfficiency: *eff, Corrosion: corr.Value,
		})
		if err != nil {
			return nil, fl.blame(err)
		}
		mawp = s.MAWP
		r.add("minimum_wall_thickness", s.MinThickness, units.DimLength)
		r.addGauge("max_allowable_pressure", float64(s.MAWP))
		r.addValue("wall_adequate", s.WallEnough)
		r.addValue("thickness_clause", s.ClauseThickCircum+" / "+s.ClauseThickLong)
		r.addValue("pressure_clause", s.ClauseMAWPCircum+" / "+s.ClauseMAWPLong)
		for _, w := range s.Warnings {
			r.warn(w)
		}
	} else {
		// No formula for these families: the entered pressure stands in for
		// PS in the EU test-pressure rule, and the reference is shown.
		r.addValue("code_reference", fam.ShellReference())
		mawp = P
		r.warn("no wall-thickness formula for " + fam.Label() + ": minimum_wall_thickness and max_allowable_pressure are given for the ASME family only")
	}
	if fl.given("mawp") {
		m := safety.GaugeOf(*marked, 0)
		if m <= 0 {
			return nil, badInput("mawp", fl.typed("mawp"), fmt.Errorf("is %s gauge; a maximum allowable working pressure is above the atmosphere", units.Format(float64(m), units.DimPressure)))
		}
		if fam == safety.FamilyASME && m > mawp {
			r.warn(fmt.Sprintf("the entered MAWP (%s gauge) is above the %s gauge that this shell wall allows by UG-27", units.Format(float64(m), units.DimPressure), units.Format(float64(mawp), units.DimPressure)))
		}
		mawp = m
		r.addGauge("mawp_used", float64(mawp))
		r.addValue("mawp_basis", "entered with --mawp")
	} else if fam == safety.FamilyASME && mawp > 0 {
		r.addGauge("mawp_used", float64(mawp))
		r.addValue("mawp_basis", "the shell wall alone (UG-27)")
		r.warn("the test pressures use the MAWP of this shell wall alone; the vessel's MAWP is the lowest of all its parts (heads, flanges, windows, feedthroughs, driver housing): give it with --mawp")
	}
	if fl.given("relief-set") {
		set := safety.GaugeOf(*relief, 0)
		if set <= 0 {
			return nil, badInput("relief-set", fl.typed("relief-set"), fmt.Errorf("is %s gauge; a relief device opens above the atmosphere", units.Format(float64(set), units.DimPressure)))
		}
		if mawp <= 0 {
			return nil, badInput("relief-set", fl.typed("relief-set"), errors.New("has no MAWP to compare with: give --mawp"))
		}
		rc, err := safety.CheckRelief(set, mawp)
		if err != nil {
			return nil, fl.blame(err, "relief-set", "mawp")
		}
		r.addGauge("relief_set_pressure", float64(rc.Set))
		r.addValue("relief_at_or_below_mawp", rc.OK)
		r.addValue("relief_check", rc.Message)
		if !rc.OK {
			r.warn(rc.Message)
		}
	}
	if mawp > 0 {
		tp, err := safety.ReferenceTestPressures(mawp, *ratio)
		if err != nil {
			return nil, fl.blame(err)
		}
		if fam == safety.FamilyASME {
			r.addGauge("hydrostatic_test_pressure", float64(tp.ASMEHydrostatic))
			r.addGauge("pneumatic_test_pressure", float64(tp.ASMEPneumatic))
			r.addValue("test_pressure_basis", "ASME VIII-1 UG-99(b) 1.3 × MAWP × stress ratio; UG-100(b) 1.1 × MAWP × stress ratio; gauge")
		} else {
			r.addGauge("eu_test_pressure", float64(tp.EUHydrostatic))
			r.addValue("test_pressure_basis", "PED 2014/68/EU Annex I 7.4: max(1.25 × PS × stress ratio, 1.43 × PS), PS = the entered pressure; gauge")
		}
		cautions = append(cautions, tp.Cautions[1:]...)
	}
	for _, c := range cautions {
		r.caution(c)
	}
	return r, nil
}
