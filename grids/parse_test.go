package grids

import (
	"errors"
	"strings"
	"testing"
)

// minimal is a valid grid; bad files below change one line of it.
const minimal = `name = "test"
[geometry]
span_m = [6.0, 9.0]
bays = [3, 4]
bay_spacing_m = [3.0]
eaves_height_m = [3.0]
roof_pitch_deg = [10]
[wind]
housing_classes = ["N2"]
`

// withLine returns minimal with line n (1-based) replaced by s.
func withLine(n int, s string) string {
	lines := strings.Split(minimal, "\n")
	lines[n-1] = s
	return strings.Join(lines, "\n")
}

func TestParseBadFiles(t *testing.T) {
	// Allowed sets: AS 4055:2021 Table 2.1 classes; AS/NZS 1170.2:2021
	// Cl 4.2.1 terrain categories; AS/NZS 1170.0:2002 Table F2 lives.
	site := "[[wind.site]]\nregion = \"B2\"\nterrain_category = 2\n"
	tests := []struct {
		name    string
		file    string
		line    int
		key     string
		allowed string // substring of Problem.Allowed
	}{
		{"unknown key", withLine(3, "spam_m = [6.0]"), 3, "geometry.spam_m", "unknown key"},
		{"unknown table", minimal + "[extras]\nx = 1\n", 10, "extras", "unknown key"},
		{"wrong type", withLine(3, `span_m = "six"`), 3, "geometry.span_m", "list of numbers"},
		{"wrong element type", withLine(3, `span_m = [6.0, "nine"]`), 3, "geometry.span_m", "must be a number"},
		{"negative span", withLine(3, "span_m = [-6.0]"), 3, "geometry.span_m", "3 ≤ value ≤ 40"},
		{"span too large", withLine(3, "span_m = [45]"), 3, "geometry.span_m", "3 ≤ value ≤ 40"},
		{"empty list", withLine(6, "eaves_height_m = []"), 6, "geometry.eaves_height_m", "must not be empty"},
		{"duplicate value", withLine(3, "span_m = [6.0, 6.0]"), 3, "geometry.span_m", "duplicate"},
		{"pitch too steep", withLine(7, "roof_pitch_deg = [40]"), 7, "geometry.roof_pitch_deg", "0 ≤ value ≤ 35"},
		{"bay spacing too small", withLine(5, "bay_spacing_m = [1.0]"), 5, "geometry.bay_spacing_m", "1.5 ≤ value ≤ 12"},
		{"range step zero", withLine(3, "span_m = {from = 6, to = 9, step = 0}"), 3, "geometry.span_m.step", "step > 0"},
		{"range from above to", withLine(3, "span_m = {from = 9, to = 6, step = 1}"), 3, "geometry.span_m.from", "from ≤ to"},
		{"range off step", withLine(3, "span_m = {from = 6, to = 10, step = 1.5}"), 3, "geometry.span_m.to", "fall on a step"},
		{"range typo", withLine(3, "span_m = {from = 6, too = 9, step = 1}"), 3, "geometry.span_m.too", "from, to, step"},
		{"fractional bays", withLine(4, "bays = [3.5]"), 4, "geometry.bays", "whole number"},
		{"length both ways", withLine(2, "[geometry]\nlength_m = [12.0]"), 3, "geometry.length_m", "not both"},
		{"unknown class", withLine(9, `housing_classes = ["N7"]`), 9, "wind.housing_classes", "N1 … N6, C1 … C4"},
		{"no wind", withLine(9, "housing_classes = []"), 9, "wind.housing_classes", "must not be empty"},
		{"terrain 5", minimal + "[[wind.site]]\nregion = \"B2\"\nterrain_category = 5\n", 12, "wind.site[0].terrain_category", "1, 2, 2.5, 3, 4"},
		{"unknown region", minimal + "[[wind.site]]\nregion = \"E\"\nterrain_category = 2\n", 11, "wind.site[0].region", "B1, B2"},
		{"importance 5", minimal + site + "importance_level = 5\n", 13, "wind.site[0].importance_level", "1, 2, 3, 4"},
		{"life 30", minimal + site + "design_life_years = 30\n", 13, "wind.site[0].design_life_years", "5, 25, 50, 100"},
		{"IL4 100 years", minimal + site + "importance_level = 4\ndesign_life_years = 100\n", 14, "wind.site[0].design_life_years", "not tabulated"},
		{"missing terrain", minimal + "[[wind.site]]\nregion = \"B2\"\n", 10, "wind.site[0].terrain_category", "missing"},
		{"bad base", minimal + "[frame]\nbase = \"hinged\"\n", 11, "frame.base", `"pinned", "fixed", "both"`},
		{"negative hoist", minimal + "[frame]\nhoist_kn = [-5]\n", 11, "frame.hoist_kn", "0 ≤ value ≤ 100"},
		{"zero roof dead", minimal + "[cladding]\nroof_dead_kpa = 0\n", 11, "cladding.roof_dead_kpa", "0 < value ≤ 1"},
		{"bad family", minimal + "[members]\npurlin_families = [\"2C\"]\n", 11, "members.purlin_families", `"Z", "C"`},
		{"bool as string", minimal + "[members]\nknee_braces = \"yes\"\n", 11, "members.knee_braces", "true or false"},
		{"door too tall", minimal + "[dominant_opening]\nwall = \"end\"\nwidth_m = 3\nheight_m = 3.0\n", 13, "dominant_opening.height_m", "smallest eaves height"},
		{"door too wide", minimal + "[dominant_opening]\nwall = \"side\"\nwidth_m = 3.0\nheight_m = 2.4\n", 12, "dominant_opening.width_m", "smallest bay spacing"},
		{"price missing", minimal + "[costs]\nper_kg = {Z = 3.0}\n", 11, "costs.per_kg", "no price for family C"},
		{"syntax", withLine(3, "span_m = [6.0,"), 4, "", "TOML syntax"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := Parse([]byte(tt.file), "bad.toml")
			var ve *ValidationError
			if !errors.As(err, &ve) {
				t.Fatalf("got error %v, want a *ValidationError", err)
			}
			for _, p := range ve.Problems {
				if (tt.key == "" || p.Key == tt.key) && strings.Contains(p.Allowed, tt.allowed) {
					if p.Line != tt.line || p.File != "bad.toml" {
						t.Errorf("%s: got line %d, want %d", p, p.Line, tt.line)
					}
					return
				}
			}
			t.Errorf("got problems\n%v\nwant key %q with %q", ve, tt.key, tt.allowed)
		})
	}
}

func TestParseReportsAllProblemsInOnePass(t *testing.T) {
	file := "[geometry]\nspan_m = [-1]\nbays = [3]\nbay_spacing_m = [3]\neaves_height_m = [99]\nroof_pitch_deg = [10]\ncolour = \"red\"\n" +
		"[wind]\nhousing_classes = [\"X9\"]\n"
	_, err := Parse([]byte(file), "many.toml")
	var ve *ValidationError
	if !errors.As(err, &ve) {
		t.Fatalf("got %v, want *ValidationError", err)
	}
	wantLines := []int{2, 5, 7, 9} // span, eaves, unknown key, class: in file order
	if len(ve.Problems) != len(wantLines) {
		t.Fatalf("got %d problems, want %d:\n%v", len(ve.Problems), len(wantLines), ve)
	}
	for i, p := range ve.Problems {
		if p.Line != wantLines[i] {
			t.Errorf("problem %d: got line %d, want %d (%s)", i, p.Line, wantLines[i], p)
		}
		if p.Value == "" || p.Allowed == "" {
			t.Errorf("problem %d lacks value or allowed: %s", i, p)
		}
	}
	if got := ve.Problems[0].String(); got != "many.toml:2: geometry.span_m = -1: allowed 3 ≤ value ≤ 40" {
		t.Errorf("got %q", got)
	}
}

func TestParseDefaults(t *testing.T) {
	g, err := Parse([]byte(minimal), "min.toml")
	if err != nil {
		t.Fatal(err)
	}
	o := g.Options
	// Defaults as stated in the key reference (keys.go), each with its source there.
	if o.Limits.PurlinDeflectionRatio != 150 || o.Limits.EavesDriftRatio != 150 || o.Cladding.RoofDeadKPa != 0.10 {
		t.Errorf("got limits %+v, cladding %+v; want span/150, height/150, 0.10 kPa", o.Limits, o.Cladding)
	}
	if len(g.Bases) != 1 || g.Bases[0] != BasePinned || len(g.HoistsKN) != 1 || g.HoistsKN[0] != 0 {
		t.Errorf("got bases %v hoists %v, want [pinned] [0]", g.Bases, g.HoistsKN)
	}
	if o.Opening != nil || o.Costs != nil {
		t.Errorf("got opening %v costs %v, want none", o.Opening, o.Costs)
	}
}

func TestParseLengthFromMaxBaySpacing(t *testing.T) {
	file := strings.Replace(minimal, "bays = [3, 4]\nbay_spacing_m = [3.0]", "length_m = [20.0, 24.0]\nmax_bay_spacing_m = 6.0", 1)
	g, err := Parse([]byte(file), "len.toml")
	if err != nil {
		t.Fatal(err)
	}
	// 20 m at ≤ 6 m bays needs ⌈20/6⌉ = 4 bays of 5 m; 24 m needs 4 bays of 6 m.
	want := []Length{{20, 4, 5}, {24, 4, 6}}
	for i, l := range g.Lengths {
		if l != want[i] {
			t.Errorf("length %d: got %+v, want %+v", i, l, want[i])
		}
	}
}

func TestParseRangeValues(t *testing.T) {
	file := withLine(3, "span_m = {from = 6.0, to = 18.0, step = 1.5}")
	g, err := Parse([]byte(file), "range.toml")
	if err != nil {
		t.Fatal(err)
	}
	// 6, 7.5, …, 18: (18 − 6)/1.5 + 1 = 9 values, exact in decimal.
	if len(g.SpansM) != 9 || g.SpansM[1] != 7.5 || g.SpansM[8] != 18 {
		t.Errorf("got spans %v, want 6 … 18 in steps of 1.5", g.SpansM)
	}
	file = withLine(6, "eaves_height_m = {from = 2.7, to = 3.3, step = 0.1}")
	g, err = Parse([]byte(file), "range.toml")
	if err != nil {
		t.Fatal(err)
	}
	if len(g.EavesHeightsM) != 7 || g.EavesHeightsM[3] != 3.0 {
		t.Errorf("got eaves %v, want 2.7, 2.8, … 3.3 without drift", g.EavesHeightsM)
	}
}

func TestHashIsSHA256OfBytes(t *testing.T) {
	g, err := Parse([]byte(minimal), "h.toml")
	if err != nil {
		t.Fatal(err)
	}
	g2, err := Parse([]byte(minimal+"# a comment changes the bytes\n"), "h.toml")
	if err != nil {
		t.Fatal(err)
	}
	if len(g.HashSHA256) != 64 || g.HashSHA256 == g2.HashSHA256 {
		t.Errorf("got hashes %q and %q, want two different 64-digit hex hashes", g.HashSHA256, g2.HashSHA256)
	}
}
