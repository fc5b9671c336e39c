package ui

import (
	"bytes"
	"reflect"
	"testing"

	"github.com/go-text/typesetting/font"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goregular"
)

// TestAppFacesDrawAsGoFonts checks the app's embedded bold face (ui/fonts,
// Go Bold without hinting instructions) against the original of
// golang.org/x/image/font/gofont: the same characters, and for each the
// same glyph outline and advance, so the app draws every character as the
// Go font does. The outside reference is the Go font's own file; the
// regular face is the original itself, compared as a check of the check.
func TestAppFacesDrawAsGoFonts(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		name      string
		ours, ref []byte
	}{
		{"Go Regular", goregular.TTF, goregular.TTF},
		{"Go Bold", goBoldTTF, gobold.TTF},
	} {
		ours, err := font.ParseTTF(bytes.NewReader(tc.ours))
		if err != nil {
			t.Fatalf("%s (ours): %v", tc.name, err)
		}
		ref, err := font.ParseTTF(bytes.NewReader(tc.ref))
		if err != nil {
			t.Fatalf("%s (gofont): %v", tc.name, err)
		}
		if tc.name == "Go Bold" && len(tc.ours) >= len(tc.ref) {
			t.Errorf("%s: ours is %d bytes, the original %d: nothing was left out", tc.name, len(tc.ours), len(tc.ref))
		}
		chars := 0
		for r := rune(0); r <= 0xFFFF; r++ {
			gr, okRef := ref.NominalGlyph(r)
			gu, okOurs := ours.NominalGlyph(r)
			if okRef != okOurs {
				t.Errorf("%s: %U has a glyph in gofont: %v, in ours: %v", tc.name, r, okRef, okOurs)
				continue
			}
			if !okRef {
				continue
			}
			chars++
			if a, b := ours.HorizontalAdvance(gu), ref.HorizontalAdvance(gr); a != b {
				t.Errorf("%s: %U advance %v, gofont %v", tc.name, r, a, b)
			}
			if a, b := ours.GlyphData(gu), ref.GlyphData(gr); !reflect.DeepEqual(a, b) {
				t.Errorf("%s: %U outline differs from gofont's", tc.name, r)
			}
		}
		// The Go fonts cover WGL4, about 650 characters.
		if chars < 600 {
			t.Errorf("%s: only %d characters compared", tc.name, chars)
		}
		t.Logf("%s: %d characters draw as in gofont; %d bytes instead of %d", tc.name, chars, len(tc.ours), len(tc.ref))
	}
}
