// Command pack assembles the browser build: it copies the page shell from
// assets/web and wasm_exec.js, writes the app's WebAssembly in up to three
// forms, names the build after a hash of its files, and writes the service
// worker with exactly the list of built files.
//
// The forms of the app, all served as plain files by any static host:
// tubewright.wasm.xz (xz -9e in two streams, code and data, the smallest;
// the page unpacks them at once in two workers with unxz.js, the
// xz-decompress package from npm given by -unxz, which is xz-embedded built
// to WebAssembly), tubewright.wasm.gz (gzip -9, unpacked by the browser's
// DecompressionStream where the xz form fails to load or unpack) and
// tubewright.wasm (raw, for browsers with neither). Without -unxz there is
// no xz form. The xz form needs the xz command (Debian's xz-utils).
//
//	go run ./assets/web/pack -wasm build/tubewright.wasm -unxz DECODER.js -out build/web
//	go run ./assets/web/pack -check build/web
//	go run ./assets/web/pack -serve build/web -addr 127.0.0.1:8080
//
// -check reads a built folder and fails when the service worker's list and
// the folder's files differ. -serve serves a built folder over plain http
// for trying it on this machine (127.0.0.1 counts as a secure context, so
// the offline start works there; see the README for hosting).
package main

import (
	"bytes"
	"compress/gzip"
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"net/http"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"slices"
	"strconv"
	"strings"
)

// Names of the built files that are not copied from the shell as they are.
const (
	wasmRaw  = "tubewright.wasm"
	wasmGz   = "tubewright.wasm.gz"
	wasmXz   = "tubewright.wasm.xz"
	unxzName = "unxz.js"
	// unxzWorkerName is the worker half of unxz.js, appended to the
	// decoder package's script.
	unxzWorkerName = "unxz-worker.js"
	swName         = "sw.js"
	pageName       = "index.html"
	execName       = "wasm_exec.js"
)

// shellFiles are copied from the shell folder unchanged (index.html and
// sw.js are templates, filled in by pack).
var shellFiles = []string{"manifest.webmanifest", "icon.svg", "icon-192.png", "icon-512.png"}

// options are the command-line settings.
type options struct {
	shell    string // folder with index.html, sw.js and shellFiles
	wasm     string // the built WebAssembly
	wasmExec string // Go's wasm_exec.js
	unxz     string // the xz decoder script (xz-decompress); "" for no xz form
	out      string // the folder to write (made; must be empty or missing)
}

func main() {
	var o options
	check := flag.String("check", "", "check a built folder's service-worker list and stop")
	serveDir := flag.String("serve", "", "serve a built folder over http and do nothing else")
	addr := flag.String("addr", "127.0.0.1:8080", "address for -serve")
	flag.StringVar(&o.shell, "shell", "assets/web", "folder of the page shell")
	flag.StringVar(&o.wasm, "wasm", "", "the built WebAssembly file")
	flag.StringVar(&o.unxz, "unxz", "", "the xz decoder script (xz-decompress.min.js); none: no xz form of the app")
	flag.StringVar(&o.wasmExec, "wasm-exec", "", "Go's wasm_exec.js (default: the one of `go env GOROOT`)")
	flag.StringVar(&o.out, "out", "build/web", "folder to write")
	flag.Parse()
	if *check != "" {
		if err := checkFolder(*check); err != nil {
			fmt.Fprintln(os.Stderr, "pack:", err)
			os.Exit(1)
		}
		fmt.Println("pack:", *check, "matches its service worker's list")
		return
	}
	if *serveDir != "" {
		fmt.Printf("pack: serving %s at http://%s/ (Ctrl-C stops)\n", *serveDir, *addr)
		err := http.ListenAndServe(*addr, http.FileServer(http.Dir(*serveDir)))
		fmt.Fprintln(os.Stderr, "pack:", err)
		os.Exit(1)
	}
	if o.wasm == "" {
		fmt.Fprintln(os.Stderr, "pack: -wasm is required")
		os.Exit(2)
	}
	if o.wasmExec == "" {
		var err error
		if o.wasmExec, err = goWasmExec(); err != nil {
			fmt.Fprintln(os.Stderr, "pack:", err)
			os.Exit(1)
		}
	}
	build, err := pack(o)
	if err != nil {
		fmt.Fprintln(os.Stderr, "pack:", err)
		os.Exit(1)
	}
	fmt.Println("pack: build", build, "in", o.out)
}

// goWasmExec returns the path of wasm_exec.js in the Go installation that
// `go` on PATH belongs to (it must match the compiler that built the app).
func goWasmExec() (string, error) {
	out, err := exec.Command("go", "env", "GOROOT").Output()
	if err != nil {
		return "", fmt.Errorf("go env GOROOT: %v", err)
	}
	return filepath.Join(strings.TrimSpace(string(out)), "lib", "wasm", "wasm_exec.js"), nil
}

// pack writes the folder and returns the build name.
func pack(o options) (string, error) {
	files := map[string][]byte{}
	read := func(name, path string) error {
		b, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		files[name] = b
		return nil
	}
	for _, f := range shellFiles {
		if err := read(f, filepath.Join(o.shell, f)); err != nil {
			return "", err
		}
	}
	if err := read(execName, o.wasmExec); err != nil {
		return "", err
	}
	if err := read(wasmRaw, o.wasm); err != nil {
		return "", err
	}
	gz, err := gzipBytes(files[wasmRaw])
	if err != nil {
		return "", err
	}
	files[wasmGz] = gz
	xzSize, xzSplit := 0, 0
	if o.unxz != "" {
		if err := read(unxzName, o.unxz); err != nil {
			return "", err
		}
		tail, err := os.ReadFile(filepath.Join(o.shell, unxzWorkerName))
		if err != nil {
			return "", err
		}
		files[unxzName] = append(append(files[unxzName], '\n'), tail...)
		if files[wasmXz], xzSplit, err = xzApp(files[wasmRaw]); err != nil {
			return "", err
		}
		xzSize = len(files[wasmXz])
	}
	page, err := os.ReadFile(filepath.Join(o.shell, pageName))
	if err != nil {
		return "", err
	}
	sw, err := os.ReadFile(filepath.Join(o.shell, swName))
	if err != nil {
		return "", err
	}
	// The build is named after everything it serves, templates included.
	build := buildName(files, page, sw)
	files[pageName] = fill(page, build, map[string]string{
		"__WASM_SIZE__":      strconv.Itoa(len(files[wasmRaw])),
		"__WASM_GZ_SIZE__":   strconv.Itoa(len(files[wasmGz])),
		"__WASM_XZ_SIZE__":   strconv.Itoa(xzSize),
		"__WASM_XZ_SPLIT__":  strconv.Itoa(xzSplit),
		"<!--__PRELOAD__-->": preload(xzSize > 0, build),
	})
	names := make([]string, 0, len(files))
	for n := range files {
		names = append(names, n)
	}
	slices.Sort(names)
	files[swName], err = fillWorker(sw, build, names)
	if err != nil {
		return "", err
	}
	if err := os.MkdirAll(o.out, 0o755); err != nil {
		return "", err
	}
	if old, _ := os.ReadDir(o.out); len(old) > 0 {
		return "", fmt.Errorf("%s is not empty", o.out)
	}
	for n, b := range files {
		if err := os.WriteFile(filepath.Join(o.out, n), b, 0o644); err != nil {
			return "", err
		}
	}
	return build, checkFolder(o.out)
}

// preload is the page's request, in its head, for the xz form of the app,
// so it downloads while the page loads; nothing where the build has no xz
// form.
func preload(xz bool, build string) string {
	if !xz {
		return ""
	}
	return `<link rel="preload" href="` + wasmXz + `?v=` + build + `" as="fetch" crossorigin>`
}

// gzipBytes compresses b at gzip's best level.
func gzipBytes(b []byte) ([]byte, error) {
	var buf bytes.Buffer
	zw, err := gzip.NewWriterLevel(&buf, gzip.BestCompression)
	if err != nil {
		return nil, err
	}
	if _, err := zw.Write(b); err != nil {
		return nil, err
	}
	if err := zw.Close(); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// buildName is the first 12 hex digits of a SHA-256 over the files' names
// and contents (in name order) and the two templates.
func buildName(files map[string][]byte, templates ...[]byte) string {
	names := make([]string, 0, len(files))
	for n := range files {
		names = append(names, n)
	}
	slices.Sort(names)
	h := sha256.New()
	for _, n := range names {
		fmt.Fprintf(h, "%s\x00%d\x00", n, len(files[n]))
		h.Write(files[n])
	}
	for _, t := range templates {
		h.Write(t)
	}
	return hex.EncodeToString(h.Sum(nil))[:12]
}

// fill replaces __BUILD__ and the given placeholders in a template.
func fill(t []byte, build string, more map[string]string) []byte {
	s := strings.ReplaceAll(string(t), "__BUILD__", build)
	for k, v := range more {
		s = strings.ReplaceAll(s, k, v)
	}
	return []byte(s)
}

// filesLine is the line of sw.js that lists the built files.
var filesLine = regexp.MustCompile(`(?m)^const FILES = (.*);$`)

// fillWorker writes the service worker: the build name and the list of
// every built file except the worker itself.
func fillWorker(t []byte, build string, names []string) ([]byte, error) {
	list, err := json.Marshal(names)
	if err != nil {
		return nil, err
	}
	s := fill(t, build, nil)
	if !filesLine.Match(s) {
		return nil, errors.New("sw.js has no line `const FILES = [];`")
	}
	return filesLine.ReplaceAll(s, []byte("const FILES = "+strings.ReplaceAll(string(list), "$", "$$")+";")), nil
}

// workerFiles reads the FILES list of a built sw.js.
func workerFiles(sw []byte) ([]string, error) {
	m := filesLine.FindSubmatch(sw)
	if m == nil {
		return nil, errors.New("sw.js has no FILES line")
	}
	var names []string
	if err := json.Unmarshal(m[1], &names); err != nil {
		return nil, fmt.Errorf("sw.js FILES: %v", err)
	}
	return names, nil
}

// checkFolder compares a built folder's files with its service worker's
// list: every file but sw.js must be listed, and every listed file must
// exist.
func checkFolder(dir string) error {
	sw, err := os.ReadFile(filepath.Join(dir, swName))
	if err != nil {
		return err
	}
	listed, err := workerFiles(sw)
	if err != nil {
		return err
	}
	ents, err := os.ReadDir(dir)
	if err != nil {
		return err
	}
	var have []string
	for _, e := range ents {
		if e.Name() == swName {
			continue
		}
		if !e.Type().IsRegular() {
			return fmt.Errorf("%s: %s is not a plain file", dir, e.Name())
		}
		have = append(have, e.Name())
	}
	slices.Sort(have)
	slices.Sort(listed)
	if !slices.Equal(have, listed) {
		return fmt.Errorf("%s holds %v but its service worker lists %v", dir, have, listed)
	}
	return nil
}
