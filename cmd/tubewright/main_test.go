package main

import (
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// TestVersionStamp builds the app with a version stamp given by -ldflags -X
// on the full import path, as release builds do, and checks that the
// binary reports it (-version exits before any window opens).
func TestVersionStamp(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the app; skipped with -short")
	}
	gobin, err := exec.LookPath("go")
	if err != nil {
		t.Skip("no go command on PATH to build with")
	}
	exe := filepath.Join(t.TempDir(), "tubewright")
	const stamp = "9.8.7-stamp-test"
	build := exec.Command(gobin, "build", "-o", exe, "-ldflags", "-X tubewright/ui.Version="+stamp, ".")
	if out, err := build.CombinedOutput(); err != nil {
		t.Fatalf("go build: %v\n%s", err, out)
	}
	out, err := exec.Command(exe, "-version").CombinedOutput()
	if err != nil {
		t.Fatalf("tubewright -version: %v\n%s", err, out)
	}
	if got, want := strings.TrimSpace(string(out)), "tubewright "+stamp; got != want {
		t.Fatalf("tubewright -version printed %q, want %q", got, want)
	}
}
