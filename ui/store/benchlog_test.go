package store

import (
	"bytes"
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

func samplePass(when time.Time) Pass {
	return Pass{
		Time:  when,
		Title: "Safety pass before pressurising",
		Rig:   "bench rig 2",
		Items: []Item{
			{ID: "rating", Title: "Vessel rating and markings known", Done: true, Note: "nameplate 40 bar at 200 degC"},
			{ID: "stress", Title: "Wall stress at the hot-end temperature", Done: true,
				Numbers:  []Number{{Name: "hoop stress", Value: 25.33e6, Unit: "Pa", Shown: "25.33 MPa"}},
				Cautions: []string{"Estimate for planning only."}},
			{ID: "relief", Title: "Relief device set at or below the MAWP", Done: false},
		},
		Cautions: []string{"These are estimates for planning."},
	}
}

func TestLoadMissingIsEmpty(t *testing.T) {
	t.Parallel()
	l, err := Load(filepath.Join(t.TempDir(), "benchlog.json"))
	if err != nil {
		t.Fatal(err)
	}
	if len(l.Passes) != 0 || l.Version != LogVersion || l.Format != LogFormat {
		t.Errorf("got %+v, want an empty log of version %d", l, LogVersion)
	}
}

func TestAppendLoadRoundTrip(t *testing.T) {
	t.Parallel()
	path := filepath.Join(t.TempDir(), "sub", "benchlog.json")
	when := time.Date(2026, 12, 1, 22, 30, 0, 0, time.FixedZone("CET", 3600))
	p1 := samplePass(when)
	p2 := samplePass(when.Add(time.Hour))
	p2.Items[2].Done = true
	for _, p := range []Pass{p1, p2} {
		if err := Append(path, p); err != nil {
			t.Fatal(err)
		}
	}
	l, err := Load(path)
	if err != nil {
		t.Fatal(err)
	}
	if len(l.Passes) != 2 {
		t.Fatalf("%d passes, want 2", len(l.Passes))
	}
	got := l.Passes[0]
	if !got.Time.Equal(when) || got.Rig != p1.Rig || len(got.Items) != 3 {
		t.Errorf("pass 1 read back as %+v", got)
	}
	if n := got.Items[1].Numbers[0]; n.Value != 25.33e6 || n.Unit != "Pa" || n.Shown != "25.33 MPa" {
		t.Errorf("number read back as %+v", n)
	}
	if got.Items[2].Done || !l.Passes[1].Items[2].Done {
		t.Error("ticks not kept")
	}
	if st, err := os.Stat(path); err != nil || st.Mode().Perm() != 0o600 {
		t.Errorf("log file mode %v (err %v), want 0600", st.Mode().Perm(), err)
	}
}

func TestDamagedFileIsReportedAndKept(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	path := filepath.Join(dir, "benchlog.json")
	if err := Append(path, samplePass(time.Date(2026, 12, 1, 10, 0, 0, 0, time.UTC))); err != nil {
		t.Fatal(err)
	}
	full, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		name string
		data []byte
		want string // part of the error text
	}{
		{"truncated", full[:len(full)/2], "unexpected EOF"},
		{"empty", nil, "empty"},
		{"garbage", []byte("\x00\x01 not json"), "invalid character"},
		{"trailing", append(append([]byte{}, full...), []byte("{}")...), "after the log"},
		{"wrong format", []byte(`{"format":"other","version":1,"passes":[]}`), "format"},
		{"no version", []byte(`{"format":"tubewright-benchlog","passes":[]}`), "version 0"},
		{"newer", []byte(`{"format":"tubewright-benchlog","version":7,"passes":[]}`), "newer version"},
		{"unknown field", []byte(`{"format":"tubewright-benchlog","version":1,"passes":[],"x":1}`), "unknown field"},
		{"no cautions", []byte(`{"format":"tubewright-benchlog","version":1,"passes":[{"time":"2026-12-01T10:00:00Z","title":"t","items":[],"cautions":[]}]}`), "no cautions"},
		{"number without unit", []byte(`{"format":"tubewright-benchlog","version":1,"passes":[{"time":"2026-12-01T10:00:00Z","title":"t","items":[{"id":"a","title":"a","done":true,"numbers":[{"name":"p","value":1,"unit":""}]}],"cautions":["c"]}]}`), "no unit"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			p := filepath.Join(t.TempDir(), "benchlog.json")
			if err := os.WriteFile(p, c.data, 0o600); err != nil {
				t.Fatal(err)
			}
			_, err := Load(p)
			var de *DamagedError
			if !errors.As(err, &de) {
				t.Fatalf("Load: got %v, want a *DamagedError", err)
			}
			if !strings.Contains(err.Error(), c.want) || !strings.Contains(err.Error(), p) {
				t.Errorf("error %q should name the file and contain %q", err, c.want)
			}
			// Appending must not overwrite the damaged file.
			if err := Append(p, samplePass(time.Now())); !errors.As(err, &de) {
				t.Errorf("Append on a damaged file: got %v, want a *DamagedError", err)
			}
			after, _ := os.ReadFile(p)
			if !bytes.Equal(after, c.data) {
				t.Error("the damaged file was changed")
			}
			// Setting it aside keeps the bytes and frees the name.
			now := time.Date(2026, 12, 1, 23, 0, 0, 0, time.UTC)
			aside, err := SetAside(p, now)
			if err != nil {
				t.Fatal(err)
			}
			if !strings.HasSuffix(aside, ".damaged-20261201T230000") {
				t.Errorf("set aside as %q", aside)
			}
			kept, _ := os.ReadFile(aside)
			if !bytes.Equal(kept, c.data) {
				t.Error("the set-aside file lost bytes")
			}
			if err := Append(p, samplePass(now)); err != nil {
				t.Errorf("Append after SetAside: %v", err)
			}
		})
	}
}

func TestSetAsideCounter(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	path := filepath.Join(dir, "benchlog.json")
	now := time.Date(2026, 12, 1, 23, 0, 0, 0, time.UTC)
	var names []string
	for i := 0; i < 3; i++ {
		if err := os.WriteFile(path, []byte("bad"), 0o600); err != nil {
			t.Fatal(err)
		}
		n, err := SetAside(path, now)
		if err != nil {
			t.Fatal(err)
		}
		names = append(names, filepath.Base(n))
	}
	want := []string{"benchlog.json.damaged-20261201T230000", "benchlog.json.damaged-20261201T230000-2", "benchlog.json.damaged-20261201T230000-3"}
	for i := range want {
		if names[i] != want[i] {
			t.Errorf("name %d = %q, want %q", i, names[i], want[i])
		}
	}
}

func TestAppendRefusesInvalidPass(t *testing.T) {
	t.Parallel()
	path := filepath.Join(t.TempDir(), "benchlog.json")
	cases := []struct {
		name   string
		modify func(*Pass)
	}{
		{"no time", func(p *Pass) { p.Time = time.Time{} }},
		{"no cautions", func(p *Pass) { p.Cautions = nil }},
		{"NaN number", func(p *Pass) { p.Items[1].Numbers[0].Value = math.NaN() }},
		{"Inf number", func(p *Pass) { p.Items[1].Numbers[0].Value = math.Inf(1) }},
		{"empty id", func(p *Pass) { p.Items[0].ID = " " }},
	}
	for _, c := range cases {
		p := samplePass(time.Now())
		c.modify(&p)
		if err := Append(path, p); err == nil {
			t.Errorf("%s: Append accepted an invalid pass", c.name)
		}
		if _, err := os.Stat(path); err == nil {
			t.Errorf("%s: a file was written", c.name)
		}
	}
}

func TestPassText(t *testing.T) {
	t.Parallel()
	p := samplePass(time.Date(2026, 12, 1, 22, 30, 5, 0, time.UTC))
	p.Items[0].Note = "two\nlines"
	txt := p.Text()
	for _, want := range []string{
		"Safety pass before pressurising\n",
		"Saved: 2026-12-01 22:30:05 +00:00\n",
		"Rig: bench rig 2\n",
		"Items ticked: 2 of 3\n",
		" 1. [x] Vessel rating and markings known\n",
		"      Note: two lines\n",
		"      hoop stress: 25.33 MPa\n",
		"      CAUTION: Estimate for planning only.\n",
		" 3. [ ] Relief device set at or below the MAWP\n",
		"CAUTIONS\n- These are estimates for planning.\n",
	} {
		if !strings.Contains(txt, want) {
			t.Errorf("text export lacks %q:\n%s", want, txt)
		}
	}
	// A number without its display text falls back to its value in a
	// readable unit, without an exponent.
	p.Items[1].Numbers[0].Shown = ""
	if txt := p.Text(); !strings.Contains(txt, "hoop stress: 25.33 MPa\n") {
		t.Errorf("fallback number text missing:\n%s", txt)
	}
}

func FuzzParse(f *testing.F) {
	good, err := (&Log{Format: LogFormat, Version: LogVersion, Passes: []Pass{samplePass(time.Date(2026, 12, 1, 0, 0, 0, 0, time.UTC))}}).Marshal()
	if err != nil {
		f.Fatal(err)
	}
	f.Add(good)
	f.Add(good[:len(good)/3])
	f.Add([]byte(`{"format":"tubewright-benchlog","version":1,"passes":[]}`))
	f.Add([]byte(`{"format":"tubewright-benchlog","version":1,"passes":null}`))
	f.Add([]byte(``))
	f.Fuzz(func(t *testing.T, data []byte) {
		l, err := Parse(data)
		if err != nil {
			return
		}
		// Whatever parses must write back and parse to the same passes.
		out, err := l.Marshal()
		if err != nil {
			t.Fatalf("parsed log does not marshal: %v", err)
		}
		l2, err := Parse(out)
		if err != nil {
			t.Fatalf("re-parse failed: %v\n%s", err, out)
		}
		if len(l2.Passes) != len(l.Passes) {
			t.Fatalf("round trip changed the pass count %d -> %d", len(l.Passes), len(l2.Passes))
		}
		for i := range l.Passes {
			if l.Passes[i].Text() != l2.Passes[i].Text() {
				t.Fatalf("round trip changed pass %d", i)
			}
		}
	})
}
