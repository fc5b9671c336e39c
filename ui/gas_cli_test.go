package ui

import (
	"encoding/json"
	"image"
	"os/exec"
	"path/filepath"
	"testing"

	"tubewright/calc/units"
)

// TestGasScreenAgreesWithTerminal builds the terminal companion, asks it for
// a helium-xenon mixture at 350 K and 10 bar, and checks that the gas screen
// shows every property with the same value (formatted alike). Both call
// gasprops; this catches a screen or a command that passes an input or a
// unit differently.
func TestGasScreenAgreesWithTerminal(t *testing.T) {
	if testing.Short() {
		t.Skip("builds twcalc; skipped with -short")
	}
	gobin, err := exec.LookPath("go")
	if err != nil {
		t.Skip("no go command on PATH to build twcalc with")
	}
	exe := filepath.Join(t.TempDir(), "twcalc")
	if out, err := exec.Command(gobin, "build", "-o", exe, "tubewright/cmd/twcalc").CombinedOutput(); err != nil {
		t.Fatalf("go build twcalc: %v\n%s", err, out)
	}
	out, err := exec.Command(exe, "gas", "--gas", "helium:0.7,xenon:0.3", "--temperature", "350 K", "--pressure", "10 bar", "--json").Output()
	if err != nil {
		t.Fatalf("twcalc gas: %v\n%s", err, out)
	}
	var rep struct {
		Results map[string]struct {
			Value float64 `json:"value"`
		} `json:"results"`
	}
	if err := json.Unmarshal(out, &rep); err != nil {
		t.Fatalf("twcalc gas --json: %v\n%s", err, out)
	}

	env := NewEnv(nil)
	s := newGasScreen(env).(*gasScreen)
	if err := s.picker.SetText("helium:0.7,xenon:0.3"); err != nil {
		t.Fatal(err)
	}
	s.temp.SetText("350 K")
	s.press.SetText("10 bar")
	s.dirty = true
	h := newHarness(t, image.Pt(412, 2400), s.Layout)

	rows := []struct{ label, key, unit string }{
		{"Molar mass", "molar_mass", "g/mol"},
		{"Density", "density", "kg/m3"},
		{"Sound speed", "sound_speed", "m/s"},
		{"Ratio of specific heats γ", "gamma", ""},
		{"Isobaric specific heat cp", "isobaric_specific_heat", "J/(kg.K)"},
		{"Dynamic viscosity", "viscosity", "uPa.s"},
		{"Thermal conductivity", "thermal_conductivity", "mW/(m.K)"},
		{"Thermal diffusivity", "thermal_diffusivity", "mm2/s"},
		{"Kinematic viscosity", "kinematic_viscosity", "mm2/s"},
		{"Prandtl number", "prandtl", ""},
	}
	for _, row := range rows {
		r, ok := rep.Results[row.key]
		if !ok {
			t.Errorf("twcalc gas gave no %s", row.key)
			continue
		}
		want := units.Format(r.Value, units.DimNone)
		if row.unit != "" {
			if want, err = units.FormatIn(r.Value, row.unit); err != nil {
				t.Fatal(err)
			}
		}
		if got, _ := h.shown(row.label); got != want {
			t.Errorf("%s: screen shows %q, twcalc says %q", row.label, got, want)
		}
	}
}
