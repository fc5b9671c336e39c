// Package numeric holds the small numerical solvers that gonum does not
// export and that every calculator of Tubewright shares: a bracketing
// scalar root finder (Brent's method, root.go) with a bracket scanner, and
// an adaptive Runge-Kutta integrator on complex state (rk.go).
//
// The package is pure Go, imports no UI code and knows nothing of physics:
// its functions work on plain float64 or complex128 values. Callers give the
// units meaning.
//
// Solvers take a *Settings value where nil means the documented defaults,
// and return a Result that carries the answer, whether it converged and how
// many iterations and function evaluations it took. A solver that does not
// converge returns its last iterate in the Result together with a non-nil
// error, so callers can report how far it got.
//
// Programmer errors (an empty interval, a non-positive count) panic with a
// message starting "numeric:"; conditions that depend on the user's data
// (no sign change, no convergence) are returned as errors.
package numeric
