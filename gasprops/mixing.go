package gasprops

import "math"

// This file mixes the transport properties of noble-gas mixtures by the
// first Chapman–Enskog approximation for monatomic gases.

// pair holds the unlike-interaction quantities of species i and j at one
// temperature.
type pair struct {
	eta    float64 // interaction viscosity η_ij, Pa·s
	lambda float64 // interaction conductivity λ_ij, W/(m·K)
	a, b   float64 // A*_ij, B*_ij
}

// pairAt evaluates the interaction of two noble gases at temperature T with
// the Lennard-Jones combining rules σ_ij = (σ_i+σ_j)/2, ε_ij = √(ε_i ε_j)
// (Hirschfelder, Curtiss & Bird 1954, eq. 8.6-1):
//
//	η_ij = 2.6693e-6 √(2 M_i M_j/(M_i+M_j) · T) / (σ_ij² Ω(2,2)*(T/ε_ij))
//	λ_ij = (15/4) R η_ij (M_i+M_j)/(2 M_i M_j)
func pairAt(si, sj *Species, T float64) pair {
	mi, mj := si.MolarMass, sj.MolarMass
	sig := 0.5 * (si.m.sigma + sj.m.sigma)
	eps := math.Sqrt(si.m.epsK * sj.m.epsK)
	mred := 2 * mi * mj / (mi + mj) * 1e3 // g/mol
	ts := T / eps
	lt := math.Log(ts)
	o22 := omega22l(ts, lt)
	// first-order Chapman–Enskog viscosity, HCB 1954 eq. 8.2-18 (Poling et
	// al. 2001 eq. 9-3.9), M in g/mol and σ in Å
	eta := 2.6693e-6 * math.Sqrt(mred*T) / (sig * sig * o22)
	a, b := ratiosAB(ts, lt, o22)
	return pair{eta: eta, lambda: 3.75 * R * eta * (mi + mj) / (2 * mi * mj), a: a, b: b}
}

// mixTransport returns the viscosity (Pa·s) and thermal conductivity
// (W/(m·K)) of a mixture of monatomic gases at temperature T by the first
// Chapman–Enskog approximation (Hirschfelder, Curtiss & Bird, Molecular
// Theory of Gases and Liquids, 1954, eqs. 8.2-22 and 8.2-36; the same
// formulas underlie Kestin et al., J. Phys. Chem. Ref. Data 13, 229, 1984):
//
//	η = xᵀ H⁻¹ x,   λ = xᵀ L⁻¹ x,
//	H_ii = x_i²/η_i + Σ_k≠i 2 x_i x_k/η_ik · M_i M_k/(M_i+M_k)² · (5/(3A*_ik) + M_k/M_i)
//	H_ij = −2 x_i x_j/η_ij · M_i M_j/(M_i+M_j)² · (5/(3A*_ij) − 1)
//	L_ii = x_i²/λ_i + Σ_k≠i x_i x_k [15/2 M_i² + 25/4 M_k² − 3 M_k² B*_ik + 4 M_i M_k A*_ik] / (2 (M_i+M_k)² A*_ik λ_ik)
//	L_ij = −x_i x_j M_i M_j [55/4 − 3 B*_ij − 4 A*_ij] / (2 (M_i+M_j)² A*_ij λ_ij)
//
// The pure-gas η_i and λ_i come from each species' own model, so the
// mixture reduces exactly to the pure gas at x = 0 and 1. The first
// approximation is within about 1–2 % of measured noble-gas mixture
// viscosities and within a few per cent for conductivities (Kestin et al.
// 1984 discuss the higher approximations).
func (m *Mixture) mixTransport(T float64) (eta, lambda float64) {
	n := m.n
	if n == 1 {
		sp := m.comps[0].Species
		return sp.viscosity(T), sp.conductivity(T)
	}
	var in ceInput
	in.n = n
	for i := 0; i < n; i++ {
		sp := m.comps[i].Species
		in.x[i] = m.comps[i].X
		in.m[i] = sp.MolarMass
		in.eta[i] = sp.viscosity(T)
		in.lam[i] = sp.conductivity(T)
	}
	for i := 0; i < n; i++ {
		for j := i + 1; j < n; j++ {
			in.pair[i][j] = pairAt(m.comps[i].Species, m.comps[j].Species, T)
		}
	}
	return chapmanEnskog(&in)
}

// ceInput holds what the first Chapman–Enskog approximation needs: mole
// fractions, molar masses (kg/mol), pure viscosities (Pa·s) and
// conductivities (W/(m·K)), and the unlike pairs (upper triangle, i < j).
type ceInput struct {
	n    int
	x, m [MaxComponents]float64
	eta  [MaxComponents]float64
	lam  [MaxComponents]float64
	pair [MaxComponents][MaxComponents]pair
}

// chapmanEnskog evaluates the formulas of mixTransport; every x must be
// positive.
func chapmanEnskog(in *ceInput) (eta, lambda float64) {
	n := in.n
	var h, l [MaxComponents][MaxComponents]float64
	x := &in.x
	for i := 0; i < n; i++ {
		h[i][i] = x[i] * x[i] / in.eta[i]
		l[i][i] = x[i] * x[i] / in.lam[i]
	}
	for i := 0; i < n; i++ {
		for j := i + 1; j < n; j++ {
			mi, mj := in.m[i], in.m[j]
			pr := &in.pair[i][j]
			xx := x[i] * x[j]
			s2 := (mi + mj) * (mi + mj)
			g := 2 * xx / pr.eta * mi * mj / s2
			h[i][i] += g * (5/(3*pr.a) + mj/mi)
			h[j][j] += g * (5/(3*pr.a) + mi/mj)
			h[i][j] = -g * (5/(3*pr.a) - 1)
			h[j][i] = h[i][j]
			f := xx / (2 * s2 * pr.a * pr.lambda)
			l[i][i] += f * (7.5*mi*mi + 6.25*mj*mj - 3*mj*mj*pr.b + 4*mi*mj*pr.a)
			l[j][j] += f * (7.5*mj*mj + 6.25*mi*mi - 3*mi*mi*pr.b + 4*mi*mj*pr.a)
			l[i][j] = -f * mi * mj * (13.75 - 3*pr.b - 4*pr.a)
			l[j][i] = l[i][j]
		}
	}
	return quadInv(&h, x, n), quadInv(&l, x, n)
}

// quadInv returns xᵀ A⁻¹ x for the leading n×n block of a symmetric
// positive-definite matrix A, by Cholesky factorisation in place on a copy.
func quadInv(a *[MaxComponents][MaxComponents]float64, x *[MaxComponents]float64, n int) float64 {
	var c [MaxComponents][MaxComponents]float64
	for i := 0; i < n; i++ {
		for j := 0; j <= i; j++ {
			s := a[i][j]
			for k := 0; k < j; k++ {
				s -= c[i][k] * c[j][k]
			}
			if i == j {
				c[i][i] = math.Sqrt(s)
			} else {
				c[i][j] = s / c[j][j]
			}
		}
	}
	// forward substitution C y = x; xᵀA⁻¹x = yᵀy
	var y [MaxComponents]float64
	q := 0.0
	for i := 0; i < n; i++ {
		s := x[i]
		for k := 0; k < i; k++ {
			s -= c[i][k] * y[k]
		}
		y[i] = s / c[i][i]
		q += y[i] * y[i]
	}
	return q
}
