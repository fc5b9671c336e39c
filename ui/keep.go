package ui

import (
	"errors"
	"fmt"
	"sync"
	"sync/atomic"
	"time"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// Keeper is the app's storage worker. The UI goroutine never waits on
// storage: it hands the keeper the last inputs of a calculator (Remember)
// or a change of the library (Do) and goes on; one goroutine of the
// keeper's own opens the back end, loads, and writes, in order. Remembered
// inputs are coalesced and written after a quiet spell (debounce), library
// changes at once. What the UI reads (Library, Texts, Status) is a snapshot
// the worker publishes when it is done, followed by a call to invalidate
// so the window draws it.
//
// The last inputs of every calculator are kept in a document of their own,
// "inputs" (see keptInputs), not in the library: typing must not rewrite the
// user's setups and log a few times a second, and a damaged inputs document
// costs only the starting values. Named setups, devices and the log are the
// store's library document, changed through a store.Shelf.
type Keeper struct {
	open       func() (store.Backend, error)
	debounce   time.Duration
	invalidate atomic.Pointer[func()]

	wake   chan struct{}
	loaded chan struct{}

	mu       sync.Mutex
	ops      []keepOp
	inputs   map[sheet.ID]map[string]string
	dirty    bool      // inputs changed since the last write
	changed  time.Time // when inputs last changed
	flushes  []chan struct{}
	backend  store.Backend
	shelf    *store.Shelf
	lib      *store.Library
	damaged  *store.DamagedLibrary
	status   keepStatus
	loadErr  error
	inputErr error // why the last inputs could not be read or written
	version  uint64

	settings      keptSettings // the app settings (the chosen theme)
	settingsDirty bool         // settings changed since the last write
	settingsErr   error        // why the settings could not be read or written
}

// keepOp is a change of the library run on the worker.
type keepOp struct {
	what string
	run  func(s *store.Shelf) (keepStatus, error)
}

// keepStatus is the last thing the keeper has to say: what was done, or
// why it failed, and a follow-up the user may choose (Undo after a delete,
// Replace after a name already in use).
type keepStatus struct {
	Text string
	Bad  bool
	// Action labels the follow-up button ("Undo"); "" for none.
	Action string
	// Then is the follow-up, queued like any change when chosen.
	Then func(s *store.Shelf) (keepStatus, error)
	// Seq counts statuses, so a screen can tell a new one from an old one.
	Seq uint64
}

// keepDebounce is how long typing must pause before the inputs are written.
const keepDebounce = 600 * time.Millisecond

// NewKeeper returns a keeper whose worker opens its back end with open
// (which may block: in the browser it waits for IndexedDB) and loads the
// library and the last inputs. The worker starts at once.
func NewKeeper(open func() (store.Backend, error)) *Keeper {
	k := &Keeper{open: open, debounce: keepDebounce, wake: make(chan struct{}, 1), loaded: make(chan struct{}),
		inputs: map[sheet.ID]map[string]string{}}
	k.SetInvalidate(nil)
	go k.run()
	return k
}

// NewMemoryKeeper returns a keeper on a fresh memory back end: nothing
// survives the app (tests, and an app started without storage).
func NewMemoryKeeper() *Keeper {
	m := store.NewMemory()
	return NewKeeper(func() (store.Backend, error) { return m, nil })
}

// SetInvalidate sets what the keeper calls when it has something new to
// show (nil: nothing). Safe from any goroutine.
func (k *Keeper) SetInvalidate(f func()) {
	if f == nil {
		f = func() {}
	}
	k.invalidate.Store(&f)
}

func (k *Keeper) notify() { (*k.invalidate.Load())() }

// poke wakes the worker.
func (k *Keeper) poke() {
	select {
	case k.wake <- struct{}{}:
	default:
	}
}

// WaitLoaded waits at most d for the first load and reports whether it is
// done. The desktop app calls it before its first frame, where files load
// in a moment; never call it inside a frame.
func (k *Keeper) WaitLoaded(d time.Duration) bool {
	select {
	case <-k.loaded:
		return true
	case <-time.After(d):
		return false
	}
}

// Loaded reports whether the first load is done (without waiting).
func (k *Keeper) Loaded() bool {
	select {
	case <-k.loaded:
		return true
	default:
		return false
	}
}

// Flush waits until every queued change and the remembered inputs are
// written (ignoring the debounce). For tests and for closing the app; never
// inside a frame.
func (k *Keeper) Flush() {
	done := make(chan struct{})
	k.mu.Lock()
	k.flushes = append(k.flushes, done)
	k.mu.Unlock()
	k.poke()
	<-done
}

// Texts returns the last inputs kept for calculator id (false before the
// load or when none were kept).
func (k *Keeper) Texts(id sheet.ID) (map[string]string, bool) {
	if !k.Loaded() {
		return nil, false
	}
	k.mu.Lock()
	defer k.mu.Unlock()
	t, ok := k.inputs[id]
	if !ok {
		return nil, false
	}
	return copyTexts(t), true
}

// Remember records the inputs of calculator id, to be written after the
// debounce. Texts equal to those kept change nothing. Before the first load
// it does nothing: the load would otherwise be written over.
func (k *Keeper) Remember(id sheet.ID, texts map[string]string) {
	if !k.Loaded() {
		return
	}
	k.mu.Lock()
	if sameTexts(k.inputs[id], texts) {
		k.mu.Unlock()
		return
	}
	k.inputs[id] = copyTexts(texts)
	k.dirty, k.changed = true, time.Now()
	k.mu.Unlock()
	k.poke()
}

// Do queues a change of the library: run is called on the worker with the
// shelf; what names it in an error message ("Saving the setup failed: …").
func (k *Keeper) Do(what string, run func(s *store.Shelf) (keepStatus, error)) {
	k.mu.Lock()
	k.ops = append(k.ops, keepOp{what: what, run: run})
	k.mu.Unlock()
	k.poke()
}

// Library returns the library as last written (nil before the load or when
// no storage could be opened). The caller must not change it.
func (k *Keeper) Library() *store.Library {
	k.mu.Lock()
	defer k.mu.Unlock()
	return k.lib
}

// Version counts the library snapshots published.
func (k *Keeper) Version() uint64 {
	k.mu.Lock()
	defer k.mu.Unlock()
	return k.version
}

// Status returns the last thing the keeper has to say.
func (k *Keeper) Status() keepStatus {
	k.mu.Lock()
	defer k.mu.Unlock()
	return k.status
}

// Damaged returns the damaged library document, or nil.
func (k *Keeper) Damaged() *store.DamagedLibrary {
	k.mu.Lock()
	defer k.mu.Unlock()
	return k.damaged
}

// Problems returns what went wrong opening or loading the storage and
// reading or writing the last inputs or the app settings (nil when
// nothing did).
func (k *Keeper) Problems() []error {
	k.mu.Lock()
	defer k.mu.Unlock()
	var out []error
	if k.loadErr != nil {
		out = append(out, k.loadErr)
	}
	if k.inputErr != nil {
		out = append(out, k.inputErr)
	}
	if k.settingsErr != nil {
		out = append(out, k.settingsErr)
	}
	return out
}

// Where says where the work is kept and whether the browser promised to
// keep it (ok false before the load or without storage).
func (k *Keeper) Where() (kind string, persist store.Persistence, ok bool) {
	k.mu.Lock()
	defer k.mu.Unlock()
	if k.backend == nil {
		return "", store.PersistUnknown, false
	}
	return k.backend.Kind(), k.backend.Persistence(), true
}

// InMemory reports whether the work lives only in memory (a memory back
// end: nothing survives closing the app).
func (k *Keeper) InMemory() bool {
	k.mu.Lock()
	defer k.mu.Unlock()
	_, mem := k.backend.(*store.Memory)
	return mem
}

// run is the worker: load, then write changes as they come.
func (k *Keeper) run() {
	k.load()
	close(k.loaded)
	k.notify()
	for {
		<-k.wake
		for k.step() {
		}
	}
}

// step does what is pending and reports whether to look again at once.
func (k *Keeper) step() bool {
	k.mu.Lock()
	ops := k.ops
	k.ops = nil
	flushes := k.flushes
	k.flushes = nil
	dirty, due := k.dirty, k.changed.Add(k.debounce)
	k.mu.Unlock()
	for _, op := range ops {
		k.apply(op)
	}
	k.writeSettings()
	switch {
	case dirty && (len(flushes) > 0 || !time.Now().Before(due)):
		k.writeInputs()
	case dirty:
		// Wait out the quiet spell, unless something else arrives first.
		t := time.NewTimer(time.Until(due))
		select {
		case <-t.C:
		case <-k.wake:
			t.Stop()
		}
		return true
	}
	for _, f := range flushes {
		close(f)
	}
	k.mu.Lock()
	more := len(k.ops) > 0 || len(k.flushes) > 0
	k.mu.Unlock()
	return more
}

// load opens the back end and reads the library and the last inputs.
func (k *Keeper) load() {
	b, err := k.open()
	if err != nil {
		k.mu.Lock()
		k.loadErr = fmt.Errorf("your work cannot be kept on this device: %v", err)
		k.mu.Unlock()
		return
	}
	shelf, err := store.OpenShelf(b)
	inputs, inErr := loadInputs(b)
	settings, setErr := loadSettings(b)
	k.mu.Lock()
	defer k.mu.Unlock()
	k.backend = b
	k.inputErr = inErr
	k.settingsErr = setErr
	if !k.settingsDirty {
		// A theme chosen before the load wins; it is written next.
		k.settings = settings
	}
	for id, t := range inputs {
		k.inputs[id] = t
	}
	if err != nil {
		k.loadErr = fmt.Errorf("your saved setups and log could not be read: %v", err)
		return
	}
	k.shelf = shelf
	k.damaged = shelf.Damaged()
	k.lib = shelf.Library()
	k.version++
}

// apply runs one library change and publishes the result.
func (k *Keeper) apply(op keepOp) {
	k.mu.Lock()
	shelf := k.shelf
	k.mu.Unlock()
	var st keepStatus
	var err error
	if shelf == nil {
		err = errors.New("no storage could be opened")
	} else {
		st, err = op.run(shelf)
	}
	if err != nil {
		st = keepStatus{Text: op.what + " failed: " + err.Error(), Bad: true}
	}
	k.mu.Lock()
	st.Seq = k.status.Seq + 1
	k.status = st
	if shelf != nil {
		k.lib = shelf.Library()
		k.damaged = shelf.Damaged()
		k.version++
	}
	k.mu.Unlock()
	k.notify()
}

// writeInputs writes the remembered inputs; a failure is kept to be shown
// and the inputs stay pending for the next change.
func (k *Keeper) writeInputs() {
	k.mu.Lock()
	b := k.backend
	data, err := marshalInputs(k.inputs)
	k.dirty = false
	k.mu.Unlock()
	if b == nil {
		return
	}
	if err == nil {
		err = b.Save(inputsDoc, data)
	}
	k.mu.Lock()
	if err != nil {
		k.inputErr = fmt.Errorf("your last inputs could not be saved: %v", err)
		k.dirty = true
	} else if k.inputErr != nil && !errors.Is(k.inputErr, errInputsSetAside) {
		k.inputErr = nil
	}
	k.mu.Unlock()
	k.notify()
}

func copyTexts(m map[string]string) map[string]string {
	c := make(map[string]string, len(m))
	for k, v := range m {
		c[k] = v
	}
	return c
}

func sameTexts(a, b map[string]string) bool {
	if a == nil || len(a) != len(b) {
		return false
	}
	for k, v := range a {
		if w, ok := b[k]; !ok || w != v {
			return false
		}
	}
	return true
}
