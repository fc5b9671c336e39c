package linear

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"tubewright/calc/units"
	"tubewright/gasprops"
)

// MaxParts is the largest number of parts a device may have.
const MaxParts = 100

// MaxDeviceBytes bounds the size of a device file that ParseDevice reads.
const MaxDeviceBytes = 1 << 20

// Part kinds, as written in a device file.
const (
	KindClosedEnd = "closed-end" // rigid end: U1 = 0
	KindOpenEnd   = "open-end"   // radiating end of the last tube
	KindTube      = "tube"       // open duct
	KindStack     = "stack"      // porous stack; mean temperature varies along it
	KindExchanger = "exchanger"  // short stack-like part held at one temperature
	KindCavity    = "cavity"     // lumped volume (compliance)
	KindDriver    = "driver"     // piston or loudspeaker at the start (closed) end
)

// Kinds lists the part kinds in the order the editor offers them.
var Kinds = []string{KindClosedEnd, KindDriver, KindTube, KindExchanger, KindStack, KindCavity, KindOpenEnd}

// Pore shapes accepted in a part's "pores" object.
var PoreShapes = []string{"plates", "circular", "rectangular", "pins", "screens", "fibres"}

// DeviceFile is a device as written in a file: every quantity is text with
// its unit, read by calc/units. Field names are the JSON keys.
type DeviceFile struct {
	Name               string     `json:"name,omitempty"`
	Gas                string     `json:"gas"`                       // "helium:0.7,argon:0.3"
	MeanPressure       string     `json:"mean_pressure"`             // "10 bar"
	AmbientTemperature string     `json:"ambient_temperature"`       // "300 K"
	HotTemperature     string     `json:"hot_temperature,omitempty"` // start value or fixed value
	PartsList          []PartFile `json:"parts"`                     // ordered from the start end
	Notes              string     `json:"notes,omitempty"`           // free text
}

// PartFile is one part as written in a file. Which fields apply depends on
// Kind; the rest must be empty.
type PartFile struct {
	Kind                    string     `json:"kind"`
	Label                   string     `json:"label,omitempty"`
	Length                  string     `json:"length,omitempty"`
	Diameter                string     `json:"diameter,omitempty"`
	Temperature             string     `json:"temperature,omitempty"` // "ambient", "hot", "cold" or a value
	Porosity                string     `json:"porosity,omitempty"`
	Pores                   *PoresFile `json:"pores,omitempty"`
	Flange                  string     `json:"flange,omitempty"` // "none" or "infinite"
	Volume                  string     `json:"volume,omitempty"`
	PressureAmplitude       string     `json:"pressure_amplitude,omitempty"`
	VolumeVelocityAmplitude string     `json:"volume_velocity_amplitude,omitempty"`
	Frequency               string     `json:"frequency,omitempty"`
}

// TempRef says where a part's mean temperature comes from.
type TempRef int

// Temperature references of a part.
const (
	TempNone    TempRef = iota // the part has no temperature of its own (ends, stacks)
	TempAmbient                // the device's ambient temperature
	TempHot                    // the hot temperature (solved for in Onset)
	TempCold                   // the cold temperature (solved for in HeatPump)
	TempFixed                  // a value given in the file
)

// Pores is a validated pore description (SI units). Only the fields of
// Shape are meaningful.
type Pores struct {
	Shape                             string
	HalfGap, Thickness                float64 // m
	Radius, HalfWidth, HalfHeight     float64 // m
	PinRadius, Pitch                  float64 // m
	Mesh, WireDiameter, FibreDiameter float64 // 1/m, m, m
}

// Part is one validated part (SI units).
type Part struct {
	Kind        string
	Label       string
	Length      float64 // m
	Diameter    float64 // m (of the whole part, solid included)
	Temp        TempRef
	Temperature float64 // K when Temp == TempFixed
	Porosity    float64 // 1, stacks and exchangers
	Pores       Pores
	Flanged     bool    // open end in an infinite baffle
	Volume      float64 // m³, cavities
	// Driver: exactly one of the amplitudes is > 0.
	PressureAmplitude       float64 // Pa
	VolumeVelocityAmplitude float64 // m³/s
	Frequency               float64 // Hz, drive frequency (0: none given)
}

// Area returns the cross-section of the part, πD²/4 (m²).
func (p Part) Area() float64 { return math.Pi * p.Diameter * p.Diameter / 4 }

// Device is a validated device (SI units).
type Device struct {
	Name               string
	GasText            string
	Gas                gasprops.Mixture
	MeanPressure       float64 // Pa, absolute
	AmbientTemperature float64 // K
	HotTemperature     float64 // K, 0 when not given
	Parts              []Part
}

// FieldError is a problem with one field of a device file. Part is -1 for
// the top level.
type FieldError struct {
	Part  int    // index from 0, or -1
	Kind  string // the part's kind
	Field string // JSON key
	Msg   string // what is wrong, with the value
}

// Error reads "part 3 (stack): field \"porosity\" ..." naming the part and field.
func (e *FieldError) Error() string {
	if e.Part < 0 {
		if e.Field == "" {
			return "device: " + e.Msg
		}
		return fmt.Sprintf("device: field %q %s", e.Field, e.Msg)
	}
	where := fmt.Sprintf("part %d", e.Part+1)
	if e.Kind != "" {
		where += " (" + e.Kind + ")"
	}
	if e.Field == "" {
		return where + ": " + e.Msg
	}
	return fmt.Sprintf("%s: field %q %s", where, e.Field, e.Msg)
}

// ParseDevice reads a device file (JSON, at most MaxDeviceBytes) and
// validates it whole. Unknown fields, unknown kinds, missing fields, wrong
// units and impossible values give one *FieldError naming the part (from 1,
// as people count) and the field.
func ParseDevice(r io.Reader) (*Device, error) {
	data, err := io.ReadAll(io.LimitReader(r, MaxDeviceBytes+1))
	if err != nil {
		return nil, fmt.Errorf("device: reading: %w", err)
	}
	if len(data) > MaxDeviceBytes {
		return nil, &FieldError{Part: -1, Msg: fmt.Sprintf("file is larger than %d bytes", MaxDeviceBytes)}
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	var f DeviceFile
	if err := dec.Decode(&f); err != nil {
		return nil, &FieldError{Part: -1, Msg: "is not a valid device file: " + jsonMessage(err)}
	}
	if dec.More() {
		return nil, &FieldError{Part: -1, Msg: "has data after the device object"}
	}
	return f.Validate()
}

func jsonMessage(err error) string {
	var se *json.SyntaxError
	var te *json.UnmarshalTypeError
	switch {
	case errors.As(err, &se):
		return fmt.Sprintf("JSON syntax error at byte %d: %v", se.Offset, se)
	case errors.As(err, &te):
		return fmt.Sprintf("field %q should be %s, not a JSON %s", te.Field, te.Type.String(), te.Value)
	}
	return strings.TrimPrefix(err.Error(), "json: ")
}

// Marshal writes the device file as indented JSON.
func (f *DeviceFile) Marshal() ([]byte, error) {
	b, err := json.MarshalIndent(f, "", "  ")
	if err != nil {
		return nil, err
	}
	return append(b, '\n'), nil
}

// Validate checks the whole file and returns the device in SI units.
func (f *DeviceFile) Validate() (*Device, error) {
	top := func(field, msg string) error { return &FieldError{Part: -1, Field: field, Msg: msg} }
	d := &Device{Name: f.Name, GasText: f.Gas}
	if strings.TrimSpace(f.Gas) == "" {
		return nil, top("gas", "is missing (e.g. \"helium\" or \"helium:0.7,argon:0.3\")")
	}
	g, err := gasprops.ParseMixture(f.Gas)
	if err != nil {
		return nil, top("gas", fmt.Sprintf("= %q: %v", f.Gas, err))
	}
	d.Gas = g
	q, err := quantity(f.MeanPressure, units.DimPressure, "mean_pressure", -1, "")
	if err != nil {
		return nil, err
	}
	if q <= 0 || q > 50e6 {
		return nil, top("mean_pressure", fmt.Sprintf("= %s must be in (0, 50 MPa]", f.MeanPressure))
	}
	d.MeanPressure = q
	if d.AmbientTemperature, err = temperatureField(f.AmbientTemperature, "ambient_temperature", -1, ""); err != nil {
		return nil, err
	}
	if f.HotTemperature != "" {
		if d.HotTemperature, err = temperatureField(f.HotTemperature, "hot_temperature", -1, ""); err != nil {
			return nil, err
		}
	}
	n := len(f.PartsList)
	switch {
	case n == 0:
		return nil, top("parts", "is missing or empty: a device needs at least a closed end, a tube and an end")
	case n > MaxParts:
		return nil, top("parts", fmt.Sprintf("has %d parts; at most %d are allowed", n, MaxParts))
	}
	d.Parts = make([]Part, n)
	for i := range f.PartsList {
		p, err := f.PartsList[i].validate(i)
		if err != nil {
			return nil, err
		}
		d.Parts[i] = p
	}
	if err := d.checkOrder(); err != nil {
		return nil, err
	}
	return d, nil
}

// checkOrder checks the arrangement of the parts: an end at each side,
// ducts in between, a driver only at the start.
func (d *Device) checkOrder() error {
	n := len(d.Parts)
	first, last := d.Parts[0], d.Parts[n-1]
	if first.Kind != KindClosedEnd && first.Kind != KindDriver {
		return &FieldError{Part: 0, Kind: first.Kind, Field: "kind", Msg: "= " + first.Kind + ": the first part must be a closed-end or a driver (the solve starts at a closed end)"}
	}
	if last.Kind != KindClosedEnd && last.Kind != KindOpenEnd {
		return &FieldError{Part: n - 1, Kind: last.Kind, Field: "kind", Msg: "= " + last.Kind + ": the last part must be a closed-end or an open-end"}
	}
	if n < 3 {
		return &FieldError{Part: -1, Field: "parts", Msg: "needs something between the two ends"}
	}
	for i := 1; i < n-1; i++ {
		p := d.Parts[i]
		switch p.Kind {
		case KindClosedEnd, KindOpenEnd, KindDriver:
			return &FieldError{Part: i, Kind: p.Kind, Field: "kind", Msg: "= " + p.Kind + ": ends and drivers may only be the first or last part"}
		}
	}
	if last.Kind == KindOpenEnd {
		if prev := d.Parts[n-2]; prev.Kind != KindTube {
			return &FieldError{Part: n - 1, Kind: last.Kind, Msg: "an open end must follow a tube"}
		}
	}
	ducts := 0
	for i := 1; i < n-1; i++ {
		if d.Parts[i].Kind != KindCavity {
			ducts++
		}
	}
	if ducts == 0 {
		return &FieldError{Part: -1, Field: "parts", Msg: "needs at least one tube, stack or exchanger"}
	}
	return nil
}

// Driver returns the driver part, or nil.
func (d *Device) Driver() *Part {
	if d.Parts[0].Kind == KindDriver {
		return &d.Parts[0]
	}
	return nil
}

// Length returns the total length of the device's ducts (m).
func (d *Device) Length() float64 {
	var l float64
	for _, p := range d.Parts {
		l += p.Length
	}
	return l
}

func (pf *PartFile) validate(i int) (Part, error) {
	p := Part{Kind: pf.Kind, Label: pf.Label}
	used, err := pf.validateKind(i, &p)
	if err != nil {
		return p, err
	}
	return p, pf.checkUnused(i, used)
}

// fieldError is a FieldError about field of this part (index i).
func (pf *PartFile) fieldError(i int, field, msg string) error {
	return &FieldError{Part: i, Kind: pf.Kind, Field: field, Msg: msg}
}

// validateKind reads the fields of pf's kind into p and returns the names
// of the fields that apply to it.
func (pf *PartFile) validateKind(i int, p *Part) (used map[string]bool, err error) {
	used = map[string]bool{}
	need := func(fields ...string) {
		for _, f := range fields {
			used[f] = true
		}
	}
	switch pf.Kind {
	case "":
		return used, pf.fieldError(i, "kind", fmt.Sprintf("is missing; use one of %s", strings.Join(Kinds, ", ")))
	case KindClosedEnd:
	case KindOpenEnd:
		need("flange")
		switch pf.Flange {
		case "", "none":
		case "infinite":
			p.Flanged = true
		default:
			return used, pf.fieldError(i, "flange", fmt.Sprintf("= %q must be \"none\" or \"infinite\"", pf.Flange))
		}
	case KindTube:
		need("length", "diameter", "temperature")
		err = pf.validateDuct(i, p)
		if err == nil {
			p.Temp, p.Temperature, err = tempRef(pf.Temperature, TempAmbient, i, pf.Kind)
		}
	case KindStack, KindExchanger:
		need("length", "diameter", "porosity", "pores")
		if pf.Kind == KindExchanger {
			need("temperature")
		}
		err = pf.validatePorous(i, p)
	case KindCavity:
		need("volume", "temperature")
		if p.Volume, err = positive(pf.Volume, units.DimVolume, "volume", i, pf.Kind, 1e-12, 100); err != nil {
			return used, err
		}
		p.Temp, p.Temperature, err = tempRef(pf.Temperature, TempAmbient, i, pf.Kind)
	case KindDriver:
		need("pressure_amplitude", "volume_velocity_amplitude", "frequency", "diameter")
		err = pf.validateDriver(i, p)
	default:
		return used, pf.fieldError(i, "kind", fmt.Sprintf("= %q is not a part kind; use one of %s", pf.Kind, strings.Join(Kinds, ", ")))
	}
	return used, err
}

// validateDuct reads the length and diameter of a tube, stack or
// exchanger.
func (pf *PartFile) validateDuct(i int, p *Part) error {
	var err error
	if p.Length, err = positive(pf.Length, units.DimLength, "length", i, pf.Kind, 1e-6, 100); err != nil {
		return err
	}
	p.Diameter, err = positive(pf.Diameter, units.DimLength, "diameter", i, pf.Kind, 1e-5, 10)
	return err
}

// validatePorous reads a stack or exchanger: its duct, an exchanger's
// temperature, the porosity and the pores.
func (pf *PartFile) validatePorous(i int, p *Part) error {
	err := pf.validateDuct(i, p)
	if pf.Kind == KindExchanger {
		if err == nil && pf.Temperature == "" {
			err = pf.fieldError(i, "temperature", "is missing: an exchanger is held at \"ambient\", \"hot\", \"cold\" or a value")
		}
		if err == nil {
			p.Temp, p.Temperature, err = tempRef(pf.Temperature, TempAmbient, i, pf.Kind)
		}
	}
	if err != nil {
		return err
	}
	if pf.Porosity == "" {
		return pf.fieldError(i, "porosity", "is missing (the open fraction of the cross-section, e.g. \"0.7\")")
	}
	if p.Porosity, err = quantity(pf.Porosity, units.DimNone, "porosity", i, pf.Kind); err != nil {
		return err
	}
	if !(p.Porosity > 0 && p.Porosity <= 1) {
		return pf.fieldError(i, "porosity", fmt.Sprintf("= %s must be in (0, 1]", pf.Porosity))
	}
	if pf.Pores == nil {
		return pf.fieldError(i, "pores", fmt.Sprintf("is missing (e.g. {\"shape\": \"plates\", \"gap\": \"0.6 mm\"}; shapes: %s)", strings.Join(PoreShapes, ", ")))
	}
	if p.Pores, err = pf.Pores.validate(i, pf.Kind); err != nil {
		return err
	}
	return checkPorosity(i, pf.Kind, p.Porosity, p.Pores)
}

// validateDriver reads a driver: exactly one amplitude, and the frequency
// when given.
func (pf *PartFile) validateDriver(i int, p *Part) error {
	var err error
	switch {
	case pf.PressureAmplitude != "" && pf.VolumeVelocityAmplitude != "":
		return pf.fieldError(i, "pressure_amplitude", "and \"volume_velocity_amplitude\" are both given; give one")
	case pf.PressureAmplitude != "":
		p.PressureAmplitude, err = positive(pf.PressureAmplitude, units.DimPressure, "pressure_amplitude", i, pf.Kind, 1e-6, 10e6)
	case pf.VolumeVelocityAmplitude != "":
		p.VolumeVelocityAmplitude, err = positive(pf.VolumeVelocityAmplitude, units.DimVolumeFlow, "volume_velocity_amplitude", i, pf.Kind, 1e-15, 10)
	default:
		return pf.fieldError(i, "pressure_amplitude", "is missing: a driver needs \"pressure_amplitude\" or \"volume_velocity_amplitude\"")
	}
	if err == nil && pf.Frequency != "" {
		p.Frequency, err = positive(pf.Frequency, units.DimFrequency, "frequency", i, pf.Kind, 0.1, 1e6)
	}
	return err
}

// checkUnused refuses fields that do not apply to the part's kind (used
// names those that do), rather than ignoring them.
func (pf *PartFile) checkUnused(i int, used map[string]bool) error {
	for _, kv := range []struct{ key, val string }{
		{"length", pf.Length}, {"diameter", pf.Diameter}, {"temperature", pf.Temperature},
		{"porosity", pf.Porosity}, {"flange", pf.Flange}, {"volume", pf.Volume},
		{"pressure_amplitude", pf.PressureAmplitude}, {"volume_velocity_amplitude", pf.VolumeVelocityAmplitude},
		{"frequency", pf.Frequency},
	} {
		if kv.val != "" && !used[kv.key] {
			return pf.fieldError(i, kv.key, fmt.Sprintf("does not apply to a %s", pf.Kind))
		}
	}
	if pf.Pores != nil && !used["pores"] {
		return pf.fieldError(i, "pores", fmt.Sprintf("does not apply to a %s", pf.Kind))
	}
	return nil
}

// quantity parses text of dimension dim for a field; a missing or
// unparsable value is a FieldError.
func quantity(text string, dim units.Dimension, field string, part int, kind string) (float64, error) {
	if strings.TrimSpace(text) == "" {
		return 0, &FieldError{Part: part, Kind: kind, Field: field, Msg: fmt.Sprintf("is missing (a %s with its unit, e.g. %s)", dimWord(dim), dimExample(dim))}
	}
	q, err := units.Parse(text, dim)
	if err != nil {
		return 0, &FieldError{Part: part, Kind: kind, Field: field, Msg: fmt.Sprintf("= %q: %v", text, err)}
	}
	if q.Uncertainty != 0 {
		return 0, &FieldError{Part: part, Kind: kind, Field: field, Msg: fmt.Sprintf("= %q: an uncertainty is not used here; give the value alone", text)}
	}
	if math.IsNaN(q.Value) || math.IsInf(q.Value, 0) {
		return 0, &FieldError{Part: part, Kind: kind, Field: field, Msg: fmt.Sprintf("= %q is not a finite number", text)}
	}
	return q.Value, nil
}

func positive(text string, dim units.Dimension, field string, part int, kind string, lo, hi float64) (float64, error) {
	v, err := quantity(text, dim, field, part, kind)
	if err != nil {
		return 0, err
	}
	if !(v >= lo && v <= hi) {
		u := units.SIUnit(dim)
		return 0, &FieldError{Part: part, Kind: kind, Field: field, Msg: fmt.Sprintf("= %s must be between %s and %s %s", text, units.Number(lo, 6), units.Number(hi, 6), u)}
	}
	return v, nil
}

func temperatureField(text, field string, part int, kind string) (float64, error) {
	v, err := quantity(text, units.DimTemperature, field, part, kind)
	if err != nil {
		return 0, err
	}
	if !(v >= 2 && v <= 3000) {
		return 0, &FieldError{Part: part, Kind: kind, Field: field, Msg: fmt.Sprintf("= %s must be between 2 and 3000 K", text)}
	}
	return v, nil
}

func tempRef(text string, def TempRef, part int, kind string) (TempRef, float64, error) {
	switch strings.ToLower(strings.TrimSpace(text)) {
	case "":
		return def, 0, nil
	case "ambient":
		return TempAmbient, 0, nil
	case "hot":
		return TempHot, 0, nil
	case "cold":
		return TempCold, 0, nil
	}
	v, err := temperatureField(text, "temperature", part, kind)
	if err != nil {
		var fe *FieldError
		if errors.As(err, &fe) {
			fe.Msg += " (or \"ambient\", \"hot\", \"cold\")"
		}
		return 0, 0, err
	}
	return TempFixed, v, nil
}

func dimWord(d units.Dimension) string {
	switch d {
	case units.DimLength:
		return "length"
	case units.DimPressure:
		return "pressure"
	case units.DimTemperature:
		return "temperature"
	case units.DimVolume:
		return "volume"
	case units.DimFrequency:
		return "frequency"
	case units.DimVolumeFlow:
		return "volume velocity"
	case units.DimPerLength:
		return "count per length"
	}
	return "number"
}

func dimExample(d units.Dimension) string {
	switch d {
	case units.DimLength:
		return "\"25 mm\""
	case units.DimPressure:
		return "\"10 bar\""
	case units.DimTemperature:
		return "\"300 K\""
	case units.DimVolume:
		return "\"0.5 L\""
	case units.DimFrequency:
		return "\"100 Hz\""
	case units.DimVolumeFlow:
		return "\"1 L/s\""
	case units.DimPerLength:
		return "\"30 /in\""
	}
	return "\"0.7\""
}
