package main

import (
	"encoding/json"
	"fmt"
	"io"
	"time"

	"github.com/spansweep/spansweep/outputs/plots"
)

// sweepSummary is summary.json (or a shard's summary file): what was run,
// how it went and the trend fits of the mass plots.
type sweepSummary struct {
	ProgramVersion string      `json:"program_version"`
	Grid           sourceJSON  `json:"grid"`
	Catalog        sourceJSON  `json:"catalog"`
	Shard          string      `json:"shard"`
	Cases          int         `json:"cases"`
	OK             int         `json:"ok"`
	NoSolution     int         `json:"no_solution"`
	ResumedCases   int         `json:"resumed_cases"`  // carried over from an interrupted run
	DesignedCases  int         `json:"designed_cases"` // designed by this run
	Workers        int         `json:"workers"`
	WallTimeS      float64     `json:"wall_time_s"` // designing (and, with --tables-only, reading)
	CasesPerS      float64     `json:"cases_per_s"` // designed cases over wall time
	Envelope       bool        `json:"envelope"`
	Trends         []trendJSON `json:"trends"`
	Notes          []string    `json:"notes"`
	Files          []string    `json:"files"`
	Caution        string      `json:"caution"`
}

// sourceJSON names an input file and its content hash.
type sourceJSON struct {
	File   string `json:"file"`
	Name   string `json:"name,omitempty"`
	SHA256 string `json:"sha256"`
}

// trendJSON is one wind condition's trend value = a·span^b on one plot.
type trendJSON struct {
	Plot     string  `json:"plot"`
	Quantity string  `json:"quantity"` // steel_mass_kg or mass_per_floor_kg_m2
	Wind     string  `json:"wind_condition"`
	Points   int     `json:"points"`
	A        float64 `json:"a"` // quantity at a span of 1 m, in its unit per m^b
	B        float64 `json:"b"` // exponent, dimensionless
	R2       float64 `json:"r2"`
	RMS      float64 `json:"rms"` // root-mean-square residual, in the quantity's unit
}

func trendsOf(quantity, plot string, fits []plots.WindFit) []trendJSON {
	var out []trendJSON
	for _, f := range fits {
		if f.Fit == nil {
			continue
		}
		out = append(out, trendJSON{Plot: plot, Quantity: quantity, Wind: f.Wind, Points: f.Points,
			A: f.Fit.A, B: f.Fit.B, R2: f.Fit.R2, RMS: f.Fit.RMS})
	}
	return out
}

// finish reads the shard's rows back from the dataset, writes the tables and
// plots when the run covers the whole grid, and the summary.
func (s *sweepRun) finish(stats runStats, stdout, stderr io.Writer) error {
	files := stats.files
	var notes []string
	if !s.whole() {
		notes = append(notes, fmt.Sprintf("shard %s: tables and plots are written by 'spansweep sweep --tables-only' once every shard has finished", s.shard))
	}
	return s.derive(s.whole(), stats, time.Time{}, files, notes, stdout, stderr)
}

// tablesOnly builds the tables, plots and summary from a finished dataset of
// every shard; its wall time is that of the pass.
func (s *sweepRun) tablesOnly(stdout, stderr io.Writer) error {
	start := time.Now()
	d, err := s.openDataset()
	if err != nil {
		return err
	}
	files := d.Parts()
	d.Close()
	return s.derive(true, runStats{}, start, files, nil, stdout, stderr)
}

// derive reads the rows of the run's cases, writes what they make, and
// reports.
// A non-zero start sets the wall time to the time since it.
func (s *sweepRun) derive(withTables bool, stats runStats, start time.Time, files, notes []string, stdout, stderr io.Writer) error {
	d, err := s.openDataset()
	if err != nil {
		return err
	}
	defer d.Close()
	lo, hi := s.shard.Range(s.grid.Count())
	got, err := s.newDerived(withTables)
	if err != nil {
		return err
	}
	defer got.close()
	if err := s.eachResult(d, lo, hi, got.add); err != nil {
		return err
	}
	var trends []trendJSON
	if withTables {
		paths, err := s.writeTables(got.tab)
		if err != nil {
			return err
		}
		ps, err := s.writePlots(got)
		if err != nil {
			return err
		}
		files = append(append(files, paths...), ps.paths...)
		trends, notes = ps.trends, append(notes, ps.notes...)
	}
	if !start.IsZero() {
		stats.wall = time.Since(start)
	}
	sum := s.summary(got, stats, trends, notes, files)
	path := s.layout.summaryPath(s.shard)
	err = writeAtomic(path, func(w io.Writer) error {
		enc := json.NewEncoder(w)
		enc.SetIndent("", "  ")
		return enc.Encode(sum)
	})
	if err != nil {
		return err
	}
	s.report(sum, append(files, path), stdout, stderr)
	return nil
}

func (s *sweepRun) summary(got *derived, stats runStats, trends []trendJSON, notes, files []string) sweepSummary {
	sum := sweepSummary{
		ProgramVersion: programVersion,
		Grid:           sourceJSON{File: s.grid.File, Name: s.grid.Name, SHA256: s.grid.HashSHA256},
		Catalog:        sourceJSON{File: s.cat.Name, SHA256: s.cat.HashSHA256},
		Shard:          s.shard.String(),
		Cases:          got.cases, OK: got.ok, NoSolution: got.noSolution,
		ResumedCases: stats.resumed, DesignedCases: stats.designed, Workers: s.flags.workers,
		WallTimeS: stats.wall.Seconds(), Envelope: s.flags.envelope,
		Trends: trends, Notes: notes, Files: files, Caution: caution,
	}
	if stats.wall > 0 {
		sum.CasesPerS = float64(stats.designed) / stats.wall.Seconds()
	}
	if sum.Trends == nil {
		sum.Trends = []trendJSON{}
	}
	if sum.Notes == nil {
		sum.Notes = []string{}
	}
	return sum
}

// report prints the one-line summary (and the caution) on stderr, and the
// files written on stdout unless --quiet.
func (s *sweepRun) report(sum sweepSummary, files []string, stdout, stderr io.Writer) {
	line := fmt.Sprintf("spansweep sweep: %d cases (%d ok, %d no_solution)", sum.Cases, sum.OK, sum.NoSolution)
	if sum.Shard != "1/1" {
		line += " in shard " + sum.Shard
	}
	line += fmt.Sprintf("; %d designed in %.2f s wall, %.1f cases/s", sum.DesignedCases, sum.WallTimeS, sum.CasesPerS)
	if sum.ResumedCases > 0 {
		line += fmt.Sprintf("; %d resumed", sum.ResumedCases)
	}
	fmt.Fprintln(stderr, line)
	for _, n := range sum.Notes {
		fmt.Fprintln(stderr, "  note: "+n)
	}
	fmt.Fprintln(stderr, caution)
	if s.flags.quiet {
		return
	}
	for _, f := range files {
		fmt.Fprintln(stdout, "wrote "+f)
	}
}
