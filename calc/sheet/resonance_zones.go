package sheet

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
)

// MaxZoneModes is the most modes of a zoned tube listed at once: the
// limit of resonator.ZonedModes (checked by this package's tests).
const MaxZoneModes = 20

// ZonePart names one value of a zone in a ZoneError.
type ZonePart int

// The parts of a zone. ZoneWhole is the zone as a whole (its text does
// not have three values, or there are too many zones). ZoneSize is the
// zone's inside size, a diameter or a radius (see ZoneSizeText).
const (
	ZoneWhole ZonePart = iota
	ZoneLength
	ZoneSize
	ZoneTemperature
)

// String returns "length", "size", "temperature" or "".
func (p ZonePart) String() string {
	switch p {
	case ZoneLength:
		return "length"
	case ZoneSize:
		return "size"
	case ZoneTemperature:
		return "temperature"
	}
	return ""
}

// ZoneError is an error about one zone of the "zones" input: which zone
// (from 0; -1 for the list as a whole) and which of its values. It is the
// reason of the *FieldError with Key "zones", so that a screen with a
// field per zone can mark that field by comparing Zone and Part.
type ZoneError struct {
	Zone int
	Part ZonePart
	Err  error
}

// Error reads "zone 2 temperature: reason".
func (e *ZoneError) Error() string {
	if e.Zone < 0 {
		return e.Err.Error()
	}
	name := fmt.Sprintf("zone %d", e.Zone+1)
	if e.Part != ZoneWhole {
		name += " " + e.Part.String()
	}
	return name + ": " + e.Err.Error()
}

// Unwrap returns the reason.
func (e *ZoneError) Unwrap() error { return e.Err }

// zoneDims are the dimensions of a zone's three values, in order.
var zoneDims = [3]units.Dimension{units.DimLength, units.DimLength, units.DimTemperature}

// SplitZones splits the text of the "zones" input, "LENGTH,SIZE,
// TEMPERATURE;..." into the three texts of each zone, trimmed, without
// reading them. A zone without three values is a *ZoneError.
func SplitZones(text string) ([][3]string, error) {
	parts := strings.Split(text, ";")
	if len(parts) > resonator.MaxZones {
		return nil, &ZoneError{Zone: -1, Err: fmt.Errorf("%d zones: at most %d", len(parts), resonator.MaxZones)}
	}
	out := make([][3]string, len(parts))
	for i, p := range parts {
		f := strings.Split(p, ",")
		if len(f) != 3 {
			return nil, &ZoneError{Zone: i, Err: fmt.Errorf("%s: write LENGTH,SIZE,TEMPERATURE, e.g. 100 mm, d 24 mm, 600 K", quote(strings.TrimSpace(p)))}
		}
		for j := range f {
			out[i][j] = strings.TrimSpace(f[j])
		}
	}
	return out, nil
}

// JoinZones writes zone texts as the "zones" input reads them, the
// inverse of SplitZones.
func JoinZones(zones [][3]string) string {
	parts := make([]string, len(zones))
	for i, z := range zones {
		parts[i] = strings.Join(z[:], ", ")
	}
	return strings.Join(parts, "; ")
}

// The forms of a zone's size. A zone's size is its inside diameter,
// written "d 24 mm" (or "diameter 24 mm", "Ø 24 mm"), or its radius,
// "r 12 mm" (or "radius 12 mm"). A size with no word is a radius: the
// zones text of older versions gave the radius bare, and such text keeps
// its meaning (documented in the input's hint).
const (
	ZoneDiameterWord = "d"
	ZoneRadiusWord   = "r"
)

// zoneSizeWords are the words that may open a zone's size, longest first
// so that "diameter" is not read as "d" and "iameter".
var zoneSizeWords = []struct {
	word   string
	radius bool
}{{"diameter", false}, {"radius", true}, {"dia", false}, {"Ø", false}, {"ø", false}, {"d", false}, {"r", true}}

// ZoneSizeText splits the size text of a zone into the length typed and
// whether it is a radius: "d 24 mm" gives "24 mm", false; "r 12 mm" and
// the bare "12 mm" of older text give "12 mm", true. The word may be
// followed by a space, "=" or ":" or nothing ("d24mm").
func ZoneSizeText(s string) (length string, radius bool) {
	t := strings.TrimSpace(s)
	for _, w := range zoneSizeWords {
		if len(t) > len(w.word) && strings.EqualFold(t[:len(w.word)], w.word) {
			rest := strings.TrimLeft(t[len(w.word):], " =:")
			if rest != "" && (rest[0] == '.' || rest[0] == '+' || rest[0] == '-' || rest[0] >= '0' && rest[0] <= '9') {
				return rest, w.radius
			}
		}
	}
	return t, true
}

// ZoneSizeJoin writes a zone's size as the zones text reads it: "d 24 mm"
// for a diameter, "r 12 mm" for a radius; "" stays "".
func ZoneSizeJoin(length string, radius bool) string {
	length = strings.TrimSpace(length)
	if length == "" {
		return ""
	}
	if radius {
		return ZoneRadiusWord + " " + length
	}
	return ZoneDiameterWord + " " + length
}

// ParseZones reads the "zones" input: up to resonator.MaxZones zones from
// the first end, each LENGTH,SIZE,TEMPERATURE in any unit (a bare
// temperature is kelvin), every value greater than zero. SIZE is the
// inside diameter "d 24 mm" or the radius "r 12 mm"; a bare size is a
// radius, as older text wrote it (ZoneSizeText). A zone takes no ±: the
// zoned tube carries no uncertainty. Errors are *ZoneError.
func ParseZones(text string) ([]resonator.Zone, error) {
	texts, err := SplitZones(text)
	if err != nil {
		return nil, err
	}
	zs := make([]resonator.Zone, len(texts))
	for i, z := range texts {
		var v [3]float64
		for j, s := range z {
			part := ZonePart(j + 1)
			name, radius := part.String(), false
			if part == ZoneSize {
				s, radius = ZoneSizeText(s)
				name = "diameter"
				if radius {
					name = "radius"
				}
			}
			q, err := units.ParseWith(s, zoneDims[j], units.Options{DefaultUnit: zoneDefaultUnit(part)})
			switch {
			case err != nil:
			case !finite(q.Value) || !finite(q.Uncertainty):
				err = errors.New("not a finite number")
			case q.Uncertainty > 0:
				err = errors.New("takes no ± here (the zoned tube carries no uncertainty); type the value alone")
			case !(q.Value > 0):
				err = units.NewRangeError(name, q.Value, 0, math.Inf(1), units.SIUnit(zoneDims[j]))
			}
			if err != nil {
				if part == ZoneSize {
					err = fmt.Errorf("%s: %w", name, err)
				}
				return nil, &ZoneError{Zone: i, Part: part, Err: err}
			}
			v[j] = q.Value
			if part == ZoneSize && !radius {
				v[j] /= 2
			}
		}
		zs[i] = resonator.Zone{Length: v[0], Radius: v[1], Temperature: v[2]}
	}
	return zs, nil
}

func zoneDefaultUnit(p ZonePart) string {
	if p == ZoneTemperature {
		return "K"
	}
	return ""
}

// zonesInputs are the inputs of the zoned tube.
func zonesInputs() []Input {
	return []Input{
		{Key: "zones", Label: "Zones from the first end", Kind: Text, Optional: true,
			Example: "100 mm, d 24 mm, 600 K; 400 mm, d 24 mm, 20 degC",
			Hint: fmt.Sprintf("LENGTH, SIZE, TEMPERATURE of each zone from the first end (the closed end of a closed – open tube), zones apart by ;  "+
				"SIZE is the inside diameter after d (d 20 mm) or the radius after r (r 10 mm); a size with neither is a radius, as older versions wrote it. "+
				"e.g. 0.1 m, d 20 mm, 700 K; 0.4 m, d 20 mm, 295 K (up to %d zones)", resonator.MaxZones)},
		{Key: "modes", Label: "Modes to list", Kind: Count, Default: "3", Min: 1, Max: MaxZoneModes,
			Hint: fmt.Sprintf("how many modes of the zoned tube to list, 1 to %d", MaxZoneModes)},
	}
}

// ZoneMode is one mode of a zoned tube in the "modes" result: JSON
// {"mode":1,"frequency_Hz":..,"travel_time_frequency_Hz":..,"difference_Hz":..}.
// With wall losses it also has "loss_free_frequency_Hz" and "q" (the
// side walls' quality factor).
type ZoneMode struct {
	Mode       int     `json:"mode"`
	Frequency  float64 `json:"frequency_Hz"`
	TravelTime float64 `json:"travel_time_frequency_Hz"`
	Difference float64 `json:"difference_Hz"`
	LossFree   float64 `json:"loss_free_frequency_Hz,omitempty"`
	Q          float64 `json:"q,omitempty"`
}

// zoneModesText lists the modes for people: "1: 347.6 Hz (travel time
// 369.7 Hz); 2: ...".
func zoneModesText(ms []ZoneMode) string {
	parts := make([]string, len(ms))
	for i, m := range ms {
		parts[i] = fmt.Sprintf("%d: %s (travel time %s)", m.Mode,
			units.Format(m.Frequency, units.DimFrequency), units.Format(m.TravelTime, units.DimFrequency))
	}
	return strings.Join(parts, "; ")
}

// zoneNoise is the relative spread below which a zoned mode's ± is the
// solver's noise and is not shown (the modes are solved to 1e-13).
const zoneNoise = 1e-9

// runZones solves the zoned tube: the exact plane-wave modes with the
// travel-time estimate beside each.
func runZones(v *Values) (*Result, error) {
	if !v.Has("zones") || strings.TrimSpace(v.Text("zones")) == "" {
		return nil, tubeMissing(v, "zones")
	}
	zs, err := ParseZones(v.Text("zones"))
	if err != nil {
		return nil, v.Blame(err, "zones")
	}
	if err := tubeRequirePositive(v, "pressure"); err != nil {
		return nil, err
	}
	if err := checkHumidity(v); err != nil {
		return nil, err
	}
	p := v.Q("pressure")
	// Evaluate each zone's gas here, so that a temperature outside the gas
	// model's range marks its own zone.
	hot := 0.0
	for i, z := range zs {
		if _, err := tubeGas(v, z.Temperature, p.Value); err != nil {
			if fe, ok := AsFieldError(err); ok && (fe.Key == "pressure" || fe.Key == "humidity") {
				return nil, err
			}
			// the zone's temperature is the one input of this evaluation
			// that is the zone's own
			if fe, ok := AsFieldError(err); ok {
				err = fe.Err
			}
			return nil, v.Blame(&ZoneError{Zone: i, Part: ZoneTemperature, Err: err}, "zones")
		}
		hot = max(hot, z.Temperature)
	}
	zt := resonator.ZonedTube{Ends: v.Pick("ends").(resonator.Ends), Correction: v.Pick("end-correction").(resonator.EndCorrection),
		Losses: v.Pick("losses").(resonator.Losses), Zones: zs, Gas: v.Gas("gas"), Pressure: p.Value, GasOptions: GasOptions(v),
		RelativeHumidity: v.SI("humidity")}
	n := v.Count("modes")
	res, err := zt.Modes(n)
	if err != nil {
		return nil, v.Blame(err, "zones")
	}
	// a typed ± on the pressure is carried to the lowest mode (through
	// the real-gas correction and the wall losses; nothing without them)
	sig, ok := Spread(func(x, out []float64) error {
		zz := zt
		zz.Pressure = x[0]
		rr, err := zz.Modes(1)
		if err != nil {
			return err
		}
		m := rr.Modes[0]
		out[0], out[1], out[2] = m.Frequency, m.TravelTime, m.Difference
		return nil
	}, []float64{p.Value}, []float64{p.Uncertainty}, 3)
	r := &Result{}
	for k, name := range []string{"lowest mode", "travel-time estimate", "difference"} {
		if !ok[k] {
			r.Warn(noSpreadWarning(name))
		}
	}
	m := res.Modes[0]
	for k := range sig {
		// An ideal gas's modes do not depend on the pressure: what the
		// finite differences leave then is the root finder's noise, far
		// below anything a bench resolves.
		if sig[k] < zoneNoise*m.Frequency {
			sig[k] = 0
		}
	}
	note := "exact plane-wave mode of the zoned tube"
	if zt.Losses == resonator.WallLosses {
		note += ", with the wall losses (Rott's complex wave number)"
	}
	r.AddPM("frequency", "Lowest mode", m.Frequency, sig[0], units.DimFrequency).Note = note
	r.AddPM("travel_time_frequency", "Travel-time estimate of the lowest mode", m.TravelTime, sig[1], units.DimFrequency).Note =
		"adds up the time sound takes through each zone, ignoring reflections at the joints"
	r.AddPM("difference", "Estimate minus exact", m.Difference, sig[2], units.DimFrequency).Note = zoneDifferenceNote(m)
	list := make([]ZoneMode, len(res.Modes))
	for i, m := range res.Modes {
		list[i] = ZoneMode{Mode: m.Number, Frequency: m.Frequency, TravelTime: m.TravelTime, Difference: m.Difference}
		if zt.Losses == resonator.WallLosses {
			list[i].LossFree = m.LossFree
			if finite(m.Q) {
				list[i].Q = m.Q
			}
		}
	}
	r.AddObject("modes", fmt.Sprintf("First %d modes", len(list)), list, zoneModesText(list))
	r.Warn(res.Warnings...)
	if v.Q("temperature").Uncertainty > 0 {
		r.Warn(unusedPMWarning(v, "temperature", "the zoned tube takes the temperature of each zone"))
	}
	tubeCautions(r, hot, p.Value)
	return r, nil
}

// zoneDifferenceNote says how far the travel-time estimate is off, in %.
func zoneDifferenceNote(m resonator.ZoneMode) string {
	word := "higher"
	if m.Difference < 0 {
		word = "lower"
	}
	return fmt.Sprintf("the estimate is %s %% %s than the exact mode", units.Number(100*math.Abs(m.Difference)/m.Frequency, 2), word)
}
