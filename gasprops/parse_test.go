package gasprops

import (
	"math"
	"strings"
	"testing"
)

func mustParse(t testing.TB, s string) Mixture {
	t.Helper()
	m, err := ParseMixture(s)
	if err != nil {
		t.Fatal(err)
	}
	return m
}

func TestLookup(t *testing.T) {
	t.Parallel()
	for in, want := range map[string]*Species{
		"helium": helium, "He": helium, " HE ": helium, "xenon": xenon, "co2": carbonDioxide,
		"carbon dioxide": carbonDioxide, "Carbon-Dioxide": carbonDioxide, "N2": nitrogen, "air": air, "h2": hydrogen,
	} {
		got, err := Lookup(in)
		if err != nil || got != want {
			t.Errorf("Lookup(%q) = %v, %v", in, got, err)
		}
	}
	_, err := Lookup("unobtainium")
	if err == nil || !strings.Contains(err.Error(), "helium, neon, argon") {
		t.Errorf("unknown gas error %v should list the known gases", err)
	}
	if n := Names(); len(n) != 9 || n[0] != "helium" || n[8] != "carbon dioxide" {
		t.Errorf("Names() = %v", n)
	}
}

func TestParseMixture(t *testing.T) {
	t.Parallel()
	good := []struct {
		in   string
		want string // String() of the result
	}{
		{"helium", "helium"},
		{"He", "helium"},
		{"CO2", "carbon dioxide"},
		{"helium:0.7,argon:0.3", "helium 70 % + argon 30 %"},
		{"He:70%,Ar:30%", "helium 70 % + argon 30 %"},
		{" He : 70 % , Ar : 30 % ", "helium 70 % + argon 30 %"},
		{"He:0,5,Ar:0,5", ""},                                 // decimal comma is ambiguous with the separator: rejected below
		{"He:0.705,Ar:0.3", "helium 70.15 % + argon 29.85 %"}, // sum 1.005, normalised
		{"helium:1,argon:0", "helium"},
		{"He:0.2,Ne:0.2,Ar:0.2,Kr:0.2,Xe:0.2", "helium 20 % + neon 20 % + argon 20 % + krypton 20 % + xenon 20 %"},
		{"air:1", "air"},
		{"helium 70 % + argon 30 %", "helium 70 % + argon 30 %"},
		{"helium 0.7 + xenon 0.3", "helium 70 % + xenon 30 %"},
		{"carbon dioxide", "carbon dioxide"},
	}
	for _, g := range good {
		if g.want == "" {
			continue
		}
		m, err := ParseMixture(g.in)
		if err != nil {
			t.Errorf("ParseMixture(%q): %v", g.in, err)
			continue
		}
		if m.String() != g.want {
			t.Errorf("ParseMixture(%q) = %q, want %q", g.in, m.String(), g.want)
		}
	}
	bad := []struct{ in, says string }{
		{"", "no gas"},
		{"   ", "no gas"},
		{"unobtainium", "known gases"},
		{"helium:0.7,argon:0.2", "sum to 0.9"},
		{"He:0,5,Ar:0,5", "decimals with a point"},
		{",", "names no gas"},
		{"helium 70 % argon 30 %", "unknown gas"},
		{"helium:0.7,helium:0.3", "twice"},
		{"He:-0.3,Ar:1.3", "outside 0–1"},
		{"He:0.5,Ar", "every gas"},
		{"He:abc,Ar:0.5", "not a number"},
		{"He:NaN,Ar:0.5", "not a number"},
		{"He:0.5,N2:0.5", "only the noble gases"},
		{"He:0.2,Ne:0.2,Ar:0.2,Kr:0.2,Xe:0.1,air:0.1", "at most 5"},
		{"He:0,Ar:0", "sum to 0"},
	}
	for _, b := range bad {
		_, err := ParseMixture(b.in)
		if err == nil || !strings.Contains(err.Error(), b.says) {
			t.Errorf("ParseMixture(%q) error %v, want one saying %q", b.in, err, b.says)
		}
	}
}

func TestBinary(t *testing.T) {
	t.Parallel()
	if _, err := Binary(helium, xenon, 1.2); err == nil {
		t.Error("x2 = 1.2 accepted")
	}
	if _, err := Binary(helium, xenon, math.NaN()); err == nil {
		t.Error("x2 = NaN accepted")
	}
	if _, err := Binary(helium, helium, 0.5); err == nil {
		t.Error("same species twice accepted")
	}
	if _, err := Binary(helium, nitrogen, 0.5); err == nil || !strings.Contains(err.Error(), "nitrogen cannot be mixed") {
		t.Errorf("helium-nitrogen: %v", err)
	}
	m, err := Binary(helium, xenon, 0.25)
	if err != nil || len(m.Components()) != 2 || m.Components()[1].X != 0.25 {
		t.Errorf("Binary(He, Xe, 0.25) = %v, %v", m.Components(), err)
	}
}

// FuzzParseMixture: any input either fails with a message or gives 1 to
// MaxComponents distinct species whose fractions are in (0, 1] and sum to
// 1; String never panics and a valid result can be evaluated.
func FuzzParseMixture(f *testing.F) {
	for _, s := range []string{"helium", "He:70%,Ar:30%", "helium:0.7,argon:0.3", "He:0.2,Ne:0.2,Ar:0.2,Kr:0.2,Xe:0.2", ":", ",", "He:1e308,Ar:1e308", "co2:1"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		m, err := ParseMixture(s)
		if err != nil {
			if err.Error() == "" {
				t.Fatal("empty error message")
			}
			return
		}
		cs := m.Components()
		if len(cs) < 1 || len(cs) > MaxComponents {
			t.Fatalf("%q: %d components", s, len(cs))
		}
		sum := 0.0
		for i, c := range cs {
			if !(c.X > 0 && c.X <= 1) {
				t.Fatalf("%q: fraction %g", s, c.X)
			}
			for _, d := range cs[:i] {
				if d.Species == c.Species {
					t.Fatalf("%q: %s twice", s, c.Species.Name)
				}
			}
			sum += c.X
		}
		if math.Abs(sum-1) > 1e-12 {
			t.Fatalf("%q: fractions sum to %.17g", s, sum)
		}
		// String round-trips through ParseMixture (to its 4 significant digits)
		back, err := ParseMixture(m.String())
		if err != nil || len(back.Components()) != len(cs) {
			t.Fatalf("%q: String %q does not parse back: %v", s, m.String(), err)
		}
		for i, c := range back.Components() {
			if c.Species != cs[i].Species || math.Abs(c.X-cs[i].X) > 3e-3*cs[i].X {
				t.Fatalf("%q: round trip %v -> %v", s, cs, back.Components())
			}
		}
		p, err := m.Properties(300, 1e5, nil)
		if err != nil || !finite(p) {
			t.Fatalf("%q: %v %+v", s, err, p)
		}
	})
}
