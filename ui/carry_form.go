package ui

import (
	"gioui.org/layout"
	"gioui.org/widget"

	"tubewright/calc/sheet"
	"tubewright/calc/units"
)

// carryMark is the mark on an input whose value was carried from another
// screen: where it came from, the text it was set to, and the text it held
// before, which Undo puts back.
type carryMark struct {
	from string // title of the screen the value came from
	what string // what the value is there, when the field's label does not say
	text string // the text the carry set
	prev string // the text before the carry, for Undo
	undo widget.Clickable
	// info, when set, is a note beside an input the value does not go
	// into (the hot temperature beside an allowable stress): the text is
	// not changed and there is nothing to undo.
	info string
	// Kept for drawing: the line under the input and the descriptions.
	line                  string
	carriedDesc, undoDesc joined
}

// kind is what input it gives and takes between screens, or "".
func (f *Form) kind(it *formItem) carryKind { return carryOf(f.Sheet.ID, it.in) }

// shareCarried puts the values of the inputs that give one on the Bench,
// each with the text as typed; a value that was itself carried keeps the
// screen it first came from.
func (f *Form) shareCarried() {
	b := f.env.Bench
	v := f.result.Values
	for i := range f.items {
		it := &f.items[i]
		k := f.kind(it)
		if k == "" || !v.Has(it.in.Key) {
			continue
		}
		from := f.Sheet.Title
		if c := it.carriedFrom(); c != "" {
			from = c
		}
		c := Carried{Text: it.text(), From: from}
		if it.in.Kind != sheet.Gas && it.in.Kind != sheet.Pick {
			val := v.Get(it.in.Key)
			c.SI, c.PM = val.Q.Value, val.Q.Uncertainty
		}
		if c.Text == "" {
			continue
		}
		b.put(k, c)
		if k == carryMeasured {
			// a measurement is also the operating frequency
			b.put(carryFrequency, c)
		}
	}
}

// takeCarried sets the inputs that take a value the Bench holds, where the
// value differs from theirs, to the carried value in the text it was
// given in, and marks each with where it came from (keeping the text it
// held for Undo). It reports whether anything changed.
func (f *Form) takeCarried() bool {
	f.cs.entered = true
	b := f.env.Bench
	changed := false
	for i := range f.items {
		it := &f.items[i]
		if f.takeNote(it) {
			continue
		}
		k := f.kind(it)
		c, ok := b.carried(k)
		if k == "" || !ok || c.From == f.Sheet.Title || f.holds(it, c) || f.hiddenExtra(it) {
			continue
		}
		text := carryText(it.in, c)
		if text == "" {
			continue
		}
		prev, earlier := it.text(), it.carriedFrom() != ""
		f.SetText(it.in.Key, text)
		if it.text() == prev {
			continue // the picker or the chips refused it
		}
		if earlier {
			prev = it.mark.prev // Undo goes back to the user's own text
		}
		from := c.From
		if from == "" {
			from = "another screen"
		}
		it.mark = &carryMark{from: from, what: carryWhat[k], text: it.text(), prev: prev}
		changed = true
	}
	return changed
}

// holds reports whether input it already holds the carried value c.
func (f *Form) holds(it *formItem, c Carried) bool {
	switch it.in.Kind {
	case sheet.Gas, sheet.Pick:
		return it.text() == c.Text
	}
	if it.field == nil {
		return true // nothing to take it
	}
	cur, ok := it.field.Value()
	return ok && near(cur, c.SI)
}

// retake runs after the kept inputs were restored: a value carried in
// before the storage loaded wins over the kept one (the kept text is what
// Undo restores), so that a screen opened early still follows the chain.
func (f *Form) retake() {
	if !f.cs.entered {
		return
	}
	for i := range f.items {
		it := &f.items[i]
		if it.mark != nil && it.mark.info == "" && it.text() != it.mark.text {
			it.mark = nil
		}
	}
	f.takeCarried()
}

// updateMarks handles the Undo taps of the carry marks: the input gets its
// text back and loses the mark. It reports whether anything changed.
func (f *Form) updateMarks(gtx layout.Context) bool {
	changed := false
	for i := range f.items {
		it := &f.items[i]
		if it.mark == nil || it.mark.info != "" || !it.mark.undo.Clicked(gtx) {
			continue
		}
		prev := it.mark.prev
		it.mark = nil
		f.SetText(it.in.Key, prev)
		changed = true
	}
	return changed
}

// Carried returns where the value of input key came from ("" when it was
// typed here or is the default) and the text Undo would restore.
func (f *Form) Carried(key string) (from, prev string) {
	it := f.item(key)
	if from := it.carriedFrom(); from != "" {
		return from, it.mark.prev
	}
	return "", ""
}

// carryNotes are inputs beside which a carried value is shown as a note
// rather than taken: the safety pass's allowable stress is read at the
// hot-end temperature an engine reaches.
var carryNotes = map[sheet.ID]map[string]carryKind{
	sheet.IDVessel: {"allowable-stress": carryHot},
}

// takeNote sets the note of input it when it is one that shows a carried
// value beside it, and reports whether it is.
func (f *Form) takeNote(it *formItem) bool {
	k, ok := carryNotes[f.Sheet.ID][it.in.Key]
	if !ok {
		return false
	}
	c, ok := f.env.Bench.carried(k)
	if !ok || !usable(c.SI) {
		return true
	}
	t := writtenIn(c.SI, units.DimTemperature)[0]
	it.mark = &carryMark{from: c.From, text: it.text(),
		info: "The engine's hot end reaches " + t + " (from " + c.From + "): take the allowable stress at that temperature."}
	return true
}

// carriedFrom returns the screen the input's value came from, or "" when
// it was typed here (or the carried text was changed since).
func (it *formItem) carriedFrom() string {
	if m := it.mark; m != nil && m.info == "" && m.text == it.text() {
		return m.from
	}
	return ""
}

// carryWhat says what a carried value was on the screen it came from,
// where the field that takes it names something else (an engine's fill
// pressure arrives as a design pressure to start from).
var carryWhat = map[carryKind]string{
	carryRigPressure: "the engine's cold fill pressure; it rises as the engine heats, so design above it",
	carryRigBore:     "the engine's widest duct",
	carryRigRadius:   "half the engine's widest duct",
	carryRigVolume:   "the gas the engine's parts hold",
}

// hiddenExtra reports whether input it carries beyond the Share tags and
// is hidden on its screen (the length while Tube resonance solves for
// it): such an input keeps its own text, which the screen stashes while
// it is hidden.
func (f *Form) hiddenExtra(it *formItem) bool {
	if _, extra := carryInputs[f.Sheet.ID][it.in.Key]; !extra || f.cs.shown == nil {
		return false
	}
	for _, k := range f.cs.shown() {
		if k == it.in.Key {
			return false
		}
	}
	return true
}
