package gasprops

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"

	"tubewright/calc/units"
)

// This file reads gas names and mixture specifications typed by people.

// aliases maps extra accepted spellings to species; names and symbols are
// matched case-insensitively in addition.
var aliases = map[string]*Species{
	"carbon-dioxide": carbonDioxide,
	"carbondioxide":  carbonDioxide,
	"carbon_dioxide": carbonDioxide,
	"dry air":        air,
}

// Lookup finds a species by name or symbol, case-insensitive ("helium",
// "He", "co2", "carbon dioxide"). An unknown name is an error that lists
// the known ones.
func Lookup(name string) (*Species, error) {
	key := strings.ToLower(strings.TrimSpace(name))
	for _, s := range table {
		if key == s.Name || key == strings.ToLower(s.Symbol) {
			return s, nil
		}
	}
	if s, ok := aliases[key]; ok {
		return s, nil
	}
	return nil, fmt.Errorf("unknown gas %q; known gases: %s", strings.TrimSpace(name), strings.Join(Names(), ", "))
}

// ParseMixture reads a gas or a mixture of noble gases by mole fraction:
//
//	helium                  one gas, by name or symbol ("He", "CO2")
//	helium:0.7,argon:0.3    mole fractions
//	He:70%,Ar:30%           mole fractions in per cent
//	He:0.7, Ar:0.3          spaces are ignored around names and numbers
//	helium 70 % + argon 30 %  as String writes it ("+" separates like ",")
//
// Fractions are normalised to sum to 1; a sum off 1 by more than 1 %
// (100 % by more than 1 point) is an error, as are negative or non-finite
// fractions, a gas named twice, more than MaxComponents gases, a mixture
// where one gas has a fraction and another has none, and a mixture that
// contains a gas other than helium, neon, argon, krypton or xenon (the
// mixing rules of this package are those of monatomic gases). A gas with
// fraction 0 is left out.
func ParseMixture(s string) (Mixture, error) {
	var m Mixture
	txt := strings.TrimSpace(s)
	if txt == "" {
		return m, errors.New("no gas given; write a name such as helium, or a mixture such as helium:0.7,argon:0.3")
	}
	parts := strings.FieldsFunc(txt, func(r rune) bool { return r == ',' || r == '+' })
	if len(parts) == 0 {
		return m, fmt.Errorf("gas mixture %q names no gas", txt)
	}
	if len(parts) > MaxComponents {
		return m, fmt.Errorf("gas mixture %q has %d components; at most %d are allowed", txt, len(parts), MaxComponents)
	}
	type item struct {
		sp      *Species
		x       float64
		hasFrac bool
	}
	var items [MaxComponents]item
	sum := 0.0
	nFrac := 0
	for i, part := range parts {
		name, frac, hasFrac := splitPart(part)
		if t := strings.TrimSpace(name); t != "" && (t[0] >= '0' && t[0] <= '9' || t[0] == '.') {
			return Mixture{}, fmt.Errorf("gas mixture %q: %q is not a gas name; write decimals with a point (0.5), commas separate the gases", txt, t)
		}
		sp, err := Lookup(name)
		if err != nil {
			return Mixture{}, err
		}
		for _, it := range items[:i] {
			if it.sp == sp {
				return Mixture{}, fmt.Errorf("gas mixture %q names %s twice", txt, sp.Name)
			}
		}
		x := 1.0
		if hasFrac {
			x, err = parseFraction(frac)
			if err != nil {
				return Mixture{}, fmt.Errorf("mole fraction of %s: %v", sp.Name, err)
			}
			nFrac++
		}
		items[i] = item{sp, x, hasFrac}
		sum += x
	}
	n := len(parts)
	if n > 1 && nFrac != n {
		return Mixture{}, fmt.Errorf("gas mixture %q: give a mole fraction for every gas, e.g. helium:0.7,argon:0.3", txt)
	}
	if math.Abs(sum-1) > 0.01 {
		return Mixture{}, fmt.Errorf("mole fractions in %q sum to %s; they must sum to 1 (or 100 %%) within 1 %%", txt, units.Number(sum, 4))
	}
	for _, it := range items[:n] {
		if it.x == 0 {
			continue
		}
		if n > 1 && !it.sp.m.noble {
			return Mixture{}, errNotNoble(it.sp)
		}
		m.comps[m.n] = Component{it.sp, it.x / sum}
		m.n++
	}
	if m.n == 0 {
		return Mixture{}, fmt.Errorf("gas mixture %q has no gas with a fraction above 0", txt)
	}
	if m.n == 1 {
		m.comps[0].X = 1
	}
	return m, nil
}

// splitPart splits one component "helium:0.7", "helium 70 %" or "helium"
// into name and fraction text.
func splitPart(part string) (name, frac string, hasFrac bool) {
	if n, f, ok := strings.Cut(part, ":"); ok {
		return n, f, true
	}
	t := strings.TrimSpace(part)
	t2 := strings.TrimSpace(strings.TrimSuffix(t, "%"))
	if i := strings.LastIndexByte(t2, ' '); i > 0 {
		if _, err := strconv.ParseFloat(t2[i+1:], 64); err == nil {
			return t2[:i], t[i+1:], true
		}
	}
	return part, "", false
}

// parseFraction reads "0.7", "70%" or "70 %" as a mole fraction.
func parseFraction(s string) (float64, error) {
	t := strings.TrimSpace(s)
	scale := 1.0
	if p, ok := strings.CutSuffix(t, "%"); ok {
		t, scale = strings.TrimSpace(p), 0.01
	}
	t = strings.Replace(t, ",", ".", 1)
	v, err := strconv.ParseFloat(t, 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, fmt.Errorf("%q is not a number; write a fraction such as 0.3 or 30%%", strings.TrimSpace(s))
	}
	v *= scale
	if v < 0 || v > 1.01 {
		return 0, fmt.Errorf("%s is outside 0–1 (0–100 %%)", units.Number(v, 4))
	}
	return v, nil
}

func errNotNoble(s *Species) error {
	return fmt.Errorf("%s cannot be mixed: mixtures may contain only the noble gases helium, neon, argon, krypton and xenon (the mixing rules here are those of monatomic gases)", s.Name)
}

// String names the mixture for people: "helium" or
// "helium 70 % + argon 30 %". The zero Mixture is "no gas".
func (m Mixture) String() string {
	if m.n == 0 {
		return "no gas"
	}
	if m.n == 1 {
		return m.comps[0].Species.Name
	}
	var b strings.Builder
	for i, c := range m.comps[:m.n] {
		if i > 0 {
			b.WriteString(" + ")
		}
		b.WriteString(c.Species.Name)
		b.WriteByte(' ')
		b.WriteString(units.Number(c.X*100, 4))
		b.WriteString(" %")
	}
	return b.String()
}
