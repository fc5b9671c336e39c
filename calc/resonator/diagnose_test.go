package resonator

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

// Round trips: forward (frequency from temperature or fraction) then
// inverse returns the input.
func TestDiagnoseRoundTrip(t *testing.T) {
	t.Parallel()
	tube := Tube{Ends: ClosedOpen, Correction: Unflanged, Mode: 1, Length: 0.6, Radius: 0.012}
	for _, c := range []struct {
		gas string
		T   float64
	}{{"helium", 412}, {"air", 293.15}, {"argon", 650}, {"helium:0.9,argon:0.1", 350}} {
		s := Setup{Tube: tube, Gas: mixture(t, c.gas), Temperature: c.T, Pressure: 2e5}
		r, err := s.SolveFrequency()
		if err != nil {
			t.Fatal(err)
		}
		s.Temperature = 0 // must not be used
		e, err := s.DiagnoseTemperature(r.Frequency)
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinRel(e.Value, c.T, 1e-9) {
			t.Errorf("%s: temperature back %.10g K, want %g K", c.gas, e.Value, c.T)
		}
	}
	he, ar := species(t, "helium"), species(t, "argon")
	for _, x := range []float64{0, 0.02, 0.13, 0.5, 0.97} {
		s := Setup{Tube: tube, Temperature: 300, Pressure: 1e5}
		pts, err := s.SweepFraction(he, ar, x, x, 2)
		if err != nil {
			t.Fatal(err)
		}
		e, err := s.DiagnoseFraction(he, ar, pts[0].Frequency)
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinAbs(e.Value, x, 1e-9) {
			t.Errorf("fraction back %.10g, want %g", e.Value, x)
		}
	}
}

// Uncertainty of the inferred temperature: with no end correction and a
// monatomic gas T ∝ f², so σ_T/T = 2σ_f/f (GUM, JCGM 100:2008, eq. 12);
// with a length ± as well, σ_T/T = 2·sqrt((σ_f/f)² + (σ_L/L)²).
func TestDiagnoseUncertainty(t *testing.T) {
	t.Parallel()
	s := Setup{Tube: Tube{Ends: ClosedClosed, Mode: 1, Length: 0.5, Radius: 0.01}, Gas: mixture(t, "argon"), Temperature: 400, Pressure: 1e5}
	r, _ := s.SolveFrequency()
	s.U = Uncertainty{Frequency: 3, Length: 0.002}
	e, err := s.DiagnoseTemperature(r.Frequency)
	if err != nil {
		t.Fatal(err)
	}
	want := 400 * 2 * math.Hypot(3/r.Frequency, 0.002/0.5)
	if !scalar.EqualWithinRel(e.Sigma, want, 1e-4) {
		t.Errorf("σ_T = %.6g K, want %.6g K", e.Sigma, want)
	}
	// fraction with a frequency ±: positive, finite
	he, ar := species(t, "helium"), species(t, "argon")
	s.U = Uncertainty{Frequency: 2}
	pts, _ := s.SweepFraction(he, ar, 0.2, 0.2, 2)
	ef, err := s.DiagnoseFraction(he, ar, pts[0].Frequency)
	if err != nil || !(ef.Sigma > 0) || !finite(ef.Sigma) {
		t.Errorf("fraction ± = %g, %v: want positive", ef.Sigma, err)
	}
}

func TestDiagnoseNoSolution(t *testing.T) {
	t.Parallel()
	s := Setup{Tube: Tube{Ends: ClosedOpen, Correction: Flanged, Mode: 1, Length: 0.3, Radius: 0.01}, Gas: mixture(t, "air"), Temperature: 293, Pressure: 101325}
	for _, f := range []float64{50, 1e5} {
		_, err := s.DiagnoseTemperature(f)
		if !errors.Is(err, ErrNoSolution) {
			t.Errorf("%g Hz: %v, want ErrNoSolution", f, err)
		}
		var re *units.RangeError
		if !errors.As(err, &re) || re.Field != "measured frequency" || !(re.Min < re.Max) {
			t.Errorf("%g Hz: %v, want a RangeError on the measured frequency with the reachable band", f, err)
		}
	}
	he, ar := species(t, "helium"), species(t, "argon")
	_, err := s.DiagnoseFraction(he, ar, 5000)
	if !errors.Is(err, ErrNoSolution) {
		t.Errorf("fraction at 5 kHz: %v, want ErrNoSolution", err)
	} else {
		t.Log(err)
	}
	if _, err := s.DiagnoseTemperature(-5); err == nil {
		t.Error("negative frequency: no error")
	}
	s.Temperature = 10
	if _, err := s.DiagnoseFraction(he, ar, 500); err == nil {
		t.Error("fraction at 10 K: no error")
	}
	s.Pressure = 0
	var re *units.RangeError
	if _, err := s.DiagnoseTemperature(500); !errors.As(err, &re) || re.Field != "pressure" {
		t.Errorf("zero pressure: %v, want a RangeError on the pressure", err)
	}
}
