package main

import (
	"errors"
	"fmt"
	"io"
	"io/fs"

	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/bill"
	"github.com/spansweep/spansweep/outputs/dataset"
)

func init() {
	commands["lookup"] = command{summary: "find the solved case covering a building; print its bill of materials", run: runLookup}
}

const lookupSynopsis = `lookup --data DIR --span M --length M --height M [--pitch DEG] [--bay M] [--base pinned|fixed]
       (--wind-class N3 | --region B2 --terrain 2.5 --importance 2 [--life 50]) [--json|--csv]

Finds, in a dataset written by 'spansweep sweep', the solved case that covers
the building asked, rounding every dimension up to the next solved size and
never down (span, eaves height, bay spacing, a length of at least as many
bays, roof pitch), with a wind condition at least as severe (ultimate and
serviceability pressures at the solved building, AS/NZS 1170.2:2021 or
AS 4055-2021; a cyclonic site needs a cyclonic condition). Prints which case
it used and why, the member schedule and the bill of materials.

Exit status: 0 found; 2 bad flags, a missing dataset directory, or no solved
case covers the request; 1 an unreadable or incompatible dataset.`

// lookupArgs is a parsed lookup command line.
type lookupArgs struct {
	data   string
	query  bill.Query
	format string // "text", "json" or "csv"
}

// parseLookupArgs reads the flags into a validated query. Every error is a
// usage error (exit 2), or pflag.ErrHelp.
func parseLookupArgs(args []string, stdout io.Writer) (lookupArgs, error) {
	var a lookupArgs
	q := &a.query
	fs := newFlagSet("lookup", lookupSynopsis, stdout)
	fs.StringVar(&a.data, "data", "out/dataset", "dataset directory (the sweep's out/dataset)")
	fs.Float64Var(&q.SpanM, "span", 0, "span, column centrelines (m); required")
	fs.Float64Var(&q.LengthM, "length", 0, "building length (m); required")
	fs.Float64Var(&q.EavesHeightM, "height", 0, "eaves height (m); required")
	fs.Float64Var(&q.RoofPitchDeg, "pitch", 0, "roof pitch (degrees); default: any, lowest solved")
	fs.Float64Var(&q.BaySpacingM, "bay", 0, "bay spacing (m); default: any")
	fs.StringVar(&q.Base, "base", "", "column base: pinned or fixed; default: any, pinned preferred")
	fs.StringVar(&q.Wind.Class, "wind-class", "", "AS 4055-2021 housing wind class, N1–N6 or C1–C4")
	fs.StringVar(&q.Wind.Region, "region", "", "AS/NZS 1170.2:2021 wind region, e.g. B2")
	fs.Float64Var(&q.Wind.TerrainCategory, "terrain", 0, "terrain category: 1, 2, 2.5, 3 or 4 (with --region)")
	fs.IntVar(&q.Wind.ImportanceLevel, "importance", 0, "importance level 1–4, AS/NZS 1170.0 (with --region)")
	fs.IntVar(&q.Wind.DesignLifeYears, "life", bill.DefaultDesignLifeYears, "design working life, years (with --region)")
	asJSON := fs.Bool("json", false, "print JSON")
	asCSV := fs.Bool("csv", false, "print CSV")
	if err := parseFlags(fs, args); err != nil {
		return a, err
	}
	if err := requireFlags(fs, "span", "length", "height"); err != nil {
		return a, err
	}
	if q.Wind.Class != "" && !fs.Changed("life") {
		q.Wind.DesignLifeYears = 0
	}
	a.format = "text"
	switch {
	case *asJSON && *asCSV:
		return a, usagef("--json and --csv: give at most one")
	case *asJSON:
		a.format = "json"
	case *asCSV:
		a.format = "csv"
	}
	if err := q.Validate(); err != nil {
		return a, usagef("%v", err)
	}
	return a, nil
}

// requireFlags reports the required flags that were not given.
func requireFlags(fs *pflag.FlagSet, names ...string) error {
	var missing []string
	for _, n := range names {
		if !fs.Changed(n) {
			missing = append(missing, "--"+n)
		}
	}
	if len(missing) > 0 {
		return usagef("missing %v (metres; see --help)", missing)
	}
	return nil
}

func runLookup(args []string, stdout, stderr io.Writer) error {
	a, err := parseLookupArgs(args, stdout)
	if err != nil {
		return err
	}
	d, err := dataset.Open(a.data)
	switch {
	case errors.Is(err, fs.ErrNotExist), errors.Is(err, dataset.ErrNoParts):
		return usagef("--data %s: no dataset there (%v); run 'spansweep sweep' first or point --data at its out/dataset", a.data, err)
	case err != nil:
		return fmt.Errorf("--data %s: %w", a.data, err)
	}
	defer d.Close()
	m, err := bill.Lookup(d, a.query, bill.Settings{Wind: siteWind})
	var nc *bill.NotCoveredError
	if errors.As(err, &nc) {
		return usagef("%v", err)
	}
	if err != nil {
		return err
	}
	b, err := bill.New(&m.Row)
	if err != nil {
		return err
	}
	ans := bill.NewAnswer(m, b, caution)
	switch a.format {
	case "json":
		return ans.WriteJSON(stdout)
	case "csv":
		return ans.WriteCSV(stdout)
	}
	return ans.WriteText(stdout)
}

// siteWind gives the asked site's design pressures at a solved building,
// by the same derivation the optimiser uses (optimize.DesignPressures).
func siteWind(w bill.WindRequest, at *dataset.Row) (bill.Pressures, error) {
	gw := grids.Wind{HousingClass: w.Class, Region: w.Region, TerrainCategory: w.TerrainCategory,
		ImportanceLevel: w.ImportanceLevel, DesignLifeYears: w.DesignLifeYears}
	qu, qs, err := optimize.DesignPressures(gw, at.SpanM, at.EavesHeightM, at.RoofPitchDeg)
	if err != nil {
		return bill.Pressures{}, err
	}
	return bill.Pressures{QULSKPa: qu, QSLSKPa: qs}, nil
}
