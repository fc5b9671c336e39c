package gasprops

import "math"

// This file evaluates pure-gas heat capacity, viscosity and thermal
// conductivity.

// R is the molar gas constant in J/(mol·K) (CODATA 2018, exact).
const R = 8.314462618

// ceaEval evaluates a two-interval NASA CEA transport fit; the value is
// exp(A ln T + B/T + C/T² + D). Outside 200–5000 K it extrapolates the
// nearest interval (the caller has already warned or refused).
func ceaEval(f *[2]ceaFit, T float64) float64 {
	s := &f[0]
	if T > s.thi {
		s = &f[1]
	}
	return math.Exp(s.a*math.Log(T) + s.b/T + s.c/(T*T) + s.d)
}

// nasaCp returns cp/R from a two-interval NASA 9-coefficient polynomial.
func nasaCp(p *[2]nasa9, T float64) float64 {
	s := &p[0]
	if T > s.thi {
		s = &p[1]
	}
	a := &s.a
	return a[0]/(T*T) + a[1]/T + a[2] + T*(a[3]+T*(a[4]+T*(a[5]+T*a[6])))
}

// molarCp returns the ideal-gas isobaric molar heat capacity in J/(mol·K).
func (sp *Species) molarCp(T float64) float64 {
	m := &sp.m
	switch {
	case m.monatomic:
		return 2.5 * R
	case m.cpParts != nil:
		c := 0.0
		for _, p := range m.cpParts {
			c += p.x * p.sp.molarCp(T)
		}
		return c
	default:
		return nasaCp(&m.cp, T) * R
	}
}

// Neufeld, Janzen & Aziz, "Empirical equations to calculate 16 of the
// transport collision integrals Ω(l,s)* for the Lennard-Jones (12-6)
// potential", J. Chem. Phys. 57, 1100 (1972): the Ω(1,1)* and Ω(2,2)* fits,
// valid 0.3 ≤ T* ≤ 100 (the small sine term of Ω(2,2)* is omitted, as in
// Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th
// ed., 2001, eq. 9-4.3). omega22l is Ω(2,2)*(T*) given T* and ln T*.
func omega22l(ts, lt float64) float64 {
	return 1.16145*math.Exp(-0.14874*lt) + 0.52487*math.Exp(-0.77320*ts) + 2.16178*math.Exp(-2.43787*ts)
}

// omega11d returns Ω(1,1)* and its first and second derivatives in T*,
// given T* and ln T*.
func omega11d(ts, lt float64) (o, d1, d2 float64) {
	p := 1.06036 * math.Exp(-0.15610*lt)
	e1 := 0.19300 * math.Exp(-0.47635*ts)
	e2 := 1.03587 * math.Exp(-1.52996*ts)
	e3 := 1.76474 * math.Exp(-3.89411*ts)
	o = p + e1 + e2 + e3
	d1 = -0.15610*p/ts - 0.47635*e1 - 1.52996*e2 - 3.89411*e3
	d2 = 0.15610*1.15610*p/(ts*ts) + 0.47635*0.47635*e1 + 1.52996*1.52996*e2 + 3.89411*3.89411*e3
	return o, d1, d2
}

// ratiosAB returns the collision-integral ratios A* = Ω(2,2)*/Ω(1,1)* and
// B* = (5Ω(1,2)* − 4Ω(1,3)*)/Ω(1,1)* at reduced temperature T*, given
// Ω(2,2)*(T*) and ln T*. Ω(1,2)* and Ω(1,3)* follow from Ω(1,1)* by the
// exact recursion
//
//	Ω(l,s+1)* = Ω(l,s)* + (T*/(s+2)) dΩ(l,s)*/dT*
//
// (Hirschfelder, Curtiss & Bird, Molecular Theory of Gases and Liquids,
// 1954, §8.2), applied to the Neufeld fit.
func ratiosAB(ts, lt, o22 float64) (a, b float64) {
	o11, d1, d2 := omega11d(ts, lt)
	o12 := o11 + ts/3*d1
	// dΩ12/dT* = d1 + d1/3 + ts/3 d2
	do12 := d1*4/3 + ts/3*d2
	o13 := o12 + ts/4*do12
	return o22 / o11, (5*o12 - 4*o13) / o11
}

// Helium below 200 K, where the NASA CEA fits end: the dilute-gas values
// of NIST Standard Reference Database 134, helium-4 table (the ab initio
// values of Hurly & Moldover, J. Res. NIST 105, 667, 2000; 0.1 % stated
// uncertainty, printed to three or four digits), at 100–180 K. Viscosity
// in µPa·s, conductivity in mW/(m·K).
var (
	heliumLowT   = [5]float64{100, 120, 140, 160, 180}
	heliumLowEta = [5]float64{9.6, 10.8, 11.9, 13.0, 14.1}
	heliumLowLam = [5]float64{74.8, 84.4, 93.4, 102.1, 110.4}
)

// heliumLowEval interpolates a helium property below 200 K as a power law
// between neighbouring rows of the SRD 134 table (ln v linear in ln T),
// joining the CEA fit's value vTop at 200 K so that the model is
// continuous there (the fit and the table differ by 0.2–0.3 % at 200 K).
// Below 100 K it extends the first segment's power law.
func heliumLowEval(v *[5]float64, T, vTop float64) float64 {
	i := 0
	for i < len(heliumLowT)-1 && T > heliumLowT[i+1] {
		i++
	}
	t0, v0 := heliumLowT[i], v[i]
	t1, v1 := 200.0, vTop
	if i < len(heliumLowT)-1 {
		t1, v1 = heliumLowT[i+1], v[i+1]
	}
	return v0 * math.Exp(math.Log(v1/v0)*math.Log(T/t0)/math.Log(t1/t0))
}

// viscosity returns the dilute-gas dynamic viscosity of the pure species in
// Pa·s.
func (sp *Species) viscosity(T float64) float64 {
	m := &sp.m
	switch m.transport {
	case transportCEA:
		if m.low && T < m.visc[0].tlo {
			return heliumLowEval(&heliumLowEta, T, ceaEval(&m.visc, m.visc[0].tlo)*1e-1) * 1e-6
		}
		return ceaEval(&m.visc, T) * 1e-7
	case transportAirLJ:
		return airViscosity0(T)
	case transportScaled:
		r := krypton.m.epsK / m.epsK
		s := krypton.m.sigma / m.sigma
		return krypton.viscosity(T*r) * math.Sqrt(sp.MolarMass/(krypton.MolarMass*r)) * s * s
	}
	panic("gasprops: unknown viscosity model of " + sp.Name)
}

// conductivity returns the dilute-gas thermal conductivity of the pure
// species in W/(m·K).
func (sp *Species) conductivity(T float64) float64 {
	m := &sp.m
	switch m.transport {
	case transportCEA:
		if m.condCO2 {
			return co2Conductivity0(T)
		}
		if m.low && T < m.cond[0].tlo {
			return heliumLowEval(&heliumLowLam, T, ceaEval(&m.cond, m.cond[0].tlo)*1e-1) * 1e-3
		}
		return ceaEval(&m.cond, T) * 1e-4
	case transportAirLJ:
		return airConductivity0(T)
	case transportScaled:
		// first Chapman–Enskog approximation for a monatomic gas (the
		// higher approximations add 0.3–0.5 %), HCB 1954 eq. 8.2-31;
		// scaling krypton's conductivity fit instead would extrapolate it
		// below its 200 K limit less gracefully.
		return 3.75 * R / sp.MolarMass * sp.viscosity(T)
	}
	panic("gasprops: unknown conductivity model of " + sp.Name)
}

// Lemmon & Jacobsen (2004) dilute-gas viscosity of air, eq. 2 with the
// collision integral of eq. 4 and Table I (air: ε/k = 103.3 K,
// σ = 0.360 nm, M = 28.9586 g/mol):
//
//	η⁰ = 0.0266958 √(M T) / (σ² Ω(T*))  µPa·s,
//	ln Ω = Σ bᵢ (ln T*)ⁱ,  b = 0.431, −0.4623, 0.08406, 0.005341, −0.00331.
func airViscosity0(T float64) float64 {
	lt := math.Log(T / 103.3)
	lnOmega := 0.431 + lt*(-0.4623+lt*(0.08406+lt*(0.005341+lt*-0.00331)))
	return 0.0266958 * math.Sqrt(28.9586*T) / (0.36 * 0.36 * math.Exp(lnOmega)) * 1e-6
}

// Lemmon & Jacobsen (2004) dilute-gas thermal conductivity of air, eq. 5
// with Table II (N1 = 1.308, N2 = 1.405, t2 = −1.1, N3 = −1.036,
// t3 = −0.3, τ = 132.6312 K / T):
//
//	λ⁰ = N1 η⁰/(µPa·s) + N2 τ^t2 + N3 τ^t3   mW/(m·K).
func airConductivity0(T float64) float64 {
	tau := 132.6312 / T
	eta := airViscosity0(T) * 1e6
	return (1.308*eta + 1.405*math.Pow(tau, -1.1) - 1.036*math.Pow(tau, -0.3)) * 1e-3
}

// co2Conductivity0 is the dilute-gas thermal conductivity of carbon dioxide
// in W/(m·K) from Huber, Sykioti, Assael & Perkins, "Reference correlation
// of the thermal conductivity of carbon dioxide from the triple point to
// 1100 K and up to 200 MPa", J. Phys. Chem. Ref. Data 45, 013102 (2016),
// eq. 3 (uncertainty about 1 % below 0.1 MPa between 300 and 700 K):
//
//	λ⁰ = √Tr / Σ_{k=0..3} L_k/Tr^k  mW/(m·K),  Tr = T/304.1282 K,
//	L = 1.51874307e-2, 2.80674040e-2, 2.28564190e-2, −7.41624210e-3.
func co2Conductivity0(T float64) float64 {
	tau := 304.1282 / T
	den := 1.51874307e-2 + tau*(2.80674040e-2+tau*(2.28564190e-2+tau*-7.41624210e-3))
	return 1e-3 / (math.Sqrt(tau) * den)
}
