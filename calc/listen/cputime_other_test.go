//go:build !(linux || darwin)

package listen

// cpuSeconds cannot be read here.
func cpuSeconds() float64 { return -1 }
