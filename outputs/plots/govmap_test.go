package plots

import (
	"bytes"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

func TestGoverningCheckMap(t *testing.T) {
	c := collect(testResults())
	var b bytes.Buffer
	cats, err := c.GoverningCheckMap(&b, GoverningMap{})
	if err != nil {
		t.Fatal(err)
	}
	// 3 winds × 5 spans = 15 cells (testResults): spans 6 and 9 m are
	// purlin-heavy (6 cells), 12–18 m rafter-heavy (9 cells), except C2 at
	// 18 m, where the 36 m case is unsolved and represents the cell.
	want := map[string]int{
		"combined axial and bending":                           8,
		"purlin bending with through-fastened flange (uplift)": 6,
		labelNoSolution: 1,
	}
	if len(cats) != len(want) {
		t.Fatalf("got categories %+v, want %v", cats, want)
	}
	for _, cat := range cats {
		if want[cat.Check] != cat.Cells {
			t.Errorf("%s: got %d cells, want %d", cat.Check, cat.Cells, want[cat.Check])
		}
	}
	if cats[0].Check != "combined axial and bending" {
		t.Errorf("first category: got %q, want the most frequent", cats[0].Check)
	}
	byName, byClass := elementCounts(t, b.Bytes())
	if byClass["cell"] != 15 || byName["title"] != 15 {
		t.Errorf("got %d cells with %d titles, want 15 each", byClass["cell"], byName["title"])
	}
	for _, s := range []string{Caution, "Span (m)", "Wind condition", "no solution (1)"} {
		if !strings.Contains(b.String(), s) {
			t.Errorf("map lacks %q", s)
		}
	}
	golden(t, "governing_map.svg", b.Bytes())
}

func TestGoverningCheckMapByRoleAndLength(t *testing.T) {
	c := collect(testResults())
	var b bytes.Buffer
	cats, err := c.GoverningCheckMap(&b, GoverningMap{Role: optimize.RoleColumn, Rows: RowsLength,
		Select: func(cs grids.Case) bool { return cs.Wind.HousingClass == "C2" }})
	if err != nil {
		t.Fatal(err)
	}
	// C2 only: 2 lengths × 5 spans; one unsolved (18 m × 36 m), the rest
	// governed by the column check testResults gives every column.
	if len(cats) != 2 || cats[0].Check != "column deflection (SLS)" || cats[0].Cells != 9 || cats[1].Cells != 1 {
		t.Errorf("got %+v, want column deflection (SLS) 9 cells, no solution 1", cats)
	}
	if !strings.Contains(b.String(), "36 m") {
		t.Errorf("map lacks the 36 m length row")
	}
}

func TestGoverningCheckMapBadOptions(t *testing.T) {
	c := collect(testResults())
	for _, tc := range []struct {
		name string
		m    GoverningMap
		want string
	}{
		{"unknown role", GoverningMap{Role: "lintel"}, `role "lintel"`},
		{"unknown rows", GoverningMap{Rows: 7}, "rows 7"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := c.GoverningCheckMap(&bytes.Buffer{}, tc.m)
			if err == nil || !strings.Contains(err.Error(), tc.want) {
				t.Errorf("got %v, want an error naming %s", err, tc.want)
			}
		})
	}
}

func TestGoverningCheckMapDeterministic(t *testing.T) {
	var first, second bytes.Buffer
	if _, err := collect(testResults()).GoverningCheckMap(&first, GoverningMap{}); err != nil {
		t.Fatal(err)
	}
	if _, err := collect(testResults()).GoverningCheckMap(&second, GoverningMap{}); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(first.Bytes(), second.Bytes()) {
		t.Errorf("same results gave different SVG:\n%s", lineDiff(first.String(), second.String()))
	}
}
