package ui

import (
	"image"
	"strings"
	"testing"
)

// TestCautionDrawsEveryLine checks that the caution box draws its heading
// and every line the caller gave, and defaults the heading to "Caution".
func TestCautionDrawsEveryLine(t *testing.T) {
	c := NewCaution(NewEnv(nil), "", "Vent the room before filling.", "Follow your local pressure code.")
	h := newHarness(t, image.Pt(412, 400), c.Layout)
	var all []string
	for _, n := range h.nodes() {
		all = append(all, n.Desc.Label)
	}
	text := strings.Join(all, "\n")
	for _, want := range []string{"Caution", "Vent the room before filling.", "Follow your local pressure code."} {
		if !strings.Contains(text, want) {
			t.Errorf("caution box does not show %q:\n%s", want, text)
		}
	}
}
