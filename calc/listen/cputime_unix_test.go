//go:build linux || darwin

package listen

import "syscall"

// cpuSeconds returns the CPU time (user + system) used by this process so
// far, s, or -1 where it cannot be read. Benchmarks report it beside the
// wall time, which a shared machine inflates.
func cpuSeconds() float64 {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return -1
	}
	return float64(ru.Utime.Sec+ru.Stime.Sec) + float64(ru.Utime.Usec+ru.Stime.Usec)*1e-6
}
