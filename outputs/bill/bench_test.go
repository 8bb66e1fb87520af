package bill

import (
	"math/rand/v2"
	"testing"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// benchGrid has 10 × 8 × 16 × 10 × 4 × 2 = 102,400 cases.
func benchGrid() testGrid {
	g := testGrid{
		winds:   []testCondition{condN1, condN2, condN3, condN4, condN5, condN6, condB2, condC1, condC2, condC3},
		heights: []float64{2.4, 3, 3.6, 4.2, 4.8, 5.4, 6, 7.2},
		pitches: []float64{5, 10, 15, 22.5},
		bases:   []string{"pinned", "fixed"},
	}
	for s := 6.0; len(g.spans) < 16; s += 1.5 {
		g.spans = append(g.spans, s)
	}
	for _, b := range []int{2, 3, 4, 5, 6} {
		g.lengths = append(g.lengths, testLength{b, 4.5}, testLength{b, 6})
	}
	return g
}

// BenchmarkLookup reports the time of one lookup (choose the case, read it
// whole, build its bill) in a dataset of 102,400 cases.
func BenchmarkLookup(b *testing.B) {
	dir := b.TempDir()
	if err := writeRows(dir, benchGrid().rows()); err != nil {
		b.Fatal(err)
	}
	d, err := dataset.Open(dir)
	if err != nil {
		b.Fatal(err)
	}
	defer d.Close()
	if d.NumRows() < 100_000 {
		b.Fatalf("dataset has %d rows, want ≥ 100,000", d.NumRows())
	}
	rng := rand.New(rand.NewPCG(3, 4))
	classes := []string{"N1", "N2", "N3", "N4", "N5", "C1", "C2"}
	queries := make([]Query, 64)
	for i := range queries {
		queries[i] = Query{SpanM: 6 + rng.Float64()*20, LengthM: 9 + rng.Float64()*25, EavesHeightM: 2.4 + rng.Float64()*4,
			Wind: WindRequest{Class: classes[rng.IntN(len(classes))]}}
	}
	var groups, read int
	i := 0
	for b.Loop() {
		m, err := Lookup(d, queries[i%len(queries)], Settings{Wind: testSiteWind})
		i++
		if err != nil {
			if _, ok := err.(*NotCoveredError); ok {
				continue
			}
			b.Fatal(err)
		}
		if _, err := New(&m.Row); err != nil {
			b.Fatal(err)
		}
		groups += m.Scan.RowGroups
		read += m.Scan.RowGroupsRead
	}
	b.ReportMetric(float64(read)/float64(i), "groups-read/op")
	b.ReportMetric(float64(groups)/float64(i), "groups/op")
}
