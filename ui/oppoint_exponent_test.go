package ui

import (
	"math/rand/v2"
	"regexp"
	"testing"
)

// TestWrittenWithExponent checks writtenWithExponent against Go's regexp
// package with the pattern it stands for, `\d[eE][-+]?\d`: on written
// cases, then on random strings of digits, signs, e, E and other letters.
func TestWrittenWithExponent(t *testing.T) {
	ref := regexp.MustCompile(`\d[eE][-+]?\d`)
	cases := []string{"", "1e5", "1E5", "2.5e-3", "3e+7", "e5", "1e", "1e-", "1e-x", "300 K", "1 atm",
		"12 degC", "5e", "x1e5", "1ee5", "1e+-5", "0.5 e5", "helium 1e3 Pa", "9E9"}
	for _, s := range cases {
		if got, want := writtenWithExponent(s), ref.MatchString(s); got != want {
			t.Errorf("writtenWithExponent(%q) = %v, regexp says %v", s, got, want)
		}
	}
	const alphabet = "0123456789eE+-. kPa"
	r := rand.New(rand.NewPCG(1, 2))
	for range 20000 {
		b := make([]byte, r.IntN(8))
		for i := range b {
			b[i] = alphabet[r.IntN(len(alphabet))]
		}
		s := string(b)
		if got, want := writtenWithExponent(s), ref.MatchString(s); got != want {
			t.Fatalf("writtenWithExponent(%q) = %v, regexp says %v", s, got, want)
		}
	}
}
