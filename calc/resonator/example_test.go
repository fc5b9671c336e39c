package resonator_test

import (
	"fmt"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// A closed-open glass tube 0.25 m long, 10 mm radius, in air at 20 °C.
func ExampleSetup_SolveFrequency() {
	air, _ := gasprops.ParseMixture("air")
	s := resonator.Setup{
		Tube: resonator.Tube{Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Mode: 1,
			Length: 0.25, Radius: 0.01},
		Gas: air, Temperature: 293.15, Pressure: units.StandardAtmosphere,
		U: resonator.Uncertainty{Length: 0.001},
	}
	r, err := s.SolveFrequency()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(units.FormatPM(r.Frequency, r.FrequencySigma, units.DimFrequency))
	fmt.Printf("end correction %.2f mm, Q %.1f\n", r.EndCorrection*1e3, r.Q.Total)
	// Output:
	// 335.1 ± 1.3 Hz
	// end correction 6.13 mm, Q 54.0
}

// The mean temperature of helium in a 1 m closed-closed tube that sings at
// 510 Hz.
func ExampleSetup_DiagnoseTemperature() {
	he, _ := gasprops.ParseMixture("helium")
	s := resonator.Setup{
		Tube:     resonator.Tube{Ends: resonator.ClosedClosed, Mode: 1, Length: 1, Radius: 0.02},
		Gas:      he,
		Pressure: 1e5,
	}
	e, err := s.DiagnoseTemperature(510)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.1f K\n", e.Value)
	// Output: 300.5 K
}

// Two zones: a 0.1 m hot end at 700 K beside 0.4 m at room temperature.
func ExampleZonedTube_Modes() {
	air, _ := gasprops.ParseMixture("air")
	z := resonator.ZonedTube{
		Ends: resonator.ClosedOpen, Correction: resonator.Unflanged, Gas: air, Pressure: 101325,
		Zones: []resonator.Zone{{Length: 0.1, Radius: 0.01, Temperature: 700}, {Length: 0.4, Radius: 0.01, Temperature: 295}},
	}
	r, _ := z.Modes(2)
	for _, m := range r.Modes {
		fmt.Printf("mode %d: %.1f Hz (travel time %.1f Hz)\n", m.Number, m.Frequency, m.TravelTime)
	}
	// Output:
	// mode 1: 169.9 Hz (travel time 182.4 Hz)
	// mode 2: 521.8 Hz (travel time 547.3 Hz)
}

func ExampleHelmholtzFrequency() {
	air, _ := gasprops.ParseMixture("air")
	g, _ := air.Properties(293.15, 101325, nil)
	r, _ := resonator.HelmholtzFrequency(resonator.Helmholtz{Volume: 1e-3, NeckLength: 0.05, NeckRadius: 0.01, Outer: resonator.Unflanged}, g)
	fmt.Printf("%.1f Hz, effective neck %.1f mm\n", r.Frequency, r.EffectiveLength*1e3)
	// Output: 120.7 Hz, effective neck 64.3 mm
}

// The helium tube of a bench check: 0.5 m closed-closed, 10 mm radius,
// 1 bar, heard at 1000 ± 2 Hz. With the wall losses the gas is about 11 K
// warmer than the loss-free sound speed says.
func ExampleTube_wallLosses() {
	he, _ := gasprops.ParseMixture("helium")
	s := resonator.Setup{
		Tube:     resonator.Tube{Ends: resonator.ClosedClosed, Mode: 1, Length: 0.5, Radius: 0.01, Losses: resonator.WallLosses},
		Gas:      he,
		Pressure: 1e5,
		U:        resonator.Uncertainty{Frequency: 2},
	}
	e, err := s.DiagnoseTemperature(1000)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("with wall losses:", units.FormatPM(e.Value, e.Sigma, units.DimTemperature))
	s.Losses = resonator.LossFree
	e, _ = s.DiagnoseTemperature(1000)
	fmt.Println("loss-free:", units.FormatPM(e.Value, e.Sigma, units.DimTemperature))
	// Output:
	// with wall losses: 299.6 ± 1.2 K
	// loss-free: 288.8 ± 1.2 K
}
