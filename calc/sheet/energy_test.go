package sheet

import "testing"

var heCharge = map[string]string{"gas": "helium", "pressure": "30 barg", "volume": "50 L"}

// TestEnergySheetValues checks the stored-energy description against hand
// calculations.
func TestEnergySheetValues(t *testing.T) {
	t.Parallel()
	r := evalOK(t, energySheet, heCharge)
	// see calc/safety/energy_test.go: helium, 30 barg, 50 L, γ = 5/3:
	// isentropic 173 405.6 J, Brode (p − pa) V/(γ − 1) = 225 kJ (hand
	// calculation); TNT at 4.184 MJ/kg.
	wantNum(t, "helium", r, "stored_energy", 173405.5674, 1e-6)
	wantNum(t, "helium", r, "brode_energy", 225000, 1e-6)
	wantNum(t, "helium", r, "tnt_equivalent", 173405.5674/4.184e6, 1e-6)
	// A bare "30 bar" is gauge: the same charge (issue 12); "30 bara" is
	// one atmosphere less and stores less.
	bare := evalOK(t, energySheet, plus(heCharge, "pressure", "30 bar"))
	wantNum(t, "bare bar", bare, "stored_energy", 173405.5674, 1e-6)
	abs := evalOK(t, energySheet, plus(heCharge, "pressure", "30 bara"))
	if rowOf(t, abs, "stored_energy").Value >= rowOf(t, r, "stored_energy").Value {
		t.Error("30 bara stores as much as 30 barg")
	}
	// A gas test at 33 barg stores more than the charge at 30 barg: the
	// isentropic energy grows with the pressure (property).
	g := evalOK(t, energySheet, plus(heCharge, "test-pressure", "33 barg"))
	if rowOf(t, g, "gas_test_energy").Value <= rowOf(t, g, "stored_energy").Value {
		t.Error("a gas test at 33 barg stores less than 30 barg")
	}
	// Hydrogen brings its fire caution.
	h := evalOK(t, energySheet, plus(heCharge, "gas", "hydrogen"))
	if len(h.Cautions) <= len(r.Cautions) {
		t.Errorf("hydrogen cautions %q", h.Cautions)
	}
}

// TestEnergySheetSpread: both energies are proportional to the volume, so
// a ± on it gives σE = E σV/V (GUM eq. 10).
func TestEnergySheetSpread(t *testing.T) {
	t.Parallel()
	for _, u := range []float64{1, 2} {
		r := evalOK(t, energySheet, plus(heCharge, "volume", "50 L ± "+ftoa(u)+" L"))
		e := rowOf(t, r, "stored_energy")
		if want := e.Value * u / 50; !near(e.PM, want, 1e-5) {
			t.Errorf("± %g L: energy ± %g J, want %g", u, e.PM, want)
		}
	}
}

// TestEnergySheetBadInput: each error names its input.
func TestEnergySheetBadInput(t *testing.T) {
	t.Parallel()
	wantFieldError(t, energySheet, plus(heCharge, "pressure", "1 atm"), "pressure")
	wantFieldError(t, energySheet, plus(heCharge, "volume", "0 L"), "volume")
	wantFieldError(t, energySheet, plus(heCharge, "temperature", "5 K"), "temperature")
	wantFieldError(t, energySheet, plus(heCharge, "test-pressure", "0.5 bara"), "test-pressure")
}
