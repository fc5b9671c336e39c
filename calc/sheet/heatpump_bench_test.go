package sheet

import (
	"testing"

	"tubewright/calc/linear"
)

// BenchmarkHeatPumpSheet is one heat-pump result as the screen and twcalc
// compute it: the solve at the drive frequency, the load's ± and the
// search for the best drive frequency.
func BenchmarkHeatPumpSheet(b *testing.B) {
	texts := map[string]string{"example": "heatpump", "load": "100 mW"}
	for b.Loop() {
		if _, err := heatPumpSheet.Evaluate(texts); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkHeatPumpBestDrive is the search for the best drive frequency
// alone (about 30 solves on the example: 13 coarse, the rest Brent's
// refinement), with the solves it spent per run.
func BenchmarkHeatPumpBestDrive(b *testing.B) {
	d, err := linear.Example("heatpump")
	if err != nil {
		b.Fatal(err)
	}
	solves := 0
	for b.Loop() {
		r, err := bestDrive(d, 400, linear.HeatPumpSettings{})
		if err != nil {
			b.Fatal(err)
		}
		solves = r.Solves
	}
	b.ReportMetric(float64(solves), "solves/op")
}
