// Package sheet describes each calculator of Tubewright once: its inputs,
// the work it does and the rows it returns. The app's screens and the
// terminal companion twcalc are both built from these descriptions, so the
// two show the same inputs, numbers, uncertainties, warnings, cautions and
// verdicts.
//
// A Sheet has a stable ID (the terminal command name), a title and a
// one-line summary; its Inputs each have a stable Key (the terminal flag
// name and the JSON key), a label for the screen, a dimension, a default,
// a hint, a valid range, whether a typed ± is accepted, and for choices the
// calc enum values with their words. Parse reads the typed texts into
// Values; Run does all the orchestration (± propagation with
// calc/uncertain, derived inputs, warnings, cautions and verdicts) and
// returns a Result of keyed Rows, each with an outcome where the row is a
// check.
//
// Errors about one input are *FieldError values carrying that input's Key,
// set where the input is checked; front ends mark the field or name the flag
// by comparing keys, never by reading the message.
//
// All values are SI inside (units.Quantity); the package imports no UI code.
package sheet
