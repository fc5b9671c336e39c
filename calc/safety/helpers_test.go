package safety

import (
	"errors"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

// near fails t unless got is within rel of want (relative) or abs.
func near(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, 1e-300, rel) {
		t.Errorf("%s = %.10g, want %.10g (rel tol %g)", what, got, want, rel)
	}
}

// wantRangeError fails t unless err is a *units.RangeError whose message
// names field.
func wantRangeError(t *testing.T, err error, field string) {
	t.Helper()
	var re *units.RangeError
	if !errors.As(err, &re) {
		t.Fatalf("got error %v, want a *units.RangeError for %q", err, field)
	}
	if re.Field != field || !strings.Contains(err.Error(), field) {
		t.Errorf("error %q names field %q, want %q", err, re.Field, field)
	}
}

// wantGeneralCaution fails t unless cs starts with the general caution.
func wantGeneralCaution(t *testing.T, cs []string) {
	t.Helper()
	if len(cs) == 0 || cs[0] != CautionGeneral {
		t.Errorf("cautions %q do not start with the general caution", cs)
	}
}

// unitsP converts a float64 to units.Pressure for brevity in tables.
func unitsP(p float64) units.Pressure { return units.Pressure(p) }
