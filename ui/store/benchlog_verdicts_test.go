package store

import (
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// TestPassKeepsInputsAndVerdicts: a saved pass keeps what was typed into
// an item's calculator and its checks with their outcomes, and the text
// export shows a failing check in capitals.
func TestPassKeepsInputsAndVerdicts(t *testing.T) {
	t.Parallel()
	path := filepath.Join(t.TempDir(), "benchlog.json")
	p := Pass{Time: time.Date(2026, 12, 1, 21, 0, 0, 0, time.UTC), Title: "pass", Cautions: []string{"general"},
		Items: []Item{{ID: "relief", Title: "Relief", Done: true,
			Inputs:   []ItemInput{{Key: "relief-set", Label: "Relief set pressure", Text: "42 barg"}},
			Verdicts: []ItemVerdict{{Check: "relief_check", Outcome: "fail", Why: "set pressure is above the MAWP"}}}}}
	if err := Append(path, p); err != nil {
		t.Fatal(err)
	}
	l, err := Load(path)
	if err != nil || len(l.Passes) != 1 {
		t.Fatalf("load: %v, %v", l, err)
	}
	it := l.Passes[0].Items[0]
	if len(it.Inputs) != 1 || it.Inputs[0].Text != "42 barg" || len(it.Verdicts) != 1 || it.Verdicts[0].Outcome != "fail" {
		t.Fatalf("item read back as %+v", it)
	}
	txt := l.Passes[0].Text()
	for _, want := range []string{"Relief set pressure: 42 barg", "FAIL relief_check: set pressure is above the MAWP"} {
		if !strings.Contains(txt, want) {
			t.Errorf("export lacks %q:\n%s", want, txt)
		}
	}
}
