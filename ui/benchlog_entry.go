package ui

import (
	"fmt"
	"strings"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// A safety pass is kept as one entry of the library's log, calculator
// "safety", so that it lives in the same storage as the rest of the user's
// work (IndexedDB in the browser, the data folder on desktop), goes into
// the export file and comes back with an import. The entry holds:
//
//   - Inputs: the rig name under "rig" and every input typed into an item's
//     calculator under "ITEM/KEY" (ITEM the checklist item's id), as typed;
//   - Rows, in checklist order: one row per item (key ITEM, label the
//     item's text, shown "ticked" or "not ticked"), then that item's note
//     (ITEM/note), inputs with their labels (ITEM/input/KEY), numbers with
//     SI value and unit (ITEM/number) and cautions (ITEM/caution);
//   - Verdicts: each item's checks, Check "ITEM/CHECK";
//   - Cautions: the cautions of the whole pass; Note: the pass's notes.
//
// passEntry and entryPass turn one into the other without loss.

// safetyCalc is the calculator name of a safety pass in the log.
var safetyCalc = string(sheet.IDSafety)

// Row shown texts of an item's tick.
const (
	shownTicked   = "ticked"
	shownUnticked = "not ticked"
)

// passEntry makes the log entry of a safety pass.
func passEntry(p store.Pass) store.Entry {
	e := store.Entry{Time: p.Time, Calculator: safetyCalc, Title: p.Title, Inputs: map[string]string{},
		Cautions: append([]string(nil), p.Cautions...), Note: p.Notes}
	if p.Rig != "" {
		e.Inputs["rig"] = p.Rig
	}
	for _, it := range p.Items {
		done := shownUnticked
		if it.Done {
			done = shownTicked
		}
		e.Rows = append(e.Rows, store.Row{Key: it.ID, Label: it.Title, Shown: done})
		if it.Note != "" {
			e.Rows = append(e.Rows, store.Row{Key: it.ID + "/note", Label: "Note", Shown: it.Note})
		}
		for _, in := range it.Inputs {
			e.Inputs[it.ID+"/"+in.Key] = in.Text
			e.Rows = append(e.Rows, store.Row{Key: it.ID + "/input/" + in.Key, Label: in.Label, Shown: in.Text})
		}
		for _, n := range it.Numbers {
			e.Rows = append(e.Rows, store.Row{Key: it.ID + "/number", Label: n.Name, Value: n.Value, Unit: n.Unit, Shown: n.Shown})
		}
		for _, c := range it.Cautions {
			e.Rows = append(e.Rows, store.Row{Key: it.ID + "/caution", Label: "Caution", Shown: c})
		}
		for _, v := range it.Verdicts {
			e.Verdicts = append(e.Verdicts, store.Verdict{Check: it.ID + "/" + v.Check, Outcome: v.Outcome, Why: v.Why})
		}
	}
	return e
}

// entryPass reads a safety pass back from its log entry. An entry that
// does not follow the layout of passEntry is an error naming what is
// wrong; the caller reports it rather than dropping the entry.
func entryPass(e store.Entry) (store.Pass, error) {
	p := store.Pass{Time: e.Time, Title: e.Title, Rig: e.Inputs["rig"], Notes: e.Note,
		Cautions: append([]string(nil), e.Cautions...)}
	index := map[string]int{}
	for _, r := range e.Rows {
		id, rest, sub := strings.Cut(r.Key, "/")
		if !sub {
			if _, dup := index[id]; dup || id == "" {
				return store.Pass{}, fmt.Errorf("item %q appears twice or has no id", id)
			}
			if r.Shown != shownTicked && r.Shown != shownUnticked {
				return store.Pass{}, fmt.Errorf("item %q is neither ticked nor not ticked (%q)", id, r.Shown)
			}
			index[id] = len(p.Items)
			p.Items = append(p.Items, store.Item{ID: id, Title: r.Label, Done: r.Shown == shownTicked})
			continue
		}
		i, ok := index[id]
		if !ok || i != len(p.Items)-1 {
			return store.Pass{}, fmt.Errorf("row %q is not under its item", r.Key)
		}
		it := &p.Items[i]
		kind, key, _ := strings.Cut(rest, "/")
		switch kind {
		case "note":
			it.Note = r.Shown
		case "input":
			text, ok := e.Inputs[id+"/"+key]
			if !ok {
				text = r.Shown
			}
			it.Inputs = append(it.Inputs, store.ItemInput{Key: key, Label: r.Label, Text: text})
		case "number":
			it.Numbers = append(it.Numbers, store.Number{Name: r.Label, Value: r.Value, Unit: r.Unit, Shown: r.Shown})
		case "caution":
			it.Cautions = append(it.Cautions, r.Shown)
		default:
			return store.Pass{}, fmt.Errorf("row %q is of no known kind", r.Key)
		}
	}
	for _, v := range e.Verdicts {
		id, check, _ := strings.Cut(v.Check, "/")
		i, ok := index[id]
		if !ok {
			return store.Pass{}, fmt.Errorf("verdict %q names no item of the pass", v.Check)
		}
		p.Items[i].Verdicts = append(p.Items[i].Verdicts, store.ItemVerdict{Check: check, Outcome: v.Outcome, Why: v.Why})
	}
	if err := p.Validate(); err != nil {
		return store.Pass{}, err
	}
	return p, nil
}
