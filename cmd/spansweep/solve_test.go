package main

import (
	"bytes"
	"encoding/json"
	"encoding/xml"
	"errors"
	"io"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/report"
)

// solveArgs is a valid building (illustrative: 12 m × 24 m, 4 bays of 6 m,
// 3.6 m eaves, 10° pitch, N3) followed by extra flags.
func solveArgs(extra ...string) []string {
	return append([]string{"solve", "--span", "12", "--length", "24", "--bay", "6", "--height", "3.6", "--pitch", "10"}, extra...)
}

// plus returns a copy of args with extra appended (never sharing args' array).
func plus(args []string, extra ...string) []string {
	return append(append([]string(nil), args...), extra...)
}

// without returns args without the flag name and its value.
func without(args []string, name string) []string {
	var out []string
	for i := 0; i < len(args); i++ {
		if args[i] == name {
			i++
			continue
		}
		out = append(out, args[i])
	}
	return out
}

// with returns args with the value of flag name replaced.
func with(args []string, name, value string) []string {
	out := append([]string(nil), args...)
	for i := range out {
		if out[i] == name {
			out[i+1] = value
		}
	}
	return out
}

// TestSolveBadInput checks that each bad input exits 2 with a message that
// names the flag, the value and what is allowed.
func TestSolveBadInput(t *testing.T) {
	n3 := solveArgs("--wind-class", "N3")
	b2 := solveArgs("--region", "B2", "--terrain", "2.5")
	dir := t.TempDir()
	badCSV := filepath.Join(dir, "bad.csv")
	badGrid := filepath.Join(dir, "bad.toml")
	os.WriteFile(badCSV, []byte("designation,shape\nX,Q\n"), 0o644)
	os.WriteFile(badGrid, []byte("[cladding]\nmax_purlin_spacing_m = 9\n"), 0o644)
	for _, tc := range []struct {
		name string
		args []string
		want []string // every one must appear in the message
	}{
		{"zero span", with(n3, "--span", "0"), []string{"--span 0", "positive length in m"}},
		{"negative height", with(n3, "--height", "-3"), []string{"--height -3", "positive length in m"}},
		{"missing length", without(n3, "--length"), []string{"--length 0", "required"}},
		{"zero bay", with(n3, "--bay", "0"), []string{"--bay 0", "positive length in m"}},
		{"span beyond the range", with(n3, "--span", "50"), []string{"--span 50", "allowed 3 ≤ value ≤ 40"}},
		{"pitch above 35", with(n3, "--pitch", "40"), []string{"--pitch 40", "allowed 0–35 degrees"}},
		{"negative pitch", with(n3, "--pitch", "-1"), []string{"--pitch -1", "allowed 0–35 degrees"}},
		{"class and region", solveArgs("--wind-class", "N3", "--region", "B2"), []string{"--wind-class N3 and --region B2", "give one, not both"}},
		{"no wind", solveArgs(), []string{"give --wind-class (N1–N6, C1–C4) or --region"}},
		{"unknown class", solveArgs("--wind-class", "N9"), []string{"--wind-class N9", "allowed N1–N6, C1–C4"}},
		{"unknown region", solveArgs("--region", "Z9", "--terrain", "2"), []string{"--region Z9", "allowed A0", "NZ4"}},
		{"terrain 5", with(b2, "--terrain", "5"), []string{"--terrain 5", "allowed 1, 2, 2.5, 3, 4"}},
		{"region without terrain", without(b2, "--terrain"), []string{"--terrain", "required with --region"}},
		{"site flag with a class", plus(n3, "--terrain", "2"), []string{"--terrain", "applies to --region only"}},
		{"life not tabulated", plus(b2, "--life", "30"), []string{"--life 30", "allowed 5, 25, 50, 100"}},
		{"importance 5", plus(b2, "--importance", "5"), []string{"--importance 5", "allowed 1, 2, 3, 4"}},
		{"shielding above 1", plus(b2, "--ms", "1.2"), []string{"--ms 1.2", "allowed 0.7 ≤ value ≤ 1"}},
		{"bad base", plus(n3, "--base", "hinged"), []string{"--base hinged", "allowed pinned, fixed"}},
		{"negative hoist", plus(n3, "--hoist-kn", "-2"), []string{"--hoist-kn -2", "allowed 0 (none) or a positive load in kN"}},
		{"hoist beyond the range", plus(n3, "--hoist-kn", "150"), []string{"--hoist-kn 150", "allowed 0 ≤ value ≤ 100"}},
		{"length not whole bays", with(n3, "--length", "20"), []string{"--length 20 with --bay 6", "whole number of bays",
			"18 m (3 bays), 24 m (4 bays)", "--bay 6.667 m (3 bays), 5 m (4 bays)"}},
		{"too many bays", with(with(n3, "--length", "195"), "--bay", "1.5"), []string{"--length 195 with --bay 1.5", "130 bays"}},
		{"report extension", plus(n3, "--report", filepath.Join(dir, "calc.txt")), []string{"calc.txt", "allowed .md (Markdown) or .html"}},
		{"report directory missing", plus(n3, "--report", filepath.Join(dir, "no", "calc.md")), []string{"--report", "no such file or directory"}},
		{"report is a directory", plus(n3, "--report", dir+"/"), []string{"--report", "is a directory"}},
		{"bad catalogue", plus(n3, "--catalog", badCSV), []string{"--catalog", "bad.csv"}},
		{"missing catalogue", plus(n3, "--catalog", filepath.Join(dir, "none.csv")), []string{"--catalog", "none.csv"}},
		{"bad grid file", plus(n3, "--grid", badGrid), []string{"--grid", "bad.toml", "max_purlin_spacing_m"}},
		{"unknown flag", plus(n3, "--spam", "1"), []string{"unknown flag: --spam"}},
		{"stray argument", plus(n3, "extra"), []string{`unexpected argument "extra"`}},
		{"several at once", solveArgs("--span", "0", "--pitch", "50", "--base", "x"), []string{"--span 0", "--pitch 50", "--base x", "give --wind-class"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var out, errb bytes.Buffer
			code := run(tc.args, &out, &errb)
			if code != exitUsage {
				t.Fatalf("exit %d, want %d; stderr: %s", code, exitUsage, errb.String())
			}
			for _, w := range tc.want {
				if !strings.Contains(errb.String(), w) {
					t.Errorf("stderr lacks %q:\n%s", w, errb.String())
				}
			}
		})
	}
}

func TestSolveHelp(t *testing.T) {
	var out, errb bytes.Buffer
	if code := run([]string{"solve", "--help"}, &out, &errb); code != exitOK {
		t.Fatalf("exit %d, want 0", code)
	}
	for _, w := range []string{"--span", "--wind-class", "--report", "--grid", caution} {
		if !strings.Contains(out.String(), w) {
			t.Errorf("help lacks %q", w)
		}
	}
}

// TestSolveCautionIsTheReportCaution: the report package states the same
// caution as every other output.
func TestSolveCautionIsTheReportCaution(t *testing.T) {
	if report.Caution != caution {
		t.Errorf("report.Caution %q differs from the command caution %q", report.Caution, caution)
	}
}

// solveJSON is the part of `solve --json` the tests read.
type solveJSON struct {
	Caution string `json:"caution"`
	Status  string `json:"status"`
	Reason  string `json:"reason"`
	Case    struct {
		ID           string  `json:"id"`
		SpanM        float64 `json:"span_m"`
		LengthM      float64 `json:"length_m"`
		Bays         int     `json:"bays"`
		BaySpacingM  float64 `json:"bay_spacing_m"`
		EavesHeightM float64 `json:"eaves_height_m"`
		RoofPitchDeg float64 `json:"roof_pitch_deg"`
		Options      struct {
			Cladding struct {
				MaxPurlinSpacingM float64 `json:"max_purlin_spacing_m"`
			} `json:"cladding"`
		} `json:"options"`
	} `json:"case"`
	VUltimateMS float64 `json:"v_ultimate_ms"`
	Members     []struct {
		Role        string  `json:"role"`
		Designation string  `json:"designation"`
		SpacingM    float64 `json:"spacing_m"`
		MassKg      float64 `json:"mass_kg"`
	} `json:"members"`
	SteelMassKg      float64         `json:"steel_mass_kg"`
	MassPerFloorKgM2 float64         `json:"mass_per_floor_kg_m2"`
	Calculation      json.RawMessage `json:"calculation"`
}

func runSolveJSON(t *testing.T, args ...string) (solveJSON, int, string) {
	t.Helper()
	var out, errb bytes.Buffer
	code := run(append(args, "--json"), &out, &errb)
	var got solveJSON
	if err := json.Unmarshal(out.Bytes(), &got); err != nil {
		t.Fatalf("--json output does not parse: %v\n%s\nstderr: %s", err, out.String(), errb.String())
	}
	return got, code, errb.String()
}

// TestSolveJSON checks that --json is one JSON document with unit-bearing
// keys that carry the flags' inputs, whatever the design's status, and that
// the exit status follows the status.
func TestSolveJSON(t *testing.T) {
	got, code, stderr := runSolveJSON(t, solveArgs("--wind-class", "N3")...)
	want := exitOK
	if got.Status != "ok" {
		want = exitFail
		if got.Reason == "" || !strings.Contains(stderr, got.Reason) {
			t.Errorf("status %s: reason %q not filled or not on stderr %q", got.Status, got.Reason, stderr)
		}
	}
	if code != want {
		t.Errorf("status %s: exit %d, want %d", got.Status, code, want)
	}
	c := got.Case
	if c.SpanM != 12 || c.LengthM != 24 || c.Bays != 4 || c.BaySpacingM != 6 || c.EavesHeightM != 3.6 || c.RoofPitchDeg != 10 {
		t.Errorf("case inputs %+v, want the flags' 12, 24, 4 × 6, 3.6, 10", c)
	}
	// AS 4055-2021 Table 2.1: N3 ultimate speed 50 m/s.
	if got.VUltimateMS != 50 {
		t.Errorf("v_ultimate_ms %g, want 50 (AS 4055-2021 Table 2.1, N3)", got.VUltimateMS)
	}
	if got.Caution != caution || len(got.Calculation) == 0 {
		t.Errorf("JSON lacks the caution or the calculation")
	}
	if !strings.HasPrefix(c.ID, "s12-l24x4-h3.6-p10-N3-pinned-") {
		t.Errorf("case id %q", c.ID)
	}
}

// TestSolveGridOptions checks that --grid applies the file's options to
// the case (and not its geometry): a purlin spacing limit of 0.9 m.
func TestSolveGridOptions(t *testing.T) {
	grid := filepath.Join(t.TempDir(), "opts.toml")
	src := "[geometry]\nspan_m = [20]\nlength_m = [30]\neaves_height_m = [4]\nroof_pitch_deg = [5]\n" +
		"[wind]\nhousing_classes = [\"N1\"]\n[cladding]\nmax_purlin_spacing_m = 0.9\n"
	if err := os.WriteFile(grid, []byte(src), 0o644); err != nil {
		t.Fatal(err)
	}
	got, _, _ := runSolveJSON(t, solveArgs("--wind-class", "N3", "--grid", grid)...)
	if got.Case.SpanM != 12 || got.Case.Options.Cladding.MaxPurlinSpacingM != 0.9 {
		t.Errorf("span %g (want 12, from the flags), max purlin spacing %g (want 0.9, from the grid)",
			got.Case.SpanM, got.Case.Options.Cladding.MaxPurlinSpacingM)
	}
	for _, m := range got.Members {
		if m.Role == "purlin" && m.SpacingM > 0.9+1e-9 {
			t.Errorf("purlin spacing %g m exceeds the grid's 0.9 m", m.SpacingM)
		}
	}
	var out, errb bytes.Buffer
	opening := filepath.Join(t.TempDir(), "door.toml")
	os.WriteFile(opening, []byte(src+"[dominant_opening]\nwall = \"side\"\nwidth_m = 5\nheight_m = 3\n"), 0o644)
	code := run(solveArgs("--wind-class", "N3", "--bay", "4", "--grid", opening), &out, &errb)
	if code != exitUsage || !strings.Contains(errb.String(), "applied to this case: dominant_opening.width_m") {
		t.Errorf("a 5 m door in 4 m bays: exit %d, stderr %q; want 2 naming dominant_opening.width_m", code, errb.String())
	}
}

// TestSolveReport writes both report formats through the command and checks
// each has every section and the caution twice, and the schedule on stdout.
func TestSolveReport(t *testing.T) {
	dir := t.TempDir()
	for _, name := range []string{"calc.md", "calc.html"} {
		path := filepath.Join(dir, name)
		var out, errb bytes.Buffer
		code := run(solveArgs("--wind-class", "N3", "--report", path), &out, &errb)
		if code != exitOK && code != exitFail {
			t.Fatalf("%s: exit %d: %s", name, code, errb.String())
		}
		data, err := os.ReadFile(path)
		if err != nil {
			t.Fatalf("%s not written: %v", name, err)
		}
		page := string(data)
		if n := strings.Count(page, caution); n != 2 {
			t.Errorf("%s: caution %d times, want 2", name, n)
		}
		for _, h := range report.SectionHeadings {
			if !strings.Contains(page, h) {
				t.Errorf("%s: no section %q", name, h)
			}
		}
		if strings.HasSuffix(name, ".html") {
			checkXML(t, page)
		}
		for _, w := range []string{caution, "Status:", "Total steel mass:", "Fly braces:", "Knee braces:", "Footings:"} {
			if !strings.Contains(out.String(), w) {
				t.Errorf("stdout lacks %q", w)
			}
		}
	}
}

// checkXML fails unless page reads as strict XML: every element closed and
// nested, every entity known (the report's HTML is XHTML-style).
func checkXML(t *testing.T, page string) {
	t.Helper()
	dec := xml.NewDecoder(strings.NewReader(page))
	dec.Strict = true
	for {
		_, err := dec.Token()
		if errors.Is(err, io.EOF) {
			return
		}
		if err != nil {
			t.Fatalf("HTML report is not well-formed: %v", err)
		}
	}
}

// TestSolveRealisticBuilding designs one realistic shed (illustrative: span
// 12 m, 4 × 6 m bays, eaves 3.6 m, 10°, N3): it must pass, and its total
// mass must equal the sum of its member groups' masses.
func TestSolveRealisticBuilding(t *testing.T) {
	got, code, stderr := runSolveJSON(t, solveArgs("--wind-class", "N3")...)
	if code != exitOK || got.Status != "ok" {
		t.Fatalf("exit %d, status %s (%s): want a passing design; stderr %s", code, got.Status, got.Reason, stderr)
	}
	var sum float64
	for _, m := range got.Members {
		sum += m.MassKg
	}
	if got.SteelMassKg <= 0 || math.Abs(got.SteelMassKg-sum) > 1e-9*got.SteelMassKg {
		t.Errorf("steel_mass_kg %g, sum of members' mass_kg %g: want equal and positive", got.SteelMassKg, sum)
	}
	if perFloor := got.SteelMassKg / (12 * 24); math.Abs(got.MassPerFloorKgM2-perFloor) > 1e-9*perFloor {
		t.Errorf("mass_per_floor_kg_m2 %g, want %g (total over 12 m × 24 m)", got.MassPerFloorKgM2, perFloor)
	}
}

// TestPrintSchedule prints a hand-built result (test input, illustrative
// sections) and checks each part of the schedule is there.
func TestPrintSchedule(t *testing.T) {
	gov := optimize.Governing{Check: "member moment capacity, lateral-torsional buckling", Standard: "AS/NZS 4600:2018",
		Clause: "cl. 3.3.3.2", LimitState: "ULS", Combination: "ULS 0.9G+Wu crosswind", Utilisation: 0.912}
	res := &optimize.Result{
		Case: grids.Case{ID: "s12-test", SpanM: 12, LengthM: 24, Bays: 4, BaySpacingM: 6, EavesHeightM: 3.6, RoofPitchDeg: 10,
			Wind: grids.Wind{HousingClass: "N3"}, Base: grids.BasePinned},
		Status: optimize.OK, VUltimateMS: 50, VServiceMS: 32, QUltimateKPa: 1.5, QServiceKPa: 0.6144,
		Members: []optimize.MemberGroup{
			{Role: optimize.RolePurlin, Designation: "Z200x1.9", SpacingM: 1.1, SpanType: "lapped", Count: 56, LengthEachM: 6.6, MassKg: 1182.7, Governing: gov},
			{Role: optimize.RoleKneeBrace},
			{Role: optimize.RoleRafter, Designation: "C250x75x2.4", Count: 10, LengthEachM: 6.093, MassKg: 488.2, Governing: gov},
		},
		Frames: 5, FlyBracesPerFrame: 4, KneeBraceColumnM: 0.8, KneeBraceRafterM: 1.2,
		Footing:     optimize.Footing{Bases: "frame bases", WidthM: 0.6, DepthM: 0.75, Count: 10, ConcreteM3: 2.7, BoltSize: "M16 4.6/S", BoltsPerBase: 2, Governing: gov},
		SteelMassKg: 1670.9, MassPerFloorKgM2: 1670.9 / 288,
	}
	var out bytes.Buffer
	if err := printSchedule(&out, res); err != nil {
		t.Fatal(err)
	}
	text := out.String()
	for _, w := range []string{
		caution, "Case s12-test", "wind N3", "Status: ok",
		"purlin", "Z200x1.9", "1.100 lapped", "1182.7", "0.912", "AS/NZS 4600:2018 cl. 3.3.3.2", "ULS 0.9G+Wu crosswind",
		"rafter", "C250x75x2.4",
		"Fly braces: 4 per frame, 20 in the building (5 frames)",
		"Knee braces: 0.800 m down the column to 1.200 m along the rafter",
		"Footings: frame bases, 10 pads 0.60 m square × 0.75 m deep (2.70 m³), 2 × M16 4.6/S bolts per base",
		"Total steel mass: 1670.9 kg, 5.80 kg/m² of floor", // 1670.9 / (12 × 24) = 5.802
	} {
		if !strings.Contains(text, w) {
			t.Errorf("schedule lacks %q:\n%s", w, text)
		}
	}
	if strings.Contains(text, "knee brace ") {
		t.Errorf("schedule lists the absent knee-brace group:\n%s", text)
	}
	if strings.Index(text, caution) != 0 {
		t.Errorf("schedule does not open with the caution")
	}
}
