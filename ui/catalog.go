package ui

import "tubewright/calc/sheet"

// Entry is one line of the app's catalog: a screen's stable ID (also used
// in screenshot file names), its title and one-line summary, and the
// constructor that builds it once.
type Entry struct {
	ID      sheet.ID
	Title   string
	Summary string
	New     func(env *Env) Screen
}

// extras are the screens that add something to their calculator's
// description (plots, the device editor, the guided safety steps), or that
// are not one calculator. Every other calculator of the catalog gets the
// plain screen built from its description.
var extras = map[sheet.ID]func(env *Env) Screen{
	sheet.IDResonance: newResonanceScreen,
	sheet.IDDiagnose:  newDiagnoseScreen,
	sheet.IDPores:     newPoresScreen,
	sheet.IDOnset:     newOnsetScreen,
	sheet.IDHeatPump:  newHeatPumpScreen,
	sheet.IDDesign:    newDesignScreen,
	sheet.IDListen:    newListenScreen,
	sheet.IDSafety:    newSafetyScreen,
	sheet.IDBenchLog:  newBenchLogScreen,
	sheet.IDSaved:     newSavedScreen,
}

// catalog lists the app's screens in the order of the one catalog in
// calc/sheet.
var catalog = appCatalog()

func appCatalog() []Entry {
	var out []Entry
	for _, e := range sheet.Catalog() {
		if e.Place&sheet.InApp == 0 {
			continue
		}
		build := extras[e.ID]
		if build == nil && e.Sheet != nil {
			build = newSheetScreen(e.Sheet)
		}
		if build == nil {
			panic("ui: no screen for catalog entry " + string(e.ID))
		}
		out = append(out, Entry{ID: e.ID, Title: e.Title, Summary: e.Summary, New: build})
	}
	return out
}

// Catalog returns a copy of the catalog table.
func Catalog() []Entry {
	return append([]Entry(nil), catalog...)
}

// lookupEntry finds a catalog entry by ID.
func lookupEntry(id sheet.ID) (Entry, bool) {
	for _, e := range catalog {
		if e.ID == id {
			return e, true
		}
	}
	return Entry{}, false
}
