package main

import (
	"bytes"
	"compress/gzip"
	"io"
	"os"
	"os/exec"
	"path/filepath"
	"slices"
	"strconv"
	"strings"
	"testing"
)

// packFake packs the real shell with a stand-in WebAssembly file into a
// new temporary folder.
func packFake(t *testing.T, wasm []byte) (dir, build string) {
	t.Helper()
	tmp := t.TempDir()
	w := filepath.Join(tmp, "app.wasm")
	if err := os.WriteFile(w, wasm, 0o644); err != nil {
		t.Fatal(err)
	}
	dir = filepath.Join(tmp, "web")
	build, err := pack(options{shell: "..", wasm: w, out: dir,
		wasmExec: must(goWasmExec())})
	if err != nil {
		t.Fatal(err)
	}
	return dir, build
}

// packXz packs the real shell with a stand-in WebAssembly file and a
// stand-in decoder script, so with an xz form, into a new temporary folder.
func packXz(t *testing.T, wasm []byte) (dir, build string) {
	t.Helper()
	tmp := t.TempDir()
	w := filepath.Join(tmp, "app.wasm")
	dec := filepath.Join(tmp, "decoder.js")
	if err := os.WriteFile(w, wasm, 0o644); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(dec, []byte("/* a stand-in decoder */"), 0o644); err != nil {
		t.Fatal(err)
	}
	dir = filepath.Join(tmp, "web")
	build, err := pack(options{shell: "..", wasm: w, unxz: dec, out: dir, wasmExec: must(goWasmExec())})
	if err != nil {
		t.Fatal(err)
	}
	return dir, build
}

// TestPackListsExactlyTheBuiltFiles packs the shell and checks the service
// worker lists every file of the folder but itself, no more; that the
// compressed app unpacks to the raw one; and that the page and the worker
// carry the build name with no placeholder left.
func TestPackListsExactlyTheBuiltFiles(t *testing.T) {
	wasm := bytes.Repeat([]byte("\x00asm fake module "), 5000)
	dir, build := packFake(t, wasm)
	sw, err := os.ReadFile(filepath.Join(dir, swName))
	if err != nil {
		t.Fatal(err)
	}
	listed, err := workerFiles(sw)
	if err != nil {
		t.Fatal(err)
	}
	ents, _ := os.ReadDir(dir)
	var have []string
	for _, e := range ents {
		if e.Name() != swName {
			have = append(have, e.Name())
		}
	}
	want := []string{"icon-192.png", "icon-512.png", "icon.svg", "index.html", "manifest.webmanifest",
		"tubewright.wasm", "tubewright.wasm.gz", "wasm_exec.js"}
	if !slices.Equal(listed, want) || !slices.Equal(have, want) {
		t.Errorf("worker lists %v, folder holds %v, want %v", listed, have, want)
	}
	zr, err := gzip.NewReader(bytes.NewReader(must(os.ReadFile(filepath.Join(dir, wasmGz)))))
	if err != nil {
		t.Fatal(err)
	}
	if got := must(io.ReadAll(zr)); !bytes.Equal(got, wasm) {
		t.Error("tubewright.wasm.gz does not unpack to the app")
	}
	for _, f := range []string{pageName, swName} {
		s := string(must(os.ReadFile(filepath.Join(dir, f))))
		if strings.Contains(s, "__") {
			t.Errorf("%s keeps a placeholder", f)
		}
		if !strings.Contains(s, `"`+build+`"`) {
			t.Errorf("%s does not name the build %s", f, build)
		}
	}
}

// TestPackWritesXzForm packs with a decoder script and checks the xz form:
// it is listed with unxz.js (the decoder, then the worker half), the xz
// command unpacks it to the app, and the page knows its size; without a
// decoder the page's xz size is 0.
func TestPackWritesXzForm(t *testing.T) {
	wasm := bytes.Repeat([]byte("\x00asm fake module, xz "), 4000)
	dir, _ := packXz(t, wasm)
	listed := must(workerFiles(must(os.ReadFile(filepath.Join(dir, swName)))))
	for _, f := range []string{wasmXz, unxzName, wasmGz, wasmRaw} {
		if !slices.Contains(listed, f) {
			t.Errorf("the worker does not list %s: %v", f, listed)
		}
	}
	unxz := string(must(os.ReadFile(filepath.Join(dir, unxzName))))
	tail := string(must(os.ReadFile(filepath.Join("..", unxzWorkerName))))
	if !strings.HasPrefix(unxz, "/* a stand-in decoder */") || !strings.HasSuffix(unxz, tail) {
		t.Error("unxz.js is not the decoder followed by its worker half")
	}
	xzFile := filepath.Join(dir, wasmXz)
	got, err := exec.Command("xz", "--decompress", "--stdout", xzFile).Output()
	if err != nil {
		t.Fatalf("xz -d: %v", err)
	}
	if !bytes.Equal(got, wasm) {
		t.Error("tubewright.wasm.xz does not unpack to the app")
	}
	st := must(os.Stat(xzFile))
	page := string(must(os.ReadFile(filepath.Join(dir, pageName))))
	if want := "xz: " + strconv.FormatInt(st.Size(), 10) + ","; !strings.Contains(page, want) {
		t.Errorf("the page does not say %q", want)
	}
	plain, _ := packFake(t, wasm)
	if page := string(must(os.ReadFile(filepath.Join(plain, pageName)))); !strings.Contains(page, "xz: 0,") {
		t.Error("a build without a decoder does not tell the page it has no xz form")
	}
}

// TestBuildNameFollowsContent checks a changed app gets a new build name
// (so a new cache) and the same app the same name.
func TestBuildNameFollowsContent(t *testing.T) {
	_, a := packFake(t, []byte("\x00asm one"))
	_, b := packFake(t, []byte("\x00asm one"))
	_, c := packFake(t, []byte("\x00asm two"))
	if a != b {
		t.Errorf("the same files gave builds %s and %s", a, b)
	}
	if a == c {
		t.Errorf("a changed app kept the build name %s", a)
	}
}

// TestCheckFolderFindsDifferences checks that a file added to or removed
// from a built folder is reported.
func TestCheckFolderFindsDifferences(t *testing.T) {
	dir, _ := packFake(t, []byte("\x00asm"))
	if err := checkFolder(dir); err != nil {
		t.Fatalf("fresh folder: %v", err)
	}
	extra := filepath.Join(dir, "stray.txt")
	if err := os.WriteFile(extra, []byte("x"), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := checkFolder(dir); err == nil {
		t.Error("an unlisted file was not reported")
	}
	os.Remove(extra)
	os.Remove(filepath.Join(dir, "icon.svg"))
	if err := checkFolder(dir); err == nil {
		t.Error("a missing listed file was not reported")
	}
}

// TestPackRefusesFullFolder checks pack never mixes two builds.
func TestPackRefusesFullFolder(t *testing.T) {
	dir, _ := packFake(t, []byte("\x00asm"))
	w := filepath.Join(t.TempDir(), "a.wasm")
	os.WriteFile(w, []byte("\x00asm"), 0o644)
	if _, err := pack(options{shell: "..", wasm: w, out: dir,
		wasmExec: must(goWasmExec())}); err == nil {
		t.Error("pack wrote into a folder that holds a build")
	}
}

func must[T any](v T, err error) T {
	if err != nil {
		panic(err)
	}
	return v
}
