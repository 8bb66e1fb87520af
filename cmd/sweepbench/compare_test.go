package main

import (
	"bytes"
	"path/filepath"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// madeUpResults are test inputs, not designs: the cases of the small example
// grid with masses that vary by case so a swapped or lost row shows.
func madeUpResults(t *testing.T) []optimize.Result {
	t.Helper()
	g, err := grids.LoadFile(filepath.Join("..", "..", "testdata", "examples", "small.toml"))
	if err != nil {
		t.Fatal(err)
	}
	var out []optimize.Result
	for c := range g.Cases() {
		r := optimize.Result{Case: c, SteelMassKg: 500 + 10*float64(c.Index), Analyses: c.Index}
		for _, role := range optimize.Roles {
			r.Members = append(r.Members, optimize.MemberGroup{Role: role, Designation: "C150x64x1.5", MassKg: 50})
		}
		out = append(out, r)
	}
	return out
}

// writeShards writes results as a dataset of n parts (shards 1/n … n/n, by
// grids.Shard.Range) in dir, cut into pieces as opts say.
func writeShards(t *testing.T, dir string, results []optimize.Result, n int, opts ...dataset.Option) {
	t.Helper()
	for k := 1; k <= n; k++ {
		meta := dataset.Meta{ProgramVersion: "test", GridSHA256: "g1", CatalogSHA256: "c1", Shard: dataset.Shard{K: k, N: n}}
		w, err := dataset.Create(dir, meta, opts...)
		if err != nil {
			t.Fatal(err)
		}
		lo, hi := grids.Shard{K: k, N: n}.Range(len(results))
		for _, r := range results[lo:hi] {
			if err := w.WriteResult(r); err != nil {
				t.Fatal(err)
			}
		}
		if err := w.Close(); err != nil {
			t.Fatal(err)
		}
	}
}

func TestCompareDatasets(t *testing.T) {
	results := madeUpResults(t)
	base := t.TempDir()
	one := filepath.Join(base, "one")
	writeShards(t, one, results, 1)

	changed := append([]optimize.Result(nil), results...)
	changed[5].SteelMassKg += 0.001
	tests := []struct {
		name      string
		results   []optimize.Result
		parts     int
		wantDiffs int
		wantText  []string // substrings of the differences
		opts      []dataset.Option
	}{
		{"same rows in three parts", results, 3, 0, nil, nil},
		// 2 shards of 4 rows, each in pieces of 2 (row groups of 1 row).
		{"same rows in pieces of two", results, 2, 0, nil, []dataset.Option{dataset.GroupRows(1), dataset.PieceGroups(2)}},
		{"one mass changed", changed, 1, 1, []string{"row 5", "550.001 kg", "first differing field SteelMassKg"}, nil},
		{"last row missing", results[:len(results)-1], 2, 1, []string{"row count", "has 8", "has 7"}, nil},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			dir := filepath.Join(base, strings.ReplaceAll(tt.name, " ", "-"))
			writeShards(t, dir, tt.results, tt.parts, tt.opts...)
			n, diffs, err := compareDatasets(one, dir)
			if err != nil {
				t.Fatal(err)
			}
			if n != len(results) {
				t.Errorf("got %d rows in the first dataset, want %d", n, len(results))
			}
			if len(diffs) != tt.wantDiffs {
				t.Fatalf("got %d differences %q, want %d", len(diffs), diffs, tt.wantDiffs)
			}
			all := strings.Join(diffs, "\n")
			for _, w := range tt.wantText {
				if !strings.Contains(all, w) {
					t.Errorf("differences %q lack %q", all, w)
				}
			}
		})
	}
}

// The command exits 0 for equal datasets, 1 when they differ and 2 for bad usage.
func TestCompareExitStatus(t *testing.T) {
	results := madeUpResults(t)
	base := t.TempDir()
	a, b, c := filepath.Join(base, "a"), filepath.Join(base, "b"), filepath.Join(base, "c")
	writeShards(t, a, results, 1)
	writeShards(t, b, results, 3)
	writeShards(t, c, results[1:], 1)
	tests := []struct {
		name string
		args []string
		want int
	}{
		{"equal", []string{"--compare", a, b}, exitOK},
		{"different", []string{"--compare", a, c}, exitFail},
		{"one directory", []string{"--compare", a}, exitUsage},
		{"missing directory", []string{"--compare", a, filepath.Join(base, "none")}, exitFail},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var so, se bytes.Buffer
			if got := run(tt.args, &so, &se); got != tt.want {
				t.Errorf("exit %d, want %d; stdout %q stderr %q", got, tt.want, so.String(), se.String())
			}
		})
	}
}
