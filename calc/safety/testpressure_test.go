package safety

import "testing"

func TestReferenceTestPressures(t *testing.T) {
	t.Parallel()
	cases := []struct {
		name            string
		mawp, ratio     float64
		hydro, pneu, eu float64
	}{
		// Hand calculation: MAWP 40 bar, stress ratio 1.
		// UG-99(b) 1.3 × 40 = 52 bar; UG-100(b) 1.1 × 40 = 44 bar;
		// PED Annex I 7.4 max(1.25 × 40, 1.43 × 40) = 57.2 bar
		// (ASME BPVC VIII-1 UG-99(b) "at least equal to 1.3 times the
		// maximum allowable working pressure" × LSR, UG-100(b) "1.1 times";
		// pressure equipment directive Annex I 7.4, coefficients 1,25 and
		// 1,43, "whichever is the greater"; texts and where they were read
		// in ReferenceTestPressures' doc).
		{"ratio 1", 40e5, 1, 52e5, 44e5, 57.2e5},
		// Stress ratio 1.2 (vessel rated hot, tested cold): 62.4, 52.8 and
		// max(60, 57.2) = 60 bar.
		{"ratio 1.2", 40e5, 1.2, 62.4e5, 52.8e5, 60e5},
	}
	for _, c := range cases {
		tp, err := ReferenceTestPressures(GaugePressure(c.mawp), c.ratio)
		if err != nil {
			t.Fatal(err)
		}
		near(t, c.name+" hydrostatic", float64(tp.ASMEHydrostatic), c.hydro, 1e-12)
		near(t, c.name+" pneumatic", float64(tp.ASMEPneumatic), c.pneu, 1e-12)
		near(t, c.name+" EU", float64(tp.EUHydrostatic), c.eu, 1e-12)
		wantGeneralCaution(t, tp.Cautions)
		if len(tp.Cautions) < 2 || tp.Cautions[1] != CautionTestPressure {
			t.Errorf("%s: test-pressure caution missing: %q", c.name, tp.Cautions)
		}
	}
	_, err := ReferenceTestPressures(-1, 1)
	wantRangeError(t, err, "pressure (gauge)")
	_, err = ReferenceTestPressures(1e6, 0)
	wantRangeError(t, err, "stress ratio")
}

func TestCheckRelief(t *testing.T) {
	t.Parallel()
	r, err := CheckRelief(30e5, 32e5)
	if err != nil || !r.OK {
		t.Errorf("30 bar set, 32 bar MAWP: ok %v, err %v", r.OK, err)
	}
	r, err = CheckRelief(32e5, 32e5)
	if err != nil || !r.OK {
		t.Errorf("set equal to MAWP must pass: ok %v, err %v", r.OK, err)
	}
	r, err = CheckRelief(35e5, 32e5)
	if err != nil || r.OK {
		t.Errorf("35 bar set, 32 bar MAWP: ok %v, err %v", r.OK, err)
	}
	wantGeneralCaution(t, r.Cautions)
	_, err = CheckRelief(1e5, 0)
	wantRangeError(t, err, "MAWP")
}
