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
	{ID: "resonance", Title: "Tube resonance", Summary: "Frequency from length or length from frequency of a quarter- or half-wave tube, with end corrections, Q and bandwidth", New: newResonanceScreen},
	{ID: "diagnose", Title: "What the pitch says", Summary: "Gas temperature or mixture fraction from a measured resonance frequency, with its ±", New: newDiagnoseScreen},
	{ID: "depths", Title: "Penetration depths", Summary: "Thermal and viscous penetration depths at your gas, temperature, pressure and frequency, with the pore sizes they call for", New: newDepthsScreen},
	{ID: "pores", Title: "Pores and packing", Summary: "Plates, pores, pins, screens, metal wool or honeycomb: porosity, hydraulic radius, Rott's functions and a verdict for a stack or regenerator", New: newPoresScreen},
	{ID: "placement", Title: "Stack placement", Summary: "Where a short stack sits in the standing wave: heat-flux and loss factors, critical temperature difference, gas displacement and exchanger length", New: newPlacementScreen},
	{ID: "onset", Title: "Engine onset", Summary: "Build an engine from parts and find the hot temperature and frequency at which it starts to sing, with profiles and onset against pressure", New: newOnsetScreen},
	{ID: "heatpump", Title: "Heat pump span", Summary: "Build a loudspeaker-driven heat pump from parts: cold temperature, span, acoustic power and COP, and the best drive frequency", New: newHeatPumpScreen},
	{ID: "safety", Title: "Safety pass", Summary: "Walk the checks before pressurising: wall stress, relief, test pressure, stored energy, room oxygen, hearing; save the pass in the bench log", New: newSafetyScreen},
	{ID: "benchlog", Title: "Bench log", Summary: "Saved safety passes with date and time, exported as text", New: newBenchLogScreen},
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
