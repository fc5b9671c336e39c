//go:build js && wasm

package store

import (
	"errors"
	"fmt"
	"sort"
	"syscall/js"
)

// Browser keeps documents in the browser: in IndexedDB (database
// "tubewright", store "docs", one record per document, each put in its own
// transaction, so a record is the old or the new document), or in
// localStorage where IndexedDB is refused (private windows of some
// browsers). Every call blocks until the browser answers: call it off the
// goroutine that handles JavaScript events (a Job), never inside a frame.
type Browser struct {
	db      js.Value // the IndexedDB database; undefined when local
	local   js.Value // localStorage when IndexedDB is refused
	prefix  string   // the key prefix of documents in localStorage
	persist Persistence
}

const browserStore = "docs"

// NewBrowser opens the browser's storage and asks it to keep the app's data
// (navigator.storage.persist); Persistence says what it answered.
func NewBrowser() (*Browser, error) {
	return newBrowserNamed("tubewright", localPrefix, true)
}

// newBrowserNamed opens the IndexedDB database dbName, or localStorage
// under the key prefix when IndexedDB is refused or useIndexedDB is false.
// Tests give each back end its own names.
func newBrowserNamed(dbName, prefix string, useIndexedDB bool) (*Browser, error) {
	b := &Browser{prefix: prefix}
	err := errors.New("IndexedDB not asked for")
	var db js.Value
	if useIndexedDB {
		db, err = openIndexedDB(dbName)
	}
	if err != nil {
		ls := js.Global().Get("localStorage")
		if !ls.Truthy() {
			return nil, fmt.Errorf("store: this browser keeps nothing: IndexedDB: %v; no localStorage", err)
		}
		b.local = ls
	} else {
		b.db = db
	}
	b.persist = askPersist()
	return b, nil
}

// await waits for a promise and returns its value or its rejection.
func await(p js.Value) (js.Value, error) {
	type answer struct {
		v   js.Value
		err error
	}
	ch := make(chan answer, 1)
	var ok, fail js.Func
	ok = js.FuncOf(func(this js.Value, args []js.Value) any {
		ch <- answer{v: arg0(args)}
		return nil
	})
	fail = js.FuncOf(func(this js.Value, args []js.Value) any {
		ch <- answer{err: errors.New(jsString(arg0(args)))}
		return nil
	})
	defer ok.Release()
	defer fail.Release()
	p.Call("then", ok, fail)
	a := <-ch
	return a.v, a.err
}

// request waits for an IDBRequest's success or error event.
func request(req js.Value) (js.Value, error) {
	ch := make(chan error, 1)
	var ok, fail js.Func
	ok = js.FuncOf(func(this js.Value, args []js.Value) any { ch <- nil; return nil })
	fail = js.FuncOf(func(this js.Value, args []js.Value) any {
		ch <- errors.New(jsString(req.Get("error")))
		return nil
	})
	defer ok.Release()
	defer fail.Release()
	req.Set("onsuccess", ok)
	req.Set("onerror", fail)
	if err := <-ch; err != nil {
		return js.Undefined(), err
	}
	return req.Get("result"), nil
}

func arg0(args []js.Value) js.Value {
	if len(args) == 0 {
		return js.Undefined()
	}
	return args[0]
}

func jsString(v js.Value) string {
	if v.IsUndefined() || v.IsNull() {
		return "unknown error"
	}
	if m := v.Get("message"); m.Type() == js.TypeString {
		return m.String()
	}
	return v.Call("toString").String()
}

func openIndexedDB(dbName string) (db js.Value, err error) {
	defer func() {
		if r := recover(); r != nil {
			err = fmt.Errorf("%v", r)
		}
	}()
	idb := js.Global().Get("indexedDB")
	if !idb.Truthy() {
		return js.Undefined(), errors.New("no IndexedDB")
	}
	req := idb.Call("open", dbName, 1)
	upgrade := js.FuncOf(func(this js.Value, args []js.Value) any {
		d := req.Get("result")
		if !d.Get("objectStoreNames").Call("contains", browserStore).Bool() {
			d.Call("createObjectStore", browserStore)
		}
		return nil
	})
	defer upgrade.Release()
	req.Set("onupgradeneeded", upgrade)
	return request(req)
}

func askPersist() Persistence {
	nav := js.Global().Get("navigator")
	if !nav.Truthy() {
		return PersistUnknown
	}
	st := nav.Get("storage")
	if !st.Truthy() || !st.Get("persist").Truthy() {
		return PersistUnknown
	}
	v, err := await(st.Call("persist"))
	switch {
	case err != nil:
		return PersistUnknown
	case v.Truthy():
		return PersistGranted
	}
	return PersistDenied
}

func (b *Browser) store(mode string) js.Value {
	return b.db.Call("transaction", browserStore, mode).Call("objectStore", browserStore)
}

const localPrefix = "tubewright/"

// Load implements Backend.
func (b *Browser) Load(name string) ([]byte, error) {
	if err := checkName(name); err != nil {
		return nil, err
	}
	var v js.Value
	if b.db.Truthy() {
		var err error
		if v, err = request(b.store("readonly").Call("get", name)); err != nil {
			return nil, fmt.Errorf("store: reading %s: %w", name, err)
		}
	} else {
		v = b.local.Call("getItem", b.prefix+name)
	}
	if v.IsUndefined() || v.IsNull() {
		return nil, fmt.Errorf("store: %s: %w", name, ErrNotFound)
	}
	return []byte(v.String()), nil
}

// Save implements Backend.
func (b *Browser) Save(name string, data []byte) (err error) {
	if err := checkName(name); err != nil {
		return err
	}
	if !b.db.Truthy() {
		defer func() {
			if r := recover(); r != nil { // a full localStorage throws
				err = fmt.Errorf("store: saving %s: the browser refused it (%v)", name, r)
			}
		}()
		b.local.Call("setItem", b.prefix+name, string(data))
		return nil
	}
	if _, err := request(b.store("readwrite").Call("put", string(data), name)); err != nil {
		return fmt.Errorf("store: saving %s: %w", name, err)
	}
	return nil
}

// Delete implements Backend.
func (b *Browser) Delete(name string) error {
	if err := checkName(name); err != nil {
		return err
	}
	if !b.db.Truthy() {
		b.local.Call("removeItem", b.prefix+name)
		return nil
	}
	_, err := request(b.store("readwrite").Call("delete", name))
	return err
}

// Names implements Backend.
func (b *Browser) Names() ([]string, error) {
	var out []string
	if b.db.Truthy() {
		keys, err := request(b.store("readonly").Call("getAllKeys"))
		if err != nil {
			return nil, err
		}
		for i := 0; i < keys.Length(); i++ {
			out = append(out, keys.Index(i).String())
		}
	} else {
		for i := 0; i < b.local.Length(); i++ {
			k := b.local.Call("key", i).String()
			if n, ok := cutPrefix(k, b.prefix); ok {
				out = append(out, n)
			}
		}
	}
	sort.Strings(out)
	return out, nil
}

func cutPrefix(s, p string) (string, bool) {
	if len(s) >= len(p) && s[:len(p)] == p {
		return s[len(p):], true
	}
	return s, false
}

// Kind implements Backend.
func (b *Browser) Kind() string {
	if b.db.Truthy() {
		return "browser storage (IndexedDB)"
	}
	return "browser storage (localStorage)"
}

// Persistence implements Backend.
func (b *Browser) Persistence() Persistence { return b.persist }
