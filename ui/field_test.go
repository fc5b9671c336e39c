package ui

import (
	"image"
	"strings"
	"testing"

	"gioui.org/io/key"
	"gioui.org/layout"

	"tubewright/calc/units"
)

// TestFieldUserChangeOnly checks that text set from code is not reported as
// a user change, that typing is, exactly once, and that the typed text is
// parsed with its unit. Unit factors: 1 bar = 1e5 Pa by definition (SI
// Brochure, 9th ed., 2019, Table 8).
func TestFieldUserChangeOnly(t *testing.T) {
	env := NewEnv(nil)
	f := NewField(env, "Mean pressure", units.DimPressure, "1 bar")
	var changes int
	h := newHarness(t, image.Pt(400, 200), func(gtx layout.Context) layout.Dimensions {
		if f.Update(gtx) {
			changes++
		}
		return f.Layout(gtx)
	})
	h.frames(3)
	if changes != 0 {
		t.Fatalf("text set by code counted as %d user changes", changes)
	}
	if v, ok := f.Value(); !ok || v != 1e5 {
		t.Fatalf("initial value = %v, %v; want 1e5 Pa", v, ok)
	}
	h.retype("Mean pressure", "1 bar", "10 bar")
	if changes != 1 {
		t.Fatalf("typing gave %d changes, want 1", changes)
	}
	if f.Text() != "10 bar" {
		t.Fatalf("text = %q, want %q", f.Text(), "10 bar")
	}
	if v, ok := f.Value(); !ok || v != 1e6 {
		t.Fatalf("value after typing = %v, %v; want 1e6 Pa", v, ok)
	}
	f.SetText("2 bar")
	h.frames(2)
	if changes != 1 {
		t.Fatalf("SetText after typing counted as a user change (%d changes)", changes)
	}
}

// TestFieldErrorNamesFieldAndValue checks the error text shown under a field
// with text that does not parse: it names the field and repeats the input,
// and it is drawn (found in the semantic tree).
func TestFieldErrorNamesFieldAndValue(t *testing.T) {
	env := NewEnv(nil)
	f := NewField(env, "Tube length", units.DimLength, "250 mm")
	h := newHarness(t, image.Pt(400, 200), func(gtx layout.Context) layout.Dimensions {
		f.Update(gtx)
		return f.Layout(gtx)
	})
	if f.ErrorText() != "" {
		t.Fatalf("good input shows an error: %q", f.ErrorText())
	}
	h.retype("Tube length", "250 mm", "250 parsec")
	msg := f.ErrorText()
	if !strings.Contains(msg, "Tube length") || !strings.Contains(msg, "250 parsec") {
		t.Fatalf("error %q should name the field and the input", msg)
	}
	if _, err := f.Quantity(); err == nil {
		t.Fatal("Quantity returned no error for unparsable text")
	}
	if got, _ := h.shown("Tube length error"); got != msg {
		t.Fatalf("shown error %q, want %q", got, msg)
	}
	h.retype("Tube length", "250 parsec", "10 in")
	if f.ErrorText() != "" {
		t.Fatalf("error not cleared after a good value: %q", f.ErrorText())
	}
	// 10 in = 0.254 m exactly (1 in = 25.4 mm by definition, NIST SP 811, 2008, B.8).
	if v, _ := f.Value(); v < 0.253999 || v > 0.254001 {
		t.Fatalf("10 in parsed as %v m, want 0.254", v)
	}
}

// TestChoiceClick checks that tapping a chip selects it and reports one
// change.
func TestChoiceClick(t *testing.T) {
	env := NewEnv(nil)
	c := NewChoice(env, "End", []string{"closed", "open"}, []string{"Closed end", "Open end"})
	var changes int
	h := newHarness(t, image.Pt(400, 200), func(gtx layout.Context) layout.Dimensions {
		if c.Update(gtx) {
			changes++
		}
		return c.Layout(gtx)
	})
	h.tap("Open end")
	if c.Selected() != "open" || changes != 1 {
		t.Fatalf("after tap: selected %q with %d changes; want open, 1", c.Selected(), changes)
	}
}

// TestFieldEnterDropsFocus checks that Enter in a field ends editing: the
// field loses focus (a phone then hides its keyboard) and the text stays.
func TestFieldEnterDropsFocus(t *testing.T) {
	env := NewEnv(nil)
	f := NewField(env, "Drive frequency", units.DimFrequency, "600 Hz")
	var focused bool
	h := newHarness(t, image.Pt(400, 200), func(gtx layout.Context) layout.Dimensions {
		f.Update(gtx)
		d := f.Layout(gtx)
		focused = gtx.Focused(&f.editor)
		return d
	})
	h.click(h.mustDesc("Drive frequency").Desc.Bounds)
	if !focused {
		t.Fatal("tapping the field did not focus it")
	}
	h.r.Queue(key.EditEvent{Range: key.Range{Start: 6, End: 6}, Text: "\n"})
	h.frames(2)
	if focused {
		t.Fatal("Enter left the field focused")
	}
	if f.Text() != "600 Hz" {
		t.Fatalf("Enter changed the text to %q", f.Text())
	}
}

// TestFieldOptionsAfterNew checks that options set after NewField apply to
// the starting text: a bare number becomes valid once a default unit is set.
func TestFieldOptionsAfterNew(t *testing.T) {
	f := NewField(NewEnv(nil), "Temperature", units.DimTemperature, "300")
	if _, ok := f.Value(); ok {
		t.Fatal("a bare 300 parsed as a temperature with no default unit")
	}
	f.Options.DefaultUnit = "K"
	if v, ok := f.Value(); !ok || v != 300 {
		t.Fatalf("with default unit K: %v, %v; want 300 K", v, ok)
	}
}
