package bill

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// midGrid has 4 winds × 6 heights × 6 spans × 5 lengths × 3 pitches × 2 bases
// = 4,320 cases: two row groups (4,096 + 224).
func midGrid() testGrid {
	n1 := condN1
	n1.noSoln = func(r *dataset.Row) bool { return r.CaseIndex%11 == 0 }
	return testGrid{
		winds:   []testCondition{n1, condN2, condB2, condN3},
		heights: []float64{2.4, 3.0, 3.6, 4.2, 4.8, 6},
		spans:   []float64{6, 7.5, 9, 10.5, 12, 15},
		lengths: []testLength{{3, 6}, {4, 6}, {4, 4.5}, {6, 4.5}, {5, 7.5}},
		pitches: []float64{5, 10, 15},
		bases:   []string{"pinned", "fixed"},
	}
}

// oracle finds the answer by brute force over every row: a filter on each
// dimension as the package doc states it, then the smallest by the doc's
// order. It shares no code with Lookup's scan or row-group pruning.
func oracle(rows []dataset.Row, q Query) *dataset.Row {
	var best *dataset.Row
	for i := range rows {
		r := &rows[i]
		if !r.OK() || r.SpanM < q.SpanM || r.EavesHeightM < q.EavesHeightM || r.LengthM < q.LengthM ||
			r.RoofPitchDeg < q.RoofPitchDeg || (q.Base != "" && r.Base != q.Base) {
			continue
		}
		if q.BaySpacingM > 0 && (r.BaySpacingM < q.BaySpacingM || float64(r.Bays)*q.BaySpacingM < q.LengthM-1e-9) {
			continue
		}
		p, _ := testSiteWind(q.Wind, r)
		exact := r.WindClass == q.Wind.Class && q.Wind.Class != ""
		if !exact && (r.QULSKPa < p.QULSKPa || r.QSLSKPa < p.QSLSKPa) {
			continue
		}
		if best == nil || less(r, best) {
			best = r
		}
	}
	return best
}

func TestLookupMatchesExhaustiveSearch(t *testing.T) {
	rows := midGrid().rows()
	dir := t.TempDir()
	if err := writeRows(dir, rows); err != nil {
		t.Fatal(err)
	}
	d, err := dataset.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	rng := rand.New(rand.NewPCG(1, 2))
	pick := func(lo, hi float64) float64 { return math.Round((lo+rng.Float64()*(hi-lo))*10) / 10 }
	pruned := 0
	for range 150 {
		q := Query{SpanM: pick(5, 16), LengthM: pick(10, 40), EavesHeightM: pick(2, 6.5),
			Wind: class([]string{"N1", "N2", "N3"}[rng.IntN(3)])}
		if rng.IntN(2) == 0 {
			q.BaySpacingM = pick(4, 8)
		}
		if rng.IntN(2) == 0 {
			q.RoofPitchDeg = pick(1, 16)
		}
		if q.BaySpacingM > q.LengthM {
			continue
		}
		want := oracle(rows, q)
		m, err := Lookup(d, q, Settings{Wind: testSiteWind})
		if want == nil {
			if _, ok := err.(*NotCoveredError); !ok {
				t.Fatalf("%+v: got %v, want NotCoveredError", q, err)
			}
			continue
		}
		if err != nil {
			t.Fatalf("%+v: %v", q, err)
		}
		if m.Row.CaseID != want.CaseID {
			t.Fatalf("%+v: got case %s, want %s", q, m.Row.CaseID, want.CaseID)
		}
		// Never rounds down.
		if m.Row.SpanM < q.SpanM || m.Row.EavesHeightM < q.EavesHeightM || m.Row.LengthM < q.LengthM || m.Row.BaySpacingM < q.BaySpacingM {
			t.Fatalf("%+v: case %s rounds down", q, m.Row.CaseID)
		}
		if m.Scan.RowGroupsRead < 2*m.Scan.RowGroups {
			pruned++
		}
	}
	if pruned == 0 {
		t.Error("no lookup skipped a row group by its statistics")
	}
}
