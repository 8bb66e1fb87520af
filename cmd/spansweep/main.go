// Command spansweep selects the lightest passing cold-formed steel sections for
// every size and wind condition of a gable-shed product range, and writes span
// tables, a Parquet dataset, plots and single-case calculation reports.
//
// Usage:
//
//	spansweep <command> [flags]
//
// Commands: sweep, solve, lookup, sections, grid, loads. Each has --help.
//
// Exit status: 0 on success, 2 on bad usage or input, 1 on any other failure.
//
// Results are a design aid: verify every design for its site with a qualified
// structural engineer; local codes and licensed practice govern.
package main

import (
	"os"
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}
