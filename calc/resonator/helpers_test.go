package resonator

import (
	"testing"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// gas returns the properties of a named gas from gasprops at T (K), p (Pa).
func gas(t testing.TB, name string, T, p float64) gasprops.Properties {
	t.Helper()
	m, err := gasprops.ParseMixture(name)
	if err != nil {
		t.Fatal(err)
	}
	g, err := m.Properties(units.Temperature(T), units.Pressure(p), nil)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

func mixture(t testing.TB, name string) gasprops.Mixture {
	t.Helper()
	m, err := gasprops.ParseMixture(name)
	if err != nil {
		t.Fatal(err)
	}
	return m
}

func species(t testing.TB, name string) *gasprops.Species {
	t.Helper()
	s, err := gasprops.Lookup(name)
	if err != nil {
		t.Fatal(err)
	}
	return s
}
