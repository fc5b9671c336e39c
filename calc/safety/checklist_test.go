package safety

import "testing"

func TestChecklistOrderAndContent(t *testing.T) {
	t.Parallel()
	// The order the issue asks for (issue 6, "A guided checklist").
	want := []string{"rating", "wall-stress", "relief", "test-pressure", "fittings", "leak-check", "cylinder", "oxygen", "hearing", "hot-surfaces", "depressurise"}
	items := Checklist()
	if len(items) != len(want) {
		t.Fatalf("%d items, want %d", len(items), len(want))
	}
	for i, it := range items {
		if it.ID != want[i] {
			t.Errorf("item %d is %q, want %q", i, it.ID, want[i])
		}
		if it.Title == "" || len(it.Why) < 40 {
			t.Errorf("item %q: title %q, why %q too short", it.ID, it.Title, it.Why)
		}
	}
	calcs := map[string]Calculator{"wall-stress": CalcWallStress, "relief": CalcRelief, "test-pressure": CalcTestEnergy, "cylinder": CalcCylinder, "oxygen": CalcOxygen, "hearing": CalcSound}
	for _, it := range items {
		if it.Calc != calcs[it.ID] {
			t.Errorf("item %q has calculator %d, want %d", it.ID, it.Calc, calcs[it.ID])
		}
	}
	// A fresh copy each call: editing one does not change the next.
	items[0].Title = "changed"
	if Checklist()[0].Title == "changed" {
		t.Error("Checklist returns shared data")
	}
}

func TestPassState(t *testing.T) {
	t.Parallel()
	p := NewPass()
	if p.Ticked() != 0 || p.Complete() || len(p.Open()) != len(p.Items) {
		t.Fatalf("fresh pass: ticked %d complete %v open %v", p.Ticked(), p.Complete(), p.Open())
	}
	p.Done[0], p.Done[3] = true, true
	p.Notes[3] = "hydro test at 52 bar on 2026-11-30"
	if p.Ticked() != 2 || p.Open()[0] != 1 || p.Open()[2] != 4 {
		t.Errorf("ticked %d open %v", p.Ticked(), p.Open())
	}
	for i := range p.Done {
		p.Done[i] = true
	}
	if !p.Complete() || len(p.Open()) != 0 {
		t.Error("all ticked is not complete")
	}
	p.Reset()
	if p.Ticked() != 0 || p.Notes[3] != "" {
		t.Error("Reset left ticks or notes")
	}
}
