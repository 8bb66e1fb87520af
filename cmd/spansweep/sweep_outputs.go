package main

import (
	"bufio"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"slices"

	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/plots"
	"github.com/spansweep/spansweep/outputs/tables"
)

// derived gathers what is made from the dataset's results as they stream
// past in case order: the counts and, for a run over the whole grid, the
// span tables and the charts. None of it grows with the number of cases:
// the tables hold one wind condition and eaves height at a time and spool
// the rest to a file, and the charts keep per-span and per-cell figures
// (and one wind condition's values for its trend fit).
type derived struct {
	cases, ok, noSolution int
	tab                   *tables.Stream // nil: no tables
	mass                  []massChart
	gov                   *plots.GoverningChart
}

// massChart is one mass plot being built, and what it is written as.
type massChart struct {
	name, quantity string
	chart          *plots.MassChart
}

func (s *sweepRun) newDerived(withTables bool) (*derived, error) {
	d := &derived{}
	if !withTables {
		return d, nil
	}
	// The spool sits in the output directory, beside what it becomes, not
	// in a temporary directory that may be held in memory.
	tab, err := tables.NewStream(tables.Options{Envelope: s.flags.envelope, KgPerM: s.kgPerM}, s.layout.root)
	if err != nil {
		return nil, err
	}
	d.tab = tab
	eaves, length := s.referenceSize()
	d.mass = []massChart{
		{plotMass, "steel_mass_kg", plots.NewMassChart(nil, plots.MassPlot{Select: plots.AtSize(eaves, length),
			Title: fmt.Sprintf("Total steel mass against span (eaves height %g m, length %g m)", eaves, length)})},
		{plotMassArea, "mass_per_floor_kg_m2", plots.NewMassChart(nil, plots.MassPlot{PerFloorArea: true})},
	}
	if d.gov, err = plots.NewGoverningChart(nil, plots.GoverningMap{}); err != nil {
		tab.Close()
		return nil, err
	}
	return d, nil
}

func (s *sweepRun) kgPerM(designation string) (float64, bool) {
	sec, ok := s.cat.Find(designation)
	return sec.MassKgPerM, ok
}

func (d *derived) add(r *optimize.Result) error {
	d.cases++
	if r.Status == optimize.OK {
		d.ok++
	} else {
		d.noSolution++
	}
	if d.tab == nil {
		return nil
	}
	for _, m := range d.mass {
		if err := m.chart.Add(r); err != nil {
			return err
		}
	}
	d.gov.Add(r)
	return d.tab.Add(r)
}

// close removes the tables' spool.
func (d *derived) close() error {
	if d.tab == nil {
		return nil
	}
	return d.tab.Close()
}

// Files of the tables and plots directories.
const (
	tablesCSV      = "span-tables.csv"
	tablesMarkdown = "span-tables.md"
	tablesHTML     = "span-tables.html"
	plotMass       = "mass-vs-span.svg"
	plotMassArea   = "mass-per-area-vs-span.svg"
	plotGoverning  = "governing-checks.svg"
)

// writeTables writes the span tables as CSV, Markdown and a printable HTML
// page and returns their paths.
func (s *sweepRun) writeTables(set *tables.Stream) ([]string, error) {
	a := s.assumptions()
	files := []struct {
		name  string
		write func(io.Writer) error
	}{
		{tablesCSV, set.WriteCSV},
		{tablesMarkdown, func(w io.Writer) error { return set.WriteMarkdown(w, a) }},
		{tablesHTML, func(w io.Writer) error { return set.WriteHTML(w, a, tables.A4) }},
	}
	var paths []string
	for _, f := range files {
		path := filepath.Join(s.layout.tablesDir(), f.name)
		if err := writeAtomic(path, f.write); err != nil {
			return paths, err
		}
		paths = append(paths, path)
	}
	return paths, nil
}

// assumptions is the header of the table pages: provenance, standards and
// the grid's defaults and limits. It holds no date, so the pages of equal
// runs are byte-identical.
func (s *sweepRun) assumptions() tables.Assumptions {
	o := s.grid.Options
	title := s.grid.Name
	if title == "" {
		title = "Span tables"
	}
	a := tables.Assumptions{
		Title:     title,
		Version:   programVersion,
		Grid:      fmt.Sprintf("%s (sha256 %s)", filepath.Base(s.grid.File), s.grid.HashSHA256),
		Catalogue: fmt.Sprintf("%s (sha256 %s)", s.cat.Name, s.cat.HashSHA256),
		Standards: []string{
			"AS/NZS 1170.0:2002 Structural design actions, general principles (combinations, importance levels)",
			"AS/NZS 1170.1:2002 Permanent, imposed and other actions (roof imposed actions)",
			"AS/NZS 1170.2:2021 Wind actions",
			"AS 4055-2021 Wind loads for housing (housing wind classes)",
			"AS/NZS 4600:2018 Cold-formed steel structures",
			"AS 4100:2020 Steel structures (holding-down bolts)",
		},
		Defaults: []string{
			fmt.Sprintf("roof cladding %g kPa and wall cladding %g kPa dead load", o.Cladding.RoofDeadKPa, o.Cladding.WallDeadKPa),
			fmt.Sprintf("purlin spacing at most %g m, girt spacing at most %g m", o.Cladding.MaxPurlinSpacingM, o.Cladding.MaxGirtSpacingM),
		},
		LimitStates: []string{
			fmt.Sprintf("purlin deflection under SLS wind ≤ span/%g", o.Limits.PurlinDeflectionRatio),
			fmt.Sprintf("girt deflection under SLS wind ≤ span/%g", o.Limits.GirtDeflectionRatio),
			fmt.Sprintf("eaves sway under SLS wind ≤ eaves height/%g", o.Limits.EavesDriftRatio),
			fmt.Sprintf("apex deflection under SLS actions ≤ span/%g", o.Limits.ApexDeflectionRatio),
		},
	}
	if op := o.Opening; op != nil {
		a.Defaults = append(a.Defaults, fmt.Sprintf("dominant opening: a %g m × %g m door in a %s wall", op.WidthM, op.HeightM, op.Wall))
	}
	return a
}

// plotSet is what writePlots made: the files, the trend fits and notes on
// plots left out.
type plotSet struct {
	paths  []string
	trends []trendJSON
	notes  []string
}

// writePlots writes the mass plots (total mass at a reference size, and mass
// per floor area over every size) and the governing-check map.
func (s *sweepRun) writePlots(d *derived) (plotSet, error) {
	var ps plotSet
	for _, mp := range d.mass {
		if mp.chart.Solved() == 0 {
			ps.notes = append(ps.notes, fmt.Sprintf("%s not drawn: no solved case to plot", mp.name))
			continue
		}
		var fits []plots.WindFit
		path := filepath.Join(s.layout.plotsDir(), mp.name)
		err := writeAtomic(path, func(w io.Writer) error {
			var err error
			fits, err = mp.chart.WriteSVG(w)
			return err
		})
		if err != nil {
			return ps, err
		}
		ps.paths = append(ps.paths, path)
		ps.trends = append(ps.trends, trendsOf(mp.quantity, mp.name, fits)...)
	}
	path := filepath.Join(s.layout.plotsDir(), plotGoverning)
	err := writeAtomic(path, func(w io.Writer) error {
		_, err := d.gov.WriteSVG(w)
		return err
	})
	if err != nil {
		return ps, err
	}
	ps.paths = append(ps.paths, path)
	return ps, nil
}

// referenceSize is the size the total-mass plot holds fixed: the lowest
// eaves height and the middle length of the grid.
func (s *sweepRun) referenceSize() (eavesHeightM, lengthM float64) {
	lengths := make([]float64, len(s.grid.Lengths))
	for i, l := range s.grid.Lengths {
		lengths[i] = l.LengthM
	}
	slices.Sort(lengths)
	lengths = slices.Compact(lengths)
	return slices.Min(s.grid.EavesHeightsM), lengths[len(lengths)/2]
}

// writeAtomic writes a file through a temporary name in its directory
// (created if needed) and renames it, so a reader never sees half a file
// and a failure leaves the earlier file in place.
func writeAtomic(path string, write func(io.Writer) error) (err error) {
	dir := filepath.Dir(path)
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return fmt.Errorf("create %s: %w", dir, err)
	}
	f, err := os.CreateTemp(dir, "."+filepath.Base(path)+".tmp*")
	if err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	defer func() {
		if err != nil {
			f.Close()
			os.Remove(f.Name())
		}
	}()
	if err := f.Chmod(0o644); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	bw := bufio.NewWriter(f)
	if err := write(bw); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	if err := f.Close(); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	if err := os.Rename(f.Name(), path); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	return nil
}
