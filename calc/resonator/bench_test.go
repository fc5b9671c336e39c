package resonator

import (
	"testing"
)

var (
	sinkResult   Result
	sinkEstimate Estimate
)

// The screens recompute on every keystroke: these show the cost of a full
// tube solve (with and without propagating ± on four inputs) and of a
// temperature diagnosis.
func BenchmarkSolveFrequency(b *testing.B) {
	s := Setup{Tube: Tube{Ends: ClosedOpen, Correction: Unflanged, Mode: 1, Length: 0.5, Radius: 0.012},
		Gas: mixture(b, "air"), Temperature: 293.15, Pressure: 101325}
	b.Run("exact", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkResult, _ = s.SolveFrequency()
		}
	})
	s.U = Uncertainty{Length: 1e-3, Radius: 1e-4, Temperature: 2, Pressure: 1000}
	b.Run("uncertain", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkResult, _ = s.SolveFrequency()
		}
	})
	s.Losses = WallLosses
	b.Run("uncertain_wall_losses", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkResult, _ = s.SolveFrequency()
		}
	})
}

func BenchmarkDiagnoseTemperature(b *testing.B) {
	s := Setup{Tube: Tube{Ends: ClosedOpen, Correction: Unflanged, Mode: 1, Length: 0.6, Radius: 0.012},
		Gas: mixture(b, "air"), Pressure: 101325, U: Uncertainty{Frequency: 2}}
	for _, l := range []Losses{LossFree, WallLosses} {
		s.Losses = l
		b.Run(l.String(), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkEstimate, _ = s.DiagnoseTemperature(140)
			}
		})
	}
}

// FuzzParseEnds: the two name parsers never panic and round-trip what they
// accept.
func FuzzParseEnds(f *testing.F) {
	for _, s := range []string{"closed-open", "Open-Open", " closed-closed ", "flanged", "none", ""} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		if e, err := ParseEnds(s); err == nil {
			if back, err := ParseEnds(e.String()); err != nil || back != e {
				t.Fatalf("%q -> %v does not round-trip", s, e)
			}
		}
		if c, err := ParseEndCorrection(s); err == nil {
			if back, err := ParseEndCorrection(c.String()); err != nil || back != c {
				t.Fatalf("%q -> %v does not round-trip", s, c)
			}
		}
	})
}
