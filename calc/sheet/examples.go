package sheet

import "strings"

// ExampleArgs splits one of a Sheet's Examples ("twcalc resonance --zones
// \"0.1m,10mm,700K;0.4m,10mm,295K\"") into its words as a shell would:
// at spaces outside double quotes, the quotes removed. Tests run the
// examples of every calculator through both front ends with it.
func ExampleArgs(line string) []string {
	var args []string
	var cur strings.Builder
	quoted, word := false, false
	for _, r := range line {
		switch {
		case r == '"':
			quoted, word = !quoted, true
		case r == ' ' && !quoted:
			if word {
				args = append(args, cur.String())
			}
			cur.Reset()
			word = false
		default:
			cur.WriteRune(r)
			word = true
		}
	}
	if word {
		args = append(args, cur.String())
	}
	return args
}
