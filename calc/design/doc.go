// Package design works backwards from what a builder wants to a device
// that does it: from a target frequency, a gas at a mean pressure, the
// hot temperature a heater reaches and a tube diameter to a complete
// standing-wave engine in the device-file format of calc/linear (closed
// hot end, hot space, heater, stack, cooler, resonator, far end), whose
// onset, solved by linear.Onset, is at the target frequency and below the
// available hot temperature; and from a target cold temperature or span
// and a driver amplitude to a loudspeaker-driven heat pump.
//
// Design chooses the stack's pore size from the thermal penetration depth
// (calc/pore), its position and length from the short-stack estimates of
// Swift, "Thermoacoustic engines", J. Acoust. Soc. Am. 84, 1145 (1988),
// then minimises the onset temperature of the linear onset solver over
// position, length and pore size with gonum/optimize's Nelder-Mead, each
// candidate's resonator length solved by Brent's method (calc/numeric) so
// that its onset frequency is the target. It reports how onset and
// frequency move with the build (a sensitivity table by central
// differences, gonum diff/fd) and, for a target that cannot be met, an
// *UnreachableError naming the problem with the nearest design.
//
// DesignHeatPump places and sizes the stack of a driven tube for the
// largest zero-load span at the driver's amplitude with linear.HeatPump,
// and finds the drive frequency of that span.
//
// Units are SI throughout: m, Pa (absolute), K, Hz. Every device written is
// read back by linear.ParseDevice before its onset is reported, so the
// figures are those of the file.
//
// Assumptions are those of calc/linear (plane waves, small amplitudes,
// ideal exchangers, no axial conduction in the solid) plus the design
// rules listed in Result.Rules with their sources. The linear model alone
// favours ever shorter stacks; the shortest stack is set by the gas
// displacement at a working amplitude (Settings.DriveRatio), a choice of
// this package stated in the rules.
//
// How designs are checked: designed engines are solved again by an
// independent scipy implementation of Rott's equations
// (testdata/design_onset.py); the written file is read back and solved
// by linear.Onset; property tests (a hotter heater never gives a worse
// margin, the frequency follows the target across gases, lengths ×2 with
// frequency and pressure ÷2 give the same onset) and the literature's
// band for the stack gap (from memory) stand beside them. Not yet done:
// a comparison with a published standing-wave engine. Of the papers,
// theses and textbooks on prime-mover onset found so far only the
// openings could be read, and those give either the geometry or the
// onset temperature, never both, so no such check is claimed here.
package design
