package ui

import "time"

// layOutUntilQuiet calls frame while env's app asks for new frames: three
// times first, so that changes found during layout settle, then once for
// every request (background solves ask when they finish) until none has
// come for quiet. It gives up after 20 s and reports whether the app went
// quiet, so a picture or a check shows results rather than "working".
func layOutUntilQuiet(env *Env, quiet time.Duration, frame func()) bool {
	asked := make(chan struct{}, 1)
	env.setInvalidate(func() {
		select {
		case asked <- struct{}{}:
		default:
		}
	})
	defer env.setInvalidate(nil)
	for range 3 {
		frame()
	}
	deadline := time.After(20 * time.Second)
	for {
		select {
		case <-asked:
			frame()
		case <-time.After(quiet):
			return true
		case <-deadline:
			return false
		}
	}
}
