package resonator

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"tubewright/calc/units"
)

// Hand-calculated textbook rules, no end correction: f = (2n-1)c/(4L) for
// a closed-open tube and f = nc/(2L) for closed-closed and open-open
// (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed.
// 2000, ch. 10).
func TestTubeTextbook(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 300, 101325)
	c := g.SoundSpeed
	cases := []struct {
		ends Ends
		mode int
		L    float64
		want float64
	}{
		{ClosedOpen, 1, 1, c / 4},
		{ClosedOpen, 3, 0.5, 5 * c / 2},
		{ClosedClosed, 1, 1, c / 2},
		{ClosedClosed, 2, 0.25, 4 * c},
		{OpenOpen, 1, 2, c / 4},
		{OpenOpen, 4, 1, 2 * c},
	}
	for _, k := range cases {
		tube := Tube{Ends: k.ends, Mode: k.mode, Length: k.L, Radius: 0.01}
		r, err := TubeFrequency(tube, g)
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinRel(r.Frequency, k.want, 1e-14) {
			t.Errorf("%v n=%d L=%g: f = %.10g, want %.10g", k.ends, k.mode, k.L, r.Frequency, k.want)
		}
		// and back: the length for that frequency
		back, err := TubeLength(tube, r.Frequency, g)
		if err != nil {
			t.Fatal(err)
		}
		if !scalar.EqualWithinRel(back.Length, k.L, 1e-13) {
			t.Errorf("%v n=%d: length back %.12g, want %g", k.ends, k.mode, back.Length, k.L)
		}
	}
}

// With end corrections the effective length adds δ per open end, and
// TubeLength inverts TubeFrequency.
func TestTubeEndCorrectionRoundTrip(t *testing.T) {
	t.Parallel()
	g := gas(t, "helium", 300, 1e6)
	for _, ends := range []Ends{ClosedOpen, ClosedClosed, OpenOpen} {
		for _, corr := range []EndCorrection{NoCorrection, Unflanged, Flanged} {
			tube := Tube{Ends: ends, Correction: corr, Mode: 2, Length: 0.8, Radius: 0.03}
			r, err := TubeFrequency(tube, g)
			if err != nil {
				t.Fatal(err)
			}
			want := tube.modeFactor() * g.SoundSpeed / r.EffectiveLength
			if !scalar.EqualWithinRel(r.Frequency, want, 1e-12) {
				t.Errorf("%v %v: f = %.10g, m c/L_eff = %.10g", ends, corr, r.Frequency, want)
			}
			if ends == ClosedClosed && r.EndCorrection != 0 {
				t.Errorf("closed-closed has end correction %g", r.EndCorrection)
			}
			back, err := TubeLength(tube, r.Frequency, g)
			if err != nil {
				t.Fatal(err)
			}
			if !scalar.EqualWithinRel(back.Length, tube.Length, 1e-10) {
				t.Errorf("%v %v: length back %.12g, want %g", ends, corr, back.Length, tube.Length)
			}
		}
	}
}

// Fact of the trade (common practice, no published source): a closed-open
// tube 0.147 m long with sound speed 340 m/s gives 578 Hz by the
// quarter-wave rule; a tube of that length was measured at 567 Hz ± 8 Hz.
// With the unflanged end correction for a radius of 8 mm and air at 20 °C
// (sound speed from gasprops, about 343 m/s) the prediction must fall
// inside that band.
func TestQuarterWaveBenchFact(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 293.15, 101325)
	fixed := g
	fixed.SoundSpeed = 340
	r, err := TubeFrequency(Tube{Ends: ClosedOpen, Mode: 1, Length: 0.147, Radius: 0.008}, fixed)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Frequency-578.2) > 0.5 {
		t.Errorf("quarter-wave rule: %.2f Hz, want 578.2 ± 0.5 Hz", r.Frequency)
	}
	r, err = TubeFrequency(Tube{Ends: ClosedOpen, Correction: Unflanged, Mode: 1, Length: 0.147, Radius: 0.008}, g)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Frequency-567) > 8 {
		t.Errorf("end-corrected prediction %.2f Hz is outside the measured 567 ± 8 Hz", r.Frequency)
	}
	t.Logf("air 20 °C: c = %.2f m/s, δ = %.2f mm, f = %.1f Hz", g.SoundSpeed, r.EndCorrection*1e3, r.Frequency)
}

func TestTubeProperties(t *testing.T) {
	t.Parallel()
	ar := mixture(t, "argon")
	base := Setup{Tube: Tube{Ends: ClosedOpen, Correction: Unflanged, Mode: 1, Length: 0.5, Radius: 0.01}, Gas: ar, Pressure: 101325}
	// f ∝ √T for an ideal gas of constant γ (argon, monatomic): with no
	// end correction the ratio is exact up to the gas model.
	s := base
	s.Correction = NoCorrection
	s.Temperature = 300
	r1, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	s.Temperature = 1200
	r2, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(r2.Frequency/r1.Frequency, 2, 1e-9) {
		t.Errorf("f(1200 K)/f(300 K) = %.10g, want 2 (√4)", r2.Frequency/r1.Frequency)
	}
	// frequency falls as the tube gets longer
	base.Temperature = 300
	prev := math.Inf(1)
	for L := 0.1; L < 3; L += 0.1 {
		s := base
		s.Length = L
		r, err := s.SolveFrequency()
		if err != nil {
			t.Fatal(err)
		}
		if r.Frequency >= prev {
			t.Errorf("f(L=%.1f) = %g not below %g", L, r.Frequency, prev)
		}
		prev = r.Frequency
	}
	// helium contaminated with argon: frequency falls monotonically
	pts, err := base.SweepFraction(species(t, "helium"), species(t, "argon"), 0, 1, 21)
	if err != nil {
		t.Fatal(err)
	}
	for i := 1; i < len(pts); i++ {
		if pts[i].Frequency >= pts[i-1].Frequency {
			t.Errorf("He-Ar: f(x=%.2f) = %g not below f(x=%.2f) = %g", pts[i].X, pts[i].Frequency, pts[i-1].X, pts[i-1].Frequency)
		}
	}
	// the temperature sweep grows
	pts, err = base.SweepTemperature(250, 450, 21)
	if err != nil {
		t.Fatal(err)
	}
	if len(pts) != 21 || pts[0].X != 250 || pts[20].X != 450 {
		t.Fatalf("sweep ends %v .. %v", pts[0], pts[len(pts)-1])
	}
	for i := 1; i < len(pts); i++ {
		if pts[i].Frequency <= pts[i-1].Frequency {
			t.Errorf("f(T) not increasing at %g K", pts[i].X)
		}
	}
}

// Uncertainty of the quarter-wave rule without end correction: f = c/(4L)
// so σ_f/f = sqrt((σ_L/L)² + (σ_T/(2T))²) for an ideal monatomic gas
// (GUM, JCGM 100:2008, eq. 12).
func TestTubeUncertainty(t *testing.T) {
	t.Parallel()
	s := Setup{
		Tube: Tube{Ends: ClosedOpen, Mode: 1, Length: 0.25, Radius: 0.01},
		Gas:  mixture(t, "argon"), Temperature: 300, Pressure: 101325,
		U: Uncertainty{Length: 0.001, Temperature: 2},
	}
	r, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	want := r.Frequency * math.Hypot(0.001/0.25, 2.0/600)
	if !scalar.EqualWithinRel(r.FrequencySigma, want, 1e-4) {
		t.Errorf("σ_f = %.6g Hz, want %.6g Hz", r.FrequencySigma, want)
	}
	if r.QSigma <= 0 || r.BandwidthSigma <= 0 {
		t.Errorf("σ_Q = %g, σ_bandwidth = %g: want positive", r.QSigma, r.BandwidthSigma)
	}
	// the inverse: length for a frequency with a ±
	s.U = Uncertainty{Frequency: 5}
	lr, err := s.SolveLength(r.Frequency)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinRel(lr.LengthSigma, 0.25*5/r.Frequency, 1e-4) {
		t.Errorf("σ_L = %.6g m, want %.6g m", lr.LengthSigma, 0.25*5/r.Frequency)
	}
	// no ± in, none out
	s.U = Uncertainty{}
	r, _ = s.SolveFrequency()
	if r.FrequencySigma != 0 || r.QSigma != 0 {
		t.Errorf("exact inputs gave σ_f = %g, σ_Q = %g", r.FrequencySigma, r.QSigma)
	}
}

func TestTubeBadInput(t *testing.T) {
	t.Parallel()
	air := mixture(t, "air")
	ok := Setup{Tube: Tube{Ends: ClosedOpen, Correction: Unflanged, Mode: 1, Length: 0.5, Radius: 0.01}, Gas: air, Temperature: 300, Pressure: 101325}
	cases := []struct {
		name  string
		edit  func(*Setup)
		field string // expected RangeError field; "" for any error
	}{
		{"zero length", func(s *Setup) { s.Length = 0 }, "length"},
		{"negative length", func(s *Setup) { s.Length = -0.1 }, "length"},
		{"NaN length", func(s *Setup) { s.Length = math.NaN() }, "length"},
		{"zero radius", func(s *Setup) { s.Radius = 0 }, "radius"},
		{"mode 0", func(s *Setup) { s.Mode = 0 }, "mode"},
		{"mode 51", func(s *Setup) { s.Mode = 51 }, "mode"},
		{"temperature far below the model", func(s *Setup) { s.Temperature = 5 }, "temperature"},
		{"zero pressure", func(s *Setup) { s.Pressure = 0 }, "pressure"},
	}
	for _, c := range cases {
		s := ok
		c.edit(&s)
		_, err := s.SolveFrequency()
		if err == nil {
			t.Errorf("%s: no error", c.name)
			continue
		}
		var re *units.RangeError
		if !errors.As(err, &re) {
			t.Errorf("%s: %v is not a RangeError", c.name, err)
			continue
		}
		if c.field != "" && re.Field != c.field {
			t.Errorf("%s: field %q, want %q (%v)", c.name, re.Field, c.field, err)
		}
	}
	// A value that must be positive says so, not "must be at least 0 m"
	// (which reads as if zero were allowed).
	for _, c := range []struct {
		v    float64
		want string
	}{{0, "length 0 m must be greater than zero"}, {-0.1, "length -100 mm must be greater than zero"}, {math.Inf(1), "length +Inf is not a finite number"}} {
		s := ok
		s.Length = c.v
		if _, err := s.SolveFrequency(); err == nil || err.Error() != c.want {
			t.Errorf("length %g: message %q, want %q", c.v, err, c.want)
		}
	}
	// a target frequency that no length reaches: end corrections longer
	// than a quarter wavelength
	_, err := ok.SolveLength(30000)
	var re *units.RangeError
	if !errors.As(err, &re) || re.Field != "frequency" || !(re.Max > 0 && re.Max < 30000) {
		t.Errorf("30 kHz in a 10 mm radius tube: %v, want a frequency RangeError with its maximum", err)
	} else {
		t.Log(err)
	}
}

// Results are finite across a wide sweep of inputs (no NaN reaches a
// screen).
func TestTubeFinite(t *testing.T) {
	t.Parallel()
	g := gas(t, "helium", 400, 3e6)
	for _, L := range []float64{1e-3, 0.01, 0.1, 1, 10, 100} {
		for _, a := range []float64{1e-4, 1e-3, 0.01, 0.1} {
			for _, ends := range []Ends{ClosedOpen, ClosedClosed, OpenOpen} {
				r, err := TubeFrequency(Tube{Ends: ends, Correction: Flanged, Mode: 1, Length: L, Radius: a}, g)
				if err != nil {
					t.Fatal(err)
				}
				for _, v := range []float64{r.Frequency, r.EffectiveLength, r.Q.Total, r.Bandwidth, r.DecayTime, r.Attenuation, r.KA} {
					if !finite(v) || v <= 0 {
						t.Errorf("L=%g a=%g %v: non-finite or non-positive result in %+v", L, a, ends, r)
						break
					}
				}
			}
		}
	}
}
