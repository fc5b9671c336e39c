package sheet

import (
	"math"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/gasprops"
)

// Curve is the resonance frequency of a tube against one variable, with
// the point of a result marked, for a screen to draw beside the result of
// the resonance or diagnosis calculator. Values are SI.
type Curve struct {
	Title          string
	XLabel, XUnit  string // e.g. "Gas temperature", "K"; XUnit "" for a mole fraction
	X, Y           []float64
	MarkX, MarkY   float64 // the result's point; NaN when there is none
	MarkDX, MarkDY float64 // its standard uncertainties (0 for none)
}

// ResonanceCurve returns the curve that goes with a result of the
// resonance or diagnosis calculator: the sweep the user asked for, or the
// frequency of the uniform tube against the gas temperature around the
// result (for a diagnosed fraction, against the mole fraction from 0 to
// 1), with the result marked. ok is false for the zoned tube, the
// Helmholtz resonator, another calculator or a sweep that fails.
func ResonanceCurve(res *Result) (c Curve, ok bool) {
	if res == nil || res.Values == nil {
		return Curve{}, false
	}
	v := res.Values
	switch v.sheet.ID {
	case IDResonance:
		if resonatorKind(v) != ResonatorTube {
			return Curve{}, false
		}
		return tubeCurve(res)
	case IDDiagnose:
		return diagnoseCurve(res)
	}
	return Curve{}, false
}

// curveSetup is the uniform tube of the values with the given length (m).
func curveSetup(v *Values, length float64) resonator.Setup {
	return resonator.Setup{Tube: resonator.Tube{
		Ends:       v.Pick("ends").(resonator.Ends),
		Correction: v.Pick("end-correction").(resonator.EndCorrection),
		Mode:       v.Count("mode"),
		Length:     length,
		Radius:     curveRadius(v),
		Losses:     v.Pick("losses").(resonator.Losses),
	}, Gas: v.Gas("gas"), Temperature: v.SI("temperature"), Pressure: v.SI("pressure"), GasOptions: GasOptions(v),
		RelativeHumidity: v.SI("humidity")}
}

func tubeCurve(res *Result) (Curve, bool) {
	v := res.Values
	f, hasF := res.Row("frequency")
	if t := res.Table; t != nil && len(t.Header) == 2 {
		c := Curve{Title: "Frequency against gas temperature", XLabel: "Gas temperature", XUnit: "K", MarkX: math.NaN(), MarkY: math.NaN()}
		if name, ok := strings.CutPrefix(t.Header[0], "mole_fraction_"); ok {
			c.Title, c.XLabel, c.XUnit = "Frequency against the mixture", "Mole fraction of "+name, ""
		} else if hasF {
			c.MarkX, c.MarkDX, c.MarkY, c.MarkDY = v.SI("temperature"), v.Q("temperature").Uncertainty, f.Value, f.PM
		}
		for _, row := range t.Rows {
			c.X, c.Y = append(c.X, row[0]), append(c.Y, row[1])
		}
		return c, true
	}
	T := v.Q("temperature")
	c := Curve{Title: "Frequency against gas temperature", XLabel: "Gas temperature", XUnit: "K", MarkX: T.Value, MarkDX: T.Uncertainty}
	var length float64
	if hasF {
		length, c.MarkY, c.MarkDY = v.SI("length"), f.Value, f.PM
	} else if row, ok := res.Row("length"); ok {
		// the tube cut to the solved length, at the target frequency
		length, c.MarkY, c.MarkDY = row.Value, v.SI("frequency"), v.Q("frequency").Uncertainty
	} else {
		return Curve{}, false
	}
	return temperatureCurve(c, curveSetup(v, length))
}

// temperatureCurve fills c with the frequency of s over temperatures
// around c.MarkX, within the gas model's range.
func temperatureCurve(c Curve, s resonator.Setup) (Curve, bool) {
	T := c.MarkX
	tmin, tmax := s.Gas.Range()
	lo := math.Max(tmin, math.Min(T-100, 0.7*T))
	hi := math.Min(tmax, math.Max(T+200, 1.5*T))
	if !(hi > lo) {
		return Curve{}, false
	}
	pts, err := s.SweepTemperature(lo, hi, 41)
	if err != nil {
		return Curve{}, false
	}
	for _, p := range pts {
		c.X, c.Y = append(c.X, p.X), append(c.Y, p.Frequency)
	}
	return c, true
}

func diagnoseCurve(res *Result) (Curve, bool) {
	v := res.Values
	f := v.Q("measured-frequency")
	s := curveSetup(v, v.SI("length"))
	if row, ok := res.Row("temperature"); ok {
		c := Curve{Title: "Frequency against temperature", XLabel: "Gas temperature", XUnit: "K",
			MarkX: row.Value, MarkDX: row.PM, MarkY: f.Value, MarkDY: f.Uncertainty}
		return temperatureCurve(c, s)
	}
	row, ok := res.Row("mole_fraction")
	if !ok {
		return Curve{}, false
	}
	first := v.Gas("gas").Components()[0].Species
	second := v.Pick("second-gas").(*gasprops.Species)
	pts, err := s.SweepFraction(first, second, 0, 1, 51)
	if err != nil {
		return Curve{}, false
	}
	c := Curve{Title: "Frequency against mixture", XLabel: "Mole fraction of " + second.Name,
		MarkX: row.Value, MarkDX: row.PM, MarkY: f.Value, MarkDY: f.Uncertainty}
	for _, p := range pts {
		c.X, c.Y = append(c.X, p.X), append(c.Y, p.Frequency)
	}
	return c, true
}

// curveRadius is the tube's inner radius (m) for a curve drawn after a
// solve that read it.
func curveRadius(v *Values) float64 {
	q, _ := tubeRadius(v)
	return q.Value
}
