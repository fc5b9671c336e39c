package sheet

import (
	"errors"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// helmholtzInputs are the sizes of a Helmholtz resonator.
func helmholtzInputs() []Input {
	return []Input{
		{Key: "volume", Label: "Cavity volume", Kind: Quantity, Dim: units.DimVolume, Optional: true, Example: "1 L", PM: true,
			Hint: "volume of the cavity without the neck: 1 L, 500 mL, 0.002 m3; ± or +- for an uncertainty"},
		{Key: "neck-length", Label: "Neck length", Kind: Quantity, Dim: units.DimLength, Optional: true, Example: "50 mm", PM: true,
			Hint: "physical neck length, at least the neck radius: 50 mm, 2 in"},
		{Key: "neck-diameter", Label: "Neck inside diameter", Kind: Quantity, Dim: units.DimLength, Optional: true, Example: "20 mm", PM: true,
			Hint: "bore of the neck: 20 mm, 3/4 in (or give neck-radius)"},
		{Key: "neck-radius", Label: "Neck inner radius", Kind: Quantity, Dim: units.DimLength, Optional: true, PM: true,
			Hint: "half the neck's inside diameter: 10 mm (or give neck-diameter)"},
	}
}

// helmholtzRows names the rows of a Helmholtz result in the order of
// helmholtzValues.
// A row's ± is shown only when one of the inputs in pmFrom carries a ±
// (nil: any input): the end corrections depend on the other inputs only
// through ka, where their ± is negligible and would only clutter the row.
var helmholtzRows = []struct {
	key, label, show, note string
	pmFrom                 []string
}{
	{"frequency", "Resonance frequency", "", "", nil},
	{"inner_end_correction", "Inner end correction", "mm", "where the neck opens into the cavity (flanged)", []string{"neck-diameter", "neck-radius"}},
	{"outer_end_correction", "Outer end correction", "mm", "at the outer end of the neck, as chosen", []string{"neck-diameter", "neck-radius"}},
	{"effective_neck_length", "Effective neck length", "", "", []string{"neck-length", "neck-diameter", "neck-radius"}},
	{"sound_speed", "Sound speed", "", "", nil},
	{"wavelength", "Wavelength", "", "", nil},
}

// helmholtzPM reports whether a row whose ± comes from the inputs from
// (nil: any) shows it.
func helmholtzPM(v *Values, from []string) bool {
	if from == nil {
		return true
	}
	for _, k := range from {
		if v.Q(k).Uncertainty > 0 {
			return true
		}
	}
	return false
}

var helmholtzDims = []units.Dimension{units.DimFrequency, units.DimLength, units.DimLength, units.DimLength, units.DimSpeed, units.DimLength}

func helmholtzValues(r resonator.HelmholtzResult) []float64 {
	return []float64{r.Frequency, r.InnerCorrection, r.OuterCorrection, r.EffectiveLength, r.SoundSpeed, r.Wavelength}
}

// runHelmholtz solves the Helmholtz resonator, with the ± of its sizes,
// temperature and pressure carried to first order.
func runHelmholtz(v *Values) (*Result, error) {
	neck := "neck-diameter"
	switch d, r := v.Has("neck-diameter"), v.Has("neck-radius"); {
	case d && r:
		return nil, v.Blame(errors.New("give either the neck's inside diameter or its inner radius, not both"), "neck-radius")
	case r:
		neck = "neck-radius"
	}
	for _, k := range []string{"volume", "neck-length", neck} {
		if !v.Has(k) {
			return nil, tubeMissing(v, k)
		}
	}
	if err := tubeRequirePositive(v, "volume", "neck-length", neck, "temperature", "pressure"); err != nil {
		return nil, err
	}
	outer := v.Pick("end-correction").(resonator.EndCorrection)
	keys := []string{"volume", "neck-length", neck, "temperature", "pressure"}
	x, u := make([]float64, len(keys)), make([]float64, len(keys))
	for i, k := range keys {
		x[i], u[i] = v.SI(k), v.Q(k).Uncertainty
	}
	if neck == "neck-diameter" { // the calculator takes the radius
		x[2], u[2] = x[2]/2, u[2]/2
	}
	solve := func(x []float64) (resonator.HelmholtzResult, error) {
		g, err := tubeGas(v, x[3], x[4])
		if err != nil {
			return resonator.HelmholtzResult{}, err
		}
		h := resonator.Helmholtz{Volume: x[0], NeckLength: x[1], NeckRadius: x[2], Outer: outer}
		res, err := resonator.HelmholtzFrequency(h, g)
		if err != nil {
			// the sizes are positive (checked above): the calculator
			// refuses a neck shorter than its radius (an orifice) or a
			// neck holding more than the cavity
			key := "volume"
			if h.NeckRadius > h.NeckLength {
				key = neck
			}
			return res, v.Blame(err, key)
		}
		return res, nil
	}
	res, err := solve(x)
	if err != nil {
		return nil, err
	}
	vals := helmholtzValues(res)
	sig, ok := Spread(func(x, out []float64) error {
		r, err := solve(x)
		copy(out, helmholtzValues(r))
		return err
	}, x, u, len(vals))
	r := &Result{}
	for k, row := range helmholtzRows {
		if !ok[k] {
			r.Warn(noSpreadWarning(row.key))
		}
		u := sig[k]
		if !helmholtzPM(v, row.pmFrom) {
			u = 0
		}
		out := r.AddPM(row.key, row.label, vals[k], u, helmholtzDims[k])
		out.Show, out.Note = row.show, row.note
	}
	r.Warn(res.Warnings...)
	tubeCautions(r, v.SI("temperature"), v.SI("pressure"))
	return r, nil
}
