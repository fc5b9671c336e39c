package sheet

import (
	"errors"
	"fmt"
	"strings"

	"tubewright/calc/pore"
)

// materialOther is the material choice that takes a typed density.
const materialOther = "other"

// materialChoices are the packing materials of calc/pore, then "other"
// for a material whose density is typed.
func materialChoices() []Choice {
	var out []Choice
	for _, m := range pore.Materials() {
		words := m.Label
		if words != "" {
			words = strings.ToUpper(words[:1]) + words[1:]
		}
		out = append(out, Choice{Key: m.Name, Words: words, Value: m})
	}
	return append(out, Choice{Key: materialOther, Words: "Other (type its density)"})
}

// fibresFrom reads a fibre packing: the fibre diameter and either the
// solid fraction, or the packed mass and volume with the material (or its
// density).
func fibresFrom(v *Values) (poreGeometry, error) {
	rf, _, err := halfSize(v, "fibre-diameter", "fibre-radius")
	if err != nil {
		return poreGeometry{}, err
	}
	d := 2 * rf
	if v.Has("solid-fraction") {
		if v.Has("packed-mass") {
			return poreGeometry{}, v.Blame(errors.New("give either the solid fraction or the packed mass with the packed volume, not both"), "packed-mass")
		}
		s, err := pore.Fibres(d, v.SI("solid-fraction"))
		return poreGeometry{shape: s, solid: v.SI("solid-fraction"), fibre: d}, v.Blame(err, "solid-fraction")
	}
	if !v.Has("packed-mass") {
		in := v.Get("solid-fraction").In
		return poreGeometry{}, &FieldError{Key: in.Key, Label: in.Label,
			Err: fmt.Errorf("%w for fibres: type the solid fraction, or the packed mass, packed volume and material", ErrRequired)}
	}
	if err := need(v, "packed-volume"); err != nil {
		return poreGeometry{}, err
	}
	rho, err := fibreDensity(v)
	if err != nil {
		return poreGeometry{}, err
	}
	solid, err := pore.SolidFraction(v.SI("packed-mass"), rho, v.SI("packed-volume"))
	if err != nil {
		return poreGeometry{}, v.Blame(err, "packed-mass")
	}
	s, err := pore.Fibres(d, solid)
	return poreGeometry{shape: s, solid: solid, byMass: true, fibre: d}, v.Blame(err, "packed-mass")
}

// fibreDensity is the density of the fibre material: the typed density
// when given (with material "other" or no material chosen), otherwise the
// chosen material's.
func fibreDensity(v *Values) (float64, error) {
	mat := v.PickKey("material")
	chosen := v.Given("material") && mat != v.Get("material").In.Default
	switch {
	case v.Has("material-density") && chosen && mat != materialOther:
		return 0, v.Blame(errors.New("give either a material or its density, not both (choose material other to type a density)"), "material-density")
	case v.Has("material-density"):
		return v.SI("material-density"), nil
	case mat == materialOther:
		return 0, need(v, "material-density")
	}
	return v.Pick("material").(pore.Material).Density, nil
}
