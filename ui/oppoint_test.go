package ui

import (
	"testing"

	"tubewright/calc/sheet"
)

// TestPointLine checks the wording of the operating-point line: each
// source named once with its values in order, the rest said to be set
// on the screen, and nothing when there is no value.
func TestPointLine(t *testing.T) {
	he := opPart{kind: carryGas, value: "helium"}
	p := opPart{kind: carryPressure, value: "10 bar"}
	temp := opPart{kind: carryTemperature, value: "20 degC", from: "Tube resonance"}
	f := opPart{kind: carryFrequency, value: "400 Hz", from: "Tube resonance"}
	fd := opPart{kind: carryFrequency, value: "400 Hz", from: "Penetration depths"}
	hd := opPart{kind: carryGas, value: "helium", from: "Working gas"}
	for _, c := range []struct {
		name  string
		parts []opPart
		want  string
	}{
		{"none", nil, ""},
		{"all set here", []opPart{he, p}, "At helium, 10 bar · all set here"},
		{"one source for two", []opPart{he, p, temp, f}, "At helium, 10 bar, 20 degC, 400 Hz · temperature and frequency from Tube resonance; the rest set here"},
		{"two sources", []opPart{hd, p, temp, fd}, "At helium, 10 bar, 20 degC, 400 Hz · gas from Working gas; temperature from Tube resonance; frequency from Penetration depths; the rest set here"},
		{"all carried", []opPart{hd, fd}, "At helium, 400 Hz · gas from Working gas; frequency from Penetration depths"},
	} {
		if got := pointLine(c.parts, "set here"); got != c.want {
			t.Errorf("%s:\n got %q\nwant %q", c.name, got, c.want)
		}
	}
	if got := andList([]string{"gas", "pressure", "temperature"}); got != "gas, pressure and temperature" {
		t.Errorf("andList: %q", got)
	}
}

// TestShownValue: a value is shown as typed when that reads plainly, and
// written out with its unit when it was typed with an exponent or bare
// (1 bar = 1e5 Pa, SI Brochure, 9th ed., Table 8).
func TestShownValue(t *testing.T) {
	pIn := sheet.MeanPressureInput("p", "Mean pressure", "1 atm")
	tIn := sheet.TemperatureInput("t", "T", "", "300 K")
	for _, c := range []struct {
		in         *sheet.Input
		text, want string
	}{
		{&pIn, "10 bar", "10 bar"},
		{&pIn, "1e5 Pa", "1 bar"},
		{&tIn, "20 degC ± 2 K", "20 degC ± 2 K"},
		{&tIn, "300", "300 K"},
	} {
		v, err := sheet.ParseInput(c.in, c.text)
		if err != nil {
			t.Fatal(err)
		}
		if got := shownValue(&v); got != c.want {
			t.Errorf("%q shown as %q, want %q", c.text, got, c.want)
		}
	}
}
