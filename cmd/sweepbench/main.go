package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"runtime"
	"time"

	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
)

// Exit statuses, as spansweep's (DESIGN.md §7).
const (
	exitOK    = 0
	exitFail  = 1
	exitUsage = 2
)

// caution is printed on every human-readable output.
const caution = "CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern."

func main() { os.Exit(run(os.Args[1:], os.Stdout, os.Stderr)) }

// options are sweepbench's command line.
type options struct {
	grid, spansweep string
	workers         []int
	sample          int
	json, large     bool
	largeGrids      []string
	compare         bool
	ignore          []string
	memo            bool
	pipelineOnly    bool
	limit           int
}

// usageError marks bad usage: exit status 2.
type usageError struct{ msg string }

func (e *usageError) Error() string { return e.msg }

func usagef(format string, args ...any) error {
	return &usageError{msg: fmt.Sprintf(format, args...)}
}

// run parses args, runs what they ask and maps errors to exit statuses.
func run(args []string, stdout, stderr io.Writer) int {
	o, fs, err := parseOptions(args, stdout)
	if errors.Is(err, pflag.ErrHelp) {
		return exitOK
	}
	if err == nil {
		err = dispatch(o, fs.Args(), stdout, stderr)
	}
	var ue *usageError
	var de *differError
	switch {
	case err == nil:
		return exitOK
	case errors.As(err, &de):
		fmt.Fprintln(stderr, "sweepbench:", err)
		return exitFail
	case errors.As(err, &ue):
		fmt.Fprintln(stderr, "sweepbench:", err)
		return exitUsage
	}
	fmt.Fprintln(stderr, "sweepbench:", err)
	return exitFail
}

func parseOptions(args []string, stdout io.Writer) (*options, *pflag.FlagSet, error) {
	o := &options{}
	fs := pflag.NewFlagSet("sweepbench", pflag.ContinueOnError)
	fs.SortFlags = false
	fs.StringVar(&o.grid, "grid", "", "grid `FILE` to measure; default: the embedded default grid")
	fs.IntSliceVar(&o.workers, "workers", []int{1, 2}, "worker counts to time, comma-separated")
	fs.IntVar(&o.sample, "sample", 20, "cases, evenly spaced, designed both by the search and exhaustively")
	fs.BoolVar(&o.json, "json", false, "print JSON instead of text")
	fs.BoolVar(&o.large, "large", false, "instead, run 'spansweep sweep' on each --large-grids file and report wall time and peak memory")
	fs.StringSliceVar(&o.largeGrids, "large-grids", []string{"testdata/examples/large-250k.toml", "testdata/examples/large-1m.toml"}, "grid `FILES` for --large, smallest first")
	fs.StringVar(&o.spansweep, "spansweep", "", "spansweep `BINARY` for --large; default: go build it into a temporary directory")
	fs.BoolVar(&o.pipelineOnly, "pipeline-only", false, "with --large: sweep with a catalogue of the embedded straps and rods only, so every case stops at the purlin step; measures the sweep's streaming, writing and memory, not the design")
	fs.BoolVar(&o.memo, "memo", true, "time the sweep as spansweep runs it, reusing sub-searches with equal inputs (optimize.Memo); --memo=false times every search in full")
	fs.IntVar(&o.limit, "limit", 0, "time only this many evenly spaced cases of the grid (0: all)")
	fs.BoolVar(&o.compare, "compare", false, "instead, compare two dataset directories given as arguments: DIR1 DIR2")
	fs.StringSliceVar(&o.ignore, "ignore", nil, "with --compare: dataset `FIELDS` (Go names of dataset.Row, e.g. Analyses) left out of the comparison")
	fs.SetOutput(io.Discard)
	fs.Usage = func() {
		fmt.Fprintln(stdout, "Usage: sweepbench [flags]\n       sweepbench --compare DIR1 DIR2\n\nMeasures spansweep's throughput, search efficiency and peak memory.\n\nFlags:")
		fmt.Fprint(stdout, fs.FlagUsages())
	}
	err := fs.Parse(args)
	if errors.Is(err, pflag.ErrHelp) {
		return nil, nil, err // Parse has printed the usage
	}
	if err != nil {
		return nil, nil, usagef("%v (see --help)", err)
	}
	return o, fs, o.validate(fs.NArg())
}

func (o *options) validate(nargs int) error {
	switch {
	case o.compare && nargs != 2:
		return usagef("--compare takes two dataset directories; got %d arguments", nargs)
	case !o.compare && nargs > 0:
		return usagef("unexpected arguments (only --compare takes arguments)")
	case o.sample < 0:
		return usagef("--sample %d: allowed 0 or more", o.sample)
	case o.limit < 0:
		return usagef("--limit %d: allowed 0 or more", o.limit)
	case len(o.ignore) > 0 && !o.compare:
		return usagef("--ignore applies only with --compare")
	case o.pipelineOnly && !o.large:
		return usagef("--pipeline-only applies only with --large")
	case len(o.workers) == 0:
		return usagef("--workers: give at least one worker count")
	}
	for _, w := range o.workers {
		if w < 1 {
			return usagef("--workers %d: allowed 1 or more", w)
		}
	}
	return nil
}

func dispatch(o *options, args []string, stdout, stderr io.Writer) error {
	if o.compare {
		return compareCommand(args[0], args[1], o.ignore, stdout)
	}
	rep := &report{DateUTC: time.Now().UTC().Format(time.RFC3339), GoVersion: runtime.Version(), CPUs: runtime.NumCPU()}
	var err error
	if o.large {
		err = measureLarge(o, rep, stderr)
	} else {
		err = measureGrid(o, rep)
	}
	if err != nil {
		return err
	}
	if o.json {
		return rep.writeJSON(stdout)
	}
	rep.writeText(stdout)
	return nil
}

// measureGrid fills rep with the throughput, per-case times, search
// comparison and peak memory of one grid.
func measureGrid(o *options, rep *report) error {
	g, err := loadGrid(o.grid)
	if err != nil {
		return err
	}
	cat := catalog.Default()
	cases := g.Count()
	if o.limit > 0 {
		cases = min(cases, o.limit)
	}
	sample := sampleCases(g, cases)
	sweepGC()
	rep.Grid, rep.Cases, rep.GridCases, rep.Memo = g.File, len(sample), g.Count(), o.memo
	for i, w := range o.workers {
		wr, times, state := timeCases(sample, cat, w, o.memo)
		rep.Throughput = append(rep.Throughput, wr)
		if i == 0 {
			rep.PerCase = summarise(times)
			rep.Design = state
		}
	}
	rep.speedup()
	s := compareSearch(g, cat, o.sample, maxOf(o.workers))
	rep.Search = &s
	rep.PeakRSSMB = peakRSSMB()
	return nil
}

// loadGrid reads the named grid file, or the embedded default.
func loadGrid(file string) (*grids.Grid, error) {
	if file == "" {
		return grids.Default()
	}
	g, err := grids.LoadFile(file)
	if err != nil {
		return nil, usagef("--grid: %v", err)
	}
	return g, nil
}

func maxOf(xs []int) int {
	m := xs[0]
	for _, x := range xs {
		m = max(m, x)
	}
	return m
}
