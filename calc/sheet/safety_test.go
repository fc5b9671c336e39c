package sheet

import (
	"strconv"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// Helpers of the safety calculators' tests.

// evalOK evaluates s on texts and fails the test on an error.
func evalOK(t *testing.T, s *Sheet, texts map[string]string) *Result {
	t.Helper()
	r, err := s.Evaluate(texts)
	if err != nil {
		t.Fatalf("%s %v: %v", s.ID, texts, err)
	}
	return r
}

// rowOf returns row key of r, failing the test when it is missing.
func rowOf(t *testing.T, r *Result, key string) Row {
	t.Helper()
	row, ok := r.Row(key)
	if !ok {
		t.Fatalf("no row %s", key)
	}
	return row
}

// wantNum checks row key against want within a relative tolerance.
func wantNum(t *testing.T, what string, r *Result, key string, want, rel float64) {
	t.Helper()
	if got := rowOf(t, r, key).Value; !scalar.EqualWithinAbsOrRel(got, want, 1e-300, rel) {
		t.Errorf("%s: %s = %.10g, want %.10g within %g", what, key, got, want, rel)
	}
}

// wantOutcome checks the outcome of check row key.
func wantOutcome(t *testing.T, what string, r *Result, key string, want Outcome) {
	t.Helper()
	if got := rowOf(t, r, key); got.Outcome != want || got.Note == "" {
		t.Errorf("%s: %s outcome %v (why %q), want %v with a why", what, key, got.Outcome, got.Note, want)
	}
}

// wantFieldError checks that evaluating s on texts fails about input key.
func wantFieldError(t *testing.T, s *Sheet, texts map[string]string, key string) error {
	t.Helper()
	_, err := s.Evaluate(texts)
	fes := FieldErrors(err)
	if len(fes) == 0 || fes[0].Key != key {
		t.Errorf("%s %v: error %v, want one about %s", s.ID, texts, err, key)
	}
	return err
}

func plus(base map[string]string, kv ...string) map[string]string {
	m := make(map[string]string, len(base)+len(kv)/2)
	for k, v := range base {
		m[k] = v
	}
	for i := 0; i+1 < len(kv); i += 2 {
		m[kv[i]] = kv[i+1]
	}
	return m
}

// near reports whether got is within rel of want.
func near(got, want, rel float64) bool { return scalar.EqualWithinAbsOrRel(got, want, 1e-300, rel) }

// ftoa writes x for a typed input.
func ftoa(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }
