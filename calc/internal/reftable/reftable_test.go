package reftable

import (
	"os"
	"path/filepath"
	"testing"
)

// recorder is a testing.TB that records a Fatalf instead of stopping the
// test, so that failures of Read can be checked.
type recorder struct {
	testing.TB
	failed bool
}

func (r *recorder) Helper() {}

func (r *recorder) Fatalf(string, ...any) {
	r.failed = true
	panic(r)
}

func read(t *testing.T, text string, numbers, minRows int) (rows []Row, failed bool) {
	t.Helper()
	path := filepath.Join(t.TempDir(), "table.csv")
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	rec := &recorder{TB: t}
	defer func() {
		if p := recover(); p != nil && p != rec {
			panic(p)
		}
		failed = rec.failed
	}()
	return Read(rec, path, numbers, minRows, "testdata/x.py"), false
}

func TestRead(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name    string
		text    string
		numbers int
		minRows int
		want    []Row
		fail    bool
	}{
		{"comments and header skipped", "# made by x\nname,a,b\nJ0,1,2.5\n\nK1,-3e-2,4\n", 2, 1,
			[]Row{{"J0", []float64{1, 2.5}}, {"K1", []float64{-0.03, 4}}}, false},
		{"wrong column count", "name,a,b\nJ0,1\n", 2, 0, nil, true},
		{"not a number", "name,a\nJ0,one\n", 1, 0, nil, true},
		{"too few rows", "name,a\nJ0,1\n", 1, 2, nil, true},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			t.Parallel()
			rows, failed := read(t, c.text, c.numbers, c.minRows)
			if failed != c.fail {
				t.Fatalf("failed = %v, want %v", failed, c.fail)
			}
			if len(rows) != len(c.want) {
				t.Fatalf("%d rows, want %d", len(rows), len(c.want))
			}
			for i, r := range rows {
				if r.Name != c.want[i].Name || len(r.Values) != len(c.want[i].Values) {
					t.Fatalf("row %d = %+v, want %+v", i, r, c.want[i])
				}
				for j, v := range r.Values {
					if v != c.want[i].Values[j] {
						t.Errorf("row %d value %d = %g, want %g", i, j, v, c.want[i].Values[j])
					}
				}
			}
		})
	}
}

func TestReadMissingFile(t *testing.T) {
	t.Parallel()
	rec := &recorder{TB: t}
	func() {
		defer func() {
			if p := recover(); p != nil && p != rec {
				panic(p)
			}
		}()
		Read(rec, filepath.Join(t.TempDir(), "none.csv"), 1, 0, "testdata/x.py")
	}()
	if !rec.failed {
		t.Error("a missing table did not fail the test")
	}
}
