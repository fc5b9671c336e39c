package safety_test

import (
	"fmt"

	"tubewright/calc/safety"
	"tubewright/calc/units"
)

func ExampleASMEShell() {
	q, _ := units.Parse("30 barg", units.DimPressure)
	s, err := safety.ASMEShell(safety.ShellInput{
		Pressure:        safety.GaugeOf(q, 0),
		InnerRadius:     0.050,
		Wall:            0.006,
		Allowable:       138e6,
		JointEfficiency: 1,
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("minimum wall %.3f mm (%s)\n", s.MinThickness*1e3, s.ClauseThickCircum)
	fmt.Printf("MAWP %.2f MPa gauge\n", float64(s.MAWP)/1e6)
	fmt.Println(len(s.Cautions) > 0)
	// Output:
	// minimum wall 1.101 mm (UG-27(c)(1))
	// MAWP 15.45 MPa gauge
	// true
}

func ExampleThickWallStress() {
	w, _ := safety.ThickWallStress(3e6, 0.050, 0.006, 138e6)
	fmt.Printf("hoop %.2f MPa, ratio %.3f\n", w.Hoop/1e6, w.HoopRatio)
	// Output: hoop 26.58 MPa, ratio 0.193
}

func ExampleExpansionEnergy() {
	e, _ := safety.ExpansionEnergy(3.101325e6, 101325, 0.050, 5.0/3)
	fmt.Printf("%.0f kJ isentropic, %.0f kJ Brode, %.1f g TNT, %s\n", e.Isentropic/1e3, e.Brode/1e3, e.TNTMass*1e3, e.Tier.Label())
	// Output: 173 kJ isentropic, 225 kJ Brode, 41.4 g TNT, severe
}

func ExampleRoomOxygen() {
	for _, m := range safety.RoomModels {
		o, _ := safety.RoomOxygen(m, 9, 30, 2.0/3600)
		fmt.Printf("%-12s %.1f %% O2, keep releases under %.2f m³, back to 19.5 %% in %.0f min\n", m.Key(), 100*o.Fraction, o.MaxRelease, o.RecoveryTime/60)
	}
	// Output:
	// displacement 14.6 % O2, keep releases under 2.01 m³, back to 19.5 % in 45 min
	// mixed        15.5 % O2, keep releases under 2.08 m³, back to 19.5 % in 41 min
	// sealed       16.1 % O2, keep releases under 2.15 m³, back to 19.5 % in 37 min
}

func ExampleLevel() {
	s, _ := safety.Level(10e3)
	fmt.Printf("SPL %.1f dB, peak %.1f dB\n", s.SPL, s.Peak)
	// Output: SPL 171.0 dB, peak 174.0 dB
}
