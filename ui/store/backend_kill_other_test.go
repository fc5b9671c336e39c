//go:build !js

package store

import (
	"errors"
	"fmt"
	"os"
	"os/exec"
	"strings"
	"syscall"
	"testing"
	"time"
)

// TestKilledWriterLeavesOldOrNew kills a process in the middle of saving
// (SIGKILL, as a crash or a phone's task killer would) and checks that the
// document is then exactly one of the versions it was writing, never a mix.
func TestKilledWriterLeavesOldOrNew(t *testing.T) {
	if testing.Short() {
		t.Skip("starts writer processes")
	}
	dir := t.TempDir()
	versions := map[string]bool{}
	for i := range 2 {
		versions[string(writerDoc(i))] = true
	}
	exe, err := os.Executable()
	if err != nil {
		t.Fatal(err)
	}
	for round := range 12 {
		cmd := exec.Command(exe, "-test.run=^TestWriterProcess$")
		cmd.Env = append(os.Environ(), "TW_STORE_WRITER="+dir)
		if err := cmd.Start(); err != nil {
			t.Fatal(err)
		}
		time.Sleep(time.Duration(30+round*17) * time.Millisecond)
		_ = cmd.Process.Signal(syscall.SIGKILL)
		_ = cmd.Wait()
		b, _ := NewFiles(dir)
		got, err := b.Load("library")
		if errors.Is(err, ErrNotFound) {
			continue // killed before the first save finished
		}
		if err != nil {
			t.Fatal(err)
		}
		if !versions[string(got)] {
			t.Fatalf("round %d: after a kill the document is neither version (%d bytes)", round, len(got))
		}
	}
}

// writerDoc is version i of a large document the writer saves.
func writerDoc(i int) []byte {
	return []byte(fmt.Sprintf(`{"v":%d,"pad":"%s"}`, i, strings.Repeat(string(rune('a'+i)), 2<<20)))
}

// TestWriterProcess is the writer of TestKilledWriterLeavesOldOrNew: run
// as a child process, it saves two versions in turn until killed.
func TestWriterProcess(t *testing.T) {
	dir := os.Getenv("TW_STORE_WRITER")
	if dir == "" {
		t.Skip("only run as the writer of TestKilledWriterLeavesOldOrNew")
	}
	b, err := NewFiles(dir)
	if err != nil {
		t.Fatal(err)
	}
	docs := [][]byte{writerDoc(0), writerDoc(1)}
	for i := 0; ; i++ {
		if err := b.Save("library", docs[i%2]); err != nil {
			t.Fatal(err)
		}
	}
}
