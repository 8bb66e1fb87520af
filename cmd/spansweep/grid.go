package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"strings"

	"github.com/spansweep/spansweep/grids"
)

func init() {
	commands["grid"] = command{summary: "validate a grid file and preview its cases", run: runGrid}
}

const gridSynopsis = `Validates a grid file (TOML) and prints its case count, the values of each
dimension, the wind conditions and the first cases. With no --grid it shows
the embedded default grid. A bad file lists every problem, one per line as
"file:line: key = value: allowed ...", and exits with status 2.`

// gridCaseJSON is one previewed case in --json output.
type gridCaseJSON struct {
	Index         int     `json:"index"`
	ID            string  `json:"id"`
	WindCondition string  `json:"wind_condition"`
	SpanM         float64 `json:"span_m"`
	LengthM       float64 `json:"length_m"`
	Bays          int     `json:"bays"`
	BaySpacingM   float64 `json:"bay_spacing_m"`
	EavesHeightM  float64 `json:"eaves_height_m"`
	RoofPitchDeg  float64 `json:"roof_pitch_deg"`
	Base          string  `json:"base"`
	HoistKN       float64 `json:"hoist_kn"`
}

// gridJSON is the --json output of the grid command.
type gridJSON struct {
	File           string         `json:"file"`
	Name           string         `json:"name"`
	SHA256         string         `json:"sha256"`
	Cases          int            `json:"cases"`
	Shard          string         `json:"shard"`
	ShardFirst     int            `json:"shard_first_index"`
	ShardCases     int            `json:"shard_cases"`
	WindConditions []string       `json:"wind_conditions"`
	EavesHeightsM  []float64      `json:"eaves_heights_m"`
	SpansM         []float64      `json:"spans_m"`
	Lengths        []grids.Length `json:"lengths"`
	RoofPitchesDeg []float64      `json:"roof_pitches_deg"`
	Bases          []string       `json:"bases"`
	HoistsKN       []float64      `json:"hoists_kn"`
	Options        grids.Options  `json:"options"`
	Preview        []gridCaseJSON `json:"preview"`
}

func runGrid(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("grid [--grid FILE] [--shard K/N] [--preview N] [--json]", gridSynopsis, stdout)
	file := fs.String("grid", "", "grid file (TOML); default: the embedded Ridgeline Sheds range")
	shardArg := fs.String("shard", "1/1", "show only part K of N of the cases")
	preview := fs.Int("preview", 10, "number of cases to preview")
	asJSON := fs.Bool("json", false, "print machine-readable JSON instead of text")
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	shard, err := grids.ParseShard(*shardArg)
	if err != nil {
		return usagef("--shard: %v", err)
	}
	if *preview < 0 {
		return usagef("--preview %d: allowed 0 or more", *preview)
	}
	g, err := loadGrid(*file)
	if err != nil {
		return err
	}
	report := newGridJSON(g, shard, *preview)
	if *asJSON {
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(report)
	}
	printGrid(stdout, report)
	return nil
}

// loadGrid reads the named grid file, or the embedded default when file is
// empty. A bad or unreadable file is a usage error listing every problem.
func loadGrid(file string) (*grids.Grid, error) {
	var g *grids.Grid
	var err error
	if file == "" {
		g, err = grids.Default()
	} else {
		g, err = grids.LoadFile(file)
	}
	var ve *grids.ValidationError
	switch {
	case errors.As(err, &ve):
		return nil, usagef("%d problem(s) in grid file; nothing was written:\n%v", len(ve.Problems), ve)
	case err != nil:
		return nil, usagef("%v", err)
	}
	return g, nil
}

func newGridJSON(g *grids.Grid, s grids.Shard, preview int) gridJSON {
	lo, hi := s.Range(g.Count())
	out := gridJSON{
		File: g.File, Name: g.Name, SHA256: g.HashSHA256, Cases: g.Count(),
		Shard: s.String(), ShardFirst: lo, ShardCases: hi - lo,
		WindConditions: g.WindKeys(), EavesHeightsM: g.EavesHeightsM, SpansM: g.SpansM,
		Lengths: g.Lengths, RoofPitchesDeg: g.RoofPitchesDeg, Bases: g.Bases, HoistsKN: g.HoistsKN,
		Options: g.Options, Preview: []gridCaseJSON{},
	}
	for c := range g.ShardCases(s) {
		if len(out.Preview) >= preview {
			break
		}
		out.Preview = append(out.Preview, gridCaseJSON{
			Index: c.Index, ID: c.ID, WindCondition: c.WindCondition(), SpanM: c.SpanM, LengthM: c.LengthM,
			Bays: c.Bays, BaySpacingM: c.BaySpacingM, EavesHeightM: c.EavesHeightM, RoofPitchDeg: c.RoofPitchDeg,
			Base: c.Base, HoistKN: c.HoistKN,
		})
	}
	return out
}

func printGrid(w io.Writer, r gridJSON) {
	fmt.Fprintf(w, "Grid:   %s\nName:   %s\nSHA256: %s\nCases:  %d", r.File, r.Name, r.SHA256, r.Cases)
	if r.Shard != "1/1" {
		fmt.Fprintf(w, " (shard %s: %d cases from index %d)", r.Shard, r.ShardCases, r.ShardFirst)
	}
	fmt.Fprintln(w, "\n\nDimensions, in enumeration order (outermost first):")
	lengths := make([]string, len(r.Lengths))
	for i, l := range r.Lengths {
		lengths[i] = fmt.Sprintf("%g (%d×%g)", l.LengthM, l.Bays, l.BaySpacingM)
	}
	dims := []struct {
		name   string
		values []string
	}{
		{"wind condition", r.WindConditions},
		{"eaves height m", fmtFloats(r.EavesHeightsM)},
		{"span m", fmtFloats(r.SpansM)},
		{"length m (bays×spacing m)", lengths},
		{"roof pitch deg", fmtFloats(r.RoofPitchesDeg)},
		{"base", r.Bases},
		{"hoist kN", fmtFloats(r.HoistsKN)},
	}
	for _, d := range dims {
		fmt.Fprintf(w, "  %-26s %3d: %s\n", d.name, len(d.values), strings.Join(d.values, ", "))
	}
	fmt.Fprintf(w, "\nFirst %d case(s):\n", len(r.Preview))
	fmt.Fprintf(w, "  %6s  %-14s %6s %6s %4s %6s %6s %5s %-7s %7s  %s\n",
		"index", "wind", "span", "length", "bays", "bay", "eaves", "pitch", "base", "hoist", "id")
	for _, c := range r.Preview {
		fmt.Fprintf(w, "  %6d  %-14s %6g %6g %4d %6g %6g %5g %-7s %7g  %s\n", c.Index, c.WindCondition,
			c.SpanM, c.LengthM, c.Bays, c.BaySpacingM, c.EavesHeightM, c.RoofPitchDeg, c.Base, c.HoistKN, c.ID)
	}
	fmt.Fprintln(w, "\n"+caution)
}

func fmtFloats(v []float64) []string {
	s := make([]string, len(v))
	for i, x := range v {
		s[i] = fmt.Sprintf("%g", x)
	}
	return s
}
