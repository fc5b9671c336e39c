package resonator

import (
	"errors"
	"math"
	"testing"

	"tubewright/calc/units"
)

// Humid air in a tube: at 22 °C, 50 % and 1 atm the sound speed is about
// 0.204 % above dry air's (python3-iapws's humid air via
// testdata/gen_humid_air.py, row t22_p101325_rh0.5), so a closed-closed
// tube without end corrections rings 0.204 % higher (f ∝ c; the wall
// losses move both alike to within 1e-5). A humidity with helium is
// refused, naming the field.
func TestSetupHumidity(t *testing.T) {
	t.Parallel()
	s := Setup{Tube: Tube{Ends: ClosedClosed, Mode: 1, Length: 0.5, Radius: 0.01, Losses: WallLosses},
		Gas: mixture(t, "air"), Temperature: 295.15, Pressure: 101325}
	dry, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	s.RelativeHumidity = 0.5
	wet, err := s.SolveFrequency()
	if err != nil {
		t.Fatal(err)
	}
	if rise := wet.Frequency/dry.Frequency - 1; math.Abs(rise-0.00204) > 0.00006 {
		t.Errorf("frequency rise %.4f %%, want about 0.204 %%", 100*rise)
	}
	e, err := s.DiagnoseTemperature(wet.Frequency)
	if err != nil || math.Abs(e.Value-295.15) > 1e-6 {
		t.Errorf("humid diagnosis %v K, %v; want 295.15 K", e.Value, err)
	}
	zt := ZonedTube{Ends: ClosedClosed, Losses: WallLosses, Gas: mixture(t, "air"), Pressure: 101325, RelativeHumidity: 0.5,
		Zones: []Zone{{Length: 0.5, Radius: 0.01, Temperature: 295.15}}}
	zr, err := zt.Modes(1)
	if err != nil || math.Abs(zr.Modes[0].Frequency/wet.Frequency-1) > 1e-10 {
		t.Errorf("zoned humid %v Hz, %v; uniform %v Hz", zr.Modes, err, wet.Frequency)
	}
	s.Gas = mixture(t, "helium")
	_, err = s.SolveFrequency()
	var re *units.RangeError
	if !errors.As(err, &re) || re.Field != "relative humidity" {
		t.Errorf("helium with humidity: %v", err)
	}
}
