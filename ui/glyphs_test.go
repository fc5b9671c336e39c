package ui

import (
	"go/ast"
	"go/parser"
	"go/token"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"testing"

	"gioui.org/font"
	"gioui.org/font/gofont"
	"gioui.org/font/opentype"

	"tubewright/calc/units"
)

// TestTextHasGlyphs checks that every character that can reach a screen
// has a glyph in every upright face of the embedded Go fonts the theme uses
// (see NewTheme): a missing glyph is drawn as an empty box, in the browser
// build always, as it has no other fonts. What is read: the string
// literals of ui/ and of the messages and notes of calc/ and gasprops/
// (not comments, not test files), and the symbols the units package
// formats with (its own literals are mostly spellings accepted from the
// user, such as ⅓ or ℉, never drawn).
func TestTextHasGlyphs(t *testing.T) {
	t.Parallel()
	var faces []struct {
		name string
		face opentype.Face
	}
	for _, ff := range gofont.Collection() {
		f, ok := ff.Face.(opentype.Face)
		if !ok {
			t.Fatalf("face %v is %T, not an opentype.Face", ff.Font, ff.Face)
		}
		if ff.Font.Style != font.Regular {
			continue // the app draws no italics
		}
		faces = append(faces, struct {
			name string
			face opentype.Face
		}{string(ff.Font.Typeface) + " " + ff.Font.Weight.String(), f})
	}
	if len(faces) < 2 {
		t.Fatalf("only %d upright faces in the Go font collection", len(faces))
	}
	var files []string
	for _, pat := range []string{"*.go", "../calc/*/*.go", "../gasprops/*.go"} {
		m, err := filepath.Glob(pat)
		if err != nil {
			t.Fatal(err)
		}
		files = append(files, m...)
	}
	where := map[rune]string{}
	note := func(s, pos string) {
		for _, r := range s {
			if r > 0x7e && where[r] == "" {
				where[r] = pos
			}
		}
	}
	fset := token.NewFileSet()
	for _, fn := range files {
		if strings.HasSuffix(fn, "_test.go") || strings.Contains(fn, "calc/units/") {
			continue
		}
		f, err := parser.ParseFile(fset, fn, nil, parser.SkipObjectResolution)
		if err != nil {
			t.Fatal(err)
		}
		ast.Inspect(f, func(n ast.Node) bool {
			lit, ok := n.(*ast.BasicLit)
			if !ok || (lit.Kind != token.STRING && lit.Kind != token.CHAR) {
				return true
			}
			s, err := strconv.Unquote(lit.Value)
			if err != nil {
				return true
			}
			pos := fset.Position(lit.Pos()).String()
			note(s, pos)
			if !strings.Contains(fn, "/") { // a ui/ file
				// A unit name the screens format in, e.g. "uPa.s":
				// what reaches the screen is the formatter's symbol.
				if out, err := units.FormatIn(1.5, s); err == nil {
					note(out, pos+" (formatted)")
				}
			}
			return true
		})
	}
	// The units package's symbols, as formatted for screens.
	for d := units.DimNone; d <= units.DimSoundLevel; d++ {
		note(units.Format(1.5, d), "units.Format, "+units.SIUnit(d))
		note(units.FormatPM(1.5, 0.1, d), "units.FormatPM, "+units.SIUnit(d))
	}
	if len(where) < 10 {
		t.Fatalf("only %d non-ASCII characters found in %d files: is the file list right?", len(where), len(files))
	}
	runes := make([]rune, 0, len(where))
	for r := range where {
		runes = append(runes, r)
	}
	sort.Slice(runes, func(i, j int) bool { return runes[i] < runes[j] })
	for _, r := range runes {
		for _, f := range faces {
			if _, ok := f.face.Face().NominalGlyph(r); !ok {
				t.Errorf("%q (U+%04X), first at %s, has no glyph in %s", r, r, where[r], f.name)
			}
		}
	}
}
