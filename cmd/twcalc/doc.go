// Command twcalc is Tubewright's terminal companion: the app's calculators
// for scripts, batch sweeps and a quick answer at the bench without the
// window. It is pure Go (no cgo) and never uses the network.
//
// Usage:
//
//	twcalc COMMAND [flags]
//	twcalc help              list the commands
//	twcalc COMMAND -h        list the flags of one command
//
// Example:
//
//	twcalc gas --gas helium --temperature 300K --pressure 10bar
//	twcalc gas --gas helium:0.7,argon:0.3 --temperature 27degC --pressure 30barg --json
//
// # Input
//
// A value with a unit is read by the project's units package and may be
// written in any common unit, with or without a space: 300K, 27degC, 80degF;
// 10bar, 145psi, 1.2MPa; 12.5cm, 3/8in, 0.5"; 1.2kHz. Quote a value that
// contains a space: --temperature "27 degC". Pressures are absolute; a gauge
// unit (barg, psig) adds the standard atmosphere, 101325 Pa. A measured value
// may carry its uncertainty, "440Hz+-5Hz" or "440 Hz ± 5 Hz", which commands
// that support it carry through to their results. A working gas is a name or
// symbol (helium, He) or a mixture by mole fraction, helium:0.7,argon:0.3;
// fractions that do not sum to 1 within 1 % are refused.
//
// # Output
//
// Without --json a command prints an aligned table: the inputs as typed (with
// the SI value they were read as), the results with their units and any ±
// uncertainty, the model warnings, and last the safety cautions under a
// "!! CAUTION !!" heading. Cautions are printed in every form of output.
//
// With --json it prints one JSON object, names in snake_case, values in SI:
//
//	{"inputs":   {"temperature": {"value": 300, "unit": "K", "typed": "300K"}, ...},
//	 "results":  {"sound_speed": {"value": 1019.3, "unit": "m/s"}, ...},
//	 "warnings": ["..."],
//	 "cautions": ["..."],
//	 "verdicts": [{"check": "relief", "outcome": "fail", "why": "..."}]}
//
// A result may also carry "uncertainty" (same unit as value); a result that
// is not a number has "unit": "", and a complex one has a value
// {"re": .., "im": ..}. warnings and cautions are always arrays.
//
// A command that sweeps a range prints CSV instead of the table: one header
// line whose names carry units (temperature_K), numbers that read back
// exactly, then warnings and cautions as "#" comment lines. With --json the
// sweep is the object's "table": {"columns": [...], "rows": [[...], ...]}.
//
// # Errors and exit status
//
// Bad input prints one line on stderr naming the flag, the value and what is
// accepted, e.g.
//
//	twcalc: --temperature "0.5K": temperature 0.5 K is outside the valid range 20–3000 K (helium model)
//
// and exits 2. A computation that fails (no solution found) exits 1. NaN or
// Inf is never printed: a non-finite result is reported as an internal error
// with exit status 1.
//
// # Commands come from the calculators' descriptions
//
// Every calculator command is built from its description in calc/sheet
// (flags, help, table, JSON, CSV); cmd/twcalc holds no per-calculator code.
// Adding a calculator is described in DEVELOPERS.md. The commands setups,
// log and run read the app's export file; --log-to FILE adds a result to it.
package main
