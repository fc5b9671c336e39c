package ui

import (
	"testing"

	"gioui.org/font"
)

// TestThemeFaces checks the theme embeds exactly the two faces the screens
// draw with (regular and bold, upright), so the WebAssembly download
// carries no unused font.
func TestThemeFaces(t *testing.T) {
	t.Parallel()
	faces := appFaces()
	if len(faces) != 2 {
		t.Fatalf("%d faces embedded, want 2", len(faces))
	}
	// The shaper reads Go Bold's weight from the file as SemiBold (600),
	// which serves the screens' 600 and 700 alike.
	want := []font.Weight{font.Normal, font.SemiBold}
	for i, f := range faces {
		if f.Font.Weight != want[i] || f.Font.Style != font.Regular {
			t.Errorf("face %d is %v %v, want weight %v upright", i, f.Font.Weight, f.Font.Style, want[i])
		}
	}
}
