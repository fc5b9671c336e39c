package ui

import (
	"fmt"
	"strings"

	"gioui.org/layout"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// mixKey is the GasPicker chip that switches to a two-gas noble mixture.
const mixKey = "noble mixture"

// nobleGases are the species offered for mixtures (names as in gasprops).
var nobleGases = []string{"helium", "neon", "argon", "krypton", "xenon"}

// GasPicker picks the working gas: one of the pure gases gasprops knows, or
// a binary noble-gas mixture with the mole fraction of the second gas.
type GasPicker struct {
	env    *Env
	gas    *Choice
	first  *Choice
	second *Choice
	frac   *Field
}

// NewGasPicker returns a picker set to initial ("helium",
// "helium:0.7,argon:0.3"); helium when initial is empty or not understood.
func NewGasPicker(env *Env, initial string) *GasPicker {
	names := gasprops.Names()
	keys := append(append([]string(nil), names...), mixKey)
	labels := make([]string, len(keys))
	for i, k := range keys {
		labels[i] = capitalize(k)
	}
	g := &GasPicker{
		env:    env,
		gas:    NewChoice(env, "Gas", keys, labels),
		first:  NewChoice(env, "First gas", nobleGases, capitalizeAll(nobleGases)),
		second: NewChoice(env, "Second gas", nobleGases, capitalizeAll(nobleGases)),
		frac:   NewField(env, "Mole fraction of the second gas", units.DimNone, "0.3"),
	}
	g.frac.Hint = "0 to 1, or a percentage such as 30 %"
	g.second.Select("argon")
	if initial == "" || g.SetText(initial) != nil {
		g.gas.Select("helium")
	}
	return g
}

func capitalize(s string) string {
	if s == "" {
		return s
	}
	return strings.ToUpper(s[:1]) + s[1:]
}

func capitalizeAll(ss []string) []string {
	out := make([]string, len(ss))
	for i, s := range ss {
		out[i] = capitalize(s)
	}
	return out
}

// SetText sets the picker from code to a gas text as understood by
// gasprops.ParseMixture (a pure gas or two noble gases); it is not a user
// change.
func (g *GasPicker) SetText(s string) error {
	m, err := gasprops.ParseMixture(s)
	if err != nil {
		return err
	}
	cs := m.Components()
	switch {
	case len(cs) == 1 && g.gas.Select(cs[0].Species.Name):
		return nil
	case len(cs) == 2 && g.first.Select(cs[0].Species.Name) && g.second.Select(cs[1].Species.Name):
		g.gas.Select(mixKey)
		g.frac.SetText(units.Decimal(cs[1].X, 6))
		return nil
	}
	return fmt.Errorf("gas %q: the picker offers one gas or two noble gases", s)
}

// Text returns the picked gas as text for gasprops.ParseMixture and the
// Bench: "helium" or "helium:0.7,argon:0.3". It is "" while the mixture
// fraction does not parse.
func (g *GasPicker) Text() string {
	if g.gas.Selected() != mixKey {
		return g.gas.Selected()
	}
	x, ok := g.frac.Value()
	if !ok || x < 0 || x > 1 {
		return ""
	}
	f := func(v float64) string { return units.Decimal(v, 6) }
	return g.first.Selected() + ":" + f(1-x) + "," + g.second.Selected() + ":" + f(x)
}

// Mixture returns the picked gas, or an error naming the bad input.
func (g *GasPicker) Mixture() (gasprops.Mixture, error) {
	if g.gas.Selected() != mixKey {
		sp, err := gasprops.Lookup(g.gas.Selected())
		if err != nil {
			return gasprops.Mixture{}, err
		}
		return gasprops.Pure(sp), nil
	}
	q, err := g.frac.Quantity()
	if err != nil {
		return gasprops.Mixture{}, err
	}
	if q.Value < 0 || q.Value > 1 {
		err := units.NewRangeError("mole fraction of the second gas", q.Value, 0, 1, "")
		g.frac.SetError(err)
		return gasprops.Mixture{}, err
	}
	a, err := gasprops.Lookup(g.first.Selected())
	if err != nil {
		return gasprops.Mixture{}, err
	}
	b, err := gasprops.Lookup(g.second.Selected())
	if err != nil {
		return gasprops.Mixture{}, err
	}
	return gasprops.Binary(a, b, q.Value)
}

// Update handles the picker's events and reports whether the user changed
// the gas since the last Update.
func (g *GasPicker) Update(gtx layout.Context) bool {
	ch := g.gas.Update(gtx)
	ch = g.first.Update(gtx) || ch
	ch = g.second.Update(gtx) || ch
	ch = g.frac.Update(gtx) || ch
	return ch
}

// Layout draws the gas chips and, for a mixture, the two gases and the
// fraction.
func (g *GasPicker) Layout(gtx layout.Context) layout.Dimensions {
	if g.gas.Selected() != mixKey {
		return g.gas.Layout(gtx)
	}
	gap := layout.Rigid(layout.Spacer{Height: 12}.Layout)
	return layout.Flex{Axis: layout.Vertical}.Layout(gtx,
		layout.Rigid(g.gas.Layout), gap,
		layout.Rigid(g.first.Layout), gap,
		layout.Rigid(g.second.Layout), gap,
		layout.Rigid(g.frac.Layout),
	)
}
