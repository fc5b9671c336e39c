package pore

import (
	"sort"
	"strings"
)

// Material is a solid used for regenerator and stack packings.
type Material struct {
	Name    string   // lower-case name used on the command line: "steel"
	Label   string   // for people: "stainless steel 304"
	Density float64  // kg/m³ at room temperature
	Aliases []string // other accepted names
	Source  string   // where Density comes from
}

// materials is the short list of common packing metals. Densities are
// nominal room-temperature values; alloys vary by a per cent or two with
// composition.
var materials = []Material{
	{"steel", "stainless steel 304", 7900, []string{"stainless", "ss304", "304", "inox"},
		"from memory: ASM Metals Handbook lists about 7900–8000 kg/m³ for type 304"},
	{"carbon-steel", "carbon steel", 7850, []string{"mild-steel", "iron"},
		"from memory: common handbook value for plain carbon steel"},
	{"copper", "copper", 8960, []string{"cu"},
		"from memory: CRC Handbook of Chemistry and Physics, density of the elements, 8.96 g/cm³"},
	{"nickel", "nickel", 8900, []string{"ni"},
		"from memory: CRC Handbook of Chemistry and Physics, density of the elements, 8.90 g/cm³"},
	{"brass", "brass (cartridge, 70/30)", 8530, nil,
		"from memory: ASM Metals Handbook, C26000 cartridge brass, 8.53 g/cm³"},
	{"bronze", "phosphor bronze", 8800, []string{"phosphor-bronze"},
		"from memory: ASM Metals Handbook, C51000 phosphor bronze, about 8.8 g/cm³"},
	{"aluminium", "aluminium", 2700, []string{"aluminum", "al"},
		"from memory: CRC Handbook of Chemistry and Physics, density of the elements, 2.70 g/cm³"},
}

// Materials returns the short list of packing materials, sorted by name.
func Materials() []Material {
	out := append([]Material(nil), materials...)
	sort.Slice(out, func(i, j int) bool { return out[i].Name < out[j].Name })
	return out
}

// LookupMaterial finds a material by name or alias, case-insensitive.
func LookupMaterial(name string) (Material, error) {
	n := strings.ToLower(strings.TrimSpace(name))
	for _, m := range materials {
		if m.Name == n {
			return m, nil
		}
		for _, a := range m.Aliases {
			if a == n {
				return m, nil
			}
		}
	}
	names := make([]string, 0, len(materials))
	for _, m := range Materials() {
		names = append(names, m.Name)
	}
	return Material{}, impossible("unknown material %q; known: %s (or give the density)", name, strings.Join(names, ", "))
}
