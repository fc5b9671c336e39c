package main

import (
	"fmt"
	"sort"
	"strconv"
	"strings"

	"tubewright/calc/sheet"
	"tubewright/ui/store"
)

// The commands that read and write the app's export file (a library of
// named setups, devices and logged results, of our own format):
//
//	twcalc setups FILE           lists the named setups
//	twcalc log FILE [N]          lists the log, or shows entry N
//	twcalc run FILE NAME [--json] runs a saved setup
//
// and the flags --log-to FILE and --note TEXT of every calculator, which add
// its result to the file's log.
var libraryCommands = []command{
	{"setups", "list the named setups in an export file of the app", runSetups},
	{"log", "list the logged results in an export file of the app, or show one", runLog},
	{"run", "run a named setup from an export file of the app", runSavedSetup},
}

// readLibrary reads an export file; every problem is a usage error naming
// the file.
func readLibrary(path string, missingOK bool) (*store.Library, error) {
	lib, err := store.ReadLibraryFile(path, missingOK)
	if err != nil {
		return nil, &usageError{msg: fmt.Sprintf("%s: %v", quoteValue(path), err)}
	}
	return lib, nil
}

func runSetups(all []string) (*report, error) {
	args := withoutJSON(all)
	if len(args) != 1 || strings.HasPrefix(args[0], "-") {
		return nil, helpOrUsage(all, "usage: twcalc setups FILE [--json]\n\nLists the named setups of an export file of the app; --json prints one JSON object.\n")
	}
	lib, err := readLibrary(args[0], false)
	if err != nil {
		return nil, err
	}
	r := newReport()
	r.input("file", args[0])
	for _, s := range lib.Setups {
		r.addObjectShown(s.Name, s, s.Calculator+", saved "+s.Saved.Format("2006-01-02 15:04"))
	}
	return r, nil
}

func runLog(all []string) (*report, error) {
	args := withoutJSON(all)
	if len(args) < 1 || len(args) > 2 || strings.HasPrefix(args[0], "-") {
		return nil, helpOrUsage(all, "usage: twcalc log FILE [N] [--json]\n\nLists the logged results of an export file of the app, or shows entry N (1 is the oldest); --json prints one JSON object.\n")
	}
	lib, err := readLibrary(args[0], false)
	if err != nil {
		return nil, err
	}
	r := newReport()
	r.input("file", args[0])
	if len(args) == 1 {
		for i, e := range lib.Log {
			shown := e.Time.Format("2006-01-02 15:04") + "  " + e.Title
			if e.Note != "" {
				shown += "  (" + e.Note + ")"
			}
			r.addObjectShown(strconv.Itoa(i+1), e, shown)
		}
		return r, nil
	}
	n, err := strconv.Atoi(args[1])
	if err != nil || n < 1 || n > len(lib.Log) {
		return nil, &usageError{msg: fmt.Sprintf("entry %s: the log has entries 1 to %d", quoteValue(args[1]), len(lib.Log))}
	}
	e := lib.Log[n-1]
	r.input("entry", n)
	keys := make([]string, 0, len(e.Inputs))
	for k := range e.Inputs {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		r.input(k, e.Inputs[k])
	}
	for _, row := range e.Rows {
		r.addObjectShown(row.Key, row, row.Shown)
	}
	for _, v := range e.Verdicts {
		r.verdicts = append(r.verdicts, sheet.Verdict{Check: v.Check, Outcome: v.Outcome, Why: v.Why})
	}
	r.warnings = append(r.warnings, e.Warnings...)
	r.cautions = append(r.cautions, e.Cautions...)
	if e.Note != "" {
		r.notes = append(r.notes, e.Note)
	}
	return r, nil
}

func runSavedSetup(args []string) (*report, error) {
	pos := withoutJSON(args)
	if len(pos) != 2 || strings.HasPrefix(pos[0], "-") {
		return nil, helpOrUsage(args, "usage: twcalc run FILE NAME [--json]\n\nRuns the setup NAME saved in an export file of the app; --json prints one JSON object.\n")
	}
	lib, err := readLibrary(pos[0], false)
	if err != nil {
		return nil, err
	}
	st, ok := lib.Setup(pos[1])
	if !ok {
		return nil, &usageError{msg: fmt.Sprintf("no setup named %s in %s", quoteValue(pos[1]), quoteValue(pos[0]))}
	}
	s, ok := sheet.Lookup(sheet.ID(st.Calculator))
	if !ok {
		return nil, &usageError{msg: fmt.Sprintf("setup %s is for %q, a calculator this twcalc does not have", quoteValue(st.Name), st.Calculator)}
	}
	res, err := s.Evaluate(knownInputs(s, st.Inputs))
	if err != nil {
		return nil, flagError(s, err)
	}
	return sheetReport(res), nil
}

// withoutJSON returns args without --json (run() reads it).
func withoutJSON(args []string) []string {
	var out []string
	for _, a := range args {
		if a != "--json" && a != "-json" {
			out = append(out, a)
		}
	}
	return out
}

// knownInputs keeps the texts of inputs the calculator has (a setup saved
// by a newer app may carry more).
func knownInputs(s *sheet.Sheet, texts map[string]string) map[string]string {
	out := map[string]string{}
	for k, v := range texts {
		if s.Input(k) != nil {
			out[k] = v
		}
	}
	return out
}

// helpOrUsage returns a help request for -h and a usage error otherwise.
func helpOrUsage(args []string, text string) error {
	for _, a := range args {
		if a == "-h" || a == "--help" || a == "-help" {
			return &helpRequest{text: text}
		}
	}
	return &usageError{msg: strings.SplitN(text, "\n", 2)[0]}
}
