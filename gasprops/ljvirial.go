package gasprops

import (
	"math"
	"sync"

	"gonum.org/v1/gonum/integrate/quad"
)

// This file gives the classical second virial coefficient of the
// Lennard-Jones (12-6) potential, used for the unlike (cross) coefficients
// B_ij of noble-gas mixtures.

// The reduced coefficient B* = B/b0, b0 = (2/3)π N_A σ³, is
//
//	B*(T*) = 3 ∫₀^∞ (1 − exp(−u*(r*)/T*)) r*² dr*,  u* = 4(r*⁻¹² − r*⁻⁶)
//
// (Hirschfelder, Curtiss & Bird 1954, eq. 3.6-4). It is tabulated once, on
// first use, on a grid in ln T* from ljTsMin to ljTsMax together with its
// first two derivatives in T*, by 32-point Gauss–Legendre quadrature on six
// pieces of the r* axis (nodes from gonum integrate/quad), and
// interpolated quadratically in ln T*.
const (
	ljTsMin  = 0.3
	ljTsMax  = 500.0
	ljGridN  = 300
	ljCutoff = 8.0 // r* beyond which the integrand is replaced by its series
)

var (
	ljOnce                sync.Once
	ljB, ljB1, ljB2       [ljGridN]float64 // B*, dB*/dT*, d²B*/dT*²
	ljLnMin, ljLnStep     float64
	avogadro              = 6.02214076e23 // 1/mol, exact (SI 2019)
	angstrom3ToCubicMetre = 1e-30
)

// ljTerms returns, at reduced distance r and temperature ts, the three
// integrands (1 − e^{−u/T})r², d/dT of it, d²/dT² of it.
func ljTerms(r, ts float64) (f, f1, f2 float64) {
	r6 := 1 / (r * r * r * r * r * r)
	u := 4 * (r6*r6 - r6)
	a := u / ts
	if a > 700 {
		return r * r, 0, 0
	}
	e := math.Exp(-a)
	f = -math.Expm1(-a) * r * r // 1 − e^{−a} without cancellation
	// d/dT (1 − e^{−u/T}) = −e^{−u/T} u/T²
	f1 = -e * u / (ts * ts) * r * r
	// d²/dT²: e^{−u/T} (2u/T³ − u²/T⁴)
	f2 = e * (2*u/(ts*ts*ts) - u*u/(ts*ts*ts*ts)) * r * r
	return f, f1, f2
}

// ljPieces splits the r* axis where the integrand changes character.
var ljPieces = [...][2]float64{{0, 0.8}, {0.8, 1.0}, {1.0, 1.3}, {1.3, 2}, {2, 4}, {4, ljCutoff}}

// ljNodes are Gauss–Legendre nodes and weights on [−1, 1], set at init.
var ljNodes, ljWeights [ljOrder]float64

const ljOrder = 32

// ljIntegrate returns B*, dB*/dT*, d²B*/dT*² at ts.
func ljIntegrate(ts float64) (b, b1, b2 float64) {
	for _, p := range ljPieces {
		h := 0.5 * (p[1] - p[0])
		c := 0.5 * (p[1] + p[0])
		for k := range ljNodes {
			f, f1, f2 := ljTerms(c+h*ljNodes[k], ts)
			w := h * ljWeights[k]
			b, b1, b2 = b+w*f, b1+w*f1, b2+w*f2
		}
	}
	// tail r > R where u/T is small: 1 − e^{−u/T} ≈ u/T − (u/T)²/2;
	// keep the leading u/T term, ∫_R^∞ 4(r⁻¹² − r⁻⁶) r² dr = 4(R⁻⁹/9 − R⁻³/3)
	R := ljCutoff
	tail := 4 * (math.Pow(R, -9)/9 - math.Pow(R, -3)/3)
	b += tail / ts
	b1 += -tail / (ts * ts)
	b2 += 2 * tail / (ts * ts * ts)
	return 3 * b, 3 * b1, 3 * b2
}

func init() {
	quad.Legendre{}.FixedLocations(ljNodes[:], ljWeights[:], -1, 1)
}

func ljTable() {
	ljLnMin = math.Log(ljTsMin)
	ljLnStep = (math.Log(ljTsMax) - ljLnMin) / (ljGridN - 1)
	for i := range ljB {
		ljB[i], ljB1[i], ljB2[i] = ljIntegrate(math.Exp(ljLnMin + float64(i)*ljLnStep))
	}
}

// ljReducedVirial returns B*, dB*/dT* and d²B*/dT*² at ts by
// interpolation, and ok = false outside ljTsMin..ljTsMax.
func ljReducedVirial(ts float64) (b, b1, b2 float64, ok bool) {
	if !(ts >= ljTsMin && ts <= ljTsMax) {
		return 0, 0, 0, false
	}
	ljOnce.Do(ljTable)
	// quadratic (three-point Lagrange) interpolation in ln T*
	x := (math.Log(ts) - ljLnMin) / ljLnStep
	i := int(math.Round(x))
	if i < 1 {
		i = 1
	}
	if i > ljGridN-2 {
		i = ljGridN - 2
	}
	w := x - float64(i)
	lm, l0, lp := 0.5*w*(w-1), 1-w*w, 0.5*w*(w+1)
	q := func(a *[ljGridN]float64) float64 { return lm*a[i-1] + l0*a[i] + lp*a[i+1] }
	return q(&ljB), q(&ljB1), q(&ljB2), true
}

// crossVirial returns the Lennard-Jones cross coefficient B_ij(T) and its
// first two temperature derivatives (m³/mol, per K, per K²) with the
// combining rules σ_ij = (σ_i+σ_j)/2, ε_ij = √(ε_i ε_j) (Hirschfelder,
// Curtiss & Bird 1954, eq. 3.6-8) and the virial-fitted parameters of the
// species (model.vsigma, vepsK). ok is false outside the tabulated T* or
// for a species without them.
//
// Accuracy: quantum effects on helium pairs are left out and the
// combining rules are approximate for partners as unlike as helium and
// xenon; take B_ij as good to a few cm³/mol. At 30 bar and room
// temperature 5 cm³/mol of B is 0.6 % of Z, against about 1.5 % for
// ignoring non-ideality altogether in a helium-argon fill.
func crossVirial(si, sj *Species, T float64) (b, d1, d2 float64, ok bool) {
	if si.m.vsigma == 0 || sj.m.vsigma == 0 {
		return 0, 0, 0, false
	}
	sig := 0.5 * (si.m.vsigma + sj.m.vsigma)
	eps := math.Sqrt(si.m.vepsK * sj.m.vepsK)
	bs, bs1, bs2, ok := ljReducedVirial(T / eps)
	if !ok {
		return 0, 0, 0, false
	}
	b0 := 2.0 / 3 * math.Pi * avogadro * sig * sig * sig * angstrom3ToCubicMetre
	return b0 * bs, b0 * bs1 / eps, b0 * bs2 / (eps * eps), true
}
