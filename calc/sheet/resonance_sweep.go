package sheet

import (
	"errors"
	"strings"

	"tubewright/calc/resonator"
	"tubewright/calc/units"
	"tubewright/gasprops"
)

// The kinds of sweep of the resonance calculator ("KIND:FROM:TO:N").
const (
	SweepTemperature = "temperature"
	SweepFraction    = "fraction"
)

// tubeSweep reads the "sweep" input and sweeps the frequency of the tube
// s against the gas temperature or the mole fraction of the second gas.
func tubeSweep(v *Values, s resonator.Setup) (*Table, error) {
	spec := v.Text("sweep")
	kind, rest, ok := strings.Cut(spec, ":")
	kind = strings.ToLower(strings.TrimSpace(kind))
	if !ok || (kind != SweepTemperature && kind != SweepFraction) {
		return nil, v.Blame(errors.New("write temperature:FROM:TO:N (e.g. temperature:250K:450K:21) or fraction:FROM:TO:N (e.g. fraction:0:0.3:16)"), "sweep")
	}
	in := &Input{Key: "sweep", Label: kind, Dim: units.DimNone}
	if kind == SweepTemperature {
		in.Dim, in.Units = units.DimTemperature, units.Options{DefaultUnit: "K"}
	}
	sp, err := readSpan(rest, in)
	if err != nil {
		return nil, v.Blame(err, "sweep")
	}
	if kind == SweepTemperature {
		pts, err := s.SweepTemperature(sp.From, sp.To, sp.N)
		if err != nil {
			err = v.BlameSubject(err, map[units.Subject]string{units.SubjectTemperature: "sweep", units.SubjectPressure: "pressure"})
			return nil, v.Blame(err, "sweep")
		}
		return pointsTable([]string{"temperature_K", "frequency_Hz"}, pts), nil
	}
	first, second, err := binaryPair(v)
	if err != nil {
		return nil, err
	}
	pts, err := s.SweepFraction(first, second, sp.From, sp.To, sp.N)
	if err != nil {
		err = v.BlameSubject(err, map[units.Subject]string{units.SubjectTemperature: "temperature", units.SubjectPressure: "pressure", units.SubjectComposition: "sweep"})
		return nil, v.Blame(err, "sweep")
	}
	return pointsTable([]string{"mole_fraction_" + second.Name, "frequency_Hz"}, pts), nil
}

// pointsTable is a sweep as a table of two columns.
func pointsTable(header []string, pts []resonator.Point) *Table {
	rows := make([][]float64, len(pts))
	for i, p := range pts {
		rows[i] = []float64{p.X, p.Frequency}
	}
	return &Table{Header: header, Rows: rows}
}

// binaryPair returns the working gas, which must be pure, and the second
// gas, which must be another noble gas: the two gases of a mixture
// fraction.
func binaryPair(v *Values) (*gasprops.Species, *gasprops.Species, error) {
	comps := v.Gas("gas").Components()
	if len(comps) != 1 {
		return nil, nil, v.Blame(errors.New("give a pure gas for a mixture fraction (the other gas is the second gas)"), "gas")
	}
	if !v.Has("second-gas") {
		return nil, nil, tubeMissing(v, "second-gas")
	}
	first, second := comps[0].Species, v.Pick("second-gas").(*gasprops.Species)
	if first == second {
		return nil, nil, v.Blame(errors.New("is the same gas as the working gas"), "second-gas")
	}
	if _, err := gasprops.Binary(first, second, 0.5); err != nil {
		return nil, nil, v.Blame(err, "gas")
	}
	return first, second, nil
}
