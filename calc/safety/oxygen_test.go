package safety

import (
	"math"
	"testing"
)

func TestRoomOxygenWorked(t *testing.T) {
	t.Parallel()
	// Hand calculation: 9 m³ released into a 30 m³ room (ratio 0.3),
	// 20.9 % oxygen in air, 19.5 % threshold (OSHA 29 CFR 1910.134(b)),
	// ventilation 2 air changes per hour (n = 2/3600 s⁻¹).
	//  displacement: 0.209 × 0.7 = 14.63 %; max release 30 × (1 − 0.195/0.209)
	//                = 2.00957 m³; recovery ln(0.0627/0.014)/n = 2698.75 s
	//  well mixed:   0.209 × e^−0.3 = 0.209 × 0.740818 = 15.4831 %;
	//                max 30 ln(0.209/0.195) = 2.08004 m³; recovery 2435.49 s
	//  sealed:       0.209/1.3 = 16.0769 %; max 30 × (0.209/0.195 − 1)
	//                = 2.15385 m³; recovery 2226.49 s
	// (formulas: RoomOxygen's doc; logarithms and exponentials by
	// calculator).
	cases := []struct {
		model           RoomModel
		frac, max, trec float64
	}{
		{Displacement, 0.1463, 2.009569378, 2698.747412},
		{WellMixed, 0.1548310081, 2.080040802, 2435.492357},
		{Sealed, 0.1607692308, 2.153846154, 2226.491736},
	}
	for _, c := range cases {
		o, err := RoomOxygen(c.model, 9, 30, 2.0/3600)
		if err != nil {
			t.Fatal(err)
		}
		near(t, c.model.Key()+" fraction", o.Fraction, c.frac, 1e-9)
		near(t, c.model.Key()+" max release", o.MaxRelease, c.max, 1e-9)
		near(t, c.model.Key()+" recovery", o.RecoveryTime, c.trec, 1e-9)
		if !o.Deficient || !o.Ventilated {
			t.Errorf("%s: deficient %v ventilated %v", c.model.Key(), o.Deficient, o.Ventilated)
		}
		wantGeneralCaution(t, o.Cautions)
		if len(o.Cautions) < 2 || o.Cautions[1] != CautionAsphyxiation {
			t.Errorf("%s: asphyxiation caution missing", c.model.Key())
		}
		// Only the sealed model raises the room pressure: 9/30 of the
		// atmosphere, 0.3 × 101 325 = 30 397.5 Pa (hand calculation).
		if c.model == Sealed {
			near(t, "sealed rise", o.SealedRise, 30397.5, 1e-12)
			if len(o.Warnings) != 1 {
				t.Errorf("sealed: warnings %q", o.Warnings)
			}
		} else if o.SealedRise != 0 || len(o.Warnings) != 0 {
			t.Errorf("%s: rise %g, warnings %q", c.model.Key(), o.SealedRise, o.Warnings)
		}
		// At exactly the largest release the oxygen is 19.5 %.
		at, err := RoomOxygen(c.model, o.MaxRelease, 30, 0)
		if err != nil {
			t.Fatal(err)
		}
		near(t, c.model.Key()+" at max release", at.Fraction, OxygenDeficient, 1e-12)
	}
}

func TestRoomOxygenProperties(t *testing.T) {
	t.Parallel()
	for _, m := range RoomModels {
		// Zero release leaves air as it is.
		o, err := RoomOxygen(m, 0, 30, 0)
		if err != nil {
			t.Fatal(err)
		}
		near(t, m.Key()+" no release", o.Fraction, AirOxygen, 1e-15)
		if o.Deficient || o.RecoveryTime != 0 {
			t.Errorf("%s: no release is deficient or needs recovery", m.Key())
		}
		// Oxygen falls as the release grows.
		prev := 1.0
		for v := 0.5; v < 29.5; v += 0.5 {
			o, err := RoomOxygen(m, v, 30, 1.0/3600)
			if err != nil {
				t.Fatal(err)
			}
			if o.Fraction >= prev {
				t.Fatalf("%s: oxygen %g at %g m³ not below %g", m.Key(), o.Fraction, v, prev)
			}
			prev = o.Fraction
		}
	}
	// Small releases: all three models agree to first order,
	// 0.209 (1 − r) (expansion of the three formulas).
	for _, m := range RoomModels {
		o, _ := RoomOxygen(m, 0.003, 30, 0)
		near(t, m.Key()+" small release", o.Fraction, AirOxygen*(1-1e-4), 1e-7)
	}
	// Ordering at the same release: displacement ≤ well mixed ≤ sealed,
	// since 1 − r ≤ e^−r ≤ 1/(1+r).
	d, _ := RoomOxygen(Displacement, 12, 30, 0)
	w, _ := RoomOxygen(WellMixed, 12, 30, 0)
	s, _ := RoomOxygen(Sealed, 12, 30, 0)
	if !(d.Fraction < w.Fraction && w.Fraction < s.Fraction) {
		t.Errorf("ordering: %g %g %g", d.Fraction, w.Fraction, s.Fraction)
	}
	// Faster ventilation recovers sooner; a release that keeps 19.5 %
	// needs no recovery.
	a, _ := RoomOxygen(WellMixed, 9, 30, 1.0/3600)
	b, _ := RoomOxygen(WellMixed, 9, 30, 6.0/3600)
	near(t, "recovery scales as 1/n", a.RecoveryTime/b.RecoveryTime, 6, 1e-12)
	c, _ := RoomOxygen(WellMixed, 1, 30, 1.0/3600)
	if c.Deficient || c.RecoveryTime != 0 || !c.Ventilated {
		t.Errorf("1 m³ in 30 m³: %+v", c)
	}
}

func TestRoomOxygenErrors(t *testing.T) {
	t.Parallel()
	_, err := RoomOxygen(Displacement, 40, 30, 0)
	wantRangeError(t, err, "release volume")
	_, err = RoomOxygen(Displacement, 30, 30, 0)
	wantRangeError(t, err, "release volume")
	// The other two models accept a release larger than the room.
	if _, err := RoomOxygen(WellMixed, 40, 30, 0); err != nil {
		t.Error(err)
	}
	_, err = RoomOxygen(Sealed, -1, 30, 0)
	wantRangeError(t, err, "release volume")
	_, err = RoomOxygen(Sealed, 1, 0, 0)
	wantRangeError(t, err, "room volume")
	_, err = RoomOxygen(Sealed, 1, 30, -1)
	wantRangeError(t, err, "ventilation rate")
	_, err = RoomOxygen(Sealed, math.NaN(), 30, 0)
	wantRangeError(t, err, "release volume")
}

func TestReleaseVolume(t *testing.T) {
	t.Parallel()
	// Hand calculation (ideal-gas law): 50 L at 31.01325 bar absolute and
	// 20 °C into a room at 101 325 Pa and 20 °C: the gas above 1 atm
	// leaves, V (p − pa)/pa = 0.05 × 3e6/101325 = 1.480385 m³.
	v, err := ReleaseVolume(0.05, 3.101325e6, 293.15, 1, 101325, 293.15)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "release", v, 0.05*3e6/101325, 1e-12)
	// A hot charge (600 K) releases less gas than a cold one.
	hot, _ := ReleaseVolume(0.05, 3.101325e6, 600, 1, 101325, 293.15)
	if hot >= v {
		t.Errorf("hot %g not below cold %g", hot, v)
	}
	_, err = ReleaseVolume(0.05, 9e4, 293.15, 1, 101325, 293.15)
	wantRangeError(t, err, "fill pressure (absolute)")
}
