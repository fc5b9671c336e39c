package safety

import "fmt"

// Relief compares the set pressure of a relief device with the vessel's
// maximum allowable working pressure.
type Relief struct {
	Set  GaugePressure // set pressure, gauge, Pa
	MAWP GaugePressure // gauge, Pa
	// OK is Set ≤ MAWP: "When a single pressure relief device is used,
	// the set pressure marked on the device shall not exceed the maximum
	// allowable working pressure of the vessel" (ASME BPVC Section VIII
	// Division 1, UG-134(a), as quoted on prochemic.com, "Set pressure –
	// ASME – PED", 2023). Several devices may be set higher under the
	// same paragraph; that case is not covered here.
	OK       bool
	Message  string
	Cautions []string
}

// CheckRelief compares set and mawp (both gauge, Pa, ≥ 0, mawp > 0).
func CheckRelief(set, mawp GaugePressure) (Relief, error) {
	if err := gaugeInput(set); err != nil {
		return Relief{}, err
	}
	if err := positive("MAWP", float64(mawp), "Pa"); err != nil {
		return Relief{}, err
	}
	r := Relief{Set: set, MAWP: mawp, OK: set <= mawp, Cautions: cautions(CautionReliefSizing)}
	if r.OK {
		r.Message = fmt.Sprintf("set pressure is %.0f %% of the MAWP, at or below it", 100*float64(set/mawp))
	} else {
		r.Message = fmt.Sprintf("set pressure is above the MAWP (%.0f %% of it): the vessel can be overpressurised before the device opens", 100*float64(set/mawp))
	}
	return r, nil
}
