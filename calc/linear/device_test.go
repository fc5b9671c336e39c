package linear

import (
	"bytes"
	"strings"
	"testing"
)

const goodTop = `"gas":"helium","mean_pressure":"10 bar","ambient_temperature":"300 K"`

// TestParseDeviceErrors: each malformed file gives one clear message that
// names the part and the field (the list; messages are ours).
func TestParseDeviceErrors(t *testing.T) {
	t.Parallel()
	tube := `{"kind":"tube","length":"1 m","diameter":"50 mm"}`
	stack := func(porosity string) string {
		return `{"kind":"stack","length":"5 cm","diameter":"50 mm","porosity":"` + porosity + `","pores":{"shape":"plates","half_gap":"0.3 mm"}}`
	}
	many := strings.Repeat(tube+",", 198)
	cases := []struct {
		name, file string
		want       []string // substrings of the message
	}{
		{"unknown kind", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"pipe","length":"1 m"},{"kind":"closed-end"}]}`,
			[]string{"part 2", `"kind"`, `"pipe"`, "tube"}},
		{"missing field", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"tube","length":"1 m"},{"kind":"closed-end"}]}`,
			[]string{"part 2 (tube)", `"diameter"`, "missing"}},
		{"wrong unit", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"tube","length":"1 kg","diameter":"50 mm"},{"kind":"closed-end"}]}`,
			[]string{"part 2 (tube)", `"length"`, "1 kg"}},
		{"no closed end", `{` + goodTop + `,"parts":[` + tube + `,{"kind":"open-end"}]}`,
			[]string{"part 1 (tube)", "closed-end"}},
		{"zero diameter", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"tube","length":"1 m","diameter":"0 mm"},{"kind":"closed-end"}]}`,
			[]string{"part 2 (tube)", `"diameter"`, "0 mm"}},
		{"porosity above 1", `{` + goodTop + `,"parts":[{"kind":"closed-end"},` + stack("1.4") + `,{"kind":"closed-end"}]}`,
			[]string{"part 2 (stack)", `"porosity"`, "1.4", "(0, 1]"}},
		{"porosity zero", `{` + goodTop + `,"parts":[{"kind":"closed-end"},` + stack("0") + `,{"kind":"closed-end"}]}`,
			[]string{"part 2 (stack)", `"porosity"`, "(0, 1]"}},
		{"200 parts", `{` + goodTop + `,"parts":[{"kind":"closed-end"},` + many + `{"kind":"closed-end"}]}`,
			[]string{`"parts"`, "200 parts", "100"}},
		{"unknown top-level field", `{` + goodTop + `,"colour":"red","parts":[]}`,
			[]string{`"colour"`}},
		{"unknown gas", `{"gas":"unobtainium","mean_pressure":"10 bar","ambient_temperature":"300 K","parts":[]}`,
			[]string{`"gas"`, "unobtainium"}},
		{"field of another kind", `{` + goodTop + `,"parts":[{"kind":"closed-end","length":"1 m"},` + tube + `,{"kind":"closed-end"}]}`,
			[]string{"part 1 (closed-end)", `"length"`, "does not apply"}},
		{"open end after stack", `{` + goodTop + `,"parts":[{"kind":"closed-end"},` + stack("0.7") + `,{"kind":"open-end"}]}`,
			[]string{"part 3 (open-end)", "tube"}},
		{"bad pore shape", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"stack","length":"5 cm","diameter":"5 cm","porosity":"0.7","pores":{"shape":"sponge"}},{"kind":"closed-end"}]}`,
			[]string{"part 2 (stack)", `"pores.shape"`, "sponge"}},
		{"driver in the middle", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"driver","pressure_amplitude":"1 kPa"},` + tube + `,{"kind":"closed-end"}]}`,
			[]string{"part 2 (driver)", "first or last"}},
		{"not JSON", `{"gas": "helium",`, []string{"not a valid device file"}},
		{"trailing data", `{` + goodTop + `,"parts":[{"kind":"closed-end"},` + tube + `,{"kind":"closed-end"}]} {}`, []string{"after the device"}},
		{"string expected", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"tube","length":1,"diameter":"5 cm"},{"kind":"closed-end"}]}`,
			[]string{"length", "string"}},
		{"uncertainty", `{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"tube","length":"1 m ± 1 mm","diameter":"5 cm"},{"kind":"closed-end"}]}`,
			[]string{"part 2 (tube)", "uncertainty"}},
	}
	for _, c := range cases {
		_, err := ParseDevice(strings.NewReader(c.file))
		if err == nil {
			t.Errorf("%s: no error", c.name)
			continue
		}
		msg := err.Error()
		if strings.Contains(msg, "\n") {
			t.Errorf("%s: message has several lines: %q", c.name, msg)
		}
		for _, w := range c.want {
			if !strings.Contains(msg, w) {
				t.Errorf("%s: message %q lacks %q", c.name, msg, w)
			}
		}
	}
}

// TestParseDeviceRoundTrip: the examples parse, marshal and parse again to
// the same device (round trip), in SI units as written (examples/*.json).
func TestParseDeviceRoundTrip(t *testing.T) {
	t.Parallel()
	for _, name := range ExampleNames() {
		b, err := ExampleFile(name)
		if err != nil {
			t.Fatal(err)
		}
		d1, err := ParseDevice(bytes.NewReader(b))
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		var f DeviceFile
		if err := jsonUnmarshal(b, &f); err != nil {
			t.Fatal(err)
		}
		out, err := f.Marshal()
		if err != nil {
			t.Fatal(err)
		}
		d2, err := ParseDevice(bytes.NewReader(out))
		if err != nil {
			t.Fatalf("%s after round trip: %v", name, err)
		}
		if len(d1.Parts) != len(d2.Parts) || d1.MeanPressure != d2.MeanPressure || d1.Length() != d2.Length() {
			t.Errorf("%s: round trip changed the device", name)
		}
	}
	d, _ := Example("engine")
	// 8 bar, 295 K, 1.016 m of parts (examples/engine.json).
	if d.MeanPressure != 8e5 || d.AmbientTemperature != 295 || d.Length() < 1.0159 || d.Length() > 1.0161 {
		t.Errorf("engine example: %g Pa, %g K, %g m", d.MeanPressure, d.AmbientTemperature, d.Length())
	}
	if d.Parts[3].Pores.HalfGap != 0.4e-3 || d.Parts[3].Porosity != 0.76 {
		t.Errorf("engine stack: %+v", d.Parts[3])
	}
	if _, err := Example("nonesuch"); err == nil {
		t.Error("unknown example: no error")
	}
}

// FuzzParseDevice: no input makes ParseDevice panic, and every accepted
// device has ends, parts within limits and finite positive sizes.
func FuzzParseDevice(f *testing.F) {
	for _, name := range ExampleNames() {
		b, _ := ExampleFile(name)
		f.Add(b)
	}
	f.Add([]byte(`{` + goodTop + `,"parts":[{"kind":"closed-end"},{"kind":"tube","length":"1 m","diameter":"5 cm"},{"kind":"open-end","flange":"infinite"}]}`))
	f.Add([]byte(`{"parts":[{"kind":"cavity","volume":"1 L"}]}`))
	f.Fuzz(func(t *testing.T, data []byte) {
		d, err := ParseDevice(bytes.NewReader(data))
		if err != nil {
			if err.Error() == "" {
				t.Fatal("empty error message")
			}
			return
		}
		if n := len(d.Parts); n < 3 || n > MaxParts {
			t.Fatalf("accepted %d parts", n)
		}
		for i, p := range d.Parts {
			if p.Length < 0 || p.Diameter < 0 || p.Porosity < 0 || p.Porosity > 1 {
				t.Fatalf("part %d accepted with %+v", i, p)
			}
		}
		if !(d.MeanPressure > 0) || !(d.AmbientTemperature > 0) {
			t.Fatalf("accepted top level %+v", d)
		}
	})
}
