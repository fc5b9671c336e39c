//go:build js && wasm

package main

import (
	"errors"
	"fmt"
	"syscall/js"

	"gioui.org/app"
	"gioui.org/io/event"

	"tubewright/ui"
	"tubewright/ui/store"
)

// openStorage keeps the user's work in the browser's IndexedDB (local
// storage where IndexedDB is refused) and asks the browser to keep it. The
// keeper opens it on its own goroutine: every call waits for the browser,
// which must never happen while a frame is handled.
// The window's events need no listener here (listen does nothing).
func openStorage(*app.Window) (*ui.Keeper, ui.Porter, func(event.Event)) {
	k := ui.NewKeeper(func() (store.Backend, error) { return store.NewBrowser() })
	// A phone hides the page before it closes it: write the last inputs
	// then, without waiting for the pause after typing. (Flush blocks, so
	// it runs on its own goroutine, never in the browser's event handler.)
	onHide := js.FuncOf(func(js.Value, []js.Value) any {
		if js.Global().Get("document").Get("visibilityState").String() == "hidden" {
			go k.Flush()
		}
		return nil
	})
	js.Global().Get("document").Call("addEventListener", "visibilitychange", onHide)
	return k, browserPorter{}, func(event.Event) {}
}

// closeStorage does nothing in the browser: changes are written as they
// come (the inputs after a short pause).
func closeStorage(*ui.Keeper) {}

// browserPorter exports through a download and imports through the
// browser's file picker.
type browserPorter struct{}

// Export implements ui.Porter: a Blob of the data, downloaded by a click on
// a hidden link.
func (browserPorter) Export(name string, data []byte) (string, error) {
	doc := js.Global().Get("document")
	arr := js.Global().Get("Uint8Array").New(len(data))
	js.CopyBytesToJS(arr, data)
	blob := js.Global().Get("Blob").New([]any{arr}, map[string]any{"type": "application/json"})
	url := js.Global().Get("URL").Call("createObjectURL", blob)
	a := doc.Call("createElement", "a")
	a.Set("href", url)
	a.Set("download", name)
	a.Get("style").Set("display", "none")
	doc.Get("body").Call("appendChild", a)
	a.Call("click")
	a.Call("remove")
	var revoke js.Func
	revoke = js.FuncOf(func(js.Value, []js.Value) any {
		js.Global().Get("URL").Call("revokeObjectURL", url)
		revoke.Release()
		return nil
	})
	js.Global().Call("setTimeout", revoke, 60000)
	return "downloaded as " + name, nil
}

// Import implements ui.Porter: an <input type=file> is clicked and the
// chosen file read whole; closing the picker is ErrCancelled.
func (browserPorter) Import() ([]byte, error) {
	doc := js.Global().Get("document")
	in := doc.Call("createElement", "input")
	in.Set("type", "file")
	in.Set("accept", ".json,application/json")
	in.Get("style").Set("display", "none")
	doc.Get("body").Call("appendChild", in)
	defer in.Call("remove")
	type answer struct {
		data []byte
		err  error
	}
	ch := make(chan answer, 1)
	var onChange, onCancel, onData, onFail js.Func
	onChange = js.FuncOf(func(js.Value, []js.Value) any {
		files := in.Get("files")
		if files.Length() == 0 {
			ch <- answer{err: ui.ErrCancelled}
			return nil
		}
		f := files.Index(0)
		if size := f.Get("size").Int(); size > store.MaxLibraryBytes {
			ch <- answer{err: fmt.Errorf("the file is %d bytes, more than the %d MB a library may have", size, store.MaxLibraryBytes>>20)}
			return nil
		}
		f.Call("arrayBuffer").Call("then", onData, onFail)
		return nil
	})
	onCancel = js.FuncOf(func(js.Value, []js.Value) any {
		ch <- answer{err: ui.ErrCancelled}
		return nil
	})
	onData = js.FuncOf(func(_ js.Value, args []js.Value) any {
		u := js.Global().Get("Uint8Array").New(args[0])
		b := make([]byte, u.Length())
		js.CopyBytesToGo(b, u)
		ch <- answer{data: b}
		return nil
	})
	onFail = js.FuncOf(func(_ js.Value, args []js.Value) any {
		msg := "the file could not be read"
		if len(args) > 0 {
			msg += ": " + args[0].Call("toString").String()
		}
		ch <- answer{err: errors.New(msg)}
		return nil
	})
	defer onChange.Release()
	defer onCancel.Release()
	defer onData.Release()
	defer onFail.Release()
	in.Call("addEventListener", "change", onChange)
	in.Call("addEventListener", "cancel", onCancel)
	in.Call("click")
	a := <-ch
	return a.data, a.err
}
