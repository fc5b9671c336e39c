package safety

import "math"

// TestPressures are reference test pressures of a vessel by code family,
// gauge, Pa. They are minimums written in the codes; the applicable code
// and the inspector decide.
type TestPressures struct {
	// StressRatio is the allowable stress at the test temperature divided by
	// the allowable stress at the design temperature (ASME's lowest stress
	// ratio, LSR), 1 or more for metals tested cold.
	StressRatio float64
	// ASMEHydrostatic is UG-99(b): 1.3 × MAWP × StressRatio.
	ASMEHydrostatic GaugePressure
	// ASMEPneumatic is UG-100(b): 1.1 × MAWP × StressRatio.
	ASMEPneumatic GaugePressure
	// EUHydrostatic is PED 2014/68/EU Annex I 7.4: the greater of
	// 1.25 × PS × StressRatio and 1.43 × PS.
	EUHydrostatic GaugePressure
	Cautions      []string
}

// ReferenceTestPressures returns the reference test pressures for a vessel
// with maximum allowable working pressure mawp (gauge, Pa; the PED's PS) and
// the ratio of allowable stresses at test and design temperature
// (stressRatio ≥ 1 is usual; 1 when the vessel is designed at room
// temperature):
//
//	ASME VIII-1 UG-99(b), hydrostatic:  PT = 1.3 × MAWP × LSR
//	ASME VIII-1 UG-100(b), pneumatic:   PT = 1.1 × MAWP × LSR
//	PED 2014/68/EU Annex I 7.4:          PT = max(1.25 × PS × ratio, 1.43 × PS)
//
// Sources: ASME BPVC Section VIII Division 1, UG-99(b): "a hydrostatic
// test pressure that at every point in the vessel is at least equal to 1.3
// times the maximum allowable working pressure" times the lowest stress
// ratio (text quoted on eng-tips.com thread 434704 and in an inspector's
// course notes, scribd.com document 466399145); UG-100(b): "at least equal
// to 1.1 times the maximum allowable working pressure multiplied by the
// lowest stress ratio (LSR)" (text reproduced on scribd.com document
// 419491368). Editions before the 1999 addenda used 1.5 and 1.25 (an older
// UG-100(b) text with 1.25 is reproduced on scribd.com document 373548581).
// Pressure equipment directive, Annex I, section 7.4: "no less than: that
// corresponding to the maximum loading to which the pressure equipment may
// be subject in service taking into account its maximum allowable pressure
// and its maximum allowable temperature, multiplied by the coefficient
// 1,25, or the maximum allowable pressure multiplied by the coefficient
// 1,43, whichever is the greater" (the 97/23/EC text as quoted on
// simpliengineering.com, "How was PED 97/23/EC test pressure coefficient
// 1.43 derived"; that 2014/68/EU Annex I 7.4 keeps the same words is from
// memory). Applying the stress ratio to the 1.25 term is our reading of
// "taking into account ... its maximum allowable temperature".
//
// Errors: mawp < 0 or stressRatio ≤ 0 (*units.RangeError).
func ReferenceTestPressures(mawp GaugePressure, stressRatio float64) (TestPressures, error) {
	if err := gaugeInput(mawp); err != nil {
		return TestPressures{}, err
	}
	if err := positive("stress ratio", stressRatio, ""); err != nil {
		return TestPressures{}, err
	}
	m := float64(mawp)
	return TestPressures{
		StressRatio:     stressRatio,
		ASMEHydrostatic: GaugePressure(1.3 * m * stressRatio),
		ASMEPneumatic:   GaugePressure(1.1 * m * stressRatio),
		EUHydrostatic:   GaugePressure(math.Max(1.25*m*stressRatio, 1.43*m)),
		Cautions:        cautions(CautionTestPressure, CautionStoredEnergy),
	}, nil
}
