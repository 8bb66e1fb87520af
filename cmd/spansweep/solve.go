package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"strings"
	"text/tabwriter"

	"github.com/BurntSushi/toml"
	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/wind"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/report"
)

func init() {
	commands["solve"] = command{summary: "design one shed: member schedule, masses and the calculation report", run: runSolve}
}

const solveSynopsis = `Designs one enclosed gable shed: the lightest passing purlins, girts,
rafters, columns, knee and fly braces, bracing, end-wall members and pad
footings over the section catalogue, and prints the member schedule with each
group's governing check, the masses and the status.

  spansweep solve --span 12 --length 24 --bay 6 --height 3.6 --pitch 10 --wind-class N3
  spansweep solve --span 15 --length 36 --bay 6 --height 4.5 --pitch 5 --region B2 --terrain 2.5 --report calc.html

--report writes the complete calculation (inputs, wind derivation, pressures
by zone, load combinations, frame analysis with moment diagrams, every check
with its clause, deflections, footings, bill): .md for Markdown, .html for a
printable page. The inputs are validated by the same rules as a grid file;
--grid takes the shared options (cladding, limits, members, dominant opening,
costs) from a grid file and ignores its geometry and wind.

Exit status: 0 when a passing design is found; 1 when none is (the schedule,
JSON and report are still written and say why) or on another failure; 2 on
bad input.`

// solveFlags are the command line of the solve command.
type solveFlags struct {
	span, length, height, pitch, bay float64
	siteFlags
	base                  string
	hoistKN               float64
	catalog, grid, report string
	json                  bool
}

func (f *solveFlags) register(fs *pflag.FlagSet) {
	fs.Float64Var(&f.span, "span", 0, "span across the ridge, column centrelines (m)")
	fs.Float64Var(&f.length, "length", 0, "length along the ridge (m): a whole number of --bay")
	fs.Float64Var(&f.bay, "bay", 0, "bay spacing, frame centres (m)")
	fs.Float64Var(&f.height, "height", 0, "eaves height (m)")
	fs.Float64Var(&f.pitch, "pitch", 0, "roof pitch (degrees, 0–35)")
	f.siteFlags.register(fs, 0, 0, "0: the region's any-direction value")
	fs.StringVar(&f.base, "base", grids.BasePinned, "column bases: pinned or fixed")
	fs.Float64Var(&f.hoistKN, "hoist-kn", 0, "hoist point load hung from the rafter at mid-span (kN); 0 for none")
	fs.StringVar(&f.catalog, "catalog", "", "section catalogue CSV `FILE`; default: the embedded RS series")
	fs.StringVar(&f.grid, "grid", "", "grid `FILE` whose shared options (cladding, limits, members, opening, costs) apply")
	fs.BoolVar(&f.json, "json", false, "print the full result as JSON (keys carry units) instead of text")
	fs.StringVar(&f.report, "report", "", "write the calculation report to `FILE`: .md for Markdown, .html for a printable page")
}

func runSolve(args []string, stdout, stderr io.Writer) error {
	var f solveFlags
	fs := newFlagSet("solve --span M --length M --bay M --height M --pitch DEG (--wind-class N3 | --region B2 --terrain 2.5) [flags]", solveSynopsis, stdout)
	f.register(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	in, err := solveInputs(&f, fs)
	if err != nil {
		return err
	}
	res := optimize.Design(in.c, &optimize.Settings{Catalogue: in.cat, Record: true})
	if f.report != "" {
		rep := report.Report{Result: &res, Catalogue: catalogueLabel(in.cat), OptionsSource: in.optionsSource, Version: programVersion}
		if err := rep.WriteFile(f.report); err != nil {
			return fmt.Errorf("--report: %w", err)
		}
	}
	if f.json {
		if err := printSolveJSON(stdout, &res); err != nil {
			return err
		}
	} else if err := printSchedule(stdout, &res); err != nil {
		return err
	}
	if res.Status != optimize.OK {
		return fmt.Errorf("no passing design: %s", res.Reason)
	}
	return nil
}

// solveInput is a validated case and the catalogue to design it with.
type solveInput struct {
	c             grids.Case
	cat           *catalog.Catalogue
	optionsSource string
}

// solveInputs checks the flags (every bad flag in one message), then builds
// the case as a one-case grid so that it passes the grid file's rules and
// takes its defaults.
func solveInputs(f *solveFlags, fs *pflag.FlagSet) (solveInput, error) {
	var bad []string
	badf := func(format string, a ...any) { bad = append(bad, fmt.Sprintf(format, a...)) }
	checkSolveFlags(f, fs, badf)
	if len(bad) > 0 {
		return solveInput{}, usagef("%s", strings.Join(bad, "\n  "))
	}
	in := solveInput{cat: catalog.Default(), optionsSource: "grid defaults (no --grid)"}
	options := map[string]any{}
	if f.grid != "" {
		g, err := grids.LoadFile(f.grid)
		if err != nil {
			return solveInput{}, usagef("--grid %s:\n%v", f.grid, err)
		}
		if options, err = gridOptionTables(f.grid); err != nil {
			return solveInput{}, usagef("--grid %s: %v", f.grid, err)
		}
		in.optionsSource = fmt.Sprintf("grid file %s (sha256 %s)", f.grid, shortHash(g.HashSHA256))
	}
	g, err := oneCaseGrid(f, options)
	if err != nil {
		return solveInput{}, err
	}
	in.c = g.Case(0)
	if f.catalog != "" {
		if in.cat, err = catalog.LoadFile(f.catalog); err != nil {
			return solveInput{}, usagef("--catalog: %v", err)
		}
	}
	return in, nil
}

// checkSolveFlags reports the mistakes a grid file cannot name in flag
// terms: missing or non-positive sizes, the wind source, the base, the
// hoist, a length that is not a whole number of bays, the report format.
func checkSolveFlags(f *solveFlags, fs *pflag.FlagSet, badf func(string, ...any)) {
	for _, d := range []struct {
		name string
		v    float64
	}{{"span", f.span}, {"length", f.length}, {"bay", f.bay}, {"height", f.height}} {
		if !(d.v > 0) {
			badf("--%s %g: must be a positive length in m (required)", d.name, d.v)
		}
	}
	if !(f.pitch >= 0 && f.pitch <= wind.MaxPitchDeg) {
		badf("--pitch %g: allowed 0–%d degrees", f.pitch, wind.MaxPitchDeg)
	}
	checkSolveWind(f, fs, badf)
	if f.base != grids.BasePinned && f.base != grids.BaseFixed {
		badf("--base %s: allowed pinned, fixed", f.base)
	}
	if !(f.hoistKN >= 0) {
		badf("--hoist-kn %g: allowed 0 (none) or a positive load in kN", f.hoistKN)
	}
	if f.length > 0 && f.bay > 0 {
		if _, ok := wholeBays(f.length, f.bay); !ok {
			badf("%s", notWholeBays(f.length, f.bay))
		}
	}
	if f.report != "" {
		checkReportPath(f.report, badf)
	}
}

// checkReportPath checks the report's extension and that its directory
// exists, before anything is designed.
func checkReportPath(path string, badf func(string, ...any)) {
	if _, err := report.FormatOf(path); err != nil {
		badf("--report %s: the extension picks the format; allowed .md (Markdown) or .html", path)
	}
	dir := filepath.Dir(path)
	switch fi, err := os.Stat(dir); {
	case err != nil:
		badf("--report %s: directory %s: %v", path, dir, errors.Unwrap(err))
	case !fi.IsDir():
		badf("--report %s: %s is not a directory", path, dir)
	}
	if fi, err := os.Stat(path); err == nil && fi.IsDir() {
		badf("--report %s: is a directory; give a file name", path)
	}
}

// checkSolveWind checks that exactly one wind source is given, and its values.
func checkSolveWind(f *solveFlags, fs *pflag.FlagSet, badf func(string, ...any)) {
	switch {
	case f.class != "" && f.region != "":
		badf("--wind-class %s and --region %s: give one, not both", f.class, f.region)
	case f.class == "" && f.region == "":
		badf("give --wind-class (N1–N6, C1–C4) or --region (%s) with --terrain", strings.Join(wind.Regions(), ", "))
	case f.class != "":
		if _, err := wind.ParseHousingClass(f.class); err != nil {
			badf("--wind-class %s: allowed N1–N6, C1–C4 (AS 4055-2021)", f.class)
		}
		for _, n := range []string{"terrain", "importance", "life", "ms", "mt", "md"} {
			if fs.Changed(n) {
				badf("--%s: applies to --region only; a --wind-class speed already includes the site", n)
			}
		}
	default:
		if _, err := wind.ClimateMultiplier(strings.ToUpper(f.region)); err != nil {
			badf("--region %s: allowed %s", f.region, strings.Join(wind.Regions(), ", "))
		}
		if !fs.Changed("terrain") {
			badf("--terrain: required with --region; allowed 1, 2, 2.5, 3, 4")
		}
	}
}

// wholeBays returns length/bay when it is a whole number.
func wholeBays(length, bay float64) (int, bool) {
	n := length / bay
	r := math.Round(n)
	return int(r), r >= 1 && math.Abs(n-r) <= 1e-6*n
}

// notWholeBays explains a length that is not a whole number of bays, with
// the nearest lengths at that bay and the bays that fit that length.
func notWholeBays(length, bay float64) string {
	n := length / bay
	lo, hi := math.Floor(n), math.Ceil(n)
	var lengths, bays []string
	for _, k := range []float64{lo, hi} {
		if k >= 1 {
			lengths = append(lengths, fmt.Sprintf("%g m (%g bays)", k*bay, k))
			bays = append(bays, fmt.Sprintf("%.4g m (%g bays)", length/k, k))
		}
	}
	return fmt.Sprintf("--length %g with --bay %g: the length must be a whole number of bays (%.4g bays given); possible lengths at --bay %g: %s; or for --length %g: --bay %s",
		length, bay, n, bay, strings.Join(lengths, ", "), length, strings.Join(bays, ", "))
}

// gridOptionTables reads the shared-option tables of a grid file: every
// table except its name, geometry, wind and frame.
func gridOptionTables(path string) (map[string]any, error) {
	var doc map[string]any
	if _, err := toml.DecodeFile(path, &doc); err != nil {
		return nil, err
	}
	for _, k := range []string{"name", "geometry", "wind", "frame"} {
		delete(doc, k)
	}
	return doc, nil
}

// solveGridName names the one-case grid in validation messages.
const solveGridName = "solve flags"

// oneCaseGrid writes the flags (and any grid options) as a one-case grid
// file and parses it, mapping each problem back to its flag.
func oneCaseGrid(f *solveFlags, options map[string]any) (*grids.Grid, error) {
	n, _ := wholeBays(f.length, f.bay)
	doc := map[string]any{
		"name": "spansweep solve",
		"geometry": map[string]any{
			"span_m": []float64{f.span}, "bays": []int{n}, "bay_spacing_m": []float64{f.bay},
			"eaves_height_m": []float64{f.height}, "roof_pitch_deg": []float64{f.pitch},
		},
		"frame": map[string]any{"base": f.base, "hoist_kn": []float64{f.hoistKN}},
	}
	if f.class != "" {
		doc["wind"] = map[string]any{"housing_classes": []string{strings.ToUpper(f.class)}}
	} else {
		site := map[string]any{"region": strings.ToUpper(f.region), "terrain_category": f.terrain,
			"importance_level": f.importance, "design_life_years": f.life, "ms": f.ms, "mt": f.mt}
		if f.md != 0 {
			site["md"] = f.md
		}
		doc["wind"] = map[string]any{"site": []map[string]any{site}}
	}
	for k, v := range options {
		doc[k] = v
	}
	var buf bytes.Buffer
	if err := toml.NewEncoder(&buf).Encode(doc); err != nil {
		return nil, fmt.Errorf("solve: writing the case as a grid: %w", err)
	}
	g, err := grids.Parse(buf.Bytes(), solveGridName)
	var ve *grids.ValidationError
	if errors.As(err, &ve) {
		return nil, usagef("%s", flagProblems(f, ve))
	}
	if err != nil {
		return nil, fmt.Errorf("solve: %w", err)
	}
	if g.Count() != 1 {
		return nil, fmt.Errorf("solve: the flags gave %d cases, want 1", g.Count())
	}
	return g, nil
}

// gridKeyFlags maps the one-case grid's keys to the flags that set them.
var gridKeyFlags = map[string]string{
	"geometry.span_m": "span", "geometry.bay_spacing_m": "bay", "geometry.eaves_height_m": "height",
	"geometry.roof_pitch_deg": "pitch", "wind.housing_classes": "wind-class",
	"wind.site[0].region": "region", "wind.site[0].terrain_category": "terrain",
	"wind.site[0].importance_level": "importance", "wind.site[0].design_life_years": "life",
	"wind.site[0].ms": "ms", "wind.site[0].mt": "mt", "wind.site[0].md": "md",
	"frame.base": "base", "frame.hoist_kn": "hoist-kn",
}

// flagProblems restates a grid's problems: a key a flag set names the flag
// and its value; a key from --grid names the grid file.
func flagProblems(f *solveFlags, ve *grids.ValidationError) string {
	msgs := make([]string, 0, len(ve.Problems))
	for _, p := range ve.Problems {
		switch name, ok := gridKeyFlags[p.Key]; {
		case ok:
			msgs = append(msgs, fmt.Sprintf("--%s %s: %s", name, strings.Trim(p.Value, `[]"`), p.Allowed))
		case p.Key == "geometry.bays":
			n, _ := wholeBays(f.length, f.bay)
			msgs = append(msgs, fmt.Sprintf("--length %g with --bay %g: %d bays; bays %s", f.length, f.bay, n, p.Allowed))
		case f.grid != "":
			msgs = append(msgs, fmt.Sprintf("--grid %s, applied to this case: %s%s: %s", f.grid, p.Key, valueSuffix(p.Value), p.Allowed))
		default:
			msgs = append(msgs, fmt.Sprintf("%s%s: %s", p.Key, valueSuffix(p.Value), p.Allowed))
		}
	}
	return strings.Join(msgs, "\n  ")
}

func valueSuffix(v string) string {
	if v == "" {
		return ""
	}
	return " = " + v
}

func shortHash(h string) string {
	if len(h) > 12 {
		return h[:12]
	}
	return h
}

func catalogueLabel(c *catalog.Catalogue) string {
	return fmt.Sprintf("%s (%d sections, sha256 %s)", c.Name, len(c.Sections), shortHash(c.HashSHA256))
}

// printSolveJSON writes the full result, calculation included.
func printSolveJSON(w io.Writer, res *optimize.Result) error {
	data, err := json.MarshalIndent(report.NewJSON(res), "", "  ")
	if err != nil {
		return fmt.Errorf("json: %w", err)
	}
	_, err = w.Write(append(data, '\n'))
	return err
}

// printSchedule writes the human-readable result: the caution, the case,
// the status, the member schedule, the braces, the footings and the masses.
func printSchedule(w io.Writer, res *optimize.Result) error {
	c := res.Case
	p := &errWriter{w: w}
	p.printf("%s\n\n", caution)
	p.printf("Case %s\n", c.ID)
	p.printf("  span %g m, length %g m (%d bays × %g m), eaves %g m, pitch %g°, %s bases, wind %s",
		c.SpanM, c.LengthM, c.Bays, c.BaySpacingM, c.EavesHeightM, c.RoofPitchDeg, c.Base, c.WindCondition())
	if c.HoistKN > 0 {
		p.printf(", hoist %g kN at mid-span", c.HoistKN)
	}
	p.printf("\n  V_des ULS %.1f m/s, SLS %.1f m/s; q_u %.3f kPa, q_s %.3f kPa\n", res.VUltimateMS, res.VServiceMS, res.QUltimateKPa, res.QServiceKPa)
	p.printf("Status: %s\n", res.Status)
	if res.Reason != "" {
		p.printf("Reason: %s\n", res.Reason)
	}
	if p.err != nil {
		return p.err
	}
	if err := printMemberTable(w, res); err != nil {
		return err
	}
	p.printf("\nFly braces: %d per frame, %d in the building (%d frames)\n", res.FlyBracesPerFrame, res.FlyBracesPerFrame*res.Frames, res.Frames)
	if res.KneeBraceColumnM > 0 || res.KneeBraceRafterM > 0 {
		p.printf("Knee braces: %.3f m down the column to %.3f m along the rafter, from the eaves\n", res.KneeBraceColumnM, res.KneeBraceRafterM)
	} else {
		p.printf("Knee braces: none\n")
	}
	fts := res.Footings()
	for _, ft := range fts {
		g := ft.Governing
		p.printf("Footings: %s, %d pads %.2f m square × %.2f m deep (%.2f m³), %d × %s bolts per base; governing %s, %s %s, %s, utilisation %.3f\n",
			ft.Bases, ft.Count, ft.WidthM, ft.DepthM, ft.ConcreteM3, ft.BoltsPerBase, ft.BoltSize, g.Check, g.Standard, g.Clause, g.LimitState, g.Utilisation)
	}
	if len(fts) == 0 {
		p.printf("Footings: none designed\n")
	}
	if res.Status == optimize.OK {
		p.printf("Total steel mass: %.1f kg, %.2f kg/m² of floor\n", res.SteelMassKg, res.MassPerFloorKgM2)
	} else {
		p.printf("Total steel mass: none (no passing design; the groups above are those chosen before the search stopped)\n")
	}
	if res.Cost != 0 {
		p.printf("Cost: %.2f (grid price table)\n", res.Cost)
	}
	p.printf("\n%s\n", caution)
	return p.err
}

// printMemberTable writes the member schedule as aligned columns.
func printMemberTable(w io.Writer, res *optimize.Result) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, "\nMember\tSection\tSpacing m\tCount\tLength each m\tMass kg\tUtil.\tGoverning check\tClause\tLimit state\tCombination")
	for _, m := range res.Members {
		if m.Designation == "" && m.Count == 0 {
			continue
		}
		g := m.Governing
		spacing := "-"
		if m.SpacingM > 0 {
			spacing = fmt.Sprintf("%.3f", m.SpacingM)
			if m.SpanType != "" {
				spacing += " " + m.SpanType
			}
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%d\t%.3f\t%.1f\t%.3f\t%s\t%s %s\t%s\t%s\n", strings.ReplaceAll(string(m.Role), "_", " "),
			m.Designation, spacing, m.Count, m.LengthEachM, m.MassKg, g.Utilisation, g.Check, g.Standard, g.Clause, g.LimitState, g.Combination)
	}
	return tw.Flush()
}
