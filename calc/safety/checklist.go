package safety

// Calculator names the inline calculator of a checklist item, where a
// number decides the item.
type Calculator int

// The inline calculators.
const (
	NoCalculator   Calculator = iota
	CalcWallStress            // wall stresses, UG-27 thickness and MAWP
	CalcRelief                // relief set pressure against the MAWP
	CalcTestEnergy            // reference test pressures and stored energy
	CalcCylinder              // cylinder contents as free gas
	CalcOxygen                // room oxygen after a full release
	CalcSound                 // sound level against hearing limits
)

// Item is one step of the safety pass: what to check, why, and which
// calculator (if any) gives the number that decides it. The words are our
// own.
type Item struct {
	ID       string     // stable key used in the bench log
	Title    string     // what to check, as an imperative or a state
	Why      string     // one or two sentences on why it matters
	Calc     Calculator // NoCalculator when no number decides it
	Cautions []string   // specific cautions shown with the item (the general one is always shown)
}

// Checklist returns the items of the safety pass in the order they are
// walked, a fresh copy each call.
func Checklist() []Item {
	return []Item{
		{ID: "rating", Title: "Vessel rating and markings known",
			Why: "You need the maximum allowable working pressure and temperature the vessel was built for before any other number here means anything. Unmarked tube or a home-made vessel has no rating until someone qualified gives it one."},
		{ID: "wall-stress", Title: "Wall stress checked at the hot-end temperature",
			Why:  "Steel and especially copper and aluminium lose strength as they heat up, so the wall must be checked with the allowable stress at the hottest part of the shell, not at room temperature.",
			Calc: CalcWallStress, Cautions: []string{CautionStress, CautionHotSurfaces}},
		{ID: "relief", Title: "Relief device set at or below the MAWP",
			Why:  "A regulator can fail open and a heated, closed volume rises in pressure. A relief valve or bursting disc that opens at or below the MAWP is what keeps a fault from becoming a rupture.",
			Calc: CalcRelief, Cautions: []string{CautionReliefSizing}},
		{ID: "test-pressure", Title: "Pressure test done or planned (liquid preferred)",
			Why:  "A proof test above the working pressure finds weak joints before the gas goes in. A liquid test stores little energy; a gas test at the same pressure stores enough to turn a failure into a blast.",
			Calc: CalcTestEnergy, Cautions: []string{CautionTestPressure, CautionStoredEnergy}},
		{ID: "fittings", Title: "Fittings, windows, feedthroughs and driver housings rated for the pressure",
			Why: "The tube is rarely the weak part: windows, electrical feedthroughs, thermocouple glands, valves and the housing of the loudspeaker or transducer fail first. Each needs a rating at or above the MAWP and the temperature it sees."},
		{ID: "leak-check", Title: "Leak check at low pressure first",
			Why: "Fill to a small fraction of the working pressure and check every joint with leak solution or a detector before going higher. A leak found at 2 bar is a nuisance; at 30 bar it can be a jet that cuts skin."},
		{ID: "cylinder", Title: "Gas cylinder secured and regulated",
			Why:  "A falling cylinder can snap its valve off and become a projectile. Chain it upright, use a regulator rated for the cylinder pressure and set it no higher than the rig's MAWP.",
			Calc: CalcCylinder, Cautions: []string{CautionCylinder}},
		{ID: "oxygen", Title: "Room oxygen after a full release checked",
			Why:  "If the vessel and the cylinder empty into the room, the gas displaces air. Below 19.5 % oxygen people lose judgement without noticing; much lower, they collapse.",
			Calc: CalcOxygen, Cautions: []string{CautionAsphyxiation}},
		{ID: "hearing", Title: "Hearing protection against the expected sound",
			Why:  "Resonators run at very high sound levels inside. What leaks out of open ends, loudspeaker housings and gaps can exceed occupational limits; measure it where people stand.",
			Calc: CalcSound, Cautions: []string{CautionHearing}},
		{ID: "hot-surfaces", Title: "Hot surfaces guarded and marked",
			Why:      "The hot end and heater run at several hundred degrees and stay hot long after switch-off. Guard them against touch and keep flammable material away.",
			Cautions: []string{CautionHotSurfaces}},
		{ID: "depressurise", Title: "Depressurise before any mechanical work",
			Why: "Never loosen a fitting, flange or bolt on a vessel under pressure. Vent to atmosphere, confirm zero on the gauge, then work."},
	}
}

// Pass is the state of one walk through the checklist: a tick and a note
// per item, in Checklist order.
type Pass struct {
	Items []Item
	Done  []bool
	Notes []string
}

// NewPass returns a pass over Checklist with nothing ticked.
func NewPass() *Pass {
	items := Checklist()
	return &Pass{Items: items, Done: make([]bool, len(items)), Notes: make([]string, len(items))}
}

// Ticked returns how many items are ticked.
func (p *Pass) Ticked() int {
	n := 0
	for _, d := range p.Done {
		if d {
			n++
		}
	}
	return n
}

// Complete reports whether every item is ticked.
func (p *Pass) Complete() bool { return p.Ticked() == len(p.Items) }

// Open returns the indexes of the items not yet ticked, in order.
func (p *Pass) Open() []int {
	var out []int
	for i, d := range p.Done {
		if !d {
			out = append(out, i)
		}
	}
	return out
}

// Reset clears every tick and note.
func (p *Pass) Reset() {
	for i := range p.Done {
		p.Done[i] = false
		p.Notes[i] = ""
	}
}
