// Package linear estimates the onset of thermoacoustic engines and the
// temperature span of driven heat pumps with Rott's linear thermoacoustics.
//
// It provides:
//   - short-stack estimates (critical temperature gradient, gradient ratio,
//     zero-load span) after Swift, "Thermoacoustic engines", J. Acoust. Soc.
//     Am. 84, 1145 (1988);
//   - a device described as an ordered list of parts in a JSON format of our
//     own (ParseDevice, the examples in examples/);
//   - a solver that integrates the linear wave equations for the complex
//     pressure amplitude p1 and volume-velocity amplitude U1 part by part
//     (Swift, "Thermoacoustics: a unifying perspective for some engines and
//     refrigerators", Acoustical Society of America, 2002, chapter 4) with
//     the adaptive Runge-Kutta integrator of calc/numeric, and on top of it
//     the onset solve (Onset), the complex frequency of the nearest mode
//     (Mode), the heat pump with its mean-temperature profile (HeatPump) and
//     sweeps.
//
// Units are SI throughout: m, m², m³, Pa (absolute mean pressure), K, Hz,
// m³/s for volume velocity, W for power. Time dependence is Re[x1 e^{iωt}]
// (Swift's convention).
//
// Assumptions: plane waves, small amplitudes (linear in p1, U1), ideal-gas
// thermal expansion (β = 1/T), solids with infinite heat capacity (εs = 0),
// no axial heat conduction in the solid, adiabatic outer walls, no minor
// losses at area changes, boundary-layer limits in ducts and cavities
// without thermal-viscous losses.
package linear
