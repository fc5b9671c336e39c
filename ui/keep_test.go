package ui

import (
	"errors"
	"image"
	"strings"
	"sync"
	"testing"
	"time"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// keepApp is an app on the keeper k, driven through the input router at
// phone size, with calculator id open.
func keepApp(t *testing.T, k *Keeper, id sheet.ID) (*App, *harness) {
	t.Helper()
	a := NewApp(nil)
	a.UseKeeper(k, nil)
	a.Open(id)
	h := newHarness(t, image.Pt(412, 915), a.Layout)
	return a, h
}

// on returns a keeper opening the back end b.
func on(b store.Backend) *Keeper {
	return NewKeeper(func() (store.Backend, error) { return b, nil })
}

// settle writes what is pending and lays out until the app shows it.
func settle(h *harness, k *Keeper) {
	k.Flush()
	h.frames(3)
}

// TestKeeperRestoresInputs types into a calculator, closes the app, and
// finds the text again in a new app on the same storage.
func TestKeeperRestoresInputs(t *testing.T) {
	mem := store.NewMemory()
	k := on(mem)
	if !k.WaitLoaded(5 * time.Second) {
		t.Fatal("memory keeper did not load")
	}
	a, h := keepApp(t, k, sheet.IDGas)
	f := keepFor(a.env).forms[sheet.IDGas]
	h.retype("Temperature", f.Text("temperature"), "350 K")
	if got := f.Text("temperature"); got != "350 K" {
		t.Fatalf("typed 350 K, field holds %q", got)
	}
	k.Flush()
	data, err := mem.Load(inputsDoc)
	if err != nil || !strings.Contains(string(data), `"350 K"`) {
		t.Fatalf("inputs document after typing: %v\n%s", err, data)
	}
	// A new app on the same storage starts with the typed text.
	k2 := on(mem)
	k2.WaitLoaded(5 * time.Second)
	a2, h2 := keepApp(t, k2, sheet.IDGas)
	h2.frames(2)
	if got := keepFor(a2.env).forms[sheet.IDGas].Text("temperature"); got != "350 K" {
		t.Fatalf("restored temperature %q, want 350 K", got)
	}
}

// gate is a back end whose opening waits until released (a slow browser).
type gate struct {
	release chan struct{}
	b       store.Backend
}

func (g *gate) open() (store.Backend, error) { <-g.release; return g.b, nil }

// TestKeeperLateLoad starts the app before the storage answers: the form
// shows its defaults, then the kept inputs when they arrive; a field the
// user typed into meanwhile is left alone, and nothing is written before
// the load.
func TestKeeperLateLoad(t *testing.T) {
	mem := store.NewMemory()
	seed := on(mem)
	seed.WaitLoaded(5 * time.Second)
	seed.Remember(sheet.IDGas, map[string]string{"gas": "argon", "temperature": "400 K", "pressure": "5 bar", "non-ideal": "false"})
	seed.Flush()

	for _, typeFirst := range []bool{false, true} {
		g := &gate{release: make(chan struct{}), b: mem}
		k := NewKeeper(g.open)
		a, h := keepApp(t, k, sheet.IDGas)
		f := keepFor(a.env).forms[sheet.IDGas]
		if f.Text("temperature") == "400 K" {
			t.Fatal("restored before the storage answered")
		}
		if typeFirst {
			h.retype("Temperature", f.Text("temperature"), "310 K")
		}
		close(g.release)
		k.WaitLoaded(5 * time.Second)
		h.frames(3)
		want := "400 K"
		if typeFirst {
			want = "310 K"
		}
		if got := f.Text("temperature"); got != want {
			t.Errorf("typed first %v: temperature %q, want %q", typeFirst, got, want)
		}
		if got := f.Text("pressure"); !typeFirst && got != "5 bar" {
			t.Errorf("pressure %q, want 5 bar", got)
		}
	}
}

// failing is a back end that loads nothing and refuses every write.
type failing struct{ store.Memory }

func (*failing) Save(string, []byte) error { return errors.New("disk full") }
func (*failing) Load(name string) ([]byte, error) {
	return nil, store.ErrNotFound
}

// TestKeeperFailingBackend shows a storage that refuses writes, or cannot be
// opened at all, as an error on screen; nothing crashes and the calculator
// goes on working.
func TestKeeperFailingBackend(t *testing.T) {
	t.Run("writes refused", func(t *testing.T) {
		k := on(&failing{})
		k.WaitLoaded(5 * time.Second)
		a, h := keepApp(t, k, sheet.IDGas)
		f := keepFor(a.env).forms[sheet.IDGas]
		h.retype("Temperature", f.Text("temperature"), "320 K")
		settle(h, k)
		if ps := k.Problems(); len(ps) != 1 || !strings.Contains(ps[0].Error(), "disk full") {
			t.Errorf("problems %v, want the refused write", ps)
		}
		h.tap("Log result")
		settle(h, k)
		msg, ok := h.shown("Saved work status")
		if !ok || !strings.Contains(msg, "failed") || !strings.Contains(msg, "disk full") {
			t.Errorf("status after a refused log: %q (shown %v)", msg, ok)
		}
		if f.Result() == nil {
			t.Error("the calculator stopped giving results")
		}
		a.Open(sheet.IDSaved)
		h.frames(2)
		if p, ok := h.shown("Storage problem"); !ok || !strings.Contains(p, "disk full") {
			t.Errorf("Saved work page shows %q (%v), want the refused write", p, ok)
		}
	})
	t.Run("no storage", func(t *testing.T) {
		k := NewKeeper(func() (store.Backend, error) { return nil, errors.New("IndexedDB refused") })
		k.WaitLoaded(5 * time.Second)
		a, h := keepApp(t, k, sheet.IDGas)
		h.tap("Setups")
		h.retype("Setup name", "", "rig")
		h.tap("Save as")
		settle(h, k)
		if msg, _ := h.shown("Saved work status"); !strings.Contains(msg, "no storage could be opened") {
			t.Errorf("status %q, want that no storage could be opened", msg)
		}
		a.Open(sheet.IDSaved)
		h.frames(2)
		if p, ok := h.shown("Storage problem"); !ok || !strings.Contains(p, "IndexedDB refused") {
			t.Errorf("Saved work page shows %q (%v)", p, ok)
		}
	})
}

// TestKeeperDamagedLibrary reports a damaged library on the Saved work
// page, never writes over it, and sets it aside on request.
func TestKeeperDamagedLibrary(t *testing.T) {
	mem := store.NewMemory()
	raw := []byte(`{"format":"tubewright-library","version":1,"setups":[{"name":`)
	if err := mem.Save("library", raw); err != nil {
		t.Fatal(err)
	}
	k := on(mem)
	k.WaitLoaded(5 * time.Second)
	a, h := keepApp(t, k, sheet.IDGas)
	h.tap("Log result")
	settle(h, k)
	if got, _ := mem.Load("library"); string(got) != string(raw) {
		t.Fatalf("the damaged library was written over: %s", got)
	}
	a.Open(sheet.IDSaved)
	h.frames(2)
	if msg, ok := h.shown("Damaged library"); !ok || !strings.Contains(msg, "could not be read") {
		t.Fatalf("damaged library shown as %q (%v)", msg, ok)
	}
	h.tap("Set it aside, start afresh")
	settle(h, k)
	if k.Damaged() != nil {
		t.Fatal("still damaged after setting aside")
	}
	names, _ := mem.Names()
	kept := false
	for _, n := range names {
		if strings.HasPrefix(n, "library-damaged-") {
			b, _ := mem.Load(n)
			kept = string(b) == string(raw)
		}
	}
	if !kept {
		t.Errorf("the damaged bytes were not kept; documents %v", names)
	}
}

// porterFake keeps what was exported and hands it back on import.
type porterFake struct {
	mu   sync.Mutex
	data []byte
	name string
}

func (p *porterFake) Export(name string, data []byte) (string, error) {
	p.mu.Lock()
	defer p.mu.Unlock()
	p.name, p.data = name, append([]byte(nil), data...)
	return "kept by the test", nil
}

func (p *porterFake) Import() ([]byte, error) {
	p.mu.Lock()
	defer p.mu.Unlock()
	if p.data == nil {
		return nil, ErrCancelled
	}
	return p.data, nil
}

// waitFor lays out until cond holds (background work arriving), at most 5 s.
func waitFor(t *testing.T, h *harness, k *Keeper, cond func() bool) {
	t.Helper()
	for end := time.Now().Add(5 * time.Second); time.Now().Before(end); time.Sleep(10 * time.Millisecond) {
		settle(h, k)
		if cond() {
			return
		}
	}
	t.Fatalf("gave up waiting; screen:\n%s", h.dump())
}
