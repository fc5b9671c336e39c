package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"tubewright/ui/store"
)

// TestLibraryFile: a result logged with --log-to appears in `twcalc log`,
// a setup saved in the app's export format runs by name with the same
// numbers as the command typed by hand, and a damaged file is refused and
// left as it is.
func TestLibraryFile(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	file := filepath.Join(dir, "tubewright-export.json")
	lib := store.NewLibrary()
	lib.Setups = append(lib.Setups, store.Setup{Name: "12 bar He-Ar rig", Calculator: "gas",
		Inputs: map[string]string{"gas": "helium:0.7,argon:0.3", "temperature": "300 K", "pressure": "12 bar"}})
	data, err := lib.Marshal()
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(file, data, 0o644); err != nil {
		t.Fatal(err)
	}
	do := func(args ...string) (string, string, int) {
		var o, e bytes.Buffer
		code := run(args, &o, &e)
		return o.String(), e.String(), code
	}
	byName, _, code := do("run", file, "12 bar He-Ar rig", "--json")
	byHand, _, code2 := do("gas", "--gas", "helium:0.7,argon:0.3", "--temperature", "300 K", "--pressure", "12 bar", "--json",
		"--log-to", file, "--note", "first fill")
	if code != exitOK || code2 != exitOK {
		t.Fatalf("exit %d, %d", code, code2)
	}
	var a, b struct {
		Results map[string]json.RawMessage `json:"results"`
	}
	if json.Unmarshal([]byte(byName), &a) != nil || json.Unmarshal([]byte(byHand), &b) != nil || len(a.Results) == 0 {
		t.Fatalf("outputs:\n%s\n%s", byName, byHand)
	}
	for k, v := range b.Results {
		if string(a.Results[k]) != string(v) {
			t.Errorf("%s: by name %s, by hand %s", k, a.Results[k], v)
		}
	}
	list, _, code := do("log", file)
	if code != exitOK || !strings.Contains(list, "Working gas") || !strings.Contains(list, "first fill") {
		t.Fatalf("log list (exit %d):\n%s", code, list)
	}
	one, _, code := do("log", file, "1", "--json")
	if code != exitOK || !strings.Contains(one, `"sound_speed"`) || !strings.Contains(one, "first fill") {
		t.Fatalf("log entry (exit %d):\n%s", code, one)
	}
	setups, _, _ := do("setups", file)
	if !strings.Contains(setups, "12 bar He-Ar rig") {
		t.Fatalf("setups:\n%s", setups)
	}
	damaged := []byte(`{"format":"tubewright-library","version":1,"log":[`)
	if err := os.WriteFile(file, damaged, 0o644); err != nil {
		t.Fatal(err)
	}
	_, msg, code := do("gas", "--gas", "helium", "--temperature", "300 K", "--log-to", file)
	if code != exitUsage || !strings.Contains(msg, "left as it is") {
		t.Fatalf("damaged file: exit %d %q", code, msg)
	}
	if got, _ := os.ReadFile(file); !bytes.Equal(got, damaged) {
		t.Fatal("a damaged export file was changed")
	}
	if _, msg, code := do("run", file+".missing", "x"); code != exitUsage || msg == "" {
		t.Fatalf("missing file: exit %d %q", code, msg)
	}
}
