package grids

import (
	"slices"
	"strings"
	"testing"
)

// mixed has every dimension with more than one value, so the count must be
// the product of the list lengths.
const mixed = `[geometry]
span_m = [6.0, 9.0, 12.0]
bays = [3, 4]
bay_spacing_m = [3.0, 3.6]
eaves_height_m = [2.7, 3.6]
roof_pitch_deg = [5, 10]
[wind]
housing_classes = ["N1", "N3"]
[[wind.site]]
region = "B2"
terrain_category = 2.5
[frame]
base = "both"
hoist_kn = [0, 5]
`

func mustParse(t testing.TB, file string) *Grid {
	t.Helper()
	g, err := Parse([]byte(file), "test.toml")
	if err != nil {
		t.Fatal(err)
	}
	return g
}

func TestCountIsProductOfDimensions(t *testing.T) {
	g := mustParse(t, mixed)
	// 3 winds × 2 eaves × 3 spans × (2 spacings × 2 bay counts) × 2 pitches × 2 bases × 2 hoists.
	want := 3 * 2 * 3 * 4 * 2 * 2 * 2
	if g.Count() != want {
		t.Fatalf("got %d cases, want %d", g.Count(), want)
	}
	n := 0
	for c := range g.Cases() {
		if c.Index != n {
			t.Fatalf("case %d has index %d", n, c.Index)
		}
		n++
	}
	if n != want {
		t.Errorf("Cases yielded %d, want %d", n, want)
	}
}

func TestEnumerationOrderKeepsTablesContiguous(t *testing.T) {
	g := mustParse(t, mixed)
	// A span table is one wind condition and eaves height: its cases must be
	// one contiguous run, and spans must not decrease within it.
	seen := map[string]bool{}
	prevTable, prevSpan := "", 0.0
	for c := range g.Cases() {
		table := c.WindCondition() + "|" + fmtNum(c.EavesHeightM)
		if table != prevTable {
			if seen[table] {
				t.Fatalf("case %d: table %s appears again after another table", c.Index, table)
			}
			seen[table], prevTable, prevSpan = true, table, 0
		}
		if c.SpanM < prevSpan {
			t.Fatalf("case %d: span %g after %g within table %s", c.Index, c.SpanM, prevSpan, table)
		}
		prevSpan = c.SpanM
	}
	if len(seen) != 3*2 {
		t.Errorf("got %d tables, want 6", len(seen))
	}
}

func TestIDsStableAndUnique(t *testing.T) {
	g1, g2 := mustParse(t, mixed), mustParse(t, mixed)
	ids := map[string]int{}
	for c := range g1.Cases() {
		if other := g2.Case(c.Index).ID; other != c.ID {
			t.Fatalf("case %d: id %s on one parse, %s on another", c.Index, c.ID, other)
		}
		if j, dup := ids[c.ID]; dup {
			t.Fatalf("cases %d and %d share id %s", j, c.Index, c.ID)
		}
		ids[c.ID] = c.Index
	}
	// The id depends on the building, not its position: reordering the spans
	// moves cases but keeps their ids.
	g3 := mustParse(t, strings.Replace(mixed, "[6.0, 9.0, 12.0]", "[12.0, 6.0, 9.0]", 1))
	for c := range g3.Cases() {
		j, ok := ids[c.ID]
		if !ok {
			t.Fatalf("reordered grid has a new id %s", c.ID)
		}
		if o := g1.Case(j); o.SpanM != c.SpanM || o.LengthM != c.LengthM || o.Wind != c.Wind || o.HoistKN != c.HoistKN {
			t.Fatalf("id %s names %+v and %+v", c.ID, o, c)
		}
	}
}

func TestCaseIDFormat(t *testing.T) {
	c := Case{SpanM: 12, LengthM: 24, Bays: 4, BaySpacingM: 6, EavesHeightM: 3.6, RoofPitchDeg: 10,
		Wind: Wind{HousingClass: "N3"}, Base: BasePinned}
	id := CaseID(c)
	prefix := "s12-l24x4-h3.6-p10-N3-pinned-"
	if !strings.HasPrefix(id, prefix) || len(id) != len(prefix)+12 {
		t.Errorf("got id %q, want %q followed by 12 hex digits", id, prefix)
	}
	c.HoistKN = 10
	if id2 := CaseID(c); id2 == id || !strings.Contains(id2, "-k10-") {
		t.Errorf("got id %q for a 10 kN hoist, want a new id with -k10-", id2)
	}
}

func TestWindKey(t *testing.T) {
	tests := []struct {
		name string
		w    Wind
		want string
	}{
		{"class", Wind{HousingClass: "N3"}, "N3"},
		{"site", Wind{Region: "B2", TerrainCategory: 2.5, ImportanceLevel: 2, DesignLifeYears: 50, Ms: 1, Mt: 1}, "B2 TC2.5 IL2 50y"},
		{"multipliers", Wind{Region: "A2", TerrainCategory: 3, ImportanceLevel: 1, DesignLifeYears: 25, Ms: 0.85, Mt: 1.1, Md: 0.95}, "A2 TC3 IL1 25y Ms0.85 Mt1.1 Md0.95"},
	}
	for _, tt := range tests {
		if got := tt.w.Key(); got != tt.want {
			t.Errorf("%s: got %q, want %q", tt.name, got, tt.want)
		}
	}
}

func TestCasesStopsEarly(t *testing.T) {
	g := mustParse(t, mixed)
	var got []int
	for c := range g.Cases() {
		if c.Index == 3 {
			break
		}
		got = append(got, c.Index)
	}
	if !slices.Equal(got, []int{0, 1, 2}) {
		t.Errorf("got %v, want [0 1 2]", got)
	}
}

func BenchmarkCases(b *testing.B) {
	g, err := Default()
	if err != nil {
		b.Fatal(err)
	}
	for b.Loop() {
		for c := range g.Cases() {
			_ = c.ID
		}
	}
}
