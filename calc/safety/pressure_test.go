package safety

import (
	"testing"

	"tubewright/calc/units"
)

func TestGaugeVersusAbsolute(t *testing.T) {
	t.Parallel()
	// "30 barg" and "30 bar" (absolute) must give different gauge pressures
	// and so different stresses: by one standard atmosphere, 1.01325 bar
	// (ISO 2533), never silently the same.
	g, err := units.Parse("30 barg", units.DimPressure)
	if err != nil {
		t.Fatal(err)
	}
	a, err := units.Parse("30 bar", units.DimPressure)
	if err != nil {
		t.Fatal(err)
	}
	pg, pa := GaugeOf(g, 0), GaugeOf(a, 0)
	near(t, "30 barg as gauge", float64(pg), 30e5, 1e-12)
	near(t, "30 bar abs as gauge", float64(pa), 30e5-101325, 1e-12)
	near(t, "gauge difference", float64(pg-pa), 101325, 1e-9)

	const ri, wall = 0.05, 0.006
	sg, err := ThickWallStress(pg, ri, wall, 138e6)
	if err != nil {
		t.Fatal(err)
	}
	sa, err := ThickWallStress(pa, ri, wall, 138e6)
	if err != nil {
		t.Fatal(err)
	}
	// Lamé: Δσθ = Δp (ro² + ri²)/(ro² − ri²) = 101325 × 8.861635 Pa.
	near(t, "hoop stress difference", sg.Hoop-sa.Hoop, 101325*0.005636/0.000636, 1e-9)
	hg, _ := ThinWallStress(pg, ri, wall, 138e6)
	ha, _ := ThinWallStress(pa, ri, wall, 138e6)
	near(t, "thin-wall hoop difference", hg.Hoop-ha.Hoop, 101325*0.053/0.006, 1e-9)

	// A local atmosphere (high altitude lab, 90 kPa) changes the gauge
	// value of an absolute entry, not of a gauge entry.
	g2, err := units.ParseWith("30 barg", units.DimPressure, units.Options{Atmosphere: 90e3})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "barg at 90 kPa", float64(GaugeOf(g2, 90e3)), 30e5, 1e-12)
	near(t, "bar abs at 90 kPa", float64(GaugeOf(a, 90e3)), 30e5-90e3, 1e-12)
	near(t, "Absolute", float64(GaugePressure(30e5).Absolute(0)), 30e5+101325, 1e-15)

	// An absolute entry below the atmosphere is a vacuum inside: refused
	// by the wall formulas with a message naming the field.
	v, err := units.Parse("0.5 bar", units.DimPressure)
	if err != nil {
		t.Fatal(err)
	}
	_, err = ThinWallStress(GaugeOf(v, 0), ri, wall, 138e6)
	wantRangeError(t, err, "pressure (gauge)")
}

func TestGaugeOfPanicsOnWrongDimension(t *testing.T) {
	t.Parallel()
	defer func() {
		if recover() == nil {
			t.Error("GaugeOf of a length did not panic")
		}
	}()
	GaugeOf(units.Quantity{Value: 1, Dim: units.DimLength}, 0)
}
