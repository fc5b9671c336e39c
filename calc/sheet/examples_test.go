package sheet

import (
	"slices"
	"testing"
)

// TestExampleArgs: words split at spaces outside double quotes, as a
// POSIX shell splits them (quotes removed, "" kept as an empty word).
func TestExampleArgs(t *testing.T) {
	t.Parallel()
	cases := []struct {
		line string
		want []string
	}{
		{"twcalc gas --gas helium", []string{"twcalc", "gas", "--gas", "helium"}},
		{`twcalc resonance --zones "0.1m,10mm,700K;0.4m,10mm,295K"  --modes 5`, []string{"twcalc", "resonance", "--zones", "0.1m,10mm,700K;0.4m,10mm,295K", "--modes", "5"}},
		{`a "b c" ""`, []string{"a", "b c", ""}},
	}
	for _, c := range cases {
		if got := ExampleArgs(c.line); !slices.Equal(got, c.want) {
			t.Errorf("ExampleArgs(%q) = %q, want %q", c.line, got, c.want)
		}
	}
}
