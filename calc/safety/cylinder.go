package safety

import (
	"errors"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// MolarGasConstant is R, J/(mol·K) (exact since the 2019 SI: CODATA 2018).
const MolarGasConstant = 8.314462618

// Standard is a reference state for "free gas" volumes.
type Standard struct {
	Name string            // shown to users
	T    units.Temperature // K
	P    units.Pressure    // Pa, absolute
}

// The reference states offered. ISO 13443:1996, Natural gas — Standard
// reference conditions, uses 15 °C and 101.325 kPa absolute (as summarised
// on brickslims.com, "ISO 13443:1996"); "normal" conditions 0 °C and
// 101.325 kPa are the older metric convention (Citizendium, "Reference
// conditions of gas temperature and pressure").
var (
	StandardISO13443 = Standard{Name: "15 °C, 101.325 kPa (ISO 13443)", T: 288.15, P: 101325}
	StandardNormal   = Standard{Name: "0 °C, 101.325 kPa (normal)", T: 273.15, P: 101325}
)

// Contents is the gas held by a cylinder, as a volume of free gas at a
// reference state.
type Contents struct {
	Standard Standard
	Ideal    float64 // free-gas volume by the ideal-gas law, m³
	// NonIdeal is the volume with the gas model's compressibility at the
	// fill state, m³; equal to Ideal when Corrected is false.
	NonIdeal  float64
	Z         float64 // compressibility factor at the fill state, 1 when uncorrected
	Corrected bool    // the gas model supplied a non-ideal correction
	Warnings  []string
	Cautions  []string
}

// CylinderContents returns the free-gas volume at the reference state std
// of a cylinder of water capacity V (m³) filled with gas m to the absolute
// pressure p (Pa) at temperature T (K):
//
//	ideal:      Vstd = V (p/T) (Tstd/pstd)
//	non-ideal:  Vstd = V (p/(Z T)) (Tstd/pstd),  Z = 1 + B p/(R T)
//
// with the second virial coefficient B of the gas model
// (gasprops.Mixture.Compressibility; where the model has no coefficient,
// e.g. hydrogen, the ideal value is returned with a warning). The reference state
// itself is taken as ideal. For helium Z > 1, so a cylinder holds less than
// the ideal estimate (about 9 % less at 200 bar and 15 °C: a published
// table gives Z = 1.0965 there, see the test). Source: the
// ideal-gas law and the virial equation of state truncated after B (e.g.
// Y. A. Çengel and M. A. Boles, Thermodynamics: An Engineering Approach,
// chapter 3, from memory). The gas model warns when its correction is
// large and only a first-order estimate.
//
// The cautions include GasCautions(m). Errors: V ≤ 0, p ≤ 0, T ≤ 0
// (*units.RangeError); gas-model errors are returned unchanged.
func CylinderContents(m gasprops.Mixture, V float64, p units.Pressure, T units.Temperature, std Standard) (Contents, error) {
	if err := positive("water capacity", V, "m³"); err != nil {
		return Contents{}, err
	}
	if err := positive("fill pressure (absolute)", float64(p), "Pa"); err != nil {
		return Contents{}, err
	}
	if err := positive("fill temperature", float64(T), "K"); err != nil {
		return Contents{}, err
	}
	c := Contents{Standard: std, Cautions: append(cautions(CautionCylinder, CautionAsphyxiation), GasCautions(m)...)}
	c.Ideal = V * float64(p) / float64(T) * float64(std.T) / float64(std.P)
	// Properties checks the temperature against the model's range (asked
	// non-ideal, so that its advice to correct is not repeated here).
	props, err := m.Properties(T, p, &gasprops.Options{NonIdeal: true})
	if err != nil {
		var re *units.RangeError
		if errors.As(err, &re) && re.Field == "pressure" && condensable(m) {
			re.Why += "; a full cylinder of a gas that liquefies at room temperature (carbon dioxide) holds liquid: take its contents from the filled mass on its label"
		}
		return Contents{}, err
	}
	c.Warnings = append(c.Warnings, props.Warnings...)
	c.Z = m.Compressibility(float64(T), float64(p))
	if !finite(c.Z) || c.Z <= 0 {
		c.Z = 1
	}
	c.Corrected = c.Z != 1
	if !c.Corrected {
		c.Warnings = append(c.Warnings, "the gas model has no non-ideal correction for "+m.String()+": the ideal-gas volume is shown")
	}
	c.NonIdeal = c.Ideal / c.Z
	return c, nil
}

// condensable reports whether m holds carbon dioxide, the one gas here that
// is sold as a liquid under its own vapour pressure at room temperature
// (critical temperature 304.1 K; Span & Wagner, J. Phys. Chem. Ref. Data
// 25, 1509 (1996), from memory).
func condensable(m gasprops.Mixture) bool {
	for _, c := range m.Components() {
		if c.Species.Name == "carbon dioxide" {
			return true
		}
	}
	return false
}
