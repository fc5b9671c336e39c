package gasprops

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// Humid air: dry air (the "air" species) with water vapour at a relative
// humidity.

// WaterMolarMass is the molar mass of water, kg/mol (IAPWS R6-95(2018),
// 18.015268 g/mol).
const WaterMolarMass = 18.015268e-3

// Temperature range of HumidAir, K: the saturation-pressure equation
// starts at 273.15 K; above 373.15 K water vapour at 1 atm is no longer
// below saturation in a meaningful sense for the bench.
const (
	HumidMinTemperature = 273.15
	HumidMaxTemperature = 373.15
)

// WaterSaturationPressure returns the saturation vapour pressure of pure
// water over liquid water (Pa) at temperature T (K), by the saturation-
// pressure equation of IAPWS-IF97 (IAPWS R7-97(2012), eq. 30; the
// coefficients agree with python3-iapws's iapws97._PSat_T):
//
//	θ = T + n9/(T − n10),   A = θ² + n1θ + n2,  B = n3θ² + n4θ + n5,
//	C = n6θ² + n7θ + n8,    p = [2C / (−B + √(B² − 4AC))]⁴ MPa
//
// Valid from 273.15 K to the critical point, 647.096 K; outside it is a
// *units.RangeError.
func WaterSaturationPressure(T float64) (float64, error) {
	if !(T >= 273.15 && T <= 647.096) {
		return 0, units.NewRangeError("temperature", T, 273.15, 647.096, "K")
	}
	n := [...]float64{0, 0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2,
		0.12020824702470e5, -0.32325550322333e7, 0.14915108613530e2,
		-0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3}
	th := T + n[9]/(T-n[10])
	a := th*th + n[1]*th + n[2]
	b := n[3]*th*th + n[4]*th + n[5]
	c := n[6]*th*th + n[7]*th + n[8]
	return 1e6 * math.Pow(2*c/(-b+math.Sqrt(b*b-4*a*c)), 4), nil
}

// WaterMoleFraction returns the mole fraction of water vapour in moist air
// at temperature T (K), total pressure p (Pa) and relative humidity rh
// (0 to 1, the ratio of the vapour's mole fraction to its value at
// saturation):
//
//	x_w = rh · f(p, t) · p_sat(T) / p,   f = 1.00062 + 3.14e-8 p/Pa + 5.6e-7 (t/°C)²
//
// with the enhancement factor f of the CIPM-2007 equation for the density
// of moist air (A. Picard, R. S. Davis, M. Gläser and K. Fujii, Metrologia
// 45, 149, 2008; coefficients from memory, checked against python3-iapws's
// saturated humid air in the tests). Errors (*units.RangeError): rh
// outside 0–1, T outside HumidMinTemperature–HumidMaxTemperature, p not
// positive, and a vapour pressure that reaches the total pressure.
func WaterMoleFraction(T, p, rh float64) (float64, error) {
	if !(rh >= 0 && rh <= 1) {
		return 0, units.NewRangeError("relative humidity", rh, 0, 1, "")
	}
	if !(T >= HumidMinTemperature && T <= HumidMaxTemperature) {
		return 0, units.NewRangeError("temperature", T, HumidMinTemperature, HumidMaxTemperature, "K")
	}
	if !(p >= MinPressure) || math.IsInf(p, 0) {
		return 0, units.NewRangeError("pressure", p, MinPressure, math.Inf(1), "Pa")
	}
	ps, err := WaterSaturationPressure(T)
	if err != nil {
		return 0, err
	}
	t := T - 273.15
	f := 1.00062 + 3.14e-8*p + 5.6e-7*t*t
	x := rh * f * ps / p
	if x >= 1 {
		e := units.NewRangeError("pressure", p, f*ps*rh, math.Inf(1), "Pa")
		e.Why = fmt.Sprintf("at %.1f K the water vapour alone would exceed the total pressure", T)
		return 0, e
	}
	return x, nil
}

// waterMolarCp is the ideal-gas isobaric molar heat capacity of water
// vapour, J/(mol·K), from the NASA 7-coefficient polynomial for H2O,
// 200–1000 K, of the GRI-Mech 3.0 thermodynamic data (Smith et al., 1999;
// coefficients from memory; 33.59 J/(mol·K) at 298.15 K, where the JANAF
// tables give 33.58):
//
//	cp/R = a1 + a2 T + a3 T² + a4 T³ + a5 T⁴
func waterMolarCp(T float64) float64 {
	const a1, a2, a3, a4, a5 = 4.19864056, -2.03643410e-3, 6.52040211e-6, -5.48797062e-9, 1.77197817e-12
	return R * (a1 + T*(a2+T*(a3+T*(a4+T*a5))))
}

// HumidAir returns the properties of air holding water vapour at relative
// humidity rh (0 to 1) at temperature T and total pressure p, as an ideal
// mixture of dry air and water vapour with the vapour's mole fraction x_w
// from WaterMoleFraction:
//
//	M = (1 − x_w) M_air + x_w M_w,   c_p,m = (1 − x_w) c_p,m,air + x_w c_p,m,w
//	γ = c_p,m / (c_p,m − R),   ρ = pM/(RT),   c = √(γRT/M)
//
// The vapour is lighter than air, so the sound speed rises: about +0.2 %
// at 22 °C, 50 % and 1 atm. With o.NonIdeal, ρ and c² carry dry air's
// virial corrections (the water's own are neglected). Viscosity and
// thermal conductivity are dry air's (the vapour changes them by well
// under 1 % at room conditions, an approximation stated here); ν, α and
// Pr follow from them with the humid density and heat capacity. The
// tests compare the sound speed's rise with python3-iapws's humid-air
// model (IAPWS G8-10) via testdata/gen_humid_air.py: 0.003 percentage
// points apart at 22 °C and 50 %, at most 0.08 (6 % of the rise) at
// 60 °C, saturated and 2 bar, where the neglected non-ideality of the
// vapour shows.
//
// Errors are those of WaterMoleFraction and of dry air's Properties.
func HumidAir(T units.Temperature, p units.Pressure, rh float64, o *Options) (Properties, error) {
	x, err := WaterMoleFraction(float64(T), float64(p), rh)
	if err != nil {
		return Properties{}, err
	}
	return humidAirX(T, p, x, o)
}

// humidAirX is HumidAir for a given mole fraction x of water vapour.
func humidAirX(T units.Temperature, p units.Pressure, x float64, o *Options) (Properties, error) {
	t, pa := float64(T), float64(p)
	dry, err := Pure(air).Properties(T, p, o)
	if err != nil {
		return Properties{}, err
	}
	if x == 0 {
		return dry, nil
	}
	cpa := air.molarCp(t)
	// dry air's non-ideal factors (1 when ideal)
	zRho := dry.Density * R * t / (pa * air.MolarMass)
	zC2 := dry.SoundSpeed * dry.SoundSpeed / (cpa / (cpa - R) * R * t / air.MolarMass)
	mm := (1-x)*air.MolarMass + x*WaterMolarMass
	cpm := (1-x)*cpa + x*waterMolarCp(t)
	gamma := cpm / (cpm - R)
	rho := pa * mm / (R * t) * zRho
	cp := cpm / mm
	h := Properties{
		MolarMass:            mm,
		Density:              rho,
		IsobaricSpecificHeat: cp,
		Gamma:                gamma,
		SoundSpeed:           math.Sqrt(gamma * R * t / mm * zC2),
		Viscosity:            dry.Viscosity,
		ThermalConductivity:  dry.ThermalConductivity,
		ThermalDiffusivity:   dry.ThermalConductivity / (rho * cp),
		KinematicViscosity:   dry.Viscosity / rho,
		Prandtl:              dry.Viscosity * cp / dry.ThermalConductivity,
		Warnings:             dry.Warnings,
	}
	if !finite(h) {
		return Properties{}, fmt.Errorf("gasprops: humid air properties overflow at %s, %s", units.Format(t, units.DimTemperature), units.Format(pa, units.DimPressure))
	}
	return h, nil
}
