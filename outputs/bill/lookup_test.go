package bill

import (
	"errors"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// smallGrid is a made-up range of 576 cases. N1 at 12 m span and 3.6 m
// eaves has no passing design, to test that lookup skips it.
func smallGrid() testGrid {
	n1 := condN1
	n1.noSoln = func(r *dataset.Row) bool { return r.SpanM == 12 && r.EavesHeightM == 3.6 }
	return testGrid{
		winds:   []testCondition{n1, condN2, condN3, condB2},
		heights: []float64{2.4, 3.0, 3.6},
		spans:   []float64{6, 9, 12},
		lengths: []testLength{{3, 6}, {4, 6}, {4, 4.5}, {6, 4.5}},
		pitches: []float64{5, 10},
		bases:   []string{"pinned", "fixed"},
	}
}

func openSmall(t *testing.T) *dataset.Dataset {
	t.Helper()
	dir := t.TempDir()
	if err := writeRows(dir, smallGrid().rows()); err != nil {
		t.Fatal(err)
	}
	d, err := dataset.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { d.Close() })
	return d
}

func class(c string) WindRequest { return WindRequest{Class: c} }

func TestLookupRounding(t *testing.T) {
	d := openSmall(t)
	type want struct {
		span, height, length, bay, pitch float64
		bays                             int
		wind, base                       string
	}
	for _, tc := range []struct {
		name string
		q    Query
		want want
	}{
		// Exact hits: every asked size is a solved size.
		{"exact", Query{SpanM: 9, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, RoofPitchDeg: 10, Base: "fixed", Wind: class("N2")},
			want{9, 3, 18, 6, 10, 3, "class N2", "fixed"}},
		// Span 7 m lies between solved 6 and 9 m: up to 9.
		{"span up", Query{SpanM: 7, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, Wind: class("N2")},
			want{9, 3, 18, 6, 5, 3, "class N2", "pinned"}},
		// A tie just below a solved size still rounds to it, never below.
		{"span tie", Query{SpanM: 8.999, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, Wind: class("N2")},
			want{9, 3, 18, 6, 5, 3, "class N2", "pinned"}},
		{"height up", Query{SpanM: 6, LengthM: 18, BaySpacingM: 6, EavesHeightM: 2.5, Wind: class("N2")},
			want{6, 3, 18, 6, 5, 3, "class N2", "pinned"}},
		// 18 m at 5 m bays needs ceil(18/5) = 4 bays of at least 5 m: 4 × 6 m = 24 m,
		// not 3 × 6 m = 18 m (too few bays) nor 4 × 4.5 m (bays too short).
		{"bays", Query{SpanM: 6, LengthM: 18, BaySpacingM: 5, EavesHeightM: 3, Wind: class("N2")},
			want{6, 3, 24, 6, 5, 4, "class N2", "pinned"}},
		// 20 m at 4.5 m bays needs ceil(20/4.5) = 5 bays: 6 × 4.5 m = 27 m.
		{"bays at solved spacing", Query{SpanM: 6, LengthM: 20, BaySpacingM: 4.5, EavesHeightM: 3, Wind: class("N2")},
			want{6, 3, 27, 4.5, 5, 6, "class N2", "pinned"}},
		// No bay asked: the smallest covering spacing, then the shortest length.
		{"length, any bay", Query{SpanM: 6, LengthM: 18, EavesHeightM: 3, Wind: class("N2")},
			want{6, 3, 18, 4.5, 5, 4, "class N2", "pinned"}},
		{"pitch up", Query{SpanM: 6, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, RoofPitchDeg: 7, Wind: class("N2")},
			want{6, 3, 18, 6, 10, 3, "class N2", "pinned"}},
		// N1 at 12 m × 3.6 m has no passing design: the next condition up, N2.
		{"skip no_solution", Query{SpanM: 12, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3.6, Wind: class("N1")},
			want{12, 3.6, 18, 6, 5, 3, "class N2", "pinned"}},
		// Region sites: the exact condition; else the least severe that covers.
		{"region exact", Query{SpanM: 6, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, Wind: WindRequest{Region: "B2", TerrainCategory: 2.5, ImportanceLevel: 2}},
			want{6, 3, 18, 6, 5, 3, "region B2, terrain category 2.5, importance level 2, design life 50 years", "pinned"}},
		// B1 site q_uls 0.9 + 0.05·3 = 1.05 kPa > N2's 0.96: B2 at 1.15 kPa covers before N3's 1.5.
		{"region by pressure", Query{SpanM: 6, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, Wind: WindRequest{Region: "B1", TerrainCategory: 3, ImportanceLevel: 2}},
			want{6, 3, 18, 6, 5, 3, "region B2, terrain category 2.5, importance level 2, design life 50 years", "pinned"}},
		// A2 site q_uls 1.3 kPa: above B2's 1.15 at 3 m, so N3 (1.5 kPa).
		{"region above", Query{SpanM: 6, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3, Wind: WindRequest{Region: "A2", TerrainCategory: 3, ImportanceLevel: 2}},
			want{6, 3, 18, 6, 5, 3, "class N3", "pinned"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			m, err := Lookup(d, tc.q, Settings{Wind: testSiteWind})
			if err != nil {
				t.Fatal(err)
			}
			r := m.Row
			got := want{r.SpanM, r.EavesHeightM, r.LengthM, r.BaySpacingM, r.RoofPitchDeg, r.Bays, rowWind(&r).String(), r.Base}
			if got != tc.want {
				t.Errorf("got %+v, want %+v", got, tc.want)
			}
			if !r.OK() {
				t.Errorf("used case %s has status %s", r.CaseID, r.Status)
			}
		})
	}
}

func TestLookupSaysNoSolutionWasSkipped(t *testing.T) {
	d := openSmall(t)
	m, err := Lookup(d, Query{SpanM: 12, LengthM: 18, BaySpacingM: 6, EavesHeightM: 3.6, Wind: class("N1")}, Settings{Wind: testSiteWind})
	if err != nil {
		t.Fatal(err)
	}
	if len(m.Passed) != 1 || !strings.Contains(m.Passed[0], "no_solution") || !strings.Contains(m.Passed[0], "-N1-") {
		t.Errorf("got passed %q, want the N1 no_solution case", m.Passed)
	}
}

func TestLookupWindRules(t *testing.T) {
	d := openSmall(t)
	q := Query{SpanM: 6, LengthM: 18, EavesHeightM: 3}
	// C1 has N3's pressures but is cyclonic (AS 4055-2021): no non-cyclonic case covers it.
	q.Wind = class("C1")
	var nc *NotCoveredError
	if _, err := Lookup(d, q, Settings{Wind: testSiteWind}); !errors.As(err, &nc) {
		t.Errorf("C1: got %v, want NotCoveredError", err)
	}
	// Without a SiteWind only the exact condition covers: B1 is not in the dataset.
	q.Wind = WindRequest{Region: "B1", TerrainCategory: 3, ImportanceLevel: 2}
	if _, err := Lookup(d, q, Settings{}); !errors.As(err, &nc) {
		t.Errorf("B1 without SiteWind: got %v, want NotCoveredError", err)
	}
	q.Wind = class("N2")
	if m, err := Lookup(d, q, Settings{}); err != nil || m.Row.WindClass != "N2" {
		t.Errorf("N2 without SiteWind: got %v, want the N2 case", err)
	}
}

func TestLookupNotCovered(t *testing.T) {
	d := openSmall(t)
	_, err := Lookup(d, Query{SpanM: 15, LengthM: 18, EavesHeightM: 3, Wind: class("N2")}, Settings{Wind: testSiteWind})
	var nc *NotCoveredError
	if !errors.As(err, &nc) {
		t.Fatalf("got %v, want NotCoveredError", err)
	}
	span := nc.Dimensions[0]
	// Largest solved span of smallGrid is 12 m; none at or above 15 m.
	if span.Name != "span" || span.Largest != "12 m" || span.Nearest != "" {
		t.Errorf("span: got %+v, want largest 12 m and no nearest", span)
	}
	height := nc.Dimensions[1]
	if height.Nearest != "3 m" || height.Largest != "3.6 m" {
		t.Errorf("height: got %+v, want nearest 3 m, largest 3.6 m", height)
	}
	if !strings.Contains(err.Error(), "none solved at or above") {
		t.Errorf("message %q does not say what is missing", err)
	}
}

func TestLookupBadQuery(t *testing.T) {
	d := openSmall(t)
	_, err := Lookup(d, Query{SpanM: -1, LengthM: 18, EavesHeightM: 3, Wind: class("N9")}, Settings{})
	if err == nil || !strings.Contains(err.Error(), "--span -1") || !strings.Contains(err.Error(), `--wind-class "N9"`) {
		t.Errorf("got %v, want errors naming --span and --wind-class", err)
	}
}
