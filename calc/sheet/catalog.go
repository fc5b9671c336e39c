package sheet

// ID identifies a calculator or an app page: the terminal command name and
// the screen's identifier (also used in screenshot file names).
type ID string

// The identifiers of the catalog, in one place.
const (
	IDGas       ID = "gas"
	IDResonance ID = "resonance"
	IDDiagnose  ID = "diagnose"
	IDDepths    ID = "depths"
	IDPores     ID = "pores"
	IDPlacement ID = "placement"
	IDOnset     ID = "onset"
	IDHeatPump  ID = "heatpump"
	IDVessel    ID = "vessel"
	IDEnergy    ID = "energy"
	IDOxygen    ID = "oxygen"
	IDSPL       ID = "spl"
	IDSafety    ID = "safety"
	IDBenchLog  ID = "benchlog"
	IDSaved     ID = "saved"
)

// Place says where a catalog entry appears.
type Place int

// The places; an entry may be in both.
const (
	InApp Place = 1 << iota
	InTerminal
	Everywhere = InApp | InTerminal
)

// Entry is one line of the catalog: a calculator (Sheet set) or an app page
// that is not one calculator (the guided safety pass, the bench log).
type Entry struct {
	ID      ID
	Title   string
	Summary string
	Sheet   *Sheet
	Place   Place
}

// catalog is the one table of calculators and pages, in the order the app
// shows them and the terminal lists them. Adding a calculator adds one line.
var catalog = []Entry{
	{ID: IDGas, Sheet: gasSheet, Place: Everywhere},
	{ID: IDResonance, Sheet: resonanceSheet, Place: Everywhere},
	{ID: IDDiagnose, Sheet: diagnoseSheet, Place: Everywhere},
	{ID: IDDepths, Sheet: depthsSheet, Place: Everywhere},
	{ID: IDPores, Sheet: poresSheet, Place: Everywhere},
	{ID: IDPlacement, Sheet: placementSheet, Place: Everywhere},
	{ID: IDOnset, Sheet: onsetSheet, Place: Everywhere},
	{ID: IDHeatPump, Sheet: heatPumpSheet, Place: Everywhere},
	{ID: IDDesign, Sheet: designSheet, Place: Everywhere},
	{ID: IDSafety, Title: "Safety pass", Summary: "Walk the checks before pressurising: wall stress, relief, test pressure, stored energy, room oxygen, hearing; save the pass in the bench log", Place: InApp},
	{ID: IDVessel, Sheet: vesselSheet, Place: InTerminal},
	{ID: IDEnergy, Sheet: energySheet, Place: InTerminal},
	{ID: IDOxygen, Sheet: oxygenSheet, Place: InTerminal},
	{ID: IDSPL, Sheet: splSheet, Place: InTerminal},
	{ID: IDListen, Sheet: listenSheet, Place: Everywhere},
	{ID: IDBenchLog, Title: "Bench log", Summary: "Saved safety passes with date and time, exported as text", Place: InApp},
	{ID: IDSaved, Title: "Saved work", Summary: "Your named setups and logged results; export everything to a file, import one", Place: InApp},
}

// Catalog returns the entries in order; an entry with a Sheet takes its
// title and summary from it.
func Catalog() []Entry {
	out := make([]Entry, len(catalog))
	for i, e := range catalog {
		if e.Sheet != nil {
			e.Title, e.Summary = e.Sheet.Title, e.Sheet.Summary
		}
		out[i] = e
	}
	return out
}

// Lookup returns the sheet of calculator id.
func Lookup(id ID) (*Sheet, bool) {
	for _, e := range catalog {
		if e.ID == id && e.Sheet != nil {
			return e.Sheet, true
		}
	}
	return nil, false
}
