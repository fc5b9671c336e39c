package main

import "tubewright/calc/sheet"

// command is one subcommand of twcalc: its name as typed, a one-line summary
// for `twcalc help`, and the function that parses its flags and computes.
//
// A run function parses its own arguments with newFlags, returns a report on
// success, and returns an error naming the flag and value on bad input. It
// never prints: run() in main.go writes the table or the JSON object.
type command struct {
	name, summary string
	run           func(args []string) (*report, error)
}

// commands is the table of subcommands in the order `twcalc help` lists
// them. Each calculator adds ONE line here; its run function lives in its own
// file cmd/twcalc/<name>.go.
var commands = append([]command{sheetCommand(mustSheet(sheet.IDGas))}, legacyCommands...)

// mustSheet returns the description of calculator id.
func mustSheet(id sheet.ID) *sheet.Sheet {
	s, ok := sheet.Lookup(id)
	if !ok {
		panic("twcalc: no calculator " + string(id))
	}
	return s
}

// legacyCommands are the commands not yet built from a description.
var legacyCommands = []command{
	{"resonance", "frequency or length of a tube, zoned tube or Helmholtz resonator, with Q and sweeps", runResonance},
	{"diagnose", "gas temperature or mixture fraction from a measured resonance frequency", runDiagnose},
	{"vessel", "wall stresses, minimum wall and MAWP of a cylindrical vessel (safety)", runVessel},
	{"energy", "stored energy of a gas charge and its TNT equivalent (safety)", runEnergy},
	{"oxygen", "oxygen left in a room after a gas release (safety)", runOxygen},
	{"spl", "sound pressure level of a pressure amplitude against hearing limits (safety)", runSPL},
	{"depths", "thermal and viscous penetration depths of a gas at a frequency", runDepths},
	{"pores", "porosity, hydraulic radius, Rott's f and a verdict for a stack or regenerator", runPores},
	{"placement", "where a short stack sits in a standing wave, displacement and exchanger length", runPlacement},
	{"onset", "hot temperature and frequency at which a device described in a file starts to sing", runOnset},
	{"heatpump", "cold temperature, span and COP of a driven heat pump described in a file", runHeatPump},
}
