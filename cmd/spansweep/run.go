package main

import (
	"errors"
	"fmt"
	"io"
	"sort"
	"strings"

	"github.com/spf13/pflag"
)

// Exit statuses, per DESIGN.md §7.
const (
	exitOK    = 0
	exitFail  = 1
	exitUsage = 2
)

// programVersion is stamped on every dataset part, table and summary; a
// resumed run must be made by the same version.
const programVersion = "0.1.0-dev"

// caution is printed on every human-readable output.
const caution = "CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern."

// command is one sub-command: its one-line summary and its entry point.
type command struct {
	summary string
	run     func(args []string, stdout, stderr io.Writer) error
}

// commands is filled by each sub-command's file in its init function, so a
// new command is one new file.
var commands = map[string]command{}

// usageError marks bad usage or bad input: the command exits with status 2.
type usageError struct{ msg string }

func (e *usageError) Error() string { return e.msg }

// usagef returns a usageError with a formatted message.
func usagef(format string, args ...any) error {
	return &usageError{msg: fmt.Sprintf(format, args...)}
}

// run dispatches to a sub-command and maps its error to an exit status.
func run(args []string, stdout, stderr io.Writer) int {
	if len(args) == 1 && (args[0] == "--version" || args[0] == "version") {
		fmt.Fprintln(stdout, "spansweep", programVersion)
		return exitOK
	}
	if len(args) == 0 || args[0] == "-h" || args[0] == "--help" || args[0] == "help" {
		printUsage(stdout)
		if len(args) == 0 {
			return exitUsage
		}
		return exitOK
	}
	cmd, ok := commands[args[0]]
	if !ok {
		fmt.Fprintf(stderr, "spansweep: unknown command %q; allowed: %s\n", args[0], strings.Join(commandNames(), ", "))
		return exitUsage
	}
	err := cmd.run(args[1:], stdout, stderr)
	switch {
	case err == nil:
		return exitOK
	case errors.Is(err, pflag.ErrHelp):
		return exitOK
	}
	fmt.Fprintf(stderr, "spansweep %s: %v\n", args[0], err)
	var ue *usageError
	if errors.As(err, &ue) {
		return exitUsage
	}
	return exitFail
}

func commandNames() []string {
	names := make([]string, 0, len(commands))
	for n := range commands {
		names = append(names, n)
	}
	sort.Strings(names)
	return names
}

func printUsage(w io.Writer) {
	fmt.Fprintln(w, "spansweep: lightest passing cold-formed steel sections for a gable-shed range.")
	fmt.Fprintln(w, "\nUsage: spansweep <command> [flags]\n\nCommands:")
	for _, n := range commandNames() {
		fmt.Fprintf(w, "  %-9s %s\n", n, commands[n].summary)
	}
	fmt.Fprintln(w, "\nRun 'spansweep <command> --help' for a command's flags; 'spansweep --version' for the version.")
	fmt.Fprintln(w, "\n"+caution)
}

// newFlagSet returns a pflag set for a sub-command whose parse errors are
// usage errors and whose --help prints the summary, the flags and the caution.
func newFlagSet(name, synopsis string, stdout io.Writer) *pflag.FlagSet {
	fs := pflag.NewFlagSet(name, pflag.ContinueOnError)
	fs.SortFlags = false
	fs.SetOutput(stdout)
	fs.Usage = func() {
		fmt.Fprintf(stdout, "Usage: spansweep %s\n\n%s\n\nFlags:\n", name, synopsis)
		fmt.Fprint(stdout, fs.FlagUsages())
		fmt.Fprintln(stdout, "\n"+caution)
	}
	return fs
}

// parseFlags parses args, turning pflag errors into usage errors and
// rejecting stray positional arguments.
func parseFlags(fs *pflag.FlagSet, args []string) error {
	fs.SetOutput(io.Discard)
	err := fs.Parse(args)
	if errors.Is(err, pflag.ErrHelp) {
		return err // pflag has printed fs.Usage
	}
	if err != nil {
		return &usageError{msg: err.Error() + " (see --help)"}
	}
	if fs.NArg() > 0 {
		return usagef("unexpected argument %q (see --help)", fs.Arg(0))
	}
	return nil
}
