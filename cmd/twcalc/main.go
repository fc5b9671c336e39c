package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"strings"
	"text/tabwriter"
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

// Exit statuses of twcalc.
const (
	exitOK    = 0
	exitFail  = 1 // the computation failed (no solution, internal error)
	exitUsage = 2 // bad command line or input out of range
)

// run is twcalc with its arguments (without the program name); it writes
// to stdout and stderr and returns the exit status.
func run(args []string, stdout, stderr io.Writer) int {
	return runWith(commands, args, stdout, stderr)
}

// runWith is run over a given command table, so tests can add their own.
func runWith(cmds []command, args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		listCommands(cmds, stderr)
		return exitUsage
	}
	name := args[0]
	switch name {
	case "help", "-h", "-help", "--help":
		if len(args) > 1 && name == "help" {
			return runWith(cmds, []string{args[1], "-h"}, stdout, stderr)
		}
		listCommands(cmds, stdout)
		return exitOK
	}
	var cmd *command
	for i := range cmds {
		if cmds[i].name == name {
			cmd = &cmds[i]
		}
	}
	if cmd == nil {
		fmt.Fprintf(stderr, "twcalc: unknown command %s; run \"twcalc help\" for the list\n", quoteValue(name))
		return exitUsage
	}
	rep, err := cmd.run(args[1:])
	if err != nil {
		var help *helpRequest
		if errors.As(err, &help) {
			fmt.Fprintf(stdout, "twcalc %s: %s\n\n%s", cmd.name, cmd.summary, help.text)
			return exitOK
		}
		fmt.Fprintf(stderr, "twcalc: %s\n", flat(err.Error()))
		var usage *usageError
		if errors.As(err, &usage) || isRangeError(err) {
			return exitUsage
		}
		return exitFail
	}
	if rep == nil {
		fmt.Fprintf(stderr, "twcalc: internal: %s returned no report\n", cmd.name)
		return exitFail
	}
	if rep.err != nil {
		fmt.Fprintf(stderr, "twcalc: %s\n", flat(rep.err.Error()))
		return exitFail
	}
	if wantJSON(args[1:]) {
		err = rep.writeJSON(stdout)
	} else {
		err = rep.writeText(stdout)
	}
	if err != nil {
		fmt.Fprintf(stderr, "twcalc: writing output: %s\n", flat(err.Error()))
		return exitFail
	}
	return exitOK
}

// wantJSON reports whether --json (or -json, --json=true) is among the
// flags. The command's own flag set has already accepted the line, so only
// the spelling needs checking here; "--" ends the flags.
func wantJSON(args []string) bool {
	on := false
	for _, a := range args {
		if a == "--" {
			break
		}
		name, val, hasVal := strings.Cut(strings.TrimLeft(a, "-"), "=")
		if !strings.HasPrefix(a, "-") || name != "json" {
			continue
		}
		on = !hasVal || val == "true" || val == "1" || val == "t" || val == "T" || val == "TRUE" || val == "True"
	}
	return on
}

// listCommands writes the help of twcalc itself.
func listCommands(cmds []command, w io.Writer) {
	fmt.Fprintln(w, "twcalc: thermoacoustics bench calculations in the terminal")
	fmt.Fprintln(w, "")
	fmt.Fprintln(w, "usage: twcalc COMMAND [flags]    (twcalc COMMAND -h lists the flags)")
	fmt.Fprintln(w, "")
	fmt.Fprintln(w, "commands:")
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	for _, c := range cmds {
		fmt.Fprintf(tw, "  %s\t%s\n", c.name, c.summary)
	}
	tw.Flush()
	fmt.Fprintln(w, "")
	fmt.Fprintln(w, "Values take any common unit: 300K, 27degC, 10bar, 30barg, 145psi, 12.5cm, 3/8in.")
	fmt.Fprintln(w, "Quote values with spaces: --temperature \"27 degC\". --json prints one JSON object.")
}

// flat puts a message on one line: line breaks become spaces, everything
// else (the quoted values in it) is kept as it is.
func flat(s string) string {
	return strings.NewReplacer("\r\n", " ", "\n", " ", "\r", " ").Replace(s)
}
