package main

import "tubewright/calc/sheet"

// command is one subcommand of twcalc: its name as typed, a one-line summary
// for `twcalc help`, and the function that parses its flags and computes.
//
// A run function parses its own arguments, returns a report on success, and
// returns an error naming the flag and value on bad input. It never prints:
// run() in main.go writes the table or the JSON object.
type command struct {
	name, summary string
	run           func(args []string) (*report, error)
}

// commands is the table of subcommands in the order `twcalc help` lists
// them: the terminal entries of the one catalog in calc/sheet, each built
// from its calculator's description.
var commands = terminalCommands()

func terminalCommands() []command {
	var out []command
	for _, e := range sheet.Catalog() {
		if e.Place&sheet.InTerminal != 0 {
			out = append(out, sheetCommand(e.Sheet))
		}
	}
	return append(out, libraryCommands...)
}
