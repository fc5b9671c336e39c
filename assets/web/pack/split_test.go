package main

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// section returns a WebAssembly section: id, size as unsigned LEB128,
// body.
func section(id byte, body []byte) []byte {
	out := []byte{id}
	n := len(body)
	for {
		c := byte(n & 0x7f)
		n >>= 7
		if n != 0 {
			out = append(out, c|0x80)
			continue
		}
		out = append(out, c)
		break
	}
	return append(out, body...)
}

// fakeModule is a module with a type section, a code section of 300 bytes
// (a two-byte size), a data section and a custom section, and the offset
// where its data section starts.
func fakeModule() ([]byte, int) {
	m := []byte("\x00asm\x01\x00\x00\x00")
	m = append(m, section(1, []byte{1, 0x60, 0})...)
	m = append(m, section(10, bytes.Repeat([]byte("code "), 60))...)
	at := len(m)
	m = append(m, section(11, bytes.Repeat([]byte("data\x00\x00\x00\x01"), 40))...)
	m = append(m, section(0, []byte("\x04name"))...)
	return m, at
}

// TestDataSectionStart checks the data section is found by walking the
// section headers (WebAssembly Core Specification 2.0, 5.5.2), and that
// what is not a module, or a module whose section sizes run past its end,
// is left whole.
func TestDataSectionStart(t *testing.T) {
	m, at := fakeModule()
	if got := dataSectionStart(m); got != at {
		t.Errorf("data section of the fake module at %d, want %d", got, at)
	}
	noData := append([]byte("\x00asm\x01\x00\x00\x00"), section(10, []byte("code"))...)
	for _, c := range []struct {
		name string
		b    []byte
	}{
		{"not a module", []byte("hello, this is text")},
		{"no data section", noData},
		{"cut short", m[:at-5]},
		{"size past the end", append([]byte("\x00asm\x01\x00\x00\x00\x0a"), 0xff, 0xff, 0x03)},
		{"endless size", append([]byte("\x00asm\x01\x00\x00\x00\x0a"), 0xff, 0xff, 0xff, 0xff, 0xff, 0xff)},
		{"empty", nil},
	} {
		if got := dataSectionStart(c.b); got != len(c.b) {
			t.Errorf("%s: split at %d, want %d (whole)", c.name, got, len(c.b))
		}
	}
}

// TestXzAppTwoStreams checks the xz form of a module: the xz command
// unpacks the whole file to the module, and the first stream alone (xz
// --single-stream) to the module up to its data section; the page is told
// where the second stream begins and asks for the file in its head.
func TestXzAppTwoStreams(t *testing.T) {
	m, at := fakeModule()
	dir, build := packXz(t, m)
	xzFile := filepath.Join(dir, wasmXz)
	whole, err := exec.Command("xz", "--decompress", "--stdout", xzFile).Output()
	if err != nil || !bytes.Equal(whole, m) {
		t.Fatalf("xz -d of the whole file: %v; equal to the module: %v", err, bytes.Equal(whole, m))
	}
	first, err := exec.Command("xz", "--decompress", "--single-stream", "--stdout", xzFile).Output()
	if err != nil || !bytes.Equal(first, m[:at]) {
		t.Fatalf("first stream: %v; %d bytes, want the %d before the data section", err, len(first), at)
	}
	file := must(os.ReadFile(xzFile))
	_, split, err := xzApp(m)
	if err != nil {
		t.Fatal(err)
	}
	second := exec.Command("xz", "--decompress", "--stdout")
	second.Stdin = bytes.NewReader(file[split:])
	if got, err := second.Output(); err != nil || !bytes.Equal(got, m[at:]) {
		t.Errorf("second stream from byte %d: %v; equal to the data section on: %v", split, err, bytes.Equal(got, m[at:]))
	}
	page := string(must(os.ReadFile(filepath.Join(dir, pageName))))
	if want := "split: " + strconv.Itoa(split); !strings.Contains(page, want) {
		t.Errorf("the page does not say %q", want)
	}
	if want := `<link rel="preload" href="tubewright.wasm.xz?v=` + build + `" as="fetch" crossorigin>`; !strings.Contains(page, want) {
		t.Errorf("the page does not ask for the xz file in its head: no %q", want)
	}
	plain, _ := packFake(t, m)
	if page := string(must(os.ReadFile(filepath.Join(plain, pageName)))); strings.Contains(page, `rel="preload"`) {
		t.Error("a build without an xz form asks for one")
	}
}
