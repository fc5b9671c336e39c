// Package gasprops gives the thermophysical properties of the working gases
// of thermoacoustic devices: helium, neon, argon, krypton, xenon, hydrogen,
// nitrogen, dry air and carbon dioxide, and mixtures of up to MaxComponents
// noble gases by mole fraction.
//
// At a temperature T (K) and absolute mean pressure p (Pa), Properties
// returns molar mass, density, isobaric specific heat, ratio of specific
// heats, sound speed, dynamic viscosity, thermal conductivity, thermal
// diffusivity, kinematic viscosity and Prandtl number, all in SI units.
//
// # Models and sources
//
// Heat capacity: monatomic gases cp = 5R/2; hydrogen, nitrogen, oxygen and
// carbon dioxide from the NASA Glenn 9-coefficient polynomials (McBride,
// Zehe & Gordon, NASA/TP-2002-211556, 2002); air as the mole-fraction mix
// N2 0.7812, O2 0.2096, Ar 0.0092 of Lemmon et al. (J. Phys. Chem. Ref.
// Data 29, 331, 2000).
//
// Transport (dilute gas, independent of pressure):
//   - helium, neon, argon, krypton, hydrogen, nitrogen, and carbon dioxide
//     viscosity: the NASA CEA least-squares fits ln η = A ln T + B/T + C/T²
//   - D (Gordon & McBride, NASA RP-1311, 1994; Svehla, NASA TM-4647,
//     1995; the noble gases rest on Bich, Millat & Vogel 1990);
//   - carbon dioxide conductivity: Huber et al., J. Phys. Chem. Ref. Data
//     45, 013102 (2016), eq. 3;
//   - air: the dilute-gas terms of Lemmon & Jacobsen, Int. J. Thermophys.
//     25, 21 (2004);
//   - xenon: corresponding states from krypton with the Lennard-Jones
//     scaling parameters of Svehla (NASA TR R-132, 1962), and
//     λ = (15/4)(R/M)η.
//
// Noble-gas mixtures: the first Chapman–Enskog approximation for
// monatomic gases (Hirschfelder, Curtiss & Bird, Molecular Theory of Gases
// and Liquids, 1954, eqs. 8.2-22 and 8.2-36), with unlike interactions
// from Lennard-Jones combining rules and the collision integrals of
// Neufeld, Janzen & Aziz (J. Chem. Phys. 57, 1100, 1972). Mixtures of
// polyatomic gases are refused.
//
// Non-ideal option (Options.NonIdeal): second virial coefficient B(T) for
// helium (a fit to the ab initio B(T) of NIST SRD 134, Hurly & Moldover,
// J. Res. NIST 105, 667, 2000) and the other gases except
// hydrogen (Tsonopoulos, AIChE J. 20, 263, 1974); for noble-gas mixtures
// B = Σ x_i x_j B_ij with Lennard-Jones cross coefficients. Density from
// Z = 1 + Bp/(RT), sound speed with the second acoustic virial
// coefficient; cp and transport stay ideal. Hydrogen stays ideal
// (SecondVirial reports ok = false, and the option says so).
//
// Humid air (HumidAir): dry air with water vapour at a relative humidity,
// an ideal mixture with the IAPWS-IF97 saturation pressure and the
// CIPM-2007 enhancement factor; transport stays dry air's.
//
// # Ranges and accuracy
//
// Validated ranges (Species.Range, Mixture.Range): 100–5000 K for helium
// (below 200 K its viscosity and conductivity interpolate the NIST SRD 134
// table of Hurly & Moldover 2000), 200–5000 K for the other gases with CEA
// fits, 200–3000 K for xenon, 200–2000 K for air and
// 200–1100 K for carbon dioxide. Up to 20 % beyond a bound the result
// carries a warning; further out Properties returns a *units.RangeError.
// The tests compare viscosity and conductivity with the CRC Handbook
// tables at 200–600 K within 2 % (plus half the last printed digit),
// helium with NIST SRD 134 at 100–1000 K within 0.5 %, ideal sound speed
// within 0.1 %, and air with python3-iapws.
//
// A state where a component's partial pressure reaches its vapour
// pressure (Lee–Kesler) is refused: carbon dioxide, xenon and krypton can
// condense in the range of use. Below 100 K (the cold end of many
// pulse-tube coolers) the package has no validated helium model, and below
// 200 K none for the other gases.
package gasprops
