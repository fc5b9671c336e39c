package ui

// Entry is one line of the catalog: a screen's stable ID (also used in
// screenshot file names), its title and a one-line summary in plain words,
// and the constructor that builds it once.
type Entry struct {
	ID      string
	Title   string
	Summary string
	New     func(env *Env) Screen
}

// catalog lists the calculators in the order the app shows them. One line
// per screen; each screen's author adds only their own line.
var catalog = []Entry{
	{ID: "gas", Title: "Working gas", Summary: "Density, sound speed, viscosity, conductivity and Prandtl number of a gas or noble-gas mixture at your temperature and pressure", New: newGasScreen},
}

// Catalog returns a copy of the catalog table.
func Catalog() []Entry {
	return append([]Entry(nil), catalog...)
}

// lookupEntry finds a catalog entry by ID.
func lookupEntry(id string) (Entry, bool) {
	for _, e := range catalog {
		if e.ID == id {
			return e, true
		}
	}
	return Entry{}, false
}
