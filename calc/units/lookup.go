package units

import (
	"strings"
	"unicode"
)

// This file turns a typed unit into an entry of unitTable.

// index maps spellings to units, per dimension. exact is case-sensitive;
// folded holds lower-cased spellings that are unique within the dimension
// ("KPA" finds kPa, but "mhz" finds nothing because of MHz and mHz).
type index struct {
	exact  [len(dims)]map[string]*unitDef
	folded [len(dims)]map[string]*unitDef
	byDim  [len(dims)][]*unitDef // table order, SI unit first
	// clash holds, for folded spellings dropped because two units share
	// them, the symbols of those units ("mhz": MHz, mHz).
	clash [len(dims)]map[string][]string
}

var idx = buildIndex(unitTable)

// variants returns the spellings of s that Parse accepts besides s itself:
// ² and ³ as 2, 3, ^2, ^3; · as *, . and a space; µ as u.
func variants(s string) []string {
	out := []string{s}
	expand := func(old string, news ...string) {
		n := len(out)
		for i := 0; i < n; i++ {
			if strings.Contains(out[i], old) {
				for _, nw := range news {
					out = append(out, strings.ReplaceAll(out[i], old, nw))
				}
			}
		}
	}
	expand("²", "2", "^2")
	expand("³", "3", "^3")
	expand("·", "*", ".", " ")
	expand("µ", "u")
	return out
}

func buildIndex(table []unitDef) *index {
	x := &index{}
	collide := [len(dims)]map[string]bool{}
	for d := range dims {
		x.exact[d] = map[string]*unitDef{}
		x.folded[d] = map[string]*unitDef{}
		collide[d] = map[string]bool{}
	}
	for i := range table {
		def := &table[i]
		d := def.dim
		x.byDim[d] = append(x.byDim[d], def)
		all := append([]string{def.name, def.symbol}, def.spellings...)
		for _, sp := range all {
			for _, v := range variants(sp) {
				if old, ok := x.exact[d][v]; ok && old != def {
					panic("calc: units: spelling " + v + " used twice for " + d.String())
				}
				x.exact[d][v] = def
				f := strings.ToLower(v)
				if old, ok := x.folded[d][f]; ok && old != def {
					collide[d][f] = true
				}
				x.folded[d][f] = def
			}
		}
	}
	for d := range dims {
		x.clash[d] = map[string][]string{}
		for f := range collide[d] {
			delete(x.folded[d], f)
			for _, def := range x.byDim[d] {
				for _, sp := range append([]string{def.name, def.symbol}, def.spellings...) {
					if strings.ToLower(sp) == f {
						x.clash[d][f] = appendOnce(x.clash[d][f], def.symbol)
					}
				}
			}
		}
	}
	return x
}

// normalizeUnit tidies a typed unit: trims it, collapses runs of white
// space to one space, maps the Greek mu to the micro sign and a few
// look-alike characters to the ones in the table.
func normalizeUnit(s string) string {
	var b strings.Builder
	space := false
	for _, r := range strings.TrimSpace(s) {
		switch {
		case unicode.IsSpace(r):
			space = true
			continue
		case r == 'μ': // Greek small letter mu
			r = 'µ' // micro sign
		case r == '⋅' || r == '∙' || r == '•': // dot operators and bullets
			r = '·'
		case r == '∕' || r == '⁄': // division and fraction slashes
			r = '/'
		}
		if space && b.Len() > 0 {
			b.WriteByte(' ')
		}
		space = false
		b.WriteRune(r)
	}
	return b.String()
}

// find looks a normalized unit up within one dimension: exact spelling,
// then without spaces around "/" , then case-folded.
func (x *index) find(d Dimension, s string) *unitDef {
	if def := x.exact[d][s]; def != nil {
		return def
	}
	t := strings.ReplaceAll(strings.ReplaceAll(s, " /", "/"), "/ ", "/")
	if def := x.exact[d][t]; def != nil {
		return def
	}
	if def := x.folded[d][strings.ToLower(s)]; def != nil && safeFold(s, def) {
		return def
	}
	if def := x.folded[d][strings.ToLower(t)]; def != nil && safeFold(t, def) {
		return def
	}
	return nil
}

// safeFold reports whether reading typed as def, ignoring letter case, is
// safe: m/M (milli/mega) and g/G (gram/giga) at the start are never
// folded, so "5 MW" is not taken for 5 mW nor "mpa" for MPa.
func safeFold(typed string, def *unitDef) bool {
	if typed == "" {
		return false
	}
	a, b := typed[0], def.name[0]
	if a == b {
		return true
	}
	switch a | 0x20 {
	case 'm', 'g':
		return false
	}
	return true
}

// foldHint returns the symbol of the unit that typed matches when letter
// case is ignored, or "".
func (x *index) foldHint(d Dimension, typed string) string {
	if def := x.folded[d][strings.ToLower(typed)]; def != nil {
		return def.symbol
	}
	return ""
}

// findAny looks a unit up in every dimension and returns the first match
// in Dimension order, preferring exact spellings.
func (x *index) findAny(s string) *unitDef {
	for d := range dims {
		if def := x.exact[d][s]; def != nil {
			return def
		}
	}
	for d := range dims {
		if def := x.find(Dimension(d), s); def != nil {
			return def
		}
	}
	return nil
}

// Units returns the unit symbols a UI can offer for d, SI unit first, e.g.
// for DimPressure: Pa, kPa, MPa, bar, barg, mbar, psi, psig, atm, torr.
// Parse accepts every one of them (and more spellings). DimNone offers "%".
func Units(d Dimension) []string {
	defs := idx.byDim[d.infoIndex()]
	out := make([]string, 0, len(defs))
	for _, def := range defs {
		if def.offered {
			out = append(out, def.symbol)
		}
	}
	return out
}

// infoIndex returns d as an index, panicking on an unknown Dimension.
func (d Dimension) infoIndex() int {
	d.info()
	return int(d)
}

// lookupUnit finds a unit by any accepted spelling. When dim is valid the
// search is limited to it; otherwise every dimension is searched and the
// first match wins (so "degC" is an absolute temperature, not a difference).
func lookupUnit(unit string, dim Dimension, anyDim bool) *unitDef {
	s := normalizeUnit(unit)
	if anyDim {
		return idx.findAny(s)
	}
	return idx.find(dim, s)
}

func appendOnce(list []string, s string) []string {
	for _, x := range list {
		if x == s {
			return list
		}
	}
	return append(list, s)
}
