//go:build js && wasm

package store

import (
	"fmt"
	"path/filepath"
	"sync/atomic"
	"syscall/js"
	"testing"
)

// browserDBs numbers the IndexedDB databases and localStorage prefixes the
// tests open, so that every test starts from an empty store (Browser has no
// delete-all).
var browserDBs atomic.Int64

// backends returns a fresh instance of every back end that runs here: under
// node (make store-wasm-test) that is the browser's on IndexedDB (from the
// fake-indexeddb package), on localStorage where the runtime has one, and
// files through node's fs.
func backends(t *testing.T) map[string]Backend {
	t.Helper()
	n := browserDBs.Add(1)
	out := map[string]Backend{"memory": NewMemory()}
	f, err := NewFiles(filepath.Join(t.TempDir(), "data"))
	if err != nil {
		t.Fatal(err)
	}
	out["files"] = f
	if !js.Global().Get("indexedDB").Truthy() {
		t.Fatal("no IndexedDB here: run under node with fake-indexeddb preloaded (make store-wasm-test)")
	}
	idb, err := newBrowserNamed(fmt.Sprintf("tubewright-test-%d", n), "", true)
	if err != nil {
		t.Fatal(err)
	}
	if k := idb.Kind(); k != "browser storage (IndexedDB)" {
		t.Fatalf("the browser back end fell back to %q", k)
	}
	out["browser-indexeddb"] = idb
	if js.Global().Get("localStorage").Truthy() {
		ls, err := newBrowserNamed("", fmt.Sprintf("tubewright-test-%d/", n), false)
		if err != nil {
			t.Fatal(err)
		}
		out["browser-localstorage"] = ls
	}
	return out
}

// TestBrowserLocalStorage says whether the localStorage fallback ran in
// the contract tests above; it needs a runtime with localStorage.
func TestBrowserLocalStorage(t *testing.T) {
	if !js.Global().Get("localStorage").Truthy() {
		t.Skip("this runtime has no localStorage; the fallback is not exercised here")
	}
	b, err := newBrowserNamed("", "tubewright-kind/", false)
	if err != nil {
		t.Fatal(err)
	}
	if k := b.Kind(); k != "browser storage (localStorage)" {
		t.Fatalf("kind %q", k)
	}
}
