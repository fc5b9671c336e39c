// Package units reads, converts and writes the physical quantities that
// people type at the bench, and holds the error type every package of the
// project uses for out-of-range input.
//
// # What it provides
//
//   - Parse and ParseWith read typed input such as "10 bar", "30 barg",
//     "27 °C", "3/8 in", "0,25 mm", "200 /in", "400 cpsi" or
//     "440 Hz ± 5 Hz" as a Quantity of a requested Dimension, in SI units,
//     with an optional uncertainty. Bad input gives a *ParseError that
//     quotes the input and says what is accepted.
//   - Format, FormatIn, FormatInDim, FormatGauge, FormatPM and FormatPMIn
//     write values with their unit symbol and sensible significant digits,
//     never with an exponent: Format and FormatPM pick the unit a person
//     reads (an SI prefix or a unit of the trade, "243.9 µm", "1 MPa",
//     "160.5 mg/m³", see readable.go) and write a dimensionless million or
//     more in words ("45.8 million"). Number, Decimal, FormatDigits,
//     FormatComplex and FormatSI do the same for sentences, files, echoes,
//     complex values and values with a stored SI symbol. Parse reads every
//     text they write back.
//   - ToUnit, FromUnit (and the Dim variants) and Gauge convert numbers.
//   - Units lists the unit symbols a screen can offer for a dimension, SI
//     first; SIUnit gives the SI symbol.
//   - RangeError (NewRangeError) is the shared out-of-range error:
//     "temperature 15 K is outside the valid range 20–3000 K (helium model)".
//
// # Units inside
//
// Everything inside the program is SI: m, m², m³, K (absolute), Pa
// (absolute; gauge only at the edges), Hz, 1/s, s, kg/m³, m/s, Pa·s, m²/s,
// W/(m·K), J/(kg·K), kg/mol, J, W, kg, m³/s, 1/m, 1/m², and dB re 20 µPa
// for sound levels. Typed quantities (Length, Pressure, ...) mark SI values
// at package borders.
//
// # Sources of the conversion factors
//
// Exact definitions, as given in NIST Special Publication 811 (2008
// edition), "Guide for the Use of the International System of Units (SI)",
// Appendix B, and in the BIPM SI Brochure, 9th edition (2019):
//
//	1 in   = 0.0254 m                       (exact)
//	1 ft   = 0.3048 m                       (exact)
//	1 lb   = 0.45359237 kg                  (exact, avoirdupois pound)
//	g_n    = 9.80665 m/s²                   (exact, standard gravity)
//	1 psi  = 1 lbf/in² = 0.45359237 × 9.80665 / 0.0254² Pa ≈ 6894.757293168 Pa
//	1 ksi  = 1000 psi
//	1 atm  = 101325 Pa                      (exact)
//	1 torr = 101325/760 Pa ≈ 133.3224 Pa    (exact ratio)
//	1 mmHg = 13.5951 g/cm³ × g_n × 1 mm = 133.322387415 Pa (conventional)
//	1 bar  = 100000 Pa                      (exact)
//	1 cal  = 4.184 J                        (thermochemical calorie)
//	1 cP   = 1 mPa·s;  1 cSt = 1 mm²/s
//	T/K    = t/°C + 273.15;  T/K = (t/°F + 459.67) × 5/9
//
// The sound level unit dB is re 20 µPa (ISO 1683). "mesh" is openings per
// inch of a woven screen and "cpsi" cells per square inch of a honeycomb:
// common practice, no published source needed beyond the inch.
//
// # Input rules and limits
//
// "bar", "psi", "kPa" and "MPa" are absolute pressures; gauge pressures
// are typed "barg", "psig", "kPag", "MPag" or "mbarg" and stored absolute
// (Quantity.Gauge records how they were typed). A stress is never gauge.
// A decimal comma is accepted ("0,25 mm") except before exactly three
// digits ("1,500"), which is refused as ambiguous. "C" and "F" alone are
// refused for temperatures ("C" is the coulomb): write °C or degC. Parse
// refuses, as absurd, magnitudes beyond MaxMagnitude(dim) (1e6 m for a
// length, 1e6 K for a temperature, 1e10 Pa for a pressure, 300 dB for a
// sound level, ...): these limits are our own choice, far beyond bench
// work, meant to catch a slipped exponent. Temperatures must be above
// absolute zero and absolute pressures at least zero; other dimensions
// that cannot be negative (length, volume, mass, frequency ...) need
// Options.AllowNegative to go below zero.
package units
