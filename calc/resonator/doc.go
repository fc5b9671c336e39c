// Package resonator computes the acoustic resonances of the tubes and
// cavities built at the thermoacoustics bench: quarter- and half-wave tubes
// with their end corrections, tubes made of hot and cold zones, Helmholtz
// resonators, the boundary-layer (Kirchhoff) losses that set the quality
// factor, and the inverse problems of the bench: from a measured resonance
// frequency back to the mean gas temperature or to the mole fraction of a
// binary mixture.
//
// Units are SI throughout: metres, m³, Hz, kelvin, pascal (absolute), m/s,
// kg/m³. Gas properties come from package gasprops at the entered
// temperature and pressure; the sound speed is never a fixed number.
//
// Model and assumptions: plane waves in rigid tubes (ka below the first
// cross-mode cutoff ka = 1.841), linear acoustics, no mean flow; losses are
// small (Q ≫ 1) and computed by perturbation from the lossless mode shape;
// end corrections are the published ones for a thin-walled open end
// (unflanged) or an end in an infinite baffle (flanged). Each function
// documents its own formula, domain and source.
//
// Wall losses in the frequency: with Tube.Losses (or ZonedTube.Losses) set
// to WallLosses the frequency comes from Rott's complex wave number of the
// circular duct (WaveNumber), so the boundary layers lower it as they do
// in the onset solver of calc/linear; the zero value LossFree keeps the
// adiabatic sound speed. The Q is computed the same way in both. A
// warning is given when the mean free path is not small against the
// radius (Knudsen number above KnudsenLimit). Inputs outside the domain
// return a *units.RangeError naming the field, the value and the valid
// range; results are never NaN.
//
// Uncertainty: every input may carry a standard uncertainty (the ± typed by
// the user); results carry the first-order propagated uncertainty computed
// with package uncertain.
package resonator
