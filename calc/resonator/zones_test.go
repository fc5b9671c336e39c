package resonator

import (
	"encoding/csv"
	"flag"
	"io"
	"math"
	"os"
	"os/exec"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

var regenerate = flag.Bool("regenerate", false, "rerun testdata/gen_twozone.py (needs Debian's /usr/bin/python3 with scipy) before comparing")

// Two-zone tubes against the independent solution of the standing-wave
// matching condition by scipy.optimize.brentq 1.10.1, via
// testdata/gen_twozone.py (written as tan-form products, not as a transfer
// matrix).
func TestZonedModesAgainstScipy(t *testing.T) {
	t.Parallel()
	if *regenerate {
		out, err := exec.Command("/usr/bin/python3", "../../testdata/gen_twozone.py").Output()
		if err != nil {
			t.Fatalf("gen_twozone.py: %v", err)
		}
		if err := os.WriteFile("../../testdata/twozone.csv", out, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	f, err := os.Open("../../testdata/twozone.csv")
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	r := csv.NewReader(f)
	r.Comment = '#'
	if _, err := r.Read(); err != nil { // header
		t.Fatal(err)
	}
	byCase := map[string][][]string{}
	var order []string
	for {
		rec, err := r.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		if _, ok := byCase[rec[0]]; !ok {
			order = append(order, rec[0])
		}
		byCase[rec[0]] = append(byCase[rec[0]], rec)
	}
	if len(order) < 4 {
		t.Fatalf("only %d cases in twozone.csv", len(order))
	}
	num := func(s string) float64 {
		v, err := strconv.ParseFloat(s, 64)
		if err != nil {
			t.Fatal(err)
		}
		return v
	}
	for _, name := range order {
		rows := byCase[name]
		rec := rows[0]
		ends, err := ParseEnds(rec[1])
		if err != nil {
			t.Fatal(err)
		}
		secs := []Section{
			{Length: num(rec[3]), Radius: num(rec[4]), SoundSpeed: num(rec[5]), Density: num(rec[6])},
			{Length: num(rec[7]), Radius: num(rec[8]), SoundSpeed: num(rec[9]), Density: num(rec[10])},
		}
		res, err := ZonedModes(ends, NoCorrection, secs, len(rows))
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		for i, row := range rows {
			want := num(row[11])
			got := res.Modes[i].Frequency
			if !scalar.EqualWithinRel(got, want, 1e-10) {
				t.Errorf("%s mode %d: %.12g Hz, scipy %.12g Hz", name, i+1, got, want)
			}
		}
	}
}

// A zoned tube whose zones are all alike is a uniform tube: the exact
// modes equal TubeFrequency's for every end condition and end correction
// (identity test), and so does the travel-time estimate.
func TestZonedUniformIsTube(t *testing.T) {
	t.Parallel()
	g := gas(t, "air", 300, 101325)
	sec := Section{Length: 0.2, Radius: 0.02, SoundSpeed: g.SoundSpeed, Density: g.Density}
	for _, ends := range []Ends{ClosedOpen, ClosedClosed, OpenOpen} {
		for _, corr := range []EndCorrection{NoCorrection, Unflanged, Flanged} {
			res, err := ZonedModes(ends, corr, []Section{sec, sec, sec}, 4)
			if err != nil {
				t.Fatal(err)
			}
			for i, m := range res.Modes {
				r, err := TubeFrequency(Tube{Ends: ends, Correction: corr, Mode: i + 1, Length: 0.6, Radius: 0.02}, g)
				if err != nil {
					t.Fatal(err)
				}
				if !scalar.EqualWithinRel(m.Frequency, r.Frequency, 1e-9) {
					t.Errorf("%v %v mode %d: zoned %.10g, uniform %.10g", ends, corr, i+1, m.Frequency, r.Frequency)
				}
				// the travel-time estimate iterates δ(ka) three times only
				if !scalar.EqualWithinRel(m.TravelTime, r.Frequency, 1e-6) {
					t.Errorf("%v %v mode %d: travel time %.10g, uniform %.10g", ends, corr, i+1, m.TravelTime, r.Frequency)
				}
			}
		}
	}
}

// In a monatomic gas (constant γ, so the compliance per length S/(γp) does
// not change with temperature) a hot zone lowers the inertance and raises
// the frequency above the all-cold tube; the travel-time estimate differs
// from the exact answer (reflections at the joint matter). (In air the
// fall of γ with temperature can outweigh this near a closed end: at 700 K
// γ is about 1.364 and a hot zone at the closed end lowers the frequency;
// the scipy check above covers the exact values.)
func TestZonedTubeGas(t *testing.T) {
	t.Parallel()
	argon := mixture(t, "argon")
	zt := ZonedTube{Ends: ClosedOpen, Correction: Unflanged, Gas: argon, Pressure: 101325,
		Zones: []Zone{{Length: 0.1, Radius: 0.01, Temperature: 700}, {Length: 0.4, Radius: 0.01, Temperature: 300}}}
	hot, err := zt.Modes(3)
	if err != nil {
		t.Fatal(err)
	}
	cold := zt
	cold.Zones = []Zone{{Length: 0.1, Radius: 0.01, Temperature: 300}, {Length: 0.4, Radius: 0.01, Temperature: 300}}
	c, err := cold.Modes(3)
	if err != nil {
		t.Fatal(err)
	}
	if hot.Modes[0].Frequency <= c.Modes[0].Frequency {
		t.Errorf("hot zone: %g Hz not above cold %g Hz", hot.Modes[0].Frequency, c.Modes[0].Frequency)
	}
	for _, m := range hot.Modes {
		if math.Abs(m.Difference) < 1e-3*m.Frequency {
			t.Errorf("mode %d: travel-time estimate equals the exact %g Hz: reflections ignored?", m.Number, m.Frequency)
		}
		if m.Difference != m.TravelTime-m.Frequency {
			t.Errorf("difference %g != %g - %g", m.Difference, m.TravelTime, m.Frequency)
		}
	}
	if _, err := (ZonedTube{Ends: ClosedOpen, Gas: argon, Pressure: 101325}).Modes(1); err == nil {
		t.Error("no zones: no error")
	}
	bad := zt
	bad.Zones = []Zone{{Length: 0, Radius: 0.01, Temperature: 300}}
	if _, err := bad.Modes(1); err == nil || !strings.Contains(err.Error(), "zone 1 length") {
		t.Errorf("zero-length zone: %v", err)
	}
	bad.Zones = []Zone{{Length: 0.1, Radius: 0.01, Temperature: 3}}
	if _, err := bad.Modes(1); err == nil {
		t.Error("3 K zone: no error")
	}
}

var sinkZones ZoneResult

func BenchmarkTwoZoneMode(b *testing.B) {
	secs := []Section{
		{Length: 0.3, Radius: 0.025, SoundSpeed: 530.4, Density: 0.504},
		{Length: 0.7, Radius: 0.025, SoundSpeed: 347.2, Density: 1.177},
	}
	for _, n := range []int{1, 3} {
		b.Run(strconv.Itoa(n)+"modes", func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkZones, _ = ZonedModes(ClosedClosed, NoCorrection, secs, n)
			}
		})
	}
}
