package linear

import (
	"bytes"
	"encoding/json"
	"os"
	"reflect"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

// stackWith is a closed-closed device whose stack has the pores given as
// the JSON object pores (porosity 0.5, or 0.679 for pins).
func stackWith(pores string) string {
	porosity := "0.5"
	if strings.Contains(pores, "pins") {
		porosity = "0.679"
	}
	return `{` + goodTop + `,"parts":[{"kind":"closed-end"},` +
		`{"kind":"stack","length":"5 cm","diameter":"50 mm","porosity":"` + porosity + `","pores":` + pores + `},` +
		`{"kind":"tube","length":"1 m","diameter":"50 mm"},{"kind":"closed-end"}]}`
}

// TestPoreSizesWholeOrHalf: a whole size (gap, diameter, width, pin
// diameter) and its half (half_gap, radius, ...) give the same pores, to
// 1e-12 relative (a size and its half is a definition, no outside source
// needed: gap = 2 y0, diameter = 2 r).
func TestPoreSizesWholeOrHalf(t *testing.T) {
	t.Parallel()
	cases := []struct{ name, whole, half string }{
		{"plates", `{"shape":"plates","gap":"0.6 mm","thickness":"0.6 mm"}`, `{"shape":"plates","half_gap":"0.3 mm","thickness":"0.6 mm"}`},
		{"round", `{"shape":"circular","diameter":"0.5 mm"}`, `{"shape":"circular","radius":"250 um"}`},
		{"rectangular", `{"shape":"rectangular","width":"0.4 mm","height":"1 mm"}`, `{"shape":"rectangular","half_width":"0.2 mm","half_height":"0.5 mm"}`},
		{"pins", `{"shape":"pins","pin_diameter":"3/64 in","pitch":"2 mm"}`, `{"shape":"pins","pin_radius":"3/128 in","pitch":"2 mm"}`},
	}
	for _, c := range cases {
		w := mustDevice(t, stackWith(c.whole)).Parts[1].Pores
		h := mustDevice(t, stackWith(c.half)).Parts[1].Pores
		for _, pair := range [][2]float64{{w.HalfGap, h.HalfGap}, {w.Radius, h.Radius}, {w.HalfWidth, h.HalfWidth},
			{w.HalfHeight, h.HalfHeight}, {w.PinRadius, h.PinRadius}, {w.Pitch, h.Pitch}, {w.Thickness, h.Thickness}} {
			if !scalar.EqualWithinRel(pair[0], pair[1], 1e-12) {
				t.Errorf("%s: whole gives %+v, half %+v", c.name, w, h)
				break
			}
		}
	}
	// Given twice: one message naming both keys, on the half.
	_, err := ParseDevice(strings.NewReader(stackWith(`{"shape":"plates","gap":"0.6 mm","half_gap":"0.3 mm"}`)))
	if err == nil || !strings.Contains(err.Error(), `"pores.half_gap"`) || !strings.Contains(err.Error(), `"gap"`) {
		t.Errorf("gap and half gap both given: %v", err)
	}
	// A half of another shape is refused like any stray field.
	_, err = ParseDevice(strings.NewReader(stackWith(`{"shape":"plates","gap":"0.6 mm","radius":"0.3 mm"}`)))
	if err == nil || !strings.Contains(err.Error(), `"pores.radius"`) {
		t.Errorf("radius on plates: %v", err)
	}
	// Missing: the whole size is asked for.
	_, err = ParseDevice(strings.NewReader(stackWith(`{"shape":"circular"}`)))
	if err == nil || !strings.Contains(err.Error(), `"pores.diameter"`) {
		t.Errorf("round pores without a size: %v", err)
	}
}

// TestOldDeviceFilesReadTheSame: the examples as saved before whole sizes
// were the rule (testdata/*_half_sizes.json, with "half_gap") read to the
// same device as the examples now, and give the same onset and heat-pump
// results to 1e-12 relative; Upgrade writes them with whole sizes only.
func TestOldDeviceFilesReadTheSame(t *testing.T) {
	t.Parallel()
	for _, name := range ExampleNames() {
		old, err := os.ReadFile("testdata/" + name + "_half_sizes.json")
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Contains(old, []byte(`"half_gap"`)) {
			t.Fatalf("%s: the old file has no half_gap to test", name)
		}
		dOld := mustDevice(t, string(old))
		dNew, err := Example(name)
		if err != nil {
			t.Fatal(err)
		}
		if !reflect.DeepEqual(dOld.Parts, dNew.Parts) {
			t.Errorf("%s: old file reads\n%+v\nnow\n%+v", name, dOld.Parts, dNew.Parts)
		}
		var f DeviceFile
		dec := json.NewDecoder(bytes.NewReader(old))
		dec.DisallowUnknownFields()
		if err := dec.Decode(&f); err != nil {
			t.Fatal(err)
		}
		f.Upgrade()
		out, err := f.Marshal()
		if err != nil {
			t.Fatal(err)
		}
		if bytes.Contains(out, []byte("half_gap")) || !bytes.Contains(out, []byte(`"gap"`)) {
			t.Errorf("%s: upgraded file still has half sizes:\n%s", name, out)
		}
		if dUp := mustDevice(t, string(out)); !reflect.DeepEqual(dUp.Parts, dNew.Parts) {
			t.Errorf("%s: upgraded file reads differently", name)
		}
		if dNew.Driver() != nil {
			a, errA := HeatPump(dOld, nil)
			b, errB := HeatPump(dNew, nil)
			if errA != nil || errB != nil {
				t.Fatalf("%s: %v, %v", name, errA, errB)
			}
			if !scalar.EqualWithinRel(a.ColdTemperature, b.ColdTemperature, 1e-12) {
				t.Errorf("%s: cold end %.15g K from the old file, %.15g K now", name, a.ColdTemperature, b.ColdTemperature)
			}
			continue
		}
		a, errA := Onset(dOld, nil)
		b, errB := Onset(dNew, nil)
		if errA != nil || errB != nil {
			t.Fatalf("%s: %v, %v", name, errA, errB)
		}
		if !scalar.EqualWithinRel(a.HotTemperature, b.HotTemperature, 1e-12) || !scalar.EqualWithinRel(a.Frequency, b.Frequency, 1e-12) {
			t.Errorf("%s: onset %.15g K %.15g Hz from the old file, %.15g K %.15g Hz now", name, a.HotTemperature, a.Frequency, b.HotTemperature, b.Frequency)
		}
	}
}

// TestUpgradeRoundPores: each half key becomes its whole key with the
// number doubled in the unit typed; a half that does not read is kept for
// Validate to report.
func TestUpgradeRoundPores(t *testing.T) {
	t.Parallel()
	p := PoresFile{Shape: "pins", PinRadius: "0.1 mm", Pitch: "0.8 mm", Radius: "3/8 in", HalfGap: "zero", HalfWidth: "1 mm", Width: "3 mm"}
	p.Upgrade()
	want := PoresFile{Shape: "pins", PinDiameter: "0.2 mm", Pitch: "0.8 mm", Diameter: "0.75 in", HalfGap: "zero", HalfWidth: "1 mm", Width: "3 mm"}
	if p != want {
		t.Errorf("Upgrade gave %+v, want %+v", p, want)
	}
}

// TestScaleLength: the number is scaled in its own unit and reads back as
// k times the value.
func TestScaleLength(t *testing.T) {
	t.Parallel()
	cases := []struct {
		in   string
		k    float64
		want string
	}{
		{"0.3 mm", 2, "0.6 mm"},
		{"3/8 in", 2, "0.75 in"},
		{"250 µm", 2, "500 um"},
		{"0,25 mm", 2, "0.5 mm"},
		{"0.1234567 mm", 2, "0.2469134 mm"},
		{"0.0000001 m", 2, "0.0000002 m"},
		{"6 mm", 0.5, "3 mm"},
	}
	for _, c := range cases {
		got, ok := ScaleLength(c.in, c.k)
		if !ok || got != c.want {
			t.Errorf("ScaleLength(%q, %g) = %q, %v; want %q", c.in, c.k, got, ok, c.want)
		}
	}
	for _, bad := range []string{"", "zero", "1 bar", "-1 mm", "0 mm", "1 mm ± 0.1 mm"} {
		if got, ok := ScaleLength(bad, 2); ok {
			t.Errorf("ScaleLength(%q) = %q, accepted", bad, got)
		}
	}
}

// FuzzScaleLength: whatever is typed, a scaled length that is accepted
// reads back as twice the value to 1e-13.
func FuzzScaleLength(f *testing.F) {
	for _, s := range []string{"0.3 mm", "3/8 in", "1 1/2 in", "250 um", "2e-3 m", "0,25 mm", "1 ft"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		out, ok := ScaleLength(s, 2)
		if !ok {
			return
		}
		a, errA := units.Parse(s, units.DimLength)
		b, errB := units.Parse(out, units.DimLength)
		if errA != nil || errB != nil {
			t.Fatalf("%q -> %q: %v, %v", s, out, errA, errB)
		}
		if !scalar.EqualWithinRel(b.Value, 2*a.Value, 1e-13) {
			t.Fatalf("%q (%g m) -> %q (%g m)", s, a.Value, out, b.Value)
		}
	})
}
