//go:build race

package ui

// raceDetector is true in a test binary built with -race, whose
// instrumentation allocates where a normal build does not: allocation
// counts are checked without it (make idle-allocs).
const raceDetector = true
