package main

import (
	"context"
	"io"
	"os"
	"os/signal"
	"runtime"
	"runtime/debug"
	"syscall"

	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/outputs/dataset"
)

func init() {
	commands["sweep"] = command{summary: "solve every case of a grid file; write the dataset, span tables and plots", run: runSweep}
}

const sweepSynopsis = `Designs every case of a grid file (default: the embedded Ridgeline Sheds
range) with a section catalogue (default: the embedded RS series) and writes,
under --out (default ./out):

  dataset/part-KKKKK-of-NNNNN-piece-PPPPP.parquet
                                         one row per case (DuckDB, Arrow, Spark),
                                         131,072 rows a piece
  tables/span-tables.{csv,md,html}       span tables (whole-grid runs only)
  plots/*.svg                            mass against span, governing checks
  summary.json                           counts, timing, trend fits, hashes
  shards/summary-KKKKK-of-NNNNN.json     instead, for a run with --shard K/N, N > 1

Everything is validated before anything is written. An existing dataset shard
is never overwritten: finish or rebuild it with --resume, or choose another
--out. Ctrl-C (or SIGTERM) stops taking cases, finishes those in flight and
keeps every finished case (in dataset/_partial-… pieces, which the
part-*.parquet glob passes by); the same command with --resume continues,
and the result equals an uninterrupted run. A sharded run (--shard K/N) writes only its
dataset part; when every shard has finished, --tables-only reads all the parts
and writes the tables, plots and summary.json.`

// sweepFlags are the command line of the sweep command.
type sweepFlags struct {
	grid, catalog, out, shard string
	workers                   int
	resume, envelope          bool
	tablesOnly, quiet         bool
	cpuProfile, memProfile    string
}

// newSweepFlagSet declares the flags into f.
func newSweepFlagSet(f *sweepFlags, stdout io.Writer) *pflag.FlagSet {
	fs := newFlagSet("sweep [--grid FILE] [--catalog FILE] [--out DIR] [--workers N] [--shard K/N] [--resume] [--envelope]", sweepSynopsis, stdout)
	fs.StringVar(&f.grid, "grid", "", "grid `FILE` (TOML); default: the embedded Ridgeline Sheds range")
	fs.StringVar(&f.catalog, "catalog", "", "section catalogue CSV `FILE`; default: the embedded RS series")
	fs.StringVar(&f.out, "out", "out", "output `DIR`; its parent must exist")
	fs.IntVar(&f.workers, "workers", runtime.NumCPU(), "cases designed at once (1 or more)")
	fs.StringVar(&f.shard, "shard", "1/1", "design only part `K/N` of the grid (for batch schedulers)")
	fs.BoolVar(&f.resume, "resume", false, "continue an interrupted run in --out (or start one if there is none)")
	fs.BoolVar(&f.envelope, "envelope", false, "span tables: no larger size shows a lighter section than a smaller one")
	fs.BoolVar(&f.tablesOnly, "tables-only", false, "design nothing: read every dataset part in --out and write the tables, plots and summary")
	fs.StringVar(&f.cpuProfile, "cpuprofile", "", "write a CPU profile (pprof) to `FILE`")
	fs.StringVar(&f.memProfile, "memprofile", "", "write a heap profile (pprof) to `FILE` at the end")
	fs.BoolVar(&f.quiet, "quiet", false, "no progress line and no list of files written; the summary line stays")
	return fs
}

// sweepRun is a sweep whose inputs have all been validated.
type sweepRun struct {
	flags  sweepFlags
	grid   *grids.Grid
	cat    *catalog.Catalogue
	shard  grids.Shard
	layout outLayout
}

// meta is the provenance every dataset part of this run carries.
func (s *sweepRun) meta() dataset.Meta {
	return dataset.Meta{
		ProgramVersion: programVersion,
		GridSHA256:     s.grid.HashSHA256,
		CatalogSHA256:  s.cat.HashSHA256,
		Shard:          dataset.Shard{K: s.shard.K, N: s.shard.N},
	}
}

// whole reports whether the run covers the whole grid, so it writes tables.
func (s *sweepRun) whole() bool { return s.shard.N == 1 }

func runSweep(args []string, stdout, stderr io.Writer) error {
	s, err := parseSweep(args, stdout)
	if err != nil {
		return err
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	// After the first signal the default action returns, so a second
	// Ctrl-C quits at once.
	context.AfterFunc(ctx, stop)
	if s.flags.tablesOnly {
		return s.withProfiles(func() error { return s.tablesOnly(stdout, stderr) })
	}
	tuneGC()
	return s.sweep(ctx, stdout, stderr)
}

// Garbage collector settings of a sweep, unless GOGC or GOMEMLIMIT is set:
// the heap may grow to three times the live data before a collection
// (GOGC=200; the default 100 spent about 8 % more CPU on the default grid),
// and the collector works harder from sweepGCSoftLimit on, so the peak stays
// well under the 300 MB a sweep of any size is meant to fit in.
const (
	sweepGCPercent   = 200
	sweepGCSoftLimit = 200 << 20
)

func tuneGC() {
	if os.Getenv("GOGC") == "" {
		debug.SetGCPercent(sweepGCPercent)
	}
	if os.Getenv("GOMEMLIMIT") == "" {
		debug.SetMemoryLimit(sweepGCSoftLimit)
	}
}

// parseSweep reads and validates the command line, the grid, the catalogue
// and the output directory. It writes nothing.
func parseSweep(args []string, stdout io.Writer) (*sweepRun, error) {
	s := &sweepRun{}
	f := &s.flags
	if err := parseFlags(newSweepFlagSet(f, stdout), args); err != nil {
		return nil, err
	}
	if f.workers < 1 {
		return nil, usagef("--workers %d: allowed 1 or more", f.workers)
	}
	var err error
	if s.shard, err = grids.ParseShard(f.shard); err != nil {
		return nil, usagef("--shard: %v", err)
	}
	if s.shard == (grids.Shard{}) {
		s.shard = grids.Shard{K: 1, N: 1}
	}
	if f.tablesOnly && (s.shard.N != 1 || f.resume) {
		return nil, usagef("--tables-only reads every part of a finished dataset: it takes neither --shard nor --resume")
	}
	for _, p := range []struct{ flag, path string }{{"--cpuprofile", f.cpuProfile}, {"--memprofile", f.memProfile}} {
		if err := checkNewFile(p.flag, p.path); err != nil {
			return nil, err
		}
	}
	if s.grid, err = loadGrid(f.grid); err != nil {
		return nil, err
	}
	if s.cat, err = loadCatalogue(f.catalog); err != nil {
		return nil, err
	}
	if s.layout, err = checkOutDir(f.out); err != nil {
		return nil, err
	}
	if !f.tablesOnly {
		if err := s.layout.checkExisting(s.shard, f.resume); err != nil {
			return nil, err
		}
		if err := s.checkSiblings(); err != nil {
			return nil, err
		}
	}
	return s, nil
}

// loadCatalogue reads the named catalogue, or the embedded one when file is
// empty. A bad or unreadable file is a usage error listing every problem.
func loadCatalogue(file string) (*catalog.Catalogue, error) {
	if file == "" {
		return catalog.Default(), nil
	}
	cat, err := catalog.LoadFile(file)
	if err != nil {
		return nil, usagef("--catalog: %v", err)
	}
	return cat, nil
}
