package sheet

import (
	"errors"
	"fmt"
	"os"
	"strings"

	"tubewright/calc/linear"
	"tubewright/calc/units"
)

// The engine-onset and heat-pump calculators work on a device: an ordered
// list of parts (calc/linear's device file). It reaches the Run in one of
// two ways, so that both front ends are built from one description:
//
//   - the input "device" (Kind Text, positional on the terminal) holds
//     either the path of a device file or the device document itself (text
//     that starts with "{"). The terminal passes the FILE it was given; the
//     app's device editor passes the document it shows.
//   - the input "example" names a built-in example device instead (the
//     terminal's --example; the app's chips that load an example into the
//     editor).
//
// The gas, mean pressure and ambient temperature belong to the device (a
// saved device carries them). Quantities inside the device take no ±: the
// device file's own check refuses one, with the same message on both
// sides, naming the part and field.

// Keys of the device inputs, shared by the onset and heat-pump sheets.
const (
	keyDevice  = "device"
	keyExample = "example"
	keyProfile = "profile"
	noExample  = "none"
)

// deviceFileHelp describes the device file (what Save device writes too);
// the About of both device sheets includes it, for the terminal help and
// the screen.
const deviceFileHelp = `The device file is JSON: "gas", "mean_pressure", "ambient_temperature" and an ordered list of "parts" from the start (closed) end, each with a "kind": closed-end, driver, tube, exchanger, stack, cavity, open-end; quantities are text with units, e.g. {"kind": "tube", "length": "1 m", "diameter": "5 cm", "temperature": "ambient"}. A stack or exchanger has "porosity" and "pores" ({"shape": "plates", "gap": "0.6 mm"}; round pores and pins take "diameter" and "pin_diameter"; older files' "half_gap", "radius" and "pin_radius" are still read); an exchanger's "temperature" is "ambient", "hot", "cold" or a value.`

// deviceInput is the device: a file path or the device document.
func deviceInput() Input {
	return Input{Key: keyDevice, Label: "Device", Kind: Text, Optional: true, Positional: true,
		Hint: "a device file (JSON: gas, fill and an ordered list of parts; see below), or give --example NAME instead"}
}

// exampleInput names a built-in example device (invented demo data).
func exampleInput() Input {
	in := Input{Key: keyExample, Label: "Start from", Kind: Pick, Default: noExample,
		Hint:    "a built-in example device instead of a file (invented demo data): " + strings.Join(linear.ExampleNames(), ", "),
		Choices: []Choice{{Key: noExample, Words: "The parts below", Value: ""}}}
	for _, name := range linear.ExampleNames() {
		in.Choices = append(in.Choices, Choice{Key: name, Words: "The example " + exampleWords(name), Value: name})
	}
	return in
}

// exampleWords names a built-in example for people.
func exampleWords(name string) string {
	if name == "heatpump" {
		return "heat pump"
	}
	return name
}

// profileInput asks for the profile along the device as a table.
func profileInput() Input {
	return Input{Key: keyProfile, Label: "Profile along the device as a table", Kind: Switch,
		Hint: "give the profile along the device as a table (x, |p1|, |U1|, phase, Tm, acoustic power)"}
}

// loadDevice returns the device of a sheet with the device inputs. A
// problem is a *FieldError about the input that named the device.
func loadDevice(v *Values) (*linear.Device, error) {
	text := strings.TrimSpace(v.Text(keyDevice))
	example, _ := v.Pick(keyExample).(string)
	switch {
	case text != "" && example != "":
		return nil, v.Blame(errors.New("give a device file or an example, not both"), keyExample)
	case example != "":
		d, err := linear.Example(example)
		return d, v.Blame(err, keyExample)
	case strings.HasPrefix(text, "{"):
		d, err := linear.ParseDevice(strings.NewReader(text))
		return d, v.Blame(err, keyDevice)
	case text != "":
		f, err := os.Open(text)
		if err != nil {
			return nil, v.Blame(err, keyDevice)
		}
		defer f.Close()
		d, err := linear.ParseDevice(f)
		return d, v.Blame(err, keyDevice)
	}
	in := v.Get(keyDevice).In
	return nil, &FieldError{Key: keyDevice, Label: in.Label, Err: fmt.Errorf("%w: name a device file or an example", ErrRequired)}
}

// deviceSource is the key of the input the device came from.
func deviceSource(v *Values) string {
	if ex, _ := v.Pick(keyExample).(string); ex != "" {
		return keyExample
	}
	return keyDevice
}

// blameDevice returns a solver's complaint about the device (a
// *linear.FieldError naming a part and field) as an error about the input
// the device came from; other errors come back unchanged.
func blameDevice(v *Values, err error) error {
	var fe *linear.FieldError
	if errors.As(err, &fe) {
		return v.Blame(err, deviceSource(v))
	}
	return err
}

// deriveDevice echoes the device's name, gas and fill with the inputs.
func deriveDevice(r *Result, d *linear.Device) {
	if d.Name != "" {
		r.DeriveWords("device_name", "Device name", d.Name)
	}
	r.DeriveWords("gas", "Working gas", d.Gas.String())
	r.Derive("mean_pressure", "Mean pressure", d.MeanPressure, units.DimPressure)
	r.Derive("ambient_temperature", "Ambient temperature", d.AmbientTemperature, units.DimTemperature)
}

// profileTable is the profile along the device as a table.
func profileTable(p *linear.Profile) *Table {
	t := &Table{Header: []string{"x_m", "pressure_amplitude_Pa", "volume_velocity_amplitude_m3_per_s",
		"phase_p_minus_U_deg", "mean_temperature_K", "acoustic_power_W"}}
	for i := range p.X {
		t.Rows = append(t.Rows, []float64{p.X[i], p.PressureAmp[i], p.FlowAmp[i], p.Phase[i], p.Temperature[i], p.AcousticPower[i]})
	}
	return t
}

// shortStackRows adds calc/linear's quick short-stack estimates after the
// solved results, each with what it means and when it holds, and the
// estimate's warnings. With pump, the zero-load span of a heat pump comes
// first and Γ is the solved span over the critical one; otherwise (an
// engine at onset) the critical temperature difference, with Γ the onset
// difference over it.
func shortStackRows(r *Result, ss *linear.ShortStackResult, pump bool) {
	if ss == nil {
		return
	}
	r.Add("short_stack_mean_temperature", "Short-stack estimates made at", ss.MeanTemperature, units.DimTemperature).Note =
		"the stack's mean gas temperature"
	if pump {
		row := r.Add("short_stack_zero_load_span", "Short-stack zero-load span (quick estimate)", ss.ZeroLoadSpan, units.DimTemperatureDifference)
		row.Note = "with no load and no heat conducted back, gas at the stack's mean temperature, " +
			units.Format(ss.MeanTemperature, units.DimTemperature) + "; compare with the solved span"
		if ss.ZeroLoadRatio <= 0 {
			row.Note = "none: viscous losses outweigh the pumping in this estimate"
		}
		r.Add("short_stack_gradient_ratio", "Short-stack Γ (solved span / critical)", ss.GradientRatio, units.DimNone).Note =
			"below 1 the stack pumps heat; at 1, the critical gradient, pumping stops"
	} else {
		r.Add("short_stack_critical_difference", "Short-stack critical ΔT (quick estimate)", ss.CriticalDifference, units.DimTemperatureDifference).Note =
			"gas at the stack's mean temperature, " + units.Format(ss.MeanTemperature, units.DimTemperature) + ", stack centre from the closed end"
		r.Add("short_stack_gradient_ratio", "Short-stack Γ (onset ΔT / critical)", ss.GradientRatio, units.DimNone).Note =
			"above 1 the stack can drive sound; losses elsewhere push onset higher"
	}
	r.Add("short_stack_k_dx", "k·Δx of the stack", ss.KDeltaX, units.DimNone).Note =
		"the short-stack estimate needs k·Δx much less than 1; rough above 0.3"
	r.Add("short_stack_depth_ratio", "δκ / y0 of the stack", ss.DepthRatio, units.DimNone).Note =
		"its boundary-layer form needs δκ much smaller than y0; rough above 0.5"
	for _, w := range ss.Warnings {
		r.Warn("Short-stack estimate: " + w)
	}
}

// iterationsRow adds the number of Newton iterations of a solve to the
// result's details (a diagnostic, not an answer).
func iterationsRow(r *Result, n int) {
	r.Detail("iterations", "Newton iterations", n, fmt.Sprint(n))
}

// withAlt formats v (SI) and, in brackets, in another unit:
// "710.7 K (437.6 degC)".
func withAlt(v float64, dim units.Dimension, unit string) string {
	s := units.Format(v, dim)
	if o, err := units.FormatIn(v, unit); err == nil && o != s {
		s += " (" + o + ")"
	}
	return s
}
