package ui

import (
	"tubewright/calc/sheet"
)

// keepSide is what an Env holds of the storage: the keeper, the Form of
// each calculator (so the keep bar finds the Form of the screen on top),
// the bars' state and the way files leave and enter the app.
type keepSide struct {
	keeper *Keeper
	forms  map[sheet.ID]*Form
	bars   map[sheet.ID]*keepBar
	porter Porter

	// paths is porter as a PathPorter (nil when it takes no typed path)
	// and pathHint its hint, asked once (see pathPorter): a frame then
	// makes no type assertion, whose runtime cache may allocate.
	paths    PathPorter
	pathHint string
	pathsOK  bool
}

// pathPorter returns the porter as a PathPorter, and the hint of its path
// field, or false when it takes no typed path.
func (ks *keepSide) pathPorter() (PathPorter, string, bool) {
	if !ks.pathsOK {
		ks.pathsOK = true
		ks.paths, _ = ks.porter.(PathPorter)
		ks.pathHint = "Path of the file to import"
		if h, ok := ks.porter.(interface{ PathHint() string }); ok {
			ks.pathHint = h.PathHint()
		}
	}
	return ks.paths, ks.pathHint, ks.paths != nil
}

// keepFor returns env's storage side, starting a memory keeper (nothing
// kept after closing) when the app was given none (tests).
func keepFor(env *Env) *keepSide {
	if env.keep == nil {
		k := NewMemoryKeeper()
		k.SetInvalidate(env.Invalidate)
		env.keep = &keepSide{keeper: k, forms: map[sheet.ID]*Form{}, bars: map[sheet.ID]*keepBar{}, porter: noPorter{}}
	}
	return env.keep
}

// UseKeeper makes k the app's storage and p the way export files leave it
// and import files come in (nil: export and import say they are not
// available). Call it before the first frame: screens built earlier keep
// the memory keeper.
func (a *App) UseKeeper(k *Keeper, p Porter) {
	if p == nil {
		p = noPorter{}
	}
	k.SetInvalidate(a.env.Invalidate)
	a.env.keep = &keepSide{keeper: k, forms: map[sheet.ID]*Form{}, bars: map[sheet.ID]*keepBar{}, porter: p}
}

// Keeper returns the app's storage keeper.
func (a *App) Keeper() *Keeper { return keepFor(a.env).keeper }

// keptAside are input keys the keeper saves but does not put back into a
// Form: a device screen's device belongs to its device editor, which would
// not show a device set behind its back.
var keptAside = map[string]bool{keyDevice: true, keyExample: true}

// formKeep restores a Form's last inputs once the keeper has loaded them
// (unless the user typed first) and remembers them after each change.
type formKeep struct {
	restored bool // the load was seen (inputs applied, or none kept)
	touched  bool // the user changed an input before the load arrived
}

// start registers f with its Env and restores its inputs if they are
// already loaded.
func (fk *formKeep) start(f *Form) {
	keepFor(f.env).forms[f.Sheet.ID] = f
	fk.restore(f)
}

// touch records a change made by the user.
func (fk *formKeep) touch() {
	if !fk.restored {
		fk.touched = true
	}
}

// restore applies the kept inputs the first time they are there and
// reports whether it changed the Form.
func (fk *formKeep) restore(f *Form) bool {
	if fk.restored {
		return false
	}
	k := keepFor(f.env).keeper
	if !k.Loaded() {
		return false
	}
	fk.restored = true
	if fk.touched {
		return false
	}
	t, ok := k.Texts(f.Sheet.ID)
	if !ok {
		return false
	}
	return applyTexts(f, t)
}

// remember hands the Form's texts to the keeper (after the load only, so
// the defaults never overwrite what was kept).
func (fk *formKeep) remember(f *Form) {
	if fk.restored {
		keepFor(f.env).keeper.Remember(f.Sheet.ID, f.Texts())
	}
}

// applyTexts sets f's inputs from texts (by key), skipping unknown keys and
// those kept aside, and reports whether any text changed.
func applyTexts(f *Form, texts map[string]string) bool {
	changed := false
	for i := range f.Sheet.Inputs {
		key := f.Sheet.Inputs[i].Key
		t, ok := texts[key]
		if !ok || keptAside[key] || f.Text(key) == t {
			continue
		}
		f.SetText(key, t)
		changed = true
	}
	return changed
}
