// Package store keeps the user's saved work on disk: an atomic file write
// shared by every package that saves, and the bench log, a JSON file of our
// own format holding the safety passes a user has completed.
//
// Files are written atomically (a temporary file in the same directory,
// fsync, rename, fsync of the directory), so a crash leaves either the old
// file or the new one, never half of each. A file that cannot be read back
// is reported as damaged (a *DamagedError) and is never overwritten without
// the user's choice: Append refuses to write over it, and SetAside renames it
// so that a fresh log can be started while the old bytes are kept.
//
// The package is pure Go with no UI imports.
package store
